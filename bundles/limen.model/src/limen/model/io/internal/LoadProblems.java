package limen.model.io.internal;

import java.io.CharConversionException;
import java.io.UnsupportedEncodingException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.util.FeatureMap;
import org.eclipse.emf.ecore.xmi.ClassNotFoundException;
import org.eclipse.emf.ecore.xmi.FeatureNotFoundException;
import org.eclipse.emf.ecore.xmi.IllegalValueException;
import org.eclipse.emf.ecore.xmi.PackageNotFoundException;
import org.eclipse.emf.ecore.xmi.UnresolvedReferenceException;
import org.eclipse.emf.ecore.xmi.XMIException;
import org.eclipse.emf.ecore.xml.type.AnyType;
import org.xml.sax.SAXParseException;

import limen.model.io.LimenResource;
import limen.model.validation.Problem;
import limen.model.validation.ProblemCode;
import limen.model.validation.internal.Labels;

/** Turns what EMF reports while loading into {@link Problem}s with codes, lines and columns. */
public final class LoadProblems {

    /** Errors before warnings, then by line and column. */
    public static final Comparator<Problem> ORDER = Comparator.comparing((Problem p) -> !p.isError())
            .thenComparingInt(Problem::line).thenComparingInt(Problem::column);

    private LoadProblems() {
    }

    /**
     * @param failure the exception the load threw, or null
     * @return one problem per distinct error and warning of the resource and the failure
     */
    public static List<Problem> of(Path file, Resource resource, Exception failure) {
        Set<String> seen = new LinkedHashSet<>();
        List<Problem> problems = new ArrayList<>();
        for (Resource.Diagnostic d : resource.getErrors()) {
            add(problems, seen, file, d, true);
        }
        for (Resource.Diagnostic d : resource.getWarnings()) {
            add(problems, seen, file, d, false);
        }
        if (failure != null && problems.stream().noneMatch(Problem::isError)) {
            Throwable cause = failure;
            while (cause.getCause() != null && !(cause instanceof SAXParseException)
                    && !(cause instanceof XMIException)) {
                cause = cause.getCause();
            }
            if (cause instanceof Resource.Diagnostic d) {
                add(problems, seen, file, d, true);
            } else if (cause instanceof SAXParseException sax) {
                problems.add(syntax(file, sax));
            } else if (cause instanceof CharConversionException || cause instanceof UnsupportedEncodingException) {
                problems.add(encoding(file, cause, 1, 0));
            } else {
                problems.add(Problem.of(ProblemCode.LOAD_FAILED, "the file could not be read: " + describe(cause),
                        file, 1, 0, null, null));
            }
        }
        return problems;
    }

    private static void add(List<Problem> problems, Set<String> seen, Path file, Resource.Diagnostic d,
            boolean error) {
        Throwable wrapped = d instanceof XMIException x ? x.getWrappedException() : null;
        if (d instanceof Throwable t && t.getCause() instanceof SAXParseException sax) {
            wrapped = sax;
        }
        Problem problem;
        if (wrapped instanceof SAXParseException sax) {
            problem = syntax(file, sax);
        } else if (wrapped instanceof CharConversionException || wrapped instanceof UnsupportedEncodingException) {
            problem = encoding(file, wrapped, Math.max(0, d.getLine()), Math.max(0, d.getColumn()));
        } else {
            int line = Math.max(0, d.getLine());
            int column = Math.max(0, d.getColumn());
            ProblemCode code;
            String message;
            EObject object = null;
            EStructuralFeature feature = null;
            if (d instanceof IllegalValueException e) {
                code = ProblemCode.INVALID_VALUE;
                feature = e.getFeature();
                Object value = e.getValue() instanceof EObject o ? Labels.of(o) : e.getValue();
                message = "value '" + value + "' of '" + (feature == null ? "?" : feature.getName())
                        + "' is not a valid " + (feature == null ? "value" : feature.getEType().getName())
                        + cause(e.getWrappedException());
            } else if (d instanceof UnresolvedReferenceException e) {
                code = ProblemCode.UNRESOLVED_ID;
                feature = e.getFeature();
                message = "no element has the id '" + e.getReference() + "'"
                        + (feature == null ? "" : " that '" + feature.getName() + "' refers to");
            } else if (d instanceof ClassNotFoundException e) {
                code = ProblemCode.NOT_A_LIMEN_DOCUMENT;
                message = "'" + e.getName() + "' is not a kind of element Limen knows";
            } else if (d instanceof PackageNotFoundException e) {
                code = ProblemCode.NOT_A_LIMEN_DOCUMENT;
                message = "the namespace '" + e.uri() + "' is not Limen's (" + limen.model.LimenPackage.eNS_URI
                        + "); the file is not a Limen document or is from an unknown version";
            } else if (d instanceof FeatureNotFoundException e) {
                code = ProblemCode.UNKNOWN_CONTENT_KEPT;
                message = "unknown element or attribute '" + e.getName() + "'";
            } else {
                code = error ? ProblemCode.LOAD_FAILED : ProblemCode.UNKNOWN_CONTENT_KEPT;
                message = stripLocation(d.getMessage());
            }
            if (column > 0) {
                message = message + " (column " + column + ")";
            }
            problem = Problem.of(code, message, file, line, column, object, feature);
        }
        if (seen.add(problem.code() + ":" + problem.line() + ":" + problem.column() + ":" + problem.message())) {
            problems.add(problem);
        }
    }

    private static Problem syntax(Path file, SAXParseException sax) {
        int line = Math.max(0, sax.getLineNumber());
        int column = Math.max(0, sax.getColumnNumber());
        String message = "malformed XML" + (column > 0 ? " at column " + column : "") + ": "
                + stripLocation(sax.getMessage());
        return Problem.of(ProblemCode.MALFORMED_FILE, message, file, line, column, null, null);
    }

    private static Problem encoding(Path file, Throwable cause, int line, int column) {
        String what = cause instanceof UnsupportedEncodingException
                ? "the declared encoding '" + cause.getMessage() + "' is unknown"
                : "the bytes are not valid text in the file's encoding (UTF-8 unless declared otherwise): "
                        + describe(cause);
        String message = "malformed file" + (column > 0 ? " at column " + column : "") + ": " + what;
        return Problem.of(ProblemCode.MALFORMED_FILE, message, file, line, column, null, null);
    }

    /** @return warnings for the elements and attributes that were kept because this version does not know them */
    public static List<Problem> unknownContent(Path file, LimenResource resource) {
        List<Problem> problems = new ArrayList<>();
        for (Map.Entry<EObject, AnyType> entry : resource.getEObjectToExtensionMap().entrySet()) {
            EObject owner = entry.getKey();
            AnyType extension = entry.getValue();
            List<String> names = new ArrayList<>();
            for (FeatureMap.Entry e : extension.getAnyAttribute()) {
                names.add("attribute '" + e.getEStructuralFeature().getName() + "'");
            }
            int[] at = resource.positionOf(owner);
            boolean unknownOnOwnerTag = !names.isEmpty();
            int[] firstElement = null;
            for (FeatureMap.Entry e : extension.getMixed()) {
                String name = "element '" + e.getEStructuralFeature().getName() + "'";
                if (e.getValue() instanceof EObject element && !names.contains(name)) {
                    names.add(name);
                    int[] own = resource.positionOf(element);
                    if (firstElement == null && own[0] > 0) {
                        firstElement = own;
                    }
                }
            }
            if (!unknownOnOwnerTag && firstElement != null) {
                at = firstElement; // point at the unknown element rather than at its parent
            }
            if (names.isEmpty()) {
                continue;
            }
            problems.add(Problem.of(ProblemCode.UNKNOWN_CONTENT_KEPT, Labels.of(owner) + ": unknown "
                    + String.join(", ", names) + " kept as it is (this version of Limen does not use it)", file,
                    at[0], at[1], owner, null));
        }
        return problems;
    }

    private static String cause(Exception e) {
        return e == null || e.getMessage() == null ? "" : " (" + stripLocation(e.getMessage()) + ")";
    }

    private static String describe(Throwable t) {
        String m = t.getMessage();
        return m == null || m.isBlank() ? t.getClass().getSimpleName() : stripLocation(m);
    }

    /** EMF appends " (uri, line, column)" to messages; the problem carries those itself. */
    static String stripLocation(String message) {
        if (message == null) {
            return "";
        }
        int at = message.lastIndexOf(" (");
        return at > 0 && message.endsWith(")") && message.substring(at).contains(", ") ? message.substring(0, at)
                : message;
    }
}
