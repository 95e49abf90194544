package limen.procedure;

/**
 * How a staircase moves: by adding and subtracting a step (x ± Δ), or by multiplying and dividing by
 * a factor (x·f, x/f), which is an additive step of ln f on ln x. Staircases work internally on the
 * working value u = x (additive) or u = ln x (multiplicative); averages of reversals are then
 * arithmetic or geometric means of x.
 */
public enum StepScale {
    /** x ± Δ; steps are given in the unit of x */
    ADDITIVE,
    /** x·f or x/f; steps are given as factors f &gt; 1; x must stay &gt; 0 */
    MULTIPLICATIVE;

    /** @return u = x or ln x */
    public double toWorking(double x) {
        if (this == ADDITIVE) {
            return x;
        }
        if (!(x > 0)) {
            throw new IllegalArgumentException("a multiplicative track needs values > 0, was " + x);
        }
        return Math.log(x);
    }

    /** @return x = u or exp(u) */
    public double fromWorking(double u) {
        return this == ADDITIVE ? u : Math.exp(u);
    }

    /**
     * @param step a step as given by the author: Δ &gt; 0 (additive) or a factor f &gt; 1 (multiplicative)
     * @return the step on the working scale: Δ or ln f
     */
    public double stepToWorking(double step, String what) {
        if (this == ADDITIVE) {
            if (!(step > 0) || Double.isInfinite(step)) {
                throw new IllegalArgumentException(what + " must be finite and > 0, was " + step);
            }
            return step;
        }
        if (!(step > 1) || Double.isInfinite(step)) {
            throw new IllegalArgumentException(what + " of a multiplicative track must be a finite factor > 1, was " + step);
        }
        return Math.log(step);
    }

    /** @return the author's form of a working step: Δ or exp(Δ) */
    public double stepFromWorking(double workingStep) {
        return this == ADDITIVE ? workingStep : Math.exp(workingStep);
    }
}
