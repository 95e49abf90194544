package limen.signal.internal;

/**
 * Exact phase of a sampled sinusoid, computed from the sample index (never accumulated).
 * <p>
 * The phase of sample {@code n} of a sine of frequency {@code f} sampled at {@code fs} is
 * {@code 2π·frac(n·f/fs)}. The product {@code n·f} is formed exactly as the unevaluated sum {@code hi + lo}
 * ({@link Math#fma} gives the rounding error of the product, Dekker's two-product), {@code hi} is reduced
 * modulo {@code fs} (IEEE remainder of doubles is exact) and {@code lo} added afterwards; so the only
 * rounding left is a few ulps of {@code fs}, whatever {@code n}: no drift over long tones.
 */
public final class Phase {

    private Phase() {
    }

    /**
     * The fractional number of cycles {@code frac(n·f/fs)} in {@code [0, 1)}.
     *
     * @param sampleIndex {@code n}, {@code 0 <= n < 2^53}
     * @param frequencyHz {@code f}, finite
     * @param sampleRateHz {@code fs > 0}
     * @return {@code frac(n·f/fs)}
     */
    public static double fractionalCycles(long sampleIndex, double frequencyHz, double sampleRateHz) {
        double n = sampleIndex;
        double hi = n * frequencyHz;
        double lo = Math.fma(n, frequencyHz, -hi);
        double r = (hi % sampleRateHz) + lo;
        r %= sampleRateHz;
        if (r < 0) {
            r += sampleRateHz;
        }
        double c = r / sampleRateHz;
        return c >= 1.0 ? 0.0 : c;
    }

    /** The phase {@code 2π·frac(n·f/fs)} in radians, in {@code [0, 2π)}. */
    public static double radians(long sampleIndex, double frequencyHz, double sampleRateHz) {
        return 2.0 * Math.PI * fractionalCycles(sampleIndex, frequencyHz, sampleRateHz);
    }
}
