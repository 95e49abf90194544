package limen.audio;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;

import javax.sound.sampled.Mixer;

import org.junit.jupiter.api.Test;

import limen.signal.CheckedStimulus;
import limen.signal.LevelRefusedException;

/**
 * The self-test's comparison on made-up captures (no device needed): a faithful copy passes; a gap, a gain
 * error, a frequency error and silence fail with the reason. The expected numbers are computed here from the
 * definitions, not taken from the code under test.
 */
class LoopbackAnalysisTest {

    private final LoopbackSelfTest test = new LoopbackSelfTest(LoopbackSelfTest.Settings.defaults());
    private final CheckedStimulus tone = test.renderTone(new SplittableRandom(3));

    /** The rendered left channel, delayed by {@code delay} samples, followed by {@code tail} zeros. */
    private double[][] capture(int delay, int tail, double gain) {
        double[] x = tone.channel(0);
        double[] c = new double[delay + x.length + tail];
        for (int n = 0; n < x.length; n++) {
            c[delay + n] = gain * x[n];
        }
        return new double[][] {c, c.clone()};
    }

    @Test
    void theRenderedToneIs1000HzAtMinus20DbfsAndAbout500Ms() {
        LoopbackSelfTest.Measurement m = test.measureRendered(tone);
        // AES17-2020: a sine of peak A reads 20·log10(A) dBFS RMS, so a -20 dBFS peak sine reads -20 dBFS
        assertEquals(-20.0, m.levelDbfs(), 0.01);
        assertEquals(1000.0, m.frequencyHz(), 1e-3);
        // 500 ms = 24000 samples at 48 kHz, less the samples under -40 dB re peak at either end: the cos² ramp
        // gain sin²(πt/2T) of T = 480 samples stays under 0.01 for t/T < (2/π)·asin(0.1) = 0.0638, i.e. 30.6
        // samples, and the 1 kHz sine itself (48 samples a period) peaks within another 24 samples
        assertTrue(m.lengthSamples() <= 24000 - 2 * 30 && m.lengthSamples() >= 24000 - 2 * (31 + 24),
                "" + m.lengthSamples());
        // lead-in of 50 ms = 2400 samples, plus the same part of the onset ramp
        assertTrue(m.onsetSample() >= 2400 + 30 && m.onsetSample() <= 2400 + 31 + 24, "" + m.onsetSample());
    }

    @Test
    void aDelayedFaithfulCopyPasses() {
        LoopbackSelfTest.Result r = test.analyse(tone, capture(7321, 9000, 1.0), "out", "in", 3.0);
        assertEquals(LoopbackSelfTest.Verdict.PASS, r.verdict(), r.problems().toString());
        assertTrue(r.passed());
        assertEquals(2, r.channels().size());
        LoopbackSelfTest.Measurement m = r.channels().get(0).captured();
        assertEquals(r.rendered().onsetSample() + 7321, m.onsetSample());
        assertEquals(r.rendered().lengthSamples(), m.lengthSamples());
        assertTrue(r.dropouts().isEmpty());
        assertEquals(3.0, r.latencyMillis());
    }

    @Test
    void anInsertedGapIsADropoutAndStretchesTheTone() {
        double[][] c = capture(1000, 4000, 1.0);
        int at = 1000 + tone.length() / 2;
        int gap = 240; // 5 ms of silence, as an underrun inserts it
        double[][] g = new double[2][c[0].length + gap];
        for (int ch = 0; ch < 2; ch++) {
            System.arraycopy(c[ch], 0, g[ch], 0, at);
            System.arraycopy(c[ch], at, g[ch], at + gap, c[ch].length - at);
        }
        LoopbackSelfTest.Result r = test.analyse(tone, g, "out", "in", Double.NaN);
        assertEquals(LoopbackSelfTest.Verdict.FAIL, r.verdict());
        List<LoopbackSelfTest.Dropout> left = r.channels().get(0).dropouts();
        assertEquals(2, left.size(), left.toString());
        assertEquals("gap", left.get(0).what());
        // the silent run is the inserted 5 ms plus the sine's own sub-threshold samples around it (< 1 ms)
        assertEquals(0.005, left.get(0).durationSeconds(), 0.001);
        assertEquals("stretched", left.get(1).what());
        assertEquals(0.005, left.get(1).durationSeconds(), 1e-9);
        assertTrue(r.problems().stream().anyMatch(p -> p.contains("dropout of 5")), r.problems().toString());
        assertTrue(r.problems().stream().anyMatch(p -> p.contains("off by 240")), r.problems().toString());
    }

    @Test
    void aGainErrorFailsOnLevelWithBothLevels() {
        LoopbackSelfTest.Result r = test.analyse(tone, capture(500, 500, 0.5), "out", "in", Double.NaN);
        assertEquals(LoopbackSelfTest.Verdict.FAIL, r.verdict());
        // 20·log10(0.5) = -6.02 dB
        assertEquals(r.rendered().levelDbfs() - 6.0206, r.channels().get(0).captured().levelDbfs(), 1e-3);
        assertTrue(r.problems().get(0).contains("rendered -20.00 dBFS"), r.problems().toString());
        assertTrue(r.problems().get(0).contains("off by -6.02 dB"), r.problems().toString());
        // the span threshold follows the capture's own peak, so the length still matches
        assertEquals(r.rendered().lengthSamples(), r.channels().get(0).captured().lengthSamples());
    }

    @Test
    void aToneAtAnotherFrequencyFailsOnFrequency() {
        CheckedStimulus other = new LoopbackSelfTest(new LoopbackSelfTest.Settings(1003, -20, 0.5, 0.01, 48000, 200,
                1.0, 0.5, 0.001, 0.002)).renderTone(new SplittableRandom(3));
        double[] x = other.channel(0);
        LoopbackSelfTest.Result r = test.analyse(tone, new double[][] {x, x}, "out", "in", Double.NaN);
        assertEquals(LoopbackSelfTest.Verdict.FAIL, r.verdict());
        assertEquals(1003.0, r.channels().get(0).captured().frequencyHz(), 1e-3);
        assertTrue(r.problems().get(0).contains("off by 3.000 Hz"), r.problems().toString());
    }

    @Test
    void aSilentOrTruncatedCaptureFails() {
        LoopbackSelfTest.Result silent = test.analyse(tone, new double[2][48000], "out", "in", Double.NaN);
        assertEquals(LoopbackSelfTest.Verdict.FAIL, silent.verdict());
        assertNull(silent.channels().get(0).captured());
        assertTrue(silent.problems().get(0).contains("no tone"), silent.problems().toString());
        double[] x = tone.channel(0);
        double[] cut = java.util.Arrays.copyOf(x, x.length / 2);
        LoopbackSelfTest.Result truncated = test.analyse(tone, new double[][] {cut, cut}, "out", "in", Double.NaN);
        assertEquals(LoopbackSelfTest.Verdict.FAIL, truncated.verdict());
        assertTrue(truncated.problems().get(0).contains("cut off by the end"), truncated.problems().toString());
    }

    @Test
    void theTestToneGoesThroughTheGuardWhichRefusesLoudRequests() {
        LoopbackSelfTest loud = new LoopbackSelfTest(new LoopbackSelfTest.Settings(1000, -3, 0.5, 0.01, 48000, 200,
                1.0, 0.5, 0.001, 0.002));
        LevelRefusedException e = assertThrows(LevelRefusedException.class, () -> loud.renderTone(new SplittableRandom(1)));
        assertTrue(e.getMessage().contains("requested 97.00 dB SPL"), e.getMessage());
        assertTrue(e.getMessage().contains("allowed 90.00 dB SPL"), e.getMessage());
    }

    @Test
    void withoutACaptureDeviceTheTonePlaysButTheResultIsUnverified() throws Exception {
        Mixer.Info info = FakeSound.info("default [default]", "Direct Audio Device: default");
        FakeSound.Line16 line = new FakeSound.Line16(i -> -1);
        Devices playOnly = new Devices(FakeSound.source(List.of(info),
                List.of(FakeSound.outputMixer(info, FakeSound.Open.WORKS, line.line()))));
        LoopbackSelfTest.Result r = test.run(playOnly, null, null, new SplittableRandom(1));
        assertEquals(LoopbackSelfTest.Verdict.UNVERIFIED, r.verdict());
        assertTrue(r.problems().get(0).startsWith("no capture device: self-test played the tone but cannot verify it"),
                r.problems().toString());
        assertEquals(tone.length() * 4 + 9600 * 4, (int) line.asked.get(0), "the tone was written");
        // a capture device named but absent is an error, not an unverified pass
        assertThrows(NoDeviceException.class, () -> test.run(playOnly, null, "Booth mic", new SplittableRandom(1)));
    }
}
