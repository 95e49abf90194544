package limen.signal;

/** Which earphone a sound goes to: channel 0 is the left ear, channel 1 the right. */
public enum Ear {
    /** Channel 0 only. */
    LEFT,
    /** Channel 1 only. */
    RIGHT,
    /** Both channels, the same signal (diotic). */
    BOTH;

    /** Whether this routing drives channel {@code channel} (0 = left, 1 = right). */
    public boolean drives(int channel) {
        return switch (this) {
            case LEFT -> channel == 0;
            case RIGHT -> channel == 1;
            case BOTH -> channel == 0 || channel == 1;
        };
    }
}
