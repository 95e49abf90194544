package limen.bench;

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;

import limen.procedure.PsiMethod;
import limen.procedure.PsiSettings;
import limen.procedure.StopRule;
import limen.procedure.internal.PsiTables;
import limen.psychometric.PsychometricFunction;
import limen.psychometric.Sigmoids;

/**
 * One Psi-method trial selection (Kontsevich &amp; Tyler 1999) on 100 thresholds × 40 spreads × 5 lapse rates
 * = 20,000 parameter points and 61 candidate values: one pass over the precomputed tables
 * ({@link PsiTables}): h(ψ) for every point and candidate (61 × 20,000 floats) and, because ψ is affine in
 * the lapse rate, F for every (threshold, spread) pair and candidate (61 × 4,000 floats), 5.86 MB in all
 * (the former single (ψ, h(ψ)) table was 9.8 MB). At the prior every point counts; later, points of
 * negligible posterior weight are skipped. The baseline streams a float array of exactly
 * {@link PsiTables#floatsPerSelection()} floats in the same layout (per pair, 5 rows of 61 into one set of
 * 61 double accumulators, then one row of 61 into another) without the weights: the memory-bandwidth floor
 * of any single pass over those tables. Sample mode, so JMH prints the median (p0.50) beside the mean; one
 * thread.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
@Threads(1)
public class PsiSelectionBench {

    private PsiTables tables;
    private double[] posterior;
    private double[] prior;
    private float[] sameBytes;
    private int lapseCount;

    @Setup
    public void setUp() {
        double[] thresholds = grid(-5, 5, 100);
        double[] spreads = new double[40];
        for (int i = 0; i < spreads.length; i++) {
            spreads[i] = 0.1 * Math.pow(1.1, i);
        }
        double[] lapses = {0, 0.01, 0.02, 0.04, 0.06};
        double[] candidates = grid(-6, 6, 61);
        PsiSettings settings = PsiSettings.builder().family(Sigmoids.LOGISTIC).guess(0.5).thresholds(thresholds)
                .spreads(spreads).lapses(lapses).candidates(candidates).prior(0, 2).stop(StopRule.afterTrials(1000))
                .build();
        // a posterior shaped by 30 simulated trials, as in a running session
        PsiMethod psi = settings.create(new SplittableRandom(1));
        prior = psi.posterior();
        PsychometricFunction listener = new PsychometricFunction(Sigmoids.LOGISTIC, 0.7, 0.8, 0.5, 0.02);
        SplittableRandom rng = new SplittableRandom(2);
        for (int t = 0; t < 30; t++) {
            double x = psi.nextValue();
            psi.record(x, rng.nextDouble() < listener.psi(x));
        }
        posterior = psi.posterior();
        tables = PsiTables.of(Sigmoids.LOGISTIC, 0.5, thresholds, spreads, lapses, candidates);
        sameBytes = new float[Math.toIntExact(tables.floatsPerSelection())];
        lapseCount = lapses.length;
        for (int i = 0; i < sameBytes.length; i++) {
            sameBytes[i] = (float) rng.nextDouble();
        }
    }

    private static double[] grid(double lo, double hi, int n) {
        double[] g = new double[n];
        for (int i = 0; i < n; i++) {
            g[i] = lo + (hi - lo) * i / (n - 1);
        }
        return g;
    }

    /**
     * The same number of bytes in the same layout as the selection reads (per (threshold, spread) pair, one
     * row of 61 floats for each lapse rate, added into 61 double accumulators, then one row of 61 into 61
     * others), without the posterior weights: the cost of one pass over the tables.
     */
    @Benchmark
    public double baselineStreamSameBytes() {
        final float[] a = sameBytes;
        final int nc = tables.candidates();
        final int nL = lapseCount;
        double[] accA = new double[nc];
        double[] accB = new double[nc];
        for (int base = 0; base < a.length;) {
            for (int l = 0; l < nL; l++, base += nc) {
                for (int c = 0; c < nc; c++) {
                    accA[c] += a[base + c];
                }
            }
            for (int c = 0; c < nc; c++) {
                accB[c] += a[base + c];
            }
            base += nc;
        }
        double s = 0;
        for (int c = 0; c < nc; c++) {
            s += accA[c] + accB[c];
        }
        return s;
    }

    /** The first trial: the Gaussian prior on α leaves every point above the negligible weight (the worst case). */
    @Benchmark
    public int psiSelectionAtPrior() {
        return tables.bestCandidate(prior);
    }

    /** After 30 trials: points of negligible posterior weight are skipped. */
    @Benchmark
    public int psiSelectionAfter30Trials() {
        return tables.bestCandidate(posterior);
    }
}
