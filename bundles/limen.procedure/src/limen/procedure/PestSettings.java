package limen.procedure;

import java.util.Objects;
import java.util.random.RandomGenerator;

/**
 * Immutable settings of PEST, Parameter Estimation by Sequential Testing (Taylor, M. M. &amp;
 * Creelman, C. D. (1967), JASA 41(4), 782-787).
 * <p>
 * Testing stays at one level until the count of correct answers N_C among the N_T trials there
 * leaves the band P_t·N_T ± W (Wald's sequential deviation limit W; the level moves down, harder,
 * when N_C &gt; P_t·N_T + W and up when N_C &lt; P_t·N_T − W); the counts restart at each new level.
 * The step rules, as implemented (recalled, marked <em>from memory</em>, not read in the printed
 * paper):
 * <ol>
 * <li>on every reversal of direction the step is halved;</li>
 * <li>the second step in one direction has the same size as the first;</li>
 * <li>the fourth and later steps in one direction are each double their predecessor;</li>
 * <li>the third step in one direction is doubled, unless the step just before the most recent
 * reversal was itself a doubling, in which case it stays the same;</li>
 * <li>steps never exceed the maximum step; when the step called for falls below the minimum
 * step the run ends if {@link #endAtMinimumStep()} (the level it moves to is the final estimate),
 * otherwise the step is held at the minimum.</li>
 * </ol>
 * Steps are additive or multiplicative ({@link StepScale}); values are clamped to [floor, ceiling].
 */
public final class PestSettings implements ProcedureFactory {

    private final double targetProbability;
    private final double waldLimit;
    private final StepScale scale;
    private final double start;
    private final double initialStepWorking;
    private final double minimumStepWorking;
    private final double maximumStepWorking;
    private final boolean endAtMinimumStep;
    private final double floor;
    private final double ceiling;
    private final StopRule stopRule;

    private PestSettings(Builder b) {
        if (!(b.targetProbability > 0 && b.targetProbability < 1)) {
            throw new IllegalArgumentException("PEST target proportion must be in (0, 1), was " + b.targetProbability);
        }
        if (!(b.waldLimit > 0) || Double.isInfinite(b.waldLimit)) {
            throw new IllegalArgumentException("Wald deviation limit W must be finite and > 0, was " + b.waldLimit);
        }
        this.targetProbability = b.targetProbability;
        this.waldLimit = b.waldLimit;
        this.scale = Objects.requireNonNull(b.scale, "scale");
        if (!Double.isFinite(b.start)) {
            throw new IllegalArgumentException("start value must be set and finite, was " + b.start);
        }
        scale.toWorking(b.start);
        this.start = b.start;
        this.initialStepWorking = scale.stepToWorking(b.initialStep, "initial step");
        this.minimumStepWorking = Double.isNaN(b.minimumStep) ? 0 : scale.stepToWorking(b.minimumStep, "minimum step");
        this.maximumStepWorking = Double.isNaN(b.maximumStep) ? Double.POSITIVE_INFINITY
                : scale.stepToWorking(b.maximumStep, "maximum step");
        if (!(minimumStepWorking <= initialStepWorking && initialStepWorking <= maximumStepWorking)) {
            throw new IllegalArgumentException("need minimum step <= initial step <= maximum step, were " + b.minimumStep
                    + ", " + b.initialStep + ", " + b.maximumStep);
        }
        this.endAtMinimumStep = b.endAtMinimumStep;
        if (endAtMinimumStep && minimumStepWorking == 0) {
            throw new IllegalArgumentException("ending at the minimum step needs a minimum step");
        }
        double fl = scale == StepScale.MULTIPLICATIVE && b.floor == Double.NEGATIVE_INFINITY ? 0 : b.floor;
        if (!(fl < b.ceiling) || b.start < fl || b.start > b.ceiling) {
            throw new IllegalArgumentException("need floor < ceiling and the start inside, were floor " + fl + ", ceiling "
                    + b.ceiling + ", start " + b.start);
        }
        this.floor = fl;
        this.ceiling = b.ceiling;
        this.stopRule = Objects.requireNonNull(b.stopRule, "stop rule");
    }

    /** @return a builder: P_t 0.75, W = 1, additive steps of 1, no limits, ending at the minimum step only if one is set */
    public static Builder builder() {
        return new Builder();
    }

    @Override
    public Pest create(RandomGenerator rng) {
        return new Pest(this);
    }

    public double targetProbability() {
        return targetProbability;
    }

    public Target target() {
        return Target.psi(targetProbability);
    }

    public double waldLimit() {
        return waldLimit;
    }

    public StepScale scale() {
        return scale;
    }

    public double start() {
        return start;
    }

    double initialStepWorking() {
        return initialStepWorking;
    }

    double minimumStepWorking() {
        return minimumStepWorking;
    }

    double maximumStepWorking() {
        return maximumStepWorking;
    }

    public boolean endAtMinimumStep() {
        return endAtMinimumStep;
    }

    public double floor() {
        return floor;
    }

    public double ceiling() {
        return ceiling;
    }

    public StopRule stopRule() {
        return stopRule;
    }

    /** Mutable builder; {@link #build()} validates. */
    public static final class Builder {
        private double targetProbability = 0.75;
        private double waldLimit = 1;
        private StepScale scale = StepScale.ADDITIVE;
        private double start = Double.NaN;
        private double initialStep = 1;
        private double minimumStep = Double.NaN;
        private double maximumStep = Double.NaN;
        private boolean endAtMinimumStep;
        private double floor = Double.NEGATIVE_INFINITY;
        private double ceiling = Double.POSITIVE_INFINITY;
        private StopRule stopRule = StopRule.never();

        private Builder() {
        }

        public Builder target(double p) {
            this.targetProbability = p;
            return this;
        }

        public Builder waldLimit(double w) {
            this.waldLimit = w;
            return this;
        }

        public Builder start(double value) {
            this.start = value;
            return this;
        }

        public Builder additive(double initialStep) {
            this.scale = StepScale.ADDITIVE;
            this.initialStep = initialStep;
            return this;
        }

        public Builder multiplicative(double initialFactor) {
            this.scale = StepScale.MULTIPLICATIVE;
            this.initialStep = initialFactor;
            return this;
        }

        /** Minimum and maximum step (Δ or factor); NaN for none. */
        public Builder stepLimits(double minimum, double maximum) {
            this.minimumStep = minimum;
            this.maximumStep = maximum;
            return this;
        }

        /** End the run when the step called for falls below the minimum step (the original PEST ending). */
        public Builder endAtMinimumStep(boolean end) {
            this.endAtMinimumStep = end;
            return this;
        }

        public Builder limits(double floorValue, double ceilingValue) {
            this.floor = floorValue;
            this.ceiling = ceilingValue;
            return this;
        }

        /** An additional stop rule (e.g. a trial cap); the minimum-step ending applies as well. */
        public Builder stop(StopRule rule) {
            this.stopRule = rule;
            return this;
        }

        public PestSettings build() {
            return new PestSettings(this);
        }
    }
}
