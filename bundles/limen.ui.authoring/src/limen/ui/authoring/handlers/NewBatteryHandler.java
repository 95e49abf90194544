package limen.ui.authoring.handlers;

import java.nio.file.Path;

import jakarta.inject.Named;

import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.core.services.events.IEventBroker;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.services.IServiceConstants;
import org.eclipse.e4.ui.workbench.modeling.EModelService;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.swt.widgets.Shell;

import limen.ui.LimenPreferences;
import limen.ui.authoring.parts.Editors;
import limen.ui.authoring.parts.LabFilesPart;
import limen.ui.parts.WorkspacePart;

/** File &gt; New battery from template: the wizard, then the new battery in its editor. */
public final class NewBatteryHandler {

    @Execute
    public void execute(@Named(IServiceConstants.ACTIVE_SHELL) Shell shell, EPartService parts, EModelService models,
            MApplication app, @Optional IEventBroker broker) {
        Path folder = LimenPreferences.open().workspaceFolder().toAbsolutePath().normalize();
        Path created = LabFilesPart.newBatteryDialog(shell, folder);
        if (created != null) {
            if (broker != null) {
                broker.send(WorkspacePart.REFRESH_TOPIC, "new battery");
            }
            Editors.open(created, parts, models, app);
        }
    }
}
