package limen.session.refit;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import limen.fit.CancellationFlag;
import limen.fit.FitSettings;
import limen.fit.Progress;

/**
 * Refits many stored sessions on several worker threads and hands the results over one at a time in the
 * order of the folders given, so that a caller can stream them into a table. Sessions, not bootstrap
 * replicates, are the unit of parallel work here (a batch has many, and each carries its own reading,
 * verifying and fitting); when there are fewer sessions than threads the remaining threads go to each
 * bootstrap. At most {@link #window()} results are held or in work at once, so memory does not grow with the
 * archive.
 * <p>
 * Results do not depend on the number of threads: every track's bootstrap uses the settings' seed with one
 * generator per replicate ({@link limen.fit.BootstrapOptions}), exactly as {@link SessionRefitter} alone.
 */
public final class BatchRefitter {

    /** Receives each session's refit, in folder order, on the calling thread. */
    @FunctionalInterface
    public interface Sink {
        void accept(SessionRefit refit) throws IOException;
    }

    private final FitSettings settings;
    private final int threads;

    /**
     * @param threads worker threads in all (sessions in parallel, times bootstrap threads when sessions are
     *                fewer), &ge; 1
     */
    public BatchRefitter(FitSettings settings, int threads) {
        this.settings = Objects.requireNonNull(settings, "settings");
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be >= 1, was " + threads);
        }
        this.threads = threads;
    }

    /**
     * @return results held at most: {@value #WINDOW_PER_THREAD} per worker thread, so that one slow session (a
     *         near-step track whose replicates need the full search) does not leave the other workers idle
     *         while its row is awaited; each held result is a few tens of kilobytes
     */
    public int window() {
        return WINDOW_PER_THREAD * threads;
    }

    private static final int WINDOW_PER_THREAD = 16;

    /**
     * Refits {@code folders} and passes each result to {@code sink} in the same order.
     *
     * @throws IOException           from the sink (the remaining work is abandoned)
     * @throws CancellationException when {@code cancel} is set
     */
    public void refit(List<Path> folders, Sink sink, CancellationFlag cancel) throws IOException {
        int sessionWorkers = Math.max(1, Math.min(threads, folders.size()));
        SessionRefitter refitter = new SessionRefitter(settings.withThreads(Math.max(1, threads / sessionWorkers)));
        if (sessionWorkers == 1) {
            for (Path folder : folders) {
                checkCancelled(cancel);
                sink.accept(refitter.refit(folder, Progress.NONE, cancel));
            }
            return;
        }
        ExecutorService pool = Executors.newFixedThreadPool(sessionWorkers, r -> {
            Thread t = new Thread(r, "limen-refit-worker");
            t.setDaemon(true);
            return t;
        });
        ArrayDeque<Future<SessionRefit>> inFlight = new ArrayDeque<>();
        // set when we leave early (sink failure, cancellation): queued sessions are then not started, and
        // shutdownNow's interrupt stops the running bootstraps; the caller's flag is left alone
        CancellationFlag abandoned = new CancellationFlag();
        try {
            int next = 0;
            while (next < folders.size() || !inFlight.isEmpty()) {
                while (next < folders.size() && inFlight.size() < window()) {
                    Path folder = folders.get(next++);
                    inFlight.add(pool.submit(() -> {
                        checkCancelled(abandoned);
                        return refitter.refit(folder, Progress.NONE, cancel);
                    }));
                }
                SessionRefit r = take(inFlight.removeFirst());
                sink.accept(r);
            }
        } finally {
            abandoned.cancel();
            pool.shutdownNow();
        }
    }

    private static SessionRefit take(Future<SessionRefit> f) {
        try {
            return f.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new CancellationException("refit interrupted");
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException re) {
                throw re;
            }
            if (cause instanceof Error err) {
                throw err;
            }
            throw new IllegalStateException("refit worker failed: " + cause, cause);
        }
    }

    private static void checkCancelled(CancellationFlag cancel) {
        if (cancel.isCancelled()) {
            throw new CancellationException("refit cancelled");
        }
    }
}
