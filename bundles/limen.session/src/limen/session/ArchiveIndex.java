package limen.session;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

/** Finds sessions in an archive (a folder tree; any depth) without reading them. */
public final class ArchiveIndex {

    private ArchiveIndex() {
    }

    /**
     * Session folders under {@code root} (or {@code root} itself if it is one), sorted by path. A folder is a
     * session when it holds a {@value SessionFolder#HEADER_FILE}.
     */
    public static List<Path> sessions(Path root) throws IOException {
        List<Path> out = new ArrayList<>();
        if (Files.isRegularFile(root.resolve(SessionFolder.HEADER_FILE))) {
            out.add(root);
            return out;
        }
        if (!Files.isDirectory(root)) {
            throw new IOException(root + ": no such folder");
        }
        try (Stream<Path> walk = Files.walk(root)) {
            walk.filter(p -> p.getFileName() != null && p.getFileName().toString().equals(SessionFolder.HEADER_FILE))
                    .map(Path::getParent).sorted().forEach(out::add);
        }
        return out;
    }

    /**
     * How many other participants already have a session of this battery in the archive: the row of the
     * counterbalancing design the next participant gets.
     */
    public static int participantsOf(Path archive, String batteryFolderPrefix, String participant) throws IOException {
        if (!Files.isDirectory(archive)) {
            return 0;
        }
        int n = 0;
        try (Stream<Path> people = Files.list(archive)) {
            for (Path p : (Iterable<Path>) people::iterator) {
                if (!Files.isDirectory(p) || p.getFileName().toString().equals(SessionFolder.safe(participant))) {
                    continue;
                }
                try (Stream<Path> sessions = Files.list(p)) {
                    if (sessions.anyMatch(s -> s.getFileName().toString().startsWith(batteryFolderPrefix + "-"))) {
                        n++;
                    }
                }
            }
        }
        return n;
    }
}
