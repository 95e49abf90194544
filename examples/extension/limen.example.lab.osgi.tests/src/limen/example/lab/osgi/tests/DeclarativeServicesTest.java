package limen.example.lab.osgi.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;

import limen.core.extension.Extensions;
import limen.example.lab.CauchySigmoid;
import limen.example.lab.FixedThreeDownOneUp;
import limen.model.Battery;
import limen.model.Calibration;
import limen.model.io.LimenFiles;
import limen.model.validation.BatteryValidator;
import limen.model.validation.Problem;
import limen.procedure.AdaptiveProcedure;
import limen.procedure.ProcedureKind;
import limen.psychometric.Sigmoid;
import limen.psychometric.Sigmoids;
import limen.session.build.BuiltTrack;
import limen.session.build.ProcedureBuilder;
import limen.signal.StimulusDesign;

/**
 * Inside OSGi no bundle sees another's {@code META-INF/services}, so the lab bundle's procedure and family can
 * reach the registry only through their Declarative Services components and {@code limen.session}'s binder: the
 * workbench's path, tested without a workbench.
 */
class DeclarativeServicesTest {

    /** DS activates components asynchronously after the framework starts; wait for the lab's procedure. */
    private static void awaitBinding() throws InterruptedException {
        long end = System.nanoTime() + 30_000_000_000L;
        while (Extensions.find(ProcedureKind.class, FixedThreeDownOneUp.ID, ProcedureKind::id).isEmpty()
                && System.nanoTime() < end) {
            Thread.sleep(100);
        }
    }

    @Test
    void theLabBundlesComponentsAndTheBuiltInsAreBound() throws Exception {
        awaitBinding();
        assertTrue(ProcedureBuilder.installedKind(FixedThreeDownOneUp.ID) instanceof FixedThreeDownOneUp,
                Extensions.ids(ProcedureKind.class, ProcedureKind::id));
        assertEquals(List.of("limen.constant-stimuli", "limen.pest", "limen.psi", "limen.quest",
                "limen.transformed-up-down", "limen.weighted-up-down"),
                Extensions.all(ProcedureKind.class).stream().map(ProcedureKind::id).filter(id -> id.startsWith("limen."))
                        .toList());
        assertTrue(Sigmoids.byName("cauchy") instanceof CauchySigmoid, Extensions.ids(Sigmoid.class, Sigmoid::name));
        assertSame(Sigmoids.WEIBULL, Sigmoids.byName("weibull"));
        assertEquals(4, Extensions.all(StimulusDesign.class).size(), Extensions.ids(StimulusDesign.class, StimulusDesign::id));
    }

    @Test
    void theExampleBatteryValidatesAndBuildsInsideOsgi() throws Exception {
        awaitBinding();
        Path root = Path.of(System.getProperty("limen.root"));
        Battery b = LimenFiles.loadBattery(root.resolve("examples/extension/harbourside-steady-staircase.battery"));
        Calibration c = LimenFiles.loadCalibration(root.resolve("examples/harbourside-demo.calibration"));
        List<Problem> problems = BatteryValidator.validate(b, c);
        assertTrue(problems.stream().noneMatch(Problem::isError), problems.toString());
        BuiltTrack t = ProcedureBuilder.build(b.getSteps().get(0), b.getSteps().get(0).getTracks().get(0));
        AdaptiveProcedure p = t.factory().create(new java.util.SplittableRandom(3));
        assertEquals(40.0, p.nextValue(), 0.0);
        for (int i = 0; i < 3; i++) {
            p.record(p.nextValue(), true);
        }
        assertEquals(38.0, p.nextValue(), 0.0, "three correct: one fixed 2 dB step down");
        p.record(38.0, false);
        assertEquals(40.0, p.nextValue(), 0.0, "one wrong: one step up");
    }
}
