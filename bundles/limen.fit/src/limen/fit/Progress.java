package limen.fit;

/**
 * Receives progress of long computations (bootstrap, goodness of fit). Called from worker threads, possibly
 * concurrently: implementations must be thread-safe and quick.
 */
@FunctionalInterface
public interface Progress {

    /** Ignores all updates. */
    Progress NONE = (done, total) -> {
    };

    /**
     * @param done  units of work completed so far (non-decreasing per computation, may arrive out of order
     *              between threads)
     * @param total units of work of the whole computation
     */
    void update(long done, long total);
}
