package limen.model.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.model.testsupport.TestPaths;
import limen.model.validation.Problem;
import limen.model.validation.ProblemCode;

/** How {@code check} finds the calibration of a battery, and how it names files. */
class DocumentCheckerTest {

    @TempDir
    Path dir;

    private Path loudBattery() throws IOException {
        // a 70 dB SPL standard: under the demo ceiling of 85 dB SPL, over the 65 dB SPL ceiling written below
        Path battery = dir.resolve("loud.battery");
        Files.writeString(battery, Files.readString(TestPaths.examples().resolve("intensity-discrimination.battery"))
                .replace("levelDbSpl=\"60.0\"", "levelDbSpl=\"70.0\""));
        return battery;
    }

    @Test
    void aBatteryIsCheckedAgainstTheCalibrationItNames() throws IOException {
        Path battery = loudBattery();
        Files.copy(TestPaths.examples().resolve("harbourside-demo.calibration"), dir.resolve("harbourside-demo.calibration"));
        DocumentChecker.Report report = DocumentChecker.check(List.of(battery), null);
        // 70 + 15 dB increments = 85 dB SPL: exactly at the demo ceiling, allowed
        assertEquals(List.of(), report.problems());
    }

    @Test
    void anOverrideCalibrationIsUsedInstead() throws IOException {
        Path battery = loudBattery();
        Path strict = dir.resolve("strict.calibration");
        Files.writeString(strict, Files.readString(TestPaths.fixtures().resolve("fixture-lab.calibration"))
                .replace("ceilingDbSpl=\"90\"", "ceilingDbSpl=\"65\""));
        DocumentChecker.Report report = DocumentChecker.check(List.of(battery), strict);
        List<ProblemCode> codes = report.problems().stream().map(Problem::code).distinct().toList();
        assertTrue(codes.contains(ProblemCode.LEVEL_ABOVE_CEILING), report.problems().toString());
        assertTrue(codes.contains(ProblemCode.VARIED_LEVEL_ABOVE_CEILING), report.problems().toString());
        assertTrue(report.hasErrors());
        assertFalse(report.unreadable());
        for (Problem p : report.problems()) {
            assertEquals(battery, p.file(), "problems carry the path as given");
        }
    }

    @Test
    void anUnreadableOverrideIsReported() throws IOException {
        DocumentChecker.Report report = DocumentChecker.check(List.of(loudBattery()), dir.resolve("none.calibration"));
        assertTrue(report.unreadable());
        assertEquals(ProblemCode.UNREADABLE_FILE, report.problems().get(0).code());
    }

    @Test
    void relativePathsStayRelative() {
        Path relative = TestPaths.root().relativize(TestPaths.fixtures().resolve("LM0205-ramp-too-long.battery"));
        Path given = Path.of(System.getProperty("user.dir")).relativize(TestPaths.root().resolve(relative));
        DocumentChecker.Report report = DocumentChecker.check(List.of(given), null);
        assertTrue(report.problems().get(0).format().startsWith(given + ":"), report.problems().get(0).format());
    }
}
