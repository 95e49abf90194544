package limen.model.validation;

import java.nio.file.Path;
import java.util.Objects;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;

/**
 * One problem found in a document: what ({@link #code()}, {@link #message()}), how bad ({@link #severity()}) and
 * where (file, line, column, and the offending element and feature when there is one).
 *
 * @param severity the severity, which is always the code's severity
 * @param code the stable code
 * @param message a sentence that names the element and the offending value
 * @param file the file, or null for a document that was never saved
 * @param line the 1-based line of the element's start tag or of the syntax error, or 0 when unknown
 * @param column the 1-based column, or 0 when unknown
 * @param object the offending model element, or null for problems with the file itself
 * @param feature the offending feature of {@code object}, or null
 */
public record Problem(Severity severity, ProblemCode code, String message, Path file, int line, int column,
        EObject object, EStructuralFeature feature) {

    /** Checks the arguments. */
    public Problem {
        Objects.requireNonNull(severity, "severity");
        Objects.requireNonNull(code, "code");
        Objects.requireNonNull(message, "message");
        if (line < 0 || column < 0) {
            throw new IllegalArgumentException("line and column must be >= 0, were " + line + " and " + column);
        }
    }

    /** @return a problem of the code's own severity */
    public static Problem of(ProblemCode code, String message, Path file, int line, int column, EObject object,
            EStructuralFeature feature) {
        return new Problem(code.severity(), code, message, file, line, column, object, feature);
    }

    /** @return a copy placed in the given file at the given position */
    public Problem at(Path newFile, int newLine, int newColumn) {
        return new Problem(severity, code, message, newFile, newLine, newColumn, object, feature);
    }

    /** @return whether this is an error */
    public boolean isError() {
        return severity == Severity.ERROR;
    }

    /**
     * @return {@code FILE:LINE: error|warning: CODE: message}; the line is 1 when no better position is known
     *         and the file is {@code <unsaved>} for documents without one
     */
    public String format() {
        String where = file == null ? "<unsaved>" : file.toString();
        return where + ":" + Math.max(1, line) + ": " + severity.label() + ": " + code.code() + ": " + message;
    }

    @Override
    public String toString() {
        return format();
    }
}
