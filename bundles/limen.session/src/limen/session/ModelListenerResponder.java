package limen.session;

import java.util.HashMap;
import java.util.Map;
import java.util.SplittableRandom;

import limen.model.Step;
import limen.model.StimulusKind;
import limen.procedure.ModelListener;

/**
 * Answers trials with a model listener, for dry runs, tests and design checks. The listener of a step is
 * the spec given for its id, else the spec given for all steps, else a default by stimulus kind (see
 * {@link #defaultSpec}). Response times are not simulated: they are recorded as missing.
 */
public final class ModelListenerResponder implements Responder {

    /** False-alarm rate of the default yes/no listener (common practice for attentive listeners). */
    public static final double DEFAULT_FALSE_ALARM_RATE = 0.05;

    private final String allSteps;
    private final Map<String, String> perStep;
    private final SplittableRandom rng;
    private final Map<String, ModelListener.Run> runs = new HashMap<>();

    /**
     * @param allSteps spec for every step without its own, or null for the defaults
     * @param perStep  specs by step id
     * @param seed     the listener's own randomness (kept apart from the session's)
     */
    public ModelListenerResponder(String allSteps, Map<String, String> perStep, long seed) {
        this.allSteps = allSteps;
        this.perStep = Map.copyOf(perStep);
        this.rng = new SplittableRandom(seed);
    }

    /** The spec used for a step. */
    public String specFor(Step step) {
        String s = perStep.get(step.getId());
        if (s != null) {
            return s;
        }
        return allSteps != null ? allSteps : defaultSpec(step);
    }

    /**
     * A plausible listener by stimulus kind and unit, for demos only (not data): frequency difference limen
     * near 0.3% of the standard (common practice: relative limens of 0.2-0.5% at mid frequencies), intensity
     * limen near 1 dB (common practice), thresholds in quiet near 10 dB SPL (common practice for young
     * normal-hearing listeners at mid frequencies), and in noise 5 dB under the masker's spectrum-wide level.
     */
    public static String defaultSpec(Step step) {
        StimulusKind kind = step.getStimulus().getKind();
        double f0 = step.getStimulus().getStandardFrequencyHz();
        return switch (kind) {
        case FREQUENCY_DISCRIMINATION -> switch (step.getVariedQuantity().getUnit()) {
            case HZ -> "logistic:mid=" + round(0.003 * f0) + ",scale=" + round(0.0008 * f0) + ",lapse=0.02";
            case CENTS -> "logistic:mid=5.2,scale=1.4,lapse=0.02";
            default -> "logistic:mid=0.3,scale=0.08,lapse=0.02";
        };
        case INTENSITY_DISCRIMINATION -> "logistic:mid=1.0,scale=0.3,lapse=0.02";
        case DETECTION_QUIET -> "logistic:mid=10,scale=1.5,lapse=0.02";
        case DETECTION_NOISE -> {
            limen.model.MaskerNoise m = step.getStimulus().getMasker();
            double masker = m != null && m.getLevel() instanceof limen.model.AbsoluteLevel a ? a.getLevelDbSpl() : 50;
            yield "logistic:mid=" + round(masker - 5) + ",scale=1.5,lapse=0.02";
        }
        };
    }

    private static double round(double v) {
        return Math.round(v * 1000) / 1000.0;
    }

    @Override
    public Response respond(TrialContext trial) {
        String key = trial.step().getId() + "\u0000" + trial.trackName();
        ModelListener.Run run = runs.computeIfAbsent(key, k -> ModelListener
                .forTask(specFor(trial.step()), trial.task(), DEFAULT_FALSE_ALARM_RATE).start(rng.split()));
        return new Response(run.answer(trial.plan()), Double.NaN);
    }
}
