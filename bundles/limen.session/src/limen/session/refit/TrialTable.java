package limen.session.refit;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import limen.model.SessionHeader;
import limen.session.journal.JournalRow;

/**
 * The tidy table of trials: one row per trial of a session (verified journal rows only), one column per
 * variable, with the session's identity repeated on every row so that tables of several sessions can be
 * stacked. A signal trial is marked as a reversal when it is one of its track's turning points
 * ({@link Reversals#indices} over the track's signal trials, the same rule as {@code ./limen refit}); catch
 * trials have {@code NA} there. Booleans are {@code 1}/{@code 0}, missing numbers {@code NA}.
 */
public final class TrialTable {

    /** The columns, in order. */
    public static final List<String> COLUMNS = List.of("session", "participant", "battery", "started", "integrity",
            "seq", "time", "step", "step_index", "track", "track_trial", "value", "unit", "correct", "response",
            "response_ms", "level_db_spl", "target_interval", "catch", "reversal");

    private TrialTable() {
    }

    /**
     * @param session   the session's folder name or path, as it should appear in the table
     * @param header    the session's header
     * @param integrity the journal's verdict
     * @param rows      the verified journal rows, in order
     * @return the rows, fields in {@link #COLUMNS} order
     */
    public static List<List<String>> rows(String session, SessionHeader header, String integrity, List<JournalRow> rows) {
        // reversals per track, over the signal trials only (as SessionTracks pools them)
        Map<String, List<Integer>> signalRows = new LinkedHashMap<>();
        for (int i = 0; i < rows.size(); i++) {
            JournalRow r = rows.get(i);
            if (!r.catchTrial()) {
                signalRows.computeIfAbsent(key(r), k -> new ArrayList<>()).add(i);
            }
        }
        boolean[] reversal = new boolean[rows.size()];
        for (List<Integer> idx : signalRows.values()) {
            double[] v = idx.stream().mapToDouble(i -> rows.get(i).value()).toArray();
            for (int turn : Reversals.indices(v)) {
                reversal[idx.get(turn)] = true;
            }
        }
        String participant = header.getParticipant() == null ? "" : header.getParticipant();
        String battery = header.getBattery() == null || header.getBattery().getTitle() == null ? "" : header.getBattery().getTitle();
        String started = header.getStartTime() == null ? "NA" : header.getStartTime().toString();
        Map<String, Integer> trialInTrack = new HashMap<>();
        List<List<String>> out = new ArrayList<>(rows.size());
        for (int i = 0; i < rows.size(); i++) {
            JournalRow r = rows.get(i);
            int n = trialInTrack.merge(key(r), 1, Integer::sum);
            List<String> f = new ArrayList<>(COLUMNS.size());
            f.add(session);
            f.add(participant);
            f.add(battery);
            f.add(started);
            f.add(integrity);
            f.add(Long.toString(r.seq()));
            f.add(r.time().toString());
            f.add(r.step());
            f.add(Integer.toString(r.stepIndex()));
            f.add(r.track());
            f.add(Integer.toString(n));
            f.add(RefitTable.num(r.value()));
            f.add(r.unit());
            f.add(r.correct() ? "1" : "0");
            f.add(Integer.toString(r.response()));
            f.add(RefitTable.num(r.responseMs()));
            f.add(RefitTable.num(r.levelDbSpl()));
            f.add(Integer.toString(r.targetInterval()));
            f.add(r.catchTrial() ? "1" : "0");
            f.add(r.catchTrial() ? "NA" : reversal[i] ? "1" : "0");
            out.add(f);
        }
        return out;
    }

    private static String key(JournalRow r) {
        return r.stepIndex() + "\u0000" + r.track();
    }
}
