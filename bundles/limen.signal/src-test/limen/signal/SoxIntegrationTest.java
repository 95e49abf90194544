package limen.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Integration: a rendered WAV measured by SoX (Debian package {@code sox}), an independent tool. SoX's
 * {@code stats} reports levels relative to a full-scale square wave (so a full-scale sine's RMS reads -3.01 dB)
 * and peaks relative to full scale; {@code stat} reports the length and a rough frequency. Without sox the test
 * is skipped, except under CI ({@code CI=true}) where it fails.
 */
class SoxIntegrationTest {

    @TempDir
    Path dir;

    @BeforeAll
    static void soxPresent() {
        boolean present;
        try {
            present = run(List.of("sox", "--version")).contains("SoX");
        } catch (IOException e) {
            present = false;
        }
        if (!present) {
            if ("true".equalsIgnoreCase(System.getenv("CI"))) {
                fail("sox is required under CI (apt-get install sox)");
            }
            Assumptions.abort("sox not installed: apt-get install sox");
        }
    }

    private static String run(List<String> command) throws IOException {
        Process p = new ProcessBuilder(command).redirectErrorStream(true).start();
        byte[] out = p.getInputStream().readAllBytes();
        try {
            if (!p.waitFor(60, TimeUnit.SECONDS)) {
                p.destroyForcibly();
                throw new IOException("sox timed out");
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException(e);
        }
        return new String(out, StandardCharsets.UTF_8);
    }

    /** The numbers of one row of {@code sox stats} output (columns Overall, Left, Right). */
    private static List<Double> row(String stats, String label) {
        for (String line : stats.split("\n")) {
            if (line.startsWith(label)) {
                List<Double> values = new ArrayList<>();
                for (String t : line.substring(label.length()).trim().split("\\s+")) {
                    values.add(t.equals("-") ? Double.NaN : t.equals("-inf") ? Double.NEGATIVE_INFINITY : Double.parseDouble(t));
                }
                return values;
            }
        }
        throw new AssertionError("no row '" + label + "' in:\n" + stats);
    }

    private static double field(String stat, String label) {
        Matcher m = Pattern.compile(Pattern.quote(label) + ":\\s+(-?[0-9.]+)").matcher(stat);
        assertTrue(m.find(), "no '" + label + "' in:\n" + stat);
        return Double.parseDouble(m.group(1));
    }

    @Test
    void soxMeasuresTheRenderedTone() throws IOException {
        for (int bits : new int[] {16, 24}) {
            // flat calibration: full-scale sine = 100 dB SPL; a 1 kHz tone at 80 dB SPL is a -20 dBFS sine (peak 0.1)
            Calibration cal = Calibration.flat("bench", 100, 48000);
            Stimulus s = new StimulusRenderer(cal).render(new Sound.Tone(1000, 80, 1.0, 0.01), Ear.LEFT, 0.25, 0.25,
                    new SplittableRandom(5));
            Path f = dir.resolve("tone" + bits + ".wav");
            WavFiles.write(new SafetyGuard(cal).check(s), bits, f, new SplittableRandom(6));
            String stats = run(List.of("sox", f.toString(), "-n", "stats"));
            String stat = run(List.of("sox", f.toString(), "-n", "remix", "1", "stat"));
            // peak: 20·log10(0.1) = -20 dBFS (sox prints two decimals)
            assertEquals(-20.00, row(stats, "Pk lev dB").get(1), 0.011);
            // RMS over the whole 1.5 s file: steady 0.98 s plus two 10 ms cos² ramps at 3/8 of the energy,
            // A²/2 · (0.98 + 2·0.01·3/8)/1.5, relative to full-scale square (mean square 1): sox's reference
            double expectedRms = 10 * Math.log10(0.01 / 2 * (0.98 + 2 * 0.01 * 3 / 8) / 1.5);
            assertEquals(expectedRms, row(stats, "RMS lev dB").get(1), 0.011);
            // the same in AES17 dBFS: sox's figure + 3.01 dB
            assertEquals(Levels.rmsDbfs(s.channel(0)), row(stats, "RMS lev dB").get(1) + 10 * Math.log10(2), 0.011);
            // right channel silent: sox prints -inf for its level; here: peak 0 (24 bit) or dither only (16 bit)
            double rightMax = row(stats, "Max level").get(2);
            assertTrue(rightMax <= (bits == 16 ? 1.5 / 32768 : 0), "right channel max " + rightMax);
            assertEquals(1.5, field(stat, "Length (seconds)"), 1e-6);
            assertEquals(1000, field(stat, "Rough   frequency"), 2);
        }
    }

    @Test
    void soxSeesTheTrialsIntervals() throws IOException {
        // a 3-interval trial, target 1 kHz 70 dB SPL in interval 2 (index 1), silence elsewhere
        Calibration cal = Calibration.flat("bench", 100, 44100);
        TrialSpec spec = new TrialSpec(3, 1, new Sound.Silence(0.3), new Sound.Tone(1000, 70, 0.3, 0.02), 0.2, 0.5, 0.4,
                Ear.BOTH, null);
        Stimulus s = new StimulusRenderer(cal).renderTrial(spec, new SplittableRandom(1));
        Path f = dir.resolve("trial.wav");
        WavFiles.write(new SafetyGuard(cal).check(s), 24, f, null);
        IntervalMark target = s.intervals().get(1);
        // trim to the target interval's marks and measure: the whole -30 dBFS tone is there
        double start = target.onsetSeconds(44100);
        double length = (target.offsetSample() - target.onsetSample()) / 44100.0;
        String inside = run(List.of("sox", f.toString(), "-n", "trim", Double.toString(start), Double.toString(length),
                "stats"));
        assertEquals(-30.00, row(inside, "Pk lev dB").get(0), 0.011);
        // the first interval is silent
        IntervalMark first = s.intervals().get(0);
        String silent = run(List.of("sox", f.toString(), "-n", "trim", Double.toString(first.onsetSeconds(44100)),
                Double.toString(length), "stats"));
        assertEquals(0.0, row(silent, "Max level").get(0), 0);
        assertEquals(s.durationSeconds(), field(run(List.of("sox", f.toString(), "-n", "stat")), "Length (seconds)"),
                1e-6);
    }
}
