package limen.ui.booth.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.Proxy;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.BooleanSupplier;

import org.eclipse.e4.core.contexts.ContextInjectionFactory;
import org.eclipse.e4.core.contexts.EclipseContextFactory;
import org.eclipse.e4.core.contexts.IEclipseContext;
import org.eclipse.e4.ui.bindings.EBindingService;
import org.eclipse.e4.ui.bindings.keys.KeyBindingDispatcher;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Shell;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.audio.DeviceLostException;
import limen.audio.NoOutput;
import limen.audio.TrialOutput;
import limen.model.SessionStatus;
import limen.procedure.Answer;
import limen.session.BatteryTrialRenderer;
import limen.session.CalibrationMapping;
import limen.session.Responder;
import limen.session.SessionFolder;
import limen.session.SessionRunner;
import limen.session.SessionStatusInfo;
import limen.session.TrialContext;
import limen.session.journal.JournalRow;
import limen.signal.CheckedStimulus;
import limen.ui.LimenPreferences;
import limen.ui.booth.BoothSession;
import limen.ui.booth.ParticipantScreen;
import limen.ui.booth.parts.OperatorConsolePart;

/**
 * The booth under a real display (Xvfb in CI): the demo battery through the participant screen with posted key
 * presses, the screen's lock and the operator's exit gesture, device loss, and resuming an interrupted session
 * from the console.
 */
class BoothTest {

    @TempDir
    Path temp;

    private Display display;
    private Shell shell;
    private IEclipseContext context;
    private Path workspace;
    private Path archive;
    private Path battery;
    /** Key presses the posted events did not deliver (then given to the screen's key handler directly). */
    private int fallbacks;
    /** Break screens seen by {@link #answerUntilEnd}. */
    private int breaks;

    @BeforeEach
    void setUp() throws Exception {
        System.setProperty("limen.preferences", temp.resolve("workbench.prefs").toString());
        workspace = temp.resolve("lab");
        archive = Files.createDirectories(temp.resolve("archive"));
        battery = DemoLab.write(workspace);
        LimenPreferences p = LimenPreferences.open();
        p.store().setValue(LimenPreferences.WORKSPACE_FOLDER, workspace.toString());
        p.store().setValue(LimenPreferences.ARCHIVE_FOLDER, archive.toString());
        p.save();
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setText("Limen test: booth");
        shell.setLayout(new FillLayout());
        shell.setSize(1200, 760);
    }

    @AfterEach
    void tearDown() {
        if (context != null) {
            context.dispose();
        }
        shell.dispose();
        System.clearProperty("limen.preferences");
    }

    private OperatorConsolePart console() {
        context = EclipseContextFactory.create("booth-test");
        Composite host = new Composite(shell, SWT.NONE);
        context.set(Composite.class, host);
        OperatorConsolePart part = ContextInjectionFactory.make(OperatorConsolePart.class, context);
        shell.open();
        return part;
    }

    private void pumpUntil(BooleanSupplier done, long millis, String what) throws InterruptedException {
        long until = System.currentTimeMillis() + millis;
        while (!done.getAsBoolean()) {
            if (System.currentTimeMillis() > until) {
                throw new AssertionError("timed out waiting for " + what);
            }
            if (!display.readAndDispatch()) {
                Thread.sleep(5);
            }
        }
    }

    private void pump(long millis) throws InterruptedException {
        long until = System.currentTimeMillis() + millis;
        while (System.currentTimeMillis() < until) {
            if (!display.readAndDispatch()) {
                Thread.sleep(5);
            }
        }
    }

    private void post(int type, char character, int keyCode) {
        Event e = new Event();
        e.type = type;
        e.character = character;
        e.keyCode = keyCode;
        assertTrue(display.post(e), "Display.post refused an event");
    }

    private void typeKey(char c) {
        post(SWT.KeyDown, c, c);
        post(SWT.KeyUp, c, c);
    }

    private void typeWithModifiers(int keyCode, char c, int... modifiers) {
        for (int m : modifiers) {
            post(SWT.KeyDown, '\0', m);
        }
        post(SWT.KeyDown, c, keyCode);
        post(SWT.KeyUp, c, keyCode);
        for (int i = modifiers.length - 1; i >= 0; i--) {
            post(SWT.KeyUp, '\0', modifiers[i]);
        }
    }

    /**
     * Answers every trial by pressing the number key of the target interval, except every third trial, which
     * gets the other interval (so the 2-down/1-up track reverses). Returns the intervals pressed (1-based).
     */
    private List<Integer> answerUntilEnd(OperatorConsolePart part, boolean screenshots) throws Exception {
        ParticipantScreen ps = part.screen();
        assertNotNull(ps, "no participant screen");
        ps.setFeedbackMillis(60);
        List<Integer> pressed = new ArrayList<>();
        boolean litShot = !screenshots;
        long until = System.currentTimeMillis() + 180_000;
        while (part.lastEnd() == null) {
            assertTrue(System.currentTimeMillis() < until, "the session did not end; pressed " + pressed.size());
            if (!display.readAndDispatch()) {
                Thread.sleep(2);
            }
            if (!litShot && ps.litInterval() >= 0) {
                Screenshots.print(ps.shell().getChildren()[1], "participant-interval-lit");
                litShot = true;
            }
            if (ps.breakWaiting()) {
                breaks++;
                pumpUntil(() -> ps.message().contains("short rest"), 3000, "the break screen's message");
                Screenshots.save(ps.shell(), "participant-break", 100);
                typeKey('1'); // before the minimum pause: ignored
                pump(50);
                assertTrue(ps.breakWaiting(), "the break ended before its minimum duration");
                pump(1100);
                typeKey('1');
                pumpUntil(() -> !ps.breakWaiting(), 3000, "the end of the break after a key press");
                continue;
            }
            TrialContext trial = ps.currentTrial();
            if (trial == null || !ps.acceptingAnswers()) {
                continue;
            }
            if (screenshots && pressed.size() == 2) {
                Screenshots.save(ps.shell(), "participant-trial", 50);
                Screenshots.print(shell.getChildren()[0], "console-running");
            }
            int target = trial.plan().targetInterval() + 1;
            int choice = (pressed.size() % 3 == 2) ? 3 - target : target;
            ps.shell().forceActive();
            typeKey((char) ('0' + choice));
            long t = System.currentTimeMillis();
            while (ps.currentTrial() == trial && System.currentTimeMillis() - t < 1000) {
                if (!display.readAndDispatch()) {
                    Thread.sleep(2);
                }
            }
            if (ps.currentTrial() == trial) {
                fallbacks++;
                ps.keyPressed((char) ('0' + choice), '0' + choice, 0);
            }
            pressed.add(choice);
        }
        return pressed;
    }

    @Test
    void demoBatteryRunsToTheEndThroughTheParticipantScreen() throws Exception {
        OperatorConsolePart part = console();
        part.choose(DemoLab.BATTERY, "P-RAVEN", BoothSession.OutputKind.NONE, false);
        pumpUntil(() -> part.preflightText().contains("NIOSH"), 60_000, "the preflight exposure estimate");
        String pre = part.preflightText();
        assertTrue(pre.contains("Measured on 2025-01-15"), pre);
        assertTrue(pre.contains("Ceiling: 85.0 dB SPL"), pre);
        assertTrue(pre.contains("not a clinical audiometer"), pre);
        assertTrue(pre.contains("OSHA"), pre);
        assertTrue(pre.contains("demonstration only"), pre);
        Path pre1 = Screenshots.save(shell, "console-preflight");
        assertTrue(Screenshots.distinctPixels(pre1) > 2, "blank console screenshot");
        part.acknowledge();
        part.start();
        assertNotNull(part.session(), part.status());

        List<Integer> pressed = answerUntilEnd(part, true);
        SessionStatusInfo end = part.lastEnd();
        assertEquals(SessionStatus.COMPLETED, end.status(), end.message());
        Path shot = Screenshots.save(part.screen().shell(), "participant-end");
        assertTrue(Screenshots.distinctPixels(shot) > 2, "blank participant screenshot");
        assertTrue(part.screen().message().contains("Thank you"), part.screen().message());
        assertTrue(Screenshots.distinctPixels(Screenshots.print(shell.getChildren()[0], "console-completed")) > 2);

        List<JournalRow> rows = SessionFolder.open(end.folder()).readJournal().rows();
        assertEquals(pressed.size(), rows.size(), "every answered trial is in the journal");
        assertEquals(end.trials(), rows.size());
        for (int i = 0; i < rows.size(); i++) {
            assertEquals(i + 1, rows.get(i).seq());
            assertEquals(pressed.get(i), rows.get(i).response(), "trial " + (i + 1));
            assertEquals(rows.get(i).response() == rows.get(i).targetInterval(), rows.get(i).correct());
            assertTrue(rows.get(i).responseMs() >= 0, "response before the end of the sound: " + rows.get(i));
        }
        List<String[]> tracks = part.trackRows();
        assertEquals(1, tracks.size());
        assertEquals(Integer.toString(rows.size()), tracks.get(0)[2]);
        assertTrue(rows.size() == 30 || "6".equals(tracks.get(0)[3]), "stopping rule: " + String.join(",", tracks.get(0)));
        assertEquals("done", tracks.get(0)[5]);
        System.out.println("booth demo: " + rows.size() + " trials, key presses not delivered by Display.post: " + fallbacks);
        assertEquals(0, fallbacks, "posted key presses should reach the participant screen");
    }

    @Test
    void breakScreenWaitsForTheParticipantBetweenParts() throws Exception {
        OperatorConsolePart part = console();
        part.choose(DemoLab.TWO_PARTS, "P-OTTER", BoothSession.OutputKind.NONE, false);
        part.acknowledge();
        part.start();
        assertNotNull(part.session(), part.status());
        List<Integer> pressed = answerUntilEnd(part, false);
        assertEquals(SessionStatus.COMPLETED, part.lastEnd().status(), part.lastEnd().message());
        assertEquals(1, breaks, "break screens");
        List<JournalRow> rows = SessionFolder.open(part.lastEnd().folder()).readJournal().rows();
        assertEquals(6, rows.size());
        assertEquals(pressed.size(), rows.size());
        for (int i = 0; i < 6; i++) {
            assertEquals(i < 3 ? 1 : 2, rows.get(i).stepIndex(), "trial " + (i + 1));
        }
    }

    @Test
    void participantScreenIgnoresClosingAndKeysAndLeavesOnTheOperatorGesture() throws Exception {
        AtomicBoolean left = new AtomicBoolean();
        ParticipantScreen ps = new ParticipantScreen(display, display.getPrimaryMonitor(), () -> "2468",
                () -> left.set(true));
        try {
            AtomicInteger seenByWidgets = new AtomicInteger();
            ps.shell().addListener(SWT.KeyDown, e -> seenByWidgets.incrementAndGet());
            pump(200);
            ps.shell().forceActive();
            pump(100);

            ps.shell().close();
            pump(100);
            assertFalse(ps.shell().isDisposed(), "close() disposed the participant screen");
            assertTrue(ps.shell().isVisible());

            typeKey((char) SWT.ESC);
            typeWithModifiers(SWT.F4, '\0', SWT.ALT);
            typeWithModifiers('w', (char) 23, SWT.CTRL);
            typeWithModifiers('q', (char) 17, SWT.CTRL);
            post(SWT.KeyDown, '\t', SWT.TAB);
            post(SWT.KeyUp, '\t', SWT.TAB);
            pump(300);
            assertFalse(ps.shell().isDisposed());
            assertTrue(ps.shell().isVisible(), "a close key hid the screen");
            assertFalse(left.get());
            assertEquals(0, seenByWidgets.get(), "keys reached the screen's widgets (and would reach the workbench)");

            typeWithModifiers('q', 'Q', SWT.CTRL, SWT.ALT, SWT.SHIFT);
            pumpUntil(ps::pinPromptVisible, 3000, "the PIN prompt after the operator chord");
            for (char c : "1111".toCharArray()) {
                typeKey(c);
            }
            typeKey('\r');
            pump(300);
            assertTrue(ps.shell().isVisible(), "a wrong PIN left the screen");
            assertFalse(left.get());
            Screenshots.save(ps.shell(), "participant-pin-prompt");
            for (char c : "2468".toCharArray()) {
                typeKey(c);
            }
            typeKey('\r');
            pumpUntil(left::get, 3000, "leaving with the right PIN");
            assertFalse(ps.shell().isVisible());
        } finally {
            ps.dispose();
        }
    }

    /**
     * The workbench registers its key-binding dispatcher as a display filter at start-up, before any participant
     * screen exists, so it sees keys first. Here a real {@link KeyBindingDispatcher}, made by injection like the
     * workbench makes it and registered the same way (KeyDown and Traverse filters), stands in for the workbench; its
     * binding service counts every lookup. While the screen shows, no key may reach it; after the operator leaves
     * with the PIN it works again.
     */
    @Test
    void workbenchKeyBindingsDoNotReachTheParticipantScreen() throws Exception {
        AtomicInteger lookups = new AtomicInteger();
        IEclipseContext workbench = EclipseContextFactory.create("workbench-stand-in");
        workbench.set(EBindingService.class, (EBindingService) Proxy.newProxyInstance(getClass().getClassLoader(),
                new Class<?>[] { EBindingService.class }, (proxy, method, args) -> {
                    lookups.incrementAndGet();
                    return nothing(method.getReturnType());
                }));
        KeyBindingDispatcher dispatcher = ContextInjectionFactory.make(KeyBindingDispatcher.class, workbench);
        KeyBindingDispatcher.KeyDownFilter filter = dispatcher.getKeyDownFilter();
        display.addFilter(SWT.KeyDown, filter);
        display.addFilter(SWT.Traverse, filter);
        AtomicBoolean left = new AtomicBoolean();
        ParticipantScreen ps = null;
        try {
            shell.open();
            shell.forceActive();
            pump(100);
            typeWithModifiers('w', (char) 23, SWT.CTRL);
            pumpUntil(() -> lookups.get() > 0, 3000, "the stand-in dispatcher to see a key (else this test proves nothing)");

            ps = new ParticipantScreen(display, display.getPrimaryMonitor(), () -> "2468", () -> left.set(true));
            ps.holdWorkbenchKeys(filter);
            assertTrue(ps.holdsWorkbenchKeys());
            assertFalse(filter.isEnabled(), "the workbench's key filter is still on under the participant screen");
            pump(200);
            ps.shell().forceActive();
            pump(100);
            lookups.set(0);
            typeWithModifiers('w', (char) 23, SWT.CTRL);
            typeWithModifiers('q', (char) 17, SWT.CTRL);
            typeWithModifiers(SWT.F4, '\0', SWT.ALT);
            typeKey('1');
            typeKey((char) SWT.ESC);
            pump(300);
            assertEquals(0, lookups.get(), "keys typed on the participant screen reached the workbench's bindings");
            assertTrue(ps.shell().isVisible());

            typeWithModifiers('q', 'Q', SWT.CTRL, SWT.ALT, SWT.SHIFT);
            pumpUntil(ps::pinPromptVisible, 3000, "the PIN prompt after the operator chord");
            for (char c : "2468".toCharArray()) {
                typeKey(c);
            }
            typeKey('\r');
            pumpUntil(left::get, 3000, "leaving with the right PIN");
            assertTrue(filter.isEnabled(), "the workbench's keys stay off after the operator left");
            assertEquals(0, lookups.get(), "the PIN reached the workbench's bindings");

            ps.showAgain();
            assertFalse(filter.isEnabled(), "shown again, the screen must hold the workbench's keys again");
            ps.dispose();
            ps = null;
            assertTrue(filter.isEnabled(), "closing the screen must give the workbench its keys back");
            shell.forceActive();
            pump(100);
            typeWithModifiers('w', (char) 23, SWT.CTRL);
            pumpUntil(() -> lookups.get() > 0, 3000, "the workbench's bindings to work again after the screen closed");
        } finally {
            if (ps != null) {
                ps.dispose();
            }
            display.removeFilter(SWT.KeyDown, filter);
            display.removeFilter(SWT.Traverse, filter);
        }
    }

    /** The console passes the workbench's dispatcher (found in its context) to the participant screen. */
    @Test
    void consoleHoldsTheWorkbenchKeysWhileASessionRuns() throws Exception {
        IEclipseContext workbench = EclipseContextFactory.create("workbench-stand-in");
        KeyBindingDispatcher dispatcher = ContextInjectionFactory.make(KeyBindingDispatcher.class, workbench);
        context = workbench.createChild("booth-test");
        context.set(KeyBindingDispatcher.class, dispatcher);
        Composite host = new Composite(shell, SWT.NONE);
        context.set(Composite.class, host);
        OperatorConsolePart part = ContextInjectionFactory.make(OperatorConsolePart.class, context);
        shell.open();
        part.choose(DemoLab.BATTERY, "P-HERON", BoothSession.OutputKind.NONE, false);
        part.acknowledge();
        part.start();
        assertNotNull(part.session(), part.status());
        assertFalse(dispatcher.getKeyDownFilter().isEnabled(), "a running session left the workbench's keys on");
        part.screen().stop();
        pumpUntil(() -> part.lastEnd() != null, 30_000, "the stopped session to end");
        part.screen().dispose();
        assertTrue(dispatcher.getKeyDownFilter().isEnabled(), "the workbench's keys stay off after the session");
    }

    /**
     * A key pressed while the first interval sounds: with the step's default (IGNORE) it is counted but not taken,
     * the answer after the sound is recorded with a response time of zero or more; with RECORD it is the answer,
     * recorded with a negative response time (milliseconds before the end of the last interval).
     */
    @Test
    void earlyResponsesAreIgnoredOrRecordedAsTheStepSays() throws Exception {
        List<JournalRow> ignored = runPressingDuringTheSound(DemoLab.IGNORING, "P-HERON");
        assertEquals(3, ignored.size());
        for (JournalRow r : ignored) {
            assertTrue(r.responseMs() >= 0, "an early press was taken although the step ignores them: " + r);
        }
        List<JournalRow> recorded = runPressingDuringTheSound(DemoLab.EARLY, "P-EGRET");
        assertEquals(3, recorded.size());
        for (JournalRow r : recorded) {
            // pressed while interval 1 of 2 sounded: at least the second interval (0.4 s) before the end
            assertTrue(r.responseMs() < -300, "the early answer is not recorded as early: " + r);
            assertEquals(1, r.response(), "the early key was interval 1: " + r);
        }
    }

    private List<JournalRow> runPressingDuringTheSound(String batteryName, String participant) throws Exception {
        if (context != null) {
            context.dispose();
        }
        for (org.eclipse.swt.widgets.Control c : shell.getChildren()) {
            c.dispose();
        }
        OperatorConsolePart part = console();
        part.choose(batteryName, participant, BoothSession.OutputKind.NONE, true);
        part.acknowledge();
        part.start();
        assertNotNull(part.session(), part.status());
        ParticipantScreen ps = part.screen();
        ps.setFeedbackMillis(0);
        int early = 0;
        long until = System.currentTimeMillis() + 60_000;
        while (part.lastEnd() == null) {
            assertTrue(System.currentTimeMillis() < until, "the session did not end");
            if (!display.readAndDispatch()) {
                Thread.sleep(2);
            }
            if (ps.litInterval() == 0) {
                ps.keyPressed('1', '1', 0); // the screen's key handler (the posted-key path is tested above)
                early++;
                while (ps.litInterval() == 0 && System.currentTimeMillis() < until) {
                    if (!display.readAndDispatch()) {
                        Thread.sleep(2);
                    }
                }
            } else if (ps.acceptingAnswers() && ps.currentTrial() != null) {
                ps.keyPressed('2', '2', 0); // after the sound: taken when the early press was ignored
                pump(100);
            }
        }
        assertEquals(SessionStatus.COMPLETED, part.lastEnd().status(), part.lastEnd().message());
        assertEquals(3, early, "presses during the first interval");
        assertTrue(ps.earlyResponses() >= 3, "early presses counted: " + ps.earlyResponses());
        return SessionFolder.open(part.lastEnd().folder()).readJournal().rows();
    }

    private static Object nothing(Class<?> type) {
        if (type == boolean.class) {
            return false;
        }
        if (type == int.class) {
            return 0;
        }
        if (type == java.util.Collection.class || type == java.util.List.class) {
            return java.util.List.of();
        }
        if (type == java.util.Map.class) {
            return java.util.Map.of();
        }
        if (type == java.util.Set.class) {
            return java.util.Set.of();
        }
        return null;
    }

    /** The demo output, losing the device at a given play. */
    private static final class FailingOutput implements TrialOutput {
        private final NoOutput delegate = new NoOutput(false);
        private final int failAt;
        private int plays;

        FailingOutput(int failAt) {
            this.failAt = failAt;
        }

        @Override
        public void play(CheckedStimulus trial) throws DeviceLostException {
            if (++plays == failAt) {
                throw new DeviceLostException("test: the sound interface was unplugged");
            }
            delegate.play(trial);
        }

        @Override
        public String describe() {
            return "none (fails at play " + failAt + ")";
        }

        @Override
        public void close() {
            delegate.close();
        }
    }

    @Test
    void deviceLossPausesTheParticipantAndTellsTheOperator() throws Exception {
        OperatorConsolePart part = console();
        BoothSession.Loaded loaded = BoothSession.load(battery, null);
        SessionFolder folder = BoothSession.create(archive, loaded, "P-OTTER", 42L,
                new BoothSession.OutputChoice(BoothSession.OutputKind.NONE, null, null, false));
        part.launch(folder, new FailingOutput(4), false);
        List<Integer> pressed = answerUntilEnd(part, false);
        assertEquals(3, pressed.size());
        assertEquals(SessionStatus.INTERRUPTED, part.lastEnd().status());
        pump(200);
        assertTrue(part.status().contains("unplugged"), part.status());
        assertTrue(part.screen().message().contains("Short pause"), part.screen().message());
        assertFalse(part.screen().message().contains("unplugged"));
        Screenshots.save(part.screen().shell(), "participant-device-lost");
        Screenshots.print(shell.getChildren()[0], "console-device-lost");
        assertTrue(part.interruptedSessions().contains(folder.path()), part.interruptedSessions().toString());
        assertEquals(3, SessionFolder.open(folder.path()).readJournal().rows().size());
    }

    @Test
    void interruptedSessionIsResumedFromTheConsoleAndCompletes() throws Exception {
        BoothSession.Loaded loaded = BoothSession.load(battery, null);
        SessionFolder folder = BoothSession.create(archive, loaded, "P-FINCH", 7L,
                new BoothSession.OutputChoice(BoothSession.OutputKind.NONE, null, null, false));
        Responder alwaysRight = new Responder() {
            @Override
            public Response respond(TrialContext trial) {
                return new Response(Answer.interval(trial.plan().targetInterval()), 400);
            }
        };
        SessionStatusInfo first = SessionRunner.start(folder, new FailingOutput(6), alwaysRight,
                new BatteryTrialRenderer(CalibrationMapping.toSignal(folder.header().getCalibration())), null, false)
                .run();
        assertEquals(SessionStatus.INTERRUPTED, first.status());
        List<JournalRow> before = SessionFolder.open(folder.path()).readJournal().rows();
        assertEquals(5, before.size());

        OperatorConsolePart part = console();
        part.participantWarningFor("P-FINCH");
        assertTrue(part.participantWarning().contains("already has 1 session"), part.participantWarning());
        assertEquals(List.of(folder.path()), part.interruptedSessions());
        Screenshots.save(shell, "console-interrupted-list");
        part.resume(folder.path());
        assertNotNull(part.session(), part.status());
        answerUntilEnd(part, false);
        assertEquals(SessionStatus.COMPLETED, part.lastEnd().status(), part.lastEnd().message());
        List<JournalRow> after = SessionFolder.open(folder.path()).readJournal().rows();
        assertTrue(after.size() > before.size());
        assertEquals(before, after.subList(0, before.size()), "resuming changed the recorded trials");
        for (int i = 0; i < after.size(); i++) {
            assertEquals(i + 1, after.get(i).seq());
        }
        assertEquals(SessionStatus.COMPLETED, SessionFolder.open(folder.path()).header().getStatus());
        pump(200);
        assertTrue(part.interruptedSessions().isEmpty(), part.interruptedSessions().toString());
    }
}
