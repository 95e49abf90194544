package limen.session.refit;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import limen.model.ForcedChoiceTask;
import limen.model.Procedure;
import limen.model.Scale;
import limen.model.SessionHeader;
import limen.model.Step;
import limen.model.Track;
import limen.model.TransformedUpDownProcedure;
import limen.model.WeightedUpDownProcedure;
import limen.session.journal.JournalRow;

/**
 * Splits the verified rows of a session's journal into its tracks, with what the header's battery snapshot
 * says about each step: the chance rate of its task, the scale of its varied quantity and the reversals its
 * procedure discards.
 */
public final class SessionTracks {

    private SessionTracks() {
    }

    /**
     * @param header the session's header (its battery snapshot describes the steps)
     * @param rows   the journal rows, in order
     * @return one entry per (step position, track), in the order of their first trial
     */
    public static List<TrackData> of(SessionHeader header, List<JournalRow> rows) {
        Map<String, Step> steps = new LinkedHashMap<>();
        if (header.getBattery() != null) {
            for (Step s : header.getBattery().getSteps()) {
                steps.put(s.getId(), s);
            }
        }
        Map<String, Builder> tracks = new LinkedHashMap<>();
        for (JournalRow r : rows) {
            Builder b = tracks.computeIfAbsent(r.stepIndex() + "\u0000" + r.track(),
                    k -> new Builder(r.step(), r.stepIndex(), r.track(), r.unit(), steps.get(r.step())));
            b.add(r);
        }
        List<TrackData> out = new ArrayList<>(tracks.size());
        for (Builder b : tracks.values()) {
            out.add(b.build());
        }
        return out;
    }

    /** @return 1/n for an n-alternative forced-choice task, NaN otherwise (yes/no or unknown) */
    public static double chanceRate(Step step) {
        return step != null && step.getTask() instanceof ForcedChoiceTask fc && fc.getIntervalCount() > 0
                ? 1.0 / fc.getIntervalCount()
                : Double.NaN;
    }

    private static int discarded(Step step, String trackName) {
        if (step == null) {
            return 0;
        }
        for (Track t : step.getTracks()) {
            if (trackName.equals(t.getName())) {
                Procedure p = t.getProcedure();
                if (p instanceof TransformedUpDownProcedure tu) {
                    return Math.max(0, tu.getDiscardedReversals());
                }
                if (p instanceof WeightedUpDownProcedure w) {
                    return Math.max(0, w.getDiscardedReversals());
                }
            }
        }
        return 0;
    }

    private static final class Builder {
        final String stepId;
        final int stepIndex;
        final String track;
        final String unit;
        final Step step;
        final List<Double> values = new ArrayList<>();
        final List<Boolean> correct = new ArrayList<>();
        int catchTrials;
        int catchYes;

        Builder(String stepId, int stepIndex, String track, String unit, Step step) {
            this.stepId = stepId;
            this.stepIndex = stepIndex;
            this.track = track;
            this.unit = unit;
            this.step = step;
        }

        void add(JournalRow r) {
            if (r.catchTrial()) {
                catchTrials++;
                // correct on a catch trial means the listener said no
                if (!r.correct()) {
                    catchYes++;
                }
                return;
            }
            values.add(r.value());
            correct.add(r.correct());
        }

        TrackData build() {
            double[] v = new double[values.size()];
            boolean[] c = new boolean[v.length];
            for (int i = 0; i < v.length; i++) {
                v[i] = values.get(i);
                c[i] = correct.get(i);
            }
            boolean log = step != null && step.getVariedQuantity() != null && step.getVariedQuantity().getScale() == Scale.LOG;
            return new TrackData(stepId, stepIndex, track, unit == null ? "" : unit, chanceRate(step), log,
                    discarded(step, track), v, c, catchTrials, catchYes);
        }
    }
}
