package limen.signal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.apache.commons.math3.stat.descriptive.moment.Kurtosis;
import org.apache.commons.math3.stat.descriptive.moment.Skewness;
import org.junit.jupiter.api.Test;

/** Noises: band edges per IEC 61260-1, pink slope, notch depth, Gaussian statistics, seeded replay. */
class NoiseTest {

    private static final double FS = 48000;

    /** Power of x in [lo, hi] over total, by a periodogram (rectangular window, no padding: n a power of two). */
    private static double bandShare(double[] x, double lo, double hi) {
        double[][] ri = {x.clone(), new double[x.length]};
        org.apache.commons.math3.transform.FastFourierTransformer.transformInPlace(ri,
                org.apache.commons.math3.transform.DftNormalization.STANDARD,
                org.apache.commons.math3.transform.TransformType.FORWARD);
        double in = 0;
        double all = 0;
        for (int k = 1; k < x.length / 2; k++) {
            double p = ri[0][k] * ri[0][k] + ri[1][k] * ri[1][k];
            double f = k * FS / x.length;
            all += p;
            if (f >= lo && f <= hi) {
                in += p;
            }
        }
        return in / all;
    }

    @Test
    void iec61260BandEdges() {
        // IEC 61260-1:2014: G = 10^(3/10); third-octave at 1 kHz has edges 1000·G^(∓1/6)
        assertEquals(1.99526231, OctaveBands.G, 1e-8);
        assertEquals(1000 * Math.pow(10, -0.05), OctaveBands.lowerEdgeHz(1000, 3), 1e-9); // 891.25 Hz
        assertEquals(1000 * Math.pow(10, 0.05), OctaveBands.upperEdgeHz(1000, 3), 1e-9); // 1122.02 Hz
        assertEquals(891.25, OctaveBands.lowerEdgeHz(1000, 3), 0.01);
        assertEquals(1122.02, OctaveBands.upperEdgeHz(1000, 3), 0.01);
        // exact mid-band of the 4 kHz third-octave (x = 6): 1000·G^2 = 3981.07 Hz (nominal "4000")
        assertEquals(3981.07, OctaveBands.midBandHz(6, 3), 0.01);
        // even b: the mid-bands sit between, 1000·G^((2x+1)/(2b)); b = 6, x = 0: 1000·G^(1/12)
        assertEquals(1000 * Math.pow(OctaveBands.G, 1 / 12.0), OctaveBands.midBandHz(0, 6), 1e-9);
    }

    @Test
    void thirdOctaveNoiseHasNoPowerOutsideItsBand() {
        // synthesised with n a power of two, the realised spectrum has exactly no power outside the band edges
        NoiseSpectrum band = NoiseSpectrum.fractionalOctave(1000, 3);
        double[] x = Noise.shaped(new SplittableRandom(3), 65536, FS, band);
        double lo = OctaveBands.lowerEdgeHz(1000, 3);
        double hi = OctaveBands.upperEdgeHz(1000, 3);
        assertEquals(1.0, bandShare(x, lo, hi), 1e-12);
        assertEquals(Noise.FULL_SCALE_SINE_RMS, Levels.rms(x), 1e-12);
        // bins just inside the edges carry power (the band is really filled)
        assertTrue(bandShare(x, lo, lo * 1.02) > 0.005);
        assertTrue(bandShare(x, hi / 1.02, hi) > 0.005);
    }

    @Test
    void truncatedBandNoiseKeepsNearlyAllPowerInBand() {
        // n not a power of two: the kept segment leaks a little (rectangular cut); measured with a Hann spectrum
        double[] x = Noise.shaped(new SplittableRandom(4), 40000, FS, NoiseSpectrum.band(2000, 4000));
        Spectrum s = Spectrum.of(x, FS);
        assertTrue(s.powerFraction(1950, 4050) > 0.999, "in band: " + s.powerFraction(1950, 4050));
    }

    @Test
    void pinkNoiseHasEqualPowerPerOctave() {
        // 1/f density: power in [f, 2f] is lowHz·ln 2 for every octave
        double[] x = Noise.shaped(new SplittableRandom(5), 1 << 18, FS, NoiseSpectrum.pink(100, 12800));
        double first = bandShare(x, 200, 400);
        for (double f = 400; f < 12800; f *= 2) {
            double share = bandShare(x, f, 2 * f);
            assertEquals(0.0, 10 * Math.log10(share / first), 0.3, "octave from " + f + " Hz");
        }
        assertEquals(1.0 / 7, first, 0.01); // seven octaves 100..12800 Hz
    }

    @Test
    void notchedNoiseHasAnEmptyNotch() {
        double[] x = Noise.shaped(new SplittableRandom(6), 65536, FS, NoiseSpectrum.notched(500, 4000, 800, 1250));
        assertEquals(0.0, bandShare(x, 801, 1249), 1e-12);
        assertEquals(1.0, bandShare(x, 500, 4000), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> NoiseSpectrum.notched(500, 4000, 300, 1000));
    }

    @Test
    void whiteNoiseIsGaussian() {
        double[] x = Noise.gaussianWhite(new SplittableRandom(7), 200_000, 0.1);
        assertEquals(0.1, Levels.rms(x), 0.001);
        // normal distribution: skewness 0, excess kurtosis 0 (standard errors √(6/n), √(24/n) ≈ 0.0055, 0.011)
        assertEquals(0.0, new Skewness().evaluate(x), 0.03);
        assertEquals(0.0, new Kurtosis().evaluate(x), 0.06);
    }

    @Test
    void seededNoiseReplays() {
        NoiseSpectrum band = NoiseSpectrum.band(300, 3000);
        assertArrayEquals(Noise.shaped(new SplittableRandom(11), 10000, FS, band),
                Noise.shaped(new SplittableRandom(11), 10000, FS, band));
        assertArrayEquals(Noise.gaussianWhite(new SplittableRandom(11), 100, 1),
                Noise.gaussianWhite(new SplittableRandom(11), 100, 1));
    }

    @Test
    void refusesBandsBeyondNyquistOrWithoutBins() {
        assertThrows(IllegalArgumentException.class,
                () -> Noise.shaped(new SplittableRandom(1), 1000, FS, NoiseSpectrum.band(1000, 30000)));
        assertThrows(IllegalArgumentException.class,
                () -> Noise.shaped(new SplittableRandom(1), 64, FS, NoiseSpectrum.band(1000, 1001)));
    }

    @Test
    void renderedNoiseLevelThroughAFlatCalibration() {
        // flat calibration: level = RMS dBFS + full-scale SPL exactly
        Calibration flat = Calibration.flat("bench", 100, 48000);
        Stimulus s = new StimulusRenderer(flat).render(new Sound.NoiseBurst(NoiseSpectrum.band(500, 5000), 70, 1.0, 0),
                Ear.LEFT, 0, 0, new SplittableRandom(9));
        assertEquals(-30.0, Levels.rmsDbfs(s.channel(0)), 1e-9);
        assertEquals(0.0, Levels.rms(s.channel(1)), 0);
    }
}
