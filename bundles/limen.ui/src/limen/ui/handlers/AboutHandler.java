package limen.ui.handlers;

import jakarta.inject.Named;

import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.ui.services.IServiceConstants;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.widgets.Shell;

import limen.core.About;

/** Help > About Limen: version, build date, Java, and the research-use and sound-level cautions. */
public final class AboutHandler {

    /** The dialog text (also used by tests). */
    public static String aboutText() {
        return About.current().versionText().replace("caution: ", "\n");
    }

    @Execute
    public void execute(@Named(IServiceConstants.ACTIVE_SHELL) Shell shell) {
        MessageDialog.openInformation(shell, "About Limen", aboutText());
    }
}
