package limen.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import limen.fit.internal.Quantiles;

class QuantilesTest {

    /** Hyndman & Fan (1996) definition 7, which is R's default quantile(type = 7). */
    @Test
    void quantileInterpolatesLikeRType7() {
        double[] v = { 1, 2, 4, 8, 16 };
        assertEquals(1, Quantiles.quantile(v, 0), 0);
        assertEquals(16, Quantiles.quantile(v, 1), 0);
        assertEquals(4, Quantiles.quantile(v, 0.5), 0);
        // h = 4 * 0.1 = 0.4: 1 + 0.4 (2 - 1); R: quantile(c(1,2,4,8,16), 0.1) = 1.4
        assertEquals(1.4, Quantiles.quantile(v, 0.1), 1e-15);
        // h = 4 * 0.9 = 3.6: 8 + 0.6 * 8; R: quantile(c(1,2,4,8,16), 0.9) = 12.8
        assertEquals(12.8, Quantiles.quantile(v, 0.9), 1e-14);
    }

    /** With z0 = 0 and a = 0, BCa's levels are the nominal ones (Efron & Tibshirani 1993, ch. 14). */
    @Test
    void bcaReducesToPercentileWithoutBiasOrAcceleration() {
        assertEquals(0.025, Quantiles.bcaLevel(0, 0, 0.025), 1e-12);
        assertEquals(0.975, Quantiles.bcaLevel(0, 0, 0.975), 1e-12);
        // z0 = 0.1, a = 0.05, alpha = 0.025; R 4.2.2: z0 <- 0.1; a <- 0.05; z <- qnorm(0.025);
        // pnorm(z0 + (z0 + z) / (1 - a * (z0 + z))) = 0.0546100769
        assertEquals(0.0546100769, Quantiles.bcaLevel(0.1, 0.05, 0.025), 1e-10);
        double[] sorted = { 1, 2, 3, 4 };
        assertEquals(0.0, Quantiles.biasCorrection(sorted, 2.5), 1e-15);
        assertEquals(Double.POSITIVE_INFINITY, Quantiles.biasCorrection(sorted, 9), 0);
    }

    /**
     * Replicates equal to the estimate up to the fits' accuracy (as on a ridge toward a step, where many refits
     * end on the estimate's value by different paths, 1e-8 apart) count half whichever side that puts them (ties
     * half: common practice): z0 does not move when the estimate moves by as much. Here 2 below, 4 tied, 2
     * above: p = 1/2.
     */
    @Test
    void tiesWithinTheFitsAccuracyCountHalf() {
        double t = 0.8262168559894514;
        double[] sorted = { 0.5, 0.7, t - 1.6e-8, t - 1e-14, t, t + 1.5e-8, 1.0, 1.6 };
        for (double estimate : new double[] { t, t - 2e-12, t + 2e-8 }) {
            assertEquals(0.0, Quantiles.biasCorrection(sorted, estimate), 1e-15, "estimate " + estimate);
        }
        // beyond the width (1e-6 of the range 1.1) the order counts again: 6 of 8 below, Φ⁻¹(3/4) from Commons
        // Math's normal distribution
        org.apache.commons.math3.distribution.NormalDistribution normal = new org.apache.commons.math3.distribution.NormalDistribution();
        assertEquals(normal.inverseCumulativeProbability(0.75), Quantiles.biasCorrection(sorted, t + 1e-4), 1e-15);
        // 2 below, 1 tied (0.7): p = 2.5/8
        assertEquals(normal.inverseCumulativeProbability(2.5 / 8),
                Quantiles.biasCorrection(new double[] { 0.5, 0.6, 0.7, 0.8, 0.9, 1.0, 1.1, 1.2 }, 0.7), 1e-15);
    }

    /** The weighted jackknife acceleration equals the plain formula on the values repeated by their weights. */
    @Test
    void weightedAccelerationEqualsExpandedJackknife() {
        double[] values = { 1.0, 1.3, 2.9 };
        double[] weights = { 3, 1, 2 };
        double[] expanded = { 1.0, 1.0, 1.0, 1.3, 2.9, 2.9 };
        double mean = 0;
        for (double e : expanded) {
            mean += e / expanded.length;
        }
        double s2 = 0;
        double s3 = 0;
        for (double e : expanded) {
            s2 += (mean - e) * (mean - e);
            s3 += Math.pow(mean - e, 3);
        }
        assertEquals(s3 / (6 * Math.pow(s2, 1.5)), Quantiles.acceleration(values, weights), 1e-15);
        assertEquals(0.0, Quantiles.acceleration(new double[] { 2, 2 }, new double[] { 1, 5 }), 0);
    }
}
