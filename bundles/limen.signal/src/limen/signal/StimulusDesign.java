package limen.signal;

import limen.core.extension.Settings;

/**
 * A kind of stimulus: what the standard and the target interval of a trial sound like at a given value. The
 * extension point for stimuli; Limen's own kinds (package {@code limen.signal.designs}) and a lab's are
 * contributed the same way, as a public class with a public no-argument constructor named in
 * {@code META-INF/services/limen.signal.StimulusDesign} and in an {@code OSGI-INF/*.xml} component offering this
 * interface (see {@link limen.core.extension.Extensions}).
 * <p>
 * <b>Safety by construction.</b> A design returns only {@link Sound} descriptions (a sealed hierarchy of
 * immutable records: tones, noise bursts, silences, sequences, mixtures, each at a level in dB SPL); it never
 * sees a sample buffer, a calibration or an output. The session lays the sounds out as a {@link TrialSpec},
 * renders it with {@link StimulusRenderer}, and every buffer then passes the {@link SafetyGuard}, the only
 * creator of the {@link CheckedStimulus} that files and devices accept. So a contributed design cannot reach
 * a listener's ears by any other path than the built-in ones, and a level above the ceiling is refused in the
 * same way, with the same message.
 */
public interface StimulusDesign {

    /** @return the identifier a battery uses, e.g. {@code "limen.frequency-discrimination"}; stable once released */
    String id();

    /** @return a short human title */
    String title();

    /**
     * @param settings the step's stimulus settings: the common ones {@code standardFrequencyHz},
     *        {@code rampDurationSeconds} and {@code unit} (the varied quantity's unit: HZ, PERCENT, CENTS, DB or
     *        DB_SPL), plus the design's own
     * @param presentation the value of this trial and the levels and duration it is played at
     * @return the sounds of one standard and one target interval, and an optional background
     * @throws IllegalArgumentException naming the setting or value that cannot be rendered
     */
    IntervalSounds design(Settings settings, Presentation presentation);

    /**
     * Checks settings before any trial, for {@code ./limen check} and the editor (LM0806). The default accepts
     * everything and leaves the errors to {@link #design}.
     *
     * @param settings as for {@link #design}
     * @throws IllegalArgumentException naming the setting and value that can never render
     */
    default void checkSettings(Settings settings) {
    }

    /**
     * One trial's request.
     *
     * @param value the varied quantity's value, in its unit
     * @param standardLevelDbSpl the step's standard level for this participant, dB SPL (NaN when the step has none)
     * @param intervalSeconds the duration of one interval, s
     */
    record Presentation(double value, double standardLevelDbSpl, double intervalSeconds) {
        /** Validates the values. */
        public Presentation {
            if (!Double.isFinite(value) || !(intervalSeconds > 0) || Double.isInfinite(intervalSeconds)) {
                throw new IllegalArgumentException("a presentation needs a finite value and a positive interval: " + value
                        + ", " + intervalSeconds + " s");
            }
        }
    }

    /**
     * The answer of a design.
     *
     * @param standard the sound of each non-target interval
     * @param target the sound of the target interval
     * @param background a masker across the whole trial, or null
     * @param leadSeconds the lead-in the design needs before the first interval (the session uses at least its
     *        own default), s
     */
    record IntervalSounds(Sound standard, Sound target, TrialSpec.Background background, double leadSeconds) {
        /** Validates the values. */
        public IntervalSounds {
            if (standard == null || target == null) {
                throw new IllegalArgumentException("a design must give a standard and a target sound");
            }
            if (!(leadSeconds >= 0) || Double.isInfinite(leadSeconds)) {
                throw new IllegalArgumentException("lead-in must be finite and >= 0, was " + leadSeconds);
            }
        }
    }
}
