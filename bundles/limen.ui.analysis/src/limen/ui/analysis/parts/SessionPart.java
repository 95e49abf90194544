package limen.ui.analysis.parts;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;

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
import org.eclipse.swt.graphics.Font;
import org.eclipse.swt.graphics.FontData;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.DirectoryDialog;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.ProgressBar;
import org.eclipse.swt.widgets.Text;
import org.jfree.chart.JFreeChart;

import limen.fit.FitSettings;
import limen.session.SessionFolder;
import limen.session.journal.JournalContents;
import limen.session.refit.RefitTable;
import limen.session.refit.SavedFits;
import limen.session.refit.SessionRefit;
import limen.session.refit.TrackFit;
import limen.session.refit.TrialTable;
import limen.ui.StatusLine;
import limen.ui.analysis.AnalysisIds;
import limen.ui.analysis.RefitJob;
import limen.ui.analysis.export.Exports;
import limen.ui.analysis.export.SessionReport;
import limen.ui.charts.ChartCanvas;
import limen.ui.analysis.internal.Charts;

/**
 * One session: the fit settings, a table of its tracks with the fit's numbers, the selected track trial by
 * trial and its psychometric fit (with the bootstrap band and the threshold), the full numbers in text, and
 * the exports. The shown numbers are the fields of {@link RefitTable} for a {@link limen.session.refit.SessionRefitter}
 * refit with the form's settings, i.e. those {@code ./limen refit} writes for the same settings and seed.
 * Showing a session fits it in a background job and stores nothing; "Refit selection" refits every selected
 * session in a background job with progress and Cancel and keeps each fit beside its session.
 */
public final class SessionPart {

    /** Default bootstrap replicates of the form (the headless command's default is none). */
    public static final int DEFAULT_BOOTSTRAP = 200;
    private static final java.time.format.DateTimeFormatter STARTED = java.time.format.DateTimeFormatter
            .ofPattern("yyyy-MM-dd HH:mm:ss 'UTC'", Locale.ROOT).withZone(java.time.ZoneOffset.UTC);
    private static final String[] FUNCTIONS = {"logistic", "normal", "weibull", "gumbel"};
    private static final String[] TRACK_COLUMNS = {"step", "track", "outcome", "trials", "threshold", "threshold_lo",
        "threshold_hi", "slope", "lapse", "deviance", "gof_p", "reversal_mean"};

    @Inject
    @Optional
    IEventBroker broker;

    private Display display;
    private Label title;
    private Combo function;
    private Text guess;
    private Text lapseMax;
    private Text target;
    private Text bootstrap;
    private Text seed;
    private Combo ciMethod;
    private Button refitButton;
    private Button cancelButton;
    private ProgressBar progress;
    private Label progressLabel;
    private TableViewer tracks;
    private ChartCanvas trackChart;
    private ChartCanvas fitChart;
    private Text numbers;
    private Label savedLabel;
    private Combo savedFits;
    private List<Path> savedPaths = List.of();
    private Font bold;

    private List<Path> selection = List.of();
    private RefitJob shownJob;
    private RefitJob batchJob;
    private SessionRefit shown;
    private FitSettings shownSettings;
    private List<List<String>> shownRows = List.of();
    private int shownTrack;
    private List<SessionRefit> lastResults = List.of();
    private FitSettings lastSettings;
    private final List<String> progressSeen = Collections.synchronizedList(new ArrayList<>());
    private String problem = "";
    private boolean displayPending;

    @PostConstruct
    public void create(Composite parent, @Optional MApplication app) {
        display = parent.getDisplay();
        parent.setLayout(new GridLayout(1, false));
        title = new Label(parent, SWT.NONE);
        title.setText("Select a session in the Sessions view.");
        title.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        FontData fd = title.getFont().getFontData()[0];
        bold = new Font(display, fd.getName(), fd.getHeight() + 1, SWT.BOLD);
        title.setFont(bold);

        Composite form = new Composite(parent, SWT.NONE);
        form.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        // two rows of settings, so that the form fits the workbench's default window
        GridLayout fl = new GridLayout(8, false);
        fl.marginHeight = 0;
        form.setLayout(fl);
        function = combo(form, "Function", FUNCTIONS, "The sigmoid F of psi = guess + (1 - guess - lapse) F(x)");
        guess = text(form, "Guess", "task", 40, "'task': 1/n for n-alternative forced choice, free for yes/no; 'free'; or a number");
        lapseMax = text(form, "Lapse \u2264", "0.06", 40, "Upper bound of the estimated lapse rate; 0 fixes it at 0");
        target = text(form, "Target \u03c8", "", 40, "Proportion at which the threshold is read; empty for midway between guess and 1 - lapse");
        bootstrap = text(form, "Bootstrap", Integer.toString(DEFAULT_BOOTSTRAP), 40, "Parametric bootstrap replicates per track (0: none)");
        seed = text(form, "Seed", "1", 40, "Seed of every track's bootstrap");
        ciMethod = combo(form, "Interval", new String[] {"bca", "percentile"}, "Bootstrap interval method (95 %)");

        Composite actions = new Composite(parent, SWT.NONE);
        actions.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        GridLayout al = new GridLayout(5, false);
        al.marginHeight = 0;
        actions.setLayout(al);
        button(actions, "Fit again", "Fit the shown session with these settings (nothing is saved)", () -> refresh());
        refitButton = button(actions, "Refit selection", "Refit every selected session with these settings; each fit is saved in the session's fits folder, earlier fits are kept", () -> refitSelection());
        cancelButton = button(actions, "Cancel", "Stop the running refit", this::cancel);
        cancelButton.setEnabled(false);
        progress = new ProgressBar(actions, SWT.SMOOTH);
        progress.setMaximum(1000);
        GridData pd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        pd.widthHint = 200;
        progress.setLayoutData(pd);
        progressLabel = new Label(actions, SWT.NONE);
        progressLabel.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));

        SashForm sash = new SashForm(parent, SWT.VERTICAL);
        sash.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        tracks = new TableViewer(sash, SWT.BORDER | SWT.SINGLE | SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL);
        tracks.getTable().setHeaderVisible(true);
        tracks.getTable().setLinesVisible(true);
        for (String c : TRACK_COLUMNS) {
            TableViewerColumn col = new TableViewerColumn(tracks, SWT.NONE);
            col.getColumn().setText(c.replace('_', ' '));
            col.getColumn().setWidth(c.equals("outcome") ? 70 : c.equals("step") ? 80 : c.startsWith("threshold") || c.startsWith("reversal") ? 96 : 68);
            final int index = RefitTable.COLUMNS.indexOf(c);
            col.setLabelProvider(new ColumnLabelProvider() {
                @Override
                public String getText(Object element) {
                    @SuppressWarnings("unchecked")
                    List<String> row = (List<String>) element;
                    return SessionReportText.short4(row.get(index));
                }
            });
        }
        tracks.setContentProvider(ArrayContentProvider.getInstance());
        tracks.addSelectionChangedListener(e -> {
            int i = tracks.getTable().getSelectionIndex();
            if (i >= 0 && i != shownTrack) {
                selectTrack(i);
            }
        });
        Composite charts = new Composite(sash, SWT.NONE);
        charts.setLayout(new FillLayout(SWT.HORIZONTAL));
        trackChart = new ChartCanvas(charts);
        trackChart.setPlaceholder("The selected track, trial by trial");
        fitChart = new ChartCanvas(charts);
        fitChart.setPlaceholder("The psychometric fit of the selected track");
        Composite bottom = new Composite(sash, SWT.NONE);
        bottom.setLayout(new GridLayout(1, false));
        numbers = new Text(bottom, SWT.MULTI | SWT.READ_ONLY | SWT.BORDER | SWT.V_SCROLL | SWT.WRAP);
        numbers.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        Composite exports = new Composite(bottom, SWT.NONE);
        exports.setLayoutData(new GridData(SWT.FILL, SWT.BOTTOM, true, false));
        GridLayout el = new GridLayout(5, false);
        el.marginHeight = 0;
        exports.setLayout(el);
        button(exports, "Export trials CSV...", "Tidy table of every trial of the selected sessions", () -> {
            Path f = saveDialog("trials.csv", "*.csv");
            if (f != null) {
                report(() -> exportTrials(f), "Trials written to " + f);
            }
        });
        button(exports, "Export fits CSV...", "Tidy table of the fits shown or last refitted (the columns of ./limen refit)", () -> {
            Path f = saveDialog("fits.csv", "*.csv");
            if (f != null) {
                report(() -> exportFits(f), "Fits written to " + f);
            }
        });
        button(exports, "Export figures...", "The selected track's charts as SVG, PNG and PDF", () -> {
            DirectoryDialog d = new DirectoryDialog(numbers.getShell());
            d.setMessage("Folder for the figures (SVG, PNG and PDF of both charts)");
            String dir = d.open();
            if (dir != null) {
                report(() -> exportFigures(Path.of(dir)), "Figures written to " + dir);
            }
        });
        button(exports, "PDF report...", "One page: the session, every track's numbers, the selected track's charts", () -> {
            Path f = saveDialog("report.pdf", "*.pdf");
            if (f != null) {
                report(() -> exportReport(f), "Report written to " + f);
            }
        });
        savedLabel = new Label(exports, SWT.NONE);
        savedLabel.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        savedFits = new Combo(exports, SWT.READ_ONLY);
        savedFits.setToolTipText("Fits saved beside the shown session (file names carry the time, UTC)");
        GridData sf = new GridData(SWT.LEFT, SWT.CENTER, false, false);
        sf.widthHint = 270;
        savedFits.setLayoutData(sf);
        button(exports, "Show saved fit", "Fit the shown session again with the chosen saved fit's settings and seed (the same numbers)",
                () -> showSavedFit(savedFits.getSelectionIndex()));
        ((GridLayout) exports.getLayout()).numColumns = 7;
        sash.setWeights(21, 55, 24);
        if (app != null && app.getContext().get(AnalysisIds.SELECTION_KEY) instanceof List<?> earlier) {
            @SuppressWarnings("unchecked")
            List<Path> folders = (List<Path>) earlier;
            show(folders);
        }
    }

    private static Combo combo(Composite parent, String label, String[] items, String tip) {
        new Label(parent, SWT.NONE).setText(label);
        Combo c = new Combo(parent, SWT.READ_ONLY);
        c.setItems(items);
        c.select(0);
        c.setToolTipText(tip);
        return c;
    }

    private static Text text(Composite parent, String label, String value, int width, String tip) {
        new Label(parent, SWT.NONE).setText(label);
        Text t = new Text(parent, SWT.BORDER);
        t.setText(value);
        t.setToolTipText(tip);
        GridData d = new GridData(SWT.LEFT, SWT.CENTER, false, false);
        d.widthHint = width;
        t.setLayoutData(d);
        return t;
    }

    private static Button button(Composite parent, String text, String tip, Runnable action) {
        Button b = new Button(parent, SWT.PUSH);
        b.setText(text);
        b.setToolTipText(tip);
        b.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, false, false));
        b.addListener(SWT.Selection, e -> action.run());
        return b;
    }

    /** Sets the form (what a user types). */
    public void setSettings(String fn, String guessText, String lapseMaxText, String targetText, int replicates, long seedValue,
            String ci) {
        function.select(java.util.Arrays.asList(FUNCTIONS).indexOf(fn));
        guess.setText(guessText);
        lapseMax.setText(lapseMaxText);
        target.setText(targetText == null ? "" : targetText);
        bootstrap.setText(Integer.toString(replicates));
        seed.setText(Long.toString(seedValue));
        ciMethod.select(ci.equalsIgnoreCase("percentile") ? 1 : 0);
    }

    /**
     * @return the form's settings, parsed as {@code ./limen refit} parses its options (level 0.95, parametric)
     * @throws IllegalArgumentException naming the bad setting
     */
    public FitSettings settings() {
        String t = target.getText().trim();
        int b;
        long s;
        double l;
        try {
            b = Integer.parseInt(bootstrap.getText().trim());
            s = Long.parseLong(seed.getText().trim());
            l = Double.parseDouble(lapseMax.getText().trim());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("bootstrap, seed and lapse bound must be numbers: " + e.getMessage());
        }
        Double targetPsi;
        try {
            targetPsi = t.isEmpty() ? null : Double.valueOf(t);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("target must be a proportion or empty, was '" + t + "'");
        }
        return FitSettings.parse(function.getText(), guess.getText(), l, null, targetPsi, null, b, s, ciMethod.getText(), 0.95,
                false, null);
    }

    /** Shows the first of the selected sessions (fitted in the background) and remembers the selection for a refit. */
    @Inject
    @Optional
    public void show(@UIEventTopic(AnalysisIds.SELECTION_TOPIC) List<Path> folders) {
        if (folders == null || title == null || title.isDisposed()) {
            return;
        }
        selection = List.copyOf(folders);
        if (!folders.isEmpty() && (shown == null || !shown.folder().equals(folders.get(0)))) {
            fitShown(folders.get(0));
        }
        refitButton.setText(selection.size() > 1 ? "Refit " + selection.size() + " sessions" : "Refit selection");
        refitButton.getParent().layout();
    }

    /** Fits the shown session again with the form's settings. */
    public RefitJob refresh() {
        return selection.isEmpty() ? null : fitShown(selection.get(0));
    }

    private RefitJob fitShown(Path folder) {
        FitSettings s;
        try {
            s = settings();
        } catch (IllegalArgumentException e) {
            fail(e.getMessage());
            return null;
        }
        return fitShown(folder, s);
    }

    private RefitJob fitShown(Path folder, FitSettings s) {
        if (shownJob != null) {
            shownJob.cancel();
        }
        problem = "";
        title.setText("Fitting " + folder.getFileName() + "...");
        RefitJob job = new RefitJob(List.of(folder), s, false, true);
        job.setUser(false);
        shownJob = job;
        displayPending = true;
        job.addJobChangeListener(new JobChangeAdapter() {
            @Override
            public void done(IJobChangeEvent event) {
                display.asyncExec(() -> {
                    if (job == shownJob && !title.isDisposed()) {
                        displayPending = false;
                        if (!job.cancelled() && !job.results().isEmpty()) {
                            display(job, job.results().get(0));
                            lastResults = job.results();
                            lastSettings = job.settings();
                        }
                    }
                });
            }
        });
        job.schedule();
        return job;
    }

    /** Refits every selected session in a background job, saving each fit beside its session. */
    public RefitJob refitSelection() {
        if (selection.isEmpty() || running()) {
            return null;
        }
        FitSettings s;
        try {
            s = settings();
        } catch (IllegalArgumentException e) {
            fail(e.getMessage());
            return null;
        }
        problem = "";
        progressSeen.clear();
        RefitJob job = new RefitJob(selection, s, true, false);
        batchJob = job;
        refitButton.setEnabled(false);
        cancelButton.setEnabled(true);
        progress.setSelection(0);
        job.addJobChangeListener(new JobChangeAdapter() {
            @Override
            public void done(IJobChangeEvent event) {
                display.asyncExec(() -> batchDone(job));
            }
        });
        job.schedule();
        display.timerExec(100, new Runnable() {
            @Override
            public void run() {
                if (progress.isDisposed() || job != batchJob) {
                    return;
                }
                showProgress(job);
                if (batchJob != null) {
                    display.timerExec(100, this);
                }
            }
        });
        return job;
    }

    private void showProgress(RefitJob job) {
        progress.setSelection((int) Math.round(1000 * job.fraction()));
        String text = job.progressText();
        progressLabel.setText(text);
        if (progressSeen.isEmpty() || !progressSeen.get(progressSeen.size() - 1).equals(text)) {
            progressSeen.add(text);
        }
    }

    private void batchDone(RefitJob job) {
        if (progress.isDisposed()) {
            return;
        }
        showProgress(job);
        batchJob = null;
        refitButton.setEnabled(true);
        cancelButton.setEnabled(false);
        lastResults = job.results();
        lastSettings = job.settings();
        String summary = (job.cancelled() ? "Cancelled after " : "Refitted ") + job.results().size() + " of "
                + job.folders().size() + " sessions; " + job.saved().size() + " fits saved"
                + (job.problems().isEmpty() ? "" : "; " + String.join("; ", job.problems()));
        progressLabel.setText(summary);
        status(summary);
        for (SessionRefit r : job.results()) {
            if (shown != null && r.folder().equals(shown.folder())) {
                // the saved fit's numbers; the band stays that of the last display fit
                shown = r;
                shownSettings = job.settings();
                shownRows = new RefitTable(shownSettings).rows(r);
                tracks.setInput(shownRows);
                selectTrack(Math.min(shownTrack, Math.max(0, r.tracks().size() - 1)));
            }
        }
        showSaved();
        if (broker != null) {
            broker.post(AnalysisIds.FITS_SAVED_TOPIC, job.folders());
        }
    }

    /** Cancels the running refit, if any. */
    public void cancel() {
        RefitJob j = batchJob;
        if (j != null) {
            j.cancel();
        }
    }

    /** @return whether a batch refit is running */
    public boolean running() {
        return batchJob != null;
    }

    /** @return whether the shown session's fit is being computed (or its result not yet shown) */
    public boolean fitting() {
        return displayPending;
    }

    /** @return the progress texts the view showed during the last batch refit */
    public List<String> progressSeen() {
        synchronized (progressSeen) {
            return List.copyOf(progressSeen);
        }
    }

    private RefitJob bandSource;

    private void display(RefitJob job, SessionRefit r) {
        shown = r;
        bandSource = job;
        shownSettings = job.settings();
        shownRows = new RefitTable(shownSettings).rows(r);
        title.setText(r.participant() + " \u2014 " + r.battery() + " \u2014 " + (r.started() == null ? "" : STARTED.format(r.started()))
                + " \u2014 journal " + r.integrity() + (r.skipped() ? " (skipped: " + r.problem() + ")" : ""));
        tracks.setInput(shownRows);
        shownTrack = -1;
        selectTrack(0);
        showSaved();
    }

    private void showSaved() {
        if (shown == null) {
            return;
        }
        try {
            List<Path> saved = SavedFits.list(shown.folder());
            savedPaths = saved;
            savedLabel.setText(saved.isEmpty() ? "No saved fits yet." : saved.size() + " saved fit" + (saved.size() == 1 ? ":" : "s:"));
            savedFits.setItems(saved.stream().map(p -> p.getFileName().toString()).toArray(String[]::new));
            savedFits.select(saved.size() - 1);
        } catch (IOException e) {
            savedLabel.setText("Saved fits unreadable: " + e.getMessage());
        }
        savedLabel.getParent().layout();
    }

    /**
     * Shows the shown session fitted with the settings of one of its saved fits (0-based, oldest first): the
     * fit is deterministic for its settings and seed, so the numbers are those saved; the form takes the
     * settings.
     */
    public RefitJob showSavedFit(int index) {
        if (shown == null || index < 0 || index >= savedPaths.size()) {
            return null;
        }
        FitSettings s;
        try {
            s = SavedFits.read(savedPaths.get(index)).settings();
        } catch (IOException e) {
            fail(e.getMessage());
            return null;
        }
        setSettings(s.sigmoid().name(), s.guessText(), Double.toString(s.lapseMax()),
                Double.isNaN(s.targetPsi()) ? "" : Double.toString(s.targetPsi()), s.bootstrapSamples(), s.seed(),
                s.intervalMethod().name().toLowerCase(Locale.ROOT));
        return fitShown(shown.folder(), s);
    }

    /** @return the saved fits of the shown session, oldest first */
    public List<Path> savedFits() {
        return savedPaths;
    }

    /** Shows one track of the shown session (0-based, in the table's order). */
    public void selectTrack(int index) {
        if (shown == null || shown.tracks().isEmpty()) {
            shownTrack = -1;
            trackChart.setChart(null);
            fitChart.setChart(null);
            numbers.setText(shown == null ? "" : shown.problem());
            return;
        }
        shownTrack = index;
        tracks.getTable().setSelection(index);
        TrackFit t = shown.tracks().get(index);
        trackChart.setChart(Charts.track(t));
        fitChart.setChart(Charts.fit(t, bandSource == null ? null : bandSource.band(t), shownSettings.intervalMethod()));
        numbers.setText(SessionReportText.numbers(shownRows.get(index), shownSettings));
    }

    /** @return the shown session's refit, or null */
    public SessionRefit shown() {
        return shown;
    }

    /** @return the settings of the shown numbers */
    public FitSettings shownSettings() {
        return shownSettings;
    }

    /** @return the shown track's row (fields in {@link RefitTable#COLUMNS} order), or null */
    public List<String> shownRow() {
        return shownTrack < 0 ? null : shownRows.get(shownTrack);
    }

    /** @return the text of the numbers panel */
    public String numbersText() {
        return numbers.getText();
    }

    public List<ChartCanvas> charts() {
        return List.of(trackChart, fitChart);
    }

    /** @return the last problem reported by the view ("" when none) */
    public String problem() {
        return problem;
    }

    /** Writes the tidy trial table of the selected sessions (verified journal rows only). */
    public void exportTrials(Path file) throws IOException {
        List<List<String>> rows = new ArrayList<>();
        for (Path folder : selection) {
            SessionFolder f = SessionFolder.open(folder);
            JournalContents j = f.readJournal();
            rows.addAll(TrialTable.rows(folder.toString(), f.header(), j.integrity().name(), j.rows()));
        }
        Exports.csv(file, TrialTable.COLUMNS, rows);
    }

    /** Writes the fits shown or last refitted, in the columns of {@code ./limen refit}. */
    public void exportFits(Path file) throws IOException {
        if (lastResults.isEmpty()) {
            throw new IOException("nothing fitted yet: select a session or refit a selection");
        }
        RefitTable table = new RefitTable(lastSettings);
        List<List<String>> rows = new ArrayList<>();
        for (SessionRefit r : lastResults) {
            rows.addAll(table.rows(r));
        }
        Exports.csv(file, RefitTable.COLUMNS, rows);
    }

    /** Writes both charts of the shown track as SVG, PNG and PDF into a folder; returns the files. */
    public List<Path> exportFigures(Path dir) throws IOException {
        JFreeChart a = trackChart.chart();
        JFreeChart b = fitChart.chart();
        if (a == null || b == null || shownRow() == null) {
            throw new IOException("no track shown");
        }
        List<String> row = shownRow();
        String stem = (shown.participant() + "-" + row.get(RefitTable.COLUMNS.indexOf("step")) + "-"
                + row.get(RefitTable.COLUMNS.indexOf("track"))).replaceAll("[^A-Za-z0-9._-]+", "_");
        List<Path> out = new ArrayList<>();
        for (String kind : new String[] {"track", "fit"}) {
            JFreeChart c = kind.equals("track") ? a : b;
            Path svg = dir.resolve(stem + "-" + kind + ".svg");
            Exports.svg(svg, c, 800, 500);
            Path png = dir.resolve(stem + "-" + kind + ".png");
            Exports.png(png, c, 800, 500);
            Path pdf = dir.resolve(stem + "-" + kind + ".pdf");
            Exports.pdf(pdf, c, 576, 360);
            out.addAll(List.of(svg, png, pdf));
        }
        return out;
    }

    /** Draws the shown session's report page into a Java2D surface (see {@link SessionReport#draw}). */
    public void drawReport(java.awt.Graphics2D g) {
        SessionReport.draw(g, shown, shownSettings, trackChart.chart(), fitChart.chart());
    }

    /** Writes the one-page PDF report of the shown session. */
    public void exportReport(Path file) throws IOException {
        if (shown == null) {
            throw new IOException("no session shown");
        }
        SessionReport.write(file, shown, shownSettings, trackChart.chart(), fitChart.chart());
    }

    private interface IoAction {
        void run() throws IOException;
    }

    private void report(IoAction action, String done) {
        try {
            action.run();
            status(done);
        } catch (IOException | RuntimeException e) {
            fail(e.getMessage());
        }
    }

    private Path saveDialog(String name, String extension) {
        FileDialog d = new FileDialog(numbers.getShell(), SWT.SAVE);
        d.setFileName(name);
        d.setFilterExtensions(new String[] {extension});
        d.setOverwrite(true);
        String f = d.open();
        return f == null ? null : Path.of(f);
    }

    private void fail(String message) {
        problem = message;
        progressLabel.setText(message);
        status(message);
    }

    private void status(String message) {
        if (broker != null) {
            broker.post(StatusLine.TOPIC, message);
        }
    }

    Control control() {
        return title.getParent();
    }

    @Focus
    public void focus() {
        tracks.getTable().setFocus();
    }

    @PreDestroy
    public void dispose() {
        cancel();
        if (shownJob != null) {
            shownJob.cancel();
        }
        if (bold != null) {
            bold.dispose();
        }
    }

    /** Text of the numbers panel and short numbers of the table. */
    static final class SessionReportText {

        private SessionReportText() {
        }

        static String short4(String number) {
            if (number.matches("-?\\d{1,6}")) {
                return number;
            }
            try {
                double v = Double.parseDouble(number);
                return Double.isFinite(v) ? String.format(Locale.ROOT, "%.4g", v) : number;
            } catch (NumberFormatException e) {
                return number;
            }
        }

        static String numbers(List<String> row, FitSettings s) {
            java.util.function.Function<String, String> f = c -> row.get(RefitTable.COLUMNS.indexOf(c));
            StringBuilder b = new StringBuilder();
            b.append("Step ").append(f.apply("step")).append(", track ").append(f.apply("track")).append(": ")
                    .append(f.apply("outcome")).append(" (").append(f.apply("function")).append(")\n");
            if (f.apply("outcome").equals("fitted")) {
                b.append("\u03c8(x) = \u03b3 + (1 \u2212 \u03b3 \u2212 \u03bb) F(x; m, s)\n");
                b.append("  guess \u03b3 = ").append(f.apply("guess")).append(", lapse \u03bb = ").append(f.apply("lapse"))
                        .append(", location m = ").append(f.apply("location")).append(", spread s = ").append(f.apply("spread"))
                        .append('\n');
                String ci = s.bootstrapSamples() > 0
                        ? "  [" + f.apply("threshold_lo") + ", " + f.apply("threshold_hi") + "] (" + Math.round(s.level() * 100)
                                + " % " + f.apply("ci_method") + ", " + f.apply("bootstrap") + " replicates, "
                                + f.apply("excluded") + " excluded)"
                        : "  (no bootstrap)";
                b.append("threshold at \u03c8 = ").append(f.apply("target")).append(": ").append(f.apply("threshold"))
                        .append(' ').append(f.apply("unit")).append(ci).append('\n');
                b.append("slope at threshold: ").append(f.apply("slope"));
                if (s.bootstrapSamples() > 0) {
                    b.append("  [").append(f.apply("slope_lo")).append(", ").append(f.apply("slope_hi")).append(']');
                }
                b.append('\n');
                b.append("log-likelihood ").append(f.apply("loglik")).append(", deviance ").append(f.apply("deviance"))
                        .append(" over ").append(f.apply("cells")).append(" cells, goodness of fit p = ").append(f.apply("gof_p"))
                        .append('\n');
            }
            b.append("trials ").append(f.apply("trials")).append(" (catch ").append(f.apply("catch_trials"))
                    .append("); reversals ").append(f.apply("reversal_count")).append(", mean ").append(f.apply("reversal_mean"))
                    .append(" (SD ").append(f.apply("reversal_sd")).append(", ").append(f.apply("reversal_scale")).append(")\n");
            b.append("settings: ").append(f.apply("settings")).append('\n');
            if (!f.apply("message").isEmpty()) {
                b.append("note: ").append(f.apply("message")).append('\n');
            }
            return b.toString();
        }
    }
}
