package limen.session.refit;

import java.util.Arrays;

import limen.fit.ReversalEstimate;

/**
 * Reversals of a recorded track, found after the fact from the sequence of presented values: a reversal is
 * a trial whose value is a peak or a valley, i.e. where the direction of the next change of value differs
 * from the direction of the last change (trials with an unchanged value carry the last direction on). These
 * are the turning points that Levitt (1971, JASA 49(2B), 467-477) averages for the estimate of a transformed
 * up-down track; for methods that do not step up and down (QUEST, Psi) the turning points are reported all
 * the same but mean less.
 */
public final class Reversals {

    private Reversals() {
    }

    /** @return the indices of the turning points of {@code values}, in order */
    public static int[] indices(double[] values) {
        int[] out = new int[values.length];
        int n = 0;
        int lastDirection = 0;
        for (int i = 1; i < values.length; i++) {
            int d = Double.compare(values[i], values[i - 1]);
            if (d == 0) {
                continue;
            }
            if (lastDirection != 0 && d != lastDirection) {
                // the peak or valley is the last trial presented before the change
                out[n++] = i - 1;
            }
            lastDirection = d;
        }
        return Arrays.copyOf(out, n);
    }

    /**
     * The staircase estimate of a track: the mean of its reversals after dropping the first
     * {@code discard}, arithmetic on a linear scale, geometric (mean of log10 values) on a log scale.
     *
     * @return the estimate on the averaging scale (log10 values for a log scale), or null when no reversal is
     *         left after the discarded ones or a log-scale value is not positive
     */
    public static ReversalEstimate estimate(double[] values, int discard, boolean logScale) {
        int[] idx = indices(values);
        if (idx.length <= discard) {
            return null;
        }
        double[] r = new double[idx.length];
        for (int i = 0; i < idx.length; i++) {
            double v = values[idx[i]];
            if (logScale && !(v > 0)) {
                return null;
            }
            r[i] = logScale ? Math.log10(v) : v;
        }
        return ReversalEstimate.of(r, discard, 0);
    }
}
