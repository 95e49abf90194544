package limen.ui.booth.parts;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.stream.Stream;

import jakarta.annotation.PostConstruct;
import jakarta.annotation.PreDestroy;
import jakarta.inject.Inject;

import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.ui.bindings.keys.KeyBindingDispatcher;

import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Group;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Monitor;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;

import limen.audio.AudioDevice;
import limen.audio.Devices;
import limen.audio.LoopbackSelfTest;
import limen.audio.TrialOutput;
import limen.model.SessionStatus;
import limen.procedure.TrialOutcome;
import limen.session.ArchiveIndex;
import limen.session.SessionFolder;
import limen.session.SessionListener;
import limen.session.SessionStatusInfo;
import limen.session.journal.JournalRow;
import limen.ui.LimenPreferences;
import limen.ui.booth.BoothSession;
import limen.ui.booth.BoothSession.OutputChoice;
import limen.ui.booth.BoothSession.OutputKind;
import limen.ui.booth.ParticipantScreen;
import limen.ui.booth.Preflight;

/**
 * The operator's console: session set-up (battery, participant, calibration, output, realtime, participant
 * monitor), the preflight checks, Start / Pause / Resume / Abort, the live state of the running tracks and the
 * archive's interrupted sessions with Resume. The participant screen is a separate shell opened on Start.
 */
public final class OperatorConsolePart {

    /** Preference key of the PIN that lets the operator leave the participant screen. */
    public static final String EXIT_PIN = "boothExitPin";
    /** Its default (shown in the console so the lab changes it). */
    public static final String DEFAULT_EXIT_PIN = "2468";
    private static final String AS_BATTERY_NAMES = "(the one the battery names)";

    private LimenPreferences prefs;
    private Display display;
    private Combo batteryCombo;
    private Text participantText;
    private Label participantWarning;
    private Combo calibrationCombo;
    private Combo outputCombo;
    private Text wavFolderText;
    private Button realtimeCheck;
    private Combo monitorCombo;
    private Text pinText;
    private Text preflightText;
    private Button acknowledgeCheck;
    private Button startButton;
    private Button pauseButton;
    private Button resumeButton;
    private Button abortButton;
    private Button showScreenButton;
    private Label statusLabel;
    private Table trackTable;
    private Table interruptedTable;
    private Button resumeSessionButton;
    private final List<Path> batteries = new ArrayList<>();
    private final List<Path> calibrations = new ArrayList<>();
    private final List<AudioDevice> devices = new ArrayList<>();
    private final List<Path> interrupted = new ArrayList<>();
    private final Map<String, TableItem> trackRows = new LinkedHashMap<>();
    private BoothSession session;
    private ParticipantScreen screen;
    private SessionStatusInfo lastEnd;
    private String lastError;
    private int preflightRun;
    /** The workbench's key-binding dispatcher (none outside the workbench): held off while the participant screen shows. */
    @Inject
    @Optional
    private KeyBindingDispatcher keyBindings;

    @PostConstruct
    public void create(Composite parent) {
        prefs = LimenPreferences.open();
        prefs.store().setDefault(EXIT_PIN, DEFAULT_EXIT_PIN);
        display = parent.getDisplay();
        parent.setLayout(new GridLayout(2, true));
        Composite left = column(parent);
        Composite right = column(parent);

        Group setup = group(left, "Session", 3);
        batteryCombo = combo(setup, "Battery:");
        batteryCombo.addListener(SWT.Selection, e -> refreshPreflight());
        button(setup, "Rescan", e -> scanWorkspace());
        label(setup, "Participant:");
        participantText = new Text(setup, SWT.BORDER);
        participantText.setMessage("pseudonym, e.g. P-RAVEN");
        participantText.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1));
        participantText.addListener(SWT.Modify, e -> checkParticipant());
        label(setup, "");
        participantWarning = new Label(setup, SWT.WRAP);
        GridData wd = new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1);
        wd.widthHint = 300;
        participantWarning.setLayoutData(wd);
        calibrationCombo = combo(setup, "Calibration:");
        calibrationCombo.addListener(SWT.Selection, e -> refreshPreflight());
        label(setup, "");
        outputCombo = combo(setup, "Output:");
        outputCombo.addListener(SWT.Selection, e -> outputChanged());
        button(setup, "Devices", e -> scanDevices());
        label(setup, "WAV folder:");
        wavFolderText = new Text(setup, SWT.BORDER);
        wavFolderText.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1));
        label(setup, "");
        realtimeCheck = new Button(setup, SWT.CHECK);
        realtimeCheck.setText("Realtime (none and WAV take as long as the sound)");
        realtimeCheck.setToolTipText("The none and WAV outputs wait as long as the sound lasts, and the inter-trial pauses are kept");
        GridData rd = new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1);
        rd.widthHint = 300;
        realtimeCheck.setLayoutData(rd);
        Group preflight = group(left, "Preflight (read before the first trial)", 2);
        ((GridData) preflight.getLayoutData()).grabExcessVerticalSpace = true;
        ((GridData) preflight.getLayoutData()).verticalAlignment = SWT.FILL;
        preflightText = new Text(preflight, SWT.MULTI | SWT.READ_ONLY | SWT.WRAP | SWT.V_SCROLL | SWT.BORDER);
        GridData pd = new GridData(SWT.FILL, SWT.FILL, true, true, 2, 1);
        pd.heightHint = 150;
        pd.widthHint = 380;
        preflightText.setLayoutData(pd);
        button(preflight, "Device test", e -> deviceTest());
        acknowledgeCheck = new Button(preflight, SWT.CHECK);
        acknowledgeCheck.setText("I have read the checks; the levels are within our ethics approval");
        acknowledgeCheck.addListener(SWT.Selection, e -> updateButtons());

        Group screenGroup = group(right, "Participant screen", 3);
        monitorCombo = combo(screenGroup, "Monitor:");
        label(screenGroup, "");
        label(screenGroup, "Exit PIN:");
        pinText = new Text(screenGroup, SWT.BORDER);
        pinText.setText(prefs.store().getString(EXIT_PIN));
        pinText.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        button(screenGroup, "Set PIN", e -> setPin(pinText.getText()));
        Label chord = new Label(screenGroup, SWT.WRAP);
        chord.setText("To leave the participant screen: Ctrl+Alt+Shift+Q, then the PIN and Enter (default PIN "
                + DEFAULT_EXIT_PIN + ": change it).");
        GridData cd = new GridData(SWT.FILL, SWT.CENTER, true, false, 3, 1);
        cd.widthHint = 400;
        chord.setLayoutData(cd);

        Group run = group(right, "Run", 5);
        startButton = button(run, "Start", e -> start());
        pauseButton = button(run, "Pause", e -> pause());
        resumeButton = button(run, "Resume", e -> resume());
        abortButton = button(run, "Abort...", e -> abort(true));
        showScreenButton = button(run, "Show participant screen", e -> {
            if (screen != null) {
                screen.showAgain();
            }
        });
        statusLabel = new Label(run, SWT.WRAP);
        statusLabel.setText("");
        statusLabel.setText("No session running.");
        GridData sd = new GridData(SWT.FILL, SWT.CENTER, true, false, 5, 1);
        sd.widthHint = 400;
        statusLabel.setLayoutData(sd);
        trackTable = table(run, 5, "Step", "Track", "Trials", "Reversals", "Estimate", "State");

        Group resumeGroup = group(right, "Interrupted sessions in the archive", 2);
        ((GridData) resumeGroup.getLayoutData()).grabExcessVerticalSpace = true;
        ((GridData) resumeGroup.getLayoutData()).verticalAlignment = SWT.FILL;
        interruptedTable = table(resumeGroup, 2, "Participant", "Session", "Status", "Trials");
        interruptedTable.addListener(SWT.Selection, e -> updateButtons());
        resumeSessionButton = button(resumeGroup, "Resume session", e -> resumeSelected());
        button(resumeGroup, "Refresh", e -> scanArchive());

        scanWorkspace();
        scanDevices();
        scanMonitors();
        scanArchive();
        updateButtons();
    }

    // ---- layout helpers ---------------------------------------------------------------------------------------

    private static Composite column(Composite parent) {
        Composite c = new Composite(parent, SWT.NONE);
        c.setLayout(new GridLayout(1, false));
        c.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        return c;
    }

    private static Group group(Composite parent, String title, int columns) {
        Group g = new Group(parent, SWT.NONE);
        g.setText(title);
        g.setLayout(new GridLayout(columns, false));
        g.setLayoutData(new GridData(SWT.FILL, SWT.BEGINNING, true, false));
        return g;
    }

    private static Label label(Composite parent, String text) {
        Label l = new Label(parent, SWT.NONE);
        l.setText(text);
        return l;
    }

    private static Combo combo(Composite parent, String title) {
        label(parent, title);
        Combo c = new Combo(parent, SWT.READ_ONLY);
        c.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        return c;
    }

    private static Button button(Composite parent, String text, org.eclipse.swt.widgets.Listener l) {
        Button b = new Button(parent, SWT.PUSH);
        b.setText(text);
        b.addListener(SWT.Selection, l);
        return b;
    }

    private static Table table(Composite parent, int span, String... columns) {
        Table t = new Table(parent, SWT.BORDER | SWT.FULL_SELECTION | SWT.SINGLE);
        t.setHeaderVisible(true);
        t.setLinesVisible(true);
        GridData d = new GridData(SWT.FILL, SWT.FILL, true, true, span, 1);
        d.heightHint = 140;
        t.setLayoutData(d);
        for (String c : columns) {
            TableColumn col = new TableColumn(t, SWT.LEFT);
            col.setText(c);
            col.setWidth(c.equals("Session") ? 250 : c.equals("Status") ? 115 : 90);
        }
        return t;
    }

    // ---- scanning ---------------------------------------------------------------------------------------------

    /** Lists the batteries and calibrations of the workspace folder (two levels deep). */
    public void scanWorkspace() {
        batteries.clear();
        calibrations.clear();
        Path ws = prefs.workspaceFolder();
        if (Files.isDirectory(ws)) {
            try (Stream<Path> walk = Files.walk(ws, 3)) {
                walk.filter(Files::isRegularFile).sorted().forEach(p -> {
                    String n = p.getFileName().toString();
                    if (n.endsWith(".battery")) {
                        batteries.add(p);
                    } else if (n.endsWith(".calibration")) {
                        calibrations.add(p);
                    }
                });
            } catch (IOException e) {
                statusLabel.setText("Cannot read the workspace folder " + ws + ": " + e.getMessage());
            }
        }
        batteryCombo.removeAll();
        batteries.forEach(p -> batteryCombo.add(ws.relativize(p).toString()));
        calibrationCombo.removeAll();
        calibrationCombo.add(AS_BATTERY_NAMES);
        calibrations.forEach(p -> calibrationCombo.add(ws.relativize(p).toString()));
        calibrationCombo.select(0);
        if (!batteries.isEmpty()) {
            batteryCombo.select(0);
        }
        refreshPreflight();
    }

    private void scanDevices() {
        devices.clear();
        try {
            devices.addAll(Devices.system().outputs());
        } catch (RuntimeException e) {
            // no sound system: only none and WAV
        }
        int keep = Math.max(0, outputCombo.getSelectionIndex());
        outputCombo.removeAll();
        outputCombo.add(OutputKind.NONE.label());
        outputCombo.add(OutputKind.WAV_FOLDER.label());
        for (AudioDevice d : devices) {
            outputCombo.add(OutputKind.SOUND_DEVICE.label() + ": " + d.name());
        }
        outputCombo.select(Math.min(keep, outputCombo.getItemCount() - 1));
        outputChanged();
    }

    private void scanMonitors() {
        monitorCombo.removeAll();
        Monitor[] ms = display.getMonitors();
        Monitor primary = display.getPrimaryMonitor();
        int pick = 0;
        for (int i = 0; i < ms.length; i++) {
            var b = ms[i].getBounds();
            monitorCombo.add("Monitor " + (i + 1) + " (" + b.width + "x" + b.height + ")"
                    + (ms[i].equals(primary) ? ", the operator's" : ""));
            if (!ms[i].equals(primary)) {
                pick = i;
            }
        }
        monitorCombo.select(pick);
    }

    /** Finds the archive's sessions whose header says RUNNING or INTERRUPTED. */
    public void scanArchive() {
        interrupted.clear();
        interruptedTable.removeAll();
        Path archive = prefs.archiveFolder();
        if (Files.isDirectory(archive)) {
            try {
                for (Path p : ArchiveIndex.sessions(archive)) {
                    if (busy() && p.equals(session.folder().path())) {
                        continue;
                    }
                    try {
                        SessionFolder f = SessionFolder.open(p);
                        SessionStatus s = f.header().getStatus();
                        if (s == SessionStatus.RUNNING || s == SessionStatus.INTERRUPTED) {
                            interrupted.add(p);
                            TableItem item = new TableItem(interruptedTable, SWT.NONE);
                            item.setText(new String[] {f.header().getParticipant(), p.getFileName().toString(),
                                    s.getLiteral(), Long.toString(f.readJournal().rows().size())});
                        }
                    } catch (IOException e) {
                        // unreadable session folders are listed by the archive views, not here
                    }
                }
            } catch (IOException e) {
                statusLabel.setText("Cannot read the archive " + archive + ": " + e.getMessage());
            }
        }
        updateButtons();
    }

    private void checkParticipant() {
        String id = participantText.getText().trim();
        String warning = "";
        if (!id.isEmpty()) {
            Path folder = prefs.archiveFolder().resolve(id.replaceAll("[^A-Za-z0-9._-]+", "_"));
            if (Files.isDirectory(folder)) {
                try {
                    int n = ArchiveIndex.sessions(folder).size();
                    if (n > 0) {
                        warning = "Note: " + id + " already has " + n + " session" + (n == 1 ? "" : "s")
                                + " in the archive. Same person? Otherwise choose another pseudonym.";
                    }
                } catch (IOException e) {
                    warning = "Cannot read " + folder + ": " + e.getMessage();
                }
            }
        }
        participantWarning.setText(warning);
        participantWarning.getParent().layout(true, true);
        updateButtons();
    }

    private void outputChanged() {
        wavFolderText.setEnabled(outputCombo.getSelectionIndex() == 1);
        if (wavFolderText.getText().isEmpty()) {
            wavFolderText.setText(prefs.archiveFolder().resolve("wav").toString());
        }
    }

    private void setPin(String pin) {
        if (pin.isBlank()) {
            MessageDialog.openError(pinText.getShell(), "Exit PIN", "The PIN cannot be empty.");
            return;
        }
        prefs.store().setValue(EXIT_PIN, pin.trim());
        prefs.save();
        statusLabel.setText("The exit PIN was changed.");
    }

    private String exitPin() {
        return prefs.store().getString(EXIT_PIN);
    }

    // ---- preflight --------------------------------------------------------------------------------------------

    private BoothSession.Loaded loadSelection() throws Exception {
        int b = batteryCombo.getSelectionIndex();
        if (b < 0) {
            throw new IllegalArgumentException("No battery in the workspace folder " + prefs.workspaceFolder());
        }
        int c = calibrationCombo.getSelectionIndex();
        return BoothSession.load(batteries.get(b), c <= 0 ? null : calibrations.get(c - 1));
    }

    /** Recomputes the preflight checks for the selection (the exposure dry run runs in the background). */
    public void refreshPreflight() {
        acknowledgeCheck.setSelection(false);
        int run = ++preflightRun;
        BoothSession.Loaded loaded;
        try {
            loaded = loadSelection();
        } catch (Exception e) {
            preflightText.setText(String.valueOf(e.getMessage()));
            updateButtons();
            return;
        }
        Preflight.Report cal = Preflight.calibration(loaded.calibration(), LocalDate.now(ZoneOffset.UTC));
        String head = String.join("\n", cal.lines());
        preflightText.setText(head + "\n\nEstimating the exposure (dry run)...");
        Thread t = new Thread(() -> {
            String text;
            try {
                text = String.join("\n", Preflight.exposure(loaded, 1L).lines());
            } catch (Exception e) {
                text = "Exposure not estimated: " + e.getMessage();
            }
            String result = text;
            display.asyncExec(() -> {
                if (!preflightText.isDisposed() && run == preflightRun) {
                    preflightText.setText(head + "\n\n" + result);
                }
            });
        }, "limen-booth-preflight");
        t.setDaemon(true);
        t.start();
        updateButtons();
    }

    /** The preflight text as shown. */
    public String preflightText() {
        return preflightText.getText();
    }

    private void deviceTest() {
        int o = outputCombo.getSelectionIndex();
        if (o < 2) {
            MessageDialog.openInformation(preflightText.getShell(), "Device test",
                    "The device test plays through a sound device: choose one as the output first.");
            return;
        }
        String device = devices.get(o - 2).name();
        statusLabel.setText("Device test: playing a 1 kHz tone at -40 dBFS peak on " + device + "...");
        Thread t = new Thread(() -> {
            String msg;
            try {
                LoopbackSelfTest.Settings d = LoopbackSelfTest.Settings.defaults();
                LoopbackSelfTest test = new LoopbackSelfTest(new LoopbackSelfTest.Settings(d.frequencyHz(), -40.0,
                        d.durationSeconds(), d.rampSeconds(), d.sampleRateHz(), d.bufferMillis(), d.frequencyToleranceHz(),
                        d.levelToleranceDb(), d.lengthToleranceSeconds(), d.minGapSeconds()));
                LoopbackSelfTest.Result r = test.run(Devices.system(), device, null, new SplittableRandom(7));
                msg = "Device test: " + r.verdict() + (r.problems().isEmpty() ? "" : " (" + String.join("; ", r.problems()) + ")");
            } catch (Exception e) {
                msg = "Device test failed: " + e.getMessage();
            }
            String m = msg;
            display.asyncExec(() -> {
                if (!statusLabel.isDisposed()) {
                    statusLabel.setText(m);
                }
            });
        }, "limen-booth-device-test");
        t.setDaemon(true);
        t.start();
    }

    // ---- running ----------------------------------------------------------------------------------------------

    private OutputChoice outputChoice() {
        int o = outputCombo.getSelectionIndex();
        boolean rt = realtimeCheck.getSelection();
        if (o <= 0) {
            return new OutputChoice(OutputKind.NONE, null, null, rt);
        }
        if (o == 1) {
            return new OutputChoice(OutputKind.WAV_FOLDER, Path.of(wavFolderText.getText().trim()), null, rt);
        }
        return new OutputChoice(OutputKind.SOUND_DEVICE, null, devices.get(o - 2).name(), true);
    }

    private void updateButtons() {
        if (startButton == null || startButton.isDisposed()) {
            return;
        }
        boolean busy = busy();
        startButton.setEnabled(!busy && acknowledgeCheck.getSelection() && !participantText.getText().isBlank()
                && batteryCombo.getSelectionIndex() >= 0);
        pauseButton.setEnabled(busy && !session.control().paused());
        resumeButton.setEnabled(busy && session.control().paused());
        abortButton.setEnabled(busy);
        showScreenButton.setEnabled(busy && screen != null);
        resumeSessionButton.setEnabled(!busy && interruptedTable.getSelectionIndex() >= 0);
    }

    /** Whether a session is under way (its thread may still be closing the output after it has ended). */
    private boolean busy() {
        return session != null && lastEnd == null && lastError == null;
    }

    /** Sets the session fields (as the operator would); used by scripted checks. */
    public void choose(String batteryName, String participant, OutputKind kind, boolean realtime) {
        for (int i = 0; i < batteryCombo.getItemCount(); i++) {
            if (batteryCombo.getItem(i).equals(batteryName)) {
                batteryCombo.select(i);
            }
        }
        participantText.setText(participant);
        outputCombo.select(kind.ordinal());
        realtimeCheck.setSelection(realtime);
        outputChanged();
        refreshPreflight();
    }

    /** Ticks "I have read the checks". */
    public void acknowledge() {
        acknowledgeCheck.setSelection(true);
        updateButtons();
    }

    /** Starts a new session for the chosen battery and participant. */
    public void start() {
        if (!acknowledgeCheck.getSelection()) {
            statusLabel.setText("Read the preflight checks and tick the box first.");
            return;
        }
        try {
            BoothSession.Loaded loaded = loadSelection();
            OutputChoice out = outputChoice();
            SessionFolder folder = BoothSession.create(prefs.archiveFolder(), loaded, participantText.getText().trim(),
                    System.currentTimeMillis(), out);
            launch(folder, out);
        } catch (Exception e) {
            failed(e);
        }
    }

    private void resumeSelected() {
        int i = interruptedTable.getSelectionIndex();
        if (i >= 0) {
            resume(interrupted.get(i));
        }
    }

    /** Continues an interrupted session with the chosen output. */
    public void resume(Path sessionFolder) {
        try {
            SessionFolder folder = SessionFolder.open(sessionFolder);
            folder.header().setStatus(SessionStatus.RUNNING);
            folder.saveHeader();
            launch(folder, outputChoice());
        } catch (Exception e) {
            failed(e);
        }
    }

    private void failed(Exception e) {
        lastError = e.getMessage();
        statusLabel.setText("Not started: " + e.getMessage());
        statusLabel.getParent().layout(true, true);
    }

    private void launch(SessionFolder folder, OutputChoice out) throws Exception {
        SplittableRandom dither = new SplittableRandom(folder.header().getRandomSeed() ^ 0x5DEECE66DL);
        TrialOutput output = out.open(folder.header().getCalibration().getSampleRateHz(), dither);
        launch(folder, output, out.realtime());
    }

    /** Runs a session folder through a given output (the console's own outputs, or a test's). */
    public void launch(SessionFolder folder, TrialOutput output, boolean realtime) {
        lastEnd = null;
        lastError = null;
        trackTable.removeAll();
        trackRows.clear();
        if (screen != null) {
            screen.dispose();
        }
        Monitor[] ms = display.getMonitors();
        Monitor m = ms[Math.max(0, Math.min(monitorCombo.getSelectionIndex(), ms.length - 1))];
        ParticipantScreen s = new ParticipantScreen(display, m, this::exitPin, this::operatorLeftScreen);
        s.holdWorkbenchKeys(keyBindings == null ? null : keyBindings.getKeyDownFilter());
        screen = s;
        session = BoothSession.launch(folder, output, s, s::soundStarting, realtime, listener(),
                info -> display.asyncExec(() -> ended(info)),
                e -> display.asyncExec(() -> {
                    lastError = e.getMessage();
                    statusLabel.setText("The session stopped with an error: " + e.getMessage()
                            + ". Every recorded trial is in " + folder.path());
                    s.showNeutralPause();
                    updateButtons();
                    scanArchive();
                }));
        statusLabel.setText("Running: " + folder.header().getParticipant() + " in " + folder.path().getFileName());
        scanArchive();
        updateButtons();
    }

    private SessionListener listener() {
        return new SessionListener() {
            @Override
            public void stepStarted(int stepIndex, int stepCount, limen.model.Step step) {
                display.asyncExec(() -> {
                    if (!statusLabel.isDisposed()) {
                        statusLabel.setText("Running step " + stepIndex + " of " + stepCount + ": " + step.getId());
                    }
                });
            }

            @Override
            public void trialRecorded(JournalRow row, TrialOutcome outcome, TrackState track) {
                display.asyncExec(() -> showTrack(row.step(), track));
            }

            @Override
            public void deviceLost(String message) {
                display.asyncExec(() -> {
                    if (screen != null) {
                        screen.showNeutralPause();
                    }
                    if (!statusLabel.isDisposed()) {
                        statusLabel.setText("Sound device lost: " + message
                                + ". The session is interrupted; every recorded trial is kept. Resume it from the list"
                                + " when the device is back.");
                    }
                });
            }
        };
    }

    private void showTrack(String step, SessionListener.TrackState t) {
        if (trackTable.isDisposed()) {
            return;
        }
        TableItem item = trackRows.computeIfAbsent(step + "/" + t.name(), k -> new TableItem(trackTable, SWT.NONE));
        item.setText(new String[] {step, t.name(), Integer.toString(t.trials()), Integer.toString(t.reversals()),
                Double.isNaN(t.estimate()) ? "-" : String.format(Locale.ROOT, "%.4g", t.estimate()),
                t.finished() ? "done" : "running"});
    }

    private void ended(SessionStatusInfo info) {
        lastEnd = info;
        if (statusLabel.isDisposed()) {
            return;
        }
        String how = info.status().getLiteral().toLowerCase(Locale.ROOT);
        if (info.status() == SessionStatus.INTERRUPTED) {
            statusLabel.setText("Interrupted after " + info.trials() + " trials: " + info.message());
        } else {
            statusLabel.setText("Session " + how + ": " + info.trials() + " trials in " + info.folder()
                    + (info.status() == SessionStatus.COMPLETED ? "" : " (" + info.message() + ")"));
        }
        statusLabel.getParent().layout(true, true);
        scanArchive();
        updateButtons();
    }

    private void operatorLeftScreen() {
        if (session != null && session.running()) {
            session.control().pause("operator left the participant screen");
            statusLabel.setText("Participant screen left by the operator: the session pauses after the current trial."
                    + " Show the screen and Resume to go on, or Abort.");
        }
        updateButtons();
    }

    private void pause() {
        if (session != null) {
            session.control().pause("paused by the operator");
            statusLabel.setText("Paused: the session stops after the current trial.");
            if (screen != null) {
                screen.pauseAfterAnswer();
            }
        }
        updateButtons();
    }

    private void resume() {
        if (session != null) {
            session.control().resume();
            statusLabel.setText("Running again.");
            if (screen != null) {
                screen.resumed();
                screen.showAgain();
            }
        }
        updateButtons();
    }

    /** Aborts the running session (after the operator confirms, when asked to). */
    public void abort(boolean confirm) {
        if (!busy()) {
            return;
        }
        if (confirm && !MessageDialog.openConfirm(statusLabel.getShell(), "Abort session",
                "Abort the session? Recorded trials are kept, but an aborted session cannot be resumed.")) {
            return;
        }
        session.control().abort("aborted by the operator");
        screen.stop();
        updateButtons();
    }

    // ---- for tests and scripted checks ------------------------------------------------------------------------

    public ParticipantScreen screen() {
        return screen;
    }

    public BoothSession session() {
        return session;
    }

    /** How the last session ended (null while running or before any). */
    public SessionStatusInfo lastEnd() {
        return lastEnd;
    }

    public String lastError() {
        return lastError;
    }

    public String status() {
        return statusLabel.getText();
    }

    /** Types a pseudonym into the participant field (and so checks it against the archive). */
    public void participantWarningFor(String participant) {
        participantText.setText(participant);
    }

    public String participantWarning() {
        return participantWarning.getText();
    }

    public List<Path> interruptedSessions() {
        return List.copyOf(interrupted);
    }

    /** Rows of the live track table: step, track, trials, reversals, estimate, state. */
    public List<String[]> trackRows() {
        List<String[]> out = new ArrayList<>();
        for (TableItem i : trackTable.getItems()) {
            out.add(new String[] {i.getText(0), i.getText(1), i.getText(2), i.getText(3), i.getText(4), i.getText(5)});
        }
        return out;
    }

    @PreDestroy
    public void dispose() {
        if (session != null && session.running()) {
            session.control().abort("the console was closed");
        }
        if (screen != null) {
            screen.dispose();
        }
    }
}
