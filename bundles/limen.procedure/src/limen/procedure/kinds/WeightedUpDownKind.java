package limen.procedure.kinds;

import limen.core.extension.Settings;
import limen.procedure.ProcedureContext;
import limen.procedure.ProcedureFactory;
import limen.procedure.ProcedureKind;

/**
 * Kaernbach's (1991) weighted up-down, {@code limen.weighted-up-down}: one step up after each wrong answer,
 * one down after each correct one, with S_up/S_down = upStep/downStep (the ratio of the logarithms with
 * {@code stepMode = MULTIPLICATIVE}). Settings: startValue, floorValue, ceilingValue, stepMode,
 * targetProbability (documentation; the steps set the target), upStep, downStep, discardedReversals,
 * [averagedReversals].
 */
public final class WeightedUpDownKind implements ProcedureKind {

    @Override
    public String id() {
        return "limen.weighted-up-down";
    }

    @Override
    public String title() {
        return "Weighted up-down staircase";
    }

    @Override
    public ProcedureFactory create(Settings s, ProcedureContext context) {
        double up = s.real("upStep");
        double down = s.real("downStep");
        double ratio = Staircases.multiplicative(s) ? Math.log(up) / Math.log(down) : up / down;
        return Staircases.staircase(s, down).rule(1, 1).upDownStepRatio(ratio)
                .threshold(s.integer("discardedReversals", 0), s.integer("averagedReversals", 0)).stop(context.stopRule())
                .build();
    }
}
