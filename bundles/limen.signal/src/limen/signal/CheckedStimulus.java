package limen.signal;

import java.util.List;
import java.util.random.RandomGenerator;

import limen.signal.internal.Quantizer;

/**
 * A stimulus that passed the {@link SafetyGuard}: the only type the WAV writer and any audio output accept.
 * Only the guard can create one (package-private constructor), so holding one proves the check was made.
 */
public final class CheckedStimulus {

    private final Stimulus stimulus;
    private final Calibration calibration;
    private final double[] measuredLevelDbSpl;

    CheckedStimulus(Stimulus stimulus, Calibration calibration, double[] measuredLevelDbSpl) {
        this.stimulus = stimulus;
        this.calibration = calibration;
        this.measuredLevelDbSpl = measuredLevelDbSpl.clone();
    }

    /** The checked stimulus itself (immutable). */
    public Stimulus stimulus() {
        return stimulus;
    }

    /** The calibration it was checked against. */
    public Calibration calibration() {
        return calibration;
    }

    /**
     * The guard's measured short-term level bound of one channel, dB SPL ({@code -Infinity} for a silent
     * channel); at most the calibration's ceiling.
     */
    public double measuredLevelDbSpl(int channel) {
        return measuredLevelDbSpl[channel];
    }

    public int sampleRateHz() {
        return stimulus.sampleRateHz();
    }

    public int length() {
        return stimulus.length();
    }

    public double durationSeconds() {
        return stimulus.durationSeconds();
    }

    public double sample(int channel, int n) {
        return stimulus.sample(channel, n);
    }

    /** A copy of one channel. */
    public double[] channel(int channel) {
        return stimulus.channel(channel);
    }

    public List<Component> components() {
        return stimulus.components();
    }

    public List<IntervalMark> intervals() {
        return stimulus.intervals();
    }

    /**
     * Interleaved little-endian signed PCM (left, right) for a file or an audio line: 16 bit with TPDF dither
     * from {@code ditherRng}, or 24 bit undithered ({@code ditherRng} may then be null). See
     * {@link Quantizer} for scale and dither.
     */
    public byte[] toPcm(int bitsPerSample, RandomGenerator ditherRng) {
        return Quantizer.interleave(channelArray(0), channelArray(1), bitsPerSample, ditherRng);
    }

    /** The live array, for the writers of this package only. */
    double[] channelArray(int channel) {
        return stimulus.channelArray(channel);
    }
}
