package limen.ui.authoring.preview;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import limen.model.Step;
import limen.model.Track;
import limen.procedure.AdaptiveTrack;
import limen.procedure.Estimate;
import limen.procedure.ModelListener;
import limen.procedure.TrialOutcome;
import limen.procedure.sim.SimulatedStep;
import limen.procedure.sim.SimulatedTrack;
import limen.procedure.sim.Simulation;
import limen.psychometric.ListenerSpec;
import limen.session.build.BuiltTrack;
import limen.session.build.DefaultListeners;
import limen.session.build.ProcedureBuilder;

/**
 * A design simulation of one step, built exactly as {@code ./limen simulate} builds each step of a battery
 * ({@code limen.cli.SimulateCommand}): each track's procedure and task from {@link ProcedureBuilder}, its
 * model listener from the author's spec ({@link ListenerSpec}, guess rate from the task) or, without one,
 * {@link DefaultListeners}; then the core {@link Simulation}. So, for the same seed, runs and trial cap, the
 * numbers equal those of {@code ./limen simulate} on a battery holding this step alone (and, because the
 * simulation draws each step's randomness in battery order, those of the first step of any battery).
 *
 * @param listenerSpec the listener for every track, or blank for each track's default
 * @param falseAlarmRate the listener's yes rate on catch trials (its guess rate in yes/no tasks), in [0, 1)
 * @param driftSdPerTrial SD per trial of a random walk of the listener's location, &ge; 0
 * @param runs number of runs, &ge; 1
 * @param seed the master seed
 * @param threads worker threads, &ge; 1 (the numbers do not depend on it)
 * @param maxTrials trial cap per track and run, &ge; 1
 */
public record DesignRun(String listenerSpec, double falseAlarmRate, double driftSdPerTrial, int runs, long seed,
        int threads, int maxTrials) {

    /** The defaults of {@code ./limen simulate}: 200 runs, seed 1, cap 2000 trials, all cores. */
    public static DesignRun defaults(String listenerSpec) {
        return new DesignRun(listenerSpec, 0, 0, 200, 1, Runtime.getRuntime().availableProcessors(), 2000);
    }

    /** Checks the settings. */
    public DesignRun {
        if (runs < 1 || threads < 1 || maxTrials < 1) {
            throw new IllegalArgumentException("runs, threads and the trial cap must be >= 1, were " + runs + ", "
                    + threads + ", " + maxTrials);
        }
        if (!(falseAlarmRate >= 0 && falseAlarmRate < 1)) {
            throw new IllegalArgumentException("false-alarm rate must be in [0, 1), was " + falseAlarmRate);
        }
        if (!(driftSdPerTrial >= 0) || Double.isInfinite(driftSdPerTrial)) {
            throw new IllegalArgumentException("drift SD must be finite and >= 0, was " + driftSdPerTrial);
        }
    }

    /** @return the listener spec a track is simulated with (the author's, else the track's default) */
    public String listenerFor(Step step, Track track) {
        BuiltTrack built = ProcedureBuilder.build(step, track);
        double guess = ModelListener.guessFor(built.task(), falseAlarmRate);
        return listenerSpec == null || listenerSpec.isBlank() ? DefaultListeners.specFor(step, track, guess)
                : listenerSpec.trim();
    }

    /**
     * @return the step as the simulation runs it
     * @throws IllegalArgumentException naming the track and setting when it cannot be simulated, or the bad part
     *         of the listener spec
     */
    public SimulatedStep simulatedStep(Step step) {
        List<SimulatedTrack> tracks = new ArrayList<>();
        for (Track t : step.getTracks()) {
            BuiltTrack built = ProcedureBuilder.build(step, t);
            tracks.add(new SimulatedTrack(t.getName(), built.factory(), built.task(), listener(step, t, built)));
        }
        return new SimulatedStep(step.getId(), tracks);
    }

    private ModelListener listener(Step step, Track t, BuiltTrack built) {
        double guess = ModelListener.guessFor(built.task(), falseAlarmRate);
        String spec = listenerSpec == null || listenerSpec.isBlank() ? DefaultListeners.specFor(step, t, guess)
                : listenerSpec.trim();
        return new ModelListener(ListenerSpec.parse(spec, guess), driftSdPerTrial);
    }

    /** @return the core simulation of the step */
    public Simulation simulation(Step step) {
        return new Simulation(List.of(simulatedStep(step)), runs, seed, threads, maxTrials);
    }

    /**
     * One example of a track: the track run alone against its listener until its stopping rule ends it (or the
     * trial cap), every trial kept. Its generators come from {@code new SplittableRandom(seed)} split for the
     * procedure, the track and the listener in that order.
     *
     * @return the trials, oldest first, and the final estimate
     */
    public Example example(Step step, Track track, long exampleSeed) {
        BuiltTrack built = ProcedureBuilder.build(step, track);
        SplittableRandom root = new SplittableRandom(exampleSeed);
        AdaptiveTrack run = new AdaptiveTrack(track.getName(), built.factory().create(root.split()), built.task(),
                root.split());
        ModelListener.Run listener = listener(step, track, built).start(root.split());
        for (int n = 0; n < maxTrials && !run.finished(); n++) {
            run.answer(listener.answer(run.nextTrial()));
        }
        return new Example(track.getName(), run.history(), run.procedure().estimate(), !run.finished());
    }

    /**
     * @param track the track's name
     * @param trials every answered trial
     * @param estimate the procedure's final estimate
     * @param capped whether the trial cap ended it
     */
    public record Example(String track, List<TrialOutcome> trials, Estimate estimate, boolean capped) {
        /** Copies the list. */
        public Example {
            trials = List.copyOf(trials);
        }
    }
}
