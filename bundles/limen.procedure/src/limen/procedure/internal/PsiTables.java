package limen.procedure.internal;

import limen.psychometric.Sigmoid;

/**
 * Precomputed tables of the Psi method's trial selection. The selection needs, for each candidate x_c,
 * Σ_θ w(θ) ψ(x_c; θ) and Σ_θ w(θ) h(ψ(x_c; θ)) over the parameter points θ = (α, β, λ), with
 * h(p) = −p ln p − (1 − p) ln(1 − p). Since ψ = γ + (1 − γ − λ) F(x; α, β) is affine in λ,
 * <pre>
 *   Σ_θ w ψ_c = γ Σ_θ w + Σ_(α,β) F_c(α, β) [(1 − γ) W(α, β) − Λ(α, β)],
 *   W(α, β) = Σ_λ w(α, β, λ),   Λ(α, β) = Σ_λ w(α, β, λ) λ,
 * </pre>
 * so the first sum needs only one table of F per (α, β) and candidate (n_λ times smaller); only the entropy
 * sum needs every point. Tables, in single precision, candidate-minor:
 * {@code f[(iα·nβ + iβ)·C + c] = F(x_c; α, β)} and {@code h[θ·C + c] = h(ψ(x_c; θ))}, θ in the
 * posterior's order ((iα·nβ) + iβ)·nλ + iλ. One selection therefore streams (n_α n_β + n_α n_β n_λ) · C
 * floats ({@link #floatsPerSelection()}) instead of 2 · n_α n_β n_λ · C, into 2C double accumulators
 * (independent per candidate, so the inner loops vectorise). Points whose posterior weight is below 1e-14
 * are skipped in both sums (and left out of W and Λ), which changes every sum by less than 1e-14 per point
 * while the posterior concentrates. The likelihood update ({@link #multiplyLikelihood}) works in double
 * precision from the sigmoid itself.
 */
public final class PsiTables {

    private final Sigmoid sigmoid;
    private final double guess;
    private final double[] thresholds;
    private final double[] spreads;
    private final double[] lapses;
    private final int points;
    private final int pairs;
    private final int candidates;
    /** F(x_c; α, β), per (α, β) a row of C. */
    private final float[] f;
    /** h(ψ(x_c; θ)), per point θ a row of C. */
    private final float[] h;

    private PsiTables(Sigmoid sigmoid, double guess, double[] thresholds, double[] spreads, double[] lapses,
            double[] candidateValues) {
        this.sigmoid = sigmoid;
        this.guess = guess;
        this.thresholds = thresholds;
        this.spreads = spreads;
        this.lapses = lapses;
        this.pairs = thresholds.length * spreads.length;
        this.points = pairs * lapses.length;
        this.candidates = candidateValues.length;
        this.f = new float[Math.multiplyExact(candidates, pairs)];
        this.h = new float[Math.multiplyExact(candidates, points)];
        int nL = lapses.length;
        for (int c = 0; c < candidates; c++) {
            double x = candidateValues[c];
            for (int ab = 0; ab < pairs; ab++) {
                double fx = sigmoid.value(x, thresholds[ab / spreads.length], spreads[ab % spreads.length]);
                f[ab * candidates + c] = (float) fx;
                for (int k = 0; k < nL; k++) {
                    h[(ab * nL + k) * candidates + c] = (float) binaryEntropy(guess + (1 - guess - lapses[k]) * fx);
                }
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

    /** @return floats of the tables that one selection streams when no point is negligible: (n_α n_β + n_α n_β n_λ) · C */
    public long floatsPerSelection() {
        return (long) (pairs + points) * candidates;
    }

    /**
     * @param w the posterior (normalised), length {@link #points()}
     * @return for each candidate the mutual information h(Σ w p_c) − Σ w h(p_c) in nats
     */
    public double[] informationGains(double[] w) {
        final int nc = candidates;
        final int nL = lapses.length;
        final float[] ft = f;
        final float[] ht = h;
        final double g = guess;
        double[] accPsi = new double[nc];
        double[] accH = new double[nc];
        double total = 0;
        for (int ab = 0, k = 0; ab < pairs; ab++) {
            double wSum = 0;
            double lambdaSum = 0;
            for (int l = 0; l < nL; l++, k++) {
                double wk = w[k];
                if (wk < NEGLIGIBLE_WEIGHT) {
                    continue;
                }
                wSum += wk;
                lambdaSum += wk * lapses[l];
                for (int c = 0, base = k * nc; c < nc; c++) {
                    accH[c] += wk * ht[base + c];
                }
            }
            if (wSum == 0) {
                continue;
            }
            total += wSum;
            double u = (1 - g) * wSum - lambdaSum;
            for (int c = 0, base = ab * nc; c < nc; c++) {
                accPsi[c] += u * ft[base + c];
            }
        }
        double[] gain = new double[nc];
        for (int c = 0; c < nc; c++) {
            double meanPsi = g * total + accPsi[c];
            gain[c] = binaryEntropy(Math.min(Math.max(meanPsi, 0), 1)) - accH[c];
        }
        return gain;
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
