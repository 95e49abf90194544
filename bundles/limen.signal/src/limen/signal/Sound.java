package limen.signal;

import java.util.List;

/**
 * What to render, in physical units: tones and noises at levels in dB SPL, silences, sequences (tone pairs
 * and longer) and mixtures. Immutable; rendered by {@link StimulusRenderer} through a {@link Calibration}.
 */
public sealed interface Sound permits Sound.Tone, Sound.NoiseBurst, Sound.Silence, Sound.Sequence, Sound.Mixture {

    /** Nominal duration in seconds (each part rounds to whole samples when rendered). */
    double durationSeconds();

    /**
     * A pure tone {@code A·sin(2πft)} starting at phase 0, with cos² onset and offset ramps.
     *
     * @param frequencyHz {@code > 0} (and below Nyquist and inside the calibration when rendered)
     * @param levelDbSpl level of the steady part, dB SPL
     * @param durationSeconds total duration including both ramps, {@code > 0}
     * @param rampSeconds each ramp, {@code >= 0}, at most half the duration
     */
    record Tone(double frequencyHz, double levelDbSpl, double durationSeconds, double rampSeconds) implements Sound {
        /** Validates the values. */
        public Tone {
            if (!(frequencyHz > 0) || Double.isInfinite(frequencyHz) || !Double.isFinite(levelDbSpl)) {
                throw new IllegalArgumentException("tone needs a positive finite frequency and a finite level: "
                        + frequencyHz + " Hz, " + levelDbSpl + " dB SPL");
            }
            requireRamps(durationSeconds, rampSeconds);
        }
    }

    /**
     * A shaped Gaussian noise burst (see {@link Noise#shaped}) with cos² ramps; its level is the total power
     * over the band through the calibration.
     *
     * @param spectrum band, shape and notch
     * @param levelDbSpl overall level of the steady part, dB SPL
     * @param durationSeconds total duration including ramps, {@code > 0}
     * @param rampSeconds each ramp, {@code >= 0}, at most half the duration
     */
    record NoiseBurst(NoiseSpectrum spectrum, double levelDbSpl, double durationSeconds, double rampSeconds)
            implements Sound {
        /** Validates the values. */
        public NoiseBurst {
            if (spectrum == null || !Double.isFinite(levelDbSpl)) {
                throw new IllegalArgumentException("noise needs a spectrum and a finite level: " + levelDbSpl);
            }
            requireRamps(durationSeconds, rampSeconds);
        }
    }

    /** Silence of a given duration (e.g. the non-target intervals of a detection trial). */
    record Silence(double durationSeconds) implements Sound {
        /** Validates the duration. */
        public Silence {
            if (!(durationSeconds > 0) || Double.isInfinite(durationSeconds)) {
                throw new IllegalArgumentException("silence needs a positive finite duration: " + durationSeconds);
            }
        }
    }

    /**
     * Sounds one after another with a fixed gap (a tone pair is a sequence of two).
     *
     * @param parts at least one sound
     * @param gapSeconds silence between consecutive parts, {@code >= 0}
     */
    record Sequence(List<Sound> parts, double gapSeconds) implements Sound {
        /** Validates and copies the parts. */
        public Sequence {
            parts = List.copyOf(parts);
            if (parts.isEmpty() || !(gapSeconds >= 0) || Double.isInfinite(gapSeconds)) {
                throw new IllegalArgumentException("sequence needs parts and a finite gap >= 0: " + gapSeconds);
            }
        }

        /** Two sounds with a gap between them. */
        public static Sequence pair(Sound first, Sound second, double gapSeconds) {
            return new Sequence(List.of(first, second), gapSeconds);
        }

        @Override
        public double durationSeconds() {
            double d = gapSeconds * (parts.size() - 1);
            for (Sound s : parts) {
                d += s.durationSeconds();
            }
            return d;
        }
    }

    /**
     * Sounds that start together and add (e.g. a tone in a noise); lasts as long as the longest part.
     *
     * @param parts at least one sound
     */
    record Mixture(List<Sound> parts) implements Sound {
        /** Validates and copies the parts. */
        public Mixture {
            parts = List.copyOf(parts);
            if (parts.isEmpty()) {
                throw new IllegalArgumentException("mixture needs parts");
            }
        }

        @Override
        public double durationSeconds() {
            double d = 0;
            for (Sound s : parts) {
                d = Math.max(d, s.durationSeconds());
            }
            return d;
        }
    }

    private static void requireRamps(double durationSeconds, double rampSeconds) {
        if (!(durationSeconds > 0) || Double.isInfinite(durationSeconds) || !(rampSeconds >= 0)
                || 2 * rampSeconds > durationSeconds) {
            throw new IllegalArgumentException("need duration > 0 and 0 <= ramp <= duration/2: " + durationSeconds
                    + " s, ramp " + rampSeconds + " s");
        }
    }
}
