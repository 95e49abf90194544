package limen.ui.authoring.edit;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.common.command.CompoundCommand;
import org.eclipse.emf.common.command.UnexecutableCommand;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.emf.edit.command.AddCommand;
import org.eclipse.emf.edit.command.DeleteCommand;
import org.eclipse.emf.edit.command.MoveCommand;

import limen.model.Battery;
import limen.model.LimenPackage.Literals;
import limen.model.Step;
import limen.model.Track;

/**
 * The battery's structural edits as EMF.Edit commands: reorder steps (or a step's tracks) by dragging, copy
 * and paste steps and tracks, delete them. Pasted copies get fresh step ids and track names, so a pasted step
 * never collides with its original (the validator's LM0102).
 */
public final class StructureEdits {

    private StructureEdits() {
    }

    /**
     * Moves steps before or after another step, or tracks before or after another track of the same step.
     *
     * @param moved the dragged elements, all steps or all tracks of one step
     * @param target the element dropped on
     * @param after whether to place them after the target (else before it)
     * @return the command, unexecutable when the drop makes no sense
     */
    public static Command move(BatteryDocument document, List<? extends EObject> moved, EObject target, boolean after) {
        if (moved.isEmpty() || moved.contains(target) || target == null) {
            return UnexecutableCommand.INSTANCE;
        }
        EObject owner = target.eContainer();
        boolean steps = moved.stream().allMatch(Step.class::isInstance) && target instanceof Step;
        boolean tracks = moved.stream().allMatch(m -> m instanceof Track && m.eContainer() == owner)
                && target instanceof Track;
        if (!steps && !tracks) {
            return UnexecutableCommand.INSTANCE;
        }
        @SuppressWarnings("unchecked")
        List<EObject> list = (List<EObject>) owner.eGet(steps ? Literals.BATTERY__STEPS : Literals.STEP__TRACKS);
        // the order after the move; then, position by position, one MoveCommand for each element not yet in
        // place (tracked on a simulated list, so every MoveCommand's index is right when it executes)
        List<EObject> order = new ArrayList<>(list);
        order.removeAll(moved);
        int at = order.indexOf(target) + (after ? 1 : 0);
        order.addAll(at, moved);
        List<EObject> now = new ArrayList<>(list);
        CompoundCommand command = new CompoundCommand(steps ? "Move steps" : "Move tracks");
        for (int i = 0; i < order.size(); i++) {
            EObject e = order.get(i);
            if (now.indexOf(e) != i) {
                now.remove(e);
                now.add(i, e);
                command.append(MoveCommand.create(document.domain(), owner,
                        steps ? Literals.BATTERY__STEPS : Literals.STEP__TRACKS, e, i));
            }
        }
        if (command.isEmpty()) {
            return UnexecutableCommand.INSTANCE;
        }
        return command;
    }

    /** @return copies of the selected steps, or else of the selected tracks, for the clipboard */
    public static Collection<Object> copy(List<?> selection) {
        List<EObject> steps = new ArrayList<>();
        List<EObject> tracks = new ArrayList<>();
        for (Object o : selection) {
            if (o instanceof Step s) {
                steps.add(s);
            } else if (o instanceof Track t) {
                tracks.add(t);
            }
        }
        return new ArrayList<>(EcoreUtil.copyAll(steps.isEmpty() ? tracks : steps));
    }

    /**
     * Inserts fresh copies of the clipboard: steps after the selected step (or the selected track's step, or at
     * the end), tracks after the selected track (or at the end of the selected step).
     *
     * @param selected the tree element selected, or null
     * @return the command, unexecutable when there is nothing to paste or no place for it
     */
    public static Command paste(BatteryDocument document, Collection<?> clipboard, Object selected) {
        if (clipboard == null || clipboard.isEmpty()) {
            return UnexecutableCommand.INSTANCE;
        }
        List<EObject> copies = new ArrayList<>();
        for (Object o : clipboard) {
            copies.add(EcoreUtil.copy((EObject) o));
        }
        Battery battery = document.battery();
        if (copies.stream().allMatch(Step.class::isInstance)) {
            Step anchor = selected instanceof Step s ? s : selected instanceof Track t ? (Step) t.eContainer() : null;
            int index = anchor == null ? battery.getSteps().size() : battery.getSteps().indexOf(anchor) + 1;
            Set<String> ids = new HashSet<>();
            battery.getSteps().forEach(s -> ids.add(s.getId()));
            for (EObject c : copies) {
                Step s = (Step) c;
                s.setId(fresh(s.getId(), ids));
            }
            return AddCommand.create(document.domain(), battery, Literals.BATTERY__STEPS, copies, index);
        }
        if (copies.stream().allMatch(Track.class::isInstance)) {
            Step step = selected instanceof Step s ? s : selected instanceof Track t ? (Step) t.eContainer() : null;
            if (step == null) {
                return UnexecutableCommand.INSTANCE;
            }
            int index = selected instanceof Track t ? step.getTracks().indexOf(t) + 1 : step.getTracks().size();
            Set<String> names = new HashSet<>();
            step.getTracks().forEach(t -> names.add(t.getName()));
            for (EObject c : copies) {
                Track t = (Track) c;
                t.setName(fresh(t.getName(), names));
            }
            return AddCommand.create(document.domain(), step, Literals.STEP__TRACKS, copies, index);
        }
        return UnexecutableCommand.INSTANCE;
    }

    /** @return the selected steps, tracks and breaks removed (references to them cleared) */
    public static Command delete(BatteryDocument document, List<?> selection) {
        List<Object> doomed = new ArrayList<>();
        for (Object o : selection) {
            if (o instanceof EObject e && !(o instanceof Battery)) {
                doomed.add(e);
            }
        }
        return doomed.isEmpty() ? UnexecutableCommand.INSTANCE : DeleteCommand.create(document.domain(), doomed);
    }

    /** @return base, or base-copy, base-copy2, ... whichever is not taken yet (and records it as taken) */
    static String fresh(String base, Set<String> taken) {
        String b = base == null || base.isBlank() ? "new" : base;
        String name = b + "-copy";
        for (int i = 2; taken.contains(name); i++) {
            name = b + "-copy" + i;
        }
        taken.add(name);
        return name;
    }
}
