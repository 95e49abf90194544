package limen.model.validation.internal;

import static limen.model.validation.internal.Rules.num;
import static limen.model.validation.internal.Rules.report;

import java.util.HashSet;
import java.util.Map;
import java.util.Set;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;

import limen.model.ConstantStimuliProcedure;
import limen.model.ContributedProcedure;
import limen.model.ForcedChoiceTask;
import limen.model.LapseMode;
import limen.model.LimenPackage.Literals;
import limen.model.PestProcedure;
import limen.model.Procedure;
import limen.model.PsiProcedure;
import limen.model.QuestProcedure;
import limen.model.StaircaseProcedure;
import limen.model.Step;
import limen.model.StepMode;
import limen.model.StoppingRule;
import limen.model.Track;
import limen.model.TransformedUpDownProcedure;
import limen.model.WeightedUpDownProcedure;
import limen.model.validation.ProblemCode;

/** Invariants of the procedures and of {@link StoppingRule}. */
public final class ProcedureRules {

    /** QUEST grids with more threshold points than this are refused (range / grain). */
    static final double MAXIMUM_QUEST_GRID_POINTS = 100_000;
    /**
     * Psi grids with more evaluations per trial than this (threshold x slope x lapse x candidate points) may make
     * trials wait on computation; an estimate of a few tens of milliseconds per trial on a lab computer.
     */
    static final double LARGE_PSI_GRID = 5e6;
    /** Allowed relative mismatch between weighted up-down steps and their target (LM0310). */
    static final double WEIGHTED_RATIO_TOLERANCE = 0.01;

    private ProcedureRules() {
    }

    /** @return the chance rate of the task of the procedure's step: 1/n for nAFC, 0 for yes/no */
    static double chanceRate(EObject element) {
        Step step = Labels.stepOf(element);
        if (step != null && step.getTask() instanceof ForcedChoiceTask task && task.getIntervalCount() >= 2) {
            return 1.0 / task.getIntervalCount();
        }
        return 0;
    }

    /** LM0301 floor not below ceiling, LM0302 start outside the limits, LM0221 multiplicative with floor &lt;= 0. */
    public static boolean validLimits(StaircaseProcedure p, DiagnosticChain diagnostics, Map<Object, Object> context) {
        boolean ok = true;
        String who = Labels.of(p);
        if (!(p.getFloorValue() < p.getCeilingValue()) || !Double.isFinite(p.getCeilingValue() - p.getFloorValue())) {
            return report(diagnostics, ProblemCode.LIMITS_INVERTED, p, Literals.STAIRCASE_PROCEDURE__CEILING_VALUE,
                    p.getCeilingValue(), who + ": floor " + num(p.getFloorValue()) + " must be below ceiling "
                            + num(p.getCeilingValue()));
        }
        if (!(p.getStartValue() >= p.getFloorValue() && p.getStartValue() <= p.getCeilingValue())) {
            ok &= report(diagnostics, ProblemCode.START_OUTSIDE_LIMITS, p, Literals.STAIRCASE_PROCEDURE__START_VALUE,
                    p.getStartValue(), who + ": start value " + num(p.getStartValue()) + " lies outside ["
                            + num(p.getFloorValue()) + ", " + num(p.getCeilingValue()) + "]");
        }
        if (p.getStepMode() == StepMode.MULTIPLICATIVE && !(p.getFloorValue() > 0)) {
            ok &= report(diagnostics, ProblemCode.VALUES_NOT_POSITIVE, p, Literals.STAIRCASE_PROCEDURE__FLOOR_VALUE,
                    p.getFloorValue(), who + ": multiplicative steps need positive values, but the floor is "
                            + num(p.getFloorValue()));
        }
        return ok;
    }

    /** LM0306 counts, LM0303/LM0304 steps, LM0305 minimum above initial, LM0307 shrink rule, LM0308 reversals. */
    public static boolean validUpDownRule(TransformedUpDownProcedure p, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        boolean ok = true;
        String who = Labels.of(p);
        if (p.getDownCount() < 1 || p.getUpCount() < 1) {
            ok &= report(diagnostics, ProblemCode.UP_DOWN_COUNT, p,
                    p.getDownCount() < 1 ? Literals.TRANSFORMED_UP_DOWN_PROCEDURE__DOWN_COUNT
                            : Literals.TRANSFORMED_UP_DOWN_PROCEDURE__UP_COUNT,
                    null, who + ": a " + p.getDownCount() + "-down/" + p.getUpCount()
                            + "-up rule needs both counts to be at least 1");
        }
        boolean initialOk = step(p, p.getInitialStep(), Literals.TRANSFORMED_UP_DOWN_PROCEDURE__INITIAL_STEP,
                "initial step", diagnostics);
        ok &= initialOk;
        if (p.isSetMinimumStep()) {
            boolean minimumOk = step(p, p.getMinimumStep(), Literals.TRANSFORMED_UP_DOWN_PROCEDURE__MINIMUM_STEP,
                    "minimum step", diagnostics);
            ok &= minimumOk;
            if (initialOk && minimumOk && p.getMinimumStep() > p.getInitialStep()) {
                ok &= report(diagnostics, ProblemCode.STEP_SIZES_DISORDERED, p,
                        Literals.TRANSFORMED_UP_DOWN_PROCEDURE__MINIMUM_STEP, p.getMinimumStep(),
                        who + ": minimum step " + num(p.getMinimumStep()) + " is larger than the initial step "
                                + num(p.getInitialStep()));
            }
        }
        if (p.isSetShrinkFactor() && !(p.getShrinkFactor() > 0 && p.getShrinkFactor() <= 1)) {
            ok &= report(diagnostics, ProblemCode.SHRINK_RULE, p, Literals.TRANSFORMED_UP_DOWN_PROCEDURE__SHRINK_FACTOR,
                    p.getShrinkFactor(), who + ": shrink factor " + num(p.getShrinkFactor()) + " must lie in (0, 1]");
        } else if (p.isSetShrinkFactor() && p.getShrinkFactor() < 1 && p.getReversalsPerShrink() < 1) {
            ok &= report(diagnostics, ProblemCode.SHRINK_RULE, p,
                    Literals.TRANSFORMED_UP_DOWN_PROCEDURE__REVERSALS_PER_SHRINK, p.getReversalsPerShrink(),
                    who + ": shrinking the step by " + num(p.getShrinkFactor()) + " needs reversalsPerShrink >= 1, not "
                            + p.getReversalsPerShrink());
        }
        ok &= reversals(p, p.getDiscardedReversals(), Literals.TRANSFORMED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS,
                p.isSetAveragedReversals(), p.getAveragedReversals(),
                Literals.TRANSFORMED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS, diagnostics);
        return ok;
    }

    /**
     * LM0303/LM0304 steps, LM0309 target, LM0310 steps that converge elsewhere, LM0308 reversals. Kaernbach (1991)
     * balances the expected movement, p S_down = (1 - p) S_up, so the steps converge on p* = S_up / (S_up + S_down);
     * in MULTIPLICATIVE mode the balance holds for the logarithms of the factors.
     */
    public static boolean validWeightedSteps(WeightedUpDownProcedure p, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        boolean ok = true;
        String who = Labels.of(p);
        boolean up = step(p, p.getUpStep(), Literals.WEIGHTED_UP_DOWN_PROCEDURE__UP_STEP, "up step", diagnostics);
        boolean down = step(p, p.getDownStep(), Literals.WEIGHTED_UP_DOWN_PROCEDURE__DOWN_STEP, "down step",
                diagnostics);
        ok &= up && down;
        boolean target = targetProbability(p, p.getTargetProbability(),
                Literals.WEIGHTED_UP_DOWN_PROCEDURE__TARGET_PROBABILITY, diagnostics);
        ok &= target;
        if (up && down && target) {
            boolean log = p.getStepMode() == StepMode.MULTIPLICATIVE;
            double su = log ? Math.log(p.getUpStep()) : p.getUpStep();
            double sd = log ? Math.log(p.getDownStep()) : p.getDownStep();
            double converges = su / (su + sd);
            double want = p.getTargetProbability();
            double ratio = sd / su;
            double wanted = (1 - want) / want;
            if (Math.abs(ratio / wanted - 1) > WEIGHTED_RATIO_TOLERANCE) {
                ok &= report(diagnostics, ProblemCode.WEIGHTED_RATIO, p, Literals.WEIGHTED_UP_DOWN_PROCEDURE__DOWN_STEP,
                        p.getDownStep(), who + ": up step " + num(p.getUpStep()) + " and down step "
                                + num(p.getDownStep()) + " converge on p = " + num(converges) + ", not the target "
                                + num(want) + " (a down step of " + num(log ? Math.exp(su * wanted) : su * wanted)
                                + " would)");
            }
        }
        ok &= reversals(p, p.getDiscardedReversals(), Literals.WEIGHTED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS,
                p.isSetAveragedReversals(), p.getAveragedReversals(),
                Literals.WEIGHTED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS, diagnostics);
        return ok;
    }

    /** LM0303/LM0304 steps, LM0305 step order, LM0311 Wald limit, LM0309 target. */
    public static boolean validPestSteps(PestProcedure p, DiagnosticChain diagnostics, Map<Object, Object> context) {
        boolean ok = true;
        String who = Labels.of(p);
        boolean steps = step(p, p.getInitialStep(), Literals.PEST_PROCEDURE__INITIAL_STEP, "initial step", diagnostics);
        steps &= step(p, p.getMinimumStep(), Literals.PEST_PROCEDURE__MINIMUM_STEP, "minimum step", diagnostics);
        steps &= step(p, p.getMaximumStep(), Literals.PEST_PROCEDURE__MAXIMUM_STEP, "maximum step", diagnostics);
        ok &= steps;
        if (steps && !(p.getMinimumStep() <= p.getInitialStep() && p.getInitialStep() <= p.getMaximumStep())) {
            ok &= report(diagnostics, ProblemCode.STEP_SIZES_DISORDERED, p, Literals.PEST_PROCEDURE__INITIAL_STEP,
                    p.getInitialStep(), who + ": steps must satisfy minimum " + num(p.getMinimumStep())
                            + " <= initial " + num(p.getInitialStep()) + " <= maximum " + num(p.getMaximumStep()));
        }
        if (!Rules.positive(p.getWaldDeviation())) {
            ok &= report(diagnostics, ProblemCode.WALD_LIMIT, p, Literals.PEST_PROCEDURE__WALD_DEVIATION,
                    p.getWaldDeviation(), who + ": Wald deviation limit W = " + num(p.getWaldDeviation())
                            + " must be positive");
        }
        ok &= targetProbability(p, p.getTargetProbability(), Literals.PEST_PROCEDURE__TARGET_PROBABILITY, diagnostics);
        return ok;
    }

    /** LM0312 prior, slope and grid, LM0313 lapse, LM0314/LM0315 guess. */
    public static boolean validQuestSettings(QuestProcedure p, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        boolean ok = true;
        String who = Labels.of(p);
        if (!Double.isFinite(p.getPriorMean())) {
            ok &= quest(p, Literals.QUEST_PROCEDURE__PRIOR_MEAN, p.getPriorMean(), who + ": prior mean "
                    + num(p.getPriorMean()) + " must be a finite number", diagnostics);
        }
        ok &= positiveQuest(p, Literals.QUEST_PROCEDURE__PRIOR_SD, p.getPriorSd(), "prior sd", diagnostics);
        ok &= positiveQuest(p, Literals.QUEST_PROCEDURE__BETA, p.getBeta(), "beta", diagnostics);
        boolean grain = positiveQuest(p, Literals.QUEST_PROCEDURE__GRAIN, p.getGrain(), "grain", diagnostics);
        boolean range = positiveQuest(p, Literals.QUEST_PROCEDURE__RANGE, p.getRange(), "range", diagnostics);
        ok &= grain && range;
        if (grain && range && p.getRange() <= p.getGrain()) {
            ok &= quest(p, Literals.QUEST_PROCEDURE__RANGE, p.getRange(), who + ": range " + num(p.getRange())
                    + " must be wider than the grain " + num(p.getGrain()), diagnostics);
        } else if (grain && range && p.getRange() / p.getGrain() > MAXIMUM_QUEST_GRID_POINTS) {
            ok &= quest(p, Literals.QUEST_PROCEDURE__GRAIN, p.getGrain(), who + ": range " + num(p.getRange())
                    + " / grain " + num(p.getGrain()) + " gives " + num(p.getRange() / p.getGrain())
                    + " grid points, more than " + num(MAXIMUM_QUEST_GRID_POINTS), diagnostics);
        }
        ok &= lapse(p, p.getLapseRate(), Literals.QUEST_PROCEDURE__LAPSE_RATE, diagnostics);
        ok &= guess(p, p.isSetGuessRate(), p.getGuessRate(), p.getLapseRate(), Literals.QUEST_PROCEDURE__GUESS_RATE,
                diagnostics);
        return ok;
    }

    /** LM0316 grids, LM0318 large grid, LM0313 lapse, LM0314/LM0315 guess. */
    public static boolean validPsiGrids(PsiProcedure p, DiagnosticChain diagnostics, Map<Object, Object> context) {
        boolean ok = true;
        ok &= grid(p, "threshold", p.getThresholdMinimum(), p.getThresholdMaximum(), p.getThresholdCount(),
                Literals.PSI_PROCEDURE__THRESHOLD_MAXIMUM, Literals.PSI_PROCEDURE__THRESHOLD_COUNT, diagnostics);
        ok &= grid(p, "slope", p.getSlopeMinimum(), p.getSlopeMaximum(), p.getSlopeCount(),
                Literals.PSI_PROCEDURE__SLOPE_MAXIMUM, Literals.PSI_PROCEDURE__SLOPE_COUNT, diagnostics);
        if (!(p.getSlopeMinimum() > 0)) {
            ok &= report(diagnostics, ProblemCode.PSI_GRID, p, Literals.PSI_PROCEDURE__SLOPE_MINIMUM,
                    p.getSlopeMinimum(), Labels.of(p) + ": the slope grid is spaced logarithmically and needs a"
                            + " positive minimum, not " + num(p.getSlopeMinimum()));
        }
        ok &= grid(p, "stimulus", p.getStimulusMinimum(), p.getStimulusMaximum(), p.getStimulusCount(),
                Literals.PSI_PROCEDURE__STIMULUS_MAXIMUM, Literals.PSI_PROCEDURE__STIMULUS_COUNT, diagnostics);
        double lapsePoints = 1;
        double worstLapse;
        if (p.getLapseMode() == LapseMode.FIXED) {
            ok &= lapse(p, p.getLapseRate(), Literals.PSI_PROCEDURE__LAPSE_RATE, diagnostics);
            worstLapse = p.getLapseRate();
        } else {
            boolean bounds = lapse(p, p.getLapseMinimum(), Literals.PSI_PROCEDURE__LAPSE_MINIMUM, diagnostics);
            bounds &= lapse(p, p.getLapseMaximum(), Literals.PSI_PROCEDURE__LAPSE_MAXIMUM, diagnostics);
            ok &= bounds;
            if (bounds) {
                ok &= grid(p, "lapse", p.getLapseMinimum(), p.getLapseMaximum(), p.getLapseCount(),
                        Literals.PSI_PROCEDURE__LAPSE_MAXIMUM, Literals.PSI_PROCEDURE__LAPSE_COUNT, diagnostics);
            }
            lapsePoints = Math.max(1, p.getLapseCount());
            worstLapse = p.getLapseMaximum();
        }
        ok &= guess(p, p.isSetGuessRate(), p.getGuessRate(), worstLapse, Literals.PSI_PROCEDURE__GUESS_RATE,
                diagnostics);
        double size = (double) Math.max(1, p.getThresholdCount()) * Math.max(1, p.getSlopeCount()) * lapsePoints
                * Math.max(1, p.getStimulusCount());
        if (size > LARGE_PSI_GRID) {
            ok &= report(diagnostics, ProblemCode.PSI_GRID_LARGE, p, Literals.PSI_PROCEDURE__STIMULUS_COUNT, size,
                    Labels.of(p) + ": the grid needs " + num(size) + " evaluations per trial (threshold x slope x lapse"
                            + " x stimulus points), more than " + num(LARGE_PSI_GRID)
                            + "; trials may wait on computation");
        }
        return ok;
    }

    /** LM0317 values not finite or repeated, no repetitions. */
    public static boolean validConstantStimuli(ConstantStimuliProcedure p, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        boolean ok = true;
        Set<Double> seen = new HashSet<>();
        for (double v : p.getValues()) {
            if (!Double.isFinite(v)) {
                ok &= report(diagnostics, ProblemCode.CONSTANT_VALUES, p, Literals.CONSTANT_STIMULI_PROCEDURE__VALUES,
                        v, Labels.of(p) + ": value " + num(v) + " is not a finite number");
            } else if (!seen.add(v)) {
                ok &= report(diagnostics, ProblemCode.CONSTANT_VALUES, p, Literals.CONSTANT_STIMULI_PROCEDURE__VALUES,
                        v, Labels.of(p) + ": value " + num(v) + " is listed twice");
            }
        }
        if (p.getRepetitionsPerValue() < 1) {
            ok &= report(diagnostics, ProblemCode.CONSTANT_VALUES, p,
                    Literals.CONSTANT_STIMULI_PROCEDURE__REPETITIONS_PER_VALUE, p.getRepetitionsPerValue(),
                    Labels.of(p) + ": repetitions per value " + p.getRepetitionsPerValue() + " must be at least 1");
        }
        return ok;
    }

    /**
     * LM0401 no criterion, LM0402 criterion not positive, LM0403 nothing can end the procedure, LM0404/LM0405
     * reversal limit and estimate, LM0406 a criterion the procedure never meets, LM0407 constant stimuli cut short.
     * Staircases count reversals; QUEST, ZEST and Psi have a posterior; every procedure counts trials; constant
     * stimuli end by themselves; contributed procedures may use any criterion.
     */
    public static boolean canEnd(StoppingRule rule, DiagnosticChain diagnostics, Map<Object, Object> context) {
        Track track = Labels.trackOf(rule);
        Procedure procedure = track == null ? null : track.getProcedure();
        String who = track == null ? Labels.of(rule) : Labels.of(track);
        boolean ok = true;
        boolean reversals = rule.isSetMaximumReversals();
        boolean trials = rule.isSetMaximumTrials();
        boolean precision = rule.isSetPosteriorSdTarget();
        if (reversals && rule.getMaximumReversals() < 1) {
            ok &= report(diagnostics, ProblemCode.STOPPING_VALUE_NOT_POSITIVE, rule,
                    Literals.STOPPING_RULE__MAXIMUM_REVERSALS, rule.getMaximumReversals(),
                    who + ": maximum reversals " + rule.getMaximumReversals() + " must be at least 1");
            reversals = false;
        }
        if (trials && rule.getMaximumTrials() < 1) {
            ok &= report(diagnostics, ProblemCode.STOPPING_VALUE_NOT_POSITIVE, rule, Literals.STOPPING_RULE__MAXIMUM_TRIALS,
                    rule.getMaximumTrials(), who + ": maximum trials " + rule.getMaximumTrials() + " must be at least 1");
            trials = false;
        }
        if (precision && !Rules.positive(rule.getPosteriorSdTarget())) {
            ok &= report(diagnostics, ProblemCode.STOPPING_VALUE_NOT_POSITIVE, rule,
                    Literals.STOPPING_RULE__POSTERIOR_SD_TARGET, rule.getPosteriorSdTarget(),
                    who + ": posterior sd target " + num(rule.getPosteriorSdTarget()) + " must be positive");
            precision = false;
        }
        boolean selfEnding = procedure instanceof ConstantStimuliProcedure;
        boolean any = procedure instanceof ContributedProcedure || procedure == null;
        boolean countsReversals = procedure instanceof StaircaseProcedure;
        boolean hasPosterior = procedure instanceof QuestProcedure || procedure instanceof PsiProcedure;
        if (!rule.isSetMaximumReversals() && !rule.isSetMaximumTrials() && !rule.isSetPosteriorSdTarget()) {
            return selfEnding || report(diagnostics, ProblemCode.NO_STOPPING_CRITERION, rule, null, null,
                    who + ": the stopping rule sets no criterion (maximumReversals, maximumTrials or posteriorSdTarget)");
        }
        if (!any) {
            boolean reachable = trials || reversals && countsReversals || precision && hasPosterior || selfEnding;
            if (!reachable && ok) {
                ok &= report(diagnostics, ProblemCode.CANNOT_END, rule, criterionFeature(rule), null, who + ": a "
                        + procedure.eClass().getName() + " never meets the criteria set ("
                        + (reversals ? "reversals" : "posterior sd") + "), so the track cannot end; set maximumTrials");
            } else {
                if (reversals && !countsReversals) {
                    ok &= report(diagnostics, ProblemCode.CRITERION_NEVER_REACHED, rule,
                            Literals.STOPPING_RULE__MAXIMUM_REVERSALS, rule.getMaximumReversals(), who + ": a "
                                    + procedure.eClass().getName() + " has no reversals; maximumReversals is ignored");
                }
                if (precision && !hasPosterior) {
                    ok &= report(diagnostics, ProblemCode.CRITERION_NEVER_REACHED, rule,
                            Literals.STOPPING_RULE__POSTERIOR_SD_TARGET, rule.getPosteriorSdTarget(), who + ": a "
                                    + procedure.eClass().getName() + " has no posterior; posteriorSdTarget is ignored");
                }
            }
        }
        if (reversals) {
            ok &= reversalLimit(rule, procedure, who, diagnostics);
        }
        if (trials && procedure instanceof ConstantStimuliProcedure c
                && (long) rule.getMaximumTrials() < (long) c.getValues().size() * c.getRepetitionsPerValue()) {
            ok &= report(diagnostics, ProblemCode.CONSTANT_STIMULI_TRUNCATED, rule, Literals.STOPPING_RULE__MAXIMUM_TRIALS,
                    rule.getMaximumTrials(), who + ": maximum trials " + rule.getMaximumTrials() + " ends the track before "
                            + c.getValues().size() + " values x " + c.getRepetitionsPerValue() + " repetitions = "
                            + (long) c.getValues().size() * c.getRepetitionsPerValue() + " trials");
        }
        return ok;
    }

    private static boolean reversalLimit(StoppingRule rule, Procedure procedure, String who,
            DiagnosticChain diagnostics) {
        int discarded;
        Integer averaged;
        if (procedure instanceof TransformedUpDownProcedure t) {
            discarded = t.getDiscardedReversals();
            averaged = t.isSetAveragedReversals() ? t.getAveragedReversals() : null;
        } else if (procedure instanceof WeightedUpDownProcedure w) {
            discarded = w.getDiscardedReversals();
            averaged = w.isSetAveragedReversals() ? w.getAveragedReversals() : null;
        } else {
            return true;
        }
        int max = rule.getMaximumReversals();
        if (max <= discarded) {
            return report(diagnostics, ProblemCode.NO_REVERSALS_LEFT, rule, Literals.STOPPING_RULE__MAXIMUM_REVERSALS,
                    max, who + ": stopping after " + max + " reversals leaves none after the " + discarded
                            + " discarded ones, so there is no estimate");
        }
        if (averaged != null && averaged > max - discarded) {
            return report(diagnostics, ProblemCode.FEW_REVERSALS_TO_AVERAGE, rule,
                    Literals.STOPPING_RULE__MAXIMUM_REVERSALS, max, who + ": stopping after " + max + " reversals and "
                            + "discarding " + discarded + " leaves " + (max - discarded) + ", fewer than the " + averaged
                            + " to average");
        }
        return true;
    }

    private static EStructuralFeature criterionFeature(StoppingRule rule) {
        if (rule.isSetMaximumReversals()) {
            return Literals.STOPPING_RULE__MAXIMUM_REVERSALS;
        }
        return rule.isSetPosteriorSdTarget() ? Literals.STOPPING_RULE__POSTERIOR_SD_TARGET
                : Literals.STOPPING_RULE__MAXIMUM_TRIALS;
    }

    /** LM0303 (additive: step &gt; 0) or LM0304 (multiplicative: factor &gt; 1). */
    private static boolean step(StaircaseProcedure p, double value, EStructuralFeature feature, String what,
            DiagnosticChain diagnostics) {
        if (p.getStepMode() == StepMode.MULTIPLICATIVE) {
            if (value > 1 && value < Double.POSITIVE_INFINITY) {
                return true;
            }
            return report(diagnostics, ProblemCode.STEP_FACTOR_NOT_ABOVE_ONE, p, feature, value, Labels.of(p) + ": "
                    + what + " " + num(value) + " must be a factor above 1 for multiplicative steps");
        }
        if (Rules.positive(value)) {
            return true;
        }
        return report(diagnostics, ProblemCode.STEP_NOT_POSITIVE, p, feature, value, Labels.of(p) + ": " + what + " "
                + num(value) + " must be positive");
    }

    private static boolean reversals(EObject p, int discarded, EStructuralFeature discardedFeature, boolean averagedSet,
            int averaged, EStructuralFeature averagedFeature, DiagnosticChain diagnostics) {
        boolean ok = true;
        if (discarded < 0) {
            ok &= report(diagnostics, ProblemCode.REVERSAL_COUNTS, p, discardedFeature, discarded, Labels.of(p)
                    + ": discarded reversals " + discarded + " must be 0 or more");
        }
        if (averagedSet && averaged < 1) {
            ok &= report(diagnostics, ProblemCode.REVERSAL_COUNTS, p, averagedFeature, averaged, Labels.of(p)
                    + ": averaged reversals " + averaged + " must be at least 1 (leave it out to average all)");
        }
        return ok;
    }

    private static boolean targetProbability(EObject p, double target, EStructuralFeature feature,
            DiagnosticChain diagnostics) {
        double chance = chanceRate(p);
        if (target > chance && target < 1) {
            return true;
        }
        return report(diagnostics, ProblemCode.TARGET_PROBABILITY, p, feature, target, Labels.of(p)
                + ": target probability " + num(target) + " must lie between chance (" + num(chance) + ") and 1");
    }

    private static boolean positiveQuest(QuestProcedure p, EStructuralFeature feature, double value, String what,
            DiagnosticChain diagnostics) {
        if (Rules.positive(value)) {
            return true;
        }
        return quest(p, feature, value, Labels.of(p) + ": " + what + " " + num(value) + " must be positive",
                diagnostics);
    }

    private static boolean quest(QuestProcedure p, EStructuralFeature feature, double value, String message,
            DiagnosticChain diagnostics) {
        return report(diagnostics, ProblemCode.QUEST_SETTINGS, p, feature, value, message);
    }

    private static boolean lapse(EObject p, double lapse, EStructuralFeature feature, DiagnosticChain diagnostics) {
        if (lapse >= 0 && lapse < 0.5) {
            return true;
        }
        return report(diagnostics, ProblemCode.LAPSE_RATE, p, feature, lapse, Labels.of(p) + ": lapse rate "
                + num(lapse) + " must lie in [0, 0.5)");
    }

    private static boolean guess(EObject p, boolean set, double guess, double lapse, EStructuralFeature feature,
            DiagnosticChain diagnostics) {
        double chance = chanceRate(p);
        double effective = set ? guess : chance;
        if (set && !(guess >= 0 && guess < 1)) {
            return report(diagnostics, ProblemCode.GUESS_RATE, p, feature, guess, Labels.of(p) + ": guess rate "
                    + num(guess) + " must lie in [0, 1)");
        }
        if (effective + lapse >= 1) {
            return report(diagnostics, ProblemCode.GUESS_RATE, p, feature, effective, Labels.of(p) + ": guess rate "
                    + num(effective) + " plus lapse rate " + num(lapse) + " reaches 1, leaving no room for the function");
        }
        Step step = Labels.stepOf(p);
        if (set && step != null && step.getTask() instanceof ForcedChoiceTask && chance > 0
                && Math.abs(guess - chance) > 1e-9) {
            return report(diagnostics, ProblemCode.GUESS_RATE_NOT_CHANCE, p, feature, guess, Labels.of(p)
                    + ": guess rate " + num(guess) + " differs from the task's chance rate " + num(chance));
        }
        return true;
    }

    private static boolean grid(EObject p, String what, double min, double max, int count, EStructuralFeature maxFeature,
            EStructuralFeature countFeature, DiagnosticChain diagnostics) {
        boolean ok = true;
        if (!(min < max) || !Double.isFinite(max - min)) {
            ok &= report(diagnostics, ProblemCode.PSI_GRID, p, maxFeature, max, Labels.of(p) + ": the " + what
                    + " grid needs minimum " + num(min) + " < maximum " + num(max));
        }
        if (count < 2) {
            ok &= report(diagnostics, ProblemCode.PSI_GRID, p, countFeature, count, Labels.of(p) + ": the " + what
                    + " grid needs at least 2 points, not " + count);
        }
        return ok;
    }
}
