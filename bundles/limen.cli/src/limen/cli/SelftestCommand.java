package limen.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.concurrent.Callable;

import limen.audio.AudioDevice;
import limen.audio.DeviceLostException;
import limen.audio.Devices;
import limen.audio.JavaSoundOutput;
import limen.audio.LoopbackSelfTest;
import limen.audio.NoDeviceException;
import limen.core.About;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code ./limen selftest}: the loopback self-test of {@link LoopbackSelfTest}: plays a test tone on the sound
 * output while recording it, and compares frequency, level and length with what was rendered.
 */
@Command(name = "selftest", mixinStandardHelpOptions = true,
        description = {"Play a test tone (1000 Hz, -20 dBFS peak, 500 ms) on the sound output while recording from a "
                + "capture device, and compare the recording with what was rendered: frequency, level, length, "
                + "dropouts.",
                "Connect the output to the capture input (a cable, or a sound server's monitor of the output); the "
                        + "tone is not meant for ears."},
        footer = {"", "Exit codes: 0 pass; 1 fail, no output device, or no capture device (played but not verified); "
                + "2 usage error."})
public final class SelftestCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Option(names = "--device", paramLabel = "NAME",
            description = "Output device (name or unique part of it; default: the system default).")
    String device;

    @Option(names = "--capture", paramLabel = "NAME",
            description = "Capture device (name or unique part of it; default: the system default).")
    String capture;

    @Option(names = "--buffer-ms", paramLabel = "MS", defaultValue = "" + JavaSoundOutput.DEFAULT_BUFFER_MILLIS,
            description = "Output line buffer in ms, at least " + JavaSoundOutput.MIN_BUFFER_MILLIS
                    + " (default: ${DEFAULT-VALUE}).")
    int bufferMillis;

    @Option(names = "--list", description = "List the output and capture devices and exit.")
    boolean list;

    @Option(names = "--seed", paramLabel = "N", defaultValue = "1",
            description = "Seed of the 16-bit dither (default: ${DEFAULT-VALUE}).")
    long seed;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        err.println("Caution: " + About.RESEARCH_CAUTION);
        err.flush();
        Devices devices = Devices.system();
        if (list) {
            print(out, "output devices", devices.outputs());
            print(out, "capture devices", devices.captures());
            out.flush();
            return 0;
        }
        if (bufferMillis < JavaSoundOutput.MIN_BUFFER_MILLIS) {
            throw new IllegalArgumentException("--buffer-ms must be at least " + JavaSoundOutput.MIN_BUFFER_MILLIS
                    + " (shorter buffers drop out unnoticed under load): " + bufferMillis);
        }
        LoopbackSelfTest test = new LoopbackSelfTest(LoopbackSelfTest.Settings.defaults().withBufferMillis(bufferMillis));
        err.println("limen selftest: playing the test tone and recording it");
        err.flush();
        LoopbackSelfTest.Result r;
        try {
            r = test.run(devices, device, capture, new SplittableRandom(seed));
        } catch (NoDeviceException | DeviceLostException e) {
            err.println("limen selftest: " + e.getMessage());
            err.flush();
            return LimenCli.EXIT_FAILED;
        }
        report(out, r);
        out.flush();
        if (!r.passed()) {
            for (String p : r.problems()) {
                err.println("limen selftest: " + p);
            }
            err.flush();
        }
        return r.passed() ? 0 : LimenCli.EXIT_FAILED;
    }

    /** {@code v} rounded to {@code decimals} places, without a sign on zero (so a match prints as +0.000). */
    private static double rounded(double v, int decimals) {
        double scale = Math.pow(10, decimals);
        return Math.round(v * scale) / scale + 0.0;
    }

    private static void print(PrintWriter out, String title, List<AudioDevice> devices) {
        out.println(title + ":" + (devices.isEmpty() ? " none" : ""));
        for (AudioDevice d : devices) {
            out.println("  " + d.name() + " (" + d.description() + ")");
        }
    }

    private static void report(PrintWriter out, LoopbackSelfTest.Result r) {
        LoopbackSelfTest.Measurement ref = r.rendered();
        out.println("output:   " + r.outputDevice());
        out.println("capture:  " + (r.captureDevice() == null ? "none" : r.captureDevice()));
        out.println(String.format(Locale.ROOT, "rendered: %.3f Hz, %.2f dBFS RMS, %d samples", ref.frequencyHz(),
                ref.levelDbfs(), ref.lengthSamples()));
        for (LoopbackSelfTest.ChannelCheck c : r.channels()) {
            String side = c.channel() == 0 ? "left:    " : "right:   ";
            LoopbackSelfTest.Measurement m = c.captured();
            if (m == null) {
                out.println(side + " no tone captured");
                continue;
            }
            out.println(String.format(Locale.ROOT, "%s captured %.3f Hz (%+.3f), %.2f dBFS RMS (%+.2f dB), %d samples (%+d)",
                    side, m.frequencyHz(), rounded(m.frequencyHz() - ref.frequencyHz(), 3), m.levelDbfs(),
                    rounded(m.levelDbfs() - ref.levelDbfs(), 2), m.lengthSamples(),
                    m.lengthSamples() - ref.lengthSamples()));
        }
        if (r.verdict() != LoopbackSelfTest.Verdict.UNVERIFIED) {
            List<LoopbackSelfTest.Dropout> d = r.dropouts();
            out.println("dropouts: " + (d.isEmpty() ? "none" : d.size()));
            for (LoopbackSelfTest.Dropout x : d) {
                out.println(String.format(Locale.ROOT, "  %s channel: %s of %.1f ms at %.1f ms into the tone",
                        x.channel() == 0 ? "left" : "right", x.what(), x.durationSeconds() * 1e3, x.atSeconds() * 1e3));
            }
        }
        if (!Double.isNaN(r.latencyMillis())) {
            out.println(String.format(Locale.ROOT, "latency:  %.1f ms from write() to the onset in the capture",
                    r.latencyMillis()));
        }
        out.println(switch (r.verdict()) {
            case PASS -> "PASS";
            case FAIL -> "FAIL";
            case UNVERIFIED -> "NOT VERIFIED: " + r.problems().get(0);
        });
    }
}
