package limen.audio;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;

import javax.sound.sampled.Mixer;

import org.junit.jupiter.api.Test;

import limen.signal.CheckedStimulus;

/**
 * The playback logic on a stand-in line: one write per trial with trailing silence, drain, short writes as
 * device loss. (The same on a real sound server: {@link PulseLoopbackTest}.)
 */
class JavaSoundOutputTest {

    private final Mixer.Info info = FakeSound.info("default [default]", "Direct Audio Device: default");

    private JavaSoundOutput open(FakeSound.Line16 line) throws NoDeviceException {
        Devices d = new Devices(FakeSound.source(List.of(info),
                List.of(FakeSound.outputMixer(info, FakeSound.Open.WORKS, line.line()))));
        return JavaSoundOutput.open(d, null, 48000, 200, new SplittableRandom(7));
    }

    @Test
    void writesEachTrialOnceWithALineBufferOfTrailingSilenceThenDrains() throws Exception {
        FakeSound.Line16 line = new FakeSound.Line16(i -> -1);
        CheckedStimulus trial = Trials.tone(1000, 70, 0.25, 1);
        try (JavaSoundOutput out = open(line)) {
            assertEquals(9600, out.bufferFrames(), "200 ms at 48 kHz");
            long t0 = System.nanoTime();
            out.play(trial);
            // the stand-in drains at once, so play waits until the trial could have been played
            assertTrue(System.nanoTime() - t0 >= 250_000_000L);
            assertEquals((12000 + 9600) * 4, (int) line.asked.get(0), "trial plus 200 ms of silence, 4 bytes a frame");
            assertTrue(line.calls.indexOf("write") < line.calls.indexOf("drain"), line.calls.toString());
            assertTrue(out.describe().contains("line buffer 200 ms"), out.describe());
        }
        assertTrue(line.calls.contains("close"));
    }

    @Test
    void aShortWriteOnARunningLineIsDeviceLossAndStaysSo() throws Exception {
        FakeSound.Line16 line = new FakeSound.Line16(i -> i <= 1 ? -1 : 0); // trial 1: write + probe; trial 2: 0 bytes
        CheckedStimulus trial = Trials.tone(1000, 70, 0.05, 1);
        try (JavaSoundOutput out = open(line)) {
            out.play(trial);
            DeviceLostException e = assertThrows(DeviceLostException.class, () -> out.play(trial));
            assertTrue(e.getMessage().contains("audio device lost on 'default [default]'"), e.getMessage());
            assertTrue(e.getMessage().contains("took 0 of"), e.getMessage());
            assertThrows(DeviceLostException.class, () -> out.play(trial));
        }
    }

    @Test
    void anEarlyDrainFollowedByARefusedSilenceIsDeviceLoss() throws Exception {
        // write accepted in full, drain returns at once, and the line then takes nothing: the server died while
        // draining
        FakeSound.Line16 line = new FakeSound.Line16(i -> i == 0 ? -1 : 0);
        try (JavaSoundOutput out = open(line)) {
            DeviceLostException e = assertThrows(DeviceLostException.class,
                    () -> out.play(Trials.tone(1000, 70, 0.5, 1)));
            assertTrue(e.getMessage().contains("drain() returned"), e.getMessage());
        }
    }

    @Test
    void refusesATrialAtAnotherRateAndAfterClose() throws Exception {
        FakeSound.Line16 line = new FakeSound.Line16(i -> -1);
        JavaSoundOutput out = open(line);
        limen.signal.Calibration at44 = limen.signal.Calibration.flat("Harbourside 44.1", 100, 90, 44100);
        CheckedStimulus t44 = new limen.signal.SafetyGuard(at44).check(new limen.signal.StimulusRenderer(at44).render(
                new limen.signal.Sound.Tone(1000, 60, 0.05, 0.005), limen.signal.Ear.LEFT, 0, 0, new SplittableRandom(1)));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> out.play(t44));
        assertTrue(e.getMessage().contains("44100") && e.getMessage().contains("48000"), e.getMessage());
        out.close();
        out.close();
        assertThrows(IllegalStateException.class, () -> out.play(Trials.tone(1000, 70, 0.05, 1)));
    }
}
