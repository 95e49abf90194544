package limen.audio;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Killing the sound server mid-playback makes {@link JavaSoundOutput} throw {@link DeviceLostException}. The
 * shared null sink of releng/run-tests.sh is left alone: this test starts its own PulseAudio daemon with its own
 * runtime folder and plays in a child JVM pointed at it (a JVM that looked for devices before a daemon started
 * never sees it), then kills that daemon with SIGKILL.
 */
class PulseDeviceLossTest {

    @TempDir
    Path runtime;

    @Test
    void killingTheSoundServerMidTrialIsReportedAsDeviceLoss() throws Exception {
        AudioTestEnvironment.requirePulse();
        Files.setPosixFilePermissions(runtime, java.nio.file.attribute.PosixFilePermissions.fromString("rwx------"));
        Path script = runtime.resolve("loss.pa");
        Files.writeString(script, String.join("\n",
                "load-module module-native-protocol-unix auth-anonymous=1",
                "load-module module-null-sink sink_name=losssink format=s16le rate=48000 channels=2 norewinds=1",
                "set-default-sink losssink", "set-default-source losssink.monitor", ""));
        ProcessBuilder pb = new ProcessBuilder("pulseaudio", "-n", "-F", script.toString(), "--daemonize=no",
                "--exit-idle-time=-1", "--disallow-exit");
        pb.environment().put("XDG_RUNTIME_DIR", runtime.toString());
        pb.environment().remove("PULSE_SERVER");
        pb.redirectErrorStream(true).redirectOutput(runtime.resolve("pulse.log").toFile());
        Process daemon = pb.start();
        AudioTestEnvironment.Child child = null;
        try {
            Path socket = runtime.resolve("pulse").resolve("native");
            long deadline = System.nanoTime() + 15_000_000_000L;
            while (!Files.exists(socket) && daemon.isAlive() && System.nanoTime() < deadline) {
                Thread.sleep(50);
            }
            assertTrue(Files.exists(socket), "own PulseAudio did not start: " + Files.readString(runtime.resolve("pulse.log")));
            child = new AudioTestEnvironment.Child("lose",
                    Map.of("XDG_RUNTIME_DIR", runtime.toString(), "PULSE_SERVER", "unix:" + socket), List.of());
            String open = child.await("OPEN", 30_000);
            assertNotNull(open, "child did not open the output: " + child.childOutput());
            assertNotNull(child.await("PLAYING 1", 30_000), child.childOutput());
            Thread.sleep(700); // well inside the second 2-second trial
            daemon.destroyForcibly();
            assertTrue(daemon.waitFor(10, TimeUnit.SECONDS));
            if (!child.process.waitFor(30, TimeUnit.SECONDS)) {
                child.process.destroyForcibly();
                fail("child still playing 30 s after the sound server was killed: " + child.childOutput());
            }
            assertEquals(3, child.process.exitValue(), child.childOutput());
            String lost = child.childOutput();
            assertTrue(lost.contains("LOST audio device lost on 'default [default]'"), lost);
            assertTrue(lost.contains("the trial was not fully played"), lost);
            System.out.println("device loss in the child: " + lost.lines().filter(l -> l.startsWith("LOST")).findFirst().orElse(""));
        } finally {
            if (child != null && child.process.isAlive()) {
                child.process.destroyForcibly();
            }
            if (daemon.isAlive()) {
                daemon.destroyForcibly();
                daemon.waitFor(10, TimeUnit.SECONDS);
            }
        }
    }
}
