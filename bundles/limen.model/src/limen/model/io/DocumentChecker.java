package limen.model.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import limen.model.Battery;
import limen.model.Calibration;
import limen.model.LimenDocument;
import limen.model.LimenPackage;
import limen.model.validation.BatteryValidator;
import limen.model.validation.Problem;
import limen.model.validation.ProblemCode;
import limen.model.validation.Severity;

/**
 * Loads and validates Limen files the way {@code ./limen check} does: each file is loaded (syntax, schema
 * version, unknown content) and, when it loads, validated; a battery is checked against the calibration it
 * names (its {@code calibrationFile}, relative to the battery's folder) or against an override calibration.
 * Problems are reported with the file path as given.
 */
public final class DocumentChecker {

    /**
     * The outcome of checking some files.
     *
     * @param problems every problem, file by file in the order given, each file's problems by line
     * @param unreadable whether a file (or the override calibration) could not be read at all
     */
    public record Report(List<Problem> problems, boolean unreadable) {

        /** Copies the list. */
        public Report {
            problems = List.copyOf(problems);
        }

        /** @return whether any problem is an error */
        public boolean hasErrors() {
            return problems.stream().anyMatch(Problem::isError);
        }

        /** @return the number of problems of the given severity */
        public long count(Severity severity) {
            return problems.stream().filter(p -> p.severity() == severity).count();
        }
    }

    private final Map<Path, LoadResult> calibrations = new HashMap<>();

    private DocumentChecker() {
    }

    /**
     * @param files the files to check
     * @param calibrationOverride a calibration to check every battery against instead of the one it names, or
     *        null
     * @return the problems found
     */
    public static Report check(List<Path> files, Path calibrationOverride) {
        return new DocumentChecker().run(files, calibrationOverride);
    }

    private Report run(List<Path> files, Path calibrationOverride) {
        List<Problem> problems = new ArrayList<>();
        boolean unreadable = false;
        Calibration override = null;
        if (calibrationOverride != null) {
            LoadResult result = calibration(calibrationOverride);
            if (!result.readable()) {
                unreadable = true;
                problems.addAll(result.problems());
            } else if (!(result.document() instanceof Calibration calibration)) {
                problems.addAll(asGiven(result.problems(), calibrationOverride));
                if (result.succeeded()) {
                    problems.add(Problem.of(ProblemCode.CALIBRATION_NOT_LOADED, "--calibration names a "
                            + result.document().eClass().getName() + ", not a Calibration", calibrationOverride, 1, 0,
                            null, null));
                }
            } else {
                override = calibration;
            }
        }
        for (Path file : files) {
            LoadResult result = LimenFiles.load(file);
            unreadable |= !result.readable();
            problems.addAll(asGiven(result.problems(), file));
            if (!result.succeeded()) {
                continue;
            }
            LimenDocument document = result.document();
            List<Problem> found;
            if (document instanceof Battery battery) {
                found = checkBattery(battery, file, result.resource(), override, calibrationOverride != null);
            } else {
                found = BatteryValidator.validate(document, null);
            }
            problems.addAll(asGiven(found, file));
        }
        return new Report(problems, unreadable);
    }

    private List<Problem> checkBattery(Battery battery, Path file, LimenResource resource, Calibration override,
            boolean overridden) {
        if (overridden) {
            // an unusable override has its own problems; the batteries are then checked without calibration
            return BatteryValidator.validate(battery, override);
        }
        String named = battery.getCalibrationFile();
        if (named == null || named.isBlank()) {
            return BatteryValidator.validate(battery, null);
        }
        Path folder = file.toAbsolutePath().getParent();
        Path calibrationFile = folder.resolve(named).normalize();
        LoadResult result = calibration(calibrationFile);
        if (result.document() instanceof Calibration calibration) {
            return BatteryValidator.validate(battery, calibration);
        }
        List<Problem> problems = new ArrayList<>(BatteryValidator.validate(battery, null));
        problems.removeIf(p -> p.code() == ProblemCode.NO_CALIBRATION);
        String why = result.succeeded() ? "it holds a " + result.document().eClass().getName()
                : result.problems().stream().filter(Problem::isError).findFirst()
                        .map(p -> "line " + Math.max(1, p.line()) + ": " + p.message()).orElse("it cannot be read");
        int[] at = resource.positionOf(battery);
        problems.add(0, Problem.of(ProblemCode.CALIBRATION_NOT_LOADED, "calibration file '" + named
                + "' cannot be used (" + why + "), so levels and frequency ranges are not checked", file, at[0], at[1],
                battery, LimenPackage.Literals.BATTERY__CALIBRATION_FILE));
        return problems;
    }

    private LoadResult calibration(Path file) {
        return calibrations.computeIfAbsent(file.toAbsolutePath().normalize(), LimenFiles::load);
    }

    /** Reports problems of the file under the name the user gave it rather than its absolute path. */
    private static List<Problem> asGiven(List<Problem> problems, Path given) {
        Path absolute = given.toAbsolutePath().normalize();
        List<Problem> result = new ArrayList<>(problems.size());
        for (Problem p : problems) {
            boolean same = p.file() == null || p.file().toAbsolutePath().normalize().equals(absolute);
            result.add(same ? p.at(given, p.line(), p.column()) : p);
        }
        return result;
    }
}
