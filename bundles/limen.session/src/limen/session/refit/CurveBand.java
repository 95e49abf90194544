package limen.session.refit;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;

import limen.fit.BinomialData;
import limen.fit.FitResult;
import limen.fit.PsychometricFitter;
import limen.psychometric.PsychometricFunction;

/**
 * A pointwise confidence band around a fitted psychometric function, for drawing: {@code replicates} data
 * sets are simulated from the fitted ψ̂ with the observed values and trial counts (parametric bootstrap,
 * Efron &amp; Tibshirani 1993, ch. 6; Wichmann &amp; Hill 2001b), each is refitted with the fit's own options,
 * and at every grid value the band runs from the (1 - level)/2 to the (1 + level)/2 quantile of the
 * replicate curves ψ*(x). Replicates whose data sit at one proportion in every cell, or that cannot be
 * fitted (not identifiable or invalid), are left out (as {@link limen.fit.Bootstrap} leaves them out of its intervals).
 * <p>
 * The band is for the picture only: the threshold and slope intervals shown with it are those of the
 * refit's own bootstrap ({@link limen.fit.BootstrapResult}), which does not keep its replicate functions.
 * Seeded, so the same fit, grid, count and seed give the same band. Immutable.
 *
 * @param x          the grid values
 * @param lower      the lower edge at each grid value
 * @param upper      the upper edge at each grid value
 * @param level      the confidence level, in (0, 1)
 * @param replicates the replicates that went into the band
 */
public record CurveBand(double[] x, double[] lower, double[] upper, double level, int replicates) {

    public CurveBand {
        if (x.length != lower.length || x.length != upper.length) {
            throw new IllegalArgumentException("grid and edges differ in length: " + x.length + ", " + lower.length + ", " + upper.length);
        }
        if (!(level > 0 && level < 1)) {
            throw new IllegalArgumentException("level must be in (0, 1), was " + level);
        }
        x = x.clone();
        lower = lower.clone();
        upper = upper.clone();
    }

    @Override
    public double[] x() {
        return x.clone();
    }

    @Override
    public double[] lower() {
        return lower.clone();
    }

    @Override
    public double[] upper() {
        return upper.clone();
    }

    /**
     * @param fit        the fit to draw the band around
     * @param grid       the values at which the band is computed
     * @param replicates the number of simulated data sets, at least 2
     * @param seed       seed of the simulation
     * @param level      confidence level in (0, 1)
     * @return the band; when fewer than 2 replicates could be refitted, both edges are NaN
     */
    public static CurveBand of(FitResult fit, double[] grid, int replicates, long seed, double level) {
        if (replicates < 2) {
            throw new IllegalArgumentException("a band needs at least 2 replicates, was " + replicates);
        }
        BinomialData data = fit.data();
        PsychometricFunction generating = fit.function();
        PsychometricFitter fitter = new PsychometricFitter(fit.options());
        SplittableRandom rng = new SplittableRandom(seed);
        List<PsychometricFunction> curves = new ArrayList<>(replicates);
        for (int b = 0; b < replicates; b++) {
            int[] k = new int[data.size()];
            boolean oneProportion = true;
            for (int i = 0; i < k.length; i++) {
                double p = generating.psi(data.value(i));
                for (int t = 0; t < data.trials(i); t++) {
                    if (rng.nextDouble() < p) {
                        k[i]++;
                    }
                }
                if (i > 0 && (double) k[i] / data.trials(i) != (double) k[0] / data.trials(0)) {
                    oneProportion = false;
                }
            }
            if (oneProportion) {
                continue;
            }
            try {
                curves.add(fitter.fit(data.withCorrect(k)).function());
            } catch (IllegalArgumentException e) {
                // left out, as the refit's bootstrap leaves such replicates out
            }
        }
        double[] lo = new double[grid.length];
        double[] hi = new double[grid.length];
        double alpha = (1 - level) / 2;
        double[] at = new double[curves.size()];
        for (int g = 0; g < grid.length; g++) {
            if (curves.size() < 2) {
                lo[g] = Double.NaN;
                hi[g] = Double.NaN;
                continue;
            }
            for (int b = 0; b < at.length; b++) {
                at[b] = curves.get(b).psi(grid[g]);
            }
            Arrays.sort(at);
            lo[g] = quantile(at, alpha);
            hi[g] = quantile(at, 1 - alpha);
        }
        return new CurveBand(grid, lo, hi, level, curves.size());
    }

    /**
     * The p-quantile of sorted values by linear interpolation between order statistics, Hyndman &amp; Fan
     * (1996, The American Statistician 50(4), 361-365) definition 7 (R's default): h = (n - 1) p,
     * Q = x[⌊h⌋] + (h - ⌊h⌋)(x[⌊h⌋ + 1] - x[⌊h⌋]) with 0-based indices.
     */
    public static double quantile(double[] sorted, double p) {
        if (sorted.length == 0 || !(p >= 0 && p <= 1)) {
            throw new IllegalArgumentException("quantile needs values and p in [0, 1], had " + sorted.length + " values, p " + p);
        }
        double h = (sorted.length - 1) * p;
        int j = (int) Math.floor(h);
        if (j >= sorted.length - 1) {
            return sorted[sorted.length - 1];
        }
        return sorted[j] + (h - j) * (sorted[j + 1] - sorted[j]);
    }

    /**
     * @return n values from {@code from} to {@code to}, evenly spaced, on a log scale when {@code log}
     *         (both ends must then be positive)
     */
    public static double[] grid(double from, double to, int n, boolean log) {
        if (n < 2 || !(to > from) || (log && !(from > 0))) {
            throw new IllegalArgumentException("grid needs n >= 2 and from < to (positive on a log scale), was " + n + ", "
                    + from + ", " + to);
        }
        double[] g = new double[n];
        for (int i = 0; i < n; i++) {
            double u = (double) i / (n - 1);
            g[i] = log ? Math.exp(Math.log(from) + u * (Math.log(to) - Math.log(from))) : from + u * (to - from);
        }
        return g;
    }
}
