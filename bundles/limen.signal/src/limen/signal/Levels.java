package limen.signal;

/**
 * Level measurement on plain sample arrays (full scale ±1.0).
 * <p>
 * AES17-2020 convention: 0 dBFS is the RMS of a full-scale sine, so {@code L_rms = 20·log10(√2·rms)} dBFS (a
 * sine of peak {@code A} reads {@code 20·log10 A}) and the peak level is {@code 20·log10(max|x|)} dBFS. Levels
 * in dB SPL go through a {@link Calibration} at a stated frequency: a sine-equivalent conversion,
 * {@code L_dBFS + S(f) - R}.
 */
public final class Levels {

    private Levels() {
    }

    /** Root mean square of {@code x[from .. to)}. */
    public static double rms(double[] x, int from, int to) {
        if (from < 0 || to > x.length || to <= from) {
            throw new IllegalArgumentException("bad range " + from + " to " + to + " of " + x.length + " samples");
        }
        double sum = 0;
        for (int i = from; i < to; i++) {
            sum += x[i] * x[i];
        }
        return Math.sqrt(sum / (to - from));
    }

    /** Root mean square of all of {@code x}. */
    public static double rms(double[] x) {
        return rms(x, 0, x.length);
    }

    /** Largest magnitude of {@code x[from .. to)}. */
    public static double peak(double[] x, int from, int to) {
        if (from < 0 || to > x.length || to <= from) {
            throw new IllegalArgumentException("bad range " + from + " to " + to + " of " + x.length + " samples");
        }
        double p = 0;
        for (int i = from; i < to; i++) {
            p = Math.max(p, Math.abs(x[i]));
        }
        return p;
    }

    /** RMS level {@code 20·log10(√2·rms)}, dBFS (AES17). */
    public static double rmsDbfs(double[] x, int from, int to) {
        return 20 * Math.log10(Math.sqrt(2.0) * rms(x, from, to));
    }

    /** RMS level of all of {@code x}, dBFS (AES17). */
    public static double rmsDbfs(double[] x) {
        return rmsDbfs(x, 0, x.length);
    }

    /** Peak level {@code 20·log10(max|x|)}, dBFS. */
    public static double peakDbfs(double[] x, int from, int to) {
        return 20 * Math.log10(peak(x, from, to));
    }

    /** Peak level of all of {@code x}, dBFS. */
    public static double peakDbfs(double[] x) {
        return peakDbfs(x, 0, x.length);
    }

    /** RMS level in dB SPL of a sound at {@code frequencyHz} through {@code calibration}. */
    public static double rmsDbSpl(double[] x, int from, int to, Calibration calibration, double frequencyHz) {
        return calibration.levelDbSpl(rmsDbfs(x, from, to), frequencyHz);
    }

    /** Peak level in dB SPL (the level of a sine with that peak) at {@code frequencyHz} through {@code calibration}. */
    public static double peakDbSpl(double[] x, int from, int to, Calibration calibration, double frequencyHz) {
        return calibration.levelDbSpl(peakDbfs(x, from, to), frequencyHz);
    }
}
