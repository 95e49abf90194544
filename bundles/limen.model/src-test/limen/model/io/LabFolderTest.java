package limen.model.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.model.Battery;
import limen.model.SessionHeader;
import limen.model.testsupport.TestPaths;
import limen.model.validation.ProblemCode;

/** The demo lab folder loads as a whole. */
class LabFolderTest {

    @Test
    void theDemoLab() throws IOException {
        LabFolder lab = LabFolder.scan(TestPaths.examples());
        assertEquals(6, lab.batteries().size());
        assertEquals(1, lab.calibrations().size());
        assertEquals(1, lab.sessions().size());
        assertEquals(lab.entries().size(), 8);
        assertEquals(java.util.List.of(), lab.problems());
        for (Battery battery : lab.batteries()) {
            assertSame(lab.calibrations().get(0), lab.calibrationFor(battery).orElseThrow(), battery.getTitle());
        }
        SessionHeader session = lab.sessions().get(0);
        assertEquals("P-OTTER", session.getParticipant());
        assertEquals(session.getBattery().getSteps(), session.getStepOrder());
    }

    @Test
    void brokenFilesAreListedWithTheirProblems(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("half.battery"), "<?xml version=\"1.0\"?>\n<limen:Battery");
        Files.writeString(dir.resolve("readme.txt"), "not a Limen file");
        Files.copy(TestPaths.examples().resolve("quest-thresholds.battery"), dir.resolve("q.battery"));
        LabFolder lab = LabFolder.scan(dir);
        assertEquals(2, lab.entries().size(), "only Limen files");
        assertEquals(1, lab.batteries().size());
        assertFalse(lab.calibrationFor(lab.batteries().get(0)).isPresent(), "its calibration is not in this folder");
        assertTrue(lab.problems().stream().anyMatch(p -> p.code() == ProblemCode.MALFORMED_FILE
                && p.file().getFileName().toString().equals("half.battery")));
    }
}
