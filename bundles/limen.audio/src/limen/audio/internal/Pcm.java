package limen.audio.internal;

/**
 * Decoding interleaved signed little-endian 16-bit PCM back to samples, with the scale of
 * {@code limen.signal.internal.Quantizer}: code {@code c} is {@code c / 32767} (so the codes written for a
 * sample come back within half a code of it, plus the dither).
 */
public final class Pcm {

    /** The code of +1.0 at 16 bit, {@code 2^15 - 1}. */
    public static final int FULL_SCALE_16 = 32767;

    private Pcm() {
    }

    /**
     * Splits {@code bytes} into {@code channels} channels; a trailing partial frame is ignored.
     *
     * @return {@code [channel][frame]}
     */
    public static double[][] decode16(byte[] bytes, int length, int channels) {
        if (channels < 1 || length < 0 || length > bytes.length) {
            throw new IllegalArgumentException("bad PCM block: " + length + " of " + bytes.length + " bytes, "
                    + channels + " channels");
        }
        int frames = length / (2 * channels);
        double[][] out = new double[channels][frames];
        int at = 0;
        for (int n = 0; n < frames; n++) {
            for (int c = 0; c < channels; c++) {
                int code = (short) ((bytes[at] & 0xff) | (bytes[at + 1] << 8));
                out[c][n] = code / (double) FULL_SCALE_16;
                at += 2;
            }
        }
        return out;
    }
}
