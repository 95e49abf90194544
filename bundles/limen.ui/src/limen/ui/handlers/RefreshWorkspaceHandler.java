package limen.ui.handlers;

import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.core.services.events.IEventBroker;

import limen.ui.parts.WorkspacePart;

/** File > Refresh workspace (F5): rereads the workspace folder. */
public final class RefreshWorkspaceHandler {

    @Execute
    public void execute(IEventBroker broker) {
        broker.send(WorkspacePart.REFRESH_TOPIC, "refresh");
    }
}
