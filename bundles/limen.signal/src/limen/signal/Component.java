package limen.signal;

/**
 * One declared sound inside a rendered buffer: what the renderer was asked for and where it put it. The
 * safety guard checks the declared levels, the exposure estimate integrates them.
 *
 * @param description e.g. {@code tone 1000 Hz} or {@code flat noise 500-2000 Hz}
 * @param lowHz lowest frequency of the component (the tone frequency for a tone)
 * @param highHz highest frequency of the component (the tone frequency for a tone)
 * @param levelDbSpl requested level (steady part), dB SPL
 * @param aWeightedLevelDb the same level A-weighted (IEC 61672-1), dB(A)
 * @param startSample first sample (inclusive)
 * @param endSample end (exclusive)
 * @param ear the channels it is in
 * @param energySeconds duration of a steady sound at {@code levelDbSpl} with the same energy: the length
 *        minus what the ramps take away ({@code Σ g[n]² / fs} over its gain envelope)
 */
public record Component(String description, double lowHz, double highHz, double levelDbSpl, double aWeightedLevelDb,
        int startSample, int endSample, Ear ear, double energySeconds) {

    /** Validates the span and the levels. */
    public Component {
        if (description == null || ear == null) {
            throw new IllegalArgumentException("description and ear must be given");
        }
        if (!(lowHz > 0) || !(highHz >= lowHz) || !Double.isFinite(levelDbSpl) || !Double.isFinite(aWeightedLevelDb)) {
            throw new IllegalArgumentException("component " + description + ": need 0 < low <= high and finite levels: "
                    + lowHz + "-" + highHz + " Hz, " + levelDbSpl + " dB SPL, " + aWeightedLevelDb + " dB(A)");
        }
        if (startSample < 0 || endSample <= startSample || !(energySeconds >= 0)) {
            throw new IllegalArgumentException("component " + description + ": bad span " + startSample + " to "
                    + endSample + " or energy duration " + energySeconds + " s");
        }
    }

    /** Whether the component sounds at sample {@code n}. */
    public boolean activeAt(int n) {
        return n >= startSample && n < endSample;
    }

    /** Frequency text for messages: {@code 1000 Hz} or {@code 500-2000 Hz}. */
    public String frequencyText() {
        return lowHz == highHz ? fmt(lowHz) + " Hz" : fmt(lowHz) + "-" + fmt(highHz) + " Hz";
    }

    private static String fmt(double hz) {
        return hz == Math.rint(hz) ? Long.toString((long) hz) : String.format(java.util.Locale.ROOT, "%.1f", hz);
    }
}
