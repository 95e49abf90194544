package limen.audio;

import static org.junit.jupiter.api.Assertions.fail;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.LinkedBlockingQueue;

import org.junit.jupiter.api.Assumptions;

/**
 * The test machine's sound: {@code releng/run-tests.sh} starts a PulseAudio null sink before Maven and exports
 * {@code LIMEN_TEST_AUDIO=pulse}; tests that need it skip without it, except under {@code CI=true}, where a
 * missing sound server is a failure (the tests must not silently vanish from CI). Also child JVMs for the tests
 * that need a Java Sound that looks for devices afresh (Java Sound looks once per JVM).
 */
final class AudioTestEnvironment {

    private AudioTestEnvironment() {
    }

    /** Skips (or under CI fails) the calling test unless the PulseAudio null sink is running. */
    static void requirePulse() {
        if ("pulse".equals(System.getenv("LIMEN_TEST_AUDIO"))) {
            return;
        }
        String why = "LIMEN_TEST_AUDIO is not 'pulse': no PulseAudio null sink for the loopback tests "
                + "(releng/run-tests.sh starts one; see ../shared/AUDIO.md to start it by hand)";
        if ("true".equalsIgnoreCase(System.getenv("CI"))) {
            fail("CI=true but " + why);
        }
        Assumptions.abort(why);
    }

    /** The test class path (surefire runs tests through a manifest-only jar; its property has the real one). */
    static String classPath() {
        String cp = System.getProperty("surefire.test.class.path");
        return cp != null && !cp.isBlank() ? cp : System.getProperty("java.class.path");
    }

    /** A started child JVM running {@link AudioChild} with {@code env} changes; its output lines are queued. */
    static final class Child {
        final Process process;
        final BlockingQueue<String> lines = new LinkedBlockingQueue<>();
        final List<String> all = new ArrayList<>();

        Child(String mode, Map<String, String> env, List<String> unset) throws IOException {
            Path java = Path.of(System.getProperty("java.home"), "bin", "java");
            ProcessBuilder pb = new ProcessBuilder(java.toString(), "-cp", classPath(), AudioChild.class.getName(), mode);
            pb.redirectErrorStream(true);
            for (String u : unset) {
                pb.environment().remove(u);
            }
            pb.environment().putAll(env);
            process = pb.start();
            Thread reader = new Thread(() -> {
                try (BufferedReader r = new BufferedReader(
                        new InputStreamReader(process.getInputStream(), StandardCharsets.UTF_8))) {
                    String line;
                    while ((line = r.readLine()) != null) {
                        synchronized (all) {
                            all.add(line);
                        }
                        lines.add(line);
                    }
                } catch (IOException e) {
                    lines.add("READ FAILED " + e);
                }
            }, "child-output");
            reader.setDaemon(true);
            reader.start();
        }

        /** Waits up to {@code millis} for a line starting with {@code prefix}; null if none came. */
        String await(String prefix, long millis) throws InterruptedException {
            long deadline = System.nanoTime() + millis * 1_000_000L;
            while (true) {
                long left = (deadline - System.nanoTime()) / 1_000_000L;
                if (left <= 0) {
                    return null;
                }
                String line = lines.poll(left, java.util.concurrent.TimeUnit.MILLISECONDS);
                if (line != null && line.startsWith(prefix)) {
                    return line;
                }
            }
        }

        String childOutput() {
            synchronized (all) {
                return String.join("\n", all);
            }
        }
    }
}
