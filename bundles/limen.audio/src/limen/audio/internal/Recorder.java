package limen.audio.internal;

import java.io.ByteArrayOutputStream;
import java.util.Objects;

import javax.sound.sampled.TargetDataLine;

/**
 * Records from an open {@link TargetDataLine} on a background thread until {@link #stop()}: for the loopback
 * self-test, which starts recording before playback and stops after it.
 */
public final class Recorder {

    private final TargetDataLine line;
    private final ByteArrayOutputStream data = new ByteArrayOutputStream();
    private final Thread thread;
    private volatile boolean running;
    private volatile RuntimeException failure;
    private long startNanos;
    // (System.nanoTime() after a read, frames recorded up to then), one pair per read
    private long[] readNanos = new long[256];
    private long[] readFrames = new long[256];
    private int reads;

    /** @param line an open line; the recorder starts, stops and closes it */
    public Recorder(TargetDataLine line) {
        this.line = Objects.requireNonNull(line, "line");
        this.thread = new Thread(this::loop, "limen-capture");
        this.thread.setDaemon(true);
    }

    /** Starts the line and the reading thread. */
    public void start() {
        running = true;
        line.flush();
        startNanos = System.nanoTime();
        line.start();
        thread.start();
    }

    /** {@link System#nanoTime()} when the line was started. */
    public long startNanos() {
        return startNanos;
    }

    /**
     * Stops recording, closes the line and returns everything read.
     *
     * @throws IllegalStateException if reading failed
     */
    public byte[] stop() {
        running = false;
        line.stop();
        try {
            thread.join(5000);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        line.close();
        if (failure != null) {
            throw new IllegalStateException("capture failed: " + failure.getMessage(), failure);
        }
        synchronized (data) {
            return data.toByteArray();
        }
    }

    /**
     * When recorded frame {@code frame} was first available to this program: the {@link System#nanoTime()} at
     * which the first read that delivered it returned ({@code Long.MAX_VALUE} if none did). Later than the
     * moment the frame was captured by the capture path's delivery delay and at most one read's length (about
     * 5 ms).
     */
    public long frameArrivalNanos(long frame) {
        synchronized (data) {
            for (int j = 0; j < reads; j++) {
                if (readFrames[j] > frame) {
                    return readNanos[j];
                }
            }
        }
        return Long.MAX_VALUE;
    }

    private void note(long nanos, long frames) {
        if (reads == readNanos.length) {
            readNanos = java.util.Arrays.copyOf(readNanos, 2 * reads);
            readFrames = java.util.Arrays.copyOf(readFrames, 2 * reads);
        }
        readNanos[reads] = nanos;
        readFrames[reads] = frames;
        reads++;
    }

    private void loop() {
        int frame = line.getFormat().getFrameSize();
        // read in pieces of about 5 ms: fine arrival times, and stop() is honoured promptly
        int chunk = Math.max(frame, (int) (line.getFormat().getFrameRate() / 200) * frame);
        byte[] buf = new byte[chunk];
        try {
            while (running) {
                int n = line.read(buf, 0, buf.length);
                if (n > 0) {
                    long now = System.nanoTime();
                    synchronized (data) {
                        data.write(buf, 0, n);
                        note(now, data.size() / frame);
                    }
                } else if (running) {
                    Thread.sleep(5); // nothing yet (or the source is gone): don't spin
                }
            }
            // what the line still holds after stop()
            int left;
            while ((left = Math.min(line.available(), buf.length)) >= frame) {
                int n = line.read(buf, 0, left - left % frame);
                if (n <= 0) {
                    break;
                }
                synchronized (data) {
                    data.write(buf, 0, n);
                }
            }
        } catch (RuntimeException e) {
            failure = e;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
