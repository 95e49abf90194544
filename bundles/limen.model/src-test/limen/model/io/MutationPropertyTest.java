package limen.model.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.TreeMap;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.model.testsupport.TestPaths;
import limen.model.validation.Problem;

/**
 * Property: loading and checking any mutation of the demo lab's files (seeded random byte edits and element
 * edits: deleted, duplicated and swapped lines, nasty attribute values, swapped element types) ends within a
 * time bound, throws nothing, reports every problem in the {@code FILE:LINE: severity: CODE: message} form,
 * and leaves the mutated file unchanged. A failing mutant is written to the report folder for reproduction.
 */
class MutationPropertyTest {

    /** Number of mutants; override with -Dlimen.mutants=N. */
    private static final int MUTANTS = Integer.getInteger("limen.mutants", 2000);
    private static final long SEED = Long.getLong("limen.mutationSeed", 20250115L);
    /** Upper bound for loading and validating one small file; generous for a busy build machine. */
    private static final long BOUND_SECONDS = 10;

    private static final Pattern FORMAT = Pattern.compile("^.+:\\d+: (error|warning): LM\\d{4}: .+$", Pattern.DOTALL);
    private static final Pattern ATTRIBUTE = Pattern.compile("(\\w+)=\"([^\"]*)\"");
    private static final String[] NASTY = {"", " ", "-1", "0", "1", "2", "-0", "NaN", "Infinity", "-Infinity", "1e309",
        "4.9E-324", "-1e308", "9223372036854775808", "2147483648", "abc", "DB_SPL", "LOG", "MULTIPLICATIVE",
        "DETECTION_NOISE", "LATIN_SQUARE", "true", "false", "abs-1000", "fd-1000", "quest-1000", "#//@steps.0",
        "missing.battery#abs-1000", "2025-13-45", "2025-03-04T09:30:00Z", "&amp;", "&lt;", "&#0;", "&#x1F600;",
        "\u00e9\u00df\u4e2d", "x".repeat(5000), "1 2 3", "0.5", "100000", "-100000", "1e-12"};
    private static final String[] TYPES = {"limen:ForcedChoiceTask", "limen:YesNoTask", "limen:AbsoluteLevel",
        "limen:RelativeLevel", "limen:TransformedUpDownProcedure", "limen:WeightedUpDownProcedure",
        "limen:PestProcedure", "limen:QuestProcedure", "limen:PsiProcedure", "limen:ConstantStimuliProcedure",
        "limen:ContributedProcedure", "limen:Battery", "limen:Calibration", "limen:Step", "limen:Nothing"};
    private static final String[] TAGS = {"steps", "tracks", "procedure", "stoppingRule", "task", "stimulus",
        "standardLevel", "variedQuantity", "points", "breaks", "masker", "level", "values", "battery", "calibration"};

    private static ExecutorService worker;
    private static final Map<String, Integer> CODES = new TreeMap<>();

    @TempDir
    Path dir;

    @BeforeAll
    static void start() {
        worker = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "mutant-loader");
            t.setDaemon(true);
            return t;
        });
    }

    @AfterAll
    static void stop() {
        worker.shutdownNow();
    }

    @Test
    void mutatedExamplesNeverThrowOrHang() throws Exception {
        List<Path> sources = new ArrayList<>();
        try (Stream<Path> files = Files.list(TestPaths.examples())) {
            files.filter(Files::isRegularFile).sorted().forEach(sources::add);
        }
        sources.add(TestPaths.fixtures().resolve("valid-session.session"));
        List<byte[]> originals = new ArrayList<>();
        for (Path source : sources) {
            originals.add(Files.readAllBytes(source));
        }
        // the batteries name the demo calibration: keep an intact copy beside the mutants
        Files.copy(TestPaths.examples().resolve("harbourside-demo.calibration"),
                dir.resolve("harbourside-demo.calibration"));
        Files.copy(TestPaths.fixtures().resolve("support-other.battery"), dir.resolve("support-other.battery"));
        // the first check loads and initialises EMF and the parser: not part of the bound on one check
        DocumentChecker.check(List.of(sources.get(0)), null);
        SplittableRandom random = new SplittableRandom(SEED);
        long slowest = 0;
        int loaded = 0;
        for (int i = 0; i < MUTANTS; i++) {
            int which = random.nextInt(sources.size());
            String name = sources.get(which).getFileName().toString();
            byte[] mutant = originals.get(which);
            int edits = 1 + random.nextInt(3);
            for (int e = 0; e < edits; e++) {
                mutant = mutate(mutant, random);
            }
            Path file = dir.resolve("m" + i + "-" + name);
            Files.write(file, mutant);
            long start = System.nanoTime();
            DocumentChecker.Report report = checkWithinBound(file, mutant, i);
            slowest = Math.max(slowest, System.nanoTime() - start);
            assertArrayEquals(mutant, Files.readAllBytes(file), "checking changed mutant " + i);
            for (Problem p : report.problems()) {
                assertTrue(FORMAT.matcher(p.format()).matches(), p.format());
                assertFalse(p.message().isBlank());
                assertTrue(p.line() >= 0 && p.column() >= 0);
                assertEquals(p.code().severity(), p.severity());
                CODES.merge(p.code().code(), 1, Integer::sum);
            }
            if (!report.hasErrors()) {
                loaded++;
            }
            Files.delete(file);
        }
        System.out.printf("MutationPropertyTest: %d mutants (seed %d), %d without errors, slowest check %.1f ms,"
                + " codes %s%n", MUTANTS, SEED, loaded, slowest / 1e6, CODES);
        assertTrue(slowest < TimeUnit.SECONDS.toNanos(BOUND_SECONDS));
        assertTrue(CODES.size() > 20, "the mutations reach many different checks: " + CODES);
        assertFalse(CODES.containsKey("LM0910"), "every load failure has a specific code: " + CODES);
    }

    private DocumentChecker.Report checkWithinBound(Path file, byte[] mutant, int index) throws IOException {
        Future<DocumentChecker.Report> run = worker.submit(() -> DocumentChecker.check(List.of(file), null));
        try {
            return run.get(BOUND_SECONDS, TimeUnit.SECONDS);
        } catch (TimeoutException e) {
            run.cancel(true);
            keep(mutant, index);
            fail("mutant " + index + " took longer than " + BOUND_SECONDS + " s");
        } catch (ExecutionException e) {
            keep(mutant, index);
            throw new AssertionError("mutant " + index + " (seed " + SEED + ") threw " + e.getCause(), e.getCause());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            fail("interrupted");
        }
        return null;
    }

    /** Keeps a failing mutant where the build's reports are, so that it can be checked by hand. */
    private static void keep(byte[] mutant, int index) throws IOException {
        Path folder = Path.of("target", "mutants");
        Files.createDirectories(folder);
        Files.write(folder.resolve("mutant-" + index + ".xml"), mutant);
    }

    /** One random edit; byte edits model damaged files, element edits model careless hand edits. */
    static byte[] mutate(byte[] bytes, SplittableRandom random) {
        if (bytes.length == 0) {
            return "<".getBytes(StandardCharsets.UTF_8);
        }
        switch (random.nextInt(11)) {
            case 0: { // overwrite one byte
                byte[] b = bytes.clone();
                b[random.nextInt(b.length)] = (byte) random.nextInt(256);
                return b;
            }
            case 1: { // delete a range
                int from = random.nextInt(bytes.length);
                int to = Math.min(bytes.length, from + 1 + random.nextInt(60));
                return concat(slice(bytes, 0, from), slice(bytes, to, bytes.length));
            }
            case 2: { // insert XML-ish characters
                String alphabet = "<>/=\"' &;#x:\n\t?!-[]";
                StringBuilder s = new StringBuilder();
                for (int n = 1 + random.nextInt(8); n > 0; n--) {
                    s.append(alphabet.charAt(random.nextInt(alphabet.length())));
                }
                int at = random.nextInt(bytes.length + 1);
                return concat(slice(bytes, 0, at), s.toString().getBytes(StandardCharsets.UTF_8), slice(bytes, at, bytes.length));
            }
            case 3: // truncate
                return slice(bytes, 0, random.nextInt(bytes.length));
            case 4: { // duplicate a range
                int from = random.nextInt(bytes.length);
                int to = Math.min(bytes.length, from + 1 + random.nextInt(200));
                return concat(slice(bytes, 0, to), slice(bytes, from, bytes.length));
            }
            default:
                return mutateText(new String(bytes, StandardCharsets.UTF_8), random).getBytes(StandardCharsets.UTF_8);
        }
    }

    private static String mutateText(String text, SplittableRandom random) {
        List<String> lines = new ArrayList<>(List.of(text.split("\n", -1)));
        int n = lines.size();
        switch (random.nextInt(6)) {
            case 0: // delete a line (an element, or half of one)
                if (n > 1) {
                    lines.remove(random.nextInt(n));
                }
                return String.join("\n", lines);
            case 1: { // duplicate a line
                int i = random.nextInt(n);
                lines.add(i, lines.get(i));
                return String.join("\n", lines);
            }
            case 2: { // swap two lines
                int i = random.nextInt(n);
                int j = random.nextInt(n);
                String t = lines.get(i);
                lines.set(i, lines.get(j));
                lines.set(j, t);
                return String.join("\n", lines);
            }
            case 3: { // a nasty value for one attribute
                int i = random.nextInt(n);
                Matcher m = ATTRIBUTE.matcher(lines.get(i));
                List<int[]> spans = new ArrayList<>();
                while (m.find()) {
                    spans.add(new int[] {m.start(2), m.end(2)});
                }
                if (spans.isEmpty()) {
                    return text;
                }
                int[] span = spans.get(random.nextInt(spans.size()));
                String line = lines.get(i);
                String value = NASTY[random.nextInt(NASTY.length)];
                lines.set(i, line.substring(0, span[0]) + value + line.substring(span[1]));
                return String.join("\n", lines);
            }
            case 4: { // another element type
                String type = TYPES[random.nextInt(TYPES.length)];
                return text.replaceFirst("xsi:type=\"limen:\\w+\"", "xsi:type=\"" + type + "\"");
            }
            default: { // another element name
                String from = TAGS[random.nextInt(TAGS.length)];
                String to = TAGS[random.nextInt(TAGS.length)];
                return text.replaceFirst("<" + from + "\\b", "<" + to).replaceFirst("</" + from + ">", "</" + to + ">");
            }
        }
    }

    private static byte[] slice(byte[] b, int from, int to) {
        return java.util.Arrays.copyOfRange(b, from, to);
    }

    private static byte[] concat(byte[]... parts) {
        int length = 0;
        for (byte[] p : parts) {
            length += p.length;
        }
        byte[] out = new byte[length];
        int at = 0;
        for (byte[] p : parts) {
            System.arraycopy(p, 0, out, at, p.length);
            at += p.length;
        }
        return out;
    }
}
