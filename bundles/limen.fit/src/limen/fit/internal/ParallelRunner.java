package limen.fit.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.IntConsumer;

import limen.fit.CancellationFlag;
import limen.fit.Progress;

/**
 * Runs numbered, independent work items on a fixed number of daemon threads. Each item writes only its own
 * slot of the caller's result arrays, so the outcome is independent of scheduling. Checks a cancellation
 * flag (and thread interruption) between items.
 */
public final class ParallelRunner {

    private final int threads;
    private final Progress progress;
    private final CancellationFlag cancel;
    private final AtomicLong done = new AtomicLong();
    private final long total;

    /**
     * @param total the number of items over all {@link #run} calls, for progress reports
     */
    public ParallelRunner(int threads, Progress progress, CancellationFlag cancel, long total) {
        this.threads = threads;
        this.progress = progress;
        this.cancel = cancel;
        this.total = total;
    }

    /**
     * Runs {@code task} for items 0..count-1.
     *
     * @throws CancellationException when cancelled before all items ran
     */
    public void run(int count, IntConsumer task) {
        if (count == 0) {
            return;
        }
        AtomicInteger next = new AtomicInteger();
        int workers = Math.min(threads, count);
        Runnable worker = () -> {
            for (int i; !stopRequested() && (i = next.getAndIncrement()) < count;) {
                task.accept(i);
                progress.update(done.incrementAndGet(), total);
            }
        };
        if (workers == 1) {
            worker.run();
        } else {
            ExecutorService pool = Executors.newFixedThreadPool(workers, r -> {
                Thread t = new Thread(r, "limen-fit-worker");
                t.setDaemon(true);
                return t;
            });
            try {
                List<Future<?>> futures = new ArrayList<>();
                for (int w = 0; w < workers; w++) {
                    futures.add(pool.submit(worker));
                }
                for (Future<?> f : futures) {
                    f.get();
                }
            } catch (InterruptedException e) {
                cancel.cancel();
                Thread.currentThread().interrupt();
            } catch (ExecutionException e) {
                Throwable cause = e.getCause();
                if (cause instanceof RuntimeException re) {
                    throw re;
                }
                throw new IllegalStateException("bootstrap worker failed: " + cause, cause);
            } finally {
                pool.shutdownNow();
            }
        }
        if (stopRequested()) {
            throw new CancellationException("cancelled after " + done.get() + " of " + total + " refits");
        }
    }

    private boolean stopRequested() {
        return cancel.isCancelled() || Thread.currentThread().isInterrupted();
    }
}
