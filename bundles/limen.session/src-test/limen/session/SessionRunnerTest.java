package limen.session;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.audio.NoOutput;
import limen.model.Battery;
import limen.model.Calibration;
import limen.model.SessionStatus;
import limen.model.io.LimenFiles;
import limen.session.journal.JournalContents;
import limen.session.journal.JournalRow;
import limen.session.journal.SessionSeal;

class SessionRunnerTest {

    @TempDir
    Path archive;

    static Path examples() {
        String root = System.getProperty("limen.root");
        Path base = root != null ? Paths.get(root) : Paths.get("../..");
        return base.resolve("examples").toAbsolutePath().normalize();
    }

    private SessionFolder newSession(String battery, long seed) throws Exception {
        Battery b = LimenFiles.loadBattery(examples().resolve(battery + ".battery"));
        Calibration c = LimenFiles.loadCalibration(examples().resolve("harbourside-demo.calibration"));
        return SessionFolder.create(archive, battery, b, c, "P-RAVEN", seed, "none", -1);
    }

    private static SessionStatusInfo run(SessionFolder f, long listenerSeed) throws Exception {
        return SessionRunner.start(f, new NoOutput(false), new ModelListenerResponder(null, Map.of(), listenerSeed),
                new BatteryTrialRenderer(CalibrationMapping.toSignal(f.header().getCalibration())), null, false).run();
    }

    @Test
    void demoBatteryRunsToTheEndWithEveryTrialOnDisk() throws Exception {
        SessionFolder f = newSession("frequency-discrimination", 11);
        List<JournalRow> seen = new ArrayList<>();
        SessionRunner runner = SessionRunner.start(f, new NoOutput(false), new ModelListenerResponder(null, Map.of(), 5),
                new BatteryTrialRenderer(CalibrationMapping.toSignal(f.header().getCalibration())), null, false);
        runner.addListener(new SessionListener() {
            @Override
            public void trialRecorded(JournalRow row, limen.procedure.TrialOutcome o, TrackState t) {
                // the row handed to listeners is already on disk: the journal holds it
                try {
                    assertEquals(row.seq(), f.readJournal().lastSeq());
                } catch (IOException e) {
                    throw new AssertionError(e);
                }
                seen.add(row);
            }
        });
        SessionStatusInfo info = runner.run();
        assertEquals(SessionStatus.COMPLETED, info.status(), info.message());
        JournalContents j = f.readJournal();
        assertEquals(JournalContents.Integrity.OK, j.integrity(), j.problems().toString());
        assertEquals(seen.size(), j.rows().size());
        assertTrue(j.rows().size() > 30);
        SessionSeal seal = SessionSeal.read(f.path());
        assertNotNull(seal);
        assertEquals(j.lastSeq(), seal.trials());
        SessionFolder reopened = SessionFolder.open(f.path());
        assertEquals(SessionStatus.COMPLETED, reopened.header().getStatus());
        assertEquals(3, reopened.header().getStepOrder().size());
        assertTrue(reopened.header().getExposure().getSoundOnSeconds() > 0);
    }

    @Test
    void sameSeedGivesTheSameSession() throws Exception {
        SessionFolder a = newSession("intensity-discrimination", 42);
        SessionFolder b = newSession("intensity-discrimination", 42);
        run(a, 1);
        run(b, 1);
        List<JournalRow> ra = a.readJournal().rows();
        List<JournalRow> rb = b.readJournal().rows();
        assertEquals(ra.size(), rb.size());
        for (int i = 0; i < ra.size(); i++) {
            assertEquals(ra.get(i).value(), rb.get(i).value());
            assertEquals(ra.get(i).checksum().length(), rb.get(i).checksum().length());
            assertEquals(ra.get(i).response(), rb.get(i).response());
        }
    }

    @Test
    void resumeAfterCrashLosesAndRepeatsNothing() throws Exception {
        SessionFolder f = newSession("frequency-discrimination", 23);
        run(f, 3);
        List<JournalRow> full = f.readJournal().rows();
        // simulate a crash after k trials, in the middle of writing trial k+1
        int k = full.size() / 2;
        Path journal = f.journalFile();
        List<String> lines = Files.readAllLines(journal);
        String torn = lines.get(k + 1).substring(0, 12);
        Files.writeString(journal, String.join("\n", lines.subList(0, k + 1)) + "\n" + torn);
        Files.delete(f.path().resolve(SessionSeal.FILE_NAME));
        f.header().setStatus(SessionStatus.RUNNING);
        f.saveHeader();

        SessionFolder again = SessionFolder.open(f.path());
        assertEquals(JournalContents.Integrity.TORN_TAIL, again.readJournal().integrity());
        SessionStatusInfo info = run(again, 99);
        assertEquals(SessionStatus.COMPLETED, info.status(), info.message());
        JournalContents after = again.readJournal();
        assertEquals(JournalContents.Integrity.OK, after.integrity(), after.problems().toString());
        List<JournalRow> rows = after.rows();
        for (int i = 0; i < k; i++) {
            assertEquals(full.get(i), rows.get(i), "trial " + (i + 1) + " kept as recorded");
        }
        for (int i = 0; i < rows.size(); i++) {
            assertEquals(i + 1, rows.get(i).seq(), "no trial lost or duplicated");
        }
        assertTrue(Files.exists(f.path().resolve("trials.torn-" + (k + 1) + ".txt")));
        // the replayed procedures continued where they stopped: the first resumed trial is the one the
        // original run planned at that point (same seed, same answers so far)
        assertEquals(full.get(k).value(), rows.get(k).value());
        assertEquals(full.get(k).track(), rows.get(k).track());
    }

    /**
     * The header's exposure covers the whole session, also when it was resumed: the replayed trials count. Every
     * trial of this battery has the same buffer length, so sound-on time is trials x one trial's length. The NIOSH
     * dose is bracketed with NIOSH (1998) Criteria for a Recommended Standard, eq. 1-1 / 1-2: D = 100 Σ C_n/T_n with
     * T = 8 h / 2^((L - 85)/3), applied to the stored L_Aeq over the buffers: the stored dose counts only the time
     * the tones sound (not the silent gaps the L_Aeq averages over, which lowers L_Aeq) and counts ramps as steady
     * (errs loud), so it lies above that figure, by less than the gaps' share of the buffer. OSHA 29 CFR 1910.95
     * counts no time below 80 dBA: these soft tones give a dose of 0. (The dose arithmetic itself is checked
     * against both standards in limen.signal's exposure tests.)
     */
    @Test
    void headerExposureCoversResumedSessionsAndCarriesTheDoses() throws Exception {
        SessionFolder whole = newSession("intensity-discrimination", 31);
        run(whole, 4);
        int wholeTrials = whole.readJournal().rows().size();
        limen.model.ExposureEstimate a = SessionFolder.open(whole.path()).header().getExposure();
        double perTrial = a.getSoundOnSeconds() / wholeTrials;
        assertTrue(perTrial > 0.5, "one trial's sound-on time " + perTrial);

        SessionFolder f = newSession("intensity-discrimination", 32);
        run(f, 5);
        List<String> lines = Files.readAllLines(f.journalFile());
        int k = (lines.size() - 1) / 2;
        Files.writeString(f.journalFile(), String.join("\n", lines.subList(0, k + 1)) + "\n");
        Files.delete(f.path().resolve(SessionSeal.FILE_NAME));
        f.header().setStatus(SessionStatus.RUNNING);
        f.header().setExposure(null);
        f.saveHeader();
        SessionFolder again = SessionFolder.open(f.path());
        assertEquals(SessionStatus.COMPLETED, run(again, 6).status());
        int trials = again.readJournal().rows().size();
        limen.model.ExposureEstimate e = SessionFolder.open(f.path()).header().getExposure();
        assertEquals(trials * perTrial, e.getSoundOnSeconds(), 1e-6, "sound-on time after a resume at trial " + k);

        double leq = e.getEquivalentLevelDbSpl();
        double allowedSeconds = 8 * 3600 / Math.pow(2, (leq - 85) / 3);
        double niosh = 100 * e.getSoundOnSeconds() / allowedSeconds;
        assertTrue(e.getNioshDosePercent() > 0);
        assertTrue(e.getNioshDosePercent() >= 0.98 * niosh && e.getNioshDosePercent() <= 1.5 * niosh,
                "NIOSH dose " + e.getNioshDosePercent() + " % against " + niosh + " % at L_Aeq " + leq);
        assertEquals(0, e.getOshaDosePercent(), 0, "OSHA counts no time below 80 dBA (L_Aeq " + leq + ")");
        assertTrue(e.getPeakLevelDbSpl() >= leq, "peak " + e.getPeakLevelDbSpl() + " below L_Aeq " + leq);
        assertTrue(e.getPeakLevelDbSpl() <= again.header().getCalibration().getCeilingDbSpl(), "peak above the ceiling");
    }

    @Test
    void resumingWithAnotherSeedIsRefused() throws Exception {
        SessionFolder f = newSession("intensity-discrimination", 5);
        run(f, 1);
        Files.delete(f.path().resolve(SessionSeal.FILE_NAME));
        f.header().setRandomSeed(6);
        f.header().setStatus(SessionStatus.INTERRUPTED);
        f.saveHeader();
        SessionFolder again = SessionFolder.open(f.path());
        IOException e = org.junit.jupiter.api.Assertions.assertThrows(IOException.class, () -> run(again, 1));
        assertTrue(e.getMessage().contains("does not belong"), e.getMessage());
    }

    @Test
    void latinSquareRowsFollowWilliams() {
        // Williams (1949) design for 4 treatments: row 0 = 0 1 3 2; each treatment follows each other once
        assertEquals(List.of(0, 1, 3, 2), toList(StepOrder.williamsRow(4, 0)));
        int[][] counts = new int[4][4];
        for (int r = 0; r < 4; r++) {
            int[] row = StepOrder.williamsRow(4, r);
            for (int i = 0; i + 1 < 4; i++) {
                counts[row[i]][row[i + 1]]++;
            }
        }
        for (int a = 0; a < 4; a++) {
            for (int b = 0; b < 4; b++) {
                assertEquals(a == b ? 0 : 1, counts[a][b], "carry-over balance " + a + "->" + b);
            }
        }
        // odd n: 2n rows balance carry-over (each ordered pair twice)
        int[][] odd = new int[3][3];
        for (int r = 0; r < StepOrder.latinSquareRows(3); r++) {
            int[] row = StepOrder.williamsRow(3, r);
            for (int i = 0; i + 1 < 3; i++) {
                odd[row[i]][row[i + 1]]++;
            }
        }
        for (int a = 0; a < 3; a++) {
            for (int b = 0; b < 3; b++) {
                assertEquals(a == b ? 0 : 2, odd[a][b]);
            }
        }
        assertFalse(StepOrder.latinSquareRows(3) == 3);
    }

    private static List<Integer> toList(int[] a) {
        List<Integer> l = new ArrayList<>();
        for (int v : a) {
            l.add(v);
        }
        return l;
    }
}
