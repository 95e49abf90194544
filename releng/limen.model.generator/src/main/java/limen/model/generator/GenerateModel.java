package limen.model.generator;

import java.io.File;
import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

import org.eclipse.emf.codegen.ecore.generator.Generator;
import org.eclipse.emf.codegen.ecore.generator.GeneratorAdapterFactory;
import org.eclipse.emf.codegen.ecore.genmodel.GenJDKLevel;
import org.eclipse.emf.codegen.ecore.genmodel.GenModel;
import org.eclipse.emf.codegen.ecore.genmodel.GenModelFactory;
import org.eclipse.emf.codegen.ecore.genmodel.GenModelPackage;
import org.eclipse.emf.codegen.ecore.genmodel.GenPackage;
import org.eclipse.emf.codegen.ecore.genmodel.GenResourceKind;
import org.eclipse.emf.codegen.ecore.genmodel.generator.GenBaseGeneratorAdapter;
import org.eclipse.emf.codegen.ecore.genmodel.generator.GenModelGeneratorAdapterFactory;
import org.eclipse.emf.common.util.BasicMonitor;
import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EPackage;
import org.eclipse.emf.ecore.EcorePackage;
import org.eclipse.emf.ecore.plugin.EcorePlugin;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.ecore.resource.URIConverter;
import org.eclipse.emf.ecore.resource.impl.ResourceSetImpl;
import org.eclipse.emf.ecore.util.Diagnostician;
import org.eclipse.emf.ecore.xmi.XMLResource;
import org.eclipse.emf.ecore.xmi.impl.EcoreResourceFactoryImpl;

/**
 * Regenerates the EMF model code of {@code bundles/limen.model} from {@code model/limen.genmodel} without an
 * Eclipse IDE or workspace.
 * <p>
 * Usage: {@code GenerateModel BUNDLE_DIR [--edit[=EDIT_BUNDLE_DIR]] [--init]}. {@code --init} writes a fresh
 * genmodel from {@code model/limen.ecore} when none exists (bootstrapping only; the checked-in genmodel is
 * the source afterwards). {@code --edit} also generates the EMF.Edit item providers into the edit bundle,
 * by default the sibling folder {@code BUNDLE_DIR.edit} ({@code limen.model.edit}).
 * <p>
 * Headless generation needs three things an IDE would otherwise provide: the bundle folder mapped as the
 * {@code platform:/resource/limen.model/} project, the GenModel generator adapter factory registered (without
 * it the generator silently writes nothing, so this class checks that files appeared), and
 * {@code platform:/plugin/org.eclipse.emf.ecore/} mapped into the Ecore jar for the Ecore genmodel that our
 * genmodel uses. Generated members keep {@code @generated}; JMerge preserves members marked
 * {@code @generated NOT}.
 */
public final class GenerateModel {

    static final String MODEL_PROJECT = "limen.model";
    static final String EDIT_PROJECT = "limen.model.edit";
    static final String GENMODEL = "model/limen.genmodel";

    private GenerateModel() {
    }

    public static void main(String[] args) throws Exception {
        Path bundle = null;
        Path edit = null;
        boolean withEdit = false;
        boolean init = false;
        for (String arg : args) {
            if (arg.isBlank()) {
                continue; // an empty optional argument from the Maven profile
            }
            if (arg.equals("--init")) {
                init = true;
            } else if (arg.equals("--edit")) {
                withEdit = true;
            } else if (arg.startsWith("--edit=")) {
                withEdit = true;
                edit = Path.of(arg.substring("--edit=".length())).toAbsolutePath().normalize();
            } else {
                bundle = Path.of(arg).toAbsolutePath().normalize();
            }
        }
        if (bundle == null || !Files.isDirectory(bundle.resolve("model"))) {
            System.err.println("usage: GenerateModel BUNDLE_DIR [--edit[=EDIT_BUNDLE_DIR]] [--init]"
                    + " (BUNDLE_DIR must contain model/limen.ecore; the edit bundle defaults to BUNDLE_DIR.edit)");
            System.exit(2);
        }
        if (withEdit && edit == null) {
            edit = bundle.resolveSibling(bundle.getFileName() + ".edit");
        }
        System.exit(run(bundle, edit, init));
    }

    static int run(Path bundle, Path edit, boolean init) throws IOException, URISyntaxException {
        ResourceSet resources = setUp(bundle, edit);
        URI genModelUri = URI.createPlatformResourceURI(MODEL_PROJECT + "/" + GENMODEL, true);
        if (init && !Files.exists(bundle.resolve(GENMODEL))) {
            initGenModel(resources, genModelUri);
            System.err.println("wrote " + bundle.resolve(GENMODEL));
        }
        Resource resource = resources.getResource(genModelUri, true);
        GenModel genModel = (GenModel) resource.getContents().get(0);
        genModel.reconcile();
        Diagnostic check = Diagnostician.INSTANCE.validate(genModel);
        if (check.getSeverity() >= Diagnostic.ERROR) {
            print(check, "");
            return 1;
        }
        genModel.setCanGenerate(true);

        Generator generator = new Generator();
        generator.setInput(genModel);
        Diagnostic result = generator.generate(genModel, GenBaseGeneratorAdapter.MODEL_PROJECT_TYPE,
                "Limen model code", new BasicMonitor.Printing(System.err));
        if (edit != null && result.getSeverity() < Diagnostic.ERROR) {
            result = generator.generate(genModel, GenBaseGeneratorAdapter.EDIT_PROJECT_TYPE,
                    "Limen item providers", new BasicMonitor.Printing(System.err));
        }
        if (result.getSeverity() >= Diagnostic.ERROR) {
            print(result, "");
            return 1;
        }
        // the generator reports success even when no adapter factory was found: check the output exists
        Path marker = bundle.resolve("src-gen/limen/model/LimenPackage.java");
        if (!Files.isRegularFile(marker)) {
            System.err.println("generation wrote nothing: " + marker + " is missing");
            return 1;
        }
        try (Stream<Path> files = Files.walk(bundle.resolve("src-gen"))) {
            System.err.println("generated " + files.filter(Files::isRegularFile).count() + " files under "
                    + bundle.resolve("src-gen"));
        }
        return 0;
    }

    private static ResourceSet setUp(Path bundle, Path edit) throws URISyntaxException {
        EcorePackage.eINSTANCE.eClass();
        GenModelPackage.eINSTANCE.eClass();
        Map<String, URI> projects = EcorePlugin.getPlatformResourceMap();
        projects.put(MODEL_PROJECT, folderUri(bundle));
        if (edit != null) {
            projects.put(EDIT_PROJECT, folderUri(edit));
        }
        GeneratorAdapterFactory.Descriptor.Registry.INSTANCE.addDescriptor(GenModelPackage.eNS_URI,
                GenModelGeneratorAdapterFactory.DESCRIPTOR);

        ResourceSet resources = new ResourceSetImpl();
        Map<String, Object> factories = resources.getResourceFactoryRegistry().getExtensionToFactoryMap();
        factories.put("ecore", new EcoreResourceFactoryImpl());
        factories.put("genmodel", new EcoreResourceFactoryImpl());
        URI ecoreJar = jarOf(EcorePackage.class);
        URIConverter.URI_MAP.put(URI.createPlatformPluginURI("/org.eclipse.emf.ecore/", false), ecoreJar);
        resources.getURIConverter().getURIMap().put(URI.createPlatformPluginURI("/org.eclipse.emf.ecore/", false),
                ecoreJar);
        resources.getLoadOptions().put(XMLResource.OPTION_ENCODING, "UTF-8");
        return resources;
    }

    /** Writes a genmodel for model/limen.ecore with Limen's settings (used once, to bootstrap). */
    private static void initGenModel(ResourceSet resources, URI genModelUri) throws IOException {
        URI ecoreUri = genModelUri.trimSegments(1).appendSegment("limen.ecore");
        EPackage ePackage = (EPackage) resources.getResource(ecoreUri, true).getContents().get(0);
        GenModel genModel = GenModelFactory.eINSTANCE.createGenModel();
        Resource resource = resources.createResource(genModelUri);
        resource.getContents().add(genModel);
        genModel.initialize(Collections.singleton(ePackage));
        genModel.getForeignModel().add("limen.ecore");
        genModel.setModelName("Limen");
        genModel.setModelPluginID(MODEL_PROJECT);
        genModel.setModelDirectory("/" + MODEL_PROJECT + "/src-gen");
        genModel.setEditDirectory("/" + EDIT_PROJECT + "/src-gen");
        genModel.setEditPluginID(EDIT_PROJECT);
        genModel.setImporterID("org.eclipse.emf.importer.ecore");
        genModel.setComplianceLevel(GenJDKLevel.JDK170_LITERAL);
        genModel.setOperationReflection(true);
        genModel.setImportOrganizing(true);
        genModel.setUpdateClasspath(false);
        genModel.setCopyrightFields(false);
        GenPackage genPackage = genModel.getGenPackages().get(0);
        genPackage.setPrefix("Limen");
        genPackage.setBasePackage("limen");
        genPackage.setResource(GenResourceKind.NONE_LITERAL);
        genPackage.setFileExtensions("battery,calibration,session");
        genPackage.setDisposableProviderFactory(true);
        resource.save(Map.of(XMLResource.OPTION_ENCODING, "UTF-8"));
    }

    private static URI folderUri(Path folder) {
        return URI.createFileURI(folder.toString() + File.separator);
    }

    private static URI jarOf(Class<?> type) throws URISyntaxException {
        Path jar = Path.of(type.getProtectionDomain().getCodeSource().getLocation().toURI());
        return URI.createURI("jar:" + URI.createFileURI(jar.toString()) + "!/");
    }

    private static void print(Diagnostic diagnostic, String indent) {
        if (diagnostic.getSeverity() != Diagnostic.OK) {
            System.err.println(indent + diagnostic.getMessage());
        }
        List<Diagnostic> children = new ArrayList<>(diagnostic.getChildren());
        for (Diagnostic child : children) {
            print(child, indent + "  ");
        }
    }
}
