package limen.signal;

/**
 * Samples read from a WAV file (full scale ±1.0, {@code code / (2^(b-1) - 1)}). Reading gives no permission to
 * play or write: to output them again they must go through the {@link SafetyGuard} as a {@link Stimulus}.
 *
 * @param channels one array per channel
 * @param sampleRateHz the file's rate
 * @param bitsPerSample the file's word length
 */
public record WavData(double[][] channels, int sampleRateHz, int bitsPerSample) {

    /** Copies the channels. */
    public WavData {
        double[][] copy = new double[channels.length][];
        for (int c = 0; c < channels.length; c++) {
            copy[c] = channels[c].clone();
        }
        channels = copy;
    }

    /** A copy of the channels. */
    @Override
    public double[][] channels() {
        double[][] copy = new double[channels.length][];
        for (int c = 0; c < channels.length; c++) {
            copy[c] = channels[c].clone();
        }
        return copy;
    }

    /** A copy of one channel. */
    public double[] channel(int c) {
        return channels[c].clone();
    }

    /** Frames per channel. */
    public int length() {
        return channels.length == 0 ? 0 : channels[0].length;
    }
}
