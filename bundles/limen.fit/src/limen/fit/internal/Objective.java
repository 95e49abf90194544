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
        for (int i = 0; i < u.length; i++) {
            double f = working.value(u[i], m, s);
            int ki = k[i];
            int misses = n[i] - ki;
            if (ki > 0) {
                sum += ki * Math.log(Math.max(g + r * f, Double.MIN_NORMAL));
            }
            if (misses > 0) {
                double fc = f < 0.5 ? 1 - f : working.complementValue(u[i], m, s);
                sum += misses * Math.log(Math.max(l + r * fc, Double.MIN_NORMAL));
            }
        }
        return -sum;
    }

    /**
     * The score (gradient of ln L) and the expected (Fisher) information with respect to the working
     * coordinates, for Fisher scoring:
     * <pre>
     *   g_j  = Σ_i (k_i − n_i ψ_i) ∂_j ψ_i / (ψ_i (1 − ψ_i))
     *   I_jl = Σ_i n_i ∂_j ψ_i ∂_l ψ_i / (ψ_i (1 − ψ_i))
     * </pre>
     * with ∂ψ/∂c0 = −(1−γ−λ) R dF/du, ∂ψ/∂c1 = −(1−γ−λ)(u − m) dF/du, ∂ψ/∂c2 = γmax (1 − F), ∂ψ/∂c3 = −λmax F
     * (u the working stimulus, m the working location, dF/du = x dF/dx on the Weibull's log axis).
     *
     * @param score       filled with g (length {@link #dimension()})
     * @param information filled with I (dimension × dimension)
     */
    public void scoreAndInformation(double[] c, double[] score, double[][] information) {
        double mU = workingLocation(c);
        double s = workingScale(c);
        double g = guess(c);
        double l = lapse(c);
        double r = 1 - g - l;
        java.util.Arrays.fill(score, 0);
        for (double[] row : information) {
            java.util.Arrays.fill(row, 0);
        }
        double[] d = new double[dimension];
        for (int i = 0; i < u.length; i++) {
            double f = working.value(u[i], mU, s);
            double fc = f < 0.5 ? 1 - f : working.complementValue(u[i], mU, s);
            double psi = g + r * f;
            double q = l + r * fc;
            double dFdu = working.derivative(u[i], mU, s);
            d[0] = -r * range * dFdu;
            d[1] = -r * (u[i] - mU) * dFdu;
            int j = 2;
            if (options.guessFree()) {
                d[j++] = options.guessMax() * fc;
            }
            if (options.lapseFree()) {
                d[j] = -options.lapseMax() * f;
            }
        double w = 1 / Math.max(psi * q, Double.MIN_NORMAL);
            double residual = (k[i] - n[i] * psi) * w;
            for (int a = 0; a < dimension; a++) {
                score[a] += residual * d[a];
                double na = n[i] * w * d[a];
                for (int b = 0; b <= a; b++) {
                    information[a][b] += na * d[b];
                }
            }
        }
        for (int a = 0; a < dimension; a++) {
            for (int b = 0; b < a; b++) {
                information[b][a] = information[a][b];
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
