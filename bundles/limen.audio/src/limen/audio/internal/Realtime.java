package limen.audio.internal;

/**
 * Waiting until a point on the {@link System#nanoTime()} clock, for outputs that take as long as the sound
 * would. Sleeps in a loop because {@link Thread#sleep} may wake early; never returns before the deadline
 * unless interrupted.
 */
public final class Realtime {

    private Realtime() {
    }

    /** Nanoseconds a buffer of {@code frames} frames lasts at {@code sampleRateHz}: {@code frames·10⁹/fs}. */
    public static long durationNanos(int frames, int sampleRateHz) {
        return Math.round(frames * 1e9 / sampleRateHz);
    }

    /**
     * Sleeps until {@code System.nanoTime() >= deadlineNanos}.
     *
     * @return {@code true} if the deadline was reached, {@code false} if the thread was interrupted (the
     *         interrupt flag is set again so the caller's loop sees the abort)
     */
    public static boolean sleepUntil(long deadlineNanos) {
        while (true) {
            long left = deadlineNanos - System.nanoTime();
            if (left <= 0) {
                return true;
            }
            try {
                Thread.sleep(left / 1_000_000, (int) (left % 1_000_000));
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                return false;
            }
        }
    }
}
