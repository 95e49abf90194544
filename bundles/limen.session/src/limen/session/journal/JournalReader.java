package limen.session.journal;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads and verifies a {@code trials.csv}: parses each row, recomputes the checksum chain, and reports a torn
 * last row, an edit or reordering (broken chain), or a file that is not a journal. Never changes the file.
 */
public final class JournalReader {

    private JournalReader() {
    }

    /** Reads and verifies one journal. */
    public static JournalContents read(Path file) throws IOException {
        byte[] bytes = Files.readAllBytes(file);
        String text = new String(bytes, StandardCharsets.UTF_8);
        List<JournalRow> rows = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        String previous = Journal.GENESIS;
        long lastSeq = 0;
        int lineNo = 0;
        int pos = 0;
        long goodBytes = 0;
        String torn = null;
        JournalContents.Integrity verdict = JournalContents.Integrity.OK;
        while (pos < text.length()) {
            int nl = text.indexOf('\n', pos);
            lineNo++;
            if (nl < 0) {
                torn = text.substring(pos);
                problems.add(file + ":" + lineNo + ": torn last row (no line end; a crash while writing): dropped");
                verdict = JournalContents.Integrity.TORN_TAIL;
                break;
            }
            String line = text.substring(pos, nl);
            int lineEnd = nl + 1;
            if (lineNo == 1) {
                List<String> header = Csv.parse(line);
                if (header == null || !header.equals(JournalRow.COLUMNS)) {
                    problems.add(file + ":1: not a Limen trial journal (unexpected header)");
                    return new JournalContents(rows, JournalContents.Integrity.MALFORMED, problems, null, 0, 0,
                            Journal.GENESIS);
                }
                goodBytes = utf8Length(text, 0, lineEnd);
                pos = lineEnd;
                continue;
            }
            List<String> f = Csv.parse(line);
            if (f == null || f.size() != JournalRow.COLUMNS.size()) {
                problems.add(file + ":" + lineNo + ": malformed row (" + (f == null ? "bad quoting" : f.size()
                        + " fields, expected " + JournalRow.COLUMNS.size()) + ")");
                verdict = JournalContents.Integrity.MALFORMED;
                break;
            }
            JournalRow row;
            try {
                row = parseRow(f);
            } catch (RuntimeException e) {
                problems.add(file + ":" + lineNo + ": malformed row: " + e.getMessage());
                verdict = JournalContents.Integrity.MALFORMED;
                break;
            }
            String payload = line.substring(0, line.lastIndexOf(','));
            String expected = Journal.chain(previous, payload);
            if (row.seq() != lastSeq + 1 || !expected.equals(row.checksum())) {
                problems.add(file + ":" + lineNo + ": checksum chain broken at seq " + row.seq()
                        + (row.seq() != lastSeq + 1 ? " (expected seq " + (lastSeq + 1) + ")" : "")
                        + ": the journal was edited, reordered or spliced");
                verdict = JournalContents.Integrity.BROKEN_CHAIN;
                break;
            }
            rows.add(row);
            previous = row.checksum();
            lastSeq = row.seq();
            // this row's bytes only (rows end at '\n', so no character straddles two): counting from the start
            // of the file at every row made reading quadratic in the journal's length
            goodBytes += utf8Length(text, pos, lineEnd);
            pos = lineEnd;
        }
        return new JournalContents(rows, verdict, problems, torn, goodBytes, lastSeq, previous);
    }

    /** Reads a journal and compares it with the session's seal, if there is one. */
    public static JournalContents readAndCheckSeal(Path journal, SessionSeal seal) throws IOException {
        JournalContents c = read(journal);
        if (seal != null && c.integrity() == JournalContents.Integrity.OK
                && (seal.trials() != c.lastSeq() || !seal.lastChecksum().equals(c.lastChecksum()))) {
            return c.withVerdict(JournalContents.Integrity.TRUNCATED, journal + ": the seal records " + seal.trials()
                    + " trials ending in " + seal.lastChecksum() + " but the journal holds " + c.lastSeq()
                    + " ending in " + c.lastChecksum() + ": rows were removed or replaced at the end");
        }
        return c;
    }

    private static long utf8Length(String text, int from, int to) {
        return text.substring(from, to).getBytes(StandardCharsets.UTF_8).length;
    }

    private static JournalRow parseRow(List<String> f) {
        try {
            return new JournalRow(Long.parseLong(f.get(0)), Instant.parse(f.get(1)), f.get(2),
                    Integer.parseInt(f.get(11)), f.get(3), parseDouble(f.get(4)), f.get(12), bool(f.get(5)),
                    Integer.parseInt(f.get(6)), parseDouble(f.get(7)), parseDouble(f.get(8)),
                    Integer.parseInt(f.get(9)), bool(f.get(10)), f.get(13));
        } catch (NumberFormatException | DateTimeParseException e) {
            throw new IllegalArgumentException(e.getMessage(), e);
        }
    }

    private static double parseDouble(String s) {
        return s.isEmpty() ? Double.NaN : Double.parseDouble(s);
    }

    private static boolean bool(String s) {
        if (s.equals("1")) {
            return true;
        }
        if (s.equals("0")) {
            return false;
        }
        throw new IllegalArgumentException("expected 0 or 1, got '" + s + "'");
    }
}
