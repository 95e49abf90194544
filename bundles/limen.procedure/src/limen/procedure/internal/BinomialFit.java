package limen.procedure.internal;

import org.apache.commons.math3.analysis.MultivariateFunction;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.PointValuePair;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.NelderMeadSimplex;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.SimplexOptimizer;

import limen.psychometric.PsychometricFunction;
import limen.psychometric.Sigmoid;

/**
 * Maximum-likelihood fit of location and spread of ψ = γ + (1 − γ − λ)F with γ and λ fixed, to
 * binomial counts (k_i correct of n_i at x_i): log L = Σ k ln ψ(x_i) + (n − k) ln(1 − ψ(x_i)).
 * Start from the best point of a coarse grid, then Nelder-Mead (Commons Math) on (location, ln spread)
 * (ln location too for positive-only families). Standard errors from the numerical observed
 * information matrix. A compact fitter for the constant-stimuli estimate; the full fitting
 * (bootstrap, free lapse) lives elsewhere.
 */
public final class BinomialFit {

    /** Fitted function (null when the data do not identify it) and covariance of (location, spread). */
    public record Result(PsychometricFunction function, double[][] covariance, double logLikelihood) {
    }

    private BinomialFit() {
    }

    public static Result fit(Sigmoid sigmoid, double guess, double lapse, double[] x, int[] n, int[] k) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < x.length; i++) {
            if (n[i] > 0) {
                lo = Math.min(lo, x[i]);
                hi = Math.max(hi, x[i]);
            }
        }
        if (!(hi > lo)) {
            return new Result(null, null, Double.NaN);
        }
        boolean positive = sigmoid.positiveDomainOnly();
        double range = hi - lo;
        MultivariateFunction ll = q -> logLikelihood(sigmoid, guess, lapse, x, n, k, loc(q[0], positive), Math.exp(q[1]));
        double[] best = null;
        double bestLl = Double.NEGATIVE_INFINITY;
        for (int a = 0; a <= 20; a++) {
            double location = lo + range * a / 20.0;
            if (positive && location <= 0) {
                continue;
            }
            for (int s = 0; s <= 14; s++) {
                double spread = positive ? 0.5 * Math.pow(2, s * 0.5) : range * Math.pow(2, -6 + s * 0.5);
                double[] q = {positive ? Math.log(location) : location, Math.log(spread)};
                double v = ll.value(q);
                if (v > bestLl) {
                    bestLl = v;
                    best = q;
                }
            }
        }
        if (best == null) {
            return new Result(null, null, Double.NaN);
        }
        PointValuePair opt = new SimplexOptimizer(1e-12, 1e-12).optimize(new MaxEval(20000), new ObjectiveFunction(ll),
                GoalType.MAXIMIZE, new InitialGuess(best), new NelderMeadSimplex(new double[] {0.1, 0.2}));
        double location = loc(opt.getPoint()[0], positive);
        double spread = Math.exp(opt.getPoint()[1]);
        // A location far outside the tested range or a vanishing spread means the data do not identify F.
        if (!Double.isFinite(location) || location < lo - range || location > hi + range || spread < range * 1e-4
                || !Double.isFinite(spread)) {
            return new Result(null, null, opt.getValue());
        }
        PsychometricFunction f = new PsychometricFunction(sigmoid, location, spread, guess, lapse);
        return new Result(f, covariance(sigmoid, guess, lapse, x, n, k, location, spread), opt.getValue());
    }

    private static double loc(double q, boolean positive) {
        return positive ? Math.exp(q) : q;
    }

    public static double logLikelihood(Sigmoid sigmoid, double guess, double lapse, double[] x, int[] n, int[] k,
            double location, double spread) {
        if (!(spread > 0) || !Double.isFinite(location) || !Double.isFinite(spread) || (sigmoid.positiveDomainOnly() && location <= 0)) {
            return Double.NEGATIVE_INFINITY;
        }
        double sum = 0;
        for (int i = 0; i < x.length; i++) {
            if (n[i] == 0) {
                continue;
            }
            double p = guess + (1 - guess - lapse) * sigmoid.value(x[i], location, spread);
            p = Math.min(Math.max(p, 1e-300), 1 - 1e-16);
            sum += k[i] * Math.log(p) + (n[i] - k[i]) * Math.log1p(-p);
        }
        return sum;
    }

    /** Inverse of the numerical observed information (−Hessian of log L) in (location, spread); null if singular. */
    private static double[][] covariance(Sigmoid sigmoid, double guess, double lapse, double[] x, int[] n, int[] k,
            double location, double spread) {
        double[] q = {location, spread};
        double[] h = {1e-4 * Math.max(Math.abs(location), spread), 1e-4 * spread};
        double[][] hess = new double[2][2];
        for (int a = 0; a < 2; a++) {
            for (int b = 0; b < 2; b++) {
                double[] pp = q.clone();
                double[] pm = q.clone();
                double[] mp = q.clone();
                double[] mm = q.clone();
                pp[a] += h[a];
                pp[b] += h[b];
                pm[a] += h[a];
                pm[b] -= h[b];
                mp[a] -= h[a];
                mp[b] += h[b];
                mm[a] -= h[a];
                mm[b] -= h[b];
                hess[a][b] = (ll(sigmoid, guess, lapse, x, n, k, pp) - ll(sigmoid, guess, lapse, x, n, k, pm)
                        - ll(sigmoid, guess, lapse, x, n, k, mp) + ll(sigmoid, guess, lapse, x, n, k, mm)) / (4 * h[a] * h[b]);
            }
        }
        RealMatrix info = MatrixUtils.createRealMatrix(new double[][] {{-hess[0][0], -hess[0][1]}, {-hess[1][0], -hess[1][1]}});
        LUDecomposition lu = new LUDecomposition(info);
        if (!lu.getSolver().isNonSingular() || info.getEntry(0, 0) <= 0 || lu.getDeterminant() <= 0) {
            return null;
        }
        return lu.getSolver().getInverse().getData();
    }

    private static double ll(Sigmoid s, double g, double l, double[] x, int[] n, int[] k, double[] q) {
        return logLikelihood(s, g, l, x, n, k, q[0], q[1]);
    }
}
