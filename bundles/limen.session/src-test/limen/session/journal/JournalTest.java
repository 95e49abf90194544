package limen.session.journal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.session.journal.JournalContents.Integrity;

class JournalTest {

    @TempDir
    Path dir;

    private JournalRow row(long seq, double value) {
        return new JournalRow(seq, Instant.parse("2026-03-04T10:15:30.125Z").plusSeconds(seq), "fd-1000", 1,
                "track \"A\", upper", value, "percent", seq % 3 != 0, 2, 612.5, 70.0, 2, false, "");
    }

    private Path write(int n) throws IOException {
        Path file = dir.resolve(Journal.FILE_NAME);
        try (JournalWriter w = JournalWriter.create(file)) {
            for (int i = 1; i <= n; i++) {
                w.append(row(i, 1.0 / i));
            }
        }
        return file;
    }

    @Test
    void roundTripVerifies() throws IOException {
        Path file = write(25);
        JournalContents c = JournalReader.read(file);
        assertEquals(Integrity.OK, c.integrity(), c.problems().toString());
        assertEquals(25, c.rows().size());
        JournalRow r7 = c.rows().get(6);
        assertEquals(7, r7.seq());
        assertEquals(1.0 / 7, r7.value(), 0.0, "values round-trip exactly");
        assertEquals("track \"A\", upper", r7.track(), "RFC 4180 quoting round-trips");
        assertEquals(612.5, r7.responseMs());
        assertTrue(Files.readString(file).startsWith(String.join(",", JournalRow.COLUMNS) + "\n"));
    }

    @Test
    void editedValueBreaksTheChainAtThatRow() throws IOException {
        Path file = write(10);
        List<String> lines = new ArrayList<>(Files.readAllLines(file));
        lines.set(5, lines.get(5).replaceFirst(",0\\.2,", ",0.25,")); // row seq 5 holds value 0.2
        Files.write(file, lines);
        JournalContents c = JournalReader.read(file);
        assertEquals(Integrity.BROKEN_CHAIN, c.integrity());
        assertEquals(4, c.rows().size(), "rows before the edit still verify");
        assertTrue(c.problems().get(0).contains("seq 5"), c.problems().toString());
        assertThrows(IOException.class, () -> JournalWriter.resume(file, c).close(), "no resume over tampering");
    }

    @Test
    void swappedRowsBreakTheChain() throws IOException {
        Path file = write(6);
        List<String> lines = new ArrayList<>(Files.readAllLines(file));
        String three = lines.get(3);
        lines.set(3, lines.get(4));
        lines.set(4, three);
        Files.write(file, lines);
        assertEquals(Integrity.BROKEN_CHAIN, JournalReader.read(file).integrity());
    }

    @Test
    void tornLastRowIsReportedSetAsideAndDroppedOnResume() throws IOException {
        Path file = write(8);
        byte[] whole = Files.readAllBytes(file);
        String text = new String(whole, StandardCharsets.UTF_8);
        int cut = text.lastIndexOf('\n', text.length() - 2) + 20; // inside the last row
        Files.write(file, java.util.Arrays.copyOf(whole, cut));
        JournalContents c = JournalReader.read(file);
        assertEquals(Integrity.TORN_TAIL, c.integrity());
        assertEquals(7, c.lastSeq());
        // the good part ends where the torn row starts: the bytes before it, counted row by row
        int tornStart = text.lastIndexOf('\n', text.length() - 2) + 1;
        assertEquals(text.substring(0, tornStart).getBytes(StandardCharsets.UTF_8).length, c.goodBytes());
        try (JournalWriter w = JournalWriter.resume(file, c)) {
            assertEquals(8, w.nextSeq());
            w.append(row(8, 0.5));
        }
        JournalContents after = JournalReader.read(file);
        assertEquals(Integrity.OK, after.integrity(), after.problems().toString());
        assertEquals(8, after.rows().size());
        assertEquals(0.5, after.rows().get(7).value());
        assertTrue(Files.exists(dir.resolve("trials.torn-8.txt")), "the torn fragment is kept aside");
    }

    @Test
    void removedLastRowsAreCaughtByTheSeal() throws IOException {
        Path file = write(12);
        JournalContents c = JournalReader.read(file);
        new SessionSeal(c.lastSeq(), c.lastChecksum()).write(dir);
        List<String> lines = Files.readAllLines(file);
        Files.write(file, lines.subList(0, lines.size() - 2));
        SessionSeal seal = SessionSeal.read(dir);
        JournalContents cut = JournalReader.readAndCheckSeal(file, seal);
        assertEquals(Integrity.TRUNCATED, cut.integrity());
        assertTrue(cut.problems().get(0).contains("12 trials"), cut.problems().toString());
    }

    @Test
    void foreignFileIsMalformedAndUntouched() throws IOException {
        Path file = dir.resolve(Journal.FILE_NAME);
        Files.writeString(file, "value,trials,correct\n1,2,3\n");
        byte[] before = Files.readAllBytes(file);
        assertEquals(Integrity.MALFORMED, JournalReader.read(file).integrity());
        assertTrue(java.util.Arrays.equals(before, Files.readAllBytes(file)));
    }

    @Test
    void noSealMeansNoTruncationVerdict() throws IOException {
        write(3);
        assertNull(SessionSeal.read(dir));
    }

    @Test
    void writerRefusesOutOfOrderRows() throws IOException {
        try (JournalWriter w = JournalWriter.create(dir.resolve(Journal.FILE_NAME))) {
            assertThrows(IllegalArgumentException.class, () -> w.append(row(2, 1)));
        }
    }
}
