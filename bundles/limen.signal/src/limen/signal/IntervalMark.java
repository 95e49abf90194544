package limen.signal;

/**
 * Where one observation interval of a trial sits in the trial's buffer; the booth lights the interval
 * indicators from these sample indices.
 *
 * @param index 0-based interval number
 * @param onsetSample first sample of the interval's sound (inclusive)
 * @param offsetSample end of the interval's sound (exclusive)
 * @param target whether the target is in this interval
 */
public record IntervalMark(int index, int onsetSample, int offsetSample, boolean target) {

    /** Validates the span. */
    public IntervalMark {
        if (index < 0 || onsetSample < 0 || offsetSample < onsetSample) {
            throw new IllegalArgumentException("bad interval " + index + ": " + onsetSample + " to " + offsetSample);
        }
    }

    /** The onset in seconds at {@code sampleRateHz}. */
    public double onsetSeconds(double sampleRateHz) {
        return onsetSample / sampleRateHz;
    }

    /** The offset in seconds at {@code sampleRateHz}. */
    public double offsetSeconds(double sampleRateHz) {
        return offsetSample / sampleRateHz;
    }
}
