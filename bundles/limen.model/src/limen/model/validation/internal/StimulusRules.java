package limen.model.validation.internal;

import static limen.model.validation.internal.Rules.num;
import static limen.model.validation.internal.Rules.report;
import static limen.model.validation.internal.Rules.seconds;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;

import limen.model.AbsoluteLevel;
import limen.model.Level;
import limen.model.LimenPackage.Literals;
import limen.model.MaskerNoise;
import limen.model.RelativeLevel;
import limen.model.Step;
import limen.model.Stimulus;
import limen.model.StimulusKind;
import limen.model.validation.ProblemCode;

/** Invariants of {@link Stimulus} that need no calibration: the tone, the standard level and the masker. */
public final class StimulusRules {

    /** Ramps shorter than this splatter energy across frequency at the tone's on- and offset (common practice). */
    static final double SHORTEST_COMFORTABLE_RAMP_SECONDS = 0.005;

    private StimulusRules() {
    }

    /** @return whether the kind measures a difference against a standard */
    static boolean isDiscrimination(StimulusKind kind) {
        return kind == StimulusKind.FREQUENCY_DISCRIMINATION || kind == StimulusKind.INTENSITY_DISCRIMINATION;
    }

    /** LM0201 frequency not positive, LM0204 negative ramp, LM0205 ramps over half the interval, LM0206 short ramp. */
    public static boolean validTone(Stimulus stimulus, DiagnosticChain diagnostics, Map<Object, Object> context) {
        boolean ok = true;
        String who = Labels.of(stimulus);
        if (!Rules.positive(stimulus.getStandardFrequencyHz())) {
            ok &= report(diagnostics, ProblemCode.FREQUENCY_NOT_POSITIVE, stimulus,
                    Literals.STIMULUS__STANDARD_FREQUENCY_HZ, stimulus.getStandardFrequencyHz(),
                    who + ": standard frequency " + num(stimulus.getStandardFrequencyHz()) + " Hz must be positive");
        }
        double ramp = stimulus.getRampDurationSeconds();
        if (!Rules.notNegative(ramp)) {
            ok &= report(diagnostics, ProblemCode.RAMP_NEGATIVE, stimulus, Literals.STIMULUS__RAMP_DURATION_SECONDS,
                    ramp, who + ": ramp duration " + seconds(ramp) + " must be 0 or more");
            return ok;
        }
        Step step = Labels.stepOf(stimulus);
        if (step != null && step.getTask() != null && Rules.positive(step.getTask().getIntervalDurationSeconds())) {
            double interval = step.getTask().getIntervalDurationSeconds();
            if (ramp > interval / 2) {
                ok &= report(diagnostics, ProblemCode.RAMP_TOO_LONG, stimulus, Literals.STIMULUS__RAMP_DURATION_SECONDS,
                        ramp, who + ": ramp duration " + seconds(ramp) + " is longer than half the interval ("
                                + seconds(interval / 2) + " of " + seconds(interval) + ")");
            }
        }
        if (ramp < SHORTEST_COMFORTABLE_RAMP_SECONDS) {
            ok &= report(diagnostics, ProblemCode.RAMP_SHORT, stimulus, Literals.STIMULUS__RAMP_DURATION_SECONDS, ramp,
                    who + ": ramp duration " + seconds(ramp) + " is shorter than 5 ms; the on- and offsets will click");
        }
        return ok;
    }

    /** LM0210 discrimination without standard level, LM0215 detection with one, LM0216 levels not finite. */
    public static boolean validStandardLevel(Stimulus stimulus, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        boolean ok = true;
        Level level = stimulus.getStandardLevel();
        if (isDiscrimination(stimulus.getKind()) && level == null) {
            ok &= report(diagnostics, ProblemCode.STANDARD_LEVEL_MISSING, stimulus, Literals.STIMULUS__STANDARD_LEVEL,
                    null, Labels.of(stimulus) + ": " + stimulus.getKind() + " needs a standard level");
        } else if (!isDiscrimination(stimulus.getKind()) && level != null) {
            ok &= report(diagnostics, ProblemCode.STANDARD_LEVEL_IGNORED, stimulus, Literals.STIMULUS__STANDARD_LEVEL,
                    null, Labels.of(stimulus) + ": the standard level is not used by " + stimulus.getKind()
                            + " (the tracks vary the level)");
        }
        ok &= finiteLevel(level, "standard level", diagnostics);
        return ok;
    }

    /**
     * LM0230 detection in noise without masker, LM0231 masker not used, LM0232 band edges not 0 &lt; low &lt; high,
     * LM0235 tone outside the band, LM0216 masker level not finite.
     */
    public static boolean validMasker(Stimulus stimulus, DiagnosticChain diagnostics, Map<Object, Object> context) {
        boolean ok = true;
        MaskerNoise masker = stimulus.getMasker();
        boolean inNoise = stimulus.getKind() == StimulusKind.DETECTION_NOISE;
        if (inNoise && masker == null) {
            return report(diagnostics, ProblemCode.MASKER_MISSING, stimulus, Literals.STIMULUS__MASKER, null,
                    Labels.of(stimulus) + ": detection in noise needs a masker");
        }
        if (masker == null) {
            return true;
        }
        if (!inNoise) {
            ok &= report(diagnostics, ProblemCode.MASKER_IGNORED, stimulus, Literals.STIMULUS__MASKER, null,
                    Labels.of(stimulus) + ": the masker is not used by " + stimulus.getKind());
        }
        double low = masker.getLowCutoffHz();
        double high = masker.getHighCutoffHz();
        if (!Rules.positive(low) || !Rules.positive(high) || !(high > low)) {
            ok &= report(diagnostics, ProblemCode.MASKER_BAND_INVALID, masker,
                    Rules.positive(low) ? Literals.MASKER_NOISE__HIGH_CUTOFF_HZ : Literals.MASKER_NOISE__LOW_CUTOFF_HZ,
                    null, Labels.of(masker) + ": masker band " + num(low) + " to " + num(high)
                            + " Hz must have 0 < low < high");
        } else if (inNoise && Rules.positive(stimulus.getStandardFrequencyHz())
                && (stimulus.getStandardFrequencyHz() < low || stimulus.getStandardFrequencyHz() > high)) {
            ok &= report(diagnostics, ProblemCode.TONE_OUTSIDE_MASKER_BAND, masker,
                    Literals.MASKER_NOISE__LOW_CUTOFF_HZ, stimulus.getStandardFrequencyHz(),
                    Labels.of(masker) + ": the tone at " + num(stimulus.getStandardFrequencyHz())
                            + " Hz lies outside the masker band " + num(low) + " to " + num(high) + " Hz");
        }
        ok &= finiteLevel(masker.getLevel(), "masker level", diagnostics);
        return ok;
    }

    private static boolean finiteLevel(Level level, String what, DiagnosticChain diagnostics) {
        if (level instanceof AbsoluteLevel absolute && !Double.isFinite(absolute.getLevelDbSpl())) {
            return report(diagnostics, ProblemCode.LEVEL_NOT_FINITE, absolute, Literals.ABSOLUTE_LEVEL__LEVEL_DB_SPL,
                    absolute.getLevelDbSpl(), Labels.of(level) + ": " + what + " " + num(absolute.getLevelDbSpl())
                            + " dB SPL is not a finite number");
        }
        if (level instanceof RelativeLevel relative && !Double.isFinite(relative.getOffsetDb())) {
            return report(diagnostics, ProblemCode.LEVEL_NOT_FINITE, relative, Literals.RELATIVE_LEVEL__OFFSET_DB,
                    relative.getOffsetDb(), Labels.of(level) + ": " + what + " offset " + num(relative.getOffsetDb())
                            + " dB is not a finite number");
        }
        return true;
    }
}
