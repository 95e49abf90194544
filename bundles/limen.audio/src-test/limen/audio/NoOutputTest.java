package limen.audio;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;

import limen.signal.CheckedStimulus;

/** The silent output: realtime waiting (only lower bounds on time are asserted), abort, closed state. */
class NoOutputTest {

    @Test
    void realtimeWaitsAtLeastAsLongAsTheSoundLasts() {
        CheckedStimulus trial = Trials.tone(1000, 60, 0.3, 1); // 14400 frames at 48 kHz = 0.3 s
        NoOutput out = new NoOutput(true);
        for (int i = 0; i < 3; i++) {
            long t0 = System.nanoTime();
            out.play(trial);
            long waited = System.nanoTime() - t0;
            assertTrue(waited >= 300_000_000L, "waited " + waited / 1e6 + " ms for a 300 ms trial");
        }
        assertTrue(out.describe().contains("realtime"), out.describe());
    }

    @Test
    void withoutRealtimeItDoesNotWaitForTheSound() {
        // a 20 s trial: returning well before 20 s shows no wait (a generous bound, not a timing measurement)
        CheckedStimulus trial = Trials.tone(500, 40, 20.0, 2);
        NoOutput out = new NoOutput(false);
        long t0 = System.nanoTime();
        out.play(trial);
        assertTrue(System.nanoTime() - t0 < 10_000_000_000L);
        assertFalse(out.realtime());
        assertTrue(out.describe().equals("none"), out.describe());
    }

    @Test
    void closeFromAnotherThreadEndsARealtimeWaitEarly() throws Exception {
        CheckedStimulus trial = Trials.tone(500, 40, 30.0, 3);
        NoOutput out = new NoOutput(true);
        CompletableFuture<Long> played = CompletableFuture.supplyAsync(() -> {
            long t0 = System.nanoTime();
            out.play(trial);
            return System.nanoTime() - t0;
        });
        Thread.sleep(200);
        out.close();
        long waited = played.get(20, TimeUnit.SECONDS); // would take 30 s without the abort
        assertTrue(waited < 30_000_000_000L, "waited " + waited / 1e6 + " ms");
        assertThrows(IllegalStateException.class, () -> out.play(trial));
    }
}
