package limen.procedure;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

import limen.psychometric.Sigmoids;

/**
 * QUEST (Watson &amp; Pelli 1983), ZEST (King-Smith et al. 1994) and Psi (Kontsevich &amp; Tyler 1999)
 * posteriors after scripted responses, against a brute-force Bayes computation written here
 * independently: prior times the product of per-trial likelihoods, normalised; and for Psi the
 * expected entropy of each candidate from the two explicit posteriors (correct and wrong).
 */
class BayesianPosteriorTest {

    private static final double[] X = {0.3, -1.2, 0.8, 2.0, -0.4, 0.1, 1.1};
    private static final boolean[] C = {true, false, true, true, false, true, false};

    private static double logistic(double x, double m, double s) {
        return 1 / (1 + Math.exp(-(x - m) / s));
    }

    @Test
    void questPosteriorMatchesBruteForceBayes() {
        double g = 0.5, l = 0.02, s = 0.7, pt = 0.8, mu = 0.5, sd = 1.5;
        QuestSettings qs = QuestSettings.builder().function(Sigmoids.LOGISTIC, s, g, l).target(pt).grid(-4, 4, 41)
                .prior(mu, sd).placement(Placement.MODE).estimator(Placement.MEAN).stop(StopRule.afterTrials(50)).build();
        Quest q = qs.create(new SplittableRandom(3));
        for (int i = 0; i < X.length; i++) {
            q.record(X[i], C[i]);
        }
        // brute force: the threshold T has psi(T) = pt, so F's midpoint is T - s ln(f/(1-f)), f = (pt-g)/(1-g-l)
        double f = (pt - g) / (1 - g - l);
        double d = s * Math.log(f / (1 - f));
        double[] post = new double[41];
        double sum = 0;
        for (int i = 0; i < 41; i++) {
            double t = -4 + 0.2 * i;
            double w = Math.exp(-0.5 * Math.pow((t - mu) / sd, 2));
            for (int k = 0; k < X.length; k++) {
                double psi = g + (1 - g - l) * logistic(X[k], t - d, s);
                w *= C[k] ? psi : 1 - psi;
            }
            post[i] = w;
            sum += w;
        }
        double mean = 0;
        int mode = 0;
        for (int i = 0; i < 41; i++) {
            post[i] /= sum;
            mean += post[i] * (-4 + 0.2 * i);
            if (post[i] > post[mode]) {
                mode = i;
            }
        }
        double[] got = q.posterior();
        for (int i = 0; i < 41; i++) {
            assertEquals(post[i], got[i], 1e-12, "posterior at grid point " + i);
        }
        assertEquals(-4 + 0.2 * mode, q.nextValue(), 1e-12, "QUEST places at the posterior mode");
        assertEquals(mean, q.estimate().value(), 1e-12, "posterior mean estimate (King-Smith et al. 1994)");
        double var = 0;
        for (int i = 0; i < 41; i++) {
            var += post[i] * Math.pow(-4 + 0.2 * i - mean, 2);
        }
        assertEquals(Math.sqrt(var), q.estimate().uncertainty(), 1e-12);

        Quest z = QuestSettings.builder().function(Sigmoids.LOGISTIC, s, g, l).target(pt).grid(-4, 4, 41).prior(mu, sd)
                .placement(Placement.MEAN).stop(StopRule.afterTrials(50)).build().create(new SplittableRandom(3));
        for (int i = 0; i < X.length; i++) {
            z.record(X[i], C[i]);
        }
        assertEquals(mean, z.nextValue(), 1e-12, "ZEST places at the posterior mean");
    }

    @Test
    void questThresholdIsAtTheTargetProportion() {
        QuestSettings qs = QuestSettings.builder().weibullInDecibels(3.5, 0.01, 0.5).target(0.82).build();
        // Watson & Pelli's form (from memory): psi = delta*gamma + (1-delta)(1 - (1-gamma) exp(-10^(beta (x-T+eps)/20)))
        double t = 3.0;
        assertEquals(0.82, qs.functionAt(t).psi(t), 1e-12);
        double eps = qs.functionAt(t).location() - t; // F's location relative to T
        for (double x = -10; x <= 10; x += 2.5) {
            double w = 1 - 0.5 * Math.exp(-Math.pow(10, 3.5 * (x - t - eps) / 20));
            assertEquals(0.01 * 0.5 + 0.99 * w, qs.functionAt(t).psi(x), 1e-12, "x=" + x);
        }
    }

    @Test
    void psiPosteriorAndSelectionMatchBruteForce() {
        double[] th = {-1, -0.5, 0, 0.5, 1};
        double[] sp = {0.2, 0.4, 0.8, 1.6};
        double[] la = {0, 0.04};
        double[] cand = {-1.5, -1, -0.5, 0, 0.5, 1, 1.5};
        double g = 0.5, mu = 0.2, sd = 0.8;
        PsiSettings ps = PsiSettings.builder().family(Sigmoids.LOGISTIC).guess(g).thresholds(th).spreads(sp).lapses(la)
                .candidates(cand).prior(mu, sd).stop(StopRule.afterTrials(100)).build();
        PsiMethod psi = ps.create(new SplittableRandom(5));
        for (int i = 0; i < X.length; i++) {
            psi.record(X[i], C[i]);
        }
        int n = th.length * sp.length * la.length;
        double[] w = new double[n];
        double sum = 0;
        for (int i = 0; i < th.length; i++) {
            for (int j = 0; j < sp.length; j++) {
                for (int k = 0; k < la.length; k++) {
                    double v = Math.exp(-0.5 * Math.pow((th[i] - mu) / sd, 2));
                    for (int t = 0; t < X.length; t++) {
                        double p = g + (1 - g - la[k]) * logistic(X[t], th[i], sp[j]);
                        v *= C[t] ? p : 1 - p;
                    }
                    w[(i * sp.length + j) * la.length + k] = v;
                    sum += v;
                }
            }
        }
        for (int q = 0; q < n; q++) {
            w[q] /= sum;
        }
        double[] got = psi.posterior();
        for (int q = 0; q < n; q++) {
            assertEquals(w[q], got[q], 1e-12, "posterior point " + q);
        }
        // expected entropy per candidate from the explicit posteriors after each outcome
        double[] expected = new double[cand.length];
        int best = 0;
        for (int c = 0; c < cand.length; c++) {
            double[] pc = new double[n];
            double[] pw = new double[n];
            double pbar = 0;
            for (int i = 0; i < th.length; i++) {
                for (int j = 0; j < sp.length; j++) {
                    for (int k = 0; k < la.length; k++) {
                        int q = (i * sp.length + j) * la.length + k;
                        double p = g + (1 - g - la[k]) * logistic(cand[c], th[i], sp[j]);
                        pc[q] = w[q] * p;
                        pw[q] = w[q] * (1 - p);
                        pbar += pc[q];
                    }
                }
            }
            double hc = 0, hw = 0;
            for (int q = 0; q < n; q++) {
                double a = pc[q] / pbar, b = pw[q] / (1 - pbar);
                hc -= a > 0 ? a * Math.log(a) : 0;
                hw -= b > 0 ? b * Math.log(b) : 0;
            }
            expected[c] = pbar * hc + (1 - pbar) * hw;
            if (expected[c] < expected[best]) {
                best = c;
            }
        }
        double[] fast = psi.expectedEntropies();
        for (int c = 0; c < cand.length; c++) {
            // the selection tables hold psi and h(psi) in single precision
            assertEquals(expected[c], fast[c], 2e-6, "expected entropy of candidate " + cand[c]);
        }
        assertEquals(cand[best], psi.nextValue(), "Psi presents the candidate of least expected entropy");
        // marginal threshold mean over spread and lapse
        double m = 0;
        for (int q = 0; q < n; q++) {
            m += w[q] * th[q / (sp.length * la.length)];
        }
        assertEquals(m, psi.estimate().value(), 1e-12);
    }
}
