package limen.session.build;

import java.util.ArrayList;
import java.util.List;

import limen.core.extension.Extensions;
import limen.core.extension.Settings;
import limen.model.ForcedChoiceTask;
import limen.model.Procedure;
import limen.model.Scale;
import limen.model.Step;
import limen.model.StoppingRule;
import limen.model.Track;
import limen.model.YesNoTask;
import limen.procedure.Axis;
import limen.procedure.ProcedureContext;
import limen.procedure.ProcedureFactory;
import limen.procedure.ProcedureKind;
import limen.procedure.StopRule;
import limen.procedure.Task;

/**
 * Maps a battery's steps, tracks, procedure settings and stopping rules (the {@code limen.model}
 * classes) onto the state machines of {@code limen.procedure}, through the one extension point for procedures:
 * the track's procedure names a {@link ProcedureKind} ({@link ModelSettings#procedureId}), which is looked up
 * among the installed ones ({@link Extensions}) and handed the procedure's {@link Settings}
 * ({@link ModelSettings#of(Procedure)}) with the task, axis, guess rate and stopping rule. Limen's own kinds
 * ({@code limen.procedure.kinds}) follow the model's documentation:
 * <ul>
 * <li>Staircases: step sizes are differences (ADDITIVE) or factors &gt; 1 (MULTIPLICATIVE); in
 * multiplicative mode the shrink rule acts on the factor's logarithm; the weighted up-down's
 * S_up/S_down is upStep/downStep (ratio of the logarithms in multiplicative mode).</li>
 * <li>QUEST/ZEST and Psi place their grids on the quantity's axis: the value (LINEAR) or 20 log10 of
 * it (LOG); prior mean, threshold and stimulus bounds are given in the quantity's unit, prior SD,
 * grain and range in axis units. QUEST's function is Watson &amp; Pelli's Weibull on the axis,
 * ψ = δγ + (1 − δ)(1 − (1 − γ) exp(−10^{β(x − T)/20})), so its threshold T sits at
 * ψ(T) = δγ + (1 − δ)(1 − (1 − γ)/e).</li>
 * <li>Psi slopes are log-spaced; a logistic or cumulative-normal slope s is the reciprocal of the
 * spread (scale or SD = 1/s, axis units); a Weibull slope is the Weibull shape β: on a LOG axis that
 * is a Gumbel of scale 20/(β ln 10) dB, on a LINEAR axis the Weibull itself.</li>
 * <li>Constant stimuli: blocked shuffle = blocks holding each value once; otherwise one block of all
 * trials. The estimate is a logistic fit with the task's guess rate, at F = 0.5.</li>
 * <li>The guess rate is the settings' {@code guessRate} when given, else the task's chance rate: 1/n for nAFC,
 * 0 for yes/no (the same rule for a lab's kind).</li>
 * <li>Stopping: a track ends as soon as any criterion that is set is met; a kind that ends by itself (constant
 * stimuli) may have none.</li>
 * </ul>
 */
public final class ProcedureBuilder {

    private ProcedureBuilder() {
    }

    /** @return every track of every step, in battery order */
    public static List<BuiltTrack> buildAll(List<Step> steps) {
        List<BuiltTrack> out = new ArrayList<>();
        for (Step s : steps) {
            for (Track t : s.getTracks()) {
                out.add(build(s, t));
            }
        }
        return out;
    }

    /**
     * @throws IllegalArgumentException naming the step, track and setting when the settings cannot be run, or
     *         the procedure kind when it is not installed
     */
    public static BuiltTrack build(Step step, Track track) {
        String where = "step " + step.getId() + ", track " + track.getName() + ": ";
        try {
            Procedure p = track.getProcedure();
            if (p == null) {
                throw new IllegalArgumentException("no procedure");
            }
            ProcedureKind kind = installedKind(ModelSettings.procedureId(p));
            Settings settings = ModelSettings.of(p);
            ProcedureContext context = context(step, settings, stopRule(track.getStoppingRule(), kind.endsByItself()));
            ProcedureFactory f = kind.create(settings, context);
            return new BuiltTrack(step.getId(), track.getName(), f, context.task(), context.axis(), context.guessRate());
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(where + e.getMessage(), e);
        }
    }

    /**
     * @param id a procedure kind's identifier
     * @return the installed kind
     * @throws IllegalArgumentException naming the identifier and the installed kinds when none has it
     */
    public static ProcedureKind installedKind(String id) {
        return Extensions.find(ProcedureKind.class, id, ProcedureKind::id).orElseThrow(() -> new IllegalArgumentException(
                "procedure '" + id + "' is not installed (installed procedures: " + Extensions.ids(ProcedureKind.class,
                        ProcedureKind::id) + "); add the extension that provides it"));
    }

    /**
     * @return what a procedure kind learns of the step's track: its task, its axis (decibels for a LOG scale), the guess rate
     *         (the settings' {@code guessRate}, else the task's chance rate) and {@code stop}
     */
    public static ProcedureContext context(Step step, Settings settings, StopRule stop) {
        Task task = task(step.getTask());
        double guess = settings.has("guessRate") ? settings.real("guessRate") : chanceRate(step.getTask());
        Axis axis = step.getVariedQuantity() != null && step.getVariedQuantity().getScale() == Scale.LOG ? Axis.DECIBEL
                : Axis.LINEAR;
        return new ProcedureContext(task, axis, guess, stop);
    }

    /** @return the procedures' task: nAFC with its interval count, or yes/no with its catch-trial rate */
    public static Task task(limen.model.Task t) {
        if (t instanceof ForcedChoiceTask fc) {
            return new Task.ForcedChoice(fc.getIntervalCount());
        }
        if (t instanceof YesNoTask yn) {
            return new Task.YesNo(yn.getCatchTrialRate());
        }
        throw new IllegalArgumentException("unknown task " + (t == null ? "(none)" : t.eClass().getName()));
    }

    /** @return 1/n for nAFC, 0 for yes/no */
    public static double chanceRate(limen.model.Task t) {
        return t instanceof ForcedChoiceTask fc ? 1.0 / fc.getIntervalCount() : 0.0;
    }

    /** @return any-of the criteria that are set; StopRule.never() for a method that ends by itself */
    public static StopRule stopRule(StoppingRule r, boolean endsItself) {
        List<StopRule> rules = new ArrayList<>();
        if (r != null) {
            if (r.isSetMaximumReversals()) {
                rules.add(StopRule.afterReversals(r.getMaximumReversals()));
            }
            if (r.isSetMaximumTrials()) {
                rules.add(StopRule.afterTrials(r.getMaximumTrials()));
            }
            if (r.isSetPosteriorSdTarget()) {
                rules.add(StopRule.uncertaintyBelow(r.getPosteriorSdTarget()));
            }
        }
        if (rules.isEmpty()) {
            if (endsItself) {
                return StopRule.never();
            }
            throw new IllegalArgumentException("the stopping rule sets no criterion, so the track could never end");
        }
        return StopRule.anyOf(rules);
    }
}
