package limen.model.validation.internal;

import java.util.Optional;

import org.eclipse.emf.ecore.EStructuralFeature;

import limen.model.ConstantStimuliProcedure;
import limen.model.LimenPackage.Literals;
import limen.model.Procedure;
import limen.model.PsiProcedure;
import limen.model.QuestProcedure;
import limen.model.Scale;
import limen.model.StaircaseProcedure;
import limen.model.Step;

/**
 * The smallest and largest value of the varied quantity a procedure can present, with the features that set
 * them (so that a problem with an extreme value points at the right setting).
 *
 * @param min the lowest value, in the quantity's unit
 * @param minFeature the feature that sets it
 * @param max the highest value, in the quantity's unit
 * @param maxFeature the feature that sets it
 */
record ValueRange(double min, EStructuralFeature minFeature, double max, EStructuralFeature maxFeature) {

    /**
     * Staircases present values in [floor, ceiling]; QUEST/ZEST place trials on their threshold grid, the prior
     * mean +- range/2 on the axis (on a LOG scale the axis is 20 log10 of the value, so the values run from
     * mean * 10^(-range/40) to mean * 10^(range/40)); Psi presents its candidate grid; constant stimuli present
     * their values. Contributed procedures are unknown here.
     *
     * @return the range, or empty when it is unknown or the settings are not numbers
     */
    static Optional<ValueRange> of(Procedure procedure, Step step) {
        ValueRange range = null;
        if (procedure instanceof StaircaseProcedure s) {
            range = new ValueRange(s.getFloorValue(), Literals.STAIRCASE_PROCEDURE__FLOOR_VALUE, s.getCeilingValue(),
                    Literals.STAIRCASE_PROCEDURE__CEILING_VALUE);
        } else if (procedure instanceof QuestProcedure q) {
            boolean log = step != null && step.getVariedQuantity() != null
                    && step.getVariedQuantity().getScale() == Scale.LOG;
            double m = q.getPriorMean();
            double half = q.getRange() / 2;
            double lo = log ? m * Math.pow(10, -half / 20) : m - half;
            double hi = log ? m * Math.pow(10, half / 20) : m + half;
            range = new ValueRange(Math.min(lo, hi), Literals.QUEST_PROCEDURE__RANGE, Math.max(lo, hi),
                    Literals.QUEST_PROCEDURE__RANGE);
        } else if (procedure instanceof PsiProcedure p) {
            range = new ValueRange(p.getStimulusMinimum(), Literals.PSI_PROCEDURE__STIMULUS_MINIMUM,
                    p.getStimulusMaximum(), Literals.PSI_PROCEDURE__STIMULUS_MAXIMUM);
        } else if (procedure instanceof ConstantStimuliProcedure c && !c.getValues().isEmpty()) {
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (double v : c.getValues()) {
                lo = Math.min(lo, v);
                hi = Math.max(hi, v);
            }
            range = new ValueRange(lo, Literals.CONSTANT_STIMULI_PROCEDURE__VALUES, hi,
                    Literals.CONSTANT_STIMULI_PROCEDURE__VALUES);
        }
        if (range == null || !Double.isFinite(range.min) || !Double.isFinite(range.max) || range.min > range.max) {
            return Optional.empty(); // invalid settings have their own diagnostics
        }
        return Optional.of(range);
    }
}
