package limen.procedure.internal;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Objects;

import limen.procedure.AdaptiveProcedure;
import limen.procedure.Response;
import limen.procedure.Reversal;
import limen.procedure.StopRule;

/**
 * The bookkeeping every procedure shares: the pending value (computed once, so any randomness it
 * draws is drawn in trial order, also on replay), the response log, reversals and the stop rule.
 */
public abstract class AbstractProcedure implements AdaptiveProcedure {

    private final StopRule stopRule;
    private final List<Response> responses = new ArrayList<>();
    private final List<Reversal> reversals = new ArrayList<>();
    private double pending;
    private boolean hasPending;

    protected AbstractProcedure(StopRule stopRule) {
        this.stopRule = Objects.requireNonNull(stopRule, "stopRule");
    }

    /** @return the value to present next; called once per trial, before {@link #update} */
    protected abstract double computeNext();

    /** Advances the state by one trial (the response is already in {@link #responses()}). */
    protected abstract void update(double value, boolean correct);

    /** @return true when the method itself has ended (e.g. an exhausted plan), apart from the stop rule */
    protected boolean methodEnded() {
        return false;
    }

    @Override
    public final double nextValue() {
        if (finished()) {
            throw new IllegalStateException("procedure finished after " + trials() + " trials (" + stopRule.describe() + ")");
        }
        if (!hasPending) {
            pending = computeNext();
            hasPending = true;
        }
        return pending;
    }

    @Override
    public final void record(double value, boolean correct) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("recorded value must be finite, was " + value);
        }
        checkValue(value);
        nextValue(); // draws whatever the pending value needs, in trial order
        hasPending = false;
        responses.add(new Response(value, correct));
        update(value, correct);
    }

    /** Hook to reject values the method cannot take; throws IllegalArgumentException. */
    protected void checkValue(double value) {
    }

    @Override
    public final boolean finished() {
        return methodEnded() || stopRule.isMet(this);
    }

    @Override
    public final int trials() {
        return responses.size();
    }

    @Override
    public final List<Response> responses() {
        return Collections.unmodifiableList(responses);
    }

    @Override
    public final List<Reversal> reversals() {
        return Collections.unmodifiableList(reversals);
    }

    /** Adds a reversal observed on the trial just recorded. */
    protected final void addReversal(double value, Reversal.Direction newDirection) {
        reversals.add(new Reversal(trials(), value, newDirection));
    }

    protected final StopRule stopRule() {
        return stopRule;
    }
}
