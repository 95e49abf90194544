package limen.procedure;

import java.util.Objects;
import java.util.random.RandomGenerator;

import limen.procedure.internal.PsiTables;
import limen.psychometric.PsychometricFunction;
import limen.psychometric.Sigmoid;
import limen.psychometric.Sigmoids;

/**
 * Immutable settings of the Psi method (Kontsevich, L. L. &amp; Tyler, C. W. (1999), Vision
 * Research 39(16), 2729-2737): a joint posterior over threshold α (the sigmoid's location), spread
 * β (its second parameter, e.g. the logistic scale or the Weibull slope) and lapse λ on a grid;
 * each trial presents the candidate value whose outcome minimises the expected entropy of the
 * posterior.
 * <p>
 * ψ(x; α, β, λ) = γ + (1 − γ − λ) F(x; α, β), γ fixed by the task. The prior is Gaussian on α
 * (mean, sd set by the author; sd = ∞ flat) and uniform over the β and λ grids. The lapse is fixed
 * (a one-point λ grid) or marginalised over a small λ grid: the entropy is then that of the joint
 * (α, β, λ) posterior, and estimates of α and β are marginal over λ. The psi-marginal refinement
 * (Prins 2013, Journal of Vision 13(7):3: the entropy of the (α, β) marginal only) is not implemented.
 */
public final class PsiSettings implements ProcedureFactory {

    private final Sigmoid sigmoid;
    private final double guess;
    private final double[] thresholds;
    private final double[] spreads;
    private final double[] lapses;
    private final double[] candidates;
    private final double priorMean;
    private final double priorSd;
    private final StopRule stopRule;
    /** Read-only once built, so every procedure (and simulation thread) of these settings shares it. */
    private volatile PsiTables tables;

    private PsiSettings(Builder b) {
        this.sigmoid = Objects.requireNonNull(b.sigmoid, "sigmoid");
        this.guess = b.guess;
        this.thresholds = sortedFinite(b.thresholds, "threshold grid");
        this.spreads = sortedFinite(b.spreads, "spread grid");
        this.lapses = sortedFinite(b.lapses, "lapse grid");
        this.candidates = sortedFinite(b.candidates, "candidate values");
        for (double t : thresholds) {
            for (double s : spreads) {
                for (double l : lapses) {
                    new PsychometricFunction(sigmoid, t, s, guess, l); // validates every grid point
                }
            }
        }
        if (sigmoid.positiveDomainOnly() && candidates[0] <= 0) {
            throw new IllegalArgumentException(sigmoid.name() + " candidates must be > 0, smallest was " + candidates[0]);
        }
        if (!Double.isFinite(b.priorMean) || !(b.priorSd > 0)) {
            throw new IllegalArgumentException("prior needs a finite mean and sd > 0, were " + b.priorMean + " and " + b.priorSd);
        }
        this.priorMean = b.priorMean;
        this.priorSd = b.priorSd;
        this.stopRule = Objects.requireNonNull(b.stopRule, "stop rule");
    }

    private static double[] sortedFinite(double[] v, String what) {
        if (v == null || v.length == 0) {
            throw new IllegalArgumentException(what + " must not be empty");
        }
        double[] c = v.clone();
        for (int i = 0; i < c.length; i++) {
            if (!Double.isFinite(c[i])) {
                throw new IllegalArgumentException(what + " must be finite, had " + c[i]);
            }
            if (i > 0 && !(c[i] > c[i - 1])) {
                throw new IllegalArgumentException(what + " must be strictly increasing, had " + c[i - 1] + " then " + c[i]);
            }
        }
        return c;
    }

    /** @return a builder: logistic, guess 0.5, fixed lapse 0, stop after 60 trials; grids and candidates must be set */
    public static Builder builder() {
        return new Builder();
    }

    @Override
    public PsiMethod create(RandomGenerator rng) {
        return new PsiMethod(this);
    }

    public Sigmoid sigmoid() {
        return sigmoid;
    }

    /** @return the precomputed selection tables, built on first use */
    PsiTables tables() {
        PsiTables t = tables;
        if (t == null) {
            synchronized (this) {
                t = tables;
                if (t == null) {
                    t = PsiTables.of(sigmoid, guess, thresholds, spreads, lapses, candidates);
                    tables = t;
                }
            }
        }
        return t;
    }

    public double guess() {
        return guess;
    }

    /** @return copies of the grids */
    public double[] thresholds() {
        return thresholds.clone();
    }

    public double[] spreads() {
        return spreads.clone();
    }

    public double[] lapses() {
        return lapses.clone();
    }

    public double[] candidates() {
        return candidates.clone();
    }

    double[] thresholdsShared() {
        return thresholds;
    }

    double[] spreadsShared() {
        return spreads;
    }

    double[] lapsesShared() {
        return lapses;
    }

    double[] candidatesShared() {
        return candidates;
    }

    public double priorMean() {
        return priorMean;
    }

    public double priorSd() {
        return priorSd;
    }

    public StopRule stopRule() {
        return stopRule;
    }

    /** @return the parameter points: thresholds × spreads × lapses */
    public int points() {
        return thresholds.length * spreads.length * lapses.length;
    }

    /** @return F at its location (0.5 for logistic and normal, 1 − 1/e for Weibull and Gumbel): what α estimates */
    public Target target() {
        return Target.sigmoid(sigmoid.value(1, 1, 1));
    }

    /** Mutable builder; {@link #build()} validates. */
    public static final class Builder {
        private Sigmoid sigmoid = Sigmoids.LOGISTIC;
        private double guess = 0.5;
        private double[] thresholds;
        private double[] spreads;
        private double[] lapses = {0};
        private double[] candidates;
        private double priorMean = 0;
        private double priorSd = Double.POSITIVE_INFINITY;
        private StopRule stopRule = StopRule.afterTrials(60);

        private Builder() {
        }

        public Builder family(Sigmoid family) {
            this.sigmoid = family;
            return this;
        }

        /** γ, from the task: 1/n for nAFC, the assumed false-alarm rate for yes/no. */
        public Builder guess(double g) {
            this.guess = g;
            return this;
        }

        public Builder thresholds(double... grid) {
            this.thresholds = grid;
            return this;
        }

        public Builder spreads(double... grid) {
            this.spreads = grid;
            return this;
        }

        /** One value fixes λ; several marginalise over them. */
        public Builder lapses(double... grid) {
            this.lapses = grid;
            return this;
        }

        public Builder candidates(double... values) {
            this.candidates = values;
            return this;
        }

        /** Gaussian prior on the threshold α; sd = +∞ for a flat prior. */
        public Builder prior(double mean, double sd) {
            this.priorMean = mean;
            this.priorSd = sd;
            return this;
        }

        public Builder stop(StopRule rule) {
            this.stopRule = rule;
            return this;
        }

        public PsiSettings build() {
            return new PsiSettings(this);
        }
    }
}
