package limen.model.validation;

import org.eclipse.emf.common.util.Diagnostic;

/** How serious a {@link Problem} is. An error makes a document unusable; a warning asks for a look. */
public enum Severity {
    /** The document cannot be used as it is (a session refuses to start, {@code check} exits 1). */
    ERROR("error", Diagnostic.ERROR),
    /** Something probably unintended or worth knowing; the document can be used. */
    WARNING("warning", Diagnostic.WARNING);

    private final String label;
    private final int diagnosticSeverity;

    Severity(String label, int diagnosticSeverity) {
        this.label = label;
        this.diagnosticSeverity = diagnosticSeverity;
    }

    /** @return the word used in reports: {@code error} or {@code warning} */
    public String label() {
        return label;
    }

    /** @return the matching {@link Diagnostic} severity constant */
    public int diagnosticSeverity() {
        return diagnosticSeverity;
    }

    /**
     * @param severity a {@link Diagnostic} severity
     * @return {@link #ERROR} for {@code ERROR} and {@code CANCEL}, {@link #WARNING} otherwise
     */
    public static Severity ofDiagnostic(int severity) {
        return severity >= Diagnostic.ERROR ? ERROR : WARNING;
    }
}
