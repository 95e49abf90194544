package limen.procedure;

/**
 * What a {@link ProcedureKind} learns of the track besides its own settings.
 *
 * @param task the task (nAFC with its interval count, or yes/no)
 * @param axis where an axis-based procedure (QUEST, Psi, ...) places its grids: the value or 20 log10 of it
 * @param guessRate the guess rate γ in [0, 1): the settings' {@code guessRate} when given, else the task's
 *        chance rate (1/n for nAFC, 0 for yes/no)
 * @param stopRule when the track ends (any of the criteria set; {@link StopRule#never()} for a kind that
 *        {@linkplain ProcedureKind#endsByItself() ends by itself} and was given none)
 */
public record ProcedureContext(Task task, Axis axis, double guessRate, StopRule stopRule) {

    /** Validates the values. */
    public ProcedureContext {
        if (task == null || axis == null || stopRule == null) {
            throw new IllegalArgumentException("task, axis and stop rule must be given");
        }
        if (!(guessRate >= 0 && guessRate < 1)) {
            throw new IllegalArgumentException("guess rate must be in [0, 1), was " + guessRate);
        }
    }
}
