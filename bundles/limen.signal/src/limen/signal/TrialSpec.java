package limen.signal;

/**
 * One n-interval forced-choice trial, rendered into a single buffer so that timing inside the trial never
 * depends on timers.
 * <p>
 * Layout (sample times are rounded per part): {@code leadSeconds} of lead-in, then interval 0, an
 * inter-stimulus interval of {@code isiSeconds}, interval 1, ... The target interval holds {@code target},
 * every other interval {@code standard} (for detection, a {@link Sound.Silence} of the target's length). With a
 * background, a noise runs from sample 0 to {@code leadSeconds} after the last interval (its ramps inside the
 * lead-in and lead-out, so the intervals sit in its steady part). Then {@code trailSeconds} of silence, which
 * also lets an output device drain.
 *
 * @param intervalCount number of intervals {@code n >= 1}
 * @param targetInterval 0-based index of the target interval, {@code 0 <= target < n}
 * @param standard the sound of the non-target intervals
 * @param target the sound of the target interval
 * @param leadSeconds lead-in before the first interval, {@code >= 0}
 * @param isiSeconds inter-stimulus interval, {@code >= 0}
 * @param trailSeconds silence at the end, {@code >= 0}
 * @param ear where the intervals (and the background) go
 * @param background optional masker across the trial, or {@code null}
 */
public record TrialSpec(int intervalCount, int targetInterval, Sound standard, Sound target, double leadSeconds,
        double isiSeconds, double trailSeconds, Ear ear, Background background) {

    /**
     * A masking noise across the whole trial.
     *
     * @param spectrum its spectrum
     * @param levelDbSpl its overall level, dB SPL
     * @param rampSeconds its cos² ramps, at most the trial's lead-in
     */
    public record Background(NoiseSpectrum spectrum, double levelDbSpl, double rampSeconds) {
        /** Validates the values. */
        public Background {
            if (spectrum == null || !Double.isFinite(levelDbSpl) || !(rampSeconds >= 0) || Double.isInfinite(rampSeconds)) {
                throw new IllegalArgumentException("background needs a spectrum, a finite level and a ramp >= 0: "
                        + levelDbSpl + " dB SPL, " + rampSeconds + " s");
            }
        }
    }

    /** Validates the layout. */
    public TrialSpec {
        if (intervalCount < 1 || targetInterval < 0 || targetInterval >= intervalCount) {
            throw new IllegalArgumentException("need n >= 1 intervals and 0 <= target < n: n = " + intervalCount
                    + ", target = " + targetInterval);
        }
        if (standard == null || target == null || ear == null) {
            throw new IllegalArgumentException("standard, target and ear must be given");
        }
        for (double d : new double[] {leadSeconds, isiSeconds, trailSeconds}) {
            if (!(d >= 0) || Double.isInfinite(d)) {
                throw new IllegalArgumentException("lead, ISI and trail must be finite and >= 0: " + leadSeconds
                        + ", " + isiSeconds + ", " + trailSeconds + " s");
            }
        }
        if (background != null && background.rampSeconds() > leadSeconds) {
            throw new IllegalArgumentException("background ramp " + background.rampSeconds()
                    + " s must fit in the lead-in of " + leadSeconds + " s");
        }
    }

    /** A copy with the target in another interval. */
    public TrialSpec withTargetInterval(int newTargetInterval) {
        return new TrialSpec(intervalCount, newTargetInterval, standard, target, leadSeconds, isiSeconds, trailSeconds,
                ear, background);
    }
}
