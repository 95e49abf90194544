package limen.signal;

/**
 * The digital output format of a rendered stimulus: sample rate and bits per sample (always two channels,
 * left and right, so that ear routing is explicit in every file).
 *
 * @param sampleRateHz 44100, 48000 or 96000
 * @param bitsPerSample 16 (written with TPDF dither) or 24
 */
public record OutputFormat(int sampleRateHz, int bitsPerSample) {

    /** Channels of every output: 0 = left, 1 = right. */
    public static final int CHANNELS = 2;

    /** Validates the rate and the word length. */
    public OutputFormat {
        requireSupportedRate(sampleRateHz);
        if (bitsPerSample != 16 && bitsPerSample != 24) {
            throw new IllegalArgumentException("bits per sample must be 16 or 24: " + bitsPerSample);
        }
    }

    /**
     * Refuses a sample rate other than 44100, 48000 or 96000 Hz.
     *
     * @return the rate
     */
    public static int requireSupportedRate(int sampleRateHz) {
        if (sampleRateHz != 44100 && sampleRateHz != 48000 && sampleRateHz != 96000) {
            throw new IllegalArgumentException("sample rate must be 44100, 48000 or 96000 Hz: " + sampleRateHz);
        }
        return sampleRateHz;
    }
}
