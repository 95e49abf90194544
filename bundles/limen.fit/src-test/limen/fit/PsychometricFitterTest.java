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
        // every location between 2 and 3 fits as well: the normal form reports the midpoint
        assertEquals(2.5, r.threshold(), 1e-12, "threshold");
        assertEquals(0.0, r.deviance(), 1e-6);
        // a refit from the estimate keeps it (the steep end of the ridge) and works out the same warnings when
        // asked, and the same ln L and deviance
        PsychometricFitter fitter = new PsychometricFitter(FitOptions.of(Sigmoids.LOGISTIC).withLapseMax(0));
        FitResult again = fitter.refit(d, r.function());
        assertTrue(again.warmStarted(), "warm start kept");
        assertEquals(r.function(), again.function());
        assertEquals(r.warnings(), again.warnings());
        assertEquals(r.logLikelihood(), again.logLikelihood(), 0.0);
        assertEquals(r.deviance(), again.deviance(), 0.0);
    }

    /**
     * Along a flat ridge toward a step (19/19 beside 8/18, nothing else near) the climbs from different
     * starts stop at different points of equal ln L; the normal form makes them one answer.
     */
    @Test
    void flatRidgeGivesOneAnswerFromEveryStart() {
        BinomialData d = new BinomialData(new double[] { 0.25, 0.3, 0.35, 0.4, 0.45, 0.5, 0.55, 0.6, 0.65, 0.7 },
                new int[] { 1, 6, 18, 19, 6, 2, 2, 2, 2, 2 }, new int[] { 0, 5, 8, 19, 6, 2, 2, 2, 2, 2 });
        PsychometricFitter fitter = new PsychometricFitter(FitOptions.of(Sigmoids.NORMAL).withGuess(0.5).withLapseMax(0.06));
        FitResult plain = fitter.fit(d);
        assertEquals(0.375, plain.threshold(), 1e-12, "midway between 0.35 and 0.4");
        for (double mid : new double[] { 0.3, 0.36, 0.39, 0.5 }) {
            for (double sd : new double[] { 0.005, 0.05 }) {
                PsychometricFunction start = new PsychometricFunction(Sigmoids.NORMAL, mid, sd, 0.5, 0.01);
                assertEquals(plain.function(), fitter.fit(d, start).function(), "from " + start);
                assertEquals(plain.function(), fitter.refit(d, start).function(), "warm from " + start);
            }
        }
    }

    /**
     * The maximum against an independent global search: Commons Math's BOBYQA (Powell 2009, Cambridge report
     * DAMTP 2009/NA06) on ln L written here from {@link BinomialLikelihood}, in natural parameters (location,
     * ln scale, lapse) inside the fitter's box, from 6 × 6 × 3 starts spread over it; the best of those
     * 108 optima is a lower bound on the maximum, so the fit must be at least as high. The data are adaptive
     * tracks (invented) whose likelihood has several modes (a steep function with a lapse, a shallower one
     * without); on the second a climb from smooth starts alone stops on the lower mode, 0.49 below.
     */
    @Test
    void fitIsAtLeastAsHighAsAGlobalMultiStartSearchOnMultimodalTracks() {
        BinomialData[] tracks = {
            new BinomialData(new double[] { 0.5, 0.5949, 0.7071, 0.70735, 0.8409, 0.84104, 1.0, 1.4142, 2.0, 4.0, 8.0 },
                    new int[] { 1, 3, 3, 14, 3, 14, 12, 2, 4, 2, 2 }, new int[] { 1, 2, 1, 5, 3, 13, 12, 2, 4, 2, 2 }),
            new BinomialData(new double[] { 0.5003, 0.5949, 0.7071, 0.70735, 0.8409, 0.84104, 1.0, 1.4142, 2.0, 4.0, 8.0 },
                    new int[] { 3, 7, 1, 14, 2, 14, 9, 2, 4, 2, 2 }, new int[] { 3, 6, 1, 5, 1, 13, 8, 2, 4, 2, 2 }),
            new BinomialData(new double[] { 0.25, 0.3536, 0.5, 0.7071, 0.70748, 0.8409, 0.84119, 1.0, 1.00017, 1.1892, 1.4142, 2.0, 4.0 },
                    new int[] { 1, 3, 3, 4, 1, 3, 8, 6, 11, 8, 2, 4, 2 }, new int[] { 1, 1, 2, 2, 0, 2, 4, 6, 7, 8, 1, 4, 2 }),
        };
        double[] improvement = new double[tracks.length];
        int t = 0;
        FitOptions o = FitOptions.of(Sigmoids.LOGISTIC).withGuess(0.5).withLapseMax(0.06);
        for (BinomialData d : tracks) {
            FitResult fit = new PsychometricFitter(o).fit(d);
            double lo = d.value(0);
            double hi = d.value(d.size() - 1);
            double range = hi - lo;
            double[] lower = { lo - range, Math.log(range * 1e-3), 0 };
            double[] upper = { hi + range, Math.log(range * 1e2), 0.06 };
            // every point evaluated counts (BOBYQA can stop with "failed to reduce Q" near a degenerate optimum)
            double[] best = { Double.NEGATIVE_INFINITY };
            double[][] at = { null };
            org.apache.commons.math3.analysis.MultivariateFunction minusLogL = p -> {
                double ll = BinomialLikelihood.logLikelihood(d, new PsychometricFunction(Sigmoids.LOGISTIC, p[0], Math.exp(p[1]), 0.5, p[2]));
                if (ll > best[0]) {
                    best[0] = ll;
                    at[0] = p.clone();
                }
                return -ll;
            };
            for (int i = 0; i < 6; i++) {
                for (int j = 0; j < 6; j++) {
                    for (int l = 0; l < 3; l++) {
                        double[] start = { lo + range * (i + 0.5) / 6, lower[1] + (upper[1] - lower[1]) * (j + 0.5) / 6, 0.06 * (l + 0.5) / 3 };
                        try {
                            new org.apache.commons.math3.optim.nonlinear.scalar.noderiv.BOBYQAOptimizer(7, 0.1, 1e-10).optimize(
                                    new org.apache.commons.math3.optim.MaxEval(20000),
                                    new org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction(minusLogL),
                                    org.apache.commons.math3.optim.nonlinear.scalar.GoalType.MINIMIZE,
                                    new org.apache.commons.math3.optim.InitialGuess(start),
                                    new org.apache.commons.math3.optim.SimpleBounds(lower, upper));
                        } catch (org.apache.commons.math3.exception.MathIllegalStateException e) {
                            // the best point it met is recorded
                        }
                    }
                }
            }
            assertTrue(fit.logLikelihood() >= best[0] - 1e-6, d + ": fit " + fit.function() + " ln L " + fit.logLikelihood()
                    + " below the multi-start search's " + best[0] + " at " + java.util.Arrays.toString(at[0]));
            improvement[t++] = fit.logLikelihood() - best[0];
        }
        // the search is good enough to matter: it finds the fit's optimum, not something far below
        for (double x : improvement) {
            assertTrue(x < 1e-3, "multi-start search " + java.util.Arrays.toString(improvement) + " below the fits");
        }
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
