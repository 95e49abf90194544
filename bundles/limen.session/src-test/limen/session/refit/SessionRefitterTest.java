package limen.session.refit;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.audio.NoOutput;
import limen.fit.BinomialData;
import limen.fit.Bootstrap;
import limen.fit.BootstrapOptions;
import limen.fit.BootstrapResult;
import limen.fit.CancellationFlag;
import limen.fit.FitOptions;
import limen.fit.FitResult;
import limen.fit.FitSettings;
import limen.fit.IntervalMethod;
import limen.fit.Progress;
import limen.fit.PsychometricFitter;
import limen.model.Battery;
import limen.model.Calibration;
import limen.model.SessionStatus;
import limen.model.Step;
import limen.model.Track;
import limen.model.io.LimenFiles;
import limen.psychometric.ListenerSpec;
import limen.psychometric.Sigmoids;
import limen.session.ArchiveIndex;
import limen.session.BatteryTrialRenderer;
import limen.session.CalibrationMapping;
import limen.session.ModelListenerResponder;
import limen.session.SessionFolder;
import limen.session.SessionRunner;
import limen.session.SessionStatusInfo;
import limen.session.journal.JournalRow;

class SessionRefitterTest {

    /** The model listener of the intensity steps (2AFC, dB increments): its own default spec. */
    private static final String LISTENER = "logistic:mid=1.0,scale=0.3,lapse=0.02";

    @TempDir
    Path tmp;

    Path archive;

    /**
     * The runner syncs the journal to disk after every trial; on a RAM disk (when there is one) that costs
     * nothing, which keeps these multi-hundred-trial sessions fast. Removed after each test.
     */
    @org.junit.jupiter.api.BeforeEach
    void archiveFolder() throws Exception {
        Path shm = Paths.get("/dev/shm");
        archive = Files.isDirectory(shm) && Files.isWritable(shm) ? Files.createTempDirectory(shm, "limen-refit-")
                : tmp.resolve("archive");
    }

    @org.junit.jupiter.api.AfterEach
    void removeArchive() throws Exception {
        if (archive.startsWith("/dev/shm")) {
            try (java.util.stream.Stream<Path> w = Files.walk(archive)) {
                w.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
    }

    static Path examples() {
        String root = System.getProperty("limen.root");
        Path base = root != null ? Paths.get(root) : Paths.get("../..");
        return base.resolve("examples").toAbsolutePath().normalize();
    }

    /** Runs the Harbourside intensity battery with tracks of {@code trials} trials for one participant. */
    private SessionFolder session(String participant, int trials, long seed) throws Exception {
        Battery b = LimenFiles.loadBattery(examples().resolve("intensity-discrimination.battery"));
        for (Step s : b.getSteps()) {
            for (Track t : s.getTracks()) {
                t.getStoppingRule().setMaximumTrials(trials);
                t.getStoppingRule().setMaximumReversals(10_000);
            }
        }
        Calibration c = LimenFiles.loadCalibration(examples().resolve("harbourside-demo.calibration"));
        SessionFolder f = SessionFolder.create(archive, "intensity-discrimination", b, c, participant, seed, "none", -1);
        SessionStatusInfo info = SessionRunner.start(f, new NoOutput(false),
                new ModelListenerResponder(LISTENER, Map.of(), seed + 1000),
                new BatteryTrialRenderer(CalibrationMapping.toSignal(c)), null, false).run();
        assertEquals(SessionStatus.COMPLETED, info.status(), info.message());
        return f;
    }

    private static FitSettings settings(int bootstrap) {
        return FitSettings.parse("logistic", "task", 0.06, null, null, null, bootstrap, 7, "bca", 0.95, false, 2);
    }

    @Test
    void refitThresholdOfAModelListenerIsNearItsTrueValue() throws Exception {
        SessionFolder f = session("P-RAVEN", 300, 11);
        SessionRefit r = new SessionRefitter(settings(0)).refit(f.path(), Progress.NONE, new CancellationFlag());
        assertFalse(r.skipped(), r.problem());
        assertEquals("P-RAVEN", r.participant());
        assertEquals("OK", r.integrity());
        assertEquals(2, r.tracks().size());
        // true value at the default target (midway between guess and 1 - lapse, i.e. F = 1/2) of the listener
        // psi = 1/2 + (1 - 1/2 - 0.02) F: the inverse of F at 1/2, computed from the spec itself
        double truth = ListenerSpec.parse(LISTENER, 0.5).inverseF(0.5);
        assertEquals(1.0, truth, 1e-12);
        for (TrackFit t : r.tracks()) {
            assertEquals(TrackFit.Outcome.FITTED, t.outcome(), t.message());
            assertEquals(300, t.data().trials());
            assertEquals(0.5, t.fit().function().guess(), 0, "2AFC: guess fixed at 1/2 from the battery snapshot");
            // loose tolerance (our choice): 300 staircase trials put the threshold's SE near 0.1 dB
            assertEquals(truth, t.fit().threshold(), 0.35, t.fit().toString());
            assertTrue(t.fit().slope() > 0);
            // the weighted up-down track (Kaernbach 1991) converges on 75 % correct, i.e. F = (0.75-0.5)/0.48
            double f75 = ListenerSpec.parse(LISTENER, 0.5).inversePsi(0.75);
            assertNotNull(t.reversals());
            assertEquals(f75, t.reversalMean(), 0.5, "reversal mean near the track's target");
        }
    }

    @Test
    void rowsEqualADirectFitOfThePooledJournal() throws Exception {
        SessionFolder f = session("P-OTTER", 120, 3);
        FitSettings s = settings(200);
        SessionRefit r = new SessionRefitter(s).refit(f.path(), Progress.NONE, new CancellationFlag());
        List<JournalRow> rows = f.readJournal().rows();
        for (TrackFit t : r.tracks()) {
            // pool independently of TrackData: values equal to 9 significant digits are one level (additive steps
            // of 0.1 give 0.2 and 0.20000000000000018 along two paths); the cell keeps its smallest recorded value
            TreeMap<java.math.BigDecimal, int[]> cells = new TreeMap<>();
            TreeMap<java.math.BigDecimal, Double> smallest = new TreeMap<>();
            for (JournalRow j : rows) {
                if (j.step().equals(t.data().stepId()) && j.track().equals(t.data().track()) && !j.catchTrial()) {
                    java.math.BigDecimal level = new java.math.BigDecimal(j.value()).round(new java.math.MathContext(9));
                    int[] c = cells.computeIfAbsent(level, v -> new int[2]);
                    c[0]++;
                    c[1] += j.correct() ? 1 : 0;
                    smallest.merge(level, j.value(), Math::min);
                }
            }
            double[] v = smallest.values().stream().mapToDouble(Double::doubleValue).toArray();
            int[] n = cells.values().stream().mapToInt(c -> c[0]).toArray();
            int[] k = cells.values().stream().mapToInt(c -> c[1]).toArray();
            BinomialData data = new BinomialData(v, n, k);
            assertEquals(data, t.fit().data());
            FitResult direct = new PsychometricFitter(FitOptions.of(Sigmoids.LOGISTIC).withGuess(0.5).withLapseMax(0.06)).fit(data);
            assertEquals(direct.threshold(), t.fit().threshold(), 0);
            assertEquals(direct.slope(), t.fit().slope(), 0);
            assertEquals(direct.logLikelihood(), t.fit().logLikelihood(), 0);
            BootstrapResult boot = new Bootstrap(BootstrapOptions.parametric(200, 7).withParallelism(1)).run(direct,
                    Progress.NONE, new CancellationFlag());
            assertEquals(boot.thresholdInterval(IntervalMethod.BCA).lower(), t.bootstrap().thresholdInterval(IntervalMethod.BCA).lower(), 0);
            assertEquals(boot.thresholdInterval(IntervalMethod.BCA).upper(), t.bootstrap().thresholdInterval(IntervalMethod.BCA).upper(), 0);
            assertEquals(boot.goodnessOfFitP(), t.bootstrap().goodnessOfFitP(), 0);
        }
        // the table holds the same numbers as text that reads back exactly
        StringWriter w = new StringWriter();
        RefitTable table = new RefitTable(s);
        table.writeHeader(w);
        table.write(w, r);
        List<String> lines = w.toString().lines().toList();
        assertEquals(1 + r.tracks().size(), lines.size());
        List<String> header = List.of(lines.get(0).split(","));
        assertEquals(RefitTable.COLUMNS, header);
        List<String> first = table.rows(r).get(0);
        assertEquals(RefitTable.COLUMNS.size(), first.size());
        assertEquals(r.tracks().get(0).fit().threshold(), Double.parseDouble(first.get(header.indexOf("threshold"))), 0);
        assertEquals("fitted", first.get(header.indexOf("outcome")));
        assertEquals("P-OTTER", first.get(header.indexOf("participant")));
    }

    @Test
    void tamperedTruncatedAndUnreadableSessionsAreSkippedWithTheirVerdict() throws Exception {
        SessionFolder edited = session("P-FINCH", 40, 5);
        SessionFolder cut = session("P-WREN", 40, 6);
        SessionFolder garbled = session("P-HERON", 40, 8);
        SessionFolder fine = session("P-RAVEN", 40, 9);
        // edit one value: the checksum chain breaks there
        List<String> lines = new ArrayList<>(Files.readAllLines(edited.journalFile()));
        String[] fields = lines.get(5).split(",", -1);
        fields[4] = fields[4].equals("3") ? "4" : "3";
        lines.set(5, String.join(",", fields));
        Files.write(edited.journalFile(), lines);
        // drop the last rows: the chain verifies but the seal counts more trials
        List<String> all = Files.readAllLines(cut.journalFile());
        Files.write(cut.journalFile(), all.subList(0, all.size() - 3));
        // not a journal at all
        Files.writeString(garbled.journalFile(), "this is not a journal\n");
        // a header that is not XMI
        Path broken = Files.createDirectories(archive.resolve("P-KITE/broken-session"));
        Files.writeString(broken.resolve(SessionFolder.HEADER_FILE), "<not xmi");

        SessionRefitter refitter = new SessionRefitter(settings(0));
        Map<String, SessionRefit> byName = new TreeMap<>();
        for (Path p : ArchiveIndex.sessions(archive)) {
            SessionRefit r = refitter.refit(p, Progress.NONE, new CancellationFlag());
            byName.put(p.getParent().getFileName().toString(), r);
        }
        assertEquals(5, byName.size());
        assertEquals("BROKEN_CHAIN", byName.get("P-FINCH").integrity());
        assertEquals("TRUNCATED", byName.get("P-WREN").integrity());
        assertEquals("MALFORMED", byName.get("P-HERON").integrity());
        assertEquals(SessionRefit.UNREADABLE, byName.get("P-KITE").integrity());
        for (String skipped : List.of("P-FINCH", "P-WREN", "P-HERON", "P-KITE")) {
            assertTrue(byName.get(skipped).skipped(), skipped);
            assertTrue(byName.get(skipped).tracks().isEmpty());
        }
        assertFalse(byName.get("P-RAVEN").skipped());
        assertEquals(2, byName.get("P-RAVEN").tracks().size());
        // a skipped session is one row with its verdict and the reason
        List<String> row = new RefitTable(settings(0)).rows(byName.get("P-FINCH")).get(0);
        assertEquals(RefitTable.COLUMNS.size(), row.size());
        assertEquals("BROKEN_CHAIN", row.get(RefitTable.COLUMNS.indexOf("integrity")));
        assertEquals("skipped", row.get(RefitTable.COLUMNS.indexOf("outcome")));
        assertTrue(row.get(RefitTable.COLUMNS.indexOf("message")).contains("BROKEN_CHAIN"));
    }

    /**
     * One level reached along two paths of a multiplicative staircase: 8 · 2^-1 · 1.189^-3 and 8 · 1.189^-3 · 2^-1
     * are the same level, but their floating-point products can differ in the last digit (IEEE 754 rounding of each
     * product). Pooling makes one cell of them; a level a real step away stays its own cell.
     */
    @Test
    void poolingMergesValuesThatDifferOnlyByRounding() {
        double a = 0.5949143382517145;
        double b = Math.nextUp(a);
        assertTrue(b != a);
        double c = a * 1.189; // one step of the staircase above
        TrackData t = new TrackData("fd-500", 1, "A", "PERCENT", 0.5, true, 0, new double[] {a, b, c, b, a},
                new boolean[] {true, false, true, true, true}, 0, 0);
        limen.fit.BinomialData cells = t.pooled();
        assertEquals(2, cells.size(), "cells " + java.util.Arrays.toString(cells.values()));
        assertEquals(a, cells.value(0), 0);
        assertEquals(4, cells.trials(0));
        assertEquals(3, cells.correct(0));
        assertEquals(c, cells.value(1), 0);
        assertEquals(1, cells.trials(1));
    }

    @Test
    void reversalsAreThePeaksAndValleysOfTheTrack() {
        // worked by hand: 8 4 4 2 [4] 2 2 [1] 2 with the valley at index 3 (value 2), the peak at 4, the valley at 7
        double[] track = { 8, 4, 4, 2, 4, 2, 2, 1, 2 };
        assertArrayEquals(new int[] { 3, 4, 7 }, Reversals.indices(track));
        assertArrayEquals(new int[0], Reversals.indices(new double[] { 1, 2, 3, 3, 4 }));
        // geometric mean on a log scale: 10^mean(log10 2, log10 4, log10 1) = (2*4*1)^(1/3) = 2
        assertEquals(Math.log10(2), Reversals.estimate(track, 0, true).mean(), 1e-12);
        assertEquals((4 + 1) / 2.0, Reversals.estimate(track, 1, false).mean(), 1e-12);
        assertEquals(null, Reversals.estimate(track, 3, false));
    }
}
