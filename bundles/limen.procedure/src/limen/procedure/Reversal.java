package limen.procedure;

/**
 * A change of direction of a track: the value presented on the trial whose answer sent the track
 * the other way (a peak or a valley of the track).
 *
 * @param trial     1-based index of that trial among the procedure's recorded trials
 * @param value     the value presented on that trial
 * @param direction the new direction, {@link Direction#DOWN} at a peak (harder from here on),
 *                  {@link Direction#UP} at a valley
 */
public record Reversal(int trial, double value, Direction direction) {

    /** The direction of a move: larger values are easier, so {@code DOWN} makes the task harder. */
    public enum Direction {
        /** towards smaller values (harder) */
        DOWN,
        /** towards larger values (easier) */
        UP
    }

    /** @throws IllegalArgumentException for a trial index below 1 or a non-finite value */
    public Reversal {
        if (trial < 1) {
            throw new IllegalArgumentException("reversal trial index must be >= 1, was " + trial);
        }
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("reversal value must be finite, was " + value);
        }
        java.util.Objects.requireNonNull(direction, "direction");
    }
}
