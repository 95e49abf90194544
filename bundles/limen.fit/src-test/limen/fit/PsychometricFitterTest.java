package limen.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

import limen.fit.internal.BinomialSampler;
import limen.psychometric.PsychometricFunction;
import limen.psychometric.Sigmoids;

class PsychometricFitterTest {

    private static final double[] LEVELS_DB = { 1, 2, 3, 4, 5, 6, 7, 8 };

    @Test
    void refusesDataThatCannotIdentifyTheFunction() {
        PsychometricFitter fitter = new PsychometricFitter(FitOptions.of(Sigmoids.LOGISTIC).withGuess(0.5));
        NotIdentifiableException one = assertThrows(NotIdentifiableException.class,
                () -> fitter.fit(new BinomialData(new double[] { 3, 3 }, new int[] { 20, 20 }, new int[] { 12, 15 })));
        assertTrue(one.getMessage().contains("1 distinct") && one.getMessage().contains("3.0"), one.getMessage());
        NotIdentifiableException flat = assertThrows(NotIdentifiableException.class,
                () -> fitter.fit(new BinomialData(new double[] { 1, 2, 3 }, new int[] { 20, 10, 40 }, new int[] { 20, 10, 40 })));
        assertTrue(flat.getMessage().contains("same proportion") && flat.getMessage().contains("1.0"), flat.getMessage());
        IllegalArgumentException weibull = assertThrows(IllegalArgumentException.class,
                () -> new PsychometricFitter(FitOptions.of(Sigmoids.WEIBULL))
                        .fit(new BinomialData(new double[] { -1, 2, 3 }, new int[] { 20, 20, 20 }, new int[] { 10, 15, 19 })));
        assertTrue(weibull.getMessage().contains("-1.0"), weibull.getMessage());
    }

    /** Perfectly separated data: the maximum-likelihood step is steeper than any data can show; we say so. */
    @Test
    void separatedDataEndOnTheSteepBoundWithAWarning() {
        BinomialData d = new BinomialData(new double[] { 1, 2, 3, 4 }, new int[] { 10, 10, 10, 10 }, new int[] { 0, 0, 10, 10 });
        FitResult r = new PsychometricFitter(FitOptions.of(Sigmoids.LOGISTIC).withLapseMax(0)).fit(d);
        assertTrue(r.warnings().stream().anyMatch(w -> w.contains("steep")), r + " " + r.warnings());
        assertTrue(r.threshold() > 2 && r.threshold() < 3, "threshold " + r.threshold());
        assertEquals(0.0, r.deviance(), 1e-6);
    }

    /** Threshold and slope from the definitions: ψ⁻¹ at the target and dψ/dx = (1 − γ − λ) F'(x). */
    @Test
    void thresholdAndSlopeFollowTheTargets() {
        BinomialData d = ReferenceTables.dataset("wren_2afc");
        FitOptions base = FitOptions.of(Sigmoids.LOGISTIC).withGuess(0.5).withLapse(0.02);
        FitResult mid = new PsychometricFitter(base).fit(d);
        PsychometricFunction f = mid.function();
        assertEquals(0.74, mid.targetPsi(), 1e-15); // (0.5 + 0.98) / 2
        assertEquals(f.location(), mid.threshold(), 1e-12); // logistic F = 1/2 at mid
        assertEquals(0.48 / (4 * f.spread()), mid.slope(), 1e-12);
        FitResult p75 = new PsychometricFitter(base.withTargetPsi(0.75).withTargetF(0.5)).fit(d);
        assertEquals(0.75, p75.function().psi(p75.threshold()), 1e-12);
        assertEquals(p75.function().location(), p75.thresholdAtF(), 1e-12);
        assertEquals(p75.function().psiDerivative(p75.threshold()), p75.slope(), 0.0);
        FitResult unreachable = new PsychometricFitter(base.withTargetPsi(0.99)).fit(d);
        assertTrue(Double.isNaN(unreachable.threshold()));
        assertTrue(unreachable.warnings().stream().anyMatch(w -> w.contains("0.99")), unreachable.warnings().toString());
    }

    /**
     * Consistency of maximum likelihood: with 20,000 trials per cell simulated from a known four-parameter
     * yes/no function, the estimates lie close to the truth (tolerances several asymptotic standard errors).
     */
    @Test
    void recoversAKnownFunctionFromLargeSamples() {
        PsychometricFunction truth = new PsychometricFunction(Sigmoids.NORMAL, 4.2, 1.3, 0.08, 0.03);
        SplittableRandom rng = new SplittableRandom(71);
        double[] x = { 0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10 };
        int[] n = new int[x.length];
        int[] k = new int[x.length];
        for (int i = 0; i < x.length; i++) {
            n[i] = 20_000;
            k[i] = BinomialSampler.sample(rng, n[i], truth.psi(x[i]));
        }
        FitResult r = new PsychometricFitter(FitOptions.of(Sigmoids.NORMAL).withFreeGuess(0.5).withLapseMax(0.06))
                .fit(new BinomialData(x, n, k));
        assertEquals(4.2, r.function().location(), 0.02);
        assertEquals(1.3, r.function().spread(), 0.03);
        assertEquals(0.08, r.function().guess(), 0.005);
        assertEquals(0.03, r.function().lapse(), 0.005);
        assertTrue(r.warnings().isEmpty(), r.warnings().toString());
    }

    /** The Weibull fit and a Gumbel fit on ln x are the same model (log-Weibull identity). */
    @Test
    void weibullFitEqualsGumbelFitOnLogValues() {
        BinomialData d = ReferenceTables.dataset("wren_2afc");
        FitOptions opts = FitOptions.of(Sigmoids.WEIBULL).withGuess(0.5).withLapseMax(0.06);
        FitResult w = new PsychometricFitter(opts).fit(d);
        double[] logX = d.values();
        for (int i = 0; i < logX.length; i++) {
            logX[i] = Math.log(logX[i]);
        }
        FitResult g = new PsychometricFitter(opts.withSigmoid(Sigmoids.GUMBEL)).fit(new BinomialData(logX, d.trials(), d.correct()));
        assertEquals(Math.log(w.function().location()), g.function().location(), 1e-6);
        assertEquals(1 / w.function().spread(), g.function().spread(), 1e-6);
        assertEquals(w.function().lapse(), g.function().lapse(), 1e-7);
        assertEquals(w.logLikelihood(), g.logLikelihood(), 1e-9);
    }

    /**
     * Two different optimisers on the same likelihood: on 60 simulated 2AFC data sets (8 levels x 50 trials,
     * lapse bounded, including replicates that fit poorly or drift toward a step) the fast path (Newton with
     * scoring) must reach a log-likelihood at least as high as BOBYQA alone, to 1e-6.
     */
    @Test
    void fastPathIsNeverWorseThanTheDerivativeFreeOptimiser() {
        PsychometricFunction truth = new PsychometricFunction(Sigmoids.WEIBULL, 26.5, 3.3, 0.5, 0.02);
        double[] x = { 10, 15, 20, 25, 30, 35, 40, 45 };
        int[] n = new int[x.length];
        java.util.Arrays.fill(n, 50);
        PsychometricFitter fitter = new PsychometricFitter(FitOptions.of(Sigmoids.WEIBULL).withGuess(0.5).withLapseMax(0.06));
        BinomialData template = new BinomialData(x, n, new int[x.length]);
        for (int r = 0; r < 60; r++) {
            BinomialData d = Bootstrap.simulate(template, truth, false, 1000 + r);
            FitResult fast = fitter.fit(d, null, false);
            FitResult slow = fitter.fit(d, null, true);
            assertTrue(fast.logLikelihood() >= slow.logLikelihood() - 1e-6,
                    d + ": fast " + fast.logLikelihood() + " < BOBYQA " + slow.logLikelihood());
        }
    }

    @Test
    void optionsAreValidated() {
        assertThrows(IllegalArgumentException.class, () -> FitOptions.of(Sigmoids.LOGISTIC).withLapseMax(1.2));
        assertThrows(IllegalArgumentException.class, () -> FitOptions.of(Sigmoids.LOGISTIC).withGuess(0.97).withLapseMax(0.06));
        assertThrows(IllegalArgumentException.class, () -> FitOptions.of(Sigmoids.LOGISTIC).withTargetPsi(1.0));
        assertEquals(4, FitOptions.of(Sigmoids.LOGISTIC).withFreeGuess(0.5).freeParameters());
        assertEquals(2, FitOptions.of(Sigmoids.LOGISTIC).withLapseMax(0).freeParameters());
        assertTrue(!FitOptions.of(Sigmoids.LOGISTIC).withLapseMax(0).lapseFree());
        assertThrows(IllegalArgumentException.class,
                () -> new BinomialData(LEVELS_DB, new int[8], new int[8]));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new BinomialData(new double[] { 1, 2 }, new int[] { 10, 10 }, new int[] { 3, 11 }));
        assertTrue(e.getMessage().contains("cell 2") && e.getMessage().contains("11"), e.getMessage());
    }
}
