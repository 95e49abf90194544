/**
 */
package limen.model.provider;


import java.util.Collection;
import java.util.List;

import limen.model.ExposureEstimate;
import limen.model.LimenPackage;

import org.eclipse.emf.common.notify.AdapterFactory;
import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.ResourceLocator;

import org.eclipse.emf.edit.provider.ComposeableAdapterFactory;
import org.eclipse.emf.edit.provider.IEditingDomainItemProvider;
import org.eclipse.emf.edit.provider.IItemLabelProvider;
import org.eclipse.emf.edit.provider.IItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.IItemPropertySource;
import org.eclipse.emf.edit.provider.IStructuredItemContentProvider;
import org.eclipse.emf.edit.provider.ITreeItemContentProvider;
import org.eclipse.emf.edit.provider.ItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.ItemProviderAdapter;
import org.eclipse.emf.edit.provider.ViewerNotification;

/**
 * This is the item provider adapter for a {@link limen.model.ExposureEstimate} object.
 * <!-- begin-user-doc -->
 * <!-- end-user-doc -->
 * @generated
 */
public class ExposureEstimateItemProvider 
	extends ItemProviderAdapter
	implements
		IEditingDomainItemProvider,
		IStructuredItemContentProvider,
		ITreeItemContentProvider,
		IItemLabelProvider,
		IItemPropertySource {
	/**
	 * This constructs an instance from a factory and a notifier.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public ExposureEstimateItemProvider(AdapterFactory adapterFactory) {
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

			addPeakLevelDbSplPropertyDescriptor(object);
			addEquivalentLevelDbSplPropertyDescriptor(object);
			addSoundOnSecondsPropertyDescriptor(object);
			addNioshDosePercentPropertyDescriptor(object);
			addOshaDosePercentPropertyDescriptor(object);
		}
		return itemPropertyDescriptors;
	}

	/**
	 * This adds a property descriptor for the Peak Level Db Spl feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addPeakLevelDbSplPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ExposureEstimate_peakLevelDbSpl_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ExposureEstimate_peakLevelDbSpl_feature", "_UI_ExposureEstimate_type"),
				 LimenPackage.Literals.EXPOSURE_ESTIMATE__PEAK_LEVEL_DB_SPL,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Equivalent Level Db Spl feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addEquivalentLevelDbSplPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ExposureEstimate_equivalentLevelDbSpl_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ExposureEstimate_equivalentLevelDbSpl_feature", "_UI_ExposureEstimate_type"),
				 LimenPackage.Literals.EXPOSURE_ESTIMATE__EQUIVALENT_LEVEL_DB_SPL,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Sound On Seconds feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addSoundOnSecondsPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ExposureEstimate_soundOnSeconds_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ExposureEstimate_soundOnSeconds_feature", "_UI_ExposureEstimate_type"),
				 LimenPackage.Literals.EXPOSURE_ESTIMATE__SOUND_ON_SECONDS,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Niosh Dose Percent feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addNioshDosePercentPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ExposureEstimate_nioshDosePercent_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ExposureEstimate_nioshDosePercent_feature", "_UI_ExposureEstimate_type"),
				 LimenPackage.Literals.EXPOSURE_ESTIMATE__NIOSH_DOSE_PERCENT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Osha Dose Percent feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addOshaDosePercentPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ExposureEstimate_oshaDosePercent_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ExposureEstimate_oshaDosePercent_feature", "_UI_ExposureEstimate_type"),
				 LimenPackage.Literals.EXPOSURE_ESTIMATE__OSHA_DOSE_PERCENT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This returns ExposureEstimate.gif.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object getImage(Object object) {
		return overlayImage(object, getResourceLocator().getImage("full/obj16/ExposureEstimate"));
	}

	/**
	 * This returns the label text for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getText(Object object) {
		ExposureEstimate exposureEstimate = (ExposureEstimate)object;
		return getString("_UI_ExposureEstimate_type") + " " + exposureEstimate.getPeakLevelDbSpl();
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

		switch (notification.getFeatureID(ExposureEstimate.class)) {
			case LimenPackage.EXPOSURE_ESTIMATE__PEAK_LEVEL_DB_SPL:
			case LimenPackage.EXPOSURE_ESTIMATE__EQUIVALENT_LEVEL_DB_SPL:
			case LimenPackage.EXPOSURE_ESTIMATE__SOUND_ON_SECONDS:
			case LimenPackage.EXPOSURE_ESTIMATE__NIOSH_DOSE_PERCENT:
			case LimenPackage.EXPOSURE_ESTIMATE__OSHA_DOSE_PERCENT:
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

	/**
	 * Return the resource locator for this item provider's resources.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ResourceLocator getResourceLocator() {
		return LimenEditPlugin.INSTANCE;
	}

}
