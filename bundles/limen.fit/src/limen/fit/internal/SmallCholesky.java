package limen.fit.internal;

/**
 * Solves A x = b for a small symmetric positive definite A (the 2 to 4 free coordinates of a fit) by the
 * Cholesky factorisation A = L Lᵀ and two triangular solves (Golub &amp; Van Loan 2013, Matrix Computations,
 * 4th ed., §4.2.5, the outer-product algorithm), without allocating matrix objects or throwing: the
 * Newton climb asks this several times per iteration and treats "not positive definite" as an answer, not
 * an error. A pivot at or below {@value #POSITIVITY_THRESHOLD} (absolute) counts as not positive definite,
 * the same rule as Commons Math's {@code CholeskyDecomposition(matrix, 1e-12, 1e-14)}, which the tests use
 * as the reference. Only the lower triangle of A is read.
 */
public final class SmallCholesky {

    /** Largest pivot still taken as "not positive definite". */
    public static final double POSITIVITY_THRESHOLD = 1e-14;

    private SmallCholesky() {
    }

    /**
     * @param a    an n × n matrix (lower triangle read; overwritten with L)
     * @param b    the right-hand side (overwritten with x)
     * @param n    the order
     * @return true with b = A⁻¹ b, or false when A is not positive definite or a value is not finite (b is
     *         then undefined)
     */
    public static boolean solveInPlace(double[][] a, double[] b, int n) {
        for (int j = 0; j < n; j++) {
            double d = a[j][j];
            for (int k = 0; k < j; k++) {
                d -= a[j][k] * a[j][k];
            }
            if (!(d > POSITIVITY_THRESHOLD)) {
                return false; // also NaN
            }
            double ljj = Math.sqrt(d);
            a[j][j] = ljj;
            for (int i = j + 1; i < n; i++) {
                double s = a[i][j];
                for (int k = 0; k < j; k++) {
                    s -= a[i][k] * a[j][k];
                }
                a[i][j] = s / ljj;
            }
        }
        for (int i = 0; i < n; i++) { // L y = b
            double s = b[i];
            for (int k = 0; k < i; k++) {
                s -= a[i][k] * b[k];
            }
            b[i] = s / a[i][i];
        }
        for (int i = n - 1; i >= 0; i--) { // Lᵀ x = y
            double s = b[i];
            for (int k = i + 1; k < n; k++) {
                s -= a[k][i] * b[k];
            }
            b[i] = s / a[i][i];
        }
        for (int i = 0; i < n; i++) {
            if (!Double.isFinite(b[i])) {
                return false;
            }
        }
        return true;
    }
}
