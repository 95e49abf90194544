package limen.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SimulateCommandTest {

    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return LimenCli.execute(new PrintWriter(out, true), new PrintWriter(err, true), args);
    }

    private static Path example(String name) {
        String root = System.getProperty("limen.root");
        Path p = root != null ? Path.of(root, "examples", name) : Path.of("examples", name);
        return Files.exists(p) ? p : Path.of("../..", "examples", name);
    }

    @Test
    void writesOneRowPerRunAndTrackAndASummary() throws IOException {
        Path csv = dir.resolve("sim.csv");
        int code = run("simulate", example("frequency-discrimination.battery").toString(), "--listener",
                "logistic:mid=3,scale=1", "--runs", "20", "--seed", "7", "--out", csv.toString());
        assertEquals(0, code, err.toString());
        List<String> lines = Files.readAllLines(csv);
        assertTrue(lines.get(0).startsWith("run,step,track,estimate,uncertainty,trials,reversals"), lines.get(0));
        assertTrue(lines.size() > 20, "rows: " + lines.size());
        assertTrue(out.toString().contains("effic."), out.toString());
        assertTrue(err.toString().contains("20/20 runs"), err.toString());
        // the same seed gives the same rows
        Path again = dir.resolve("again.csv");
        assertEquals(0, run("simulate", example("frequency-discrimination.battery").toString(), "--listener",
                "logistic:mid=3,scale=1", "--runs", "20", "--seed", "7", "--threads", "1", "--out", again.toString()));
        assertEquals(lines, Files.readAllLines(again));
    }

    @Test
    void everyExampleSimulatesWithDefaultListeners() throws IOException {
        for (String b : List.of("method-sampler.battery", "quest-thresholds.battery", "psi-masked-threshold.battery",
                "intensity-discrimination.battery")) {
            Path csv = dir.resolve(b + ".csv");
            assertEquals(0, run("simulate", example(b).toString(), "--runs", "4", "--out", csv.toString()), b + ": " + err);
            assertTrue(Files.readAllLines(csv).size() > 4, b);
        }
        assertTrue(err.toString().contains(": listener "), err.toString());
    }

    @Test
    void badListenerSpecIsAUsageErrorAndAMissingFileToo() {
        assertEquals(2, run("simulate", example("frequency-discrimination.battery").toString(), "--listener", "cubic:mid=1",
                "--out", dir.resolve("x.csv").toString()));
        assertTrue(err.toString().contains("limen simulate:"), err.toString());
        assertEquals(2, run("simulate", dir.resolve("missing.battery").toString(), "--out", dir.resolve("y.csv").toString()));
    }
}
