package limen.ui.authoring.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicBoolean;

import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.widgets.Composite;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.cli.LimenCli;
import limen.model.Battery;
import limen.model.Step;
import limen.model.io.LimenFiles;
import limen.procedure.TrialOutcome;
import limen.procedure.sim.RunRow;
import limen.procedure.sim.SimulationProgress;
import limen.procedure.sim.SimulationResult;
import limen.procedure.sim.TrackSummary;
import limen.ui.authoring.AuthoringTopics;
import limen.ui.authoring.StepFocus;
import limen.ui.authoring.parts.BatteryEditorPart;
import limen.ui.authoring.parts.DesignSimulationPart;
import limen.ui.authoring.preview.DesignRun;

/** The design simulation job: progress, cancel, and the same numbers as {@code ./limen simulate}. */
class DesignSimulationTest {

    private static final String LISTENER = "logistic:mid=1.5,scale=0.4";

    @TempDir
    Path temp;

    private Fixture fx;
    private BatteryEditorPart editor;
    private DesignSimulationPart simulation;

    @BeforeEach
    void setUp() throws Exception {
        fx = new Fixture(temp, "design simulation", 1300, 900);
        SashForm sash = new SashForm(fx.shell, SWT.VERTICAL);
        Composite top = new Composite(sash, SWT.NONE);
        Composite bottom = new Composite(sash, SWT.NONE);
        sash.setWeights(35, 65);
        simulation = fx.make(DesignSimulationPart.class, bottom, null);
        fx.broker.on(AuthoringTopics.STEP, data -> simulation.show((StepFocus) data));
        editor = fx.editor(top, "frequency-discrimination.battery");
        fx.shell.open();
    }

    @AfterEach
    void tearDown() {
        simulation.cancel();
        fx.close();
    }

    private SimulationResult runToTheEnd(Job job) throws Exception {
        assertNotNull(job, "started: " + simulation.problem());
        assertTrue(fx.pumpUntil(() -> !simulation.running(), 120_000), "the job ends");
        job.join();
        return simulation.result();
    }

    /** Runs ./limen simulate in this JVM and returns the CSV rows: run, step, track, estimate, ..., trials, ... */
    private List<String[]> cli(Path battery, int runs, long seed, int cap) throws Exception {
        Path csv = temp.resolve("cli-" + battery.getFileName() + ".csv");
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = LimenCli.execute(new PrintWriter(out), new PrintWriter(err), "simulate", battery.toString(),
                "--listener", LISTENER, "--runs", Integer.toString(runs), "--seed", Long.toString(seed),
                "--max-trials", Integer.toString(cap), "--out", csv.toString());
        assertEquals(0, code, err.toString());
        List<String[]> rows = new ArrayList<>();
        List<String> lines = Files.readAllLines(csv);
        assertEquals("run,step,track,estimate,uncertainty,trials,reversals,catch_trials,false_alarms,capped",
                lines.get(0));
        for (String line : lines.subList(1, lines.size())) {
            rows.add(line.split(",", -1));
        }
        return rows;
    }

    private static void assertSameRows(List<String[]> cli, List<RunRow> ui, String stepId) {
        List<String[]> mine = cli.stream().filter(r -> r[1].equals(stepId)).toList();
        assertEquals(mine.size(), ui.size());
        for (int i = 0; i < ui.size(); i++) {
            RunRow r = ui.get(i);
            String[] c = mine.get(i);
            String where = "run " + r.run() + " track " + r.track();
            assertEquals(Integer.parseInt(c[0]), r.run(), where);
            assertEquals(c[2], r.track(), where);
            assertEquals(c[3], Double.isNaN(r.estimate()) ? "" : Double.toString(r.estimate()), where + " estimate");
            assertEquals(Integer.parseInt(c[5]), r.trials(), where + " trials");
            assertEquals(Integer.parseInt(c[6]), r.reversals(), where + " reversals");
        }
    }

    @Test
    void jobReportsProgressAndMatchesTheHeadlessCommand() throws Exception {
        Battery battery = editor.document().battery();
        Step step = battery.getSteps().get(0);
        editor.select(step.getTracks().get(0));
        simulation.set(LISTENER, 80, 7, 400);
        SimulationResult ui = runToTheEnd(simulation.start());
        assertFalse(ui.cancelled());
        assertEquals(160, ui.rows().size(), "80 runs of 2 tracks");
        List<String> progress = simulation.progressSeen();
        assertFalse(progress.isEmpty(), "progress was reported");
        assertEquals("80/80", progress.get(progress.size() - 1));

        // the same as the core simulation called directly with the same seed
        SimulationResult direct = new DesignRun(LISTENER, 0, 0, 80, 7, 1, 400).simulation(step)
                .run(SimulationProgress.none(), new AtomicBoolean());
        assertEquals(direct.rows(), ui.rows(), "one thread or several: the same rows");
        assertEquals(direct.summaries(), ui.summaries());

        // and the same as ./limen simulate on a battery holding just this step
        Battery alone = EcoreUtil.copy(battery);
        alone.getSteps().retainAll(List.of(alone.getSteps().get(0)));
        alone.getBreaks().clear();
        Path aloneFile = temp.resolve("fd-500-alone.battery");
        LimenFiles.save(alone, aloneFile);
        assertSameRows(cli(aloneFile, 80, 7, 400), ui.rows(), "fd-500");
        // the first step of the whole battery draws the same randomness (the simulation splits it in step order)
        assertSameRows(cli(fx.workspace.resolve("frequency-discrimination.battery"), 80, 7, 400), ui.rows(),
                "fd-500");

        // bias and spread as the table shows them, recomputed here from the rows (mean, SD with n - 1)
        for (TrackSummary s : ui.summaries()) {
            double[] est = ui.rows().stream().filter(r -> r.track().equals(s.track())).mapToDouble(RunRow::estimate)
                    .toArray();
            double mean = java.util.Arrays.stream(est).average().orElseThrow();
            double ss = java.util.Arrays.stream(est).map(v -> (v - mean) * (v - mean)).sum();
            assertEquals(mean, s.meanEstimate(), 1e-12);
            assertEquals(Math.sqrt(ss / (est.length - 1)), s.sd(), 1e-12);
            assertEquals(s.meanEstimate() - s.trueValue(), s.bias(), 1e-12);
            assertTrue(s.efficiency() > 0 && Double.isFinite(s.efficiency()), "efficiency " + s.efficiency());
        }

        // the example track: every trial kept, correct and incorrect marked, ending in the procedure's estimate
        DesignRun.Example example = simulation.example();
        assertEquals("A", example.track());
        assertFalse(example.trials().isEmpty());
        assertTrue(example.trials().stream().anyMatch(TrialOutcome::correct));
        assertTrue(example.trials().stream().anyMatch(o -> !o.correct()));
        assertTrue(example.trials().size() <= 80, "the stopping rule's 80 trials at most");
        assertEquals(3, simulation.charts().stream().filter(c -> c.chart() != null).count(), "three charts");
        fx.pump(300);
        Path png = Screenshots.save(fx.shell, "design-simulation");
        assertTrue(Screenshots.distinctPixels(png) > 50);
    }

    @Test
    void cancelStopsEarly() throws Exception {
        editor.select(editor.document().battery().getSteps().get(2));
        simulation.set(LISTENER, 20000, 3, 400);
        Job job = simulation.start();
        assertNotNull(job);
        assertTrue(fx.pumpUntil(() -> !simulation.progressSeen().isEmpty(), 60_000), "progress arrives");
        simulation.cancel();
        SimulationResult r = runToTheEnd(job);
        assertTrue(r.cancelled());
        assertTrue(r.rows().size() < 2 * 20000, "stopped before all runs: " + r.rows().size() / 2);
        fx.pump(100);
        Screenshots.save(fx.shell, "design-simulation-cancelled");
    }

    @Test
    void badListenerSpecIsRefusedWithTheReason() {
        editor.select(editor.document().battery().getSteps().get(0));
        simulation.set("logistic:middle=1", 10, 1, 100);
        assertEquals(null, simulation.start());
        assertTrue(simulation.problem().contains("unknown key 'middle'"), simulation.problem());
    }
}
