package limen.bench;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

import org.openjdk.jmh.results.RunResult;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.options.CommandLineOptions;
import org.openjdk.jmh.runner.options.Options;
import org.openjdk.jmh.runner.options.OptionsBuilder;

/**
 * Runs Limen's JMH benchmarks and reports each one as a ratio to the baseline of its own class, measured in
 * the same run on the same machine (a benchmark method whose name starts with {@code baseline}). Ratios say
 * more than raw times on shared two-core machines: both sides feel the same load.
 */
public final class BenchMain {

    private BenchMain() {
    }

    public static void main(String[] args) throws Exception {
        // JMH's own command line (include regexp, -wi, -i, -f, -t ...); all of Limen's benchmarks by default
        CommandLineOptions parsed = new CommandLineOptions(args);
        OptionsBuilder builder = new OptionsBuilder();
        builder.parent(parsed).shouldFailOnError(true);
        if (parsed.getIncludes().isEmpty()) {
            builder.include("limen\\.bench\\..*");
        }
        Options options = builder.build();
        Collection<RunResult> results = new Runner(options).run();
        System.out.println();
        System.out.println(report(results));
    }

    /** One line per benchmark: class, method, score with unit, baseline, and the ratio. */
    static String report(Collection<RunResult> results) {
        Map<String, List<RunResult>> byClass = new TreeMap<>();
        for (RunResult r : results) {
            String label = r.getParams().getBenchmark();
            String cls = label.substring(0, label.lastIndexOf('.'));
            byClass.computeIfAbsent(cls, k -> new ArrayList<>()).add(r);
        }
        StringBuilder out = new StringBuilder("benchmark,score,unit,baseline,baseline_score,ratio_to_baseline\n");
        for (Map.Entry<String, List<RunResult>> e : byClass.entrySet()) {
            RunResult baseline = e.getValue().stream()
                    .filter(r -> method(r).startsWith("baseline")).findFirst().orElse(null);
            for (RunResult r : e.getValue()) {
                double score = r.getPrimaryResult().getScore();
                String unit = r.getPrimaryResult().getScoreUnit();
                String line;
                if (baseline == null || baseline == r) {
                    line = String.format(Locale.ROOT, "%s.%s,%.4g,%s,,,", simple(e.getKey()), method(r), score, unit);
                } else {
                    double base = baseline.getPrimaryResult().getScore();
                    line = String.format(Locale.ROOT, "%s.%s,%.4g,%s,%s,%.4g,%.3f", simple(e.getKey()), method(r),
                            score, unit, method(baseline), base, score / base);
                }
                out.append(line).append('\n');
            }
        }
        return out.toString();
    }

    private static String method(RunResult r) {
        String label = r.getParams().getBenchmark();
        return label.substring(label.lastIndexOf('.') + 1);
    }

    private static String simple(String cls) {
        return cls.substring(cls.lastIndexOf('.') + 1);
    }
}
