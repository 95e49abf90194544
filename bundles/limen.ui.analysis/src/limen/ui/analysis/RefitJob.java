package limen.ui.analysis;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicLong;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;

import limen.fit.CancellationFlag;
import limen.fit.FitSettings;
import limen.fit.Progress;
import limen.session.refit.CurveBand;
import limen.session.refit.SavedFits;
import limen.session.refit.SessionRefit;
import limen.session.refit.SessionRefitter;
import limen.session.refit.TrackFit;

/**
 * Refits sessions in the background with {@link SessionRefitter} (the code of {@code ./limen refit}), one
 * session at a time, reporting progress (sessions done, and the bootstrap of the current session) and
 * stopping between bootstrap replicates when cancelled. With {@code save}, every refit is kept beside its
 * session by {@link SavedFits} (never replacing an earlier fit). Optionally draws the display band of each
 * fitted track ({@link CurveBand}).
 */
public final class RefitJob extends Job {

    /** Bootstrap replicates drawn for a curve band at most (the band is for display). */
    public static final int BAND_REPLICATES_MAX = 200;

    private final List<Path> folders;
    private final FitSettings settings;
    private final boolean save;
    private final boolean bands;
    private final CancellationFlag cancel = new CancellationFlag();
    private final AtomicLong sessionsDone = new AtomicLong();
    private final AtomicLong bootDone = new AtomicLong();
    private final AtomicLong bootTotal = new AtomicLong();
    private final List<SessionRefit> results = Collections.synchronizedList(new ArrayList<>());
    private final Map<TrackFit, CurveBand> bandOf = Collections.synchronizedMap(new LinkedHashMap<>());
    private final List<Path> saved = Collections.synchronizedList(new ArrayList<>());
    private final List<String> problems = Collections.synchronizedList(new ArrayList<>());
    private volatile boolean cancelled;

    /**
     * @param folders  the session folders
     * @param settings the fit settings
     * @param save     keep each refit beside its session
     * @param bands    draw curve bands of the fitted tracks (only with a bootstrap)
     */
    public RefitJob(List<Path> folders, FitSettings settings, boolean save, boolean bands) {
        super((save ? "Refit of " : "Fit of ") + folders.size() + (folders.size() == 1 ? " session" : " sessions"));
        this.folders = List.copyOf(folders);
        this.settings = settings;
        this.save = save;
        this.bands = bands;
        setUser(true);
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        monitor.beginTask(getName(), folders.size());
        SessionRefitter refitter = new SessionRefitter(settings);
        Progress progress = (done, total) -> {
            bootTotal.set(total);
            bootDone.accumulateAndGet(done, Math::max);
            if (monitor.isCanceled()) {
                cancel.cancel();
            }
        };
        try {
            for (Path folder : folders) {
                if (monitor.isCanceled() || cancel.isCancelled()) {
                    throw new CancellationException();
                }
                monitor.subTask(folder.getFileName().toString());
                bootDone.set(0);
                bootTotal.set(0);
                SessionRefit r = refitter.refit(folder, progress, cancel);
                if (bands && settings.bootstrapSamples() > 0) {
                    for (TrackFit t : r.tracks()) {
                        if (t.fit() != null) {
                            bandOf.put(t, drawBand(t));
                        }
                    }
                }
                if (save && !r.skipped()) {
                    try {
                        saved.add(SavedFits.save(r, settings, Instant.now()));
                    } catch (IOException e) {
                        problems.add(folder + ": fit not saved: " + e.getMessage());
                    }
                } else if (r.skipped()) {
                    problems.add(folder.getFileName() + ": " + r.problem());
                }
                results.add(r);
                sessionsDone.incrementAndGet();
                monitor.worked(1);
            }
        } catch (CancellationException e) {
            cancelled = true;
            return Status.CANCEL_STATUS;
        } finally {
            monitor.done();
        }
        return Status.OK_STATUS;
    }

    private CurveBand drawBand(TrackFit t) {
        double[] v = t.fit().data().values();
        double lo = v[0];
        double hi = v[v.length - 1];
        if (Double.isFinite(t.fit().threshold())) {
            lo = Math.min(lo, t.fit().threshold());
            hi = Math.max(hi, t.fit().threshold());
        }
        boolean log = t.data().logScale() && lo > 0;
        if (!(hi > lo)) {
            hi = lo + (log ? lo : 1);
        }
        return CurveBand.of(t.fit(), CurveBand.grid(lo, hi, 101, log), Math.max(2, Math.min(BAND_REPLICATES_MAX,
                settings.bootstrapSamples())), settings.seed(), settings.level());
    }

    @Override
    protected void canceling() {
        cancel.cancel();
    }

    public FitSettings settings() {
        return settings;
    }

    public List<Path> folders() {
        return folders;
    }

    /** @return the refits finished so far, in order */
    public List<SessionRefit> results() {
        synchronized (results) {
            return List.copyOf(results);
        }
    }

    /** @return the curve band of a fitted track, or null */
    public CurveBand band(TrackFit fit) {
        return bandOf.get(fit);
    }

    /** @return the saved fit tables */
    public List<Path> saved() {
        synchronized (saved) {
            return List.copyOf(saved);
        }
    }

    /** @return sessions skipped or fits not saved, one line each */
    public List<String> problems() {
        synchronized (problems) {
            return List.copyOf(problems);
        }
    }

    /** @return whether the job stopped because it was cancelled */
    public boolean cancelled() {
        return cancelled;
    }

    /** @return the fraction done in [0, 1]: sessions done plus the bootstrap of the current session */
    public double fraction() {
        double within = bootTotal.get() > 0 ? (double) bootDone.get() / bootTotal.get() : 0;
        return Math.min(1, (sessionsDone.get() + Math.min(within, 0.999)) / Math.max(1, folders.size()));
    }

    /** @return "i of n sessions" */
    public String progressText() {
        return sessionsDone.get() + " of " + folders.size() + " sessions"
                + (bootTotal.get() > 0 && sessionsDone.get() < folders.size()
                        ? ", bootstrap " + bootDone.get() + "/" + bootTotal.get() : "");
    }
}
