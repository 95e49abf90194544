package limen.procedure;

/**
 * One scored trial as a procedure sees it: the value presented and whether the answer was correct
 * (for yes/no signal trials, "correct" means the listener said yes). Catch trials never reach a
 * procedure; see {@link AdaptiveTrack}.
 *
 * @param value   the presented value, in the unit the track reports; finite
 * @param correct true for a correct answer
 */
public record Response(double value, boolean correct) {

    /** @throws IllegalArgumentException if the value is not finite */
    public Response {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("response value must be finite, was " + value);
        }
    }
}
