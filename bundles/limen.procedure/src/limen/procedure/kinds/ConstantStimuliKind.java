package limen.procedure.kinds;

import limen.core.extension.Settings;
import limen.procedure.ConstantStimuliSettings;
import limen.procedure.ProcedureContext;
import limen.procedure.ProcedureFactory;
import limen.procedure.ProcedureKind;
import limen.procedure.Target;
import limen.psychometric.Sigmoids;

/**
 * The method of constant stimuli, {@code limen.constant-stimuli}: {@code values} (quantity's unit), each
 * {@code repetitionsPerValue} times; with {@code blockedShuffle} in blocks holding each value once, otherwise
 * one shuffled block of all trials. The estimate is a logistic fit with the context's guess rate, at F = 0.5.
 * Ends by itself.
 */
public final class ConstantStimuliKind implements ProcedureKind {

    @Override
    public String id() {
        return "limen.constant-stimuli";
    }

    @Override
    public String title() {
        return "Constant stimuli";
    }

    @Override
    public boolean endsByItself() {
        return true;
    }

    @Override
    public ProcedureFactory create(Settings s, ProcedureContext context) {
        double[] values = s.reals("values");
        for (int i = 0; i < values.length; i++) {
            values[i] = context.axis().toAxis(values[i]);
        }
        int reps = s.integer("repetitionsPerValue");
        ConstantStimuliSettings.Builder b = ConstantStimuliSettings.builder().values(values)
                .fit(Sigmoids.LOGISTIC, context.guessRate(), 0).target(Target.sigmoid(0.5));
        return context.axis().wrap((s.bool("blockedShuffle", false) ? b.blocks(1, reps) : b.blocks(reps, 1)).build());
    }
}
