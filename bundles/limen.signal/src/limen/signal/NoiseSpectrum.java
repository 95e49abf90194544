package limen.signal;

/**
 * The long-term power spectrum a shaped noise is drawn from: power density flat ("white" within the band) or
 * proportional to {@code 1/f} ("pink": equal power per octave) between {@code lowHz} and {@code highHz},
 * optionally with a stop band (notch) {@code (notchLowHz, notchHighHz)} removed.
 *
 * @param shape flat or pink density
 * @param lowHz lower band edge, {@code > 0}
 * @param highHz upper band edge, {@code > lowHz}
 * @param notchLowHz lower notch edge, or NaN for no notch
 * @param notchHighHz upper notch edge, or NaN for no notch
 */
public record NoiseSpectrum(Shape shape, double lowHz, double highHz, double notchLowHz, double notchHighHz) {

    /** Power density over frequency. */
    public enum Shape {
        /** Constant power density (white within the band). */
        FLAT,
        /** Power density {@code ∝ 1/f} (pink: equal power in each octave). */
        PINK
    }

    /** Validates the band and the notch. */
    public NoiseSpectrum {
        if (shape == null) {
            throw new IllegalArgumentException("shape must be given");
        }
        if (!(lowHz > 0) || !(highHz > lowHz) || Double.isInfinite(highHz)) {
            throw new IllegalArgumentException("band must satisfy 0 < low < high < infinity: " + lowHz + " to "
                    + highHz + " Hz");
        }
        if (Double.isNaN(notchLowHz) != Double.isNaN(notchHighHz)) {
            throw new IllegalArgumentException("notch needs both edges or neither: " + notchLowHz + ", " + notchHighHz);
        }
        if (!Double.isNaN(notchLowHz) && !(notchLowHz >= lowHz && notchHighHz > notchLowHz && notchHighHz <= highHz
                && (notchLowHz > lowHz || notchHighHz < highHz))) {
            throw new IllegalArgumentException("notch " + notchLowHz + " to " + notchHighHz
                    + " Hz must lie inside the band " + lowHz + " to " + highHz + " Hz and leave some of it");
        }
    }

    /** Flat (white) band-pass noise from {@code lowHz} to {@code highHz}. */
    public static NoiseSpectrum band(double lowHz, double highHz) {
        return new NoiseSpectrum(Shape.FLAT, lowHz, highHz, Double.NaN, Double.NaN);
    }

    /** Pink noise from {@code lowHz} to {@code highHz}. */
    public static NoiseSpectrum pink(double lowHz, double highHz) {
        return new NoiseSpectrum(Shape.PINK, lowHz, highHz, Double.NaN, Double.NaN);
    }

    /** Flat band-stop (notched) noise: the band {@code low..high} without {@code (notchLow, notchHigh)}. */
    public static NoiseSpectrum notched(double lowHz, double highHz, double notchLowHz, double notchHighHz) {
        return new NoiseSpectrum(Shape.FLAT, lowHz, highHz, notchLowHz, notchHighHz);
    }

    /** Flat noise in the 1/b-octave band around {@code midBandHz}, edges per IEC 61260-1 ({@link OctaveBands}). */
    public static NoiseSpectrum fractionalOctave(double midBandHz, int bandwidthDesignator) {
        return band(OctaveBands.lowerEdgeHz(midBandHz, bandwidthDesignator),
                OctaveBands.upperEdgeHz(midBandHz, bandwidthDesignator));
    }

    /** Whether a notch is cut out of the band. */
    public boolean hasNotch() {
        return !Double.isNaN(notchLowHz);
    }

    /**
     * Relative power density at {@code f}: 0 outside {@code [low, high]} and inside the open notch, else 1
     * (flat) or {@code lowHz/f} (pink).
     */
    public double relativeDensity(double frequencyHz) {
        if (frequencyHz < lowHz || frequencyHz > highHz) {
            return 0.0;
        }
        if (hasNotch() && frequencyHz > notchLowHz && frequencyHz < notchHighHz) {
            return 0.0;
        }
        return shape == Shape.FLAT ? 1.0 : lowHz / frequencyHz;
    }

    /** A short description for messages, e.g. {@code flat noise 500-2000 Hz}. */
    public String describe() {
        String s = (shape == Shape.FLAT ? "flat" : "pink") + " noise " + fmt(lowHz) + "-" + fmt(highHz) + " Hz";
        return hasNotch() ? s + " notched " + fmt(notchLowHz) + "-" + fmt(notchHighHz) + " Hz" : s;
    }

    private static String fmt(double hz) {
        return hz == Math.rint(hz) ? Long.toString((long) hz) : String.format(java.util.Locale.ROOT, "%.1f", hz);
    }
}
