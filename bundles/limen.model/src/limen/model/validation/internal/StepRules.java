package limen.model.validation.internal;

import static limen.model.validation.internal.Rules.num;
import static limen.model.validation.internal.Rules.report;

import java.util.EnumSet;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;

import limen.model.AbsoluteLevel;
import limen.model.Calibration;
import limen.model.ContributedProcedure;
import limen.model.Level;
import limen.model.LimenPackage.Literals;
import limen.model.MaskerNoise;
import limen.model.QuantityUnit;
import limen.model.RelativeLevel;
import limen.model.Scale;
import limen.model.Step;
import limen.model.Stimulus;
import limen.model.StimulusKind;
import limen.model.Track;
import limen.model.VariedQuantity;
import limen.model.validation.ProblemCode;
import limen.model.validation.ValidationContext;

/** Invariants of {@link Step}: the varied quantity, and levels and frequencies against the calibration. */
public final class StepRules {

    private StepRules() {
    }

    /** @return the units that fit a stimulus kind */
    static Set<QuantityUnit> unitsFor(StimulusKind kind) {
        return switch (kind) {
            case FREQUENCY_DISCRIMINATION -> EnumSet.of(QuantityUnit.HZ, QuantityUnit.PERCENT, QuantityUnit.CENTS);
            case INTENSITY_DISCRIMINATION -> EnumSet.of(QuantityUnit.DB);
            case DETECTION_QUIET, DETECTION_NOISE -> EnumSet.of(QuantityUnit.DB_SPL);
        };
    }

    /** LM0220 unit does not fit the kind, LM0221 log scale with values &lt;= 0, LM0223 negative differences. */
    public static boolean consistentQuantity(Step step, DiagnosticChain diagnostics, Map<Object, Object> context) {
        VariedQuantity quantity = step.getVariedQuantity();
        Stimulus stimulus = step.getStimulus();
        if (quantity == null || stimulus == null) {
            return true;
        }
        boolean ok = true;
        if (!unitsFor(stimulus.getKind()).contains(quantity.getUnit())) {
            ok &= report(diagnostics, ProblemCode.UNIT_DOES_NOT_FIT_KIND, quantity, Literals.VARIED_QUANTITY__UNIT,
                    quantity.getUnit(), Labels.of(step) + ": unit " + quantity.getUnit() + " does not fit "
                            + stimulus.getKind() + " (use " + unitsFor(stimulus.getKind()) + ")");
        }
        for (Track track : step.getTracks()) {
            Optional<ValueRange> range = ValueRange.of(track.getProcedure(), step);
            if (range.isEmpty()) {
                continue;
            }
            ValueRange r = range.get();
            if (quantity.getScale() == Scale.LOG && !(r.min() > 0)) {
                ok &= report(diagnostics, ProblemCode.VALUES_NOT_POSITIVE, track.getProcedure(), r.minFeature(),
                        r.min(), Labels.of(track) + ": values down to " + num(r.min())
                                + " cannot lie on a LOG scale, which needs positive values");
            }
            if (StimulusRules.isDiscrimination(stimulus.getKind()) && r.min() < 0) {
                ok &= report(diagnostics, ProblemCode.NEGATIVE_DIFFERENCE, track.getProcedure(), r.minFeature(),
                        r.min(), Labels.of(track) + ": can present a difference of " + num(r.min()) + " "
                                + quantity.getUnit() + "; a discrimination difference must not be negative");
            }
        }
        return ok;
    }

    /**
     * LM0211 fixed level above the ceiling, LM0212 relative level that may exceed it, LM0213 level above the
     * full-scale output, LM0214 track maximum above the ceiling, LM0804 contributed procedures not checked.
     */
    public static boolean levelsWithinCeiling(Step step, DiagnosticChain diagnostics, Map<Object, Object> context) {
        Calibration calibration = ValidationContext.calibration(step, context);
        Stimulus stimulus = step.getStimulus();
        VariedQuantity quantity = step.getVariedQuantity();
        if (calibration == null || stimulus == null || quantity == null
                || !Rules.positive(calibration.getCeilingDbSpl())) {
            return true;
        }
        LevelCheck check = new LevelCheck(calibration, diagnostics);
        double f0 = stimulus.getStandardFrequencyHz();
        double fullScale = Rules.positive(f0) ? check.curve.fullScaleDbSpl(f0) : Double.NaN;
        StimulusKind kind = stimulus.getKind();
        boolean ok = true;
        if (StimulusRules.isDiscrimination(kind) && stimulus.getStandardLevel() != null) {
            ok &= check.fixed(stimulus.getStandardLevel(), "standard level", fullScale);
        }
        MaskerNoise masker = stimulus.getMasker();
        if (kind == StimulusKind.DETECTION_NOISE && masker != null && masker.getLevel() != null) {
            ok &= check.fixed(masker.getLevel(), "masker level", Double.NaN);
        }
        boolean variesLevel = kind == StimulusKind.INTENSITY_DISCRIMINATION && quantity.getUnit() == QuantityUnit.DB
                || !StimulusRules.isDiscrimination(kind) && quantity.getUnit() == QuantityUnit.DB_SPL;
        for (Track track : step.getTracks()) {
            if (track.getProcedure() instanceof ContributedProcedure contributed && variesLevel) {
                String by = contributed.getSettings() == null ? "?" : contributed.getSettings().getContributorId();
                ok &= report(diagnostics, ProblemCode.CONTRIBUTED_NOT_CHECKED, contributed,
                        Literals.CONTRIBUTED_PROCEDURE__SETTINGS, by, Labels.of(track) + ": the levels of the procedure"
                                + " contributed by '" + by + "' cannot be checked against the ceiling here;"
                                + " the safety guard still refuses louder trials");
                continue;
            }
            Optional<ValueRange> range = ValueRange.of(track.getProcedure(), step);
            if (range.isEmpty() || !variesLevel) {
                continue;
            }
            ValueRange r = range.get();
            if (kind == StimulusKind.INTENSITY_DISCRIMINATION) {
                ok &= check.increment(stimulus.getStandardLevel(), r, track, fullScale);
            } else {
                ok &= check.top(r.max(), track.getProcedure(), r.maxFeature(),
                        Labels.of(track) + ": the track can present up to " + num(r.max()) + " dB SPL", fullScale);
            }
        }
        return ok;
    }

    /** LM0202 at or above Nyquist, LM0203 outside the calibrated frequencies (tone, comparison, masker band). */
    public static boolean frequenciesWithinRange(Step step, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        Calibration calibration = ValidationContext.calibration(step, context);
        Stimulus stimulus = step.getStimulus();
        if (calibration == null || stimulus == null || !Rules.positive(stimulus.getStandardFrequencyHz())) {
            return true;
        }
        CalibrationCurve curve = CalibrationCurve.of(calibration);
        FrequencyCheck check = new FrequencyCheck(calibration, curve, diagnostics);
        double f0 = stimulus.getStandardFrequencyHz();
        boolean ok = check.frequency(f0, stimulus, Literals.STIMULUS__STANDARD_FREQUENCY_HZ,
                Labels.of(stimulus) + ": standard frequency");
        VariedQuantity quantity = step.getVariedQuantity();
        if (stimulus.getKind() == StimulusKind.FREQUENCY_DISCRIMINATION && quantity != null) {
            for (Track track : step.getTracks()) {
                Optional<ValueRange> range = ValueRange.of(track.getProcedure(), step);
                if (range.isPresent()) {
                    ValueRange r = range.get();
                    double top = comparisonHz(f0, r.max(), quantity.getUnit());
                    double bottom = comparisonHz(f0, r.min(), quantity.getUnit());
                    ok &= check.frequency(top, track.getProcedure(), r.maxFeature(),
                            Labels.of(track) + ": comparison frequency (standard + " + num(r.max()) + " "
                                    + quantity.getUnit() + ")");
                    ok &= check.frequency(bottom, track.getProcedure(), r.minFeature(),
                            Labels.of(track) + ": comparison frequency (standard + " + num(r.min()) + " "
                                    + quantity.getUnit() + ")");
                }
            }
        }
        MaskerNoise masker = stimulus.getMasker();
        if (stimulus.getKind() == StimulusKind.DETECTION_NOISE && masker != null
                && Rules.positive(masker.getLowCutoffHz()) && masker.getHighCutoffHz() > masker.getLowCutoffHz()) {
            ok &= check.frequency(masker.getLowCutoffHz(), masker, Literals.MASKER_NOISE__LOW_CUTOFF_HZ,
                    Labels.of(masker) + ": masker lower edge");
            ok &= check.frequency(masker.getHighCutoffHz(), masker, Literals.MASKER_NOISE__HIGH_CUTOFF_HZ,
                    Labels.of(masker) + ": masker upper edge");
        }
        return ok;
    }

    /**
     * The comparison tone of a frequency discrimination trial: f0 + d (Hz), f0 (1 + d/100) (percent) or
     * f0 2^(d/1200) (cents, 1200 to the octave).
     */
    static double comparisonHz(double standardHz, double difference, QuantityUnit unit) {
        return switch (unit) {
            case PERCENT -> standardHz * (1 + difference / 100);
            case CENTS -> standardHz * Math.pow(2, difference / 1200);
            default -> standardHz + difference;
        };
    }

    /**
     * @return the highest threshold the step can report (the largest value its tracks can present), or NaN when
     *         the step does not measure an absolute threshold or its range is unknown
     */
    static double highestThresholdDbSpl(Step step) {
        if (step == null || step.eIsProxy() || !ReferenceRules.measuresAbsoluteThreshold(step)) {
            return Double.NaN;
        }
        double top = Double.NaN;
        for (Track track : step.getTracks()) {
            Optional<ValueRange> range = ValueRange.of(track.getProcedure(), step);
            if (range.isEmpty()) {
                return Double.NaN;
            }
            top = Double.isNaN(top) ? range.get().max() : Math.max(top, range.get().max());
        }
        return top;
    }

    /** Level checks against one calibration's ceiling and full-scale output. */
    private static final class LevelCheck {
        final Calibration calibration;
        final CalibrationCurve curve;
        final double ceiling;
        final DiagnosticChain diagnostics;

        LevelCheck(Calibration calibration, DiagnosticChain diagnostics) {
            this.calibration = calibration;
            this.curve = CalibrationCurve.of(calibration);
            this.ceiling = calibration.getCeilingDbSpl();
            this.diagnostics = diagnostics;
        }

        private String ceilingText() {
            return "the ceiling of " + num(ceiling) + " dB SPL of " + Labels.of(calibration);
        }

        boolean fixed(Level level, String what, double fullScale) {
            if (level instanceof AbsoluteLevel absolute) {
                double l = absolute.getLevelDbSpl();
                if (l > ceiling) {
                    return report(diagnostics, ProblemCode.LEVEL_ABOVE_CEILING, absolute,
                            Literals.ABSOLUTE_LEVEL__LEVEL_DB_SPL, l,
                            Labels.of(level) + ": " + what + " " + num(l) + " dB SPL is above " + ceilingText());
                }
                if (l > fullScale) {
                    return report(diagnostics, ProblemCode.LEVEL_ABOVE_FULL_SCALE, absolute,
                            Literals.ABSOLUTE_LEVEL__LEVEL_DB_SPL, l, Labels.of(level) + ": " + what + " " + num(l)
                                    + " dB SPL needs more than the full-scale output of " + num(fullScale)
                                    + " dB SPL at that frequency");
                }
            } else if (level instanceof RelativeLevel relative) {
                double worst = highestThresholdDbSpl(relative.getReference()) + relative.getOffsetDb();
                if (worst > ceiling) {
                    return report(diagnostics, ProblemCode.RELATIVE_LEVEL_MAY_EXCEED_CEILING, relative,
                            Literals.RELATIVE_LEVEL__OFFSET_DB, relative.getOffsetDb(), Labels.of(level) + ": " + what
                                    + " " + num(relative.getOffsetDb()) + " dB above the threshold in "
                                    + Labels.of(relative.getReference()) + " can reach " + num(worst)
                                    + " dB SPL, above " + ceilingText() + "; the safety guard will refuse such trials");
                }
            }
            return true;
        }

        boolean increment(Level standard, ValueRange r, Track track, double fullScale) {
            if (standard instanceof AbsoluteLevel absolute) {
                double top = absolute.getLevelDbSpl() + r.max();
                return top(top, track.getProcedure(), r.maxFeature(), Labels.of(track) + ": standard "
                        + num(absolute.getLevelDbSpl()) + " dB SPL + increment up to " + num(r.max()) + " dB gives "
                        + num(top) + " dB SPL", fullScale);
            }
            if (standard instanceof RelativeLevel relative) {
                double base = highestThresholdDbSpl(relative.getReference()) + relative.getOffsetDb();
                if (base <= ceiling && base + r.max() > ceiling) {
                    return report(diagnostics, ProblemCode.RELATIVE_LEVEL_MAY_EXCEED_CEILING, track.getProcedure(),
                            r.maxFeature(), r.max(), Labels.of(track) + ": the relative standard plus an increment up to "
                                    + num(r.max()) + " dB can reach " + num(base + r.max()) + " dB SPL, above "
                                    + ceilingText() + "; the safety guard will refuse such trials");
                }
            }
            return true;
        }

        boolean top(double top, EObject element, EStructuralFeature feature, String what, double fullScale) {
            if (top > ceiling) {
                return report(diagnostics, ProblemCode.VARIED_LEVEL_ABOVE_CEILING, element, feature, top,
                        what + ", above " + ceilingText());
            }
            if (top > fullScale) {
                return report(diagnostics, ProblemCode.LEVEL_ABOVE_FULL_SCALE, element, feature, top,
                        what + ", more than the full-scale output of " + num(fullScale) + " dB SPL at that frequency");
            }
            return true;
        }
    }

    /** Frequency checks against one calibration's sample rate and calibrated range. */
    private record FrequencyCheck(Calibration calibration, CalibrationCurve curve, DiagnosticChain diagnostics) {
        boolean frequency(double f, EObject element, EStructuralFeature feature, String what) {
            double nyquist = curve.nyquistHz();
            if (f >= nyquist) {
                return report(diagnostics, ProblemCode.ABOVE_NYQUIST, element, feature, f, what + " " + num(f)
                        + " Hz is not below the Nyquist frequency " + num(nyquist) + " Hz of " + Labels.of(calibration)
                        + " (sample rate " + calibration.getSampleRateHz() + " Hz)");
            }
            if (!curve.isEmpty() && !curve.covers(f)) {
                return report(diagnostics, ProblemCode.OUTSIDE_CALIBRATED_RANGE, element, feature, f, what + " "
                        + num(f) + " Hz lies outside the calibrated range " + num(curve.lowestHz()) + " to "
                        + num(curve.highestHz()) + " Hz of " + Labels.of(calibration));
            }
            return true;
        }
    }
}
