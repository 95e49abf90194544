package limen.session;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.SplittableRandom;

import limen.audio.DeviceLostException;
import limen.audio.TrialOutput;
import limen.model.AbsoluteLevel;
import limen.model.Level;
import limen.model.RelativeLevel;
import limen.model.SessionHeader;
import limen.model.SessionStatus;
import limen.model.Step;
import limen.model.Track;
import limen.procedure.AdaptiveTrack;
import limen.procedure.Answer;
import limen.procedure.Estimate;
import limen.procedure.Interleaver;
import limen.procedure.TrialOutcome;
import limen.procedure.TrialPlan;
import limen.session.build.BuiltTrack;
import limen.session.build.ProcedureBuilder;
import limen.session.journal.JournalContents;
import limen.session.journal.JournalReader;
import limen.session.journal.JournalRow;
import limen.session.journal.JournalWriter;
import limen.session.journal.SessionSeal;
import limen.signal.CheckedStimulus;
import limen.signal.Exposure;
import limen.signal.SafetyGuard;
import limen.signal.Stimulus;

/**
 * Runs one participant through a battery: orders the steps, builds each step's tracks, resolves levels
 * that refer to this participant's earlier results, interleaves the tracks, renders every trial through the
 * calibration's safety guard, plays it, takes the answer, and writes the trial to the journal (synced)
 * before the next trial starts.
 * <p>
 * Resuming after a crash rebuilds every procedure by replaying the journal: the same seeds drive the same
 * choices, and each recorded answer is fed back in order; a mismatch between the replay and the journal
 * (another battery, another seed, an edited journal) stops the resume with the sequence number.
 * <p>
 * Randomness: one session seed; every stream (track order, each track's procedure and task, the interleaver,
 * per-trial noise) is split from it in a fixed order, so a session is reproducible from its header.
 */
public final class SessionRunner {

    private final SessionFolder folder;
    private final SessionHeader header;
    private final TrialOutput output;
    private final Responder responder;
    private final TrialRenderer renderer;
    private final SessionControl control;
    private final List<SessionListener> listeners = new ArrayList<>();
    private final Clock clock;
    private final boolean realtime;
    private final SafetyGuard guard;
    private Exposure exposure = Exposure.none();
    private double peakDbSpl = Double.NEGATIVE_INFINITY;
    private final List<Double> turnaround = new ArrayList<>();
    private final java.util.concurrent.ExecutorService prefetcher = java.util.concurrent.Executors
            .newSingleThreadExecutor(r -> {
                Thread t = new Thread(r, "limen-trial-prefetch");
                t.setDaemon(true);
                return t;
            });

    private SessionRunner(SessionFolder folder, SessionHeader header, TrialOutput output, Responder responder,
            TrialRenderer renderer, SessionControl control, boolean realtime, Clock clock) {
        this.folder = folder;
        this.header = header;
        this.output = Objects.requireNonNull(output, "output");
        this.responder = Objects.requireNonNull(responder, "responder");
        this.renderer = Objects.requireNonNull(renderer, "renderer");
        this.control = control != null ? control : new SessionControl();
        this.realtime = realtime;
        this.clock = clock;
        this.guard = new SafetyGuard(CalibrationMapping.toSignal(header.getCalibration()));
    }

    /** A runner for a new session whose folder and header were just created. */
    public static SessionRunner start(SessionFolder folder, TrialOutput output, Responder responder,
            TrialRenderer renderer, SessionControl control, boolean realtime) {
        return new SessionRunner(folder, folder.header(), output, responder, renderer, control, realtime,
                Clock.systemUTC());
    }

    /** A runner that continues an interrupted session. */
    public static SessionRunner resume(SessionFolder folder, TrialOutput output, Responder responder,
            TrialRenderer renderer, SessionControl control, boolean realtime) {
        return start(folder, output, responder, renderer, control, realtime);
    }

    public SessionRunner addListener(SessionListener l) {
        listeners.add(l);
        return this;
    }

    public SessionControl control() {
        return control;
    }

    public SessionFolder folder() {
        return folder;
    }

    /**
     * Runs (or continues) the session to its end, an abort, or a device loss.
     *
     * @throws IOException when the journal or header cannot be written (nothing recorded is lost: every
     *                     trial before the failure is on disk)
     */
    public SessionStatusInfo run() throws IOException, InterruptedException {
        List<Step> order = new ArrayList<>(header.getStepOrder());
        JournalContents existing = folder.readJournal();
        List<JournalRow> recorded = existing.rows();
        long seed = header.getRandomSeed();
        SplittableRandom master = new SplittableRandom(seed);
        Map<String, Double> results = new HashMap<>();
        int replayed = 0;
        java.util.concurrent.Future<CheckedStimulus> prefetched = null;
        TrialPlan prefetchedPlan = null;
        long prefetchedSeq = -1;
        long answeredAt = 0;
        try (JournalWriter journal = folder.openJournalForAppend(existing)) {
            for (int s = 0; s < order.size(); s++) {
                Step step = order.get(s);
                SplittableRandom stepRng = master.split();
                List<AdaptiveTrack> tracks = new ArrayList<>();
                for (Track t : step.getTracks()) {
                    BuiltTrack built = ProcedureBuilder.build(step, t);
                    SplittableRandom procRng = stepRng.split();
                    SplittableRandom taskRng = stepRng.split();
                    tracks.add(new AdaptiveTrack(t.getName(), built.factory().create(procRng), built.task(), taskRng));
                }
                Interleaver interleaver = new Interleaver(tracks, stepRng.split());
                double standardLevel = resolveLevel(step, results);
                int trialInStep = 0;
                boolean announced = false;
                while (!interleaver.finished()) {
                    AdaptiveTrack track = tracks.get(interleaver.nextTrack());
                    TrialPlan plan = interleaver.nextTrial();
                    trialInStep++;
                    if (replayed < recorded.size()) {
                        JournalRow row = recorded.get(replayed++);
                        checkReplay(row, step, s + 1, track, plan);
                        // the header's exposure covers the whole session: re-render the replayed trial (same seed)
                        addExposure(renderChecked(step, plan, standardLevel, row.seq()));
                        interleaver.answer(new Answer(plan.forcedChoice() ? row.response() - 1 : row.response()));
                        continue;
                    }
                    if (!announced) {
                        announced = true;
                        int idx = s + 1;
                        listeners.forEach(l -> l.stepStarted(idx, order.size(), step));
                        Break pause = breakBefore(s);
                        if (pause != null && trialInStep == 1) {
                            responder.pauseForBreak(pause.message(), pause.minimumSeconds());
                        }
                    }
                    if (!control.awaitRunnable()) {
                        return finish(journal, SessionStatus.ABORTED, "aborted: " + control.reason());
                    }
                    CheckedStimulus sound;
                    if (prefetched != null && prefetchedPlan == plan && prefetchedSeq == journal.nextSeq()) {
                        sound = await(prefetched);
                    } else {
                        sound = renderChecked(step, plan, standardLevel, journal.nextSeq());
                    }
                    prefetched = null;
                    if (answeredAt != 0) {
                        turnaround.add((System.nanoTime() - answeredAt) / 1e6);
                        answeredAt = 0;
                    }
                    TrialContext ctx = new TrialContext(journal.nextSeq(), s + 1, order.size(), step, track.name(),
                            track.task(), plan, sound, trialInStep);
                    responder.trialStarting(ctx);
                    try {
                        output.play(sound);
                    } catch (DeviceLostException e) {
                        listeners.forEach(l -> l.deviceLost(e.getMessage()));
                        return finish(journal, SessionStatus.INTERRUPTED, "sound device lost: " + e.getMessage()
                                + "; every recorded trial is kept, resume the session when the device is back");
                    }
                    addExposure(sound);
                    Responder.Response response = responder.respond(ctx);
                    if (response == null) {
                        return finish(journal, SessionStatus.ABORTED, "aborted while waiting for an answer");
                    }
                    answeredAt = System.nanoTime();
                    TrialOutcome outcome = interleaver.answer(response.answer());
                    if (!interleaver.finished()) {
                        // render the next trial while this one is being synced to disk
                        TrialPlan next = interleaver.nextTrial();
                        long nextSeq = journal.nextSeq() + 1;
                        double level = standardLevel;
                        prefetchedPlan = next;
                        prefetchedSeq = nextSeq;
                        prefetched = prefetcher.submit(() -> renderChecked(step, next, level, nextSeq));
                    }
                    JournalRow row = journal.append(new JournalRow(journal.nextSeq(), Instant.now(clock), step.getId(),
                            s + 1, track.name(), plan.value(), unitOf(step), outcome.correct(),
                            journalResponse(plan, response.answer()), response.responseMs(), targetLevel(sound), journalTarget(plan),
                            plan.catchTrial(), ""));
                    if (step.getTask() != null && step.getTask().isFeedback()) {
                        responder.feedback(ctx, outcome.correct());
                    }
                    SessionListener.TrackState state = stateOf(track);
                    listeners.forEach(l -> l.trialRecorded(row, outcome, state));
                    if (realtime && step.getTask() != null) {
                        long sleptFrom = System.nanoTime();
                        Thread.sleep(Math.round(step.getTask().getInterTrialIntervalSeconds() * 1000));
                        answeredAt += System.nanoTime() - sleptFrom; // the designed interval does not count
                    }
                }
                double estimate = stepEstimate(tracks);
                results.put(step.getId(), estimate);
                if (announced) {
                    int idx = s + 1;
                    listeners.forEach(l -> l.stepFinished(idx, step, estimate));
                }
            }
            if (replayed < recorded.size()) {
                throw new IOException(folder.path() + ": the journal holds " + recorded.size()
                        + " trials but the battery ends after " + replayed + ": it belongs to another battery");
            }
            return finish(journal, SessionStatus.COMPLETED, "completed");
        }
    }

    private void addExposure(CheckedStimulus sound) {
        exposure = exposure.plus(Exposure.of(sound));
        for (int c = 0; c < 2; c++) {
            peakDbSpl = Math.max(peakDbSpl, sound.measuredLevelDbSpl(c));
        }
    }

    private CheckedStimulus renderChecked(Step step, TrialPlan plan, double standardLevel, long seq) {
        long trialSeed = new SplittableRandom(header.getRandomSeed() ^ (0x9E3779B97F4A7C15L * seq)).nextLong();
        Stimulus raw = renderer.render(step, plan, standardLevel, new SplittableRandom(trialSeed));
        return guard.check(raw);
    }

    private static CheckedStimulus await(java.util.concurrent.Future<CheckedStimulus> f) throws InterruptedException {
        try {
            return f.get();
        } catch (java.util.concurrent.ExecutionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            throw new IllegalStateException(e.getCause());
        }
    }

    /**
     * Milliseconds from each answer to the next trial's checked sound being ready to play (the designed
     * inter-trial interval excluded), for the trials of this run.
     */
    public List<Double> turnaroundMillis() {
        return List.copyOf(turnaround);
    }

    private SessionStatusInfo finish(JournalWriter journal, SessionStatus status, String message) throws IOException {
        prefetcher.shutdownNow();
        header.setEndTime(Instant.now(clock));
        header.setStatus(status);
        folder.recordExposure(exposure, peakDbSpl);
        if (status != SessionStatus.INTERRUPTED) {
            new SessionSeal(journal.nextSeq() - 1, journal.lastChecksum()).write(folder.path());
        }
        folder.saveHeader();
        SessionStatusInfo info = new SessionStatusInfo(folder.path(), status, journal.nextSeq() - 1, message);
        responder.finished(info);
        return info;
    }

    private record Break(String message, double minimumSeconds) {
    }

    private Break breakBefore(int stepPosition) {
        if (stepPosition == 0) {
            return null;
        }
        for (limen.model.Break b : header.getBattery().getBreaks()) {
            if (b.getAfterStepCount() == stepPosition) {
                return new Break(b.getMessage() == null ? "Take a short break." : b.getMessage(),
                        b.getMinimumDurationSeconds());
            }
        }
        return null;
    }

    private static void checkReplay(JournalRow row, Step step, int stepIndex, AdaptiveTrack track, TrialPlan plan)
            throws IOException {
        boolean same = row.step().equals(step.getId()) && row.stepIndex() == stepIndex
                && row.track().equals(track.name()) && Double.compare(row.value(), plan.value()) == 0
                && row.targetInterval() == journalTarget(plan) && row.catchTrial() == plan.catchTrial();
        if (!same) {
            throw new IOException("resume: trial " + row.seq() + " of the journal (step " + row.step() + ", track "
                    + row.track() + ", value " + row.value() + ") differs from the replay (step " + step.getId()
                    + ", track " + track.name() + ", value " + plan.value()
                    + "): the journal does not belong to this battery and seed");
        }
    }

    /** The standard level of a step, resolving a reference to an earlier step's result. */
    static double resolveLevel(Step step, Map<String, Double> results) {
        Level level = step.getStimulus() == null ? null : step.getStimulus().getStandardLevel();
        if (level instanceof AbsoluteLevel a) {
            return a.getLevelDbSpl();
        }
        if (level instanceof RelativeLevel r) {
            Step ref = r.getReference();
            Double base = ref == null ? null : results.get(ref.getId());
            if (base == null || base.isNaN()) {
                throw new IllegalStateException("step " + step.getId() + ": its level refers to step "
                        + (ref == null ? "(none)" : ref.getId()) + ", which has no result yet in this session");
            }
            return base + r.getOffsetDb();
        }
        return Double.NaN; // detection steps vary the level itself
    }

    private static double stepEstimate(List<AdaptiveTrack> tracks) {
        double sum = 0;
        int n = 0;
        for (AdaptiveTrack t : tracks) {
            Estimate e = t.procedure().estimate();
            if (e.available()) {
                sum += e.value();
                n++;
            }
        }
        return n == 0 ? Double.NaN : sum / n;
    }

    private static SessionListener.TrackState stateOf(AdaptiveTrack t) {
        Estimate e = t.procedure().estimate();
        return new SessionListener.TrackState(t.name(), t.procedure().trials(), t.procedure().reversals().size(),
                e.available() ? e.value() : Double.NaN, t.finished());
    }

    /** Journal convention: the target interval 1-based for nAFC, 0 for yes/no. */
    static int journalTarget(TrialPlan plan) {
        return plan.forcedChoice() ? plan.targetInterval() + 1 : 0;
    }

    /** Journal convention: the chosen interval 1-based for nAFC; 1 yes, 0 no for yes/no. */
    static int journalResponse(TrialPlan plan, Answer answer) {
        return plan.forcedChoice() ? answer.code() + 1 : answer.code();
    }

    private static String unitOf(Step step) {
        return step.getVariedQuantity() == null ? "" : step.getVariedQuantity().getUnit().getLiteral();
    }

    private static double targetLevel(CheckedStimulus sound) {
        double worst = Double.NEGATIVE_INFINITY;
        for (int c = 0; c < 2; c++) {
            worst = Math.max(worst, sound.measuredLevelDbSpl(c));
        }
        return Math.round(worst * 100) / 100.0;
    }
}
