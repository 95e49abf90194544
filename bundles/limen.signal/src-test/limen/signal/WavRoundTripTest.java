package limen.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** WAV write and read back (RIFF through the JDK), 16 and 24 bit, at the three rates. */
class WavRoundTripTest {

    @TempDir
    Path dir;

    @Test
    void roundTripWithinHalfAnLsbPlusDither() throws IOException {
        for (int rate : new int[] {44100, 48000, 96000}) {
            Calibration cal = Calibration.flat("bench", 100, rate);
            Stimulus s = new StimulusRenderer(cal).render(new Sound.Tone(1000, 80, 0.2, 0.01), Ear.RIGHT, 0.01, 0.01,
                    new SplittableRandom(1));
            CheckedStimulus checked = new SafetyGuard(cal).check(s);
            for (int bits : new int[] {16, 24}) {
                Path f = dir.resolve("tone-" + rate + "-" + bits + ".wav");
                WavFiles.write(checked, bits, f, new SplittableRandom(2));
                WavData back = WavFiles.read(f);
                assertEquals(rate, back.sampleRateHz());
                assertEquals(bits, back.bitsPerSample());
                assertEquals(2, back.channels().length);
                assertEquals(s.length(), back.length());
                double lsb = 1.0 / ((1 << (bits - 1)) - 1);
                // rounding is at most 1/2 LSB; TPDF dither (16 bit) adds at most 1 LSB
                double tolerance = (bits == 16 ? 1.5 : 0.5) * lsb + 1e-12;
                for (int c = 0; c < 2; c++) {
                    double[] read = back.channel(c);
                    for (int n = 0; n < s.length(); n++) {
                        assertEquals(s.sample(c, n), read[n], tolerance, rate + " Hz " + bits + " bit ch " + c + " n " + n);
                    }
                }
                // header: RIFF/WAVE, 2 channels, byte rate
                byte[] head = Files.readAllBytes(f);
                assertEquals("RIFF", new String(head, 0, 4, java.nio.charset.StandardCharsets.US_ASCII));
                assertEquals("WAVE", new String(head, 8, 4, java.nio.charset.StandardCharsets.US_ASCII));
            }
        }
    }

    @Test
    void twentyFourBitIsExactToTheCode() throws IOException {
        Calibration cal = Calibration.flat("bench", 100, 48000);
        CheckedStimulus c = new SafetyGuard(cal).check(new Stimulus(new double[] {0.5, -0.25, 1.0, -1.0, 0},
                new double[] {1.0 / 8388607, 0, 0, 0, 0}, 48000, java.util.List.of(), java.util.List.of()));
        Path f = dir.resolve("codes.wav");
        WavFiles.write(c, 24, f, null);
        WavData d = WavFiles.read(f);
        assertEquals(Math.rint(0.5 * 8388607) / 8388607, d.channel(0)[0], 0);
        assertEquals(1.0, d.channel(0)[2], 0);
        assertEquals(-1.0, d.channel(0)[3], 0);
        assertEquals(1.0 / 8388607, d.channel(1)[0], 0);
    }

    @Test
    void sixteenBitNeedsADitherSourceAndUnreadableFilesFail() throws IOException {
        Calibration cal = Calibration.flat("bench", 100, 48000);
        CheckedStimulus c = new SafetyGuard(cal).check(new Stimulus(new double[4], new double[4], 48000,
                java.util.List.of(), java.util.List.of()));
        Path f = dir.resolve("x.wav");
        assertThrows(IllegalArgumentException.class, () -> WavFiles.write(c, 16, f, null));
        assertFalse(Files.exists(f));
        Files.writeString(f, "not a wav");
        assertThrows(IOException.class, () -> WavFiles.read(f));
    }
}
