package limen.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.Callable;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.CSVRecord;

import limen.fit.BinomialData;
import limen.fit.Bootstrap;
import limen.fit.BootstrapResult;
import limen.fit.CancellationFlag;
import limen.fit.ConfidenceInterval;
import limen.fit.FitOptions;
import limen.fit.FitResult;
import limen.fit.FitSettings;
import limen.fit.IntervalMethod;
import limen.fit.NotIdentifiableException;
import limen.fit.Progress;
import limen.fit.PsychometricFitter;
import limen.psychometric.ListenerSpec;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code ./limen fit DATA.csv}: maximum-likelihood fit of a psychometric function to binomial data
 * (columns {@code value,trials,correct}), written as one CSV row with a header to stdout. See
 * {@link PsychometricFitter} and {@link Bootstrap} for the methods.
 */
@Command(name = "fit", mixinStandardHelpOptions = true,
        description = {"Fit a psychometric function psi = guess + (1 - guess - lapse) F(x) by maximum likelihood to a CSV "
                + "with header value,trials,correct; print one CSV row with a header to stdout.",
                "Families: logistic F = 1/(1+exp(-(x-mid)/scale)); normal F = Phi((x-mid)/sd); "
                + "weibull F = 1-exp(-(x/alpha)^beta), x > 0; gumbel F = 1-exp(-exp((x-mid)/scale)).", ""},
        footer = {"", "Columns: function,threshold,slope,guess,lapse,loglik,deviance,location,spread,target,trials,spec",
                "[,threshold_f] and with --bootstrap: threshold_lo,threshold_hi,slope_lo,slope_hi,gof_p,ci_method,level,samples,excluded.",
                "The threshold is where psi reaches --target (default: midway between guess and 1 - lapse); the slope is",
                "dpsi/dx there. Exit codes: 0 fitted, 1 the data cannot identify the function, 2 usage or unreadable data."})
public final class FitCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "DATA.csv", description = "binomial data: header value,trials,correct (other columns ignored; '#' starts a comment line)")
    Path data;

    @Option(names = "--function", paramLabel = "NAME", defaultValue = "logistic",
            description = "logistic, normal, weibull or gumbel (default: ${DEFAULT-VALUE})")
    String function;

    @Option(names = "--guess", paramLabel = "G", defaultValue = "free",
            description = "guess rate: a number fixes it (1/n for n-alternative forced choice, e.g. 0.5 for 2AFC); 'free' estimates it in [0, 0.5] for yes/no tasks (default: ${DEFAULT-VALUE})")
    String guess;

    @Option(names = "--lapse-max", paramLabel = "L", defaultValue = "0.06",
            description = "upper bound of the estimated lapse rate; 0 fixes the lapse rate at 0 (default: ${DEFAULT-VALUE}, after Wichmann & Hill 2001)")
    double lapseMax;

    @Option(names = "--lapse", paramLabel = "L", description = "fix the lapse rate at L instead of estimating it")
    Double lapse;

    @Option(names = "--target", paramLabel = "P", description = "proportion at which the threshold is read (default: midway between guess and 1 - lapse)")
    Double target;

    @Option(names = "--target-f", paramLabel = "P", description = "also report the value where F (without guess and lapse) reaches P, as column threshold_f")
    Double targetF;

    @Option(names = "--bootstrap", paramLabel = "N", defaultValue = "0",
            description = "bootstrap samples for confidence intervals and the goodness of fit (default: none)")
    int bootstrap;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "seed of the bootstrap (default: ${DEFAULT-VALUE})")
    long seed;

    @Option(names = "--ci-method", paramLabel = "M", defaultValue = "bca",
            description = "percentile or bca (default: ${DEFAULT-VALUE})")
    String ciMethod;

    @Option(names = "--level", paramLabel = "C", defaultValue = "0.95", description = "confidence level (default: ${DEFAULT-VALUE})")
    double level;

    @Option(names = "--nonparametric", description = "resample the observed proportions instead of the fitted function")
    boolean nonparametric;

    @Option(names = "--threads", paramLabel = "T", description = "worker threads of the bootstrap (default: all cores)")
    Integer threads;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        PrintWriter out = spec.commandLine().getOut();
        FitSettings settings;
        FitOptions options;
        BinomialData cells;
        IntervalMethod method;
        try {
            settings = settings();
            // no task known here: 'task' means free, as for yes/no
            options = settings.fitOptions(Double.NaN);
            method = settings.intervalMethod();
            cells = readData(data);
        } catch (IllegalArgumentException | IOException e) {
            err.println("limen fit: " + e.getMessage());
            return LimenCli.EXIT_USAGE;
        }
        FitResult fit;
        try {
            fit = new PsychometricFitter(options).fit(cells);
        } catch (NotIdentifiableException e) {
            err.println("limen fit: " + data + ": " + e.getMessage());
            return LimenCli.EXIT_FAILED;
        } catch (IllegalArgumentException e) {
            err.println("limen fit: " + data + ": " + e.getMessage());
            return LimenCli.EXIT_USAGE;
        }
        for (String w : fit.warnings()) {
            err.println("limen fit: warning: " + w);
        }
        BootstrapResult boot = null;
        if (bootstrap > 0) {
            boot = new Bootstrap(settings.bootstrapOptions()).run(fit, new StderrProgress(err), new CancellationFlag());
            if (boot.excludedReplicates() > 0) {
                err.println("limen fit: warning: " + boot.excludedReplicates() + " of " + bootstrap
                        + " bootstrap replicates left out (no threshold: flat simulated data or target not reached)");
            }
        }
        write(out, fit, boot, method);
        out.flush();
        return 0;
    }

    /** The settings as parsed by {@link FitSettings#parse}, shared with {@code ./limen refit}. */
    private FitSettings settings() {
        return FitSettings.parse(function, guess, lapseMax, lapse, target, targetF, bootstrap, seed, ciMethod, level,
                nonparametric, threads);
    }

    /**
     * Reads {@code value,trials,correct} (header names case-insensitive, any column order, extra columns
     * ignored, '#' comment lines and blank lines skipped).
     *
     * @throws IllegalArgumentException naming the file and line of the first bad record
     */
    static BinomialData readData(Path file) throws IOException {
        if (!Files.isReadable(file)) {
            throw new IllegalArgumentException(file + ": cannot read the file");
        }
        CSVFormat format = CSVFormat.DEFAULT.builder().setCommentMarker('#').setIgnoreEmptyLines(true).setTrim(true).get();
        List<Double> values = new ArrayList<>();
        List<Integer> trials = new ArrayList<>();
        List<Integer> correct = new ArrayList<>();
        try (Reader reader = Files.newBufferedReader(file, StandardCharsets.UTF_8); CSVParser parser = CSVParser.parse(reader, format)) {
            Map<String, Integer> columns = null;
            for (CSVRecord record : parser) {
                long line = parser.getCurrentLineNumber();
                if (columns == null) {
                    columns = header(file, line, record);
                    continue;
                }
                String where = file + " line " + line;
                if (record.size() < columns.size() || columns.values().stream().anyMatch(i -> i >= record.size())) {
                    throw new IllegalArgumentException(where + ": expected columns value,trials,correct, found " + record.size() + " fields");
                }
                double v = number(where, "value", record.get(columns.get("value")));
                int n = whole(where, "trials", record.get(columns.get("trials")));
                int k = whole(where, "correct", record.get(columns.get("correct")));
                if (n < 1) {
                    throw new IllegalArgumentException(where + ": trials must be >= 1, was " + n);
                }
                if (k < 0 || k > n) {
                    throw new IllegalArgumentException(where + ": correct must be between 0 and trials (" + n + "), was " + k);
                }
                values.add(v);
                trials.add(n);
                correct.add(k);
            }
            if (columns == null) {
                throw new IllegalArgumentException(file + ": empty file; expected a header value,trials,correct");
            }
        } catch (java.io.UncheckedIOException e) {
            throw new IllegalArgumentException(file + ": " + e.getMessage(), e);
        }
        if (values.isEmpty()) {
            throw new IllegalArgumentException(file + ": no data rows after the header");
        }
        return new BinomialData(values.stream().mapToDouble(Double::doubleValue).toArray(),
                trials.stream().mapToInt(Integer::intValue).toArray(), correct.stream().mapToInt(Integer::intValue).toArray());
    }

    private static Map<String, Integer> header(Path file, long line, CSVRecord record) {
        Map<String, Integer> columns = new TreeMap<>();
        for (int i = 0; i < record.size(); i++) {
            String name = record.get(i).toLowerCase(Locale.ROOT);
            if ((name.equals("value") || name.equals("trials") || name.equals("correct")) && columns.put(name, i) != null) {
                throw new IllegalArgumentException(file + " line " + line + ": column '" + name + "' appears twice in the header");
            }
        }
        List<String> missing = new ArrayList<>();
        for (String c : new String[] { "value", "trials", "correct" }) {
            if (!columns.containsKey(c)) {
                missing.add(c);
            }
        }
        if (!missing.isEmpty()) {
            throw new IllegalArgumentException(file + " line " + line + ": header lacks column(s) " + String.join(", ", missing)
                    + "; expected value,trials,correct");
        }
        return columns;
    }

    private static double number(String where, String column, String text) {
        try {
            double v = Double.parseDouble(text);
            if (Double.isFinite(v)) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new IllegalArgumentException(where + ": " + column + " '" + text + "' is not a finite number");
    }

    private static int whole(String where, String column, String text) {
        try {
            return Integer.parseInt(text);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(where + ": " + column + " '" + text + "' is not a whole number");
        }
    }

    private void write(PrintWriter out, FitResult fit, BootstrapResult boot, IntervalMethod method) {
        List<String> header = new ArrayList<>(List.of("function", "threshold", "slope", "guess", "lapse", "loglik", "deviance",
                "location", "spread", "target", "trials", "spec"));
        List<Object> row = new ArrayList<>(List.of(fit.function().sigmoid().name(), num(fit.threshold()), num(fit.slope()),
                num(fit.function().guess()), num(fit.function().lapse()), num(fit.logLikelihood()), num(fit.deviance()),
                num(fit.function().location()), num(fit.function().spread()), num(fit.targetPsi()),
                Long.toString(fit.data().totalTrials()), ListenerSpec.format(fit.function())));
        if (targetF != null) {
            header.add("threshold_f");
            row.add(num(fit.thresholdAtF()));
        }
        if (boot != null) {
            ConfidenceInterval t = boot.thresholdInterval(method);
            ConfidenceInterval s = boot.slopeInterval(method);
            header.addAll(List.of("threshold_lo", "threshold_hi", "slope_lo", "slope_hi", "gof_p", "ci_method", "level", "samples", "excluded"));
            row.addAll(List.of(num(t.lower()), num(t.upper()), num(s.lower()), num(s.upper()), num(boot.goodnessOfFitP()),
                    method.name().toLowerCase(Locale.ROOT), num(level), Integer.toString(bootstrap),
                    Integer.toString(boot.excludedReplicates())));
        }
        try {
            CSVPrinter printer = new CSVPrinter(out, CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get());
            printer.printRecord(header);
            printer.printRecord(row);
            printer.flush();
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    /** Shortest text that reads back as the same double; NaN for undefined values. */
    private static String num(double v) {
        return Double.isNaN(v) ? "NaN" : Double.toString(v);
    }

    /** Prints bootstrap progress to stderr at every tenth of the work. */
    private static final class StderrProgress implements Progress {
        private final PrintWriter err;
        private long lastTenth = -1;

        StderrProgress(PrintWriter err) {
            this.err = err;
        }

        @Override
        public synchronized void update(long done, long total) {
            long tenth = done * 10 / total;
            if (tenth > lastTenth) {
                lastTenth = tenth;
                err.println("limen fit: bootstrap " + done + "/" + total + " refits");
                err.flush();
            }
        }
    }
}
