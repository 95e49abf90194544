package limen.signal;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.random.RandomGenerator;

/**
 * Renders {@link Sound}s and whole {@link TrialSpec trials} through a {@link Calibration} into stereo
 * {@link Stimulus} buffers at the calibration's sample rate, declaring every component for the guard.
 * <p>
 * Levels: a tone of level {@code L} dB SPL at {@code f} gets the peak amplitude
 * {@code 10^((L - S(f) + R)/20)} ({@link Calibration#sineAmplitude}). A noise gets the RMS that puts its
 * expected acoustic power at {@code L}: with {@code w} the spectrum's density and {@code g(f) = 10^((S(f)-R)/10)}
 * the calibration's power gain, {@code 10·log10(2·rms²) = L - 10·log10(Σ w_k g_k / Σ w_k)} over the noise's
 * bins ({@link Noise#meanGain}). Every frequency (tone, or both band edges of a noise) must lie in the
 * calibrated range and below Nyquist. Ramps are cos² ({@link Synthesis#applyCos2Ramps}).
 */
public final class StimulusRenderer {

    private final Calibration calibration;
    private final int sampleRateHz;

    public StimulusRenderer(Calibration calibration) {
        this.calibration = Objects.requireNonNull(calibration, "calibration");
        this.sampleRateHz = calibration.sampleRateHz();
    }

    public Calibration calibration() {
        return calibration;
    }

    /** Length of a sound in samples at the calibration's rate (each part rounded to whole samples). */
    public int lengthSamples(Sound sound) {
        if (sound instanceof Sound.Sequence q) {
            long n = (long) Synthesis.samples(q.gapSeconds(), sampleRateHz) * (q.parts().size() - 1);
            for (Sound p : q.parts()) {
                n += lengthSamples(p);
            }
            return checkedLength(n);
        }
        if (sound instanceof Sound.Mixture m) {
            int n = 0;
            for (Sound p : m.parts()) {
                n = Math.max(n, lengthSamples(p));
            }
            return n;
        }
        // tone, noise burst and silence: their own duration
        return Synthesis.samples(sound.durationSeconds(), sampleRateHz);
    }

    /**
     * Renders one sound with lead-in and trailing silence.
     *
     * @param rng randomness for noises (used only if the sound holds noise)
     * @throws IllegalArgumentException for frequencies outside the calibration or at/above Nyquist
     */
    public Stimulus render(Sound sound, Ear ear, double leadSeconds, double trailSeconds, RandomGenerator rng) {
        Objects.requireNonNull(rng, "rng");
        int lead = Synthesis.samples(leadSeconds, sampleRateHz);
        int n = checkedLength((long) lead + lengthSamples(sound) + Synthesis.samples(trailSeconds, sampleRateHz));
        double[][] ch = new double[2][n];
        List<Component> components = new ArrayList<>();
        renderInto(sound, ch, lead, ear, rng, components);
        return new Stimulus(ch, sampleRateHz, components, List.of());
    }

    /** Renders a whole trial (layout in {@link TrialSpec}), with its interval marks. */
    public Stimulus renderTrial(TrialSpec trial, RandomGenerator rng) {
        Objects.requireNonNull(rng, "rng");
        int lead = Synthesis.samples(trial.leadSeconds(), sampleRateHz);
        int isi = Synthesis.samples(trial.isiSeconds(), sampleRateHz);
        int[] onsets = new int[trial.intervalCount()];
        int[] offsets = new int[trial.intervalCount()];
        long t = lead;
        for (int i = 0; i < trial.intervalCount(); i++) {
            Sound s = i == trial.targetInterval() ? trial.target() : trial.standard();
            onsets[i] = checkedLength(t);
            t += lengthSamples(s);
            offsets[i] = checkedLength(t);
            if (i < trial.intervalCount() - 1) {
                t += isi;
            }
        }
        long maskerEnd = trial.background() == null ? t : t + lead;
        int n = checkedLength(maskerEnd + Synthesis.samples(trial.trailSeconds(), sampleRateHz));
        double[][] ch = new double[2][n];
        List<Component> components = new ArrayList<>();
        List<IntervalMark> marks = new ArrayList<>();
        if (trial.background() != null) {
            TrialSpec.Background bg = trial.background();
            int ramp = Synthesis.samples(bg.rampSeconds(), sampleRateHz);
            renderNoise(bg.spectrum(), bg.levelDbSpl(), (int) maskerEnd, ramp, ch, 0, trial.ear(), rng, components);
        }
        for (int i = 0; i < trial.intervalCount(); i++) {
            boolean isTarget = i == trial.targetInterval();
            renderInto(isTarget ? trial.target() : trial.standard(), ch, onsets[i], trial.ear(), rng, components);
            marks.add(new IntervalMark(i, onsets[i], offsets[i], isTarget));
        }
        return new Stimulus(ch, sampleRateHz, components, marks);
    }

    private void renderInto(Sound sound, double[][] ch, int offset, Ear ear, RandomGenerator rng,
            List<Component> components) {
        if (sound instanceof Sound.Tone t) {
            renderTone(t, ch, offset, ear, components);
        } else if (sound instanceof Sound.NoiseBurst b) {
            renderNoise(b.spectrum(), b.levelDbSpl(), lengthSamples(b), Synthesis.samples(b.rampSeconds(), sampleRateHz),
                    ch, offset, ear, rng, components);
        } else if (sound instanceof Sound.Sequence q) {
            int gap = Synthesis.samples(q.gapSeconds(), sampleRateHz);
            int at = offset;
            for (Sound p : q.parts()) {
                renderInto(p, ch, at, ear, rng, components);
                at += lengthSamples(p) + gap;
            }
        } else if (sound instanceof Sound.Mixture m) {
            for (Sound p : m.parts()) {
                renderInto(p, ch, offset, ear, rng, components);
            }
        }
        // Sound.Silence adds nothing
    }

    private void renderTone(Sound.Tone t, double[][] ch, int offset, Ear ear, List<Component> components) {
        double f = t.frequencyHz();
        Synthesis.requireBelowNyquist(f, sampleRateHz);
        double amplitude = calibration.sineAmplitude(t.levelDbSpl(), f);
        int n = lengthSamples(t);
        int ramp = Synthesis.samples(t.rampSeconds(), sampleRateHz);
        if (n == 0) {
            throw new IllegalArgumentException("tone of " + t.durationSeconds() + " s is shorter than one sample");
        }
        ramp = Math.min(ramp, n / 2);
        double[] x = new double[n];
        Synthesis.addSine(x, 0, n, 0, f, amplitude, 0.0, sampleRateHz);
        Synthesis.applyCos2Ramps(x, 0, n, ramp);
        mix(x, ch, offset, ear);
        components.add(new Component("tone " + fmt(f) + " Hz", f, f, t.levelDbSpl(),
                t.levelDbSpl() + AWeighting.gainDb(f), offset, offset + n, ear, energySeconds(n, ramp)));
    }

    private void renderNoise(NoiseSpectrum spectrum, double levelDbSpl, int n, int ramp, double[][] ch, int offset,
            Ear ear, RandomGenerator rng, List<Component> components) {
        if (n == 0) {
            throw new IllegalArgumentException("noise is shorter than one sample");
        }
        calibration.requireCovered(spectrum.lowHz());
        calibration.requireCovered(spectrum.highHz());
        if (spectrum.highHz() >= sampleRateHz / 2.0) {
            throw new IllegalArgumentException(spectrum.describe() + " must stay below the Nyquist frequency "
                    + sampleRateHz / 2.0 + " Hz (sampling theorem)");
        }
        double gain = Noise.meanGain(n, sampleRateHz, spectrum, calibration::powerGain);
        double weighted = Noise.meanGain(n, sampleRateHz, spectrum,
                f -> calibration.powerGain(f) * AWeighting.powerFactor(f));
        double scale = Math.pow(10, (levelDbSpl - 10 * Math.log10(gain)) / 20);
        double[] x = Noise.shaped(rng, n, sampleRateHz, spectrum);
        for (int i = 0; i < n; i++) {
            x[i] *= scale;
        }
        ramp = Math.min(ramp, n / 2);
        Synthesis.applyCos2Ramps(x, 0, n, ramp);
        mix(x, ch, offset, ear);
        components.add(new Component(spectrum.describe(), spectrum.lowHz(), spectrum.highHz(), levelDbSpl,
                levelDbSpl + 10 * Math.log10(weighted / gain), offset, offset + n, ear, energySeconds(n, ramp)));
    }

    private double energySeconds(int n, int ramp) {
        double e = n - 2.0 * ramp;
        for (int i = 0; i < ramp; i++) {
            double g = Synthesis.cos2RampGain(i, ramp);
            e += 2 * g * g;
        }
        return e / sampleRateHz;
    }

    private static void mix(double[] x, double[][] ch, int offset, Ear ear) {
        for (int c = 0; c < 2; c++) {
            if (ear.drives(c)) {
                double[] out = ch[c];
                for (int i = 0; i < x.length; i++) {
                    out[offset + i] += x[i];
                }
            }
        }
    }

    private static int checkedLength(long n) {
        if (n > Integer.MAX_VALUE - 16) {
            throw new IllegalArgumentException("stimulus too long for one buffer: " + n + " samples");
        }
        return (int) n;
    }

    private static String fmt(double hz) {
        return hz == Math.rint(hz) ? Long.toString((long) hz) : String.format(java.util.Locale.ROOT, "%.2f", hz);
    }
}
