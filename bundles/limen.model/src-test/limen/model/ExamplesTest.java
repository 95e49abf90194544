package limen.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

import limen.model.io.LimenFiles;
import limen.model.io.LoadResult;
import limen.model.validation.BatteryValidator;
import limen.model.validation.Problem;
import limen.model.testsupport.TestPaths;
import limen.model.validation.ProblemCode;

/** The demo lab in examples/ loads and validates without errors against its demo calibration. */
class ExamplesTest {

    static List<Path> exampleFiles() throws IOException {
        try (Stream<Path> files = Files.list(TestPaths.examples())) {
            return files.filter(Files::isRegularFile).sorted().collect(Collectors.toList());
        }
    }

    @Test
    void everyExampleLoadsAndValidatesWithoutErrors() throws IOException {
        Calibration demo = LimenFiles.loadCalibration(TestPaths.examples().resolve("harbourside-demo.calibration"));
        List<Path> files = exampleFiles();
        assertTrue(files.size() >= 7, "examples: " + files);
        for (Path file : files) {
            LoadResult result = LimenFiles.load(file);
            assertTrue(result.problems().isEmpty(), file + ": " + result.problems());
            List<Problem> problems = BatteryValidator.validate(result.document(), demo);
            List<Problem> errors = problems.stream().filter(Problem::isError).toList();
            assertEquals(List.of(), errors, file.toString());
            if (result.document() instanceof Calibration) {
                // the demo calibration must say loudly that it is not real
                assertTrue(problems.stream().anyMatch(p -> p.code() == ProblemCode.DEMONSTRATION_CALIBRATION));
            } else if (result.document() instanceof Battery battery) {
                assertFalse(problems.stream().anyMatch(Problem::isError), problems.toString());
                assertEquals("harbourside-demo.calibration", battery.getCalibrationFile());
            }
        }
    }
}
