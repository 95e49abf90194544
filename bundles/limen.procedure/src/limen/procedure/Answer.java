package limen.procedure;

/**
 * A listener's answer: the chosen interval (0-based) in nAFC, or yes / no.
 *
 * @param code the interval index for nAFC; 1 for yes and 0 for no in yes/no tasks
 */
public record Answer(int code) {

    /** @throws IllegalArgumentException for a negative code */
    public Answer {
        if (code < 0) {
            throw new IllegalArgumentException("answer code must be >= 0, was " + code);
        }
    }

    /** @return the answer "the target was in interval i" (0-based) */
    public static Answer interval(int i) {
        return new Answer(i);
    }

    /** @return a yes/no answer */
    public static Answer yesNo(boolean yes) {
        return new Answer(yes ? 1 : 0);
    }

    /** @return for yes/no tasks, whether the answer was yes */
    public boolean yes() {
        return code == 1;
    }
}
