package limen.procedure.internal;

import limen.psychometric.Sigmoid;

/**
 * Precomputed ψ and binary-entropy tables of the Psi method: for candidate c and parameter point
 * θ = (α, β, λ), {@code table[c·2P + 2θ] = ψ(x_c; θ)} and {@code table[c·2P + 2θ + 1] = h(ψ)} with
 * h(p) = −p ln p − (1 − p) ln(1 − p), in single precision so one selection streams 8 bytes per
 * (candidate, point). Sums are accumulated in double precision with independent accumulators.
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
            int base = c * 2 * points;
            for (int k = 0; k < points; k++) {
                table[base + 2 * k] = (float) psi[k];
                table[base + 2 * k + 1] = (float) binaryEntropy(psi[k]);
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

    /**
     * @param w the posterior (normalised), length {@link #points()}
     * @return for each candidate the mutual information h(Σ w p_c) − Σ w h(p_c) in nats
     */
    public double[] informationGains(double[] w) {
        double[] g = new double[candidates];
        for (int c = 0; c < candidates; c++) {
            g[c] = gain(w, c);
        }
        return g;
    }

    /** @return the candidate index of the largest information gain (least expected entropy), the first on ties */
    public int bestCandidate(double[] w) {
        int best = 0;
        double bestGain = Double.NEGATIVE_INFINITY;
        for (int c = 0; c < candidates; c++) {
            double g = gain(w, c);
            if (g > bestGain) {
                bestGain = g;
                best = c;
            }
        }
        return best;
    }

    private double gain(double[] w, int c) {
        final float[] t = table;
        int i = c * 2 * points;
        double p0 = 0, p1 = 0, h0 = 0, h1 = 0;
        int k = 0;
        // Two points per iteration, four independent accumulators: the loop is bound by memory, not latency.
        for (; k + 1 < points; k += 2, i += 4) {
            double w0 = w[k];
            double w1 = w[k + 1];
            p0 += w0 * t[i];
            h0 += w0 * t[i + 1];
            p1 += w1 * t[i + 2];
            h1 += w1 * t[i + 3];
        }
        if (k < points) {
            p0 += w[k] * t[i];
            h0 += w[k] * t[i + 1];
        }
        double pBar = Math.min(Math.max(p0 + p1, 0), 1);
        return binaryEntropy(pBar) - (h0 + h1);
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
