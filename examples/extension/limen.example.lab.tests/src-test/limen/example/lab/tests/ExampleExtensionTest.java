package limen.example.lab.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.apache.commons.math3.distribution.CauchyDistribution;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.example.lab.CauchySigmoid;
import limen.example.lab.FixedThreeDownOneUp;
import limen.model.Battery;
import limen.model.ContributedProcedure;
import limen.model.io.LimenFiles;
import limen.psychometric.Sigmoids;
import limen.session.build.ProcedureBuilder;

/**
 * The example extension installed and not installed: the same battery, the same headless commands, each in a
 * child JVM on a plain class path (as {@code ./limen} runs them) with and without the extension's entry.
 */
class ExampleExtensionTest {

    private static final String ID = FixedThreeDownOneUp.ID;
    private static Path battery;
    private static List<String> withExtension;
    private static List<String> withoutExtension;

    @BeforeAll
    static void classPaths() {
        Path root = Path.of(System.getProperty("limen.root", "../../.."));
        battery = root.resolve("examples/extension/harbourside-steady-staircase.battery").toAbsolutePath().normalize();
        assertTrue(Files.isRegularFile(battery), battery.toString());
        withExtension = ChildCli.testClassPath();
        withoutExtension = withExtension.stream().filter(e -> !ChildCli.isExtension(e)).toList();
        assertEquals(withExtension.size() - 1, withoutExtension.size(),
                "exactly one class path entry is the extension: " + withExtension);
    }

    @Test
    void inThisJvmTheRegistryFindsTheExtensionBesideTheBuiltIns() {
        assertTrue(Sigmoids.byName("cauchy") instanceof CauchySigmoid);
        assertSame(Sigmoids.LOGISTIC, Sigmoids.byName("logistic"), "built-ins keep their constants");
        assertTrue(ProcedureBuilder.installedKind(ID) instanceof FixedThreeDownOneUp);
        assertEquals("limen.transformed-up-down", ProcedureBuilder.installedKind("limen.transformed-up-down").id());
    }

    @Test
    void withoutTheExtensionEveryCommandNamesTheMissingProcedure(@TempDir Path tmp) throws Exception {
        ChildCli cli = new ChildCli(withoutExtension, tmp);
        ChildCli.Result check = cli.run("check", battery.toString());
        assertEquals(1, check.exit(), check.toString());
        assertTrue(check.out().contains(battery + ":12: error: LM0805: ") && check.out().contains("procedure '" + ID
                + "' is not installed (installed procedures: limen.constant-stimuli, "), check.toString());

        ChildCli.Result sim = cli.run("simulate", battery.toString(), "--listener", "logistic:mid=20,scale=2", "--runs", "5",
                "--out", tmp.resolve("sim.csv").toString());
        assertEquals(1, sim.exit(), sim.toString());
        assertTrue(sim.err().contains("procedure '" + ID + "' is not installed"), sim.toString());
        assertFalse(Files.exists(tmp.resolve("sim.csv")));

        ChildCli.Result run = cli.run("run", battery.toString(), "--participant", "P-FINCH", "--archive",
                tmp.resolve("archive").toString(), "--listener", "logistic:mid=20,scale=2", "--output", "none");
        assertEquals(1, run.exit(), run.toString());
        assertTrue(run.err().contains("LM0805") && run.err().contains("'" + ID + "' is not installed"), run.toString());

        // the family is missing too: a demo battery of built-in procedures cannot use it as a listener
        Path demo = battery.getParent().getParent().resolve("quest-thresholds.battery");
        ChildCli.Result family = cli.run("simulate", demo.toString(), "--listener", "cauchy:mid=20,scale=2", "--runs", "5",
                "--out", tmp.resolve("sim.csv").toString());
        assertEquals(2, family.exit(), family.toString());
        assertTrue(family.err().contains("unknown psychometric family 'cauchy'"), family.toString());
    }

    /**
     * Simulated with the extension's own family as the model listener, the staircase's mean estimate lies near
     * the listener's 79.4 % point: a 3-down 1-up rule converges where p³ = 1/2 (Levitt 1971, JASA 49, 467-477,
     * Table I), and with a 2AFC guess rate of 1/2, ψ = 1/2 + F/2, so F = 2p − 1. The level is computed by
     * Commons Math's {@link CauchyDistribution} (independent of the extension's code). Tolerance: half the
     * fixed 2 dB step (common practice: a fixed-step staircase's reversal mean is biased by a fraction of a
     * step).
     */
    @Test
    void withTheExtensionTheBatteryChecksSimulatesAndRunsWithAModelListener(@TempDir Path tmp) throws Exception {
        ChildCli cli = new ChildCli(withExtension, tmp);
        ChildCli.Result check = cli.run("check", battery.toString());
        assertEquals(0, check.exit(), check.toString());
        assertFalse(check.out().contains("LM0805") || check.out().contains("LM0806"), check.toString());

        Path csv = tmp.resolve("sim.csv");
        ChildCli.Result sim = cli.run("simulate", battery.toString(), "--listener", "cauchy:mid=20,scale=2", "--runs", "400",
                "--seed", "11", "--threads", "1", "--out", csv.toString());
        assertEquals(0, sim.exit(), sim.toString());
        List<String[]> rows;
        try (Stream<String> lines = Files.lines(csv, StandardCharsets.UTF_8)) {
            rows = lines.skip(1).map(l -> l.split(",", -1)).toList();
        }
        assertEquals(400, rows.size());
        double sum = 0;
        for (String[] r : rows) {
            assertEquals("thr-1000-steady", r[1]);
            int trials = Integer.parseInt(r[5]);
            assertTrue(trials > 0 && trials <= 150, "trials " + trials);
            sum += Double.parseDouble(r[3]);
        }
        double mean = sum / rows.size();
        double p = Math.pow(0.5, 1.0 / 3);
        double expected = new CauchyDistribution(20, 2).inverseCumulativeProbability(2 * p - 1);
        assertEquals(20.56, expected, 0.01, "from the formula 20 + 2 tan(pi (2p - 1.5))");
        assertEquals(expected, mean, 1.0, sim.out());

        ChildCli.Result run = cli.run("run", battery.toString(), "--participant", "P-FINCH", "--archive",
                tmp.resolve("archive").toString(), "--listener", "cauchy:mid=20,scale=2", "--output", "none", "--seed", "7");
        assertEquals(0, run.exit(), run.toString());
        Path session = Path.of(run.out().lines().findFirst().orElseThrow().trim());
        List<String> trials = Files.readAllLines(session.resolve("trials.csv"), StandardCharsets.UTF_8);
        assertTrue(trials.size() > 12, "a header and at least 12 trials (12 reversals): " + trials.size());

        // the session's snapshot of the battery keeps the contributed settings and checks clean with the extension
        try (Stream<Path> files = Files.list(session)) {
            Path header = files.filter(f -> f.getFileName().toString().endsWith(".session")).findFirst().orElseThrow();
            assertTrue(Files.readString(header).contains("contributorId=\"" + ID + "\""));
            // (only the contributed parts are asserted here: the header's other checks are not this test's subject)
            ChildCli.Result again = cli.run("check", header.toString());
            assertFalse(again.out().contains("LM0805") || again.out().contains("LM0806"), again.toString());
            ChildCli.Result missing = new ChildCli(withoutExtension, tmp).run("check", header.toString());
            assertEquals(1, missing.exit(), missing.toString());
            assertTrue(missing.out().contains("LM0805"), missing.toString());
        }
    }

    @Test
    void withoutAListenerTheProcedureOffersItsOwnDefault(@TempDir Path tmp) throws Exception {
        ChildCli.Result sim = new ChildCli(withExtension, tmp).run("simulate", battery.toString(), "--runs", "20",
                "--out", tmp.resolve("sim.csv").toString());
        assertEquals(0, sim.exit(), sim.toString());
        // four 2 dB steps below the start of 40 dB SPL, scale one step
        assertTrue(sim.err().contains("track A: listener logistic:mid=32.0,scale=2.0"), sim.toString());
    }

    @Test
    void theContributedSettingsAreSavedAndLoadedLikeBuiltInOnes(@TempDir Path tmp) throws IOException {
        Battery b = LimenFiles.loadBattery(battery);
        Path copy = tmp.resolve("copy.battery");
        LimenFiles.save(b, copy);
        Battery again = LimenFiles.loadBattery(copy);
        ContributedProcedure before = (ContributedProcedure) b.getSteps().get(0).getTracks().get(0).getProcedure();
        ContributedProcedure after = (ContributedProcedure) again.getSteps().get(0).getTracks().get(0).getProcedure();
        assertEquals(ID, after.getSettings().getContributorId());
        assertEquals(before.getSettings().getEntries().size(), after.getSettings().getEntries().size());
        for (int i = 0; i < before.getSettings().getEntries().size(); i++) {
            assertEquals(before.getSettings().getEntries().get(i).getName(), after.getSettings().getEntries().get(i).getName());
            assertEquals(before.getSettings().getEntries().get(i).getValue(), after.getSettings().getEntries().get(i).getValue());
            assertEquals(before.getSettings().getEntries().get(i).getType(), after.getSettings().getEntries().get(i).getType());
        }
    }
}
