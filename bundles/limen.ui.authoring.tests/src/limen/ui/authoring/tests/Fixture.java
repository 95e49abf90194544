package limen.ui.authoring.tests;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;

import org.eclipse.e4.core.contexts.ContextInjectionFactory;
import org.eclipse.e4.core.contexts.EclipseContextFactory;
import org.eclipse.e4.core.contexts.IEclipseContext;
import org.eclipse.e4.core.services.events.IEventBroker;
import org.eclipse.e4.ui.model.application.ui.basic.MBasicFactory;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;

import limen.ui.authoring.AuthoringIds;
import limen.ui.authoring.parts.BatteryEditorPart;

/**
 * A lab workspace in a temporary folder with copies of the demo lab's files, a shell, and an injection
 * context with a {@link TestBroker}.
 */
final class Fixture implements AutoCloseable {

    final Path workspace;
    final Display display;
    final Shell shell;
    final TestBroker broker = new TestBroker();
    final IEclipseContext context;

    Fixture(Path temp, String title, int width, int height) throws Exception {
        workspace = Files.createDirectories(temp.resolve("lab"));
        for (String name : new String[] {"frequency-discrimination.battery", "intensity-discrimination.battery",
                "harbourside-demo.calibration", "quest-thresholds.battery"}) {
            Files.copy(examples().resolve(name), workspace.resolve(name));
        }
        System.setProperty("limen.preferences", temp.resolve("workbench.prefs").toString());
        System.setProperty("limen.workspace", workspace.toString());
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setText("Limen test: " + title);
        shell.setLayout(new FillLayout());
        shell.setSize(width, height);
        context = EclipseContextFactory.create("test " + title);
        context.set(IEventBroker.class, broker);
    }

    /** @return the demo lab's folder of the source tree (system property limen.root, set by the build) */
    static Path examples() {
        String root = System.getProperty("limen.root");
        if (root == null) {
            throw new IllegalStateException("limen.root is not set: run the tests through the Maven build");
        }
        return Paths.get(root, "examples");
    }

    /** @return a part of the given class made in a new child composite of the shell's sash */
    <T> T make(Class<T> type, Composite parent, MPart part) {
        IEclipseContext child = context.createChild(type.getSimpleName());
        child.set(Composite.class, parent);
        if (part != null) {
            child.set(MPart.class, part);
        }
        return ContextInjectionFactory.make(type, child);
    }

    /** Opens an editor on a workspace file inside the given parent. */
    BatteryEditorPart editor(Composite parent, String fileName) {
        MPart part = MBasicFactory.INSTANCE.createPart();
        part.getPersistedState().put(AuthoringIds.FILE_KEY, workspace.resolve(fileName).toString());
        BatteryEditorPart editor = make(BatteryEditorPart.class, parent, part);
        part.setObject(editor);
        return editor;
    }

    /** A vertical sash filling the shell. */
    SashForm sash(int style) {
        return new SashForm(shell, style);
    }

    /** Lets the display paint and run pending timers for about the given time. */
    void pump(long millis) throws InterruptedException {
        long end = System.currentTimeMillis() + millis;
        do {
            while (display.readAndDispatch()) {
                // drain
            }
            Thread.sleep(5);
        } while (System.currentTimeMillis() < end);
    }

    /** Pumps until the condition holds or the time is up; returns whether it held. */
    boolean pumpUntil(java.util.function.BooleanSupplier condition, long millis) throws InterruptedException {
        long end = System.currentTimeMillis() + millis;
        while (!condition.getAsBoolean()) {
            if (System.currentTimeMillis() > end) {
                return false;
            }
            while (display.readAndDispatch()) {
                // drain
            }
            Thread.sleep(5);
        }
        return true;
    }

    @Override
    public void close() {
        shell.dispose();
        context.dispose();
        System.clearProperty("limen.preferences");
        System.clearProperty("limen.workspace");
    }

    static int style() {
        return SWT.VERTICAL;
    }
}
