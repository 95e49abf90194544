package limen.signal;

import java.util.Arrays;
import java.util.function.DoubleUnaryOperator;
import java.util.random.RandomGenerator;

import org.apache.commons.math3.transform.DftNormalization;
import org.apache.commons.math3.transform.FastFourierTransformer;
import org.apache.commons.math3.transform.TransformType;

/**
 * Noise generators. Randomness always comes from the caller's generator, so a seeded generator replays the
 * same noise.
 * <p>
 * Shaped noise is made in the frequency domain: for a transform length {@code M} (the next power of two
 * {@code >= n}) every bin {@code k = 1 .. M/2-1} at {@code f_k = k·fs/M} gets an independent complex Gaussian
 * coefficient scaled by {@code sqrt(w(f_k))}, {@code w} the spectrum's relative density; the spectrum is made
 * Hermitian, inverse-transformed (Commons Math radix-2 FFT) and the first {@code n} samples kept. This gives
 * Gaussian noise whose expected power spectrum is {@code w} and which has exactly no power in bins outside
 * the band (DC and Nyquist bins are always empty). The result is scaled to a stated RMS.
 */
public final class Noise {

    /** RMS of a full-scale sine, {@code 1/√2}: the 0 dBFS reference of AES17. */
    public static final double FULL_SCALE_SINE_RMS = Math.sqrt(0.5);

    private Noise() {
    }

    /** Gaussian white noise, independent samples {@code N(0, rms²)}. */
    public static double[] gaussianWhite(RandomGenerator rng, int n, double rms) {
        requireLength(n);
        if (!(rms >= 0) || Double.isInfinite(rms)) {
            throw new IllegalArgumentException("rms must be >= 0 and finite: " + rms);
        }
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = rms * rng.nextGaussian();
        }
        return out;
    }

    /**
     * Gaussian noise of {@code n} samples with the given spectrum, scaled to an RMS of
     * {@link #FULL_SCALE_SINE_RMS} (0 dBFS) over the {@code n} samples.
     *
     * @throws IllegalArgumentException if the band reaches beyond Nyquist or holds no bin of the transform
     */
    public static double[] shaped(RandomGenerator rng, int n, double sampleRateHz, NoiseSpectrum spectrum) {
        requireLength(n);
        requireBand(spectrum, sampleRateHz);
        int m = transformLength(n);
        double[] re = new double[m];
        double[] im = new double[m];
        int bins = 0;
        for (int k = 1; k < m / 2; k++) {
            double w = spectrum.relativeDensity(k * sampleRateHz / m);
            if (w > 0) {
                double a = Math.sqrt(w);
                double x = a * rng.nextGaussian();
                double y = a * rng.nextGaussian();
                re[k] = x;
                im[k] = y;
                re[m - k] = x;
                im[m - k] = -y;
                bins++;
            }
        }
        if (bins == 0) {
            throw new IllegalArgumentException(spectrum.describe() + " holds no frequency bin of a " + m
                    + "-point transform at " + sampleRateHz + " Hz (bin spacing " + sampleRateHz / m
                    + " Hz): widen the band or lengthen the sound");
        }
        FastFourierTransformer.transformInPlace(new double[][] {re, im}, DftNormalization.STANDARD,
                TransformType.INVERSE);
        double[] out = Arrays.copyOf(re, n);
        double sum = 0;
        for (double v : out) {
            sum += v * v;
        }
        double rms = Math.sqrt(sum / n);
        if (!(rms > 0)) {
            throw new IllegalStateException("shaped noise came out silent for " + spectrum.describe());
        }
        double scale = FULL_SCALE_SINE_RMS / rms;
        for (int i = 0; i < n; i++) {
            out[i] *= scale;
        }
        return out;
    }

    /**
     * The density-weighted mean of a gain over exactly the bins {@link #shaped} fills for this length:
     * {@code Σ w(f_k)·g(f_k) / Σ w(f_k)}. With {@code g} a calibration's power gain this is the factor from
     * digital power to acoustic power of the noise (its expected value).
     */
    public static double meanGain(int n, double sampleRateHz, NoiseSpectrum spectrum, DoubleUnaryOperator gain) {
        requireLength(n);
        requireBand(spectrum, sampleRateHz);
        int m = transformLength(n);
        double sw = 0;
        double swg = 0;
        for (int k = 1; k < m / 2; k++) {
            double f = k * sampleRateHz / m;
            double w = spectrum.relativeDensity(f);
            if (w > 0) {
                sw += w;
                swg += w * gain.applyAsDouble(f);
            }
        }
        if (sw == 0) {
            throw new IllegalArgumentException(spectrum.describe() + " holds no frequency bin of a " + m
                    + "-point transform at " + sampleRateHz + " Hz");
        }
        return swg / sw;
    }

    /** The transform length used for {@code n} samples: the next power of two {@code >= max(n, 2)}. */
    public static int transformLength(int n) {
        int m = Integer.highestOneBit(Math.max(n, 2));
        return m < n ? m << 1 : m;
    }

    private static void requireBand(NoiseSpectrum spectrum, double sampleRateHz) {
        if (spectrum.highHz() > sampleRateHz / 2) {
            throw new IllegalArgumentException(spectrum.describe() + " reaches beyond the Nyquist frequency "
                    + sampleRateHz / 2 + " Hz (sampling theorem)");
        }
    }

    private static void requireLength(int n) {
        if (n < 1 || n > (1 << 29)) {
            throw new IllegalArgumentException("noise length must be 1 to 2^29 samples: " + n);
        }
    }
}
