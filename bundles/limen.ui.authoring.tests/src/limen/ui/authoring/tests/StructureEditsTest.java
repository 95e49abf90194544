package limen.ui.authoring.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.eclipse.emf.common.command.Command;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.model.Battery;
import limen.model.Step;
import limen.model.Track;
import limen.ui.authoring.edit.BatteryDocument;
import limen.ui.authoring.edit.StructureEdits;

/** The moves a drop in the step tree makes (the same commands as the tree's drag and drop and Move up/down). */
class StructureEditsTest {

    @TempDir
    Path temp;

    private BatteryDocument open(String name) throws Exception {
        Path file = temp.resolve(name);
        Files.copy(Fixture.examples().resolve(name), file);
        Files.copy(Fixture.examples().resolve("harbourside-demo.calibration"), temp.resolve("harbourside-demo.calibration"));
        return BatteryDocument.open(file);
    }

    private static List<String> ids(Battery b) {
        return b.getSteps().stream().map(Step::getId).toList();
    }

    @Test
    void dropStepsBeforeOrAfterAnotherAndUndo() throws Exception {
        BatteryDocument doc = open("frequency-discrimination.battery");
        Battery b = doc.battery();
        Step s500 = b.getSteps().get(0);
        Step s1000 = b.getSteps().get(1);
        Step s4000 = b.getSteps().get(2);

        assertTrue(doc.execute(StructureEdits.move(doc, List.of(s4000), s500, false)), "fd-4000 dropped before fd-500");
        assertEquals(List.of("fd-4000", "fd-500", "fd-1000"), ids(b));
        doc.commandStack().undo();
        assertEquals(List.of("fd-500", "fd-1000", "fd-4000"), ids(b));

        // two steps dragged together keep their order
        assertTrue(doc.execute(StructureEdits.move(doc, List.of(s500, s1000), s4000, true)));
        assertEquals(List.of("fd-4000", "fd-500", "fd-1000"), ids(b));
        doc.commandStack().undo();
        assertEquals(List.of("fd-500", "fd-1000", "fd-4000"), ids(b), "one undo takes the whole drop back");
        assertFalse(doc.isDirty());

        // a drop that changes nothing, or onto itself, or a track onto a step, is refused
        Command none = StructureEdits.move(doc, List.of(s500), s1000, false);
        assertFalse(none.canExecute(), "fd-500 before fd-1000 is where it is");
        assertFalse(StructureEdits.move(doc, List.of(s500), s500, true).canExecute());
        assertFalse(StructureEdits.move(doc, List.of(s500.getTracks().get(0)), s1000, true).canExecute());
    }

    @Test
    void tracksMoveWithinTheirStepOnly() throws Exception {
        BatteryDocument doc = open("frequency-discrimination.battery");
        Step step = doc.battery().getSteps().get(0);
        Track a = step.getTracks().get(0);
        Track b = step.getTracks().get(1);
        assertTrue(doc.execute(StructureEdits.move(doc, List.of(a), b, true)));
        assertEquals(List.of("B", "A"), step.getTracks().stream().map(Track::getName).toList());
        Track other = doc.battery().getSteps().get(1).getTracks().get(0);
        assertFalse(StructureEdits.move(doc, List.of(a), other, true).canExecute(), "not into another step");
    }

    @Test
    void deletedStepsComeBackWithUndo() throws Exception {
        BatteryDocument doc = open("frequency-discrimination.battery");
        Step s1000 = doc.battery().getSteps().get(1);
        assertTrue(doc.execute(StructureEdits.delete(doc, List.of(s1000))));
        assertEquals(List.of("fd-500", "fd-4000"), ids(doc.battery()));
        doc.commandStack().undo();
        assertEquals(List.of("fd-500", "fd-1000", "fd-4000"), ids(doc.battery()));
    }
}
