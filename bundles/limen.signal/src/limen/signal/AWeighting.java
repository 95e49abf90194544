package limen.signal;

/**
 * Frequency weighting A of IEC 61672-1:2013 (Annex E, analytic form):
 * <pre>
 *   A(f) = 20·log10[ f4²·f⁴ / ((f² + f1²)·√(f² + f2²)·√(f² + f3²)·(f² + f4²)) ] - A1000
 * </pre>
 * with {@code f1 = 20.598997 Hz}, {@code f2 = 107.65265 Hz}, {@code f3 = 737.86223 Hz},
 * {@code f4 = 12194.217 Hz}; {@code A1000} is the normalisation that makes {@code A(1 kHz) = 0}, which the
 * standard prints rounded as -2.000 dB and which is computed here from the same expression (so 1 kHz weighs
 * exactly 0 dB).
 */
public final class AWeighting {

    private static final double F1 = 20.598997;
    private static final double F2 = 107.65265;
    private static final double F3 = 737.86223;
    private static final double F4 = 12194.217;
    private static final double A1000 = unnormalisedDb(1000.0);

    private AWeighting() {
    }

    /** The A-weighting in dB at {@code frequencyHz > 0}. */
    public static double gainDb(double frequencyHz) {
        if (!(frequencyHz > 0) || Double.isInfinite(frequencyHz)) {
            throw new IllegalArgumentException("frequency must be positive and finite: " + frequencyHz + " Hz");
        }
        return unnormalisedDb(frequencyHz) - A1000;
    }

    private static double unnormalisedDb(double frequencyHz) {
        double f2 = frequencyHz * frequencyHz;
        double num = F4 * F4 * f2 * f2;
        double den = (f2 + F1 * F1) * Math.sqrt(f2 + F2 * F2) * Math.sqrt(f2 + F3 * F3) * (f2 + F4 * F4);
        return 20 * Math.log10(num / den);
    }

    /** The A-weighting as a power factor {@code 10^(A(f)/10)}. */
    public static double powerFactor(double frequencyHz) {
        return Math.pow(10, gainDb(frequencyHz) / 10);
    }
}
