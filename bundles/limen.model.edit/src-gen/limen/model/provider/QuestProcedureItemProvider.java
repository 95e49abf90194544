/**
 */
package limen.model.provider;


import java.util.Collection;
import java.util.List;

import limen.model.BayesianVariant;
import limen.model.LimenPackage;
import limen.model.QuestProcedure;

import org.eclipse.emf.common.notify.AdapterFactory;
import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.edit.provider.ComposeableAdapterFactory;
import org.eclipse.emf.edit.provider.IItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.ItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.ViewerNotification;

/**
 * This is the item provider adapter for a {@link limen.model.QuestProcedure} object.
 * <!-- begin-user-doc -->
 * <!-- end-user-doc -->
 * @generated
 */
public class QuestProcedureItemProvider extends ProcedureItemProvider {
	/**
	 * This constructs an instance from a factory and a notifier.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public QuestProcedureItemProvider(AdapterFactory adapterFactory) {
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

			addVariantPropertyDescriptor(object);
			addPriorMeanPropertyDescriptor(object);
			addPriorSdPropertyDescriptor(object);
			addBetaPropertyDescriptor(object);
			addLapseRatePropertyDescriptor(object);
			addGuessRatePropertyDescriptor(object);
			addGrainPropertyDescriptor(object);
			addRangePropertyDescriptor(object);
			addPlacementPropertyDescriptor(object);
		}
		return itemPropertyDescriptors;
	}

	/**
	 * This adds a property descriptor for the Variant feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addVariantPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_QuestProcedure_variant_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_QuestProcedure_variant_feature", "_UI_QuestProcedure_type"),
				 LimenPackage.Literals.QUEST_PROCEDURE__VARIANT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Prior Mean feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addPriorMeanPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_QuestProcedure_priorMean_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_QuestProcedure_priorMean_feature", "_UI_QuestProcedure_type"),
				 LimenPackage.Literals.QUEST_PROCEDURE__PRIOR_MEAN,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Prior Sd feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addPriorSdPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_QuestProcedure_priorSd_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_QuestProcedure_priorSd_feature", "_UI_QuestProcedure_type"),
				 LimenPackage.Literals.QUEST_PROCEDURE__PRIOR_SD,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Beta feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addBetaPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_QuestProcedure_beta_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_QuestProcedure_beta_feature", "_UI_QuestProcedure_type"),
				 LimenPackage.Literals.QUEST_PROCEDURE__BETA,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
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
				 getString("_UI_QuestProcedure_lapseRate_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_QuestProcedure_lapseRate_feature", "_UI_QuestProcedure_type"),
				 LimenPackage.Literals.QUEST_PROCEDURE__LAPSE_RATE,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
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
				 getString("_UI_QuestProcedure_guessRate_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_QuestProcedure_guessRate_feature", "_UI_QuestProcedure_type"),
				 LimenPackage.Literals.QUEST_PROCEDURE__GUESS_RATE,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Grain feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addGrainPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_QuestProcedure_grain_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_QuestProcedure_grain_feature", "_UI_QuestProcedure_type"),
				 LimenPackage.Literals.QUEST_PROCEDURE__GRAIN,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Range feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addRangePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_QuestProcedure_range_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_QuestProcedure_range_feature", "_UI_QuestProcedure_type"),
				 LimenPackage.Literals.QUEST_PROCEDURE__RANGE,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Placement feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addPlacementPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_QuestProcedure_placement_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_QuestProcedure_placement_feature", "_UI_QuestProcedure_type"),
				 LimenPackage.Literals.QUEST_PROCEDURE__PLACEMENT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This returns QuestProcedure.gif.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object getImage(Object object) {
		return overlayImage(object, getResourceLocator().getImage("full/obj16/QuestProcedure"));
	}

	/**
	 * This returns the label text for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getText(Object object) {
		BayesianVariant labelValue = ((QuestProcedure)object).getVariant();
		String label = labelValue == null ? null : labelValue.toString();
		return label == null || label.length() == 0 ?
			getString("_UI_QuestProcedure_type") :
			getString("_UI_QuestProcedure_type") + " " + label;
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

		switch (notification.getFeatureID(QuestProcedure.class)) {
			case LimenPackage.QUEST_PROCEDURE__VARIANT:
			case LimenPackage.QUEST_PROCEDURE__PRIOR_MEAN:
			case LimenPackage.QUEST_PROCEDURE__PRIOR_SD:
			case LimenPackage.QUEST_PROCEDURE__BETA:
			case LimenPackage.QUEST_PROCEDURE__LAPSE_RATE:
			case LimenPackage.QUEST_PROCEDURE__GUESS_RATE:
			case LimenPackage.QUEST_PROCEDURE__GRAIN:
			case LimenPackage.QUEST_PROCEDURE__RANGE:
			case LimenPackage.QUEST_PROCEDURE__PLACEMENT:
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
