package limen.ui.handlers;

import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.ui.workbench.IWorkbench;

/** File > Quit. Parts with unsaved changes are asked by the workbench's save handling. */
public final class QuitHandler {

    @Execute
    public void execute(IWorkbench workbench) {
        workbench.close();
    }
}
