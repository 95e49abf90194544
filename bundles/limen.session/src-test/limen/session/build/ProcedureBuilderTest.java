package limen.session.build;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

import limen.model.Battery;
import limen.model.ForcedChoiceTask;
import limen.model.LimenFactory;
import limen.model.QuestProcedure;
import limen.model.Scale;
import limen.model.Step;
import limen.model.StepMode;
import limen.model.StoppingRule;
import limen.model.Track;
import limen.model.TransformedUpDownProcedure;
import limen.model.VariedQuantity;
import limen.model.WeightedUpDownProcedure;
import limen.model.YesNoTask;
import limen.model.io.LimenFiles;
import limen.procedure.AdaptiveProcedure;
import limen.procedure.Axis;
import limen.procedure.Task;
import limen.procedure.UpDownSettings;

class ProcedureBuilderTest {

    private static final LimenFactory F = LimenFactory.eINSTANCE;

    private static Step step(limen.model.Task task, Scale scale, limen.model.Procedure p, StoppingRule stop) {
        Step s = F.createStep();
        s.setId("s1");
        s.setTask(task);
        VariedQuantity q = F.createVariedQuantity();
        q.setScale(scale);
        s.setVariedQuantity(q);
        Track t = F.createTrack();
        t.setName("A");
        t.setProcedure(p);
        t.setStoppingRule(stop);
        s.getTracks().add(t);
        return s;
    }

    private static ForcedChoiceTask afc(int n) {
        ForcedChoiceTask t = F.createForcedChoiceTask();
        t.setIntervalCount(n);
        return t;
    }

    private static StoppingRule reversals(int n) {
        StoppingRule r = F.createStoppingRule();
        r.setMaximumReversals(n);
        return r;
    }

    @Test
    void transformedUpDownMapsRuleStepsAndStop() {
        TransformedUpDownProcedure p = F.createTransformedUpDownProcedure();
        p.setDownCount(2);
        p.setUpCount(1);
        p.setStepMode(StepMode.MULTIPLICATIVE);
        p.setInitialStep(2);
        p.setShrinkFactor(0.5);
        p.setReversalsPerShrink(2);
        p.setStartValue(8);
        p.setFloorValue(0.1);
        p.setCeilingValue(50);
        Step s = step(afc(2), Scale.LINEAR, p, reversals(6));
        BuiltTrack b = ProcedureBuilder.build(s, s.getTracks().get(0));
        UpDownSettings u = (UpDownSettings) b.factory();
        assertEquals(Math.sqrt(0.5), u.targetProbability(), 1e-9); // Levitt (1971): p^2 = 0.5
        assertEquals(new Task.ForcedChoice(2), b.task());
        assertEquals(0.5, b.guessRate());
        AdaptiveProcedure proc = u.create(new SplittableRandom(1));
        assertEquals(8.0, proc.nextValue(), 1e-12);
        proc.record(8, true);
        proc.record(8, true);
        assertEquals(4.0, proc.nextValue(), 1e-12);
        assertEquals("reversals>=6", u.stopRule().describe());
    }

    @Test
    void weightedUpDownRatioIsUpOverDown() {
        WeightedUpDownProcedure w = F.createWeightedUpDownProcedure();
        w.setStepMode(StepMode.ADDITIVE);
        w.setUpStep(3);
        w.setDownStep(1);
        w.setTargetProbability(0.75);
        w.setStartValue(10);
        w.setFloorValue(0);
        w.setCeilingValue(20);
        Step s = step(afc(2), Scale.LINEAR, w, reversals(10));
        UpDownSettings u = (UpDownSettings) ProcedureBuilder.build(s, s.getTracks().get(0)).factory();
        // Kaernbach (1991): p = S_up / (S_up + S_down)
        assertEquals(0.75, u.targetProbability(), 1e-9);
    }

    @Test
    void questOnALogAxisWorksInDecibelsAndPlacesAtThePriorFirst() {
        QuestProcedure q = F.createQuestProcedure();
        q.setPriorMean(10); // quantity unit: 20 dB on the axis
        q.setPriorSd(6);
        q.setBeta(3.5);
        q.setLapseRate(0.01);
        q.setGrain(0.5);
        q.setRange(40);
        q.setPlacement(limen.model.EstimatePlacement.MEAN);
        StoppingRule r = F.createStoppingRule();
        r.setPosteriorSdTarget(2);
        r.setMaximumTrials(80);
        Step s = step(afc(3), Scale.LOG, q, r);
        BuiltTrack b = ProcedureBuilder.build(s, s.getTracks().get(0));
        assertEquals(Axis.DECIBEL, b.axis());
        assertEquals(1.0 / 3, b.guessRate(), 1e-12);
        AdaptiveProcedure p = b.factory().create(new SplittableRandom(1));
        assertEquals(10.0, p.nextValue(), 1e-9);
        // psi(T) for the model's Weibull: delta*gamma + (1-delta)(1 - (1-gamma)/e)
        assertEquals(0.01 / 3 + 0.99 * (1 - (2.0 / 3) * Math.exp(-1)), p.target().proportion(), 1e-12);
    }

    @Test
    void yesNoTaskKeepsItsCatchRateAndATrackThatCannotEndIsRefused() {
        YesNoTask yn = F.createYesNoTask();
        yn.setCatchTrialRate(0.2);
        TransformedUpDownProcedure p = F.createTransformedUpDownProcedure();
        p.setDownCount(1);
        p.setUpCount(1);
        p.setInitialStep(2);
        p.setStartValue(40);
        p.setFloorValue(-10);
        p.setCeilingValue(80);
        Step s = step(yn, Scale.LINEAR, p, F.createStoppingRule());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ProcedureBuilder.build(s, s.getTracks().get(0)));
        assertTrue(e.getMessage().contains("step s1, track A"), e.getMessage());
        s.getTracks().get(0).setStoppingRule(reversals(8));
        BuiltTrack b = ProcedureBuilder.build(s, s.getTracks().get(0));
        assertEquals(new Task.YesNo(0.2), b.task());
        assertEquals(0.0, b.guessRate());
    }

    @Test
    void everyExampleBatteryBuilds() throws IOException, Exception {
        String root = System.getProperty("limen.root");
        Path examples = root != null ? Path.of(root, "examples")
                : Files.isDirectory(Path.of("examples")) ? Path.of("examples") : Path.of("../../examples");
        int batteries = 0;
        try (DirectoryStream<Path> ds = Files.newDirectoryStream(examples, "*.battery")) {
            for (Path f : ds) {
                Battery b = LimenFiles.loadBattery(f);
                List<BuiltTrack> tracks = ProcedureBuilder.buildAll(b.getSteps());
                assertFalse(tracks.isEmpty(), f.toString());
                for (BuiltTrack t : tracks) {
                    AdaptiveProcedure p = t.factory().create(new SplittableRandom(3));
                    assertTrue(Double.isFinite(p.nextValue()), f + " " + t.stepId());
                }
                batteries++;
            }
        }
        assertTrue(batteries >= 4, "examples found: " + batteries);
    }
}
