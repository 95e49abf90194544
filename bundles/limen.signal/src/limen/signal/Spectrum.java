package limen.signal;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.transform.DftNormalization;
import org.apache.commons.math3.transform.FastFourierTransformer;
import org.apache.commons.math3.transform.TransformType;

/**
 * A Hann-windowed amplitude spectrum (Commons Math radix-2 FFT), for measurement, tests and preview plots.
 * <p>
 * The {@code N} samples are multiplied by the Hann window {@code w[n] = sin²(π(n + 1/2)/N)}, zero-padded to
 * the next power of two {@code M >= N} and transformed. {@link #amplitude(int)} is {@code 2|X_k| / Σw}, so a
 * sine of peak {@code A} centred on a bin reads {@code A} (coherent-gain correction); between bins it reads
 * less (scalloping, up to 1.42 dB for Hann without padding).
 * <p>
 * {@link #dominantFrequencyHz()} refines the largest bin to sub-bin accuracy by maximising the windowed
 * spectrum's magnitude {@code |Σ w[n]x[n]e^{-2πifn/fs}|} over frequency between the neighbouring bins (Brent's
 * method, Commons Math): the maximum of the periodogram is the maximum-likelihood frequency of a single tone
 * in white noise (Rife &amp; Boorstyn 1974, IEEE Trans. Inf. Theory 20(5), 591-598).
 */
public final class Spectrum {

    private final double[] windowed;
    private final double sampleRateHz;
    private final int transformLength;
    private final double[] magnitude;
    private final double windowSum;

    private Spectrum(double[] windowed, double sampleRateHz, int transformLength, double[] magnitude,
            double windowSum) {
        this.windowed = windowed;
        this.sampleRateHz = sampleRateHz;
        this.transformLength = transformLength;
        this.magnitude = magnitude;
        this.windowSum = windowSum;
    }

    /** The Hann-windowed spectrum of {@code x} sampled at {@code sampleRateHz}. */
    public static Spectrum of(double[] x, double sampleRateHz) {
        if (x.length < 2) {
            throw new IllegalArgumentException("need at least 2 samples for a spectrum: " + x.length);
        }
        if (!(sampleRateHz > 0)) {
            throw new IllegalArgumentException("sample rate must be positive: " + sampleRateHz);
        }
        int n = x.length;
        int m = Noise.transformLength(n);
        double[] re = new double[m];
        double[] im = new double[m];
        double[] windowed = new double[n];
        double sum = 0;
        for (int i = 0; i < n; i++) {
            double s = Math.sin(Math.PI * (i + 0.5) / n);
            double w = s * s;
            sum += w;
            windowed[i] = w * x[i];
            re[i] = windowed[i];
        }
        FastFourierTransformer.transformInPlace(new double[][] {re, im}, DftNormalization.STANDARD,
                TransformType.FORWARD);
        double[] mag = new double[m / 2 + 1];
        for (int k = 0; k <= m / 2; k++) {
            mag[k] = Math.hypot(re[k], im[k]);
        }
        return new Spectrum(windowed, sampleRateHz, m, mag, sum);
    }

    /** Number of one-sided bins, {@code M/2 + 1}. */
    public int bins() {
        return magnitude.length;
    }

    /** Bin spacing {@code fs/M}, Hz. */
    public double binHz() {
        return sampleRateHz / transformLength;
    }

    /** Frequency of bin {@code k}, Hz. */
    public double frequencyHz(int k) {
        return k * binHz();
    }

    /** Peak-amplitude reading of bin {@code k} ({@code 2|X_k|/Σw}; DC and Nyquist bins {@code |X_k|/Σw}). */
    public double amplitude(int k) {
        double a = magnitude[k] / windowSum;
        return k == 0 || k == magnitude.length - 1 ? a : 2 * a;
    }

    /** {@code 20·log10(amplitude(k))}: the dBFS of a sine that would read the same. */
    public double levelDbfs(int k) {
        return 20 * Math.log10(amplitude(k));
    }

    /** The bin with the largest magnitude (DC excluded unless it is the only content). */
    public int dominantBin() {
        int best = 1;
        for (int k = 2; k < magnitude.length; k++) {
            if (magnitude[k] > magnitude[best]) {
                best = k;
            }
        }
        return magnitude[best] > 0 ? best : 0;
    }

    /** The dominant frequency, refined between the neighbouring bins (see class comment), Hz. */
    public double dominantFrequencyHz() {
        int k = dominantBin();
        if (k == 0) {
            return 0.0;
        }
        double lo = frequencyHz(k - 1);
        double hi = frequencyHz(Math.min(k + 1, magnitude.length - 1));
        UnivariateFunction power = this::windowedPowerAt;
        BrentOptimizer optimizer = new BrentOptimizer(1e-12, 1e-9 * binHz());
        return optimizer.optimize(new MaxEval(200), new UnivariateObjectiveFunction(power), GoalType.MAXIMIZE,
                new SearchInterval(lo, hi, frequencyHz(k))).getPoint();
    }

    /** {@code |Σ w[n]x[n]e^{-2πifn/fs}|²} at any frequency (direct evaluation). */
    public double windowedPowerAt(double frequencyHz) {
        double re = 0;
        double im = 0;
        double step = 2 * Math.PI * frequencyHz / sampleRateHz;
        for (int n = 0; n < windowed.length; n++) {
            double a = step * n;
            re += windowed[n] * Math.cos(a);
            im -= windowed[n] * Math.sin(a);
        }
        return re * re + im * im;
    }

    /**
     * The fraction of the windowed spectrum's power in bins with {@code loHz <= f <= hiHz}: {@code Σ|X_k|²}
     * over those bins divided by the sum over all one-sided bins.
     */
    public double powerFraction(double loHz, double hiHz) {
        double in = 0;
        double all = 0;
        for (int k = 0; k < magnitude.length; k++) {
            double p = magnitude[k] * magnitude[k];
            all += p;
            double f = frequencyHz(k);
            if (f >= loHz && f <= hiHz) {
                in += p;
            }
        }
        return all == 0 ? 0 : in / all;
    }
}
