package limen.ui.authoring.parts;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.stream.Collectors;

import jakarta.annotation.PostConstruct;
import jakarta.annotation.PreDestroy;
import jakarta.inject.Inject;

import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.core.services.events.IEventBroker;
import org.eclipse.e4.ui.di.Focus;
import org.eclipse.e4.ui.di.Persist;
import org.eclipse.e4.ui.di.UIEventTopic;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.services.EContextService;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.common.command.CommandStackListener;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.jface.util.LocalSelectionTransfer;
import org.eclipse.jface.viewers.ColumnViewerToolTipSupport;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.jface.viewers.TreeViewer;
import org.eclipse.jface.viewers.ViewerDropAdapter;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.dnd.DND;
import org.eclipse.swt.dnd.DragSourceAdapter;
import org.eclipse.swt.dnd.DragSourceEvent;
import org.eclipse.swt.dnd.Transfer;
import org.eclipse.swt.dnd.TransferData;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.ToolBar;
import org.eclipse.swt.widgets.ToolItem;

import limen.model.Battery;
import limen.model.Break;
import limen.model.Step;
import limen.model.Track;
import limen.model.io.LimenFileException;
import limen.model.validation.Problem;
import limen.model.validation.Severity;
import limen.ui.StatusLine;
import limen.ui.authoring.AuthoringIds;
import limen.ui.authoring.AuthoringTopics;
import limen.ui.authoring.ProblemReport;
import limen.ui.authoring.StepFocus;
import limen.ui.authoring.edit.BatteryDocument;
import limen.ui.authoring.edit.Field;
import limen.ui.authoring.edit.ItemContentProvider;
import limen.ui.authoring.edit.ItemLabelProvider;
import limen.ui.authoring.edit.SettingsForm;
import limen.ui.authoring.edit.StructureEdits;
import limen.ui.authoring.internal.Icons;

/**
 * The battery editor: one part per {@code *.battery} file (its path in the part's persisted state under
 * {@link AuthoringIds#FILE_KEY}). The steps and tracks as a tree (EMF.Edit item providers through our small
 * JFace adapters) beside the settings form of the selected element; drag to reorder, copy and paste, undo
 * and redo through the EMF command stack; validated after every change, with the problems at the tree
 * elements, at the fields and in the battery check view; saved atomically through {@code LimenFiles}.
 */
public final class BatteryEditorPart {

    @Inject
    MPart part;

    @Inject
    @Optional
    IEventBroker broker;

    @Inject
    @Optional
    EContextService contexts;

    @Inject
    @Optional
    EPartService partService;

    @Inject
    @Optional
    MApplication app;

    private BatteryDocument document;
    private Icons icons;
    private TreeViewer viewer;
    private SettingsForm form;
    private Label banner;
    private ToolItem undoItem;
    private ToolItem redoItem;
    private ToolItem saveItem;
    private List<Problem> problems = List.of();
    private String lastStatus = "";
    private final CommandStackListener stackListener = e -> changed();

    @PostConstruct
    public void create(Composite parent) {
        parent.setLayout(new GridLayout(1, false));
        icons = new Icons(parent.getDisplay());
        String file = part.getPersistedState().get(AuthoringIds.FILE_KEY);
        if (file == null) {
            failed(parent, "This editor was opened without a battery file.");
            return;
        }
        try {
            document = BatteryDocument.open(Path.of(file));
        } catch (LimenFileException e) {
            failed(parent, "Cannot open " + file + ":\n" + e.problems().stream().map(Problem::format)
                    .collect(Collectors.joining("\n")));
            return;
        }
        part.setLabel(document.name());
        part.setTooltip(document.file().toString());
        banner = new Label(parent, SWT.WRAP);
        banner.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        createToolBar(parent);
        SashForm sash = new SashForm(parent, SWT.HORIZONTAL);
        sash.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        createTree(sash);
        form = new SettingsForm(sash, document, this::status);
        sash.setWeights(38, 62);
        document.commandStack().addCommandStackListener(stackListener);
        viewer.setSelection(new StructuredSelection(document.battery().getSteps().isEmpty() ? document.battery()
                : document.battery().getSteps().get(0)), true);
        validate();
        updateBanner(null);
    }

    private void failed(Composite parent, String message) {
        Label l = new Label(parent, SWT.WRAP);
        l.setText(message);
        l.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
    }

    private void createToolBar(Composite parent) {
        ToolBar bar = new ToolBar(parent, SWT.FLAT | SWT.RIGHT);
        saveItem = item(bar, "Save", "Save the battery (Ctrl+S)", this::save);
        undoItem = item(bar, "Undo", "Undo the last change (Ctrl+Z)", this::undo);
        redoItem = item(bar, "Redo", "Redo (Ctrl+Shift+Z or Ctrl+Y)", this::redo);
        new ToolItem(bar, SWT.SEPARATOR);
        item(bar, "Copy", "Copy the selected steps or tracks (Ctrl+C in the tree)", this::copy);
        item(bar, "Paste", "Paste after the selection (Ctrl+V in the tree)", this::paste);
        item(bar, "Delete", "Delete the selected steps, tracks or breaks (Del in the tree)", this::delete);
        new ToolItem(bar, SWT.SEPARATOR);
        item(bar, "Move up", "Move the selected step or track up (or drag it)", () -> moveBy(-1));
        item(bar, "Move down", "Move the selected step or track down (or drag it)", () -> moveBy(1));
        bar.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
    }

    private static ToolItem item(ToolBar bar, String text, String tip, Runnable action) {
        ToolItem item = new ToolItem(bar, SWT.PUSH);
        item.setText(text);
        item.setToolTipText(tip);
        item.addListener(SWT.Selection, e -> action.run());
        return item;
    }

    private void createTree(Composite parent) {
        viewer = new TreeViewer(parent, SWT.BORDER | SWT.MULTI | SWT.V_SCROLL | SWT.H_SCROLL);
        viewer.setContentProvider(new ItemContentProvider(document.adapterFactory()));
        viewer.setLabelProvider(new ItemLabelProvider(document.adapterFactory(), icons, this::problemsAt));
        ColumnViewerToolTipSupport.enableFor(viewer);
        viewer.setInput(List.of(document.battery()));
        viewer.expandAll();
        viewer.addSelectionChangedListener(e -> selected());
        viewer.getTree().addListener(SWT.FocusIn, e -> {
            if (contexts != null) {
                contexts.activateContext(AuthoringIds.TREE_CONTEXT);
            }
        });
        viewer.getTree().addListener(SWT.FocusOut, e -> {
            if (contexts != null) {
                contexts.deactivateContext(AuthoringIds.TREE_CONTEXT);
            }
        });
        Transfer[] transfers = {LocalSelectionTransfer.getTransfer()};
        viewer.addDragSupport(DND.DROP_MOVE, transfers, new DragSourceAdapter() {
            @Override
            public void dragStart(DragSourceEvent event) {
                List<?> s = selection();
                event.doit = !s.isEmpty() && s.stream().allMatch(o -> o instanceof Step || o instanceof Track);
                LocalSelectionTransfer.getTransfer().setSelection(viewer.getStructuredSelection());
            }
        });
        viewer.addDropSupport(DND.DROP_MOVE, transfers, new ViewerDropAdapter(viewer) {
            @Override
            public boolean validateDrop(Object target, int operation, TransferData type) {
                return target instanceof EObject t && dropCommand(t, getCurrentLocation()).canExecute();
            }

            @Override
            public boolean performDrop(Object data) {
                return getCurrentTarget() instanceof EObject t && document.execute(dropCommand(t, getCurrentLocation()));
            }
        });
    }

    private Command dropCommand(EObject target, int location) {
        List<EObject> moved = new ArrayList<>();
        for (Object o : selection()) {
            moved.add((EObject) o);
        }
        return StructureEdits.move(document, moved, target, location == ViewerDropAdapter.LOCATION_AFTER);
    }

    private List<?> selection() {
        return viewer.getStructuredSelection().toList();
    }

    private void selected() {
        Object first = viewer.getStructuredSelection().getFirstElement();
        EObject element = first instanceof EObject e ? e : null;
        if (element != form.shown()) {
            form.show(element);
        }
        publishStep();
    }

    private void publishStep() {
        Step step = stepOfSelection();
        if (step == null) {
            return;
        }
        StepFocus focus = new StepFocus(document, step);
        if (app != null) {
            app.getContext().set(StepFocus.class, focus); // for views created later
        }
        if (broker != null) {
            broker.send(AuthoringTopics.STEP, focus);
        }
    }

    /** Sends this battery's problems again (for a battery check view created after the last change). */
    @Inject
    @Optional
    void republish(@UIEventTopic(AuthoringTopics.REPUBLISH) Object why) {
        if (document != null && broker != null) {
            broker.send(AuthoringTopics.PROBLEMS, new ProblemReport(document, problems, this::goTo));
        }
    }

    /** @return the selected step, or the step of the selected track, or null */
    public Step stepOfSelection() {
        Object first = viewer.getStructuredSelection().getFirstElement();
        return first instanceof Step s ? s : first instanceof Track t ? (Step) t.eContainer() : null;
    }

    private void changed() {
        if (viewer.getControl().isDisposed()) {
            return;
        }
        viewer.refresh(true);
        Command last = document.commandStack().getMostRecentCommand();
        Collection<?> affected = last == null ? List.of() : last.getAffectedObjects();
        List<Object> shown = new ArrayList<>();
        for (Object o : affected) {
            if (o instanceof Step || o instanceof Track || o instanceof Break) {
                shown.add(o);
            }
        }
        if (!shown.isEmpty() && shown.stream().allMatch(o -> ((EObject) o).eResource() != null)) {
            shown.forEach(o -> viewer.expandToLevel(o, 1));
            viewer.setSelection(new StructuredSelection(shown), true);
        }
        form.refresh();
        validate();
        part.setDirty(document.isDirty());
        updateBanner(null);
        publishStep();
    }

    private void validate() {
        problems = document.validate();
        viewer.refresh(true);
        form.showProblems(problems);
        if (broker != null) {
            broker.send(AuthoringTopics.PROBLEMS, new ProblemReport(document, problems, this::goTo));
        }
    }

    private void updateBanner(String message) {
        undoItem.setEnabled(document.commandStack().canUndo());
        redoItem.setEnabled(document.commandStack().canRedo());
        saveItem.setEnabled(document.isDirty());
        long errors = BatteryDocument.count(problems, Severity.ERROR);
        long warnings = BatteryDocument.count(problems, Severity.WARNING);
        String text = message != null ? message
                : errors + warnings == 0 ? document.file().toString() + ": no problems"
                : document.file() + ": " + errors + " error(s), " + warnings + " warning(s) (see Battery check)";
        banner.setText(text);
        banner.setForeground(banner.getDisplay().getSystemColor(message != null || errors > 0 ? SWT.COLOR_DARK_RED
                : SWT.COLOR_WIDGET_FOREGROUND));
        banner.getParent().layout(true);
    }

    /** The tree element a problem is shown at: its element's nearest battery, step, track or break. */
    public static EObject nodeOf(EObject object) {
        for (EObject e = object; e != null; e = e.eContainer()) {
            if (e instanceof Battery || e instanceof Step || e instanceof Track || e instanceof Break) {
                return e;
            }
        }
        return null;
    }

    /** @return the problems shown at a tree element: those of its settings and of the elements below it */
    public List<Problem> problemsAt(Object element) {
        List<Problem> out = new ArrayList<>();
        for (Problem p : problems) {
            for (EObject n = nodeOf(p.object()); n != null; n = n.eContainer()) {
                if (n == element) {
                    out.add(p);
                    break;
                }
            }
        }
        return out;
    }

    private void status(String message) {
        lastStatus = message;
        if (broker != null) {
            broker.post(StatusLine.TOPIC, message);
        }
    }

    /** Saves; an invalid battery is saved too, with a warning naming its errors. */
    @Persist
    public void save() {
        if (document == null) {
            return;
        }
        form.fields().forEach(Field::commit); // a value still being typed counts
        try {
            List<Problem> errors = document.save();
            part.setDirty(false);
            String message = errors.isEmpty() ? null
                    : "Saved with " + errors.size() + " error(s): a session will refuse to run this battery until "
                            + "they are fixed. First: " + errors.get(0).message();
            updateBanner(message);
            status(errors.isEmpty() ? "Saved " + document.name() : "Saved " + document.name() + " with "
                    + errors.size() + " error(s)");
        } catch (IOException e) {
            updateBanner("Not saved (the file on disk is unchanged): " + e.getMessage());
            status("Not saved: " + e.getMessage());
        }
    }

    /** Takes back the last change. */
    public void undo() {
        if (document.commandStack().canUndo()) {
            status("Undo: " + label(document.commandStack().getUndoCommand()));
            document.commandStack().undo();
        }
    }

    /** Makes the last undone change again. */
    public void redo() {
        if (document.commandStack().canRedo()) {
            status("Redo: " + label(document.commandStack().getRedoCommand()));
            document.commandStack().redo();
        }
    }

    private static String label(Command c) {
        return c.getLabel() == null ? "change" : c.getLabel();
    }

    /** Copies the selected steps (or tracks) to this editor's clipboard. */
    public void copy() {
        Collection<Object> copies = StructureEdits.copy(selection());
        if (!copies.isEmpty()) {
            document.domain().setClipboard(copies);
            status("Copied " + copies.size() + " element(s)");
        }
    }

    /** Pastes fresh copies of the clipboard after the selection. */
    public void paste() {
        if (!document.execute(StructureEdits.paste(document, document.domain().getClipboard(),
                viewer.getStructuredSelection().getFirstElement()))) {
            status("Nothing to paste here: copy steps to paste steps, tracks to paste tracks into a step");
        }
    }

    /** Deletes the selected steps, tracks or breaks. */
    public void delete() {
        document.execute(StructureEdits.delete(document, selection()));
    }

    /** Moves the selected step or track one place up (-1) or down (+1). */
    public void moveBy(int delta) {
        Object first = viewer.getStructuredSelection().getFirstElement();
        if (!(first instanceof Step || first instanceof Track)) {
            return;
        }
        EObject e = (EObject) first;
        @SuppressWarnings("unchecked")
        List<EObject> siblings = (List<EObject>) e.eContainer().eGet(e.eContainmentFeature());
        int to = siblings.indexOf(e) + delta;
        if (to < 0 || to >= siblings.size()) {
            return;
        }
        document.execute(StructureEdits.move(document, List.of(e), siblings.get(to), delta > 0));
    }

    /**
     * Goes to a problem: selects its element in the tree and puts the caret into its field when it has one.
     */
    public void reveal(Problem problem) {
        EObject node = nodeOf(problem.object());
        if (node == null) {
            return;
        }
        viewer.setSelection(new StructuredSelection(node), true);
        Field field = problem.feature() == null ? null : form.field(problem.object(), problem.feature());
        if (field != null) {
            field.focus();
        } else {
            viewer.getControl().setFocus();
        }
    }

    private void goTo(Problem problem) {
        if (partService != null) {
            partService.activate(part);
        }
        reveal(problem);
    }

    /** Selects an element in the tree (and shows its settings). */
    public void select(EObject element) {
        viewer.setSelection(new StructuredSelection(element), true);
    }

    @Focus
    public void focus() {
        if (viewer != null) {
            viewer.getControl().setFocus();
            publishStep(); // the views follow the editor brought to the front
        }
    }

    @PreDestroy
    public void dispose() {
        if (document != null) {
            document.commandStack().removeCommandStackListener(stackListener);
            StepFocus shown = app == null ? null : app.getContext().get(StepFocus.class);
            if (shown != null && shown.document() == document) {
                app.getContext().remove(StepFocus.class);
            }
            if (broker != null) {
                broker.send(AuthoringTopics.CLOSED, document);
            }
            document.dispose();
        }
        if (icons != null) {
            icons.dispose();
        }
    }

    /** @return the application model part this editor fills */
    public MPart modelPart() {
        return part;
    }

    /** @return the open document, or null when the file could not be opened */
    public BatteryDocument document() {
        return document;
    }

    /** @return the tree viewer */
    public TreeViewer viewer() {
        return viewer;
    }

    /** @return the settings form */
    public SettingsForm form() {
        return form;
    }

    /** @return the problems as last validated */
    public List<Problem> problems() {
        return problems;
    }

    /** @return the banner text (file, problem count, or the save warning) */
    public String bannerText() {
        return banner.getText();
    }

    /** @return the last status message */
    public String lastStatus() {
        return lastStatus;
    }

    /** @return the icons this editor draws (for tests that compare tree images) */
    public Icons icons() {
        return icons;
    }

    /** @return the selection as a list */
    public List<?> selectedElements() {
        IStructuredSelection s = viewer.getStructuredSelection();
        return s.toList();
    }
}
