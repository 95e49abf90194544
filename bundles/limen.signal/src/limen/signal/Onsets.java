package limen.signal;

import java.util.ArrayList;
import java.util.List;

/**
 * Onset and offset detection by threshold on the sample magnitude: a sound is on where {@code |x[n]|}
 * exceeds {@code 10^(thresholdDbfs/20)}; excursions separated by less than a minimum gap (e.g. the zero
 * crossings of a tone) belong to one segment.
 */
public final class Onsets {

    /** One detected sound: {@code [onsetSample, offsetSample)}. */
    public record Span(int onsetSample, int offsetSample) {
        /** Length in samples. */
        public int length() {
            return offsetSample - onsetSample;
        }
    }

    private Onsets() {
    }

    /**
     * The segments where the sound is on.
     *
     * @param thresholdDbfs peak threshold, dBFS (e.g. -60)
     * @param minGapSamples below-threshold runs shorter than this do not split a segment; {@code >= 1}
     */
    public static List<Span> segments(double[] x, double thresholdDbfs, int minGapSamples) {
        if (minGapSamples < 1 || !Double.isFinite(thresholdDbfs)) {
            throw new IllegalArgumentException("need a finite threshold and a gap >= 1: " + thresholdDbfs + " dBFS, "
                    + minGapSamples + " samples");
        }
        double t = Math.pow(10, thresholdDbfs / 20);
        List<Span> spans = new ArrayList<>();
        int start = -1;
        int last = -1;
        for (int n = 0; n < x.length; n++) {
            if (Math.abs(x[n]) > t) {
                if (start < 0) {
                    start = n;
                } else if (n - last > minGapSamples) {
                    spans.add(new Span(start, last + 1));
                    start = n;
                }
                last = n;
            }
        }
        if (start >= 0) {
            spans.add(new Span(start, last + 1));
        }
        return spans;
    }

    /** The first onset and last offset above threshold, or empty for a buffer that never exceeds it. */
    public static java.util.Optional<Span> overall(double[] x, double thresholdDbfs) {
        List<Span> s = segments(x, thresholdDbfs, Integer.MAX_VALUE);
        return s.isEmpty() ? java.util.Optional.empty() : java.util.Optional.of(s.get(0));
    }
}
