/**
 */
package limen.model.provider;


import java.util.Collection;
import java.util.List;

import limen.model.LimenFactory;
import limen.model.LimenPackage;
import limen.model.SessionHeader;

import org.eclipse.emf.common.notify.AdapterFactory;
import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EStructuralFeature;

import org.eclipse.emf.edit.provider.ComposeableAdapterFactory;
import org.eclipse.emf.edit.provider.IItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.ItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.ViewerNotification;

/**
 * This is the item provider adapter for a {@link limen.model.SessionHeader} object.
 * <!-- begin-user-doc -->
 * <!-- end-user-doc -->
 * @generated
 */
public class SessionHeaderItemProvider extends LimenDocumentItemProvider {
	/**
	 * This constructs an instance from a factory and a notifier.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public SessionHeaderItemProvider(AdapterFactory adapterFactory) {
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

			addParticipantPropertyDescriptor(object);
			addDevicePropertyDescriptor(object);
			addRandomSeedPropertyDescriptor(object);
			addSoftwareVersionPropertyDescriptor(object);
			addStartTimePropertyDescriptor(object);
			addEndTimePropertyDescriptor(object);
			addStatusPropertyDescriptor(object);
			addLatinSquareRowPropertyDescriptor(object);
			addStepOrderPropertyDescriptor(object);
		}
		return itemPropertyDescriptors;
	}

	/**
	 * This adds a property descriptor for the Participant feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addParticipantPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SessionHeader_participant_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SessionHeader_participant_feature", "_UI_SessionHeader_type"),
				 LimenPackage.Literals.SESSION_HEADER__PARTICIPANT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Device feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addDevicePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SessionHeader_device_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SessionHeader_device_feature", "_UI_SessionHeader_type"),
				 LimenPackage.Literals.SESSION_HEADER__DEVICE,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Random Seed feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addRandomSeedPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SessionHeader_randomSeed_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SessionHeader_randomSeed_feature", "_UI_SessionHeader_type"),
				 LimenPackage.Literals.SESSION_HEADER__RANDOM_SEED,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.INTEGRAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Software Version feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addSoftwareVersionPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SessionHeader_softwareVersion_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SessionHeader_softwareVersion_feature", "_UI_SessionHeader_type"),
				 LimenPackage.Literals.SESSION_HEADER__SOFTWARE_VERSION,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Start Time feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addStartTimePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SessionHeader_startTime_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SessionHeader_startTime_feature", "_UI_SessionHeader_type"),
				 LimenPackage.Literals.SESSION_HEADER__START_TIME,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the End Time feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addEndTimePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SessionHeader_endTime_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SessionHeader_endTime_feature", "_UI_SessionHeader_type"),
				 LimenPackage.Literals.SESSION_HEADER__END_TIME,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Status feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addStatusPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SessionHeader_status_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SessionHeader_status_feature", "_UI_SessionHeader_type"),
				 LimenPackage.Literals.SESSION_HEADER__STATUS,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Latin Square Row feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addLatinSquareRowPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SessionHeader_latinSquareRow_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SessionHeader_latinSquareRow_feature", "_UI_SessionHeader_type"),
				 LimenPackage.Literals.SESSION_HEADER__LATIN_SQUARE_ROW,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.INTEGRAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Step Order feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addStepOrderPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SessionHeader_stepOrder_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SessionHeader_stepOrder_feature", "_UI_SessionHeader_type"),
				 LimenPackage.Literals.SESSION_HEADER__STEP_ORDER,
				 true,
				 false,
				 true,
				 null,
				 null,
				 null));
	}

	/**
	 * This specifies how to implement {@link #getChildren} and is used to deduce an appropriate feature for an
	 * {@link org.eclipse.emf.edit.command.AddCommand}, {@link org.eclipse.emf.edit.command.RemoveCommand} or
	 * {@link org.eclipse.emf.edit.command.MoveCommand} in {@link #createCommand}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Collection<? extends EStructuralFeature> getChildrenFeatures(Object object) {
		if (childrenFeatures == null) {
			super.getChildrenFeatures(object);
			childrenFeatures.add(LimenPackage.Literals.SESSION_HEADER__BATTERY);
			childrenFeatures.add(LimenPackage.Literals.SESSION_HEADER__CALIBRATION);
			childrenFeatures.add(LimenPackage.Literals.SESSION_HEADER__EXPOSURE);
		}
		return childrenFeatures;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EStructuralFeature getChildFeature(Object object, Object child) {
		// Check the type of the specified child object and return the proper feature to use for
		// adding (see {@link AddCommand}) it as a child.

		return super.getChildFeature(object, child);
	}

	/**
	 * This returns SessionHeader.gif.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object getImage(Object object) {
		return overlayImage(object, getResourceLocator().getImage("full/obj16/SessionHeader"));
	}

	/**
	 * This returns the label text for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getText(Object object) {
		String label = ((SessionHeader)object).getParticipant();
		return label == null || label.length() == 0 ?
			getString("_UI_SessionHeader_type") :
			getString("_UI_SessionHeader_type") + " " + label;
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

		switch (notification.getFeatureID(SessionHeader.class)) {
			case LimenPackage.SESSION_HEADER__PARTICIPANT:
			case LimenPackage.SESSION_HEADER__DEVICE:
			case LimenPackage.SESSION_HEADER__RANDOM_SEED:
			case LimenPackage.SESSION_HEADER__SOFTWARE_VERSION:
			case LimenPackage.SESSION_HEADER__START_TIME:
			case LimenPackage.SESSION_HEADER__END_TIME:
			case LimenPackage.SESSION_HEADER__STATUS:
			case LimenPackage.SESSION_HEADER__LATIN_SQUARE_ROW:
				fireNotifyChanged(new ViewerNotification(notification, notification.getNotifier(), false, true));
				return;
			case LimenPackage.SESSION_HEADER__BATTERY:
			case LimenPackage.SESSION_HEADER__CALIBRATION:
			case LimenPackage.SESSION_HEADER__EXPOSURE:
				fireNotifyChanged(new ViewerNotification(notification, notification.getNotifier(), true, false));
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

		newChildDescriptors.add
			(createChildParameter
				(LimenPackage.Literals.SESSION_HEADER__BATTERY,
				 LimenFactory.eINSTANCE.createBattery()));

		newChildDescriptors.add
			(createChildParameter
				(LimenPackage.Literals.SESSION_HEADER__CALIBRATION,
				 LimenFactory.eINSTANCE.createCalibration()));

		newChildDescriptors.add
			(createChildParameter
				(LimenPackage.Literals.SESSION_HEADER__EXPOSURE,
				 LimenFactory.eINSTANCE.createExposureEstimate()));
	}

}
