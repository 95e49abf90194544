package limen.fit;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;

import org.apache.commons.math3.analysis.MultivariateFunction;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.SimpleBounds;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.BOBYQAOptimizer;

import limen.fit.internal.NewtonScoring;
import limen.fit.internal.Objective;
import limen.psychometric.PsychometricFunction;

/**
 * Maximum-likelihood fit of ψ(x) = γ + (1 − γ − λ) F(x) to binomial data, after Wichmann &amp; Hill
 * (2001a), Perception &amp; Psychophysics 63(8), 1293-1313: maximise
 * ln L = Σ k_i ln ψ(x_i) + (n_i − k_i) ln(1 − ψ(x_i)) over location, spread and, where free, γ in
 * [0, γmax] and λ in [0, λmax].
 * <p>
 * Method: the parameters are mapped to dimensionless working coordinates (location in units of the data
 * range, log of the scale, γ/γmax, λ/λmax; the Weibull on ln x) inside the box location ∈ centre ± 3 ranges,
 * scale ∈ [range/1000, 100 range]. A grid of {@value #GRID_LOCATIONS} × {@value #GRID_SCALES} locations and
 * scales is evaluated; from the best grid point, from the best one at least {@value #DISTINCT_START}
 * working units away and from the best step ({@code Objective.stepStart}: near-step data can have a mode
 * at the steep end that no smooth start leads to), box-constrained Newton-Raphson with Fisher scoring as
 * safeguard (the fast path, {@code NewtonScoring}) climbs to the maximum, and the best optimum wins; only
 * where it fails from every start Powell's derivative-free bounded optimiser BOBYQA (Commons Math
 * {@link BOBYQAOptimizer}; Powell 2009, Cambridge report DAMTP 2009/NA06) runs from the same starts and
 * takes over. On a flat ridge toward a step the result is put in a normal form ({@link #normalForm}), so
 * that every path to it reports the same function. Cells at 0% and 100% need no special handling
 * (0 ln 0 = 0).
 * <p>
 * Refuses, with {@link NotIdentifiableException}, data with fewer than 2 distinct values or with every
 * cell at the same proportion. Thread-safe: every fit uses its own optimiser.
 */
public final class PsychometricFitter {

    static final int GRID_LOCATIONS = 7;
    static final int GRID_SCALES = 4;
    static final double DISTINCT_START = 0.3;
    private static final double INITIAL_RADIUS = 0.2;
    private static final double STOPPING_RADIUS = 1e-9;
    private static final int MAX_EVALUATIONS = 3000;
    private static final double BOUND_TOLERANCE = 1e-6;
    /** A log-likelihood difference too small to matter (far below the 0.5 of a 1-sd likelihood interval). */
    private static final double FLAT_LOG_LIKELIHOOD = 1e-6;
    /** ln L change that {@link #normalForm} treats as none: rounding of a sum of a few hundred terms. */
    private static final double NORMAL_FORM_FLAT = 1e-9;
    /**
     * Profile curvature of ln L in the log scale below which {@link #normalForm} tries the steep end (a scale
     * the data identify has a curvature of order its information, 1 and more per unit for tens of trials).
     */
    private static final double FLAT_PROFILE_CURVATURE = 1e-4;

    private final FitOptions options;

    public PsychometricFitter(FitOptions options) {
        this.options = Objects.requireNonNull(options, "options");
    }

    public FitOptions options() {
        return options;
    }

    /**
     * @return the maximum-likelihood fit
     * @throws NotIdentifiableException when the data cannot identify the function
     * @throws IllegalArgumentException for data outside the family's domain (the Weibull needs x &gt; 0)
     */
    public FitResult fit(BinomialData data) {
        checkIdentifiable(data);
        return fit(data, null);
    }

    /**
     * Fit without the identifiability refusal (the bootstrap keeps its replicates' bounded optimum) and with
     * an extra start, e.g. the original estimate.
     */
    FitResult fit(BinomialData data, PsychometricFunction extraStart) {
        return fit(data, extraStart, false);
    }

    /**
     * Refit of data close to those that gave {@code warm}: bootstrap replicates simulated from it, jackknife
     * sets that leave one trial out. Newton with scoring climbs from {@code warm} ({@link NewtonScoring#converge});
     * such data have their optimum near it, so this converges in a few steps. The warm result is kept only
     * when it is a clean interior optimum (converged, finite, location and scale strictly inside their search
     * box, the steepest allowed function not as good) or the converged steep end of a ridge toward a step
     * (scale on its lower bound, location inside), no point of the start grid is better, and the climbs from
     * the full search's other starts (the best step, the best grid point at least {@value #DISTINCT_START}
     * from it) do not end higher; those climbs stop as soon as they reach the warm optimum's basin. Otherwise
     * the full search {@link #fit(BinomialData, PsychometricFunction)} with {@code warm} as its extra start
     * decides, taking the ends of the climbs made here (from {@code warm}, and from a start whose climb ended
     * higher) instead of repeating them. Adaptive tracks can have several modes (a steep function with a lapse
     * beside a shallower one without), which is why the other starts are climbed too. A free γ or λ may end on its bound (the
     * projected method holds it there when the score presses outward). BootstrapWarmStartTest checks on many
     * replicates that both paths reach the same optimum.
     */
    FitResult refit(BinomialData data, PsychometricFunction warm) {
        return refit(data, warm, null);
    }

    /**
     * @param grid start-grid terms shared by data with the same values and trials, or null; results are the
     *             same with or without it
     */
    FitResult refit(BinomialData data, PsychometricFunction warm, GridCache grid) {
        Objective objective = new Objective(data, options);
        double[] warmStart = objective.coordinates(warm);
        double[] c = NewtonScoring.converge(objective, warmStart);
        // climbs made here that the full search would repeat: it takes their ends instead
        List<Climbed> climbed = new ArrayList<>(3);
        if (c != null) {
            climbed.add(new Climbed(warmStart, c));
            double v = objective.value(c);
            double[] steepest = c.clone();
            steepest[1] = objective.lowerBounds()[1];
            double vSteepest = objective.value(steepest);
            boolean clean = cleanInteriorOptimum(objective, c, v, vSteepest);
            // cheapest check first: the structure of c, the start grid, then the climbs from the other starts
            if (clean || steepEnd(objective, c, v)) {
                double[][] points = grid(objective, data, grid);
                double[] values = gridValues(objective, data, grid, points);
                if (!(min(values) < v) && !betterFromStep(objective, c, v, climbed)
                        && !betterFromGrid(objective, points, values, c, v, climbed)) {
                    c = normalForm(objective, c, v, vSteepest);
                    PsychometricFunction f = objective.function(c);
                    double[] at = c;
                    // asked for only where someone reads them (not by the bootstrap); the objective is not used again
                    return new FitResult(data, options, f, () -> warnings(objective, at, f, data), objective.evaluations(),
                            false, true);
                }
            }
        }
        return fit(data, warm, false, grid, climbed);
    }

    /**
     * A climb already made on the same data: from {@code start} (working coordinates) to {@code end}. Only
     * climbs that ran to their end (not stopped early in another optimum's basin) are recorded, so the full
     * search loses nothing by taking the end instead of climbing again: from the same start the climb takes
     * the same path, and where it would stop early in its best-so-far's basin, the recorded end is as high or
     * higher.
     */
    private record Climbed(double[] start, double[] end) {
    }

    /** @return a cache of start-grid terms for refits of data with the stimulus values of {@code design} */
    GridCache gridCache(BinomialData design) {
        return new GridCache(design);
    }

    /**
     * The start grid's {@link Objective#logTerms} for one set of stimulus values, by the grid's guess and
     * lapse (which follow the smallest and largest proportions, so a bootstrap meets only a few). Turns the
     * grid's {@value #GRID_LOCATIONS} × {@value #GRID_SCALES} likelihood evaluations of each refit into dot
     * products with the counts. Thread-safe.
     */
    static final class GridCache {
        private final double[] values;
        private final java.util.concurrent.ConcurrentHashMap<java.util.List<Double>, double[][]> terms = new java.util.concurrent.ConcurrentHashMap<>();
        /** {@link #grid} by the grid's guess and lapse (the points do not depend on the counts). */
        private final java.util.concurrent.ConcurrentHashMap<java.util.List<Double>, double[][]> points = new java.util.concurrent.ConcurrentHashMap<>();

        GridCache(BinomialData design) {
            this.values = design.values();
        }
    }

    /**
     * @param points {@link #grid} of these data
     * @return −ln L at every point of {@link #grid}, through {@code cache} when it fits the data
     */
    private double[] gridValues(Objective objective, BinomialData data, GridCache cache, double[][] points) {
        double[] v = new double[points.length];
        if (cache != null && objective.sameValues(cache.values)) {
            double[] gl = gridGuessLapse(data);
            double[][] t = cache.terms.computeIfAbsent(java.util.List.of(gl[0], gl[1]), key -> {
                double[][] all = new double[points.length][];
                for (int p = 0; p < points.length; p++) {
                    all[p] = objective.logTerms(points[p]);
                }
                return all;
            });
            for (int p = 0; p < points.length; p++) {
                v[p] = objective.valueFromLogTerms(t[p]);
            }
            return v;
        }
        for (int p = 0; p < points.length; p++) {
            v[p] = objective.value(points[p]);
        }
        return v;
    }

    private static double min(double[] v) {
        double m = Double.POSITIVE_INFINITY;
        for (double x : v) {
            m = Math.min(m, x);
        }
        return m;
    }

    /**
     * One representative of an optimum on a flat ridge toward a step, so that every path to it (the warm
     * refit, the full search from any start) reports the same function: where the steepest allowed function at
     * c's location fits as well as c to {@value #NORMAL_FORM_FLAT} in ln L, the scale moves to its lower bound;
     * there, where moving the location to the midpoint between the stimulus values on either side of it
     * changes ln L by no more than that either (no cell within the step's rise), the location moves there.
     * Along such a ridge the data cannot tell these functions apart, and the climbs otherwise stop wherever
     * ln L stops improving.
     *
     * @return c, or its normal form
     */
    private static double[] normalForm(Objective objective, double[] c) {
        if (c == null) {
            return null;
        }
        double[] steep = c.clone();
        steep[1] = objective.lowerBounds()[1];
        return normalForm(objective, c, objective.value(c), objective.value(steep));
    }

    /**
     * @param v          −ln L at c
     * @param vSteepest  −ln L at c with the scale on its lower bound
     */
    private static double[] normalForm(Objective objective, double[] c, double v, double vSteepest) {
        double[] lo = objective.lowerBounds();
        double[] steep = c.clone();
        steep[1] = lo[1];
        if (c[1] > lo[1] && !(vSteepest <= v + NORMAL_FORM_FLAT)) {
            // a curved ridge: the location follows the scale; only where the profile is flat in the scale
            if (!(Math.abs(NewtonScoring.scaleProfileCurvature(objective, c)) < FLAT_PROFILE_CURVATURE)) {
                return c;
            }
            steep = NewtonScoring.atSteepEnd(objective, c);
            if (steep == null || !(objective.value(steep) <= v + NORMAL_FORM_FLAT)) {
                return c;
            }
        }
        double[] mid = steep.clone();
        mid[0] = objective.gapMidpoint(steep[0]);
        return objective.value(mid) <= v + NORMAL_FORM_FLAT ? mid : steep;
    }

    /**
     * @return whether c, a converged climb's end, is the steep end of a ridge toward a step: finite, the
     *         location inside its box, the scale at its lower bound
     */
    private static boolean steepEnd(Objective objective, double[] c, double v) {
        if (!Double.isFinite(v)) {
            return false;
        }
        for (double ci : c) {
            if (!Double.isFinite(ci)) {
                return false;
            }
        }
        double[] lo = objective.lowerBounds();
        double[] hi = objective.upperBounds();
        return c[0] > lo[0] + BOUND_TOLERANCE && c[0] < hi[0] - BOUND_TOLERANCE && c[1] <= lo[1] + BOUND_TOLERANCE;
    }

    /**
     * The full search's second start, for a warm refit: from the best start-grid point at least
     * {@value #DISTINCT_START} working units from c, climbs (stopping early in c's basin).
     *
     * @return whether that climb ends higher than c by more than {@value #FLAT_LOG_LIKELIHOOD} in ln L (a
     *         better, smoother optimum elsewhere: the full search decides)
     */
    private static boolean betterFromGrid(Objective objective, double[][] points, double[] values, double[] c, double v,
            List<Climbed> climbed) {
        int other = -1;
        for (int i = 0; i < points.length; i++) {
            if (distance(points[i], c) >= DISTINCT_START && (other < 0 || values[i] < values[other])) {
                other = i;
            }
        }
        if (other < 0) {
            return false;
        }
        double[] p = NewtonScoring.maximise(objective, points[other], values[other], c);
        boolean better = p != null && objective.value(p) < v - FLAT_LOG_LIKELIHOOD;
        if (better) {
            climbed.add(new Climbed(points[other], p)); // higher than c: not stopped in c's basin
        }
        return better;
    }

    /**
     * @return whether the climb from {@link Objective#stepStart} (stopping early in c's basin) ends higher
     *         than c by more than {@value #FLAT_LOG_LIKELIHOOD} in ln L: a mode at the steep end, e.g. a steep
     *         function with a lapse where c is a shallow one without
     */
    private static boolean betterFromStep(Objective objective, double[] c, double v, List<Climbed> climbed) {
        double[] start = objective.stepStart();
        if (start == null) {
            return false;
        }
        double[] p = NewtonScoring.maximise(objective, start, c);
        boolean better = p != null && objective.value(p) < v - FLAT_LOG_LIKELIHOOD;
        if (better) {
            climbed.add(new Climbed(start, p)); // higher than c: not stopped in c's basin
        }
        return better;
    }

    /** @param vSteepest −ln L at c with the scale on its lower bound */
    private static boolean cleanInteriorOptimum(Objective objective, double[] c, double v, double vSteepest) {
        if (!Double.isFinite(v)) {
            return false;
        }
        for (double ci : c) {
            if (!Double.isFinite(ci)) {
                return false;
            }
        }
        double[] lo = objective.lowerBounds();
        double[] hi = objective.upperBounds();
        for (int j = 0; j < 2; j++) {
            if (c[j] <= lo[j] + BOUND_TOLERANCE || c[j] >= hi[j] - BOUND_TOLERANCE) {
                return false;
            }
        }
        return vSteepest > v + FLAT_LOG_LIKELIHOOD;
    }

    /** @param derivativeFreeOnly skip Newton/scoring (tests compare the two optimisers) */
    FitResult fit(BinomialData data, PsychometricFunction extraStart, boolean derivativeFreeOnly) {
        return fit(data, extraStart, derivativeFreeOnly, null, List.of());
    }

    /** @param climbed climbs already made on these data (by a refit), taken instead of climbing again */
    private FitResult fit(BinomialData data, PsychometricFunction extraStart, boolean derivativeFreeOnly, GridCache grid,
            List<Climbed> climbed) {
        Objective objective = new Objective(data, options);
        double[][] starts = allStarts(objective, data, extraStart, grid);
        double[] best = null;
        double bestValue = Double.POSITIVE_INFINITY;
        boolean bestDerivativeFree = false;
        if (!derivativeFreeOnly) {
            for (double[] start : starts) {
                double[] p = endOf(climbed, start);
                if (p == null) {
                    p = NewtonScoring.maximise(objective, start, best);
                }
                double v = p == null ? Double.POSITIVE_INFINITY : objective.value(p);
                if (v < bestValue) {
                    best = p;
                    bestValue = v;
                }
            }
        }
        if (best == null) {
            // Newton failed from every start (singular information, e.g. separated data), or was not wanted
            for (double[] start : starts) {
                double[] p = boundedSearch(objective, start);
                double v = objective.value(p);
                if (v < bestValue) {
                    best = p;
                    bestValue = v;
                    bestDerivativeFree = true;
                }
            }
        }
        best = normalForm(objective, best);
        PsychometricFunction f = objective.function(best);
        return new FitResult(data, options, f, warnings(objective, best, f, data), objective.evaluations(), bestDerivativeFree);
    }

    /** @return the end of the recorded climb from exactly this start, or null */
    private static double[] endOf(List<Climbed> climbed, double[] start) {
        for (Climbed k : climbed) {
            if (Arrays.equals(k.start(), start)) {
                return k.end();
            }
        }
        return null;
    }

    /** @return {@link #starts} and {@link Objective#stepStart} where there is one */
    private double[][] allStarts(Objective objective, BinomialData data, PsychometricFunction extraStart, GridCache cache) {
        double[][] starts = starts(objective, data, extraStart, cache);
        double[] step = objective.stepStart();
        if (step == null) {
            return starts;
        }
        starts = Arrays.copyOf(starts, starts.length + 1);
        starts[starts.length - 1] = step;
        return starts;
    }

    /**
     * @return the best grid point (or the extra start, if better) and the best one at least
     *         {@value #DISTINCT_START} working units from it (absent when every point is closer)
     */
    private double[][] starts(Objective objective, BinomialData data, PsychometricFunction extraStart, GridCache cache) {
        double[][] grid = grid(objective, data, cache);
        int count = grid.length + (extraStart == null ? 0 : 1);
        double[][] points = java.util.Arrays.copyOf(grid, count);
        double[] values = java.util.Arrays.copyOf(gridValues(objective, data, cache, grid), count);
        if (extraStart != null) {
            points[count - 1] = objective.coordinates(extraStart);
            values[count - 1] = objective.value(points[count - 1]);
        }
        int first = 0;
        for (int i = 1; i < count; i++) {
            if (values[i] < values[first]) {
                first = i;
            }
        }
        int second = -1;
        for (int i = 0; i < count; i++) {
            if (distance(points[i], points[first]) >= DISTINCT_START && (second < 0 || values[i] < values[second])) {
                second = i;
            }
        }
        return second < 0 ? new double[][] { points[first] } : new double[][] { points[first], points[second] };
    }

    /**
     * @return the {@value #GRID_LOCATIONS} × {@value #GRID_SCALES} start points in working coordinates, shared
     *         through {@code cache} where there is one (callers do not modify them)
     */
    private double[][] grid(Objective objective, BinomialData data, GridCache cache) {
        if (cache == null) {
            return grid(objective, gridGuessLapse(data));
        }
        double[] gl = gridGuessLapse(data);
        return cache.points.computeIfAbsent(java.util.List.of(gl[0], gl[1]), key -> grid(objective, gl));
    }

    private double[][] grid(Objective objective, double[] gl) {
        double guess0 = gl[0];
        double lapse0 = gl[1];
        double[][] points = new double[GRID_LOCATIONS * GRID_SCALES][];
        int p = 0;
        for (int i = 0; i < GRID_LOCATIONS; i++) {
            double c0 = -0.6 + 1.2 * i / (GRID_LOCATIONS - 1);
            for (int j = 0; j < GRID_SCALES; j++) {
                double c1 = Math.log(0.02) + (Math.log(1.0) - Math.log(0.02)) * j / (GRID_SCALES - 1);
                points[p++] = objective.coordinates(c0, c1, guess0, lapse0);
            }
        }
        return points;
    }

    /** @return the grid's γ and λ: the smallest proportion and 1 − the largest, kept inside their bounds */
    private double[] gridGuessLapse(BinomialData data) {
        double minP = 1;
        double maxP = 0;
        for (int i = 0; i < data.size(); i++) {
            minP = Math.min(minP, data.proportion(i));
            maxP = Math.max(maxP, data.proportion(i));
        }
        // only a free rate enters the coordinates; a fixed one must not split the cache
        double guess0 = options.guessFree() ? clamp(minP, 0.1 * options.guessMax(), 0.9 * options.guessMax()) : 0;
        double lapse0 = options.lapseFree() ? clamp(1 - maxP, 0.1 * options.lapseMax(), 0.9 * options.lapseMax()) : 0;
        return new double[] { guess0, lapse0 };
    }

    /**
     * BOBYQA in the working box. Commons Math's implementation can stop with "trust region step has failed to
     * reduce Q" near a degenerate optimum; then it restarts once with a smaller radius from the best point
     * seen, and otherwise keeps that point.
     */
    private static double[] boundedSearch(Objective objective, double[] start) {
        BestPoint tracked = new BestPoint(objective);
        double radius = INITIAL_RADIUS;
        double[] from = start;
        for (int attempt = 0; attempt < 2; attempt++, radius *= 0.1) {
            int dim = objective.dimension();
            BOBYQAOptimizer optimizer = new BOBYQAOptimizer(2 * dim + 1, radius, STOPPING_RADIUS);
            try {
                return optimizer.optimize(new MaxEval(MAX_EVALUATIONS), new ObjectiveFunction(tracked), GoalType.MINIMIZE,
                        new InitialGuess(from), new SimpleBounds(objective.lowerBounds(), objective.upperBounds())).getPoint();
            } catch (TooManyEvaluationsException e) {
                return tracked.point.clone(); // a flat ridge: the best point met is as good as any
            } catch (MathIllegalStateException e) {
                from = tracked.point.clone();
            }
        }
        return tracked.point.clone();
    }

    /** Remembers the best point an optimiser has evaluated. */
    private static final class BestPoint implements MultivariateFunction {
        private final Objective objective;
        double[] point;
        double value = Double.POSITIVE_INFINITY;

        BestPoint(Objective objective) {
            this.objective = objective;
        }

        @Override
        public double value(double[] c) {
            double v = objective.value(c);
            if (v < value) {
                value = v;
                point = c.clone();
            }
            return v;
        }
    }

    private List<String> warnings(Objective objective, double[] c, PsychometricFunction f, BinomialData data) {
        List<String> w = new ArrayList<>();
        double[] lo = objective.lowerBounds();
        double[] hi = objective.upperBounds();
        if (c[0] <= lo[0] + BOUND_TOLERANCE || c[0] >= hi[0] - BOUND_TOLERANCE) {
            w.add("location " + f.location() + " is at the edge of the search range (3 data ranges beyond the data): "
                    + "the data do not locate the function");
        }
        // Separated data keep improving, ever more slowly, as the scale shrinks; the optimiser stops once the
        // gain is below rounding. So ask directly whether the steepest allowed function fits as well.
        double[] steepest = c.clone();
        steepest[1] = lo[1];
        boolean steepAsGood = objective.value(steepest) <= objective.value(c) + FLAT_LOG_LIKELIHOOD;
        if (c[1] <= lo[1] + BOUND_TOLERANCE || steepAsGood) {
            w.add(f.sigmoid().spreadName() + " " + f.spread() + " is at or near the steep end of the search range: "
                    + "the data are consistent with a step and do not constrain the slope");
        } else if (c[1] >= hi[1] - BOUND_TOLERANCE) {
            w.add(f.sigmoid().spreadName() + " " + f.spread() + " is at the shallow end of the search range: "
                    + "the function is nearly flat over the data");
        }
        if (options.lapseFree() && f.lapse() >= options.lapseMax() * (1 - BOUND_TOLERANCE)) {
            w.add("lapse rate is at its upper bound " + options.lapseMax());
        }
        if (options.guessFree() && f.guess() >= options.guessMax() * (1 - BOUND_TOLERANCE)) {
            w.add("guess rate is at its upper bound " + options.guessMax());
        }
        int distinct = data.distinctValues();
        if (distinct < options.freeParameters()) {
            w.add("only " + distinct + " distinct stimulus values for " + options.freeParameters()
                    + " free parameters: the estimate is not unique");
        }
        if (Double.isNaN(FitResult.thresholdOf(f, options))) {
            w.add("the fitted function does not reach the target proportion " + options.targetPsi() + " (its range is "
                    + f.guess() + " to " + (1 - f.lapse()) + ")");
        }
        return w;
    }

    /**
     * @throws NotIdentifiableException for fewer than 2 distinct values or all cells at one proportion
     */
    static void checkIdentifiable(BinomialData data) {
        if (data.distinctValues() < 2) {
            throw new NotIdentifiableException("the data have " + data.distinctValues()
                    + " distinct stimulus value (" + data.value(0) + "); at least 2 are needed to identify a location and a spread");
        }
        double p = data.proportion(0);
        boolean same = true;
        for (int i = 1; i < data.size() && same; i++) {
            same = data.proportion(i) == p;
        }
        if (same) {
            throw new NotIdentifiableException("every cell has the same proportion correct (" + p
                    + "): the data cannot identify where the function rises");
        }
    }

    private static double distance(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += (a[i] - b[i]) * (a[i] - b[i]);
        }
        return Math.sqrt(s);
    }

    private static double clamp(double v, double lo, double hi) {
        return Math.max(lo, Math.min(hi, v));
    }

    @Override
    public String toString() {
        return "PsychometricFitter[" + options + "]";
    }

    static String describe(double[] c) {
        return Arrays.toString(c);
    }
}
