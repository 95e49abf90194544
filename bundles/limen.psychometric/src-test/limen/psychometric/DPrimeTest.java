package limen.psychometric;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

class DPrimeTest {

    /** Green & Swets (1966): for 2AFC the integral reduces to Pc = Φ(d'/√2). */
    @Test
    void twoAlternativesMatchClosedForm() {
        for (double d = -4; d <= 6; d += 0.25) {
            double closed = Sigmoids.NORMAL.value(d / Math.sqrt(2), 0, 1);
            assertEquals(closed, DPrime.proportionCorrect(d, 2), 1e-12, "d'=" + d);
        }
    }

    /** From the formula: at d' = 0 the integrand is d(Φ^m)/dx / m, so Pc = 1/m exactly. */
    @Test
    void chanceAtZeroSensitivity() {
        for (int m = 2; m <= 10; m++) {
            assertEquals(1.0 / m, DPrime.proportionCorrect(0, m), 1e-13, "m=" + m);
            assertEquals(0.0, DPrime.dPrime(1.0 / m, m), 1e-9, "m=" + m);
        }
    }

    /**
     * Independent check by simulation of the decision rule itself (Green & Swets 1966): the target
     * interval holds N(d', 1), the others N(0, 1), the observer picks the largest. 400,000 seeded trials,
     * tolerance 5 binomial standard errors.
     */
    @Test
    void matchesSimulatedMaxRuleObserver() {
        SplittableRandom rng = new SplittableRandom(20010806L);
        java.util.Random gauss = new java.util.Random(rng.nextLong());
        int trials = 400_000;
        for (int m : new int[] { 3, 4, 8 }) {
            for (double d : new double[] { 0.5, 1.0, 2.0 }) {
                int correct = 0;
                for (int t = 0; t < trials; t++) {
                    double target = d + gauss.nextGaussian();
                    boolean win = true;
                    for (int k = 1; k < m && win; k++) {
                        win = gauss.nextGaussian() < target;
                    }
                    correct += win ? 1 : 0;
                }
                double pc = DPrime.proportionCorrect(d, m);
                double se = Math.sqrt(pc * (1 - pc) / trials);
                assertEquals((double) correct / trials, pc, 5 * se, "m=" + m + " d'=" + d);
            }
        }
    }

    /**
     * Table values (Hacker & Ratcliff 1979, Table 1; Macmillan & Creelman 2005, Table A5.7), from memory,
     * not read in the printed tables, hence a tolerance of one unit in the second printed decimal. The
     * 3- and 4-alternative values are carried by the simulation check above, not by these.
     */
    @Test
    void publishedTableValuesFromMemory() {
        // 2AFC: Pc = .76 at d' = 1.00 (from memory; also follows from Φ(1/√2) = 0.7602)
        assertEquals(1.00, DPrime.dPrime(0.76, 2), 0.01);
        // 3AFC: d' = 1.00 gives Pc ≈ .63 (from memory)
        assertEquals(0.63, DPrime.proportionCorrect(1.0, 3), 0.01);
    }

    @Test
    void inverseRoundTripsAndIsMonotone() {
        for (int m : new int[] { 2, 3, 4, 6 }) {
            double prev = -1;
            for (double d = -3; d <= 5; d += 0.5) {
                double pc = DPrime.proportionCorrect(d, m);
                assertTrue(pc > prev);
                prev = pc;
                assertEquals(d, DPrime.dPrime(pc, m), 1e-8, "m=" + m + " d'=" + d);
            }
        }
    }

    @Test
    void rejectsBadArguments() {
        assertThrows(IllegalArgumentException.class, () -> DPrime.proportionCorrect(1, 1));
        assertThrows(IllegalArgumentException.class, () -> DPrime.proportionCorrect(11, 2));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> DPrime.dPrime(1.0, 2));
        assertTrue(e.getMessage().contains("1.0"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> DPrime.dPrime(0.0, 3));
    }
}
