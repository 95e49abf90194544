package limen.procedure.sim;

import java.util.List;

/**
 * Per-run rows (ordered by run, then step and track order) and per-track summaries.
 *
 * @param rows      one row per completed run and track
 * @param summaries one per track, in battery order
 * @param cancelled true when the simulation was cancelled (rows then cover the completed runs only)
 * @param masterSeed the seed the run seeds were derived from
 */
public record SimulationResult(List<RunRow> rows, List<TrackSummary> summaries, boolean cancelled, long masterSeed) {

    public SimulationResult {
        rows = List.copyOf(rows);
        summaries = List.copyOf(summaries);
    }
}
