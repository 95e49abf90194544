package limen.ui.booth;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Stream;

import limen.audio.TrialOutput;
import limen.core.About;
import limen.model.Calibration;
import limen.session.BatteryTrialRenderer;
import limen.session.CalibrationMapping;
import limen.session.ModelListenerResponder;
import limen.session.SessionFolder;
import limen.session.SessionRunner;
import limen.signal.CheckedStimulus;
import limen.signal.Exposure;
import limen.signal.ExposureCriterion;

/**
 * What the operator checks before the first trial: the calibration's age and ceiling, the research caution, and
 * the session's estimated noise exposure.
 * <p>
 * The exposure is estimated by a dry run of the whole battery in a temporary archive, with the core runner, a
 * silent output and the default model listener of each step ({@link ModelListenerResponder}), so the trials and
 * levels are those the runner would produce for such a listener. The daily noise dose is
 * {@code D = 100 % · sum_i T_i / T_allowed(L_i)} with {@code T_allowed(L) = T_c / 2^((L - L_c) / q)} (NIOSH 1998,
 * Criteria for a recommended standard, eq. 1-1 and 1-2: L_c = 85 dBA, q = 3 dB, T_c = 8 h; OSHA 29 CFR 1910.95
 * Table G-16a: L_c = 90 dBA, q = 5 dB, levels under 80 dBA not counted), computed by limen.signal's
 * {@link Exposure#worstEarDosePercent}.
 */
public final class Preflight {

    /** Calibrations older than this get a warning (common practice: re-check transducers at least yearly). */
    public static final int CALIBRATION_WARNING_DAYS = 365;

    private Preflight() {
    }

    /**
     * The report.
     *
     * @param lines    what to read
     * @param warnings what needs the operator's attention (also among the lines)
     */
    public record Report(List<String> lines, List<String> warnings) {
    }

    /** The calibration's age and ceiling, and the caution. */
    public static Report calibration(Calibration c, LocalDate today) {
        List<String> lines = new ArrayList<>();
        List<String> warnings = new ArrayList<>();
        lines.add("Calibration: " + c.getName());
        LocalDate on = c.getMeasuredOn();
        if (on == null) {
            warn(lines, warnings, "The calibration has no measurement date: check it before testing anyone.");
        } else {
            long days = ChronoUnit.DAYS.between(on, today);
            lines.add("Measured on " + on + " (" + days + " days ago)"
                    + (c.getMeasuredBy() != null ? " by " + c.getMeasuredBy() : "") + ".");
            if (days > CALIBRATION_WARNING_DAYS) {
                warn(lines, warnings, "The calibration is more than " + CALIBRATION_WARNING_DAYS
                        + " days old: re-measure the transducer.");
            }
        }
        lines.add(String.format(Locale.ROOT, "Ceiling: %.1f dB SPL (the safety guard refuses anything louder).",
                c.getCeilingDbSpl()));
        if (c.isDemonstrationOnly()) {
            warn(lines, warnings, "This calibration is for demonstration only: its values are not measured.");
        }
        lines.add("Caution: " + About.RESEARCH_CAUTION);
        lines.add("Levels must follow your lab's ethics approval and local rules.");
        return new Report(lines, warnings);
    }

    /**
     * The estimated exposure of one run of the battery (a dry run with simulated listeners; takes as long as
     * rendering every trial once). Every trial the runner outputs is added up by {@link Exposure#plus}, and the
     * doses come from {@link Exposure#worstEarDosePercent} (levels per trial, so the OSHA threshold and its 5-dB
     * exchange rate apply trial by trial, not to the session's average).
     */
    public static Report exposure(BoothSession.Loaded loaded, long seed) throws IOException, InterruptedException {
        Path temp = Files.createTempDirectory("limen-preflight");
        try {
            SessionFolder folder = SessionFolder.create(temp, loaded.stem(), loaded.battery(), loaded.calibration(),
                    "preflight", seed, "none (preflight dry run)", 0);
            Summing sum = new Summing();
            SessionRunner runner = SessionRunner.start(folder, sum,
                    new ModelListenerResponder(null, Map.of(), seed ^ 0x2545F4914F6CDD1DL),
                    new BatteryTrialRenderer(CalibrationMapping.toSignal(loaded.calibration())), null, false);
            long trials = runner.run().trials();
            return exposureReport(trials, sum.total);
        } finally {
            try (Stream<Path> walk = Files.walk(temp)) {
                walk.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
    }

    /** A silent output that adds up the exposure of everything played. */
    private static final class Summing implements TrialOutput {
        private Exposure total = Exposure.none();

        @Override
        public void play(CheckedStimulus trial) {
            total = total.plus(Exposure.of(trial));
        }

        @Override
        public String describe() {
            return "none (preflight dry run)";
        }

        @Override
        public void close() {
        }
    }

    /** The report for a total exposure. */
    public static Report exposureReport(long trials, Exposure total) {
        List<String> lines = new ArrayList<>();
        List<String> warnings = new ArrayList<>();
        double leq = Math.max(total.leqDbA(0), total.leqDbA(1));
        lines.add(String.format(Locale.ROOT, "Estimated exposure (dry run, simulated listener, %d trials): "
                + "L_Aeq %.1f dB (worse ear) over %.0f s of sound.", trials, leq, total.durationSeconds()));
        for (ExposureCriterion c : List.of(ExposureCriterion.NIOSH_1998, ExposureCriterion.OSHA_1910_95)) {
            double dose = total.worstEarDosePercent(c);
            String line = dose == 0
                    ? String.format(Locale.ROOT, "  %s: 0 %% of the daily dose (every level below its %.0f dBA threshold).",
                            c.name(), c.thresholdLevelDbA())
                    : String.format(Locale.ROOT, "  %s: %.3g %% of the daily dose.", c.name(), dose);
            if (dose >= 100) {
                warn(lines, warnings, line + " Over the limit: do not run this battery.");
            } else if (dose >= 50) {
                warn(lines, warnings, line + " Above half the daily dose.");
            } else {
                lines.add(line);
            }
        }
        return new Report(lines, warnings);
    }

    private static void warn(List<String> lines, List<String> warnings, String w) {
        lines.add("WARNING: " + w);
        warnings.add(w);
    }
}
