package limen.ui.authoring.handlers;

import java.util.List;

import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.model.application.ui.basic.MPartStack;
import org.eclipse.e4.ui.model.application.ui.basic.MStackElement;
import org.eclipse.e4.ui.workbench.modeling.EModelService;

import limen.ui.authoring.AuthoringIds;
import limen.ui.authoring.parts.BatteryEditorPart;

/**
 * The battery editor the editing commands act on: the active part when it is one, else the editor on top of
 * the Authoring editor stack (so that undo still reaches the battery while the author looks at a view).
 */
final class ActiveEditor {

    private ActiveEditor() {
    }

    static BatteryEditorPart find(MPart active, EModelService models, MApplication app) {
        if (active != null && active.getObject() instanceof BatteryEditorPart e && e.document() != null) {
            return e;
        }
        if (models == null || app == null) {
            return null;
        }
        List<MPartStack> stacks = models.findElements(app, AuthoringIds.EDITOR_STACK, MPartStack.class, null);
        if (stacks.isEmpty()) {
            return null;
        }
        MStackElement top = stacks.get(0).getSelectedElement();
        return top instanceof MPart p && p.getObject() instanceof BatteryEditorPart e && e.document() != null ? e
                : null;
    }
}
