package limen.model.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.model.Battery;
import limen.model.LimenFactory;
import limen.model.RelativeLevel;
import limen.model.Step;
import limen.model.testsupport.TestPaths;

/** A failed save leaves the previous file exactly as it was and no temporary file behind. */
class AtomicSaveTest {

    @TempDir
    Path dir;

    private List<Path> folderContent() throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.sorted().toList();
        }
    }

    private Path copyOfExample(String name) throws IOException {
        Path file = dir.resolve(name);
        Files.copy(TestPaths.examples().resolve(name), file);
        return file;
    }

    @Test
    void aSaveReplacesTheContentAndKeepsThePermissions() throws IOException {
        Path file = copyOfExample("quest-thresholds.battery");
        Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-rw----"));
        Battery battery = LimenFiles.loadBattery(file);
        battery.setTitle("Retitled");
        LimenFiles.save(battery, file);
        assertEquals("Retitled", LimenFiles.loadBattery(file).getTitle());
        assertEquals("rw-rw----", PosixFilePermissions.toString(Files.getPosixFilePermissions(file)));
        assertEquals(List.of(file), folderContent());
    }

    @Test
    void aSerialisationFailureLeavesTheOldFile() throws IOException {
        Path file = copyOfExample("thresholds-then-discrimination.battery");
        byte[] before = Files.readAllBytes(file);
        Battery battery = LimenFiles.loadBattery(file);
        // a reference to a step that belongs to no document cannot be written (a dangling reference)
        Step stray = LimenFactory.eINSTANCE.createStep();
        stray.setId("stray");
        RelativeLevel level = (RelativeLevel) battery.getSteps().get(6).getStimulus().getStandardLevel();
        level.setReference(stray);
        assertThrows(IOException.class, () -> LimenFiles.save(battery, file));
        assertArrayEquals(before, Files.readAllBytes(file));
        assertEquals(List.of(file), folderContent());
    }

    @Test
    void aNewFileIsCreated() throws IOException {
        Battery battery = LimenFiles.loadBattery(TestPaths.examples().resolve("psi-masked-threshold.battery"));
        Path target = dir.resolve("new.battery");
        LimenFiles.save(battery, target);
        assertEquals(List.of(target), folderContent());
        assertEquals("rw-r--r--", PosixFilePermissions.toString(Files.getPosixFilePermissions(target)));
        assertTrue(LimenFiles.load(target).problems().isEmpty());
    }
}
