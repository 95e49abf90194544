package limen.session;

/**
 * Pause, resume and abort for a running session, safe to call from any thread (the operator console). A
 * pause takes effect between trials: the trial in progress is completed and recorded first.
 */
public final class SessionControl {

    private boolean paused;
    private boolean aborted;
    private String reason = "";

    public synchronized void pause(String why) {
        paused = true;
        reason = why;
        notifyAll();
    }

    public synchronized void resume() {
        paused = false;
        notifyAll();
    }

    public synchronized void abort(String why) {
        aborted = true;
        reason = why;
        notifyAll();
    }

    public synchronized boolean aborted() {
        return aborted;
    }

    public synchronized boolean paused() {
        return paused;
    }

    public synchronized String reason() {
        return reason;
    }

    /** Blocks while paused; returns false if the session was aborted. */
    synchronized boolean awaitRunnable() throws InterruptedException {
        while (paused && !aborted) {
            wait();
        }
        return !aborted;
    }
}
