package limen.ui.authoring.parts;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

import jakarta.annotation.PostConstruct;
import jakarta.annotation.PreDestroy;
import jakarta.inject.Inject;

import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.core.services.events.IEventBroker;
import org.eclipse.e4.ui.di.Focus;
import org.eclipse.e4.ui.di.UIEventTopic;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;

import limen.model.validation.Problem;
import limen.model.validation.Severity;
import limen.ui.authoring.AuthoringTopics;
import limen.ui.authoring.ProblemReport;
import limen.ui.authoring.edit.BatteryDocument;
import limen.ui.authoring.edit.ElementLabels;
import limen.ui.authoring.edit.FieldSpec;
import limen.ui.authoring.internal.Icons;

/**
 * The battery check: every problem of the open batteries with its severity, code, element, setting and
 * message, kept up to date as the author edits. Double-click (or Enter) goes to the problem's element and
 * field in its editor.
 */
public final class ProblemsPart {

    /** One row: a problem of one open battery. */
    public record Row(ProblemReport report, Problem problem) {
    }

    @Inject
    @Optional
    IEventBroker broker;

    private final Map<BatteryDocument, ProblemReport> reports = new LinkedHashMap<>();
    private TableViewer viewer;
    private Label summary;
    private Icons icons;

    @PostConstruct
    public void create(Composite parent) {
        parent.setLayout(new GridLayout(1, false));
        icons = new Icons(parent.getDisplay());
        summary = new Label(parent, SWT.NONE);
        summary.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        viewer = new TableViewer(parent, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL);
        viewer.getTable().setHeaderVisible(true);
        viewer.getTable().setLinesVisible(true);
        viewer.getTable().setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        column("Severity", 90, r -> r.problem().severity().label(),
                r -> r.problem().severity() == Severity.ERROR ? icons.error() : icons.warning());
        column("Code", 70, r -> r.problem().code().code(), null);
        column("Where", 170, r -> ElementLabels.path(r.problem().object()), null);
        column("Setting", 140, r -> r.problem().feature() == null ? "" : FieldSpec.label(r.problem().feature()), null);
        column("Message", 520, r -> r.problem().message(), null);
        column("File", 170, r -> r.report().document().name()
                + (r.problem().line() > 0 ? ":" + r.problem().line() : ""), null);
        viewer.setContentProvider(ArrayContentProvider.getInstance());
        viewer.addDoubleClickListener(e -> {
            if (viewer.getStructuredSelection().getFirstElement() instanceof Row row) {
                goTo(row);
            }
        });
        viewer.getTable().addListener(SWT.DefaultSelection, e -> {
            if (viewer.getStructuredSelection().getFirstElement() instanceof Row row) {
                goTo(row);
            }
        });
        refresh();
        if (broker != null) {
            broker.send(AuthoringTopics.REPUBLISH, "battery check opened");
        }
    }

    private void column(String title, int width, Function<Row, String> text, Function<Row, Image> image) {
        TableViewerColumn c = new TableViewerColumn(viewer, SWT.NONE);
        c.getColumn().setText(title);
        c.getColumn().setWidth(width);
        c.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return text.apply((Row) element);
            }

            @Override
            public Image getImage(Object element) {
                return image == null ? null : image.apply((Row) element);
            }
        });
    }

    /** Shows a battery's problems (replacing what was shown for it). */
    @Inject
    @Optional
    public void show(@UIEventTopic(AuthoringTopics.PROBLEMS) ProblemReport report) {
        reports.put(report.document(), report);
        refresh();
    }

    /** Forgets a closed battery. */
    @Inject
    @Optional
    public void closed(@UIEventTopic(AuthoringTopics.CLOSED) BatteryDocument document) {
        if (reports.remove(document) != null) {
            refresh();
        }
    }

    private void refresh() {
        if (viewer == null || viewer.getTable().isDisposed()) {
            return;
        }
        viewer.setInput(rows());
        long errors = rows().stream().filter(r -> r.problem().isError()).count();
        long warnings = rows().size() - errors;
        summary.setText(reports.isEmpty() ? "No battery open: open one from Lab files."
                : errors + " error(s), " + warnings + " warning(s) in " + reports.size() + " open batter"
                        + (reports.size() == 1 ? "y" : "ies") + ". Double-click a row to go there.");
        summary.getParent().layout(true);
    }

    /** @return the rows shown, battery by battery */
    public List<Row> rows() {
        List<Row> out = new ArrayList<>();
        for (ProblemReport r : reports.values()) {
            for (Problem p : r.problems()) {
                out.add(new Row(r, p));
            }
        }
        return out;
    }

    /** Goes to a row's problem in its editor (what a double-click does). */
    public void goTo(Row row) {
        row.report().goTo().accept(row.problem());
    }

    /** @return the summary line */
    public String summaryText() {
        return summary.getText();
    }

    /** @return the table viewer */
    public TableViewer viewer() {
        return viewer;
    }

    @Focus
    public void focus() {
        viewer.getTable().setFocus();
    }

    @PreDestroy
    public void dispose() {
        if (icons != null) {
            icons.dispose();
        }
    }
}
