package limen.audio;

import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Objects;
import java.util.random.RandomGenerator;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import limen.audio.internal.Realtime;
import limen.signal.CheckedStimulus;
import limen.signal.OutputFormat;
import limen.signal.WavFiles;

/**
 * Writes each trial as a two-channel PCM WAV file {@code trial-0001.wav}, {@code trial-0002.wav}, ... into a
 * folder (for offline checks with a sound level meter or an analyser), through
 * {@link WavFiles#write(CheckedStimulus, int, Path, RandomGenerator)}: 16 bit with TPDF dither or 24 bit.
 * <p>
 * Numbering continues after the highest {@code trial-NNNN.wav} already in the folder, so a resumed session
 * never overwrites the files of its first part. More than 9999 trials get five-digit numbers. Each file is
 * written to a temporary name and moved into place (see {@link WavFiles}), so a crash leaves no partial file
 * under a trial name.
 * <p>
 * In realtime mode {@link #play} returns no earlier than {@code length / fs} after it was called.
 */
public final class WavFolderOutput implements TrialOutput {

    private static final Pattern TRIAL_FILE = Pattern.compile("trial-(\\d{4,9})\\.wav");

    private final Path folder;
    private final int bitsPerSample;
    private final boolean realtime;
    private final RandomGenerator ditherRng;
    private int nextNumber;
    private Path lastFile;
    private volatile boolean closed;

    /**
     * Opens (and creates if needed) the folder.
     *
     * @param folder where the files go
     * @param bitsPerSample 16 (dithered from {@code ditherRng}) or 24
     * @param realtime whether {@code play} takes as long as the sound
     * @param ditherRng the dither's randomness (seeded by the caller; may be null for 24 bit)
     * @throws IOException if the folder cannot be created or listed
     * @throws IllegalArgumentException for another word length, or 16 bit without a generator
     */
    public WavFolderOutput(Path folder, int bitsPerSample, boolean realtime, RandomGenerator ditherRng)
            throws IOException {
        this.folder = Objects.requireNonNull(folder, "folder");
        if (bitsPerSample != 16 && bitsPerSample != 24) {
            throw new IllegalArgumentException("WAV output needs 16 or 24 bits per sample: " + bitsPerSample);
        }
        if (bitsPerSample == 16 && ditherRng == null) {
            throw new IllegalArgumentException("16-bit WAV output needs a random generator for its TPDF dither");
        }
        this.bitsPerSample = bitsPerSample;
        this.realtime = realtime;
        this.ditherRng = ditherRng;
        Files.createDirectories(folder);
        this.nextNumber = highestExisting(folder) + 1;
    }

    /** The folder the files go to. */
    public Path folder() {
        return folder;
    }

    public int bitsPerSample() {
        return bitsPerSample;
    }

    public boolean realtime() {
        return realtime;
    }

    /** The number the next file will get. */
    public synchronized int nextNumber() {
        return nextNumber;
    }

    /** The file written by the last successful {@link #play}, or {@code null} before the first. */
    public synchronized Path lastFile() {
        return lastFile;
    }

    /** The name of trial file {@code number}: {@code trial-%04d.wav}. */
    public static String fileName(int number) {
        if (number < 1) {
            throw new IllegalArgumentException("trial file numbers start at 1: " + number);
        }
        return String.format(Locale.ROOT, "trial-%04d.wav", number);
    }

    /**
     * Writes the next file; in realtime mode then waits for the rest of the sound's duration (an interrupt or
     * {@link #close} ends the wait early).
     *
     * @throws DeviceLostException if the file cannot be written (disk full, folder removed): the session
     *         pauses as for a lost sound device
     */
    @Override
    public void play(CheckedStimulus trial) throws DeviceLostException {
        Objects.requireNonNull(trial, "trial");
        long start = System.nanoTime();
        Path file;
        synchronized (this) {
            if (closed) {
                throw new IllegalStateException("WAV output to " + folder + " is closed");
            }
            file = folder.resolve(fileName(nextNumber));
            try {
                WavFiles.write(trial, new OutputFormat(trial.sampleRateHz(), bitsPerSample).bitsPerSample(), file,
                        ditherRng);
            } catch (IOException e) {
                throw new DeviceLostException("cannot write trial WAV file " + file + ": " + e.getMessage(), e);
            }
            lastFile = file;
            nextNumber++;
        }
        if (realtime) {
            long deadline = start + Realtime.durationNanos(trial.length(), trial.sampleRateHz());
            while (!closed && System.nanoTime() < deadline) {
                if (!Realtime.sleepUntil(Math.min(deadline, System.nanoTime() + 50_000_000L))) {
                    return;
                }
            }
        }
    }

    @Override
    public String describe() {
        return "WAV files in " + folder.toAbsolutePath() + " (" + bitsPerSample + "-bit"
                + (bitsPerSample == 16 ? " TPDF-dithered" : "") + " stereo PCM" + (realtime ? ", realtime" : "") + ")";
    }

    @Override
    public void close() {
        closed = true;
    }

    private static int highestExisting(Path folder) throws IOException {
        int highest = 0;
        try (DirectoryStream<Path> files = Files.newDirectoryStream(folder, "trial-*.wav")) {
            for (Path p : files) {
                Matcher m = TRIAL_FILE.matcher(p.getFileName().toString());
                if (m.matches()) {
                    highest = Math.max(highest, Integer.parseInt(m.group(1)));
                }
            }
        }
        return highest;
    }
}
