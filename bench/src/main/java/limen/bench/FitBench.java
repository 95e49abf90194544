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

import limen.fit.BinomialData;
import limen.fit.FitOptions;
import limen.fit.FitResult;
import limen.fit.PsychometricFitter;
import limen.psychometric.PsychometricFunction;
import limen.psychometric.Sigmoids;

/**
 * Single maximum-likelihood fits on 8 stimulus values x 50 trials (Harbourside Auditory Lab, invented
 * yes/no data of P-HERON): the four-parameter fit (location, spread, guess, lapse all estimated), a 2AFC
 * Weibull with guess fixed and lapse bounded, and the two-parameter logistic that equals R's glm (compare
 * with bench/r/glm_timing.R on the same data). Baseline: one evaluation of the binomial log-likelihood of a
 * four-parameter function on the same data, so each ratio reads as "cost in likelihood evaluations".
 * Mode.SampleTime: the JMH table gives the median (p0.50) per call; the ratio line uses the mean.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class FitBench {

    /** Stimulus levels (dB) and correct counts of 50 trials each. */
    static final double[] LEVELS = { 10, 15, 20, 25, 30, 35, 40, 45 };
    static final int[] YES = { 5, 7, 12, 20, 31, 40, 45, 47 };
    static final int[] CORRECT_2AFC = { 26, 28, 33, 38, 44, 47, 48, 49 };

    private BinomialData yesNo;
    private BinomialData twoAfc;
    private PsychometricFitter fourParameters;
    private PsychometricFitter weibull2afc;
    private PsychometricFitter logisticLikeGlm;
    private PsychometricFunction function;

    @Setup
    public void setUp() {
        int[] n = new int[LEVELS.length];
        java.util.Arrays.fill(n, 50);
        yesNo = new BinomialData(LEVELS, n, YES);
        twoAfc = new BinomialData(LEVELS, n, CORRECT_2AFC);
        fourParameters = new PsychometricFitter(FitOptions.of(Sigmoids.LOGISTIC).withFreeGuess(0.5).withLapseMax(0.06));
        weibull2afc = new PsychometricFitter(FitOptions.of(Sigmoids.WEIBULL).withGuess(0.5).withLapseMax(0.06));
        logisticLikeGlm = new PsychometricFitter(FitOptions.of(Sigmoids.LOGISTIC).withLapseMax(0));
        function = new PsychometricFunction(Sigmoids.LOGISTIC, 27.0, 5.0, 0.08, 0.02);
    }

    /** One binomial log-likelihood evaluation (without the constant), written out plainly. */
    @Benchmark
    public double baselineLikelihood() {
        double sum = 0;
        for (int i = 0; i < LEVELS.length; i++) {
            double p = function.psi(LEVELS[i]);
            sum += YES[i] * Math.log(p) + (50 - YES[i]) * Math.log(1 - p);
        }
        return sum;
    }

    @Benchmark
    public FitResult fourParameterLogisticYesNo() {
        return fourParameters.fit(yesNo);
    }

    @Benchmark
    public FitResult weibull2afcLapseBounded() {
        return weibull2afc.fit(twoAfc);
    }

    @Benchmark
    public FitResult twoParameterLogisticLikeGlm() {
        return logisticLikeGlm.fit(yesNo);
    }
}
