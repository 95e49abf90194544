package limen.procedure;

import java.util.Objects;
import java.util.random.RandomGenerator;

import limen.psychometric.ListenerSpec;
import limen.psychometric.PsychometricFunction;

/**
 * A simulated listener for design-time simulation and dry runs: a psychometric function
 * ψ = γ + (1 − γ − λ)F, with the guess rate γ from the task (1/n for nAFC, the false-alarm rate for
 * yes/no), and optionally a trial-to-trial drift of its location: a Gaussian random walk with the
 * given SD per trial (on ln α for families restricted to positive x, so α stays positive).
 * <p>
 * Answers: in nAFC the correct interval with probability ψ(x), otherwise one of the n − 1 wrong
 * intervals uniformly; in yes/no "yes" with probability ψ(x) on signal trials and with probability γ
 * (the false-alarm rate) on catch trials. Immutable; {@link #start} gives the per-run state.
 */
public final class ModelListener {

    private final PsychometricFunction function;
    private final double driftSdPerTrial;

    /**
     * @param function        the listener's ψ (its guess rate is the task's)
     * @param driftSdPerTrial SD of the location's random walk per trial, &ge; 0 (0 = no drift)
     */
    public ModelListener(PsychometricFunction function, double driftSdPerTrial) {
        this.function = Objects.requireNonNull(function, "function");
        if (!(driftSdPerTrial >= 0) || Double.isInfinite(driftSdPerTrial)) {
            throw new IllegalArgumentException("drift SD per trial must be finite and >= 0, was " + driftSdPerTrial);
        }
        this.driftSdPerTrial = driftSdPerTrial;
    }

    /**
     * @param spec           a {@link ListenerSpec}, e.g. {@code "logistic:mid=2,scale=0.5,lapse=0.02"}
     * @param task           the task; gives γ = 1/n for nAFC
     * @param falseAlarmRate γ for yes/no tasks (ignored for nAFC)
     * @return a listener without drift
     */
    public static ModelListener forTask(String spec, Task task, double falseAlarmRate) {
        return new ModelListener(ListenerSpec.parse(spec, guessFor(task, falseAlarmRate)), 0);
    }

    /** @return 1/n for nAFC, falseAlarmRate for yes/no */
    public static double guessFor(Task task, double falseAlarmRate) {
        if (task instanceof Task.ForcedChoice fc) {
            return fc.guessRate();
        }
        return falseAlarmRate;
    }

    /** @return a copy with this drift */
    public ModelListener withDrift(double sdPerTrial) {
        return new ModelListener(function, sdPerTrial);
    }

    public PsychometricFunction function() {
        return function;
    }

    public double driftSdPerTrial() {
        return driftSdPerTrial;
    }

    /** @return the listener's true value at a target (without drift) */
    public double trueValue(Target target) {
        return target.valueOn(function);
    }

    /** @return a fresh run of this listener drawing from rng */
    public Run start(RandomGenerator rng) {
        return new Run(rng);
    }

    /** One listener's state through a run (the drifted location). Not thread-safe. */
    public final class Run {
        private final RandomGenerator rng;
        private PsychometricFunction current = function;

        private Run(RandomGenerator rng) {
            this.rng = Objects.requireNonNull(rng, "rng");
        }

        /** @return the function in force for the next trial */
        public PsychometricFunction current() {
            return current;
        }

        /** Answers one trial, then lets the location drift by one step. */
        public Answer answer(TrialPlan plan) {
            Answer a;
            if (plan.catchTrial()) {
                a = Answer.yesNo(rng.nextDouble() < current.guess());
            } else {
                boolean hit = rng.nextDouble() < current.psi(plan.value());
                if (!plan.forcedChoice()) {
                    a = Answer.yesNo(hit);
                } else if (hit) {
                    a = Answer.interval(plan.targetInterval());
                } else {
                    int wrong = rng.nextInt(plan.intervals() - 1);
                    a = Answer.interval(wrong >= plan.targetInterval() ? wrong + 1 : wrong);
                }
            }
            if (driftSdPerTrial > 0) {
                double step = driftSdPerTrial * rng.nextGaussian();
                double loc = current.sigmoid().positiveDomainOnly() ? current.location() * Math.exp(step)
                        : current.location() + step;
                current = current.withLocation(loc);
            }
            return a;
        }
    }
}
