package limen.session;

import java.util.random.RandomGenerator;

import limen.core.extension.Extensions;
import limen.model.ForcedChoiceTask;
import limen.model.Step;
import limen.model.StimulusKind;
import limen.model.Task;
import limen.procedure.TrialPlan;
import limen.session.build.ModelSettings;
import limen.signal.Ear;
import limen.signal.Sound;
import limen.signal.Stimulus;
import limen.signal.StimulusDesign;
import limen.signal.StimulusRenderer;
import limen.signal.TrialSpec;
import limen.signal.designs.FrequencyDiscriminationDesign;

/**
 * Renders a battery step's trial at a given value with {@link StimulusRenderer}. The sounds come from the
 * step's {@link StimulusDesign}, the one extension point for stimulus kinds; the built-in designs
 * ({@code limen.signal.designs}) are:
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

    /**
     * The layout of one trial (separate for tests and previews): the step's stimulus design (found among the
     * installed ones, see {@link ModelSettings#stimulusId}) gives the standard and target sounds; this method
     * lays them out as nAFC intervals or a single yes/no interval, in the step's ear.
     *
     * @throws IllegalArgumentException naming the step when its design is not installed or cannot render
     */
    public static TrialSpec spec(Step step, TrialPlan plan, double standardLevelDbSpl) {
        limen.model.Stimulus st = step.getStimulus();
        Task task = step.getTask();
        if (st.getContributions().isEmpty() && st.getKind() == StimulusKind.DETECTION_NOISE && st.getMasker() == null) {
            throw new IllegalArgumentException("step " + step.getId() + ": detection in noise needs a masker");
        }
        StimulusDesign.IntervalSounds sounds;
        try {
            StimulusDesign design = installedDesign(ModelSettings.stimulusId(step));
            sounds = design.design(ModelSettings.stimulusSettings(step),
                    new StimulusDesign.Presentation(plan.value(), standardLevelDbSpl, task.getIntervalDurationSeconds()));
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("step " + step.getId() + ": " + e.getMessage(), e);
        }
        Sound standard = sounds.standard();
        Sound target = sounds.target();
        double lead = Math.max(LEAD_SECONDS, sounds.leadSeconds());
        Ear ear = switch (st.getEar()) {
        case LEFT -> Ear.LEFT;
        case RIGHT -> Ear.RIGHT;
        default -> Ear.BOTH;
        };
        if (plan.forcedChoice()) {
            double isi = task instanceof ForcedChoiceTask fc ? fc.getInterStimulusIntervalSeconds() : 0.3;
            return new TrialSpec(plan.intervals(), plan.targetInterval(), standard, target, lead, isi, TRAIL_SECONDS, ear,
                    sounds.background());
        }
        Sound only = plan.catchTrial() ? standard : target;
        return new TrialSpec(1, 0, only, only, lead, 0, TRAIL_SECONDS, ear, sounds.background());
    }

    /**
     * @param id a stimulus design's identifier
     * @return the installed design
     * @throws IllegalArgumentException naming the identifier and the installed designs when none has it
     */
    public static StimulusDesign installedDesign(String id) {
        return Extensions.find(StimulusDesign.class, id, StimulusDesign::id).orElseThrow(() -> new IllegalArgumentException(
                "stimulus design '" + id + "' is not installed (installed designs: " + Extensions.ids(StimulusDesign.class,
                        StimulusDesign::id) + "); add the extension that provides it"));
    }

    /** The comparison frequency of a frequency-discrimination step at value {@code v}. */
    public static double comparisonFrequency(Step step, double v) {
        try {
            return FrequencyDiscriminationDesign.comparisonFrequency(step.getStimulus().getStandardFrequencyHz(),
                    step.getVariedQuantity().getUnit().getName(), v);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("step " + step.getId() + ": " + e.getMessage(), e);
        }
    }
}
