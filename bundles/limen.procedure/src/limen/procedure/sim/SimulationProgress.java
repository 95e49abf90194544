package limen.procedure.sim;

/** Receives progress from a running simulation (from worker threads: implementations must be thread-safe). */
@FunctionalInterface
public interface SimulationProgress {

    /** Called after each completed run. */
    void completed(int runsDone, int runsTotal);

    /** @return a listener that ignores progress */
    static SimulationProgress none() {
        return (done, total) -> {
        };
    }
}
