package limen.bench;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import limen.fit.BinomialData;
import limen.fit.Bootstrap;
import limen.fit.BootstrapOptions;
import limen.fit.BootstrapResult;
import limen.fit.CancellationFlag;
import limen.fit.FitOptions;
import limen.fit.FitResult;
import limen.fit.Progress;
import limen.fit.PsychometricFitter;
import limen.psychometric.Sigmoids;

/**
 * 2,000 parametric bootstrap refits (plus the jackknife refits for BCa, 16 here) of the 2AFC Weibull of
 * {@link FitBench}, on 1 and 2 threads. Baseline: 2,000 single-threaded likelihood evaluations over the
 * same data, so the ratio reads as "likelihood evaluations per refit" for one thread.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 5)
@Measurement(iterations = 5, time = 5)
@Fork(1)
public class BootstrapBench {

    @Param({ "1", "2" })
    public int threads;

    private FitResult fit;
    private Bootstrap bootstrap;
    private final FitBench likelihood = new FitBench();

    @Setup
    public void setUp() {
        int[] n = new int[FitBench.LEVELS.length];
        java.util.Arrays.fill(n, 50);
        fit = new PsychometricFitter(FitOptions.of(Sigmoids.WEIBULL).withGuess(0.5).withLapseMax(0.06))
                .fit(new BinomialData(FitBench.LEVELS, n, FitBench.CORRECT_2AFC));
        bootstrap = new Bootstrap(BootstrapOptions.parametric(2000, 20011).withGoodnessOfFit(true).withParallelism(threads));
        likelihood.setUp();
    }

    @Benchmark
    public double baselineLikelihood2000() {
        double s = 0;
        for (int i = 0; i < 2000; i++) {
            s += likelihood.baselineLikelihood();
        }
        return s;
    }

    @Benchmark
    public BootstrapResult bootstrap2000() {
        return bootstrap.run(fit, Progress.NONE, new CancellationFlag());
    }
}
