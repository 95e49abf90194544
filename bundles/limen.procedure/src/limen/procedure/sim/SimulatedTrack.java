package limen.procedure.sim;

import java.util.Objects;

import limen.procedure.ModelListener;
import limen.procedure.ProcedureFactory;
import limen.procedure.Task;

/**
 * One track to simulate: its procedure, its task and the model listener that answers it.
 *
 * @param name     the track's name
 * @param factory  creates the track's procedure
 * @param task     the task
 * @param listener the simulated listener (its guess rate should match the task)
 */
public record SimulatedTrack(String name, ProcedureFactory factory, Task task, ModelListener listener) {

    public SimulatedTrack {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(factory, "factory");
        Objects.requireNonNull(task, "task");
        Objects.requireNonNull(listener, "listener");
    }
}
