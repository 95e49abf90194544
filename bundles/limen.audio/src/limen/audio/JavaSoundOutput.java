package limen.audio;

import java.util.Arrays;
import java.util.Locale;
import java.util.Objects;
import java.util.random.RandomGenerator;

import javax.sound.sampled.AudioFormat;
import javax.sound.sampled.SourceDataLine;

import limen.audio.internal.Realtime;
import limen.signal.CheckedStimulus;
import limen.signal.OutputFormat;

/**
 * Plays trials on a Java Sound {@link SourceDataLine}: 16-bit signed little-endian stereo at the trial's
 * sample rate, TPDF-dithered by {@link CheckedStimulus#toPcm}.
 * <p>
 * Why it is built this way (measured on a loaded 2-core machine with a PulseAudio null sink): an underrun
 * inserts silence and stretches the sound, yet {@code write()} returns full length and the frame position
 * looks normal, so nothing in Java Sound reports it. Line buffers of 10 ms dropped out in about half the
 * tones, 100 ms in 1 of 60, 200 ms and more in none. Hence: a line buffer of at least
 * {@value #MIN_BUFFER_MILLIS} ms (default {@value #DEFAULT_BUFFER_MILLIS} ms); each trial written as one
 * buffer in one {@code write()} call; that buffer padded with trailing silence as long as the line buffer, so
 * that when {@code drain()} returns the trial itself has left the line (a sound server may keep the last
 * partial period otherwise); and a loopback self-test ({@link LoopbackSelfTest}) that records what was played.
 * <p>
 * Device loss: when the sound server dies, {@code write()} returns early (0 bytes, at once) without an
 * exception. A write that returns less than asked on a line this output did not close is therefore reported
 * as {@link DeviceLostException}. When the server dies during {@code drain()}, the drain returns at once with
 * a complete-looking frame position; a drain that returns before the trial could have been played is
 * therefore followed by a short write of silence, and a short write there is a loss too. After a loss every
 * {@code play} throws it again.
 */
public final class JavaSoundOutput implements TrialOutput {

    /** The smallest line buffer accepted, ms. */
    public static final int MIN_BUFFER_MILLIS = 100;
    /** The default line buffer, ms. */
    public static final int DEFAULT_BUFFER_MILLIS = 200;

    private static final int BITS = 16;
    private static final int FRAME_BYTES = OutputFormat.CHANNELS * BITS / 8;
    /** Silence written to test a line whose drain returned too early: 64 frames (1.3 ms at 48 kHz). */
    private static final int PROBE_FRAMES = 64;

    private final AudioDevice device;
    private final SourceDataLine line;
    private final int sampleRateHz;
    private final int bufferFrames;
    private final RandomGenerator ditherRng;
    private final Object playLock = new Object();
    private volatile boolean closed;
    private volatile String lostMessage;
    private volatile long lastWriteNanos;

    private JavaSoundOutput(AudioDevice device, SourceDataLine line, int sampleRateHz, RandomGenerator ditherRng) {
        this.device = device;
        this.line = line;
        this.sampleRateHz = sampleRateHz;
        this.bufferFrames = line.getBufferSize() / FRAME_BYTES;
        this.ditherRng = ditherRng;
    }

    /**
     * Opens a line on a device.
     *
     * @param devices where to look ({@link Devices#system()} normally)
     * @param deviceName a device name for {@link Devices#chooseOutput}, or {@code null} for the default
     * @param sampleRateHz the rate of every trial to come (the calibration's: 44100, 48000 or 96000)
     * @param bufferMillis requested line buffer, {@code >= } {@value #MIN_BUFFER_MILLIS} ms (the device may
     *        grant another size; {@link #bufferFrames()} tells)
     * @param ditherRng randomness for the 16-bit TPDF dither (seeded by the caller)
     * @throws NoDeviceException if there is no output device (message {@value Devices#NO_OUTPUT_MESSAGE}), the
     *         name matches none, or the line cannot be opened
     * @throws IllegalArgumentException for an unsupported rate or a buffer under {@value #MIN_BUFFER_MILLIS} ms
     */
    public static JavaSoundOutput open(Devices devices, String deviceName, int sampleRateHz, int bufferMillis,
            RandomGenerator ditherRng) throws NoDeviceException {
        Objects.requireNonNull(devices, "devices");
        Objects.requireNonNull(ditherRng, "ditherRng");
        OutputFormat.requireSupportedRate(sampleRateHz);
        if (bufferMillis < MIN_BUFFER_MILLIS || bufferMillis > 10_000) {
            throw new IllegalArgumentException("line buffer must be " + MIN_BUFFER_MILLIS + " to 10000 ms (shorter "
                    + "buffers drop out unnoticed under load): " + bufferMillis + " ms");
        }
        AudioDevice device = devices.chooseOutput(deviceName);
        AudioFormat format = format(sampleRateHz);
        int bytes = (int) ((long) sampleRateHz * bufferMillis / 1000) * FRAME_BYTES;
        SourceDataLine line = devices.openOutputLine(device, format, bytes);
        return new JavaSoundOutput(device, line, sampleRateHz, ditherRng);
    }

    /** The line format: signed 16-bit little-endian stereo PCM at {@code sampleRateHz}. */
    public static AudioFormat format(int sampleRateHz) {
        return new AudioFormat(AudioFormat.Encoding.PCM_SIGNED, sampleRateHz, BITS, OutputFormat.CHANNELS,
                FRAME_BYTES, sampleRateHz, false);
    }

    public AudioDevice device() {
        return device;
    }

    public int sampleRateHz() {
        return sampleRateHz;
    }

    /** The line buffer the device granted, frames. */
    public int bufferFrames() {
        return bufferFrames;
    }

    /** The trailing silence added to every trial, frames (as long as the line buffer). */
    public int paddingFrames() {
        return bufferFrames;
    }

    /** {@link System#nanoTime()} just before the last trial's {@code write()} (0 before the first). */
    public long lastWriteNanos() {
        return lastWriteNanos;
    }

    /**
     * Writes the trial and its trailing silence as one buffer, then drains the line; returns when the trial has
     * been played. {@link #close} from another thread ends it early without an exception.
     *
     * @throws DeviceLostException on a short write (the sound server or device went away)
     * @throws IllegalArgumentException if the trial's rate is not the line's
     * @throws IllegalStateException if this output was closed
     */
    @Override
    public void play(CheckedStimulus trial) throws DeviceLostException {
        Objects.requireNonNull(trial, "trial");
        if (trial.sampleRateHz() != sampleRateHz) {
            throw new IllegalArgumentException("trial at " + trial.sampleRateHz() + " Hz but the line on '"
                    + device.name() + "' was opened at " + sampleRateHz + " Hz");
        }
        synchronized (playLock) {
            if (closed) {
                throw new IllegalStateException("audio output on '" + device.name() + "' is closed");
            }
            if (lostMessage != null) {
                throw new DeviceLostException(lostMessage);
            }
            byte[] pcm = trial.toPcm(BITS, ditherRng);
            byte[] buffer = Arrays.copyOf(pcm, pcm.length + paddingFrames() * FRAME_BYTES); // zeros = silence
            line.start();
            long start = System.nanoTime();
            lastWriteNanos = start;
            int written = line.write(buffer, 0, buffer.length);
            if (written < buffer.length) {
                if (closed) {
                    return; // aborted by close(), not a loss
                }
                throw lost("the line took " + written + " of " + buffer.length + " bytes ("
                        + seconds(written / FRAME_BYTES) + " of " + seconds(buffer.length / FRAME_BYTES) + " s)");
            }
            line.drain();
            long soundEnd = start + Realtime.durationNanos(trial.length(), sampleRateHz);
            if (!closed && System.nanoTime() < soundEnd) {
                // drain() returned before the trial could have been heard: this happens when the sound server
                // dies during the drain (measured: it then returns at once and the frame position looks complete);
                // a write of a little silence tells a dead line (0 bytes taken) from an early but healthy drain
                byte[] probe = new byte[PROBE_FRAMES * FRAME_BYTES];
                int taken = line.write(probe, 0, probe.length);
                if (taken < probe.length && !closed) {
                    throw lost("drain() returned " + String.format(Locale.ROOT, "%.0f", (soundEnd - System.nanoTime())
                            / 1e6) + " ms before the trial's end and the line then took " + taken + " of "
                            + probe.length + " bytes");
                }
                Realtime.sleepUntil(soundEnd);
                line.drain();
            }
        }
    }

    private DeviceLostException lost(String what) {
        lostMessage = "audio device lost on '" + device.name() + "': " + what + " without error, which happens when "
                + "the sound server or device has gone away; the trial was not fully played";
        return new DeviceLostException(lostMessage);
    }

    private String seconds(int frames) {
        return String.format(Locale.ROOT, "%.3f", frames / (double) sampleRateHz);
    }

    @Override
    public String describe() {
        return "javax.sound: " + device + ", " + sampleRateHz + " Hz 16-bit stereo, line buffer "
                + String.format(Locale.ROOT, "%.0f", bufferFrames * 1000.0 / sampleRateHz) + " ms";
    }

    /** Stops and closes the line; a {@code play} blocked in another thread returns early. Idempotent. */
    @Override
    public void close() {
        if (closed) {
            return;
        }
        closed = true;
        line.stop();
        line.flush();
        line.close();
    }
}
