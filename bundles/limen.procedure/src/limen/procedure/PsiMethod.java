package limen.procedure;

import limen.procedure.internal.AbstractProcedure;
import limen.procedure.internal.GridPosterior;
import limen.procedure.internal.PsiTables;

/**
 * The Psi method (Kontsevich &amp; Tyler 1999); see {@link PsiSettings}.
 * <p>
 * Selection: with posterior w over parameter points θ and p_c(θ) = ψ(x_c; θ), the expected
 * posterior entropy after presenting candidate c is
 * E[H_c] = H(w) − [h(Σ_θ w p_c) − Σ_θ w h(p_c)], with h(p) = −p ln p − (1 − p) ln(1 − p), which
 * equals p̄ H(w | correct) + (1 − p̄) H(w | wrong) expanded (the bracket is the mutual information
 * of the response and θ). So one pass over precomputed tables finds the candidate with the least expected
 * entropy (the first on ties): h(p_c) per candidate and point, and, since p_c is affine in the lapse rate,
 * F per candidate and (threshold, spread) for Σ_θ w p_c (see {@code PsiTables}).
 * <p>
 * The estimate is the marginal posterior mean of α with its SD; {@link #spreadEstimate()} and
 * {@link #lapseEstimate()} give the other marginals.
 */
public final class PsiMethod extends AbstractProcedure {

    private final PsiSettings settings;
    private final PsiTables tables;
    private final double[] posterior;

    PsiMethod(PsiSettings settings) {
        super(settings.stopRule());
        this.settings = settings;
        this.tables = settings.tables();
        double[] th = settings.thresholdsShared();
        int perThreshold = settings.spreadsShared().length * settings.lapsesShared().length;
        this.posterior = new double[settings.points()];
        double sum = 0;
        for (int i = 0; i < th.length; i++) {
            double w = Math.exp(GridPosterior.logGaussian(th[i], settings.priorMean(), settings.priorSd()));
            for (int j = 0; j < perThreshold; j++) {
                posterior[i * perThreshold + j] = w;
                sum += w;
            }
        }
        for (int k = 0; k < posterior.length; k++) {
            posterior[k] /= sum;
        }
    }

    public PsiSettings settings() {
        return settings;
    }

    /** @return the joint posterior, index ((iα·nβ) + iβ)·nλ + iλ (a copy) */
    public double[] posterior() {
        return posterior.clone();
    }

    /** @return the expected posterior entropy (nats) for each candidate, as the selection computes it */
    public double[] expectedEntropies() {
        double h = entropy(posterior);
        double[] gain = tables.informationGains(posterior);
        double[] e = new double[gain.length];
        for (int c = 0; c < gain.length; c++) {
            e[c] = h - gain[c];
        }
        return e;
    }

    private static double entropy(double[] w) {
        double h = 0;
        for (double v : w) {
            if (v > 0) {
                h -= v * Math.log(v);
            }
        }
        return h;
    }

    @Override
    protected double computeNext() {
        return settings.candidatesShared()[tables.bestCandidate(posterior)];
    }

    @Override
    protected void checkValue(double value) {
        if (settings.sigmoid().positiveDomainOnly() && !(value > 0)) {
            throw new IllegalArgumentException(settings.sigmoid().name() + " values must be > 0, was " + value);
        }
    }

    @Override
    protected void update(double value, boolean correct) {
        tables.multiplyLikelihood(posterior, value, correct);
    }

    @Override
    public Target target() {
        return settings.target();
    }

    @Override
    public Estimate estimate() {
        double[] ms = GridPosterior.meanSd(settings.thresholdsShared(), marginal(0));
        return new Estimate(ms[0], ms[1], Estimate.Kind.POSTERIOR_SD, trials());
    }

    /** @return the marginal posterior mean and SD of the spread β */
    public Estimate spreadEstimate() {
        double[] ms = GridPosterior.meanSd(settings.spreadsShared(), marginal(1));
        return new Estimate(ms[0], ms[1], Estimate.Kind.POSTERIOR_SD, trials());
    }

    /** @return the marginal posterior mean and SD of the lapse λ */
    public Estimate lapseEstimate() {
        double[] ms = GridPosterior.meanSd(settings.lapsesShared(), marginal(2));
        return new Estimate(ms[0], ms[1], Estimate.Kind.POSTERIOR_SD, trials());
    }

    /** @return the marginal posterior of dimension 0 (α), 1 (β) or 2 (λ) */
    public double[] marginal(int dimension) {
        int nT = settings.thresholdsShared().length;
        int nS = settings.spreadsShared().length;
        int nL = settings.lapsesShared().length;
        double[] m = new double[dimension == 0 ? nT : dimension == 1 ? nS : nL];
        for (int i = 0; i < nT; i++) {
            for (int j = 0; j < nS; j++) {
                for (int k = 0; k < nL; k++) {
                    double w = posterior[(i * nS + j) * nL + k];
                    m[dimension == 0 ? i : dimension == 1 ? j : k] += w;
                }
            }
        }
        return m;
    }
}
