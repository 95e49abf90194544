package limen.fit;

/**
 * The data cannot identify the psychometric function (for example fewer than two distinct stimulus
 * values, or every cell at the same proportion correct). The message says why, with the offending values.
 */
public final class NotIdentifiableException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    public NotIdentifiableException(String message) {
        super(message);
    }
}
