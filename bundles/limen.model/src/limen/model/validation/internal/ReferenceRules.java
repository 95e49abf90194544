package limen.model.validation.internal;

import static limen.model.validation.internal.Rules.num;
import static limen.model.validation.internal.Rules.report;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;

import limen.model.Battery;
import limen.model.LimenPackage.Literals;
import limen.model.QuantityUnit;
import limen.model.RelativeLevel;
import limen.model.Step;
import limen.model.StimulusKind;
import limen.model.validation.ProblemCode;

/** Invariants of {@link RelativeLevel}: what a level may refer to. */
public final class ReferenceRules {

    /** Two standard frequencies closer than this relative difference count as the same frequency. */
    static final double SAME_FREQUENCY_TOLERANCE = 1e-6;

    private ReferenceRules() {
    }

    /**
     * LM0501 step of another battery, LM0502 a step that does not run earlier in every allowed order, LM0503 a
     * step that does not measure an absolute threshold in dB SPL, LM0504 a threshold at another frequency.
     */
    public static boolean validReference(RelativeLevel level, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        Step target = level.getReference();
        Step owner = Labels.stepOf(level);
        if (target == null || target.eIsProxy() || owner == null) {
            return true; // missing or unresolved references are reported as LM0001 and LM0002
        }
        String who = Labels.of(level);
        if (!(owner.eContainer() instanceof Battery battery) || target.eContainer() != battery) {
            return report(diagnostics, ProblemCode.REFERENCE_OUTSIDE_BATTERY, level, Literals.RELATIVE_LEVEL__REFERENCE,
                    target.getId(), who + ": refers to " + Labels.of(target) + ", which is not in the same battery");
        }
        boolean ok = true;
        if (!RunOrder.alwaysBefore(battery, target, owner)) {
            String why;
            if (target == owner) {
                why = "its own result";
            } else if (battery.getSteps().indexOf(target) > battery.getSteps().indexOf(owner)) {
                why = Labels.of(target) + ", which comes later";
            } else {
                why = Labels.of(target) + ", which the " + battery.getOrdering()
                        + " ordering may run later (give both steps fixedPosition, or use FIXED ordering)";
            }
            ok &= report(diagnostics, ProblemCode.REFERENCE_NOT_EARLIER, level, Literals.RELATIVE_LEVEL__REFERENCE,
                    target.getId(), who + ": the level refers to " + why);
        }
        if (!measuresAbsoluteThreshold(target)) {
            String what = target.getStimulus() == null || target.getVariedQuantity() == null ? "nothing"
                    : target.getStimulus().getKind() + " in " + target.getVariedQuantity().getUnit();
            ok &= report(diagnostics, ProblemCode.REFERENCE_NOT_THRESHOLD, level, Literals.RELATIVE_LEVEL__REFERENCE,
                    target.getId(), who + ": refers to " + Labels.of(target) + ", which measures " + what
                            + ", not an absolute threshold in DB_SPL");
        } else if (owner.getStimulus() != null) {
            double here = owner.getStimulus().getStandardFrequencyHz();
            double there = target.getStimulus().getStandardFrequencyHz();
            if (Math.abs(here - there) > SAME_FREQUENCY_TOLERANCE * Math.max(Math.abs(here), Math.abs(there))
                    || !Double.isFinite(here - there)) {
                ok &= report(diagnostics, ProblemCode.REFERENCE_OTHER_FREQUENCY, level,
                        Literals.RELATIVE_LEVEL__REFERENCE, target.getId(), who + ": refers to the threshold at "
                                + num(there) + " Hz in " + Labels.of(target) + " but presents " + num(here) + " Hz");
            }
        }
        return ok;
    }

    /** @return whether the step measures a threshold level in dB SPL (detection in quiet or in noise) */
    static boolean measuresAbsoluteThreshold(Step step) {
        return step.getStimulus() != null && step.getVariedQuantity() != null
                && (step.getStimulus().getKind() == StimulusKind.DETECTION_QUIET
                        || step.getStimulus().getKind() == StimulusKind.DETECTION_NOISE)
                && step.getVariedQuantity().getUnit() == QuantityUnit.DB_SPL;
    }
}
