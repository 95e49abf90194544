package limen.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The spectrum of a cos²-gated sine, compared with an independent direct DFT written here (no FFT), and the
 * sidelobe behaviour of the gate against the rectangular gate's sinc (first sidelobe -13.3 dB, Harris 1978,
 * Proc. IEEE 66(1), 51-83, Table I for the rectangular window).
 */
class GatedSpectrumTest {

    private static final double FS = 48000;

    /** Direct DFT magnitude of the Hann-weighted signal at frequency f (the library's window, written again). */
    private static double directHannMagnitude(double[] x, double f) {
        double re = 0;
        double im = 0;
        int n = x.length;
        for (int i = 0; i < n; i++) {
            double s = Math.sin(Math.PI * (i + 0.5) / n);
            double v = s * s * x[i];
            re += v * Math.cos(2 * Math.PI * f * i / FS);
            im -= v * Math.sin(2 * Math.PI * f * i / FS);
        }
        return Math.hypot(re, im);
    }

    /** Direct DFT magnitude (no window) at frequency f. */
    private static double directMagnitude(double[] x, double f) {
        double re = 0;
        double im = 0;
        for (int i = 0; i < x.length; i++) {
            re += x[i] * Math.cos(2 * Math.PI * f * i / FS);
            im -= x[i] * Math.sin(2 * Math.PI * f * i / FS);
        }
        return Math.hypot(re, im);
    }

    @Test
    void fftSpectrumMatchesDirectDft() {
        int n = 4096; // a power of two: the FFT bins are exactly the DFT frequencies k·fs/n
        double[] x = Synthesis.sine(1500, 0.5, n, FS);
        Synthesis.applyCos2Ramps(x, 0, n, 480);
        Spectrum s = Spectrum.of(x, FS);
        double windowSum = 0;
        for (int i = 0; i < n; i++) {
            double w = Math.sin(Math.PI * (i + 0.5) / n);
            windowSum += w * w;
        }
        for (int k : new int[] {0, 5, 100, 127, 128, 129, 130, 200, 1000, 2047}) {
            double expected = directHannMagnitude(x, k * FS / n) / windowSum * (k == 0 ? 1 : 2);
            assertEquals(expected, s.amplitude(k), 1e-9 * Math.max(1, expected), "bin " + k);
        }
    }

    @Test
    void gateSpectraMatchTheirAnalyticForms() {
        // a 100 ms tone at 8 kHz, gated rectangularly and with 10 ms cos² ramps; direct DFT (no analysis window)
        // near the tone against the analytic Fourier transforms of the gates:
        //   rectangular, length T:          |G(Δf)| = T·|sinc(Δf·T)|                       (sinc x = sin πx / πx)
        //   cos² ramps R (a rectangle of T-R convolved with a unit-area half-cosine lobe of width R):
        //                                   |G(Δf)| = (T-R)·|sinc(Δf·(T-R))|·|cos(πΔfR) / (1 - 4Δf²R²)|
        // the sine's line at f + Δf is (A/2)·fs·|G(Δf)|; the image line at -f adds at most
        // |G(2f + Δf)|/|G(Δf)| (for the rectangle Δf/(2f + Δf) by the sinc envelope), which sets the tolerance.
        int n = 4800;
        double t = n / FS;
        double r = 0.01;
        double f0 = 8000;
        double[] rect = Synthesis.sine(f0, 1, n, FS);
        double[] gated = rect.clone();
        Synthesis.applyCos2Ramps(gated, 0, n, (int) (r * FS));
        for (int m : new int[] {1, 3, 8, 17, 30}) { // away from the zeros of cos(πΔfR)
            double dfRect = (m + 0.5) / t; // near the sinc's sidelobe peaks
            double analyticRect = 0.5 * FS * t * Math.abs(Math.sin(Math.PI * dfRect * t) / (Math.PI * dfRect * t));
            double imageShare = dfRect / (2 * f0 + dfRect);
            assertEquals(20 * Math.log10(analyticRect), 20 * Math.log10(directMagnitude(rect, f0 + dfRect)),
                    20 * Math.log10(1 + imageShare) + 0.01,
                    "rectangular gate at +" + dfRect + " Hz");
            double tr = t - r;
            double df = (m + 0.5) / tr;
            double analytic = 0.5 * FS * tr * Math.abs(Math.sin(Math.PI * df * tr) / (Math.PI * df * tr))
                    * Math.abs(Math.cos(Math.PI * df * r) / (1 - 4 * df * df * r * r));
            assertEquals(20 * Math.log10(analytic), 20 * Math.log10(directMagnitude(gated, f0 + df)), 0.05,
                    "cos² gate at +" + df + " Hz");
        }
        // the rectangular gate's first sidelobe is -13.26 dB (Harris 1978, Table I)
        double peakRect = directMagnitude(rect, f0);
        double firstSidelobe = 0;
        for (double df = 10; df <= 20; df += 0.05) {
            firstSidelobe = Math.max(firstSidelobe, directMagnitude(rect, f0 + df));
        }
        assertEquals(-13.26, 20 * Math.log10(firstSidelobe / peakRect), 0.05);
        // 405 Hz away the cos² gate is far below the rectangular one, by as much as the analytic forms say
        double rectFar = directMagnitude(rect, f0 + 405) / peakRect;
        double gatedFar = directMagnitude(gated, f0 + 405) / directMagnitude(gated, f0);
        double tr = t - r;
        double analyticRect = Math.abs(Math.sin(Math.PI * 405 * t) / (Math.PI * 405 * t));
        double analyticGated = Math.abs(Math.sin(Math.PI * 405 * tr) / (Math.PI * 405 * tr))
                * Math.abs(Math.cos(Math.PI * 405 * r) / (1 - 4 * 405.0 * 405.0 * r * r));
        double measuredDb = 20 * Math.log10(gatedFar / rectFar);
        assertEquals(20 * Math.log10(analyticGated / analyticRect), measuredDb, 0.3);
        assertTrue(measuredDb < -30, "cos² vs rectangular gate 405 Hz off: " + measuredDb + " dB");
    }

    @Test
    void analyticSpectrumOfTheGate() {
        // analytic check: the DFT at the tone's own frequency of a gated sine is (A/2)·Σ g[n] (the 2f term is
        // negligible for 10 cycles per ramp and more); Σ g over a cos² gate = n - 2R + 2·Σ_{i<R} sin²(πi/2R),
        // and Σ_{i<R} sin²(πi/2R) = R/2 - (1/2)·Σ_{i<R} cos(πi/R) = (R - 1)/2, so Σ g = n - R - 1
        int n = 9600;
        int r = 960;
        double[] x = Synthesis.sine(2000, 0.8, n, FS);
        Synthesis.applyCos2Ramps(x, 0, n, r);
        double expected = 0.8 / 2 * (n - r - 1);
        assertEquals(expected, directMagnitude(x, 2000), 1e-6 * expected);
    }

    @Test
    void dominantFrequencyToSubBinAccuracy() {
        // Rife & Boorstyn (1974): the periodogram maximum is the ML frequency of one tone; bins are 11.7 Hz
        for (double f : new double[] {440.0, 1001.37, 3333.3, 12345.6}) {
            double[] x = Synthesis.sine(f, 0.3, 4000, FS);
            assertEquals(f, Spectrum.of(x, FS).dominantFrequencyHz(), 0.01, "tone " + f);
        }
        double[] x = Synthesis.sine(1001.37, 0.3, 48000, FS);
        Synthesis.applyCos2Ramps(x, 0, x.length, 2400);
        assertEquals(1001.37, Spectrum.of(x, FS).dominantFrequencyHz(), 1e-4);
    }
}
