package limen.model.validation.internal;

import java.util.Arrays;

import limen.model.Calibration;

/**
 * The calibrated output of a {@link Calibration} as a function of frequency, for range and ceiling checks:
 * the level produced at the reference digital level, interpolated linearly in dB against log frequency between
 * the measured points (as the model documents), and not defined outside them.
 */
final class CalibrationCurve {

    private final double[] frequenciesHz;
    private final double[] levelsDbSpl;
    private final double referenceLevelDbfs;
    private final double nyquistHz;

    private CalibrationCurve(double[] frequenciesHz, double[] levelsDbSpl, double referenceLevelDbfs,
            double nyquistHz) {
        this.frequenciesHz = frequenciesHz;
        this.levelsDbSpl = levelsDbSpl;
        this.referenceLevelDbfs = referenceLevelDbfs;
        this.nyquistHz = nyquistHz;
    }

    /** @return the curve of the calibration's valid points (invalid points have their own diagnostics) */
    static CalibrationCurve of(Calibration calibration) {
        double[][] points = calibration.getPoints().stream()
                .filter(p -> Rules.positive(p.getFrequencyHz()) && Double.isFinite(p.getMeasuredDbSpl()))
                .map(p -> new double[] {p.getFrequencyHz(), p.getMeasuredDbSpl()})
                .sorted((a, b) -> Double.compare(a[0], b[0]))
                .toArray(double[][]::new);
        double[] f = new double[points.length];
        double[] l = new double[points.length];
        for (int i = 0; i < points.length; i++) {
            f[i] = points[i][0];
            l[i] = points[i][1];
        }
        double nyquist = calibration.getSampleRateHz() > 0 ? calibration.getSampleRateHz() / 2.0 : Double.NaN;
        return new CalibrationCurve(f, l, calibration.getReferenceLevelDbfs(), nyquist);
    }

    /** @return half the sample rate in Hz, or NaN when the sample rate is not positive */
    double nyquistHz() {
        return nyquistHz;
    }

    boolean isEmpty() {
        return frequenciesHz.length == 0;
    }

    double lowestHz() {
        return frequenciesHz[0];
    }

    double highestHz() {
        return frequenciesHz[frequenciesHz.length - 1];
    }

    /** @return whether f lies within the calibrated frequencies (relative tolerance 1e-9 for round-off) */
    boolean covers(double frequencyHz) {
        return !isEmpty() && frequencyHz >= lowestHz() * (1 - 1e-9) && frequencyHz <= highestHz() * (1 + 1e-9);
    }

    /**
     * The level a full-scale sine (0 dBFS) would produce: the interpolated level at the reference digital level
     * plus (0 - reference level); L(f) between points f1 &lt; f &lt; f2 is
     * L1 + (L2 - L1) log(f / f1) / log(f2 / f1).
     *
     * @return the full-scale level in dB SPL, or NaN outside the calibrated range
     */
    double fullScaleDbSpl(double frequencyHz) {
        if (!covers(frequencyHz) || !Double.isFinite(referenceLevelDbfs)) {
            return Double.NaN;
        }
        double f = Math.min(Math.max(frequencyHz, lowestHz()), highestHz());
        int i = Arrays.binarySearch(frequenciesHz, f);
        double level;
        if (i >= 0) {
            level = levelsDbSpl[i];
        } else {
            int hi = -i - 1;
            int lo = hi - 1;
            double t = Math.log(f / frequenciesHz[lo]) / Math.log(frequenciesHz[hi] / frequenciesHz[lo]);
            level = levelsDbSpl[lo] + t * (levelsDbSpl[hi] - levelsDbSpl[lo]);
        }
        return level - referenceLevelDbfs;
    }
}
