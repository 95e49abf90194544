package limen.session.refit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.audio.NoOutput;
import limen.fit.CancellationFlag;
import limen.fit.FitSettings;
import limen.fit.Progress;
import limen.model.Battery;
import limen.model.Calibration;
import limen.model.SessionStatus;
import limen.model.Step;
import limen.model.Track;
import limen.model.io.LimenFiles;
import limen.session.ArchiveIndex;
import limen.session.BatteryTrialRenderer;
import limen.session.CalibrationMapping;
import limen.session.ModelListenerResponder;
import limen.session.SessionFolder;
import limen.session.SessionRunner;
import limen.session.SessionStatusInfo;

/**
 * The parallel batch against the one-session-at-a-time refit ({@link SessionRefitter}, itself checked against
 * direct fits of the pooled journal in {@link SessionRefitterTest}): the same table, byte for byte, in folder
 * order, whatever the number of threads; a broken session stays a skipped row; a failing sink stops the batch.
 */
class BatchRefitterTest {

    @TempDir
    Path tmp;

    Path archive;

    @BeforeEach
    void archiveFolder() throws Exception {
        Path shm = Paths.get("/dev/shm");
        archive = Files.isDirectory(shm) && Files.isWritable(shm) ? Files.createTempDirectory(shm, "limen-batch-")
                : tmp.resolve("archive");
    }

    @AfterEach
    void removeArchive() throws Exception {
        if (archive.startsWith("/dev/shm")) {
            try (java.util.stream.Stream<Path> w = Files.walk(archive)) {
                w.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
    }

    private void session(String participant, long seed) throws Exception {
        Battery b = LimenFiles.loadBattery(SessionRefitterTest.examples().resolve("intensity-discrimination.battery"));
        for (Step s : b.getSteps()) {
            for (Track t : s.getTracks()) {
                t.getStoppingRule().setMaximumTrials(40);
                t.getStoppingRule().setMaximumReversals(10_000);
            }
        }
        Calibration c = LimenFiles.loadCalibration(SessionRefitterTest.examples().resolve("harbourside-demo.calibration"));
        SessionFolder f = SessionFolder.create(archive, "intensity-discrimination", b, c, participant, seed, "none", -1);
        SessionStatusInfo info = SessionRunner.start(f, new NoOutput(false),
                new ModelListenerResponder("logistic:mid=1.0,scale=0.3,lapse=0.02", Map.of(), seed + 1000),
                new BatteryTrialRenderer(CalibrationMapping.toSignal(c)), null, false).run();
        assertEquals(SessionStatus.COMPLETED, info.status(), info.message());
    }

    private static FitSettings settings() {
        return FitSettings.parse("logistic", "task", 0.06, null, null, null, 60, 11, "bca", 0.95, false, null);
    }

    private static String table(List<SessionRefit> refits) throws IOException {
        StringWriter w = new StringWriter();
        RefitTable t = new RefitTable(settings());
        t.writeHeader(w);
        for (SessionRefit r : refits) {
            t.write(w, r);
        }
        return w.toString();
    }

    @Test
    void sameTableInFolderOrderWhateverTheThreadCount() throws Exception {
        String[] names = { "P-RAVEN", "P-OTTER", "P-FINCH", "P-WREN", "P-HERON", "P-KITE", "P-TERN" };
        for (int i = 0; i < names.length; i++) {
            session(names[i], 20 + i);
        }
        // one broken header among them: reported, never fatal
        Path broken = Files.createDirectories(archive.resolve("P-LARK/broken-session"));
        Files.writeString(broken.resolve(SessionFolder.HEADER_FILE), "<not xmi");
        List<Path> folders = ArchiveIndex.sessions(archive);
        assertEquals(names.length + 1, folders.size());

        List<SessionRefit> one = new ArrayList<>();
        SessionRefitter sequential = new SessionRefitter(settings());
        for (Path f : folders) {
            one.add(sequential.refit(f, Progress.NONE, new CancellationFlag()));
        }
        String expected = table(one);
        for (int threads : new int[] { 1, 2, 3, 16 }) {
            List<SessionRefit> got = new ArrayList<>();
            new BatchRefitter(settings(), threads).refit(folders, got::add, new CancellationFlag());
            assertEquals(folders, got.stream().map(SessionRefit::folder).toList(), threads + " threads: folder order");
            assertEquals(expected, table(got), threads + " threads: the same table");
        }
        assertTrue(expected.contains("P-LARK"), "the broken session has its row");
    }

    @Test
    void aFailingSinkStopsTheBatch() throws Exception {
        for (int i = 0; i < 4; i++) {
            session("P-GULL" + i, 40 + i);
        }
        List<Path> folders = ArchiveIndex.sessions(archive);
        int[] seen = new int[1];
        IOException e = assertThrows(IOException.class, () -> new BatchRefitter(settings(), 2).refit(folders, r -> {
            if (++seen[0] == 2) {
                throw new IOException("disk full (simulated)");
            }
        }, new CancellationFlag()));
        assertEquals("disk full (simulated)", e.getMessage());
        assertEquals(2, seen[0], "nothing is delivered after the failure");
        CancellationFlag cancelled = new CancellationFlag();
        cancelled.cancel();
        assertThrows(java.util.concurrent.CancellationException.class,
                () -> new BatchRefitter(settings(), 2).refit(folders, r -> { }, cancelled));
    }
}
