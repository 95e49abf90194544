package limen.signal;

import limen.signal.internal.Phase;

/**
 * Sample-accurate synthesis primitives on plain {@code double} arrays (full scale = ±1.0).
 * <p>
 * Every sine sample is a direct function of its sample index: {@code x[n] = A·sin(2π·frac(n·f/fs) + φ)} with
 * the exact phase reduction of {@link Phase}. For speed the samples are produced in blocks of {@value #BLOCK}:
 * the phase {@code φ0} of the block's first index is computed exactly, and sample {@code n0 + k} is
 * {@code sin φ0·cos θk + cos φ0·sin θk} (angle addition), with {@code θk = 2π·frac(k·f/fs)} tabulated once per
 * tone. Nothing is carried from one block to the next, so the error stays at a few ulps for any tone length
 * (no recurrence, no drift).
 * <p>
 * Sampling theorem (Shannon 1949; Nyquist 1928): a sine is representable only below {@code fs/2}, so
 * frequencies at or above the Nyquist frequency are refused.
 */
public final class Synthesis {

    /** Samples per block of the angle-addition scheme. */
    public static final int BLOCK = 256;

    private Synthesis() {
    }

    /**
     * Refuses a frequency that is not strictly between 0 and the Nyquist frequency {@code fs/2}.
     *
     * @throws IllegalArgumentException with the offending frequency and the Nyquist frequency
     */
    public static void requireBelowNyquist(double frequencyHz, double sampleRateHz) {
        if (!(sampleRateHz > 0) || Double.isInfinite(sampleRateHz)) {
            throw new IllegalArgumentException("sample rate must be positive and finite: " + sampleRateHz + " Hz");
        }
        if (!(frequencyHz > 0) || frequencyHz >= sampleRateHz / 2) {
            throw new IllegalArgumentException("frequency " + frequencyHz + " Hz must be > 0 and below the Nyquist "
                    + "frequency " + sampleRateHz / 2 + " Hz (sampling theorem) at " + sampleRateHz + " Hz");
        }
    }

    /**
     * Adds {@code A·sin(2π·f·(firstIndex + i)/fs + φ)} to {@code out[offset + i]} for {@code 0 <= i < length}.
     *
     * @param out the buffer to add to
     * @param offset first position written in {@code out}
     * @param length number of samples
     * @param firstIndex the sample index (phase origin) of {@code out[offset]}; 0 starts the sine at phase φ
     * @param frequencyHz {@code 0 < f < fs/2}
     * @param peakAmplitude {@code A}, finite
     * @param phaseRadians {@code φ}
     * @param sampleRateHz {@code fs}
     */
    public static void addSine(double[] out, int offset, int length, long firstIndex, double frequencyHz,
            double peakAmplitude, double phaseRadians, double sampleRateHz) {
        requireBelowNyquist(frequencyHz, sampleRateHz);
        checkRange(out, offset, length);
        if (!Double.isFinite(peakAmplitude) || !Double.isFinite(phaseRadians) || firstIndex < 0) {
            throw new IllegalArgumentException("amplitude " + peakAmplitude + ", phase " + phaseRadians
                    + " and first index " + firstIndex + " must be finite and the index >= 0");
        }
        int table = Math.min(BLOCK, length);
        double[] sinTheta = new double[table];
        double[] cosTheta = new double[table];
        for (int k = 0; k < table; k++) {
            double theta = Phase.radians(k, frequencyHz, sampleRateHz);
            sinTheta[k] = Math.sin(theta);
            cosTheta[k] = Math.cos(theta);
        }
        for (int start = 0; start < length; start += BLOCK) {
            double phi0 = Phase.radians(firstIndex + start, frequencyHz, sampleRateHz) + phaseRadians;
            double s0 = peakAmplitude * Math.sin(phi0);
            double c0 = peakAmplitude * Math.cos(phi0);
            int end = Math.min(BLOCK, length - start);
            int base = offset + start;
            for (int k = 0; k < end; k++) {
                out[base + k] += s0 * cosTheta[k] + c0 * sinTheta[k];
            }
        }
    }

    /**
     * A new buffer holding {@code A·sin(2π·f·n/fs)}, {@code n = 0 .. length-1}.
     */
    public static double[] sine(double frequencyHz, double peakAmplitude, int length, double sampleRateHz) {
        double[] out = new double[length];
        addSine(out, 0, length, 0, frequencyHz, peakAmplitude, 0.0, sampleRateHz);
        return out;
    }

    /**
     * The raised-cosine (cos²) onset gain at position {@code i} of a ramp of {@code rampSamples} samples:
     * {@code g(i) = sin²(π·i / (2R)) = (1 - cos(π·i/R))/2}, so {@code g(0) = 0} and the gain reaches 1 at
     * {@code i = R} (the first steady sample).
     */
    public static double cos2RampGain(int i, int rampSamples) {
        if (i >= rampSamples) {
            return 1.0;
        }
        double s = Math.sin(Math.PI * i / (2.0 * rampSamples));
        return s * s;
    }

    /**
     * Multiplies {@code x[offset .. offset+length)} by cos² onset and offset ramps of {@code rampSamples}
     * each: the onset gain {@link #cos2RampGain(int, int)} at {@code i}, the offset gain mirrored so the
     * last sample gets {@code g(0) = 0}.
     *
     * @throws IllegalArgumentException if the two ramps do not fit in {@code length}
     */
    public static void applyCos2Ramps(double[] x, int offset, int length, int rampSamples) {
        checkRange(x, offset, length);
        if (rampSamples < 0 || 2L * rampSamples > length) {
            throw new IllegalArgumentException("two ramps of " + rampSamples + " samples do not fit in "
                    + length + " samples");
        }
        for (int i = 0; i < rampSamples; i++) {
            double g = cos2RampGain(i, rampSamples);
            x[offset + i] *= g;
            x[offset + length - 1 - i] *= g;
        }
    }

    /**
     * Samples of a duration, rounded to the nearest sample: {@code round(seconds·fs)}.
     *
     * @throws IllegalArgumentException for a negative or non-finite duration or more than 2^31-1 samples
     */
    public static int samples(double seconds, double sampleRateHz) {
        if (!(seconds >= 0) || Double.isInfinite(seconds)) {
            throw new IllegalArgumentException("duration must be >= 0 and finite: " + seconds + " s");
        }
        double n = Math.rint(seconds * sampleRateHz);
        if (n > Integer.MAX_VALUE - 16) {
            throw new IllegalArgumentException("duration too long for one buffer: " + seconds + " s");
        }
        return (int) n;
    }

    private static void checkRange(double[] out, int offset, int length) {
        if (offset < 0 || length < 0 || (long) offset + length > out.length) {
            throw new IllegalArgumentException("range [" + offset + ", " + ((long) offset + length)
                    + ") outside a buffer of " + out.length + " samples");
        }
    }
}
