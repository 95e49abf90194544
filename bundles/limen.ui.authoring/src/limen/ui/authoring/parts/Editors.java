package limen.ui.authoring.parts;

import java.nio.file.Path;
import java.util.List;

import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.model.application.ui.basic.MPartStack;
import org.eclipse.e4.ui.workbench.modeling.EModelService;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.e4.ui.workbench.modeling.EPartService.PartState;

import limen.ui.authoring.AuthoringIds;

/** Opens battery editors: one part per file, in the Authoring perspective's editor stack. */
public final class Editors {

    private Editors() {
    }

    /**
     * Brings the editor of a battery file to the front, opening one when there is none.
     *
     * @return the editor's part
     */
    public static MPart open(Path file, EPartService parts, EModelService models, MApplication app) {
        String key = file.toAbsolutePath().normalize().toString();
        MPart open = find(key, parts);
        if (open != null) {
            parts.showPart(open, PartState.ACTIVATE);
            return open;
        }
        MPart part = parts.createPart(AuthoringIds.EDITOR_DESCRIPTOR);
        part.getPersistedState().put(AuthoringIds.FILE_KEY, key);
        part.setLabel(file.getFileName().toString());
        part.setTooltip(key);
        List<MPartStack> stacks = models.findElements(app, AuthoringIds.EDITOR_STACK, MPartStack.class, null);
        if (!stacks.isEmpty()) {
            MPartStack stack = stacks.get(0);
            stack.setToBeRendered(true);
            stack.setVisible(true);
            stack.getChildren().add(part);
        }
        parts.showPart(part, PartState.ACTIVATE);
        return part;
    }

    /** @return the open editor of a file (absolute, normalised path), or null */
    public static MPart find(String file, EPartService parts) {
        for (MPart p : parts.getParts()) {
            if (AuthoringIds.EDITOR_DESCRIPTOR.equals(p.getElementId())
                    && file.equals(p.getPersistedState().get(AuthoringIds.FILE_KEY))) {
                return p;
            }
        }
        return null;
    }

    /** @return whether a file is open in an editor */
    public static boolean isOpen(Path file, EPartService parts) {
        return parts != null && find(file.toAbsolutePath().normalize().toString(), parts) != null;
    }
}
