package limen.procedure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

/**
 * PEST step sequences for scripted answers, traced by hand from the rules of Taylor &amp; Creelman
 * (1967), JASA 41(4), 782-787, as stated in {@link PestSettings} (rules recalled, from memory): halve
 * on reversal; 2nd step in one direction the same; 4th and later doubled; 3rd doubled unless the step
 * before the last reversal was a doubling. With P_t = 0.75 and W = 1 a level is left after 5 correct
 * in a row (N_C − 0.75 N_T = 1.25 &gt; 1) or 2 wrong in a row (0.75·2 − 0 = 1.5 &gt; 1).
 */
class PestTest {

    private static final String DOWN = "+++++";
    private static final String UP = "--";

    /** @return the distinct levels visited, in order */
    private static List<Double> levels(Pest p, String script) {
        List<Double> out = new ArrayList<>();
        for (char c : script.toCharArray()) {
            double v = p.nextValue();
            if (out.isEmpty() || out.get(out.size() - 1) != v) {
                out.add(v);
            }
            p.record(v, c == '+');
        }
        out.add(p.nextValue());
        return out;
    }

    @Test
    void stepRulesTaylorCreelman1967() {
        Pest p = PestSettings.builder().target(0.75).waldLimit(1).start(10).additive(2).build().create(new SplittableRandom(1));
        String script = DOWN + DOWN + DOWN // 10 -2-> 8 -2 (2nd same)-> 6 -4 (3rd doubled: no doubling before a reversal)-> 2
                + UP + UP + UP + UP // reversal: halve 4 -> 2: 4; 2nd same: 6; 3rd NOT doubled (the step before the reversal was a doubling): 8; 4th doubled: 12
                + DOWN + DOWN + DOWN // reversal: halve 4 -> 2: 10; same: 8; 3rd not doubled (doubling before this reversal): 6
                + UP + UP + UP; // reversal: halve -> 1: 7; same: 8; 3rd doubled (the step before the reversal was not a doubling): 10
        assertEquals(List.of(10.0, 8.0, 6.0, 2.0, 4.0, 6.0, 8.0, 12.0, 10.0, 8.0, 6.0, 7.0, 8.0, 10.0), levels(p, script));
        assertEquals(3, p.reversals().size());
        assertEquals(new Reversal(17, 2.0, Reversal.Direction.UP), p.reversals().get(0));
        assertEquals(12.0, p.reversals().get(1).value());
        assertEquals(6.0, p.reversals().get(2).value());
    }

    @Test
    void waldBandDecidesWhenToMove() {
        Pest p = PestSettings.builder().target(0.75).waldLimit(1).start(0).additive(1).build().create(new SplittableRandom(1));
        // + - + + + + + : N=7, C=6, 6 - 5.25 = 0.75; 8th +: 7 - 6 = 1.0 (not > 1); 9th +: 8 - 6.75 = 1.25 > 1 -> move
        String s = "+-++++++";
        for (char c : s.toCharArray()) {
            p.record(p.nextValue(), c == '+');
        }
        assertEquals(0.0, p.nextValue());
        p.record(p.nextValue(), true);
        assertEquals(-1.0, p.nextValue());
        // at the new level: + then - - : N=3, C=1, 2.25 - 1 = 1.25 > 1 -> up
        p.record(p.nextValue(), true);
        p.record(p.nextValue(), false);
        assertEquals(-1.0, p.nextValue());
        p.record(p.nextValue(), false);
        assertEquals(-0.5, p.nextValue(), 1e-12); // reversal: halved
    }

    @Test
    void endsWhenTheStepFallsBelowTheMinimum() {
        Pest p = PestSettings.builder().start(10).additive(2).stepLimits(0.6, 8).endAtMinimumStep(true).build()
                .create(new SplittableRandom(1));
        // down 2 -> 8; reversal up 1 -> 9; reversal down 0.5 < 0.6: ends at 8.5
        for (char c : (DOWN + UP + DOWN).toCharArray()) {
            assertFalse(p.finished());
            p.record(p.nextValue(), c == '+');
        }
        assertTrue(p.finished());
        assertEquals(8.5, p.estimate().value(), 1e-12);
        assertEquals(Estimate.Kind.STEP_SIZE, p.estimate().kind());
    }

    @Test
    void maximumStepCapsDoubling() {
        Pest p = PestSettings.builder().start(100).additive(4).stepLimits(Double.NaN, 6).build().create(new SplittableRandom(1));
        assertEquals(List.of(100.0, 96.0, 92.0, 86.0, 80.0), levels(p, DOWN + DOWN + DOWN + DOWN));
    }

    @Test
    void multiplicativeStepsHalveInLogUnits() {
        Pest p = PestSettings.builder().start(16).multiplicative(2).build().create(new SplittableRandom(1));
        List<Double> v = levels(p, DOWN + UP);
        assertEquals(16.0, v.get(0), 1e-9);
        assertEquals(8.0, v.get(1), 1e-9);
        assertEquals(8 * Math.sqrt(2), v.get(2), 1e-9);
    }
}
