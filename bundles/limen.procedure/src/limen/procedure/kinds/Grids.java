package limen.procedure.kinds;

/** Evenly spaced grids for the Bayesian kinds. */
final class Grids {

    private Grids() {
    }

    /** @return n points from lo to hi inclusive, evenly spaced */
    static double[] even(double lo, double hi, int n) {
        if (n < 2 || !(hi > lo)) {
            throw new IllegalArgumentException("grid needs minimum < maximum and >= 2 points, was [" + lo + ", " + hi + "] with " + n);
        }
        double[] g = new double[n];
        for (int i = 0; i < n; i++) {
            g[i] = lo + (hi - lo) * i / (n - 1);
        }
        return g;
    }
}
