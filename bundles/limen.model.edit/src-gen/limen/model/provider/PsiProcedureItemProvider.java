/**
 */
package limen.model.provider;


import java.util.Collection;
import java.util.List;

import limen.model.LimenPackage;
import limen.model.PsiProcedure;
import limen.model.PsychometricFamily;

import org.eclipse.emf.common.notify.AdapterFactory;
import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.edit.provider.ComposeableAdapterFactory;
import org.eclipse.emf.edit.provider.IItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.ItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.ViewerNotification;

/**
 * This is the item provider adapter for a {@link limen.model.PsiProcedure} object.
 * <!-- begin-user-doc -->
 * <!-- end-user-doc -->
 * @generated
 */
public class PsiProcedureItemProvider extends ProcedureItemProvider {
	/**
	 * This constructs an instance from a factory and a notifier.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public PsiProcedureItemProvider(AdapterFactory adapterFactory) {
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

			addFamilyPropertyDescriptor(object);
			addThresholdMinimumPropertyDescriptor(object);
			addThresholdMaximumPropertyDescriptor(object);
			addThresholdCountPropertyDescriptor(object);
			addSlopeMinimumPropertyDescriptor(object);
			addSlopeMaximumPropertyDescriptor(object);
			addSlopeCountPropertyDescriptor(object);
			addStimulusMinimumPropertyDescriptor(object);
			addStimulusMaximumPropertyDescriptor(object);
			addStimulusCountPropertyDescriptor(object);
			addLapseModePropertyDescriptor(object);
			addLapseRatePropertyDescriptor(object);
			addLapseMinimumPropertyDescriptor(object);
			addLapseMaximumPropertyDescriptor(object);
			addLapseCountPropertyDescriptor(object);
			addGuessRatePropertyDescriptor(object);
		}
		return itemPropertyDescriptors;
	}

	/**
	 * This adds a property descriptor for the Family feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addFamilyPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PsiProcedure_family_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PsiProcedure_family_feature", "_UI_PsiProcedure_type"),
				 LimenPackage.Literals.PSI_PROCEDURE__FAMILY,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Threshold Minimum feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addThresholdMinimumPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PsiProcedure_thresholdMinimum_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PsiProcedure_thresholdMinimum_feature", "_UI_PsiProcedure_type"),
				 LimenPackage.Literals.PSI_PROCEDURE__THRESHOLD_MINIMUM,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Threshold Maximum feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addThresholdMaximumPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PsiProcedure_thresholdMaximum_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PsiProcedure_thresholdMaximum_feature", "_UI_PsiProcedure_type"),
				 LimenPackage.Literals.PSI_PROCEDURE__THRESHOLD_MAXIMUM,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Threshold Count feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addThresholdCountPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PsiProcedure_thresholdCount_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PsiProcedure_thresholdCount_feature", "_UI_PsiProcedure_type"),
				 LimenPackage.Literals.PSI_PROCEDURE__THRESHOLD_COUNT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.INTEGRAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Slope Minimum feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addSlopeMinimumPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PsiProcedure_slopeMinimum_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PsiProcedure_slopeMinimum_feature", "_UI_PsiProcedure_type"),
				 LimenPackage.Literals.PSI_PROCEDURE__SLOPE_MINIMUM,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Slope Maximum feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addSlopeMaximumPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PsiProcedure_slopeMaximum_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PsiProcedure_slopeMaximum_feature", "_UI_PsiProcedure_type"),
				 LimenPackage.Literals.PSI_PROCEDURE__SLOPE_MAXIMUM,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Slope Count feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addSlopeCountPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PsiProcedure_slopeCount_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PsiProcedure_slopeCount_feature", "_UI_PsiProcedure_type"),
				 LimenPackage.Literals.PSI_PROCEDURE__SLOPE_COUNT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.INTEGRAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Stimulus Minimum feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addStimulusMinimumPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PsiProcedure_stimulusMinimum_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PsiProcedure_stimulusMinimum_feature", "_UI_PsiProcedure_type"),
				 LimenPackage.Literals.PSI_PROCEDURE__STIMULUS_MINIMUM,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Stimulus Maximum feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addStimulusMaximumPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PsiProcedure_stimulusMaximum_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PsiProcedure_stimulusMaximum_feature", "_UI_PsiProcedure_type"),
				 LimenPackage.Literals.PSI_PROCEDURE__STIMULUS_MAXIMUM,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Stimulus Count feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addStimulusCountPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PsiProcedure_stimulusCount_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PsiProcedure_stimulusCount_feature", "_UI_PsiProcedure_type"),
				 LimenPackage.Literals.PSI_PROCEDURE__STIMULUS_COUNT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.INTEGRAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Lapse Mode feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addLapseModePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PsiProcedure_lapseMode_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PsiProcedure_lapseMode_feature", "_UI_PsiProcedure_type"),
				 LimenPackage.Literals.PSI_PROCEDURE__LAPSE_MODE,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Lapse Rate feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addLapseRatePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PsiProcedure_lapseRate_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PsiProcedure_lapseRate_feature", "_UI_PsiProcedure_type"),
				 LimenPackage.Literals.PSI_PROCEDURE__LAPSE_RATE,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Lapse Minimum feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addLapseMinimumPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PsiProcedure_lapseMinimum_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PsiProcedure_lapseMinimum_feature", "_UI_PsiProcedure_type"),
				 LimenPackage.Literals.PSI_PROCEDURE__LAPSE_MINIMUM,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Lapse Maximum feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addLapseMaximumPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PsiProcedure_lapseMaximum_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PsiProcedure_lapseMaximum_feature", "_UI_PsiProcedure_type"),
				 LimenPackage.Literals.PSI_PROCEDURE__LAPSE_MAXIMUM,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Lapse Count feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addLapseCountPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PsiProcedure_lapseCount_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PsiProcedure_lapseCount_feature", "_UI_PsiProcedure_type"),
				 LimenPackage.Literals.PSI_PROCEDURE__LAPSE_COUNT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.INTEGRAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Guess Rate feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addGuessRatePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PsiProcedure_guessRate_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PsiProcedure_guessRate_feature", "_UI_PsiProcedure_type"),
				 LimenPackage.Literals.PSI_PROCEDURE__GUESS_RATE,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This returns PsiProcedure.gif.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object getImage(Object object) {
		return overlayImage(object, getResourceLocator().getImage("full/obj16/PsiProcedure"));
	}

	/**
	 * This returns the label text for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getText(Object object) {
		PsychometricFamily labelValue = ((PsiProcedure)object).getFamily();
		String label = labelValue == null ? null : labelValue.toString();
		return label == null || label.length() == 0 ?
			getString("_UI_PsiProcedure_type") :
			getString("_UI_PsiProcedure_type") + " " + label;
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

		switch (notification.getFeatureID(PsiProcedure.class)) {
			case LimenPackage.PSI_PROCEDURE__FAMILY:
			case LimenPackage.PSI_PROCEDURE__THRESHOLD_MINIMUM:
			case LimenPackage.PSI_PROCEDURE__THRESHOLD_MAXIMUM:
			case LimenPackage.PSI_PROCEDURE__THRESHOLD_COUNT:
			case LimenPackage.PSI_PROCEDURE__SLOPE_MINIMUM:
			case LimenPackage.PSI_PROCEDURE__SLOPE_MAXIMUM:
			case LimenPackage.PSI_PROCEDURE__SLOPE_COUNT:
			case LimenPackage.PSI_PROCEDURE__STIMULUS_MINIMUM:
			case LimenPackage.PSI_PROCEDURE__STIMULUS_MAXIMUM:
			case LimenPackage.PSI_PROCEDURE__STIMULUS_COUNT:
			case LimenPackage.PSI_PROCEDURE__LAPSE_MODE:
			case LimenPackage.PSI_PROCEDURE__LAPSE_RATE:
			case LimenPackage.PSI_PROCEDURE__LAPSE_MINIMUM:
			case LimenPackage.PSI_PROCEDURE__LAPSE_MAXIMUM:
			case LimenPackage.PSI_PROCEDURE__LAPSE_COUNT:
			case LimenPackage.PSI_PROCEDURE__GUESS_RATE:
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
