package limen.cli;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.concurrent.Callable;

import limen.audio.Devices;
import limen.audio.JavaSoundOutput;
import limen.audio.NoDeviceException;
import limen.audio.NoOutput;
import limen.audio.TrialOutput;
import limen.audio.WavFolderOutput;
import limen.core.About;
import limen.model.Battery;
import limen.model.Calibration;
import limen.model.SessionStatus;
import limen.model.io.LimenFileException;
import limen.model.io.LimenFiles;
import limen.procedure.Answer;
import limen.procedure.TrialOutcome;
import limen.session.BatteryTrialRenderer;
import limen.session.CalibrationMapping;
import limen.session.ModelListenerResponder;
import limen.session.Responder;
import limen.session.SessionFolder;
import limen.session.SessionListener;
import limen.session.SessionRunner;
import limen.session.SessionStatusInfo;
import limen.session.TrialContext;
import limen.session.journal.JournalRow;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code ./limen run BATTERY --participant ID --archive DIR [...]} and {@code ./limen run --resume SESSION_DIR}:
 * runs a battery for one participant, every trial written to the session's journal before the next starts.
 */
@Command(name = "run", mixinStandardHelpOptions = true,
        description = {"Run a battery for one participant into a session archive, or resume an interrupted session.",
                "Answers come from a model listener (--listener) or, without one, from the terminal (type the",
                "interval number, or y/n for yes/no tasks)."},
        footer = {"", "Exit codes: 0 completed, 1 refused, aborted or interrupted (resumable), 2 usage error or "
                + "unreadable input.", "Caution: " + About.RESEARCH_CAUTION})
public final class RunCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(paramLabel = "BATTERY", arity = "0..1", description = "The battery file (*.battery).")
    Path battery;

    @Option(names = "--participant", paramLabel = "ID", description = "Participant pseudonym.")
    String participant;

    @Option(names = "--archive", paramLabel = "DIR", description = "Archive folder that receives the session.")
    Path archive;

    @Option(names = "--resume", paramLabel = "SESSION_DIR", description = "Continue an interrupted session.")
    Path resume;

    @Option(names = "--output", paramLabel = "audio|wav:DIR|none", defaultValue = "none",
            description = "Where the sound goes (default: ${DEFAULT-VALUE}).")
    String output;

    @Option(names = "--device", paramLabel = "NAME", description = "Sound output device for --output audio.")
    String device;

    @Option(names = "--listener", paramLabel = "SPEC", description = {"Model listener answering the trials, for all "
            + "steps (e.g. logistic:mid=0.3,scale=0.08) or one step (STEP_ID=SPEC); repeatable.",
            "Steps without a spec get the same default listener as ./limen simulate."})
    List<String> listeners;

    @Option(names = "--realtime", description = "Make the none and wav outputs take as long as the sound would, "
            + "and keep the inter-trial intervals.")
    boolean realtime;

    @Option(names = "--seed", paramLabel = "S", description = "Session seed (default: from the clock; recorded).")
    Long seed;

    @Option(names = "--calibration", paramLabel = "FILE",
            description = "Calibration to use instead of the one the battery names.")
    Path calibration;

    @Option(names = "--quiet", description = "No progress lines on stderr.")
    boolean quiet;

    @Override
    public Integer call() throws Exception {
        PrintWriter err = spec.commandLine().getErr();
        PrintWriter out = spec.commandLine().getOut();
        err.println("limen run: caution: " + About.RESEARCH_CAUTION);
        SessionFolder folder;
        if (resume != null) {
            if (battery != null || participant != null || archive != null) {
                return usage("--resume takes a session folder only (not BATTERY, --participant or --archive)");
            }
            try {
                folder = SessionFolder.open(resume);
            } catch (IOException e) {
                return usage(e.getMessage());
            }
            if (folder.header().getStatus() == SessionStatus.COMPLETED
                    || folder.header().getStatus() == SessionStatus.ABORTED) {
                err.println("limen run: " + resume + " has already ended (" + folder.header().getStatus() + ")");
                return LimenCli.EXIT_FAILED;
            }
        } else {
            if (battery == null || participant == null || archive == null) {
                return usage("give BATTERY, --participant and --archive (or --resume SESSION_DIR)");
            }
            Battery b;
            Calibration c;
            try {
                b = LimenFiles.loadBattery(battery);
                c = LimenFiles.loadCalibration(calibrationFile(b));
            } catch (LimenFileException e) {
                return usage(e.getMessage());
            }
            List<limen.model.validation.Problem> problems = limen.model.validation.BatteryValidator.validate(b, c);
            long errors = problems.stream().filter(limen.model.validation.Problem::isError).count();
            if (errors > 0) {
                problems.stream().filter(limen.model.validation.Problem::isError)
                        .forEach(p -> err.println(p.at(battery, p.line(), p.column()).format()));
                err.println("limen run: the battery has " + errors + " errors: not running it (see ./limen check)");
                return LimenCli.EXIT_FAILED;
            }
            long s = seed != null ? seed : System.currentTimeMillis();
            String stem = battery.getFileName().toString().replaceFirst("\\.battery$", "");
            folder = SessionFolder.create(archive, stem, b, c, participant, s, describeOutput(), -1);
            out.println(folder.path());
            out.flush();
        }
        SplittableRandom dither = new SplittableRandom(folder.header().getRandomSeed() ^ 0x5DEECE66DL);
        TrialOutput sink;
        try {
            sink = openOutput(folder, dither);
        } catch (NoDeviceException e) {
            err.println("limen run: " + e.getMessage());
            return LimenCli.EXIT_FAILED;
        }
        Responder responder = responder(folder.header().getRandomSeed(), err);
        try (TrialOutput o = sink) {
            SessionRunner runner = SessionRunner.start(folder, o, responder,
                    new BatteryTrialRenderer(CalibrationMapping.toSignal(folder.header().getCalibration())), null,
                    realtime);
            if (!quiet) {
                runner.addListener(progress(err));
            }
            SessionStatusInfo info = runner.run();
            List<Double> turn = new java.util.ArrayList<>(runner.turnaroundMillis());
            if (!turn.isEmpty() && !quiet) {
                java.util.Collections.sort(turn);
                err.println(String.format(Locale.ROOT, "limen run: answer to next trial ready: median %.2f ms, "
                        + "90th percentile %.2f ms over %d trials", turn.get(turn.size() / 2),
                        turn.get((int) (turn.size() * 0.9)), turn.size()));
            }
            err.println("limen run: " + info.status().getLiteral().toLowerCase(Locale.ROOT) + ": " + info.trials()
                    + " trials in " + info.folder() + (info.status() == SessionStatus.COMPLETED ? "" : " (" + info.message() + ")"));
            if (resume != null) {
                out.println(info.folder());
            }
            return info.status() == SessionStatus.COMPLETED ? 0 : LimenCli.EXIT_FAILED;
        }
    }

    private Path calibrationFile(Battery b) {
        if (calibration != null) {
            return calibration;
        }
        if (b.getCalibrationFile() == null || b.getCalibrationFile().isBlank()) {
            throw new IllegalArgumentException(battery + ": the battery names no calibration file: give --calibration FILE");
        }
        return battery.toAbsolutePath().getParent().resolve(b.getCalibrationFile()).normalize();
    }

    private String describeOutput() {
        return output.equals("audio") ? "javax.sound" + (device != null ? " (" + device + ")" : "") : output;
    }

    private TrialOutput openOutput(SessionFolder folder, SplittableRandom dither) throws NoDeviceException, IOException {
        if (output.equals("none")) {
            return new NoOutput(realtime);
        }
        if (output.startsWith("wav:")) {
            Path dir = Path.of(output.substring(4));
            Files.createDirectories(dir);
            return new WavFolderOutput(dir, 24, realtime, dither);
        }
        if (output.equals("audio")) {
            return JavaSoundOutput.open(Devices.system(), device,
                    folder.header().getCalibration().getSampleRateHz(), JavaSoundOutput.DEFAULT_BUFFER_MILLIS, dither);
        }
        throw new IllegalArgumentException("--output must be audio, wav:DIR or none, not '" + output + "'");
    }

    private Responder responder(long sessionSeed, PrintWriter err) {
        if (listeners == null || listeners.isEmpty()) {
            return new TerminalResponder(err);
        }
        String all = null;
        Map<String, String> perStep = new LinkedHashMap<>();
        for (String l : listeners) {
            int eq = l.indexOf('=');
            int colon = l.indexOf(':');
            if (eq > 0 && (colon < 0 || eq < colon)) {
                perStep.put(l.substring(0, eq), l.substring(eq + 1));
            } else {
                all = l;
            }
        }
        return new ModelListenerResponder(all, perStep, sessionSeed ^ 0x1F123BB5L);
    }

    private static SessionListener progress(PrintWriter err) {
        return new SessionListener() {
            @Override
            public void stepStarted(int stepIndex, int stepCount, limen.model.Step step) {
                err.println("limen run: step " + stepIndex + "/" + stepCount + ": " + step.getId()
                        + (step.getTitle() != null ? " (" + step.getTitle() + ")" : ""));
                err.flush();
            }

            @Override
            public void trialRecorded(JournalRow row, TrialOutcome outcome, TrackState track) {
                if (row.seq() % 20 == 0) {
                    err.println("limen run:   trial " + row.seq() + ", track " + track.name() + ": " + track.trials()
                            + " trials, " + track.reversals() + " reversals");
                    err.flush();
                }
            }

            @Override
            public void stepFinished(int stepIndex, limen.model.Step step, double estimate) {
                err.println(String.format(Locale.ROOT, "limen run: step %d done: estimate %.4g", stepIndex, estimate));
                err.flush();
            }

            @Override
            public void deviceLost(String message) {
                err.println("limen run: sound device lost: " + message + " (session paused; resume with --resume)");
                err.flush();
            }
        };
    }

    private int usage(String message) {
        spec.commandLine().getErr().println("limen run: " + message);
        return LimenCli.EXIT_USAGE;
    }

    /** Answers typed in the terminal: the interval number for nAFC, y or n for yes/no; q aborts. */
    static final class TerminalResponder implements Responder {
        private final BufferedReader in = new BufferedReader(new InputStreamReader(System.in, StandardCharsets.UTF_8));
        private final PrintWriter err;

        TerminalResponder(PrintWriter err) {
            this.err = err;
        }

        @Override
        public Response respond(TrialContext trial) throws InterruptedException {
            boolean nafc = trial.plan().forcedChoice();
            while (true) {
                err.print("trial " + trial.seq() + " (" + trial.step().getId() + "): "
                        + (nafc ? "interval 1-" + trial.plan().intervals() : "heard it? y/n") + ", q to stop > ");
                err.flush();
                long t0 = System.nanoTime();
                String line;
                try {
                    line = in.readLine();
                } catch (IOException e) {
                    return null;
                }
                if (line == null || line.trim().equalsIgnoreCase("q")) {
                    return null;
                }
                double ms = (System.nanoTime() - t0) / 1e6;
                String a = line.trim().toLowerCase(Locale.ROOT);
                if (nafc) {
                    try {
                        int k = Integer.parseInt(a);
                        if (k >= 1 && k <= trial.plan().intervals()) {
                            return new Response(Answer.interval(k - 1), ms);
                        }
                    } catch (NumberFormatException e) {
                        // ask again
                    }
                } else if (a.equals("y") || a.equals("n")) {
                    return new Response(Answer.yesNo(a.equals("y")), ms);
                }
            }
        }

        @Override
        public void feedback(TrialContext trial, boolean correct) {
            err.println(correct ? "  correct" : "  wrong");
        }

        @Override
        public void pauseForBreak(String message, double minimumSeconds) throws InterruptedException {
            err.println("break: " + message);
            Thread.sleep(Math.round(minimumSeconds * 1000));
        }
    }
}
