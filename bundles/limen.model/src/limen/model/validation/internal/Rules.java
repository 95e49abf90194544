package limen.model.validation.internal;

import java.math.BigDecimal;
import java.math.MathContext;

import org.eclipse.emf.common.util.BasicDiagnostic;
import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;

import limen.model.validation.ProblemCode;
import limen.model.validation.Severity;

/**
 * Shared plumbing of the constraint implementations: one diagnostic per problem, carrying the code, a message
 * that names the element and the value, and the data {@code [element, feature, value]} that EMF tools use to
 * select the offending feature.
 */
final class Rules {

    private Rules() {
    }

    /**
     * Adds one diagnostic to the chain (if there is a chain).
     *
     * @return false for an error, true for a warning, so that rules can write {@code ok &= report(...)}
     */
    static boolean report(DiagnosticChain diagnostics, ProblemCode code, EObject element, EStructuralFeature feature,
            Object value, String message) {
        if (diagnostics != null) {
            Object[] data = value == null ? new Object[] {element, feature} : new Object[] {element, feature, value};
            diagnostics.add(new BasicDiagnostic(code.severity().diagnosticSeverity(), ProblemCode.SOURCE,
                    code.number(), message, data));
        }
        return code.severity() != Severity.ERROR;
    }

    /** @return x in at most 6 significant digits without trailing zeros: 1000, 0.15, -3.5, NaN */
    static String num(double x) {
        if (!Double.isFinite(x)) {
            return Double.toString(x);
        }
        if (x == 0) {
            return "0";
        }
        return new BigDecimal(x).round(new MathContext(6)).stripTrailingZeros().toPlainString();
    }

    /** @return seconds as text with the unit: {@code 0.15 s} */
    static String seconds(double x) {
        return num(x) + " s";
    }

    /** @return whether x is finite and strictly positive */
    static boolean positive(double x) {
        return x > 0 && x < Double.POSITIVE_INFINITY;
    }

    /** @return whether x is finite and not negative */
    static boolean notNegative(double x) {
        return x >= 0 && x < Double.POSITIVE_INFINITY;
    }

    /** @return whether s is null or only white space */
    static boolean blank(String s) {
        return s == null || s.isBlank();
    }
}
