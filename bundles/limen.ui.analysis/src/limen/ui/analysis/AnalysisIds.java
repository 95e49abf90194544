package limen.ui.analysis;

/** Element ids and event topics of the Analysis work area (see {@code fragment.e4xmi}). */
public final class AnalysisIds {

    /** The Analysis perspective in {@code limen.ui.perspectivestack}. */
    public static final String PERSPECTIVE = "limen.ui.analysis.perspective";
    /** The archive browser. */
    public static final String BROWSER_PART = "limen.ui.analysis.part.archiveBrowser";
    /** The session view. */
    public static final String SESSION_PART = "limen.ui.analysis.part.session";
    /** The summary across sessions. */
    public static final String SUMMARY_PART = "limen.ui.analysis.part.summary";
    /** Event topic: the browser's selection changed; data is a {@code List<Path>} of session folders. */
    public static final String SELECTION_TOPIC = "limen/analysis/selection";
    /**
     * Key of the browser's selection ({@code List<Path>}) in the application's context, for views created
     * after the selection was posted (a tab opened later).
     */
    public static final String SELECTION_KEY = "limen.ui.analysis.selection";
    /** Event topic: fits of these session folders were saved; data is a {@code List<Path>}. */
    public static final String FITS_SAVED_TOPIC = "limen/analysis/fitsSaved";

    private AnalysisIds() {
    }
}
