/**
 */
package limen.model.impl;

import limen.model.CalibrationPoint;
import limen.model.LimenPackage;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.EObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Calibration Point</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.CalibrationPointImpl#getFrequencyHz <em>Frequency Hz</em>}</li>
 *   <li>{@link limen.model.impl.CalibrationPointImpl#getMeasuredDbSpl <em>Measured Db Spl</em>}</li>
 * </ul>
 *
 * @generated
 */
public class CalibrationPointImpl extends EObjectImpl implements CalibrationPoint {
	/**
	 * The default value of the '{@link #getFrequencyHz() <em>Frequency Hz</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFrequencyHz()
	 * @generated
	 * @ordered
	 */
	protected static final double FREQUENCY_HZ_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getFrequencyHz() <em>Frequency Hz</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFrequencyHz()
	 * @generated
	 * @ordered
	 */
	protected double frequencyHz = FREQUENCY_HZ_EDEFAULT;

	/**
	 * The default value of the '{@link #getMeasuredDbSpl() <em>Measured Db Spl</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMeasuredDbSpl()
	 * @generated
	 * @ordered
	 */
	protected static final double MEASURED_DB_SPL_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMeasuredDbSpl() <em>Measured Db Spl</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMeasuredDbSpl()
	 * @generated
	 * @ordered
	 */
	protected double measuredDbSpl = MEASURED_DB_SPL_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected CalibrationPointImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.CALIBRATION_POINT;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getFrequencyHz() {
		return frequencyHz;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setFrequencyHz(double newFrequencyHz) {
		double oldFrequencyHz = frequencyHz;
		frequencyHz = newFrequencyHz;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.CALIBRATION_POINT__FREQUENCY_HZ, oldFrequencyHz, frequencyHz));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMeasuredDbSpl() {
		return measuredDbSpl;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMeasuredDbSpl(double newMeasuredDbSpl) {
		double oldMeasuredDbSpl = measuredDbSpl;
		measuredDbSpl = newMeasuredDbSpl;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.CALIBRATION_POINT__MEASURED_DB_SPL, oldMeasuredDbSpl, measuredDbSpl));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case LimenPackage.CALIBRATION_POINT__FREQUENCY_HZ:
				return getFrequencyHz();
			case LimenPackage.CALIBRATION_POINT__MEASURED_DB_SPL:
				return getMeasuredDbSpl();
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
			case LimenPackage.CALIBRATION_POINT__FREQUENCY_HZ:
				setFrequencyHz((Double)newValue);
				return;
			case LimenPackage.CALIBRATION_POINT__MEASURED_DB_SPL:
				setMeasuredDbSpl((Double)newValue);
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
			case LimenPackage.CALIBRATION_POINT__FREQUENCY_HZ:
				setFrequencyHz(FREQUENCY_HZ_EDEFAULT);
				return;
			case LimenPackage.CALIBRATION_POINT__MEASURED_DB_SPL:
				setMeasuredDbSpl(MEASURED_DB_SPL_EDEFAULT);
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
			case LimenPackage.CALIBRATION_POINT__FREQUENCY_HZ:
				return frequencyHz != FREQUENCY_HZ_EDEFAULT;
			case LimenPackage.CALIBRATION_POINT__MEASURED_DB_SPL:
				return measuredDbSpl != MEASURED_DB_SPL_EDEFAULT;
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
		result.append(" (frequencyHz: ");
		result.append(frequencyHz);
		result.append(", measuredDbSpl: ");
		result.append(measuredDbSpl);
		result.append(')');
		return result.toString();
	}

} //CalibrationPointImpl
