package limen.ui.authoring.parts;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Function;

import jakarta.annotation.PostConstruct;
import jakarta.annotation.PreDestroy;
import jakarta.inject.Inject;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.core.services.events.IEventBroker;
import org.eclipse.e4.ui.di.Focus;
import org.eclipse.e4.ui.di.UIEventTopic;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.ProgressBar;
import org.eclipse.swt.widgets.Text;

import limen.model.Scale;
import limen.model.Step;
import limen.model.Track;
import limen.procedure.sim.RunRow;
import limen.procedure.sim.Simulation;
import limen.procedure.sim.SimulationResult;
import limen.procedure.sim.TrackSummary;
import limen.ui.StatusLine;
import limen.ui.authoring.AuthoringTopics;
import limen.ui.authoring.StepFocus;
import limen.ui.authoring.edit.BatteryDocument;
import limen.ui.authoring.edit.Units;
import limen.ui.authoring.internal.Charts;
import limen.ui.charts.ChartCanvas;
import limen.ui.authoring.preview.DesignRun;

/**
 * Design simulation: the core Monte Carlo simulation of the step being edited against a model listener the
 * author sets, as a background job with a progress bar and Cancel. Shows per track the bias, spread and
 * efficiency ({@link TrackSummary}), the distributions of the estimates and of the trial counts, and one
 * example track trial by trial. Built as {@code ./limen simulate} builds a step ({@link DesignRun}), so the
 * numbers equal the headless command's for the same seed.
 */
public final class DesignSimulationPart {

    @Inject
    @Optional
    IEventBroker broker;

    private StepFocus focus;
    private Label title;
    private Text listener;
    private String listenerDefaults;
    private Text runs;
    private Text seed;
    private Text cap;
    private Text falseAlarms;
    private Button run;
    private Button cancel;
    private ProgressBar progress;
    private Label progressText;
    private TableViewer table;
    private Combo exampleTrack;
    private ChartCanvas estimates;
    private ChartCanvas trials;
    private ChartCanvas example;
    private Job job;
    private AtomicBoolean cancelRequested;
    private final AtomicInteger progressMax = new AtomicInteger();
    private volatile int progressDone;
    private SimulationResult result;
    private DesignRun lastRun;
    private Step lastStep;
    private String problem;
    private final List<String> progressSeen = new ArrayList<>();

    @PostConstruct
    public void create(Composite parent, @Optional MApplication app) {
        parent.setLayout(new GridLayout(1, false));
        title = new Label(parent, SWT.WRAP);
        title.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        Composite row1 = new Composite(parent, SWT.NONE);
        row1.setLayout(new GridLayout(12, false));
        row1.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        new Label(row1, SWT.NONE).setText("Listener");
        listener = new Text(row1, SWT.BORDER);
        GridData listenerData = new GridData(SWT.FILL, SWT.CENTER, true, false);
        listenerData.minimumWidth = 180;
        listener.setLayoutData(listenerData);
        listener.setMessage("e.g. logistic:mid=0.3,scale=0.08 (empty: each track's default)");
        listenerDefaults = "";
        runs = field(row1, "Runs", "200", 45);
        seed = field(row1, "Seed", "1", 45);
        cap = field(row1, "Trial cap", "2000", 45);
        falseAlarms = field(row1, "False alarms", "0", 35);
        falseAlarms.setToolTipText("The listener's yes rate on catch trials (yes/no tasks), in [0, 1)");
        run = new Button(row1, SWT.PUSH);
        run.setText("Run");
        run.addListener(SWT.Selection, e -> start());
        cancel = new Button(row1, SWT.PUSH);
        cancel.setText("Cancel");
        cancel.setEnabled(false);
        cancel.addListener(SWT.Selection, e -> cancel());
        Composite row2 = new Composite(parent, SWT.NONE);
        row2.setLayout(new GridLayout(4, false));
        row2.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        progress = new ProgressBar(row2, SWT.SMOOTH);
        progress.setLayoutData(new GridData(160, SWT.DEFAULT));
        progressText = new Label(row2, SWT.NONE);
        progressText.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        new Label(row2, SWT.NONE).setText("Example track");
        exampleTrack = new Combo(row2, SWT.READ_ONLY);
        exampleTrack.addListener(SWT.Selection, e -> showExample());

        SashForm results = new SashForm(parent, SWT.VERTICAL);
        results.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        table = new TableViewer(results, SWT.BORDER | SWT.FULL_SELECTION);
        table.getTable().setHeaderVisible(true);
        table.getTable().setLinesVisible(true);
        column("Track", 60, TrackSummary::track);
        column("Target", 120, s -> String.valueOf(s.target()));
        column("True value", 80, s -> num(s.trueValue()));
        column("Mean estimate", 95, s -> num(s.meanEstimate()));
        column("Bias", 75, s -> num(s.bias()));
        column("SD", 75, s -> num(s.sd()));
        column("Mean trials", 80, s -> num(s.meanTrials()));
        column("Efficiency", 75, s -> num(s.efficiency()));
        column("Runs", 50, s -> Integer.toString(s.runs()));
        column("Capped", 55, s -> Integer.toString(s.capped()));
        table.setContentProvider(ArrayContentProvider.getInstance());

        SashForm charts = new SashForm(results, SWT.HORIZONTAL);
        estimates = new ChartCanvas(charts);
        trials = new ChartCanvas(charts);
        example = new ChartCanvas(charts);
        estimates.setPlaceholder("Run a simulation to see the distribution of estimates.");
        charts.setWeights(33, 30, 37);
        results.setWeights(28, 72);
        show(app == null ? null : app.getContext().get(StepFocus.class)); // the step chosen before this view opened
    }

    private static Text field(Composite row, String label, String value, int width) {
        new Label(row, SWT.NONE).setText(label);
        Text t = new Text(row, SWT.BORDER);
        t.setText(value);
        t.setLayoutData(new GridData(width, SWT.DEFAULT));
        return t;
    }

    private void column(String name, int width, Function<TrackSummary, String> text) {
        TableViewerColumn c = new TableViewerColumn(table, SWT.NONE);
        c.getColumn().setText(name);
        c.getColumn().setWidth(width);
        c.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return text.apply((TrackSummary) element);
            }
        });
    }

    private static String num(double v) {
        return Double.isNaN(v) ? "-" : String.format(Locale.ROOT, "%.4g", v);
    }

    /** Simulates the step the author works on. */
    @Inject
    @Optional
    public void show(@UIEventTopic(AuthoringTopics.STEP) StepFocus newFocus) {
        if (title == null || title.isDisposed()) {
            return;
        }
        if (newFocus != null && focus != null && newFocus.step() == focus.step()) {
            focus = newFocus;
            return;
        }
        focus = newFocus;
        Step step = focus == null ? null : focus.step();
        if (job == null && result != null && step != lastStep) {
            clearResults(); // results of another step would read as this one's
        }
        title.setText(step == null ? "No step selected: select a step or track in a battery editor."
                : "Step " + step.getId() + " (" + step.getTitle() + ") of " + focus.document().name()
                        + ": values in " + Units.quantity(step));
        listenerDefaults = step == null ? "" : defaultsText(step);
        listener.setMessage(step == null ? "e.g. logistic:mid=0.3,scale=0.08"
                : "empty: each track's default (" + listenerDefaults + ")");
        listener.setToolTipText("Model listener for every track: logistic:mid=M,scale=S | normal:mid=M,sd=S | "
                + "weibull:alpha=A,beta=B | gumbel:mid=M,scale=S, optionally ,lapse=L; values in the step's "
                + "quantity unit; the guess rate comes from the task. Empty: " + listenerDefaults);
        run.setEnabled(step != null && job == null);
        title.getParent().layout(true, true);
    }

    private void clearResults() {
        result = null;
        table.setInput(List.of());
        estimates.setChart(null);
        trials.setChart(null);
        example.setChart(null);
        exampleTrack.setItems();
        progress.setSelection(0);
        progressText.setText("");
    }

    private String defaultsText(Step step) {
        List<String> parts = new ArrayList<>();
        try {
            DesignRun d = DesignRun.defaults("");
            for (Track t : step.getTracks()) {
                parts.add(t.getName() + ": " + d.listenerFor(step, t));
            }
        } catch (IllegalArgumentException e) {
            return "cannot simulate: " + e.getMessage();
        }
        return String.join("; ", parts);
    }

    /** Forgets a closed battery. */
    @Inject
    @Optional
    public void closed(@UIEventTopic(AuthoringTopics.CLOSED) BatteryDocument document) {
        if (focus != null && focus.document() == document) {
            show(null);
        }
    }

    /** @return the settings in the controls */
    public DesignRun settings() {
        try {
            return new DesignRun(listener.getText(), Double.parseDouble(falseAlarms.getText().trim()), 0,
                    Integer.parseInt(runs.getText().trim()), Long.parseLong(seed.getText().trim()),
                    Runtime.getRuntime().availableProcessors(), Integer.parseInt(cap.getText().trim()));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("runs, seed and trial cap must be whole numbers, the false-alarm rate "
                    + "a number: " + e.getMessage(), e);
        }
    }

    /** Sets the controls as the author would. */
    public void set(String listenerSpec, int runCount, long masterSeed, int trialCap) {
        listener.setText(listenerSpec);
        runs.setText(Integer.toString(runCount));
        seed.setText(Long.toString(masterSeed));
        cap.setText(Integer.toString(trialCap));
    }

    /**
     * Starts the simulation as a background job (what Run does).
     *
     * @return the job, or null when the settings were refused (see {@link #problem()})
     */
    public Job start() {
        if (focus == null || job != null) {
            return null;
        }
        Simulation simulation;
        DesignRun settings;
        Step step = focus.step();
        try {
            settings = settings();
            simulation = settings.simulation(step);
        } catch (IllegalArgumentException e) {
            problem = e.getMessage();
            progressText.setText("Not started: " + problem);
            progressText.getParent().layout(true);
            return null;
        }
        problem = null;
        progressSeen.clear();
        lastRun = settings;
        lastStep = step;
        Display display = title.getDisplay();
        AtomicBoolean stop = new AtomicBoolean();
        cancelRequested = stop;
        progressMax.set(settings.runs());
        progressDone = 0;
        progress.setMaximum(settings.runs());
        progress.setSelection(0);
        progressText.setText("0/" + settings.runs() + " runs of step " + step.getId());
        run.setEnabled(false);
        cancel.setEnabled(true);
        job = Job.create("Design simulation of step " + step.getId(), (IProgressMonitor monitor) -> {
            monitor.beginTask("Simulating step " + step.getId(), settings.runs());
            AtomicInteger shown = new AtomicInteger(-1);
            SimulationResult r;
            try {
                r = simulation.run((done, total) -> {
                    progressDone = done;
                    monitor.worked(1);
                    if (monitor.isCanceled()) {
                        stop.set(true);
                    }
                    int percent = done * 100 / total;
                    if (shown.getAndSet(percent) != percent && !display.isDisposed()) {
                        display.asyncExec(() -> progressed(done, total));
                    }
                }, stop);
            } catch (RuntimeException e) {
                display.asyncExec(() -> failed(e));
                return Status.error("design simulation failed: " + e.getMessage(), e);
            } finally {
                monitor.done();
            }
            SimulationResult done = r;
            display.asyncExec(() -> finished(done));
            return done.cancelled() ? Status.CANCEL_STATUS : Status.OK_STATUS;
        });
        job.setUser(false);
        job.schedule();
        status("Design simulation of " + step.getId() + " started: " + settings.runs() + " runs, seed "
                + settings.seed());
        return job;
    }

    private void progressed(int done, int total) {
        if (progress.isDisposed() || done <= progress.getSelection()) {
            return; // worker threads report out of order: the bar only moves forward
        }
        progressSeen.add(done + "/" + total);
        progress.setSelection(done);
        progressText.setText(done + "/" + total + " runs of step " + lastStep.getId());
    }

    private void failed(RuntimeException e) {
        job = null;
        problem = e.getMessage();
        if (!progress.isDisposed()) {
            progressText.setText("Failed: " + e.getMessage());
            run.setEnabled(focus != null);
            cancel.setEnabled(false);
        }
    }

    private void finished(SimulationResult r) {
        job = null;
        result = r;
        if (progress.isDisposed()) {
            return;
        }
        progress.setSelection(r.cancelled() ? progressDone : progress.getMaximum());
        long completed = r.rows().stream().mapToInt(RunRow::run).distinct().count();
        progressText.setText((r.cancelled() ? "Cancelled after " : "Done: ") + completed + " runs of step "
                + lastStep.getId() + ", seed " + r.masterSeed());
        run.setEnabled(focus != null);
        cancel.setEnabled(false);
        table.setInput(r.summaries());
        List<String> names = r.summaries().stream().map(TrackSummary::track).toList();
        List<double[]> est = new ArrayList<>();
        List<double[]> cnt = new ArrayList<>();
        for (String n : names) {
            est.add(r.rows().stream().filter(row -> row.track().equals(n) && !Double.isNaN(row.estimate()))
                    .mapToDouble(RunRow::estimate).toArray());
            cnt.add(r.rows().stream().filter(row -> row.track().equals(n)).mapToDouble(RunRow::trials).toArray());
        }
        String unit = Units.quantity(lastStep);
        estimates.setChart(Charts.histogram("Estimates", "estimate (" + unit + ")", names, est, false));
        trials.setChart(Charts.histogram("Trials per run", "trials", names, cnt, true));
        exampleTrack.setItems(names.toArray(String[]::new));
        exampleTrack.select(0);
        showExample();
        title.getParent().layout(true, true);
        status("Design simulation of " + lastStep.getId() + (r.cancelled() ? " cancelled" : " done"));
    }

    private void showExample() {
        int i = exampleTrack.getSelectionIndex();
        if (result == null || i < 0 || lastStep == null || i >= lastStep.getTracks().size()) {
            example.setChart(null);
            return;
        }
        Track track = lastStep.getTracks().get(i);
        DesignRun.Example ex = lastRun.example(lastStep, track, lastRun.seed());
        TrackSummary s = result.summaries().get(i);
        boolean log = lastStep.getVariedQuantity() != null && lastStep.getVariedQuantity().getScale() == Scale.LOG;
        example.setChart(Charts.exampleTrack("Example: track " + track.getName() + " run alone, seed " + lastRun.seed()
                + (ex.capped() ? " (capped)" : ""), Units.quantity(lastStep), ex.trials(), ex.estimate().value(),
                s.trueValue(), log));
    }

    /** Stops the running simulation after the runs in progress (what Cancel does). */
    public void cancel() {
        if (cancelRequested != null) {
            cancelRequested.set(true);
        }
        if (job != null) {
            job.cancel();
        }
    }

    private void status(String message) {
        if (broker != null) {
            broker.post(StatusLine.TOPIC, message);
        }
    }

    /** @return the last finished result, or null */
    public SimulationResult result() {
        return result;
    }

    /** @return the settings of the last run started */
    public DesignRun lastRun() {
        return lastRun;
    }

    /** @return the progress values shown ("done/total"), in order */
    public List<String> progressSeen() {
        return List.copyOf(progressSeen);
    }

    /** @return whether a job is running */
    public boolean running() {
        return job != null;
    }

    /** @return why the last start was refused or the last run failed, or null */
    public String problem() {
        return problem;
    }

    /** @return the charts: estimates, trials, example */
    public List<ChartCanvas> charts() {
        return List.of(estimates, trials, example);
    }

    /** @return the example track of the last result (first track unless another was chosen) */
    public DesignRun.Example example() {
        int i = Math.max(0, exampleTrack.getSelectionIndex());
        return lastRun == null ? null : lastRun.example(lastStep, lastStep.getTracks().get(i), lastRun.seed());
    }

    @Focus
    public void focus() {
        listener.setFocus();
    }

    @PreDestroy
    public void dispose() {
        cancel();
    }
}
