package limen.example.lab;

import java.util.Optional;

import limen.core.extension.Settings;
import limen.procedure.ProcedureContext;
import limen.procedure.ProcedureFactory;
import limen.procedure.ProcedureKind;
import limen.procedure.UpDownSettings;

/**
 * The Harbourside Auditory Lab's "steady staircase" (an invented lab's house method), a battery's
 * {@code ContributedProcedure} with contributor id {@value #ID}: one step up after each wrong answer, one step
 * down after three correct answers in a row, always the same additive step. Levitt's (1971) transformed up-down
 * rule with n = 3, m = 1 converges where p³ = 1/2, p = 0.794 correct.
 * <p>
 * Settings (types as written in the battery's settings group):
 * <ul>
 * <li>{@code startValue} REAL, {@code floorValue} REAL, {@code ceilingValue} REAL: where the track starts and
 * the values it is kept within, in the varied quantity's unit;</li>
 * <li>{@code stepSize} REAL &gt; 0: the fixed step, same unit;</li>
 * <li>{@code discardedReversals} INTEGER &ge; 0 (default 2) and {@code averagedReversals} INTEGER &ge; 0
 * (default 0 = all remaining): the estimate is the mean of the reversal values after the first ones are
 * dropped.</li>
 * </ul>
 * Built on the public {@link UpDownSettings}, which validates every value and says which one is wrong; the
 * messages reach the author through {@code ./limen check} (LM0806).
 */
public final class FixedThreeDownOneUp implements ProcedureKind {

    /** The contributor id a battery names. */
    public static final String ID = "harbourside.steady-staircase";

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "Harbourside steady staircase (fixed step, 3-down 1-up)";
    }

    @Override
    public ProcedureFactory create(Settings settings, ProcedureContext context) {
        double step = settings.real("stepSize");
        if (!(step > 0)) {
            throw new IllegalArgumentException("setting 'stepSize' must be > 0, was " + step);
        }
        return UpDownSettings.builder().start(settings.real("startValue"))
                .limits(settings.real("floorValue"), settings.real("ceilingValue")).additive(step).rule(3, 1)
                .threshold(settings.integer("discardedReversals", 2), settings.integer("averagedReversals", 0))
                .stop(context.stopRule()).build();
    }

    /**
     * For a simulation without a named listener: a logistic with its midpoint four steps below the start (never
     * below the floor) and a scale of one step, the rule Limen uses for its own additive staircases.
     */
    @Override
    public Optional<String> defaultListener(Settings settings) {
        double step = settings.real("stepSize");
        double mid = Math.max(settings.real("startValue") - 4 * step, settings.real("floorValue"));
        return Optional.of("logistic:mid=" + mid + ",scale=" + step);
    }
}
