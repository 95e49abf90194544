package limen.bench;

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
import org.openjdk.jmh.annotations.Warmup;

import limen.psychometric.PsychometricFunction;
import limen.psychometric.Sigmoids;

/**
 * ψ(x) over 10,000 stimulus values for each family, against a baseline that only sums the same array
 * (the cost of touching the data). The ratio is the price of one ψ evaluation in units of one array element read.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class PsychometricBench {

    private double[] x;
    private PsychometricFunction logistic;
    private PsychometricFunction normal;
    private PsychometricFunction weibull;

    @Setup
    public void setUp() {
        x = new double[10_000];
        for (int i = 0; i < x.length; i++) {
            x[i] = 0.01 + 10.0 * i / x.length;
        }
        logistic = new PsychometricFunction(Sigmoids.LOGISTIC, 3.0, 0.8, 0.5, 0.02);
        normal = new PsychometricFunction(Sigmoids.NORMAL, 3.0, 0.8, 0.5, 0.02);
        weibull = new PsychometricFunction(Sigmoids.WEIBULL, 3.0, 3.5, 0.5, 0.02);
    }

    @Benchmark
    public double baselineSum() {
        double s = 0;
        for (double v : x) {
            s += v;
        }
        return s;
    }

    @Benchmark
    public double logisticPsi() {
        return sum(logistic);
    }

    @Benchmark
    public double normalPsi() {
        return sum(normal);
    }

    @Benchmark
    public double weibullPsi() {
        return sum(weibull);
    }

    private double sum(PsychometricFunction f) {
        double s = 0;
        for (double v : x) {
            s += f.psi(v);
        }
        return s;
    }
}
