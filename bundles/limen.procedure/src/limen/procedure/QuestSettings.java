package limen.procedure;

import java.util.Objects;
import java.util.random.RandomGenerator;

import limen.procedure.internal.GridPosterior;
import limen.psychometric.PsychometricFunction;
import limen.psychometric.Sigmoid;
import limen.psychometric.Sigmoids;

/**
 * Immutable settings of QUEST (Watson, A. B. &amp; Pelli, D. G. (1983), Perception &amp;
 * Psychophysics 33(2), 113-120) and its posterior-mean variant (King-Smith, P. E. et al. (1994),
 * Vision Research 34(7), 885-912).
 * <p>
 * The unknown is the threshold T, the x at which ψ(x) = P_t; the psychometric function's shape is
 * assumed known: ψ(x; T) = γ + (1 − γ − λ) F(x − T + d) with F a location family
 * ({@link Sigmoid} with location 0) and d = F⁻¹((P_t − γ)/(1 − γ − λ)). The posterior on an even
 * grid of T is prior × Π ψ(x_k; T)^{c_k} (1 − ψ(x_k; T))^{1−c_k}, with a Gaussian prior (mean, sd)
 * set by the author. The next stimulus is placed at the posterior mode (QUEST) or mean (ZEST); the
 * estimate is the mode or mean likewise, with the posterior SD as its uncertainty.
 * <p>
 * Watson &amp; Pelli's Weibull on a decibel axis, W(x) = 1 − (1 − γ) exp(−10^{β(x − T + ε)/20}) with
 * ψ = δγ + (1 − δ)W (from memory), is {@link Builder#weibullInDecibels}: a Gumbel F of scale
 * 20/(β ln 10) with λ = δ(1 − γ). Their typical values β = 3.5, δ = 0.01, γ = 0.5 are from memory.
 * The sigmoid must not be restricted to positive x (use the Gumbel on a log axis instead of the Weibull).
 */
public final class QuestSettings implements ProcedureFactory {

    private final Sigmoid sigmoid;
    private final double spread;
    private final double guess;
    private final double lapse;
    private final double targetProbability;
    private final double[] grid;
    private final double priorMean;
    private final double priorSd;
    private final Placement placement;
    private final Placement estimator;
    private final StopRule stopRule;
    private final double offset;

    private QuestSettings(Builder b) {
        this.sigmoid = Objects.requireNonNull(b.sigmoid, "sigmoid");
        if (sigmoid.positiveDomainOnly()) {
            throw new IllegalArgumentException("QUEST needs a location family on the whole axis; " + sigmoid.name()
                    + " is for positive x only: use gumbel on log values");
        }
        PsychometricFunction base = new PsychometricFunction(sigmoid, 0, b.spread, b.guess, b.lapse);
        this.spread = b.spread;
        this.guess = b.guess;
        this.lapse = b.lapse;
        if (!(b.targetProbability > b.guess && b.targetProbability < 1 - b.lapse)) {
            throw new IllegalArgumentException("QUEST target proportion must lie between guess " + b.guess
                    + " and 1 - lapse " + (1 - b.lapse) + ", was " + b.targetProbability);
        }
        this.targetProbability = b.targetProbability;
        this.offset = base.inversePsi(targetProbability);
        this.grid = GridPosterior.linspace(b.gridMin, b.gridMax, b.gridPoints);
        if (!Double.isFinite(b.priorMean) || !(b.priorSd > 0)) {
            throw new IllegalArgumentException("prior needs a finite mean and sd > 0 (infinite for flat), were "
                    + b.priorMean + " and " + b.priorSd);
        }
        this.priorMean = b.priorMean;
        this.priorSd = b.priorSd;
        this.placement = Objects.requireNonNull(b.placement, "placement");
        this.estimator = Objects.requireNonNull(b.estimator, "estimator");
        this.stopRule = Objects.requireNonNull(b.stopRule, "stop rule");
    }

    /** @return a builder: logistic of scale 1, guess 0.5, lapse 0, P_t 0.75, grid [-10, 10] in 201 points, flat prior, MODE placement and estimate, stop after 40 trials */
    public static Builder builder() {
        return new Builder();
    }

    @Override
    public Quest create(RandomGenerator rng) {
        return new Quest(this);
    }

    /** @return ψ(x) for threshold T: the assumed function located so that ψ(T) = P_t */
    public PsychometricFunction functionAt(double threshold) {
        return new PsychometricFunction(sigmoid, threshold - offset, spread, guess, lapse);
    }

    public Sigmoid sigmoid() {
        return sigmoid;
    }

    public double spread() {
        return spread;
    }

    public double guess() {
        return guess;
    }

    public double lapse() {
        return lapse;
    }

    public double targetProbability() {
        return targetProbability;
    }

    public Target target() {
        return Target.psi(targetProbability);
    }

    /** @return the threshold grid (a copy) */
    public double[] grid() {
        return grid.clone();
    }

    double[] gridShared() {
        return grid;
    }

    /** @return location of F for threshold T: T − d */
    double locationOf(double threshold) {
        return threshold - offset;
    }

    public double priorMean() {
        return priorMean;
    }

    public double priorSd() {
        return priorSd;
    }

    public Placement placement() {
        return placement;
    }

    public Placement estimator() {
        return estimator;
    }

    public StopRule stopRule() {
        return stopRule;
    }

    /** Mutable builder; {@link #build()} validates. */
    public static final class Builder {
        private Sigmoid sigmoid = Sigmoids.LOGISTIC;
        private double spread = 1;
        private double guess = 0.5;
        private double lapse = 0;
        private double targetProbability = 0.75;
        private double gridMin = -10;
        private double gridMax = 10;
        private int gridPoints = 201;
        private double priorMean = 0;
        private double priorSd = Double.POSITIVE_INFINITY;
        private Placement placement = Placement.MODE;
        private Placement estimator = Placement.MODE;
        private StopRule stopRule = StopRule.afterTrials(40);

        private Builder() {
        }

        /** The assumed shape: family, spread (Sigmoid's second parameter), guess γ and lapse λ. */
        public Builder function(Sigmoid family, double spreadValue, double guessRate, double lapseRate) {
            this.sigmoid = family;
            this.spread = spreadValue;
            this.guess = guessRate;
            this.lapse = lapseRate;
            return this;
        }

        /**
         * Watson &amp; Pelli's form on a dB axis: W(x) = 1 − (1 − γ) exp(−10^{β(x − T + ε)/20}),
         * ψ = δγ + (1 − δ)W, i.e. Gumbel scale 20/(β ln 10), λ = δ(1 − γ) (form from memory).
         */
        public Builder weibullInDecibels(double beta, double delta, double guessRate) {
            if (!(beta > 0) || !(delta >= 0 && delta < 1)) {
                throw new IllegalArgumentException("need beta > 0 and 0 <= delta < 1, were " + beta + " and " + delta);
            }
            return function(Sigmoids.GUMBEL, 20 / (beta * Math.log(10)), guessRate, delta * (1 - guessRate));
        }

        public Builder target(double p) {
            this.targetProbability = p;
            return this;
        }

        /** An even grid of thresholds from min to max with the given number of points. */
        public Builder grid(double min, double max, int points) {
            this.gridMin = min;
            this.gridMax = max;
            this.gridPoints = points;
            return this;
        }

        /** Gaussian prior on the threshold; sd = +∞ for a flat prior. */
        public Builder prior(double mean, double sd) {
            this.priorMean = mean;
            this.priorSd = sd;
            return this;
        }

        public Builder placement(Placement p) {
            this.placement = p;
            return this;
        }

        public Builder estimator(Placement e) {
            this.estimator = e;
            return this;
        }

        public Builder stop(StopRule rule) {
            this.stopRule = rule;
            return this;
        }

        public QuestSettings build() {
            return new QuestSettings(this);
        }
    }
}
