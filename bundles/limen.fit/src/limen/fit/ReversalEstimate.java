package limen.fit;

import java.util.Arrays;

/**
 * The staircase threshold estimate as the mean of reversal values, with its spread, for comparison beside a
 * fitted function: discard the first {@code discard} reversals (the approach from the start value), then
 * average the last {@code use} of the rest (all of them when {@code use} = 0). Levitt (1971), JASA 49(2B),
 * 467-477, estimates the convergence point of a transformed up-down track from reversal mid-points; averaging
 * an even number of reversals so that peaks and valleys balance is common practice.
 * <pre>
 *   mean = Σ r_i / m,   sd = sqrt(Σ (r_i − mean)² / (m − 1)),   se = sd / √m
 * </pre>
 * Values are averaged in the unit given (for log-spaced steps pass log values, e.g. dB, to get the
 * geometric mean). Immutable.
 */
public final class ReversalEstimate {

    private final double[] used;
    private final int discarded;
    private final double mean;
    private final double sd;

    private ReversalEstimate(double[] used, int discarded) {
        this.used = used;
        this.discarded = discarded;
        this.mean = Arrays.stream(used).sum() / used.length;
        double ss = 0;
        for (double r : used) {
            ss += (r - mean) * (r - mean);
        }
        this.sd = used.length > 1 ? Math.sqrt(ss / (used.length - 1)) : Double.NaN;
    }

    /**
     * @param reversals the reversal values in track order
     * @param discard   how many leading reversals to drop, &ge; 0
     * @param use       how many of the remaining (the last ones) to average; 0 for all
     * @throws IllegalArgumentException for a negative count, a non-finite value, or no reversal left to average
     */
    public static ReversalEstimate of(double[] reversals, int discard, int use) {
        if (discard < 0 || use < 0) {
            throw new IllegalArgumentException("reversal counts must be >= 0, were discard=" + discard + ", use=" + use);
        }
        for (int i = 0; i < reversals.length; i++) {
            if (!Double.isFinite(reversals[i])) {
                throw new IllegalArgumentException("reversal " + (i + 1) + " is not finite: " + reversals[i]);
            }
        }
        int remaining = reversals.length - discard;
        if (remaining < 1) {
            throw new IllegalArgumentException("no reversals left to average: " + reversals.length + " reversals, " + discard
                    + " discarded");
        }
        int count = use == 0 ? remaining : use;
        if (count > remaining) {
            throw new IllegalArgumentException("asked to average the last " + use + " reversals but only " + remaining
                    + " remain after discarding " + discard + " of " + reversals.length);
        }
        double[] chosen = Arrays.copyOfRange(reversals, reversals.length - count, reversals.length);
        return new ReversalEstimate(chosen, reversals.length - count);
    }

    /** @return the mean of the reversals used */
    public double mean() {
        return mean;
    }

    /** @return their sample standard deviation; NaN for one reversal */
    public double standardDeviation() {
        return sd;
    }

    /** @return sd / √m; NaN for one reversal */
    public double standardError() {
        return sd / Math.sqrt(used.length);
    }

    /** @return m, the number of reversals averaged */
    public int count() {
        return used.length;
    }

    /** @return the number of leading reversals not used */
    public int notUsed() {
        return discarded;
    }

    /** @return the reversals averaged (a copy) */
    public double[] used() {
        return used.clone();
    }

    @Override
    public String toString() {
        return "ReversalEstimate[mean " + mean + ", sd " + sd + ", n " + used.length + "]";
    }
}
