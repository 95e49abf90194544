package limen.ui.authoring.parts;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.stream.Stream;

import jakarta.annotation.PostConstruct;
import jakarta.annotation.PreDestroy;
import jakarta.inject.Inject;

import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.core.services.events.IEventBroker;
import org.eclipse.e4.ui.di.Focus;
import org.eclipse.e4.ui.di.UIEventTopic;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.emf.common.command.CommandStackListener;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.custom.ScrolledComposite;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;

import limen.audio.Devices;
import limen.audio.JavaSoundOutput;
import limen.core.About;
import limen.model.Calibration;
import limen.model.Step;
import limen.model.io.LimenFiles;
import limen.model.io.LoadResult;
import limen.signal.CheckedStimulus;
import limen.signal.Component;
import limen.ui.StatusLine;
import limen.ui.authoring.AuthoringTopics;
import limen.ui.authoring.StepFocus;
import limen.ui.authoring.edit.BatteryDocument;
import limen.ui.authoring.edit.Units;
import limen.ui.authoring.internal.Charts;
import limen.ui.charts.ChartCanvas;
import limen.ui.authoring.preview.TrialPreview;

/**
 * Stimulus preview: one trial of the step being edited, rendered through the real synthesis and checked by
 * the safety guard of the chosen calibration (the one the battery names, or another the author picks), drawn
 * as waveform and per-interval spectrum with levels in dB SPL. Play sends the checked trial to the sound
 * device, after the research-use caution; without a device, or when the guard refuses the trial, Play is off
 * and says why. Re-rendered when the step changes.
 */
public final class StimulusPreviewPart {

    private static final String OTHER = "Other calibration file...";

    @Inject
    @Optional
    IEventBroker broker;

    private StepFocus focus;
    private BatteryDocument listened;
    private final CommandStackListener edits = e -> scheduleRender();
    private final Runnable renderLater = this::render;
    private Label title;
    private Combo calibrationChoice;
    private final List<Path> calibrationFiles = new ArrayList<>();
    private Path chosenCalibration;
    private Text valueText;
    private Label valueUnit;
    private Combo targetChoice;
    private Label referenceLabel;
    private Text referenceText;
    private Button play;
    private Label playReason;
    private Label levels;
    private ScrolledComposite infoScroller;
    private Composite info;
    private ChartCanvas waveform;
    private ChartCanvas spectrum;
    private TrialPreview.Result result;
    private String problem;
    private String deviceProblem;
    private boolean cautionShown;
    private long seed = 1;

    @PostConstruct
    public void create(Composite parent, @Optional MApplication app) {
        parent.setLayout(new GridLayout(1, false));
        title = new Label(parent, SWT.WRAP);
        title.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        Composite row = new Composite(parent, SWT.NONE);
        row.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        row.setLayout(new GridLayout(7, false));
        new Label(row, SWT.NONE).setText("Calibration");
        calibrationChoice = new Combo(row, SWT.READ_ONLY);
        calibrationChoice.setLayoutData(new GridData(260, SWT.DEFAULT));
        calibrationChoice.addListener(SWT.Selection, e -> calibrationChosen(parent));
        new Label(row, SWT.NONE).setText("Value");
        valueText = new Text(row, SWT.BORDER);
        valueText.setLayoutData(new GridData(70, SWT.DEFAULT));
        valueText.setToolTipText("The varied quantity's value of the previewed trial (Enter to render)");
        valueText.addListener(SWT.DefaultSelection, e -> render());
        valueText.addListener(SWT.FocusOut, e -> render());
        valueUnit = new Label(row, SWT.NONE);
        valueUnit.setLayoutData(new GridData(50, SWT.DEFAULT));
        new Label(row, SWT.NONE).setText("Target in interval");
        targetChoice = new Combo(row, SWT.READ_ONLY);
        targetChoice.addListener(SWT.Selection, e -> render());
        Composite row2 = new Composite(parent, SWT.NONE);
        row2.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        row2.setLayout(new GridLayout(6, false));
        referenceLabel = new Label(row2, SWT.NONE);
        referenceLabel.setText("Assumed threshold (dB SPL)");
        referenceText = new Text(row2, SWT.BORDER);
        referenceText.setLayoutData(new GridData(50, SWT.DEFAULT));
        referenceText.setText("30");
        referenceText.setToolTipText("The standard level is relative to an earlier step's threshold: the preview "
                + "assumes this threshold, dB SPL");
        referenceText.addListener(SWT.DefaultSelection, e -> render());
        Button again = new Button(row2, SWT.PUSH);
        again.setText("New noise");
        again.setToolTipText("Render again with fresh randomness (noise maskers)");
        again.addListener(SWT.Selection, e -> {
            seed++;
            render();
        });
        play = new Button(row2, SWT.PUSH);
        play.setText("Play");
        play.addListener(SWT.Selection, e -> play(parent));
        playReason = new Label(row2, SWT.WRAP);
        playReason.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        showReference(false);
        SashForm charts = new SashForm(parent, SWT.HORIZONTAL);
        charts.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        ScrolledComposite infoScroller = new ScrolledComposite(charts, SWT.V_SCROLL);
        infoScroller.setExpandHorizontal(true);
        infoScroller.setExpandVertical(true);
        Composite info = new Composite(infoScroller, SWT.NONE);
        info.setLayout(new GridLayout(1, false));
        infoScroller.setContent(info);
        levels = new Label(info, SWT.WRAP);
        levels.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        Label caution = new Label(info, SWT.WRAP);
        caution.setText("Caution: " + About.RESEARCH_CAUTION);
        GridData cautionData = new GridData(SWT.FILL, SWT.TOP, true, false);
        cautionData.verticalIndent = 8;
        caution.setLayoutData(cautionData);
        caution.setForeground(parent.getDisplay().getSystemColor(SWT.COLOR_DARK_GRAY));
        infoScroller.addListener(SWT.Resize, e -> fitInfo(infoScroller, info));
        this.infoScroller = infoScroller;
        this.info = info;
        waveform = new ChartCanvas(charts);
        spectrum = new ChartCanvas(charts);
        waveform.setPlaceholder("Select a step in a battery editor to preview one of its trials.");
        charts.setWeights(22, 42, 36);
        try {
            deviceProblem = Devices.system().outputs().isEmpty() ? Devices.NO_OUTPUT_MESSAGE : null;
        } catch (RuntimeException | LinkageError e) {
            deviceProblem = "no sound device available (" + e + ")";
        }
        show(app == null ? null : app.getContext().get(StepFocus.class)); // the step chosen before this view opened
    }

    /** Previews the step the author works on. */
    @Inject
    @Optional
    public void show(@UIEventTopic(AuthoringTopics.STEP) StepFocus newFocus) {
        if (title == null || title.isDisposed()) {
            return;
        }
        boolean sameStep = newFocus != null && focus != null && newFocus.step() == focus.step();
        if (newFocus != null && focus != null && sameStep) {
            return; // an edit of the same step: the command stack listener re-renders
        }
        if (listened != null) {
            listened.commandStack().removeCommandStackListener(edits);
            listened = null;
        }
        focus = newFocus;
        if (focus == null) {
            title.setText("No step selected.");
            update();
            return;
        }
        listened = focus.document();
        listened.commandStack().addCommandStackListener(edits);
        Step step = focus.step();
        title.setText("Step " + step.getId() + " (" + step.getTitle() + ") of " + focus.document().name());
        valueText.setText(Units.format(TrialPreview.defaultValue(step)));
        valueUnit.setText(Units.quantity(step));
        int n = TrialPreview.intervals(step);
        targetChoice.setItems(java.util.stream.IntStream.rangeClosed(1, n).mapToObj(Integer::toString)
                .toArray(String[]::new));
        targetChoice.select(n - 1); // the target last: the standard comes first, as listeners are told
        targetChoice.setEnabled(n > 1);
        showReference(TrialPreview.referenceOf(step) != null);
        fillCalibrations();
        render();
    }

    private static void fitInfo(ScrolledComposite scroller, Composite content) {
        int width = Math.max(120, scroller.getClientArea().width);
        scroller.setMinSize(content.computeSize(width, SWT.DEFAULT));
        content.layout(true);
    }

    private void showReference(boolean relative) {
        for (org.eclipse.swt.widgets.Control c : new org.eclipse.swt.widgets.Control[] {referenceLabel, referenceText}) {
            c.setVisible(relative);
            GridData d = c.getLayoutData() instanceof GridData g ? g : new GridData();
            d.exclude = !relative;
            c.setLayoutData(d);
        }
        referenceLabel.getParent().layout(true);
    }

    /** Forgets a closed battery. */
    @Inject
    @Optional
    public void closed(@UIEventTopic(AuthoringTopics.CLOSED) BatteryDocument document) {
        if (focus != null && focus.document() == document) {
            show(null);
        }
    }

    /** Uses a calibration file (sent by the lab files view). */
    @Inject
    @Optional
    public void useCalibration(@UIEventTopic(LabFilesPart.USE_CALIBRATION_TOPIC) Path file) {
        chooseCalibration(file);
    }

    /** Renders with the given calibration file instead of the battery's. */
    public void chooseCalibration(Path file) {
        chosenCalibration = file.toAbsolutePath().normalize();
        fillCalibrations();
        render();
    }

    private void fillCalibrations() {
        calibrationFiles.clear();
        List<String> items = new ArrayList<>();
        if (focus != null) {
            Path named = focus.document().calibrationFile();
            if (named != null) {
                calibrationFiles.add(named);
                items.add(named.getFileName() + " (named by the battery)");
            }
            try (Stream<Path> s = Files.list(focus.document().file().getParent())) {
                s.filter(p -> p.toString().endsWith("." + LimenFiles.CALIBRATION_EXTENSION) && !p.equals(named))
                        .sorted().forEach(p -> {
                            calibrationFiles.add(p);
                            items.add(p.getFileName().toString());
                        });
            } catch (IOException e) {
                // the battery's folder cannot be listed: only the named calibration is offered
            }
        }
        if (chosenCalibration != null && !calibrationFiles.contains(chosenCalibration)) {
            calibrationFiles.add(chosenCalibration);
            items.add(chosenCalibration.toString());
        }
        items.add(OTHER);
        calibrationChoice.setItems(items.toArray(String[]::new));
        int index = chosenCalibration != null ? calibrationFiles.indexOf(chosenCalibration) : 0;
        calibrationChoice.select(Math.max(0, Math.min(index, items.size() - 1)));
    }

    private void calibrationChosen(Composite parent) {
        int i = calibrationChoice.getSelectionIndex();
        if (i == calibrationFiles.size()) {
            FileDialog dialog = new FileDialog(parent.getShell(), SWT.OPEN);
            dialog.setFilterExtensions(new String[] {"*." + LimenFiles.CALIBRATION_EXTENSION});
            String picked = dialog.open();
            if (picked != null) {
                chooseCalibration(Path.of(picked));
            } else {
                fillCalibrations();
            }
            return;
        }
        chosenCalibration = i >= 0 && i < calibrationFiles.size() ? calibrationFiles.get(i) : null;
        render();
    }

    private void scheduleRender() {
        if (!title.isDisposed()) {
            title.getDisplay().timerExec(250, renderLater);
        }
    }

    /** Renders the trial with the values in the controls. */
    public void render() {
        if (title.isDisposed()) {
            return;
        }
        result = null;
        problem = null;
        if (focus != null) {
            try {
                result = TrialPreview.render(focus.step(), number(valueText, "value"),
                        Math.max(0, targetChoice.getSelectionIndex()), calibration(), number(referenceText,
                                "assumed threshold"), seed);
            } catch (IllegalArgumentException | IllegalStateException e) {
                problem = "Cannot render this step: " + e.getMessage();
            }
        }
        update();
    }

    private Calibration calibration() {
        int i = calibrationChoice.getSelectionIndex();
        Path path = i >= 0 && i < calibrationFiles.size() ? calibrationFiles.get(i) : null;
        if (path == null) {
            throw new IllegalArgumentException("the battery names no calibration: choose one above");
        }
        LoadResult loaded = focus.document().loadCalibration(path);
        if (!(loaded.document() instanceof Calibration c)) {
            throw new IllegalArgumentException("calibration " + path.getFileName() + " cannot be used: "
                    + loaded.problems().stream().filter(p -> p.isError()).findFirst().map(p -> p.message())
                            .orElse("it holds no calibration"));
        }
        return c;
    }

    private static double number(Text t, String what) {
        try {
            double v = Double.parseDouble(t.getText().trim());
            if (Double.isFinite(v)) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new IllegalArgumentException(what + " '" + t.getText() + "' is not a number");
    }

    private void update() {
        if (result == null) {
            waveform.setChart(null);
            spectrum.setChart(null);
            waveform.setPlaceholder(problem != null ? problem : "Select a step in a battery editor to preview it.");
            levels.setText(problem == null ? "" : problem);
        } else {
            waveform.setChart(Charts.waveform(result, 1600));
            spectrum.setChart(Charts.spectrum(result));
            levels.setText(levelText(result));
        }
        levels.setForeground(levels.getDisplay().getSystemColor(problem != null
                || (result != null && result.refusal() != null) ? SWT.COLOR_DARK_RED : SWT.COLOR_WIDGET_FOREGROUND));
        String reason = playReason();
        play.setEnabled(reason == null);
        play.setToolTipText(reason == null ? "Play this checked trial on the default sound device" : reason);
        playReason.setText(reason == null ? "" : reason);
        title.getParent().layout(true, true);
        fitInfo(infoScroller, info);
    }

    private static String levelText(TrialPreview.Result r) {
        StringBuilder b = new StringBuilder();
        b.append(String.format(Locale.ROOT, "Standard level %.1f dB SPL. Components: ", r.standardLevelDbSpl()));
        List<String> parts = new ArrayList<>();
        for (Component c : r.stimulus().components()) {
            parts.add(String.format(Locale.ROOT, "%s %.1f dB SPL", c.description(), c.levelDbSpl()));
        }
        b.append(String.join("; ", parts)).append('.');
        if (r.checked() != null) {
            CheckedStimulus c = r.checked();
            b.append(String.format(Locale.ROOT, " Guard: passed, measured %s dB SPL; ceiling %.1f dB SPL (%s).",
                    measured(c), r.calibration().ceilingDbSpl(), r.calibration().deviceLabel()));
        } else {
            b.append(" Guard refused: ").append(r.refusal());
        }
        return b.toString();
    }

    private static String measured(CheckedStimulus c) {
        return String.format(Locale.ROOT, "L %s / R %s", db(c.measuredLevelDbSpl(0)), db(c.measuredLevelDbSpl(1)));
    }

    private static String db(double v) {
        return Double.isInfinite(v) ? "silent" : String.format(Locale.ROOT, "%.1f", v);
    }

    /** @return why Play is off, or null when it is on */
    public String playReason() {
        if (result == null) {
            return "nothing rendered";
        }
        if (result.checked() == null) {
            return "the safety guard refused this trial";
        }
        return deviceProblem;
    }

    private void play(Composite parent) {
        if (result == null || result.checked() == null || deviceProblem != null) {
            return;
        }
        CheckedStimulus trial = result.checked();
        if (!cautionShown) {
            String text = About.RESEARCH_CAUTION + "\n\nAbout to play one trial: " + measured(trial)
                    + " dB SPL measured by the guard, ceiling " + Units.format(trial.calibration().ceilingDbSpl())
                    + " dB SPL, calibration '" + trial.calibration().deviceLabel()
                    + "'. The levels are right only on the calibrated transducer.";
            if (!MessageDialog.openConfirm(parent.getShell(), "Play a trial", text)) {
                return;
            }
            cautionShown = true;
        }
        play.setEnabled(false);
        long ditherSeed = seed;
        Thread t = new Thread(() -> {
            String outcome;
            try (JavaSoundOutput out = JavaSoundOutput.open(Devices.system(), null, trial.sampleRateHz(),
                    JavaSoundOutput.DEFAULT_BUFFER_MILLIS, new SplittableRandom(ditherSeed))) {
                out.play(trial);
                outcome = "Played one trial on " + out.device().name();
            } catch (Exception e) {
                outcome = "Not played: " + e.getMessage();
            }
            String message = outcome;
            if (!parent.isDisposed()) {
                parent.getDisplay().asyncExec(() -> {
                    if (!play.isDisposed()) {
                        play.setEnabled(playReason() == null);
                        status(message);
                    }
                });
            }
        }, "limen-preview-play");
        t.setDaemon(true);
        t.start();
    }

    private void status(String message) {
        if (broker != null) {
            broker.post(StatusLine.TOPIC, message);
        }
    }

    /** @return the last rendered trial, or null */
    public TrialPreview.Result result() {
        return result;
    }

    /** @return why the last render failed, or null */
    public String problem() {
        return problem;
    }

    /** @return the level line */
    public String levelsText() {
        return levels.getText();
    }

    /** @return whether Play is enabled */
    public boolean playEnabled() {
        return play.isEnabled();
    }

    /** @return the waveform and spectrum canvases */
    public List<ChartCanvas> charts() {
        return List.of(waveform, spectrum);
    }

    /** Sets the value and the target interval (1-based) as the author would, then renders. */
    public void preview(double value, int targetInterval) {
        valueText.setText(Units.format(value));
        targetChoice.select(targetInterval - 1);
        render();
    }

    @Focus
    public void focus() {
        valueText.setFocus();
    }

    @PreDestroy
    public void dispose() {
        if (listened != null) {
            listened.commandStack().removeCommandStackListener(edits);
        }
    }
}
