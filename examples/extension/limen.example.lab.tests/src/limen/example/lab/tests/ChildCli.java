package limen.example.lab.tests;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * Runs {@code limen.cli.LimenCli} in a child JVM on a plain class path, as the {@code ./limen} launcher does,
 * either with this JVM's whole test class path or with the example extension's entries removed from it: the
 * difference between a lab that has installed the extension and one that has not.
 */
public final class ChildCli {

    /** What the child printed and returned. */
    public record Result(int exit, String out, String err) {
        @Override
        public String toString() {
            return "exit " + exit + "\n--- stdout\n" + out + "\n--- stderr\n" + err;
        }
    }

    private final List<String> classPath;
    private final Path workDir;

    /**
     * @param classPath the class path entries of the child
     * @param workDir where the child's output is captured
     */
    public ChildCli(List<String> classPath, Path workDir) {
        this.classPath = List.copyOf(classPath);
        this.workDir = workDir;
    }

    /** @return this JVM's test class path (surefire's, when a manifest-only jar hides java.class.path) */
    public static List<String> testClassPath() {
        String cp = System.getProperty("surefire.test.class.path");
        if (cp == null || cp.isBlank()) {
            cp = System.getProperty("java.class.path");
        }
        List<String> entries = new ArrayList<>();
        for (String e : cp.split(File.pathSeparator)) {
            if (!e.isBlank()) {
                entries.add(e);
            }
        }
        return entries;
    }

    /** @return whether a class path entry is the example extension (its classes folder or its jar) */
    public static boolean isExtension(String entry) {
        String normal = entry.replace('\\', '/');
        return normal.matches(".*/limen\\.example\\.lab(/target/classes/?|/bin/?|[-_][^/]*\\.jar)$");
    }

    /**
     * @param args the command line, e.g. {@code check FILE}
     * @return the child's exit status and output
     */
    public Result run(String... args) throws IOException, InterruptedException {
        List<String> command = new ArrayList<>();
        command.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        command.add("-cp");
        command.add(String.join(File.pathSeparator, classPath));
        command.add("limen.cli.LimenCli");
        command.addAll(List.of(args));
        Path out = Files.createTempFile(workDir, "child", ".out");
        Path err = Files.createTempFile(workDir, "child", ".err");
        Process p = new ProcessBuilder(command).directory(workDir.toFile()).redirectOutput(out.toFile())
                .redirectError(err.toFile()).start();
        if (!p.waitFor(10, TimeUnit.MINUTES)) {
            p.destroyForcibly();
            throw new IllegalStateException("limen " + String.join(" ", args) + " did not end in 10 minutes");
        }
        return new Result(p.exitValue(), Files.readString(out, StandardCharsets.UTF_8),
                Files.readString(err, StandardCharsets.UTF_8));
    }
}
