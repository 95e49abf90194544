package limen.procedure;

import limen.procedure.internal.AbstractProcedure;

/**
 * PEST (Taylor &amp; Creelman 1967); rules in {@link PestSettings}. The estimate is the level to be
 * tested next (after the minimum-step ending: the final level), with the current step as its
 * resolution ({@link Estimate.Kind#STEP_SIZE}, in the author's form: Δ or factor).
 */
public final class Pest extends AbstractProcedure {

    private final PestSettings settings;
    private final StepScale scale;
    private final double floorWorking;
    private final double ceilingWorking;
    private double level;
    private double step;
    private int trialsAtLevel;
    private int correctAtLevel;
    private Reversal.Direction lastDirection;
    private int stepsInDirection;
    private boolean lastStepDoubled;
    private boolean doubledBeforeLastReversal;
    private boolean ended;
    private int moves;

    Pest(PestSettings settings) {
        super(settings.stopRule());
        this.settings = settings;
        this.scale = settings.scale();
        this.floorWorking = scale == StepScale.MULTIPLICATIVE && settings.floor() <= 0 ? Double.NEGATIVE_INFINITY
                : scale.toWorking(settings.floor());
        this.ceilingWorking = settings.ceiling() == Double.POSITIVE_INFINITY ? Double.POSITIVE_INFINITY
                : scale.toWorking(settings.ceiling());
        this.level = scale.toWorking(settings.start());
        this.step = settings.initialStepWorking();
    }

    public PestSettings settings() {
        return settings;
    }

    /** @return the step the next move would take (before the reversal/doubling rules), author's form */
    public double currentStep() {
        return scale.stepFromWorking(step);
    }

    /** @return the number of level changes so far */
    public int moves() {
        return moves;
    }

    /** @return trials and correct answers at the current level */
    public int[] countsAtLevel() {
        return new int[] {trialsAtLevel, correctAtLevel};
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
    protected boolean methodEnded() {
        return ended;
    }

    @Override
    protected void update(double value, boolean correct) {
        level = scale.toWorking(value);
        trialsAtLevel++;
        if (correct) {
            correctAtLevel++;
        }
        double expected = settings.targetProbability() * trialsAtLevel;
        if (correctAtLevel - expected > settings.waldLimit()) {
            move(Reversal.Direction.DOWN, value);
        } else if (expected - correctAtLevel > settings.waldLimit()) {
            move(Reversal.Direction.UP, value);
        }
    }

    private void move(Reversal.Direction direction, double value) {
        double next;
        boolean doubled = false;
        if (lastDirection == null) {
            next = step;
            stepsInDirection = 1;
        } else if (direction != lastDirection) {
            addReversal(value, direction);
            doubledBeforeLastReversal = lastStepDoubled;
            next = step / 2;
            stepsInDirection = 1;
        } else {
            stepsInDirection++;
            if (stepsInDirection == 3) {
                doubled = !doubledBeforeLastReversal;
            } else if (stepsInDirection >= 4) {
                doubled = true;
            }
            next = doubled ? step * 2 : step;
        }
        if (next > settings.maximumStepWorking()) {
            next = settings.maximumStepWorking();
            doubled = doubled && next > step;
        }
        if (next < settings.minimumStepWorking()) {
            if (settings.endAtMinimumStep()) {
                ended = true;
            } else {
                next = settings.minimumStepWorking();
            }
        }
        lastStepDoubled = doubled;
        lastDirection = direction;
        step = next;
        level = Math.min(Math.max(level + (direction == Reversal.Direction.DOWN ? -next : next), floorWorking),
                ceilingWorking);
        trialsAtLevel = 0;
        correctAtLevel = 0;
        moves++;
    }

    @Override
    public Target target() {
        return settings.target();
    }

    @Override
    public Estimate estimate() {
        if (moves == 0) {
            return Estimate.none(trials());
        }
        return new Estimate(scale.fromWorking(level), scale.stepFromWorking(step), Estimate.Kind.STEP_SIZE, trials());
    }
}
