package limen.procedure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

import limen.procedure.sim.RunRow;
import limen.procedure.sim.SimulatedStep;
import limen.procedure.sim.SimulatedTrack;
import limen.procedure.sim.Simulation;
import limen.procedure.sim.SimulationProgress;
import limen.procedure.sim.TrackSummary;
import limen.psychometric.PsychometricFunction;
import limen.psychometric.Sigmoids;

/**
 * Convergence of the up-down rules by simulation against a 2AFC logistic model listener
 * (mid 0, scale 1). Steps shrink from 0.4 to 0.1 (a tenth of the spread) after 8 reversals, so the
 * small-step theory applies (a long fixed-step run at 0.1 settles at ψ = 0.704 for 2-down/1-up).
 * The estimate of each run is the mean of its last 40 reversals after 20 discarded; we check ψ at the
 * mean estimate over 1500 runs (standard error of that ψ about 0.001).
 */
class ConvergenceTest {

    private static final PsychometricFunction LISTENER = new PsychometricFunction(Sigmoids.LOGISTIC, 0, 1, 0.5, 0);

    private static TrackSummary simulate(UpDownSettings.Builder b, int runs) {
        UpDownSettings s = b.start(1.5).additive(0.4).shrink(0.5, 4).minimumStep(0.1).threshold(20, 40)
                .stop(StopRule.afterReversals(60)).build();
        SimulatedTrack t = new SimulatedTrack("t", s, new Task.ForcedChoice(2), new ModelListener(LISTENER, 0));
        Simulation sim = new Simulation(List.of(new SimulatedStep("s", List.of(t))), runs, 20260601L, 2, 5000);
        return sim.run(SimulationProgress.none(), new java.util.concurrent.atomic.AtomicBoolean()).summaries().get(0);
    }

    @Test
    void levitt1971TwoDownOneUpConvergesTo707() {
        // Levitt (1971), JASA 49(2B) 467-477, Table I: 2-down/1-up targets p with p^2 = 0.5, 70.7 %
        UpDownSettings.Builder b = UpDownSettings.builder().rule(2, 1);
        assertEquals(Math.sqrt(0.5), b.start(0).build().targetProbability(), 1e-9);
        TrackSummary s = simulate(UpDownSettings.builder().rule(2, 1), 1500);
        assertEquals(0.7071, LISTENER.psi(s.meanEstimate()), 0.01);
        assertEquals(0, s.capped());
        assertEquals(0.0, s.bias(), 0.08);
    }

    @Test
    void levitt1971ThreeDownOneUpConvergesTo794() {
        // Levitt (1971), Table I: 3-down/1-up targets p^3 = 0.5, 79.4 %
        assertEquals(Math.pow(0.5, 1.0 / 3), UpDownSettings.builder().rule(3, 1).start(0).build().targetProbability(), 1e-9);
        TrackSummary s = simulate(UpDownSettings.builder().rule(3, 1), 1500);
        assertEquals(0.7937, LISTENER.psi(s.meanEstimate()), 0.01);
    }

    @Test
    void kaernbach1991WeightedUpDownConvergesWhereTheWeightedStepsBalance() {
        // Kaernbach (1991), Perception & Psychophysics 49(3) 227-229: p S_down = (1 - p) S_up
        for (double p : new double[] {0.75, 0.85}) {
            UpDownSettings set = UpDownSettings.builder().weighted(p).start(0).build();
            assertEquals(p / (1 - p), set.upDownStepRatio(), 1e-12);
            assertEquals(p, set.targetProbability(), 1e-9);
            TrackSummary s = simulate(UpDownSettings.builder().weighted(p), 1500);
            assertEquals(p, LISTENER.psi(s.meanEstimate()), 0.01, "weighted up-down at " + p);
        }
    }

    /**
     * García-Pérez (1998), Vision Research 38(12), 1861-1881: with fixed step sizes the convergence
     * point depends on the ratio of down to up steps (and on the step size relative to the spread),
     * not only on the rule. Checked against the exact stationary distribution of the staircase as a
     * Markov chain on the level lattice, computed here independently: the long-run mean presented
     * level of a simulated 2-down/1-up staircase matches the chain for two step ratios, and the two
     * ratios converge to different points, ordered as the drift balance p² S_down = (1 − p²) S_up says.
     */
    @Test
    void garciaPerez1998FixedStepsDependOnTheStepRatio() {
        double step = 0.5;
        double[] chainMean = new double[2];
        int[] upSteps = {1, 2};
        for (int r = 0; r < 2; r++) {
            chainMean[r] = stationaryMeanLevel(step, upSteps[r], 2);
            UpDownSettings s = UpDownSettings.builder().rule(2, 1).start(0).additive(step).upDownStepRatio(upSteps[r])
                    .stop(StopRule.afterTrials(300_000)).build();
            UpDownStaircase p = s.create(new SplittableRandom(77 + r));
            SplittableRandom listener = new SplittableRandom(99 + r);
            double sum = 0;
            int n = 0;
            for (int t = 0; t < 300_000; t++) {
                double x = p.nextValue();
                if (t >= 1000) {
                    sum += x;
                    n++;
                }
                p.record(x, listener.nextDouble() < LISTENER.psi(x));
            }
            // the chain's mean level; level autocorrelation makes the simulation's error about 0.01
            assertEquals(chainMean[r], sum / n, 0.03, "step ratio " + upSteps[r]);
        }
        // up steps twice the down step push the track up: ψ(2-down, ratio 2) near sqrt(2/3) = 0.816, above 0.707
        assertTrue(chainMean[1] > chainMean[0] + 0.5, chainMean[0] + " vs " + chainMean[1]);
        assertEquals(Math.sqrt(2.0 / 3.0), UpDownSettings.builder().rule(2, 1).upDownStepRatio(2).start(0).build()
                .targetProbability(), 1e-9);
        assertEquals(Math.sqrt(2.0 / 3.0), LISTENER.psi(chainMean[1]), 0.03);
    }

    /**
     * Exact stationary mean presented level of an n-down/1-up staircase with down step Δ and up step
     * k·Δ on the lattice jΔ, |j| &le; 200 (clamped), by power iteration on states (level, correct run).
     */
    private static double stationaryMeanLevel(double delta, int upMultiple, int nDown) {
        int levels = 401;
        double[][] pi = new double[levels][nDown];
        pi[200][0] = 1;
        for (int it = 0; it < 200_000; it++) {
            double[][] next = new double[levels][nDown];
            for (int j = 0; j < levels; j++) {
                double p = LISTENER.psi((j - 200) * delta);
                for (int c = 0; c < nDown; c++) {
                    double w = pi[j][c];
                    if (w == 0) {
                        continue;
                    }
                    if (c + 1 == nDown) {
                        next[Math.max(j - 1, 0)][0] += w * p;
                    } else {
                        next[j][c + 1] += w * p;
                    }
                    next[Math.min(j + upMultiple, levels - 1)][0] += w * (1 - p);
                }
            }
            double diff = 0;
            for (int j = 0; j < levels; j++) {
                for (int c = 0; c < nDown; c++) {
                    diff += Math.abs(next[j][c] - pi[j][c]);
                }
            }
            pi = next;
            if (diff < 1e-13) {
                break;
            }
        }
        double mean = 0;
        for (int j = 0; j < levels; j++) {
            for (int c = 0; c < nDown; c++) {
                mean += pi[j][c] * (j - 200) * delta;
            }
        }
        return mean;
    }

    @Test
    void simulationRowsDoNotDependOnThreads() {
        UpDownSettings s = UpDownSettings.builder().rule(2, 1).start(2).additive(0.5).stop(StopRule.afterReversals(8)).build();
        SimulatedTrack a = new SimulatedTrack("a", s, new Task.ForcedChoice(2), new ModelListener(LISTENER, 0.05));
        SimulatedTrack b = new SimulatedTrack("b", s, new Task.ForcedChoice(2), new ModelListener(LISTENER, 0));
        List<SimulatedStep> steps = List.of(new SimulatedStep("s", List.of(a, b)));
        List<RunRow> one = new Simulation(steps, 64, 5L, 1, 1000).run(SimulationProgress.none(),
                new java.util.concurrent.atomic.AtomicBoolean()).rows();
        List<RunRow> two = new Simulation(steps, 64, 5L, 2, 1000).run(SimulationProgress.none(),
                new java.util.concurrent.atomic.AtomicBoolean()).rows();
        assertEquals(one, two);
        assertEquals(128, one.size());
        assertEquals(new Simulation(steps, 64, 5L, 2, 1000).runOnce(17), one.subList(34, 36));
    }
}
