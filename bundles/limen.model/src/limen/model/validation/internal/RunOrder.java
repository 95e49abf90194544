package limen.model.validation.internal;

import java.util.ArrayList;
import java.util.List;

import limen.model.Battery;
import limen.model.OrderingPolicy;
import limen.model.Step;

/**
 * Which step positions an ordering policy can give a step: FIXED keeps the list order; SHUFFLED and
 * LATIN_SQUARE put the movable steps (those without fixedPosition) into the movable slots in any order, so a
 * movable step can run at any movable slot and a fixed step only at its own index.
 */
final class RunOrder {

    private RunOrder() {
    }

    /** @return whether {@code earlier} runs before {@code later} in every order the battery's policy allows */
    static boolean alwaysBefore(Battery battery, Step earlier, Step later) {
        if (earlier == later) {
            return false;
        }
        List<Integer> first = positions(battery, earlier);
        List<Integer> second = positions(battery, later);
        if (first.isEmpty() || second.isEmpty()) {
            return false;
        }
        return first.stream().mapToInt(Integer::intValue).max().getAsInt()
                < second.stream().mapToInt(Integer::intValue).min().getAsInt();
    }

    /** @return whether the policy can move the step away from its list index */
    static boolean movable(Battery battery, Step step) {
        return battery.getOrdering() != OrderingPolicy.FIXED && !step.isFixedPosition();
    }

    private static List<Integer> positions(Battery battery, Step step) {
        List<Step> steps = battery.getSteps();
        int index = steps.indexOf(step);
        List<Integer> result = new ArrayList<>();
        if (index < 0) {
            return result;
        }
        if (!movable(battery, step)) {
            result.add(index);
            return result;
        }
        for (int i = 0; i < steps.size(); i++) {
            if (movable(battery, steps.get(i))) {
                result.add(i);
            }
        }
        return result;
    }
}
