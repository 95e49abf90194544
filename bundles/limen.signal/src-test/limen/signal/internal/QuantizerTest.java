package limen.signal.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

/**
 * TPDF dither statistics against their definitions (Vanderkooy &amp; Lipshitz 1984; Wannamaker, Lipshitz &amp;
 * Vanderkooy 2000, "A theory of nonsubtractive dither", IEEE Trans. Signal Processing 48(2), 499-516): the
 * difference of two independent U(0,1) variates has the triangular density {@code 1 - |d|} on (-1, 1), mean 0
 * and variance 1/6; with it the quantiser's mean output equals the input (no bias below one LSB) and the
 * total error variance is {@code 1/12 + 1/6 = 1/4} LSB² whatever the input.
 */
class QuantizerTest {

    @Test
    void ditherHasTheTriangularDensity() {
        SplittableRandom rng = new SplittableRandom(1);
        int n = 400_000;
        int[] histogram = new int[20];
        double sum = 0;
        double sumSq = 0;
        for (int i = 0; i < n; i++) {
            double d = Quantizer.tpdf(rng);
            sum += d;
            sumSq += d * d;
            histogram[(int) Math.floor((d + 1) * 10)]++;
        }
        assertEquals(0.0, sum / n, 0.003);
        assertEquals(1.0 / 6, sumSq / n, 0.002);
        for (int b = 0; b < 20; b++) {
            // probability of bin [a, a + 0.1) under 1 - |d|
            double a = -1 + b / 10.0;
            double mid = a + 0.05;
            double p = 0.1 * (1 - Math.abs(mid));
            assertEquals(p, histogram[b] / (double) n, 0.004, "bin " + b);
        }
    }

    @Test
    void ditheredQuantiserIsUnbiasedWithConstantErrorVariance() {
        SplittableRandom rng = new SplittableRandom(2);
        int fs = Quantizer.fullScaleCode(16);
        for (double lsb : new double[] {0.0, 0.25, 0.3, 0.5, 0.77}) {
            double x = (1000 + lsb) / fs;
            int n = 200_000;
            double sum = 0;
            double sumSq = 0;
            for (int i = 0; i < n; i++) {
                double e = Quantizer.quantize(x, 16, Quantizer.tpdf(rng)) - x * fs;
                sum += e;
                sumSq += e * e;
            }
            assertEquals(0.0, sum / n, 0.005, "mean error at +" + lsb + " LSB");
            assertEquals(0.25, sumSq / n - (sum / n) * (sum / n), 0.005, "error variance at +" + lsb + " LSB");
        }
        // without dither a constant 0.3 LSB offset is simply lost (bias -0.3 LSB)
        assertEquals(1000, Quantizer.quantize(1000.3 / fs, 16, 0.0));
    }

    @Test
    void scaleAndClamp() {
        assertEquals(32767, Quantizer.quantize(1.0, 16, 0.0));
        assertEquals(-32767, Quantizer.quantize(-1.0, 16, 0.0));
        assertEquals(32767, Quantizer.quantize(1.0, 16, 0.9));
        assertEquals(-32768, Quantizer.quantize(-1.0, 16, -0.9));
        assertEquals(8388607, Quantizer.quantize(1.0, 24, 0.0));
        assertThrows(IllegalArgumentException.class, () -> Quantizer.fullScaleCode(8));
        assertThrows(IllegalArgumentException.class, () -> Quantizer.interleave(new double[1], new double[1], 16, null));
    }

    @Test
    void interleavesLittleEndian() {
        byte[] pcm = Quantizer.interleave(new double[] {1.0}, new double[] {-1.0 / 8388607}, 24, null);
        assertEquals(6, pcm.length);
        assertEquals((byte) 0xff, pcm[0]);
        assertEquals((byte) 0xff, pcm[1]);
        assertEquals((byte) 0x7f, pcm[2]);
        assertEquals((byte) 0xff, pcm[3]); // -1 = 0xffffff
        assertEquals((byte) 0xff, pcm[5]);
    }
}
