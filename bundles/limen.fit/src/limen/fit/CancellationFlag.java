package limen.fit;

import java.util.concurrent.atomic.AtomicBoolean;

/**
 * A flag by which a caller (a UI's cancel button, a signal handler) asks a running computation to stop. The
 * computation checks it between units of work and then throws
 * {@link java.util.concurrent.CancellationException}. Thread-safe; one flag can be shared by several
 * computations.
 */
public final class CancellationFlag {

    private final AtomicBoolean cancelled = new AtomicBoolean();

    /** Asks every computation watching this flag to stop. Idempotent. */
    public void cancel() {
        cancelled.set(true);
    }

    public boolean isCancelled() {
        return cancelled.get();
    }

    @Override
    public String toString() {
        return isCancelled() ? "CancellationFlag[cancelled]" : "CancellationFlag[running]";
    }
}
