package limen.ui.authoring.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.model.Battery;
import limen.model.io.LimenFiles;
import limen.ui.authoring.edit.BatteryDocument;
import limen.ui.authoring.edit.Templates;
import limen.ui.authoring.parts.LabFilesPart;

/** The lab files view: templates, new, rename, delete. */
class LabFilesTest {

    @TempDir
    Path temp;

    private Fixture fx;

    @BeforeEach
    void setUp() throws Exception {
        fx = new Fixture(temp, "lab files", 420, 500);
    }

    @AfterEach
    void tearDown() {
        fx.close();
    }

    @Test
    void newFromTemplateRenameDelete() throws Exception {
        LabFilesPart files = fx.make(LabFilesPart.class, fx.shell, null);
        fx.shell.open();
        assertEquals(fx.workspace, files.folder());
        List<Templates.Template> templates = Templates.list(Templates.examplesFolder());
        assertTrue(templates.size() >= 5, "the demo lab's batteries are the templates: " + templates);
        Templates.Template fd = templates.stream().filter(t -> t.name().equals("frequency-discrimination.battery"))
                .findFirst().orElseThrow();
        assertEquals(3, fd.steps());

        // a new battery in an empty subfolder gets the calibration it names copied beside it
        Path sub = Files.createDirectories(fx.workspace.resolve("pilot"));
        assertEquals("frequency-discrimination.battery exists already",
                Templates.refusal(fx.workspace, "frequency-discrimination"));
        Path made = Templates.create(fd, sub, "pilot-raven", "Pilot for P-RAVEN");
        assertEquals(sub.resolve("pilot-raven.battery"), made);
        assertTrue(Files.exists(sub.resolve("harbourside-demo.calibration")));
        Battery b = LimenFiles.loadBattery(made);
        assertEquals("Pilot for P-RAVEN", b.getTitle());
        BatteryDocument doc = BatteryDocument.open(made);
        assertTrue(doc.validate().stream().noneMatch(p -> p.isError()), "the copy validates: " + doc.validate());
        assertNotNull(doc.namedCalibration(), "against the copied calibration");

        files.refresh();
        files.viewer().expandAll();
        files.select(made);
        assertEquals(made, files.selectedFile());
        fx.pump(100);
        Screenshots.save(fx.shell, "lab-files");

        assertEquals("keep the extension .battery", LabFilesPart.renameRefusal(made, "pilot.txt"));
        Path renamed = files.rename(made, "pilot-otter.battery");
        assertFalse(Files.exists(made));
        assertTrue(Files.exists(renamed));
        assertThrows(IOException.class, () -> files.rename(renamed, "../escape.battery"));
        files.delete(renamed);
        assertFalse(Files.exists(renamed));
        assertTrue(files.lastStatus().startsWith("Deleted pilot-otter.battery"), files.lastStatus());
    }
}
