package limen.ui.authoring.edit;

import java.util.Locale;

/**
 * The values a settings field accepts while the author types: a number type and a closed range. Values
 * outside it are never written to the battery (the field says why); values inside it reach the model, where
 * {@code BatteryValidator} judges them together with the other settings (e.g. a start value above the ceiling).
 * The ranges are physical plausibility bounds of the form, not the validator's rules.
 *
 * @param integral whether only whole numbers are accepted
 * @param min the smallest accepted value
 * @param max the largest accepted value
 */
public record Domain(boolean integral, double min, double max) {

    /** Any finite number of ordinary magnitude. */
    public static final Domain FINITE = new Domain(false, -1e9, 1e9);
    /** Zero or more. */
    public static final Domain NON_NEGATIVE = new Domain(false, 0, 1e9);
    /** A duration in seconds, up to an hour. */
    public static final Domain DURATION = new Domain(false, 0, 3600);
    /** A frequency in Hz, up to 1 MHz (the calibration decides what is playable). */
    public static final Domain FREQUENCY = new Domain(false, 0, 1e6);
    /** A level or level offset in dB. */
    public static final Domain LEVEL = new Domain(false, -200, 200);
    /** A probability or rate. */
    public static final Domain PROBABILITY = new Domain(false, 0, 1);
    /** A count. */
    public static final Domain COUNT = new Domain(true, 0, 1_000_000);
    /** A seed (any whole number). */
    public static final Domain SEED = new Domain(true, Long.MIN_VALUE, Long.MAX_VALUE);

    /** Checks the range. */
    public Domain {
        if (!(min <= max)) {
            throw new IllegalArgumentException("domain needs min <= max: " + min + ", " + max);
        }
    }

    /** @return whether a character may appear while typing a number of this domain */
    public boolean mayContain(char c) {
        return Character.isDigit(c) || c == '-' || c == '+' || (!integral && (c == '.' || c == 'e' || c == 'E'));
    }

    /**
     * @param text what the author typed
     * @return null when the text is an accepted value, else why not (e.g. "must be between 0 and 1")
     */
    public String refusal(String text) {
        String t = text.trim();
        if (t.isEmpty()) {
            return "a value is required";
        }
        double v;
        try {
            v = integral ? Long.parseLong(t) : Double.parseDouble(t);
        } catch (NumberFormatException e) {
            return "'" + t + "' is not " + (integral ? "a whole number" : "a number");
        }
        if (!Double.isFinite(v)) {
            return "'" + t + "' is not a finite number";
        }
        if (v < min || v > max) {
            return "must lie between " + Units.format(min) + " and " + Units.format(max) + ", not " + t;
        }
        return null;
    }

    /** @return "0 to 1" for the tool tip */
    public String describe() {
        if (this.equals(SEED)) {
            return "any whole number";
        }
        return String.format(Locale.ROOT, "%s%s to %s", integral ? "whole number, " : "", Units.format(min),
                Units.format(max));
    }
}
