package limen.audio;

import java.util.Objects;

import limen.audio.internal.Realtime;
import limen.signal.CheckedStimulus;

/**
 * Outputs nothing: for dry runs with a model listener. In realtime mode {@link #play} takes as long as the
 * trial would sound ({@code length / fs}, measured on {@link System#nanoTime()} from the call), so that a dry
 * run has the timing of a real one; otherwise it returns at once.
 */
public final class NoOutput implements TrialOutput {

    private final boolean realtime;
    private volatile boolean closed;

    /** @param realtime whether {@code play} waits as long as the sound lasts */
    public NoOutput(boolean realtime) {
        this.realtime = realtime;
    }

    public boolean realtime() {
        return realtime;
    }

    /**
     * Waits (realtime mode) or returns. An interrupt, or {@link #close} from another thread, ends the wait
     * early (the interrupt flag stays set).
     */
    @Override
    public void play(CheckedStimulus trial) {
        Objects.requireNonNull(trial, "trial");
        long start = System.nanoTime();
        if (closed) {
            throw new IllegalStateException("output 'none' is closed");
        }
        if (realtime) {
            long deadline = start + Realtime.durationNanos(trial.length(), trial.sampleRateHz());
            // wake every 50 ms at most so that close() from another thread ends the wait promptly
            while (!closed && System.nanoTime() < deadline) {
                if (!Realtime.sleepUntil(Math.min(deadline, System.nanoTime() + 50_000_000L))) {
                    return;
                }
            }
        }
    }

    @Override
    public String describe() {
        return realtime ? "none (realtime: waits as long as each trial sounds)" : "none";
    }

    @Override
    public void close() {
        closed = true;
    }
}
