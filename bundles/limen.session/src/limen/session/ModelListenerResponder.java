package limen.session;

import java.util.HashMap;
import java.util.Map;
import java.util.SplittableRandom;

import limen.model.Step;
import limen.session.build.DefaultListeners;
import limen.session.build.ProcedureBuilder;
import limen.procedure.ModelListener;

/**
 * Answers trials with a model listener, for dry runs, tests and design checks. The listener of a step is
 * the spec given for its id, else the spec given for all steps, else the same default as design simulation
 * ({@link DefaultListeners}). Response times are not simulated: they are recorded as missing.
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

    /** The spec used for a track: its step's own, else the one for all steps, else the design default. */
    public String specFor(Step step, String trackName) {
        String s = perStep.get(step.getId());
        if (s != null) {
            return s;
        }
        if (allSteps != null) {
            return allSteps;
        }
        for (limen.model.Track t : step.getTracks()) {
            if (t.getName().equals(trackName)) {
                return DefaultListeners.specFor(step, t, ProcedureBuilder.chanceRate(step.getTask()));
            }
        }
        throw new IllegalArgumentException("step " + step.getId() + " has no track " + trackName);
    }

    @Override
    public Response respond(TrialContext trial) {
        String key = trial.step().getId() + "\u0000" + trial.trackName();
        ModelListener.Run run = runs.computeIfAbsent(key, k -> ModelListener
                .forTask(specFor(trial.step(), trial.trackName()), trial.task(), DEFAULT_FALSE_ALARM_RATE).start(rng.split()));
        return new Response(run.answer(trial.plan()), Double.NaN);
    }
}
