package limen.procedure;

import java.util.Objects;
import java.util.random.RandomGenerator;

import limen.procedure.internal.AbstractProcedure;
import limen.procedure.internal.BinomialFit;
import limen.psychometric.PsychometricFunction;

/**
 * The method of constant stimuli in shuffled blocks; see {@link ConstantStimuliSettings}.
 * Recorded values are counted at the nearest planned value.
 */
public final class ConstantStimuli extends AbstractProcedure {

    private final ConstantStimuliSettings settings;
    private final RandomGenerator rng;
    private final double[] values;
    private final int[] block;
    private final int[] presented;
    private final int[] correct;
    private int position;

    ConstantStimuli(ConstantStimuliSettings settings, RandomGenerator rng) {
        super(StopRule.never());
        this.settings = settings;
        this.rng = Objects.requireNonNull(rng, "rng");
        this.values = settings.valuesShared();
        this.block = new int[values.length * settings.repetitionsPerBlock()];
        this.presented = new int[values.length];
        this.correct = new int[values.length];
        this.position = block.length; // a new block is shuffled on the first request
    }

    public ConstantStimuliSettings settings() {
        return settings;
    }

    @Override
    protected boolean methodEnded() {
        return trials() >= settings.totalTrials();
    }

    @Override
    protected double computeNext() {
        if (position == block.length) {
            for (int i = 0; i < block.length; i++) {
                block[i] = i % values.length;
            }
            for (int i = block.length - 1; i > 0; i--) {
                int j = rng.nextInt(i + 1);
                int t = block[i];
                block[i] = block[j];
                block[j] = t;
            }
            position = 0;
        }
        return values[block[position]];
    }

    @Override
    protected void update(double value, boolean isCorrect) {
        position++;
        int nearest = 0;
        for (int i = 1; i < values.length; i++) {
            if (Math.abs(values[i] - value) < Math.abs(values[nearest] - value)) {
                nearest = i;
            }
        }
        presented[nearest]++;
        if (isCorrect) {
            correct[nearest]++;
        }
    }

    /** @return trials per planned value so far (a copy) */
    public int[] presentedCounts() {
        return presented.clone();
    }

    /** @return correct answers per planned value so far (a copy) */
    public int[] correctCounts() {
        return correct.clone();
    }

    @Override
    public Target target() {
        return settings.target();
    }

    @Override
    public Estimate estimate() {
        BinomialFit.Result r = BinomialFit.fit(settings.sigmoid(), settings.guess(), settings.lapse(), values, presented, correct);
        if (r.function() == null) {
            return Estimate.none(trials());
        }
        PsychometricFunction f = r.function();
        double x = settings.target().valueOn(f);
        double se = Double.NaN;
        if (r.covariance() != null) {
            double hl = 1e-6 * Math.max(Math.abs(f.location()), f.spread());
            double hs = 1e-6 * f.spread();
            double gl = (settings.target().valueOn(f.withLocation(f.location() + hl)) - x) / hl;
            double gs = (settings.target().valueOn(f.withSpread(f.spread() + hs)) - x) / hs;
            double[][] c = r.covariance();
            double var = gl * gl * c[0][0] + 2 * gl * gs * c[0][1] + gs * gs * c[1][1];
            se = var >= 0 ? Math.sqrt(var) : Double.NaN;
        }
        return new Estimate(x, se, Estimate.Kind.STANDARD_ERROR, trials());
    }
}
