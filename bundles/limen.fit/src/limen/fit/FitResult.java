package limen.fit;

import java.util.List;
import java.util.function.Supplier;

import limen.psychometric.PsychometricFunction;

/**
 * The outcome of one maximum-likelihood fit ({@link PsychometricFitter#fit}): the fitted function, its
 * threshold and slope, log-likelihood and deviance, and warnings about parameters that ended on a bound
 * of the search box (which means the data constrain them poorly). Immutable; the log-likelihood, the deviance
 * and the warnings are worked out when first asked for (a bootstrap refit is asked only for its threshold,
 * slope and deviance).
 */
public final class FitResult {

    private final BinomialData data;
    private final FitOptions options;
    private final PsychometricFunction function;
    private final double targetPsi;
    private final double threshold;
    private final double thresholdAtF;
    private final double slope;
    private double logLikelihood;
    private boolean logLikelihoodKnown;
    private double deviance;
    private boolean devianceKnown;
    private Supplier<List<String>> warningSource;
    private List<String> warnings;
    private final long evaluations;
    private final boolean derivativeFree;
    private final boolean warmStarted;

    FitResult(BinomialData data, FitOptions options, PsychometricFunction function, List<String> warnings, long evaluations,
            boolean derivativeFree) {
        this(data, options, function, warnings, evaluations, derivativeFree, false);
    }

    FitResult(BinomialData data, FitOptions options, PsychometricFunction function, List<String> warnings, long evaluations,
            boolean derivativeFree, boolean warmStarted) {
        this(data, options, function, () -> warnings, evaluations, derivativeFree, warmStarted);
    }

    /** @param warnings worked out on the first call of {@link #warnings()}, at most once */
    FitResult(BinomialData data, FitOptions options, PsychometricFunction function, Supplier<List<String>> warnings,
            long evaluations, boolean derivativeFree, boolean warmStarted) {
        this.data = data;
        this.options = options;
        this.function = function;
        this.targetPsi = Double.isNaN(options.targetPsi()) ? 0.5 * (function.guess() + 1 - function.lapse()) : options.targetPsi();
        this.threshold = thresholdOf(function, options);
        this.thresholdAtF = Double.isNaN(options.targetF()) ? Double.NaN : function.inverseF(options.targetF());
        this.slope = Double.isNaN(threshold) ? Double.NaN : function.psiDerivative(threshold);
        this.warningSource = warnings;
        this.evaluations = evaluations;
        this.derivativeFree = derivativeFree;
        this.warmStarted = warmStarted;
    }

    /** @return true when a refit kept its warm start's optimum without the full search, for tests */
    boolean warmStarted() {
        return warmStarted;
    }

    /** @return true when the winning optimum came from the derivative-free fallback (BOBYQA), for tests */
    boolean derivativeFree() {
        return derivativeFree;
    }

    /**
     * @return x with ψ(x) = target: F⁻¹(1/2) for the default midpoint target, else ψ⁻¹(target); NaN when the
     *         target lies outside (γ, 1 − λ) of f
     */
    static double thresholdOf(PsychometricFunction f, FitOptions options) {
        double target = options.targetPsi();
        if (Double.isNaN(target)) {
            return f.inverseF(0.5);
        }
        return target > f.guess() && target < 1 - f.lapse() ? f.inversePsi(target) : Double.NaN;
    }

    public BinomialData data() {
        return data;
    }

    public FitOptions options() {
        return options;
    }

    /** @return the maximum-likelihood psychometric function */
    public PsychometricFunction function() {
        return function;
    }

    /** @return the proportion at which the threshold is reported (the midpoint (γ + 1 − λ)/2 by default) */
    public double targetPsi() {
        return targetPsi;
    }

    /** @return x at which ψ reaches {@link #targetPsi()}; NaN if the fitted function does not reach it */
    public double threshold() {
        return threshold;
    }

    /** @return x at which F reaches {@link FitOptions#targetF()}; NaN if none was asked */
    public double thresholdAtF() {
        return thresholdAtF;
    }

    /** @return dψ/dx at the threshold, in proportion per unit of x; NaN with the threshold */
    public double slope() {
        return slope;
    }

    /** @return ln L including the binomial coefficients ({@link BinomialLikelihood#logLikelihood}) */
    public synchronized double logLikelihood() {
        if (!logLikelihoodKnown) {
            logLikelihood = BinomialLikelihood.logLikelihood(data, function);
            logLikelihoodKnown = true;
        }
        return logLikelihood;
    }

    /** @return the deviance D ({@link BinomialLikelihood#deviance}) */
    public synchronized double deviance() {
        if (!devianceKnown) {
            deviance = BinomialLikelihood.deviance(data, function);
            devianceKnown = true;
        }
        return deviance;
    }

    /** @return cells minus free parameters (may be ≤ 0) */
    public int degreesOfFreedom() {
        return data.size() - options.freeParameters();
    }

    /** @return human-readable cautions (parameters on a bound, target not reached, too few cells) */
    public synchronized List<String> warnings() {
        if (warnings == null) {
            warnings = List.copyOf(warningSource.get());
            warningSource = null;
        }
        return warnings;
    }

    /** @return likelihood evaluations spent (grid and optimiser) */
    public long evaluations() {
        return evaluations;
    }

    @Override
    public String toString() {
        return "FitResult[" + function + ", threshold " + threshold + " at psi " + targetPsi + ", slope " + slope
                + ", lnL " + logLikelihood() + ", D " + deviance() + "]";
    }
}
