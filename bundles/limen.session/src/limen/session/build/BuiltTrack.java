package limen.session.build;

import java.util.Objects;

import limen.procedure.Axis;
import limen.procedure.ProcedureFactory;
import limen.procedure.Task;

/**
 * A battery track mapped onto the procedures bundle: what a runner or a simulation needs to run it.
 *
 * @param stepId    the step's id
 * @param trackName the track's name
 * @param factory   creates the track's procedure (presenting values in the quantity's unit)
 * @param task      the task, with catch trials for yes/no
 * @param axis      the axis of model-based procedures (their uncertainties are in its units)
 * @param guessRate the guess rate the procedure assumes (1/n for nAFC, the set or default rate otherwise)
 */
public record BuiltTrack(String stepId, String trackName, ProcedureFactory factory, Task task, Axis axis, double guessRate) {

    public BuiltTrack {
        Objects.requireNonNull(stepId, "stepId");
        Objects.requireNonNull(trackName, "trackName");
        Objects.requireNonNull(factory, "factory");
        Objects.requireNonNull(task, "task");
        Objects.requireNonNull(axis, "axis");
    }
}
