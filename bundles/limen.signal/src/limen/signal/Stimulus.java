package limen.signal;

import java.util.List;

/**
 * A rendered, not yet checked, two-channel buffer (channel 0 left, channel 1 right; full scale ±1.0) with the
 * components it declares and, for a trial, its interval marks. Immutable: the arrays are copied in and out.
 * <p>
 * A stimulus cannot be written or played: only {@link SafetyGuard#check(Stimulus)} turns it into a
 * {@link CheckedStimulus}, the one type outputs accept.
 */
public final class Stimulus {

    private final double[][] channels;
    private final int sampleRateHz;
    private final List<Component> components;
    private final List<IntervalMark> intervals;

    /**
     * A stimulus from caller-made samples (copied). Declared components may be empty: the guard then relies on
     * its own measurement alone.
     *
     * @throws IllegalArgumentException if the channels differ in length or the rate is unsupported
     */
    public Stimulus(double[] left, double[] right, int sampleRateHz, List<Component> components,
            List<IntervalMark> intervals) {
        this(new double[][] {left.clone(), right.clone()}, sampleRateHz, components, intervals);
    }

    /** Takes ownership of {@code channels} (no copy): for the renderer, which never touches them again. */
    Stimulus(double[][] channels, int sampleRateHz, List<Component> components, List<IntervalMark> intervals) {
        if (channels.length != OutputFormat.CHANNELS || channels[0].length != channels[1].length) {
            throw new IllegalArgumentException("need two channels of equal length");
        }
        this.channels = channels;
        this.sampleRateHz = OutputFormat.requireSupportedRate(sampleRateHz);
        this.components = List.copyOf(components);
        this.intervals = List.copyOf(intervals);
        for (Component c : this.components) {
            if (c.endSample() > channels[0].length) {
                throw new IllegalArgumentException("component " + c.description() + " ends at sample "
                        + c.endSample() + ", after the buffer's " + channels[0].length + " samples");
            }
        }
        for (IntervalMark mark : this.intervals) {
            if (mark.offsetSample() > channels[0].length) {
                throw new IllegalArgumentException("interval " + mark.index() + " ends after the buffer");
            }
        }
    }

    /** Frames (samples per channel). */
    public int length() {
        return channels[0].length;
    }

    public int sampleRateHz() {
        return sampleRateHz;
    }

    /** Duration in seconds, {@code length / fs}. */
    public double durationSeconds() {
        return length() / (double) sampleRateHz;
    }

    /** Sample {@code n} of {@code channel} (0 left, 1 right). */
    public double sample(int channel, int n) {
        return channels[channel][n];
    }

    /** A copy of one channel. */
    public double[] channel(int channel) {
        return channels[channel].clone();
    }

    /** The declared components. */
    public List<Component> components() {
        return components;
    }

    /** The interval marks (empty unless this is a trial). */
    public List<IntervalMark> intervals() {
        return intervals;
    }

    /** The live array, for the guard and the writers of this package only. */
    double[] channelArray(int channel) {
        return channels[channel];
    }
}
