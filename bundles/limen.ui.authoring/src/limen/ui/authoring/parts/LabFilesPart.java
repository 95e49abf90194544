package limen.ui.authoring.parts;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;

import jakarta.annotation.PostConstruct;
import jakarta.annotation.PreDestroy;
import jakarta.inject.Inject;

import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.core.services.events.IEventBroker;
import org.eclipse.e4.ui.di.Focus;
import org.eclipse.e4.ui.di.UIEventTopic;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.workbench.modeling.EModelService;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.jface.dialogs.IInputValidator;
import org.eclipse.jface.dialogs.InputDialog;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.ITreeContentProvider;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.jface.viewers.TreeViewer;
import org.eclipse.jface.window.Window;
import org.eclipse.jface.wizard.WizardDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.ToolBar;
import org.eclipse.swt.widgets.ToolItem;

import limen.model.io.LimenFiles;
import limen.ui.LimenPreferences;
import limen.ui.StatusLine;
import limen.ui.authoring.AuthoringTopics;
import limen.ui.authoring.edit.Templates;
import limen.ui.authoring.internal.Icons;
import limen.ui.parts.WorkspacePart;

/**
 * Lab files: the batteries and calibrations of the workspace folder as a tree. New (from the demo lab's
 * templates), open (a battery in its editor; a calibration for the stimulus preview), rename, and delete with
 * confirmation. Files open in an editor are not renamed or deleted underneath it.
 */
public final class LabFilesPart {

    /** Event topic (payload: the calibration's {@link Path}) asking the preview to use a calibration. */
    public static final String USE_CALIBRATION_TOPIC = AuthoringTopics.STEP + "/calibration";

    @Inject
    @Optional
    IEventBroker broker;

    @Inject
    @Optional
    EPartService parts;

    @Inject
    @Optional
    EModelService models;

    @Inject
    @Optional
    MApplication app;

    private Path folder;
    private TreeViewer viewer;
    private Label folderLabel;
    private Icons icons;
    private String lastStatus = "";

    @PostConstruct
    public void create(Composite parent) {
        parent.setLayout(new GridLayout(1, false));
        icons = new Icons(parent.getDisplay());
        ToolBar bar = new ToolBar(parent, SWT.FLAT | SWT.RIGHT | SWT.WRAP);
        item(bar, "New...", "New battery from a template of the demo lab", () -> newBattery(parent.getShell()));
        item(bar, "Open", "Open the selected battery (or use the selected calibration for the preview)",
                this::openSelected);
        item(bar, "Rename...", "Rename the selected file", () -> renameSelected(parent.getShell()));
        item(bar, "Delete...", "Delete the selected file (asks first)", () -> deleteSelected(parent.getShell()));
        item(bar, "Refresh", "Read the folder again (F5)", this::refresh);
        folderLabel = new Label(parent, SWT.WRAP);
        folderLabel.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        viewer = new TreeViewer(parent, SWT.BORDER | SWT.SINGLE | SWT.V_SCROLL | SWT.H_SCROLL);
        viewer.getTree().setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        viewer.setContentProvider(new FolderContent());
        viewer.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return ((Path) element).getFileName().toString();
            }

            @Override
            public Image getImage(Object element) {
                return Files.isDirectory((Path) element) ? null
                        : element.toString().endsWith(".battery") ? icons.battery() : icons.calibration();
            }
        });
        viewer.addDoubleClickListener(e -> openSelected());
        refresh();
    }

    private static void item(ToolBar bar, String text, String tip, Runnable action) {
        ToolItem item = new ToolItem(bar, SWT.PUSH);
        item.setText(text);
        item.setToolTipText(tip);
        item.addListener(SWT.Selection, e -> action.run());
    }

    /** Batteries, calibrations and the folders holding them. */
    private static final class FolderContent implements ITreeContentProvider {
        @Override
        public Object[] getElements(Object input) {
            return getChildren(input);
        }

        @Override
        public Object[] getChildren(Object parent) {
            return listed((Path) parent).toArray();
        }

        @Override
        public Object getParent(Object element) {
            return ((Path) element).getParent();
        }

        @Override
        public boolean hasChildren(Object element) {
            return Files.isDirectory((Path) element) && !listed((Path) element).isEmpty();
        }
    }

    /** @return a folder's batteries and calibrations, and its subfolders that hold some, folders first */
    static List<Path> listed(Path dir) {
        List<Path> out = new ArrayList<>();
        if (!Files.isDirectory(dir)) {
            return out;
        }
        try (Stream<Path> s = Files.list(dir)) {
            s.filter(p -> Files.isDirectory(p) ? holdsLabFiles(p) : isLabFile(p))
                    .sorted(Comparator.comparing((Path p) -> !Files.isDirectory(p)).thenComparing(Path::toString))
                    .forEach(out::add);
        } catch (IOException e) {
            // an unreadable folder shows empty; refresh() reports the top folder's problems
        }
        return out;
    }

    private static boolean holdsLabFiles(Path dir) {
        try (Stream<Path> s = Files.walk(dir, 4)) {
            return s.anyMatch(LabFilesPart::isLabFile);
        } catch (IOException e) {
            return false;
        }
    }

    static boolean isLabFile(Path p) {
        String n = p.getFileName().toString();
        return Files.isRegularFile(p) && (n.endsWith("." + LimenFiles.BATTERY_EXTENSION)
                || n.endsWith("." + LimenFiles.CALIBRATION_EXTENSION));
    }

    @Inject
    @Optional
    void onRefresh(@UIEventTopic(WorkspacePart.REFRESH_TOPIC) Object why) {
        if (viewer != null && !viewer.getTree().isDisposed()) {
            refresh();
        }
    }

    /** Rereads the workspace folder named in the preferences. */
    public void refresh() {
        folder = LimenPreferences.open().workspaceFolder().toAbsolutePath().normalize();
        Object[] expanded = viewer.getExpandedElements();
        viewer.setInput(folder);
        viewer.setExpandedElements(expanded);
        folderLabel.setText(Files.isDirectory(folder) ? folder.toString() : folder + " (missing: set it in Preferences)");
        folderLabel.getParent().layout(true);
    }

    /** @return the workspace folder shown */
    public Path folder() {
        return folder;
    }

    /** @return the file selected, or null */
    public Path selectedFile() {
        Object first = viewer.getStructuredSelection().getFirstElement();
        return first instanceof Path p && Files.isRegularFile(p) ? p : null;
    }

    /** Selects a file in the tree. */
    public void select(Path file) {
        viewer.setSelection(new StructuredSelection(file), true);
    }

    private void openSelected() {
        Path file = selectedFile();
        if (file != null) {
            open(file);
        }
    }

    /** Opens a battery in its editor, or uses a calibration for the stimulus preview. */
    public void open(Path file) {
        if (file.toString().endsWith("." + LimenFiles.CALIBRATION_EXTENSION)) {
            if (broker != null) {
                broker.send(USE_CALIBRATION_TOPIC, file);
            }
            status("Stimulus preview now uses " + file.getFileName());
            return;
        }
        if (parts == null || models == null || app == null) {
            status("No workbench to open " + file.getFileName() + " in");
            return;
        }
        Editors.open(file, parts, models, app);
    }

    private void newBattery(Shell shell) {
        Path created = newBatteryDialog(shell, folder);
        if (created != null) {
            refreshAll();
            select(created);
            open(created);
        }
    }

    /**
     * Runs the new-battery wizard.
     *
     * @return the created file, or null when cancelled
     */
    public static Path newBatteryDialog(Shell shell, Path folder) {
        List<Templates.Template> templates;
        try {
            templates = Templates.list(Templates.examplesFolder());
        } catch (IOException e) {
            templates = List.of();
        }
        if (templates.isEmpty()) {
            MessageDialog.openInformation(shell, "New battery", "No templates found: the demo lab's examples folder "
                    + (Templates.examplesFolder() == null ? "is not known (start Limen with ./limen)"
                            : Templates.examplesFolder() + " holds no readable battery") + ".");
            return null;
        }
        NewBatteryWizard wizard = new NewBatteryWizard(folder, templates);
        WizardDialog dialog = new WizardDialog(shell, wizard);
        return dialog.open() == Window.OK ? wizard.created() : null;
    }

    private void renameSelected(Shell shell) {
        Path file = selectedFile();
        if (file == null || refuseIfOpen(shell, file, "renamed")) {
            return;
        }
        String name = file.getFileName().toString();
        String extension = name.substring(name.lastIndexOf('.'));
        IInputValidator check = text -> renameRefusal(file, text);
        InputDialog dialog = new InputDialog(shell, "Rename", "New name for " + name + " (the extension "
                + extension + " stays):", name, check);
        if (dialog.open() == Window.OK) {
            try {
                select(rename(file, dialog.getValue()));
            } catch (IOException e) {
                MessageDialog.openError(shell, "Rename", "Not renamed: " + e.getMessage());
            }
        }
    }

    /** @return null when a file may be renamed to {@code newName}, else why not */
    public static String renameRefusal(Path file, String newName) {
        String name = file.getFileName().toString();
        String extension = name.substring(name.lastIndexOf('.'));
        String n = newName == null ? "" : newName.trim();
        if (n.isEmpty() || n.contains("/") || n.contains("\\") || n.startsWith(".")) {
            return "a plain file name, please";
        }
        if (!n.endsWith(extension)) {
            return "keep the extension " + extension;
        }
        if (!n.equals(name) && Files.exists(file.resolveSibling(n))) {
            return n + " exists already";
        }
        return null;
    }

    /**
     * Renames a file in its folder.
     *
     * @return the new path
     * @throws IOException when the name is refused or the move fails
     */
    public Path rename(Path file, String newName) throws IOException {
        String why = renameRefusal(file, newName);
        if (why != null) {
            throw new IOException(why);
        }
        Path target = Files.move(file, file.resolveSibling(newName.trim()));
        status("Renamed " + file.getFileName() + " to " + target.getFileName());
        refreshAll();
        return target;
    }

    private void deleteSelected(Shell shell) {
        Path file = selectedFile();
        if (file == null || refuseIfOpen(shell, file, "deleted")) {
            return;
        }
        if (MessageDialog.openConfirm(shell, "Delete", "Delete " + file.getFileName() + " from " + file.getParent()
                + "?\nThis cannot be undone.")) {
            try {
                delete(file);
            } catch (IOException e) {
                MessageDialog.openError(shell, "Delete", "Not deleted: " + e.getMessage());
            }
        }
    }

    /** Deletes a file (after the confirmation the view asks for). */
    public void delete(Path file) throws IOException {
        Files.delete(file);
        status("Deleted " + file.getFileName());
        refreshAll();
    }

    private boolean refuseIfOpen(Shell shell, Path file, String what) {
        if (Editors.isOpen(file, parts)) {
            MessageDialog.openInformation(shell, "File is open", file.getFileName()
                    + " is open in an editor: close it first, so that it is not " + what + " underneath the editor.");
            return true;
        }
        return false;
    }

    private void refreshAll() {
        refresh();
        if (broker != null) {
            broker.send(WorkspacePart.REFRESH_TOPIC, "lab files changed");
        }
    }

    private void status(String message) {
        lastStatus = message;
        if (broker != null) {
            broker.post(StatusLine.TOPIC, message);
        }
    }

    /** @return the last status message */
    public String lastStatus() {
        return lastStatus;
    }

    /** @return the tree */
    public TreeViewer viewer() {
        return viewer;
    }

    @Focus
    public void focus() {
        viewer.getTree().setFocus();
    }

    @PreDestroy
    public void dispose() {
        icons.dispose();
    }
}
