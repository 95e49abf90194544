package limen.signal.internal;

import org.apache.commons.math3.transform.DftNormalization;
import org.apache.commons.math3.transform.FastFourierTransformer;
import org.apache.commons.math3.transform.TransformType;

import limen.signal.Calibration;

/**
 * The safety guard's measurement: an upper estimate of the highest short-time sound pressure level one channel
 * of a buffer produces through a calibration, whatever the buffer holds (no declaration needed).
 * <p>
 * Method (short-time spectrum). Frames of {@code B} samples ({@value #FRAME_SECONDS_NOMINAL} s nominal: 4096
 * samples at 44.1 and 48 kHz, 8192 at 96 kHz), hop {@code B/4}, the first frame starting at sample 0 and the
 * last reaching past the end (zero-padded). Each frame is weighted by the Hann window
 * {@code w[n] = sin²(π(n+1/2)/B)} and transformed (Commons Math radix-2 FFT, {@code X_k}). By Parseval,
 * {@code Σ_k |X_k|² = B·Σ_n (w[n]x[n])²}, so each bin's share of the frame's windowed energy is known exactly;
 * each bin is weighted with the calibration's <em>worst-case</em> power gain over the two bins on either side
 * ({@code G_k = 10^(max_{|f - f_k| <= 2·fs/B} (S(f) - R)/10)}, {@link Calibration#worstCaseFullScaleSplDb}; the
 * Hann main lobe is ±2 bins wide, so a sine's energy lands in bins whose range contains its frequency). The
 * frame's level is
 * <pre>  L = 10·log10( Σ_k c_k·|X_k|²·G_k / (B·Σ_n w[n]²) / (1/2) ),  c_k = 1 at DC and Nyquist, else 2</pre>
 * that is the Hann-time-weighted mean square, in AES17 units (0 dBFS = mean square 1/2 of a full-scale sine),
 * spectrally weighted through the calibration, divided by {@code 1 - }{@link #SIDELOBE_SHARE}; the result is
 * the loudest frame.
 * <p>
 * Accuracy. A steady sine of peak {@code A} at {@code f} reads {@code 20·log10(A) + S(f) - R}, plus at most the
 * calibration's rise within ±2 bins of {@code f} (±23 Hz at 48 kHz): it errs on the loud side. A noise reads
 * its loudest short-time level, which for a narrow band exceeds its long-term level by a dB or more. Content outside
 * the calibrated range is weighted at the nearest calibration point within an octave and at the most
 * sensitive point beyond that (e.g. DC). As on a sound level meter with a time weighting, a sound shorter than
 * a frame reads lower than its steady level would; declared levels are checked exactly by the guard as well.
 */
public final class LevelBound {

    /**
     * Bound on the share of a sine's Hann-windowed energy that falls in bins more than 2 bins from its frequency
     * (the sidelobes): 9.0e-4 at worst over sub-bin offsets, computed by direct DFT (see the test). Dividing by
     * {@code 1 - SIDELOBE_SHARE} makes the reading of a steady sine never low even if every sidelobe bin had zero
     * gain (+0.004 dB).
     */
    public static final double SIDELOBE_SHARE = 1e-3;

    /** Nominal frame length, seconds. */
    public static final double FRAME_SECONDS_NOMINAL = 0.085;

    private final Calibration calibration;
    private final int frame;
    private final int hop;
    private final double[] window;
    private final double windowEnergy;
    private final double[] binGain;
    private final double maxGain;

    /** The loudest frame of one channel: its level, first sample and length. */
    public record Result(double levelDbSpl, int windowStartSample, int windowSamples) {
    }

    public LevelBound(Calibration calibration) {
        this.calibration = calibration;
        double fs = calibration.sampleRateHz();
        this.frame = fs > 48000 ? 8192 : 4096;
        this.hop = frame / 4;
        this.window = new double[frame];
        double e = 0;
        for (int n = 0; n < frame; n++) {
            double s = Math.sin(Math.PI * (n + 0.5) / frame);
            window[n] = s * s;
            e += window[n] * window[n];
        }
        this.windowEnergy = e;
        double df = fs / frame;
        binGain = new double[frame / 2 + 1];
        for (int k = 0; k <= frame / 2; k++) {
            double lo = Math.max(0, (k - 2) * df);
            double hi = Math.min(fs / 2, (k + 2) * df);
            binGain[k] = Math.pow(10, calibration.worstCaseFullScaleSplDb(lo, hi) / 10);
        }
        double g = 0;
        for (double v : binGain) {
            g = Math.max(g, v);
        }
        this.maxGain = g;
    }

    /** Frame length in samples. */
    public int frameSamples() {
        return frame;
    }

    /**
     * Measures one channel.
     *
     * @param x samples, full scale ±1.0, all finite
     * @return the loudest frame; {@code -Infinity} dB SPL for silence
     */
    public Result measure(double[] x) {
        int n = x.length;
        // Frame starts, and each frame's windowed energy E = Σ (w[i] x[start+i])². By Parseval the frame's
        // spectrally weighted level lies between minGain·E and maxGain·E (before the common normalisation), so
        // frames are transformed loudest-first and a frame whose maxGain·E cannot beat the loudest level found
        // so far is skipped: the result is the same maximum as transforming every frame, found with few FFTs.
        int frames = 0;
        for (int start = 0; start == 0 || start + frame - hop < n; start += hop) {
            frames++;
        }
        double[] energy = new double[frames];
        int[] starts = new int[frames];
        int f = 0;
        for (int start = 0; start == 0 || start + frame - hop < n; start += hop, f++) {
            starts[f] = start;
            double e = 0;
            int stop = Math.min(frame, n - start);
            for (int i = 0; i < stop; i++) {
                double v = x[start + i] * window[i];
                e += v * v;
            }
            energy[f] = e;
        }
        Integer[] order = new Integer[frames];
        for (int i = 0; i < frames; i++) {
            order[i] = i;
        }
        java.util.Arrays.sort(order, (a, b) -> Double.compare(energy[b], energy[a]));
        double best = 0;
        int bestStart = 0;
        double[] re = new double[frame];
        double[] im = new double[frame];
        double norm = frame * windowEnergy * 0.5;
        for (int idx : order) {
            double e = energy[idx];
            if (e == 0.0) {
                break; // silent frames (and all after them in this order)
            }
            // upper bound of this frame's level: Σ_k c_k|X_k|² = B·E (Parseval), each bin weighted ≤ maxGain
            double upper = frame * e * maxGain / norm / (1 - SIDELOBE_SHARE);
            if (upper * (1 + 1e-9) < best) {
                break; // no later frame (smaller E) can beat the loudest level found
            }
            int start = starts[idx];
            for (int i = 0; i < frame; i++) {
                int at = start + i;
                re[i] = (at < n ? x[at] : 0.0) * window[i];
                im[i] = 0.0;
            }
            FastFourierTransformer.transformInPlace(new double[][] {re, im}, DftNormalization.STANDARD,
                    TransformType.FORWARD);
            double sum = 0;
            for (int k = 0; k <= frame / 2; k++) {
                double p = (re[k] * re[k] + im[k] * im[k]) * binGain[k];
                sum += (k == 0 || k == frame / 2) ? p : 2 * p;
            }
            double level = sum / norm / (1 - SIDELOBE_SHARE);
            if (level > best || (level == best && start < bestStart)) {
                best = level;
                bestStart = start;
            }
        }
        return new Result(best > 0 ? 10 * Math.log10(best) : Double.NEGATIVE_INFINITY, bestStart,
                Math.min(frame, Math.max(0, n - bestStart)));
    }

    /** The calibration this bound measures through. */
    public Calibration calibration() {
        return calibration;
    }
}
