package limen.ui.authoring.edit;

import java.util.Collection;

import org.eclipse.emf.common.notify.AdapterFactory;
import org.eclipse.emf.edit.provider.ITreeItemContentProvider;
import org.eclipse.jface.viewers.ITreeContentProvider;

/**
 * A JFace tree content provider that asks EMF.Edit item providers for children and parents (the small adapter
 * that {@code emf.edit.ui}'s {@code AdapterFactoryContentProvider} would be, were that bundle available). The
 * viewer's input is a collection of root elements.
 */
public final class ItemContentProvider implements ITreeContentProvider {

    private final AdapterFactory factory;

    public ItemContentProvider(AdapterFactory factory) {
        this.factory = factory;
    }

    @Override
    public Object[] getElements(Object input) {
        if (input instanceof Collection<?> roots) {
            return roots.toArray();
        }
        return getChildren(input);
    }

    @Override
    public Object[] getChildren(Object element) {
        ITreeItemContentProvider provider = provider(element);
        return provider == null ? new Object[0] : provider.getChildren(element).toArray();
    }

    @Override
    public Object getParent(Object element) {
        ITreeItemContentProvider provider = provider(element);
        return provider == null ? null : provider.getParent(element);
    }

    @Override
    public boolean hasChildren(Object element) {
        ITreeItemContentProvider provider = provider(element);
        return provider != null && provider.hasChildren(element);
    }

    private ITreeItemContentProvider provider(Object element) {
        return (ITreeItemContentProvider) factory.adapt(element, ITreeItemContentProvider.class);
    }
}
