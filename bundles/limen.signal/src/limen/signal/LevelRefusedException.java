package limen.signal;

/**
 * The safety guard refused a stimulus: too loud for the calibration's ceiling, or it would clip digital full
 * scale. The message gives the requested and the allowed level and, where it applies, the frequency.
 */
public final class LevelRefusedException extends IllegalStateException {

    private static final long serialVersionUID = 1L;

    private final double requestedLevel;
    private final double allowedLevel;
    private final String unit;

    LevelRefusedException(String message, double requestedLevel, double allowedLevel, String unit) {
        super(message);
        this.requestedLevel = requestedLevel;
        this.allowedLevel = allowedLevel;
        this.unit = unit;
    }

    /** The refused level (declared, measured, or the peak for clipping), in {@link #unit()}. */
    public double requestedLevel() {
        return requestedLevel;
    }

    /** The allowed level in {@link #unit()}: the calibration's ceiling, or 0 dBFS peak for clipping. */
    public double allowedLevel() {
        return allowedLevel;
    }

    /** {@code dB SPL} or {@code dBFS}. */
    public String unit() {
        return unit;
    }
}
