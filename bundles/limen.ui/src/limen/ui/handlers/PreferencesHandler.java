package limen.ui.handlers;

import jakarta.inject.Named;

import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.core.services.events.IEventBroker;
import org.eclipse.e4.ui.services.IServiceConstants;
import org.eclipse.jface.preference.PreferenceDialog;
import org.eclipse.jface.preference.PreferenceManager;
import org.eclipse.jface.preference.PreferenceNode;
import org.eclipse.jface.window.Window;
import org.eclipse.swt.widgets.Shell;

import limen.ui.LimenPreferences;
import limen.ui.parts.WorkspacePart;

/** File > Preferences...: the workbench's folders and preview settings. */
public final class PreferencesHandler {

    /** Builds the dialog (separate for tests, which open it without blocking). */
    public static PreferenceDialog createDialog(Shell shell, LimenPreferences prefs) {
        PreferenceManager manager = new PreferenceManager();
        manager.addToRoot(new PreferenceNode("limen.folders", new FoldersPreferencePage()));
        PreferenceDialog dialog = new PreferenceDialog(shell, manager);
        dialog.setPreferenceStore(prefs.store());
        return dialog;
    }

    @Execute
    public void execute(@Named(IServiceConstants.ACTIVE_SHELL) Shell shell, IEventBroker broker) {
        LimenPreferences prefs = LimenPreferences.open();
        PreferenceDialog dialog = createDialog(shell, prefs);
        if (dialog.open() == Window.OK) {
            prefs.save();
            broker.send(WorkspacePart.REFRESH_TOPIC, "preferences");
        }
    }
}
