package limen.ui;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;

import org.eclipse.jface.preference.PreferenceStore;

/**
 * The workbench's own settings, kept in {@code ~/.limen/workbench.prefs} (or the file named by the system
 * property {@code limen.preferences}). Plain JFace {@link PreferenceStore}: the preference pages edit it and
 * the parts read it.
 */
public final class LimenPreferences {

    /** Folder holding the lab's batteries and calibrations. */
    public static final String WORKSPACE_FOLDER = "workspaceFolder";
    /** Folder tree where sessions are stored. */
    public static final String ARCHIVE_FOLDER = "archiveFolder";
    /** Sample rate in Hz used to render previews. */
    public static final String SAMPLE_RATE_HZ = "sampleRateHz";

    private final PreferenceStore store;
    private final Path file;

    private LimenPreferences(PreferenceStore store, Path file) {
        this.store = store;
        this.file = file;
    }

    /** Opens (creating if needed) the store at its usual place. */
    public static LimenPreferences open() {
        String override = System.getProperty("limen.preferences");
        Path file = override != null ? Paths.get(override)
                : Paths.get(System.getProperty("user.home"), ".limen", "workbench.prefs");
        return open(file);
    }

    /** Opens (creating if needed) the store in a given file. */
    public static LimenPreferences open(Path file) {
        try {
            Files.createDirectories(file.toAbsolutePath().getParent());
            PreferenceStore store = new PreferenceStore(file.toString());
            if (Files.exists(file)) {
                store.load();
            }
            LimenPreferences prefs = new LimenPreferences(store, file);
            prefs.setDefaults();
            return prefs;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read preferences " + file + ": " + e.getMessage(), e);
        }
    }

    private void setDefaults() {
        String workspace = System.getProperty("limen.workspace");
        store.setDefault(WORKSPACE_FOLDER, workspace != null ? Paths.get(workspace).toAbsolutePath().toString()
                : Paths.get(System.getProperty("user.home"), "limen-workspace").toString());
        String archive = System.getProperty("limen.archive");
        store.setDefault(ARCHIVE_FOLDER, archive != null ? Paths.get(archive).toAbsolutePath().toString()
                : Paths.get(System.getProperty("user.home"), "limen-archive").toString());
        store.setDefault(SAMPLE_RATE_HZ, 48000);
    }

    /** The JFace store, for preference pages. */
    public PreferenceStore store() {
        return store;
    }

    public Path workspaceFolder() {
        return Paths.get(store.getString(WORKSPACE_FOLDER));
    }

    public Path archiveFolder() {
        return Paths.get(store.getString(ARCHIVE_FOLDER));
    }

    public int sampleRateHz() {
        return store.getInt(SAMPLE_RATE_HZ);
    }

    /** Writes changed values to disk. */
    public void save() {
        try {
            store.save();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot save preferences " + file + ": " + e.getMessage(), e);
        }
    }
}
