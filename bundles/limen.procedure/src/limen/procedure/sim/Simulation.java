package limen.procedure.sim;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;

import limen.procedure.AdaptiveProcedure;
import limen.procedure.AdaptiveTrack;
import limen.procedure.Estimate;
import limen.procedure.Interleaver;
import limen.procedure.ModelListener;
import limen.procedure.Target;
import limen.procedure.TrialPlan;
import limen.psychometric.PsychometricFunction;

/**
 * Design-time Monte Carlo simulation: runs a battery's steps (each step's tracks randomly
 * interleaved) against model listeners many times, on several threads.
 * <p>
 * Run r draws everything from {@code new SplittableRandom(runSeed(masterSeed, r))}, split in a fixed
 * order into the interleaver's generator and, per track, the procedure's, the track's and the
 * listener's generators; so the rows do not depend on the number of threads. Immutable settings;
 * {@link #run} may be called from any thread.
 */
public final class Simulation {

    private final List<SimulatedStep> steps;
    private final int runs;
    private final long masterSeed;
    private final int threads;
    private final int maxTrialsPerTrack;

    /**
     * @param steps             the steps in battery order
     * @param runs              number of runs, &ge; 1
     * @param masterSeed        the seed all run seeds derive from
     * @param threads           worker threads, &ge; 1 (e.g. the number of cores)
     * @param maxTrialsPerTrack trial cap per track and run: a step ends after this many trials times its number of
     *                          tracks, and its unfinished tracks are reported as capped
     */
    public Simulation(List<SimulatedStep> steps, int runs, long masterSeed, int threads, int maxTrialsPerTrack) {
        this.steps = List.copyOf(steps);
        if (this.steps.isEmpty()) {
            throw new IllegalArgumentException("nothing to simulate: no steps");
        }
        if (runs < 1 || threads < 1 || maxTrialsPerTrack < 1) {
            throw new IllegalArgumentException("runs, threads and the trial cap must be >= 1, were " + runs + ", " + threads
                    + ", " + maxTrialsPerTrack);
        }
        this.runs = runs;
        this.masterSeed = masterSeed;
        this.threads = threads;
        this.maxTrialsPerTrack = maxTrialsPerTrack;
    }

    /** @return the seed of run r: the SplitMix64 finaliser of masterSeed + (r + 1)·0x9E3779B97F4A7C15 */
    public static long runSeed(long masterSeed, int run) {
        long z = masterSeed + (run + 1L) * 0x9E3779B97F4A7C15L;
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    /**
     * Runs the simulation.
     *
     * @param progress called after each run (from worker threads)
     * @param cancel   set to true to stop early; runs in progress finish, no new ones start
     * @return rows and summaries (of the completed runs when cancelled)
     */
    public SimulationResult run(SimulationProgress progress, AtomicBoolean cancel) {
        Objects.requireNonNull(progress, "progress");
        Objects.requireNonNull(cancel, "cancel");
        @SuppressWarnings("unchecked")
        List<RunRow>[] perRun = new List[runs];
        Target[][] targets = new Target[steps.size()][];
        for (int s = 0; s < steps.size(); s++) {
            targets[s] = new Target[steps.get(s).tracks().size()];
        }
        AtomicInteger next = new AtomicInteger();
        AtomicInteger done = new AtomicInteger();
        int workers = Math.min(threads, runs);
        ExecutorService pool = Executors.newFixedThreadPool(workers, r -> {
            Thread t = new Thread(r, "limen-simulation");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<?>> futures = new ArrayList<>();
            for (int w = 0; w < workers; w++) {
                futures.add(pool.submit(() -> {
                    int r;
                    while (!cancel.get() && (r = next.getAndIncrement()) < runs) {
                        perRun[r] = runOnce(r, targets);
                        progress.completed(done.incrementAndGet(), runs);
                    }
                }));
            }
            for (Future<?> f : futures) {
                f.get();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            cancel.set(true);
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException re) {
                throw re;
            }
            throw new IllegalStateException("simulation failed: " + cause, cause);
        } finally {
            pool.shutdownNow();
        }
        List<RunRow> rows = new ArrayList<>();
        for (List<RunRow> l : perRun) {
            if (l != null) {
                rows.addAll(l);
            }
        }
        return new SimulationResult(rows, summarise(rows, targets), cancel.get(), masterSeed);
    }

    /** Simulates run r alone (the same rows {@link #run} gives for it). */
    public List<RunRow> runOnce(int r) {
        Target[][] targets = new Target[steps.size()][];
        for (int s = 0; s < steps.size(); s++) {
            targets[s] = new Target[steps.get(s).tracks().size()];
        }
        return runOnce(r, targets);
    }

    private List<RunRow> runOnce(int r, Target[][] targets) {
        SplittableRandom root = new SplittableRandom(runSeed(masterSeed, r));
        List<RunRow> rows = new ArrayList<>();
        for (int s = 0; s < steps.size(); s++) {
            SimulatedStep step = steps.get(s);
            SplittableRandom interleaveRng = root.split();
            List<AdaptiveTrack> tracks = new ArrayList<>();
            List<ModelListener.Run> listeners = new ArrayList<>();
            for (SimulatedTrack t : step.tracks()) {
                AdaptiveProcedure p = t.factory().create(root.split());
                tracks.add(new AdaptiveTrack(t.name(), p, t.task(), root.split()));
                listeners.add(t.listener().start(root.split()));
            }
            Interleaver il = new Interleaver(tracks, interleaveRng);
            // The cap applies to the step as a whole, so interleaving stays unbiased until it bites.
            long cap = (long) maxTrialsPerTrack * tracks.size();
            long presented = 0;
            while (!il.finished() && presented < cap) {
                int i = il.nextTrack();
                TrialPlan plan = il.nextTrial();
                il.answer(listeners.get(i).answer(plan));
                presented++;
            }
            boolean[] capped = new boolean[tracks.size()];
            for (int i = 0; i < tracks.size(); i++) {
                capped[i] = !tracks.get(i).finished();
            }
            for (int i = 0; i < tracks.size(); i++) {
                AdaptiveTrack t = tracks.get(i);
                AdaptiveProcedure p = t.procedure();
                synchronized (targets) {
                    if (targets[s][i] == null) {
                        targets[s][i] = p.target();
                    }
                }
                Estimate e = p.estimate();
                rows.add(new RunRow(r, step.name(), t.name(), e.value(), e.uncertainty(), p.trials(), p.reversals().size(),
                        t.catchTrials(), t.falseAlarms(), capped[i]));
            }
        }
        return rows;
    }

    private List<TrackSummary> summarise(List<RunRow> rows, Target[][] targets) {
        List<TrackSummary> out = new ArrayList<>();
        for (int s = 0; s < steps.size(); s++) {
            SimulatedStep step = steps.get(s);
            for (int i = 0; i < step.tracks().size(); i++) {
                SimulatedTrack t = step.tracks().get(i);
                Target target = targets[s][i];
                List<RunRow> mine = new ArrayList<>();
                for (RunRow row : rows) {
                    if (row.step().equals(step.name()) && row.track().equals(t.name())) {
                        mine.add(row);
                    }
                }
                out.add(summary(step.name(), t, target, mine));
            }
        }
        return out;
    }

    static TrackSummary summary(String step, SimulatedTrack t, Target target, List<RunRow> rows) {
        int n = 0;
        int missing = 0;
        int capped = 0;
        double sum = 0;
        double trials = 0;
        for (RunRow r : rows) {
            capped += r.capped() ? 1 : 0;
            if (Double.isNaN(r.estimate())) {
                missing++;
                continue;
            }
            n++;
            sum += r.estimate();
            trials += r.trials();
        }
        double mean = n == 0 ? Double.NaN : sum / n;
        double ss = 0;
        for (RunRow r : rows) {
            if (!Double.isNaN(r.estimate())) {
                ss += (r.estimate() - mean) * (r.estimate() - mean);
            }
        }
        double sd = n > 1 ? Math.sqrt(ss / (n - 1)) : Double.NaN;
        double meanTrials = n == 0 ? Double.NaN : trials / n;
        double truth = Double.NaN;
        double ideal = Double.NaN;
        if (target != null) {
            PsychometricFunction f = t.listener().function();
            try {
                truth = target.valueOn(f);
                ideal = idealSweatFactor(f, truth);
            } catch (IllegalArgumentException e) {
                truth = Double.NaN; // the target lies outside this listener's range (γ, 1 − λ)
            }
        }
        double k = sd * sd * meanTrials;
        return new TrackSummary(step, t.name(), target, n, missing, capped, truth, mean, mean - truth, sd, meanTrials, k,
                ideal, ideal / k);
    }

    /**
     * @return K_ideal = ψ(x)(1 − ψ(x)) / ψ'(x)², the inverse Fisher information per trial at x
     *         (Taylor &amp; Creelman 1967's ideal sweat factor)
     */
    public static double idealSweatFactor(PsychometricFunction f, double x) {
        double p = f.psi(x);
        double d = f.psiDerivative(x);
        return p * (1 - p) / (d * d);
    }
}
