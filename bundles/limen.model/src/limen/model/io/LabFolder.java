package limen.model.io;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

import limen.model.Battery;
import limen.model.Calibration;
import limen.model.LimenDocument;
import limen.model.SessionHeader;
import limen.model.validation.Problem;

/**
 * The Limen files of one folder (a lab's protocol folder, such as the demo lab in {@code examples/}): every
 * {@code *.battery}, {@code *.calibration} and {@code *.session} directly in it, loaded, with the load problems
 * of those that failed. Files are read once, in name order; nothing is written.
 */
public final class LabFolder {

    /**
     * One file of the folder.
     *
     * @param file the file
     * @param result what loading it gave
     */
    public record Entry(Path file, LoadResult result) {
    }

    private final Path folder;
    private final List<Entry> entries;

    private LabFolder(Path folder, List<Entry> entries) {
        this.folder = folder;
        this.entries = List.copyOf(entries);
    }

    /**
     * @param folder the folder to read
     * @return its Limen files, loaded
     * @throws IOException if the folder cannot be listed
     */
    public static LabFolder scan(Path folder) throws IOException {
        List<Entry> entries = new ArrayList<>();
        try (Stream<Path> files = Files.list(folder)) {
            for (Path file : files.filter(LabFolder::isLimenFile).sorted().toList()) {
                entries.add(new Entry(file, LimenFiles.load(file)));
            }
        }
        return new LabFolder(folder, entries);
    }

    private static boolean isLimenFile(Path file) {
        String name = file.getFileName().toString();
        return Files.isRegularFile(file) && (name.endsWith("." + LimenFiles.BATTERY_EXTENSION)
                || name.endsWith("." + LimenFiles.CALIBRATION_EXTENSION)
                || name.endsWith("." + LimenFiles.SESSION_EXTENSION));
    }

    /** @return the folder */
    public Path folder() {
        return folder;
    }

    /** @return every file found, loaded or not */
    public List<Entry> entries() {
        return entries;
    }

    /** @return the batteries that loaded */
    public List<Battery> batteries() {
        return documents(Battery.class);
    }

    /** @return the calibrations that loaded */
    public List<Calibration> calibrations() {
        return documents(Calibration.class);
    }

    /** @return the session headers that loaded */
    public List<SessionHeader> sessions() {
        return documents(SessionHeader.class);
    }

    /** @return the load problems of all files (warnings of loaded files and errors of those that failed) */
    public List<Problem> problems() {
        return entries.stream().flatMap(e -> e.result().problems().stream()).toList();
    }

    /**
     * @return the loaded calibration the battery names in its calibrationFile (relative to this folder), if
     *         it is one of this folder's files
     */
    public Optional<Calibration> calibrationFor(Battery battery) {
        String named = battery.getCalibrationFile();
        if (named == null || named.isBlank()) {
            return Optional.empty();
        }
        Path wanted = folder.resolve(named).toAbsolutePath().normalize();
        return entries.stream()
                .filter(e -> e.file().toAbsolutePath().normalize().equals(wanted))
                .map(e -> e.result().document())
                .filter(Calibration.class::isInstance).map(Calibration.class::cast).findFirst();
    }

    private <T extends LimenDocument> List<T> documents(Class<T> type) {
        return entries.stream().map(e -> e.result().document()).filter(type::isInstance).map(type::cast).toList();
    }
}
