/**
 */
package limen.model.impl;

import java.lang.reflect.InvocationTargetException;

import java.util.Collection;
import java.util.Map;

import limen.model.LimenPackage;
import limen.model.Setting;
import limen.model.SettingsGroup;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.NotificationChain;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.EObjectImpl;

import org.eclipse.emf.ecore.util.EObjectContainmentEList;
import org.eclipse.emf.ecore.util.InternalEList;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Settings Group</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.SettingsGroupImpl#getContributorId <em>Contributor Id</em>}</li>
 *   <li>{@link limen.model.impl.SettingsGroupImpl#getEntries <em>Entries</em>}</li>
 * </ul>
 *
 * @generated
 */
public class SettingsGroupImpl extends EObjectImpl implements SettingsGroup {
	/**
	 * The default value of the '{@link #getContributorId() <em>Contributor Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getContributorId()
	 * @generated
	 * @ordered
	 */
	protected static final String CONTRIBUTOR_ID_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getContributorId() <em>Contributor Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getContributorId()
	 * @generated
	 * @ordered
	 */
	protected String contributorId = CONTRIBUTOR_ID_EDEFAULT;

	/**
	 * The cached value of the '{@link #getEntries() <em>Entries</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEntries()
	 * @generated
	 * @ordered
	 */
	protected EList<Setting> entries;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected SettingsGroupImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.SETTINGS_GROUP;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getContributorId() {
		return contributorId;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setContributorId(String newContributorId) {
		String oldContributorId = contributorId;
		contributorId = newContributorId;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.SETTINGS_GROUP__CONTRIBUTOR_ID, oldContributorId, contributorId));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Setting> getEntries() {
		if (entries == null) {
			entries = new EObjectContainmentEList<Setting>(Setting.class, this, LimenPackage.SETTINGS_GROUP__ENTRIES);
		}
		return entries;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean validSettings(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.SettingsRules.validSettings(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case LimenPackage.SETTINGS_GROUP__ENTRIES:
				return ((InternalEList<?>)getEntries()).basicRemove(otherEnd, msgs);
		}
		return super.eInverseRemove(otherEnd, featureID, msgs);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case LimenPackage.SETTINGS_GROUP__CONTRIBUTOR_ID:
				return getContributorId();
			case LimenPackage.SETTINGS_GROUP__ENTRIES:
				return getEntries();
		}
		return super.eGet(featureID, resolve, coreType);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@SuppressWarnings("unchecked")
	@Override
	public void eSet(int featureID, Object newValue) {
		switch (featureID) {
			case LimenPackage.SETTINGS_GROUP__CONTRIBUTOR_ID:
				setContributorId((String)newValue);
				return;
			case LimenPackage.SETTINGS_GROUP__ENTRIES:
				getEntries().clear();
				getEntries().addAll((Collection<? extends Setting>)newValue);
				return;
		}
		super.eSet(featureID, newValue);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void eUnset(int featureID) {
		switch (featureID) {
			case LimenPackage.SETTINGS_GROUP__CONTRIBUTOR_ID:
				setContributorId(CONTRIBUTOR_ID_EDEFAULT);
				return;
			case LimenPackage.SETTINGS_GROUP__ENTRIES:
				getEntries().clear();
				return;
		}
		super.eUnset(featureID);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean eIsSet(int featureID) {
		switch (featureID) {
			case LimenPackage.SETTINGS_GROUP__CONTRIBUTOR_ID:
				return CONTRIBUTOR_ID_EDEFAULT == null ? contributorId != null : !CONTRIBUTOR_ID_EDEFAULT.equals(contributorId);
			case LimenPackage.SETTINGS_GROUP__ENTRIES:
				return entries != null && !entries.isEmpty();
		}
		return super.eIsSet(featureID);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	@SuppressWarnings("unchecked")
	public Object eInvoke(int operationID, EList<?> arguments) throws InvocationTargetException {
		switch (operationID) {
			case LimenPackage.SETTINGS_GROUP___VALID_SETTINGS__DIAGNOSTICCHAIN_MAP:
				return validSettings((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
		}
		return super.eInvoke(operationID, arguments);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String toString() {
		if (eIsProxy()) return super.toString();

		StringBuilder result = new StringBuilder(super.toString());
		result.append(" (contributorId: ");
		result.append(contributorId);
		result.append(')');
		return result.toString();
	}

} //SettingsGroupImpl
