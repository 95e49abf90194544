package limen.ui.authoring;

import java.util.Objects;

import limen.model.Step;
import limen.ui.authoring.edit.BatteryDocument;

/**
 * The step the author is working on, with the open document it belongs to (which knows the battery's file and
 * the calibration it names).
 *
 * @param document the open battery
 * @param step a step of {@code document}'s battery
 */
public record StepFocus(BatteryDocument document, Step step) {

    /** Checks the arguments. */
    public StepFocus {
        Objects.requireNonNull(document, "document");
        Objects.requireNonNull(step, "step");
    }
}
