package limen.session.journal;

import java.util.List;

/**
 * What {@link JournalReader} found in a journal.
 *
 * @param rows         the rows whose checksums verified, in order (rows after a break are not included)
 * @param integrity    the overall verdict
 * @param problems     human-readable findings, each naming the file and line
 * @param tornTail     the text of an incomplete last row (no line end), or null
 * @param goodBytes    length in bytes of the journal up to the end of the last good row
 * @param lastSeq      seq of the last good row (0 if none)
 * @param lastChecksum checksum of the last good row ({@link Journal#GENESIS} if none)
 */
public record JournalContents(List<JournalRow> rows, Integrity integrity, List<String> problems, String tornTail,
        long goodBytes, long lastSeq, String lastChecksum) {

    /** The verdict on a journal. */
    public enum Integrity {
        /** every row present verifies */
        OK,
        /** every complete row verifies; the last row was cut off (a crash while writing) */
        TORN_TAIL,
        /** a row's checksum or sequence number does not follow from the rows before it: edited or reordered */
        BROKEN_CHAIN,
        /** the file is not a Limen journal (wrong header, unparseable row) */
        MALFORMED,
        /** the chain verifies but rows are missing at the end compared with the session's seal */
        TRUNCATED
    }

    public JournalContents {
        rows = List.copyOf(rows);
        problems = List.copyOf(problems);
    }

    /** A copy with another verdict and one more problem (used when comparing with the seal). */
    public JournalContents withVerdict(Integrity verdict, String problem) {
        List<String> more = new java.util.ArrayList<>(problems);
        more.add(problem);
        return new JournalContents(rows, verdict, more, tornTail, goodBytes, lastSeq, lastChecksum);
    }
}
