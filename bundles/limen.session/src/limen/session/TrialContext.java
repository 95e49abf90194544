package limen.session;

import limen.model.Step;
import limen.procedure.Task;
import limen.procedure.TrialPlan;
import limen.signal.CheckedStimulus;

/**
 * One trial as the responder sees it.
 *
 * @param seq        1-based trial number in the session
 * @param stepIndex  1-based position of the step in this participant's order
 * @param stepCount  number of steps in the session
 * @param step       the battery step (snapshot in the session header)
 * @param trackName  the track that gave this trial
 * @param task       the task (nAFC or yes/no)
 * @param plan       value, intervals, target interval, catch flag
 * @param stimulus   the checked sound, with its interval marks (sample indices) for interval indicators
 * @param trialInStep 1-based trial number within the step
 */
public record TrialContext(long seq, int stepIndex, int stepCount, Step step, String trackName, Task task,
        TrialPlan plan, CheckedStimulus stimulus, int trialInStep) {
}
