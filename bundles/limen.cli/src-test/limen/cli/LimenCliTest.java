package limen.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;

import org.junit.jupiter.api.Test;

class LimenCliTest {

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return LimenCli.execute(new PrintWriter(out, true), new PrintWriter(err, true), args);
    }

    @Test
    void versionPrintsVersionJavaAndCaution() {
        assertEquals(0, run("--version"));
        String text = out.toString();
        assertTrue(text.startsWith("Limen "), text);
        assertTrue(text.contains("java: " + System.getProperty("java.version")), text);
        assertTrue(text.contains("not a clinical audiometer"), text);
    }

    @Test
    void helpListsTheCaution() {
        assertEquals(0, run("--help"));
        assertTrue(out.toString().contains("Usage: limen"), out.toString());
        assertTrue(out.toString().contains("ethics approval"), out.toString());
    }

    @Test
    void unknownCommandIsAUsageError() {
        assertEquals(2, run("no-such-command"));
        assertTrue(err.toString().contains("no-such-command"), err.toString());
    }

    @Test
    void noCommandWordIsAUsageError() {
        assertEquals(2, run());
    }
}
