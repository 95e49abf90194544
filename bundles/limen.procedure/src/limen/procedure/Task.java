package limen.procedure;

import java.util.random.RandomGenerator;

/**
 * The listener's task: n-alternative forced choice with the target interval drawn uniformly at
 * random, or yes/no where each trial is a catch trial (no signal) with a set probability. Immutable.
 */
public sealed interface Task permits Task.ForcedChoice, Task.YesNo {

    /** @return the plan for one trial at this value, drawing what is random from rng */
    TrialPlan plan(double value, RandomGenerator rng);

    /** @return whether the answer to this plan is correct (for catch trials: a correct rejection) */
    boolean isCorrect(TrialPlan plan, Answer answer);

    /**
     * n-AFC with n = 2, 3 or more intervals; guess rate 1/n.
     *
     * @param intervals n &ge; 2
     */
    record ForcedChoice(int intervals) implements Task {

        public ForcedChoice {
            if (intervals < 2) {
                throw new IllegalArgumentException("forced choice needs >= 2 intervals, was " + intervals);
            }
        }

        /** @return 1/n */
        public double guessRate() {
            return 1.0 / intervals;
        }

        @Override
        public TrialPlan plan(double value, RandomGenerator rng) {
            return new TrialPlan(value, intervals, rng.nextInt(intervals), false);
        }

        @Override
        public boolean isCorrect(TrialPlan plan, Answer answer) {
            if (answer.code() >= intervals) {
                throw new IllegalArgumentException("answer interval " + answer.code() + " does not exist in " + intervals + "AFC");
            }
            return answer.code() == plan.targetInterval();
        }
    }

    /**
     * Yes/no with catch trials: each trial is a catch trial with probability {@code catchRate}.
     *
     * @param catchRate probability of a catch trial, 0 &le; c &lt; 1
     */
    record YesNo(double catchRate) implements Task {

        public YesNo {
            if (!(catchRate >= 0 && catchRate < 1)) {
                throw new IllegalArgumentException("catch-trial rate must be in [0, 1), was " + catchRate);
            }
        }

        @Override
        public TrialPlan plan(double value, RandomGenerator rng) {
            // Draw even when catchRate is 0, so the sequence of draws does not depend on the rate.
            boolean isCatch = rng.nextDouble() < catchRate;
            return isCatch ? new TrialPlan(value, 1, -1, true) : new TrialPlan(value, 1, 0, false);
        }

        @Override
        public boolean isCorrect(TrialPlan plan, Answer answer) {
            if (answer.code() > 1) {
                throw new IllegalArgumentException("a yes/no answer must be 0 or 1, was " + answer.code());
            }
            return plan.catchTrial() != answer.yes();
        }
    }
}
