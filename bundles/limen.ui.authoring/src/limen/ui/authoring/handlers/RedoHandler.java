package limen.ui.authoring.handlers;

import jakarta.inject.Named;

import org.eclipse.e4.core.di.annotations.CanExecute;
import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.services.IServiceConstants;
import org.eclipse.e4.ui.workbench.modeling.EModelService;

import limen.ui.authoring.parts.BatteryEditorPart;

/** Edit &gt; Redo (Ctrl+Shift+Z, Ctrl+Y): makes the last undone change again. */
public final class RedoHandler {

    @CanExecute
    public boolean canExecute(@Optional @Named(IServiceConstants.ACTIVE_PART) MPart active,
            @Optional EModelService models, @Optional MApplication app) {
        BatteryEditorPart editor = ActiveEditor.find(active, models, app);
        return editor != null && editor.document().commandStack().canRedo();
    }

    @Execute
    public void execute(@Optional @Named(IServiceConstants.ACTIVE_PART) MPart active,
            @Optional EModelService models, @Optional MApplication app) {
        BatteryEditorPart editor = ActiveEditor.find(active, models, app);
        if (editor != null) {
            editor.redo();
        }
    }
}
