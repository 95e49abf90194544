package limen.procedure.sim;

/**
 * The result of one track in one simulated run.
 *
 * @param run         0-based run index
 * @param step        the step's name
 * @param track       the track's name
 * @param estimate    the procedure's final estimate (NaN when it had none)
 * @param uncertainty the estimate's uncertainty (see the procedure)
 * @param trials      trials the procedure recorded (catch trials excluded)
 * @param reversals   reversals of the track
 * @param catchTrials catch trials presented
 * @param falseAlarms yes answers on catch trials
 * @param capped      true when the run hit the trial cap before the procedure finished
 */
public record RunRow(int run, String step, String track, double estimate, double uncertainty, int trials, int reversals,
        int catchTrials, int falseAlarms, boolean capped) {
}
