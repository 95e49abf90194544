package limen.fit;

import java.util.Locale;
import java.util.Objects;

import limen.psychometric.Sigmoid;
import limen.psychometric.Sigmoids;

/**
 * The user-facing settings of a fit and its bootstrap, shared by {@code ./limen fit}, {@code ./limen refit}
 * and the workbench so that they parse, default and apply options the same way. Immutable; built by
 * {@link #parse}.
 * <p>
 * The guess rate γ is one of: {@value #GUESS_BY_TASK} (fixed at the chance rate 1/n of an n-alternative
 * forced-choice task, free in [0, {@value FitOptions#DEFAULT_GUESS_MAX}] when the task has no chance rate,
 * i.e. yes/no), {@value #GUESS_FREE} (always free), or a number (fixed).
 */
public final class FitSettings {

    /** Guess mode: fixed at the task's chance rate, free for yes/no. */
    public static final String GUESS_BY_TASK = "task";
    /** Guess mode: estimated in [0, {@value FitOptions#DEFAULT_GUESS_MAX}]. */
    public static final String GUESS_FREE = "free";

    private final Sigmoid sigmoid;
    private final String guessMode;
    private final double fixedGuess;
    private final double lapseMax;
    private final double fixedLapse;
    private final double targetPsi;
    private final double targetF;
    private final int bootstrapSamples;
    private final long seed;
    private final IntervalMethod intervalMethod;
    private final double level;
    private final boolean nonparametric;
    private final int threads;

    private FitSettings(Sigmoid sigmoid, String guessMode, double fixedGuess, double lapseMax, double fixedLapse,
            double targetPsi, double targetF, int bootstrapSamples, long seed, IntervalMethod intervalMethod,
            double level, boolean nonparametric, int threads) {
        this.sigmoid = Objects.requireNonNull(sigmoid, "sigmoid");
        this.guessMode = guessMode;
        this.fixedGuess = fixedGuess;
        this.lapseMax = lapseMax;
        this.fixedLapse = fixedLapse;
        this.targetPsi = targetPsi;
        this.targetF = targetF;
        this.bootstrapSamples = bootstrapSamples;
        this.seed = seed;
        this.intervalMethod = Objects.requireNonNull(intervalMethod, "intervalMethod");
        this.level = level;
        this.nonparametric = nonparametric;
        this.threads = threads;
        // validate the combination once, with the strictest guess the settings can produce
        fitOptions(Double.NaN);
        if (guessMode.equals(GUESS_BY_TASK)) {
            fitOptions(0.5);
        }
        if (bootstrapSamples > 0) {
            bootstrapOptions();
        }
    }

    /**
     * Parses settings as typed on a command line or in a dialog.
     *
     * @param function       logistic, normal, weibull or gumbel
     * @param guess          {@value #GUESS_BY_TASK}, {@value #GUESS_FREE} or a number in [0, 1)
     * @param lapseMax       upper bound of a free lapse rate; 0 fixes it at 0
     * @param lapse          a fixed lapse rate, or null to estimate it in [0, lapseMax]
     * @param target         the proportion ψ at which the threshold is read, or null for the midpoint
     * @param targetF        also report where F reaches this, or null
     * @param bootstrap      bootstrap samples, 0 for none
     * @param seed           seed of the bootstrap
     * @param ciMethod       percentile or bca
     * @param level          confidence level
     * @param nonparametric  resample observed proportions instead of the fitted function
     * @param threads        bootstrap worker threads, null for all cores
     * @throws IllegalArgumentException naming the option and the offending value
     */
    public static FitSettings parse(String function, String guess, double lapseMax, Double lapse, Double target,
            Double targetF, int bootstrap, long seed, String ciMethod, double level, boolean nonparametric,
            Integer threads) {
        Sigmoid sigmoid = Sigmoids.byName(function);
        String g = guess == null ? GUESS_BY_TASK : guess.trim().toLowerCase(Locale.ROOT);
        double fixed = Double.NaN;
        if (!g.equals(GUESS_BY_TASK) && !g.equals(GUESS_FREE)) {
            try {
                fixed = Double.parseDouble(g);
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("--guess must be a number, 'free' or 'task', was '" + guess + "'");
            }
            g = "fixed";
        }
        if (bootstrap < 0) {
            throw new IllegalArgumentException("--bootstrap must be >= 0, was " + bootstrap);
        }
        if (threads != null && threads < 1) {
            throw new IllegalArgumentException("--threads must be >= 1, was " + threads);
        }
        return new FitSettings(sigmoid, g, fixed, lapseMax, lapse == null ? Double.NaN : lapse,
                target == null ? Double.NaN : target, targetF == null ? Double.NaN : targetF, bootstrap, seed,
                intervalMethod(ciMethod), level, nonparametric, threads == null ? 0 : threads);
    }

    /** @return the interval method named percentile or bca (any case) */
    public static IntervalMethod intervalMethod(String name) {
        switch (name == null ? "" : name.trim().toLowerCase(Locale.ROOT)) {
        case "percentile":
            return IntervalMethod.PERCENTILE;
        case "bca":
            return IntervalMethod.BCA;
        default:
            throw new IllegalArgumentException("--ci-method must be percentile or bca, was '" + name + "'");
        }
    }

    /**
     * The fit options for one data set.
     *
     * @param chanceRate the task's chance rate (1/n for nAFC), NaN when it has none (yes/no, or unknown)
     */
    public FitOptions fitOptions(double chanceRate) {
        FitOptions o = FitOptions.of(sigmoid);
        switch (guessMode) {
        case "fixed":
            o = o.withGuess(fixedGuess);
            break;
        case GUESS_BY_TASK:
            o = Double.isNaN(chanceRate) ? o.withFreeGuess(FitOptions.DEFAULT_GUESS_MAX) : o.withGuess(chanceRate);
            break;
        default:
            o = o.withFreeGuess(FitOptions.DEFAULT_GUESS_MAX);
        }
        o = Double.isNaN(fixedLapse) ? o.withLapseMax(lapseMax) : o.withLapse(fixedLapse);
        if (!Double.isNaN(targetPsi)) {
            o = o.withTargetPsi(targetPsi);
        }
        if (!Double.isNaN(targetF)) {
            o = o.withTargetF(targetF);
        }
        return o;
    }

    /** @return the bootstrap options; only meaningful when {@link #bootstrapSamples()} &gt; 0 */
    public BootstrapOptions bootstrapOptions() {
        BootstrapOptions bo = BootstrapOptions.parametric(bootstrapSamples, seed).withNonparametric(nonparametric)
                .withLevel(level);
        return threads > 0 ? bo.withParallelism(threads) : bo;
    }

    public Sigmoid sigmoid() {
        return sigmoid;
    }

    /** @return {@value #GUESS_BY_TASK}, {@value #GUESS_FREE} or the fixed number as text */
    public String guessText() {
        return guessMode.equals("fixed") ? Double.toString(fixedGuess) : guessMode;
    }

    public double lapseMax() {
        return lapseMax;
    }

    /** @return the fixed lapse rate, NaN when estimated */
    public double fixedLapse() {
        return fixedLapse;
    }

    /** @return the target ψ, NaN for the midpoint */
    public double targetPsi() {
        return targetPsi;
    }

    /** @return the target F, NaN when not asked */
    public double targetF() {
        return targetF;
    }

    public int bootstrapSamples() {
        return bootstrapSamples;
    }

    public long seed() {
        return seed;
    }

    public IntervalMethod intervalMethod() {
        return intervalMethod;
    }

    public double level() {
        return level;
    }

    public boolean nonparametric() {
        return nonparametric;
    }

    /** @return bootstrap worker threads, 0 for one per available processor */
    public int threads() {
        return threads;
    }

    /**
     * @param t bootstrap worker threads, &ge; 1 (results do not depend on it)
     * @return a copy with that many
     */
    public FitSettings withThreads(int t) {
        if (t < 1) {
            throw new IllegalArgumentException("threads must be >= 1, was " + t);
        }
        return new FitSettings(sigmoid, guessMode, fixedGuess, lapseMax, fixedLapse, targetPsi, targetF, bootstrapSamples,
                seed, intervalMethod, level, nonparametric, t);
    }

    /** @return a one-line summary of every setting, e.g. for a file beside saved fits */
    @Override
    public String toString() {
        return "function=" + sigmoid.name() + " guess=" + guessText() + " lapse="
                + (Double.isNaN(fixedLapse) ? "free<=" + lapseMax : Double.toString(fixedLapse)) + " target="
                + (Double.isNaN(targetPsi) ? "midpoint" : Double.toString(targetPsi))
                + (Double.isNaN(targetF) ? "" : " target_f=" + targetF) + " bootstrap=" + bootstrapSamples + " seed=" + seed
                + " ci=" + intervalMethod.name().toLowerCase(Locale.ROOT) + " level=" + level
                + (nonparametric ? " nonparametric" : "");
    }
}
