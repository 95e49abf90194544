package limen.fit.internal;

/**
 * Box-constrained Newton-Raphson on ln L with Fisher scoring as its safeguard. Each iteration solves
 * J δ = g with the observed information J (minus the Hessian) where J is positive definite, else I δ = g
 * with the expected information I (Fisher scoring; for a binomial GLM this is iteratively reweighted least
 * squares, McCullagh &amp; Nelder 1989, Generalized Linear Models, 2nd ed., §2.5), on the coordinates not
 * held at a bound (a coordinate is held when it sits on a bound and the score pushes outward, the
 * active-set rule of projected Newton methods, Bertsekas 1982, SIAM J. Control Optim. 20(2), 221-246). The
 * step is shortened to at most {@value #MAX_STEP} working units, projected onto the box and halved until −ln L decreases (a scoring step that succeeds at once is
 * doubled while −ln L keeps decreasing). Newton converges quadratically near the
 * optimum, where scoring alone can crawl when the data fit poorly. Linear solves use {@link SmallCholesky}
 * (checked against Commons Math's {@code CholeskyDecomposition}).
 * <p>
 * Where both matrices are singular (the function has become a step, or has left the data) it climbs along the
 * score instead, with the same line search, until a bound holds the degenerate coordinate; and it stops where
 * ln L gains less than {@value #STALL_GAIN} over {@value #STALL_WINDOW} iterations (a ridge toward a step,
 * along which no data can distinguish the functions).
 * <p>
 * This is the fast path. It gives up (returns null) when no halving
 * decreases the objective before convergence, or after {@value #MAX_ITERATIONS} iterations; the caller then
 * uses the derivative-free bounded optimiser.
 */
public final class NewtonScoring {

    static final int MAX_ITERATIONS = 100;
    static final double SAME_BASIN = 1e-3;
    private static final double STEP_TOLERANCE = 1e-10;
    private static final int MAX_HALVINGS = 40;
    private static final int MAX_EXPANSIONS = 12;
    /** |∂ ln L / ∂c| below this (log-likelihood units per working unit) counts as stationary. */
    private static final double SCORE_TOLERANCE = 1e-9;
    private static final double ASCENT_STEP = 0.05;
    private static final int STALL_WINDOW = 5;
    private static final int HISTORY = STALL_WINDOW + 1;
    /** Longest step (largest component, in working units) tried before halving. */
    private static final double MAX_STEP = 0.5;
    /** Gain of ln L over {@value #STALL_WINDOW} iterations below which the climb stops (a flat ridge). */
    private static final double STALL_GAIN = 1e-10;
    /**
     * Largest component (working units) of a Newton step (J positive definite) that ends the climb: the step is
     * taken without a line search and the climb returns. Newton converges quadratically there, so the point
     * is the optimum to about the square of this; ln L no longer changes in double precision, and a line
     * search would only halve steps that rounding cannot tell apart, while on a flat ridge the score can stay
     * far above {@link #SCORE_TOLERANCE} (Nocedal &amp; Wright 2006, Numerical Optimization, 2nd ed., Theorem 3.5).
     */
    private static final double NEWTON_STEP = 1e-6;
    /** Largest move (working units) over {@value #STALL_WINDOW} stalled iterations that still counts as converged. */
    private static final double STALLED_MOVE = 1e-6;
    /**
     * Gain of ln L over {@value #STALL_WINDOW} iterations below which a climb that cannot take Newton steps and
     * presses toward steeper functions tries the steep end of the ridge ({@link #steepEnd}).
     */
    private static final double RIDGE_GAIN = 1e-4;
    /** Smallest multiple of the expected information's diagonal added to J in {@link #modifiedNewton}. */
    private static final double MODIFIED_TAU_MIN = 1e-3;
    private static final int MODIFIED_TRIES = 4;
    /** Attempts at the steep end per climb. */
    private static final int MAX_JUMPS = 2;

    private NewtonScoring() {
    }

    /**
     * @param known an optimum found from another start, or null: once the iterate comes within
     *              {@value #SAME_BASIN} of it the climb stops early and returns the iterate (it would end there)
     * @return the maximiser in working coordinates, or null when the method failed
     */
    public static double[] maximise(Objective objective, double[] start, double[] known) {
        return climb(objective, start, known, false, MAX_JUMPS, false, Double.NaN);
    }

    /**
     * {@link #maximise(Objective, double[], double[])} from a start inside the box whose −ln L the caller already
     * has (e.g. from shared log terms, which give the same double as {@link Objective#value}).
     */
    public static double[] maximise(Objective objective, double[] start, double startValue, double[] known) {
        return climb(objective, start, known, false, MAX_JUMPS, false, startValue);
    }

    /**
     * The warm start of a refit from a nearby optimum (e.g. a bootstrap replicate from the estimate that
     * generated it): the same climb, but it reports success only on convergence, i.e. at a stationary point
     * of the free coordinates, with every held coordinate pressing against its bound, once the step has
     * shrunk below rounding, after a Newton step shorter than {@value #NEWTON_STEP}, or where ln L has gained less than {@value #STALL_GAIN} over {@value #STALL_WINDOW}
     * iterations while the iterate moved less than {@value #STALLED_MOVE}. A climb that creeps along a ridge, meets singular information (both matrices not
     * positive definite), runs out of iterations or cannot decrease −ln L returns null, so the caller can
     * fall back to the full multi-start search.
     *
     * @return the converged maximiser in working coordinates, or null
     */
    public static double[] converge(Objective objective, double[] start) {
        return climb(objective, start, null, true);
    }

    private static double[] climb(Objective objective, double[] start, double[] known, boolean convergedOnly) {
        return climb(objective, start, known, convergedOnly, MAX_JUMPS, false, Double.NaN);
    }

    /**
     * @param jumps     attempts left at {@link #steepEnd} (a climb started there makes none)
     * @param holdScale keep the scale coordinate where it starts (the steep end's first climb)
     * @param startValue −ln L at start, or NaN to evaluate it (used only where start lies inside the box)
     */
    private static double[] climb(Objective objective, double[] start, double[] known, boolean convergedOnly, int jumps,
            boolean holdScale, double startValue) {
        int dim = objective.dimension();
        double[] lo = objective.lowerBounds();
        double[] hi = objective.upperBounds();
        double[] c = start.clone();
        boolean inside = true;
        for (int j = 0; j < dim; j++) {
            c[j] = Math.max(lo[j], Math.min(hi[j], c[j]));
            inside &= c[j] == start[j];
        }
        double value = inside && !Double.isNaN(startValue) ? startValue : objective.value(c);
        double[] score = new double[dim];
        double[][] expected = new double[dim][dim];
        double[][] observed = new double[dim][dim];
        double[] trial = new double[dim];
        // −ln L at the start of the last STALL_WINDOW + 1 iterations (ring: iteration i at i % HISTORY)
        double[] history = new double[HISTORY];
        Workspace ws = new Workspace(dim);
        boolean[] held = new boolean[dim];
        history[0] = value;
        // iterates of the last STALL_WINDOW + 1 iterations (ring), to tell a converged stall from a creep
        double[][] recent = convergedOnly ? new double[HISTORY][dim] : null;
        for (int iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
            if (recent != null) {
                System.arraycopy(c, 0, recent[iteration % HISTORY], 0, dim);
            }
            if (iteration >= STALL_WINDOW && history[(iteration - STALL_WINDOW) % HISTORY] - value < STALL_GAIN) {
                // a ridge along which ln L still creeps up (a near-step function): no data can tell these apart;
                // or an optimum where the last steps gain only rounding, which a warm start accepts when the
                // iterate has stopped moving
                if (!convergedOnly) {
                    return c;
                }
                double[] before = recent[(iteration - STALL_WINDOW) % HISTORY];
                return distance(c, before) < STALLED_MOVE ? c : null;
            }
            objective.scoreAndInformation(c, score, expected, observed);
            if (!finite(score)) {
                return null; // ψ has saturated at 0 or 1 where the cell has the other outcome: no usable direction
            }
            int free = 0;
            for (int j = 0; j < dim; j++) {
                held[j] = (c[j] <= lo[j] && score[j] < 0) || (c[j] >= hi[j] && score[j] > 0) || (holdScale && j == 1);
                free += held[j] ? 0 : 1;
            }
            if (free == 0 || freeScore(score, held) < SCORE_TOLERANCE) {
                return c; // every coordinate at a bound it presses against, or a stationary point
            }
            double[] step = solve(observed, score, held, free, ws);
            if (step != null && maxAbs(step) < NEWTON_STEP) {
                // J positive definite and a tiny Newton step: its end is the optimum to rounding
                for (int j = 0; j < dim; j++) {
                    c[j] = Math.max(lo[j], Math.min(hi[j], c[j] + step[j]));
                }
                return c;
            }
            if (step == null) {
                step = modifiedNewton(observed, expected, score, held, free, ws);
            }
            boolean scoring = step == null;
            if (scoring) {
                step = solve(expected, score, held, free, ws);
            }
            boolean singular = step == null;
            if (jumps > 0 && score[1] < 0 && c[1] > lo[1] && (singular || (step[1] < 0 && iteration >= STALL_WINDOW
                    && history[(iteration - STALL_WINDOW) % HISTORY] - value < RIDGE_GAIN))) {
                // on a ridge toward a step, where the information is singular (one cell holds the function) or
                // the climb creeps: try the ridge's end, at the steepest allowed function
                jumps--;
                double[] end = steepEnd(objective, c, value, convergedOnly);
                if (end != null && objective.value(end) <= value) {
                    return end;
                }
            }
            if (step == null && convergedOnly) {
                return null; // a degenerate function (a step, or one that has left the data): the full search decides
            }
            if (step == null) {
                // both matrices singular: the function has turned into a step or left the data, where every
                // cell's derivative vanishes; climb along the score until a bound holds the degenerate coordinate
                step = ascentStep(score, held);
            }
            double size = maxAbs(step);
            if (size > MAX_STEP) {
                // a nearly singular matrix gives huge steps that the halving would only whittle down
                for (int j = 0; j < dim; j++) {
                    step[j] *= MAX_STEP / size;
                }
                size = MAX_STEP;
            }
            boolean improved = false;
            double t = 1;
            for (int h = 0; h < MAX_HALVINGS && !improved; h++, t *= 0.5) {
                for (int j = 0; j < dim; j++) {
                    trial[j] = Math.max(lo[j], Math.min(hi[j], c[j] + t * step[j]));
                }
                double v = objective.value(trial);
                if (v <= value) {
                    improved = true;
                    double moved = 0;
                    for (int j = 0; j < dim; j++) {
                        moved = Math.max(moved, Math.abs(trial[j] - c[j]));
                    }
                    if (scoring && h == 0) {
                        // away from the optimum scoring steps can be far too short (poorly fitting data, a
                        // ridge near a bound): keep doubling while the objective keeps falling
                        v = expand(objective, c, step, trial, v, lo, hi);
                    }
                    System.arraycopy(trial, 0, c, 0, dim);
                    boolean stalled = value - v <= 1e-15 * Math.abs(value);
                    value = v;
                    if (size < STEP_TOLERANCE || (moved < STEP_TOLERANCE && stalled)) {
                        return c;
                    }
                    if (known != null && distance(c, known) < SAME_BASIN) {
                        return c;
                    }
                }
            }
            history[(iteration + 1) % HISTORY] = value;
            if (!improved) {
                // no decrease along the step: at an optimum only if the step was already tiny (rounding)
                return size < 1e-7 ? c : null;
            }
        }
        return null;
    }

    /**
     * @return c moved to the steep end (scale at its lower bound) and climbed there with the scale held
     *         (location and free rates re-optimised), or null when that climb fails
     */
    public static double[] atSteepEnd(Objective objective, double[] c) {
        return climb(objective, objective.steepEndOfRidge(c), null, false, 0, true, Double.NaN);
    }

    /**
     * The curvature of the profile log-likelihood in the scale coordinate at c, the other free coordinates
     * re-optimised: the Schur complement J_ss − J_s,r J_r,r⁻¹ J_r,s of the observed information J (free
     * coordinates r: not the scale, not on a bound). Near 0 on a ridge along which the function can steepen
     * without changing ln L.
     *
     * @return the curvature, or NaN where J_r,r is not positive definite
     */
    public static double scaleProfileCurvature(Objective objective, double[] c) {
        int dim = objective.dimension();
        double[] score = new double[dim];
        double[][] expected = new double[dim][dim];
        double[][] observed = new double[dim][dim];
        objective.scoreAndInformation(c, score, expected, observed);
        double[] lo = objective.lowerBounds();
        double[] hi = objective.upperBounds();
        int[] rest = new int[dim];
        int m = 0;
        for (int j = 0; j < dim; j++) {
            if (j != 1 && c[j] > lo[j] && c[j] < hi[j]) {
                rest[m++] = j;
            }
        }
        double[][] a = new double[m][m];
        double[] x = new double[m];
        for (int p = 0; p < m; p++) {
            x[p] = observed[rest[p]][1];
            for (int q = 0; q < m; q++) {
                a[p][q] = observed[rest[p]][rest[q]];
            }
        }
        if (m > 0 && !SmallCholesky.solveInPlace(a, x, m)) {
            return Double.NaN;
        }
        double schur = observed[1][1];
        for (int p = 0; p < m; p++) {
            schur -= observed[1][rest[p]] * x[p];
        }
        return schur;
    }

    /**
     * The end of a ridge toward a step: {@link Objective#steepEndOfRidge} (the scale at its lower bound, the
     * location moved along the ridge), the climb over the other coordinates with the scale held there, then
     * the free climb (without further jumps), which keeps the scale there while the score presses toward
     * steeper functions.
     *
     * @return the optimum reached from there, or null when that climb failed
     */
    private static double[] steepEnd(Objective objective, double[] c, double value, boolean convergedOnly) {
        // along the ridge the location follows the scale: start where the cell that holds the function keeps
        // its place on it, then the other coordinates with the scale held
        double[] end = climb(objective, objective.steepEndOfRidge(c), null, false, 0, true, Double.NaN);
        if (end == null || !(objective.value(end) <= value)) {
            return null;
        }
        double[] free = climb(objective, end, null, convergedOnly, 0, false, Double.NaN);
        return free != null || convergedOnly ? free : end;
    }

    /**
     * Tries c + 2t·step, 4t·step, ... (projected) while each lowers the objective; leaves the best in trial.
     *
     * @return the objective at trial
     */
    private static double expand(Objective objective, double[] c, double[] step, double[] trial, double value,
            double[] lo, double[] hi) {
        double[] next = new double[c.length];
        double t = 1;
        for (int e = 0; e < MAX_EXPANSIONS; e++) {
            t *= 2;
            for (int j = 0; j < c.length; j++) {
                next[j] = Math.max(lo[j], Math.min(hi[j], c[j] + t * step[j]));
            }
            double v = objective.value(next);
            if (!(v < value)) {
                break;
            }
            value = v;
            System.arraycopy(next, 0, trial, 0, c.length);
        }
        return value;
    }

    /** @return the score scaled to a largest component of {@value #ASCENT_STEP}, held coordinates 0 */
    private static double[] ascentStep(double[] score, boolean[] held) {
        double m = freeScore(score, held);
        double[] step = new double[score.length];
        for (int j = 0; j < score.length; j++) {
            step[j] = held[j] ? 0 : ASCENT_STEP * score[j] / m;
        }
        return step;
    }

    private static double freeScore(double[] score, boolean[] held) {
        double m = 0;
        for (int j = 0; j < score.length; j++) {
            if (!held[j]) {
                m = Math.max(m, Math.abs(score[j]));
            }
        }
        return m;
    }

    private static boolean finite(double[] v) {
        for (double x : v) {
            if (!Double.isFinite(x)) {
                return false;
            }
        }
        return true;
    }

    private static double maxAbs(double[] v) {
        double m = 0;
        for (double x : v) {
            m = Math.max(m, Math.abs(x));
        }
        return m;
    }

    private static double distance(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s = Math.max(s, Math.abs(a[i] - b[i]));
        }
        return s;
    }

    /**
     * Newton with a modified Hessian where J is not positive definite (off the crest of a curved ridge, where
     * ln L is not concave): J + τ D with D the diagonal of I and the smallest τ in {@value #MODIFIED_TAU_MIN}
     * × 10^m, m = 0 … {@value #MODIFIED_TRIES} − 1, that is positive definite (Nocedal &amp; Wright 2006,
     * Numerical Optimization, 2nd ed., §3.4). It keeps the curvature along the crest, which scoring loses,
     * so the climb follows the ridge instead of zigzagging across it.
     *
     * @return the step, or null when no τ tried gives a positive definite matrix
     */
    private static double[] modifiedNewton(double[][] observed, double[][] expected, double[] score, boolean[] held, int free,
            Workspace ws) {
        int dim = score.length;
        double[][] m = ws.modified;
        double tau = MODIFIED_TAU_MIN;
        for (int t = 0; t < MODIFIED_TRIES; t++, tau *= 10) {
            for (int a = 0; a < dim; a++) {
                System.arraycopy(observed[a], 0, m[a], 0, dim);
                m[a][a] += tau * Math.max(expected[a][a], Double.MIN_NORMAL);
            }
            double[] step = solve(m, score, held, free, ws);
            if (step != null) {
                return step;
            }
        }
        return null;
    }

    /** Scratch arrays of one climb (the solves run several times per iteration). */
    private static final class Workspace {
        final double[][] reduced;
        final double[] rhs;
        final int[] index;
        final double[] step;
        final double[][] modified;

        Workspace(int dim) {
            reduced = new double[dim][dim];
            rhs = new double[dim];
            index = new int[dim];
            step = new double[dim];
            modified = new double[dim][dim];
        }
    }

    /**
     * @return the solution of the reduced system (held coordinates fixed) in {@code ws.step}, or null if not
     *         positive definite
     */
    private static double[] solve(double[][] matrix, double[] score, boolean[] held, int free, Workspace ws) {
        double[][] a = ws.reduced;
        double[] b = ws.rhs;
        int[] index = ws.index;
        for (int j = 0, p = 0; j < held.length; j++) {
            if (!held[j]) {
                index[p++] = j;
            }
        }
        for (int p = 0; p < free; p++) {
            b[p] = score[index[p]];
            for (int q = 0; q < free; q++) {
                a[p][q] = matrix[index[p]][index[q]];
                if (!Double.isFinite(a[p][q])) {
                    return null;
                }
            }
        }
        if (!SmallCholesky.solveInPlace(a, b, free)) {
            return null;
        }
        double[] step = ws.step;
        java.util.Arrays.fill(step, 0);
        for (int p = 0; p < free; p++) {
            step[index[p]] = b[p];
        }
        return step;
    }
}
