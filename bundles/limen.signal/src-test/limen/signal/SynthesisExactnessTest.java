package limen.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;

import org.junit.jupiter.api.Test;

/**
 * Exact frequency and the sampling theorem.
 * <p>
 * Reference: sample {@code n} of a sine is {@code sin(2π·f·n/fs)} by definition. The reference phase is
 * computed here independently, in exact decimal arithmetic (BigDecimal of the binary value of {@code f}),
 * reduced to one cycle before the final {@code Math.sin}; so any drift or phase rounding in the synthesis shows.
 */
class SynthesisExactnessTest {

    private static double reference(long n, double f, double fs) {
        BigDecimal cycles = new BigDecimal(f).multiply(BigDecimal.valueOf(n)).divide(new BigDecimal(fs),
                MathContext.DECIMAL128);
        BigDecimal frac = cycles.subtract(new BigDecimal(cycles.toBigInteger()));
        return Math.sin(2 * Math.PI * frac.doubleValue());
    }

    @Test
    void longToneHasNoDrift() {
        // a two-minute tone at a frequency that is not a whole number of cycles per sample period, whole
        double fs = 48000;
        double f = 1000.123456789;
        int n = (int) (120 * fs);
        double[] x = new double[n];
        Synthesis.addSine(x, 0, n, 0, f, 1.0, 0.0, fs);
        double worst = 0;
        for (long i = 0; i < n; i += 997) {
            worst = Math.max(worst, Math.abs(x[(int) i] - reference(i, f, fs)));
        }
        for (int i = n - 200; i < n; i++) {
            worst = Math.max(worst, Math.abs(x[i] - reference(i, f, fs)));
        }
        assertTrue(worst < 1e-12, "largest deviation from sin(2πfn/fs) over two minutes: " + worst);
        // the synthesis keeps no state between blocks, so the samples of hour 1 and of day 1 are reached directly
        for (long start : new long[] {3600L * 48000 - 100, 86400L * 48000 - 100}) {
            double[] seg = new double[300];
            Synthesis.addSine(seg, 0, seg.length, start, f, 1.0, 0.0, fs);
            for (int i = 0; i < seg.length; i++) {
                assertEquals(reference(start + i, f, fs), seg[i], 1e-11, "sample " + (start + i));
            }
        }
    }

    @Test
    void periodIsFsOverF() {
        // sampling theorem corollary (SOURCES.md): a sine of f sampled at fs has period fs/f samples
        double fs = 44100;
        double f = 441; // period exactly 100 samples
        double[] x = Synthesis.sine(f, 0.5, 100_000, fs);
        for (int i = 0; i + 100 < x.length; i += 7) {
            assertEquals(x[i], x[i + 100], 1e-13, "sample " + i);
        }
    }

    @Test
    void firstIndexContinuesThePhase() {
        double fs = 96000;
        double f = 3333.3;
        double[] whole = Synthesis.sine(f, 0.7, 10_000, fs);
        double[] tail = new double[4000];
        Synthesis.addSine(tail, 0, 4000, 6000, f, 0.7, 0.0, fs);
        for (int i = 0; i < 4000; i++) {
            assertEquals(whole[6000 + i], tail[i], 1e-14);
        }
    }

    @Test
    void refusesFrequenciesAtOrAboveNyquist() {
        // Shannon (1949): only components below fs/2 are representable
        assertThrows(IllegalArgumentException.class, () -> Synthesis.sine(24000, 1, 10, 48000));
        assertThrows(IllegalArgumentException.class, () -> Synthesis.sine(30000, 1, 10, 48000));
        assertThrows(IllegalArgumentException.class, () -> Synthesis.sine(0, 1, 10, 48000));
        Synthesis.sine(23999.9, 1, 10, 48000);
        Calibration flat = Calibration.flat("bench", 100, 44100);
        StimulusRenderer r = new StimulusRenderer(flat);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> r.render(new Sound.Tone(22050, 60, 0.1, 0.01), Ear.BOTH, 0, 0, new java.util.SplittableRandom(1)));
        assertTrue(e.getMessage().contains("Nyquist"), e.getMessage());
    }

    @Test
    void cos2RampShape() {
        // raised cosine: g(i) = sin²(πi/2R) = (1 - cos(πi/R))/2; g(0) = 0, g(R/2) = 1/2
        int r = 480;
        assertEquals(0.0, Synthesis.cos2RampGain(0, r), 0);
        assertEquals(0.5, Synthesis.cos2RampGain(240, r), 1e-15);
        for (int i = 0; i < r; i++) {
            assertEquals((1 - Math.cos(Math.PI * i / r)) / 2, Synthesis.cos2RampGain(i, r), 1e-15);
        }
        double[] x = new double[2000];
        java.util.Arrays.fill(x, 1.0);
        Synthesis.applyCos2Ramps(x, 0, 2000, r);
        assertEquals(0.0, x[0], 0);
        assertEquals(0.0, x[1999], 0);
        assertEquals(1.0, x[r], 0);
        assertEquals(1.0, x[1999 - r], 0);
        assertEquals(x[10], x[1989], 0);
    }
}
