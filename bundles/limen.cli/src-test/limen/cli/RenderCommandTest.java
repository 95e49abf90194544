package limen.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.signal.Levels;
import limen.signal.Spectrum;
import limen.signal.WavData;
import limen.signal.WavFiles;

class RenderCommandTest {

    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return LimenCli.execute(new PrintWriter(out, true), new PrintWriter(err, true), args);
    }

    @Test
    void rendersAToneAtItsLevel() throws IOException {
        Path f = dir.resolve("tone.wav");
        int code = run("render", "--frequency", "1000", "--level", "70", "--duration", "0.5", "--ramp", "0.02",
                "--ear", "left", "--rate", "44100", "--bits", "24", "--full-scale-spl", "100", "--out", f.toString());
        assertEquals(0, code, err.toString());
        assertTrue(err.toString().contains("Research software"), err.toString());
        WavData d = WavFiles.read(f);
        assertEquals(44100, d.sampleRateHz());
        assertEquals(24, d.bitsPerSample());
        assertEquals(22050, d.length());
        // 70 dB SPL through a full-scale level of 100 dB SPL: a -30 dBFS sine (AES17), steady part
        assertEquals(-30.0, Levels.rmsDbfs(d.channel(0), 2000, 20000), 0.01);
        assertEquals(-30.0, Levels.peakDbfs(d.channel(0)), 0.001);
        assertEquals(0.0, Levels.peak(d.channel(1), 0, d.length()), 0);
        assertEquals(1000.0, Spectrum.of(d.channel(0), 44100).dominantFrequencyHz(), 0.01);
        assertTrue(out.toString().contains("1000 Hz at 70.00 dB SPL"), out.toString());
    }

    @Test
    void overTheCeilingWritesNothingAndExits1() {
        Path f = dir.resolve("loud.wav");
        int code = run("render", "--frequency", "2000", "--level", "95", "--duration", "0.2",
                "--full-scale-spl", "100", "--ceiling", "90", "--bits", "16", "--out", f.toString());
        assertEquals(1, code);
        assertFalse(Files.exists(f));
        assertTrue(err.toString().contains("limen render: requested 95.00 dB SPL for tone 2000 Hz at 2000 Hz exceeds "
                + "the allowed 90.00 dB SPL"), err.toString());
        // the default ceiling is the full-scale level - 3
        err.getBuffer().setLength(0);
        assertEquals(1, run("render", "--frequency", "1000", "--level", "97.5", "--duration", "0.2",
                "--full-scale-spl", "100", "--out", f.toString()));
        assertTrue(err.toString().contains("allowed 97.00 dB SPL"), err.toString());
        assertFalse(Files.exists(f));
    }

    private static Path examples() {
        Path root = Path.of(System.getProperty("limen.root", "../.."));
        Path ex = root.resolve("examples");
        return Files.isDirectory(ex) ? ex : Path.of("../../examples");
    }

    /** Onset and offset seconds of interval k (1-based) from the command's summary lines. */
    private double[] interval(int k) {
        for (String line : out.toString().lines().toList()) {
            String t = line.trim();
            if (t.startsWith("interval " + k + ":")) {
                String[] span = t.substring(t.indexOf(':') + 1).trim().split(" ")[0].split("-");
                return new double[] {Double.parseDouble(span[0]), Double.parseDouble(span[1])};
            }
        }
        throw new AssertionError("no interval " + k + " in " + out);
    }

    @Test
    void rendersABatteryTrialThroughTheBatteryCalibration() throws IOException {
        // Harbourside example battery, step 2: frequency discrimination at 1000 Hz, 60 dB SPL, comparison +5 %
        Path f = dir.resolve("trial.wav");
        int code = run("render", examples().resolve("frequency-discrimination.battery").toString(), "--step", "2",
                "--value", "5", "--target-interval", "2", "--out", f.toString());
        assertEquals(0, code, err.toString());
        assertTrue(out.toString().contains("step fd-1000 at 5, target in interval 2 of 2"), out.toString());
        WavData d = WavFiles.read(f);
        assertEquals(48000, d.sampleRateHz());
        double[] left = d.channel(0);
        double[] first = interval(1);
        double[] second = interval(2);
        assertEquals(0.3, first[1] - first[0], 1e-9);
        assertEquals(0.4, second[0] - first[1], 1e-9); // the step's ISI
        double[] a = java.util.Arrays.copyOfRange(left, (int) Math.round(first[0] * 48000), (int) Math.round(first[1] * 48000));
        double[] b = java.util.Arrays.copyOfRange(left, (int) Math.round(second[0] * 48000),
                (int) Math.round(second[1] * 48000));
        assertEquals(1000.0, Spectrum.of(a, 48000).dominantFrequencyHz(), 0.01);
        assertEquals(1050.0, Spectrum.of(b, 48000).dominantFrequencyHz(), 0.01);
        // demo calibration: -20 dBFS gives 80 dB SPL, so 60 dB SPL is a -40 dBFS sine
        assertEquals(-40.0, Levels.peakDbfs(a), 0.01);
        // by step id, and by the drawn interval
        out.getBuffer().setLength(0);
        assertEquals(0, run("render", examples().resolve("frequency-discrimination.battery").toString(), "--step",
                "fd-500", "--value", "2", "--seed", "3", "--out", f.toString()), err.toString());
        assertTrue(out.toString().contains("step fd-500 at 2, target in interval"), out.toString());
    }

    @Test
    void batteryTrialOverTheCeilingIsRefused() {
        // intensity discrimination at 60 dB SPL + 30 dB = 90 dB SPL, over the demo calibration's 85 dB ceiling
        Path f = dir.resolve("loud-trial.wav");
        int code = run("render", examples().resolve("intensity-discrimination.battery").toString(), "--step", "1",
                "--value", "30", "--out", f.toString());
        assertEquals(1, code, err.toString());
        assertTrue(err.toString().contains("exceeds the allowed 85.00 dB SPL"), err.toString());
        assertFalse(Files.exists(f));
    }

    @Test
    void toneThroughACalibrationFile() throws IOException {
        Path f = dir.resolve("cal-tone.wav");
        Path cal = examples().resolve("harbourside-demo.calibration");
        assertEquals(0, run("render", "--calibration", cal.toString(), "--frequency", "2000", "--level", "70",
                "--duration", "0.3", "--out", f.toString()), err.toString());
        assertEquals(-30.0, Levels.peakDbfs(WavFiles.read(f).channel(1)), 0.01);
        // outside the calibrated range 125-12000 Hz: a usage error, nothing written
        Path g = dir.resolve("low.wav");
        assertEquals(2, run("render", "--calibration", cal.toString(), "--frequency", "100", "--level", "60",
                "--duration", "0.3", "--out", g.toString()));
        assertTrue(err.toString().contains("outside the calibrated range"), err.toString());
        assertFalse(Files.exists(g));
        assertEquals(2, run("render", "--calibration", cal.toString(), "--full-scale-spl", "100", "--frequency", "1000",
                "--level", "60", "--duration", "0.3", "--out", g.toString()));
        assertEquals(2, run("render", "--calibration", cal.toString(), "--rate", "44100", "--frequency", "1000",
                "--level", "60", "--duration", "0.3", "--out", g.toString()));
    }

    @Test
    void usageErrorsExit2() {
        Path f = dir.resolve("x.wav");
        assertEquals(2, run("render", "--frequency", "1000", "--level", "60", "--full-scale-spl", "100",
                "--out", f.toString())); // no duration
        assertEquals(2, run("render", "--frequency", "30000", "--level", "60", "--duration", "0.1",
                "--full-scale-spl", "100", "--out", f.toString())); // above Nyquist
        assertEquals(2, run("render", "--frequency", "1000", "--level", "60", "--duration", "0.1", "--rate", "22050",
                "--full-scale-spl", "100", "--out", f.toString()));
        assertEquals(2, run("render", "--frequency", "1000", "--level", "60", "--duration", "0.1", "--bits", "8",
                "--full-scale-spl", "100", "--out", f.toString()));
        assertFalse(Files.exists(f));
    }
}
