package limen.ui.authoring.edit;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import limen.model.Battery;
import limen.model.io.LimenFileException;
import limen.model.io.LimenFiles;

/**
 * The new-battery templates: the demo lab's batteries in {@code examples/} of the Limen installation (the
 * workbench gets its root in the system property {@code limen.root}). A new battery is a copy of a template
 * under a new file name and title, saved atomically; the calibration the template names is copied beside it
 * when the workspace lacks it, so the new battery validates against the same calibration.
 */
public final class Templates {

    /** One template. */
    public record Template(Path file, String title, int steps) {
        /** @return the file name */
        public String name() {
            return file.getFileName().toString();
        }
    }

    private Templates() {
    }

    /** @return the examples folder of the installation, or null when {@code limen.root} is not set */
    public static Path examplesFolder() {
        String root = System.getProperty("limen.root");
        return root == null || root.isBlank() ? null : Paths.get(root, "examples");
    }

    /**
     * @param folder the folder holding the templates
     * @return the batteries in it that load without error, sorted by file name
     */
    public static List<Template> list(Path folder) throws IOException {
        List<Template> out = new ArrayList<>();
        if (folder == null || !Files.isDirectory(folder)) {
            return out;
        }
        try (Stream<Path> files = Files.list(folder)) {
            for (Path p : (Iterable<Path>) files.sorted()::iterator) {
                if (!p.getFileName().toString().endsWith("." + LimenFiles.BATTERY_EXTENSION)) {
                    continue;
                }
                try {
                    Battery b = LimenFiles.loadBattery(p);
                    out.add(new Template(p, b.getTitle(), b.getSteps().size()));
                } catch (LimenFileException e) {
                    // a broken example is not offered as a template
                }
            }
        }
        return out;
    }

    /**
     * @param name a file name the author typed, with or without the extension
     * @return null when it is usable in the folder, else why not
     */
    public static String refusal(Path folder, String name) {
        String n = withExtension(name);
        if (name == null || name.isBlank()) {
            return "type a file name";
        }
        if (n.contains("/") || n.contains("\\") || n.startsWith(".")) {
            return "a plain file name, without folders, please";
        }
        if (Files.exists(folder.resolve(n))) {
            return n + " exists already";
        }
        return null;
    }

    /** @return the name with {@code .battery} appended unless it has it */
    public static String withExtension(String name) {
        String n = name == null ? "" : name.trim();
        return n.endsWith("." + LimenFiles.BATTERY_EXTENSION) ? n : n + "." + LimenFiles.BATTERY_EXTENSION;
    }

    /**
     * Creates a battery from a template.
     *
     * @param template the template
     * @param folder the workspace folder
     * @param name the new file's name
     * @param title the new battery's title (blank keeps the template's)
     * @return the new file
     * @throws IOException when the template cannot be loaded or the file cannot be written
     */
    public static Path create(Template template, Path folder, String name, String title) throws IOException {
        String why = refusal(folder, name);
        if (why != null) {
            throw new IOException(why);
        }
        Battery battery = LimenFiles.loadBattery(template.file());
        if (title != null && !title.isBlank()) {
            battery.setTitle(title.trim());
        }
        String calibration = battery.getCalibrationFile();
        if (calibration != null && !calibration.isBlank()) {
            Path source = template.file().getParent().resolve(calibration).normalize();
            Path target = folder.resolve(calibration).normalize();
            if (Files.isRegularFile(source) && !Files.exists(target) && target.startsWith(folder)) {
                Files.createDirectories(target.getParent());
                Files.copy(source, target);
            }
        }
        Path file = folder.resolve(withExtension(name));
        LimenFiles.save(battery, file);
        return file;
    }
}
