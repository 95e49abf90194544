package limen.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.Constructor;
import java.lang.reflect.Modifier;
import java.util.List;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

/** The guard's refusals and their messages; that only the guard makes a {@link CheckedStimulus}. */
class SafetyGuardTest {

    private final Calibration cal = new Calibration("Harbourside booth A", -20, new double[] {125, 1000, 8000},
            new double[] {70, 75, 72}, 90, 48000);
    private final SafetyGuard guard = new SafetyGuard(cal);
    private final StimulusRenderer renderer = new StimulusRenderer(cal);
    private final SplittableRandom rng = new SplittableRandom(42);

    @Test
    void acceptsAToneBelowTheCeiling() {
        CheckedStimulus c = guard.check(renderer.render(new Sound.Tone(1000, 85, 0.5, 0.01), Ear.LEFT, 0.1, 0.1, rng));
        // the measured bound of a steady 1 kHz tone is its level within the documented margin
        assertEquals(85.0, c.measuredLevelDbSpl(0), 0.1);
        assertTrue(c.measuredLevelDbSpl(0) >= 85.0 - 1e-6, "measured " + c.measuredLevelDbSpl(0));
        assertEquals(Double.NEGATIVE_INFINITY, c.measuredLevelDbSpl(1));
    }

    @Test
    void refusesADeclaredLevelOverTheCeilingWithBothLevelsAndTheFrequency() {
        LevelRefusedException e = assertThrows(LevelRefusedException.class,
                () -> guard.check(renderer.render(new Sound.Tone(2000, 91, 0.5, 0.01), Ear.RIGHT, 0, 0, rng)));
        assertTrue(e.getMessage().contains("requested 91.00 dB SPL"), e.getMessage());
        assertTrue(e.getMessage().contains("allowed 90.00 dB SPL"), e.getMessage());
        assertTrue(e.getMessage().contains("2000 Hz"), e.getMessage());
        assertEquals(91.0, e.requestedLevel(), 0);
        assertEquals(90.0, e.allowedLevel(), 0);
        assertEquals("dB SPL", e.unit());
    }

    @Test
    void refusesSimultaneousComponentsWhosePowerSumIsOver() {
        // 87 + 87 dB add in power to 90.01 dB
        Sound mix = new Sound.Mixture(List.of(new Sound.Tone(1000, 87, 0.5, 0.01), new Sound.Tone(3000, 87, 0.5, 0.01)));
        LevelRefusedException e = assertThrows(LevelRefusedException.class,
                () -> guard.check(renderer.render(mix, Ear.BOTH, 0, 0, rng)));
        assertTrue(e.getMessage().contains("combined 90.01 dB SPL of 2 simultaneous components"), e.getMessage());
        // the same two tones one after the other are fine
        guard.check(renderer.render(Sound.Sequence.pair(new Sound.Tone(1000, 87, 0.3, 0.01),
                new Sound.Tone(3000, 87, 0.3, 0.01), 0.1), Ear.BOTH, 0, 0, rng));
    }

    @Test
    void refusesClipping() {
        double[] x = Synthesis.sine(1000, 1.01, 4800, 48000);
        LevelRefusedException e = assertThrows(LevelRefusedException.class,
                () -> guard.check(new Stimulus(new double[4800], x, 48000, List.of(), List.of())));
        assertTrue(e.getMessage().contains("right channel") && e.getMessage().contains("allowed 0.00 dBFS"),
                e.getMessage());
        double[] nan = new double[10];
        nan[3] = Double.NaN;
        assertThrows(LevelRefusedException.class,
                () -> guard.check(new Stimulus(nan, new double[10], 48000, List.of(), List.of())));
    }

    @Test
    void measuresAnUndeclaredBuffer() {
        // -10 dBFS at 1 kHz is 75 + 20 - 10 = 85 dB SPL: fine; -4 dBFS is 91 dB SPL: refused by measurement alone
        double[] ok = Synthesis.sine(1000, Math.pow(10, -10 / 20.0), 24000, 48000);
        guard.check(new Stimulus(ok, ok, 48000, List.of(), List.of()));
        double[] loud = Synthesis.sine(1000, Math.pow(10, -4 / 20.0), 24000, 48000);
        LevelRefusedException e = assertThrows(LevelRefusedException.class,
                () -> guard.check(new Stimulus(loud, new double[24000], 48000, List.of(), List.of())));
        assertTrue(e.getMessage().startsWith("measured level 91.0"), e.getMessage());
        assertTrue(e.getMessage().contains("around 1000 Hz") && e.getMessage().contains("left channel"), e.getMessage());
    }

    @Test
    void aFalseDeclarationDoesNotHelp() {
        double[] loud = Synthesis.sine(1000, Math.pow(10, -4 / 20.0), 24000, 48000);
        Component lie = new Component("tone 1000 Hz", 1000, 1000, 60, 60, 0, 24000, Ear.LEFT, 0.5);
        assertThrows(LevelRefusedException.class,
                () -> guard.check(new Stimulus(loud, new double[24000], 48000, List.of(lie), List.of())));
    }

    @Test
    void refusesAnotherSampleRate() {
        Stimulus at44 = new StimulusRenderer(Calibration.flat("bench", 100, 44100))
                .render(new Sound.Tone(1000, 60, 0.1, 0.01), Ear.BOTH, 0, 0, rng);
        assertThrows(IllegalArgumentException.class, () -> guard.check(at44));
    }

    @Test
    void onlyTheGuardCreatesCheckedStimuli() {
        for (Constructor<?> c : CheckedStimulus.class.getDeclaredConstructors()) {
            assertFalse(Modifier.isPublic(c.getModifiers()) || Modifier.isProtected(c.getModifiers()), c.toString());
        }
        assertTrue(Modifier.isFinal(CheckedStimulus.class.getModifiers()));
        assertTrue(Modifier.isFinal(SafetyGuard.class.getModifiers()));
        // the writer takes only a CheckedStimulus
        for (var m : WavFiles.class.getDeclaredMethods()) {
            if (m.getName().equals("write")) {
                assertEquals(CheckedStimulus.class, m.getParameterTypes()[0]);
            }
        }
    }
}
