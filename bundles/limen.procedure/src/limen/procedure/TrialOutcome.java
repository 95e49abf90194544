package limen.procedure;

/**
 * One answered trial of a track.
 *
 * @param plan    what was presented
 * @param answer  the answer
 * @param correct whether it was correct (on a catch trial: a correct rejection)
 */
public record TrialOutcome(TrialPlan plan, Answer answer, boolean correct) {

    /** @return true for a yes answer on a catch trial */
    public boolean falseAlarm() {
        return plan.catchTrial() && answer.yes();
    }
}
