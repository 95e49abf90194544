package limen.session.refit;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.fit.BinomialData;
import limen.fit.FitOptions;
import limen.fit.FitResult;
import limen.fit.FitSettings;
import limen.fit.PsychometricFitter;
import limen.model.LimenFactory;
import limen.model.QuantityUnit;
import limen.model.SessionHeader;
import limen.psychometric.PsychometricFunction;
import limen.psychometric.Sigmoids;
import limen.session.journal.JournalRow;

/** Saved fits, the tidy trial table, the curve band and the condition summary used by the analysis views. */
class AnalysisSupportTest {

    @TempDir
    Path tmp;

    private static FitSettings settings(int bootstrap, long seed) {
        return FitSettings.parse("logistic", "task", 0.06, null, 0.75, null, bootstrap, seed, "percentile", 0.9, false, 1);
    }

    /** A refit with one fitted track, made by the real refitter on hand-made data. */
    private SessionRefit refit(Path folder, FitSettings s) {
        double[] v = {1, 1, 2, 2, 3, 3, 4, 4, 4, 5, 5, 6};
        boolean[] c = {false, true, false, true, true, false, true, true, true, true, true, true};
        TrackData d = new TrackData("fd-1000", 1, "A", "percent", 0.5, true, 0, v, c, 0, 0);
        TrackFit t = new SessionRefitter(s).fit(d, limen.fit.Progress.NONE, new limen.fit.CancellationFlag());
        return new SessionRefit(folder, "P-FINCH", "Harbourside, \"FD\"", Instant.parse("2026-03-04T10:00:00Z"), "COMPLETED",
                "OK", "", List.of(t));
    }

    @Test
    void savedFitsNeverReplaceAnEarlierFitAndKeepTheirSettings() throws Exception {
        Path session = Files.createDirectories(tmp.resolve("P-FINCH/fd-1"));
        Path other = Files.writeString(session.resolve("trials.csv"), "untouched\n");
        Instant when = Instant.parse("2026-03-04T11:22:33.456Z");
        FitSettings s1 = settings(20, 3);
        FitSettings s2 = FitSettings.parse("weibull", "0.5", 0.0, null, null, null, 0, 9, "bca", 0.95, false, null);
        SessionRefit r1 = refit(session, s1);
        Path first = SavedFits.save(r1, s1, when);
        byte[] firstBytes = Files.readAllBytes(first);
        // the same instant twice: the second save must take another name
        Path second = SavedFits.save(refit(session, s2), s2, when);
        assertNotEquals(first, second);
        assertArrayEquals(firstBytes, Files.readAllBytes(first), "the earlier fit is unchanged");
        assertEquals("fit-20260304-112233-456-1.csv", first.getFileName().toString());
        assertEquals("fit-20260304-112233-456-2.csv", second.getFileName().toString());
        assertEquals(List.of(first, second), SavedFits.list(session));
        assertEquals("untouched\n", Files.readString(other));
        try (Stream<Path> files = Files.list(session.resolve(SavedFits.FOLDER))) {
            assertEquals(4, files.count(), "two tables, two settings files, no temporary file left");
        }

        SavedFits.SavedFit back = SavedFits.read(first);
        assertEquals(s1.toString(), back.settings().toString(), "settings read back");
        assertEquals(RefitTable.COLUMNS, back.header());
        assertEquals(new RefitTable(s1).rows(r1), back.rows(), "the rows as ./limen refit writes them");
        assertEquals("Harbourside, \"FD\"", back.field(back.rows().get(0), "battery"), "quoted field read back");
        assertEquals(s2.toString(), SavedFits.read(second).settings().toString());
        // the settings reproduce the numbers: refit with them and compare the threshold column
        SessionRefit again = refit(session, back.settings());
        assertEquals(new RefitTable(back.settings()).rows(again).get(0).get(RefitTable.COLUMNS.indexOf("threshold")),
                back.field(back.rows().get(0), "threshold"));
    }

    @Test
    void rfc4180RecordsAsInTheStandardsExamples() throws Exception {
        // RFC 4180 (Shafranovich 2005) section 2, rules 5-7: quoted fields may hold commas, line breaks, doubled quotes
        String text = "a,b,c\r\n\"x,1\",\"two\nlines\",\"say \"\"hi\"\"\"\r\n,,\n";
        List<List<String>> r = Rfc4180.parse(text);
        assertEquals(List.of(List.of("a", "b", "c"), List.of("x,1", "two\nlines", "say \"hi\""), List.of("", "", "")), r);
        // and what RefitTable writes reads back to the same fields
        StringWriter w = new StringWriter();
        List<String> fields = List.of("p,q", "\"", "plain", "", "line\r\nbreak");
        RefitTable.writeRecord(w, fields);
        assertEquals(List.of(fields), Rfc4180.parse(w.toString()));
    }

    private static JournalRow row(long seq, String track, double value, boolean correct, boolean catchTrial) {
        return new JournalRow(seq, Instant.parse("2026-03-04T10:00:00Z").plusSeconds(seq), "fd-500", 1, track, value,
                "percent", correct, 1, 500, 60, 1, catchTrial, "x");
    }

    @Test
    void trialTableMarksEachTracksTurningPoints() {
        // track A: 8, 4, 4, 2, 4, 8, 4 -> turning points at 2 (down then up) and 8 (up then down), worked by hand after
        // Levitt (1971) JASA 49(2B) 467-477: a reversal is a change of direction of the staircase
        // track B is interleaved and has a catch trial in between; its values 1, 2, 1 turn at 2
        List<JournalRow> rows = new ArrayList<>();
        double[] a = {8, 4, 4, 2, 4, 8, 4};
        double[] b = {1, 2, 1};
        long seq = 1;
        for (int i = 0; i < a.length; i++) {
            rows.add(row(seq++, "A", a[i], i % 2 == 0, false));
            if (i < b.length) {
                rows.add(row(seq++, "B", b[i], true, false));
            }
            if (i == 1) {
                rows.add(row(seq++, "B", 0, true, true));
            }
        }
        SessionHeader h = LimenFactory.eINSTANCE.createSessionHeader();
        h.setParticipant("P-OTTER");
        List<List<String>> t = TrialTable.rows("s1", h, "OK", rows);
        assertEquals(rows.size(), t.size());
        int rev = TrialTable.COLUMNS.indexOf("reversal");
        int value = TrialTable.COLUMNS.indexOf("value");
        int track = TrialTable.COLUMNS.indexOf("track");
        int trial = TrialTable.COLUMNS.indexOf("track_trial");
        List<String> reversalsA = new ArrayList<>();
        List<String> reversalsB = new ArrayList<>();
        for (List<String> r : t) {
            assertEquals(TrialTable.COLUMNS.size(), r.size());
            if (r.get(rev).equals("1")) {
                (r.get(track).equals("A") ? reversalsA : reversalsB).add(r.get(value) + "@" + r.get(trial));
            }
        }
        assertEquals(List.of("2.0@4", "8.0@6"), reversalsA);
        assertEquals(List.of("2.0@2"), reversalsB, "the catch trial is counted in the track but is no turning point");
        assertEquals("NA", t.stream().filter(r -> r.get(TrialTable.COLUMNS.indexOf("catch")).equals("1")).findFirst()
                .orElseThrow().get(rev));
        assertEquals("P-OTTER", t.get(0).get(1));
        assertEquals("NA", t.get(0).get(TrialTable.COLUMNS.indexOf("started")), "no start time in this header");
    }

    @Test
    void quantileIsHyndmanAndFanDefinition7() {
        double[] x = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10};
        // Hyndman & Fan (1996) definition 7: h = (n - 1) p; worked by hand: p 0.1 -> h 0.9 -> 1.9; p 0.975 -> h 8.775
        assertEquals(1.9, CurveBand.quantile(x, 0.1), 1e-12);
        assertEquals(9.775, CurveBand.quantile(x, 0.975), 1e-12);
        assertEquals(5.5, CurveBand.quantile(x, 0.5), 1e-12, "the median of 1..10");
        assertEquals(1, CurveBand.quantile(x, 0), 0);
        assertEquals(10, CurveBand.quantile(x, 1), 0);
    }

    private static FitResult fitOf(int trialsPerCell) {
        PsychometricFunction truth = new PsychometricFunction(Sigmoids.byName("logistic"), 3, 0.8, 0.5, 0);
        double[] v = {1, 2, 3, 4, 5, 6};
        int[] n = new int[v.length];
        int[] k = new int[v.length];
        for (int i = 0; i < v.length; i++) {
            n[i] = trialsPerCell;
            k[i] = (int) Math.round(trialsPerCell * truth.psi(v[i]));
        }
        return new PsychometricFitter(FitOptions.of(Sigmoids.byName("logistic")).withGuess(0.5).withLapse(0))
                .fit(new BinomialData(v, n, k));
    }

    @Test
    void curveBandSurroundsTheFitAndNarrowsWithMoreTrials() {
        double[] grid = CurveBand.grid(1, 6, 11, false);
        assertEquals(1.5, grid[1], 1e-12);
        FitResult small = fitOf(20);
        FitResult large = fitOf(320);
        CurveBand a = CurveBand.of(small, grid, 300, 5, 0.9);
        CurveBand again = CurveBand.of(small, grid, 300, 5, 0.9);
        assertArrayEquals(a.lower(), again.lower(), "seeded: the same band");
        assertFalse(java.util.Arrays.equals(a.lower(), CurveBand.of(small, grid, 300, 6, 0.9).lower()), "another seed, another band");
        CurveBand b = CurveBand.of(large, grid, 300, 5, 0.9);
        assertTrue(a.replicates() > 250, "nearly all replicates refitted: " + a.replicates());
        double widthA = 0;
        double widthB = 0;
        for (int g = 0; g < grid.length; g++) {
            double psi = small.function().psi(grid[g]);
            assertTrue(a.lower()[g] <= psi && psi <= a.upper()[g], "the fitted curve lies in its band at " + grid[g]);
            assertTrue(a.lower()[g] >= 0.5 - 1e-9 && a.upper()[g] <= 1 + 1e-9, "guess fixed at 0.5, lapse at 0");
            widthA += a.upper()[g] - a.lower()[g];
            widthB += b.upper()[g] - b.lower()[g];
        }
        // 16 times the trials: the band should be about 4 times narrower (standard error ~ 1/sqrt(n), common practice)
        double ratio = widthB / widthA;
        assertTrue(ratio > 0.15 && ratio < 0.4, "width ratio " + ratio);
        assertTrue(CurveBand.grid(0.1, 10, 3, true)[1] - 1 < 1e-12, "log grid midpoint is the geometric mean");
    }

    @Test
    void relativeDifferenceLimens() {
        // Δf/f from the definitions: 1200 cents is an octave (ratio 2, Δf/f = 1); 100 cents a semitone, 2^(1/12) - 1
        assertEquals(1.0, ConditionSummary.relative(1200, QuantityUnit.CENTS, 1000), 1e-12);
        assertEquals(Math.pow(2, 1.0 / 12) - 1, ConditionSummary.relative(100, QuantityUnit.CENTS, 1000), 1e-12);
        assertEquals(0.005, ConditionSummary.relative(0.5, QuantityUnit.PERCENT, 500), 1e-15);
        assertEquals(0.005, ConditionSummary.relative(5, QuantityUnit.HZ, 1000), 1e-15);
        assertTrue(Double.isNaN(ConditionSummary.relative(2, QuantityUnit.DB, 1000)), "a level has no Δf/f");
    }
}
