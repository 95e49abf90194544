package limen.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.concurrent.Callable;

import limen.core.About;
import limen.model.AbsoluteLevel;
import limen.model.Battery;
import limen.model.ForcedChoiceTask;
import limen.model.Level;
import limen.model.Step;
import limen.model.io.LimenFileException;
import limen.model.io.LimenFiles;
import limen.procedure.TrialPlan;
import limen.session.BatteryTrialRenderer;
import limen.session.CalibrationMapping;
import limen.signal.Calibration;
import limen.signal.CheckedStimulus;
import limen.signal.Component;
import limen.signal.Ear;
import limen.signal.IntervalMark;
import limen.signal.SafetyGuard;
import limen.signal.Sound;
import limen.signal.Stimulus;
import limen.signal.StimulusRenderer;
import limen.signal.WavFiles;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code ./limen render}: renders a calibrated tone, or one trial of a battery step, to a WAV file through
 * limen.signal's renderer and its single safety guard. Over the calibration's ceiling (or clipping) nothing is
 * written and the command exits 1 with the guard's message.
 */
@Command(name = "render", mixinStandardHelpOptions = true,
        description = {"Render a calibrated tone, or one trial of a battery step, to a two-channel WAV file.",
                "Tone: --frequency HZ --level DB_SPL --duration S [--ramp S] [--ear left|right|both] [--rate HZ].",
                "Trial: BATTERY --step N --value X [--target-interval K] [--standard-level DB_SPL].",
                "Levels go through --calibration FILE (a .calibration file; for a trial, by default the one the "
                        + "battery names) or a flat bench calibration --full-scale-spl DB (a full-scale sine gives DB "
                        + "dB SPL at every frequency; ceiling DB - 3 unless --ceiling is lower). Every buffer passes "
                        + "the safety guard; over the ceiling nothing is written."},
        footer = {"", "Exit codes: 0 written; 1 refused by the safety guard or not written; 2 usage error or "
                + "unreadable input."})
public final class RenderCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", arity = "0..1", paramLabel = "BATTERY", description = "Battery file (trial mode).")
    Path battery;

    @Option(names = "--step", paramLabel = "N", description = "Trial mode: step number (1 = first) or step id.")
    String step;

    @Option(names = "--value", paramLabel = "X",
            description = "Trial mode: the value of the step's varied quantity, in its unit.")
    Double value;

    @Option(names = "--target-interval", paramLabel = "K",
            description = "Trial mode: interval holding the target, 1 = first (default: drawn with --seed).")
    Integer targetInterval;

    @Option(names = "--standard-level", paramLabel = "DB_SPL",
            description = "Trial mode: standard level for a step whose level is relative to another step's result.")
    Double standardLevelDbSpl;

    @Option(names = "--frequency", paramLabel = "HZ", description = "Tone mode: frequency, Hz.")
    Double frequencyHz;

    @Option(names = "--level", paramLabel = "DB_SPL", description = "Tone mode: level, dB SPL.")
    Double levelDbSpl;

    @Option(names = "--duration", paramLabel = "S", description = "Tone mode: duration including the ramps, s.")
    Double durationSeconds;

    @Option(names = "--ramp", paramLabel = "S", defaultValue = "0.01",
            description = "Tone mode: cos² onset and offset ramp, seconds each (default: ${DEFAULT-VALUE}).")
    double rampSeconds;

    @Option(names = "--ear", paramLabel = "left|right|both", defaultValue = "both",
            description = "Tone mode: channel(s) the tone goes to (default: ${DEFAULT-VALUE}).")
    Ear ear;

    @Option(names = "--rate", paramLabel = "HZ",
            description = "Sample rate 44100, 48000 or 96000 (default 48000; with --calibration, its rate).")
    Integer sampleRateHz;

    @Option(names = "--bits", paramLabel = "16|24", defaultValue = "24",
            description = "Bits per sample; 16 bit is TPDF-dithered (default: ${DEFAULT-VALUE}).")
    int bitsPerSample;

    @Option(names = "--calibration", paramLabel = "FILE", description = "Calibration file (.calibration).")
    Path calibrationFile;

    @Option(names = "--full-scale-spl", paramLabel = "DB",
            description = "Flat bench calibration: dB SPL of a full-scale sine at every frequency.")
    Double fullScaleSplDb;

    @Option(names = "--ceiling", paramLabel = "DB",
            description = "With --full-scale-spl: a lower ceiling, dB SPL (default and maximum: full scale - 3).")
    Double ceilingDbSpl;

    @Option(names = "--out", paramLabel = "FILE.wav", required = true, description = "WAV file to write.")
    Path out;

    @Option(names = "--seed", paramLabel = "N", defaultValue = "1",
            description = "Seed of the noise, the drawn target interval and the 16-bit dither (default: ${DEFAULT-VALUE}).")
    long seed;

    @Override
    public Integer call() throws IOException {
        PrintWriter err = spec.commandLine().getErr();
        err.println("Caution: " + About.RESEARCH_CAUTION);
        err.flush();
        if (bitsPerSample != 16 && bitsPerSample != 24) {
            throw new IllegalArgumentException("--bits must be 16 or 24: " + bitsPerSample);
        }
        Path dir = out.toAbsolutePath().getParent();
        if (dir == null || !Files.isDirectory(dir)) {
            throw new IllegalArgumentException("no such folder for --out: " + dir);
        }
        if ((fullScaleSplDb != null) == (calibrationFile != null) && battery == null) {
            throw new IllegalArgumentException("give exactly one of --calibration FILE and --full-scale-spl DB");
        }
        if (fullScaleSplDb != null && calibrationFile != null) {
            throw new IllegalArgumentException("give --calibration FILE or --full-scale-spl DB, not both");
        }
        if (ceilingDbSpl != null && fullScaleSplDb == null) {
            throw new IllegalArgumentException("--ceiling goes with --full-scale-spl (a calibration file has its own)");
        }
        SplittableRandom rng = new SplittableRandom(seed);
        Stimulus stimulus;
        Calibration calibration;
        String what;
        if (battery != null) {
            if (frequencyHz != null || levelDbSpl != null || durationSeconds != null) {
                throw new IllegalArgumentException("BATTERY renders a step's trial: --frequency, --level and --duration "
                        + "belong to tone mode");
            }
            if (step == null || value == null) {
                throw new IllegalArgumentException("BATTERY needs --step N and --value X");
            }
            Battery b = load(battery);
            Step s = findStep(b);
            calibration = calibration(b);
            TrialPlan plan = plan(s, rng);
            double standard = standardLevel(s);
            stimulus = new BatteryTrialRenderer(calibration).render(s, plan, standard, rng);
            what = "step " + s.getId() + " at " + fmt(value) + (plan.forcedChoice()
                    ? ", target in interval " + (plan.targetInterval() + 1) + " of " + plan.intervals() : "");
        } else {
            if (frequencyHz == null || levelDbSpl == null || durationSeconds == null) {
                throw new IllegalArgumentException("tone mode needs --frequency HZ, --level DB_SPL and --duration S "
                        + "(or give BATTERY --step N --value X)");
            }
            if (step != null || value != null || targetInterval != null || standardLevelDbSpl != null) {
                throw new IllegalArgumentException("--step, --value, --target-interval and --standard-level need BATTERY");
            }
            calibration = calibration(null);
            stimulus = new StimulusRenderer(calibration).render(
                    new Sound.Tone(frequencyHz, levelDbSpl, durationSeconds, rampSeconds), ear, 0, 0, rng);
            what = String.format(Locale.ROOT, "tone %s Hz at %.2f dB SPL, ramps %s s, %s", fmt(frequencyHz), levelDbSpl,
                    fmt(rampSeconds), ear.name().toLowerCase(Locale.ROOT));
        }
        CheckedStimulus checked = new SafetyGuard(calibration).check(stimulus); // throws: nothing is written
        WavFiles.write(checked, bitsPerSample, out, rng);
        PrintWriter stdout = spec.commandLine().getOut();
        stdout.printf(Locale.ROOT, "%s: %s; %.3f s, %d Hz, %d bit; ceiling %.2f dB SPL (%s)%n", out, what,
                checked.durationSeconds(), checked.sampleRateHz(), bitsPerSample, calibration.ceilingDbSpl(),
                calibration.deviceLabel());
        for (Component c : checked.components()) {
            stdout.printf(Locale.ROOT, "  %s at %.2f dB SPL, %.3f-%.3f s, %s%n", c.description(), c.levelDbSpl(),
                    c.startSample() / (double) checked.sampleRateHz(), c.endSample() / (double) checked.sampleRateHz(),
                    c.ear().name().toLowerCase(Locale.ROOT));
        }
        for (IntervalMark m : checked.intervals()) {
            stdout.printf(Locale.ROOT, "  interval %d: %.3f-%.3f s%s%n", m.index() + 1, m.onsetSeconds(checked.sampleRateHz()),
                    m.offsetSeconds(checked.sampleRateHz()), m.target() ? " (target)" : "");
        }
        stdout.flush();
        return 0;
    }

    private Calibration calibration(Battery b) {
        if (fullScaleSplDb != null) {
            return Calibration.flat(
                    String.format(Locale.ROOT, "flat bench calibration, full-scale sine %.1f dB SPL", fullScaleSplDb),
                    fullScaleSplDb, ceilingDbSpl == null ? Double.POSITIVE_INFINITY : ceilingDbSpl,
                    sampleRateHz == null ? 48000 : sampleRateHz);
        }
        Path file = calibrationFile;
        if (file == null) {
            if (b.getCalibrationFile() == null || b.getCalibrationFile().isBlank()) {
                throw new IllegalArgumentException(battery + ": the battery names no calibration file: give "
                        + "--calibration FILE or --full-scale-spl DB");
            }
            file = battery.toAbsolutePath().getParent().resolve(b.getCalibrationFile()).normalize();
        }
        Calibration c;
        try {
            c = CalibrationMapping.toSignal(LimenFiles.loadCalibration(file));
        } catch (LimenFileException e) {
            throw new IllegalArgumentException(e.getMessage(), e);
        }
        if (sampleRateHz != null && sampleRateHz != c.sampleRateHz()) {
            throw new IllegalArgumentException("--rate " + sampleRateHz + " differs from the calibration's "
                    + c.sampleRateHz() + " Hz (" + file + ")");
        }
        return c;
    }

    private static Battery load(Path file) {
        try {
            return LimenFiles.loadBattery(file);
        } catch (LimenFileException e) {
            throw new IllegalArgumentException(e.getMessage(), e);
        }
    }

    private Step findStep(Battery b) {
        if (step.matches("[0-9]+")) {
            int n = Integer.parseInt(step);
            if (n < 1 || n > b.getSteps().size()) {
                throw new IllegalArgumentException("--step " + n + ": the battery has steps 1 to " + b.getSteps().size());
            }
            return b.getSteps().get(n - 1);
        }
        for (Step s : b.getSteps()) {
            if (step.equals(s.getId())) {
                return s;
            }
        }
        throw new IllegalArgumentException("--step " + step + ": no step with that number or id in " + battery);
    }

    private TrialPlan plan(Step s, SplittableRandom rng) {
        if (s.getTask() instanceof ForcedChoiceTask fc) {
            int n = fc.getIntervalCount();
            int k = targetInterval == null ? rng.nextInt(n) : targetInterval - 1;
            if (k < 0 || k >= n) {
                throw new IllegalArgumentException("--target-interval must be 1 to " + n + ": " + targetInterval);
            }
            return new TrialPlan(value, n, k, false);
        }
        if (targetInterval != null) {
            throw new IllegalArgumentException("--target-interval: step " + s.getId() + " has one interval (yes/no)");
        }
        return new TrialPlan(value, 1, 0, false);
    }

    private double standardLevel(Step s) {
        Level level = s.getStimulus() == null ? null : s.getStimulus().getStandardLevel();
        if (standardLevelDbSpl != null) {
            return standardLevelDbSpl;
        }
        if (level instanceof AbsoluteLevel a) {
            return a.getLevelDbSpl();
        }
        if (level != null) {
            throw new IllegalArgumentException("step " + s.getId() + ": its level is relative to another step's result: "
                    + "give --standard-level DB_SPL");
        }
        return Double.NaN; // detection: the value is the level
    }

    private static String fmt(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
    }
}
