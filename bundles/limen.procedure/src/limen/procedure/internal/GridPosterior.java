package limen.procedure.internal;

/**
 * Helpers for distributions held as unnormalised log weights on a grid.
 */
public final class GridPosterior {

    private GridPosterior() {
    }

    /** @return exp(logW − max) / Σ, a normalised copy (all-equal weights if every log weight is −∞) */
    public static double[] normalise(double[] logW) {
        double max = Double.NEGATIVE_INFINITY;
        for (double v : logW) {
            max = Math.max(max, v);
        }
        double[] p = new double[logW.length];
        if (max == Double.NEGATIVE_INFINITY) {
            java.util.Arrays.fill(p, 1.0 / p.length);
            return p;
        }
        double sum = 0;
        for (int i = 0; i < p.length; i++) {
            p[i] = Math.exp(logW[i] - max);
            sum += p[i];
        }
        for (int i = 0; i < p.length; i++) {
            p[i] /= sum;
        }
        return p;
    }

    /** @return {mean, sd} of grid values under weights p (normalised) */
    public static double[] meanSd(double[] grid, double[] p) {
        double m = 0;
        for (int i = 0; i < grid.length; i++) {
            m += p[i] * grid[i];
        }
        double v = 0;
        for (int i = 0; i < grid.length; i++) {
            v += p[i] * (grid[i] - m) * (grid[i] - m);
        }
        return new double[] {m, Math.sqrt(v)};
    }

    /** @return the index of the largest weight (the first on ties) */
    public static int argMax(double[] w) {
        int best = 0;
        for (int i = 1; i < w.length; i++) {
            if (w[i] > w[best]) {
                best = i;
            }
        }
        return best;
    }

    /** @return n evenly spaced values from lo to hi inclusive */
    public static double[] linspace(double lo, double hi, int n) {
        if (n < 2 || !(lo < hi) || !Double.isFinite(lo) || !Double.isFinite(hi)) {
            throw new IllegalArgumentException("grid needs finite lo < hi and >= 2 points, was [" + lo + ", " + hi + "] with " + n);
        }
        double[] g = new double[n];
        for (int i = 0; i < n; i++) {
            g[i] = lo + (hi - lo) * i / (n - 1);
        }
        return g;
    }

    /** @return the natural log of the Gaussian density up to a constant: −(x − mean)²/(2 sd²); 0 for sd = ∞ */
    public static double logGaussian(double x, double mean, double sd) {
        if (sd == Double.POSITIVE_INFINITY) {
            return 0;
        }
        double z = (x - mean) / sd;
        return -0.5 * z * z;
    }
}
