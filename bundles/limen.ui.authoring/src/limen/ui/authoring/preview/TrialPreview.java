package limen.ui.authoring.preview;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;

import limen.model.AbsoluteLevel;
import limen.model.ConstantStimuliProcedure;
import limen.model.ForcedChoiceTask;
import limen.model.Level;
import limen.model.Procedure;
import limen.model.PsiProcedure;
import limen.model.QuestProcedure;
import limen.model.RelativeLevel;
import limen.model.StaircaseProcedure;
import limen.model.Step;
import limen.procedure.TrialPlan;
import limen.session.BatteryTrialRenderer;
import limen.session.CalibrationMapping;
import limen.signal.Calibration;
import limen.signal.CheckedStimulus;
import limen.signal.IntervalMark;
import limen.signal.LevelRefusedException;
import limen.signal.SafetyGuard;
import limen.signal.Spectrum;
import limen.signal.Stimulus;

/**
 * One trial of a step, rendered as a session would render it ({@link BatteryTrialRenderer}: the real
 * synthesis through the calibration) and checked by the calibration's {@link SafetyGuard}, with the numbers the
 * preview plots: each interval's spectrum in dB SPL and its dominant frequency.
 * <p>
 * Spectrum levels: the Hann-windowed amplitude spectrum of the interval's samples ({@link Spectrum}), each
 * bin's sine-equivalent level {@code 20 log10 A_k} dBFS turned into dB SPL by the calibration at the bin's
 * frequency ({@link Calibration#levelDbSpl}); bins outside the calibrated range are left out. A tone between
 * bins reads up to 1.42 dB low (Hann scalloping loss; Harris 1978, Proc. IEEE 66(1), Table 1).
 */
public final class TrialPreview {

    /**
     * The numbers of one interval.
     *
     * @param index 0-based interval
     * @param target whether it holds the target
     * @param onsetSeconds start of its sound in the trial
     * @param offsetSeconds end of its sound
     * @param dominantFrequencyHz the refined dominant frequency of its samples (0 for silence)
     * @param peakLevelDbSpl the spectrum's highest level, dB SPL (-Infinity for silence)
     * @param frequencyHz the spectrum's bin frequencies inside the calibrated range
     * @param levelDbSpl the levels of those bins
     */
    public record Interval(int index, boolean target, double onsetSeconds, double offsetSeconds,
            double dominantFrequencyHz, double peakLevelDbSpl, double[] frequencyHz, double[] levelDbSpl) {
    }

    /**
     * A rendered trial.
     *
     * @param plan the trial's value, intervals and target interval
     * @param standardLevelDbSpl the standard level used (a relative level resolved against the assumed threshold)
     * @param calibration the calibration rendered and checked against
     * @param stimulus the rendered buffer (drawn even when the guard refused it; never played then)
     * @param checked the guard's result, or null when it refused
     * @param refusal the guard's message (requested and allowed levels), or null
     * @param intervals the per-interval numbers
     */
    public record Result(TrialPlan plan, double standardLevelDbSpl, Calibration calibration, Stimulus stimulus,
            CheckedStimulus checked, String refusal, List<Interval> intervals) {

        /** @return the channel the step's sound is in (left unless only the right ear is driven) */
        public int channel() {
            for (int c = 0; c < 2; c++) {
                for (int n = 0; n < stimulus.length(); n += 8) {
                    if (stimulus.sample(c, n) != 0) {
                        return c;
                    }
                }
            }
            return 0;
        }
    }

    private TrialPreview() {
    }

    /**
     * @return the value a preview starts at: the first track's start value (staircases), prior mean (QUEST),
     *         middle of the stimulus range (Psi), largest value (constant stimuli), else 0
     */
    public static double defaultValue(Step step) {
        if (step.getTracks().isEmpty()) {
            return 0;
        }
        Procedure p = step.getTracks().get(0).getProcedure();
        if (p instanceof StaircaseProcedure s) {
            return s.getStartValue();
        }
        if (p instanceof QuestProcedure q) {
            return q.getPriorMean();
        }
        if (p instanceof PsiProcedure ps) {
            return (ps.getStimulusMinimum() + ps.getStimulusMaximum()) / 2;
        }
        if (p instanceof ConstantStimuliProcedure c && !c.getValues().isEmpty()) {
            return c.getValues().stream().mapToDouble(Double::doubleValue).max().orElse(0);
        }
        return 0;
    }

    /** @return the number of intervals of the step's trials (1 for yes/no) */
    public static int intervals(Step step) {
        return step.getTask() instanceof ForcedChoiceTask fc ? Math.max(1, fc.getIntervalCount()) : 1;
    }

    /** @return the step this step's relative standard level refers to, or null */
    public static Step referenceOf(Step step) {
        Level level = step.getStimulus() == null ? null : step.getStimulus().getStandardLevel();
        return level instanceof RelativeLevel r ? r.getReference() : null;
    }

    /**
     * Renders and checks one trial.
     *
     * @param step the step
     * @param value the varied quantity's value, in its unit
     * @param targetInterval 0-based interval of the target (ignored for yes/no)
     * @param calibration the calibration (the model's, as the lab measured it)
     * @param assumedThresholdDbSpl for a standard level relative to an earlier threshold: that threshold
     * @param seed randomness for noise
     * @return the trial with its numbers
     * @throws IllegalArgumentException when the step or calibration cannot be rendered (naming why)
     */
    public static Result render(Step step, double value, int targetInterval, limen.model.Calibration calibration,
            double assumedThresholdDbSpl, long seed) {
        Calibration cal = CalibrationMapping.toSignal(calibration);
        int n = intervals(step);
        TrialPlan plan = n > 1 ? new TrialPlan(value, n, Math.max(0, Math.min(n - 1, targetInterval)), false)
                : new TrialPlan(value, 1, 0, false);
        Level level = step.getStimulus().getStandardLevel();
        double standard = level instanceof AbsoluteLevel a ? a.getLevelDbSpl()
                : level instanceof RelativeLevel r ? assumedThresholdDbSpl + r.getOffsetDb() : 0;
        Stimulus stimulus = new BatteryTrialRenderer(cal).render(step, plan, standard, new SplittableRandom(seed));
        CheckedStimulus checked = null;
        String refusal = null;
        try {
            checked = new SafetyGuard(cal).check(stimulus);
        } catch (LevelRefusedException e) {
            refusal = e.getMessage();
        }
        Result partial = new Result(plan, standard, cal, stimulus, checked, refusal, List.of());
        int channel = partial.channel();
        double[] x = stimulus.channel(channel);
        List<Interval> intervals = new ArrayList<>();
        for (IntervalMark m : stimulus.intervals()) {
            intervals.add(interval(m, Arrays.copyOfRange(x, m.onsetSample(), m.offsetSample()), cal,
                    stimulus.sampleRateHz()));
        }
        return new Result(plan, standard, cal, stimulus, checked, refusal, intervals);
    }

    private static Interval interval(IntervalMark m, double[] x, Calibration cal, int fs) {
        double on = m.onsetSeconds(fs);
        double off = m.offsetSeconds(fs);
        boolean silent = Arrays.stream(x).allMatch(v -> v == 0);
        if (x.length < 2 || silent) {
            return new Interval(m.index(), m.target(), on, off, 0, Double.NEGATIVE_INFINITY, new double[0], new double[0]);
        }
        Spectrum s = Spectrum.of(x, fs);
        List<double[]> bins = new ArrayList<>();
        double peak = Double.NEGATIVE_INFINITY;
        for (int k = 1; k < s.bins(); k++) {
            double f = s.frequencyHz(k);
            if (!cal.covers(f)) {
                continue;
            }
            double db = cal.levelDbSpl(s.levelDbfs(k), f);
            bins.add(new double[] {f, db});
            peak = Math.max(peak, db);
        }
        double[] fHz = new double[bins.size()];
        double[] dB = new double[bins.size()];
        for (int i = 0; i < fHz.length; i++) {
            fHz[i] = bins.get(i)[0];
            dB[i] = bins.get(i)[1];
        }
        return new Interval(m.index(), m.target(), on, off, s.dominantFrequencyHz(), peak, fHz, dB);
    }
}
