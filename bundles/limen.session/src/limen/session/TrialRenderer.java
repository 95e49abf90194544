package limen.session;

import java.util.random.RandomGenerator;

import limen.model.Step;
import limen.procedure.TrialPlan;
import limen.signal.Stimulus;

/**
 * Turns one planned trial of a step into sound (not yet checked: the runner passes every result through the
 * calibration's {@link limen.signal.SafetyGuard} before anything can play it).
 */
public interface TrialRenderer {

    /**
     * @param step               the step (its stimulus kind, frequency, timing, ear, masker)
     * @param plan               the value, the intervals and the target interval (or catch trial)
     * @param standardLevelDbSpl the standard's level with any reference to an earlier result resolved
     * @param rng                randomness for noise (a fresh generator per trial, derived from the session seed)
     */
    Stimulus render(Step step, TrialPlan plan, double standardLevelDbSpl, RandomGenerator rng);
}
