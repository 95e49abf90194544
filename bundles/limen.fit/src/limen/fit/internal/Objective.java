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
        evaluations++;
        double m = workingLocation(c);
        double s = workingScale(c);
        double g = guess(c);
        double l = lapse(c);
        double r = 1 - g - l;
        double sum = 0;
        double[] e = new double[4];
        for (int i = 0; i < u.length; i++) {
            working.evaluate(u[i], m, s, e);
            int ki = k[i];
            int misses = n[i] - ki;
            if (ki > 0) {
                sum += ki * Math.log(Math.max(g + r * e[0], Double.MIN_NORMAL));
            }
            if (misses > 0) {
                sum += misses * Math.log(Math.max(l + r * e[1], Double.MIN_NORMAL));
            }
        }
        return -sum;
    }

    /**
     * The per-cell logarithms that {@link #value} weights by the counts: ln ψ_i and ln(1 − ψ_i) at c (each
     * guarded below by ln of the smallest normal double, as there). They do not depend on the correct counts
     * k_i, so data sets with the same values and trials (bootstrap replicates) can share them.
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

    /** @return whether these are the stimulus values and trial counts of this objective's data */
    public boolean sameDesign(double[] values, int[] trials) {
        return java.util.Arrays.equals(x, values) && java.util.Arrays.equals(n, trials);
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
        int gi = options.guessFree() ? 2 : -1;
        int li = options.lapseFree() ? (gi < 0 ? 2 : 3) : -1;
        java.util.Arrays.fill(score, 0);
        for (int a = 0; a < dimension; a++) {
            java.util.Arrays.fill(expected[a], 0);
            if (observed != null) {
                java.util.Arrays.fill(observed[a], 0);
            }
        }
        double[] d = new double[dimension];
        double[][] dd = new double[dimension][dimension];
        double[] e = new double[4];
        for (int i = 0; i < u.length; i++) {
            working.evaluate(u[i], mU, s, e);
            double f = e[0];
            double fc = e[1];
            double psi = g + r * f;
            double q = l + r * fc;
            double fu = e[2];
            double du = u[i] - mU;
            double f0 = -range * fu;
            double f1 = -du * fu;
            d[0] = r * f0;
            d[1] = r * f1;
            if (gi > 0) {
                d[gi] = options.guessMax() * fc;
            }
            if (li > 0) {
                d[li] = -options.lapseMax() * f;
            }
            double pq = Math.max(psi * q, Double.MIN_NORMAL);
            double rho = (k[i] - n[i] * psi) / pq;
            double w = n[i] / pq;
            for (int a = 0; a < dimension; a++) {
                score[a] += rho * d[a];
                for (int b = 0; b <= a; b++) {
                    expected[a][b] += w * d[a] * d[b];
                }
            }
            if (observed != null) {
                double fuu = e[3];
                dd[0][0] = r * range * range * fuu;
                dd[1][0] = r * range * (fu + du * fuu);
                dd[1][1] = r * du * (fu + du * fuu);
                if (gi > 0) {
                    dd[gi][0] = -options.guessMax() * f0;
                    dd[gi][1] = -options.guessMax() * f1;
                }
                if (li > 0) {
                    dd[li][0] = -options.lapseMax() * f0;
                    dd[li][1] = -options.lapseMax() * f1;
                }
                double psiSafe = Math.max(psi, Double.MIN_NORMAL);
                double qSafe = Math.max(q, Double.MIN_NORMAL);
                double curvature = k[i] / (psiSafe * psiSafe) + (n[i] - k[i]) / (qSafe * qSafe);
                for (int a = 0; a < dimension; a++) {
                    for (int b = 0; b <= a; b++) {
                        observed[a][b] += curvature * d[a] * d[b] - rho * dd[a][b];
                    }
                }
            }
        }
        for (int a = 0; a < dimension; a++) {
            for (int b = 0; b < a; b++) {
                expected[b][a] = expected[a][b];
                if (observed != null) {
                    observed[b][a] = observed[a][b];
                }
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
