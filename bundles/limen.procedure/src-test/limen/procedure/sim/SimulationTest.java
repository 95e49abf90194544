package limen.procedure.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.Test;

import limen.procedure.ModelListener;
import limen.procedure.QuestSettings;
import limen.procedure.StopRule;
import limen.procedure.Task;
import limen.procedure.UpDownSettings;
import limen.psychometric.PsychometricFunction;
import limen.psychometric.Sigmoids;

class SimulationTest {

    private static final PsychometricFunction F = new PsychometricFunction(Sigmoids.LOGISTIC, 1, 0.5, 0.5, 0);

    private static List<SimulatedStep> steps() {
        return List.of(new SimulatedStep("s", List.of(new SimulatedTrack("t",
                UpDownSettings.builder().rule(2, 1).start(3).additive(0.25).stop(StopRule.afterReversals(10)).build(),
                new Task.ForcedChoice(2), new ModelListener(F, 0)))));
    }

    @Test
    void idealSweatFactorIsTheInverseBinomialFisherInformation() {
        // Taylor & Creelman (1967): K_ideal = p(1-p)/psi'(x)^2; for the 2AFC logistic psi' = 0.5 F(1-F)/s
        double x = 1.3;
        double f = 1 / (1 + Math.exp(-(x - 1) / 0.5));
        double p = 0.5 + 0.5 * f;
        double d = 0.5 * f * (1 - f) / 0.5;
        assertEquals(p * (1 - p) / (d * d), Simulation.idealSweatFactor(F, x), 1e-9);
    }

    @Test
    void summaryComputesBiasSdAndEfficiency() {
        SimulationResult r = new Simulation(steps(), 400, 1L, 2, 2000).run(SimulationProgress.none(), new AtomicBoolean());
        TrackSummary s = r.summaries().get(0);
        double truth = F.inversePsi(Math.sqrt(0.5));
        assertEquals(truth, s.trueValue(), 1e-9);
        double sum = 0, ss = 0, trials = 0;
        for (RunRow row : r.rows()) {
            sum += row.estimate();
            trials += row.trials();
        }
        double mean = sum / 400;
        for (RunRow row : r.rows()) {
            ss += Math.pow(row.estimate() - mean, 2);
        }
        double sd = Math.sqrt(ss / 399);
        assertEquals(mean, s.meanEstimate(), 1e-12);
        assertEquals(mean - truth, s.bias(), 1e-12);
        assertEquals(sd, s.sd(), 1e-12);
        assertEquals(trials / 400, s.meanTrials(), 1e-12);
        assertEquals(Simulation.idealSweatFactor(F, truth) / (sd * sd * trials / 400), s.efficiency(), 1e-9);
        assertTrue(s.efficiency() > 0.05 && s.efficiency() < 1.2, "efficiency " + s.efficiency());
    }

    @Test
    void progressIsReportedAndCancelStopsEarly() {
        AtomicInteger calls = new AtomicInteger();
        SimulationResult r = new Simulation(steps(), 50, 1L, 2, 2000).run((done, total) -> {
            calls.incrementAndGet();
            assertEquals(50, total);
        }, new AtomicBoolean());
        assertEquals(50, calls.get());
        assertEquals(50, r.rows().size());
        AtomicBoolean cancel = new AtomicBoolean();
        SimulationResult c = new Simulation(steps(), 100_000, 1L, 2, 2000).run((done, total) -> {
            if (done >= 10) {
                cancel.set(true);
            }
        }, cancel);
        assertTrue(c.cancelled());
        assertTrue(c.rows().size() < 1000, "rows " + c.rows().size());
    }

    @Test
    void aTrackThatCannotEndIsCapped() {
        List<SimulatedStep> s = List.of(new SimulatedStep("s", List.of(new SimulatedTrack("q",
                QuestSettings.builder().grid(-3, 3, 31).stop(StopRule.uncertaintyBelow(1e-9)).build(),
                new Task.ForcedChoice(2), new ModelListener(F, 0)))));
        SimulationResult r = new Simulation(s, 3, 1L, 1, 50).run(SimulationProgress.none(), new AtomicBoolean());
        for (RunRow row : r.rows()) {
            assertTrue(row.capped());
            assertEquals(50, row.trials());
        }
        assertEquals(3, r.summaries().get(0).capped());
    }
}
