package limen.fit;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.SplittableRandom;

import limen.fit.internal.BinomialSampler;
import limen.fit.internal.ParallelRunner;
import limen.fit.internal.Quantiles;
import limen.fit.internal.Seeds;
import limen.psychometric.PsychometricFunction;

/**
 * Bootstrap confidence intervals for threshold and slope, and the Monte Carlo goodness of fit, after
 * Wichmann &amp; Hill (2001a,b), Perception &amp; Psychophysics 63(8), 1293-1313 and 1314-1329.
 * <ul>
 * <li>Parametric: replicate b draws k*_i ~ Binomial(n_i, ψ̂(x_i)) from the fitted function and refits with
 * the same options. Nonparametric ({@link BootstrapOptions#withNonparametric}): k*_i ~ Binomial(n_i,
 * k_i/n_i), i.e. resampling each cell's trials with replacement.</li>
 * <li>Intervals: percentile and BCa ({@link IntervalMethod}); BCa's acceleration is the jackknife estimate
 * over single trials (each of the Σn_i trials left out once; trials of one cell and one outcome share one
 * refit), Efron &amp; Tibshirani (1993), ch. 14.</li>
 * <li>Goodness of fit: the deviance of each parametric replicate's refit against the observed deviance
 * ({@link BootstrapResult#goodnessOfFitP()}); with nonparametric resampling a separate set of parametric
 * replicates of the same size is simulated for it.</li>
 * </ul>
 * Replicate b uses a generator seeded by {@link Seeds#derive}(seed, stream, b), so results do not depend on
 * the number of threads. Refits climb from the original estimate alone and fall back to the full search
 * (grid and original estimate as starts) when that warm start does not end at a clean interior optimum
 * ({@code PsychometricFitter.refit}, package-private).
 */
public final class Bootstrap {

    private static final int STREAM_REPLICATES = 0;
    private static final int STREAM_GOODNESS_OF_FIT = 1;

    private final BootstrapOptions options;

    public Bootstrap(BootstrapOptions options) {
        this.options = Objects.requireNonNull(options, "options");
    }

    public BootstrapOptions options() {
        return options;
    }

    /**
     * @param fit      the fit to the observed data
     * @param progress receives (refits done, refits total), from worker threads
     * @param cancel   checked between refits
     * @return replicate distributions, intervals and goodness of fit
     * @throws java.util.concurrent.CancellationException when cancelled
     */
    public BootstrapResult run(FitResult fit, Progress progress, CancellationFlag cancel) {
        PsychometricFitter fitter = new PsychometricFitter(fit.options());
        BinomialData data = fit.data();
        int b = options.samples();
        boolean separateGof = options.nonparametric() && options.goodnessOfFit();
        List<BinomialData> jackknife = new ArrayList<>();
        List<Double> weights = new ArrayList<>();
        jackknifeSets(data, jackknife, weights);
        long total = (long) b + (separateGof ? b : 0) + jackknife.size();
        ParallelRunner runner = new ParallelRunner(options.parallelism(), progress, cancel, total);

        double[] thresholds = new double[b];
        double[] slopes = new double[b];
        double[] deviances = options.goodnessOfFit() ? new double[b] : null;
        PsychometricFunction generating = fit.function();
        // replicates keep the values of the data (and jackknife sets do, except where they empty a cell): they
        // share the start grid's log terms
        PsychometricFitter.GridCache grid = fitter.gridCache(data);
        runner.run(b, i -> {
            BinomialData replicate = simulate(data, generating, options.nonparametric(), Seeds.derive(options.seed(), STREAM_REPLICATES, i));
            FitResult r = fitter.refit(replicate, generating, grid);
            boolean usable = !allOneProportion(replicate);
            thresholds[i] = usable ? r.threshold() : Double.NaN;
            slopes[i] = usable ? r.slope() : Double.NaN;
            if (deviances != null && !options.nonparametric()) {
                deviances[i] = r.deviance();
            }
        });
        if (separateGof) {
            runner.run(b, i -> {
                BinomialData replicate = simulate(data, generating, false, Seeds.derive(options.seed(), STREAM_GOODNESS_OF_FIT, i));
                deviances[i] = fitter.refit(replicate, generating, grid).deviance();
            });
        }
        double[] jackThresholds = new double[jackknife.size()];
        double[] jackSlopes = new double[jackknife.size()];
        runner.run(jackknife.size(), j -> {
            FitResult r = fitter.refit(jackknife.get(j), generating, grid); // unused where the set empties a cell
            jackThresholds[j] = r.threshold();
            jackSlopes[j] = r.slope();
        });
        double[] w = weights.stream().mapToDouble(Double::doubleValue).toArray();
        return new BootstrapResult(fit, options, thresholds, slopes, deviances, acceleration(jackThresholds, w),
                acceleration(jackSlopes, w));
    }

    /** @return one simulated data set with the original values and trial counts */
    static BinomialData simulate(BinomialData data, PsychometricFunction f, boolean nonparametric, long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        int[] k = new int[data.size()];
        for (int i = 0; i < k.length; i++) {
            double p = nonparametric ? data.proportion(i) : f.psi(data.value(i));
            k[i] = BinomialSampler.sample(rng, data.trials(i), p);
        }
        return data.withCorrect(k);
    }

    /** Leave-one-trial-out data sets with their multiplicities; a cell emptied by the removal is dropped. */
    static void jackknifeSets(BinomialData data, List<BinomialData> sets, List<Double> weights) {
        for (int i = 0; i < data.size(); i++) {
            int n = data.trials(i);
            int k = data.correct(i);
            if (k > 0) {
                sets.add(without(data, i, true));
                weights.add((double) k);
            }
            if (k < n) {
                sets.add(without(data, i, false));
                weights.add((double) (n - k));
            }
        }
    }

    private static BinomialData without(BinomialData data, int cell, boolean correctTrial) {
        int size = data.size() - (data.trials(cell) == 1 ? 1 : 0);
        double[] v = new double[size];
        int[] n = new int[size];
        int[] k = new int[size];
        for (int i = 0, j = 0; i < data.size(); i++) {
            int ni = data.trials(i);
            int ki = data.correct(i);
            if (i == cell) {
                ni--;
                ki -= correctTrial ? 1 : 0;
                if (ni == 0) {
                    continue;
                }
            }
            v[j] = data.value(i);
            n[j] = ni;
            k[j] = ki;
            j++;
        }
        return new BinomialData(v, n, k);
    }

    private static double acceleration(double[] values, double[] weights) {
        for (double v : values) {
            if (Double.isNaN(v)) {
                return 0; // a jackknife set that misses the target: no acceleration estimate, BCa reduces to BC
            }
        }
        return Quantiles.acceleration(values, weights);
    }

    static boolean allOneProportion(BinomialData d) {
        for (int i = 1; i < d.size(); i++) {
            if (d.proportion(i) != d.proportion(0)) {
                return false;
            }
        }
        return true;
    }

    @Override
    public String toString() {
        return "Bootstrap[" + options + "]";
    }
}
