package limen.audio;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.SplittableRandom;

import javax.sound.sampled.AudioFormat;
import javax.sound.sampled.AudioInputStream;
import javax.sound.sampled.AudioSystem;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.signal.CheckedStimulus;

/** The WAV folder output: names, numbering, contents read back, realtime waiting, write failure. */
class WavFolderOutputTest {

    @TempDir
    Path dir;

    private final List<CheckedStimulus> trials = List.of(Trials.tone(1000, 70, 0.2, 1), Trials.tone(2000, 65, 0.1, 2),
            Trials.leftTone(500, 60, 0.15));

    @Test
    void sixteenBitFilesHoldExactlyTheDitheredPcmOfEachTrialInOrder() throws Exception {
        Path folder = dir.resolve("wav16");
        try (WavFolderOutput out = new WavFolderOutput(folder, 16, false, new SplittableRandom(99))) {
            for (CheckedStimulus t : trials) {
                out.play(t);
            }
            assertEquals(folder.resolve("trial-0003.wav"), out.lastFile());
        }
        // the same seed consumed in the same order gives the same dither
        SplittableRandom again = new SplittableRandom(99);
        for (int i = 0; i < trials.size(); i++) {
            Path file = folder.resolve(String.format("trial-%04d.wav", i + 1));
            byte[] expected = trials.get(i).toPcm(16, again);
            assertArrayEquals(expected, pcmOf(file, 16), file.toString());
        }
        try (var files = Files.list(folder)) {
            assertEquals(3, files.count(), "no temporary files left behind");
        }
    }

    @Test
    void twentyFourBitFilesHoldTheSamplesRoundedToCodesOfFullScale8388607() throws Exception {
        try (WavFolderOutput out = new WavFolderOutput(dir, 24, false, null)) {
            out.play(trials.get(2));
        }
        byte[] pcm = pcmOf(dir.resolve("trial-0001.wav"), 24);
        assertArrayEquals(trials.get(2).toPcm(24, null), pcm);
        // independent check of the code mapping (Quantizer's contract: code = round(x·(2^23 - 1)), no dither),
        // computed here from the trial's samples rather than through limen.signal's quantizer
        double[] left = trials.get(2).channel(0);
        double[] right = trials.get(2).channel(1);
        assertEquals(left.length * 6, pcm.length);
        for (int n = 0; n < left.length; n++) {
            assertEquals(Math.rint(left[n] * 8388607), code24(pcm, 6 * n), 0.0, "left sample " + n);
            assertEquals(Math.rint(right[n] * 8388607), code24(pcm, 6 * n + 3), 0.0, "right sample " + n);
        }
    }

    @Test
    void numberingContinuesAfterTheHighestExistingTrialFile() throws Exception {
        Files.write(dir.resolve("trial-0007.wav"), new byte[0]);
        Files.write(dir.resolve("trial-0002.wav"), new byte[0]);
        Files.write(dir.resolve("notes-0100.wav"), new byte[0]);
        try (WavFolderOutput out = new WavFolderOutput(dir, 24, false, null)) {
            assertEquals(8, out.nextNumber());
            out.play(trials.get(1));
            assertTrue(Files.size(dir.resolve("trial-0008.wav")) > 44);
            assertEquals(9, out.nextNumber());
        }
        assertEquals("trial-12345.wav", WavFolderOutput.fileName(12345));
        assertThrows(IllegalArgumentException.class, () -> WavFolderOutput.fileName(0));
    }

    @Test
    void realtimeModeTakesAtLeastTheTrialsDuration() throws Exception {
        try (WavFolderOutput out = new WavFolderOutput(dir, 16, true, new SplittableRandom(1))) {
            long t0 = System.nanoTime();
            out.play(trials.get(0)); // 9600 frames = 200 ms
            assertTrue(System.nanoTime() - t0 >= 200_000_000L);
            assertTrue(out.describe().contains("realtime"), out.describe());
        }
    }

    @Test
    void aFolderThatVanishedIsReportedAsALostOutputNamingTheFile() throws Exception {
        Path folder = dir.resolve("gone");
        WavFolderOutput out = new WavFolderOutput(folder, 16, false, new SplittableRandom(1));
        Files.delete(folder);
        DeviceLostException e = assertThrows(DeviceLostException.class, () -> out.play(trials.get(0)));
        assertTrue(e.getMessage().contains("trial-0001.wav"), e.getMessage());
        out.close();
        assertThrows(IllegalStateException.class, () -> out.play(trials.get(0)));
    }

    @Test
    void refusesOtherWordLengthsAndUnditheredSixteenBit() {
        assertThrows(IllegalArgumentException.class, () -> new WavFolderOutput(dir, 8, false, new SplittableRandom(1)));
        assertThrows(IllegalArgumentException.class, () -> new WavFolderOutput(dir, 16, false, null));
    }

    /** The data chunk's bytes, read with the JDK's WAV reader. */
    private static byte[] pcmOf(Path file, int bits) throws IOException, javax.sound.sampled.UnsupportedAudioFileException {
        try (AudioInputStream in = AudioSystem.getAudioInputStream(file.toFile())) {
            AudioFormat f = in.getFormat();
            assertEquals(bits, f.getSampleSizeInBits());
            assertEquals(2, f.getChannels());
            assertEquals(48000f, f.getSampleRate());
            assertEquals(AudioFormat.Encoding.PCM_SIGNED, f.getEncoding());
            return in.readAllBytes();
        }
    }

    private static double code24(byte[] b, int at) {
        int v = (b[at] & 0xff) | (b[at + 1] & 0xff) << 8 | b[at + 2] << 16; // sign from the top byte
        return v;
    }
}
