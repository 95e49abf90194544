package limen.product.tests;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.awt.image.BufferedImage;
import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Starts the built product as a user would, and looks at it. */
class WorkbenchStartsTest {

    /** A line of {@code xwininfo -root -tree}: id, "title", (class), WxH+X+Y. */
    private static final Pattern TREE_LINE = Pattern.compile(
            "^\\s*(0x[0-9a-f]+) \"([^\"]*)\":.*?\\s(\\d+)x(\\d+)\\+-?\\d+\\+-?\\d+", Pattern.MULTILINE);

    @TempDir
    Path temp;

    @Test
    void mainWindowTitledLimenAppears() throws Exception {
        String display = System.getenv("DISPLAY");
        if (display == null || display.isEmpty()) {
            fail("no DISPLAY: run the tests through the README's test command, which starts Xvfb");
        }
        Path product = Paths.get(System.getProperty("limen.product"));
        File[] launchers = product.resolve("plugins").toFile()
                .listFiles((dir, name) -> name.startsWith("org.eclipse.equinox.launcher_") && name.endsWith(".jar"));
        assertNotNull(launchers, "no product at " + product);
        assertTrue(launchers.length == 1, "expected one launcher jar in " + product);
        Path root = Paths.get(System.getProperty("limen.root")).toAbsolutePath().normalize();
        Path log = temp.resolve("workbench.log");
        ProcessBuilder pb = new ProcessBuilder(javaExecutable(), "-Dlimen.workspace=" + root.resolve("examples"),
                "-Dlimen.preferences=" + temp.resolve("workbench.prefs"),
                "-jar", launchers[0].getAbsolutePath(), "-data", temp.resolve("state").toString(), "-consoleLog")
                .directory(product.toFile()).redirectErrorStream(true).redirectOutput(log.toFile());
        Process workbench = pb.start();
        try {
            String windowId = waitForWindow(workbench, 120);
            if (windowId == null) {
                fail("no window titled Limen within 120 s; workbench log:\n" + Files.readString(log));
            }
            Thread.sleep(3000); // let the parts paint after the window maps
            Path dir = Files.createDirectories(Paths.get(System.getProperty("limen.screenshots")));
            Path png = dir.resolve("workbench-main-window.png");
            run("import", "-window", windowId, png.toString());
            BufferedImage image = ImageIO.read(png.toFile());
            assertNotNull(image, "screenshot unreadable: " + png);
            assertTrue(image.getWidth() > 400 && image.getHeight() > 300, "window too small");
            assertTrue(distinctColours(image) > 8, "screenshot looks blank: " + png);
            String output = Files.readString(log);
            assertTrue(!output.contains("!ENTRY") || !output.contains("!MESSAGE Application error"),
                    "workbench reported an application error:\n" + output);
        } finally {
            workbench.destroy();
            if (!workbench.waitFor(10, TimeUnit.SECONDS)) {
                workbench.destroyForcibly().waitFor(10, TimeUnit.SECONDS);
            }
        }
    }

    private static String waitForWindow(Process workbench, int seconds) throws Exception {
        long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(seconds);
        while (System.nanoTime() < end) {
            if (!workbench.isAlive()) {
                return null;
            }
            // GTK makes several small helper windows with the same name: take the real, large one
            Matcher m = TREE_LINE.matcher(run("xwininfo", "-root", "-tree"));
            while (m.find()) {
                if (m.group(2).trim().equals("Limen") && Integer.parseInt(m.group(3)) > 400
                        && Integer.parseInt(m.group(4)) > 300) {
                    return m.group(1);
                }
            }
            Thread.sleep(500);
        }
        return null;
    }

    private static String run(String... command) throws Exception {
        Process p = new ProcessBuilder(List.of(command)).redirectErrorStream(true).start();
        byte[] out = p.getInputStream().readAllBytes();
        p.waitFor(30, TimeUnit.SECONDS);
        return new String(out, StandardCharsets.UTF_8);
    }

    private static String javaExecutable() {
        return Paths.get(System.getProperty("java.home"), "bin", "java").toString();
    }

    private static int distinctColours(BufferedImage image) {
        Set<Integer> seen = new HashSet<>();
        for (int y = 0; y < image.getHeight(); y += 3) {
            for (int x = 0; x < image.getWidth(); x += 3) {
                seen.add(image.getRGB(x, y));
            }
        }
        return seen.size();
    }
}
