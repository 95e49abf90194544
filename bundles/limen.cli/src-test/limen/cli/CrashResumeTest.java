package limen.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.model.Battery;
import limen.model.SessionStatus;
import limen.model.Step;
import limen.model.StoppingRule;
import limen.model.Track;
import limen.model.io.LimenFiles;
import limen.session.SessionFolder;
import limen.session.journal.JournalContents;
import limen.session.journal.JournalReader;
import limen.session.journal.JournalRow;

/**
 * Kills {@code limen run --realtime} with SIGKILL at random moments and resumes each session: no completed trial
 * is lost or duplicated, and the checksum chain verifies. (Process.destroyForcibly sends SIGKILL on Linux.)
 */
class CrashResumeTest {

    private static final int KILLS = 20;

    @TempDir
    Path temp;

    private static Path examples() {
        String root = System.getProperty("limen.root");
        Path p = root != null ? Paths.get(root, "examples") : Paths.get("examples");
        return Files.isDirectory(p) ? p : Paths.get("../../examples");
    }

    /** The intensity-discrimination demo cut to 10 trials per track, so that each resume is quick. */
    private Path shortBattery() throws Exception {
        Battery b = LimenFiles.loadBattery(examples().resolve("intensity-discrimination.battery"));
        for (Step s : b.getSteps()) {
            for (Track t : s.getTracks()) {
                StoppingRule r = t.getStoppingRule();
                r.setMaximumTrials(10);
            }
        }
        b.setCalibrationFile(examples().resolve("harbourside-demo.calibration").toAbsolutePath().toString());
        Path file = temp.resolve("short.battery");
        LimenFiles.save(b, file);
        return file;
    }

    @Test
    void killedRunsResumeWithoutLossOrDuplication() throws Exception {
        Path battery = shortBattery();
        Path archive = temp.resolve("archive");
        SplittableRandom rng = new SplittableRandom(20261201L);
        int kills = 0;
        int attempts = 0;
        while (kills < KILLS && attempts < 3 * KILLS) {
            attempts++;
            ProcessBuilder pb = new ProcessBuilder(javaExecutable(), "-cp", System.getProperty("java.class.path"),
                    "limen.cli.LimenCli", "run", battery.toString(), "--participant", "P-CRASH" + attempts,
                    "--archive", archive.toString(), "--listener", "logistic:mid=1.0,scale=0.3", "--realtime",
                    "--seed", Long.toString(1000 + attempts), "--quiet");
            pb.redirectError(ProcessBuilder.Redirect.DISCARD);
            Process child = pb.start();
            BufferedReader out = new BufferedReader(new InputStreamReader(child.getInputStream(), StandardCharsets.UTF_8));
            String folderLine = out.readLine(); // printed once the session folder exists
            if (folderLine == null) {
                child.waitFor(10, TimeUnit.SECONDS);
                continue;
            }
            Thread.sleep(rng.nextLong(50, 4000));
            if (!child.isAlive()) {
                continue; // it finished before the chosen moment: not a crash
            }
            child.destroyForcibly();
            child.waitFor(10, TimeUnit.SECONDS);
            kills++;
            Path folder = Paths.get(folderLine.trim());
            JournalContents beforeResume = JournalReader.read(folder.resolve("trials.csv"));
            assertTrue(beforeResume.integrity() == JournalContents.Integrity.OK
                    || beforeResume.integrity() == JournalContents.Integrity.TORN_TAIL,
                    "after SIGKILL: " + beforeResume.problems());
            List<JournalRow> kept = beforeResume.rows();

            StringWriter o = new StringWriter();
            StringWriter e = new StringWriter();
            int code = LimenCli.execute(new PrintWriter(o, true), new PrintWriter(e, true), "run", "--resume",
                    folder.toString(), "--listener", "logistic:mid=1.0,scale=0.3", "--quiet");
            assertEquals(0, code, "resume of " + folder + " failed: " + e);
            SessionFolder resumed = SessionFolder.open(folder);
            assertEquals(SessionStatus.COMPLETED, resumed.header().getStatus());
            JournalContents after = resumed.readJournal();
            assertEquals(JournalContents.Integrity.OK, after.integrity(), after.problems().toString());
            List<JournalRow> rows = after.rows();
            assertTrue(rows.size() >= kept.size());
            for (int i = 0; i < kept.size(); i++) {
                assertEquals(kept.get(i), rows.get(i), "trial " + (i + 1) + " recorded before the kill is kept as is");
            }
            List<Long> seqs = new ArrayList<>();
            rows.forEach(r -> seqs.add(r.seq()));
            for (int i = 0; i < seqs.size(); i++) {
                assertEquals(i + 1, seqs.get(i), "no trial lost or duplicated in " + folder);
            }
        }
        assertEquals(KILLS, kills, "needed " + KILLS + " kills mid-run, got " + kills + " in " + attempts + " attempts");
    }

    private static String javaExecutable() {
        return Paths.get(System.getProperty("java.home"), "bin", "java").toString();
    }
}
