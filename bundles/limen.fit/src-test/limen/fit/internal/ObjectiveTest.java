package limen.fit.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import limen.fit.BinomialData;
import limen.fit.FitOptions;
import limen.psychometric.PsychometricFunction;
import limen.psychometric.Sigmoid;
import limen.psychometric.Sigmoids;

/**
 * The objective's derivatives and starts against independent computations written here: central finite
 * differences of −ln L for the score and the observed information, and a direct sum over every split for
 * the best step.
 */
class ObjectiveTest {

    /** An adaptive track's cells (invented, Harbourside demo scale): two levels nearly coincide. */
    private static final BinomialData TRACK = new BinomialData(
            new double[] { 0.5, 0.5949, 0.7071, 0.70735, 0.8409, 0.84104, 1.0, 1.4142, 2.0, 4.0, 8.0 },
            new int[] { 1, 3, 3, 14, 3, 14, 12, 2, 4, 2, 2 },
            new int[] { 1, 2, 1, 7, 3, 13, 12, 2, 4, 2, 2 });

    /**
     * g = −∂(−ln L)/∂c and J = ∂²(−ln L)/∂c² by central differences (step h: error O(h²) for the score,
     * O(h²) for the Hessian, rounding O(ε/h²)), at interior points and at a steep function with λ = 0 whose
     * upper cells are at 100%: there 1 − ψ underflows, which once made J NaN.
     */
    @Test
    void scoreAndObservedInformationAreTheDerivativesOfTheLikelihood() {
        FitOptions[] options = {
            FitOptions.of(Sigmoids.LOGISTIC).withGuess(0.5).withLapseMax(0.06),
            FitOptions.of(Sigmoids.NORMAL).withFreeGuess(0.5).withLapseMax(0.06),
            FitOptions.of(Sigmoids.WEIBULL).withGuess(1.0 / 3).withLapse(0.02),
            FitOptions.of(Sigmoids.GUMBEL).withFreeGuess(0.5).withLapseMax(0.1),
        };
        for (FitOptions o : options) {
            Objective obj = new Objective(TRACK, o);
            int dim = obj.dimension();
            for (double[] point : new double[][] { { -0.4, -2.5, 0.3, 0.4 }, { -0.45, -4.0, 0.1, 0.2 }, { 0.1, -1.0, 0.5, 0.6 } }) {
                double[] c = java.util.Arrays.copyOf(point, dim);
                checkDerivatives(obj, c, o + " at " + java.util.Arrays.toString(c));
            }
        }
        // λ = 0, a function steep enough that ψ = 1 to double precision in the upper cells
        FitOptions o = FitOptions.of(Sigmoids.LOGISTIC).withGuess(0.5).withLapseMax(0.06);
        Objective obj = new Objective(TRACK, o);
        double[] c = { -0.4579, -6.39, 0.0 };
        double[] score = new double[3];
        double[][] expected = new double[3][3];
        double[][] observed = new double[3][3];
        obj.scoreAndInformation(c, score, expected, observed);
        for (int a = 0; a < 2; a++) {
            for (int b = 0; b < 2; b++) {
                assertTrue(Double.isFinite(observed[a][b]), "J finite at λ = 0: " + java.util.Arrays.deepToString(observed));
            }
        }
        // the lapse derivative at its bound 0 is one-sided: compare location and scale only
        double[] h = { 1e-7, 1e-5 };
        for (int a = 0; a < 2; a++) {
            for (int b = 0; b < 2; b++) {
                double fd = secondDifference(obj, c, a, b, h[a], h[b]);
                assertEquals(fd, observed[a][b], 1e-4 * Math.abs(observed[a][b]) + 1e-3, "J" + a + b + " at λ = 0");
            }
        }
    }

    /**
     * The score reuses the family's values from the last {@link Objective#value} only at that very point: after
     * value at the same point, at another point, and at an array changed in place since, it is the same double
     * for double as a fresh objective's (which evaluates the family itself).
     */
    @Test
    void scoreReusesTheLastEvaluationOnlyAtItsPoint() {
        FitOptions o = FitOptions.of(Sigmoids.LOGISTIC).withGuess(0.5).withLapseMax(0.06);
        double[] c = { -0.4, -2.5, 0.3 };
        double[] other = { 0.1, -1.0, 0.6 };
        Objective reused = new Objective(TRACK, o);
        double[] moving = c.clone();
        reused.value(moving);
        assertSameScore(new Objective(TRACK, o), reused, c, "after value at the same point");
        reused.value(other);
        assertSameScore(new Objective(TRACK, o), reused, c, "after value at another point");
        reused.value(moving);
        moving[1] = -1.7; // the caller's array changed after the evaluation
        assertSameScore(new Objective(TRACK, o), reused, moving, "after the evaluated array changed");
        // value at the point it was last evaluated is that value again; at a changed array it is evaluated anew
        double[] again = other.clone();
        double first = reused.value(again);
        assertEquals(new Objective(TRACK, o).value(other), first, 0.0);
        assertEquals(first, reused.value(again), 0.0);
        again[0] = 0.2;
        assertEquals(new Objective(TRACK, o).value(again), reused.value(again), 0.0, "after the evaluated array changed");
    }

    private static void assertSameScore(Objective fresh, Objective reused, double[] c, String where) {
        double[] s1 = new double[3];
        double[] s2 = new double[3];
        double[][] e1 = new double[3][3];
        double[][] e2 = new double[3][3];
        double[][] o1 = new double[3][3];
        double[][] o2 = new double[3][3];
        fresh.scoreAndInformation(c, s1, e1, o1);
        reused.scoreAndInformation(c.clone(), s2, e2, o2);
        assertTrue(java.util.Arrays.equals(s1, s2), "score " + where);
        assertTrue(java.util.Arrays.deepEquals(e1, e2), "expected information " + where);
        assertTrue(java.util.Arrays.deepEquals(o1, o2), "observed information " + where);
    }

    private static void checkDerivatives(Objective obj, double[] c, String where) {
        int dim = obj.dimension();
        double[] score = new double[dim];
        double[][] expected = new double[dim][dim];
        double[][] observed = new double[dim][dim];
        obj.scoreAndInformation(c, score, expected, observed);
        double h = 1e-5;
        for (int a = 0; a < dim; a++) {
            double[] p = c.clone();
            double[] m = c.clone();
            p[a] += h;
            m[a] -= h;
            double fd = -(obj.value(p) - obj.value(m)) / (2 * h);
            assertEquals(fd, score[a], 1e-5 * Math.max(1, Math.abs(fd)), where + ": g" + a);
            for (int b = 0; b < dim; b++) {
                double second = secondDifference(obj, c, a, b, 1e-4, 1e-4);
                assertEquals(second, observed[a][b], 1e-4 * Math.max(1, Math.abs(second)), where + ": J" + a + b);
                assertEquals(expected[a][b], expected[b][a], 0.0, where + ": I symmetric");
            }
        }
    }

    /** ∂²(−ln L)/∂c_a∂c_b by the four-point central formula. */
    private static double secondDifference(Objective obj, double[] c, int a, int b, double ha, double hb) {
        double[] pp = c.clone();
        double[] pm = c.clone();
        double[] mp = c.clone();
        double[] mm = c.clone();
        pp[a] += ha;
        pp[b] += hb;
        pm[a] += ha;
        pm[b] -= hb;
        mp[a] -= ha;
        mp[b] += hb;
        mm[a] -= ha;
        mm[b] -= hb;
        return (obj.value(pp) - obj.value(pm) - obj.value(mp) + obj.value(mm)) / (4 * ha * hb);
    }

    /**
     * The best step by direct summation: for every split between distinct values, ψ = γ below and 1 − λ
     * above with the rates at their closed-form maxima, the log-likelihood summed cell by cell.
     */
    @Test
    void stepStartIsTheBestSplitByDirectSummation() {
        for (FitOptions o : new FitOptions[] { FitOptions.of(Sigmoids.LOGISTIC).withGuess(0.5).withLapseMax(0.06),
                FitOptions.of(Sigmoids.LOGISTIC).withFreeGuess(0.5).withLapseMax(0.06),
                FitOptions.of(Sigmoids.WEIBULL).withGuess(0.5).withLapse(0.03) }) {
            Objective obj = new Objective(TRACK, o);
            double[] start = obj.stepStart();
            assertNotNull(start, o.toString());
            double bestLl = Double.NEGATIVE_INFINITY;
            double bestMid = Double.NaN;
            double bestGuess = Double.NaN;
            double bestLapse = Double.NaN;
            double[] x = TRACK.values();
            for (int split = 1; split < x.length; split++) { // cells sorted: below = [0, split)
                double kb = 0, nb = 0, ka = 0, na = 0;
                for (int i = 0; i < x.length; i++) {
                    if (i < split) {
                        kb += TRACK.correct(i);
                        nb += TRACK.trials(i);
                    } else {
                        ka += TRACK.correct(i);
                        na += TRACK.trials(i);
                    }
                }
                double g = o.guessFree() ? Math.min(o.guessMax(), kb / nb) : o.guess();
                double l = o.lapseFree() ? Math.min(o.lapseMax(), (na - ka) / na) : o.lapse();
                double ll = 0;
                for (int i = 0; i < x.length; i++) {
                    double psi = i < split ? g : 1 - l;
                    int k = TRACK.correct(i);
                    int n = TRACK.trials(i);
                    ll += (k > 0 ? k * Math.log(psi) : 0) + (n > k ? (n - k) * Math.log(1 - psi) : 0);
                }
                if (ll > bestLl) {
                    bestLl = ll;
                    bestMid = o.sigmoid().positiveDomainOnly() ? Math.sqrt(x[split - 1] * x[split]) : 0.5 * (x[split - 1] + x[split]);
                    bestGuess = g;
                    bestLapse = l;
                }
            }
            PsychometricFunction f = obj.function(start);
            assertEquals(bestMid, f.location(), 1e-12 * bestMid, o + " location at the best split's midpoint");
            assertEquals(bestGuess, f.guess(), 1e-15, o + " guess");
            assertEquals(bestLapse, f.lapse(), 1e-15, o + " lapse");
            assertEquals(Objective.LOG_SCALE_MIN, start[1], 0.0, o + " steepest scale");
        }
        // γ = λ = 0 fixed and cells that are not separated: no step has a finite likelihood
        assertNull(new Objective(TRACK, FitOptions.of(Sigmoids.LOGISTIC).withLapseMax(0)).stepStart());
    }

    /** Moving to the steep end of the ridge keeps F at the cell that holds the function. */
    @Test
    void steepEndOfRidgeKeepsThePivotCellOnTheCurve() {
        FitOptions o = FitOptions.of(Sigmoids.NORMAL).withGuess(0.5).withLapseMax(0.06);
        Objective obj = new Objective(TRACK, o);
        double[] c = obj.coordinates(new PsychometricFunction(Sigmoids.NORMAL, 0.83, 0.01, 0.5, 0.01));
        double[] end = obj.steepEndOfRidge(c);
        assertEquals(Objective.LOG_SCALE_MIN, end[1], 0.0);
        assertEquals(c[2], end[2], 0.0, "lapse kept");
        Sigmoid s = Sigmoids.NORMAL;
        PsychometricFunction before = obj.function(c);
        PsychometricFunction after = obj.function(end);
        // the pivot is the cell at 0.84104 (largest n dF/dz: 14 trials, 1.1 sd above the location)
        assertEquals(s.value(0.84104, before.location(), before.spread()), s.value(0.84104, after.location(), after.spread()), 1e-12);
        assertEquals((8.0 - 0.5) * Math.exp(Objective.LOG_SCALE_MIN), after.spread(), 1e-15);
    }
}
