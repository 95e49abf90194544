package limen.fit.internal;

/**
 * Derives independent per-replicate seeds from one user seed, so that replicate b's random numbers do not
 * depend on which thread runs it or in what order. Uses the SplitMix64 finaliser (Steele, Lea &amp; Flood
 * 2014, "Fast splittable pseudorandom number generators", OOPSLA), a bijective 64-bit mixer.
 */
public final class Seeds {

    private static final long GOLDEN_GAMMA = 0x9E3779B97F4A7C15L;

    private Seeds() {
    }

    /** @return the seed of item {@code index} in stream {@code stream} under {@code seed} */
    public static long derive(long seed, int stream, long index) {
        return mix64(mix64(seed + GOLDEN_GAMMA * (stream + 1L)) + GOLDEN_GAMMA * (index + 1L));
    }

    static long mix64(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }
}
