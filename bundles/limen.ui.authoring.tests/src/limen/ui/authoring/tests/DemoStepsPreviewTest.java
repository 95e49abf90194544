package limen.ui.authoring.tests;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

import limen.model.Battery;
import limen.model.Calibration;
import limen.model.Step;
import limen.model.io.LimenFiles;
import limen.ui.authoring.preview.DesignRun;
import limen.ui.authoring.preview.TrialPreview;

/** Every step of every demo battery previews (rendered and guarded) and simulates with its default listeners. */
class DemoStepsPreviewTest {

    @Test
    void everyDemoStepRendersAndSimulates() throws Exception {
        Path examples = Fixture.examples();
        Calibration calibration = LimenFiles.loadCalibration(examples.resolve("harbourside-demo.calibration"));
        List<String> seen = new ArrayList<>();
        try (Stream<Path> files = Files.list(examples)) {
            for (Path file : (Iterable<Path>) files.filter(p -> p.toString().endsWith(".battery")).sorted()::iterator) {
                Battery battery = LimenFiles.loadBattery(file);
                for (Step step : battery.getSteps()) {
                    String where = file.getFileName() + " " + step.getId();
                    TrialPreview.Result r;
                    try {
                        r = TrialPreview.render(step, TrialPreview.defaultValue(step), TrialPreview.intervals(step) - 1,
                                calibration, 30, 1);
                    } catch (IllegalArgumentException e) {
                        fail(where + ": " + e.getMessage(), e);
                        return;
                    }
                    assertNotNull(r.checked(), where + " refused: " + r.refusal());
                    assertFalse(r.intervals().isEmpty(), where);
                    assertTrue(r.intervals().stream().anyMatch(i -> i.target() && i.peakLevelDbSpl() > 0), where);
                    DesignRun run = new DesignRun("", 0, 0, 3, 1, 1, 300);
                    assertTrue(run.simulation(step).run(limen.procedure.sim.SimulationProgress.none(),
                            new java.util.concurrent.atomic.AtomicBoolean()).rows().size() == 3 * step.getTracks().size(),
                            where);
                    seen.add(where);
                }
            }
        }
        assertTrue(seen.size() >= 10, seen.toString());
    }
}
