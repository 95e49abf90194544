package limen.ui.handlers;

import java.util.List;

import org.eclipse.e4.ui.di.AboutToShow;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.model.application.ui.advanced.MPerspective;
import org.eclipse.e4.ui.model.application.ui.advanced.MPerspectiveStack;
import org.eclipse.e4.ui.model.application.ui.menu.MDirectMenuItem;
import org.eclipse.e4.ui.model.application.ui.menu.MMenuElement;
import org.eclipse.e4.ui.workbench.modeling.EModelService;

/**
 * Window menu: one entry per work area (perspective) of the main window, e.g. Lab, Authoring, Booth,
 * Analysis; the bundles that provide a work area add its perspective to {@link #STACK_ID} with a model fragment.
 */
public final class WorkAreaMenu {

    /** The perspective stack of the main window. */
    public static final String STACK_ID = "limen.ui.perspectivestack";

    @AboutToShow
    public void aboutToShow(List<MMenuElement> items, MApplication app, EModelService models) {
        List<MPerspectiveStack> stacks = models.findElements(app, STACK_ID, MPerspectiveStack.class, null);
        if (stacks.isEmpty()) {
            return;
        }
        MPerspectiveStack stack = stacks.get(0);
        for (MPerspective p : stack.getChildren()) {
            if (!p.isToBeRendered()) {
                continue;
            }
            MDirectMenuItem item = models.createModelElement(MDirectMenuItem.class);
            item.setLabel(p.getLabel());
            item.setTooltip(p.getTooltip());
            item.setElementId("limen.ui.menuitem.workarea." + p.getElementId());
            item.setSelected(stack.getSelectedElement() == p);
            item.setObject(new SwitchTo(p.getElementId()));
            items.add(item);
        }
    }

    /** The action of one menu entry. */
    public static final class SwitchTo {
        private final String perspectiveId;

        SwitchTo(String perspectiveId) {
            this.perspectiveId = perspectiveId;
        }

        @org.eclipse.e4.core.di.annotations.Execute
        public void execute(MApplication app, EModelService models,
                org.eclipse.e4.ui.workbench.modeling.EPartService parts) {
            List<MPerspective> found = models.findElements(app, perspectiveId, MPerspective.class, null);
            if (!found.isEmpty()) {
                parts.switchPerspective(found.get(0));
            }
        }
    }
}
