package limen.procedure;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Objects;
import java.util.random.RandomGenerator;

/**
 * A procedure bound to a task: turns the procedure's next value into a {@link TrialPlan} (drawing
 * the target interval, or whether this is a catch trial), scores answers and feeds signal trials to
 * the procedure. Catch trials do not reach the procedure; their false alarms are counted here.
 * <p>
 * Deterministic given its generator: rebuilding with an equally seeded generator and the same
 * answers ({@link #replay}) gives the same state. Not thread-safe.
 */
public final class AdaptiveTrack {

    private final String name;
    private final AdaptiveProcedure procedure;
    private final Task task;
    private final RandomGenerator rng;
    private final List<TrialOutcome> history = new ArrayList<>();
    private TrialPlan pending;
    private int catchTrials;
    private int falseAlarms;

    /**
     * @param name      the track's name (for reports)
     * @param procedure a fresh procedure
     * @param task      the task
     * @param rng       the generator for target intervals and catch trials
     */
    public AdaptiveTrack(String name, AdaptiveProcedure procedure, Task task, RandomGenerator rng) {
        this.name = Objects.requireNonNull(name, "name");
        this.procedure = Objects.requireNonNull(procedure, "procedure");
        this.task = Objects.requireNonNull(task, "task");
        this.rng = Objects.requireNonNull(rng, "rng");
    }

    /**
     * Rebuilds a track from its answers.
     *
     * @param factory the procedure's factory
     * @param procedureRng a generator in the original procedure generator's initial state
     * @param trackRng a generator in the original track generator's initial state
     * @param answers the answers in order
     */
    public static AdaptiveTrack replay(String name, ProcedureFactory factory, RandomGenerator procedureRng, Task task,
            RandomGenerator trackRng, List<Answer> answers) {
        AdaptiveTrack t = new AdaptiveTrack(name, factory.create(procedureRng), task, trackRng);
        for (Answer a : answers) {
            t.nextTrial();
            t.answer(a);
        }
        return t;
    }

    public String name() {
        return name;
    }

    public AdaptiveProcedure procedure() {
        return procedure;
    }

    public Task task() {
        return task;
    }

    /** @return true when the procedure is finished */
    public boolean finished() {
        return procedure.finished();
    }

    /** @return the plan of the next trial; the same until it is answered */
    public TrialPlan nextTrial() {
        if (pending == null) {
            pending = task.plan(procedure.nextValue(), rng);
        }
        return pending;
    }

    /**
     * Answers the pending trial.
     *
     * @return the scored outcome
     * @throws IllegalStateException when no trial is pending
     */
    public TrialOutcome answer(Answer answer) {
        if (pending == null) {
            throw new IllegalStateException("track " + name + ": no trial pending; call nextTrial() first");
        }
        TrialPlan plan = pending;
        boolean correct = task.isCorrect(plan, answer);
        pending = null;
        TrialOutcome outcome = new TrialOutcome(plan, answer, correct);
        history.add(outcome);
        if (plan.catchTrial()) {
            catchTrials++;
            if (answer.yes()) {
                falseAlarms++;
            }
        } else {
            procedure.record(plan.value(), correct);
        }
        return outcome;
    }

    /** @return all answered trials including catch trials, oldest first (unmodifiable) */
    public List<TrialOutcome> history() {
        return Collections.unmodifiableList(history);
    }

    public int catchTrials() {
        return catchTrials;
    }

    public int falseAlarms() {
        return falseAlarms;
    }

    /** @return false alarms / catch trials, NaN without catch trials */
    public double falseAlarmRate() {
        return catchTrials == 0 ? Double.NaN : (double) falseAlarms / catchTrials;
    }
}
