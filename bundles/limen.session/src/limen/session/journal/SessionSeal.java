package limen.session.journal;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.Properties;

/**
 * Written when a session ends (completed or aborted): how many trials the journal holds and the checksum of
 * the last one, so that rows removed from the end are detected later. Stored as {@code journal.seal}
 * (a Java properties file), written atomically.
 *
 * @param trials       number of rows
 * @param lastChecksum checksum of the last row
 */
public record SessionSeal(long trials, String lastChecksum) {

    /** File name inside a session folder. */
    public static final String FILE_NAME = "journal.seal";

    /** Writes the seal atomically (temporary file, sync, rename). */
    public void write(Path sessionFolder) throws IOException {
        Path target = sessionFolder.resolve(FILE_NAME);
        Path temp = sessionFolder.resolve(FILE_NAME + ".tmp");
        String text = "# Limen journal seal: the journal's length and last checksum when the session ended\n"
                + "trials=" + trials + "\nlastChecksum=" + lastChecksum + "\n";
        Files.writeString(temp, text, StandardCharsets.UTF_8);
        try (FileChannel ch = FileChannel.open(temp, StandardOpenOption.WRITE)) {
            ch.force(true);
        }
        Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
    }

    /** Reads the seal of a session folder, or null if it has none. */
    public static SessionSeal read(Path sessionFolder) throws IOException {
        Path file = sessionFolder.resolve(FILE_NAME);
        if (!Files.exists(file)) {
            return null;
        }
        Properties p = new Properties();
        try (var in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            p.load(in);
        }
        String trials = p.getProperty("trials");
        String last = p.getProperty("lastChecksum");
        if (trials == null || last == null) {
            throw new IOException(file + ": not a journal seal (missing trials or lastChecksum)");
        }
        try {
            return new SessionSeal(Long.parseLong(trials.trim()), last.trim());
        } catch (NumberFormatException e) {
            throw new IOException(file + ": trials is not a number: " + trials, e);
        }
    }
}
