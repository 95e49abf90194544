package limen.procedure.kinds;

import limen.core.extension.Settings;
import limen.procedure.Placement;
import limen.procedure.ProcedureContext;
import limen.procedure.ProcedureFactory;
import limen.procedure.ProcedureKind;
import limen.procedure.QuestSettings;

/**
 * QUEST (Watson &amp; Pelli 1983) and ZEST, {@code limen.quest}, on the context's axis: a grid of
 * round(range/grain) + 1 points spaced by grain around the prior mean; Watson &amp; Pelli's Weibull in
 * decibels, ψ = δγ + (1 − δ)(1 − (1 − γ) exp(−10^{β(x − T)/20})), so the threshold T sits at
 * ψ(T) = δγ + (1 − δ)(1 − (1 − γ)/e). Settings: priorMean (quantity's unit), priorSd, grain, range (axis
 * units), beta, lapseRate, placement (MEAN or MODE; also the estimator), [guessRate] (reaches the context).
 */
public final class QuestKind implements ProcedureKind {

    @Override
    public String id() {
        return "limen.quest";
    }

    @Override
    public String title() {
        return "QUEST / ZEST";
    }

    @Override
    public ProcedureFactory create(Settings s, ProcedureContext context) {
        double mean = context.axis().toAxis(s.real("priorMean"));
        double grain = s.real("grain");
        double range = s.real("range");
        if (!(grain > 0) || !(range > grain)) {
            throw new IllegalArgumentException("QUEST grid needs grain > 0 and range > grain, were " + grain + " and " + range);
        }
        int points = (int) Math.round(range / grain) + 1;
        double half = (points - 1) * grain / 2;
        double delta = s.real("lapseRate");
        double guess = context.guessRate();
        double target = delta * guess + (1 - delta) * (1 - (1 - guess) * Math.exp(-1));
        Placement placement = s.text("placement", "MEAN").equals("MODE") ? Placement.MODE : Placement.MEAN;
        return context.axis().wrap(QuestSettings.builder().weibullInDecibels(s.real("beta"), delta, guess).target(target)
                .grid(mean - half, mean + half, points).prior(mean, s.real("priorSd")).placement(placement)
                .estimator(placement).stop(context.stopRule()).build());
    }
}
