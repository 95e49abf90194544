package limen.procedure;

import java.util.Objects;
import java.util.random.RandomGenerator;

import limen.procedure.internal.TransformedTarget;

/**
 * Immutable settings of a transformed up-down staircase (Levitt 1971, JASA 49(2B), 467-477): the
 * track moves down (harder) after {@code nDown} correct answers in a row and up after {@code mUp}
 * wrong answers in a row, by a down step Δ and an up step r·Δ (r = {@link #upDownStepRatio()}).
 * With n = m = 1 and r = p/(1 − p) this is the weighted up-down method of Kaernbach (1991),
 * Perception &amp; Psychophysics 49(3), 227-229, converging where p·S_down = (1 − p)·S_up.
 * <p>
 * Steps are additive (x ± Δ) or multiplicative (x·f, x/f); see {@link StepScale}. The step
 * schedule: the initial step is multiplied (on the working scale) by {@code shrinkFactor} at every
 * {@code shrinkEveryReversals}-th reversal, never below the minimum step. Values are clamped to
 * [floor, ceiling]. The threshold is the mean, on the working scale (arithmetic for additive,
 * geometric for multiplicative), of the last {@code useLastReversals} reversal values after the first
 * {@code discardReversals} are dropped (0 = all remaining).
 * <p>
 * {@link #target()} is the small-step convergence point of the rule, computed exactly from the
 * run-counter Markov chain (see {@link #targetProbability()}).
 */
public final class UpDownSettings implements ProcedureFactory {

    private final int nDown;
    private final int mUp;
    private final StepScale scale;
    private final double start;
    private final double initialStepWorking;
    private final double upDownStepRatio;
    private final double shrinkFactor;
    private final int shrinkEveryReversals;
    private final double minimumStepWorking;
    private final double floor;
    private final double ceiling;
    private final int discardReversals;
    private final int useLastReversals;
    private final StopRule stopRule;
    private final double targetProbability;

    private UpDownSettings(Builder b) {
        if (b.nDown < 1 || b.mUp < 1) {
            throw new IllegalArgumentException("n-down and m-up must be >= 1, were " + b.nDown + " and " + b.mUp);
        }
        this.nDown = b.nDown;
        this.mUp = b.mUp;
        this.scale = Objects.requireNonNull(b.scale, "scale");
        if (!Double.isFinite(b.start)) {
            throw new IllegalArgumentException("start value must be set and finite, was " + b.start);
        }
        this.start = b.start;
        scale.toWorking(start);
        this.initialStepWorking = scale.stepToWorking(b.initialStep, "initial step");
        if (!(b.upDownStepRatio > 0) || Double.isInfinite(b.upDownStepRatio)) {
            throw new IllegalArgumentException("up/down step ratio must be finite and > 0, was " + b.upDownStepRatio);
        }
        this.upDownStepRatio = b.upDownStepRatio;
        if (!(b.shrinkFactor > 0 && b.shrinkFactor <= 1)) {
            throw new IllegalArgumentException("step shrink factor must be in (0, 1], was " + b.shrinkFactor);
        }
        this.shrinkFactor = b.shrinkFactor;
        if (b.shrinkEveryReversals < 1) {
            throw new IllegalArgumentException("shrink interval must be >= 1 reversal, was " + b.shrinkEveryReversals);
        }
        this.shrinkEveryReversals = b.shrinkEveryReversals;
        this.minimumStepWorking = Double.isNaN(b.minimumStep) ? 0 : scale.stepToWorking(b.minimumStep, "minimum step");
        if (minimumStepWorking > initialStepWorking) {
            throw new IllegalArgumentException("minimum step " + b.minimumStep + " exceeds the initial step " + b.initialStep);
        }
        double fl = scale == StepScale.MULTIPLICATIVE && b.floor == Double.NEGATIVE_INFINITY ? 0 : b.floor;
        if (!(fl < b.ceiling)) {
            throw new IllegalArgumentException("floor must be below ceiling, were " + b.floor + " and " + b.ceiling);
        }
        if (scale == StepScale.MULTIPLICATIVE && fl < 0) {
            throw new IllegalArgumentException("a multiplicative track's floor must be >= 0, was " + b.floor);
        }
        if (start < fl || start > b.ceiling) {
            throw new IllegalArgumentException("start value " + start + " lies outside [" + fl + ", " + b.ceiling + "]");
        }
        this.floor = fl;
        this.ceiling = b.ceiling;
        if (b.discardReversals < 0 || b.useLastReversals < 0) {
            throw new IllegalArgumentException("reversal counts must be >= 0, were discard " + b.discardReversals
                    + " and use " + b.useLastReversals);
        }
        this.discardReversals = b.discardReversals;
        this.useLastReversals = b.useLastReversals;
        this.stopRule = Objects.requireNonNull(b.stopRule, "stop rule");
        this.targetProbability = TransformedTarget.solve(nDown, mUp, 1.0, upDownStepRatio);
    }

    /** @return a builder with 1-down/1-up, additive steps of 1, ratio 1, fixed steps, no limits, threshold from all reversals, stop after 12 reversals */
    public static Builder builder() {
        return new Builder();
    }

    @Override
    public UpDownStaircase create(RandomGenerator rng) {
        return new UpDownStaircase(this);
    }

    /**
     * The convergence proportion: p solving r_down(p)·S_down = r_up(p)·S_up for this rule's
     * run-counter chain; e.g. 0.7071 (2-down/1-up) and 0.7937 (3-down/1-up), p^n = 1/2 (Levitt 1971);
     * p/(1 − p) = S_up/S_down for 1-down/1-up (Kaernbach 1991).
     */
    public double targetProbability() {
        return targetProbability;
    }

    /** @return {@code Target.psi(targetProbability())} */
    public Target target() {
        return Target.psi(targetProbability);
    }

    public int nDown() {
        return nDown;
    }

    public int mUp() {
        return mUp;
    }

    public StepScale scale() {
        return scale;
    }

    public double start() {
        return start;
    }

    /** @return the initial (down) step in the author's form: Δ or the factor f */
    public double initialStep() {
        return scale.stepFromWorking(initialStepWorking);
    }

    double initialStepWorking() {
        return initialStepWorking;
    }

    double minimumStepWorking() {
        return minimumStepWorking;
    }

    /** @return S_up/S_down on the working scale */
    public double upDownStepRatio() {
        return upDownStepRatio;
    }

    public double shrinkFactor() {
        return shrinkFactor;
    }

    public int shrinkEveryReversals() {
        return shrinkEveryReversals;
    }

    public double floor() {
        return floor;
    }

    public double ceiling() {
        return ceiling;
    }

    public int discardReversals() {
        return discardReversals;
    }

    public int useLastReversals() {
        return useLastReversals;
    }

    public StopRule stopRule() {
        return stopRule;
    }

    @Override
    public String toString() {
        return nDown + "-down/" + mUp + "-up " + scale + " start=" + start + " step=" + initialStep() + " ratio="
                + upDownStepRatio + " target psi=" + targetProbability + " stop " + stopRule.describe();
    }

    /** Mutable builder; {@link #build()} validates. */
    public static final class Builder {
        private int nDown = 1;
        private int mUp = 1;
        private StepScale scale = StepScale.ADDITIVE;
        private double start = Double.NaN;
        private double initialStep = 1;
        private double upDownStepRatio = 1;
        private double shrinkFactor = 1;
        private int shrinkEveryReversals = 1;
        private double minimumStep = Double.NaN;
        private double floor = Double.NEGATIVE_INFINITY;
        private double ceiling = Double.POSITIVE_INFINITY;
        private int discardReversals;
        private int useLastReversals;
        private StopRule stopRule = StopRule.afterReversals(12);

        private Builder() {
        }

        /** n-down/m-up: down after n correct in a row, up after m wrong in a row. */
        public Builder rule(int nDownCorrect, int mUpWrong) {
            this.nDown = nDownCorrect;
            this.mUp = mUpWrong;
            return this;
        }

        /**
         * Kaernbach's (1991) weighted up-down: 1-down/1-up with S_up/S_down = p/(1 − p), converging at p.
         *
         * @param p the target proportion correct, 0 &lt; p &lt; 1
         */
        public Builder weighted(double p) {
            if (!(p > 0 && p < 1)) {
                throw new IllegalArgumentException("weighted up-down target must be in (0, 1), was " + p);
            }
            this.nDown = 1;
            this.mUp = 1;
            this.upDownStepRatio = p / (1 - p);
            return this;
        }

        public Builder start(double value) {
            this.start = value;
            return this;
        }

        /** Additive steps x ± Δ with initial down step Δ. */
        public Builder additive(double initialStep) {
            this.scale = StepScale.ADDITIVE;
            this.initialStep = initialStep;
            return this;
        }

        /** Multiplicative steps x·f, x/f with initial down factor f &gt; 1. */
        public Builder multiplicative(double initialFactor) {
            this.scale = StepScale.MULTIPLICATIVE;
            this.initialStep = initialFactor;
            return this;
        }

        /** S_up/S_down (on the working scale); 1 for Levitt's rules. */
        public Builder upDownStepRatio(double ratio) {
            this.upDownStepRatio = ratio;
            return this;
        }

        /** Multiply the working step by factor at every k-th reversal (factor 1 = fixed steps). */
        public Builder shrink(double factor, int everyReversals) {
            this.shrinkFactor = factor;
            this.shrinkEveryReversals = everyReversals;
            return this;
        }

        /** The smallest step: Δ (additive) or factor (multiplicative). */
        public Builder minimumStep(double step) {
            this.minimumStep = step;
            return this;
        }

        /** Clamp presented values to [floor, ceiling]. */
        public Builder limits(double floorValue, double ceilingValue) {
            this.floor = floorValue;
            this.ceiling = ceilingValue;
            return this;
        }

        /** Threshold = mean of the last {@code useLast} reversals after discarding the first {@code discard} (useLast 0 = all). */
        public Builder threshold(int discard, int useLast) {
            this.discardReversals = discard;
            this.useLastReversals = useLast;
            return this;
        }

        public Builder stop(StopRule rule) {
            this.stopRule = rule;
            return this;
        }

        public UpDownSettings build() {
            return new UpDownSettings(this);
        }
    }
}
