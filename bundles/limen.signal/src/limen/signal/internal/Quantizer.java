package limen.signal.internal;

import java.util.random.RandomGenerator;

/**
 * Conversion of samples (full scale ±1.0) to signed integer PCM codes.
 * <p>
 * Scale: 1.0 maps to {@code FS = 2^(b-1) - 1} (so +1.0 and -1.0 are symmetric; code {@code -2^(b-1)} is only
 * reached by dither). With TPDF dither (triangular probability density over ±1 LSB, the difference of two
 * independent uniform variates; Vanderkooy &amp; Lipshitz 1984, "Resolution below the least significant bit in
 * digital systems with dither", JAES 32(3), 106-113; Wannamaker, Lipshitz &amp; Vanderkooy 2000) the code is
 * {@code round(x·FS + d)}, clamped to the code range; the total error is then independent of the signal in its
 * first two moments, with variance {@code 1/12 + 1/6 = 1/4} LSB².
 */
public final class Quantizer {

    private Quantizer() {
    }

    /** {@code 2^(b-1) - 1}: the code of +1.0. */
    public static int fullScaleCode(int bits) {
        if (bits != 16 && bits != 24) {
            throw new IllegalArgumentException("bits must be 16 or 24: " + bits);
        }
        return (1 << (bits - 1)) - 1;
    }

    /** One TPDF dither value in LSB: {@code u1 - u2}, {@code u} uniform on [0, 1); mean 0, variance 1/6. */
    public static double tpdf(RandomGenerator rng) {
        return rng.nextDouble() - rng.nextDouble();
    }

    /**
     * The code {@code round(x·FS + ditherLsb)} clamped to {@code [-FS-1, FS]}.
     *
     * @param x sample, {@code |x| <= 1}
     * @param bits 16 or 24
     * @param ditherLsb dither in LSB (0 for none)
     */
    public static int quantize(double x, int bits, double ditherLsb) {
        int fs = fullScaleCode(bits);
        double v = Math.rint(x * fs + ditherLsb);
        if (v > fs) {
            return fs;
        }
        if (v < -fs - 1) {
            return -fs - 1;
        }
        return (int) v;
    }

    /**
     * Interleaved little-endian PCM of two channels; TPDF dither for 16 bit (needs {@code rng}), none for 24 bit.
     */
    public static byte[] interleave(double[] left, double[] right, int bits, RandomGenerator rng) {
        if (left.length != right.length) {
            throw new IllegalArgumentException("channels differ in length: " + left.length + ", " + right.length);
        }
        boolean dither = bits == 16;
        if (dither && rng == null) {
            throw new IllegalArgumentException("16-bit output needs a random generator for its TPDF dither");
        }
        int bytes = bits / 8;
        long size = (long) left.length * 2 * bytes;
        if (size > Integer.MAX_VALUE - 64) {
            throw new IllegalArgumentException("too long for one PCM buffer: " + left.length + " frames");
        }
        byte[] out = new byte[(int) size];
        int at = 0;
        for (int n = 0; n < left.length; n++) {
            for (int c = 0; c < 2; c++) {
                double x = c == 0 ? left[n] : right[n];
                int code = quantize(x, bits, dither ? tpdf(rng) : 0.0);
                for (int b = 0; b < bytes; b++) {
                    out[at++] = (byte) (code >> (8 * b));
                }
            }
        }
        return out;
    }
}
