package limen.procedure.kinds;

import limen.core.extension.Settings;
import limen.procedure.ProcedureContext;
import limen.procedure.ProcedureFactory;
import limen.procedure.ProcedureKind;
import limen.procedure.UpDownSettings;

/**
 * Levitt's (1971) transformed up-down staircase, {@code limen.transformed-up-down}: down after
 * {@code downCount} correct in a row, up after {@code upCount} wrong; step {@code initialStep} (a difference,
 * or a factor &gt; 1 with {@code stepMode = MULTIPLICATIVE}), optionally shrunk by {@code shrinkFactor} every
 * {@code reversalsPerShrink} reversals down to {@code minimumStep}; the estimate averages
 * {@code averagedReversals} reversals after {@code discardedReversals}. Settings: startValue, floorValue,
 * ceilingValue, stepMode, downCount, upCount, initialStep, [minimumStep], [shrinkFactor], reversalsPerShrink,
 * discardedReversals, [averagedReversals] (see {@link UpDownSettings}).
 */
public final class TransformedUpDownKind implements ProcedureKind {

    @Override
    public String id() {
        return "limen.transformed-up-down";
    }

    @Override
    public String title() {
        return "Transformed up-down staircase";
    }

    @Override
    public ProcedureFactory create(Settings s, ProcedureContext context) {
        UpDownSettings.Builder b = Staircases.staircase(s, s.real("initialStep"))
                .rule(s.integer("downCount"), s.integer("upCount"))
                .threshold(s.integer("discardedReversals", 0), s.integer("averagedReversals", 0)).stop(context.stopRule());
        if (s.has("shrinkFactor")) {
            b.shrink(s.real("shrinkFactor"), Math.max(1, s.integer("reversalsPerShrink", 1)));
        }
        if (s.has("minimumStep")) {
            b.minimumStep(s.real("minimumStep"));
        }
        return b.build();
    }
}
