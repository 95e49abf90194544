package limen.model.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eclipse.emf.common.util.BasicDiagnostic;
import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.ecore.util.Diagnostician;
import org.eclipse.emf.ecore.util.EObjectValidator;
import org.junit.jupiter.api.Test;

import limen.model.ForcedChoiceTask;
import limen.model.LimenFactory;
import limen.model.LimenPackage.Literals;
import limen.model.Step;
import limen.model.Stimulus;

/** EMF's structural diagnostics get Limen codes; plain Diagnostician use gets Limen's constraints. */
class StructuralMappingTest {

    private static Step stepWithLongRamps() {
        LimenFactory f = LimenFactory.eINSTANCE;
        Step step = f.createStep();
        step.setId("s1");
        step.setTitle("Loud step");
        ForcedChoiceTask task = f.createForcedChoiceTask();
        task.setIntervalCount(2);
        task.setIntervalDurationSeconds(0.3);
        step.setTask(task);
        Stimulus stimulus = f.createStimulus();
        stimulus.setStandardFrequencyHz(1000);
        stimulus.setRampDurationSeconds(0.25);
        step.setStimulus(stimulus);
        return step;
    }

    @Test
    void otherStructuralRulesBecomeLm0003WithTheElementNamed() {
        Step step = stepWithLongRamps();
        BasicDiagnostic emf = new BasicDiagnostic(Diagnostic.ERROR, EObjectValidator.DIAGNOSTIC_SOURCE,
                EObjectValidator.DATA_VALUE__VALUE_IN_RANGE, "The value '7' is not in range",
                new Object[] {step, Literals.STEP__TITLE});
        Problem p = BatteryValidator.mapStructural(emf, step, Literals.STEP__TITLE);
        assertEquals(ProblemCode.STRUCTURE_INVALID, p.code());
        assertEquals("step 'Loud step': The value '7' is not in range", p.message());
        assertSame(Literals.STEP__TITLE, p.feature());
    }

    @Test
    void missingRequiredValuesAndDuplicateIds() {
        Step step = stepWithLongRamps();
        BasicDiagnostic missing = new BasicDiagnostic(Diagnostic.ERROR, EObjectValidator.DIAGNOSTIC_SOURCE,
                EObjectValidator.EOBJECT__EVERY_MULTIPCITY_CONFORMS, "The required feature ...",
                new Object[] {step, Literals.STEP__TRACKS});
        Problem p = BatteryValidator.mapStructural(missing, step, Literals.STEP__TRACKS);
        assertEquals(ProblemCode.MISSING_REQUIRED, p.code());
        assertEquals("step 'Loud step': required 'tracks' is missing", p.message());
        BasicDiagnostic duplicate = new BasicDiagnostic(Diagnostic.ERROR, EObjectValidator.DIAGNOSTIC_SOURCE,
                EObjectValidator.EOBJECT__UNIQUE_ID, "dup", new Object[] {step});
        assertNull(BatteryValidator.mapStructural(duplicate, step, null), "LM0102 reports duplicate step ids");
    }

    @Test
    void plainDiagnosticianRunsLimensConstraints() {
        Step step = stepWithLongRamps();
        Diagnostic result = Diagnostician.INSTANCE.validate(step);
        Diagnostic ramp = result.getChildren().stream()
                .filter(d -> ProblemCode.SOURCE.equals(d.getSource()) && d.getCode() == 205).findFirst().orElseThrow();
        assertEquals(Diagnostic.ERROR, ramp.getSeverity());
        assertSame(step.getStimulus(), ramp.getData().get(0));
        assertSame(Literals.STIMULUS__RAMP_DURATION_SECONDS, ramp.getData().get(1));
        assertEquals(0.25, ramp.getData().get(2));
        assertTrue(ramp.getMessage().startsWith("step 'Loud step': ramp duration 0.25 s is longer than half"),
                ramp.getMessage());
        // the step has no tracks and no varied quantity: EMF's multiplicity check, as LM0001 through the API
        assertTrue(BatteryValidator.problemsOf(result).stream()
                .anyMatch(p -> p.code() == ProblemCode.MISSING_REQUIRED && p.feature() == Literals.STEP__TRACKS));
    }
}
