package limen.procedure;

import java.util.Objects;
import java.util.random.RandomGenerator;

import limen.psychometric.PsychometricFunction;
import limen.psychometric.Sigmoid;
import limen.psychometric.Sigmoids;

/**
 * Immutable settings of the method of constant stimuli: a fixed set of values, each presented
 * {@code repetitionsPerBlock} times in every block, in an order shuffled anew for each block
 * (Fisher-Yates with the procedure's seeded generator); the run ends after {@code blocks} blocks.
 * <p>
 * The estimate is the value at the target of a maximum-likelihood fit of ψ = γ + (1 − γ − λ)F
 * (family, γ and λ fixed by these settings; location and spread free) to the counts so far, with its
 * asymptotic standard error from the observed information (delta method).
 */
public final class ConstantStimuliSettings implements ProcedureFactory {

    private final double[] values;
    private final int repetitionsPerBlock;
    private final int blocks;
    private final Sigmoid sigmoid;
    private final double guess;
    private final double lapse;
    private final Target target;

    private ConstantStimuliSettings(Builder b) {
        if (b.values == null || b.values.length < 2) {
            throw new IllegalArgumentException("constant stimuli need at least 2 values");
        }
        this.values = b.values.clone();
        for (double v : values) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("constant-stimuli values must be finite, had " + v);
            }
        }
        if (b.repetitionsPerBlock < 1 || b.blocks < 1) {
            throw new IllegalArgumentException("repetitions per block and blocks must be >= 1, were " + b.repetitionsPerBlock
                    + " and " + b.blocks);
        }
        this.repetitionsPerBlock = b.repetitionsPerBlock;
        this.blocks = b.blocks;
        this.sigmoid = Objects.requireNonNull(b.sigmoid, "sigmoid");
        new PsychometricFunction(sigmoid, 1, 1, b.guess, b.lapse); // validates γ and λ
        this.guess = b.guess;
        this.lapse = b.lapse;
        this.target = Objects.requireNonNull(b.target, "target");
    }

    /** @return a builder: logistic fit with guess 0.5 and lapse 0, target ψ = 0.75, 1 repetition, 10 blocks */
    public static Builder builder() {
        return new Builder();
    }

    @Override
    public ConstantStimuli create(RandomGenerator rng) {
        return new ConstantStimuli(this, rng);
    }

    public double[] values() {
        return values.clone();
    }

    double[] valuesShared() {
        return values;
    }

    public int repetitionsPerBlock() {
        return repetitionsPerBlock;
    }

    public int blocks() {
        return blocks;
    }

    public int totalTrials() {
        return values.length * repetitionsPerBlock * blocks;
    }

    public Sigmoid sigmoid() {
        return sigmoid;
    }

    public double guess() {
        return guess;
    }

    public double lapse() {
        return lapse;
    }

    public Target target() {
        return target;
    }

    /** Mutable builder; {@link #build()} validates. */
    public static final class Builder {
        private double[] values;
        private int repetitionsPerBlock = 1;
        private int blocks = 10;
        private Sigmoid sigmoid = Sigmoids.LOGISTIC;
        private double guess = 0.5;
        private double lapse;
        private Target target = Target.psi(0.75);

        private Builder() {
        }

        public Builder values(double... v) {
            this.values = v;
            return this;
        }

        public Builder blocks(int repetitions, int blockCount) {
            this.repetitionsPerBlock = repetitions;
            this.blocks = blockCount;
            return this;
        }

        /** The family and fixed γ, λ of the fit behind the estimate. */
        public Builder fit(Sigmoid family, double guessRate, double lapseRate) {
            this.sigmoid = family;
            this.guess = guessRate;
            this.lapse = lapseRate;
            return this;
        }

        public Builder target(Target t) {
            this.target = t;
            return this;
        }

        public ConstantStimuliSettings build() {
            return new ConstantStimuliSettings(this);
        }
    }
}
