package limen.procedure.internal;

import limen.psychometric.Sigmoid;

/**
 * Precomputed ψ and binary-entropy tables of the Psi method, point-major: for parameter point
 * θ = (α, β, λ) and candidate c, {@code table[θ·2C + c] = ψ(x_c; θ)} and
 * {@code table[θ·2C + C + c] = h(ψ)} with h(p) = −p ln p − (1 − p) ln(1 − p), in single precision so
 * one selection streams at most 8 bytes per (candidate, point). One pass over the points adds
 * w(θ)·ψ and w(θ)·h into 2C double-precision accumulators (independent per candidate, so the inner
 * loops vectorise); points whose posterior weight is below 1e-14 are skipped, which changes every sum
 * by less than 1e-14 per point while the posterior concentrates.
 */
public final class PsiTables {

    private final Sigmoid sigmoid;
    private final double guess;
    private final double[] thresholds;
    private final double[] spreads;
    private final double[] lapses;
    private final int points;
    private final int candidates;
    private final float[] table;

    private PsiTables(Sigmoid sigmoid, double guess, double[] thresholds, double[] spreads, double[] lapses,
            double[] candidateValues) {
        this.sigmoid = sigmoid;
        this.guess = guess;
        this.thresholds = thresholds;
        this.spreads = spreads;
        this.lapses = lapses;
        this.points = thresholds.length * spreads.length * lapses.length;
        this.candidates = candidateValues.length;
        this.table = new float[Math.multiplyExact(candidates, 2 * points)];
        double[] psi = new double[points];
        for (int c = 0; c < candidates; c++) {
            fillPsi(candidateValues[c], psi);
            for (int k = 0; k < points; k++) {
                table[k * 2 * candidates + c] = (float) psi[k];
                table[k * 2 * candidates + candidates + c] = (float) binaryEntropy(psi[k]);
            }
        }
    }

    /** Builds the tables (cost: one sigmoid evaluation per candidate and (α, β)). */
    public static PsiTables of(Sigmoid sigmoid, double guess, double[] thresholds, double[] spreads, double[] lapses,
            double[] candidateValues) {
        return new PsiTables(sigmoid, guess, thresholds, spreads, lapses, candidateValues);
    }

    /** @return h(p) = −p ln p − (1 − p) ln(1 − p), 0 at p = 0 or 1 */
    public static double binaryEntropy(double p) {
        double h = 0;
        if (p > 0) {
            h -= p * Math.log(p);
        }
        if (p < 1) {
            h -= (1 - p) * Math.log1p(-p);
        }
        return h;
    }

    private void fillPsi(double x, double[] out) {
        int nS = spreads.length;
        int nL = lapses.length;
        for (int i = 0; i < thresholds.length; i++) {
            for (int j = 0; j < nS; j++) {
                double f = sigmoid.value(x, thresholds[i], spreads[j]);
                int base = (i * nS + j) * nL;
                for (int k = 0; k < nL; k++) {
                    out[base + k] = guess + (1 - guess - lapses[k]) * f;
                }
            }
        }
    }

    public int points() {
        return points;
    }

    public int candidates() {
        return candidates;
    }

    /** Posterior weights below this are skipped in the selection pass. */
    static final double NEGLIGIBLE_WEIGHT = 1e-14;

    /**
     * @param w the posterior (normalised), length {@link #points()}
     * @return for each candidate the mutual information h(Σ w p_c) − Σ w h(p_c) in nats
     */
    public double[] informationGains(double[] w) {
        final int nc = candidates;
        final float[] t = table;
        final int row = 2 * nc;
        // acc[0..C) sums w·ψ, acc[C..2C) sums w·h(ψ): one contiguous row per point, one vectorisable loop
        double[] acc = new double[row];
        for (int k = 0, base = 0; k < points; k++, base += row) {
            double wk = w[k];
            if (wk < NEGLIGIBLE_WEIGHT) {
                continue;
            }
            for (int j = 0; j < row; j++) {
                acc[j] += wk * t[base + j];
            }
        }
        double[] g = new double[nc];
        for (int c = 0; c < nc; c++) {
            g[c] = binaryEntropy(Math.min(Math.max(acc[c], 0), 1)) - acc[nc + c];
        }
        return g;
    }

    /** @return the candidate index of the largest information gain (least expected entropy), the first on ties */
    public int bestCandidate(double[] w) {
        double[] g = informationGains(w);
        int best = 0;
        for (int c = 1; c < g.length; c++) {
            if (g[c] > g[best]) {
                best = c;
            }
        }
        return best;
    }

    /** Multiplies w by the likelihood of one response at value x (in double precision) and renormalises. */
    public void multiplyLikelihood(double[] w, double x, boolean correct) {
        double[] psi = new double[points];
        fillPsi(x, psi);
        double sum = 0;
        for (int k = 0; k < points; k++) {
            w[k] *= correct ? psi[k] : 1 - psi[k];
            sum += w[k];
        }
        if (!(sum > 0)) {
            throw new IllegalStateException("posterior vanished after the response at " + x
                    + "; widen the grid or allow a lapse rate");
        }
        for (int k = 0; k < points; k++) {
            w[k] /= sum;
        }
    }
}
