package limen.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.model.Battery;
import limen.model.SessionStatus;
import limen.model.Step;
import limen.model.Track;
import limen.model.io.LimenFiles;
import limen.session.SessionFolder;
import limen.session.journal.JournalContents;
import limen.session.journal.JournalRow;

/**
 * Killing the sound server in the middle of {@code limen run --output audio} interrupts the session with a
 * message and keeps every recorded trial; the session then resumes (here to the none output) and completes.
 * Needs PulseAudio (started by releng/run-tests.sh, which sets LIMEN_TEST_AUDIO=pulse); this test starts its
 * own daemon so the shared one stays up, and runs the session in a child JVM pointed at it.
 */
class SessionDeviceLossTest {

    @TempDir
    Path temp;

    @Test
    void killingTheSoundServerInterruptsAndResumeCompletes() throws Exception {
        boolean pulse = "pulse".equals(System.getenv("LIMEN_TEST_AUDIO"));
        if (!pulse && "true".equals(System.getenv("CI"))) {
            throw new AssertionError("CI=true but no PulseAudio (LIMEN_TEST_AUDIO unset): run releng/run-tests.sh");
        }
        Assumptions.assumeTrue(pulse, "needs PulseAudio: run through releng/run-tests.sh");
        Path runtime = Files.createDirectories(temp.resolve("runtime"));
        Files.setPosixFilePermissions(runtime, PosixFilePermissions.fromString("rwx------"));
        Path script = runtime.resolve("loss.pa");
        Files.writeString(script, String.join("\n", "load-module module-native-protocol-unix auth-anonymous=1",
                "load-module module-null-sink sink_name=sessionsink format=s16le rate=48000 channels=2 norewinds=1",
                "set-default-sink sessionsink", "set-default-source sessionsink.monitor", ""));
        ProcessBuilder daemonBuilder = new ProcessBuilder("pulseaudio", "-n", "-F", script.toString(), "--daemonize=no",
                "--exit-idle-time=-1", "--disallow-exit");
        daemonBuilder.environment().put("XDG_RUNTIME_DIR", runtime.toString());
        daemonBuilder.environment().remove("PULSE_SERVER");
        daemonBuilder.redirectErrorStream(true).redirectOutput(runtime.resolve("pulse.log").toFile());
        Process daemon = daemonBuilder.start();
        Process child = null;
        try {
            Path socket = runtime.resolve("pulse").resolve("native");
            long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(15);
            while (!Files.exists(socket) && daemon.isAlive() && System.nanoTime() < deadline) {
                Thread.sleep(50);
            }
            assertTrue(Files.exists(socket), "own PulseAudio did not start");
            Path battery = battery();
            Path archive = temp.resolve("archive");
            Path errLog = temp.resolve("child.err");
            ProcessBuilder pb = new ProcessBuilder(Paths.get(System.getProperty("java.home"), "bin", "java").toString(),
                    "-cp", System.getProperty("java.class.path"), "limen.cli.LimenCli", "run", battery.toString(),
                    "--participant", "P-HERON", "--archive", archive.toString(), "--output", "audio",
                    "--listener", "logistic:mid=1.0,scale=0.3", "--seed", "77");
            pb.environment().put("XDG_RUNTIME_DIR", runtime.toString());
            pb.environment().put("PULSE_SERVER", "unix:" + socket);
            pb.redirectError(errLog.toFile());
            child = pb.start();
            BufferedReader out = new BufferedReader(new InputStreamReader(child.getInputStream(), StandardCharsets.UTF_8));
            String folderLine = out.readLine();
            assertNotNull(folderLine, "no session folder: " + Files.readString(errLog));
            Path folder = Paths.get(folderLine.trim());
            // let a few trials play, then take the sound server away
            long until = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
            while (SessionFolder.open(folder).readJournal().rows().size() < 3 && System.nanoTime() < until) {
                Thread.sleep(100);
            }
            daemon.destroyForcibly();
            daemon.waitFor(10, TimeUnit.SECONDS);
            assertTrue(child.waitFor(60, TimeUnit.SECONDS), "the run did not stop after the device was lost");
            String err = Files.readString(errLog);
            assertEquals(1, child.exitValue(), err);
            assertTrue(err.contains("sound device lost"), err);

            SessionFolder interrupted = SessionFolder.open(folder);
            assertEquals(SessionStatus.INTERRUPTED, interrupted.header().getStatus());
            JournalContents kept = interrupted.readJournal();
            assertEquals(JournalContents.Integrity.OK, kept.integrity(), kept.problems().toString());
            List<JournalRow> before = kept.rows();
            assertTrue(before.size() >= 3, "trials recorded before the loss: " + before.size());

            StringWriter o = new StringWriter();
            StringWriter e = new StringWriter();
            int code = LimenCli.execute(new PrintWriter(o, true), new PrintWriter(e, true), "run", "--resume",
                    folder.toString(), "--output", "none", "--listener", "logistic:mid=1.0,scale=0.3", "--quiet");
            assertEquals(0, code, e.toString());
            List<JournalRow> after = SessionFolder.open(folder).readJournal().rows();
            for (int i = 0; i < before.size(); i++) {
                assertEquals(before.get(i), after.get(i), "trial " + (i + 1) + " kept through the loss");
            }
            assertEquals(SessionStatus.COMPLETED, SessionFolder.open(folder).header().getStatus());
        } finally {
            if (child != null && child.isAlive()) {
                child.destroyForcibly();
            }
            if (daemon.isAlive()) {
                daemon.destroyForcibly();
            }
        }
    }

    private Path battery() throws Exception {
        String root = System.getProperty("limen.root");
        Path examples = root != null ? Paths.get(root, "examples") : Paths.get("examples");
        if (!Files.isDirectory(examples)) {
            examples = Paths.get("../../examples");
        }
        Battery b = LimenFiles.loadBattery(examples.resolve("intensity-discrimination.battery"));
        for (Step s : b.getSteps()) {
            for (Track t : s.getTracks()) {
                t.getStoppingRule().setMaximumTrials(12);
            }
        }
        b.setCalibrationFile(examples.resolve("harbourside-demo.calibration").toAbsolutePath().toString());
        Path file = temp.resolve("loss.battery");
        LimenFiles.save(b, file);
        return file;
    }
}
