package limen.procedure;

import java.util.List;
import java.util.Objects;

/**
 * When a procedure is done: after a number of reversals, of trials, or once the uncertainty of
 * its estimate (the posterior standard deviation for Bayesian methods) is below a target;
 * combinable with {@link #or} and {@link #and}. Immutable.
 */
public interface StopRule {

    /** @return true when the procedure should stop */
    boolean isMet(AdaptiveProcedure p);

    /** @return a short text form, e.g. {@code "reversals>=12 or trials>=80"} */
    String describe();

    /** @return a rule met after n reversals */
    static StopRule afterReversals(int n) {
        positive(n, "reversal count");
        return new Simple("reversals>=" + n, p -> p.reversals().size() >= n);
    }

    /** @return a rule met after n recorded trials */
    static StopRule afterTrials(int n) {
        positive(n, "trial count");
        return new Simple("trials>=" + n, p -> p.trials() >= n);
    }

    /**
     * @param sd the target, &gt; 0, in the unit of the estimate's uncertainty
     * @return a rule met once an estimate is available whose uncertainty is below sd
     */
    static StopRule uncertaintyBelow(double sd) {
        if (!(sd > 0) || Double.isInfinite(sd)) {
            throw new IllegalArgumentException("uncertainty target must be finite and > 0, was " + sd);
        }
        return new Simple("sd<" + sd, p -> {
            Estimate e = p.estimate();
            return e.available() && e.uncertainty() < sd;
        });
    }

    /** @return a rule that is never met (the method's own end, e.g. a constant-stimuli plan, decides) */
    static StopRule never() {
        return new Simple("never", p -> false);
    }

    /** @return a rule met when this or the other is met */
    default StopRule or(StopRule other) {
        Objects.requireNonNull(other, "other");
        StopRule self = this;
        return new Simple("(" + describe() + " or " + other.describe() + ")", p -> self.isMet(p) || other.isMet(p));
    }

    /** @return a rule met when both this and the other are met */
    default StopRule and(StopRule other) {
        Objects.requireNonNull(other, "other");
        StopRule self = this;
        return new Simple("(" + describe() + " and " + other.describe() + ")", p -> self.isMet(p) && other.isMet(p));
    }

    /** @return a rule met when any of the rules is met */
    static StopRule anyOf(List<StopRule> rules) {
        if (rules.isEmpty()) {
            throw new IllegalArgumentException("anyOf needs at least one rule");
        }
        StopRule r = rules.get(0);
        for (int i = 1; i < rules.size(); i++) {
            r = r.or(rules.get(i));
        }
        return r;
    }

    private static void positive(int n, String what) {
        if (n < 1) {
            throw new IllegalArgumentException(what + " must be >= 1, was " + n);
        }
    }

    /** A described predicate. */
    final class Simple implements StopRule {
        private final String text;
        private final java.util.function.Predicate<AdaptiveProcedure> test;

        private Simple(String text, java.util.function.Predicate<AdaptiveProcedure> test) {
            this.text = text;
            this.test = test;
        }

        @Override
        public boolean isMet(AdaptiveProcedure p) {
            return test.test(p);
        }

        @Override
        public String describe() {
            return text;
        }

        @Override
        public String toString() {
            return text;
        }
    }
}
