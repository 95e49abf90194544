/**
 */
package limen.model.impl;

import limen.model.AbsoluteLevel;
import limen.model.LimenPackage;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Absolute Level</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.AbsoluteLevelImpl#getLevelDbSpl <em>Level Db Spl</em>}</li>
 * </ul>
 *
 * @generated
 */
public class AbsoluteLevelImpl extends LevelImpl implements AbsoluteLevel {
	/**
	 * The default value of the '{@link #getLevelDbSpl() <em>Level Db Spl</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLevelDbSpl()
	 * @generated
	 * @ordered
	 */
	protected static final double LEVEL_DB_SPL_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getLevelDbSpl() <em>Level Db Spl</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLevelDbSpl()
	 * @generated
	 * @ordered
	 */
	protected double levelDbSpl = LEVEL_DB_SPL_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected AbsoluteLevelImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.ABSOLUTE_LEVEL;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getLevelDbSpl() {
		return levelDbSpl;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLevelDbSpl(double newLevelDbSpl) {
		double oldLevelDbSpl = levelDbSpl;
		levelDbSpl = newLevelDbSpl;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.ABSOLUTE_LEVEL__LEVEL_DB_SPL, oldLevelDbSpl, levelDbSpl));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case LimenPackage.ABSOLUTE_LEVEL__LEVEL_DB_SPL:
				return getLevelDbSpl();
		}
		return super.eGet(featureID, resolve, coreType);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void eSet(int featureID, Object newValue) {
		switch (featureID) {
			case LimenPackage.ABSOLUTE_LEVEL__LEVEL_DB_SPL:
				setLevelDbSpl((Double)newValue);
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
			case LimenPackage.ABSOLUTE_LEVEL__LEVEL_DB_SPL:
				setLevelDbSpl(LEVEL_DB_SPL_EDEFAULT);
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
			case LimenPackage.ABSOLUTE_LEVEL__LEVEL_DB_SPL:
				return levelDbSpl != LEVEL_DB_SPL_EDEFAULT;
		}
		return super.eIsSet(featureID);
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
		result.append(" (levelDbSpl: ");
		result.append(levelDbSpl);
		result.append(')');
		return result.toString();
	}

} //AbsoluteLevelImpl
