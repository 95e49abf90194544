package limen.ui.analysis.parts;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.TreeSet;

import jakarta.annotation.PostConstruct;
import jakarta.annotation.PreDestroy;
import jakarta.inject.Inject;

import org.eclipse.core.runtime.jobs.IJobChangeEvent;
import org.eclipse.core.runtime.jobs.JobChangeAdapter;
import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.core.services.events.IEventBroker;
import org.eclipse.e4.ui.di.Focus;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.di.UIEventTopic;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;

import limen.fit.FitSettings;
import limen.model.SessionHeader;
import limen.session.SessionFolder;
import limen.session.refit.ConditionSummary;
import limen.session.refit.RefitTable;
import limen.session.refit.SessionRefit;
import limen.ui.StatusLine;
import limen.ui.analysis.AnalysisIds;
import limen.ui.analysis.RefitJob;
import limen.ui.analysis.export.Exports;
import limen.ui.charts.ChartCanvas;
import limen.ui.analysis.internal.Charts;

/**
 * Thresholds across the selected sessions by condition: every fitted track of every selected session as a
 * point at its step's standard frequency, the relative difference limen Δf/f for frequency discrimination
 * (the threshold in its unit otherwise), one colour per participant, log axes, bootstrap intervals as bars.
 * The participants shown are those of the selected sessions (select them in the Sessions view, e.g. after
 * filtering by pseudonym). Fitted in a background job with the settings typed here, nothing is saved.
 */
public final class SummaryPart {

    @Inject
    @Optional
    IEventBroker broker;

    private Display display;
    private Text bootstrap;
    private Text seed;
    private Label info;
    private ChartCanvas chart;
    private TableViewer table;
    private List<Path> selection = List.of();
    private List<ConditionSummary.Point> points = List.of();
    private RefitJob job;

    @PostConstruct
    public void create(Composite parent, @Optional MApplication app) {
        display = parent.getDisplay();
        parent.setLayout(new GridLayout(1, false));
        Composite row = new Composite(parent, SWT.NONE);
        row.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        row.setLayout(new GridLayout(7, false));
        new Label(row, SWT.NONE).setText("Bootstrap");
        bootstrap = new Text(row, SWT.BORDER);
        bootstrap.setText("200");
        bootstrap.setLayoutData(new GridData(40, SWT.DEFAULT));
        new Label(row, SWT.NONE).setText("Seed");
        seed = new Text(row, SWT.BORDER);
        seed.setText("1");
        seed.setLayoutData(new GridData(40, SWT.DEFAULT));
        Button go = new Button(row, SWT.PUSH);
        go.setText("Summarise selection");
        go.setToolTipText("Fit every track of the selected sessions (logistic, guess by task, lapse \u2264 0.06) and plot the thresholds by condition");
        go.addListener(SWT.Selection, e -> summarise());
        Button export = new Button(row, SWT.PUSH);
        export.setText("Export...");
        export.setToolTipText("The summary as CSV and the figure as SVG, PNG and PDF, into a folder");
        export.addListener(SWT.Selection, e -> {
            org.eclipse.swt.widgets.DirectoryDialog d = new org.eclipse.swt.widgets.DirectoryDialog(parent.getShell());
            String dir = d.open();
            if (dir != null) {
                try {
                    export(Path.of(dir));
                    status("Summary written to " + dir);
                } catch (IOException | RuntimeException ex) {
                    status(ex.getMessage());
                }
            }
        });
        info = new Label(row, SWT.NONE);
        info.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        SashForm sash = new SashForm(parent, SWT.VERTICAL);
        sash.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        chart = new ChartCanvas(sash);
        chart.setPlaceholder("Select sessions in the Sessions view, then Summarise selection.");
        table = new TableViewer(sash, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL);
        table.getTable().setHeaderVisible(true);
        table.getTable().setLinesVisible(true);
        String[] heads = {"participant", "step", "track", "f0 (Hz)", "threshold", "unit", "low", "high", "\u0394f/f"};
        for (int c = 0; c < heads.length; c++) {
            final int column = c;
            TableViewerColumn col = new TableViewerColumn(table, SWT.NONE);
            col.getColumn().setText(heads[c]);
            col.getColumn().setWidth(c < 3 ? 90 : 80);
            col.setLabelProvider(new ColumnLabelProvider() {
                @Override
                public String getText(Object element) {
                    return cell((ConditionSummary.Point) element, column);
                }
            });
        }
        table.setContentProvider(ArrayContentProvider.getInstance());
        table.setInput(points);
        sash.setWeights(68, 32);
        if (app != null && app.getContext().get(AnalysisIds.SELECTION_KEY) instanceof List<?> earlier) {
            @SuppressWarnings("unchecked")
            List<Path> folders = (List<Path>) earlier;
            select(folders);
        }
    }

    private static String cell(ConditionSummary.Point p, int column) {
        switch (column) {
        case 0:
            return p.participant();
        case 1:
            return p.stepId();
        case 2:
            return p.track();
        case 3:
            return num(p.standardFrequencyHz());
        case 4:
            return num(p.threshold());
        case 5:
            return p.unit();
        case 6:
            return num(p.thresholdLow());
        case 7:
            return num(p.thresholdHigh());
        default:
            return num(p.relative());
        }
    }

    private static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.4g", v) : "NA";
    }

    /** Remembers the browser's selection. */
    @Inject
    @Optional
    public void select(@UIEventTopic(AnalysisIds.SELECTION_TOPIC) List<Path> folders) {
        if (folders != null) {
            selection = List.copyOf(folders);
            if (info != null && !info.isDisposed()) {
                info.setText(selection.size() + " sessions selected");
            }
        }
    }

    /** @return the settings of the summary's fits (those of ./limen refit with this bootstrap and seed) */
    public FitSettings settings() {
        return FitSettings.parse("logistic", FitSettings.GUESS_BY_TASK, 0.06, null, null, null,
                Integer.parseInt(bootstrap.getText().trim()), Long.parseLong(seed.getText().trim()), "bca", 0.95, false, null);
    }

    public void setBootstrap(int replicates, long seedValue) {
        bootstrap.setText(Integer.toString(replicates));
        seed.setText(Long.toString(seedValue));
    }

    /** Fits the selected sessions in the background and plots them when done. */
    public RefitJob summarise() {
        if (selection.isEmpty() || running()) {
            return null;
        }
        FitSettings s;
        try {
            s = settings();
        } catch (IllegalArgumentException e) {
            info.setText(e.getMessage());
            return null;
        }
        RefitJob j = new RefitJob(selection, s, false, false);
        job = j;
        info.setText("Fitting " + selection.size() + " sessions...");
        j.addJobChangeListener(new JobChangeAdapter() {
            @Override
            public void done(IJobChangeEvent event) {
                display.asyncExec(() -> finished(j));
            }
        });
        j.schedule();
        return j;
    }

    private void finished(RefitJob j) {
        if (info.isDisposed()) {
            return;
        }
        job = null;
        List<ConditionSummary.Point> all = new ArrayList<>();
        for (SessionRefit r : j.results()) {
            try {
                SessionHeader h = SessionFolder.open(r.folder()).header();
                all.addAll(ConditionSummary.points(r, h, j.settings().intervalMethod()));
            } catch (IOException e) {
                // an unreadable header was already reported as a skipped refit
            }
        }
        points = List.copyOf(all);
        table.setInput(points);
        chart.setChart(points.isEmpty() ? null : Charts.summary(points));
        TreeSet<String> people = new TreeSet<>();
        points.forEach(p -> people.add(p.participant()));
        info.setText(points.size() + " fitted tracks of " + j.results().size() + " sessions, participants " + String.join(", ", people)
                + (j.problems().isEmpty() ? "" : "; " + j.problems().size() + " skipped"));
        info.getParent().layout();
    }

    /** @return whether the summary is being fitted */
    public boolean running() {
        return job != null;
    }

    /** @return the points shown */
    public List<ConditionSummary.Point> points() {
        return points;
    }

    public ChartCanvas chart() {
        return chart;
    }

    /** Writes summary.csv and the figure as summary.svg, summary.png and summary.pdf into a folder. */
    public List<Path> export(Path dir) throws IOException {
        if (chart.chart() == null) {
            throw new IOException("nothing summarised yet");
        }
        List<String> header = List.of("participant", "session", "step", "track", "kind", "standard_frequency_hz", "unit",
                "threshold", "threshold_lo", "threshold_hi", "relative_dl", "relative_dl_lo", "relative_dl_hi");
        List<List<String>> rows = new ArrayList<>();
        for (ConditionSummary.Point p : points) {
            rows.add(List.of(p.participant(), p.session(), p.stepId(), p.track(), p.kind(), RefitTable.num(p.standardFrequencyHz()),
                    p.unit(), RefitTable.num(p.threshold()), RefitTable.num(p.thresholdLow()), RefitTable.num(p.thresholdHigh()),
                    RefitTable.num(p.relative()), RefitTable.num(p.relativeLow()), RefitTable.num(p.relativeHigh())));
        }
        Path csv = dir.resolve("summary.csv");
        Exports.csv(csv, header, rows);
        Path svg = dir.resolve("summary.svg");
        Exports.svg(svg, chart.chart(), 800, 560);
        Path png = dir.resolve("summary.png");
        Exports.png(png, chart.chart(), 800, 560);
        Path pdf = dir.resolve("summary.pdf");
        Exports.pdf(pdf, chart.chart(), 576, 400);
        return List.of(csv, svg, png, pdf);
    }

    private void status(String message) {
        if (broker != null) {
            broker.post(StatusLine.TOPIC, message);
        }
    }

    @Focus
    public void focus() {
        chart.control().setFocus();
    }

    @PreDestroy
    public void dispose() {
        RefitJob j = job;
        if (j != null) {
            j.cancel();
        }
    }
}
