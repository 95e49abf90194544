package limen.ui.authoring;

/** Element ids of the Authoring work area's application model (see {@code fragment.e4xmi}). */
public final class AuthoringIds {

    /** The Authoring perspective in {@code limen.ui.perspectivestack}. */
    public static final String PERSPECTIVE = "limen.ui.authoring.perspective";
    /** Part descriptor of the battery editor (one part per file). */
    public static final String EDITOR_DESCRIPTOR = "limen.ui.authoring.partdescriptor.batteryEditor";
    /** The stack the battery editors open in. */
    public static final String EDITOR_STACK = "limen.ui.authoring.partstack.editors";
    /** The lab files view. */
    public static final String LAB_FILES_PART = "limen.ui.authoring.part.labFiles";
    /** The battery check (problems) view. */
    public static final String PROBLEMS_PART = "limen.ui.authoring.part.problems";
    /** The stimulus preview. */
    public static final String PREVIEW_PART = "limen.ui.authoring.part.stimulusPreview";
    /** The design simulation view. */
    public static final String SIMULATION_PART = "limen.ui.authoring.part.designSimulation";
    /** Binding context active while a battery's step tree has focus (copy, paste, delete keys). */
    public static final String TREE_CONTEXT = "limen.ui.authoring.context.stepTree";
    /** Persisted-state key of an editor part: the absolute path of its battery file. */
    public static final String FILE_KEY = "limen.ui.authoring.file";

    private AuthoringIds() {
    }
}
