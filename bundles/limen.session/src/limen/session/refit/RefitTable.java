package limen.session.refit;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import limen.fit.BootstrapResult;
import limen.fit.ConfidenceInterval;
import limen.fit.FitResult;
import limen.fit.FitSettings;
import limen.psychometric.PsychometricFunction;

/**
 * The tidy table of refits: one row per session, step and track (one row with empty step and track for a
 * skipped session), RFC 4180 CSV with a header, {@code NA} for missing numbers, so that R's
 * {@code read.csv} and pandas' {@code read_csv} read it unchanged. Used by {@code ./limen refit} and the
 * workbench so that both write the same columns.
 */
public final class RefitTable {

    /** The columns, in order. */
    public static final List<String> COLUMNS = List.of("session", "participant", "battery", "started", "session_status",
            "integrity", "step", "step_index", "track", "unit", "outcome", "function", "guess", "lapse", "location",
            "spread", "threshold", "threshold_lo", "threshold_hi", "slope", "slope_lo", "slope_hi", "target",
            "threshold_f", "loglik", "deviance", "gof_p", "trials", "cells", "catch_trials", "catch_yes",
            "reversal_count", "reversal_mean", "reversal_sd", "reversal_scale", "bootstrap", "seed", "ci_method", "level",
            "excluded", "settings", "message");

    private final FitSettings settings;

    public RefitTable(FitSettings settings) {
        this.settings = settings;
    }

    /** Writes the header line. */
    public void writeHeader(Appendable out) throws IOException {
        writeRecord(out, COLUMNS);
    }

    /** Writes the rows of one session (one row per track, or one row for a skipped session). */
    public void write(Appendable out, SessionRefit s) throws IOException {
        for (List<String> r : rows(s)) {
            writeRecord(out, r);
        }
    }

    /** @return the session's rows as fields in {@link #COLUMNS} order */
    public List<List<String>> rows(SessionRefit s) {
        List<List<String>> out = new ArrayList<>();
        if (s.skipped() || s.tracks().isEmpty()) {
            List<String> r = sessionPart(s);
            for (int i = r.size(); i < COLUMNS.size() - 2; i++) {
                r.add(COLUMNS.get(i).equals("outcome") ? (s.skipped() ? "skipped" : "no_trials") : "");
            }
            r.add(settings.toString());
            r.add(s.problem());
            out.add(r);
            return out;
        }
        for (TrackFit t : s.tracks()) {
            out.add(row(s, t));
        }
        return out;
    }

    private static List<String> sessionPart(SessionRefit s) {
        List<String> r = new ArrayList<>();
        r.add(s.folder().toString());
        r.add(s.participant());
        r.add(s.battery());
        r.add(s.started() == null ? "" : s.started().toString());
        r.add(s.status());
        r.add(s.integrity());
        return r;
    }

    private List<String> row(SessionRefit s, TrackFit t) {
        List<String> r = sessionPart(s);
        TrackData d = t.data();
        r.add(d.stepId());
        r.add(Integer.toString(d.stepIndex()));
        r.add(d.track());
        r.add(d.unit());
        r.add(t.outcome().name().toLowerCase(Locale.ROOT));
        r.add(settings.sigmoid().name());
        FitResult f = t.fit();
        BootstrapResult b = t.bootstrap();
        if (f != null) {
            PsychometricFunction p = f.function();
            ConfidenceInterval ti = b == null ? null : b.thresholdInterval(settings.intervalMethod());
            ConfidenceInterval si = b == null ? null : b.slopeInterval(settings.intervalMethod());
            r.add(num(p.guess()));
            r.add(num(p.lapse()));
            r.add(num(p.location()));
            r.add(num(p.spread()));
            r.add(num(f.threshold()));
            r.add(ti == null ? "NA" : num(ti.lower()));
            r.add(ti == null ? "NA" : num(ti.upper()));
            r.add(num(f.slope()));
            r.add(si == null ? "NA" : num(si.lower()));
            r.add(si == null ? "NA" : num(si.upper()));
            r.add(num(f.targetPsi()));
            r.add(num(f.thresholdAtF()));
            r.add(num(f.logLikelihood()));
            r.add(num(f.deviance()));
            r.add(b == null ? "NA" : num(b.goodnessOfFitP()));
            r.add(Long.toString(f.data().totalTrials()));
            r.add(Integer.toString(f.data().size()));
        } else {
            for (int i = 0; i < 15; i++) {
                r.add("NA");
            }
            r.add(Integer.toString(d.trials()));
            r.add("NA");
        }
        r.add(Integer.toString(d.catchTrials()));
        r.add(Integer.toString(d.catchYes()));
        r.add(t.reversals() == null ? "0" : Integer.toString(t.reversals().count()));
        r.add(num(t.reversalMean()));
        r.add(num(t.reversalSd()));
        r.add(d.logScale() ? "log10" : "linear");
        r.add(Integer.toString(settings.bootstrapSamples()));
        r.add(Long.toString(settings.seed()));
        r.add(settings.intervalMethod().name().toLowerCase(Locale.ROOT));
        r.add(num(settings.level()));
        r.add(b == null ? "NA" : Integer.toString(b.excludedReplicates()));
        r.add(settings.toString());
        r.add(t.message());
        return r;
    }

    /** Shortest text that reads back as the same double; NA for undefined values. */
    public static String num(double v) {
        return Double.isFinite(v) ? Double.toString(v) : Double.isNaN(v) ? "NA" : v > 0 ? "Inf" : "-Inf";
    }

    /** Writes one RFC 4180 record (fields quoted when they hold a comma, quote or line break) and a LF. */
    public static void writeRecord(Appendable out, List<String> fields) throws IOException {
        for (int i = 0; i < fields.size(); i++) {
            if (i > 0) {
                out.append(',');
            }
            String f = fields.get(i);
            if (f.indexOf(',') >= 0 || f.indexOf('"') >= 0 || f.indexOf('\n') >= 0 || f.indexOf('\r') >= 0) {
                out.append('"').append(f.replace("\"", "\"\"")).append('"');
            } else {
                out.append(f);
            }
        }
        out.append('\n');
    }
}
