package limen.procedure;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

class AxisTest {

    @Test
    void decibelAxisPresentsValuesAndConvertsTheEstimate() {
        QuestSettings onAxis = QuestSettings.builder().weibullInDecibels(3.5, 0.01, 0.5).grid(-20, 20, 81).prior(6, 10)
                .placement(Placement.MEAN).estimator(Placement.MEAN).stop(StopRule.afterTrials(30)).build();
        ProcedureFactory f = Axis.DECIBEL.wrap(onAxis);
        AdaptiveProcedure p = f.create(new SplittableRandom(1));
        Quest reference = onAxis.create(new SplittableRandom(1));
        for (int i = 0; i < 10; i++) {
            double x = p.nextValue();
            // 20 log10 of the presented value is what the axis procedure placed
            assertEquals(reference.nextValue(), 20 * Math.log10(x), 1e-9);
            boolean c = i % 3 != 0;
            p.record(x, c);
            reference.record(20 * Math.log10(x), c);
        }
        assertEquals(Math.pow(10, reference.estimate().value() / 20), p.estimate().value(), 1e-9);
        assertEquals(reference.estimate().uncertainty(), p.estimate().uncertainty(), 1e-12);
        AdaptiveProcedure again = f.replay(new SplittableRandom(1), p.responses());
        assertEquals(p.estimate(), again.estimate());
        assertEquals(1000.0, Axis.DECIBEL.fromAxis(60), 1e-9);
    }
}
