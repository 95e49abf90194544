/**
 */
package limen.model.provider;


import java.util.Collection;
import java.util.List;

import limen.model.LimenPackage;
import limen.model.TransformedUpDownProcedure;

import org.eclipse.emf.common.notify.AdapterFactory;
import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.edit.provider.ComposeableAdapterFactory;
import org.eclipse.emf.edit.provider.IItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.ItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.ViewerNotification;

/**
 * This is the item provider adapter for a {@link limen.model.TransformedUpDownProcedure} object.
 * <!-- begin-user-doc -->
 * <!-- end-user-doc -->
 * @generated
 */
public class TransformedUpDownProcedureItemProvider extends StaircaseProcedureItemProvider {
	/**
	 * This constructs an instance from a factory and a notifier.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public TransformedUpDownProcedureItemProvider(AdapterFactory adapterFactory) {
		super(adapterFactory);
	}

	/**
	 * This returns the property descriptors for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public List<IItemPropertyDescriptor> getPropertyDescriptors(Object object) {
		if (itemPropertyDescriptors == null) {
			super.getPropertyDescriptors(object);

			addDownCountPropertyDescriptor(object);
			addUpCountPropertyDescriptor(object);
			addInitialStepPropertyDescriptor(object);
			addMinimumStepPropertyDescriptor(object);
			addShrinkFactorPropertyDescriptor(object);
			addReversalsPerShrinkPropertyDescriptor(object);
			addDiscardedReversalsPropertyDescriptor(object);
			addAveragedReversalsPropertyDescriptor(object);
		}
		return itemPropertyDescriptors;
	}

	/**
	 * This adds a property descriptor for the Down Count feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addDownCountPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_TransformedUpDownProcedure_downCount_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_TransformedUpDownProcedure_downCount_feature", "_UI_TransformedUpDownProcedure_type"),
				 LimenPackage.Literals.TRANSFORMED_UP_DOWN_PROCEDURE__DOWN_COUNT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.INTEGRAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Up Count feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addUpCountPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_TransformedUpDownProcedure_upCount_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_TransformedUpDownProcedure_upCount_feature", "_UI_TransformedUpDownProcedure_type"),
				 LimenPackage.Literals.TRANSFORMED_UP_DOWN_PROCEDURE__UP_COUNT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.INTEGRAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Initial Step feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addInitialStepPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_TransformedUpDownProcedure_initialStep_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_TransformedUpDownProcedure_initialStep_feature", "_UI_TransformedUpDownProcedure_type"),
				 LimenPackage.Literals.TRANSFORMED_UP_DOWN_PROCEDURE__INITIAL_STEP,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Minimum Step feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addMinimumStepPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_TransformedUpDownProcedure_minimumStep_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_TransformedUpDownProcedure_minimumStep_feature", "_UI_TransformedUpDownProcedure_type"),
				 LimenPackage.Literals.TRANSFORMED_UP_DOWN_PROCEDURE__MINIMUM_STEP,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Shrink Factor feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addShrinkFactorPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_TransformedUpDownProcedure_shrinkFactor_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_TransformedUpDownProcedure_shrinkFactor_feature", "_UI_TransformedUpDownProcedure_type"),
				 LimenPackage.Literals.TRANSFORMED_UP_DOWN_PROCEDURE__SHRINK_FACTOR,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Reversals Per Shrink feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addReversalsPerShrinkPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_TransformedUpDownProcedure_reversalsPerShrink_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_TransformedUpDownProcedure_reversalsPerShrink_feature", "_UI_TransformedUpDownProcedure_type"),
				 LimenPackage.Literals.TRANSFORMED_UP_DOWN_PROCEDURE__REVERSALS_PER_SHRINK,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.INTEGRAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Discarded Reversals feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addDiscardedReversalsPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_TransformedUpDownProcedure_discardedReversals_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_TransformedUpDownProcedure_discardedReversals_feature", "_UI_TransformedUpDownProcedure_type"),
				 LimenPackage.Literals.TRANSFORMED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.INTEGRAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Averaged Reversals feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addAveragedReversalsPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_TransformedUpDownProcedure_averagedReversals_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_TransformedUpDownProcedure_averagedReversals_feature", "_UI_TransformedUpDownProcedure_type"),
				 LimenPackage.Literals.TRANSFORMED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.INTEGRAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This returns TransformedUpDownProcedure.gif.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object getImage(Object object) {
		return overlayImage(object, getResourceLocator().getImage("full/obj16/TransformedUpDownProcedure"));
	}

	/**
	 * This returns the label text for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getText(Object object) {
		TransformedUpDownProcedure transformedUpDownProcedure = (TransformedUpDownProcedure)object;
		return getString("_UI_TransformedUpDownProcedure_type") + " " + transformedUpDownProcedure.getStartValue();
	}


	/**
	 * This handles model notifications by calling {@link #updateChildren} to update any cached
	 * children and by creating a viewer notification, which it passes to {@link #fireNotifyChanged}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void notifyChanged(Notification notification) {
		updateChildren(notification);

		switch (notification.getFeatureID(TransformedUpDownProcedure.class)) {
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__DOWN_COUNT:
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__UP_COUNT:
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__INITIAL_STEP:
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__MINIMUM_STEP:
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__SHRINK_FACTOR:
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__REVERSALS_PER_SHRINK:
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS:
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS:
				fireNotifyChanged(new ViewerNotification(notification, notification.getNotifier(), false, true));
				return;
		}
		super.notifyChanged(notification);
	}

	/**
	 * This adds {@link org.eclipse.emf.edit.command.CommandParameter}s describing the children
	 * that can be created under this object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected void collectNewChildDescriptors(Collection<Object> newChildDescriptors, Object object) {
		super.collectNewChildDescriptors(newChildDescriptors, object);
	}

}
