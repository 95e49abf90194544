package limen.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.eclipse.e4.core.contexts.ContextInjectionFactory;
import org.eclipse.e4.core.contexts.EclipseContextFactory;
import org.eclipse.e4.core.contexts.IEclipseContext;
import org.eclipse.jface.preference.PreferenceDialog;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.ui.LimenPreferences;
import limen.ui.handlers.AboutHandler;
import limen.ui.handlers.PreferencesHandler;
import limen.ui.parts.WorkspacePart;

class WorkspacePartTest {

    @TempDir
    Path temp;

    private Display display;
    private Shell shell;

    @BeforeEach
    void setUp() throws Exception {
        Path prefs = temp.resolve("workbench.prefs");
        System.setProperty("limen.preferences", prefs.toString());
        LimenPreferences p = LimenPreferences.open();
        Path ws = Files.createDirectories(temp.resolve("lab"));
        Files.writeString(ws.resolve("pitch.battery"), "<x/>");
        Files.createDirectories(ws.resolve("cal"));
        Files.writeString(ws.resolve("cal/booth-a.calibration"), "<y/>");
        Files.writeString(ws.resolve("notes.txt"), "not listed");
        p.store().setValue(LimenPreferences.WORKSPACE_FOLDER, ws.toString());
        p.save();
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setText("Limen test: workspace");
        shell.setLayout(new FillLayout());
        shell.setSize(700, 400);
    }

    @AfterEach
    void tearDown() {
        shell.dispose();
        System.clearProperty("limen.preferences");
    }

    @Test
    void listsBatteriesAndCalibrationsOnly() throws Exception {
        IEclipseContext context = EclipseContextFactory.create("test");
        context.set(Composite.class, shell);
        WorkspacePart part = ContextInjectionFactory.make(WorkspacePart.class, context);
        shell.open();
        List<WorkspacePart.Entry> entries = part.entries();
        assertEquals(2, entries.size(), entries.toString());
        assertEquals("booth-a.calibration", entries.get(0).name());
        assertEquals("calibration", entries.get(0).kind());
        assertEquals("pitch.battery", entries.get(1).name());
        Path png = Screenshots.save(shell, "workspace-part");
        assertTrue(Files.size(png) > 0);
        assertTrue(Screenshots.distinctPixels(png) > 2, "screenshot is blank");
        context.dispose();
    }

    @Test
    void aboutTextCarriesTheCautions() {
        String text = AboutHandler.aboutText();
        assertTrue(text.startsWith("Limen "), text);
        assertTrue(text.contains("not a clinical audiometer"), text);
        assertTrue(text.contains("ethics approval"), text);
    }

    @Test
    void preferencesDialogEditsTheStore() throws Exception {
        LimenPreferences prefs = LimenPreferences.open();
        PreferenceDialog dialog = PreferencesHandler.createDialog(shell, prefs);
        dialog.setBlockOnOpen(false);
        dialog.open();
        try {
            Screenshots.save(dialog.getShell(), "preferences-dialog");
            assertTrue(dialog.getShell().isVisible());
        } finally {
            dialog.close();
        }
        prefs.store().setValue(LimenPreferences.SAMPLE_RATE_HZ, 96000);
        prefs.save();
        assertEquals(96000, LimenPreferences.open().sampleRateHz());
    }
}
