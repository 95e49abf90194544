package limen.ui.authoring.edit;

import java.util.HashMap;
import java.util.Map;
import java.util.function.Function;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.ecore.util.EcoreUtil;

import limen.model.LimenPackage.Literals;
import limen.model.StaircaseProcedure;
import limen.model.Step;
import limen.model.StepMode;

/**
 * How the settings form shows one feature: its label, its unit (which may depend on the step, e.g. a
 * staircase's start value is in the step's quantity unit, its step size a factor in multiplicative mode), the
 * {@link Domain} typing is held to, and the model's own documentation as the tool tip.
 *
 * @param label the label without unit
 * @param unit the unit shown after the field ("" for none)
 * @param domain accepted numbers (null for text, choices and switches)
 * @param help the tool tip
 */
public record FieldSpec(String label, String unit, Domain domain, String help) {

    private static final Map<EStructuralFeature, Rule> RULES = new HashMap<>();

    /** The unit and domain of a feature, given its owner. */
    private record Rule(Function<EObject, String> unit, Domain domain) {
    }

    private static void put(Domain domain, String unit, EStructuralFeature... features) {
        for (EStructuralFeature f : features) {
            RULES.put(f, new Rule(o -> unit, domain));
        }
    }

    private static void put(Domain domain, Function<EObject, String> unit, EStructuralFeature... features) {
        for (EStructuralFeature f : features) {
            RULES.put(f, new Rule(unit, domain));
        }
    }

    static {
        put(Domain.SEED, "", Literals.BATTERY__SHUFFLE_SEED);
        put(Domain.COUNT, "steps", Literals.BREAK__AFTER_STEP_COUNT);
        put(Domain.DURATION, "s", Literals.BREAK__MINIMUM_DURATION_SECONDS, Literals.TASK__INTERVAL_DURATION_SECONDS,
                Literals.TASK__RESPONSE_WINDOW_SECONDS, Literals.TASK__INTER_TRIAL_INTERVAL_SECONDS,
                Literals.FORCED_CHOICE_TASK__INTER_STIMULUS_INTERVAL_SECONDS, Literals.STIMULUS__RAMP_DURATION_SECONDS);
        put(Domain.COUNT, "intervals", Literals.FORCED_CHOICE_TASK__INTERVAL_COUNT);
        put(Domain.PROBABILITY, "", Literals.YES_NO_TASK__CATCH_TRIAL_RATE);
        put(Domain.FREQUENCY, "Hz", Literals.STIMULUS__STANDARD_FREQUENCY_HZ, Literals.MASKER_NOISE__LOW_CUTOFF_HZ,
                Literals.MASKER_NOISE__HIGH_CUTOFF_HZ);
        put(Domain.LEVEL, "dB SPL", Literals.ABSOLUTE_LEVEL__LEVEL_DB_SPL);
        put(Domain.LEVEL, "dB", Literals.RELATIVE_LEVEL__OFFSET_DB);
        Function<EObject, String> quantity = o -> Units.quantity(stepOf(o));
        Function<EObject, String> axis = o -> Units.axis(stepOf(o));
        Function<EObject, String> stepSize = o -> o instanceof StaircaseProcedure s
                && s.getStepMode() == StepMode.MULTIPLICATIVE ? "× (factor)" : Units.quantity(stepOf(o));
        put(Domain.FINITE, quantity, Literals.STAIRCASE_PROCEDURE__START_VALUE, Literals.STAIRCASE_PROCEDURE__FLOOR_VALUE,
                Literals.STAIRCASE_PROCEDURE__CEILING_VALUE, Literals.QUEST_PROCEDURE__PRIOR_MEAN,
                Literals.PSI_PROCEDURE__THRESHOLD_MINIMUM, Literals.PSI_PROCEDURE__THRESHOLD_MAXIMUM,
                Literals.PSI_PROCEDURE__STIMULUS_MINIMUM, Literals.PSI_PROCEDURE__STIMULUS_MAXIMUM,
                Literals.CONSTANT_STIMULI_PROCEDURE__VALUES);
        put(Domain.NON_NEGATIVE, stepSize, Literals.TRANSFORMED_UP_DOWN_PROCEDURE__INITIAL_STEP,
                Literals.TRANSFORMED_UP_DOWN_PROCEDURE__MINIMUM_STEP, Literals.WEIGHTED_UP_DOWN_PROCEDURE__UP_STEP,
                Literals.WEIGHTED_UP_DOWN_PROCEDURE__DOWN_STEP, Literals.PEST_PROCEDURE__INITIAL_STEP,
                Literals.PEST_PROCEDURE__MINIMUM_STEP, Literals.PEST_PROCEDURE__MAXIMUM_STEP);
        put(Domain.PROBABILITY, "", Literals.TRANSFORMED_UP_DOWN_PROCEDURE__SHRINK_FACTOR,
                Literals.WEIGHTED_UP_DOWN_PROCEDURE__TARGET_PROBABILITY, Literals.PEST_PROCEDURE__TARGET_PROBABILITY,
                Literals.QUEST_PROCEDURE__LAPSE_RATE, Literals.QUEST_PROCEDURE__GUESS_RATE,
                Literals.PSI_PROCEDURE__LAPSE_RATE, Literals.PSI_PROCEDURE__LAPSE_MINIMUM,
                Literals.PSI_PROCEDURE__LAPSE_MAXIMUM, Literals.PSI_PROCEDURE__GUESS_RATE);
        put(Domain.COUNT, "", Literals.TRANSFORMED_UP_DOWN_PROCEDURE__DOWN_COUNT,
                Literals.TRANSFORMED_UP_DOWN_PROCEDURE__UP_COUNT);
        put(Domain.COUNT, "reversals", Literals.TRANSFORMED_UP_DOWN_PROCEDURE__REVERSALS_PER_SHRINK,
                Literals.TRANSFORMED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS,
                Literals.TRANSFORMED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS,
                Literals.WEIGHTED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS,
                Literals.WEIGHTED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS, Literals.STOPPING_RULE__MAXIMUM_REVERSALS);
        put(Domain.COUNT, "trials", Literals.STOPPING_RULE__MAXIMUM_TRIALS,
                Literals.CONSTANT_STIMULI_PROCEDURE__REPETITIONS_PER_VALUE);
        put(Domain.COUNT, "points", Literals.PSI_PROCEDURE__THRESHOLD_COUNT, Literals.PSI_PROCEDURE__SLOPE_COUNT,
                Literals.PSI_PROCEDURE__STIMULUS_COUNT, Literals.PSI_PROCEDURE__LAPSE_COUNT);
        put(Domain.NON_NEGATIVE, "SD", Literals.PEST_PROCEDURE__WALD_DEVIATION);
        put(Domain.NON_NEGATIVE, axis, Literals.QUEST_PROCEDURE__PRIOR_SD, Literals.QUEST_PROCEDURE__GRAIN,
                Literals.QUEST_PROCEDURE__RANGE, Literals.STOPPING_RULE__POSTERIOR_SD_TARGET);
        put(Domain.NON_NEGATIVE, "", Literals.QUEST_PROCEDURE__BETA, Literals.PSI_PROCEDURE__SLOPE_MINIMUM,
                Literals.PSI_PROCEDURE__SLOPE_MAXIMUM);
    }

    /**
     * @param owner the element being edited
     * @param feature one of its features
     * @return how the form shows the feature
     */
    public static FieldSpec of(EObject owner, EStructuralFeature feature) {
        Rule rule = RULES.get(feature);
        Domain domain = rule != null ? rule.domain() : defaultDomain(feature);
        String unit = rule != null ? rule.unit().apply(owner) : "";
        String doc = EcoreUtil.getDocumentation(feature);
        String help = doc == null ? "" : doc;
        if (domain != null) {
            help = help + (help.isEmpty() ? "" : "\n") + "Accepted: " + domain.describe()
                    + (feature.isUnsettable() ? "; empty = not set" : "");
        }
        return new FieldSpec(label(feature), unit, domain, help);
    }

    private static Domain defaultDomain(EStructuralFeature feature) {
        if (!(feature instanceof EAttribute a)) {
            return null;
        }
        Class<?> type = a.getEAttributeType().getInstanceClass();
        if (type == int.class || type == Integer.class || type == long.class || type == Long.class) {
            return Domain.COUNT;
        }
        if (type == double.class || type == Double.class) {
            return Domain.FINITE;
        }
        return null;
    }

    /** @return "interStimulusIntervalSeconds" as "Inter stimulus interval" (the unit is shown apart) */
    public static String label(EStructuralFeature feature) {
        String name = feature.getName().replaceAll("(Seconds|Hz|DbSpl|Db)$", "");
        return Units.capitalised(ElementLabels.words(name)).replace(" sd", " SD");
    }

    /** @return the step an element belongs to, or null */
    public static Step stepOf(EObject o) {
        for (EObject e = o; e != null; e = e.eContainer()) {
            if (e instanceof Step s) {
                return s;
            }
        }
        return null;
    }
}
