package limen.fit.internal;

import org.apache.commons.math3.analysis.MultivariateFunction;

import limen.fit.BinomialData;
import limen.fit.FitOptions;
import limen.psychometric.PsychometricFunction;
import limen.psychometric.Sigmoid;
import limen.psychometric.Sigmoids;

/**
 * The negative binomial log-likelihood (without the constant binomial coefficients) as a function of
 * dimensionless working coordinates c, so that one bounded optimiser with one trust-region radius suits
 * every family and every unit:
 * <pre>
 *   u = ln x for the Weibull, u = x otherwise;  u_mid, R = centre and range of u over the data
 *   c0 = (location_u − u_mid) / R       location_u = location, or ln alpha for the Weibull
 *   c1 = ln(scale_u / R)                 scale_u = spread, or 1/beta for the Weibull
 *   c2 = γ / γmax  (only if γ is free)   c3 = λ / λmax  (only if λ is free)
 * </pre>
 * For the Weibull this uses weibull(x; A, B) = gumbel(ln x; ln A, 1/B): the likelihood is evaluated as the
 * Gumbel on u = ln x (one exponential per cell instead of a power), and A = e^m, B = 1/s only at the end. Not thread-safe only in the sense that {@link #evaluations()} counts
 * calls; instances are used by one fit at a time.
 */
public final class Objective implements MultivariateFunction {

    /** Search box of c0: the location stays within 3 data ranges of the data's centre. */
    public static final double LOCATION_BOUND = 3.0;
    /** Search box of c1: scale_u between R/1000 and 100 R. */
    public static final double LOG_SCALE_MIN = Math.log(1e-3);
    public static final double LOG_SCALE_MAX = Math.log(1e2);

    private final Sigmoid sigmoid;
    private final boolean logDomain;
    /** The family evaluated on the working axis: the Gumbel on ln x for the Weibull, else the family itself. */
    private final Sigmoid working;
    private final double[] x;
    /** Working stimulus u_i: ln x_i for the Weibull, x_i otherwise. */
    private final double[] u;
    private final int[] n;
    private final int[] k;
    private final double centre;
    private final double range;
    private final FitOptions options;
    private final int dimension;
    private long evaluations;
    /**
     * The family's F, 1 − F, F_u and F_uu at every cell for the point {@link #value} last evaluated
     * ({@code evaluatedAt}): a climb asks for the score where its line search has just accepted a point, and
     * reads them back instead of evaluating the family again. The same doubles, so the same results.
     */
    private final double[] evaluated;
    private final double[] evaluatedAt;
    private boolean evaluatedValid;
    /** −ln L at {@code evaluatedAt}: asked for again at that point (a climb's end), value returns it. */
    private double evaluatedValue;

    /**
     * @throws IllegalArgumentException for a family that is neither location-scale nor the Weibull, for
     *                                  x &le; 0 with the Weibull, or for fewer than 2 distinct values
     */
    public Objective(BinomialData data, FitOptions options) {
        this.options = options;
        this.sigmoid = options.sigmoid();
        this.logDomain = sigmoid.positiveDomainOnly();
        if (logDomain && sigmoid != Sigmoids.WEIBULL) {
            throw new IllegalArgumentException("fitting supports location-scale families and the Weibull, not " + sigmoid.name());
        }
        this.working = logDomain ? Sigmoids.GUMBEL : sigmoid;
        this.x = data.values();
        this.u = new double[x.length];
        this.n = data.trials();
        this.k = data.correct();
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < x.length; i++) {
            if (logDomain && !(x[i] > 0)) {
                throw new IllegalArgumentException("the Weibull needs stimulus values > 0; cell " + (i + 1) + " has " + x[i]);
            }
            u[i] = logDomain ? Math.log(x[i]) : x[i];
            lo = Math.min(lo, u[i]);
            hi = Math.max(hi, u[i]);
        }
        if (!(hi > lo)) {
            throw new IllegalArgumentException("fewer than 2 distinct stimulus values (all at " + x[0] + ")");
        }
        this.centre = 0.5 * (lo + hi);
        this.range = hi - lo;
        this.dimension = options.freeParameters();
        this.evaluated = new double[4 * x.length];
        this.evaluatedAt = new double[dimension];
    }

    /** @return 2, 3 or 4 */
    public int dimension() {
        return dimension;
    }

    public long evaluations() {
        return evaluations;
    }

    /** @return the lower corner of the search box */
    public double[] lowerBounds() {
        double[] b = new double[dimension];
        b[0] = -LOCATION_BOUND;
        b[1] = LOG_SCALE_MIN;
        return b; // c2, c3 from 0
    }

    /** @return the upper corner of the search box */
    public double[] upperBounds() {
        double[] b = new double[dimension];
        b[0] = LOCATION_BOUND;
        b[1] = LOG_SCALE_MAX;
        for (int i = 2; i < dimension; i++) {
            b[i] = 1.0;
        }
        return b;
    }

    @Override
    public double value(double[] c) {
        if (evaluatedAt(c)) {
            return evaluatedValue; // the same point as last time: the same double
        }
        evaluations++;
        double m = workingLocation(c);
        double s = workingScale(c);
        double g = guess(c);
        double l = lapse(c);
        double r = 1 - g - l;
        double sum = 0;
        double[] e = new double[4];
        double[] cells = evaluated;
        for (int i = 0; i < u.length; i++) {
            working.evaluate(u[i], m, s, e);
            int b = 4 * i;
            cells[b] = e[0];
            cells[b + 1] = e[1];
            cells[b + 2] = e[2];
            cells[b + 3] = e[3];
            int ki = k[i];
            int misses = n[i] - ki;
            if (ki > 0) {
                sum += ki * Math.log(Math.max(g + r * e[0], Double.MIN_NORMAL));
            }
            if (misses > 0) {
                sum += misses * Math.log(Math.max(l + r * e[1], Double.MIN_NORMAL));
            }
        }
        System.arraycopy(c, 0, evaluatedAt, 0, dimension);
        evaluatedValid = true;
        evaluatedValue = -sum;
        return -sum;
    }

    /** @return whether {@link #evaluated} holds the family at c (the point value() saw last) */
    private boolean evaluatedAt(double[] c) {
        if (!evaluatedValid) {
            return false;
        }
        for (int j = 0; j < dimension; j++) {
            // bitwise, so that -0.0 and 0.0 or two NaNs are not confused with each other
            if (Double.doubleToRawLongBits(c[j]) != Double.doubleToRawLongBits(evaluatedAt[j])) {
                return false;
            }
        }
        return true;
    }

    /**
     * The per-cell logarithms that {@link #value} weights by the counts: ln ψ_i and ln(1 − ψ_i) at c (each
     * guarded below by ln of the smallest normal double, as there). They do not depend on the counts n_i and
     * k_i, so data sets with the same values (bootstrap replicates, jackknife sets that keep every cell) can
     * share them.
     *
     * @return {ln ψ_0, ln(1 − ψ_0), ln ψ_1, ...}
     */
    public double[] logTerms(double[] c) {
        double m = workingLocation(c);
        double s = workingScale(c);
        double g = guess(c);
        double l = lapse(c);
        double r = 1 - g - l;
        double[] terms = new double[2 * u.length];
        double[] e = new double[4];
        for (int i = 0; i < u.length; i++) {
            working.evaluate(u[i], m, s, e);
            terms[2 * i] = Math.log(Math.max(g + r * e[0], Double.MIN_NORMAL));
            terms[2 * i + 1] = Math.log(Math.max(l + r * e[1], Double.MIN_NORMAL));
        }
        return terms;
    }

    /**
     * @param terms {@link #logTerms} of the same point, from data with these values and trials
     * @return −ln L, the same arithmetic and so the same double as {@link #value} at that point
     */
    public double valueFromLogTerms(double[] terms) {
        evaluations++;
        double sum = 0;
        for (int i = 0; i < u.length; i++) {
            int ki = k[i];
            int misses = n[i] - ki;
            if (ki > 0) {
                sum += ki * terms[2 * i];
            }
            if (misses > 0) {
                sum += misses * terms[2 * i + 1];
            }
        }
        return -sum;
    }

    /**
     * The best step, as a start at the steep end of the box. A step at u* (F = 0 below, 1 above) has
     * ψ = γ below and 1 − λ above, so its log-likelihood is K_b ln γ + (N_b − K_b) ln(1 − γ) + K_a ln(1 − λ)
     * + (N_a − K_a) ln λ with the counts K, N below (b) and above (a) u*; a free γ or λ takes its closed-form
     * maximum K_b / N_b or (N_a − K_a) / N_a, clamped into its bounds. Every split between neighbouring
     * distinct values is tried, with prefix sums over the sorted cells. Multi-start searches need it because
     * near-step data (a steep function with a lapse, an adaptive track's narrow range of levels) can have a
     * mode at the steep end that neither a smooth start nor the start grid leads to.
     *
     * @return working coordinates: location at the best split's midpoint, the scale at its lower bound, γ and
     *         λ as above; null when no step has a finite likelihood (e.g. γ = λ = 0 fixed and data that
     *         are not separated)
     */
    public double[] stepStart() {
        int size = u.length;
        int[] order = new int[size];
        for (int i = 0; i < size; i++) {
            int j = i;
            while (j > 0 && u[order[j - 1]] > u[i]) { // insertion sort: cells arrive sorted or nearly so
                order[j] = order[j - 1];
                j--;
            }
            order[j] = i;
        }
        long totalK = 0;
        long totalN = 0;
        for (int i = 0; i < size; i++) {
            totalK += k[i];
            totalN += n[i];
        }
        long kb = 0;
        long nb = 0;
        double best = Double.NEGATIVE_INFINITY;
        double[] start = null;
        for (int p = 0; p < size - 1; p++) {
            kb += k[order[p]];
            nb += n[order[p]];
            double below = u[order[p]];
            double above = u[order[p + 1]];
            if (!(above > below)) {
                continue;
            }
            long ka = totalK - kb;
            long na = totalN - nb;
            double g = options.guessFree() ? Math.min(options.guessMax(), (double) kb / nb) : options.guess();
            double l = options.lapseFree() ? Math.min(options.lapseMax(), (double) (na - ka) / na) : options.lapse();
            double ll = xlogy(kb, g) + xlogy(nb - kb, 1 - g) + xlogy(ka, 1 - l) + xlogy(na - ka, l);
            if (ll > best) {
                best = ll;
                start = coordinates((0.5 * (below + above) - centre) / range, LOG_SCALE_MIN, g, l);
            }
        }
        return start;
    }

    /**
     * The point at the steep end of the ridge through c along which one cell holds the function: the scale at
     * its lower bound and the location moved so that the cell where F changes most (largest n_i dF/dz at c)
     * keeps its z = (u_i − m)/s, hence its F; cells far in the tails stay there. Where no other cell is
     * within the rise, ln L is the same as at c.
     *
     * @return working coordinates (guess and lapse as in c)
     */
    public double[] steepEndOfRidge(double[] c) {
        double m = workingLocation(c);
        double s = workingScale(c);
        double steepest = range * Math.exp(LOG_SCALE_MIN);
        double[] e = new double[4];
        int pivot = -1;
        double most = 0;
        for (int i = 0; i < u.length; i++) {
            working.evaluate(u[i], m, s, e);
            double w = n[i] * e[2] * s;
            if (w > most) {
                most = w;
                pivot = i;
            }
        }
        double[] end = c.clone();
        end[1] = LOG_SCALE_MIN;
        if (pivot >= 0) {
            double z = (u[pivot] - m) / s;
            end[0] = clamp((u[pivot] - z * steepest - centre) / range, -LOCATION_BOUND, LOCATION_BOUND);
        }
        return end;
    }

    /**
     * @param c0 a location in working coordinates
     * @return the working location midway between the nearest distinct stimulus values below and above c0
     *         (in the working domain: ln x for the Weibull), or c0 itself outside the data or on a value
     */
    public double gapMidpoint(double c0) {
        double m = centre + c0 * range;
        double below = Double.NEGATIVE_INFINITY;
        double above = Double.POSITIVE_INFINITY;
        for (double ui : u) {
            if (ui < m) {
                below = Math.max(below, ui);
            } else if (ui > m) {
                above = Math.min(above, ui);
            } else {
                return c0;
            }
        }
        if (below == Double.NEGATIVE_INFINITY || above == Double.POSITIVE_INFINITY) {
            return c0;
        }
        return (0.5 * (below + above) - centre) / range;
    }

    /** @return count · ln p, 0 for a zero count */
    private static double xlogy(long count, double p) {
        return count == 0 ? 0 : count * Math.log(p);
    }

    /**
     * @return whether these are the stimulus values of this objective's data (then {@link #logTerms}, which
     *         depend on the values alone, not on the trials or correct counts, carry over)
     */
    public boolean sameValues(double[] values) {
        return java.util.Arrays.equals(x, values);
    }

    /**
     * The score (gradient of ln L), the expected (Fisher) information and the observed information (minus
     * the Hessian of ln L) with respect to the working coordinates:
     * <pre>
     *   g_a  = Σ_i ρ_i ∂_a ψ_i,                       ρ_i = (k_i − n_i ψ_i) / (ψ_i (1 − ψ_i))
     *   I_ab = Σ_i n_i ∂_a ψ_i ∂_b ψ_i / (ψ_i (1 − ψ_i))
     *   J_ab = Σ_i [k_i/ψ_i² + (n_i − k_i)/(1 − ψ_i)²] ∂_a ψ_i ∂_b ψ_i − ρ_i ∂_a∂_b ψ_i
     * </pre>
     * With F(u; m, s), F_u and F_uu its u-derivatives, r = 1 − γ − λ, m = u_mid + c0 R, s = R e^c1:
     * ∂F/∂c0 = −R F_u, ∂F/∂c1 = −(u − m) F_u, ∂²F/∂c0² = R² F_uu, ∂²F/∂c0∂c1 = R (F_u + (u − m) F_uu),
     * ∂²F/∂c1² = (u − m)(F_u + (u − m) F_uu); ∂ψ/∂c_{0,1} = r ∂F/∂c_{0,1}, ∂ψ/∂c2 = γmax (1 − F),
     * ∂ψ/∂c3 = −λmax F, ∂²ψ/∂c2∂c_{0,1} = −γmax ∂F/∂c_{0,1}, ∂²ψ/∂c3∂c_{0,1} = −λmax ∂F/∂c_{0,1}, and the
     * remaining second derivatives in c2, c3 are 0.
     *
     * @param score    filled with g (length {@link #dimension()})
     * @param expected filled with I (dimension × dimension)
     * @param observed filled with J (dimension × dimension), or null
     */
    public void scoreAndInformation(double[] c, double[] score, double[][] expected, double[][] observed) {
        double mU = workingLocation(c);
        double s = workingScale(c);
        double g = guess(c);
        double l = lapse(c);
        double r = 1 - g - l;
        boolean guessFree = options.guessFree();
        boolean lapseFree = options.lapseFree();
        double gMax = guessFree ? options.guessMax() : 0;
        double lMax = lapseFree ? options.lapseMax() : 0;
        boolean wantObserved = observed != null;
        // Coordinates 0 (location), 1 (scale), G (guess) and L (lapse) in local sums, a fixed rate's derivative
        // 0: the sums stay in registers, where array elements would be stored and reloaded for every cell.
        double s0 = 0, s1 = 0, sG = 0, sL = 0;
        double e00 = 0, e10 = 0, e11 = 0, eG0 = 0, eG1 = 0, eGG = 0, eL0 = 0, eL1 = 0, eLG = 0, eLL = 0;
        double o00 = 0, o10 = 0, o11 = 0, oG0 = 0, oG1 = 0, oGG = 0, oL0 = 0, oL1 = 0, oLG = 0, oLL = 0;
        double[] e = new double[4];
        double[] cells = evaluatedAt(c) ? evaluated : null;
        for (int i = 0; i < u.length; i++) {
            double f;
            double fc;
            double fu;
            double fuu;
            if (cells != null) {
                int b = 4 * i;
                f = cells[b];
                fc = cells[b + 1];
                fu = cells[b + 2];
                fuu = cells[b + 3];
            } else {
                working.evaluate(u[i], mU, s, e);
                f = e[0];
                fc = e[1];
                fu = e[2];
                fuu = e[3];
            }
            double psi = g + r * f;
            double q = l + r * fc;
            double du = u[i] - mU;
            double f0 = -range * fu;
            double f1 = -du * fu;
            double d0 = r * f0;
            double d1 = r * f1;
            double dG = gMax * fc;
            double dL = -lMax * f;
            int ki = k[i];
            int ni = n[i];
            double pq = Math.max(psi * q, Double.MIN_NORMAL);
            // one division: 1/ψ = (1 − ψ)/(ψ(1 − ψ)) and 1/(1 − ψ) = ψ/(ψ(1 − ψ)) where the product is normal
            double inv = 1 / pq;
            double rho = (ki - ni * psi) * inv;
            double w = ni * inv;
            s0 += rho * d0;
            s1 += rho * d1;
            double w0 = w * d0;
            double w1 = w * d1;
            double wG = w * dG;
            e00 += w0 * d0;
            e10 += w1 * d0;
            e11 += w1 * d1;
            // the sums of a fixed rate are not used: skip them (nAFC fits fix the guess rate)
            if (guessFree) {
                sG += rho * dG;
                eG0 += wG * d0;
                eG1 += wG * d1;
                eGG += wG * dG;
            }
            if (lapseFree) {
                sL += rho * dL;
                eL0 += w0 * dL;
                eL1 += w1 * dL;
                eLL += w * dL * dL;
                if (guessFree) {
                    eLG += wG * dL;
                }
            }
            if (wantObserved) {
                double curvature;
                if (psi * q >= Double.MIN_NORMAL) {
                    double invPsi = q * inv;
                    double invQ = psi * inv;
                    curvature = ki * invPsi * invPsi + (ni - ki) * invQ * invQ;
                } else {
                    double psiSafe = Math.max(psi, Double.MIN_NORMAL);
                    double qSafe = Math.max(q, Double.MIN_NORMAL);
                    // a term without trials of its outcome is 0, also where ψ or 1 − ψ has underflowed (a cell far
                    // above a function without lapses): 0 / MIN_NORMAL² would be 0 / 0 and make J NaN
                    curvature = (ki > 0 ? ki / psiSafe / psiSafe : 0) + (ni > ki ? (ni - ki) / qSafe / qSafe : 0);
                }
                double c0 = curvature * d0;
                double c1 = curvature * d1;
                double cG = curvature * dG;
                double cross = fu + du * fuu;
                o00 += c0 * d0 - rho * r * range * range * fuu;
                o10 += c1 * d0 - rho * r * range * cross;
                o11 += c1 * d1 - rho * r * du * cross;
                if (guessFree) {
                    oG0 += cG * d0 + rho * gMax * f0;
                    oG1 += cG * d1 + rho * gMax * f1;
                    oGG += cG * dG;
                }
                if (lapseFree) {
                    oL0 += c0 * dL + rho * lMax * f0;
                    oL1 += c1 * dL + rho * lMax * f1;
                    oLL += curvature * dL * dL;
                    if (guessFree) {
                        oLG += cG * dL;
                    }
                }
            }
        }
        int gi = guessFree ? 2 : -1;
        int li = lapseFree ? (guessFree ? 3 : 2) : -1;
        score[0] = s0;
        score[1] = s1;
        fill(expected, e00, e10, e11, gi, eG0, eG1, eGG, li, eL0, eL1, eLG, eLL);
        if (gi > 0) {
            score[gi] = sG;
        }
        if (li > 0) {
            score[li] = sL;
        }
        if (wantObserved) {
            fill(observed, o00, o10, o11, gi, oG0, oG1, oGG, li, oL0, oL1, oLG, oLL);
        }
    }

    /** Writes the symmetric matrix of the sums into m (rows and columns gi, li only where those are free). */
    private static void fill(double[][] m, double m00, double m10, double m11, int gi, double mG0, double mG1, double mGG,
            int li, double mL0, double mL1, double mLG, double mLL) {
        m[0][0] = m00;
        m[1][0] = m10;
        m[0][1] = m10;
        m[1][1] = m11;
        if (gi > 0) {
            m[gi][0] = mG0;
            m[0][gi] = mG0;
            m[gi][1] = mG1;
            m[1][gi] = mG1;
            m[gi][gi] = mGG;
        }
        if (li > 0) {
            m[li][0] = mL0;
            m[0][li] = mL0;
            m[li][1] = mL1;
            m[1][li] = mL1;
            m[li][li] = mLL;
            if (gi > 0) {
                m[li][gi] = mLG;
                m[gi][li] = mLG;
            }
        }
    }

    /** @return the psychometric function at working coordinates c */
    public PsychometricFunction function(double[] c) {
        return new PsychometricFunction(sigmoid, location(c), spread(c), guess(c), lapse(c));
    }

    /** @return working coordinates of f (γ and λ clamped into their boxes) */
    public double[] coordinates(PsychometricFunction f) {
        double[] c = new double[dimension];
        double locU = logDomain ? Math.log(f.location()) : f.location();
        double scaleU = logDomain ? 1 / f.spread() : f.spread();
        c[0] = clamp((locU - centre) / range, -LOCATION_BOUND, LOCATION_BOUND);
        c[1] = clamp(Math.log(scaleU / range), LOG_SCALE_MIN, LOG_SCALE_MAX);
        int i = 2;
        if (options.guessFree()) {
            c[i++] = clamp(f.guess() / options.guessMax(), 0, 1);
        }
        if (options.lapseFree()) {
            c[i] = clamp(f.lapse() / options.lapseMax(), 0, 1);
        }
        return c;
    }

    /** @return working coordinates for a location/scale in units of the data range and given γ, λ */
    public double[] coordinates(double c0, double c1, double guess, double lapse) {
        double[] c = new double[dimension];
        c[0] = c0;
        c[1] = c1;
        int i = 2;
        if (options.guessFree()) {
            c[i++] = clamp(guess / options.guessMax(), 0, 1);
        }
        if (options.lapseFree()) {
            c[i] = clamp(lapse / options.lapseMax(), 0, 1);
        }
        return c;
    }

    private double workingLocation(double[] c) {
        return centre + c[0] * range;
    }

    private double workingScale(double[] c) {
        return range * Math.exp(c[1]);
    }

    private double location(double[] c) {
        double m = workingLocation(c);
        return logDomain ? Math.exp(m) : m;
    }

    private double spread(double[] c) {
        double s = workingScale(c);
        return logDomain ? 1 / s : s;
    }

    private double guess(double[] c) {
        return options.guessFree() ? c[2] * options.guessMax() : options.guess();
    }

    private double lapse(double[] c) {
        if (!options.lapseFree()) {
            return options.lapse();
        }
        return c[options.guessFree() ? 3 : 2] * options.lapseMax();
    }

    private static double clamp(double v, double lo, double hi) {
        return Math.max(lo, Math.min(hi, v));
    }
}
