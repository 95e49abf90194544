package limen.ui.booth;

import java.util.List;
import java.util.Locale;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import java.util.function.Supplier;

import org.eclipse.e4.ui.bindings.keys.KeyBindingDispatcher;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.Font;
import org.eclipse.swt.graphics.FontData;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Listener;
import org.eclipse.swt.widgets.Monitor;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Text;

import limen.model.EarlyResponsePolicy;
import limen.model.SessionStatus;
import limen.model.Task;
import limen.procedure.Answer;
import limen.session.Responder;
import limen.session.SessionStatusInfo;
import limen.session.TrialContext;
import limen.signal.CheckedStimulus;
import limen.signal.IntervalMark;

/**
 * The participant's full-screen shell: large interval indicators lit in step with the sound, big response
 * buttons (or number keys), feedback, progress, break and end screens. Nothing else is reachable from it: it has
 * no trim and no menus, refuses to close, turns off traversal (Esc, Tab), swallows every key before its widgets
 * see it, and is left only by the operator gesture {@link #EXIT_CHORD_MASK} + Q followed by the lab's PIN. (The
 * key filter is a display filter added when the screen opens; display filters run in the order they were
 * added, so the workbench's key-binding filter, added at start-up, would see keys first: the console hands it to
 * {@link #holdWorkbenchKeys}, which turns it off while the screen is shown and on again when the operator leaves
 * or the screen closes.)
 * <p>
 * Timing: {@link #soundStarting} (called by {@link IndicatedOutput} just before {@code play}) fixes
 * {@code t0}; interval i is lit from {@code t0 + onset_i / fs} to {@code t0 + offset_i / fs}, taken from the
 * rendered buffer's {@link CheckedStimulus#intervals()} marks. An answer counts only from the end of the last
 * interval, {@code t_end = t0 + max(offset_i) / fs}; its response time is {@code now - t_end} (the device's output
 * latency is not added). Earlier key presses and clicks are counted ({@link #earlyResponses()}) and, as the step's
 * {@link Task#getEarlyResponses()} says, ignored (the participant answers after the sound) or taken as the answer and
 * recorded with a negative response time.
 * <p>
 * Threads: {@link Responder} methods run on the session runner's thread and block there; everything that
 * touches widgets runs on the display thread.
 */
public final class ParticipantScreen implements Responder {

    /** Modifier keys of the operator's exit chord (with Q). */
    public static final int EXIT_CHORD_MASK = SWT.CTRL | SWT.ALT | SWT.SHIFT;
    /** The key of the exit chord. */
    public static final char EXIT_CHORD_KEY = 'q';

    private static final long NO_TIME = Long.MIN_VALUE;

    private final Display display;
    private final Shell shell;
    private final Supplier<String> pin;
    private final Runnable operatorLeft;
    private final Color background;
    private final Color foreground;
    private final Color dim;
    private final Color lit;
    private final Color good;
    private final Font big;
    private final Font huge;
    private final Font small;
    private final Label instruction;
    private final Composite indicatorRow;
    private final Composite buttonRow;
    private final Label feedbackLabel;
    private final Label progress;
    private final Composite pinPanel;
    private final Text pinText;
    private final Label pinMessage;
    private final Listener keyFilter = this::filterKey;
    private final Listener traverseFilter = this::filterTraverse;
    private final BlockingQueue<Response> answers = new LinkedBlockingQueue<>();
    private KeyBindingDispatcher.KeyDownFilter workbenchKeys;
    private boolean workbenchKeysHeld;

    private volatile boolean stopped;
    private volatile boolean forcedChoice = true;
    private volatile int intervalCount;
    private volatile long soundStartNanos = NO_TIME;
    private volatile long answerFromNanos = NO_TIME;
    private volatile boolean accepting;
    private volatile boolean breakWaiting;
    private volatile long breakReadyNanos;
    private volatile int feedbackMillis = 700;
    private volatile int earlyResponses;
    private volatile EarlyResponsePolicy earlyPolicy = EarlyResponsePolicy.IGNORE;
    private volatile boolean pauseAfterAnswer;
    private volatile TrialContext current;
    private final Object breakLock = new Object();
    private boolean breakDone;
    private boolean closable;
    private List<IntervalMark> marks = List.of();
    private int sampleRateHz = 48000;
    private Canvas[] indicators = new Canvas[0];
    private Button[] buttons = new Button[0];

    /**
     * Opens the screen on a monitor.
     *
     * @param pin          the lab's exit PIN, read when the operator types one
     * @param operatorLeft called on the display thread after the operator left with the right PIN (the screen is
     *                     then hidden, not disposed)
     */
    public ParticipantScreen(Display display, Monitor monitor, Supplier<String> pin, Runnable operatorLeft) {
        this.display = display;
        this.pin = pin;
        this.operatorLeft = operatorLeft;
        shell = new Shell(display, SWT.NO_TRIM | SWT.ON_TOP);
        shell.setText("Limen listening test");
        background = new Color(display, 24, 26, 32);
        foreground = new Color(display, 236, 236, 236);
        dim = new Color(display, 60, 64, 76);
        lit = new Color(display, 255, 200, 40);
        good = new Color(display, 120, 210, 140);
        FontData base = display.getSystemFont().getFontData()[0];
        big = new Font(display, base.getName(), 26, SWT.NORMAL);
        huge = new Font(display, base.getName(), 44, SWT.BOLD);
        small = new Font(display, base.getName(), 16, SWT.NORMAL);
        shell.setBackground(background);
        shell.setBackgroundMode(SWT.INHERIT_FORCE);
        GridLayout layout = new GridLayout(1, false);
        layout.marginWidth = 60;
        layout.marginHeight = 50;
        layout.verticalSpacing = 36;
        shell.setLayout(layout);

        instruction = label(shell, big, SWT.CENTER | SWT.WRAP);
        instruction.setLayoutData(new GridData(SWT.FILL, SWT.END, true, true));
        indicatorRow = new Composite(shell, SWT.NONE);
        indicatorRow.setLayoutData(new GridData(SWT.CENTER, SWT.CENTER, true, false));
        buttonRow = new Composite(shell, SWT.NONE);
        buttonRow.setLayoutData(new GridData(SWT.CENTER, SWT.CENTER, true, false));
        feedbackLabel = label(shell, huge, SWT.CENTER);
        feedbackLabel.setLayoutData(new GridData(SWT.FILL, SWT.BEGINNING, true, true));
        progress = label(shell, small, SWT.CENTER);
        progress.setLayoutData(new GridData(SWT.FILL, SWT.END, true, false));

        pinPanel = new Composite(shell, SWT.BORDER);
        pinPanel.setLayout(new GridLayout(3, false));
        GridData pd = new GridData(SWT.CENTER, SWT.END, true, false);
        pd.exclude = true;
        pinPanel.setLayoutData(pd);
        pinPanel.setVisible(false);
        label(pinPanel, small, SWT.NONE).setText("Operator PIN:");
        pinText = new Text(pinPanel, SWT.PASSWORD | SWT.BORDER | SWT.SINGLE);
        pinText.setLayoutData(new GridData(160, SWT.DEFAULT));
        pinText.addListener(SWT.KeyDown, e -> {
            if (e.character == SWT.CR || e.keyCode == SWT.KEYPAD_CR) {
                checkPin(pinText.getText());
            } else if (e.keyCode == SWT.ESC) {
                hidePinPrompt();
            }
        });
        pinMessage = label(pinPanel, small, SWT.NONE);
        pinMessage.setLayoutData(new GridData(260, SWT.DEFAULT));

        shell.addListener(SWT.Close, e -> e.doit = closable);
        shell.addListener(SWT.Traverse, e -> {
            e.doit = false;
            e.detail = SWT.TRAVERSE_NONE;
        });
        display.addFilter(SWT.KeyDown, keyFilter);
        display.addFilter(SWT.Traverse, traverseFilter);
        shell.addListener(SWT.Dispose, e -> {
            releaseWorkbenchKeys();
            display.removeFilter(SWT.KeyDown, keyFilter);
            display.removeFilter(SWT.Traverse, traverseFilter);
            for (org.eclipse.swt.graphics.Resource r : new org.eclipse.swt.graphics.Resource[] {background,
                    foreground, dim, lit, good, big, huge, small}) {
                r.dispose();
            }
        });
        showMessage("Welcome. Please sit comfortably and put on the headphones.\nThe test will start in a moment.");
        Rectangle bounds = monitor.getBounds();
        shell.setBounds(bounds);
        shell.open();
        shell.setFullScreen(true);
        shell.forceActive();
    }

    private Label label(Composite parent, Font font, int style) {
        Label l = new Label(parent, style);
        l.setFont(font);
        l.setForeground(foreground);
        return l;
    }

    public Shell shell() {
        return shell;
    }

    /** How long feedback stays on the screen after a trial, milliseconds. */
    public void setFeedbackMillis(int millis) {
        feedbackMillis = Math.max(0, millis);
    }

    /** Key presses and clicks that came before the end of the last interval and were ignored. */
    public int earlyResponses() {
        return earlyResponses;
    }

    /** Whether an answer would be taken now (the sound has ended and no answer has been given yet). */
    public boolean acceptingAnswers() {
        return accepting && System.nanoTime() >= answerFromNanos;
    }

    /** Whether a break screen waits for the participant to go on. */
    public boolean breakWaiting() {
        return breakWaiting;
    }

    /** The trial waiting for an answer, if any (for the console and tests). */
    public TrialContext currentTrial() {
        return accepting ? current : null;
    }

    /** The 0-based interval lit now, or -1 (display thread). */
    public int litInterval() {
        for (int i = 0; i < indicators.length; i++) {
            if (isLit(i)) {
                return i;
            }
        }
        return -1;
    }

    /** The message or instruction shown (display thread). */
    public String message() {
        return instruction.getText();
    }

    /** Shows the screen again after the operator left it. */
    public void showAgain() {
        shell.setVisible(true);
        holdWorkbenchKeysNow();
        shell.forceActive();
    }

    /**
     * Keeps the workbench's key bindings away from the participant: the given filter (the workbench's
     * key-binding dispatcher, registered on the display before this screen existed, so it would see every key
     * first) is disabled while the screen is shown and enabled again when the operator leaves with the PIN or the
     * screen closes. A filter that was already disabled is left as it was. Display thread.
     *
     * @param filter the workbench's key filter, or null when there is no workbench (nothing to hold)
     */
    public void holdWorkbenchKeys(KeyBindingDispatcher.KeyDownFilter filter) {
        releaseWorkbenchKeys();
        workbenchKeys = filter;
        if (shell.isVisible()) {
            holdWorkbenchKeysNow();
        }
    }

    /** Whether this screen has the workbench's key bindings switched off now. */
    public boolean holdsWorkbenchKeys() {
        return workbenchKeysHeld;
    }

    private void holdWorkbenchKeysNow() {
        if (workbenchKeys != null && !workbenchKeysHeld && workbenchKeys.isEnabled()) {
            workbenchKeys.setEnabled(false);
            workbenchKeysHeld = true;
        }
    }

    private void releaseWorkbenchKeys() {
        if (workbenchKeysHeld) {
            workbenchKeys.setEnabled(true);
            workbenchKeysHeld = false;
        }
    }

    /** Closes the screen for good (the console does this when the session has ended). */
    public void dispose() {
        stopped = true;
        releaseBreak();
        if (!shell.isDisposed()) {
            closable = true;
            shell.dispose();
        }
    }

    /** Makes a waiting {@link #respond} return null (the console's abort). */
    public void stop() {
        stopped = true;
        releaseBreak();
    }

    // ---- runner thread ----------------------------------------------------------------------------------------

    /** Called just before the buffer goes to the output: lights the indicators along its interval marks. */
    public void soundStarting(CheckedStimulus trial, long nanos) {
        List<IntervalMark> m = trial.intervals();
        long lastOffset = 0;
        for (IntervalMark mark : m) {
            lastOffset = Math.max(lastOffset, mark.offsetSample());
        }
        answers.clear();
        soundStartNanos = nanos;
        answerFromNanos = nanos + Math.round(lastOffset * 1e9 / trial.sampleRateHz());
        accepting = true;
        int rate = trial.sampleRateHz();
        ui(() -> startIndicators(m, rate));
    }

    /** Learns the trial's task and its step's rule for early responses before the sound starts (runner's thread). */
    @Override
    public void trialStarting(TrialContext trial) {
        // the keys taken during the sound depend on the trial's task: set before the sound starts
        forcedChoice = trial.plan().forcedChoice();
        intervalCount = trial.plan().intervals();
        Task task = trial.step().getTask();
        earlyPolicy = task == null ? EarlyResponsePolicy.IGNORE : task.getEarlyResponses();
    }

    @Override
    public Response respond(TrialContext trial) throws InterruptedException {
        current = trial;
        forcedChoice = trial.plan().forcedChoice();
        intervalCount = trial.plan().intervals();
        if (soundStartNanos == NO_TIME) { // an output that is not wrapped: treat the call as the sound's start
            soundStarting(trial.stimulus(), System.nanoTime());
        }
        ui(() -> showTrial(trial));
        try {
            while (!stopped) {
                Response r = answers.poll(50, TimeUnit.MILLISECONDS);
                if (r != null) {
                    return r;
                }
            }
            return null;
        } finally {
            accepting = false;
            soundStartNanos = NO_TIME;
        }
    }

    @Override
    public void feedback(TrialContext trial, boolean correct) {
        ui(() -> {
            feedbackLabel.setForeground(correct ? good : foreground);
            feedbackLabel.setText(correct ? "Correct" : "Not this time");
            shell.layout(true, true);
        });
        try {
            Thread.sleep(feedbackMillis);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    @Override
    public void pauseForBreak(String message, double minimumSeconds) throws InterruptedException {
        synchronized (breakLock) {
            breakDone = false;
        }
        breakReadyNanos = System.nanoTime() + Math.round(minimumSeconds * 1e9);
        breakWaiting = true;
        ui(() -> showBreak(message, minimumSeconds));
        try {
            synchronized (breakLock) {
                while (!breakDone && !stopped) {
                    breakLock.wait(100);
                }
            }
        } finally {
            breakWaiting = false;
        }
    }

    @Override
    public void finished(SessionStatusInfo status) {
        accepting = false;
        if (status.status() == SessionStatus.COMPLETED) {
            ui(() -> showMessage("That is all. Thank you very much!\nPlease wait for the operator."));
        } else if (status.status() == SessionStatus.INTERRUPTED) {
            showNeutralPause();
        } else {
            ui(() -> showMessage("The test has ended.\nPlease wait for the operator."));
        }
    }

    /** The neutral screen shown when the session stops for a reason the participant need not know. */
    public void showNeutralPause() {
        accepting = false;
        ui(() -> showMessage("Short pause.\nPlease wait: the operator will be with you in a moment."));
    }

    // ---- display thread ---------------------------------------------------------------------------------------

    private void ui(Runnable r) {
        if (display.isDisposed()) {
            return;
        }
        display.asyncExec(() -> {
            if (!shell.isDisposed()) {
                r.run();
            }
        });
    }

    private void showMessage(String text) {
        instruction.setText(text);
        rebuild(0, false);
        feedbackLabel.setText("");
        progress.setText("");
        shell.layout(true, true);
    }

    private void showBreak(String message, double minimumSeconds) {
        instruction.setText(message + "\n\n" + (minimumSeconds > 0
                ? String.format(Locale.ROOT, "You can go on after %.0f second%s: then press 1 or the button.",
                        minimumSeconds, Math.round(minimumSeconds) == 1 ? "" : "s")
                : "Press 1 or the button when you are ready to go on."));
        rebuild(0, false);
        feedbackLabel.setText("");
        Button go = bigButton(buttonRow, "Continue");
        go.addListener(SWT.Selection, e -> continueAfterBreak());
        ((GridLayout) buttonRow.getLayout()).numColumns = 1;
        shell.layout(true, true);
    }

    private void startIndicators(List<IntervalMark> m, int rate) {
        marks = m;
        sampleRateHz = rate;
        feedbackLabel.setText("");
        int n = Math.max(1, m.size());
        if (indicators.length != n) {
            rebuild(n, forcedChoice);
            shell.layout(true, true);
        }
        tick();
    }

    private void tick() {
        if (shell.isDisposed()) {
            return;
        }
        for (Canvas c : indicators) {
            c.redraw();
        }
        long end = answerFromNanos;
        if (accepting && System.nanoTime() < end + 50_000_000L) {
            display.timerExec(15, this::tick);
        }
    }

    private boolean isLit(int i) {
        long t0 = soundStartNanos;
        if (t0 == NO_TIME || i >= marks.size()) {
            return false;
        }
        IntervalMark m = marks.get(i);
        long now = System.nanoTime();
        return now >= t0 + Math.round(m.onsetSample() * 1e9 / sampleRateHz)
                && now < t0 + Math.round(m.offsetSample() * 1e9 / sampleRateHz);
    }

    private void showTrial(TrialContext trial) {
        int n = forcedChoice ? trial.plan().intervals() : 1;
        if (indicators.length != n || buttons.length != (forcedChoice ? n : 2)) {
            rebuild(n, forcedChoice);
        }
        instruction.setText(forcedChoice
                ? "Listen to the " + n + " sounds. Which one was different?\nPress its number ("
                        + (n == 2 ? "1 or 2" : "1 to " + n) + ") or touch its button."
                : "Did you hear the tone?\nPress 1 or Y for yes, 2 or N for no.");
        progress.setText("Part " + trial.stepIndex() + " of " + trial.stepCount() + "  ·  trial "
                + trial.trialInStep());
        shell.layout(true, true);
    }

    private void rebuild(int n, boolean nafc) {
        for (Control c : indicatorRow.getChildren()) {
            c.dispose();
        }
        for (Control c : buttonRow.getChildren()) {
            c.dispose();
        }
        indicators = new Canvas[n];
        int columns = Math.max(1, nafc ? n : 2);
        GridLayout il = new GridLayout(Math.max(1, n), true);
        il.horizontalSpacing = 60;
        indicatorRow.setLayout(il);
        GridLayout bl = new GridLayout(columns, true);
        bl.horizontalSpacing = 60;
        buttonRow.setLayout(bl);
        for (int i = 0; i < n; i++) {
            int index = i;
            Canvas c = new Canvas(indicatorRow, SWT.DOUBLE_BUFFERED);
            c.setLayoutData(new GridData(170, 170));
            c.addPaintListener(e -> paintIndicator(e.gc, c, index));
            indicators[i] = c;
        }
        if (n == 0) {
            buttons = new Button[0];
            return;
        }
        buttons = new Button[nafc ? n : 2];
        for (int i = 0; i < buttons.length; i++) {
            String text = nafc ? Integer.toString(i + 1) : (i == 0 ? "1  Yes" : "2  No");
            Button b = bigButton(buttonRow, text);
            Answer a = nafc ? Answer.interval(i) : Answer.yesNo(i == 0);
            b.addListener(SWT.Selection, e -> answer(a));
            buttons[i] = b;
        }
    }

    private Button bigButton(Composite parent, String text) {
        Button b = new Button(parent, SWT.PUSH);
        b.setText(text);
        b.setFont(huge);
        b.setBackground(dim);
        b.setForeground(foreground);
        GridData d = new GridData(SWT.FILL, SWT.FILL, true, false);
        d.widthHint = Math.max(220, b.computeSize(SWT.DEFAULT, SWT.DEFAULT).x + 60);
        d.heightHint = 120;
        b.setLayoutData(d);
        return b;
    }

    private void paintIndicator(GC gc, Canvas c, int index) {
        Rectangle r = c.getClientArea();
        gc.setAntialias(SWT.ON);
        gc.setBackground(background);
        gc.fillRectangle(r);
        gc.setBackground(isLit(index) ? lit : dim);
        gc.fillOval(r.x + 4, r.y + 4, r.width - 8, r.height - 8);
        if (forcedChoice && indicators.length > 1) {
            gc.setFont(huge);
            gc.setForeground(isLit(index) ? background : foreground);
            String s = Integer.toString(index + 1);
            org.eclipse.swt.graphics.Point p = gc.textExtent(s);
            gc.drawText(s, r.x + (r.width - p.x) / 2, r.y + (r.height - p.y) / 2, true);
        }
    }

    /** An answer from a key or a button; taken only after the last interval has ended. */
    private void answer(Answer a) {
        if (!accepting) {
            return;
        }
        long now = System.nanoTime();
        if (now < answerFromNanos) {
            earlyResponses++;
            if (earlyPolicy != EarlyResponsePolicy.RECORD) {
                return;
            }
        }
        accepting = false;
        answers.offer(new Response(a, (now - answerFromNanos) / 1e6));
        if (pauseAfterAnswer) {
            showNeutralPause();
        }
    }

    /**
     * The operator paused: the trial in progress is still answered (the runner pauses between trials), then the
     * neutral pause screen shows.
     */
    public void pauseAfterAnswer() {
        pauseAfterAnswer = true;
        if (!accepting) {
            showNeutralPause();
        }
    }

    /** The operator resumed. */
    public void resumed() {
        pauseAfterAnswer = false;
        ui(() -> showMessage("Get ready: the test goes on."));
    }

    private void continueAfterBreak() {
        if (breakWaiting && System.nanoTime() >= breakReadyNanos) {
            releaseBreak();
        }
    }

    private void releaseBreak() {
        synchronized (breakLock) {
            breakDone = true;
            breakLock.notifyAll();
        }
    }

    private boolean inScreen(Event e) {
        return e.widget instanceof Control c && !c.isDisposed() && c.getShell() == shell && shell.isVisible();
    }

    private void filterTraverse(Event e) {
        if (inScreen(e)) {
            e.doit = false;
            e.detail = SWT.TRAVERSE_NONE;
        }
    }

    private void filterKey(Event e) {
        if (!inScreen(e)) {
            return;
        }
        if (pinPanel.isVisible() && e.widget == pinText) {
            return; // the operator types the PIN
        }
        keyPressed(e.character, e.keyCode, e.stateMask);
        e.doit = false;
        e.type = SWT.None; // nobody else (workbench bindings, widgets) sees the key
    }

    /**
     * What a key does on this screen: number keys 1 to 4 (main row or keypad) choose an interval; for yes/no
     * tasks 1 or Y is yes and 2 or N is no; 1, Space or Enter go on after a break; the exit chord asks for the
     * PIN. Everything else is ignored.
     */
    public void keyPressed(char character, int keyCode, int stateMask) {
        if ((stateMask & EXIT_CHORD_MASK) == EXIT_CHORD_MASK
                && (Character.toLowerCase((char) keyCode) == EXIT_CHORD_KEY || Character.toLowerCase(character) == EXIT_CHORD_KEY
                        || character == 17 /* Ctrl+Q */)) {
            showPinPrompt();
            return;
        }
        if ((stateMask & (SWT.CTRL | SWT.ALT | SWT.COMMAND)) != 0) {
            return;
        }
        int digit = digit(character, keyCode);
        if (breakWaiting) {
            if (digit == 1 || character == ' ' || character == SWT.CR) {
                continueAfterBreak();
            }
            return;
        }
        if (forcedChoice) {
            if (digit >= 1 && digit <= Math.min(4, intervalCount)) {
                answer(Answer.interval(digit - 1));
            }
        } else {
            char c = Character.toLowerCase(character);
            if (digit == 1 || c == 'y') {
                answer(Answer.yesNo(true));
            } else if (digit == 2 || c == 'n') {
                answer(Answer.yesNo(false));
            }
        }
    }

    private static int digit(char character, int keyCode) {
        if (character >= '1' && character <= '9') {
            return character - '0';
        }
        if (keyCode >= SWT.KEYPAD_1 && keyCode <= SWT.KEYPAD_9) {
            return keyCode - SWT.KEYPAD_1 + 1;
        }
        return -1;
    }

    /** Whether the PIN prompt is showing. */
    public boolean pinPromptVisible() {
        return pinPanel.isVisible();
    }

    private void showPinPrompt() {
        pinText.setText("");
        pinMessage.setText("Enter, or Esc to go back");
        ((GridData) pinPanel.getLayoutData()).exclude = false;
        pinPanel.setVisible(true);
        shell.layout(true, true);
        pinText.setFocus();
    }

    private void hidePinPrompt() {
        ((GridData) pinPanel.getLayoutData()).exclude = true;
        pinPanel.setVisible(false);
        shell.layout(true, true);
        shell.setFocus();
    }

    /** Checks a PIN typed in the prompt; the right one hides the screen and tells the console. */
    public boolean checkPin(String typed) {
        if (!pinPanel.isVisible()) {
            return false;
        }
        if (!typed.equals(pin.get())) {
            pinText.setText("");
            pinMessage.setText("Wrong PIN");
            return false;
        }
        hidePinPrompt();
        shell.setVisible(false);
        releaseWorkbenchKeys();
        operatorLeft.run();
        return true;
    }
}
