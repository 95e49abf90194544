package limen.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.PrintWriter;
import java.io.StringWriter;

import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;

import limen.audio.Devices;
import limen.core.About;

/**
 * {@code ./limen selftest}: on the PulseAudio null sink of releng/run-tests.sh it passes (exit 0); on a machine
 * without any sound device it fails with the plain message (exit 1); usage errors exit 2.
 */
class SelftestCommandTest {

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return LimenCli.execute(new PrintWriter(out, true), new PrintWriter(err, true), args);
    }

    private static boolean pulse() {
        if ("pulse".equals(System.getenv("LIMEN_TEST_AUDIO"))) {
            return true;
        }
        if ("true".equalsIgnoreCase(System.getenv("CI"))) {
            fail("CI=true but LIMEN_TEST_AUDIO is not 'pulse': run the tests through releng/run-tests.sh");
        }
        return false;
    }

    @Test
    void passesOnTheNullSinkAndPrintsDeviceMeasurementsAndVerdict() {
        Assumptions.assumeTrue(pulse(), "LIMEN_TEST_AUDIO unset: no PulseAudio null sink");
        assertEquals(0, run("selftest"), out + "\n" + err);
        String o = out.toString();
        assertTrue(o.contains("output:   javax.sound: default [default]"), o);
        assertTrue(o.contains("capture:  default [default]"), o);
        assertTrue(o.contains("rendered: 1000.000 Hz, -20.00 dBFS RMS"), o);
        assertTrue(o.contains("left:     captured 1000.000 Hz (+0.000), -20.00 dBFS RMS (+0.00 dB)"), o);
        assertTrue(o.contains("right:    captured 1000.000 Hz"), o);
        assertTrue(o.contains("dropouts: none"), o);
        assertTrue(o.strip().endsWith("PASS"), o);
        assertTrue(err.toString().contains(About.RESEARCH_CAUTION), err.toString());
    }

    @Test
    void listsTheDevices() {
        assertEquals(0, run("selftest", "--list"), err.toString());
        assertTrue(out.toString().contains("output devices:"), out.toString());
        assertTrue(out.toString().contains("capture devices:"), out.toString());
    }

    @Test
    void withoutAnyDeviceItSaysSoAndFails() {
        Assumptions.assumeFalse(pulse(), "a sound server is running");
        Assumptions.assumeTrue(Devices.system().outputs().isEmpty(), "this machine has a sound device");
        assertEquals(1, run("selftest"), out + "\n" + err);
        assertTrue(err.toString().contains("limen selftest: no audio output device: playback unavailable, render to WAV "
                + "instead"), err.toString());
    }

    @Test
    void aTooShortLineBufferIsAUsageError() {
        assertEquals(2, run("selftest", "--buffer-ms", "50"), err.toString());
        assertTrue(err.toString().contains("--buffer-ms must be at least 100"), err.toString());
    }
}
