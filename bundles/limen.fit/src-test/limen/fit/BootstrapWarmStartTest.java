package limen.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

import limen.psychometric.PsychometricFunction;
import limen.psychometric.Sigmoids;

/**
 * The bootstrap's warm-started refit ({@link PsychometricFitter#refit}: Newton with scoring from the
 * generating estimate, checked by climbs from the best step and the best distinct grid point) against the
 * full search ({@link PsychometricFitter#fit(BinomialData, PsychometricFunction)}: grid, generating estimate,
 * best step and their climbs, BOBYQA where Newton fails), which is the
 * independent reference here: it is checked against R's {@code glm} and {@code optim} in
 * {@link GlmReferenceTest} and {@link OptimReferenceTest}. On every replicate the two must reach the same
 * optimum: the warm log-likelihood no lower than the full one beyond rounding, and the same threshold,
 * slope and deviance to tight tolerances; and the warm path must actually be taken on most replicates (else
 * the test would pass vacuously by always falling back).
 */
class BootstrapWarmStartTest {

    /** ln L agreement: far below the 0.5 of a 1-sd likelihood interval, above the optimiser's rounding. */
    private static final double LOG_LIKELIHOOD_TOLERANCE = 1e-7;

    private record Case(String name, FitOptions options, BinomialData data, double minimumWarmShare) {
    }

    private static List<Case> cases() {
        List<Case> c = new ArrayList<>();
        c.add(new Case("wren 2AFC Weibull, lapse free", FitOptions.of(Sigmoids.WEIBULL).withGuess(0.5).withLapseMax(0.06),
                ReferenceTables.dataset("wren_2afc"), 0.9));
        c.add(new Case("raven logistic, lapse 0", FitOptions.of(Sigmoids.LOGISTIC).withLapseMax(0),
                ReferenceTables.dataset("raven_intensity"), 0.9));
        c.add(new Case("raven yes/no logistic, guess and lapse free",
                FitOptions.of(Sigmoids.LOGISTIC).withFreeGuess(0.5).withLapseMax(0.06), ReferenceTables.dataset("raven_intensity"), 0.8));
        c.add(new Case("staircase-like 2AFC normal, 60 trials, lapse free",
                FitOptions.of(Sigmoids.NORMAL).withGuess(0.5).withLapseMax(0.06), staircaseLike(), 0.5));
        // an adaptive track with nearly coincident levels (invented): a likelihood with several modes, where
        // the warm refit must also climb from the best step and the start grid
        c.add(new Case("adaptive track, near-coincident levels, 2AFC logistic, lapse free",
                FitOptions.of(Sigmoids.LOGISTIC).withGuess(0.5).withLapseMax(0.06),
                new BinomialData(new double[] { 0.5003, 0.5949, 0.7071, 0.70735, 0.8409, 0.84104, 1.0, 1.4142, 2.0, 4.0, 8.0 },
                        new int[] { 3, 7, 1, 14, 2, 14, 9, 2, 4, 2, 2 }, new int[] { 3, 6, 1, 5, 1, 13, 8, 2, 4, 2, 2 }), 0.5));
        c.add(new Case("staircase-like 3AFC Gumbel, 60 trials, lapse 0.02 fixed",
                FitOptions.of(Sigmoids.GUMBEL).withGuess(1.0 / 3).withLapse(0.02), staircaseLike(), 0.5));
        return c;
    }

    /**
     * 60 trials of a 2-down/1-up track around 0.3 (P-OTTER of the Harbourside Auditory Lab, invented):
     * uneven cells, many with few trials, as in the stored sessions that {@code ./limen refit} refits.
     */
    private static BinomialData staircaseLike() {
        PsychometricFunction listener = new PsychometricFunction(Sigmoids.NORMAL, 0.3, 0.1, 0.5, 0.02);
        SplittableRandom rng = new SplittableRandom(606);
        double step = 0.05;
        double x = 0.7;
        int run = 0;
        java.util.TreeMap<Double, int[]> cells = new java.util.TreeMap<>();
        for (int t = 0; t < 60; t++) {
            double v = Math.round(x / step) * step;
            boolean correct = rng.nextDouble() < listener.psi(v);
            int[] cell = cells.computeIfAbsent(v, k -> new int[2]);
            cell[0]++;
            cell[1] += correct ? 1 : 0;
            if (correct && ++run == 2) {
                x -= step;
                run = 0;
            } else if (!correct) {
                x += step;
                run = 0;
            }
        }
        double[] v = new double[cells.size()];
        int[] n = new int[v.length];
        int[] k = new int[v.length];
        int i = 0;
        for (var e : cells.entrySet()) {
            v[i] = e.getKey();
            n[i] = e.getValue()[0];
            k[i++] = e.getValue()[1];
        }
        return new BinomialData(v, n, k);
    }

    /**
     * Where the likelihood has a flat ridge (near-separated cells, e.g. 19/19 beside 12/18) two climbs may
     * stop at different points of equal ln L (to 1e-15), so the thresholds are compared against their own
     * bootstrap spread: a difference below 1e-3 standard errors (1e-2 for the slope, which moves most along
     * such a ridge) cannot move an interval visibly.
     */
    @Test
    void warmStartReachesTheSameOptimumAsTheFullSearch() {
        for (Case c : cases()) {
            PsychometricFitter fitter = new PsychometricFitter(c.options());
            FitResult original = fitter.fit(c.data());
            PsychometricFitter.GridCache grid = fitter.gridCache(c.data());
            int replicates = 400;
            double[][] thresholds = new double[2][replicates];
            double[][] slopes = new double[2][replicates];
            int warm = 0;
            for (int b = 0; b < replicates; b++) {
                // parametric replicates, plus nonparametric ones for the last quarter (data further from the estimate)
                BinomialData d = Bootstrap.simulate(c.data(), original.function(), b >= 300, 7000 + b);
                FitResult fast = fitter.refit(d, original.function());
                FitResult full = fitter.fit(d, original.function());
                warm += fast.warmStarted() ? 1 : 0;
                String where = c.name() + ", replicate " + b + " " + d;
                // the bootstrap's shared start-grid terms change no bit of the result
                assertEquals(fast.function(), fitter.refit(d, original.function(), grid).function(), where + ": grid cache");
                if (!fast.warmStarted()) {
                    // the fallback is the full search, which takes the refit's own climbs where it would repeat
                    // them: the same optimum, to the last digits of its coordinates
                    assertSameFunction(full.function(), fast.function(), where + ": the fallback is the full search");
                }
                assertEquals(full.logLikelihood(), fast.logLikelihood(), LOG_LIKELIHOOD_TOLERANCE, where + ": ln L");
                assertEquals(full.deviance(), fast.deviance(), 2 * LOG_LIKELIHOOD_TOLERANCE, where + ": deviance");
                assertEquals(Double.isNaN(full.threshold()), Double.isNaN(fast.threshold()), where + ": target reached");
                thresholds[0][b] = full.threshold();
                thresholds[1][b] = fast.threshold();
                slopes[0][b] = full.slope();
                slopes[1][b] = fast.slope();
            }
            // the staircase-like cells are often near-separated (a ridge toward a step), where the full search
            // must decide; elsewhere the warm start should almost always stand
            assertTrue(warm >= c.minimumWarmShare() * replicates, c.name() + ": warm start kept on only " + warm + " of " + replicates);
            assertSameWithinSpread(c.name() + " threshold", thresholds[0], thresholds[1], 1e-3);
            // the slope moves most along such a ridge (0.2% there); still far below its spread
            assertSameWithinSpread(c.name() + " slope", slopes[0], slopes[1], 1e-2);
        }
    }

    private static void assertSameFunction(PsychometricFunction expected, PsychometricFunction actual, String where) {
        assertEquals(expected.location(), actual.location(), 1e-12 * Math.max(1, Math.abs(expected.location())), where + ", location");
        assertEquals(expected.spread(), actual.spread(), 1e-12 * expected.spread(), where + ", spread");
        assertEquals(expected.guess(), actual.guess(), 1e-12, where + ", guess");
        assertEquals(expected.lapse(), actual.lapse(), 1e-12, where + ", lapse");
    }

    private static void assertSameWithinSpread(String what, double[] full, double[] fast, double standardErrors) {
        double sd = standardDeviation(full);
        assertTrue(sd > 0, what + ": replicates vary");
        double max = 0;
        for (int b = 0; b < full.length; b++) {
            if (!Double.isNaN(full[b])) {
                max = Math.max(max, Math.abs(full[b] - fast[b]));
            }
        }
        assertTrue(max <= standardErrors * sd, what + ": max |warm - full| " + max + " vs bootstrap SD " + sd);
    }

    private static double standardDeviation(double[] v) {
        double sum = 0;
        double sq = 0;
        int n = 0;
        for (double x : v) {
            if (!Double.isNaN(x)) {
                sum += x;
                sq += x * x;
                n++;
            }
        }
        double mean = sum / n;
        return Math.sqrt(Math.max(0, (sq - n * mean * mean) / (n - 1)));
    }

    /** The jackknife sets of BCa (one trial left out) are refitted the same way. */
    @Test
    void warmStartMatchesTheFullSearchOnJackknifeSets() {
        for (Case c : cases()) {
            PsychometricFitter fitter = new PsychometricFitter(c.options());
            FitResult original = fitter.fit(c.data());
            List<BinomialData> sets = new ArrayList<>();
            Bootstrap.jackknifeSets(c.data(), sets, new ArrayList<>());
            PsychometricFitter.GridCache grid = fitter.gridCache(c.data());
            for (BinomialData d : sets) {
                FitResult fast = fitter.refit(d, original.function());
                // the start grid's terms of the full data (the same values, fewer trials in one cell, or one
                // cell fewer where it is not used) change no bit of the result
                assertEquals(fast.function(), fitter.refit(d, original.function(), grid).function(), c.name() + " " + d + ": grid cache");
                FitResult full = fitter.fit(d, original.function());
                assertTrue(fast.warmStarted(), c.name() + " " + d + ": leaving one trial out keeps the optimum interior");
                assertEquals(full.logLikelihood(), fast.logLikelihood(), LOG_LIKELIHOOD_TOLERANCE, c.name() + " " + d);
                assertEquals(full.threshold(), fast.threshold(), 1e-5 * range(c.data()), c.name() + " " + d);
            }
        }
    }

    private static double range(BinomialData d) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < d.size(); i++) {
            lo = Math.min(lo, d.value(i));
            hi = Math.max(hi, d.value(i));
        }
        return hi - lo;
    }
}
