package limen.model.validation;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;

import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.ecore.EValidator;
import org.eclipse.emf.ecore.impl.EValidatorRegistryImpl;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.util.Diagnostician;
import org.eclipse.emf.ecore.util.EObjectValidator;

import limen.model.Battery;
import limen.model.Calibration;
import limen.model.LimenDocument;
import limen.model.LimenPackage;
import limen.model.SessionHeader;
import limen.model.io.LimenResource;
import limen.model.util.LimenValidator;
import limen.model.validation.internal.Labels;

/**
 * Validates Limen documents with EMF's {@link Diagnostician} (the generated {@link LimenValidator} with the
 * constraints of {@code limen.ecore}) and returns the result as {@link Problem}s with codes, messages naming the
 * element, and the file and line of the offending element when the document was loaded from a file.
 * <p>
 * EMF's own structural checks are reported with Limen codes: LM0001 (a required value is missing), LM0002 (an
 * unresolved or dangling reference) and LM0003 (other structural rules); EMF's duplicate-id check is left to
 * Limen's LM0102.
 */
public final class BatteryValidator {

    private BatteryValidator() {
    }

    /**
     * @param battery the battery to check
     * @param calibration the calibration to check levels and frequency ranges against, or null to skip those
     *        checks (a warning LM0911 says so)
     * @return the problems, sorted by line
     */
    public static List<Problem> validate(Battery battery, Calibration calibration) {
        List<Problem> problems = problemsOf(diagnose(battery, calibration));
        if (calibration == null) {
            problems.add(place(Problem.of(ProblemCode.NO_CALIBRATION, Labels.of(battery)
                    + ": no calibration given, so levels and frequency ranges are not checked", null, 0, 0, battery,
                    LimenPackage.Literals.BATTERY__CALIBRATION_FILE)));
        }
        problems.sort(ORDER);
        return problems;
    }

    /** @return the problems of a calibration, sorted by line */
    public static List<Problem> validate(Calibration calibration) {
        return sorted(problemsOf(diagnose(calibration, null)));
    }

    /** @return the problems of a session header, its snapshots checked against its own calibration snapshot */
    public static List<Problem> validate(SessionHeader session) {
        return sorted(problemsOf(diagnose(session, session.getCalibration())));
    }

    /**
     * @param document any Limen document
     * @param calibration for batteries, the calibration to check against (may be null); otherwise ignored
     * @return the problems, sorted by line
     */
    public static List<Problem> validate(LimenDocument document, Calibration calibration) {
        if (document instanceof Battery battery) {
            return validate(battery, calibration);
        }
        if (document instanceof SessionHeader session) {
            return validate(session);
        }
        return validate((Calibration) document);
    }

    /**
     * Runs EMF validation with Limen's validator.
     *
     * @param root the element to validate with everything it contains
     * @param calibration the calibration for level and range checks, or null
     * @return EMF's diagnostic tree
     */
    public static Diagnostic diagnose(EObject root, Calibration calibration) {
        EValidatorRegistryImpl registry = new EValidatorRegistryImpl();
        registry.put(LimenPackage.eINSTANCE, LimenValidator.INSTANCE);
        Diagnostician diagnostician = new Diagnostician(registry);
        Map<Object, Object> context = diagnostician.createDefaultContext();
        if (calibration != null) {
            context.put(ValidationContext.CALIBRATION, calibration);
        }
        return diagnostician.validate(root, context);
    }

    /**
     * @param diagnostic a diagnostic tree from {@link #diagnose}
     * @return one problem per leaf diagnostic, placed in the element's file and line
     */
    public static List<Problem> problemsOf(Diagnostic diagnostic) {
        List<Problem> problems = new ArrayList<>();
        collect(diagnostic, problems);
        return problems;
    }

    private static final Comparator<Problem> ORDER = Comparator
            .comparing((Problem p) -> p.file() == null ? "" : p.file().toString()).thenComparingInt(Problem::line)
            .thenComparing(p -> p.code().number());

    private static List<Problem> sorted(List<Problem> problems) {
        problems.sort(ORDER);
        return problems;
    }

    private static void collect(Diagnostic diagnostic, List<Problem> problems) {
        if (diagnostic.getChildren().isEmpty()) {
            if (diagnostic.getSeverity() >= Diagnostic.WARNING) {
                Problem problem = toProblem(diagnostic);
                if (problem != null) {
                    problems.add(place(problem));
                }
            }
            return;
        }
        for (Diagnostic child : diagnostic.getChildren()) {
            collect(child, problems);
        }
    }

    private static Problem toProblem(Diagnostic d) {
        List<?> data = d.getData();
        EObject object = !data.isEmpty() && data.get(0) instanceof EObject o ? o : null;
        EStructuralFeature feature = data.size() > 1 && data.get(1) instanceof EStructuralFeature f ? f : null;
        if (ProblemCode.SOURCE.equals(d.getSource())) {
            ProblemCode code = ProblemCode.ofNumber(d.getCode()).orElse(ProblemCode.STRUCTURE_INVALID);
            return Problem.of(code, d.getMessage(), null, 0, 0, object, feature);
        }
        if (EObjectValidator.DIAGNOSTIC_SOURCE.equals(d.getSource())) {
            return mapStructural(d, object, feature);
        }
        return new Problem(Severity.ofDiagnostic(d.getSeverity()), ProblemCode.STRUCTURE_INVALID,
                Labels.of(object) + ": " + d.getMessage(), null, 0, 0, object, feature);
    }

    /** Maps EMF's structural diagnostics to Limen codes with messages in Limen's terms. */
    static Problem mapStructural(Diagnostic d, EObject object, EStructuralFeature feature) {
        String who = Labels.of(object);
        String name = feature == null ? "?" : feature.getName();
        switch (d.getCode()) {
            case EObjectValidator.EOBJECT__UNIQUE_ID:
                return null; // LM0102 names the steps
            case EObjectValidator.EOBJECT__EVERY_MULTIPCITY_CONFORMS:
                return Problem.of(ProblemCode.MISSING_REQUIRED, who + ": required '" + name + "' is missing",
                        null, 0, 0, object, feature);
            case EObjectValidator.EOBJECT__EVERY_PROXY_RESOLVES:
                Object proxy = d.getData().size() > 2 ? d.getData().get(2) : null;
                String target = proxy instanceof EObject p && p.eIsProxy()
                        ? ((org.eclipse.emf.ecore.InternalEObject) p).eProxyURI().toString() : String.valueOf(proxy);
                return Problem.of(ProblemCode.UNRESOLVED_REFERENCE, who + ": '" + name + "' refers to '" + target
                        + "', which cannot be loaded", null, 0, 0, object, feature);
            case EObjectValidator.EOBJECT__EVERY_REFERENCE_IS_CONTAINED:
                return Problem.of(ProblemCode.UNRESOLVED_REFERENCE, who + ": '" + name
                        + "' refers to an element that belongs to no document", null, 0, 0, object, feature);
            default:
                return Problem.of(ProblemCode.STRUCTURE_INVALID, who + ": " + d.getMessage(), null, 0, 0, object,
                        feature);
        }
    }

    /** @return the problem placed at its element's file and start line, when the element came from a file */
    private static Problem place(Problem problem) {
        if (problem.object() == null) {
            return problem;
        }
        Resource resource = problem.object().eResource();
        if (resource == null || resource.getURI() == null) {
            return problem;
        }
        Path file = resource.getURI().isFile() ? Path.of(resource.getURI().toFileString()) : null;
        int[] at = resource instanceof LimenResource limen ? limen.positionOf(problem.object()) : new int[] {0, 0};
        return problem.at(file, at[0], at[1]);
    }

    /** @return the validator registry entry Limen uses (for callers that run their own Diagnostician) */
    public static EValidator validator() {
        return LimenValidator.INSTANCE;
    }
}
