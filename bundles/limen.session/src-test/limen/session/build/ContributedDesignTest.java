package limen.session.build;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

import limen.core.extension.Settings;
import limen.model.Battery;
import limen.model.Calibration;
import limen.model.CalibrationPoint;
import limen.model.ContributedProcedure;
import limen.model.ForcedChoiceTask;
import limen.model.LimenFactory;
import limen.model.QuantityUnit;
import limen.model.Setting;
import limen.model.SettingType;
import limen.model.SettingsGroup;
import limen.model.Step;
import limen.model.StimulusKind;
import limen.model.StoppingRule;
import limen.model.Track;
import limen.model.VariedQuantity;
import limen.procedure.TrialPlan;
import limen.session.BatteryTrialRenderer;
import limen.session.CalibrationMapping;
import limen.signal.Component;
import limen.signal.LevelRefusedException;
import limen.signal.SafetyGuard;
import limen.signal.Sound;
import limen.signal.StimulusDesign;

/**
 * A stimulus design contributed from outside Limen's bundles (this test's {@link TwoToneDesign}, named in
 * {@code src-test/META-INF/services/limen.signal.StimulusDesign}) renders through the session's renderer, and
 * what it asks for passes the same safety guard: a level above the ceiling is refused.
 */
class ContributedDesignTest {

    /** A lab design: the target is the standard tone plus a second tone {@code gapHz} above it, same level. */
    public static final class TwoToneDesign implements StimulusDesign {
        @Override
        public String id() {
            return "test.two-tone";
        }

        @Override
        public String title() {
            return "Two tones";
        }

        @Override
        public IntervalSounds design(Settings s, Presentation p) {
            double f0 = s.real("standardFrequencyHz");
            double ramp = s.real("rampDurationSeconds");
            double d = p.intervalSeconds();
            Sound standard = new Sound.Silence(d);
            Sound target = new Sound.Mixture(java.util.List.of(new Sound.Tone(f0, p.value(), d, ramp),
                    new Sound.Tone(f0 + s.real("gapHz"), p.value(), d, ramp)));
            return new IntervalSounds(standard, target, null, 0);
        }

        @Override
        public void checkSettings(Settings s) {
            if (!(s.real("gapHz") > 0)) {
                throw new IllegalArgumentException("setting 'gapHz' must be > 0, was " + s.real("gapHz"));
            }
        }
    }

    private static final LimenFactory F = LimenFactory.eINSTANCE;

    private static Step step(double gapHz) {
        Step step = F.createStep();
        step.setId("two-tone");
        step.setTitle("Two tones");
        ForcedChoiceTask task = F.createForcedChoiceTask();
        task.setIntervalCount(2);
        task.setIntervalDurationSeconds(0.3);
        task.setInterStimulusIntervalSeconds(0.4);
        step.setTask(task);
        limen.model.Stimulus st = F.createStimulus();
        st.setKind(StimulusKind.DETECTION_QUIET);
        st.setStandardFrequencyHz(1000);
        st.setRampDurationSeconds(0.02);
        SettingsGroup g = F.createSettingsGroup();
        g.setContributorId("test.two-tone");
        Setting gap = F.createSetting();
        gap.setName("gapHz");
        gap.setType(SettingType.REAL);
        gap.setValue(Double.toString(gapHz));
        g.getEntries().add(gap);
        st.getContributions().add(g);
        step.setStimulus(st);
        VariedQuantity q = F.createVariedQuantity();
        q.setUnit(QuantityUnit.DB_SPL);
        step.setVariedQuantity(q);
        Track t = F.createTrack();
        t.setName("A");
        ContributedProcedure p = F.createContributedProcedure();
        SettingsGroup ps = F.createSettingsGroup();
        ps.setContributorId("limen.transformed-up-down");
        p.setSettings(ps);
        t.setProcedure(p);
        StoppingRule r = F.createStoppingRule();
        r.setMaximumTrials(10);
        t.setStoppingRule(r);
        step.getTracks().add(t);
        return step;
    }

    private static limen.signal.Calibration calibration() {
        Calibration c = F.createCalibration();
        c.setName("flat");
        c.setDevice("test");
        c.setTransducer("test");
        c.setReferenceLevelDbfs(-20);
        c.setSampleRateHz(48000);
        c.setCeilingDbSpl(85);
        for (double f : new double[] {125, 1000, 8000}) {
            CalibrationPoint pt = F.createCalibrationPoint();
            pt.setFrequencyHz(f);
            pt.setMeasuredDbSpl(80);
            c.getPoints().add(pt);
        }
        return CalibrationMapping.toSignal(c);
    }

    @Test
    void theContributedDesignRendersAndItsLoudTrialsAreRefusedByTheGuard() {
        Step step = step(500);
        Battery b = F.createBattery();
        b.getSteps().add(step);
        BatteryTrialRenderer renderer = new BatteryTrialRenderer(calibration());
        limen.signal.Stimulus st = renderer.render(step, new TrialPlan(50, 2, 1, false), Double.NaN, new SplittableRandom(1));
        assertEquals(java.util.Set.of(1000.0, 1500.0),
                st.components().stream().map(Component::lowHz).collect(java.util.stream.Collectors.toSet()));
        SafetyGuard guard = new SafetyGuard(calibration());
        guard.check(st); // 50 dB SPL per tone: allowed
        limen.signal.Stimulus loud = renderer.render(step, new TrialPlan(84, 2, 1, false), Double.NaN, new SplittableRandom(1));
        // two tones of 84 dB SPL each sum to 87 dB SPL (10 log10 2 = 3.01 dB), above the 85 dB SPL ceiling
        LevelRefusedException e = assertThrows(LevelRefusedException.class, () -> guard.check(loud));
        assertTrue(e.getMessage().contains("85"), e.getMessage());
    }

    @Test
    void theValidatorAsksTheDesignAndTheProcedure() {
        InstalledContributions check = new InstalledContributions();
        Step ok = step(500);
        assertEquals(null, check.check(ok.getStimulus().getContributions().get(0)));
        Step bad = step(-5);
        assertEquals("stimulus design 'test.two-tone' refuses its settings: setting 'gapHz' must be > 0, was -5.0",
                check.check(bad.getStimulus().getContributions().get(0)).message());
        // the procedure names the built-in staircase through the generic element, without its settings
        var finding = check.check(((ContributedProcedure) ok.getTracks().get(0).getProcedure()).getSettings());
        assertTrue(finding.installed() && finding.message().startsWith("procedure 'limen.transformed-up-down' refuses its "
                + "settings: setting '"), finding.message());
    }
}
