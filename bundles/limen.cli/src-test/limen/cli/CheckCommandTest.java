package limen.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code ./limen check}: output format and exit codes 0, 1 and 2. */
class CheckCommandTest {

    /** FILE:LINE: error|warning: LMnnnn: message */
    private static final Pattern LINE = Pattern.compile("^.+:\\d+: (error|warning): LM\\d{4}: .+$");

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return LimenCli.execute(new PrintWriter(out, true), new PrintWriter(err, true), args);
    }

    private static Path examples() {
        String root = System.getProperty("limen.root");
        for (Path p = root != null ? Path.of(root) : Path.of("").toAbsolutePath(); p != null; p = p.getParent()) {
            if (Files.isDirectory(p.resolve("examples")) && Files.isDirectory(p.resolve("bundles"))) {
                return p.resolve("examples");
            }
        }
        throw new IllegalStateException("no examples folder above " + Path.of("").toAbsolutePath());
    }

    @Test
    void theDemoLabHasNoErrors() throws IOException {
        List<String> args = new ArrayList<>(List.of("check"));
        try (Stream<Path> files = Files.list(examples())) {
            files.filter(Files::isRegularFile).sorted().forEach(f -> args.add(f.toString()));
        }
        assertEquals(0, run(args.toArray(String[]::new)), out + "\n" + err);
        for (String line : out.toString().split("\n")) {
            if (!line.isEmpty()) {
                assertTrue(LINE.matcher(line).matches(), line);
                assertTrue(line.contains(": warning: "), line);
            }
        }
        // the demo calibration announces itself as not valid for real headphones
        assertTrue(out.toString().contains("harbourside-demo.calibration:2: warning: LM0608: "), out.toString());
    }

    @Test
    void errorsGiveExitOneWithFileAndLine(@TempDir Path dir) throws IOException {
        Path battery = dir.resolve("broken.battery");
        String text = Files.readString(examples().resolve("quest-thresholds.battery"))
                .replace("calibrationFile=\"harbourside-demo.calibration\"", "")
                .replace("intervalCount=\"2\"", "intervalCount=\"7\"");
        Files.writeString(battery, text);
        assertEquals(1, run("check", "--calibration", examples().resolve("harbourside-demo.calibration").toString(),
                battery.toString()), err.toString());
        String first = out.toString().lines().filter(l -> l.contains("LM0114")).findFirst().orElseThrow();
        assertTrue(first.startsWith(battery + ":4: error: LM0114: step 'QUEST threshold 1000 Hz'"), first);
    }

    @Test
    void garbageGivesExitOneAndIsLeftUnchanged(@TempDir Path dir) throws IOException {
        Path garbage = dir.resolve("garbage.battery");
        byte[] bytes = "<?xml version=\"1.0\"?>\n<limen:Battery xmlns:limen=\"http://limen.dev/model/1.0\" ti"
                .getBytes(StandardCharsets.UTF_8);
        Files.write(garbage, bytes);
        assertEquals(1, run("check", garbage.toString()));
        assertTrue(out.toString().startsWith(garbage + ":2: error: LM0901: malformed XML at column "), out.toString());
        assertArrayEquals(bytes, Files.readAllBytes(garbage));
    }

    @Test
    void unreadableFileOrNoFileIsAUsageError(@TempDir Path dir) {
        assertEquals(2, run("check", dir.resolve("missing.battery").toString()));
        assertTrue(out.toString().contains("missing.battery:1: error: LM0905: cannot read the file"), out.toString());
        assertEquals(2, run("check", dir.toString()));
        assertEquals(2, run("check"));
    }
}
