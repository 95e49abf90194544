package limen.session.journal;

import java.io.Closeable;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.List;

/**
 * Appends trials to a session's {@code trials.csv}. Every {@link #append} writes the whole row and forces it
 * to the storage device ({@link FileChannel#force}) before it returns, so a trial is on disk before the next
 * one starts.
 */
public final class JournalWriter implements Closeable {

    private final Path file;
    private final FileChannel channel;
    private String previousChecksum;
    private long lastSeq;

    private JournalWriter(Path file, FileChannel channel, String previousChecksum, long lastSeq) {
        this.file = file;
        this.channel = channel;
        this.previousChecksum = previousChecksum;
        this.lastSeq = lastSeq;
    }

    /** Creates a new journal (the file must not exist) and writes its header. */
    public static JournalWriter create(Path file) throws IOException {
        FileChannel ch = FileChannel.open(file, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE);
        JournalWriter w = new JournalWriter(file, ch, Journal.GENESIS, 0);
        w.writeLine(Csv.line(JournalRow.COLUMNS));
        return w;
    }

    /**
     * Continues a journal after {@link JournalReader} has checked it. A torn last row (one without its line
     * end) is moved to {@code trials.torn-<seq>.txt} beside the journal, so nothing is silently lost, and cut
     * from the journal; then new rows follow the last good one.
     *
     * @throws IOException if the journal's chain is broken (resuming would bless tampered data)
     */
    public static JournalWriter resume(Path file, JournalContents contents) throws IOException {
        if (contents.integrity() == JournalContents.Integrity.BROKEN_CHAIN
                || contents.integrity() == JournalContents.Integrity.MALFORMED) {
            throw new IOException(file + ": cannot resume: " + String.join("; ", contents.problems()));
        }
        FileChannel ch = FileChannel.open(file, StandardOpenOption.WRITE, StandardOpenOption.READ);
        if (contents.tornTail() != null) {
            Path aside = file.resolveSibling("trials.torn-" + (contents.lastSeq() + 1) + ".txt");
            Files.writeString(aside, contents.tornTail(), StandardCharsets.UTF_8);
            ch.truncate(contents.goodBytes());
            ch.force(true);
        }
        ch.position(ch.size());
        return new JournalWriter(file, ch, contents.lastChecksum(), contents.lastSeq());
    }

    /** The next sequence number. */
    public long nextSeq() {
        return lastSeq + 1;
    }

    /** The checksum of the last row written (or {@link Journal#GENESIS}). */
    public String lastChecksum() {
        return previousChecksum;
    }

    /**
     * Writes one trial; its {@code seq} must be {@link #nextSeq()} and its checksum is computed here.
     *
     * @return the row as written, with its checksum
     */
    public JournalRow append(JournalRow row) throws IOException {
        if (row.seq() != lastSeq + 1) {
            throw new IllegalArgumentException("journal " + file + ": expected seq " + (lastSeq + 1) + ", got " + row.seq());
        }
        List<String> fields = new ArrayList<>(row.payloadFields());
        for (String f : fields) {
            if (f.indexOf('\n') >= 0 || f.indexOf('\r') >= 0) {
                throw new IllegalArgumentException("journal " + file + ": a field holds a line break: " + f);
            }
        }
        String payload = Csv.line(fields);
        String checksum = Journal.chain(previousChecksum, payload);
        writeLine(payload + "," + checksum);
        previousChecksum = checksum;
        lastSeq = row.seq();
        return row.withChecksum(checksum);
    }

    private void writeLine(String line) throws IOException {
        ByteBuffer buf = ByteBuffer.wrap((line + "\n").getBytes(StandardCharsets.UTF_8));
        while (buf.hasRemaining()) {
            channel.write(buf);
        }
        channel.force(false);
    }

    @Override
    public void close() throws IOException {
        channel.close();
    }
}
