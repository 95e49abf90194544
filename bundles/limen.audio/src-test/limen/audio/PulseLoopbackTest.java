package limen.audio;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.util.SplittableRandom;

import javax.sound.sampled.AudioSystem;
import javax.sound.sampled.TargetDataLine;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import limen.signal.CheckedStimulus;
import limen.signal.Ear;
import limen.signal.SafetyGuard;
import limen.signal.Sound;
import limen.signal.StimulusRenderer;
import limen.signal.TrialSpec;

/**
 * On the PulseAudio null sink (started by releng/run-tests.sh): a trial played through javax.sound comes back
 * from the sink's monitor matching what was rendered. Two checks: the self-test's own comparison, and an
 * independent one written here (plain Java Sound capture, sample-by-sample comparison).
 */
class PulseLoopbackTest {

    @BeforeEach
    void needsTheNullSink() {
        AudioTestEnvironment.requirePulse();
    }

    @Test
    void theSelfTestPassesWithFrequencyLevelAndLengthOfTheRenderedTone() throws Exception {
        LoopbackSelfTest test = new LoopbackSelfTest(LoopbackSelfTest.Settings.defaults());
        for (int run = 0; run < 2; run++) {
            LoopbackSelfTest.Result r = test.run(Devices.system(), null, null, new SplittableRandom(run));
            assertEquals(LoopbackSelfTest.Verdict.PASS, r.verdict(), r.problems() + " " + r.channels());
            assertEquals(2, r.channels().size());
            for (LoopbackSelfTest.ChannelCheck c : r.channels()) {
                // a digital loopback: same clock, same samples (only the 16-bit dither differs from the doubles)
                assertEquals(r.rendered().frequencyHz(), c.captured().frequencyHz(), 0.01);
                assertEquals(r.rendered().levelDbfs(), c.captured().levelDbfs(), 0.05);
                assertEquals(r.rendered().lengthSamples(), c.captured().lengthSamples(), 2);
                assertTrue(c.dropouts().isEmpty(), c.dropouts().toString());
            }
            System.out.printf("self-test run %d: %s; latency %.1f ms%n", run, r.channels(), r.latencyMillis());
        }
    }

    @Test
    void aTwoIntervalTrialComesBackSampleForSampleWithinTheDither() throws Exception {
        // a 2AFC frequency-discrimination trial of the Harbourside protocol: 1000 Hz standard, 1010 Hz target
        TrialSpec spec = new TrialSpec(2, 1, new Sound.Tone(1000, 70, 0.3, 0.01), new Sound.Tone(1010, 70, 0.3, 0.01),
                0.1, 0.4, 0.1, Ear.BOTH, null);
        CheckedStimulus trial = new SafetyGuard(Trials.BENCH).check(
                new StimulusRenderer(Trials.BENCH).renderTrial(spec, new SplittableRandom(4)));
        byte[] recorded;
        try (JavaSoundOutput out = JavaSoundOutput.open(Devices.system(), null, 48000, 200, new SplittableRandom(5))) {
            TargetDataLine in = AudioSystem.getTargetDataLine(JavaSoundOutput.format(48000));
            in.open(JavaSoundOutput.format(48000), 48000 * 4 / 2);
            ByteArrayOutputStream data = new ByteArrayOutputStream();
            Thread reader = new Thread(() -> {
                byte[] buf = new byte[3840];
                while (in.isOpen()) {
                    int n = in.read(buf, 0, buf.length);
                    if (n <= 0) {
                        break;
                    }
                    synchronized (data) {
                        data.write(buf, 0, n);
                    }
                }
            });
            in.start();
            reader.start();
            Thread.sleep(150);
            out.play(trial);
            Thread.sleep(300);
            in.stop();
            in.close();
            reader.join(5000);
            synchronized (data) {
                recorded = data.toByteArray();
            }
        }
        double[] left = trial.channel(0);
        int frames = recorded.length / 4;
        double[] got = new double[frames];
        for (int n = 0; n < frames; n++) {
            got[n] = (short) ((recorded[4 * n] & 0xff) | (recorded[4 * n + 1] << 8)) / 32767.0;
        }
        int first = firstAbove(left, 1e-3);
        int guess = firstAbove(got, 1e-3) - first;
        // align on the best of a few offsets around the threshold crossing (dither can move it by a sample)
        int best = guess;
        double bestErr = Double.MAX_VALUE;
        for (int k = guess - 3; k <= guess + 3; k++) {
            double err = maxError(left, got, k);
            if (err < bestErr) {
                bestErr = err;
                best = k;
            }
        }
        // TPDF dither of ±1 LSB plus rounding of ±1/2 LSB: |code - x·32767| <= 1.5 LSB (Vanderkooy & Lipshitz
        // 1984: the dither's range is the difference of two uniform variates)
        assertTrue(bestErr <= 1.5 / 32767 + 1e-12, "largest difference " + bestErr * 32767 + " LSB at offset " + best);
        // both intervals, the ISI and the lead/trail silences all came back: the whole buffer is inside the capture
        assertTrue(best >= 0 && best + left.length <= frames, "offset " + best + ", " + frames + " frames captured");
        System.out.printf("2-interval trial: %d frames matched within %.2f LSB at capture offset %d%n", left.length,
                bestErr * 32767, best);
    }

    private static int firstAbove(double[] x, double t) {
        for (int n = 0; n < x.length; n++) {
            if (Math.abs(x[n]) > t) {
                return n;
            }
        }
        throw new AssertionError("no sound above " + t + " in " + x.length + " samples");
    }

    /** Largest |got[n + k] - want[n]| over the rendered buffer (samples outside the capture count as silence). */
    private static double maxError(double[] want, double[] got, int k) {
        double max = 0;
        for (int n = 0; n < want.length; n++) {
            int m = n + k;
            double g = m >= 0 && m < got.length ? got[m] : 0;
            max = Math.max(max, Math.abs(g - want[n]));
        }
        return max;
    }
}
