package limen.cli;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import limen.fit.CancellationFlag;
import limen.fit.FitSettings;
import limen.session.ArchiveIndex;
import limen.session.refit.BatchRefitter;
import limen.session.refit.RefitTable;
import limen.session.refit.SessionRefit;
import limen.session.refit.TrackFit;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code ./limen refit PATH... --out FILE.csv}: refits stored sessions after the fact, one CSV row per
 * session, step and track, by {@link limen.session.refit.SessionRefitter} (the same code as the workbench),
 * several sessions at once ({@link BatchRefitter}); rows are written in the order the sessions were found as
 * soon as each is done, and only a few sessions are held at a time, so memory does not grow with the archive.
 */
@Command(name = "refit", mixinStandardHelpOptions = true,
        description = {"Refit stored sessions (session folders, or archive folders searched recursively): pool each",
                "step's track by value and fit psi = guess + (1 - guess - lapse) F(x) by maximum likelihood, as ./limen fit does.",
                "Writes one CSV row per session, step and track to --out; progress on stderr."},
        footer = {"", "Sessions whose journal is edited, truncated or malformed (integrity BROKEN_CHAIN, TRUNCATED, MALFORMED)",
                "or unreadable are reported on stderr and as one row with outcome 'skipped'; the batch goes on.",
                "Columns: " + "see RefitTable.COLUMNS (session,participant,...,threshold,threshold_lo,threshold_hi,slope,...,integrity).",
                "Exit codes: 0 every session refitted, 1 some session skipped, 2 usage error or a PATH that is not a folder."})
public final class RefitCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0..*", arity = "1..*", paramLabel = "PATH", description = "session folders or archive folders")
    List<Path> paths;

    @Option(names = "--out", paramLabel = "FILE.csv", required = true, description = "where to write the table (replaced if it exists)")
    Path out;

    @Option(names = "--function", paramLabel = "NAME", defaultValue = "logistic",
            description = "logistic, normal, weibull or gumbel (default: ${DEFAULT-VALUE})")
    String function;

    @Option(names = "--guess", paramLabel = "G", defaultValue = FitSettings.GUESS_BY_TASK,
            description = "guess rate: 'task' fixes it at 1/n for n-alternative forced choice and estimates it for yes/no; "
                    + "'free' always estimates it; a number fixes it (default: ${DEFAULT-VALUE})")
    String guess;

    @Option(names = "--lapse-max", paramLabel = "L", defaultValue = "0.06",
            description = "upper bound of the estimated lapse rate; 0 fixes the lapse rate at 0 (default: ${DEFAULT-VALUE}, after Wichmann & Hill 2001)")
    double lapseMax;

    @Option(names = "--lapse", paramLabel = "L", description = "fix the lapse rate at L instead of estimating it")
    Double lapse;

    @Option(names = "--target", paramLabel = "P", description = "proportion at which the threshold is read (default: midway between guess and 1 - lapse)")
    Double target;

    @Option(names = "--target-f", paramLabel = "P", description = "also report the value where F reaches P (column threshold_f)")
    Double targetF;

    @Option(names = "--bootstrap", paramLabel = "N", defaultValue = "0",
            description = "bootstrap samples per track for intervals and goodness of fit (default: none)")
    int bootstrap;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "seed of every track's bootstrap (default: ${DEFAULT-VALUE})")
    long seed;

    @Option(names = "--ci-method", paramLabel = "M", defaultValue = "bca", description = "percentile or bca (default: ${DEFAULT-VALUE})")
    String ciMethod;

    @Option(names = "--level", paramLabel = "C", defaultValue = "0.95", description = "confidence level (default: ${DEFAULT-VALUE})")
    double level;

    @Option(names = "--nonparametric", description = "resample the observed proportions instead of the fitted function")
    boolean nonparametric;

    @Option(names = "--threads", paramLabel = "T",
            description = "worker threads: sessions are refitted in parallel, results do not depend on it (default: all cores)")
    Integer threads;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        FitSettings settings;
        try {
            settings = FitSettings.parse(function, guess, lapseMax, lapse, target, targetF, bootstrap, seed, ciMethod, level,
                    nonparametric, threads);
        } catch (IllegalArgumentException e) {
            err.println("limen refit: " + e.getMessage());
            return LimenCli.EXIT_USAGE;
        }
        // find the sessions first (paths only) so that progress can say "i of n"
        List<List<Path>> found = new java.util.ArrayList<>();
        int total = 0;
        for (Path p : paths) {
            try {
                List<Path> s = ArchiveIndex.sessions(p);
                found.add(s);
                total += s.size();
            } catch (IOException e) {
                err.println("limen refit: " + e.getMessage());
                return LimenCli.EXIT_USAGE;
            }
        }
        if (total == 0) {
            err.println("limen refit: no sessions under " + paths);
            return LimenCli.EXIT_USAGE;
        }
        List<Path> folders = new java.util.ArrayList<>(total);
        found.forEach(folders::addAll);
        int workers = threads != null ? threads : Runtime.getRuntime().availableProcessors();
        BatchRefitter refitter = new BatchRefitter(settings, workers);
        RefitTable table = new RefitTable(settings);
        CancellationFlag cancel = new CancellationFlag();
        long t0 = System.nanoTime();
        int[] counts = new int[4]; // done, skipped, tracks fitted, tracks not fitted
        int all = total;
        try (BufferedWriter w = Files.newBufferedWriter(out, StandardCharsets.UTF_8)) {
            table.writeHeader(w);
            // sessions are refitted in parallel; rows arrive here in folder order and are written at once
            refitter.refit(folders, r -> {
                table.write(w, r);
                w.flush();
                report(err, r, ++counts[0], all, counts);
            }, cancel);
        } catch (IOException e) {
            err.println("limen refit: " + out + ": cannot write: " + e.getMessage());
            return LimenCli.EXIT_FAILED;
        }
        double seconds = (System.nanoTime() - t0) / 1e9;
        int skipped = counts[1];
        err.println(String.format(Locale.ROOT, "limen refit: %d sessions, %d tracks fitted, %d not fitted, %d sessions skipped, %.2f s -> %s",
                counts[0], counts[2], counts[3], skipped, seconds, out));
        return skipped > 0 ? LimenCli.EXIT_FAILED : 0;
    }

    /** Progress and problems of one session on stderr; counts[1..3] += skipped, tracks fitted, not fitted. */
    private static void report(PrintWriter err, SessionRefit r, int done, int total, int[] counts) {
        Path folder = r.folder();
        if (r.skipped()) {
            counts[1]++;
            err.println("limen refit: [" + done + "/" + total + "] " + folder + ": skipped (integrity "
                    + r.integrity() + "): " + r.problem());
        } else {
            long ok = r.tracks().stream().filter(t -> t.outcome() == TrackFit.Outcome.FITTED).count();
            counts[2] += (int) ok;
            counts[3] += r.tracks().size() - (int) ok;
            err.println("limen refit: [" + done + "/" + total + "] " + folder + ": " + ok + " of " + r.tracks().size()
                    + " tracks fitted" + (r.integrity().equals("OK") ? "" : " (integrity " + r.integrity() + ")"));
            for (TrackFit t : r.tracks()) {
                if (t.outcome() != TrackFit.Outcome.FITTED) {
                    err.println("limen refit: warning: " + folder + " step " + t.data().stepId() + " track "
                            + t.data().track() + ": " + t.outcome().name().toLowerCase(Locale.ROOT) + ": " + t.message());
                }
            }
        }
        err.flush();
    }
}
