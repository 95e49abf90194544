package limen.signal.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import limen.signal.Calibration;
import limen.signal.Synthesis;

/** The guard's measurement: its sidelobe constant by direct DFT, and readings of steady sines. */
class LevelBoundTest {

    @Test
    void hannSidelobeShareIsBelowTheConstant() {
        // direct DFT (written here, no FFT) of a Hann-windowed sine at sub-bin offsets: energy share of the bins
        // more than 2 bins away from the sine's frequency. Harris (1978, Proc. IEEE 66(1), 51-83) gives the Hann
        // main lobe as ±2 bins and the highest sidelobe -31.5 dB (from memory); the share must be below 1e-3.
        int b = 512;
        double worst = 0;
        for (double offset : new double[] {0.0, 0.25, 0.5, 0.75}) {
            double f = (60 + offset) / b;
            double total = 0;
            double side = 0;
            for (int k = 0; k <= b / 2; k++) {
                double re = 0;
                double im = 0;
                for (int n = 0; n < b; n++) {
                    double s = Math.sin(Math.PI * (n + 0.5) / b);
                    double v = s * s * Math.sin(2 * Math.PI * f * n + 0.3);
                    re += v * Math.cos(2 * Math.PI * k * n / b);
                    im -= v * Math.sin(2 * Math.PI * k * n / b);
                }
                double p = (re * re + im * im) * (k == 0 || k == b / 2 ? 1 : 2);
                total += p;
                if (Math.abs(k - f * b) > 2) {
                    side += p;
                }
            }
            worst = Math.max(worst, side / total);
        }
        assertTrue(worst < LevelBound.SIDELOBE_SHARE, "sidelobe share " + worst);
        assertTrue(worst > 1e-4, "sidelobe share implausibly small: " + worst);
    }

    @Test
    void steadySineReadsItsLevelNeverLow() {
        Calibration cal = new Calibration("peaked", -20, new double[] {125, 1000, 8000}, new double[] {70, 75, 72}, 120,
                48000);
        LevelBound bound = new LevelBound(cal);
        for (double f : new double[] {125, 300, 1000, 1234.5, 8000}) {
            double a = 0.3;
            double[] x = Synthesis.sine(f, a, 48000, 48000);
            double expected = 20 * Math.log10(a) + cal.fullScaleSineSplDb(f);
            double got = bound.measure(x).levelDbSpl();
            assertTrue(got >= expected, f + " Hz: " + got + " < " + expected);
            // loud side margin: the calibration's rise within ±2 bins (±23.4 Hz) plus the sidelobe constant
            double rise = cal.worstCaseFullScaleSplDb(Math.max(125, f - 2 * 48000.0 / 4096), Math.min(8000, f + 2 * 48000.0 / 4096))
                    - cal.fullScaleSineSplDb(f);
            assertEquals(expected + rise / 2, got, rise / 2 + 0.01, f + " Hz");
        }
    }

    @Test
    void silenceIsMinusInfinity() {
        LevelBound bound = new LevelBound(Calibration.flat("bench", 100, 44100));
        assertEquals(Double.NEGATIVE_INFINITY, bound.measure(new double[5000]).levelDbSpl());
        assertEquals(Double.NEGATIVE_INFINITY, bound.measure(new double[0]).levelDbSpl());
    }

    @Test
    void dcAndOutOfRangeContentCountsAtTheMostSensitivePoint() {
        Calibration cal = new Calibration("narrow", -20, new double[] {1000, 2000}, new double[] {70, 80}, 120, 48000);
        LevelBound bound = new LevelBound(cal);
        double[] dc = new double[48000];
        java.util.Arrays.fill(dc, 0.1);
        // DC of 0.1 has mean square 0.01 = -17 dB re 1/2; weighted at the most sensitive point, 80 + 20 dB
        assertEquals(10 * Math.log10(0.01 / 0.5) + 100, bound.measure(dc).levelDbSpl(), 0.01);
    }
}
