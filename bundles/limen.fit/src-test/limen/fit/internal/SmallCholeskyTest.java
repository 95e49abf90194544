package limen.fit.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.NonPositiveDefiniteMatrixException;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.api.Test;

/**
 * {@link SmallCholesky} against the general-purpose reference, Commons Math's
 * {@code CholeskyDecomposition(matrix, 1e-12, 1e-14)} (which the climb used before): the same solutions of
 * positive definite systems of order 1 to 4, and the same verdict on matrices that are not.
 */
class SmallCholeskyTest {

    @Test
    void solvesPositiveDefiniteSystemsAsCommonsMathDoes() {
        SplittableRandom rng = new SplittableRandom(41);
        for (int trial = 0; trial < 2000; trial++) {
            int n = 1 + trial % 4;
            // A = B Bᵀ + δ I with entries of very different size, as the information matrices have
            double[][] b = new double[n][n];
            for (int i = 0; i < n; i++) {
                double scale = Math.pow(10, rng.nextInt(-2, 4));
                for (int j = 0; j < n; j++) {
                    b[i][j] = scale * rng.nextGaussian();
                }
            }
            double[][] a = new double[n][n];
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    for (int k = 0; k < n; k++) {
                        a[i][j] += b[i][k] * b[j][k];
                    }
                }
                a[i][i] += 1e-3;
            }
            double[] rhs = new double[n];
            for (int i = 0; i < n; i++) {
                rhs[i] = rng.nextGaussian();
            }
            RealVector reference = new CholeskyDecomposition(new Array2DRowRealMatrix(a), 1e-12, 1e-14).getSolver()
                    .solve(new ArrayRealVector(rhs));
            double[][] work = copy(a);
            double[] x = rhs.clone();
            assertTrue(SmallCholesky.solveInPlace(work, x, n), "trial " + trial);
            for (int i = 0; i < n; i++) {
                assertEquals(reference.getEntry(i), x[i], 1e-9 * Math.max(1, Math.abs(reference.getEntry(i))), "trial " + trial + " x" + i);
            }
            // and the residual is small in its own right
            for (int i = 0; i < n; i++) {
                double r = -rhs[i];
                double size = Math.abs(rhs[i]);
                for (int j = 0; j < n; j++) {
                    r += a[i][j] * x[j];
                    size += Math.abs(a[i][j] * x[j]);
                }
                assertEquals(0, r, 1e-12 * size, "trial " + trial + " residual " + i);
            }
        }
    }

    @Test
    void refusesWhatCommonsMathRefuses() {
        double[][][] bad = {
            { { 1, 2 }, { 2, 1 } }, // indefinite
            { { 1, 1 }, { 1, 1 } }, // singular
            { { 0, 0 }, { 0, 1 } }, // zero pivot
            { { 4, 2, 0 }, { 2, 1, 0 }, { 0, 0, 3 } }, // singular leading block
            { { -1 } },
        };
        for (double[][] a : bad) {
            boolean commonsRefuses;
            try {
                new CholeskyDecomposition(new Array2DRowRealMatrix(a), 1e-12, 1e-14);
                commonsRefuses = false;
            } catch (NonPositiveDefiniteMatrixException e) {
                commonsRefuses = true;
            }
            assertTrue(commonsRefuses, java.util.Arrays.deepToString(a));
            assertFalse(SmallCholesky.solveInPlace(copy(a), new double[a.length], a.length), java.util.Arrays.deepToString(a));
        }
        assertFalse(SmallCholesky.solveInPlace(new double[][] { { Double.NaN, 0 }, { 0, 1 } }, new double[2], 2));
        assertFalse(SmallCholesky.solveInPlace(new double[][] { { 1, 0 }, { 0, 1 } }, new double[] { Double.NaN, 0 }, 2));
    }

    private static double[][] copy(double[][] a) {
        double[][] c = new double[a.length][];
        for (int i = 0; i < a.length; i++) {
            c[i] = a[i].clone();
        }
        return c;
    }
}
