package limen.procedure;

import java.util.List;

/**
 * An adaptive psychophysical method as a small deterministic state machine over numbers.
 * <p>
 * The protocol per trial is {@link #nextValue()} (idempotent until the next {@link #record}),
 * present that value, then {@link #record(double, boolean)}. Larger values are assumed to be
 * easier (ψ increases with x). All randomness a procedure uses comes from the generator its
 * {@link ProcedureFactory} was given, drawn in an order fixed by the sequence of recorded trials, so
 * a procedure created from an equally seeded generator and fed the same responses
 * ({@link ProcedureFactory#replay}) is in the same state: this is how a session resumes after a
 * crash.
 * <p>
 * Implementations are not thread-safe.
 */
public interface AdaptiveProcedure {

    /**
     * @return the value to present next, in the unit the track reports; the same until a trial is recorded
     * @throws IllegalStateException when {@link #finished()}
     */
    double nextValue();

    /**
     * Records one trial. The value is the one actually presented, normally {@link #nextValue()}
     * (a runner may have rounded it); procedures continue from the recorded value.
     *
     * @param value   the presented value, finite
     * @param correct whether the answer was correct
     * @throws IllegalStateException when {@link #finished()}
     * @throws IllegalArgumentException for a non-finite value or one the method cannot take
     *                                  (e.g. a non-positive value on a multiplicative track)
     */
    void record(double value, boolean correct);

    /** @return true when the stopping rule is met; then no more trials are accepted */
    boolean finished();

    /** @return the current estimate at {@link #target()}; {@link Estimate#available()} is false until there is one */
    Estimate estimate();

    /** @return the point of the psychometric function that {@link #estimate()} aims at */
    Target target();

    /** @return the number of trials recorded */
    int trials();

    /** @return the reversals so far, oldest first (unmodifiable; empty for methods without reversals) */
    List<Reversal> reversals();

    /** @return the recorded responses, oldest first (unmodifiable), enough to rebuild this state by replay */
    List<Response> responses();
}
