package limen.ui.authoring.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.TreeItem;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.model.LimenPackage.Literals;
import limen.model.Step;
import limen.model.Track;
import limen.model.validation.Problem;
import limen.model.validation.ProblemCode;
import limen.ui.authoring.AuthoringTopics;
import limen.ui.authoring.ProblemReport;
import limen.ui.authoring.edit.Field;
import limen.ui.authoring.parts.BatteryEditorPart;
import limen.ui.authoring.parts.ProblemsPart;

/** An invalid value shows at the tree element, at the field and in the battery check; fixing it clears all three. */
class LiveValidationTest {

    @TempDir
    Path temp;

    private Fixture fx;
    private BatteryEditorPart editor;
    private ProblemsPart problems;

    @BeforeEach
    void setUp() throws Exception {
        fx = new Fixture(temp, "live validation", 1100, 800);
        SashForm sash = new SashForm(fx.shell, SWT.VERTICAL);
        Composite top = new Composite(sash, SWT.NONE);
        Composite bottom = new Composite(sash, SWT.NONE);
        sash.setWeights(65, 35);
        problems = fx.make(ProblemsPart.class, bottom, null);
        fx.broker.on(AuthoringTopics.PROBLEMS, data -> problems.show((ProblemReport) data));
        editor = fx.editor(top, "frequency-discrimination.battery");
        fx.shell.open();
    }

    @AfterEach
    void tearDown() {
        fx.close();
    }

    private List<ProblemsPart.Row> rows(ProblemCode code) {
        return problems.rows().stream().filter(r -> r.problem().code() == code).toList();
    }

    private TreeItem itemOf(Object element) {
        for (TreeItem step : editor.viewer().getTree().getItem(0).getItems()) {
            if (step.getData() == element) {
                return step;
            }
            for (TreeItem track : step.getItems()) {
                if (track.getData() == element) {
                    return track;
                }
            }
        }
        throw new AssertionError("not in the tree: " + element);
    }

    @Test
    void problemAppearsAtElementFieldAndListThenClears() throws Exception {
        Step step = editor.document().battery().getSteps().get(1);
        Track track = step.getTracks().get(0);
        assertTrue(rows(ProblemCode.STEP_FACTOR_NOT_ABOVE_ONE).isEmpty(), "the demo battery has no such error");
        assertSame(editor.icons().track(), itemOf(track).getImage(), "a clean track shows its own icon");
        String before = problems.summaryText();

        editor.select(track);
        Field stepSize = editor.form().field(track.getProcedure(), Literals.TRANSFORMED_UP_DOWN_PROCEDURE__INITIAL_STEP);
        // 0.9 is a number in the field's range, but a multiplicative factor must exceed 1 (the validator's LM0304)
        assertTrue(stepSize.enter("0.9"));
        fx.pump(50);

        List<ProblemsPart.Row> listed = rows(ProblemCode.STEP_FACTOR_NOT_ABOVE_ONE);
        assertEquals(1, listed.size(), problems.rows().toString());
        Problem p = listed.get(0).problem();
        assertSame(track.getProcedure(), p.object());
        assertEquals(Literals.TRANSFORMED_UP_DOWN_PROCEDURE__INITIAL_STEP, p.feature());
        assertTrue(p.message().contains("0.9"), p.message());
        assertTrue(before.startsWith("0 error"), before);
        assertFalse(problems.summaryText().startsWith("0 error"), problems.summaryText());
        assertSame(editor.icons().error(), itemOf(track).getImage(), "the track shows the error");
        assertTrue(itemOf(track).getParentItem().getImage() == editor.icons().error(), "and so does its step");
        assertSame(editor.icons().track(), itemOf(step.getTracks().get(1)).getImage(), "track B stays clean");
        assertTrue(stepSize.decorated(), "the field shows it");
        assertTrue(stepSize.decoration().getDescriptionText().contains("LM0304"), stepSize.decoration().getDescriptionText());
        fx.pump(100);
        Screenshots.save(fx.shell, "validation-error-shown");

        // double-click in the list goes to the element and the field
        editor.select(editor.document().battery().getSteps().get(2));
        problems.goTo(listed.get(0));
        assertEquals(List.of(track), editor.selectedElements());
        Field again = editor.form().field(track.getProcedure(), Literals.TRANSFORMED_UP_DOWN_PROCEDURE__INITIAL_STEP);
        assertNotNull(again);
        fx.pump(50);
        assertTrue(again.control().isFocusControl(), "the caret is in the offending field");

        // saving an invalid battery is allowed, with a warning
        editor.save();
        assertFalse(editor.document().isDirty());
        assertTrue(editor.bannerText().startsWith("Saved with "), editor.bannerText());
        assertTrue(editor.bannerText().contains("a session will refuse to run this battery"), editor.bannerText());
        assertTrue(Files.readString(fx.workspace.resolve("frequency-discrimination.battery")).contains("initialStep=\"0.9\""));

        // fixing it clears all three
        assertTrue(again.enter("1.26"));
        fx.pump(50);
        assertTrue(rows(ProblemCode.STEP_FACTOR_NOT_ABOVE_ONE).isEmpty());
        assertEquals(before, problems.summaryText());
        assertSame(editor.icons().track(), itemOf(track).getImage());
        assertFalse(again.decorated());
        Screenshots.save(fx.shell, "validation-error-fixed");
    }

    @Test
    void crossFieldRuleNamesTheSettingAndUndoBringsItBack() throws Exception {
        Step step = editor.document().battery().getSteps().get(0);
        Track track = step.getTracks().get(1);
        editor.select(track);
        Field start = editor.form().field(track.getProcedure(), Literals.STAIRCASE_PROCEDURE__START_VALUE);
        assertTrue(start.enter("25"), "25 % is a number the field takes");
        List<ProblemsPart.Row> listed = rows(ProblemCode.START_OUTSIDE_LIMITS);
        assertEquals(1, listed.size(), "but it lies above the ceiling of 20 %: " + problems.rows());
        assertTrue(start.decorated());
        editor.undo();
        assertTrue(rows(ProblemCode.START_OUTSIDE_LIMITS).isEmpty(), "undo clears it");
        assertFalse(start.decorated());
        editor.redo();
        assertEquals(1, rows(ProblemCode.START_OUTSIDE_LIMITS).size(), "redo brings it back");
    }
}
