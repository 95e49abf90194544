package limen.model.io;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.ecore.resource.ContentHandler;
import org.eclipse.emf.ecore.resource.impl.ExtensibleURIConverterImpl;
import org.eclipse.emf.ecore.resource.impl.FileURIHandlerImpl;
import org.eclipse.emf.ecore.resource.impl.ResourceSetImpl;
import org.eclipse.emf.ecore.resource.impl.URIHandlerImpl;
import org.eclipse.emf.ecore.util.EcoreUtil;

import limen.model.Battery;
import limen.model.Calibration;
import limen.model.LimenDocument;
import limen.model.LimenPackage;
import limen.model.SessionHeader;
import limen.model.io.internal.AtomicFiles;
import limen.model.io.internal.LoadProblems;
import limen.model.validation.Problem;
import limen.model.validation.ProblemCode;
import limen.model.validation.internal.Labels;

/**
 * Reading and writing Limen files: XMI in UTF-8, {@code *.battery} for batteries, {@code *.calibration} for
 * calibrations, {@code *.session} for session headers, each stamped with {@link #SCHEMA_VERSION}.
 * <p>
 * Loading reads the file's bytes and never writes to it; every problem (syntax errors with line and column,
 * unknown content, unsupported schema versions) is returned in a {@link LoadResult} instead of thrown. Unknown
 * elements and attributes are kept and written back on save, with a warning. Saving is atomic (see
 * {@link AtomicFiles}): a failed save leaves the previous file as it was.
 * <p>
 * Works on a plain class path and in OSGi alike: each resource set gets the Limen package and resource factory
 * registered on itself, so nothing depends on global registries.
 */
public final class LimenFiles {

    /** The file layout version written by this software; files with a higher version are refused. */
    public static final int SCHEMA_VERSION = 1;
    /** File extension of batteries. */
    public static final String BATTERY_EXTENSION = "battery";
    /** File extension of calibrations. */
    public static final String CALIBRATION_EXTENSION = "calibration";
    /** File extension of session headers. */
    public static final String SESSION_EXTENSION = "session";
    /** Files larger than this are refused unread: protocols are a few kilobytes. */
    public static final long MAXIMUM_FILE_BYTES = 64L << 20;

    private LimenFiles() {
    }

    /** @return a new resource set that reads and writes Limen files by their extensions */
    public static ResourceSet newResourceSet() {
        ResourceSet resources = new ResourceSetImpl();
        // local files only: a reference or namespace in a file must never make Limen open a network connection
        resources.setURIConverter(new ExtensibleURIConverterImpl(
                List.of(new FileURIHandlerImpl(), new LocalFilesOnly()), ContentHandler.Registry.INSTANCE.contentHandlers()));
        resources.getPackageRegistry().put(LimenPackage.eNS_URI, LimenPackage.eINSTANCE);
        LimenResourceFactory factory = new LimenResourceFactory();
        Map<String, Object> byExtension = resources.getResourceFactoryRegistry().getExtensionToFactoryMap();
        byExtension.put(BATTERY_EXTENSION, factory);
        byExtension.put(CALIBRATION_EXTENSION, factory);
        byExtension.put(SESSION_EXTENSION, factory);
        return resources;
    }

    /** Answers every URI that is not a local file with an I/O error, which EMF reports as an unresolved item. */
    private static final class LocalFilesOnly extends URIHandlerImpl {
        @Override
        public boolean canHandle(URI uri) {
            return true;
        }

        @Override
        public InputStream createInputStream(URI uri, Map<?, ?> options) throws IOException {
            throw new IOException("Limen reads only local files, not " + uri);
        }

        @Override
        public OutputStream createOutputStream(URI uri, Map<?, ?> options) throws IOException {
            throw new IOException("Limen writes only local files, not " + uri);
        }

        @Override
        public boolean exists(URI uri, Map<?, ?> options) {
            return false;
        }
    }

    /**
     * Loads any Limen document. Never throws for problems with the file; never changes the file.
     *
     * @param file the file to read
     * @return the document (if it loaded without error) and all problems found
     */
    public static LoadResult load(Path file) {
        return load(file, newResourceSet());
    }

    /**
     * Loads any Limen document into the given resource set (which should come from {@link #newResourceSet()}).
     *
     * @return the document (if it loaded without error) and all problems found
     */
    public static LoadResult load(Path file, ResourceSet resources) {
        byte[] bytes;
        try {
            if (!Files.isRegularFile(file)) {
                String why = Files.isDirectory(file) ? "is a folder" : "does not exist";
                return unreadable(file, "cannot read the file: it " + why);
            }
            long size = Files.size(file);
            if (size > MAXIMUM_FILE_BYTES) {
                return unreadable(file, "cannot read the file: " + size + " bytes is more than the "
                        + MAXIMUM_FILE_BYTES + " a Limen file may have");
            }
            bytes = Files.readAllBytes(file);
        } catch (IOException | SecurityException e) {
            return unreadable(file, "cannot read the file: " + e);
        }
        URI uri = URI.createFileURI(file.toAbsolutePath().normalize().toString());
        LimenResource resource = new LimenResource(uri);
        resources.getResources().add(resource);
        List<Problem> problems = new ArrayList<>();
        if (bytes.length == 0) {
            resources.getResources().remove(resource);
            problems.add(Problem.of(ProblemCode.MALFORMED_FILE, "the file is empty", file, 1, 1, null, null));
            return new LoadResult(file, null, null, problems, true);
        }
        Exception failure = null;
        try {
            resource.load(new ByteArrayInputStream(bytes), null);
        } catch (IOException | RuntimeException e) {
            failure = e;
        } catch (StackOverflowError e) {
            failure = new IOException("elements are nested too deeply to read", null);
        }
        resource.moveToTagStarts(new String(bytes, StandardCharsets.UTF_8));
        problems.addAll(LoadProblems.of(file, resource, failure));
        LimenDocument document = null;
        if (problems.stream().noneMatch(Problem::isError)) {
            document = checkRoot(file, resource, problems);
        }
        if (document != null) {
            problems.addAll(LoadProblems.unknownContent(file, resource));
        }
        problems.sort(LoadProblems.ORDER);
        if (document == null) {
            resources.getResources().remove(resource); // no half-read document stays in the caller's set
        }
        return new LoadResult(file, document, document == null ? null : resource, problems, true);
    }

    /** Loads a battery, or throws with the problems when the file holds none or has errors. */
    public static Battery loadBattery(Path file) throws LimenFileException {
        return loadAs(file, Battery.class);
    }

    /** Loads a calibration, or throws with the problems when the file holds none or has errors. */
    public static Calibration loadCalibration(Path file) throws LimenFileException {
        return loadAs(file, Calibration.class);
    }

    /** Loads a session header, or throws with the problems when the file holds none or has errors. */
    public static SessionHeader loadSession(Path file) throws LimenFileException {
        return loadAs(file, SessionHeader.class);
    }

    private static <T extends LimenDocument> T loadAs(Path file, Class<T> type) throws LimenFileException {
        LoadResult result = load(file);
        if (!result.succeeded()) {
            throw new LimenFileException(file, result.problems());
        }
        if (!type.isInstance(result.document())) {
            throw new LimenFileException(file, List.of(Problem.of(ProblemCode.NOT_A_LIMEN_DOCUMENT,
                    "expected a " + type.getSimpleName() + " but the file holds a "
                            + result.document().eClass().getName(), file, 1, 0, result.document(), null)));
        }
        return type.cast(result.document());
    }

    /**
     * Saves a document atomically, stamping it (and the documents it contains) with {@link #SCHEMA_VERSION}.
     * The document stays in (or is put into) a resource of its own resource set whose URI becomes the file.
     *
     * @param document the battery, calibration or session header
     * @param file the target; its folder must exist
     * @throws IOException if serialising or writing fails, or the document refers to an element that belongs to
     *         no document; the previous file content is then unchanged
     * @throws IllegalArgumentException if the document is contained in another (a session's snapshot)
     */
    public static void save(LimenDocument document, Path file) throws IOException {
        if (document.eContainer() != null) {
            throw new IllegalArgumentException("a " + document.eClass().getName()
                    + " inside another document is saved with that document, not on its own");
        }
        refuseDanglingReferences(document);
        stamp(document);
        URI uri = URI.createFileURI(file.toAbsolutePath().normalize().toString());
        Resource resource = document.eResource();
        if (!(resource instanceof LimenResource) || resource.getContents().size() != 1) {
            ResourceSet resources = resource != null && resource.getResourceSet() != null ? resource.getResourceSet()
                    : newResourceSet();
            resource = new LimenResource(uri);
            resources.getResources().add(resource);
            resource.getContents().add(document);
        }
        resource.setURI(uri);
        ByteArrayOutputStream bytes = new ByteArrayOutputStream(16 * 1024);
        resource.save(bytes, null);
        AtomicFiles.write(file, bytes.toByteArray());
        resource.setModified(false);
    }

    /** XMI would write a reference to an element outside every document as an id that no longer resolves. */
    private static void refuseDanglingReferences(LimenDocument document) throws IOException {
        List<EObject> elements = new ArrayList<>();
        elements.add(document);
        EcoreUtil.<EObject>getAllProperContents(document, false).forEachRemaining(elements::add);
        for (EObject element : elements) {
            for (EObject target : element.eCrossReferences()) {
                if (!target.eIsProxy() && target.eResource() == null && !EcoreUtil.isAncestor(document, target)) {
                    throw new IOException(Labels.of(element) + " refers to " + Labels.of(target)
                            + ", which belongs to no document; the saved file would not load again");
                }
            }
        }
    }

    private static void stamp(LimenDocument document) {
        document.setSchemaVersion(SCHEMA_VERSION);
        for (Iterator<EObject> it = document.eAllContents(); it.hasNext();) {
            if (it.next() instanceof LimenDocument nested) {
                nested.setSchemaVersion(SCHEMA_VERSION);
            }
        }
    }

    private static LimenDocument checkRoot(Path file, LimenResource resource, List<Problem> problems) {
        if (resource.getContents().isEmpty() || !(resource.getContents().get(0) instanceof LimenDocument document)) {
            String found = resource.getContents().isEmpty() ? "nothing"
                    : "a " + resource.getContents().get(0).eClass().getName();
            int[] at = resource.getContents().isEmpty() ? new int[] {1, 0}
                    : resource.positionOf(resource.getContents().get(0));
            problems.add(Problem.of(ProblemCode.NOT_A_LIMEN_DOCUMENT, "the file holds " + found
                    + ", not a Battery, Calibration or SessionHeader", file, at[0], at[1], null, null));
            return null;
        }
        int[] at = resource.positionOf(document);
        if (resource.getContents().size() > 1) {
            problems.add(Problem.of(ProblemCode.NOT_A_LIMEN_DOCUMENT, "the file holds "
                    + resource.getContents().size() + " documents; a Limen file holds one", file, at[0], at[1],
                    document, null));
            return null;
        }
        int version = document.getSchemaVersion();
        if (version <= 0 || version > SCHEMA_VERSION) {
            String why = version <= 0 ? "has no schema version (schemaVersion=\"" + SCHEMA_VERSION + "\" expected)"
                    : "has schema version " + version + ", newer than the version " + SCHEMA_VERSION
                            + " this software reads; update Limen";
            problems.add(Problem.of(ProblemCode.SCHEMA_VERSION, "the " + document.eClass().getName() + " " + why,
                    file, at[0], at[1], document, LimenPackage.Literals.LIMEN_DOCUMENT__SCHEMA_VERSION));
            return null;
        }
        String expected = document instanceof Battery ? BATTERY_EXTENSION
                : document instanceof Calibration ? CALIBRATION_EXTENSION : SESSION_EXTENSION;
        String name = file.getFileName() == null ? "" : file.getFileName().toString();
        if (!name.endsWith("." + expected)) {
            problems.add(Problem.of(ProblemCode.EXTENSION_MISMATCH, "the file holds a " + document.eClass().getName()
                    + "; name it *." + expected, file, at[0], at[1], document, null));
        }
        return document;
    }

    private static LoadResult unreadable(Path file, String message) {
        return new LoadResult(file, null, null,
                List.of(Problem.of(ProblemCode.UNREADABLE_FILE, message, file, 1, 0, null, null)), false);
    }
}
