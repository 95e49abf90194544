package limen.model.io.internal;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Set;

/**
 * Replaces a file's content so that, whatever fails, the file holds either its old content or the whole new
 * content: the bytes go to a temporary file in the same folder, which is flushed and synced to the disk, then
 * renamed over the target in one atomic step, and the folder is synced so the rename itself survives a crash.
 * On failure the temporary file is deleted and the target is untouched.
 */
public final class AtomicFiles {

    /** Permissions of newly created files (existing files keep theirs). */
    private static final Set<PosixFilePermission> NEW_FILE = PosixFilePermissions.fromString("rw-r--r--");

    /** A point in the write sequence where tests can make the write fail. */
    @FunctionalInterface
    interface Checkpoint {
        void reached(Path temporary) throws IOException;
    }

    private AtomicFiles() {
    }

    /**
     * @param target the file to create or replace; its folder must exist
     * @param content the complete new content
     * @throws IOException if any step fails; the target then still holds its previous content
     */
    public static void write(Path target, byte[] content) throws IOException {
        write(target, content, t -> { });
    }

    static void write(Path target, byte[] content, Checkpoint beforeRename) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        Path temporary = Files.createTempFile(folder, "." + absolute.getFileName() + ".", ".tmp");
        try {
            copyPermissions(absolute, temporary);
            try (FileChannel channel = FileChannel.open(temporary, StandardOpenOption.WRITE,
                    StandardOpenOption.TRUNCATE_EXISTING)) {
                ByteBuffer buffer = ByteBuffer.wrap(content);
                while (buffer.hasRemaining()) {
                    channel.write(buffer);
                }
                channel.force(true);
            }
            beforeRename.reached(temporary);
            try {
                Files.move(temporary, absolute, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                throw new IOException("cannot replace " + absolute + " atomically on this file system", e);
            }
        } catch (IOException | RuntimeException | Error e) {
            try {
                Files.deleteIfExists(temporary);
            } catch (IOException suppressed) {
                e.addSuppressed(suppressed);
            }
            throw e;
        }
        syncFolder(folder);
    }

    private static void copyPermissions(Path from, Path to) throws IOException {
        PosixFileAttributeView view = Files.getFileAttributeView(to, PosixFileAttributeView.class);
        if (view == null) {
            return; // not a POSIX file system
        }
        view.setPermissions(Files.exists(from) ? Files.getPosixFilePermissions(from) : NEW_FILE);
    }

    /** Makes the rename durable; some platforms cannot open folders, where the rename is all we can do. */
    private static void syncFolder(Path folder) {
        try (FileChannel channel = FileChannel.open(folder, StandardOpenOption.READ)) {
            channel.force(true);
        } catch (IOException | UnsupportedOperationException e) {
            // the content is already renamed into place; a folder sync is not possible here
        }
    }
}
