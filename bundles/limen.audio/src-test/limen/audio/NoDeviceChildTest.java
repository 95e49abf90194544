package limen.audio;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The real no-device path: a JVM that finds no sound server and no sound card gets an empty mixer list from
 * Java Sound and the plain message from {@link JavaSoundOutput#open}. Runs in a child JVM whose PULSE_SERVER
 * points at a socket that does not exist (which also stops the client from starting a server of its own).
 */
class NoDeviceChildTest {

    @TempDir
    Path dir;

    @Test
    void withoutSoundServerOrCardOpeningSaysPlaybackIsUnavailable() throws Exception {
        Assumptions.assumeFalse(Files.exists(Path.of("/dev/snd")), "this machine has a sound card");
        AudioTestEnvironment.Child child = new AudioTestEnvironment.Child("none",
                Map.of("XDG_RUNTIME_DIR", dir.toString(), "PULSE_SERVER", "unix:" + dir.resolve("no-server")),
                List.of("LIMEN_TEST_AUDIO"));
        assertTrue(child.process.waitFor(60, TimeUnit.SECONDS), child.childOutput());
        Thread.sleep(100); // let the reader take the last lines
        assertEquals(5, child.process.exitValue(), child.childOutput());
        String out = child.childOutput();
        assertTrue(out.contains("OUTPUTS 0"), out);
        assertTrue(out.contains("NO_DEVICE no audio output device: playback unavailable, render to WAV instead"), out);
    }
}
