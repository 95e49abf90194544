package limen.model.validation.internal;

import static limen.model.validation.internal.Rules.report;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.ecore.EObject;

import limen.model.Battery;
import limen.model.Break;
import limen.model.LimenPackage.Literals;
import limen.model.OrderingPolicy;
import limen.model.RelativeLevel;
import limen.model.Step;
import limen.model.validation.ProblemCode;

/** Invariants of {@link Battery}: step ids, ordering, breaks, and reference cycles between steps. */
public final class BatteryRules {

    private BatteryRules() {
    }

    /** LM0102 duplicate step id, LM0108 blank id or id with white space (an XMI reference is a word). */
    public static boolean uniqueStepIds(Battery battery, DiagnosticChain diagnostics, Map<Object, Object> context) {
        boolean ok = true;
        Map<String, Step> seen = new HashMap<>();
        for (Step step : battery.getSteps()) {
            String id = step.getId();
            if (id == null) {
                continue; // a missing id is a multiplicity problem (LM0001)
            }
            if (id.isBlank() || !id.equals(id.strip()) || id.chars().anyMatch(Character::isWhitespace)) {
                ok &= report(diagnostics, ProblemCode.STEP_ID_INVALID, step, Literals.STEP__ID, id,
                        Labels.of(step) + ": id '" + id + "' must be a single word without white space");
                continue;
            }
            Step first = seen.putIfAbsent(id, step);
            if (first != null) {
                ok &= report(diagnostics, ProblemCode.DUPLICATE_STEP_ID, step, Literals.STEP__ID, id,
                        Labels.of(step) + ": id '" + id + "' is already used by " + Labels.of(first));
            }
        }
        return ok;
    }

    /** LM0103 seed without shuffling, LM0104 a permuting policy with fewer than two movable steps. */
    public static boolean validOrdering(Battery battery, DiagnosticChain diagnostics, Map<Object, Object> context) {
        boolean ok = true;
        OrderingPolicy policy = battery.getOrdering();
        if (battery.isSetShuffleSeed() && policy != OrderingPolicy.SHUFFLED) {
            ok &= report(diagnostics, ProblemCode.SEED_WITHOUT_SHUFFLE, battery, Literals.BATTERY__SHUFFLE_SEED,
                    battery.getShuffleSeed(), Labels.of(battery) + ": shuffle seed " + battery.getShuffleSeed()
                            + " is ignored because the ordering is " + policy);
        }
        if (policy != OrderingPolicy.FIXED) {
            long movable = battery.getSteps().stream().filter(s -> !s.isFixedPosition()).count();
            if (movable < 2) {
                ok &= report(diagnostics, ProblemCode.NOTHING_TO_PERMUTE, battery, Literals.BATTERY__ORDERING, policy,
                        Labels.of(battery) + ": ordering " + policy + " has " + movable
                                + " movable step(s), so the order never changes");
            }
        }
        return ok;
    }

    /** LM0105 break outside 1..steps-1, LM0106 negative minimum duration, LM0107 two breaks at one place. */
    public static boolean validBreaks(Battery battery, DiagnosticChain diagnostics, Map<Object, Object> context) {
        boolean ok = true;
        int steps = battery.getSteps().size();
        Set<Integer> places = new HashSet<>();
        for (Break pause : battery.getBreaks()) {
            int after = pause.getAfterStepCount();
            if (after < 1 || after > steps - 1) {
                ok &= report(diagnostics, ProblemCode.BREAK_OUT_OF_RANGE, pause, Literals.BREAK__AFTER_STEP_COUNT,
                        after, Labels.of(battery) + ": a break after " + after + " steps does not lie between two of its "
                                + steps + " steps (use 1 to " + (steps - 1) + ")");
            } else if (!places.add(after)) {
                ok &= report(diagnostics, ProblemCode.BREAKS_AT_SAME_PLACE, pause, Literals.BREAK__AFTER_STEP_COUNT,
                        after, Labels.of(battery) + ": two breaks follow step " + after);
            }
            if (!Rules.notNegative(pause.getMinimumDurationSeconds())) {
                ok &= report(diagnostics, ProblemCode.BREAK_DURATION_NEGATIVE, pause,
                        Literals.BREAK__MINIMUM_DURATION_SECONDS, pause.getMinimumDurationSeconds(),
                        Labels.of(pause) + ": minimum duration " + Rules.seconds(pause.getMinimumDurationSeconds())
                                + " must be 0 or more");
            }
        }
        return ok;
    }

    /**
     * LM0505: a depth-first search over "step uses the result of step" edges; each cycle is reported once, on
     * the relative level that closes it.
     */
    public static boolean noReferenceCycles(Battery battery, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        Map<Step, List<RelativeLevel>> edges = new LinkedHashMap<>();
        for (Step step : battery.getSteps()) {
            List<RelativeLevel> out = new ArrayList<>();
            for (var it = step.eAllContents(); it.hasNext();) {
                EObject e = it.next();
                if (e instanceof RelativeLevel level && level.getReference() != null
                        && !level.getReference().eIsProxy() && level.getReference().eContainer() == battery) {
                    out.add(level);
                }
            }
            edges.put(step, out);
        }
        boolean ok = true;
        Map<Step, Integer> state = new HashMap<>(); // absent: new, 1: on the current path, 2: done
        for (Step start : battery.getSteps()) {
            if (!state.containsKey(start)) {
                ok &= visit(start, edges, state, new ArrayList<>(), diagnostics);
            }
        }
        return ok;
    }

    private static boolean visit(Step step, Map<Step, List<RelativeLevel>> edges, Map<Step, Integer> state,
            List<Step> path, DiagnosticChain diagnostics) {
        boolean ok = true;
        state.put(step, 1);
        path.add(step);
        for (RelativeLevel level : edges.getOrDefault(step, List.of())) {
            Step target = level.getReference();
            Integer s = state.get(target);
            if (s == null) {
                ok &= visit(target, edges, state, path, diagnostics);
            } else if (s == 1) {
                List<Step> cycle = path.subList(path.indexOf(target), path.size());
                StringBuilder text = new StringBuilder();
                for (Step c : cycle) {
                    text.append('\'').append(c.getTitle()).append("' -> ");
                }
                text.append('\'').append(target.getTitle()).append('\'');
                ok &= report(diagnostics, ProblemCode.REFERENCE_CYCLE, level, Literals.RELATIVE_LEVEL__REFERENCE,
                        target.getId(), Labels.of(step) + ": levels refer to each other's results in a cycle: " + text);
            }
        }
        path.remove(path.size() - 1);
        state.put(step, 2);
        return ok;
    }
}
