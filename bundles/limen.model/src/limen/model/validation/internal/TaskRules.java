package limen.model.validation.internal;

import static limen.model.validation.internal.Rules.report;
import static limen.model.validation.internal.Rules.seconds;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;

import limen.model.ForcedChoiceTask;
import limen.model.LimenPackage.Literals;
import limen.model.Task;
import limen.model.YesNoTask;
import limen.model.validation.ProblemCode;

/** Invariants of tasks: timing, interval count and catch trials. */
public final class TaskRules {

    private TaskRules() {
    }

    /** LM0110 interval not positive, LM0112 response window not positive, LM0113 negative inter-trial interval. */
    public static boolean validTiming(Task task, DiagnosticChain diagnostics, Map<Object, Object> context) {
        boolean ok = true;
        String who = Labels.of(task);
        if (!Rules.positive(task.getIntervalDurationSeconds())) {
            ok &= report(diagnostics, ProblemCode.INTERVAL_NOT_POSITIVE, task, Literals.TASK__INTERVAL_DURATION_SECONDS,
                    task.getIntervalDurationSeconds(), who + ": interval duration "
                            + seconds(task.getIntervalDurationSeconds()) + " must be positive");
        }
        if (task.isSetResponseWindowSeconds() && !Rules.positive(task.getResponseWindowSeconds())) {
            ok &= report(diagnostics, ProblemCode.RESPONSE_WINDOW_NOT_POSITIVE, task,
                    Literals.TASK__RESPONSE_WINDOW_SECONDS, task.getResponseWindowSeconds(),
                    who + ": response window " + seconds(task.getResponseWindowSeconds())
                            + " must be positive (leave it out to wait without limit)");
        }
        if (!Rules.notNegative(task.getInterTrialIntervalSeconds())) {
            ok &= report(diagnostics, ProblemCode.ITI_NEGATIVE, task, Literals.TASK__INTER_TRIAL_INTERVAL_SECONDS,
                    task.getInterTrialIntervalSeconds(), who + ": inter-trial interval "
                            + seconds(task.getInterTrialIntervalSeconds()) + " must be 0 or more");
        }
        return ok;
    }

    /** LM0114 interval count outside 2..4, LM0111 negative inter-stimulus interval. */
    public static boolean validIntervals(ForcedChoiceTask task, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        boolean ok = true;
        if (task.getIntervalCount() < 2 || task.getIntervalCount() > 4) {
            ok &= report(diagnostics, ProblemCode.INTERVAL_COUNT, task, Literals.FORCED_CHOICE_TASK__INTERVAL_COUNT,
                    task.getIntervalCount(), Labels.of(task) + ": a forced-choice task needs 2, 3 or 4 intervals, not "
                            + task.getIntervalCount());
        }
        if (!Rules.notNegative(task.getInterStimulusIntervalSeconds())) {
            ok &= report(diagnostics, ProblemCode.ISI_NEGATIVE, task,
                    Literals.FORCED_CHOICE_TASK__INTER_STIMULUS_INTERVAL_SECONDS,
                    task.getInterStimulusIntervalSeconds(), Labels.of(task) + ": inter-stimulus interval "
                            + seconds(task.getInterStimulusIntervalSeconds()) + " must be 0 or more");
        }
        return ok;
    }

    /** LM0115 catch-trial rate outside [0, 1). */
    public static boolean validCatchTrials(YesNoTask task, DiagnosticChain diagnostics, Map<Object, Object> context) {
        double rate = task.getCatchTrialRate();
        if (rate >= 0 && rate < 1) {
            return true;
        }
        return report(diagnostics, ProblemCode.CATCH_RATE, task, Literals.YES_NO_TASK__CATCH_TRIAL_RATE, rate,
                Labels.of(task) + ": catch-trial rate " + Rules.num(rate) + " must lie in [0, 1)");
    }
}
