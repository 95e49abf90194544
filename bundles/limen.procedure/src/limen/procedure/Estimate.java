package limen.procedure;

import java.util.Objects;

/**
 * A procedure's current estimate of the value at its {@link Target}, with an uncertainty whose
 * meaning is given by {@link #kind()}.
 *
 * @param value       the estimate in the unit the track reports, NaN while none is available
 * @param uncertainty the uncertainty (see {@link Kind}), NaN when not available; never negative
 * @param kind        what the uncertainty means
 * @param basis       how many items the estimate rests on: reversals for staircases, trials otherwise
 */
public record Estimate(double value, double uncertainty, Kind kind, int basis) {

    /** What {@link Estimate#uncertainty()} means. */
    public enum Kind {
        /** sample standard deviation of the reversal values averaged (not a standard error: reversals are correlated) */
        REVERSAL_SD,
        /** standard deviation of the posterior distribution of the estimated quantity */
        POSTERIOR_SD,
        /** the step size the procedure would use next (PEST: the resolution reached) */
        STEP_SIZE,
        /** asymptotic standard error from the Fisher information of a maximum-likelihood fit */
        STANDARD_ERROR,
        /** no estimate available yet */
        NONE
    }

    /** An estimate that is not available yet. */
    public static Estimate none(int basis) {
        return new Estimate(Double.NaN, Double.NaN, Kind.NONE, basis);
    }

    /** @throws IllegalArgumentException for a negative uncertainty or basis */
    public Estimate {
        Objects.requireNonNull(kind, "kind");
        if (uncertainty < 0) {
            throw new IllegalArgumentException("uncertainty must be >= 0 or NaN, was " + uncertainty);
        }
        if (basis < 0) {
            throw new IllegalArgumentException("basis must be >= 0, was " + basis);
        }
    }

    /** @return true when {@link #value()} is a number */
    public boolean available() {
        return !Double.isNaN(value);
    }
}
