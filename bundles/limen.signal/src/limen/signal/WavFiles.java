package limen.signal;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.random.RandomGenerator;

import javax.sound.sampled.AudioFileFormat;
import javax.sound.sampled.AudioFormat;
import javax.sound.sampled.AudioInputStream;
import javax.sound.sampled.AudioSystem;
import javax.sound.sampled.UnsupportedAudioFileException;

import limen.signal.internal.Quantizer;

/**
 * WAV (RIFF, PCM) files through the JDK's {@code javax.sound.sampled} file writer and reader. Writing
 * accepts only a {@link CheckedStimulus}: no unchecked buffer reaches a file.
 */
public final class WavFiles {

    private WavFiles() {
    }

    /**
     * Writes a checked stimulus as a two-channel PCM WAV file (written to a temporary file beside the target,
     * then moved over it, so a failure leaves no partial file).
     *
     * @param bitsPerSample 16 (TPDF-dithered from {@code ditherRng}) or 24
     * @param ditherRng randomness for the 16-bit dither (may be null for 24 bit)
     */
    public static void write(CheckedStimulus stimulus, int bitsPerSample, Path path, RandomGenerator ditherRng)
            throws IOException {
        OutputFormat format = new OutputFormat(stimulus.sampleRateHz(), bitsPerSample);
        byte[] pcm = stimulus.toPcm(format.bitsPerSample(), ditherRng);
        AudioFormat af = new AudioFormat(AudioFormat.Encoding.PCM_SIGNED, format.sampleRateHz(), bitsPerSample,
                OutputFormat.CHANNELS, OutputFormat.CHANNELS * bitsPerSample / 8, format.sampleRateHz(), false);
        Path dir = path.toAbsolutePath().getParent();
        Path tmp = Files.createTempFile(dir, ".limen-", ".wav.part");
        try {
            try (AudioInputStream in = new AudioInputStream(new ByteArrayInputStream(pcm), af, stimulus.length())) {
                AudioSystem.write(in, AudioFileFormat.Type.WAVE, tmp.toFile());
            }
            Files.move(tmp, path, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /**
     * Reads a 16- or 24-bit signed PCM WAV file.
     *
     * @throws IOException if it cannot be read or is not 16/24-bit signed PCM
     */
    public static WavData read(Path path) throws IOException {
        try (AudioInputStream in = AudioSystem.getAudioInputStream(path.toFile())) {
            AudioFormat f = in.getFormat();
            int bits = f.getSampleSizeInBits();
            if (!AudioFormat.Encoding.PCM_SIGNED.equals(f.getEncoding()) || (bits != 16 && bits != 24)
                    || (f.isBigEndian() && bits > 8)) {
                throw new IOException(path + ": need 16- or 24-bit signed little-endian PCM, found " + f);
            }
            int channels = f.getChannels();
            byte[] data = readAll(in);
            int bytes = bits / 8;
            int frames = data.length / (bytes * channels);
            double scale = 1.0 / Quantizer.fullScaleCode(bits);
            double[][] out = new double[channels][frames];
            int at = 0;
            for (int n = 0; n < frames; n++) {
                for (int c = 0; c < channels; c++) {
                    int code = 0;
                    for (int b = 0; b < bytes; b++) {
                        code |= (data[at++] & 0xff) << (8 * b);
                    }
                    code = (code << (32 - bits)) >> (32 - bits); // sign-extend
                    out[c][n] = code * scale;
                }
            }
            return new WavData(out, Math.round(f.getSampleRate()), bits);
        } catch (UnsupportedAudioFileException e) {
            throw new IOException(path + ": not a readable WAV file: " + e.getMessage(), e);
        }
    }

    private static byte[] readAll(InputStream in) throws IOException {
        return in.readAllBytes();
    }
}
