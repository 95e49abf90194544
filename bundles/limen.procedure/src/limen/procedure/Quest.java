package limen.procedure;

import limen.procedure.internal.AbstractProcedure;
import limen.procedure.internal.GridPosterior;

/**
 * QUEST / ZEST on a threshold grid; see {@link QuestSettings}. The posterior is kept as log
 * weights, so long runs do not underflow.
 */
public final class Quest extends AbstractProcedure {

    private final QuestSettings settings;
    private final double[] grid;
    private final double[] logPosterior;

    Quest(QuestSettings settings) {
        super(settings.stopRule());
        this.settings = settings;
        this.grid = settings.gridShared();
        this.logPosterior = new double[grid.length];
        for (int i = 0; i < grid.length; i++) {
            logPosterior[i] = GridPosterior.logGaussian(grid[i], settings.priorMean(), settings.priorSd());
        }
    }

    public QuestSettings settings() {
        return settings;
    }

    /** @return the normalised posterior over {@link QuestSettings#grid()} (a copy) */
    public double[] posterior() {
        return GridPosterior.normalise(logPosterior);
    }

    @Override
    protected double computeNext() {
        return summary(settings.placement());
    }

    private double summary(Placement which) {
        if (which == Placement.MODE) {
            return grid[GridPosterior.argMax(logPosterior)];
        }
        return GridPosterior.meanSd(grid, posterior())[0];
    }

    @Override
    protected void update(double value, boolean correct) {
        for (int i = 0; i < grid.length; i++) {
            double psi = settings.guess() + (1 - settings.guess() - settings.lapse())
                    * settings.sigmoid().value(value, settings.locationOf(grid[i]), settings.spread());
            logPosterior[i] += Math.log(correct ? psi : 1 - psi);
        }
    }

    @Override
    public Target target() {
        return settings.target();
    }

    /** @return the posterior mode or mean (per the settings' estimator) and the posterior SD */
    @Override
    public Estimate estimate() {
        double[] p = posterior();
        double[] ms = GridPosterior.meanSd(grid, p);
        double value = settings.estimator() == Placement.MEAN ? ms[0] : grid[GridPosterior.argMax(p)];
        return new Estimate(value, ms[1], Estimate.Kind.POSTERIOR_SD, trials());
    }
}
