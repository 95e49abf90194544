package limen.signal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import limen.signal.internal.LevelBound;

/**
 * The single safety gate: every rendered buffer must pass {@link #check(Stimulus)} to become a
 * {@link CheckedStimulus}, the only type that can be written or played.
 * <p>
 * A stimulus is refused ({@link LevelRefusedException}, message with requested and allowed levels) when any
 * of these holds:
 * <ol>
 * <li>a sample is not finite, or its magnitude exceeds 1.0 (it would clip digital full scale);</li>
 * <li>a declared component's level exceeds the ceiling, or the power sum
 *     {@code 10·log10 Σ 10^(L_i/10)} of the declared components sounding at the same time in one ear does;</li>
 * <li>the guard's own measurement of a channel exceeds the ceiling ({@link LevelBound}: the loudest
 *     Hann-weighted short-time frame of about 85 ms, its spectrum weighted bin by bin with the calibration's
 *     most sensitive value near that bin, content far outside the calibrated range at the calibration's most
 *     sensitive point). This check needs no declaration, so a buffer that lies about its content, or declares
 *     none, is still caught. It errs on the loud side (by the calibration's rise within ±2 analysis bins,
 *     ±23 Hz at 48 kHz), so a request within that margin of the ceiling may be refused; like a sound level
 *     meter's time weighting it reads sounds shorter than a frame low, which the declared check covers.</li>
 * </ol>
 * The sample rate must be the calibration's: the calibration says nothing about another rate.
 */
public final class SafetyGuard {

    private final Calibration calibration;
    private final LevelBound bound;

    public SafetyGuard(Calibration calibration) {
        this.calibration = calibration;
        this.bound = new LevelBound(calibration);
    }

    public Calibration calibration() {
        return calibration;
    }

    /**
     * Checks a stimulus and returns it as checked.
     *
     * @throws LevelRefusedException if it is too loud or would clip
     * @throws IllegalArgumentException if its rate is not the calibration's or a declared frequency is outside
     *         the calibrated range
     */
    public CheckedStimulus check(Stimulus stimulus) {
        if (stimulus.sampleRateHz() != calibration.sampleRateHz()) {
            throw new IllegalArgumentException("stimulus at " + stimulus.sampleRateHz() + " Hz but calibration '"
                    + calibration.deviceLabel() + "' was made at " + calibration.sampleRateHz() + " Hz");
        }
        for (int c = 0; c < OutputFormat.CHANNELS; c++) {
            checkClipping(stimulus.channelArray(c), c);
        }
        checkDeclared(stimulus.components());
        double[] measured = new double[OutputFormat.CHANNELS];
        LevelBound.Result first = null;
        for (int c = 0; c < OutputFormat.CHANNELS; c++) {
            double[] x = stimulus.channelArray(c);
            // both ears get the same samples for most stimuli: measure once (same input, same result)
            LevelBound.Result r = c > 0 && java.util.Arrays.equals(x, stimulus.channelArray(0)) ? first
                    : bound.measure(x);
            if (c == 0) {
                first = r;
            }
            measured[c] = r.levelDbSpl();
            if (r.levelDbSpl() > calibration.ceilingDbSpl()) {
                double dominant = dominantHz(x, r.windowStartSample(), r.windowSamples());
                throw refuse("measured level " + db(r.levelDbSpl()) + " dB SPL (loudest frame at "
                        + String.format(Locale.ROOT, "%.3f", r.windowStartSample() / (double) stimulus.sampleRateHz())
                        + " s on the " + side(c) + " channel, around " + String.format(Locale.ROOT, "%.0f", dominant)
                        + " Hz)", r.levelDbSpl());
            }
        }
        return new CheckedStimulus(stimulus, calibration, measured);
    }

    /**
     * The guard's measured level bound of one channel of any stimulus, dB SPL, without refusing anything
     * (for previews and the booth self-test).
     */
    public double measureDbSpl(Stimulus stimulus, int channel) {
        return bound.measure(stimulus.channelArray(channel)).levelDbSpl();
    }

    private void checkClipping(double[] x, int channel) {
        for (int n = 0; n < x.length; n++) {
            double v = x[n];
            if (!(Math.abs(v) <= 1.0)) {
                double peakDbfs = 20 * Math.log10(Math.abs(v));
                String what = Double.isFinite(v) ? "sample magnitude " + Math.abs(v) : "non-finite sample " + v;
                throw new LevelRefusedException(what + " at sample " + n + " on the " + side(channel) + " channel: "
                        + "requested peak " + db(peakDbfs) + " dBFS exceeds the allowed 0.00 dBFS (digital full scale; "
                        + "it would clip)", peakDbfs, 0.0, "dBFS");
            }
        }
    }

    private void checkDeclared(List<Component> components) {
        double ceiling = calibration.ceilingDbSpl();
        for (Component c : components) {
            calibration.requireCovered(c.lowHz());
            calibration.requireCovered(c.highHz());
            if (c.levelDbSpl() > ceiling) {
                throw refuse("requested " + db(c.levelDbSpl()) + " dB SPL for " + c.description() + " at "
                        + c.frequencyText(), c.levelDbSpl());
            }
        }
        for (int channel = 0; channel < OutputFormat.CHANNELS; channel++) {
            List<Component> inEar = new ArrayList<>();
            for (Component c : components) {
                if (c.ear().drives(channel)) {
                    inEar.add(c);
                }
            }
            for (Component first : inEar) {
                // the active set can only grow at a component's start, so checking every start suffices
                double power = 0;
                int count = 0;
                StringBuilder freqs = new StringBuilder();
                for (Component c : inEar) {
                    if (c.activeAt(first.startSample())) {
                        power += Math.pow(10, c.levelDbSpl() / 10);
                        freqs.append(count++ == 0 ? "" : ", ").append(c.frequencyText());
                    }
                }
                double sum = 10 * Math.log10(power);
                if (count > 1 && sum > ceiling) {
                    throw refuse("requested combined " + db(sum) + " dB SPL of " + count + " simultaneous components ("
                            + freqs + ") on the " + side(channel) + " channel", sum);
                }
            }
        }
    }

    private LevelRefusedException refuse(String what, double levelDbSpl) {
        return new LevelRefusedException(what + " exceeds the allowed " + db(calibration.ceilingDbSpl())
                + " dB SPL (ceiling of calibration '" + calibration.deviceLabel() + "')", levelDbSpl,
                calibration.ceilingDbSpl(), "dB SPL");
    }

    private double dominantHz(double[] x, int start, int length) {
        double[] window = java.util.Arrays.copyOfRange(x, start, start + length);
        return Spectrum.of(window, calibration.sampleRateHz()).dominantFrequencyHz();
    }

    private static String side(int channel) {
        return channel == 0 ? "left" : "right";
    }

    private static String db(double v) {
        return String.format(Locale.ROOT, "%.2f", v);
    }
}
