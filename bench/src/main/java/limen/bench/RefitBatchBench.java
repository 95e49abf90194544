package limen.bench;

import java.io.BufferedWriter;
import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.lang.management.ThreadMXBean;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;

import limen.audio.NoOutput;
import limen.fit.CancellationFlag;
import limen.fit.FitSettings;
import limen.fit.Progress;
import limen.model.Battery;
import limen.model.Calibration;
import limen.model.ForcedChoiceTask;
import limen.model.SessionStatus;
import limen.model.Step;
import limen.model.Track;
import limen.model.io.LimenFiles;
import limen.session.ArchiveIndex;
import limen.session.BatteryTrialRenderer;
import limen.session.CalibrationMapping;
import limen.session.ModelListenerResponder;
import limen.session.SessionFolder;
import limen.session.SessionRunner;
import limen.session.SessionStatusInfo;
import limen.session.journal.JournalContents;
import limen.session.refit.BatchRefitter;
import limen.session.refit.RefitTable;
import limen.session.refit.SessionRefitter;
import limen.session.refit.SessionTracks;
import limen.session.refit.TrackData;

/**
 * Batch refit of a stored archive, as {@code ./limen refit ARCHIVE --bootstrap 500} does it: 1,000 sessions
 * (by default) of the Harbourside frequency-discrimination battery cut to one 2-down/1-up track per
 * standard, 60 trials each (3 tracks per session), answered by a model listener through the real session
 * runner and journal writer (every row synced and chained, headers written as XMI), so the files are the
 * ones a booth writes. The tones are made 10 ms long (intervals and gaps) so that generating the archive
 * stays quick; refitting reads only the journal and the header.
 * <p>
 * The archive is generated once into {@code /dev/shm} (or the temporary folder) and reused while its marker
 * file exists. Timed in the same run, with the same threads:
 * <ul>
 * <li>baseline: reading every header and journal, verifying the journal's hash chain, and splitting and
 * pooling the tracks, without fitting (the part of the batch that does not depend on the fitter);</li>
 * <li>batch: {@link BatchRefitter} writing the {@link RefitTable} CSV, with {@code --bootstrap} samples per
 * track (parametric, BCa, goodness of fit), exactly the work of {@code ./limen refit};</li>
 * <li>optionally ({@code --sequential}) the former loop: one session after another, the bootstrap of each
 * track parallel.</li>
 * </ul>
 * Reports wall time, process CPU time, their ratio to the baseline, the peak heap in use and the load
 * average. Run: {@code bench/refit.sh [--sessions N] [--threads T] [--bootstrap B] [--sequential]}.
 */
public final class RefitBatchBench {

    private static final int TRIALS = 60;
    private static final String LISTENER = "logistic:mid=0.9,scale=0.3,lapse=0.02";

    private RefitBatchBench() {
    }

    public static void main(String[] args) throws Exception {
        int sessions = 1000;
        int threads = 2;
        int bootstrap = 500;
        boolean sequential = false;
        Path root = Paths.get(System.getProperty("limen.root", "."));
        for (int i = 0; i < args.length; i++) {
            switch (args[i]) {
            case "--sessions" -> sessions = Integer.parseInt(args[++i]);
            case "--threads" -> threads = Integer.parseInt(args[++i]);
            case "--bootstrap" -> bootstrap = Integer.parseInt(args[++i]);
            case "--sequential" -> sequential = true;
            case "--root" -> root = Paths.get(args[++i]);
            default -> throw new IllegalArgumentException("unknown option " + args[i]
                    + " (--sessions N --threads T --bootstrap B --sequential --root REPO)");
            }
        }
        int workers = threads;
        Path archive = archive(root.resolve("examples"), sessions, workers);
        List<Path> folders = ArchiveIndex.sessions(archive);
        if (folders.size() != sessions) {
            throw new IllegalStateException(archive + " holds " + folders.size() + " sessions, expected " + sessions);
        }
        FitSettings settings = FitSettings.parse("logistic", FitSettings.GUESS_BY_TASK, 0.06, null, null, null, bootstrap, 1,
                "bca", 0.95, false, threads);
        System.out.printf(Locale.ROOT, "archive %s: %d sessions x 3 tracks x %d trials, bootstrap %d, %d threads, load average %.2f%n",
                archive, sessions, TRIALS, bootstrap, threads, load());

        // warm-up on a few sessions (JIT), not timed
        new BatchRefitter(settings, threads).refit(folders.subList(0, Math.min(20, sessions)), r -> { }, new CancellationFlag());
        Timing base = time(() -> readAll(folders, workers));
        System.out.printf(Locale.ROOT, "baseline  read+verify+pool all journals: %s%n", base);
        Path out = archive.resolveSibling(archive.getFileName() + "-refit.csv");
        AtomicLong rows = new AtomicLong();
        resetPeakHeap();
        Timing batch = time(() -> {
            RefitTable table = new RefitTable(settings);
            try (BufferedWriter w = Files.newBufferedWriter(out, StandardCharsets.UTF_8)) {
                table.writeHeader(w);
                new BatchRefitter(settings, workers).refit(folders, r -> {
                    table.write(w, r);
                    w.flush();
                    rows.addAndGet(Math.max(1, r.tracks().size()));
                }, new CancellationFlag());
            }
        });
        long peak = peakHeap();
        System.out.printf(Locale.ROOT, "batch     BatchRefitter, %d rows -> %s: %s; ratio to baseline %.1f (wall), %.1f (CPU); peak heap %.0f MB%n",
                rows.get(), out, batch, batch.wallSeconds / base.wallSeconds, batch.cpuSeconds / base.cpuSeconds, peak / 1e6);
        if (sequential) {
            SessionRefitter one = new SessionRefitter(settings);
            Timing seq = time(() -> {
                for (Path f : folders) {
                    one.refit(f, Progress.NONE, new CancellationFlag());
                }
            });
            System.out.printf(Locale.ROOT, "sequential one session at a time, parallel bootstrap: %s; ratio to baseline %.1f%n", seq,
                    seq.wallSeconds / base.wallSeconds);
        }
        System.out.printf(Locale.ROOT, "load average at the end %.2f%n", load());
    }

    /** Reads, verifies and pools every session on {@code threads} threads, as the refit does before fitting. */
    private static void readAll(List<Path> folders, int threads) throws Exception {
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        try {
            AtomicInteger next = new AtomicInteger();
            List<Future<Long>> parts = new ArrayList<>();
            for (int t = 0; t < threads; t++) {
                parts.add(pool.submit(() -> {
                    long cells = 0;
                    for (int i; (i = next.getAndIncrement()) < folders.size();) {
                        SessionFolder s = SessionFolder.open(folders.get(i));
                        JournalContents j = s.readJournal();
                        if (j.integrity() != JournalContents.Integrity.OK) {
                            throw new IllegalStateException(folders.get(i) + ": " + j.integrity());
                        }
                        for (TrackData d : SessionTracks.of(s.header(), j.rows())) {
                            cells += d.pooled().size();
                        }
                    }
                    return cells;
                }));
            }
            for (Future<Long> f : parts) {
                f.get();
            }
        } finally {
            pool.shutdown();
        }
    }

    /** @return the archive folder, generated when its marker is missing */
    private static Path archive(Path examples, int sessions, int threads) throws Exception {
        Path base = Files.isDirectory(Paths.get("/dev/shm")) ? Paths.get("/dev/shm") : Paths.get(System.getProperty("java.io.tmpdir"));
        Path archive = base.resolve("limen-refit-bench-" + sessions + "x3x" + TRIALS);
        Path marker = archive.resolve(".complete");
        if (Files.exists(marker)) {
            return archive;
        }
        if (Files.exists(archive)) {
            try (var w = Files.walk(archive)) {
                w.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
        Files.createDirectories(archive);
        Battery battery = battery(examples);
        Calibration calibration = LimenFiles.loadCalibration(examples.resolve("harbourside-demo.calibration"));
        long t0 = System.nanoTime();
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        try {
            List<Future<?>> jobs = new ArrayList<>();
            for (int i = 0; i < sessions; i++) {
                int n = i;
                jobs.add(pool.submit(() -> {
                    // each session its own copy of the battery (the runner and the header hold it)
                    Battery b = org.eclipse.emf.ecore.util.EcoreUtil.copy(battery);
                    SessionFolder f = SessionFolder.create(archive, "frequency-discrimination", b, calibration,
                            String.format(Locale.ROOT, "P-HB%04d", n), 5000 + n, "none", -1);
                    SessionStatusInfo info = SessionRunner.start(f, new NoOutput(false),
                            new ModelListenerResponder(LISTENER, Map.of(), 9000 + n),
                            new BatteryTrialRenderer(CalibrationMapping.toSignal(calibration)), null, false).run();
                    if (info.status() != SessionStatus.COMPLETED) {
                        throw new IllegalStateException("session " + n + ": " + info.status() + " " + info.message());
                    }
                    return null;
                }));
            }
            for (Future<?> j : jobs) {
                j.get();
            }
        } finally {
            pool.shutdown();
        }
        Files.writeString(marker, "generated in " + (System.nanoTime() - t0) / 1e9 + " s\n");
        System.out.printf(Locale.ROOT, "generated %d sessions in %.1f s%n", sessions, (System.nanoTime() - t0) / 1e9);
        return archive;
    }

    /** The demo battery with one track per step, 60 trials each, no break, 10 ms intervals and gaps. */
    private static Battery battery(Path examples) throws IOException {
        Battery b = LimenFiles.loadBattery(examples.resolve("frequency-discrimination.battery"));
        b.getBreaks().clear();
        for (Step s : b.getSteps()) {
            while (s.getTracks().size() > 1) {
                s.getTracks().remove(s.getTracks().size() - 1);
            }
            for (Track t : s.getTracks()) {
                t.getStoppingRule().setMaximumTrials(TRIALS);
                t.getStoppingRule().setMaximumReversals(10_000);
            }
            if (s.getTask() instanceof ForcedChoiceTask fc) {
                fc.setIntervalDurationSeconds(0.01);
                fc.setInterStimulusIntervalSeconds(0.01);
                fc.setInterTrialIntervalSeconds(0);
            }
            s.getStimulus().setRampDurationSeconds(0.002);
        }
        return b;
    }

    private interface Work {
        void run() throws Exception;
    }

    private record Timing(double wallSeconds, double cpuSeconds) {
        @Override
        public String toString() {
            return String.format(Locale.ROOT, "%.2f s wall, %.2f s CPU", wallSeconds, cpuSeconds);
        }
    }

    private static Timing time(Work w) throws Exception {
        long cpu0 = processCpuNanos();
        long t0 = System.nanoTime();
        w.run();
        return new Timing((System.nanoTime() - t0) / 1e9, (processCpuNanos() - cpu0) / 1e9);
    }

    private static long processCpuNanos() {
        if (ManagementFactory.getOperatingSystemMXBean() instanceof com.sun.management.OperatingSystemMXBean os) {
            return os.getProcessCpuTime();
        }
        ThreadMXBean t = ManagementFactory.getThreadMXBean();
        return t.getCurrentThreadCpuTime();
    }

    private static double load() {
        return ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage();
    }

    private static void resetPeakHeap() {
        System.gc();
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP) {
                p.resetPeakUsage();
            }
        }
    }

    /** @return the sum of the heap pools' peak use since {@link #resetPeakHeap} (an upper bound of the live set) */
    private static long peakHeap() {
        long sum = 0;
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP) {
                sum += p.getPeakUsage().getUsed();
            }
        }
        return sum;
    }
}
