package limen.session.refit;

import java.util.ArrayList;
import java.util.List;

import limen.fit.ConfidenceInterval;
import limen.fit.IntervalMethod;
import limen.model.QuantityUnit;
import limen.model.SessionHeader;
import limen.model.Step;
import limen.model.StimulusKind;

/**
 * Thresholds of fitted tracks by condition, for a summary across sessions and participants: the condition of
 * a step is its standard frequency (Hz) and standard stimulus kind, from the session's battery snapshot. For
 * frequency discrimination the threshold is also given as the relative difference limen Δf/f: a threshold in
 * percent divided by 100, in cents c as 2^(c/1200) - 1 (the frequency ratio minus one), in Hz divided by the
 * standard frequency. Other quantities have no relative form (NaN).
 */
public final class ConditionSummary {

    /**
     * One fitted track as a point of the summary.
     *
     * @param participant         the participant's pseudonym
     * @param session             the session folder's name
     * @param stepId              the step
     * @param track               the track
     * @param kind                the step's stimulus kind (its literal), "" when unknown
     * @param standardFrequencyHz the step's standard frequency, NaN when unknown
     * @param unit                the unit of the threshold
     * @param threshold           the fitted threshold, in {@code unit}
     * @param thresholdLow        lower end of its bootstrap interval, NaN without bootstrap
     * @param thresholdHigh       upper end, NaN without bootstrap
     * @param relative            Δf/f for frequency discrimination, NaN otherwise
     * @param relativeLow         Δf/f at the lower end, NaN when absent
     * @param relativeHigh        Δf/f at the upper end, NaN when absent
     */
    public record Point(String participant, String session, String stepId, String track, String kind,
            double standardFrequencyHz, String unit, double threshold, double thresholdLow, double thresholdHigh,
            double relative, double relativeLow, double relativeHigh) {
    }

    private ConditionSummary() {
    }

    /**
     * @param method the interval method of the refit's settings (as {@link RefitTable} reports it)
     * @return one point per fitted track of the refit (none for a skipped session)
     */
    public static List<Point> points(SessionRefit refit, SessionHeader header, IntervalMethod method) {
        List<Point> out = new ArrayList<>();
        for (TrackFit t : refit.tracks()) {
            if (t.fit() == null) {
                continue;
            }
            Step step = step(header, t.data().stepId());
            double f0 = step == null || step.getStimulus() == null ? Double.NaN : step.getStimulus().getStandardFrequencyHz();
            StimulusKind kind = step == null || step.getStimulus() == null ? null : step.getStimulus().getKind();
            QuantityUnit unit = step == null || step.getVariedQuantity() == null ? null : step.getVariedQuantity().getUnit();
            double lo = Double.NaN;
            double hi = Double.NaN;
            if (t.bootstrap() != null) {
                ConfidenceInterval ci = t.bootstrap().thresholdInterval(method);
                lo = ci.lower();
                hi = ci.upper();
            }
            double thr = t.fit().threshold();
            boolean frequency = kind == StimulusKind.FREQUENCY_DISCRIMINATION;
            out.add(new Point(refit.participant(), refit.folder().getFileName().toString(), t.data().stepId(), t.data().track(),
                    kind == null ? "" : kind.getLiteral(), f0, t.data().unit(), thr, lo, hi,
                    frequency ? relative(thr, unit, f0) : Double.NaN, frequency ? relative(lo, unit, f0) : Double.NaN,
                    frequency ? relative(hi, unit, f0) : Double.NaN));
        }
        return out;
    }

    /** @return Δf/f of a frequency difference in the given unit at standard frequency f0 (NaN when unknown) */
    public static double relative(double value, QuantityUnit unit, double f0Hz) {
        if (unit == null || Double.isNaN(value)) {
            return Double.NaN;
        }
        switch (unit) {
        case PERCENT:
            return value / 100;
        case CENTS:
            return Math.pow(2, value / 1200) - 1;
        case HZ:
            return f0Hz > 0 ? value / f0Hz : Double.NaN;
        default:
            return Double.NaN;
        }
    }

    private static Step step(SessionHeader header, String id) {
        if (header == null || header.getBattery() == null) {
            return null;
        }
        for (Step s : header.getBattery().getSteps()) {
            if (id.equals(s.getId())) {
                return s;
            }
        }
        return null;
    }
}
