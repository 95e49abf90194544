/**
 */
package limen.model.provider;


import java.util.Collection;
import java.util.List;

import limen.model.LimenPackage;
import limen.model.WeightedUpDownProcedure;

import org.eclipse.emf.common.notify.AdapterFactory;
import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.edit.provider.ComposeableAdapterFactory;
import org.eclipse.emf.edit.provider.IItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.ItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.ViewerNotification;

/**
 * This is the item provider adapter for a {@link limen.model.WeightedUpDownProcedure} object.
 * <!-- begin-user-doc -->
 * <!-- end-user-doc -->
 * @generated
 */
public class WeightedUpDownProcedureItemProvider extends StaircaseProcedureItemProvider {
	/**
	 * This constructs an instance from a factory and a notifier.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public WeightedUpDownProcedureItemProvider(AdapterFactory adapterFactory) {
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

			addTargetProbabilityPropertyDescriptor(object);
			addUpStepPropertyDescriptor(object);
			addDownStepPropertyDescriptor(object);
			addDiscardedReversalsPropertyDescriptor(object);
			addAveragedReversalsPropertyDescriptor(object);
		}
		return itemPropertyDescriptors;
	}

	/**
	 * This adds a property descriptor for the Target Probability feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addTargetProbabilityPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_WeightedUpDownProcedure_targetProbability_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_WeightedUpDownProcedure_targetProbability_feature", "_UI_WeightedUpDownProcedure_type"),
				 LimenPackage.Literals.WEIGHTED_UP_DOWN_PROCEDURE__TARGET_PROBABILITY,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Up Step feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addUpStepPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_WeightedUpDownProcedure_upStep_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_WeightedUpDownProcedure_upStep_feature", "_UI_WeightedUpDownProcedure_type"),
				 LimenPackage.Literals.WEIGHTED_UP_DOWN_PROCEDURE__UP_STEP,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Down Step feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addDownStepPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_WeightedUpDownProcedure_downStep_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_WeightedUpDownProcedure_downStep_feature", "_UI_WeightedUpDownProcedure_type"),
				 LimenPackage.Literals.WEIGHTED_UP_DOWN_PROCEDURE__DOWN_STEP,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
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
				 getString("_UI_WeightedUpDownProcedure_discardedReversals_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_WeightedUpDownProcedure_discardedReversals_feature", "_UI_WeightedUpDownProcedure_type"),
				 LimenPackage.Literals.WEIGHTED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS,
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
				 getString("_UI_WeightedUpDownProcedure_averagedReversals_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_WeightedUpDownProcedure_averagedReversals_feature", "_UI_WeightedUpDownProcedure_type"),
				 LimenPackage.Literals.WEIGHTED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.INTEGRAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This returns WeightedUpDownProcedure.gif.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object getImage(Object object) {
		return overlayImage(object, getResourceLocator().getImage("full/obj16/WeightedUpDownProcedure"));
	}

	/**
	 * This returns the label text for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getText(Object object) {
		WeightedUpDownProcedure weightedUpDownProcedure = (WeightedUpDownProcedure)object;
		return getString("_UI_WeightedUpDownProcedure_type") + " " + weightedUpDownProcedure.getStartValue();
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

		switch (notification.getFeatureID(WeightedUpDownProcedure.class)) {
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__TARGET_PROBABILITY:
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__UP_STEP:
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__DOWN_STEP:
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS:
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS:
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
