package limen.fit;

import org.apache.commons.math3.util.CombinatoricsUtils;

import limen.psychometric.PsychometricFunction;

/**
 * Binomial log-likelihood and deviance of a psychometric function on binomial data.
 * <pre>
 *   ln L = Σ_i [ ln C(n_i, k_i) + k_i ln ψ(x_i) + (n_i − k_i) ln(1 − ψ(x_i)) ]
 *   D    = 2 Σ_i [ k_i ln(k_i / (n_i ψ(x_i))) + (n_i − k_i) ln((n_i − k_i) / (n_i (1 − ψ(x_i)))) ]
 * </pre>
 * with 0 ln 0 = 0. D is the log-likelihood ratio of the saturated model (ψ_i = k_i/n_i) to ψ, Wichmann
 * &amp; Hill (2001a), Perception &amp; Psychophysics 63(8), 1293-1313, and equals the residual
 * deviance of a binomial generalised linear model. ln L includes the binomial coefficients, as R's
 * {@code logLik} of a binomial {@code glm} does.
 */
public final class BinomialLikelihood {

    private BinomialLikelihood() {
    }

    /** @return ln L of f on the data, including ln C(n_i, k_i) */
    public static double logLikelihood(BinomialData data, PsychometricFunction f) {
        double sum = 0;
        for (int i = 0; i < data.size(); i++) {
            int n = data.trials(i);
            int k = data.correct(i);
            double x = data.value(i);
            sum += CombinatoricsUtils.binomialCoefficientLog(n, k) + kernel(k, n, f, x);
        }
        return sum;
    }

    /** @return the deviance D of f on the data (Wichmann &amp; Hill 2001a) */
    public static double deviance(BinomialData data, PsychometricFunction f) {
        double sum = 0;
        for (int i = 0; i < data.size(); i++) {
            int n = data.trials(i);
            int k = data.correct(i);
            double x = data.value(i);
            double saturated = (k > 0 ? k * Math.log((double) k / n) : 0) + (k < n ? (n - k) * Math.log((double) (n - k) / n) : 0);
            sum += saturated - kernel(k, n, f, x);
        }
        return 2 * sum;
    }

    /** k ln ψ + (n − k) ln(1 − ψ), with 1 − ψ = λ + (1 − γ − λ)(1 − F) kept accurate near ψ = 1. */
    static double kernel(int k, int n, PsychometricFunction f, double x) {
        double range = 1 - f.guess() - f.lapse();
        double fx = f.sigmoid().value(x, f.location(), f.spread());
        double result = 0;
        if (k > 0) {
            result += k * Math.log(Math.max(f.guess() + range * fx, Double.MIN_NORMAL));
        }
        if (k < n) {
            double fc = fx < 0.5 ? 1 - fx : f.sigmoid().complementValue(x, f.location(), f.spread());
            result += (n - k) * Math.log(Math.max(f.lapse() + range * fc, Double.MIN_NORMAL));
        }
        return result;
    }
}
