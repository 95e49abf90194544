package limen.fit.internal;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.NonPositiveDefiniteMatrixException;
import org.apache.commons.math3.linear.NonSymmetricMatrixException;
import org.apache.commons.math3.linear.RealVector;

/**
 * Box-constrained Newton-Raphson on ln L with Fisher scoring as its safeguard. Each iteration solves
 * J δ = g with the observed information J (minus the Hessian) where J is positive definite, else I δ = g
 * with the expected information I (Fisher scoring; for a binomial GLM this is iteratively reweighted least
 * squares, McCullagh &amp; Nelder 1989, Generalized Linear Models, 2nd ed., §2.5), on the coordinates not
 * held at a bound (a coordinate is held when it sits on a bound and the score pushes outward, the
 * active-set rule of projected Newton methods, Bertsekas 1982, SIAM J. Control Optim. 20(2), 221-246). The
 * step is shortened to at most {@value #MAX_STEP} working units, projected onto the box and halved until −ln L decreases (a scoring step that succeeds at once is
 * doubled while −ln L keeps decreasing). Newton converges quadratically near the
 * optimum, where scoring alone can crawl when the data fit poorly. Linear solves use Commons Math's
 * {@link CholeskyDecomposition}.
 * <p>
 * Where both matrices are singular (the function has become a step, or has left the data) it climbs along the
 * score instead, with the same line search, until a bound holds the degenerate coordinate; and it stops where
 * ln L gains less than {@value #STALL_GAIN} over {@value #STALL_WINDOW} iterations (a ridge toward a step,
 * along which no data can distinguish the functions).
 * <p>
 * This is the fast path. It gives up (returns null) when no halving
 * decreases the objective before convergence, or after {@value #MAX_ITERATIONS} iterations; the caller then
 * uses the derivative-free bounded optimiser.
 */
public final class NewtonScoring {

    static final int MAX_ITERATIONS = 100;
    static final double SAME_BASIN = 1e-3;
    private static final double STEP_TOLERANCE = 1e-10;
    private static final int MAX_HALVINGS = 40;
    private static final int MAX_EXPANSIONS = 12;
    /** |∂ ln L / ∂c| below this (log-likelihood units per working unit) counts as stationary. */
    private static final double SCORE_TOLERANCE = 1e-9;
    private static final double ASCENT_STEP = 0.05;
    private static final int STALL_WINDOW = 5;
    /** Longest step (largest component, in working units) tried before halving. */
    private static final double MAX_STEP = 0.5;
    /** Gain of ln L over {@value #STALL_WINDOW} iterations below which the climb stops (a flat ridge). */
    private static final double STALL_GAIN = 1e-10;
    /** Largest move (working units) over {@value #STALL_WINDOW} stalled iterations that still counts as converged. */
    private static final double STALLED_MOVE = 1e-6;

    private NewtonScoring() {
    }

    /**
     * @param known an optimum found from another start, or null: once the iterate comes within
     *              {@value #SAME_BASIN} of it the climb stops early and returns the iterate (it would end there)
     * @return the maximiser in working coordinates, or null when the method failed
     */
    public static double[] maximise(Objective objective, double[] start, double[] known) {
        return climb(objective, start, known, false);
    }

    /**
     * The warm start of a refit from a nearby optimum (e.g. a bootstrap replicate from the estimate that
     * generated it): the same climb, but it reports success only on convergence, i.e. at a stationary point
     * of the free coordinates, with every held coordinate pressing against its bound, once the step has
     * shrunk below rounding, or where ln L has gained less than {@value #STALL_GAIN} over {@value #STALL_WINDOW}
     * iterations while the iterate moved less than {@value #STALLED_MOVE}. A climb that creeps along a ridge, meets singular information (both matrices not
     * positive definite), runs out of iterations or cannot decrease −ln L returns null, so the caller can
     * fall back to the full multi-start search.
     *
     * @return the converged maximiser in working coordinates, or null
     */
    public static double[] converge(Objective objective, double[] start) {
        return climb(objective, start, null, true);
    }

    private static double[] climb(Objective objective, double[] start, double[] known, boolean convergedOnly) {
        int dim = objective.dimension();
        double[] lo = objective.lowerBounds();
        double[] hi = objective.upperBounds();
        double[] c = start.clone();
        for (int j = 0; j < dim; j++) {
            c[j] = Math.max(lo[j], Math.min(hi[j], c[j]));
        }
        double value = objective.value(c);
        double[] score = new double[dim];
        double[][] expected = new double[dim][dim];
        double[][] observed = new double[dim][dim];
        double[] trial = new double[dim];
        double[] history = new double[MAX_ITERATIONS + 1];
        history[0] = value;
        // iterates of the last STALL_WINDOW + 1 iterations (ring), to tell a converged stall from a creep
        double[][] recent = convergedOnly ? new double[STALL_WINDOW + 1][] : null;
        for (int iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
            if (recent != null) {
                recent[iteration % recent.length] = c.clone();
            }
            if (iteration >= STALL_WINDOW && history[iteration - STALL_WINDOW] - value < STALL_GAIN) {
                // a ridge along which ln L still creeps up (a near-step function): no data can tell these apart;
                // or an optimum where the last steps gain only rounding, which a warm start accepts when the
                // iterate has stopped moving
                if (!convergedOnly) {
                    return c;
                }
                double[] before = recent[(iteration - STALL_WINDOW) % recent.length];
                return distance(c, before) < STALLED_MOVE ? c : null;
            }
            objective.scoreAndInformation(c, score, expected, observed);
            boolean[] held = new boolean[dim];
            int free = 0;
            for (int j = 0; j < dim; j++) {
                held[j] = (c[j] <= lo[j] && score[j] < 0) || (c[j] >= hi[j] && score[j] > 0);
                free += held[j] ? 0 : 1;
            }
            if (free == 0 || freeScore(score, held) < SCORE_TOLERANCE) {
                return c; // every coordinate at a bound it presses against, or a stationary point
            }
            double[] step = solve(observed, score, held, free);
            boolean scoring = step == null;
            if (scoring) {
                step = solve(expected, score, held, free);
            }
            if (step == null && convergedOnly) {
                return null; // a degenerate function (a step, or one that has left the data): the full search decides
            }
            if (step == null) {
                // both matrices singular: the function has turned into a step or left the data, where every
                // cell's derivative vanishes; climb along the score until a bound holds the degenerate coordinate
                step = ascentStep(score, held);
            }
            double size = maxAbs(step);
            if (size > MAX_STEP) {
                // a nearly singular matrix gives huge steps that the halving would only whittle down
                for (int j = 0; j < dim; j++) {
                    step[j] *= MAX_STEP / size;
                }
                size = MAX_STEP;
            }
            boolean improved = false;
            double t = 1;
            for (int h = 0; h < MAX_HALVINGS && !improved; h++, t *= 0.5) {
                for (int j = 0; j < dim; j++) {
                    trial[j] = Math.max(lo[j], Math.min(hi[j], c[j] + t * step[j]));
                }
                double v = objective.value(trial);
                if (v <= value) {
                    improved = true;
                    double moved = 0;
                    for (int j = 0; j < dim; j++) {
                        moved = Math.max(moved, Math.abs(trial[j] - c[j]));
                    }
                    if (scoring && h == 0) {
                        // away from the optimum scoring steps can be far too short (poorly fitting data, a
                        // ridge near a bound): keep doubling while the objective keeps falling
                        v = expand(objective, c, step, trial, v, lo, hi);
                    }
                    System.arraycopy(trial, 0, c, 0, dim);
                    boolean stalled = value - v <= 1e-15 * Math.abs(value);
                    value = v;
                    if (size < STEP_TOLERANCE || (moved < STEP_TOLERANCE && stalled)) {
                        return c;
                    }
                    if (known != null && distance(c, known) < SAME_BASIN) {
                        return c;
                    }
                }
            }
            history[iteration + 1] = value;
            if (!improved) {
                // no decrease along the step: at an optimum only if the step was already tiny (rounding)
                return size < 1e-7 ? c : null;
            }
        }
        return null;
    }

    /**
     * Tries c + 2t·step, 4t·step, ... (projected) while each lowers the objective; leaves the best in trial.
     *
     * @return the objective at trial
     */
    private static double expand(Objective objective, double[] c, double[] step, double[] trial, double value,
            double[] lo, double[] hi) {
        double[] next = new double[c.length];
        double t = 1;
        for (int e = 0; e < MAX_EXPANSIONS; e++) {
            t *= 2;
            for (int j = 0; j < c.length; j++) {
                next[j] = Math.max(lo[j], Math.min(hi[j], c[j] + t * step[j]));
            }
            double v = objective.value(next);
            if (!(v < value)) {
                break;
            }
            value = v;
            System.arraycopy(next, 0, trial, 0, c.length);
        }
        return value;
    }

    /** @return the score scaled to a largest component of {@value #ASCENT_STEP}, held coordinates 0 */
    private static double[] ascentStep(double[] score, boolean[] held) {
        double m = freeScore(score, held);
        double[] step = new double[score.length];
        for (int j = 0; j < score.length; j++) {
            step[j] = held[j] ? 0 : ASCENT_STEP * score[j] / m;
        }
        return step;
    }

    private static double freeScore(double[] score, boolean[] held) {
        double m = 0;
        for (int j = 0; j < score.length; j++) {
            if (!held[j]) {
                m = Math.max(m, Math.abs(score[j]));
            }
        }
        return m;
    }

    private static double maxAbs(double[] v) {
        double m = 0;
        for (double x : v) {
            m = Math.max(m, Math.abs(x));
        }
        return m;
    }

    private static double distance(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s = Math.max(s, Math.abs(a[i] - b[i]));
        }
        return s;
    }

    /** @return the solution of the reduced system (held coordinates fixed), or null if not positive definite */
    private static double[] solve(double[][] matrix, double[] score, boolean[] held, int free) {
        double[][] a = new double[free][free];
        double[] b = new double[free];
        int[] index = new int[free];
        for (int j = 0, p = 0; j < held.length; j++) {
            if (!held[j]) {
                index[p++] = j;
            }
        }
        for (int p = 0; p < free; p++) {
            b[p] = score[index[p]];
            for (int q = 0; q < free; q++) {
                a[p][q] = matrix[index[p]][index[q]];
                if (!Double.isFinite(a[p][q])) {
                    return null;
                }
            }
        }
        RealVector x;
        try {
            x = new CholeskyDecomposition(new Array2DRowRealMatrix(a, false), 1e-12, 1e-14).getSolver()
                    .solve(new ArrayRealVector(b, false));
        } catch (NonPositiveDefiniteMatrixException | NonSymmetricMatrixException e) {
            return null;
        }
        double[] step = new double[held.length];
        for (int p = 0; p < free; p++) {
            double v = x.getEntry(p);
            if (!Double.isFinite(v)) {
                return null;
            }
            step[index[p]] = v;
        }
        return step;
    }
}
