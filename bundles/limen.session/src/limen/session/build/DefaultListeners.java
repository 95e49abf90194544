package limen.session.build;

import java.util.Locale;

import limen.model.ConstantStimuliProcedure;
import limen.model.ContributedProcedure;
import limen.model.PestProcedure;
import limen.model.Procedure;
import limen.model.PsiProcedure;
import limen.model.QuestProcedure;
import limen.model.Scale;
import limen.model.StaircaseProcedure;
import limen.model.Step;
import limen.model.StepMode;
import limen.model.Track;
import limen.model.TransformedUpDownProcedure;
import limen.model.WeightedUpDownProcedure;

/**
 * A model listener for a track when the author names none: placed where the track's settings expect
 * the threshold, so a design-time simulation says something about the settings themselves. The spec
 * (a {@code limen.psychometric.ListenerSpec}, in the quantity's unit) is:
 * <ul>
 * <li>staircases: logistic with its midpoint four initial steps below the start (divided by the factor
 * four times for multiplicative steps), never below the floor, and scale one initial step (for
 * multiplicative steps: the midpoint times ln f);</li>
 * <li>QUEST/ZEST: the procedure's own Weibull at the prior mean (on a LOG axis the Weibull in x with
 * α = prior mean, β = beta, which is the assumed Gumbel in dB; on a LINEAR axis that Gumbel itself),
 * with its lapse δ(1 − γ);</li>
 * <li>Psi: the procedure's family at the middle of the threshold grid with the geometric middle slope
 * (on a LOG axis a Weibull in x of matching spread);</li>
 * <li>constant stimuli: logistic at the middle of the value range, scale an eighth of the range;</li>
 * <li>a contributed procedure: what its kind offers ({@code ProcedureKind.defaultListener}), if anything.</li>
 * </ul>
 */
public final class DefaultListeners {

    private DefaultListeners() {
    }

    /** @return the default listener spec for this track */
    public static String specFor(Step step, Track track, double guessRate) {
        boolean log = step.getVariedQuantity() != null && step.getVariedQuantity().getScale() == Scale.LOG;
        Procedure p = track.getProcedure();
        if (p instanceof StaircaseProcedure s) {
            double step0 = initialStep(s);
            double mid;
            double scale;
            if (s.getStepMode() == StepMode.MULTIPLICATIVE) {
                mid = s.getStartValue() / Math.pow(step0, 4);
                mid = Math.max(mid, s.getFloorValue() > 0 ? s.getFloorValue() : mid);
                scale = mid * Math.log(step0);
            } else {
                mid = Math.max(s.getStartValue() - 4 * step0, s.getFloorValue());
                scale = step0;
            }
            return "logistic:mid=" + num(mid) + ",scale=" + num(scale);
        }
        if (p instanceof QuestProcedure q) {
            double lapse = q.getLapseRate() * (1 - guessRate);
            if (log) {
                return "weibull:alpha=" + num(q.getPriorMean()) + ",beta=" + num(q.getBeta()) + ",lapse=" + num(lapse);
            }
            return "gumbel:mid=" + num(q.getPriorMean()) + ",scale=" + num(20 / (q.getBeta() * Math.log(10))) + ",lapse="
                    + num(lapse);
        }
        if (p instanceof PsiProcedure ps) {
            double slope = Math.sqrt(ps.getSlopeMinimum() * ps.getSlopeMaximum());
            if (log) {
                double lo = 20 * Math.log10(ps.getThresholdMinimum());
                double hi = 20 * Math.log10(ps.getThresholdMaximum());
                double alpha = Math.pow(10, (lo + hi) / 40);
                double beta = ps.getFamily() == limen.model.PsychometricFamily.WEIBULL ? slope : 20 * slope / Math.log(10);
                return "weibull:alpha=" + num(alpha) + ",beta=" + num(beta);
            }
            double mid = (ps.getThresholdMinimum() + ps.getThresholdMaximum()) / 2;
            return switch (ps.getFamily()) {
                case WEIBULL -> "weibull:alpha=" + num(mid) + ",beta=" + num(slope);
                case CUMULATIVE_NORMAL -> "normal:mid=" + num(mid) + ",sd=" + num(1 / slope);
                default -> "logistic:mid=" + num(mid) + ",scale=" + num(1 / slope);
            };
        }
        if (p instanceof ConstantStimuliProcedure c && !c.getValues().isEmpty()) {
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (double v : c.getValues()) {
                lo = Math.min(lo, v);
                hi = Math.max(hi, v);
            }
            double range = hi > lo ? hi - lo : Math.max(Math.abs(hi), 1);
            return "logistic:mid=" + num((lo + hi) / 2) + ",scale=" + num(range / 8);
        }
        if (p instanceof ContributedProcedure c) {
            String id = ModelSettings.procedureId(c);
            java.util.Optional<String> offered = ProcedureBuilder.installedKind(id).defaultListener(ModelSettings.of(c));
            if (offered.isPresent()) {
                return offered.get();
            }
            throw new IllegalArgumentException("step " + step.getId() + ", track " + track.getName()
                    + ": procedure '" + id + "' offers no default listener; give --listener");
        }
        throw new IllegalArgumentException("step " + step.getId() + ", track " + track.getName()
                + ": no default listener for this procedure; give --listener");
    }

    private static double initialStep(StaircaseProcedure s) {
        if (s instanceof TransformedUpDownProcedure t) {
            return t.getInitialStep();
        }
        if (s instanceof WeightedUpDownProcedure w) {
            return w.getDownStep();
        }
        if (s instanceof PestProcedure p) {
            return p.getInitialStep();
        }
        throw new IllegalArgumentException("unknown staircase " + s.eClass().getName());
    }

    private static String num(double v) {
        return String.format(Locale.ROOT, "%.6g", v).replaceAll("(\\.\\d*?)0+(e|$)", "$1$2").replaceAll("\\.(e|$)", "$1");
    }
}
