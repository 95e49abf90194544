package limen.fit;

/**
 * An immutable two-sided confidence interval [lower, upper] at a coverage level, with the method that made it.
 * Bounds are NaN when the bootstrap could not produce them (too few usable replicates; for BCa, every
 * replicate on one side of the estimate).
 */
public final class ConfidenceInterval {

    private final double lower;
    private final double upper;
    private final double level;
    private final IntervalMethod method;

    /**
     * @throws IllegalArgumentException for a level outside (0, 1) or lower &gt; upper
     */
    public ConfidenceInterval(double lower, double upper, double level, IntervalMethod method) {
        if (!(level > 0 && level < 1)) {
            throw new IllegalArgumentException("confidence level must be in (0, 1), was " + level);
        }
        if (lower > upper) {
            throw new IllegalArgumentException("lower bound " + lower + " exceeds upper bound " + upper);
        }
        this.lower = lower;
        this.upper = upper;
        this.level = level;
        this.method = method;
    }

    public double lower() {
        return lower;
    }

    public double upper() {
        return upper;
    }

    /** @return the nominal coverage, e.g. 0.95 */
    public double level() {
        return level;
    }

    public IntervalMethod method() {
        return method;
    }

    /** @return true when both bounds are numbers */
    public boolean isDefined() {
        return !Double.isNaN(lower) && !Double.isNaN(upper);
    }

    @Override
    public String toString() {
        return method + " " + level * 100 + "% [" + lower + ", " + upper + "]";
    }
}
