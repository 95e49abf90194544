package limen.bench;

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;

import limen.signal.Calibration;
import limen.signal.Ear;
import limen.signal.SafetyGuard;
import limen.signal.Sound;
import limen.signal.Stimulus;
import limen.signal.StimulusRenderer;
import limen.signal.Synthesis;

/**
 * Synthesis of one second of a 48 kHz stereo tone (1 kHz, 10 ms cos² ramps, both ears) on one thread, against a
 * baseline that only copies a buffer of the same size (two channels of 48,000 doubles: the memory bandwidth the
 * output alone costs). Score: microseconds per second of sound, so the real-time factor is {@code 1e6 / score}
 * (the target: at least 2000, i.e. at most 500 µs), and the ratio to the baseline is the synthesis cost
 * in units of one plain copy of its output.
 * <ul>
 * <li>{@code synthesizeStereoTone}: the primitives into preallocated buffers (exact-phase sine, ramps, copy to
 *     the second ear);</li>
 * <li>{@code renderStereoTone}: the whole {@link StimulusRenderer} path (calibrated level, allocation,
 *     declared component);</li>
 * <li>{@code guardCheck}: the {@link SafetyGuard} on that rendered second (not synthesis; for the record).</li>
 * </ul>
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
@Threads(1)
public class SynthesisBench {

    private static final int RATE = 48000;

    private double[] left;
    private double[] right;
    private double[][] source;
    private StimulusRenderer renderer;
    private SafetyGuard guard;
    private Sound.Tone tone;
    private Stimulus rendered;
    private SplittableRandom rng;

    @Setup
    public void setUp() {
        left = new double[RATE];
        right = new double[RATE];
        source = new double[][] {Synthesis.sine(997, 0.25, RATE, RATE), Synthesis.sine(1003, 0.25, RATE, RATE)};
        Calibration flat = Calibration.flat("bench", 100, RATE);
        renderer = new StimulusRenderer(flat);
        guard = new SafetyGuard(flat);
        tone = new Sound.Tone(1000, 70, 1.0, 0.01);
        rng = new SplittableRandom(1);
        rendered = renderer.render(tone, Ear.BOTH, 0, 0, rng);
    }

    @Benchmark
    public double baselineArrayCopy() {
        System.arraycopy(source[0], 0, left, 0, RATE);
        System.arraycopy(source[1], 0, right, 0, RATE);
        return left[RATE / 2] + right[RATE / 3];
    }

    @Benchmark
    public double synthesizeStereoTone() {
        java.util.Arrays.fill(left, 0.0);
        Synthesis.addSine(left, 0, RATE, 0, 1000, 0.0316, 0.0, RATE);
        Synthesis.applyCos2Ramps(left, 0, RATE, RATE / 100);
        System.arraycopy(left, 0, right, 0, RATE);
        return left[RATE / 2] + right[RATE / 3];
    }

    @Benchmark
    public Stimulus renderStereoTone() {
        return renderer.render(tone, Ear.BOTH, 0, 0, rng);
    }

    @Benchmark
    public Object guardCheck() {
        return guard.check(rendered);
    }
}
