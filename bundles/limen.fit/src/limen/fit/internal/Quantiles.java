package limen.fit.internal;

import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * Percentile and BCa interval arithmetic on bootstrap replicates.
 * <ul>
 * <li>Quantile q(p) of sorted replicates: linear interpolation between order statistics at position
 * h = (B − 1)p (Hyndman &amp; Fan 1996, The American Statistician 50(4), 361-365, definition 7).</li>
 * <li>BCa (Efron &amp; Tibshirani 1993, An Introduction to the Bootstrap, ch. 14):
 * z0 = Φ⁻¹(#{θ* &lt; θ̂}/B) (ties counted half: common practice; a tie is a replicate within the fits' accuracy of θ̂), a = Σ(θ̄ − θ_(i))³ / (6 [Σ(θ̄ − θ_(i))²]^(3/2)) from
 * jackknife values θ_(i), and the interval is [q(α1), q(α2)] with
 * α1,2 = Φ(z0 + (z0 + z_(α/2, 1−α/2)) / (1 − a (z0 + z_(α/2, 1−α/2)))).</li>
 * </ul>
 */
public final class Quantiles {

    private static final NormalDistribution STANDARD_NORMAL = new NormalDistribution(null, 0, 1);

    private Quantiles() {
    }

    /** @param sorted ascending, non-empty; @return q(p) */
    public static double quantile(double[] sorted, double p) {
        double h = (sorted.length - 1) * p;
        int lo = (int) Math.floor(h);
        if (lo >= sorted.length - 1) {
            return sorted[sorted.length - 1];
        }
        if (lo < 0) {
            return sorted[0];
        }
        return sorted[lo] + (h - lo) * (sorted[lo + 1] - sorted[lo]);
    }

    /**
     * Relative width (of the replicates' range) within which a replicate counts as a tie with the estimate. Fits
     * on a ridge toward a step put many replicates on the estimate's value, equal to it only up to the accuracy
     * of their optimisers (seen: 1e-8 of the range, where ln L is flat to 1e-12); counted as below or above by
     * that, they would move z0, and the BCa interval, by chance (once by a third of its width). A replicate
     * that differs genuinely falls this close with probability of order 1e-6.
     */
    static final double TIE_WIDTH = 1e-6;

    /**
     * @return z0 = Φ⁻¹(proportion of replicates below the estimate, ties half, a tie being within
     *         {@value #TIE_WIDTH} of the replicates' range); ±∞ if all on one side
     */
    public static double biasCorrection(double[] sorted, double estimate) {
        double tie = TIE_WIDTH * (sorted[sorted.length - 1] - sorted[0]);
        double below = 0;
        for (double v : sorted) {
            if (Math.abs(v - estimate) <= tie) {
                below += 0.5;
            } else if (v < estimate) {
                below += 1;
            }
        }
        double p = below / sorted.length;
        if (p <= 0) {
            return Double.NEGATIVE_INFINITY;
        }
        if (p >= 1) {
            return Double.POSITIVE_INFINITY;
        }
        return STANDARD_NORMAL.inverseCumulativeProbability(p);
    }

    /**
     * Jackknife acceleration with multiplicities: leaving out one of {@code weights[j]} identical observations
     * gives {@code values[j]}.
     *
     * @return a; 0 when the jackknife values do not vary
     */
    public static double acceleration(double[] values, double[] weights) {
        double total = 0;
        double mean = 0;
        for (int j = 0; j < values.length; j++) {
            total += weights[j];
            mean += weights[j] * values[j];
        }
        mean /= total;
        double s2 = 0;
        double s3 = 0;
        for (int j = 0; j < values.length; j++) {
            double d = mean - values[j];
            s2 += weights[j] * d * d;
            s3 += weights[j] * d * d * d;
        }
        return s2 == 0 ? 0 : s3 / (6 * Math.pow(s2, 1.5));
    }

    /** @return the BCa-adjusted probability for nominal tail probability alpha */
    public static double bcaLevel(double z0, double a, double alpha) {
        double z = STANDARD_NORMAL.inverseCumulativeProbability(alpha);
        return STANDARD_NORMAL.cumulativeProbability(z0 + (z0 + z) / (1 - a * (z0 + z)));
    }
}
