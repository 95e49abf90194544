package limen.session.journal;

import java.time.Instant;
import java.util.List;
import java.util.Locale;

/**
 * One trial as written to {@code trials.csv}: what was presented, what the listener answered, and the
 * running checksum that chains this row to the one before it.
 *
 * @param seq            1-based trial number within the session
 * @param time           when the response was recorded (UTC)
 * @param step           the step's identifier in the battery
 * @param stepIndex      1-based position of the step in this participant's order
 * @param track          the track's name within the step
 * @param value          the varied quantity presented, in {@code unit}
 * @param unit           unit of {@code value} (e.g. {@code Hz}, {@code percent}, {@code dB}, {@code dB SPL})
 * @param correct        whether the answer was correct (for a yes/no catch trial: whether the listener said no)
 * @param response       the answer code: the chosen interval (1-based) for nAFC, 1 yes / 0 no for yes/no
 * @param responseMs     response time in milliseconds from the end of the last interval (negative: early)
 * @param levelDbSpl     the rendered level of the target in dB SPL
 * @param targetInterval the interval that held the target (1-based), 0 for yes/no
 * @param catchTrial     whether this was a catch trial (no signal)
 * @param checksum       hex digest chaining this row to the previous one (see {@link Journal#chain})
 */
public record JournalRow(long seq, Instant time, String step, int stepIndex, String track, double value,
        String unit, boolean correct, int response, double responseMs, double levelDbSpl, int targetInterval,
        boolean catchTrial, String checksum) {

    /** The header line of {@code trials.csv}. */
    public static final List<String> COLUMNS = List.of("seq", "time", "step", "track", "value", "correct",
            "response", "response_ms", "level_db_spl", "target_interval", "catch", "step_index", "unit", "checksum");

    /** The fields in {@link #COLUMNS} order, without the checksum (the text the checksum covers). */
    List<String> payloadFields() {
        return List.of(Long.toString(seq), time.toString(), step, track, number(value), correct ? "1" : "0",
                Integer.toString(response), number(responseMs), number(levelDbSpl), Integer.toString(targetInterval),
                catchTrial ? "1" : "0", Integer.toString(stepIndex), unit);
    }

    /** A copy with the given checksum. */
    public JournalRow withChecksum(String newChecksum) {
        return new JournalRow(seq, time, step, stepIndex, track, value, unit, correct, response, responseMs,
                levelDbSpl, targetInterval, catchTrial, newChecksum);
    }

    static String number(double v) {
        if (Double.isNaN(v)) {
            return "";
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        // shortest repr that round-trips exactly
        return Double.toString(v).toLowerCase(Locale.ROOT);
    }
}
