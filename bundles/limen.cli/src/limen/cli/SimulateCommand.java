package limen.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicBoolean;

import limen.model.Battery;
import limen.model.Step;
import limen.model.Track;
import limen.model.io.LimenFileException;
import limen.model.io.LimenFiles;
import limen.procedure.ModelListener;
import limen.procedure.sim.RunRow;
import limen.procedure.sim.SimulatedStep;
import limen.procedure.sim.SimulatedTrack;
import limen.procedure.sim.Simulation;
import limen.procedure.sim.SimulationResult;
import limen.procedure.sim.TrackSummary;
import limen.psychometric.ListenerSpec;
import limen.session.build.BuiltTrack;
import limen.session.build.DefaultListeners;
import limen.session.build.ProcedureBuilder;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code ./limen simulate BATTERY}: design-time Monte Carlo simulation of a battery's tracks against a
 * model listener (see {@link Simulation}); one CSV row per run and track, a summary per track on stdout,
 * progress on stderr.
 */
@Command(name = "simulate", mixinStandardHelpOptions = true,
        description = {"Simulate a battery's tracks against a model listener, many runs on all cores.",
                "Writes one CSV row per run and track (run,step,track,estimate,uncertainty,trials,reversals,"
                        + "catch_trials,false_alarms,capped) and prints a summary per track: mean estimate, bias against the",
                "listener's true value at the procedure's target, SD, mean trials, and the efficiency against the ideal",
                "sweat factor (Taylor & Creelman 1967). Listener specs: logistic:mid=M,scale=S, normal:mid=M,sd=S,",
                "weibull:alpha=A,beta=B, gumbel:mid=M,scale=S, each optionally with ,lapse=L; values in the",
                "quantity's unit; the guess rate comes from the task (1/n for nAFC, --false-alarm-rate for yes/no)."},
        footer = {"", "Without --listener each track gets a listener placed where its settings expect the threshold "
                + "(printed on stderr).", "Exit codes: 0 done, 1 the battery cannot be simulated, 2 usage error or unreadable file."})
public final class SimulateCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(paramLabel = "BATTERY", description = "The battery (*.battery).")
    Path battery;

    @Option(names = "--listener", paramLabel = "SPEC", description = "Model listener for every track, e.g. logistic:mid=2,scale=0.5,lapse=0.02.")
    String listener;

    @Option(names = "--false-alarm-rate", paramLabel = "RATE", defaultValue = "0",
            description = "The listener's yes rate on catch trials (its guess rate in yes/no tasks); default ${DEFAULT-VALUE}.")
    double falseAlarmRate;

    @Option(names = "--drift", paramLabel = "SD", defaultValue = "0",
            description = "SD per trial of a random walk of the listener's location (ln alpha for weibull); default ${DEFAULT-VALUE}.")
    double drift;

    @Option(names = "--runs", paramLabel = "N", defaultValue = "200", description = "Number of runs; default ${DEFAULT-VALUE}.")
    int runs;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "Master seed; default ${DEFAULT-VALUE}.")
    long seed;

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads; default: all cores.")
    Integer threads;

    @Option(names = "--max-trials", paramLabel = "N", defaultValue = "2000",
            description = "Trial cap per track and run; default ${DEFAULT-VALUE}.")
    int maxTrials;

    @Option(names = "--out", paramLabel = "FILE.csv", required = true, description = "Where to write the per-run rows.")
    Path out;

    @Override
    public Integer call() throws IOException {
        PrintWriter err = spec.commandLine().getErr();
        PrintWriter stdout = spec.commandLine().getOut();
        if (runs < 1 || maxTrials < 1 || (threads != null && threads < 1)) {
            throw new IllegalArgumentException("--runs, --max-trials and --threads must be >= 1");
        }
        if (!(falseAlarmRate >= 0 && falseAlarmRate < 1)) {
            throw new IllegalArgumentException("--false-alarm-rate must be in [0, 1), was " + falseAlarmRate);
        }
        Battery b;
        try {
            b = LimenFiles.loadBattery(battery);
        } catch (LimenFileException e) {
            err.println("limen simulate: cannot read " + battery + ": " + e.getMessage());
            return LimenCli.EXIT_USAGE;
        }
        List<SimulatedStep> steps = new ArrayList<>();
        try {
            for (Step s : b.getSteps()) {
                List<SimulatedTrack> tracks = new ArrayList<>();
                for (Track t : s.getTracks()) {
                    BuiltTrack built = ProcedureBuilder.build(s, t);
                    double guess = ModelListener.guessFor(built.task(), falseAlarmRate);
                    String chosen = listener;
                    if (chosen == null) {
                        chosen = DefaultListeners.specFor(s, t, guess);
                        err.println("limen simulate: step " + s.getId() + ", track " + t.getName() + ": listener " + chosen);
                    }
                    ModelListener m;
                    try {
                        m = new ModelListener(ListenerSpec.parse(chosen, guess), drift);
                    } catch (IllegalArgumentException e) {
                        if (listener != null) {
                            throw new IllegalArgumentException(e.getMessage(), e); // a usage error
                        }
                        err.println("limen simulate: " + e.getMessage());
                        return LimenCli.EXIT_FAILED;
                    }
                    tracks.add(new SimulatedTrack(t.getName(), built.factory(), built.task(), m));
                }
                steps.add(new SimulatedStep(s.getId(), tracks));
            }
        } catch (IllegalArgumentException e) {
            if (listener != null && e.getMessage() != null && e.getMessage().startsWith("listener spec")) {
                throw e;
            }
            err.println("limen simulate: " + battery + ": " + e.getMessage());
            return LimenCli.EXIT_FAILED;
        }
        if (steps.isEmpty()) {
            err.println("limen simulate: " + battery + " has no steps");
            return LimenCli.EXIT_FAILED;
        }
        int workers = threads != null ? threads : Runtime.getRuntime().availableProcessors();
        Simulation sim = new Simulation(steps, runs, seed, workers, maxTrials);
        int every = Math.max(1, runs / 10);
        long t0 = System.nanoTime();
        SimulationResult result = sim.run((done, total) -> {
            if (done % every == 0 || done == total) {
                synchronized (err) {
                    err.println("limen simulate: " + done + "/" + total + " runs");
                    err.flush();
                }
            }
        }, new AtomicBoolean());
        double seconds = (System.nanoTime() - t0) / 1e9;
        writeRows(result.rows());
        printSummary(stdout, result, seconds, workers);
        for (TrackSummary s : result.summaries()) {
            if (s.capped() > 0) {
                err.println("limen simulate: step " + s.step() + ", track " + s.track() + ": " + s.capped() + " of " + runs
                        + " runs hit the cap of " + maxTrials + " trials");
            }
        }
        return 0;
    }

    private void writeRows(List<RunRow> rows) throws IOException {
        Path dir = out.toAbsolutePath().getParent();
        if (dir != null) {
            Files.createDirectories(dir);
        }
        Path tmp = Files.createTempFile(dir, ".simulate", ".csv.tmp");
        try {
            try (Writer w = Files.newBufferedWriter(tmp, StandardCharsets.UTF_8)) {
                w.write("run,step,track,estimate,uncertainty,trials,reversals,catch_trials,false_alarms,capped\r\n");
                for (RunRow r : rows) {
                    w.write(r.run() + "," + quote(r.step()) + "," + quote(r.track()) + "," + num(r.estimate()) + ","
                            + num(r.uncertainty()) + "," + r.trials() + "," + r.reversals() + "," + r.catchTrials() + ","
                            + r.falseAlarms() + "," + r.capped() + "\r\n");
                }
            }
            Files.move(tmp, out, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /** RFC 4180: quote a field holding a comma, quote, CR or LF, doubling inner quotes. */
    static String quote(String field) {
        if (field.indexOf(',') < 0 && field.indexOf('"') < 0 && field.indexOf('\r') < 0 && field.indexOf('\n') < 0) {
            return field;
        }
        return '"' + field.replace("\"", "\"\"") + '"';
    }

    private static String num(double v) {
        return Double.isNaN(v) ? "" : Double.toString(v);
    }

    private static String fmt(double v) {
        return Double.isNaN(v) ? "-" : String.format(Locale.ROOT, "%.4g", v);
    }

    private void printSummary(PrintWriter o, SimulationResult r, double seconds, int workers) {
        o.printf(Locale.ROOT, "%-18s %-6s %-12s %10s %10s %10s %10s %9s %8s %7s %7s%n", "step", "track", "target", "true",
                "mean", "bias", "sd", "trials", "effic.", "runs", "capped");
        for (TrackSummary s : r.summaries()) {
            o.printf(Locale.ROOT, "%-18s %-6s %-12s %10s %10s %10s %10s %9s %8s %7d %7d%n", s.step(), s.track(),
                    s.target() == null ? "-" : s.target().toString(), fmt(s.trueValue()), fmt(s.meanEstimate()), fmt(s.bias()),
                    fmt(s.sd()), fmt(s.meanTrials()), fmt(s.efficiency()), s.runs(), s.capped());
        }
        o.printf(Locale.ROOT, "%d runs, seed %d, %d threads, %.2f s; efficiency = K_ideal / (sd^2 * trials) "
                + "(Taylor & Creelman 1967); rows in %s%n", runs, r.masterSeed(), workers, seconds, out);
        o.flush();
    }
}
