package limen.procedure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.Map;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

import limen.procedure.internal.BinomialFit;
import limen.psychometric.Sigmoids;

class ConstantStimuliTest {

    @Test
    void everyBlockHoldsEachValueItsNumberOfTimesInShuffledOrder() {
        ConstantStimuliSettings s = ConstantStimuliSettings.builder().values(1, 2, 3, 4).blocks(3, 5).build();
        ConstantStimuli p = s.create(new SplittableRandom(8));
        int orders = 0;
        String first = null;
        for (int b = 0; b < 5; b++) {
            Map<Double, Integer> counts = new HashMap<>();
            StringBuilder order = new StringBuilder();
            for (int i = 0; i < 12; i++) {
                double v = p.nextValue();
                counts.merge(v, 1, Integer::sum);
                order.append(v).append(',');
                p.record(v, true);
            }
            assertEquals(Map.of(1.0, 3, 2.0, 3, 3.0, 3, 4.0, 3), counts);
            if (first == null) {
                first = order.toString();
            } else if (!first.equals(order.toString())) {
                orders++;
            }
        }
        assertTrue(orders > 0, "blocks are shuffled anew");
        assertTrue(p.finished());
        assertEquals(60, p.trials());
    }

    /** The maximum-likelihood fit against an independent brute-force search of the same likelihood on a fine grid. */
    @Test
    void fitMatchesBruteForceMaximumLikelihood() {
        double[] x = {-2, -1, 0, 1, 2, 3};
        int[] n = {40, 40, 40, 40, 40, 40};
        int[] k = {21, 24, 29, 33, 38, 39};
        BinomialFit.Result r = BinomialFit.fit(Sigmoids.LOGISTIC, 0.5, 0.01, x, n, k);
        double bestLl = Double.NEGATIVE_INFINITY, bm = 0, bs = 0;
        for (double m = -2; m <= 2; m += 0.005) {
            for (double s = 0.2; s <= 3; s += 0.005) {
                double ll = 0;
                for (int i = 0; i < x.length; i++) {
                    double p = 0.5 + 0.49 / (1 + Math.exp(-(x[i] - m) / s));
                    ll += k[i] * Math.log(p) + (n[i] - k[i]) * Math.log(1 - p);
                }
                if (ll > bestLl) {
                    bestLl = ll;
                    bm = m;
                    bs = s;
                }
            }
        }
        assertEquals(bm, r.function().location(), 0.01);
        assertEquals(bs, r.function().spread(), 0.01);
        assertTrue(r.logLikelihood() >= bestLl - 1e-9);
    }

    @Test
    void estimateIsTheFittedValueAtTheTarget() {
        ConstantStimuliSettings s = ConstantStimuliSettings.builder().values(-1, 0, 1, 2).blocks(50, 1)
                .fit(Sigmoids.LOGISTIC, 0.5, 0).target(Target.psi(0.75)).build();
        ConstantStimuli p = s.create(new SplittableRandom(2));
        SplittableRandom l = new SplittableRandom(3);
        while (!p.finished()) {
            double v = p.nextValue();
            p.record(v, l.nextDouble() < 0.5 + 0.5 / (1 + Math.exp(-(v - 0.5) / 0.5)));
        }
        Estimate e = p.estimate();
        // true value at psi 0.75 is the midpoint 0.5; SE from the information matrix is roughly 0.1-0.2
        assertEquals(0.5, e.value(), 3 * e.uncertainty());
        assertTrue(e.uncertainty() > 0.03 && e.uncertainty() < 0.4, "SE " + e.uncertainty());
    }
}
