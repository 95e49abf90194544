package limen.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class FitCommandTest {

    /** Harbourside Auditory Lab, P-WREN, 2AFC level increments (dB), invented numbers. */
    private static final String WREN = "value,trials,correct\n1,50,26\n2,50,29\n3,50,35\n4,50,42\n5,50,46\n6,50,49\n";

    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return LimenCli.execute(new PrintWriter(out, true), new PrintWriter(err, true), args);
    }

    private Path file(String name, String text) throws IOException {
        Path p = dir.resolve(name);
        Files.writeString(p, text);
        return p;
    }

    private Map<String, String> row() {
        List<String> lines = out.toString().lines().toList();
        assertEquals(2, lines.size(), out.toString());
        String[] h = lines.get(0).split(",");
        // the spec column is quoted and holds commas: split the data row by the CSV rules
        List<String> cells = splitCsv(lines.get(1));
        assertEquals(h.length, cells.size(), lines.toString());
        Map<String, String> m = new HashMap<>();
        for (int i = 0; i < h.length; i++) {
            m.put(h[i], cells.get(i));
        }
        return m;
    }

    private static List<String> splitCsv(String line) {
        List<String> cells = new java.util.ArrayList<>();
        StringBuilder b = new StringBuilder();
        boolean quoted = false;
        for (char c : line.toCharArray()) {
            if (c == '"') {
                quoted = !quoted;
            } else if (c == ',' && !quoted) {
                cells.add(b.toString());
                b.setLength(0);
            } else {
                b.append(c);
            }
        }
        cells.add(b.toString());
        return cells;
    }

    /**
     * Weibull, γ = 0.5, λ = 0.02 fixed: R's optim on the same likelihood gives alpha = 3.7344545204532884,
     * beta = 2.8285700268278471 (limen.fit's reference/optim_reference.csv, from optim_reference.R); the
     * midpoint threshold is then F⁻¹(1/2) = alpha (ln 2)^(1/beta), the slope (1 − γ − λ) F'(threshold).
     */
    @Test
    void fitsAndWritesOneRowWithTheRequiredColumns() throws IOException {
        Path data = file("wren.csv", WREN);
        assertEquals(0, run("fit", data.toString(), "--function", "weibull", "--guess", "0.5", "--lapse", "0.02"), err.toString());
        Map<String, String> r = row();
        assertTrue(out.toString().startsWith("function,threshold,slope,guess,lapse,loglik,deviance,"), out.toString());
        double alpha = 3.7344545204532884;
        double beta = 2.8285700268278471;
        double threshold = alpha * Math.pow(Math.log(2), 1 / beta);
        assertEquals("weibull", r.get("function"));
        assertEquals(threshold, Double.parseDouble(r.get("threshold")), 1e-5 * threshold);
        double u = Math.pow(threshold / alpha, beta);
        double slope = 0.48 * beta / threshold * u * Math.exp(-u);
        assertEquals(slope, Double.parseDouble(r.get("slope")), 1e-4 * slope);
        assertEquals(0.5, Double.parseDouble(r.get("guess")));
        assertEquals(0.02, Double.parseDouble(r.get("lapse")));
        assertEquals(-11.086051771600154, Double.parseDouble(r.get("loglik")), 1e-8);
        assertEquals("300", r.get("trials"));
        assertTrue(r.get("spec").startsWith("weibull:alpha="), r.get("spec"));
    }

    @Test
    void bootstrapAddsIntervalsAndGoodnessOfFitAndIsReproducible() throws IOException {
        Path data = file("wren.csv", WREN);
        String[] args = { "fit", data.toString(), "--guess", "0.5", "--bootstrap", "60", "--seed", "9", "--threads", "2" };
        assertEquals(0, run(args), err.toString());
        Map<String, String> r = row();
        double t = Double.parseDouble(r.get("threshold"));
        assertTrue(Double.parseDouble(r.get("threshold_lo")) < t && t < Double.parseDouble(r.get("threshold_hi")), r.toString());
        assertTrue(Double.parseDouble(r.get("slope_lo")) < Double.parseDouble(r.get("slope_hi")), r.toString());
        double p = Double.parseDouble(r.get("gof_p"));
        assertTrue(p > 0 && p <= 1, r.toString());
        assertEquals("bca", r.get("ci_method"));
        assertTrue(err.toString().contains("bootstrap"), err.toString());
        String first = out.toString();
        out.getBuffer().setLength(0);
        assertEquals(0, run("fit", data.toString(), "--guess", "0.5", "--bootstrap", "60", "--seed", "9", "--threads", "1"));
        assertEquals(first, out.toString());
    }

    @Test
    void badInputNamesFileAndLine() throws IOException {
        Path noColumn = file("a.csv", "value,trials\n1,10\n");
        assertEquals(2, run("fit", noColumn.toString()));
        assertTrue(err.toString().contains("a.csv line 1") && err.toString().contains("correct"), err.toString());

        err.getBuffer().setLength(0);
        Path badNumber = file("b.csv", "# Harbourside, P-OTTER\nvalue,trials,correct\n1,10,3\n2,ten,5\n");
        assertEquals(2, run("fit", badNumber.toString()));
        assertTrue(err.toString().contains("b.csv line 4") && err.toString().contains("'ten'"), err.toString());

        err.getBuffer().setLength(0);
        Path tooMany = file("c.csv", "value,trials,correct\n1,10,3\n2,10,11\n");
        assertEquals(2, run("fit", tooMany.toString()));
        assertTrue(err.toString().contains("c.csv line 3") && err.toString().contains("11"), err.toString());

        err.getBuffer().setLength(0);
        assertEquals(2, run("fit", dir.resolve("missing.csv").toString()));
        assertTrue(err.toString().startsWith("limen fit: ") && err.toString().contains("missing.csv"), err.toString());

        err.getBuffer().setLength(0);
        assertEquals(2, run("fit", noColumn.toString(), "--function", "cauchy"));
        assertTrue(err.toString().contains("cauchy"), err.toString());
    }

    @Test
    void unidentifiableDataIsRefusedWithExitOne() throws IOException {
        Path flat = file("flat.csv", "value,trials,correct\n1,20,20\n2,20,20\n3,20,20\n");
        assertEquals(1, run("fit", flat.toString(), "--guess", "0.5"));
        assertTrue(err.toString().contains("same proportion"), err.toString());
        assertEquals("", out.toString());
    }
}
