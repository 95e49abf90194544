package limen.ui.authoring;

/**
 * Event topics of the Authoring work area (payloads sent with the workbench's event broker on the UI thread).
 */
public final class AuthoringTopics {

    /** A {@link StepFocus}: the step the author is working on (selected, or one of its tracks selected). */
    public static final String STEP = "limen/authoring/step";
    /** A {@link ProblemReport}: an open battery's problems after a change. */
    public static final String PROBLEMS = "limen/authoring/problems";
    /** Asks the open editors to send their {@link #PROBLEMS} again (payload ignored). */
    public static final String REPUBLISH = "limen/authoring/republish";
    /** An {@code edit.BatteryDocument} that was closed: views drop what they show of it. */
    public static final String CLOSED = "limen/authoring/closed";

    private AuthoringTopics() {
    }
}
