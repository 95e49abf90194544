package limen.ui.authoring.edit;

import java.util.List;
import java.util.function.Function;
import java.util.stream.Collectors;

import org.eclipse.emf.common.notify.AdapterFactory;
import org.eclipse.emf.edit.provider.IItemLabelProvider;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.swt.graphics.Image;

import limen.model.Battery;
import limen.model.Break;
import limen.model.Step;
import limen.model.Track;
import limen.model.validation.Problem;
import limen.model.validation.Severity;
import limen.ui.authoring.internal.Icons;

/**
 * A JFace label provider over EMF.Edit's {@link IItemLabelProvider}, with the element's problems shown at the
 * element: an error or warning icon in place of its own, and the messages as its tool tip.
 */
public final class ItemLabelProvider extends ColumnLabelProvider {

    private final AdapterFactory factory;
    private final Icons icons;
    private final Function<Object, List<Problem>> problemsAt;

    /**
     * @param problemsAt the problems shown at a tree element (its own and those of the settings it holds)
     */
    public ItemLabelProvider(AdapterFactory factory, Icons icons, Function<Object, List<Problem>> problemsAt) {
        this.factory = factory;
        this.icons = icons;
        this.problemsAt = problemsAt;
    }

    @Override
    public String getText(Object element) {
        IItemLabelProvider provider = (IItemLabelProvider) factory.adapt(element, IItemLabelProvider.class);
        return provider == null ? String.valueOf(element) : provider.getText(element);
    }

    @Override
    public Image getImage(Object element) {
        Severity worst = worst(problemsAt.apply(element));
        if (worst == Severity.ERROR) {
            return icons.error();
        }
        if (worst == Severity.WARNING) {
            return icons.warning();
        }
        if (element instanceof Battery) {
            return icons.battery();
        }
        if (element instanceof Step) {
            return icons.step();
        }
        if (element instanceof Track) {
            return icons.track();
        }
        if (element instanceof Break) {
            return icons.pause();
        }
        return null;
    }

    @Override
    public String getToolTipText(Object element) {
        List<Problem> problems = problemsAt.apply(element);
        if (problems.isEmpty()) {
            return null;
        }
        return problems.stream().map(p -> p.severity().label() + " " + p.code().code() + ": " + p.message())
                .collect(Collectors.joining("\n"));
    }

    /** @return the worst severity among problems, or null for none */
    public static Severity worst(List<Problem> problems) {
        Severity worst = null;
        for (Problem p : problems) {
            if (p.severity() == Severity.ERROR) {
                return Severity.ERROR;
            }
            worst = Severity.WARNING;
        }
        return worst;
    }
}
