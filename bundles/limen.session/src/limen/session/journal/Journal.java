package limen.session.journal;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * The trial journal's file conventions: {@code trials.csv} (RFC 4180, UTF-8, LF line ends, header first,
 * one row per trial) with a checksum chain.
 * <p>
 * Chain: {@code c_0 = SHA-256("limen-journal-v1")}; for row n, {@code c_n = SHA-256(c_(n-1) + "\n" + payload_n)}
 * where {@code payload_n} is the row's CSV text without its checksum field; the row stores the first 16 hex
 * digits of {@code c_n}. Editing, inserting, removing or reordering any row breaks the chain from that row on;
 * removing rows at the end is detected against the seal written when the session ends ({@link SessionSeal}).
 */
public final class Journal {

    /** File name of the journal inside a session folder. */
    public static final String FILE_NAME = "trials.csv";

    /** The digest before the first row. */
    public static final String GENESIS = hex(sha256("limen-journal-v1"));

    private Journal() {
    }

    /** The checksum of a row given the previous row's checksum (or {@link #GENESIS}). */
    public static String chain(String previous, String payload) {
        return hex(sha256(previous + "\n" + payload)).substring(0, 16);
    }

    static byte[] sha256(String text) {
        try {
            return MessageDigest.getInstance("SHA-256").digest(text.getBytes(StandardCharsets.UTF_8));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("the JDK has no SHA-256", e);
        }
    }

    static String hex(byte[] bytes) {
        return HexFormat.of().formatHex(bytes);
    }
}
