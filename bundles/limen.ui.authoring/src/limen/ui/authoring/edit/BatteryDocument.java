package limen.ui.authoring.edit;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import org.eclipse.emf.common.command.BasicCommandStack;
import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.edit.domain.AdapterFactoryEditingDomain;

import limen.model.Battery;
import limen.model.Calibration;
import limen.model.LimenPackage;
import limen.model.io.LimenFileException;
import limen.model.io.LimenFiles;
import limen.model.io.LoadResult;
import limen.model.validation.BatteryValidator;
import limen.model.validation.Problem;
import limen.model.validation.ProblemCode;
import limen.model.validation.Severity;

/**
 * One battery opened for editing, without any widget: its file, its EMF editing domain (every change is an
 * EMF command on a {@link BasicCommandStack}, so it can be undone), validation and atomic saving through
 * {@link LimenFiles}.
 * <p>
 * Problems are computed the way {@code ./limen check} computes them: the loading problems (unknown content
 * kept, ...) and {@link BatteryValidator} against the calibration the battery names, relative to its folder.
 * Not thread-safe: use it from the UI thread.
 */
public final class BatteryDocument {

    private final Path file;
    private final ResourceSet resources;
    private final Battery battery;
    private final BatteryItemProviders adapterFactory;
    private final BasicCommandStack commandStack;
    private final AdapterFactoryEditingDomain domain;
    private final List<Problem> loadProblems;
    private Path calibrationPath;
    private long calibrationStamp;
    private LoadResult calibrationResult;

    private BatteryDocument(Path file, ResourceSet resources, Battery battery, List<Problem> loadProblems) {
        this.file = file;
        this.resources = resources;
        this.battery = battery;
        this.loadProblems = List.copyOf(loadProblems);
        this.adapterFactory = new BatteryItemProviders();
        this.commandStack = new BasicCommandStack();
        this.domain = new AdapterFactoryEditingDomain(adapterFactory, commandStack, resources);
    }

    /**
     * Loads a battery for editing.
     *
     * @param file a {@code *.battery} file
     * @return the document
     * @throws LimenFileException with the problems when the file cannot be loaded or holds no battery
     */
    public static BatteryDocument open(Path file) throws LimenFileException {
        Path absolute = file.toAbsolutePath().normalize();
        ResourceSet resources = LimenFiles.newResourceSet();
        LoadResult result = LimenFiles.load(absolute, resources);
        if (!result.succeeded()) {
            throw new LimenFileException(absolute, result.problems());
        }
        if (!(result.document() instanceof Battery battery)) {
            throw new LimenFileException(absolute, List.of(Problem.of(ProblemCode.NOT_A_LIMEN_DOCUMENT,
                    "expected a Battery but the file holds a " + result.document().eClass().getName(), absolute, 1,
                    0, result.document(), null)));
        }
        return new BatteryDocument(absolute, resources, battery, result.problems());
    }

    /** @return the battery's file (absolute) */
    public Path file() {
        return file;
    }

    /** @return the battery being edited (change it only through {@link #execute}) */
    public Battery battery() {
        return battery;
    }

    /** @return the editing domain (commands, clipboard) */
    public AdapterFactoryEditingDomain domain() {
        return domain;
    }

    /** @return the command stack (undo, redo, save point) */
    public BasicCommandStack commandStack() {
        return commandStack;
    }

    /** @return the item providers the viewers show the battery through */
    public BatteryItemProviders adapterFactory() {
        return adapterFactory;
    }

    /** @return the resource set the battery lives in */
    public ResourceSet resources() {
        return resources;
    }

    /**
     * Executes a change as one undoable step.
     *
     * @return whether it could be executed
     */
    public boolean execute(Command command) {
        if (command == null || !command.canExecute()) {
            return false;
        }
        commandStack.execute(command);
        return true;
    }

    /** @return whether there are changes since loading or the last save */
    public boolean isDirty() {
        return commandStack.isSaveNeeded();
    }

    /**
     * Writes the battery to its file atomically (a failed save leaves the previous file as it was) and marks the
     * command stack's save point. Saving an invalid battery is allowed: the caller warns with the returned errors.
     *
     * @return the errors the saved battery has (empty when it is valid)
     * @throws IOException when writing fails
     */
    public List<Problem> save() throws IOException {
        LimenFiles.save(battery, file);
        commandStack.saveIsDone();
        return validate().stream().filter(Problem::isError).toList();
    }

    /** @return the calibration file the battery names, resolved against its folder, or null when it names none */
    public Path calibrationFile() {
        String named = battery.getCalibrationFile();
        if (named == null || named.isBlank()) {
            return null;
        }
        return file.getParent().resolve(named).normalize();
    }

    /**
     * Loads (or reuses, while the file is unchanged) a calibration file.
     *
     * @return what loading gave
     */
    public LoadResult loadCalibration(Path path) {
        long stamp;
        try {
            stamp = Files.getLastModifiedTime(path).toMillis();
        } catch (IOException e) {
            stamp = -1;
        }
        if (!path.equals(calibrationPath) || stamp != calibrationStamp || calibrationResult == null) {
            calibrationPath = path;
            calibrationStamp = stamp;
            calibrationResult = LimenFiles.load(path);
        }
        return calibrationResult;
    }

    /** @return the calibration the battery names, when it loads; else null */
    public Calibration namedCalibration() {
        Path path = calibrationFile();
        if (path == null) {
            return null;
        }
        return loadCalibration(path).document() instanceof Calibration c ? c : null;
    }

    /**
     * Validates the battery as it is now.
     *
     * @return the problems: loading warnings first, then the validator's, sorted as it sorts them
     */
    public List<Problem> validate() {
        List<Problem> problems = new ArrayList<>(loadProblems);
        Path path = calibrationFile();
        if (path == null) {
            problems.addAll(BatteryValidator.validate(battery, null));
            return problems;
        }
        LoadResult calibration = loadCalibration(path);
        if (calibration.document() instanceof Calibration c) {
            problems.addAll(BatteryValidator.validate(battery, c));
            return problems;
        }
        // as ./limen check does: say why the named calibration is unusable instead of "no calibration given"
        List<Problem> found = new ArrayList<>(BatteryValidator.validate(battery, null));
        found.removeIf(p -> p.code() == ProblemCode.NO_CALIBRATION);
        String why = calibration.succeeded() ? "it holds a " + calibration.document().eClass().getName()
                : calibration.problems().stream().filter(Problem::isError).findFirst()
                        .map(p -> "line " + Math.max(1, p.line()) + ": " + p.message()).orElse("it cannot be read");
        problems.add(Problem.of(ProblemCode.CALIBRATION_NOT_LOADED, "calibration file '" + battery.getCalibrationFile()
                + "' cannot be used (" + why + "), so levels and frequency ranges are not checked", file, 0, 0,
                battery, LimenPackage.Literals.BATTERY__CALIBRATION_FILE));
        problems.addAll(found);
        return problems;
    }

    /** @return the number of problems of a severity */
    public static long count(List<Problem> problems, Severity severity) {
        return problems.stream().filter(p -> p.severity() == severity).count();
    }

    /** Releases the item providers. */
    public void dispose() {
        adapterFactory.dispose();
    }

    @Override
    public String toString() {
        return "BatteryDocument[" + file + "]";
    }

    /** @return the file name shown as the editor's label */
    public String name() {
        return Objects.toString(file.getFileName());
    }
}
