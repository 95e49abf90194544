package limen.audio;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.random.RandomGenerator;

import javax.sound.sampled.TargetDataLine;

import limen.audio.internal.Pcm;
import limen.audio.internal.Realtime;
import limen.audio.internal.Recorder;
import limen.signal.Calibration;
import limen.signal.CheckedStimulus;
import limen.signal.Ear;
import limen.signal.Levels;
import limen.signal.Onsets;
import limen.signal.SafetyGuard;
import limen.signal.Sound;
import limen.signal.Spectrum;
import limen.signal.StimulusRenderer;

/**
 * Plays a test tone through {@link JavaSoundOutput} while recording from a capture device, then compares
 * what came back with what was rendered: dominant frequency, level and length of the tone, and dropouts.
 * Underruns are invisible to Java Sound (they insert silence while {@code write()} reports success), so only
 * a recording shows them. On the PulseAudio null sink the default capture device is the sink's monitor, a
 * digital loopback; with a cable from a sound card's output to its input it checks the analogue path too.
 * <p>
 * The tone is rendered by limen.signal's {@link StimulusRenderer} through a nominal flat calibration
 * ({@value #CALIBRATION_LABEL}) whose ceiling of 90 dB SPL allows peaks up to -10 dBFS, and passes the
 * {@link SafetyGuard} like every other sound; a louder request is refused with the requested and allowed
 * levels.
 * <p>
 * Measurement, applied alike to the rendered buffer and to each captured channel (the tone goes to both):
 * <ul>
 * <li>the tone's span is where the magnitude exceeds {@value #ONSET_RE_PEAK_DB} dB re the channel's own peak
 *     ({@link Onsets#overall}), so a gain error does not move the span; its length is the sample count;</li>
 * <li>the steady part leaves out the ramps and {@value #STEADY_MARGIN_SECONDS} s more at each end; in it the
 *     dominant frequency ({@link Spectrum#dominantFrequencyHz}, periodogram maximum) and the RMS level in dBFS
 *     ({@link Levels#rmsDbfs}, AES17: a sine of peak {@code A} reads {@code 20·log10 A}) are measured;</li>
 * <li>a dropout is a run of samples below the span threshold at least {@link Settings#minGapSeconds()} long
 *     inside the span ({@link Onsets#segments}), or a captured tone longer than the rendered one by more than
 *     the length tolerance (an underrun stretches the sound).</li>
 * </ul>
 * The test passes when every captured channel holds the tone and frequency, level and length agree within the
 * {@link Settings} tolerances and there is no dropout.
 */
public final class LoopbackSelfTest {

    /** The label of the nominal calibration the test tone is rendered through. */
    public static final String CALIBRATION_LABEL = "loopback self-test (nominal flat: 0 dBFS = 100 dB SPL)";

    /** The verdict text when nothing can record. */
    public static final String NO_CAPTURE_MESSAGE = "no capture device: self-test played the tone but cannot verify it";

    /** Threshold of the tone's span relative to the channel's peak, dB. */
    public static final double ONSET_RE_PEAK_DB = -40.0;

    /** Left out of the steady part beyond each ramp, s. */
    public static final double STEADY_MARGIN_SECONDS = 0.005;

    private static final double NOMINAL_FULL_SCALE_DB_SPL = 100.0;
    private static final double NOMINAL_CEILING_DB_SPL = 90.0;
    private static final double LEAD_SECONDS = 0.05;
    private static final double TRAIL_SECONDS = 0.05;
    private static final long SETTLE_NANOS = 150_000_000L;
    private static final long TAIL_NANOS = 300_000_000L;
    private static final int CAPTURE_BUFFER_MILLIS = 500;

    /**
     * What to play and how closely it must come back.
     *
     * @param frequencyHz test tone frequency, Hz, below Nyquist
     * @param peakDbfs peak level of the tone, dBFS (at most -10 by the nominal calibration's ceiling)
     * @param durationSeconds tone duration including ramps
     * @param rampSeconds cos² onset and offset ramps
     * @param sampleRateHz 44100, 48000 or 96000
     * @param bufferMillis the output's line buffer
     * @param frequencyToleranceHz allowed |captured - rendered| dominant frequency
     * @param levelToleranceDb allowed |captured - rendered| RMS level
     * @param lengthToleranceSeconds allowed |captured - rendered| tone length
     * @param minGapSeconds shortest silent run inside the tone counted as a dropout
     */
    public record Settings(double frequencyHz, double peakDbfs, double durationSeconds, double rampSeconds,
            int sampleRateHz, int bufferMillis, double frequencyToleranceHz, double levelToleranceDb,
            double lengthToleranceSeconds, double minGapSeconds) {

        /** Validates the values; the steady part must last at least 50 ms. */
        public Settings {
            for (double v : new double[] {frequencyHz, durationSeconds, frequencyToleranceHz, levelToleranceDb,
                    lengthToleranceSeconds, minGapSeconds}) {
                if (!(v > 0) || Double.isInfinite(v)) {
                    throw new IllegalArgumentException("self-test frequency, duration and tolerances must be positive"
                            + " and finite: " + frequencyHz + " Hz, " + durationSeconds + " s, tolerances "
                            + frequencyToleranceHz + " Hz, " + levelToleranceDb + " dB, " + lengthToleranceSeconds
                            + " s, gap " + minGapSeconds + " s");
                }
            }
            if (!Double.isFinite(peakDbfs) || !(rampSeconds >= 0)) {
                throw new IllegalArgumentException("peak level must be finite and the ramp >= 0: " + peakDbfs + " dBFS, "
                        + rampSeconds + " s");
            }
            if (durationSeconds - 2 * (rampSeconds + STEADY_MARGIN_SECONDS) < 0.05) {
                throw new IllegalArgumentException("tone of " + durationSeconds + " s with ramps of " + rampSeconds
                        + " s leaves less than 50 ms of steady part to measure");
            }
        }

        /**
         * 1000 Hz at -20 dBFS peak for 500 ms with 10 ms ramps at 48 kHz, 200 ms line buffer; tolerances 1 Hz,
         * 0.5 dB, 1 ms, dropouts from 2 ms (common practice for a digital loopback, generous for an analogue one).
         */
        public static Settings defaults() {
            return new Settings(1000.0, -20.0, 0.5, 0.01, 48000, JavaSoundOutput.DEFAULT_BUFFER_MILLIS, 1.0, 0.5,
                    0.001, 0.002);
        }

        /** A copy with another line buffer. */
        public Settings withBufferMillis(int millis) {
            return new Settings(frequencyHz, peakDbfs, durationSeconds, rampSeconds, sampleRateHz, millis,
                    frequencyToleranceHz, levelToleranceDb, lengthToleranceSeconds, minGapSeconds);
        }
    }

    /**
     * The measured tone in one channel.
     *
     * @param onsetSample first sample of the span
     * @param lengthSamples span length, samples
     * @param frequencyHz dominant frequency of the steady part
     * @param levelDbfs RMS level of the steady part, dBFS (AES17)
     */
    public record Measurement(int onsetSample, int lengthSamples, double frequencyHz, double levelDbfs) {
    }

    /**
     * A dropout in a captured channel.
     *
     * @param channel 0 left, 1 right
     * @param atSeconds where it starts, from the captured tone's onset
     * @param durationSeconds how long (for a stretched tone: by how much it is longer)
     * @param what {@code "gap"} or {@code "stretched"}
     */
    public record Dropout(int channel, double atSeconds, double durationSeconds, String what) {
    }

    /**
     * One captured channel.
     *
     * @param channel 0 left, 1 right
     * @param captured the measured tone, or {@code null} if none was found
     * @param dropouts its dropouts
     */
    public record ChannelCheck(int channel, Measurement captured, List<Dropout> dropouts) {
        /** Copies the list. */
        public ChannelCheck {
            dropouts = List.copyOf(dropouts);
        }
    }

    /** PASS, FAIL, or UNVERIFIED (played but nothing recorded it). */
    public enum Verdict {
        PASS, FAIL, UNVERIFIED
    }

    /**
     * The outcome.
     *
     * @param verdict pass, fail or unverified
     * @param outputDevice {@link JavaSoundOutput#describe()} of the output used
     * @param captureDevice the capture device's name, or {@code null}
     * @param rendered the rendered tone (left channel; the right is the same)
     * @param channels per captured channel (empty when unverified)
     * @param latencyMillis estimated delay from {@code write()} to the tone's onset in the capture, ms (see
     *        {@link LoopbackSelfTest#run}), or NaN
     * @param problems why it failed, or why it is unverified (empty on a pass)
     */
    public record Result(Verdict verdict, String outputDevice, String captureDevice, Measurement rendered,
            List<ChannelCheck> channels, double latencyMillis, List<String> problems) {
        /** Copies the lists. */
        public Result {
            channels = List.copyOf(channels);
            problems = List.copyOf(problems);
        }

        public boolean passed() {
            return verdict == Verdict.PASS;
        }

        /** All dropouts of all channels. */
        public List<Dropout> dropouts() {
            List<Dropout> all = new ArrayList<>();
            for (ChannelCheck c : channels) {
                all.addAll(c.dropouts());
            }
            return all;
        }
    }

    private final Settings settings;
    private final StimulusRenderer renderer;
    private final SafetyGuard guard;

    public LoopbackSelfTest(Settings settings) {
        this.settings = Objects.requireNonNull(settings, "settings");
        Calibration calibration = Calibration.flat(CALIBRATION_LABEL, NOMINAL_FULL_SCALE_DB_SPL, NOMINAL_CEILING_DB_SPL,
                settings.sampleRateHz());
        this.renderer = new StimulusRenderer(calibration);
        this.guard = new SafetyGuard(calibration);
    }

    public Settings settings() {
        return settings;
    }

    /**
     * The test tone with {@value #LEAD_SECONDS} s of silence before and after, rendered and checked by the guard.
     *
     * @throws limen.signal.LevelRefusedException if the requested peak exceeds the nominal ceiling (-10 dBFS)
     */
    public CheckedStimulus renderTone(RandomGenerator rng) {
        Sound.Tone tone = new Sound.Tone(settings.frequencyHz(), NOMINAL_FULL_SCALE_DB_SPL + settings.peakDbfs(),
                settings.durationSeconds(), settings.rampSeconds());
        return guard.check(renderer.render(tone, Ear.BOTH, LEAD_SECONDS, TRAIL_SECONDS, rng));
    }

    /**
     * Runs the test on the given devices: opens the output, starts recording, waits
     * {@value #SETTLE_NANOS} ns, plays the tone, records {@value #TAIL_NANOS} ns more, stops and
     * {@link #analyse analyses}. The latency is {@code t_arrival - (t_write + onset_rendered/fs)}: from the
     * moment the tone's onset was due after {@code write()} (its position in the buffer) to the return of the
     * capture read that delivered it ({@link Recorder#frameArrivalNanos}). It includes the capture path's
     * delivery delay (with the capture buffer of {@value #CAPTURE_BUFFER_MILLIS} ms, chosen so that a busy machine
     * does not overrun the recording, PulseAudio delivers in fragments of tens of ms) and up to one read (about
     * 5 ms), so it is an upper bound on the output delay; a sound server that processes in blocks may deliver a
     * block before the time of its last sample, so small negative values can occur.
     *
     * @param outputName output device name, or {@code null} for the default
     * @param captureName capture device name, or {@code null} for the default
     * @param rng randomness for the dither
     * @throws NoDeviceException if there is no output device, or a named capture device does not exist
     * @throws DeviceLostException if the output was lost while playing
     * @return UNVERIFIED ({@value #NO_CAPTURE_MESSAGE}) when there is no capture device
     */
    public Result run(Devices devices, String outputName, String captureName, RandomGenerator rng)
            throws NoDeviceException, DeviceLostException {
        CheckedStimulus tone = renderTone(rng);
        try (JavaSoundOutput out = JavaSoundOutput.open(devices, outputName, settings.sampleRateHz(),
                settings.bufferMillis(), rng)) {
            AudioDevice capture;
            TargetDataLine line;
            try {
                capture = devices.chooseCapture(captureName);
                int bytes = settings.sampleRateHz() * CAPTURE_BUFFER_MILLIS / 1000 * 4;
                line = devices.openCaptureLine(capture, JavaSoundOutput.format(settings.sampleRateHz()), bytes);
            } catch (NoDeviceException e) {
                if (captureName != null && !captureName.isBlank()) {
                    throw e;
                }
                out.play(tone);
                return new Result(Verdict.UNVERIFIED, out.describe(), null, measureRendered(tone), List.of(),
                        Double.NaN, List.of(NO_CAPTURE_MESSAGE + " (" + e.getMessage() + ")"));
            }
            Recorder recorder = new Recorder(line);
            byte[] recorded;
            try {
                recorder.start();
                Realtime.sleepUntil(System.nanoTime() + SETTLE_NANOS);
                out.play(tone);
                Realtime.sleepUntil(System.nanoTime() + TAIL_NANOS);
            } finally {
                recorded = recorder.stop();
            }
            double[][] captured = Pcm.decode16(recorded, recorded.length, 2);
            Result r = analyse(tone, captured, out.describe(), capture.name(), Double.NaN);
            double latency = Double.NaN;
            if (!r.channels().isEmpty() && r.channels().get(0).captured() != null) {
                long captured0 = recorder.frameArrivalNanos(r.channels().get(0).captured().onsetSample());
                if (captured0 != Long.MAX_VALUE) {
                    double renderedOnset = out.lastWriteNanos() + r.rendered().onsetSample() * 1e9 / settings.sampleRateHz();
                    latency = (captured0 - renderedOnset) / 1e6;
                }
            }
            return new Result(r.verdict(), r.outputDevice(), r.captureDevice(), r.rendered(), r.channels(), latency,
                    r.problems());
        }
    }

    /**
     * Compares a capture with the rendered tone (see the class comment for the measures and the criteria).
     *
     * @param rendered the tone that was played
     * @param captured the recording, {@code [channel][frame]} at the tone's rate
     * @param latencyMillis passed through to the result (NaN if unknown)
     */
    public Result analyse(CheckedStimulus rendered, double[][] captured, String outputDevice, String captureDevice,
            double latencyMillis) {
        Measurement ref = measureRendered(rendered);
        int fs = rendered.sampleRateHz();
        int lengthTolerance = (int) Math.round(settings.lengthToleranceSeconds() * fs);
        int minGap = Math.max(1, (int) Math.round(settings.minGapSeconds() * fs));
        List<ChannelCheck> checks = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        if (captured.length == 0) {
            problems.add("the capture has no channels");
        }
        for (int c = 0; c < captured.length; c++) {
            double[] x = captured[c];
            String side = c == 0 ? "left" : c == 1 ? "right" : "channel " + c;
            Optional<Onsets.Span> span = span(x);
            if (span.isEmpty()) {
                problems.add(side + ": no tone in the capture (it stayed silent)");
                checks.add(new ChannelCheck(c, null, List.of()));
                continue;
            }
            Onsets.Span s = span.get();
            if (s.onsetSample() == 0 || s.offsetSample() == x.length) {
                problems.add(side + ": the tone is cut off by the " + (s.onsetSample() == 0 ? "start" : "end")
                        + " of the capture");
            }
            Measurement m = measure(x, s, fs);
            if (m == null) {
                problems.add(side + ": the captured tone is too short to measure (" + s.length() + " samples)");
                checks.add(new ChannelCheck(c, null, List.of()));
                continue;
            }
            List<Dropout> dropouts = new ArrayList<>();
            double peak = Levels.peakDbfs(x, s.onsetSample(), s.offsetSample());
            double[] inside = java.util.Arrays.copyOfRange(x, s.onsetSample(), s.offsetSample());
            List<Onsets.Span> parts = Onsets.segments(inside, peak + ONSET_RE_PEAK_DB, minGap);
            for (int i = 1; i < parts.size(); i++) {
                int from = parts.get(i - 1).offsetSample();
                dropouts.add(new Dropout(c, from / (double) fs, (parts.get(i).onsetSample() - from) / (double) fs, "gap"));
            }
            int extra = m.lengthSamples() - ref.lengthSamples();
            if (extra > lengthTolerance) {
                dropouts.add(new Dropout(c, 0, extra / (double) fs, "stretched"));
            }
            checks.add(new ChannelCheck(c, m, dropouts));
            double df = m.frequencyHz() - ref.frequencyHz();
            if (!(Math.abs(df) <= settings.frequencyToleranceHz())) {
                problems.add(side + String.format(Locale.ROOT, ": frequency %.3f Hz, rendered %.3f Hz (off by %.3f Hz,"
                        + " allowed %.3f Hz)", m.frequencyHz(), ref.frequencyHz(), df, settings.frequencyToleranceHz()));
            }
            double dl = m.levelDbfs() - ref.levelDbfs();
            if (!(Math.abs(dl) <= settings.levelToleranceDb())) {
                problems.add(side + String.format(Locale.ROOT, ": level %.2f dBFS, rendered %.2f dBFS (off by %.2f dB,"
                        + " allowed %.2f dB)", m.levelDbfs(), ref.levelDbfs(), dl, settings.levelToleranceDb()));
            }
            if (Math.abs(extra) > lengthTolerance) {
                problems.add(side + ": length " + m.lengthSamples() + " samples, rendered " + ref.lengthSamples()
                        + " (off by " + extra + ", allowed " + lengthTolerance + ")");
            }
            for (Dropout d : dropouts) {
                if (d.what().equals("gap")) {
                    problems.add(side + String.format(Locale.ROOT, ": dropout of %.1f ms at %.1f ms into the tone",
                            d.durationSeconds() * 1e3, d.atSeconds() * 1e3));
                }
            }
        }
        return new Result(problems.isEmpty() ? Verdict.PASS : Verdict.FAIL, outputDevice, captureDevice, ref, checks,
                latencyMillis, problems);
    }

    /** The rendered tone's measurement (left channel). */
    public Measurement measureRendered(CheckedStimulus rendered) {
        double[] x = rendered.channel(0);
        Onsets.Span s = span(x).orElseThrow(() -> new IllegalArgumentException("the rendered tone is silent"));
        Measurement m = measure(x, s, rendered.sampleRateHz());
        if (m == null) {
            throw new IllegalArgumentException("the rendered tone is too short to measure");
        }
        return m;
    }

    private static Optional<Onsets.Span> span(double[] x) {
        if (x.length == 0) {
            return Optional.empty();
        }
        double peak = Levels.peak(x, 0, x.length);
        if (!(peak > 0)) {
            return Optional.empty();
        }
        return Onsets.overall(x, 20 * Math.log10(peak) + ONSET_RE_PEAK_DB);
    }

    /** Frequency and level in the steady part of a span, or null if the span has none. */
    private Measurement measure(double[] x, Onsets.Span s, int fs) {
        int skip = (int) Math.round((settings.rampSeconds() + STEADY_MARGIN_SECONDS) * fs);
        int from = s.onsetSample() + skip;
        int to = s.offsetSample() - skip;
        if (to - from < 64) {
            return null;
        }
        double[] steady = java.util.Arrays.copyOfRange(x, from, to);
        double f = Spectrum.of(steady, fs).dominantFrequencyHz();
        return new Measurement(s.onsetSample(), s.length(), f, Levels.rmsDbfs(x, from, to));
    }
}
