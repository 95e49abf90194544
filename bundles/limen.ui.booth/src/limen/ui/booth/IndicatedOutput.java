package limen.ui.booth;

import java.util.Objects;
import java.util.function.BiConsumer;

import limen.audio.DeviceLostException;
import limen.audio.TrialOutput;
import limen.signal.CheckedStimulus;

/**
 * A trial output that tells the participant screen the moment {@code play} starts, so the interval
 * indicators are lit from the same rendered buffer's interval marks as the sound (the output itself is
 * unchanged: the runner's guard-checked buffer goes straight to it).
 */
public final class IndicatedOutput implements TrialOutput {

    private final TrialOutput delegate;
    private final BiConsumer<CheckedStimulus, Long> started;

    /**
     * @param started called on the runner's thread with the trial and {@link System#nanoTime()} just before
     *                the buffer is handed to the delegate
     */
    public IndicatedOutput(TrialOutput delegate, BiConsumer<CheckedStimulus, Long> started) {
        this.delegate = Objects.requireNonNull(delegate, "delegate");
        this.started = Objects.requireNonNull(started, "started");
    }

    @Override
    public void play(CheckedStimulus trial) throws DeviceLostException {
        started.accept(trial, System.nanoTime());
        delegate.play(trial);
    }

    @Override
    public String describe() {
        return delegate.describe();
    }

    @Override
    public void close() {
        delegate.close();
    }
}
