package limen.signal;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

/**
 * Property test of the safety ceiling: thousands of random calibrations and stimuli (declared tones, noises,
 * mixtures, whole trials, and undeclared or falsely declared buffers made here), each either refused or
 * accepted. Checked:
 * <ul>
 * <li>every stimulus whose true level exceeds the ceiling is refused;</li>
 * <li>no accepted stimulus has a sample beyond full scale, and its level measured here, independently of the
 *     library (steady-part RMS through a log-frequency interpolation written in this test), is not above the
 *     ceiling;</li>
 * <li>the guard is not uselessly strict: a single steady tone 6 dB below the ceiling that does not clip is
 *     accepted.</li>
 * </ul>
 * The "true level" of a tone is, by the definition of a calibration, {@code 20·log10(A) + S(f) - R}; of
 * simultaneous tones the power sum (long-term level of incoherent components).
 */
class SafetyGuardPropertyTest {

    private static final int CASES = 2000;

    /** The calibration's log-frequency interpolation, written again here. */
    private static double fullScaleSpl(double[] f, double[] s, double ref, double x) {
        if (x <= f[0]) {
            return s[0] - ref;
        }
        for (int i = 1; i < f.length; i++) {
            if (x <= f[i]) {
                double t = (Math.log10(x) - Math.log10(f[i - 1])) / (Math.log10(f[i]) - Math.log10(f[i - 1]));
                return s[i - 1] + t * (s[i] - s[i - 1]) - ref;
            }
        }
        return s[s.length - 1] - ref;
    }

    @Test
    void nothingOverTheCeilingGetsThrough() {
        SplittableRandom rng = new SplittableRandom(20261201);
        int[] rates = {44100, 48000, 96000};
        int refused = 0;
        int accepted = 0;
        int overAndRefused = 0;
        for (int trial = 0; trial < CASES; trial++) {
            int rate = rates[rng.nextInt(3)];
            int points = 2 + rng.nextInt(6);
            double[] f = new double[points];
            double[] s = new double[points];
            double lf = Math.log(100 + rng.nextDouble() * 150);
            double level = 60 + rng.nextDouble() * 25;
            for (int i = 0; i < points; i++) {
                f[i] = Math.exp(lf);
                s[i] = level;
                lf += Math.log(2) * (0.5 + rng.nextDouble());
                level += rng.nextDouble() * 12 - 6;
                if (Math.exp(lf) > rate / 2.0 * 0.9) {
                    f = java.util.Arrays.copyOf(f, i + 1);
                    s = java.util.Arrays.copyOf(s, i + 1);
                    break;
                }
            }
            if (f.length < 2) {
                continue;
            }
            double ref = -10 - rng.nextDouble() * 20;
            double ceiling = 70 + rng.nextDouble() * 40;
            Calibration cal = new Calibration("random " + trial, ref, f, s, ceiling, rate);
            SafetyGuard guard = new SafetyGuard(cal);
            StimulusRenderer renderer = new StimulusRenderer(cal);
            double fLo = f[0];
            double fHi = f[f.length - 1];
            int kind = rng.nextInt(6);
            Stimulus stimulus;
            double truth; // the true level, or NaN where only the declared levels define it
            List<double[]> tones = new ArrayList<>(); // {frequency, amplitude} of tones made here
            double duration = 0.2 + rng.nextDouble() * 0.25;
            int n = (int) Math.round(duration * rate);
            if (kind <= 1) {
                // a declared tone through the renderer
                double ft = Math.exp(Math.log(fLo) + rng.nextDouble() * Math.log(fHi / fLo));
                double l = ceiling - 20 + rng.nextDouble() * 30;
                stimulus = renderer.render(new Sound.Tone(ft, l, duration, rng.nextDouble() * 0.02), Ear.values()[rng.nextInt(3)],
                        0.05, 0.05, rng);
                truth = l;
                tones.add(new double[] {ft, cal.sineAmplitude(l, ft)});
            } else if (kind == 2) {
                // a declared noise band, or a mixture of a tone and a noise
                double a = Math.exp(Math.log(fLo) + rng.nextDouble() * Math.log(fHi / fLo) * 0.7);
                double b = Math.min(fHi, a * (1.2 + rng.nextDouble() * 3));
                double l = ceiling - 20 + rng.nextDouble() * 30;
                Sound noise = new Sound.NoiseBurst(NoiseSpectrum.band(a, b), l, duration, 0.01);
                double lt = ceiling - 20 + rng.nextDouble() * 30;
                boolean mix = rng.nextBoolean();
                Sound sound = mix ? new Sound.Mixture(List.of(noise, new Sound.Tone(a, lt, duration, 0.01))) : noise;
                stimulus = renderer.render(sound, Ear.BOTH, 0, 0.02, rng);
                truth = mix ? 10 * Math.log10(Math.pow(10, l / 10) + Math.pow(10, lt / 10)) : l;
            } else if (kind == 3) {
                // a 2- or 3-interval trial with a background noise
                double ft = Math.exp(Math.log(fLo) + rng.nextDouble() * Math.log(fHi / fLo));
                double lt = ceiling - 20 + rng.nextDouble() * 30;
                double a = Math.max(fLo, ft / 1.5);
                double b = Math.min(fHi, ft * 1.5);
                double lb = ceiling - 30 + rng.nextDouble() * 30;
                int intervals = 2 + rng.nextInt(2);
                TrialSpec spec = new TrialSpec(intervals, rng.nextInt(intervals), new Sound.Silence(0.15),
                        new Sound.Tone(ft, lt, 0.15, 0.01), 0.05, 0.1, 0.05, Ear.BOTH,
                        b > a * 1.01 ? new TrialSpec.Background(NoiseSpectrum.band(a, b), lb, 0.02) : null);
                stimulus = renderer.renderTrial(spec, rng);
                truth = spec.background() == null ? lt
                        : 10 * Math.log10(Math.pow(10, lt / 10) + Math.pow(10, lb / 10));
                tones.add(new double[] {ft, cal.sineAmplitude(lt, ft)});
            } else {
                // undeclared (or falsely declared) sums of 1 to 3 steady tones made here, amplitudes from the
                // test's own interpolation
                int count = 1 + rng.nextInt(3);
                double[] x = new double[n];
                double power = 0;
                for (int i = 0; i < count; i++) {
                    double ft = Math.exp(Math.log(fLo) + rng.nextDouble() * Math.log(fHi / fLo));
                    double l = ceiling - 15 + rng.nextDouble() * 20 - 5 * Math.log10(count);
                    double amp = Math.pow(10, (l - fullScaleSpl(f, s, ref, ft)) / 20);
                    double phase = rng.nextDouble() * 2 * Math.PI;
                    for (int j = 0; j < n; j++) {
                        x[j] += amp * Math.sin(2 * Math.PI * ft * j / rate + phase);
                    }
                    power += Math.pow(10, l / 10);
                    tones.add(new double[] {ft, amp});
                }
                truth = 10 * Math.log10(power);
                List<Component> declared = kind == 5
                        ? List.of(new Component("tone", fLo, fLo, ceiling - 30, ceiling - 30, 0, n, Ear.LEFT, duration))
                        : List.of();
                stimulus = new Stimulus(x, x, rate, declared, List.of());
            }
            CheckedStimulus checked;
            try {
                checked = guard.check(stimulus);
            } catch (LevelRefusedException e) {
                refused++;
                if (truth > ceiling) {
                    overAndRefused++;
                }
                continue;
            }
            accepted++;
            if (truth > ceiling) {
                fail("case " + trial + ": true level " + truth + " dB SPL over the ceiling " + ceiling + " was accepted ("
                        + cal + ")");
            }
            for (int c = 0; c < 2; c++) {
                for (int j = 0; j < checked.length(); j++) {
                    if (Math.abs(checked.sample(c, j)) > 1.0) {
                        fail("case " + trial + ": accepted sample beyond full scale: " + checked.sample(c, j));
                    }
                }
            }
            if (tones.size() == 1 && kind <= 1) {
                // independent measurement of the steady part of an accepted single tone
                double[] ft = tones.get(0);
                double[] ch = checked.channel(checked.components().get(0).ear() == Ear.RIGHT ? 1 : 0);
                Component comp = checked.components().get(0);
                int ramp = (int) Math.round(0.02 * rate) + 1;
                int from = comp.startSample() + ramp;
                int to = comp.endSample() - ramp;
                int period = (int) Math.max(1, Math.floor((to - from) * ft[0] / rate));
                to = from + (int) Math.round(period * rate / ft[0]); // whole cycles
                double sum = 0;
                for (int j = from; j < to; j++) {
                    sum += ch[j] * ch[j];
                }
                double measured = 10 * Math.log10(2 * sum / (to - from)) + fullScaleSpl(f, s, ref, ft[0]);
                assertTrue(measured <= ceiling + 0.01, "case " + trial + ": accepted tone measures " + measured
                        + " dB SPL over the ceiling " + ceiling);
            }
        }
        assertTrue(accepted > CASES / 5 && refused > CASES / 5, "accepted " + accepted + ", refused " + refused);
        assertTrue(overAndRefused > CASES / 10, "over and refused: " + overAndRefused);
    }

    @Test
    void notUselesslyStrict() {
        SplittableRandom rng = new SplittableRandom(7);
        int rejectedUsable = 0;
        for (int trial = 0; trial < 300; trial++) {
            double[] f = {125, 250, 500, 1000, 2000, 4000, 8000};
            double[] s = new double[f.length];
            double level = 65 + rng.nextDouble() * 20;
            for (int i = 0; i < f.length; i++) {
                s[i] = level;
                level += rng.nextDouble() * 12 - 6; // slopes up to 6 dB per octave
            }
            double ceiling = 80 + rng.nextDouble() * 30;
            Calibration cal = new Calibration("smooth " + trial, -20, f, s, ceiling, 48000);
            double ft = Math.exp(Math.log(125) + rng.nextDouble() * Math.log(64));
            double l = Math.min(ceiling - 6, cal.fullScaleSineSplDb(ft) - 1);
            Stimulus st = new StimulusRenderer(cal).render(new Sound.Tone(ft, l, 0.3, 0.01), Ear.BOTH, 0, 0, rng);
            try {
                new SafetyGuard(cal).check(st);
            } catch (LevelRefusedException e) {
                rejectedUsable++;
            }
        }
        assertTrue(rejectedUsable == 0, rejectedUsable + " of 300 usable tones refused");
    }
}
