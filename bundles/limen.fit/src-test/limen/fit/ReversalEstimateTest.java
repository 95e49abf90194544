package limen.fit;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ReversalEstimateTest {

    private static final double[] TRACK_DB = { 20, 12, 16, 10, 14, 11, 13, 10, 12, 11 };

    /** Hand arithmetic: last 6 of the 8 left after discarding 2: 14, 11, 13, 10, 12, 11. */
    @Test
    void meanAndSpreadOfTheLastReversals() {
        ReversalEstimate e = ReversalEstimate.of(TRACK_DB, 2, 6);
        assertArrayEquals(new double[] { 14, 11, 13, 10, 12, 11 }, e.used());
        assertEquals(71.0 / 6, e.mean(), 1e-14);
        // deviations from 71/6: sum of squares = 851 - 71^2/6 = 10.8333...
        double sd = Math.sqrt((851 - 71.0 * 71 / 6) / 5);
        assertEquals(sd, e.standardDeviation(), 1e-14);
        assertEquals(sd / Math.sqrt(6), e.standardError(), 1e-14);
        assertEquals(6, e.count());
        assertEquals(4, e.notUsed());
    }

    @Test
    void allAfterTheDiscardedOnesWhenUseIsZero() {
        ReversalEstimate e = ReversalEstimate.of(TRACK_DB, 4, 0);
        assertEquals(6, e.count());
        assertEquals((14 + 11 + 13 + 10 + 12 + 11) / 6.0, e.mean(), 1e-14);
        assertTrue(Double.isNaN(ReversalEstimate.of(new double[] { 5 }, 0, 0).standardDeviation()));
    }

    @Test
    void tooFewReversalsAreRefusedWithCounts() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ReversalEstimate.of(TRACK_DB, 4, 8));
        assertTrue(e.getMessage().contains("8") && e.getMessage().contains("6 remain"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> ReversalEstimate.of(TRACK_DB, 10, 0));
        assertThrows(IllegalArgumentException.class, () -> ReversalEstimate.of(TRACK_DB, -1, 0));
        assertThrows(IllegalArgumentException.class, () -> ReversalEstimate.of(new double[] { 1, Double.NaN }, 0, 0));
    }
}
