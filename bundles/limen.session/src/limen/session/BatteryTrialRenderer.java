package limen.session;

import java.util.random.RandomGenerator;

import limen.model.AbsoluteLevel;
import limen.model.ForcedChoiceTask;
import limen.model.MaskerNoise;
import limen.model.Step;
import limen.model.StimulusKind;
import limen.model.Task;
import limen.procedure.TrialPlan;
import limen.signal.Ear;
import limen.signal.NoiseSpectrum;
import limen.signal.Sound;
import limen.signal.Stimulus;
import limen.signal.StimulusRenderer;
import limen.signal.TrialSpec;

/**
 * Renders a battery step's trial at a given value with {@link StimulusRenderer}:
 * <ul>
 * <li>frequency discrimination: standard tone f0, target f0 + Δf with Δf from the value and its unit
 * (Hz: f0 + v; percent: f0 (1 + v/100); cents: f0 · 2^(v/1200)), both at the standard level;</li>
 * <li>intensity discrimination: target at the standard level + v dB;</li>
 * <li>detection in quiet: target tone at v dB SPL, the other intervals silent;</li>
 * <li>detection in noise: as in quiet, over the step's masker for the whole trial.</li>
 * </ul>
 * Yes/no tasks have one interval: the target, or on a catch trial the standard (silence for detection).
 * Every trial starts with a lead-in and ends with {@value #TRAIL_SECONDS} s of silence so the device drains.
 */
public final class BatteryTrialRenderer implements TrialRenderer {

    /** Silence after the last interval, s: lets a sound line drain before the response window. */
    public static final double TRAIL_SECONDS = 0.2;
    /** Lead-in before the first interval, s (holds a masker's onset ramp). */
    public static final double LEAD_SECONDS = 0.1;

    private final StimulusRenderer renderer;

    public BatteryTrialRenderer(limen.signal.Calibration calibration) {
        this.renderer = new StimulusRenderer(calibration);
    }

    @Override
    public Stimulus render(Step step, TrialPlan plan, double standardLevelDbSpl, RandomGenerator rng) {
        return renderer.renderTrial(spec(step, plan, standardLevelDbSpl), rng);
    }

    /** The layout of one trial (separate for tests and previews). */
    public static TrialSpec spec(Step step, TrialPlan plan, double standardLevelDbSpl) {
        limen.model.Stimulus st = step.getStimulus();
        Task task = step.getTask();
        double f0 = st.getStandardFrequencyHz();
        double duration = task.getIntervalDurationSeconds();
        double ramp = st.getRampDurationSeconds();
        double v = plan.value();
        StimulusKind kind = st.getKind();
        Sound standard;
        Sound target;
        switch (kind) {
        case FREQUENCY_DISCRIMINATION -> {
            standard = new Sound.Tone(f0, standardLevelDbSpl, duration, ramp);
            target = new Sound.Tone(comparisonFrequency(step, v), standardLevelDbSpl, duration, ramp);
        }
        case INTENSITY_DISCRIMINATION -> {
            standard = new Sound.Tone(f0, standardLevelDbSpl, duration, ramp);
            target = new Sound.Tone(f0, standardLevelDbSpl + v, duration, ramp);
        }
        case DETECTION_QUIET, DETECTION_NOISE -> {
            standard = new Sound.Silence(duration);
            target = new Sound.Tone(f0, v, duration, ramp);
        }
        default -> throw new IllegalArgumentException("step " + step.getId() + ": stimulus kind " + kind
                + " cannot be rendered");
        }
        TrialSpec.Background background = null;
        double lead = LEAD_SECONDS;
        if (kind == StimulusKind.DETECTION_NOISE) {
            MaskerNoise m = st.getMasker();
            if (m == null) {
                throw new IllegalArgumentException("step " + step.getId() + ": detection in noise needs a masker");
            }
            double maskerLevel = m.getLevel() instanceof AbsoluteLevel a ? a.getLevelDbSpl() : standardLevelDbSpl;
            NoiseSpectrum.Shape shape = m.getSpectrum() == limen.model.NoiseSpectrum.PINK ? NoiseSpectrum.Shape.PINK
                    : NoiseSpectrum.Shape.FLAT;
            double maskerRamp = Math.max(ramp, 0.02);
            lead = Math.max(lead, maskerRamp + 0.1);
            background = new TrialSpec.Background(new NoiseSpectrum(shape, m.getLowCutoffHz(), m.getHighCutoffHz(),
                    Double.NaN, Double.NaN), maskerLevel, maskerRamp);
        }
        Ear ear = switch (st.getEar()) {
        case LEFT -> Ear.LEFT;
        case RIGHT -> Ear.RIGHT;
        default -> Ear.BOTH;
        };
        if (plan.forcedChoice()) {
            double isi = task instanceof ForcedChoiceTask fc ? fc.getInterStimulusIntervalSeconds() : 0.3;
            return new TrialSpec(plan.intervals(), plan.targetInterval(), standard, target, lead, isi, TRAIL_SECONDS, ear,
                    background);
        }
        Sound only = plan.catchTrial() ? standard : target;
        return new TrialSpec(1, 0, only, only, lead, 0, TRAIL_SECONDS, ear, background);
    }

    /** The comparison frequency of a frequency-discrimination step at value {@code v}. */
    public static double comparisonFrequency(Step step, double v) {
        double f0 = step.getStimulus().getStandardFrequencyHz();
        return switch (step.getVariedQuantity().getUnit()) {
        case HZ -> f0 + v;
        case PERCENT -> f0 * (1 + v / 100.0);
        case CENTS -> f0 * Math.pow(2, v / 1200.0);
        default -> throw new IllegalArgumentException("step " + step.getId() + ": frequency discrimination varies Hz, "
                + "percent or cents, not " + step.getVariedQuantity().getUnit());
        };
    }
}
