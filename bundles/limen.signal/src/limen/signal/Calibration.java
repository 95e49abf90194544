package limen.signal;

import java.util.Arrays;
import java.util.Objects;

/**
 * An immutable acoustic calibration of one playback chain (device, transducer, coupler): what sound pressure
 * level a sine at a reference digital level produced at each measured frequency, and the ceiling that no
 * stimulus may exceed.
 * <p>
 * Level convention (AES17-2020, also IEC 61606): 0 dBFS is the RMS level of a sine whose peak reaches digital
 * full scale, so a sine of peak amplitude {@code A} (full scale 1.0) is at {@code 20·log10(A)} dBFS.
 * <p>
 * With {@code S(f)} the measured level (dB SPL) of a sine at the reference level {@code R} dBFS, a sine of
 * frequency {@code f} at {@code D} dBFS gives {@code D - R + S(f)} dB SPL (the chain is taken to be linear).
 * Between calibrated frequencies {@code S} is interpolated linearly on log frequency:
 * {@code S(f) = S_i + (S_{i+1} - S_i)·ln(f/f_i)/ln(f_{i+1}/f_i)}. Frequencies outside
 * {@code [f_min, f_max]} are refused: the calibration says nothing there.
 * <p>
 * This is a plain value type of the signal layer; the session layer converts the model's calibration into it.
 */
public final class Calibration {

    private final String deviceLabel;
    private final double referenceLevelDbfs;
    private final double[] frequenciesHz;
    private final double[] splAtReferenceDb;
    private final double ceilingDbSpl;
    private final int sampleRateHz;
    private final double maxFullScaleSplDb;

    /**
     * @param deviceLabel names the device/transducer chain (shown in messages), not blank
     * @param referenceLevelDbfs the digital level of the calibration sines, in dBFS, finite and {@code <= 0}
     * @param frequenciesHz calibrated frequencies, strictly increasing, {@code > 0} and at most {@code fs/2}
     * @param splAtReferenceDb measured dB SPL at each frequency for a sine at the reference level
     * @param ceilingDbSpl the highest level any stimulus may reach, dB SPL, finite
     * @param sampleRateHz the rate the chain was calibrated at (44100, 48000 or 96000)
     */
    public Calibration(String deviceLabel, double referenceLevelDbfs, double[] frequenciesHz,
            double[] splAtReferenceDb, double ceilingDbSpl, int sampleRateHz) {
        this.deviceLabel = Objects.requireNonNull(deviceLabel, "deviceLabel");
        if (deviceLabel.isBlank()) {
            throw new IllegalArgumentException("device label must not be blank");
        }
        if (!Double.isFinite(referenceLevelDbfs) || referenceLevelDbfs > 0) {
            throw new IllegalArgumentException("reference level must be finite and <= 0 dBFS: "
                    + referenceLevelDbfs + " dBFS");
        }
        this.sampleRateHz = OutputFormat.requireSupportedRate(sampleRateHz);
        this.frequenciesHz = frequenciesHz.clone();
        this.splAtReferenceDb = splAtReferenceDb.clone();
        if (this.frequenciesHz.length == 0 || this.frequenciesHz.length != this.splAtReferenceDb.length) {
            throw new IllegalArgumentException("need at least one calibration point and as many levels as "
                    + "frequencies: " + this.frequenciesHz.length + " frequencies, " + this.splAtReferenceDb.length
                    + " levels");
        }
        double max = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < this.frequenciesHz.length; i++) {
            double f = this.frequenciesHz[i];
            if (!(f > 0) || f > sampleRateHz / 2.0) {
                throw new IllegalArgumentException("calibrated frequency must be > 0 and <= " + sampleRateHz / 2.0
                        + " Hz (Nyquist): " + f + " Hz");
            }
            if (i > 0 && !(f > this.frequenciesHz[i - 1])) {
                throw new IllegalArgumentException("calibrated frequencies must increase strictly: "
                        + this.frequenciesHz[i - 1] + " Hz then " + f + " Hz");
            }
            if (!Double.isFinite(this.splAtReferenceDb[i])) {
                throw new IllegalArgumentException("measured level at " + f + " Hz must be finite: "
                        + this.splAtReferenceDb[i] + " dB SPL");
            }
            max = Math.max(max, this.splAtReferenceDb[i] - referenceLevelDbfs);
        }
        if (!Double.isFinite(ceilingDbSpl)) {
            throw new IllegalArgumentException("ceiling must be finite: " + ceilingDbSpl + " dB SPL");
        }
        this.referenceLevelDbfs = referenceLevelDbfs;
        this.ceilingDbSpl = ceilingDbSpl;
        this.maxFullScaleSplDb = max;
    }

    /**
     * A flat calibration for bench work: a full-scale sine gives {@code fullScaleSplDb} dB SPL at every
     * frequency from 1 Hz to Nyquist; the ceiling is {@code fullScaleSplDb - 3} dB SPL.
     */
    public static Calibration flat(String deviceLabel, double fullScaleSplDb, int sampleRateHz) {
        return flat(deviceLabel, fullScaleSplDb, Double.POSITIVE_INFINITY, sampleRateHz);
    }

    /**
     * A flat calibration with a ceiling of {@code min(ceilingDbSpl, fullScaleSplDb - 3)} dB SPL: a lower
     * ceiling is honoured, a higher one is not (the 3 dB keep full-scale sines out of reach).
     */
    public static Calibration flat(String deviceLabel, double fullScaleSplDb, double ceilingDbSpl, int sampleRateHz) {
        if (!Double.isFinite(fullScaleSplDb)) {
            throw new IllegalArgumentException("full-scale level must be finite: " + fullScaleSplDb + " dB SPL");
        }
        if (Double.isNaN(ceilingDbSpl)) {
            throw new IllegalArgumentException("ceiling must not be NaN");
        }
        double nyquist = OutputFormat.requireSupportedRate(sampleRateHz) / 2.0;
        return new Calibration(deviceLabel, 0.0, new double[] {1.0, nyquist},
                new double[] {fullScaleSplDb, fullScaleSplDb}, Math.min(ceilingDbSpl, fullScaleSplDb - 3.0),
                sampleRateHz);
    }

    /** A copy with another ceiling. */
    public Calibration withCeiling(double newCeilingDbSpl) {
        return new Calibration(deviceLabel, referenceLevelDbfs, frequenciesHz, splAtReferenceDb, newCeilingDbSpl,
                sampleRateHz);
    }

    public String deviceLabel() {
        return deviceLabel;
    }

    public double referenceLevelDbfs() {
        return referenceLevelDbfs;
    }

    /** A copy of the calibrated frequencies. */
    public double[] frequenciesHz() {
        return frequenciesHz.clone();
    }

    /** A copy of the measured levels at the reference level. */
    public double[] splAtReferenceDb() {
        return splAtReferenceDb.clone();
    }

    public double ceilingDbSpl() {
        return ceilingDbSpl;
    }

    public int sampleRateHz() {
        return sampleRateHz;
    }

    public double minFrequencyHz() {
        return frequenciesHz[0];
    }

    public double maxFrequencyHz() {
        return frequenciesHz[frequenciesHz.length - 1];
    }

    /** Whether {@code f} lies in the calibrated range {@code [f_min, f_max]}. */
    public boolean covers(double frequencyHz) {
        return frequencyHz >= minFrequencyHz() && frequencyHz <= maxFrequencyHz();
    }

    /**
     * Refuses a frequency outside the calibrated range.
     *
     * @throws IllegalArgumentException naming the frequency, the range and the calibration
     */
    public void requireCovered(double frequencyHz) {
        if (!covers(frequencyHz)) {
            throw new IllegalArgumentException("frequency " + frequencyHz + " Hz is outside the calibrated range "
                    + minFrequencyHz() + " to " + maxFrequencyHz() + " Hz of calibration '" + deviceLabel + "'");
        }
    }

    /** {@code S(f)}: measured dB SPL of a reference-level sine, interpolated on log frequency. */
    public double splAtReferenceDb(double frequencyHz) {
        requireCovered(frequencyHz);
        return interpolate(frequencyHz);
    }

    /** {@code S(f) - R}: dB SPL of a full-scale (0 dBFS) sine of frequency {@code f}. */
    public double fullScaleSineSplDb(double frequencyHz) {
        return splAtReferenceDb(frequencyHz) - referenceLevelDbfs;
    }

    /** The dBFS level a sine of frequency {@code f} needs to reach {@code levelDbSpl}: {@code L - S(f) + R}. */
    public double dbfsForLevel(double levelDbSpl, double frequencyHz) {
        return levelDbSpl - fullScaleSineSplDb(frequencyHz);
    }

    /** The peak amplitude (full scale 1.0) of a sine of frequency {@code f} at {@code levelDbSpl}. */
    public double sineAmplitude(double levelDbSpl, double frequencyHz) {
        return Math.pow(10.0, dbfsForLevel(levelDbSpl, frequencyHz) / 20.0);
    }

    /** The dB SPL of a sine of frequency {@code f} at {@code levelDbfs}: {@code D - R + S(f)}. */
    public double levelDbSpl(double levelDbfs, double frequencyHz) {
        return levelDbfs + fullScaleSineSplDb(frequencyHz);
    }

    /**
     * Power gain {@code 10^((S(f)-R)/10)}: acoustic power (re (20 µPa)²) per unit digital power, digital power
     * being mean square divided by 1/2 (the mean square of a full-scale sine).
     */
    public double powerGain(double frequencyHz) {
        return Math.pow(10.0, fullScaleSineSplDb(frequencyHz) / 10.0);
    }

    /** The highest full-scale sine level of the calibration, {@code max_i (S_i - R)}: its most sensitive point. */
    public double maxFullScaleSineSplDb() {
        return maxFullScaleSplDb;
    }

    /**
     * A worst-case full-scale sine level over {@code [loHz, hiHz]} for the safety guard: the maximum of the
     * interpolated {@code S(f) - R} over the part inside the calibrated range (exact: the interpolant is
     * linear in log frequency between points, so its maximum sits at an end or a calibration point); parts
     * within one octave outside the range take the nearest end point's value (this covers the analysis smear
     * of sounds at the range's edges; the renderer never puts sound outside the range); anything further out
     * (and 0 Hz) takes the most sensitive point of the whole calibration, since nothing is known there.
     */
    public double worstCaseFullScaleSplDb(double loHz, double hiHz) {
        if (!(loHz <= hiHz)) {
            throw new IllegalArgumentException("empty frequency interval: " + loHz + " to " + hiHz + " Hz");
        }
        double fMin = minFrequencyHz();
        double fMax = maxFrequencyHz();
        if (loHz < fMin / 2 || hiHz > fMax * 2) {
            return maxFullScaleSplDb;
        }
        double a = Math.max(loHz, fMin);
        double b = Math.min(hiHz, fMax);
        double best = Double.NEGATIVE_INFINITY;
        if (a <= b) {
            best = Math.max(interpolate(a), interpolate(b));
            for (int i = 0; i < frequenciesHz.length; i++) {
                if (frequenciesHz[i] > a && frequenciesHz[i] < b) {
                    best = Math.max(best, splAtReferenceDb[i]);
                }
            }
        }
        if (loHz < fMin) {
            best = Math.max(best, splAtReferenceDb[0]);
        }
        if (hiHz > fMax) {
            best = Math.max(best, splAtReferenceDb[splAtReferenceDb.length - 1]);
        }
        return best - referenceLevelDbfs;
    }

    private double interpolate(double f) {
        int n = frequenciesHz.length;
        if (f <= frequenciesHz[0]) {
            return splAtReferenceDb[0];
        }
        if (f >= frequenciesHz[n - 1]) {
            return splAtReferenceDb[n - 1];
        }
        int i = Arrays.binarySearch(frequenciesHz, f);
        if (i >= 0) {
            return splAtReferenceDb[i];
        }
        int hi = -i - 1;
        int lo = hi - 1;
        double t = Math.log(f / frequenciesHz[lo]) / Math.log(frequenciesHz[hi] / frequenciesHz[lo]);
        return splAtReferenceDb[lo] + t * (splAtReferenceDb[hi] - splAtReferenceDb[lo]);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Calibration c && deviceLabel.equals(c.deviceLabel)
                && Double.compare(referenceLevelDbfs, c.referenceLevelDbfs) == 0
                && Arrays.equals(frequenciesHz, c.frequenciesHz) && Arrays.equals(splAtReferenceDb, c.splAtReferenceDb)
                && Double.compare(ceilingDbSpl, c.ceilingDbSpl) == 0 && sampleRateHz == c.sampleRateHz;
    }

    @Override
    public int hashCode() {
        return Objects.hash(deviceLabel, referenceLevelDbfs, Arrays.hashCode(frequenciesHz),
                Arrays.hashCode(splAtReferenceDb), ceilingDbSpl, sampleRateHz);
    }

    @Override
    public String toString() {
        return "Calibration['" + deviceLabel + "', reference " + referenceLevelDbfs + " dBFS, " + frequenciesHz.length
                + " points " + minFrequencyHz() + "-" + maxFrequencyHz() + " Hz, ceiling " + ceilingDbSpl
                + " dB SPL, " + sampleRateHz + " Hz]";
    }
}
