package limen.procedure;

import java.util.Optional;

import limen.core.extension.Settings;

/**
 * An adaptive procedure that can be named in a battery: the extension point for procedures. Limen's own
 * methods (package {@code limen.procedure.kinds}) and a lab's are contributed the same way, as a public class
 * with a public no-argument constructor named in {@code META-INF/services/limen.procedure.ProcedureKind} (plain
 * class path) and in an {@code OSGI-INF/*.xml} component offering this interface (workbench); see
 * {@link limen.core.extension.Extensions}.
 * <p>
 * A battery names a kind by its {@link #id()}: the built-ins through the model's own procedure elements, a
 * lab's through a {@code ContributedProcedure} whose settings group has this id as contributor. The settings
 * reach {@link #create} as typed {@link Settings}; a kind validates them there, like any settings class of this
 * bundle does in its constructor, and its {@link IllegalArgumentException} message is shown to the author
 * (by {@code ./limen check} as LM0806, by the runner before the first trial).
 */
public interface ProcedureKind {

    /** @return the identifier a battery uses, e.g. {@code "limen.transformed-up-down"}; stable once released */
    String id();

    /** @return a short human title, e.g. {@code "Transformed up-down staircase"} */
    String title();

    /**
     * @return true when the procedure ends by itself (as constant stimuli do), so a stopping rule with no
     *         criterion is allowed; false (the default) when it needs one
     */
    default boolean endsByItself() {
        return false;
    }

    /**
     * @param settings the track's settings (names and types as the kind documents them)
     * @param context the task, axis, guess rate and stopping rule of the track
     * @return a factory of fresh procedures with these settings; values on the quantity's own scale (wrap an
     *         axis-based procedure with {@code context.axis().wrap(...)})
     * @throws IllegalArgumentException naming the setting and its value when the settings cannot run
     */
    ProcedureFactory create(Settings settings, ProcedureContext context);

    /**
     * A model listener for design-time simulation when the author names none, as a
     * {@code limen.psychometric.ListenerSpec} in the quantity's unit, placed where these settings expect the
     * threshold (Limen's own kinds follow {@code limen.session.build.DefaultListeners}).
     *
     * @param settings the track's settings
     * @return the spec, or empty (the default) when the kind offers none: the author must then give one
     */
    default Optional<String> defaultListener(Settings settings) {
        return Optional.empty();
    }
}
