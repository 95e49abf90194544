package limen.ui.authoring.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.model.ContributedProcedure;
import limen.model.LimenPackage.Literals;
import limen.model.Setting;
import limen.model.Track;
import limen.model.validation.Problem;
import limen.ui.authoring.edit.Field;
import limen.ui.authoring.parts.BatteryEditorPart;

/**
 * A battery whose track runs a lab's contributed procedure, opened in the editor of a workbench that does not
 * have the lab's bundle: the generic settings are shown and edited like any other field, and the editor's live
 * validation names the missing procedure (LM0805).
 */
class ContributedSettingsEditorTest {

    @TempDir
    Path temp;

    private Fixture fx;

    @BeforeEach
    void setUp() throws Exception {
        fx = new Fixture(temp, "contributed settings", 1100, 700);
        String text = Files.readString(Fixture.examples().resolve("extension/harbourside-steady-staircase.battery"),
                StandardCharsets.UTF_8).replace("calibrationFile=\"../harbourside-demo.calibration\"",
                        "calibrationFile=\"harbourside-demo.calibration\"");
        Files.writeString(fx.workspace.resolve("steady.battery"), text, StandardCharsets.UTF_8);
    }

    @AfterEach
    void tearDown() {
        fx.close();
    }

    @Test
    void settingsAreEditableAndTheMissingProcedureIsNamed() throws Exception {
        BatteryEditorPart editor = fx.editor(fx.shell, "steady.battery");
        fx.shell.open();
        Track track = editor.document().battery().getSteps().get(0).getTracks().get(0);
        editor.select(track);
        ContributedProcedure procedure = (ContributedProcedure) track.getProcedure();
        Field id = editor.form().field(procedure.getSettings(), Literals.SETTINGS_GROUP__CONTRIBUTOR_ID);
        assertNotNull(id, "the form shows the contributor id");
        assertEquals("harbourside.steady-staircase", id.text());
        Setting stepSize = procedure.getSettings().getEntries().stream().filter(s -> s.getName().equals("stepSize"))
                .findFirst().orElseThrow();
        Field value = editor.form().field(stepSize, Literals.SETTING__VALUE);
        assertNotNull(value, "the form shows each setting's value");
        assertEquals("2", value.text());
        assertTrue(value.enter("1.5"));
        assertEquals("1.5", stepSize.getValue());
        editor.undo();
        assertEquals("2", stepSize.getValue());

        fx.pump(200);
        Problem missing = editor.problems().stream().filter(p -> p.code().code().equals("LM0805")).findFirst()
                .orElseThrow(() -> new AssertionError("no LM0805 among " + editor.problems()));
        assertTrue(missing.isError() && missing.message().contains("procedure 'harbourside.steady-staircase' is not installed"),
                missing.message());
        Screenshots.save(fx.shell, "editor-contributed-settings");
    }
}
