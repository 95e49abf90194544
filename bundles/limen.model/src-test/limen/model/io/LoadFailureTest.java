package limen.model.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.List;

import org.eclipse.emf.common.util.URI;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.model.io.internal.LoadProblems;
import limen.model.testsupport.TestPaths;
import limen.model.validation.Problem;
import limen.model.validation.ProblemCode;

/** Failed loads name file, line and column, never change the file, and never throw. */
class LoadFailureTest {

    @TempDir
    Path dir;

    private Problem firstError(Path file, byte[] content) throws IOException {
        Files.write(file, content);
        FileTime modified = Files.getLastModifiedTime(file);
        LoadResult result = LimenFiles.load(file);
        assertFalse(result.succeeded(), file + " loaded");
        assertNull(result.document());
        assertArrayEquals(content, Files.readAllBytes(file), "the load changed " + file);
        assertEquals(modified, Files.getLastModifiedTime(file));
        Problem error = result.problems().stream().filter(Problem::isError).findFirst().orElseThrow();
        assertEquals(file, error.file());
        return error;
    }

    @Test
    void truncatedFilesGiveLineAndColumnOfTheCut() throws IOException {
        byte[] full = Files.readAllBytes(TestPaths.examples().resolve("quest-thresholds.battery"));
        String text = new String(full, StandardCharsets.UTF_8);
        for (int cut : new int[] {10, 60, 300, text.indexOf("<tracks"), text.length() / 2, text.length() - 3}) {
            byte[] part = text.substring(0, cut).getBytes(StandardCharsets.UTF_8);
            Problem error = firstError(dir.resolve("cut-" + cut + ".battery"), part);
            assertEquals(ProblemCode.MALFORMED_FILE, error.code(), error.format());
            long lines = text.substring(0, cut).chars().filter(c -> c == '\n').count() + 1;
            assertEquals(lines, error.line(), error.format());
            assertTrue(error.column() > 0, error.format());
            assertTrue(error.message().contains("column " + error.column()), error.message());
        }
    }

    @Test
    void garbageEmptyAndBinaryFiles() throws IOException {
        Problem text = firstError(dir.resolve("garbage.battery"), "this is not XML\n".getBytes(StandardCharsets.UTF_8));
        assertEquals(ProblemCode.MALFORMED_FILE, text.code());
        assertEquals(1, text.line());
        Problem empty = firstError(dir.resolve("empty.calibration"), new byte[0]);
        assertEquals(ProblemCode.MALFORMED_FILE, empty.code());
        assertEquals("the file is empty", empty.message());
        byte[] binary = new byte[512];
        new java.util.SplittableRandom(3).nextBytes(binary);
        assertEquals(ProblemCode.MALFORMED_FILE, firstError(dir.resolve("noise.battery"), binary).code());
        byte[] badUtf8 = "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n<a title=\"\u00ff\"/>".getBytes(StandardCharsets.ISO_8859_1);
        Problem encoding = firstError(dir.resolve("latin1.battery"), badUtf8);
        assertEquals(ProblemCode.MALFORMED_FILE, encoding.code(), encoding.format());
        assertEquals(2, encoding.line(), encoding.format());
    }

    @Test
    void externalEntitiesAreRefusedUnread() throws IOException {
        Path secret = dir.resolve("secret.txt");
        Files.writeString(secret, "do not read me");
        String xxe = "<?xml version=\"1.0\"?>\n<!DOCTYPE b [<!ENTITY s SYSTEM \"" + secret.toUri() + "\">]>\n"
                + "<limen:Battery xmlns:limen=\"http://limen.dev/model/1.0\" schemaVersion=\"1\" title=\"&s;\"/>";
        Problem error = firstError(dir.resolve("xxe.battery"), xxe.getBytes(StandardCharsets.UTF_8));
        assertEquals(ProblemCode.MALFORMED_FILE, error.code());
        assertEquals(2, error.line());
        assertFalse(error.message().contains("do not read me"));
    }

    @Test
    void referencesToTheNetworkAreNeverFollowed() throws IOException {
        IOException refused = org.junit.jupiter.api.Assertions.assertThrows(IOException.class,
                () -> LimenFiles.newResourceSet().getURIConverter()
                        .createInputStream(URI.createURI("http://192.0.2.1/lab.battery")));
        assertTrue(refused.getMessage().contains("only local files"), refused.getMessage());
        Path battery = dir.resolve("remote.battery");
        Files.writeString(battery, Files.readString(TestPaths.fixtures().resolve("valid-base.battery")).replace(
                "<standardLevel xsi:type=\"limen:RelativeLevel\" reference=\"abs-1000\" offsetDb=\"40\"/>",
                "<standardLevel xsi:type=\"limen:RelativeLevel\" offsetDb=\"40\"><reference"
                        + " href=\"http://192.0.2.1/lab.battery#abs-1000\"/></standardLevel>"));
        List<Problem> problems = DocumentChecker.check(List.of(battery), null).problems();
        assertTrue(problems.stream().anyMatch(p -> p.code() == ProblemCode.UNRESOLVED_REFERENCE
                && p.message().contains("http://192.0.2.1/lab.battery#abs-1000")), problems.toString());
    }

    @Test
    void missingFilesAndFoldersAreUnreadable() {
        LoadResult missing = LimenFiles.load(dir.resolve("nowhere.battery"));
        assertFalse(missing.readable());
        assertEquals(ProblemCode.UNREADABLE_FILE, missing.problems().get(0).code());
        assertTrue(missing.problems().get(0).message().contains("does not exist"));
        LoadResult folder = LimenFiles.load(dir);
        assertFalse(folder.readable());
        assertTrue(folder.problems().get(0).message().contains("is a folder"));
        assertTrue(Files.notExists(dir.resolve("nowhere.battery")));
    }

    @Test
    void aFailureWithoutDiagnosticsIsLm0910() {
        LimenResource resource = new LimenResource(URI.createFileURI(dir.resolve("x.battery").toString()));
        List<Problem> problems = LoadProblems.of(dir.resolve("x.battery"), resource,
                new IOException("the device was removed"));
        assertEquals(1, problems.size());
        assertEquals(ProblemCode.LOAD_FAILED, problems.get(0).code());
        assertEquals("the file could not be read: the device was removed", problems.get(0).message());
    }

    @Test
    void typedLoadersThrowWithTheProblems() throws IOException {
        Path calibration = TestPaths.examples().resolve("harbourside-demo.calibration");
        LimenFileException wrongKind = org.junit.jupiter.api.Assertions.assertThrows(LimenFileException.class,
                () -> LimenFiles.loadBattery(calibration));
        assertEquals(ProblemCode.NOT_A_LIMEN_DOCUMENT, wrongKind.problems().get(0).code());
        Path garbage = dir.resolve("g.battery");
        Files.writeString(garbage, "<x");
        LimenFileException bad = org.junit.jupiter.api.Assertions.assertThrows(LimenFileException.class,
                () -> LimenFiles.loadBattery(garbage));
        assertTrue(bad.getMessage().contains("g.battery:1: error: LM0901"), bad.getMessage());
    }
}
