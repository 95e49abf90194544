package limen.fit;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Map;
import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicLong;

import org.junit.jupiter.api.Test;

import limen.psychometric.Sigmoids;

class BootstrapTest {

    private static FitResult ravenLogistic() {
        return new PsychometricFitter(FitOptions.of(Sigmoids.LOGISTIC).withLapseMax(0))
                .fit(ReferenceTables.dataset("raven_intensity"));
    }

    private static FitResult wren2afc() {
        return new PsychometricFitter(FitOptions.of(Sigmoids.WEIBULL).withGuess(0.5).withLapseMax(0.06))
                .fit(ReferenceTables.dataset("wren_2afc"));
    }

    /** Replicate b draws from its own derived seed: the thread count must not change any number. */
    @Test
    void resultsDoNotDependOnThreadCount() {
        FitResult fit = wren2afc();
        BootstrapOptions o = BootstrapOptions.parametric(120, 42);
        BootstrapResult one = new Bootstrap(o.withParallelism(1)).run(fit, Progress.NONE, new CancellationFlag());
        BootstrapResult two = new Bootstrap(o.withParallelism(2)).run(fit, Progress.NONE, new CancellationFlag());
        BootstrapResult four = new Bootstrap(o.withParallelism(4)).run(fit, Progress.NONE, new CancellationFlag());
        assertArrayEquals(one.thresholds(), two.thresholds(), 0.0);
        assertArrayEquals(one.thresholds(), four.thresholds(), 0.0);
        assertArrayEquals(one.slopes(), four.slopes(), 0.0);
        assertArrayEquals(one.simulatedDeviances(), four.simulatedDeviances(), 0.0);
        assertEquals(one.thresholdInterval(IntervalMethod.BCA).lower(), four.thresholdInterval(IntervalMethod.BCA).lower(), 0.0);
        BootstrapResult other = new Bootstrap(BootstrapOptions.parametric(120, 43)).run(fit, Progress.NONE, new CancellationFlag());
        assertFalse(Arrays.equals(one.thresholds(), other.thresholds()));
    }

    /**
     * The parametric bootstrap's spread of the threshold (= mid) and of the scale must agree with the
     * asymptotic standard errors of R's glm (delta method on vcov), reference/glm_reference.csv. 2000
     * replicates estimate an SD to about 1.6%; the 8% tolerance also allows for the small-sample departure
     * from the asymptotic value at 40 trials per cell.
     */
    @Test
    void parametricSpreadMatchesAsymptoticStandardErrorsOfGlm() {
        Map<String, String> ref = ReferenceTables.read("glm_reference.csv").stream()
                .filter(r -> r.get("dataset").equals("raven_intensity") && r.get("family").equals("logistic")).findFirst().orElseThrow();
        FitResult fit = ravenLogistic();
        BootstrapResult b = new Bootstrap(BootstrapOptions.parametric(2000, 2001).withGoodnessOfFit(false))
                .run(fit, Progress.NONE, new CancellationFlag());
        double seMid = ReferenceTables.number(ref, "location_se");
        assertEquals(seMid, b.thresholdStandardError(), 0.08 * seMid);
        // slope at the midpoint = 1/(4 S): delta method SE = SE(S) / (4 S^2)
        double s = ReferenceTables.number(ref, "spread");
        double seSlope = ReferenceTables.number(ref, "spread_se") / (4 * s * s);
        assertEquals(seSlope, b.slopeStandardError(), 0.12 * seSlope);
        assertEquals(0, b.excludedReplicates());
        ConfidenceInterval pct = b.thresholdInterval(IntervalMethod.PERCENTILE);
        // for a near-normal estimator the 95% interval spans about ±1.96 SE (normal quantile, from the definition)
        assertEquals(2 * 1.959964 * seMid, pct.upper() - pct.lower(), 0.12 * 2 * 1.959964 * seMid);
        assertTrue(pct.lower() < fit.threshold() && fit.threshold() < pct.upper());
        ConfidenceInterval bca = b.thresholdInterval(IntervalMethod.BCA);
        assertTrue(bca.lower() < fit.threshold() && fit.threshold() < bca.upper(), bca.toString());
    }

    /**
     * Monte Carlo goodness of fit (Wichmann & Hill 2001a). With many trials per cell the deviance of a
     * correct model is asymptotically χ² with (cells − parameters) degrees of freedom (Wilks 1938, Ann. Math.
     * Stat. 9, 60-62): the simulated deviances' mean must be near 8 − 2 = 6 (sd of the mean 3.46/√600 = 0.14).
     * Data that the function cannot follow (non-monotone) must get a tiny p.
     */
    @Test
    void goodnessOfFitFollowsTheChiSquareLimitAndRejectsMisfit() {
        double[] x = { 1, 2, 3, 4, 5, 6, 7, 8 };
        int[] n = new int[8];
        Arrays.fill(n, 500);
        int[] k = { 40, 75, 140, 230, 300, 370, 430, 460 };
        FitResult fit = new PsychometricFitter(FitOptions.of(Sigmoids.LOGISTIC).withLapseMax(0)).fit(new BinomialData(x, n, k));
        BootstrapResult b = new Bootstrap(BootstrapOptions.parametric(600, 7)).run(fit, Progress.NONE, new CancellationFlag());
        double mean = Arrays.stream(b.simulatedDeviances()).average().orElseThrow();
        assertEquals(6.0, mean, 0.6);
        double p = b.goodnessOfFitP();
        assertTrue(p > 0 && p <= 1);

        int[] zigzag = { 100, 400, 120, 420, 150, 450, 200, 480 };
        FitResult bad = new PsychometricFitter(FitOptions.of(Sigmoids.LOGISTIC).withLapseMax(0)).fit(new BinomialData(x, n, zigzag));
        BootstrapResult bb = new Bootstrap(BootstrapOptions.parametric(200, 7)).run(bad, Progress.NONE, new CancellationFlag());
        assertEquals(1.0 / 201, bb.goodnessOfFitP(), 1e-12); // no simulated deviance reaches the observed one
    }

    @Test
    void nonparametricResamplesObservedProportionsAndStillGivesGoodnessOfFit() {
        FitResult fit = wren2afc();
        BootstrapResult np = new Bootstrap(BootstrapOptions.parametric(150, 5).withNonparametric(true))
                .run(fit, Progress.NONE, new CancellationFlag());
        BootstrapResult p = new Bootstrap(BootstrapOptions.parametric(150, 5)).run(fit, Progress.NONE, new CancellationFlag());
        assertFalse(Arrays.equals(np.thresholds(), p.thresholds()));
        assertEquals(150, np.simulatedDeviances().length);
        assertTrue(np.thresholdInterval(IntervalMethod.PERCENTILE).isDefined());
        assertTrue(np.goodnessOfFitP() > 0);
    }

    /** Nonparametric resampling of a cell at 0% or 100% can only reproduce it: Binomial(n, 0 or 1). */
    @Test
    void simulationDrawsFromTheRightProportions() {
        BinomialData d = ReferenceTables.dataset("finch_edges");
        BinomialData r = Bootstrap.simulate(d, null, true, 99);
        assertEquals(0, r.correct(0));
        assertEquals(20, r.correct(6));
        // parametric: the mean count over many draws approaches n psi (law of large numbers; 5 SE)
        FitResult fit = new PsychometricFitter(FitOptions.of(Sigmoids.LOGISTIC).withLapseMax(0)).fit(d);
        double sum = 0;
        int draws = 4000;
        for (int s = 0; s < draws; s++) {
            sum += Bootstrap.simulate(d, fit.function(), false, s).correct(3);
        }
        double psi = fit.function().psi(d.value(3));
        assertEquals(20 * psi, sum / draws, 5 * Math.sqrt(20 * psi * (1 - psi) / draws));
    }

    @Test
    void progressReachesTheTotalAndCancelStops() {
        FitResult fit = wren2afc();
        AtomicLong last = new AtomicLong();
        AtomicLong total = new AtomicLong();
        new Bootstrap(BootstrapOptions.parametric(50, 1)).run(fit, (d, t) -> {
            last.accumulateAndGet(d, Math::max);
            total.set(t);
        }, new CancellationFlag());
        assertEquals(total.get(), last.get());
        assertTrue(total.get() > 50); // replicates plus jackknife refits

        CancellationFlag cancel = new CancellationFlag();
        AtomicLong seen = new AtomicLong();
        CancellationException e = assertThrows(CancellationException.class,
                () -> new Bootstrap(BootstrapOptions.parametric(5000, 1)).run(fit, (d, t) -> {
                    if (seen.incrementAndGet() == 20) {
                        cancel.cancel();
                    }
                }, cancel));
        assertTrue(e.getMessage().contains("cancelled"), e.getMessage());
        assertTrue(seen.get() < 200, "stopped after " + seen.get());
    }
}
