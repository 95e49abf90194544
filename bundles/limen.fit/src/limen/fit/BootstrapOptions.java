package limen.fit;

/**
 * Immutable settings of a bootstrap: number of replicates, seed, parametric or nonparametric resampling,
 * coverage level, whether to run the Monte Carlo goodness of fit, and the number of worker threads.
 * Results depend only on the data, the fit options and these settings, never on the number of threads:
 * replicate b draws from its own generator seeded from (seed, b).
 */
public final class BootstrapOptions {

    /** Default coverage 0.95 (common practice). */
    public static final double DEFAULT_LEVEL = 0.95;

    private final int samples;
    private final long seed;
    private final boolean nonparametric;
    private final double level;
    private final boolean goodnessOfFit;
    private final int parallelism;

    private BootstrapOptions(int samples, long seed, boolean nonparametric, double level, boolean goodnessOfFit, int parallelism) {
        if (samples < 1) {
            throw new IllegalArgumentException("bootstrap samples must be >= 1, was " + samples);
        }
        if (!(level > 0 && level < 1)) {
            throw new IllegalArgumentException("confidence level must be in (0, 1), was " + level);
        }
        if (parallelism < 1) {
            throw new IllegalArgumentException("parallelism must be >= 1, was " + parallelism);
        }
        this.samples = samples;
        this.seed = seed;
        this.nonparametric = nonparametric;
        this.level = level;
        this.goodnessOfFit = goodnessOfFit;
        this.parallelism = parallelism;
    }

    /**
     * @return parametric bootstrap with {@code samples} replicates, coverage {@value #DEFAULT_LEVEL}, goodness of
     *         fit on, one worker per available processor
     */
    public static BootstrapOptions parametric(int samples, long seed) {
        return new BootstrapOptions(samples, seed, false, DEFAULT_LEVEL, true, Runtime.getRuntime().availableProcessors());
    }

    /** @return a copy resampling each cell's observed proportion (nonparametric) instead of the fitted ψ */
    public BootstrapOptions withNonparametric(boolean on) {
        return new BootstrapOptions(samples, seed, on, level, goodnessOfFit, parallelism);
    }

    public BootstrapOptions withLevel(double l) {
        return new BootstrapOptions(samples, seed, nonparametric, l, goodnessOfFit, parallelism);
    }

    /** @return a copy with the Monte Carlo goodness of fit on or off */
    public BootstrapOptions withGoodnessOfFit(boolean on) {
        return new BootstrapOptions(samples, seed, nonparametric, level, on, parallelism);
    }

    /** @return a copy with this many worker threads (results do not depend on it) */
    public BootstrapOptions withParallelism(int threads) {
        return new BootstrapOptions(samples, seed, nonparametric, level, goodnessOfFit, threads);
    }

    public int samples() {
        return samples;
    }

    public long seed() {
        return seed;
    }

    public boolean nonparametric() {
        return nonparametric;
    }

    public double level() {
        return level;
    }

    public boolean goodnessOfFit() {
        return goodnessOfFit;
    }

    public int parallelism() {
        return parallelism;
    }

    @Override
    public String toString() {
        return (nonparametric ? "nonparametric" : "parametric") + " bootstrap, " + samples + " samples, seed " + seed
                + ", level " + level + (goodnessOfFit ? ", goodness of fit" : "") + ", " + parallelism + " threads";
    }
}
