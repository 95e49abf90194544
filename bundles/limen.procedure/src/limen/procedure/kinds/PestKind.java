package limen.procedure.kinds;

import limen.core.extension.Settings;
import limen.procedure.PestSettings;
import limen.procedure.ProcedureContext;
import limen.procedure.ProcedureFactory;
import limen.procedure.ProcedureKind;

/**
 * Taylor &amp; Creelman's (1967) PEST, {@code limen.pest} (see {@link PestSettings}). Settings: startValue,
 * floorValue, ceilingValue, stepMode, initialStep, minimumStep, maximumStep, waldDeviation, targetProbability.
 */
public final class PestKind implements ProcedureKind {

    @Override
    public String id() {
        return "limen.pest";
    }

    @Override
    public String title() {
        return "PEST";
    }

    @Override
    public ProcedureFactory create(Settings s, ProcedureContext context) {
        PestSettings.Builder b = PestSettings.builder().target(s.real("targetProbability")).waldLimit(s.real("waldDeviation"))
                .start(s.real("startValue")).limits(s.real("floorValue"), s.real("ceilingValue"))
                .stepLimits(s.real("minimumStep"), s.real("maximumStep")).stop(context.stopRule());
        if (Staircases.multiplicative(s)) {
            b.multiplicative(s.real("initialStep"));
        } else {
            b.additive(s.real("initialStep"));
        }
        return b.build();
    }
}
