package limen.fit.internal;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.NonPositiveDefiniteMatrixException;
import org.apache.commons.math3.linear.RealVector;

/**
 * Fisher scoring with box constraints: from a start, repeat δ = I⁻¹ g on the coordinates not held at a
 * bound (a coordinate is held when it sits on a bound and the score pushes outward), project the step onto
 * the box and halve it until −ln L decreases. For a binomial GLM this is iteratively reweighted least squares
 * (McCullagh &amp; Nelder 1989, Generalized Linear Models, 2nd ed., §2.5); the projection with an active set
 * follows Bertsekas (1982), SIAM J. Control Optim. 20(2), 221-246. The linear solve is Commons Math's
 * {@link CholeskyDecomposition}.
 * <p>
 * This is the fast path. It gives up (returns null) when the information matrix is singular (e.g. separated
 * data), when no halving decreases the objective before convergence, or after {@value #MAX_ITERATIONS}
 * iterations; the caller then uses the derivative-free bounded optimiser.
 */
public final class FisherScoring {

    static final int MAX_ITERATIONS = 100;
    private static final double STEP_TOLERANCE = 1e-10;
    private static final int MAX_HALVINGS = 40;
    static final double SAME_BASIN = 1e-3;

    private FisherScoring() {
    }

    /**
     * @return the maximiser in working coordinates, or null when scoring failed
     */
    public static double[] maximise(Objective objective, double[] start) {
        return maximise(objective, start, null);
    }

    /**
     * @param known an optimum found from another start, or null: once the iterate comes within
     *              {@value #SAME_BASIN} of it the climb stops early and returns the iterate (it would end there)
     * @return the maximiser in working coordinates, or null when scoring failed
     */
    public static double[] maximise(Objective objective, double[] start, double[] known) {
        int dim = objective.dimension();
        double[] lo = objective.lowerBounds();
        double[] hi = objective.upperBounds();
        double[] c = start.clone();
        for (int j = 0; j < dim; j++) {
            c[j] = Math.max(lo[j], Math.min(hi[j], c[j]));
        }
        double value = objective.value(c);
        double[] score = new double[dim];
        double[][] info = new double[dim][dim];
        for (int iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
            objective.scoreAndInformation(c, score, info);
            boolean[] held = new boolean[dim];
            int free = 0;
            for (int j = 0; j < dim; j++) {
                held[j] = (c[j] <= lo[j] && score[j] < 0) || (c[j] >= hi[j] && score[j] > 0);
                free += held[j] ? 0 : 1;
            }
            if (free == 0) {
                return c;
            }
            double[] step = solve(info, score, held, free);
            if (step == null) {
                return null;
            }
            double size = 0;
            for (double v : step) {
                size = Math.max(size, Math.abs(v));
            }
            double t = 1;
            boolean improved = false;
            double[] trial = new double[dim];
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
            if (!improved) {
                // no decrease along the scoring direction: at an optimum only if the step was already tiny
                return size < 1e-7 ? c : null;
            }
        }
        return null;
    }

    private static double distance(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s = Math.max(s, Math.abs(a[i] - b[i]));
        }
        return s;
    }

    private static double[] solve(double[][] info, double[] score, boolean[] held, int free) {
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
                a[p][q] = info[index[p]][index[q]];
            }
        }
        RealVector x;
        try {
            x = new CholeskyDecomposition(new Array2DRowRealMatrix(a, false), 1e-12, 1e-14).getSolver()
                    .solve(new ArrayRealVector(b, false));
        } catch (NonPositiveDefiniteMatrixException | org.apache.commons.math3.linear.NonSymmetricMatrixException e) {
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
