package limen.procedure.kinds;

import limen.core.extension.Settings;
import limen.procedure.Axis;
import limen.procedure.ProcedureContext;
import limen.procedure.ProcedureFactory;
import limen.procedure.ProcedureKind;
import limen.procedure.PsiSettings;
import limen.psychometric.Sigmoid;
import limen.psychometric.Sigmoids;

/**
 * Kontsevich &amp; Tyler's (1999) Psi method, {@code limen.psi}, on the context's axis. Slopes are log-spaced;
 * a LOGISTIC or CUMULATIVE_NORMAL slope s is the reciprocal of the spread (scale or SD = 1/s, axis units); a
 * WEIBULL slope is the Weibull shape β: on a decibel axis that is a Gumbel of scale 20/(β ln 10) dB, on a
 * linear axis the Weibull itself. Settings: family, thresholdMinimum, thresholdMaximum, thresholdCount,
 * stimulusMinimum, stimulusMaximum, stimulusCount (quantity's unit), slopeMinimum, slopeMaximum, slopeCount,
 * lapseMode (FIXED or MARGINALIZED), lapseRate, lapseMinimum, lapseMaximum, lapseCount, [guessRate].
 */
public final class PsiKind implements ProcedureKind {

    @Override
    public String id() {
        return "limen.psi";
    }

    @Override
    public String title() {
        return "Psi";
    }

    @Override
    public ProcedureFactory create(Settings s, ProcedureContext context) {
        Axis axis = context.axis();
        double[] thresholds = Grids.even(axis.toAxis(s.real("thresholdMinimum")), axis.toAxis(s.real("thresholdMaximum")),
                s.integer("thresholdCount"));
        double[] candidates = Grids.even(axis.toAxis(s.real("stimulusMinimum")), axis.toAxis(s.real("stimulusMaximum")),
                s.integer("stimulusCount"));
        double lo = s.real("slopeMinimum");
        double hi = s.real("slopeMaximum");
        int n = s.integer("slopeCount");
        if (!(lo > 0) || !(hi > lo) || n < 2) {
            throw new IllegalArgumentException("Psi slope grid needs 0 < minimum < maximum and >= 2 points, were " + lo + ", "
                    + hi + ", " + n);
        }
        double[] slopes = new double[n];
        for (int i = 0; i < n; i++) {
            slopes[i] = lo * Math.pow(hi / lo, i / (n - 1.0));
        }
        String name = s.text("family", "LOGISTIC");
        Sigmoid family;
        double[] spreads = new double[n];
        switch (name) {
            case "WEIBULL" -> {
                if (axis == Axis.DECIBEL) {
                    family = Sigmoids.GUMBEL;
                    for (int i = 0; i < n; i++) {
                        spreads[n - 1 - i] = 20 / (slopes[i] * Math.log(10));
                    }
                } else {
                    family = Sigmoids.WEIBULL;
                    spreads = slopes.clone();
                }
            }
            case "LOGISTIC", "CUMULATIVE_NORMAL" -> {
                family = name.equals("LOGISTIC") ? Sigmoids.LOGISTIC : Sigmoids.NORMAL;
                for (int i = 0; i < n; i++) {
                    spreads[n - 1 - i] = 1 / slopes[i];
                }
            }
            default -> throw new IllegalArgumentException("setting 'family' = " + name
                    + " is not LOGISTIC, CUMULATIVE_NORMAL or WEIBULL");
        }
        double[] lapses = s.text("lapseMode", "FIXED").equals("MARGINALIZED")
                ? Grids.even(s.real("lapseMinimum"), s.real("lapseMaximum"), s.integer("lapseCount"))
                : new double[] {s.real("lapseRate")};
        return axis.wrap(PsiSettings.builder().family(family).guess(context.guessRate()).thresholds(thresholds)
                .spreads(spreads).lapses(lapses).candidates(candidates).stop(context.stopRule()).build());
    }
}
