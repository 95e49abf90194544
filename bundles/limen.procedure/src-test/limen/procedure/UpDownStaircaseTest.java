package limen.procedure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

/** Scripted sequences of the transformed up-down rules, traced by hand from the definition (Levitt 1971). */
class UpDownStaircaseTest {

    private static List<Double> drive(AdaptiveProcedure p, String script) {
        for (char c : script.toCharArray()) {
            p.record(p.nextValue(), c == '+');
        }
        return p.responses().stream().map(Response::value).toList();
    }

    @Test
    void twoDownOneUpAdditiveTrace() {
        UpDownSettings s = UpDownSettings.builder().rule(2, 1).start(10).additive(2).stop(StopRule.afterTrials(100)).build();
        UpDownStaircase p = s.create(new SplittableRandom(1));
        // ++ down to 8, ++ down to 6, - up to 8 (reversal at 6), ++ down to 6 (reversal at 8), + stays
        List<Double> v = drive(p, "++++-+++");
        assertEquals(List.of(10.0, 10.0, 8.0, 8.0, 6.0, 8.0, 8.0, 6.0), v);
        assertEquals(6.0, p.nextValue());
        assertEquals(2, p.reversals().size());
        assertEquals(new Reversal(5, 6.0, Reversal.Direction.UP), p.reversals().get(0));
        assertEquals(new Reversal(7, 8.0, Reversal.Direction.DOWN), p.reversals().get(1));
        assertEquals(7.0, p.estimate().value(), 1e-12);
        assertEquals(Math.sqrt(2), p.estimate().uncertainty(), 1e-12);
    }

    @Test
    void wrongInTheMiddleOfACorrectRunResetsTheCount() {
        UpDownSettings s = UpDownSettings.builder().rule(3, 1).start(0).additive(1).stop(StopRule.afterTrials(100)).build();
        UpDownStaircase p = s.create(new SplittableRandom(1));
        List<Double> v = drive(p, "++-+++");
        assertEquals(List.of(0.0, 0.0, 0.0, 1.0, 1.0, 1.0), v);
        assertEquals(0.0, p.nextValue());
    }

    @Test
    void oneDownTwoUpNeedsTwoWrongInARow() {
        UpDownSettings s = UpDownSettings.builder().rule(1, 2).start(0).additive(1).stop(StopRule.afterTrials(100)).build();
        UpDownStaircase p = s.create(new SplittableRandom(1));
        List<Double> v = drive(p, "-+--");
        assertEquals(List.of(0.0, 0.0, -1.0, -1.0), v);
        assertEquals(0.0, p.nextValue());
    }

    @Test
    void stepShrinksAtEverySecondReversalDownToTheMinimum() {
        UpDownSettings s = UpDownSettings.builder().rule(1, 1).start(0).additive(4).shrink(0.5, 2).minimumStep(1.5)
                .stop(StopRule.afterTrials(100)).build();
        UpDownStaircase p = s.create(new SplittableRandom(1));
        // + down 4 to -4; - reversal 1 up 4 to 0; + reversal 2: shrink to 2, down to -2; - reversal 3 up 2 to 0;
        // + reversal 4: shrink to max(1, 1.5) = 1.5, down to -1.5
        List<Double> v = drive(p, "+-+-+");
        assertEquals(List.of(0.0, -4.0, 0.0, -2.0, 0.0), v);
        assertEquals(-1.5, p.nextValue(), 1e-12);
        assertEquals(1.5, p.currentStep(), 1e-12);
    }

    @Test
    void multiplicativeStepsUseFactorsAndAGeometricMean() {
        UpDownSettings s = UpDownSettings.builder().rule(1, 1).start(8).multiplicative(2).stop(StopRule.afterTrials(100))
                .build();
        UpDownStaircase p = s.create(new SplittableRandom(1));
        List<Double> v = drive(p, "++-+");
        assertEquals(8.0, v.get(0), 1e-12);
        assertEquals(4.0, v.get(1), 1e-12);
        assertEquals(2.0, v.get(2), 1e-12);
        assertEquals(4.0, v.get(3), 1e-12);
        assertEquals(2.0, p.nextValue(), 1e-12);
        // reversals at 2 (up) and 4 (down): geometric mean sqrt(8)
        assertEquals(Math.sqrt(8), p.estimate().value(), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> p.record(-1, true));
    }

    @Test
    void clampsAtFloorAndCeiling() {
        UpDownSettings s = UpDownSettings.builder().rule(1, 1).start(1).additive(3).limits(0, 5)
                .stop(StopRule.afterTrials(100)).build();
        UpDownStaircase p = s.create(new SplittableRandom(1));
        List<Double> v = drive(p, "+--");
        assertEquals(List.of(1.0, 0.0, 3.0), v);
        assertEquals(5.0, p.nextValue());
    }

    @Test
    void thresholdDiscardsFirstAndUsesLast() {
        UpDownSettings s = UpDownSettings.builder().rule(1, 1).start(0).additive(1).threshold(1, 2)
                .stop(StopRule.afterReversals(4)).build();
        UpDownStaircase p = s.create(new SplittableRandom(1));
        // values 0, -1(+), 0(-), ... reversals at -1 (trial 2), 0 (3), -1 (4), 0 (5)... use "+-+-+-"
        drive(p, "+-+-+");
        assertEquals(4, p.reversals().size());
        assertTrue(p.finished());
        assertThrows(IllegalStateException.class, p::nextValue);
        // reversals -1, 0, -1, 0: discard 1, last 2 of the remaining three = (-1 + 0)/2
        assertEquals(-0.5, p.estimate().value(), 1e-12);
        assertEquals(2, p.estimate().basis());
    }

    @Test
    void noEstimateBeforeAReversal() {
        UpDownStaircase p = UpDownSettings.builder().start(0).build().create(new SplittableRandom(1));
        p.record(p.nextValue(), true);
        assertFalse(p.estimate().available());
    }

    /**
     * Targets of the run-counter chain against closed forms: Levitt (1971) p^n = 1/2 for n-down/1-up and,
     * by the same argument on wrong runs, (1 - p)^m = 1/2 for 1-down/m-up; a symmetric 2-down/2-up rule
     * with equal steps balances at p = 1/2 by symmetry; Kaernbach (1991) p S_down = (1 - p) S_up.
     */
    @Test
    void targetsOfTheRunCounterChainMatchClosedForms() {
        for (int n = 1; n <= 4; n++) {
            assertEquals(Math.pow(0.5, 1.0 / n), UpDownSettings.builder().rule(n, 1).start(0).build().targetProbability(), 1e-9);
        }
        assertEquals(1 - Math.sqrt(0.5), UpDownSettings.builder().rule(1, 2).start(0).build().targetProbability(), 1e-9);
        assertEquals(0.5, UpDownSettings.builder().rule(2, 2).start(0).build().targetProbability(), 1e-9);
        assertEquals(0.8, UpDownSettings.builder().rule(1, 1).upDownStepRatio(4).start(0).build().targetProbability(), 1e-9);
    }

    @Test
    void rejectsBadSettingsNamingTheValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> UpDownSettings.builder().start(0).additive(-1).build());
        assertTrue(e.getMessage().contains("-1"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> UpDownSettings.builder().start(1).multiplicative(0.5).build());
        assertThrows(IllegalArgumentException.class, () -> UpDownSettings.builder().start(9).limits(0, 5).build());
        assertThrows(IllegalArgumentException.class, () -> UpDownSettings.builder().build());
    }
}
