package limen.ui.authoring.edit;

import java.util.Locale;

import org.eclipse.emf.ecore.EObject;

import limen.model.Battery;
import limen.model.Break;
import limen.model.ConstantStimuliProcedure;
import limen.model.ContributedProcedure;
import limen.model.PestProcedure;
import limen.model.Procedure;
import limen.model.PsiProcedure;
import limen.model.QuestProcedure;
import limen.model.Step;
import limen.model.Track;
import limen.model.TransformedUpDownProcedure;
import limen.model.WeightedUpDownProcedure;

/** Short texts for the tree and the problem list, in the lab's words. */
public final class ElementLabels {

    private ElementLabels() {
    }

    /** @return the label of a battery, step, track or break (or a generic one for other elements) */
    public static String text(Object object) {
        if (object instanceof Battery b) {
            return blank(b.getTitle()) ? "Battery (untitled)" : b.getTitle();
        }
        if (object instanceof Step s) {
            return s.getId() + "  " + (s.getTitle() == null ? "" : s.getTitle());
        }
        if (object instanceof Track t) {
            return "Track " + t.getName() + ": " + procedure(t.getProcedure());
        }
        if (object instanceof Break b) {
            return String.format(Locale.ROOT, "Break after %d steps (at least %s s)", b.getAfterStepCount(),
                    Units.format(b.getMinimumDurationSeconds()));
        }
        if (object instanceof EObject e) {
            return e.eClass().getName();
        }
        return String.valueOf(object);
    }

    /** @return the procedure in words, e.g. "2-down/1-up staircase" */
    public static String procedure(Procedure p) {
        if (p instanceof TransformedUpDownProcedure t) {
            return t.getDownCount() + "-down/" + t.getUpCount() + "-up staircase";
        }
        if (p instanceof WeightedUpDownProcedure w) {
            return "weighted up-down staircase (target " + Units.format(w.getTargetProbability()) + ")";
        }
        if (p instanceof PestProcedure) {
            return "PEST";
        }
        if (p instanceof QuestProcedure q) {
            return q.getVariant() == null ? "QUEST" : q.getVariant().getLiteral();
        }
        if (p instanceof PsiProcedure) {
            return "Psi";
        }
        if (p instanceof ConstantStimuliProcedure c) {
            return "constant stimuli (" + c.getValues().size() + " values)";
        }
        if (p instanceof ContributedProcedure) {
            return "contributed procedure";
        }
        return "no procedure";
    }

    /**
     * @return where an element sits, for the problem list: "fd-500 / track A / procedure" and the like
     */
    public static String path(EObject object) {
        if (object == null) {
            return "";
        }
        StringBuilder out = new StringBuilder();
        for (EObject e = object; e != null; e = e.eContainer()) {
            String part = e instanceof Step s ? s.getId()
                    : e instanceof Track t ? "track " + t.getName()
                    : e instanceof Battery ? null
                    : e instanceof Break b ? "break after " + b.getAfterStepCount()
                    : ElementLabels.words(e.eClass().getName());
            if (part != null) {
                out.insert(0, out.length() == 0 ? part : part + " / ");
            }
        }
        return out.length() == 0 ? "battery" : out.toString();
    }

    /** @return "TransformedUpDownProcedure" as "transformed up down procedure" */
    public static String words(String camel) {
        return camel.replaceAll("([a-z])([A-Z])", "$1 $2").toLowerCase(Locale.ROOT);
    }

    private static boolean blank(String s) {
        return s == null || s.isBlank();
    }
}
