package limen.fit.internal;

import java.util.SplittableRandom;

import org.apache.commons.math3.distribution.BinomialDistribution;

/**
 * Draws Binomial(n, p) counts from a caller's generator: by counting n Bernoulli trials for n &le;
 * {@value #DIRECT_LIMIT} (exact and fast at psychophysical trial counts), else by inverting the binomial
 * distribution function at one uniform deviate.
 */
public final class BinomialSampler {

    static final int DIRECT_LIMIT = 1000;

    private BinomialSampler() {
    }

    public static int sample(SplittableRandom rng, int n, double p) {
        if (p <= 0) {
            return 0;
        }
        if (p >= 1) {
            return n;
        }
        if (n <= DIRECT_LIMIT) {
            int k = 0;
            for (int i = 0; i < n; i++) {
                if (rng.nextDouble() < p) {
                    k++;
                }
            }
            return k;
        }
        double u = rng.nextDouble();
        return new BinomialDistribution(null, n, p).inverseCumulativeProbability(u);
    }
}
