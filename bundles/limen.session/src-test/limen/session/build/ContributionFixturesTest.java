package limen.session.build;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

import limen.model.io.DocumentChecker;
import limen.model.validation.Problem;

/**
 * The broken fixtures of the codes that need the installed extensions (LM0805, LM0806), in
 * {@code src-test/limen/session/fixtures}: with this bundle's {@link InstalledContributions} on the class path,
 * each gives exactly the codes its header names ({@code expect: LM0805@11 ...}), each at its line.
 */
class ContributionFixturesTest {

    private static final Pattern EXPECT = Pattern.compile("expect:((?:\\s+LM\\d{4}@\\d+)+)");
    private static final Pattern ITEM = Pattern.compile("(LM\\d{4})@(\\d+)");

    static Path fixtures() {
        String root = System.getProperty("limen.root");
        Path base = root != null ? Paths.get(root) : Paths.get("../..");
        return base.resolve("bundles/limen.session/src-test/limen/session/fixtures").toAbsolutePath().normalize();
    }

    @TestFactory
    Stream<DynamicTest> eachFixtureGivesItsCodesAtTheirLines() throws IOException {
        List<Path> files;
        try (Stream<Path> list = Files.list(fixtures())) {
            files = list.filter(p -> p.getFileName().toString().startsWith("LM")).sorted().toList();
        }
        assertEquals(2, files.size(), files.toString());
        return files.stream().map(f -> DynamicTest.dynamicTest(f.getFileName().toString(), () -> {
            Matcher m = EXPECT.matcher(Files.readString(f));
            assertTrue(m.find(), f + " has no expect: comment");
            Set<String> expected = new TreeSet<>();
            Matcher item = ITEM.matcher(m.group(1));
            while (item.find()) {
                expected.add(item.group(1) + "@" + item.group(2));
            }
            List<Problem> problems = DocumentChecker.check(List.of(f), null).problems();
            String all = problems.stream().map(Problem::format).collect(Collectors.joining("\n"));
            Set<String> found = problems.stream().map(p -> p.code().code() + "@" + p.line())
                    .collect(Collectors.toCollection(TreeSet::new));
            assertEquals(expected, found, all);
            for (Problem p : problems) {
                assertEquals(p.code().severity(), p.severity(), p.format());
            }
        }));
    }
}
