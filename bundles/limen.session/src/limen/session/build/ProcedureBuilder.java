package limen.session.build;

import java.util.ArrayList;
import java.util.List;

import limen.model.ConstantStimuliProcedure;
import limen.model.EstimatePlacement;
import limen.model.ForcedChoiceTask;
import limen.model.LapseMode;
import limen.model.PestProcedure;
import limen.model.Procedure;
import limen.model.PsiProcedure;
import limen.model.QuestProcedure;
import limen.model.Scale;
import limen.model.StaircaseProcedure;
import limen.model.Step;
import limen.model.StepMode;
import limen.model.StoppingRule;
import limen.model.Track;
import limen.model.TransformedUpDownProcedure;
import limen.model.WeightedUpDownProcedure;
import limen.model.YesNoTask;
import limen.procedure.Axis;
import limen.procedure.ConstantStimuliSettings;
import limen.procedure.PestSettings;
import limen.procedure.Placement;
import limen.procedure.ProcedureFactory;
import limen.procedure.PsiSettings;
import limen.procedure.QuestSettings;
import limen.procedure.StopRule;
import limen.procedure.Target;
import limen.procedure.Task;
import limen.procedure.UpDownSettings;
import limen.psychometric.Sigmoid;
import limen.psychometric.Sigmoids;

/**
 * Maps a battery's steps, tracks, procedure settings and stopping rules (the {@code limen.model}
 * classes) onto the state machines of {@code limen.procedure}. Follows the model's documentation:
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
 * <li>The guess rate, where not set, is the task's chance rate: 1/n for nAFC, 0 for yes/no.</li>
 * <li>Stopping: a track ends as soon as any criterion that is set is met; constant stimuli also end
 * by themselves.</li>
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
     * @throws IllegalArgumentException naming the step, track and setting when the settings cannot be run
     */
    public static BuiltTrack build(Step step, Track track) {
        String where = "step " + step.getId() + ", track " + track.getName() + ": ";
        try {
            Task task = task(step.getTask());
            double chance = chanceRate(step.getTask());
            Axis axis = step.getVariedQuantity() != null && step.getVariedQuantity().getScale() == Scale.LOG ? Axis.DECIBEL
                    : Axis.LINEAR;
            Procedure p = track.getProcedure();
            if (p == null) {
                throw new IllegalArgumentException("no procedure");
            }
            StoppingRule rule = track.getStoppingRule();
            boolean endsItself = p instanceof ConstantStimuliProcedure;
            StopRule stop = stopRule(rule, endsItself);
            double guess = chance;
            ProcedureFactory f;
            if (p instanceof TransformedUpDownProcedure t) {
                f = transformed(t, stop);
            } else if (p instanceof WeightedUpDownProcedure w) {
                f = weighted(w, stop);
            } else if (p instanceof PestProcedure pe) {
                f = pest(pe, stop);
            } else if (p instanceof QuestProcedure q) {
                guess = q.isSetGuessRate() ? q.getGuessRate() : chance;
                f = axis.wrap(quest(q, axis, guess, stop));
            } else if (p instanceof PsiProcedure ps) {
                guess = ps.isSetGuessRate() ? ps.getGuessRate() : chance;
                f = axis.wrap(psi(ps, axis, guess, stop));
            } else if (p instanceof ConstantStimuliProcedure c) {
                f = axis.wrap(constantStimuli(c, axis, chance));
            } else {
                throw new IllegalArgumentException("procedure " + p.eClass().getName() + " is not supported by the simulator and runner");
            }
            return new BuiltTrack(step.getId(), track.getName(), f, task, axis, guess);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(where + e.getMessage(), e);
        }
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

    private static UpDownSettings.Builder staircase(StaircaseProcedure s, double initialStep) {
        UpDownSettings.Builder b = UpDownSettings.builder().start(s.getStartValue()).limits(s.getFloorValue(), s.getCeilingValue());
        return s.getStepMode() == StepMode.MULTIPLICATIVE ? b.multiplicative(initialStep) : b.additive(initialStep);
    }

    private static ProcedureFactory transformed(TransformedUpDownProcedure t, StopRule stop) {
        UpDownSettings.Builder b = staircase(t, t.getInitialStep()).rule(t.getDownCount(), t.getUpCount())
                .threshold(t.getDiscardedReversals(), t.isSetAveragedReversals() ? t.getAveragedReversals() : 0).stop(stop);
        if (t.isSetShrinkFactor()) {
            b.shrink(t.getShrinkFactor(), Math.max(1, t.getReversalsPerShrink()));
        }
        if (t.isSetMinimumStep()) {
            b.minimumStep(t.getMinimumStep());
        }
        return b.build();
    }

    private static ProcedureFactory weighted(WeightedUpDownProcedure w, StopRule stop) {
        double ratio = w.getStepMode() == StepMode.MULTIPLICATIVE ? Math.log(w.getUpStep()) / Math.log(w.getDownStep())
                : w.getUpStep() / w.getDownStep();
        return staircase(w, w.getDownStep()).rule(1, 1).upDownStepRatio(ratio)
                .threshold(w.getDiscardedReversals(), w.isSetAveragedReversals() ? w.getAveragedReversals() : 0).stop(stop)
                .build();
    }

    private static ProcedureFactory pest(PestProcedure p, StopRule stop) {
        PestSettings.Builder b = PestSettings.builder().target(p.getTargetProbability()).waldLimit(p.getWaldDeviation())
                .start(p.getStartValue()).limits(p.getFloorValue(), p.getCeilingValue())
                .stepLimits(p.getMinimumStep(), p.getMaximumStep()).stop(stop);
        if (p.getStepMode() == StepMode.MULTIPLICATIVE) {
            b.multiplicative(p.getInitialStep());
        } else {
            b.additive(p.getInitialStep());
        }
        return b.build();
    }

    private static ProcedureFactory quest(QuestProcedure q, Axis axis, double guess, StopRule stop) {
        double mean = axis.toAxis(q.getPriorMean());
        if (!(q.getGrain() > 0) || !(q.getRange() > q.getGrain())) {
            throw new IllegalArgumentException("QUEST grid needs grain > 0 and range > grain, were " + q.getGrain() + " and " + q.getRange());
        }
        int points = (int) Math.round(q.getRange() / q.getGrain()) + 1;
        double half = (points - 1) * q.getGrain() / 2;
        double delta = q.getLapseRate();
        double target = delta * guess + (1 - delta) * (1 - (1 - guess) * Math.exp(-1));
        Placement placement = q.getPlacement() == EstimatePlacement.MODE ? Placement.MODE : Placement.MEAN;
        return QuestSettings.builder().weibullInDecibels(q.getBeta(), delta, guess).target(target)
                .grid(mean - half, mean + half, points).prior(mean, q.getPriorSd()).placement(placement).estimator(placement)
                .stop(stop).build();
    }

    private static ProcedureFactory psi(PsiProcedure p, Axis axis, double guess, StopRule stop) {
        double[] thresholds = even(axis.toAxis(p.getThresholdMinimum()), axis.toAxis(p.getThresholdMaximum()), p.getThresholdCount());
        double[] candidates = even(axis.toAxis(p.getStimulusMinimum()), axis.toAxis(p.getStimulusMaximum()), p.getStimulusCount());
        if (!(p.getSlopeMinimum() > 0) || !(p.getSlopeMaximum() > p.getSlopeMinimum()) || p.getSlopeCount() < 2) {
            throw new IllegalArgumentException("Psi slope grid needs 0 < minimum < maximum and >= 2 points, were "
                    + p.getSlopeMinimum() + ", " + p.getSlopeMaximum() + ", " + p.getSlopeCount());
        }
        double[] slopes = new double[p.getSlopeCount()];
        for (int i = 0; i < slopes.length; i++) {
            slopes[i] = p.getSlopeMinimum() * Math.pow(p.getSlopeMaximum() / p.getSlopeMinimum(), i / (slopes.length - 1.0));
        }
        Sigmoid family;
        double[] spreads = new double[slopes.length];
        switch (p.getFamily()) {
            case WEIBULL -> {
                if (axis == Axis.DECIBEL) {
                    family = Sigmoids.GUMBEL;
                    for (int i = 0; i < slopes.length; i++) {
                        spreads[slopes.length - 1 - i] = 20 / (slopes[i] * Math.log(10));
                    }
                } else {
                    family = Sigmoids.WEIBULL;
                    spreads = slopes.clone();
                }
            }
            case CUMULATIVE_NORMAL, LOGISTIC -> {
                family = p.getFamily() == limen.model.PsychometricFamily.LOGISTIC ? Sigmoids.LOGISTIC : Sigmoids.NORMAL;
                for (int i = 0; i < slopes.length; i++) {
                    spreads[slopes.length - 1 - i] = 1 / slopes[i];
                }
            }
            default -> throw new IllegalArgumentException("unknown family " + p.getFamily());
        }
        double[] lapses = p.getLapseMode() == LapseMode.MARGINALIZED ? even(p.getLapseMinimum(), p.getLapseMaximum(), p.getLapseCount())
                : new double[] {p.getLapseRate()};
        return PsiSettings.builder().family(family).guess(guess).thresholds(thresholds).spreads(spreads).lapses(lapses)
                .candidates(candidates).stop(stop).build();
    }

    private static ProcedureFactory constantStimuli(ConstantStimuliProcedure c, Axis axis, double chance) {
        double[] values = new double[c.getValues().size()];
        for (int i = 0; i < values.length; i++) {
            values[i] = axis.toAxis(c.getValues().get(i));
        }
        int reps = c.getRepetitionsPerValue();
        ConstantStimuliSettings.Builder b = ConstantStimuliSettings.builder().values(values)
                .fit(Sigmoids.LOGISTIC, chance, 0).target(Target.sigmoid(0.5));
        return (c.isBlockedShuffle() ? b.blocks(1, reps) : b.blocks(reps, 1)).build();
    }

    private static double[] even(double lo, double hi, int n) {
        if (n < 2 || !(hi > lo)) {
            throw new IllegalArgumentException("grid needs minimum < maximum and >= 2 points, was [" + lo + ", " + hi + "] with " + n);
        }
        double[] g = new double[n];
        for (int i = 0; i < n; i++) {
            g[i] = lo + (hi - lo) * i / (n - 1);
        }
        return g;
    }
}
