package limen.audio;

import limen.signal.CheckedStimulus;

/**
 * Where the session runner sends each rendered trial: a sound device, a folder of WAV files, or nowhere.
 * Only a {@link CheckedStimulus} (a buffer that passed limen.signal's single safety guard) can be played.
 * <p>
 * Contract: {@link #play} is called from one thread at a time; {@link #close} may be called from any thread,
 * also while {@code play} blocks, and then makes {@code play} return early without an exception (an abort, not
 * a device loss). After {@code close}, {@code play} throws {@link IllegalStateException}.
 */
public interface TrialOutput extends AutoCloseable {

    /**
     * Outputs one trial. A realtime output blocks until the whole buffer has been played (or, for the file and
     * silent outputs in realtime mode, until as long as the sound lasts has passed); a non-realtime output
     * returns as soon as its work is done.
     *
     * @throws DeviceLostException if the output stopped working (sound server gone, disk full): the trial was
     *         not fully output; the output cannot be used again, but nothing already done is affected
     * @throws IllegalStateException if the output was closed
     */
    void play(CheckedStimulus trial) throws DeviceLostException;

    /** One line for session headers and logs, e.g. the device name, format and buffer size. */
    String describe();

    /** Releases the device or file handles; idempotent. */
    @Override
    void close();
}
