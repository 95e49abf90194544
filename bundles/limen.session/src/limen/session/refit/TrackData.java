package limen.session.refit;

import java.util.Arrays;
import java.util.Map;
import java.util.TreeMap;

import limen.fit.BinomialData;

/**
 * The trials of one track of one step of a stored session, in journal order, and their pooled binomial
 * cells. Catch trials (no signal) are kept apart: they carry no information about the psychometric function
 * of the signal and are only counted. Immutable.
 *
 * @param stepId             the step's identifier in the battery
 * @param stepIndex          1-based position of the step in the participant's order
 * @param track              the track's name
 * @param unit               unit of the values as written in the journal
 * @param chanceRate         1/n for an n-alternative forced-choice task, NaN for yes/no or an unknown step
 * @param logScale           whether the step varies its quantity on a log scale (reversals are then averaged
 *                           geometrically)
 * @param discardedReversals how many leading reversals the battery says to drop from the staircase estimate
 * @param values             the presented values of the signal trials, in order
 * @param correct            whether each signal trial was answered correctly ("yes" for yes/no)
 * @param catchTrials        number of catch trials of the track
 * @param catchYes           how many of them drew a "yes" (false alarms)
 */
public record TrackData(String stepId, int stepIndex, String track, String unit, double chanceRate, boolean logScale,
        int discardedReversals, double[] values, boolean[] correct, int catchTrials, int catchYes) {

    public TrackData {
        if (values.length != correct.length) {
            throw new IllegalArgumentException("values and correct differ in length: " + values.length + ", " + correct.length);
        }
        if (discardedReversals < 0) {
            throw new IllegalArgumentException("discarded reversals must be >= 0, was " + discardedReversals);
        }
        values = values.clone();
        correct = correct.clone();
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    @Override
    public boolean[] correct() {
        return correct.clone();
    }

    /** @return the number of signal trials */
    public int trials() {
        return values.length;
    }

    /** Relative difference below which two recorded values are one stimulus level (rounding, not design). */
    public static final double SAME_LEVEL_RELATIVE = 1e-9;

    /**
     * Pools the signal trials by value: one cell per stimulus level, in increasing order of value, with its trial
     * and correct counts. Values within {@link #SAME_LEVEL_RELATIVE} of the cell's smallest value are one level:
     * a multiplicative staircase reaches a level along different paths whose products differ only by rounding
     * (e.g. 0.5949143382517145 and 0.5949143382517146), and splitting them would make two cells of one level
     * (and, in near-step data, a spurious ridge for the fit). The cell keeps the smallest value.
     *
     * @throws IllegalArgumentException when the track has no signal trials
     */
    public BinomialData pooled() {
        Map<Double, int[]> cells = new TreeMap<>();
        for (int i = 0; i < values.length; i++) {
            int[] c = cells.computeIfAbsent(values[i], v -> new int[2]);
            c[0]++;
            if (correct[i]) {
                c[1]++;
            }
        }
        if (cells.isEmpty()) {
            throw new IllegalArgumentException("step " + stepId + " track " + track + ": no signal trials to fit");
        }
        double[] v = new double[cells.size()];
        int[] n = new int[v.length];
        int[] k = new int[v.length];
        int i = -1;
        for (Map.Entry<Double, int[]> e : cells.entrySet()) {
            double x = e.getKey();
            if (i < 0 || Math.abs(x - v[i]) > SAME_LEVEL_RELATIVE * Math.max(Math.abs(x), Math.abs(v[i]))) {
                i++;
                v[i] = x;
            }
            n[i] += e.getValue()[0];
            k[i] += e.getValue()[1];
        }
        int size = i + 1;
        return new BinomialData(java.util.Arrays.copyOf(v, size), java.util.Arrays.copyOf(n, size),
                java.util.Arrays.copyOf(k, size));
    }

    /** @return the indices (into {@link #values()}) of the track's reversals, see {@link Reversals#indices} */
    public int[] reversalIndices() {
        return Reversals.indices(values);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof TrackData t && stepId.equals(t.stepId) && stepIndex == t.stepIndex && track.equals(t.track)
                && unit.equals(t.unit) && Double.compare(chanceRate, t.chanceRate) == 0 && logScale == t.logScale
                && discardedReversals == t.discardedReversals && Arrays.equals(values, t.values)
                && Arrays.equals(correct, t.correct) && catchTrials == t.catchTrials && catchYes == t.catchYes;
    }

    @Override
    public int hashCode() {
        return ((stepId.hashCode() * 31 + track.hashCode()) * 31 + stepIndex) * 31 + Arrays.hashCode(values);
    }

    @Override
    public String toString() {
        return "TrackData[" + stepId + "/" + track + ", " + values.length + " trials, " + catchTrials + " catch]";
    }
}
