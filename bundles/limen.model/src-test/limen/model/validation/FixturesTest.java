package limen.model.validation;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;

import limen.model.io.DocumentChecker;
import limen.model.testsupport.TestPaths;

/**
 * Every broken fixture in {@code fixtures/LMnnnn-*.*} gives exactly the codes its header comment names
 * ({@code expect: LM0205@7 ...}), each at the named line, and is left unchanged by checking; every problem code
 * has a fixture or a test of its own.
 */
class FixturesTest {

    private static final Pattern EXPECT = Pattern.compile("expect:((?:\\s+LM\\d{4}(?:@\\d+)?)+)");
    private static final Pattern ITEM = Pattern.compile("(LM\\d{4})(?:@(\\d+))?");
    /** Codes checked by tests of their own rather than by a fixture file. */
    private static final Set<ProblemCode> TESTED_ELSEWHERE = EnumSet.of(
            ProblemCode.STRUCTURE_INVALID, // StructuralMappingTest
            ProblemCode.UNREADABLE_FILE, // LoadFailureTest, CheckCommandTest
            ProblemCode.LOAD_FAILED, // LoadFailureTest
            ProblemCode.CONTRIBUTION_NOT_INSTALLED, // limen.session ContributionFixturesTest: needs the installed
            ProblemCode.CONTRIBUTION_REFUSED); // extensions, which live above this bundle

    static List<Path> fixtures() throws IOException {
        try (Stream<Path> files = Files.list(TestPaths.fixtures())) {
            return files.filter(p -> p.getFileName().toString().startsWith("LM")).sorted().collect(Collectors.toList());
        }
    }

    /** @return code -> expected line (0: any line), from the fixture's header comment */
    static Map<String, Integer> expectations(Path fixture) throws IOException {
        Matcher m = EXPECT.matcher(Files.readString(fixture));
        assertTrue(m.find(), fixture + " has no 'expect:' comment");
        Map<String, Integer> expected = new LinkedHashMap<>();
        Matcher item = ITEM.matcher(m.group(1));
        while (item.find()) {
            expected.put(item.group(1), item.group(2) == null ? 0 : Integer.parseInt(item.group(2)));
        }
        return expected;
    }

    @TestFactory
    Stream<DynamicTest> eachFixtureGivesItsCodesAtTheirLines() throws IOException {
        return fixtures().stream().map(fixture -> DynamicTest.dynamicTest(fixture.getFileName().toString(), () -> {
            Map<String, Integer> expected = expectations(fixture);
            byte[] before = Files.readAllBytes(fixture);
            FileTime modified = Files.getLastModifiedTime(fixture);
            DocumentChecker.Report report = DocumentChecker.check(List.of(fixture), null);
            String all = report.problems().stream().map(Problem::format).collect(Collectors.joining("\n"));
            Set<String> found = report.problems().stream().map(p -> p.code().code())
                    .collect(Collectors.toCollection(TreeSet::new));
            assertEquals(new TreeSet<>(expected.keySet()), found, all);
            for (Map.Entry<String, Integer> e : expected.entrySet()) {
                if (e.getValue() > 0) {
                    assertTrue(report.problems().stream().anyMatch(p -> p.code().code().equals(e.getKey())
                            && p.line() == e.getValue()), e.getKey() + " expected at line " + e.getValue() + ":\n" + all);
                }
            }
            for (Problem p : report.problems()) {
                assertEquals(p.code().severity(), p.severity(), p.format());
                assertEquals(fixture, p.file(), p.format());
                assertTrue(p.format().startsWith(fixture + ":" + Math.max(1, p.line()) + ": " + p.severity().label()
                        + ": " + p.code().code() + ": "), p.format());
                assertFalse(p.message().isBlank(), p.format());
            }
            assertFalse(report.unreadable());
            assertArrayEquals(before, Files.readAllBytes(fixture), "checking changed " + fixture);
            assertEquals(modified, Files.getLastModifiedTime(fixture));
        }));
    }

    @Test
    void validationDiagnosticsNameTheOffendingFeature() throws IOException {
        Path fixture = TestPaths.fixtures().resolve("LM0205-ramp-too-long.battery");
        Problem ramp = DocumentChecker.check(List.of(fixture), null).problems().get(0);
        assertEquals(ProblemCode.RAMP_TOO_LONG, ramp.code());
        assertEquals("rampDurationSeconds", ramp.feature().getName());
        assertEquals("Stimulus", ramp.object().eClass().getName());
        assertTrue(ramp.message().contains("step 'Threshold 1000 Hz'") && ramp.message().contains("0.2 s"),
                ramp.message());
    }

    @Test
    void supportFilesHaveNoProblems() throws IOException {
        for (String name : List.of("valid-base.battery", "valid-session.session", "support-other.battery",
                "fixture-lab.calibration", "fixture-quiet-output.calibration")) {
            Path file = TestPaths.fixtures().resolve(name);
            DocumentChecker.Report report = DocumentChecker.check(List.of(file), null);
            assertEquals(List.of(), report.problems(), name);
        }
    }

    @Test
    void everyCodeHasAFixtureOrATestOfItsOwn() throws IOException {
        Set<ProblemCode> covered = EnumSet.copyOf(TESTED_ELSEWHERE);
        for (Path fixture : fixtures()) {
            String prefix = fixture.getFileName().toString().substring(0, 6);
            covered.add(ProblemCode.ofNumber(Integer.parseInt(prefix.substring(2))).orElseThrow(
                    () -> new AssertionError("fixture " + fixture + " names no known code")));
        }
        Set<ProblemCode> missing = EnumSet.complementOf(EnumSet.copyOf(covered));
        assertEquals(Set.of(), missing);
    }

    @Test
    void codesAreUniqueAndWellFormed() {
        Set<Integer> numbers = new TreeSet<>();
        for (ProblemCode code : ProblemCode.values()) {
            assertTrue(numbers.add(code.number()), "duplicate " + code);
            assertTrue(code.code().matches("LM\\d{4}"), code.code());
            assertEquals(code, ProblemCode.ofNumber(code.number()).orElseThrow());
        }
    }
}
