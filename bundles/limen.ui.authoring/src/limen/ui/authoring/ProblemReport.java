package limen.ui.authoring;

import java.util.List;
import java.util.Objects;
import java.util.function.Consumer;

import limen.model.validation.Problem;
import limen.ui.authoring.edit.BatteryDocument;

/**
 * The problems of one open battery, as last computed (loading problems first, then validation), and how to go
 * to one of them in its editor.
 *
 * @param document the open battery
 * @param problems its problems (copied)
 * @param goTo brings the battery's editor to the front and shows the problem's element and field
 */
public record ProblemReport(BatteryDocument document, List<Problem> problems, Consumer<Problem> goTo) {

    /** Copies the list. */
    public ProblemReport {
        Objects.requireNonNull(document, "document");
        Objects.requireNonNull(goTo, "goTo");
        problems = List.copyOf(problems);
    }
}
