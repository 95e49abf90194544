package limen.ui.authoring.edit;

import java.util.Collection;
import java.util.List;

import org.eclipse.emf.common.notify.Adapter;
import org.eclipse.emf.common.notify.Notifier;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.edit.provider.ReflectiveItemProvider;
import org.eclipse.emf.edit.provider.ReflectiveItemProviderAdapterFactory;

import limen.model.Battery;
import limen.model.LimenPackage.Literals;
import limen.model.Step;

/**
 * EMF.Edit item providers for batteries (the model has no generated {@code .edit} bundle): EMF's reflective
 * item provider, narrowed so that the tree shows what an author arranges - a battery's steps and breaks, a
 * step's tracks - with labels in the lab's words ({@link ElementLabels}). Everything else of an element
 * (task, stimulus, procedure, stopping rule) is edited in the settings form beside the tree.
 * <p>
 * The same providers create the editing commands (add, move, remove), so copy, paste and drag-to-reorder
 * run through EMF.Edit's {@code AddCommand}/{@code MoveCommand}/{@code DeleteCommand}.
 */
public final class BatteryItemProviders extends ReflectiveItemProviderAdapterFactory {

    private final TreeItemProvider provider = new TreeItemProvider(this);

    @Override
    public Adapter createAdapter(Notifier target) {
        // the superclass makes its plain reflective provider in its constructor: hand out ours instead
        return provider;
    }

    @Override
    public void dispose() {
        provider.dispose();
        super.dispose();
    }

    /** The reflective provider with the tree's children and our labels. */
    static final class TreeItemProvider extends ReflectiveItemProvider {

        TreeItemProvider(BatteryItemProviders factory) {
            super(factory);
        }

        @Override
        protected Collection<? extends EStructuralFeature> getChildrenFeatures(Object object) {
            if (object instanceof Battery) {
                return List.of(Literals.BATTERY__STEPS, Literals.BATTERY__BREAKS);
            }
            if (object instanceof Step) {
                return List.of(Literals.STEP__TRACKS);
            }
            return List.of();
        }

        @Override
        public String getText(Object object) {
            return ElementLabels.text(object);
        }

        @Override
        public Object getImage(Object object) {
            return null; // the label provider draws its own icons with the problem markers
        }
    }
}
