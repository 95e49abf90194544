package limen.session;

import limen.procedure.Answer;

/**
 * Who answers trials: the booth's participant screen, or a model listener in dry runs and simulations.
 * Called on the runner's thread after the trial's sound has been handed to the output.
 */
public interface Responder {

    /**
     * Waits for the answer to one trial.
     *
     * @return the answer and its response time, or null if the session was stopped while waiting
     * @throws InterruptedException when the runner's thread is interrupted
     */
    Response respond(TrialContext trial) throws InterruptedException;

    /**
     * The trial's sound is about to go to the output (called on the runner's thread just before {@code play}, then
     * {@link #respond} follows): a responder that takes answers while the sound plays learns the trial, and its
     * step's rules such as {@link limen.model.Task#getEarlyResponses()}, here. Nothing by default.
     */
    default void trialStarting(TrialContext trial) {
    }

    /** Shows feedback after a trial when the step asks for it (nothing by default). */
    default void feedback(TrialContext trial, boolean correct) {
    }

    /** A break between steps: returns when the participant is ready to go on. */
    default void pauseForBreak(String message, double minimumSeconds) throws InterruptedException {
    }

    /** The session ended (completed, aborted or paused on device loss). */
    default void finished(SessionStatusInfo status) {
    }

    /**
     * An answer with its response time in milliseconds, measured from the end of the last interval
     * (negative when the answer came early).
     */
    record Response(Answer answer, double responseMs) {
    }
}
