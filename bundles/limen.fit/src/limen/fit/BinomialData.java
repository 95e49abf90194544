package limen.fit;

import java.util.Arrays;

/**
 * Immutable binomial psychometric data: for each cell i a stimulus value x_i (in the unit of the varied
 * quantity), a number of trials n_i &ge; 1 and a number of correct (or "yes") responses 0 &le; k_i &le; n_i.
 * Cells keep their order; repeated values are allowed (the likelihood is the same as for pooled cells).
 */
public final class BinomialData {

    private final double[] values;
    private final int[] trials;
    private final int[] correct;

    /**
     * @throws IllegalArgumentException for arrays of different length, no cells, a non-finite value,
     *                                  n_i &lt; 1 or k_i outside [0, n_i]; the message names the cell
     */
    public BinomialData(double[] values, int[] trials, int[] correct) {
        if (values.length != trials.length || values.length != correct.length) {
            throw new IllegalArgumentException("values, trials and correct differ in length: " + values.length + ", "
                    + trials.length + ", " + correct.length);
        }
        if (values.length == 0) {
            throw new IllegalArgumentException("no data cells");
        }
        for (int i = 0; i < values.length; i++) {
            if (!Double.isFinite(values[i])) {
                throw new IllegalArgumentException("cell " + (i + 1) + ": value must be finite, was " + values[i]);
            }
            if (trials[i] < 1) {
                throw new IllegalArgumentException("cell " + (i + 1) + ": trials must be >= 1, was " + trials[i]);
            }
            if (correct[i] < 0 || correct[i] > trials[i]) {
                throw new IllegalArgumentException("cell " + (i + 1) + ": correct must be in [0, trials=" + trials[i]
                        + "], was " + correct[i]);
            }
        }
        this.values = values.clone();
        this.trials = trials.clone();
        this.correct = correct.clone();
    }

    /** @return the number of cells */
    public int size() {
        return values.length;
    }

    public double value(int i) {
        return values[i];
    }

    public int trials(int i) {
        return trials[i];
    }

    public int correct(int i) {
        return correct[i];
    }

    /** @return k_i / n_i */
    public double proportion(int i) {
        return (double) correct[i] / trials[i];
    }

    /** @return a copy of the values */
    public double[] values() {
        return values.clone();
    }

    /** @return a copy of the trial counts */
    public int[] trials() {
        return trials.clone();
    }

    /** @return a copy of the correct counts */
    public int[] correct() {
        return correct.clone();
    }

    /** @return Σ n_i */
    public long totalTrials() {
        long n = 0;
        for (int t : trials) {
            n += t;
        }
        return n;
    }

    /** @return the number of distinct stimulus values */
    public int distinctValues() {
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        int distinct = 1;
        for (int i = 1; i < sorted.length; i++) {
            if (sorted[i] != sorted[i - 1]) {
                distinct++;
            }
        }
        return distinct;
    }

    /** @return data with the same values and trials and these correct counts (used by the bootstrap) */
    public BinomialData withCorrect(int[] newCorrect) {
        return new BinomialData(values, trials, newCorrect);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof BinomialData d && Arrays.equals(values, d.values) && Arrays.equals(trials, d.trials)
                && Arrays.equals(correct, d.correct);
    }

    @Override
    public int hashCode() {
        return 31 * (31 * Arrays.hashCode(values) + Arrays.hashCode(trials)) + Arrays.hashCode(correct);
    }

    @Override
    public String toString() {
        StringBuilder b = new StringBuilder("BinomialData[");
        for (int i = 0; i < values.length; i++) {
            b.append(i == 0 ? "" : ", ").append(values[i]).append(':').append(correct[i]).append('/').append(trials[i]);
        }
        return b.append(']').toString();
    }
}
