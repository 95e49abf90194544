package limen.model.validation.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.eclipse.emf.common.util.BasicDiagnostic;
import org.eclipse.emf.common.util.Diagnostic;
import org.junit.jupiter.api.Test;

import limen.model.Battery;
import limen.model.Calibration;
import limen.model.CalibrationPoint;
import limen.model.ForcedChoiceTask;
import limen.model.LimenFactory;
import limen.model.OrderingPolicy;
import limen.model.QuantityUnit;
import limen.model.QuestProcedure;
import limen.model.Scale;
import limen.model.Step;
import limen.model.Track;
import limen.model.VariedQuantity;
import limen.model.WeightedUpDownProcedure;

/** The arithmetic behind the checks, against values computed independently here. */
class RuleArithmeticTest {

    private static final LimenFactory F = LimenFactory.eINSTANCE;

    private static Calibration calibration(double referenceDbfs, int sampleRate, double[][] points) {
        Calibration c = F.createCalibration();
        c.setReferenceLevelDbfs(referenceDbfs);
        c.setSampleRateHz(sampleRate);
        for (double[] p : points) {
            CalibrationPoint point = F.createCalibrationPoint();
            point.setFrequencyHz(p[0]);
            point.setMeasuredDbSpl(p[1]);
            c.getPoints().add(point);
        }
        return c;
    }

    @Test
    void calibrationIsInterpolatedLinearlyInDecibelsOnLogFrequency() {
        // points deliberately unsorted; the model documents linear interpolation in dB against log frequency
        CalibrationCurve curve = CalibrationCurve.of(calibration(-20, 48000,
                new double[][] {{2000, 76}, {1000, 70}, {4000, 73}}));
        // half an octave above 1000 Hz is half way on the log axis: 70 + 0.5 * (76 - 70) = 73 dB at -20 dBFS,
        // 93 dB SPL at full scale (hand computation)
        assertEquals(93, curve.fullScaleDbSpl(1000 * Math.sqrt(2)), 1e-9);
        // a quarter octave above 2000 Hz: 76 + 0.25 * (73 - 76) = 75.25 dB, 95.25 at full scale
        assertEquals(95.25, curve.fullScaleDbSpl(2000 * Math.pow(2, 0.25)), 1e-9);
        assertEquals(90, curve.fullScaleDbSpl(1000), 1e-12);
        assertTrue(Double.isNaN(curve.fullScaleDbSpl(999)), "not calibrated below the lowest point");
        assertTrue(Double.isNaN(curve.fullScaleDbSpl(4001)), "not calibrated above the highest point");
        assertEquals(24000, curve.nyquistHz(), 0);
        assertEquals(1000, curve.lowestHz(), 0);
        assertEquals(4000, curve.highestHz(), 0);
    }

    @Test
    void comparisonFrequencies() {
        // 1200 cents make an octave and 100 cents an equal-tempered semitone, 2^(1/12) = 1.0594630943592953
        // (definition of the cent, Ellis 1885; the ratio computed here by hand from the definition)
        assertEquals(2000, StepRules.comparisonHz(1000, 1200, QuantityUnit.CENTS), 1e-9);
        assertEquals(1059.4630943592953, StepRules.comparisonHz(1000, 100, QuantityUnit.CENTS), 1e-9);
        assertEquals(1050, StepRules.comparisonHz(1000, 5, QuantityUnit.PERCENT), 1e-9);
        assertEquals(1003, StepRules.comparisonHz(1000, 3, QuantityUnit.HZ), 1e-12);
    }

    private static Step stepWith(WeightedUpDownProcedure procedure, int intervals) {
        Step step = F.createStep();
        step.setTitle("w");
        ForcedChoiceTask task = F.createForcedChoiceTask();
        task.setIntervalCount(intervals);
        step.setTask(task);
        Track track = F.createTrack();
        track.setName("A");
        track.setProcedure(procedure);
        step.getTracks().add(track);
        return step;
    }

    private static List<Diagnostic> weighted(double p, double up, double down, int intervals) {
        WeightedUpDownProcedure w = F.createWeightedUpDownProcedure();
        w.setTargetProbability(p);
        w.setUpStep(up);
        w.setDownStep(down);
        stepWith(w, intervals);
        BasicDiagnostic chain = new BasicDiagnostic();
        ProcedureRules.validWeightedSteps(w, chain, null);
        return chain.getChildren();
    }

    @Test
    void weightedStepsFollowKaernbach() {
        // Kaernbach (1991): p S_down = (1 - p) S_up, so S_up / S_down = p / (1 - p): 3 for p = 0.75, 4 for p = 0.8
        assertEquals(List.of(), weighted(0.75, 1.5, 0.5, 2));
        assertEquals(List.of(), weighted(0.8, 4, 1, 3));
        List<Diagnostic> off = weighted(0.75, 1.5, 0.75, 2);
        assertEquals(1, off.size());
        assertEquals(310, off.get(0).getCode());
        // 1.5 / (1.5 + 0.75) = 2/3
        assertTrue(off.get(0).getMessage().contains("converge on p = 0.666667"), off.get(0).getMessage());
        assertTrue(off.get(0).getMessage().contains("a down step of 0.5 would"), off.get(0).getMessage());
        // the target must exceed chance: 1/3 for 3AFC
        assertEquals(309, weighted(0.3, 1, 1, 3).get(0).getCode());
    }

    @Test
    void questGridOnALogScaleSpansDecibels() {
        QuestProcedure q = F.createQuestProcedure();
        q.setPriorMean(10);
        q.setRange(40);
        Step step = F.createStep();
        VariedQuantity quantity = F.createVariedQuantity();
        quantity.setScale(Scale.LOG);
        step.setVariedQuantity(quantity);
        // +-20 dB on the 20 log10 axis is a factor 10 either way
        ValueRange range = ValueRange.of(q, step).orElseThrow();
        assertEquals(1, range.min(), 1e-12);
        assertEquals(100, range.max(), 1e-12);
        quantity.setScale(Scale.LINEAR);
        range = ValueRange.of(q, step).orElseThrow();
        assertEquals(-10, range.min(), 1e-12);
        assertEquals(30, range.max(), 1e-12);
    }

    @Test
    void runOrderUnderPermutingPolicies() {
        Battery battery = F.createBattery();
        Step a = F.createStep();
        Step b = F.createStep();
        Step c = F.createStep();
        battery.getSteps().addAll(List.of(a, b, c));
        assertTrue(RunOrder.alwaysBefore(battery, a, c));
        assertFalse(RunOrder.alwaysBefore(battery, c, a));
        assertFalse(RunOrder.alwaysBefore(battery, a, a));
        battery.setOrdering(OrderingPolicy.SHUFFLED);
        assertFalse(RunOrder.alwaysBefore(battery, a, c), "both may move");
        a.setFixedPosition(true);
        assertTrue(RunOrder.alwaysBefore(battery, a, c), "a stays first, the movable slots are 1 and 2");
        assertFalse(RunOrder.alwaysBefore(battery, b, c), "b and c may swap");
        battery.getSteps().move(2, a); // order b, c, a with a fixed in the last slot
        assertFalse(RunOrder.alwaysBefore(battery, a, b));
        assertTrue(RunOrder.alwaysBefore(battery, b, a));
        battery.setOrdering(OrderingPolicy.LATIN_SQUARE);
        assertTrue(RunOrder.alwaysBefore(battery, c, a));
    }

    @Test
    void numbersInMessages() {
        assertEquals("1000", Rules.num(1000.0));
        assertEquals("0.15", Rules.num(0.3 / 2));
        assertEquals("0.3", Rules.num(0.1 + 0.2));
        assertEquals("-3.5", Rules.num(-3.5));
        assertEquals("NaN", Rules.num(Double.NaN));
        assertEquals("0", Rules.num(-0.0));
    }
}
