package limen.ui.authoring.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.model.Battery;
import limen.model.LimenPackage.Literals;
import limen.model.Step;
import limen.model.Track;
import limen.model.TransformedUpDownProcedure;
import limen.model.io.LimenFiles;
import limen.ui.authoring.edit.BatteryDocument;
import limen.ui.authoring.edit.Field;
import limen.ui.authoring.handlers.RedoHandler;
import limen.ui.authoring.handlers.SaveBatteryHandler;
import limen.ui.authoring.handlers.UndoHandler;
import limen.ui.authoring.parts.BatteryEditorPart;

/** Editing a demo battery: a track's step size changed, undone, redone, saved and read back. */
class BatteryEditorTest {

    @TempDir
    Path temp;

    private Fixture fx;

    @BeforeEach
    void setUp() throws Exception {
        fx = new Fixture(temp, "battery editor", 1100, 700);
    }

    @AfterEach
    void tearDown() {
        fx.close();
    }

    private static TransformedUpDownProcedure procedureOf(Track t) {
        return (TransformedUpDownProcedure) t.getProcedure();
    }

    @Test
    void stepSizeChangeUndoRedoSaveReopen() throws Exception {
        BatteryEditorPart editor = fx.editor(fx.shell, "frequency-discrimination.battery");
        fx.shell.open();
        Battery battery = editor.document().battery();
        Track trackA = battery.getSteps().get(0).getTracks().get(0);
        editor.select(trackA);
        Field stepSize = editor.form().field(trackA.getProcedure(), Literals.TRANSFORMED_UP_DOWN_PROCEDURE__INITIAL_STEP);
        assertNotNull(stepSize, "the track's form shows the initial step");
        assertEquals("2", stepSize.text());
        assertEquals("× (factor)", stepSize.unit(), "multiplicative steps are factors");
        Field start = editor.form().field(trackA.getProcedure(), Literals.STAIRCASE_PROCEDURE__START_VALUE);
        assertEquals("%", start.unit(), "the start value is in the step's quantity unit (percent)");

        assertTrue(stepSize.enter("1.5"));
        assertEquals(1.5, procedureOf(trackA).getInitialStep());
        assertTrue(editor.document().isDirty());
        MPart part = editor.modelPart();
        assertTrue(part.isDirty(), "the part shows the change as unsaved");
        fx.pump(100);
        Screenshots.save(fx.shell, "editor-step-size-changed");

        // undo and redo through the handlers the key bindings call (Ctrl+Z, Ctrl+Shift+Z / Ctrl+Y)
        assertTrue(new UndoHandler().canExecute(part, null, null));
        new UndoHandler().execute(part, null, null);
        assertEquals(2.0, procedureOf(trackA).getInitialStep());
        assertEquals("2", stepSize.text(), "the field follows the undo");
        assertFalse(editor.document().isDirty(), "undo back to the saved state is clean");
        new RedoHandler().execute(part, null, null);
        assertEquals(1.5, procedureOf(trackA).getInitialStep());
        assertEquals("1.5", stepSize.text());

        assertTrue(new SaveBatteryHandler().canExecute(part, null, null));
        new SaveBatteryHandler().execute(part, null, null);
        assertFalse(editor.document().isDirty());
        assertFalse(part.isDirty());
        assertFalse(new SaveBatteryHandler().canExecute(part, null, null), "nothing left to save");

        Path file = fx.workspace.resolve("frequency-discrimination.battery");
        assertTrue(Files.readString(file).contains("initialStep=\"1.5\""), "written to the file");
        Battery reread = LimenFiles.loadBattery(file);
        assertEquals(1.5, procedureOf(reread.getSteps().get(0).getTracks().get(0)).getInitialStep());
        assertEquals(2.0, procedureOf(reread.getSteps().get(0).getTracks().get(1)).getInitialStep(),
                "track B untouched");
        BatteryDocument reopened = BatteryDocument.open(file);
        assertEquals(1.5, procedureOf(reopened.battery().getSteps().get(0).getTracks().get(0)).getInitialStep());
        Screenshots.save(fx.shell, "editor-saved");
    }

    @Test
    void typingOutsideTheFieldRangeNeverReachesTheModel() throws Exception {
        BatteryEditorPart editor = fx.editor(fx.shell, "frequency-discrimination.battery");
        fx.shell.open();
        Step step = editor.document().battery().getSteps().get(0);
        editor.select(step);
        Field ramp = editor.form().field(step.getStimulus(), Literals.STIMULUS__RAMP_DURATION_SECONDS);
        assertEquals("s", ramp.unit());
        assertFalse(ramp.enter("-0.5"));
        assertEquals(0.02, step.getStimulus().getRampDurationSeconds(), "refused: below the field's range");
        assertTrue(ramp.refusal().contains("between 0 and 3600"), ramp.refusal());
        assertTrue(ramp.decorated());
        Field count = editor.form().field(step.getTask(), Literals.FORCED_CHOICE_TASK__INTERVAL_COUNT);
        assertFalse(count.enter("2.5"), "a count takes whole numbers only");
        assertEquals(2, ((limen.model.ForcedChoiceTask) step.getTask()).getIntervalCount());
        assertFalse(editor.document().isDirty());
        fx.pump(100);
        Screenshots.save(fx.shell, "editor-refused-input");
    }

    @Test
    void copyPasteAndReorderSteps() throws Exception {
        BatteryEditorPart editor = fx.editor(fx.shell, "frequency-discrimination.battery");
        fx.shell.open();
        Battery battery = editor.document().battery();
        Step first = battery.getSteps().get(0);
        editor.select(first);
        editor.copy();
        editor.paste();
        assertEquals(4, battery.getSteps().size());
        Step pasted = battery.getSteps().get(1);
        assertEquals("fd-500-copy", pasted.getId(), "a pasted step gets a fresh id");
        assertEquals(first.getTitle(), pasted.getTitle());
        assertEquals(List.of(pasted), editor.selectedElements(), "the pasted step is selected");
        assertTrue(editor.problems().stream().noneMatch(p -> p.code().number() == 102), "no duplicate id");

        editor.select(pasted);
        editor.moveBy(1);
        assertEquals(List.of("fd-500", "fd-1000", "fd-500-copy", "fd-4000"),
                battery.getSteps().stream().map(Step::getId).toList());
        editor.undo();
        editor.undo();
        assertEquals(List.of("fd-500", "fd-1000", "fd-4000"), battery.getSteps().stream().map(Step::getId).toList());
        assertFalse(editor.document().isDirty());

        // a track pasted into another step
        Track b = first.getTracks().get(1);
        editor.select(b);
        editor.copy();
        editor.select(battery.getSteps().get(2));
        editor.paste();
        assertEquals(List.of("A", "B", "B-copy"),
                battery.getSteps().get(2).getTracks().stream().map(Track::getName).toList());
        fx.pump(100);
        Screenshots.save(fx.shell, "editor-pasted-track");
    }
}
