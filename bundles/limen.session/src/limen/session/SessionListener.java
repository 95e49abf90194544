package limen.session;

import limen.procedure.TrialOutcome;
import limen.session.journal.JournalRow;

/** Observes a running session (the operator console's live view, progress on the command line). */
public interface SessionListener {

    default void stepStarted(int stepIndex, int stepCount, limen.model.Step step) {
    }

    /** After a trial is on disk. */
    default void trialRecorded(JournalRow row, TrialOutcome outcome, TrackState track) {
    }

    default void stepFinished(int stepIndex, limen.model.Step step, double estimate) {
    }

    /** The output failed; the session is paused (status INTERRUPTED) and can be resumed later. */
    default void deviceLost(String message) {
    }

    /**
     * A track's progress.
     *
     * @param name      track name
     * @param trials    trials so far
     * @param reversals reversals so far
     * @param estimate  current estimate (NaN when none yet)
     * @param finished  whether the track has stopped
     */
    record TrackState(String name, int trials, int reversals, double estimate, boolean finished) {
    }
}
