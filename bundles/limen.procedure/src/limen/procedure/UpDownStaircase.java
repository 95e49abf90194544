package limen.procedure;

import java.util.List;

import limen.procedure.internal.AbstractProcedure;

/**
 * A transformed (or weighted) up-down staircase; see {@link UpDownSettings} for the rules and
 * references. A reversal is recorded at the value of the trial whose answer moves the track in
 * the direction opposite to its previous move; the step shrink due at that reversal already applies
 * to that move.
 */
public final class UpDownStaircase extends AbstractProcedure {

    private final UpDownSettings settings;
    private final StepScale scale;
    private final double floorWorking;
    private final double ceilingWorking;
    private double level;
    private double step;
    private int correctRun;
    private int wrongRun;
    private Reversal.Direction lastDirection;

    UpDownStaircase(UpDownSettings settings) {
        super(settings.stopRule());
        this.settings = settings;
        this.scale = settings.scale();
        this.floorWorking = scale == StepScale.MULTIPLICATIVE && settings.floor() <= 0 ? Double.NEGATIVE_INFINITY
                : scale.toWorking(settings.floor());
        this.ceilingWorking = scale == StepScale.MULTIPLICATIVE && settings.ceiling() == Double.POSITIVE_INFINITY
                ? Double.POSITIVE_INFINITY : scale.toWorking(settings.ceiling());
        this.level = scale.toWorking(settings.start());
        this.step = settings.initialStepWorking();
    }

    public UpDownSettings settings() {
        return settings;
    }

    /** @return the current down step in the author's form (Δ or factor) */
    public double currentStep() {
        return scale.stepFromWorking(step);
    }

    @Override
    protected double computeNext() {
        return scale.fromWorking(level);
    }

    @Override
    protected void checkValue(double value) {
        scale.toWorking(value);
    }

    @Override
    protected void update(double value, boolean correct) {
        double u = scale.toWorking(value);
        level = u;
        if (correct) {
            wrongRun = 0;
            if (++correctRun == settings.nDown()) {
                correctRun = 0;
                move(Reversal.Direction.DOWN, value);
            }
        } else {
            correctRun = 0;
            if (++wrongRun == settings.mUp()) {
                wrongRun = 0;
                move(Reversal.Direction.UP, value);
            }
        }
    }

    private void move(Reversal.Direction direction, double value) {
        if (lastDirection != null && direction != lastDirection) {
            addReversal(value, direction);
            if (reversals().size() % settings.shrinkEveryReversals() == 0) {
                step = Math.max(step * settings.shrinkFactor(), settings.minimumStepWorking());
            }
        }
        lastDirection = direction;
        double delta = direction == Reversal.Direction.DOWN ? -step : step * settings.upDownStepRatio();
        level = Math.min(Math.max(level + delta, floorWorking), ceilingWorking);
    }

    @Override
    public Target target() {
        return settings.target();
    }

    /**
     * @return the mean of the reversals chosen by {@link UpDownSettings#threshold}; arithmetic for
     *         additive, geometric for multiplicative tracks; uncertainty = sample SD of those reversal
     *         values in x units (NaN for one reversal); not available before a reversal is usable
     */
    @Override
    public Estimate estimate() {
        List<Reversal> all = reversals();
        int from = Math.min(all.size(), settings.discardReversals());
        int count = all.size() - from;
        if (settings.useLastReversals() > 0) {
            count = Math.min(count, settings.useLastReversals());
        }
        if (count == 0) {
            return Estimate.none(0);
        }
        List<Reversal> used = all.subList(all.size() - count, all.size());
        double sumWorking = 0;
        double sum = 0;
        for (Reversal r : used) {
            sumWorking += scale.toWorking(r.value());
            sum += r.value();
        }
        double mean = sum / count;
        double ss = 0;
        for (Reversal r : used) {
            ss += (r.value() - mean) * (r.value() - mean);
        }
        double sd = count > 1 ? Math.sqrt(ss / (count - 1)) : Double.NaN;
        return new Estimate(scale.fromWorking(sumWorking / count), sd, Estimate.Kind.REVERSAL_SD, count);
    }
}
