package limen.session.refit;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import limen.fit.BinomialData;
import limen.fit.Bootstrap;
import limen.fit.BootstrapResult;
import limen.fit.CancellationFlag;
import limen.fit.FitResult;
import limen.fit.FitSettings;
import limen.fit.NotIdentifiableException;
import limen.fit.Progress;
import limen.fit.PsychometricFitter;
import limen.fit.ReversalEstimate;
import limen.model.SessionHeader;
import limen.session.SessionFolder;
import limen.session.journal.JournalContents;
import limen.session.journal.JournalContents.Integrity;

/**
 * Refits stored sessions after the fact, the same way for {@code ./limen refit} and the workbench: for each
 * step and track, the signal trials are pooled by value ({@link TrackData#pooled}) and fitted by
 * {@link PsychometricFitter} with {@link FitSettings#fitOptions} at the task's chance rate (1/n for nAFC;
 * free for yes/no unless the settings fix it), then bootstrapped by {@link Bootstrap} with the settings'
 * seed when asked. Journals whose rows verify ({@link Integrity#OK}, or {@link Integrity#TORN_TAIL}, whose
 * complete rows all verify) are refitted; edited, truncated or malformed ones are skipped and reported.
 * Works on one session at a time, so memory does not grow with the archive. Immutable, thread-safe.
 */
public final class SessionRefitter {

    private final FitSettings settings;

    public SessionRefitter(FitSettings settings) {
        this.settings = Objects.requireNonNull(settings, "settings");
    }

    public FitSettings settings() {
        return settings;
    }

    /**
     * Refits one session folder. Never throws for a bad session: an unreadable header or journal and a
     * journal that fails its checks are returned as a skipped {@link SessionRefit}.
     *
     * @param progress receives (refits done, total) of each track's bootstrap
     * @param cancel   checked between tracks and inside bootstraps
     * @throws java.util.concurrent.CancellationException when cancelled
     */
    public SessionRefit refit(Path folder, Progress progress, CancellationFlag cancel) {
        SessionFolder session;
        JournalContents journal;
        try {
            session = SessionFolder.open(folder);
        } catch (IOException | RuntimeException e) {
            return new SessionRefit(folder, "", "", null, "", SessionRefit.UNREADABLE, "cannot read the header: " + message(e),
                    List.of());
        }
        SessionHeader h = session.header();
        String participant = h.getParticipant() == null ? "" : h.getParticipant();
        String battery = h.getBattery() == null || h.getBattery().getTitle() == null ? "" : h.getBattery().getTitle();
        String status = h.getStatus() == null ? "" : h.getStatus().getLiteral();
        try {
            journal = session.readJournal();
        } catch (IOException | RuntimeException e) {
            return new SessionRefit(folder, participant, battery, h.getStartTime(), status, SessionRefit.UNREADABLE,
                    "cannot read the journal: " + message(e), List.of());
        }
        Integrity verdict = journal.integrity();
        if (verdict != Integrity.OK && verdict != Integrity.TORN_TAIL) {
            String why = journal.problems().isEmpty() ? verdict.name() : String.join("; ", journal.problems());
            return new SessionRefit(folder, participant, battery, h.getStartTime(), status, verdict.name(),
                    "journal " + verdict.name() + ": " + why, List.of());
        }
        List<TrackFit> fits = new ArrayList<>();
        for (TrackData t : SessionTracks.of(h, journal.rows())) {
            if (cancel.isCancelled()) {
                throw new java.util.concurrent.CancellationException("refit cancelled at " + folder);
            }
            fits.add(fit(t, progress, cancel));
        }
        return new SessionRefit(folder, participant, battery, h.getStartTime(), status, verdict.name(), "", fits);
    }

    /**
     * Fits one track (see the class comment).
     *
     * @throws java.util.concurrent.CancellationException when cancelled during the bootstrap
     */
    public TrackFit fit(TrackData track, Progress progress, CancellationFlag cancel) {
        ReversalEstimate reversals = Reversals.estimate(track.values(), track.discardedReversals(), track.logScale());
        if (track.trials() == 0) {
            return new TrackFit(track, TrackFit.Outcome.INVALID_DATA, "no signal trials to fit", null, null, reversals);
        }
        BinomialData data = track.pooled();
        FitResult fit;
        try {
            fit = new PsychometricFitter(settings.fitOptions(track.chanceRate())).fit(data);
        } catch (NotIdentifiableException e) {
            return new TrackFit(track, TrackFit.Outcome.NOT_IDENTIFIABLE, message(e), null, null, reversals);
        } catch (IllegalArgumentException e) {
            return new TrackFit(track, TrackFit.Outcome.INVALID_DATA, message(e), null, null, reversals);
        }
        BootstrapResult boot = null;
        if (settings.bootstrapSamples() > 0) {
            boot = new Bootstrap(settings.bootstrapOptions()).run(fit, progress, cancel);
        }
        return new TrackFit(track, TrackFit.Outcome.FITTED, String.join("; ", fit.warnings()), fit, boot, reversals);
    }

    private static String message(Exception e) {
        return e.getMessage() == null || e.getMessage().isBlank() ? e.toString() : e.getMessage();
    }
}
