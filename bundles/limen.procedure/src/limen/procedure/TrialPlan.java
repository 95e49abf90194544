package limen.procedure;

/**
 * What one trial presents: the value, and either the interval holding the target (nAFC) or, for
 * yes/no, whether this is a catch trial (no signal at all).
 *
 * @param value          the value of the varied quantity
 * @param intervals      number of observation intervals: n for nAFC, 1 for yes/no
 * @param targetInterval 0-based interval of the target in nAFC; 0 for yes/no signal trials, −1 for catch trials
 * @param catchTrial     true for a yes/no trial without signal
 */
public record TrialPlan(double value, int intervals, int targetInterval, boolean catchTrial) {

    /** @throws IllegalArgumentException for inconsistent fields */
    public TrialPlan {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("trial value must be finite, was " + value);
        }
        if (intervals < 1) {
            throw new IllegalArgumentException("intervals must be >= 1, was " + intervals);
        }
        if (catchTrial ? (intervals != 1 || targetInterval != -1) : (targetInterval < 0 || targetInterval >= intervals)) {
            throw new IllegalArgumentException("target interval " + targetInterval + " does not fit " + intervals
                    + " interval(s)" + (catchTrial ? " on a catch trial (needs 1 interval and -1)" : ""));
        }
    }

    /** @return true for an nAFC plan (2 or more intervals) */
    public boolean forcedChoice() {
        return intervals > 1;
    }
}
