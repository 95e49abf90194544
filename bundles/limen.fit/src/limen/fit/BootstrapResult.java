package limen.fit;

import java.util.Arrays;

import limen.fit.internal.Quantiles;

/**
 * Replicate distributions of threshold and slope from a {@link Bootstrap}, their percentile and BCa
 * intervals, and the Monte Carlo goodness of fit. Immutable.
 * <p>
 * Replicates whose simulated data have every cell at one proportion (nothing to locate) or whose fitted
 * function does not reach the target are left out of the intervals and counted in
 * {@link #excludedReplicates()}.
 */
public final class BootstrapResult {

    private final FitResult fit;
    private final BootstrapOptions options;
    private final double[] thresholds;
    private final double[] slopes;
    private final double[] deviances;
    private final double thresholdAcceleration;
    private final double slopeAcceleration;
    private final int excluded;

    BootstrapResult(FitResult fit, BootstrapOptions options, double[] thresholds, double[] slopes, double[] deviances,
            double thresholdAcceleration, double slopeAcceleration) {
        this.fit = fit;
        this.options = options;
        double[] t = Arrays.stream(thresholds).filter(v -> !Double.isNaN(v)).sorted().toArray();
        double[] s = Arrays.stream(slopes).filter(v -> !Double.isNaN(v)).sorted().toArray();
        this.excluded = thresholds.length - t.length;
        this.thresholds = t;
        this.slopes = s;
        this.deviances = deviances == null ? null : Arrays.stream(deviances).filter(v -> !Double.isNaN(v)).sorted().toArray();
        this.thresholdAcceleration = thresholdAcceleration;
        this.slopeAcceleration = slopeAcceleration;
    }

    public FitResult fit() {
        return fit;
    }

    public BootstrapOptions options() {
        return options;
    }

    /** @return the usable replicate thresholds, sorted ascending (a copy) */
    public double[] thresholds() {
        return thresholds.clone();
    }

    /** @return the usable replicate slopes, sorted ascending (a copy) */
    public double[] slopes() {
        return slopes.clone();
    }

    /** @return deviances of the goodness-of-fit simulations, sorted (a copy); empty when it was not run */
    public double[] simulatedDeviances() {
        return deviances == null ? new double[0] : deviances.clone();
    }

    /** @return replicates left out of the intervals */
    public int excludedReplicates() {
        return excluded;
    }

    /** @return the threshold interval at {@link BootstrapOptions#level()} */
    public ConfidenceInterval thresholdInterval(IntervalMethod method) {
        return interval(thresholds, fit.threshold(), thresholdAcceleration, method);
    }

    /** @return the slope interval at {@link BootstrapOptions#level()} */
    public ConfidenceInterval slopeInterval(IntervalMethod method) {
        return interval(slopes, fit.slope(), slopeAcceleration, method);
    }

    /** @return the sample standard deviation of the replicate thresholds */
    public double thresholdStandardError() {
        return standardDeviation(thresholds);
    }

    /** @return the sample standard deviation of the replicate slopes */
    public double slopeStandardError() {
        return standardDeviation(slopes);
    }

    /** @return the jackknife acceleration a used by BCa for the threshold */
    public double thresholdAcceleration() {
        return thresholdAcceleration;
    }

    /** @return the jackknife acceleration a used by BCa for the slope */
    public double slopeAcceleration() {
        return slopeAcceleration;
    }

    /**
     * Monte Carlo goodness of fit (Wichmann &amp; Hill 2001a): the proportion of data sets simulated from the
     * fitted ψ and refitted whose deviance D* is at least the observed D, as (1 + #{D* ≥ D}) / (B + 1)
     * (Davison &amp; Hinkley 1997, Bootstrap Methods and their Application, ch. 4).
     *
     * @return the p-value, or NaN when the goodness of fit was not run
     */
    public double goodnessOfFitP() {
        if (deviances == null || deviances.length == 0) {
            return Double.NaN;
        }
        int atLeast = 0;
        for (double d : deviances) {
            if (d >= fit.deviance()) {
                atLeast++;
            }
        }
        return (1.0 + atLeast) / (deviances.length + 1.0);
    }

    private ConfidenceInterval interval(double[] sorted, double estimate, double acceleration, IntervalMethod method) {
        double alpha = (1 - options.level()) / 2;
        if (sorted.length < 2 || Double.isNaN(estimate)) {
            return new ConfidenceInterval(Double.NaN, Double.NaN, options.level(), method);
        }
        double pLo = alpha;
        double pHi = 1 - alpha;
        if (method == IntervalMethod.BCA) {
            double z0 = Quantiles.biasCorrection(sorted, estimate);
            if (Double.isInfinite(z0)) {
                return new ConfidenceInterval(Double.NaN, Double.NaN, options.level(), method);
            }
            pLo = Quantiles.bcaLevel(z0, acceleration, alpha);
            pHi = Quantiles.bcaLevel(z0, acceleration, 1 - alpha);
        }
        return new ConfidenceInterval(Quantiles.quantile(sorted, pLo), Quantiles.quantile(sorted, pHi), options.level(), method);
    }

    private static double standardDeviation(double[] v) {
        if (v.length < 2) {
            return Double.NaN;
        }
        double mean = Arrays.stream(v).average().orElse(Double.NaN);
        double ss = 0;
        for (double x : v) {
            ss += (x - mean) * (x - mean);
        }
        return Math.sqrt(ss / (v.length - 1));
    }

    @Override
    public String toString() {
        return "BootstrapResult[" + options + ", threshold " + thresholdInterval(IntervalMethod.PERCENTILE) + ", slope "
                + slopeInterval(IntervalMethod.PERCENTILE) + ", gof p " + goodnessOfFitP() + ", excluded " + excluded + "]";
    }
}
