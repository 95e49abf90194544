package limen.model.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.util.List;
import java.util.stream.Stream;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.model.AbsoluteLevel;
import limen.model.Battery;
import limen.model.Calibration;
import limen.model.CalibrationPoint;
import limen.model.ContributedProcedure;
import limen.model.ExposureEstimate;
import limen.model.ForcedChoiceTask;
import limen.model.LimenFactory;
import limen.model.MaskerNoise;
import limen.model.NoiseSpectrum;
import limen.model.OrderingPolicy;
import limen.model.PsiProcedure;
import limen.model.QuantityUnit;
import limen.model.RelativeLevel;
import limen.model.SessionHeader;
import limen.model.SessionStatus;
import limen.model.Setting;
import limen.model.SettingType;
import limen.model.SettingsGroup;
import limen.model.Step;
import limen.model.StepMode;
import limen.model.Stimulus;
import limen.model.StimulusKind;
import limen.model.StoppingRule;
import limen.model.Track;
import limen.model.TransformedUpDownProcedure;
import limen.model.VariedQuantity;
import limen.model.YesNoTask;
import limen.model.testsupport.TestPaths;
import limen.model.validation.Problem;
import limen.model.validation.ProblemCode;

/** Save and load give back the same model; the examples are in the exact form saving writes. */
class RoundTripTest {

    private static final LimenFactory F = LimenFactory.eINSTANCE;

    @TempDir
    Path dir;

    @Test
    void examplesAreInCanonicalFormAndSurviveASave() throws IOException {
        try (Stream<Path> files = Files.list(TestPaths.examples())) {
            for (Path example : files.filter(Files::isRegularFile).sorted().toList()) {
                LoadResult loaded = LimenFiles.load(example);
                assertTrue(loaded.succeeded(), example + ": " + loaded.problems());
                Path copy = dir.resolve(example.getFileName());
                LimenFiles.save(loaded.document(), copy);
                assertEquals(Files.readString(example), Files.readString(copy), example.toString());
                LoadResult again = LimenFiles.load(copy);
                assertTrue(EcoreUtil.equals(loaded.document(), again.document()), example.toString());
            }
        }
    }

    @Test
    void everyKindOfElementSurvivesSaveAndLoad() throws IOException {
        SessionHeader session = fullSession();
        Path file = dir.resolve("P-FINCH.session");
        LimenFiles.save(session, file);
        String text = Files.readString(file, StandardCharsets.UTF_8);
        assertTrue(text.startsWith("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"), text);
        assertTrue(text.contains("schemaVersion=\"" + LimenFiles.SCHEMA_VERSION + "\""), text);
        assertTrue(text.contains("startTime=\"2025-03-04T09:30:00Z\""), text);
        assertTrue(text.contains("measuredOn=\"2025-02-01\""), text);
        assertTrue(text.contains("Sm\u00f8rrebr\u00f8d booth \u2013 \u00b5-phone"), "UTF-8 text survives: " + text);
        LoadResult loaded = LimenFiles.load(file);
        assertEquals(List.of(), loaded.problems());
        SessionHeader back = assertInstanceOf(SessionHeader.class, loaded.document());
        assertTrue(EcoreUtil.equals(session, back));
        assertEquals(Instant.parse("2025-03-04T10:05:00Z"), back.getEndTime());
        Step second = back.getBattery().getSteps().get(1);
        RelativeLevel level = assertInstanceOf(RelativeLevel.class, second.getStimulus().getStandardLevel());
        assertEquals(back.getBattery().getSteps().get(0), level.getReference(), "reference by id resolves");
        assertEquals(List.of(back.getBattery().getSteps().get(1), back.getBattery().getSteps().get(0)),
                back.getStepOrder());
        assertTrue(back.getBattery().isSetShuffleSeed());
        assertEquals(0, back.getBattery().getShuffleSeed(), "an explicitly set 0 is kept apart from unset");
        assertEquals(1, back.getBattery().getSchemaVersion(), "nested documents are stamped too");
    }

    @Test
    void unknownContentIsKeptThroughASave() throws IOException {
        Path fixture = TestPaths.fixtures().resolve("LM0902-unknown-content-kept.battery");
        LoadResult loaded = LimenFiles.load(fixture);
        assertTrue(loaded.succeeded());
        assertEquals(ProblemCode.UNKNOWN_CONTENT_KEPT, loaded.problems().get(0).code());
        Path copy = dir.resolve("copy.battery");
        LimenFiles.save(loaded.document(), copy);
        String text = Files.readString(copy);
        assertTrue(text.contains("colour=\"teal\""), text);
        assertTrue(text.contains("<lighting level=\"dim\"/>"), text);
        LoadResult again = LimenFiles.load(copy);
        assertEquals(List.of(ProblemCode.UNKNOWN_CONTENT_KEPT), again.problems().stream().map(Problem::code).toList());
    }

    @Test
    void aSnapshotInsideASessionIsNotSavedAlone() {
        SessionHeader session = fullSession();
        assertThrows(IllegalArgumentException.class,
                () -> LimenFiles.save(session.getBattery(), dir.resolve("alone.battery")));
    }

    /** A session header with a battery using most of the model and a calibration. */
    static SessionHeader fullSession() {
        Battery battery = F.createBattery();
        battery.setTitle("Round trip");
        battery.setNotes("all kinds of elements");
        battery.setOrdering(OrderingPolicy.SHUFFLED);
        battery.setShuffleSeed(0);
        Step threshold = step("abs-1000", StimulusKind.DETECTION_QUIET, QuantityUnit.DB_SPL);
        threshold.setFixedPosition(true);
        MaskerNoise masker = F.createMaskerNoise();
        masker.setSpectrum(NoiseSpectrum.PINK);
        masker.setLowCutoffHz(500);
        masker.setHighCutoffHz(2000);
        masker.setContinuous(true);
        masker.setLevel(absolute(45));
        threshold.getStimulus().setMasker(masker);
        SettingsGroup extra = F.createSettingsGroup();
        extra.setContributorId("org.example.lab.envelope");
        Setting depth = F.createSetting();
        depth.setName("depth");
        depth.setValue("0.5");
        depth.setType(SettingType.REAL);
        extra.getEntries().add(depth);
        threshold.getStimulus().getContributions().add(extra);
        Step pitch = step("fd-1000", StimulusKind.FREQUENCY_DISCRIMINATION, QuantityUnit.CENTS);
        RelativeLevel relative = F.createRelativeLevel();
        relative.setReference(threshold);
        relative.setOffsetDb(40);
        pitch.getStimulus().setStandardLevel(relative);
        YesNoTask yesNo = F.createYesNoTask();
        yesNo.setIntervalDurationSeconds(0.25);
        yesNo.setCatchTrialRate(0.2);
        yesNo.setResponseWindowSeconds(2);
        pitch.setTask(yesNo);
        PsiProcedure psi = F.createPsiProcedure();
        psi.setThresholdMinimum(1);
        psi.setThresholdMaximum(100);
        psi.setThresholdCount(40);
        psi.setGuessRate(0.02);
        Track second = F.createTrack();
        second.setName("B");
        second.setProcedure(psi);
        StoppingRule byPrecision = F.createStoppingRule();
        byPrecision.setPosteriorSdTarget(1.5);
        second.setStoppingRule(byPrecision);
        pitch.getTracks().add(second);
        ContributedProcedure contributed = F.createContributedProcedure();
        contributed.setSettings(EcoreUtil.copy(extra));
        Track third = F.createTrack();
        third.setName("C");
        third.setProcedure(contributed);
        third.setStoppingRule(F.createStoppingRule());
        pitch.getTracks().add(third);
        battery.getSteps().add(threshold);
        battery.getSteps().add(pitch);
        limen.model.Break pause = F.createBreak();
        pause.setAfterStepCount(1);
        pause.setMinimumDurationSeconds(20);
        pause.setMessage("Rest");
        battery.getBreaks().add(pause);

        Calibration calibration = F.createCalibration();
        calibration.setName("Sm\u00f8rrebr\u00f8d booth \u2013 \u00b5-phone");
        calibration.setDevice("interface");
        calibration.setTransducer("phone");
        calibration.setReferenceLevelDbfs(-20);
        calibration.setSampleRateHz(48000);
        calibration.setCeilingDbSpl(85);
        calibration.setMeasuredBy("P. Quay");
        calibration.setMeasuredOn(LocalDate.parse("2025-02-01"));
        for (double f : new double[] {250, 1000, 4000}) {
            CalibrationPoint point = F.createCalibrationPoint();
            point.setFrequencyHz(f);
            point.setMeasuredDbSpl(79.5);
            calibration.getPoints().add(point);
        }
        SessionHeader session = F.createSessionHeader();
        session.setParticipant("P-FINCH");
        session.setBattery(battery);
        session.setCalibration(calibration);
        session.setDevice("demo device");
        session.setRandomSeed(-8_000_000_000L);
        session.setSoftwareVersion("0.1.0");
        session.setStartTime(Instant.parse("2025-03-04T09:30:00Z"));
        session.setEndTime(Instant.parse("2025-03-04T10:05:00Z"));
        session.setStatus(SessionStatus.COMPLETED);
        session.setLatinSquareRow(2);
        session.getStepOrder().add(pitch);
        session.getStepOrder().add(threshold);
        ExposureEstimate exposure = F.createExposureEstimate();
        exposure.setPeakLevelDbSpl(71);
        exposure.setEquivalentLevelDbSpl(55.5);
        exposure.setSoundOnSeconds(120);
        session.setExposure(exposure);
        return session;
    }

    private static Step step(String id, StimulusKind kind, QuantityUnit unit) {
        Step step = F.createStep();
        step.setId(id);
        step.setTitle(id);
        ForcedChoiceTask task = F.createForcedChoiceTask();
        task.setIntervalCount(3);
        task.setIntervalDurationSeconds(0.3);
        task.setInterStimulusIntervalSeconds(0.3);
        task.setInterTrialIntervalSeconds(0.5);
        task.setFeedback(true);
        step.setTask(task);
        Stimulus stimulus = F.createStimulus();
        stimulus.setKind(kind);
        stimulus.setStandardFrequencyHz(1000);
        stimulus.setRampDurationSeconds(0.02);
        step.setStimulus(stimulus);
        VariedQuantity quantity = F.createVariedQuantity();
        quantity.setUnit(unit);
        step.setVariedQuantity(quantity);
        TransformedUpDownProcedure upDown = F.createTransformedUpDownProcedure();
        upDown.setStartValue(30);
        upDown.setFloorValue(1);
        upDown.setCeilingValue(40);
        upDown.setStepMode(StepMode.MULTIPLICATIVE);
        upDown.setDownCount(3);
        upDown.setUpCount(1);
        upDown.setInitialStep(2);
        upDown.setMinimumStep(1.1);
        upDown.setShrinkFactor(0.5);
        upDown.setReversalsPerShrink(2);
        upDown.setDiscardedReversals(2);
        upDown.setAveragedReversals(6);
        StoppingRule rule = F.createStoppingRule();
        rule.setMaximumReversals(10);
        rule.setMaximumTrials(60);
        Track track = F.createTrack();
        track.setName("A");
        track.setProcedure(upDown);
        track.setStoppingRule(rule);
        step.getTracks().add(track);
        return step;
    }

    private static AbsoluteLevel absolute(double levelDbSpl) {
        AbsoluteLevel level = F.createAbsoluteLevel();
        level.setLevelDbSpl(levelDbSpl);
        return level;
    }
}
