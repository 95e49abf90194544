package limen.model.io.internal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The write sequence of {@link AtomicFiles}: temporary file beside the target, complete before the rename. */
class AtomicFilesTest {

    @TempDir
    Path dir;

    private List<Path> folderContent() throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.sorted().toList();
        }
    }

    @Test
    void aFailureJustBeforeTheRenameLeavesTheOldFileAndNoTemporary() throws IOException {
        Path file = dir.resolve("lab.battery");
        byte[] before = "old content".getBytes(StandardCharsets.UTF_8);
        Files.write(file, before);
        Path[] seen = new Path[1];
        IOException failure = assertThrows(IOException.class, () -> AtomicFiles.write(file, new byte[] {1, 2, 3},
                temporary -> {
                    seen[0] = temporary;
                    assertEquals(3, Files.size(temporary), "the complete new content is on disk before the rename");
                    assertEquals(dir, temporary.getParent(), "the temporary file is beside the target");
                    throw new IOException("disk pulled out");
                }));
        assertEquals("disk pulled out", failure.getMessage());
        assertArrayEquals(before, Files.readAllBytes(file));
        assertTrue(Files.notExists(seen[0]), "temporary file removed");
        assertEquals(List.of(file), folderContent());
    }

    @Test
    void aRuntimeFailureIsCleanedUpToo() throws IOException {
        Path file = dir.resolve("lab.calibration");
        assertThrows(IllegalStateException.class, () -> AtomicFiles.write(file, new byte[] {7}, temporary -> {
            throw new IllegalStateException("bug");
        }));
        assertEquals(List.of(), folderContent(), "nothing half-written, not even a new empty file");
    }

    @Test
    void theNewContentReplacesTheOld() throws IOException {
        Path file = dir.resolve("lab.session");
        Files.writeString(file, "old");
        AtomicFiles.write(file, "new".getBytes(StandardCharsets.UTF_8));
        assertEquals("new", Files.readString(file));
        assertEquals(List.of(file), folderContent());
    }

    @Test
    void aMissingFolderFailsWithoutCreatingAnything() {
        Path file = dir.resolve("no-such-folder/lab.battery");
        assertThrows(IOException.class, () -> AtomicFiles.write(file, new byte[] {1}));
        assertTrue(Files.notExists(dir.resolve("no-such-folder")));
    }
}
