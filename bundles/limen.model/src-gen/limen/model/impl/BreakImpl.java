/**
 */
package limen.model.impl;

import limen.model.Break;
import limen.model.LimenPackage;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.EObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Break</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.BreakImpl#getAfterStepCount <em>After Step Count</em>}</li>
 *   <li>{@link limen.model.impl.BreakImpl#getMinimumDurationSeconds <em>Minimum Duration Seconds</em>}</li>
 *   <li>{@link limen.model.impl.BreakImpl#getMessage <em>Message</em>}</li>
 * </ul>
 *
 * @generated
 */
public class BreakImpl extends EObjectImpl implements Break {
	/**
	 * The default value of the '{@link #getAfterStepCount() <em>After Step Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAfterStepCount()
	 * @generated
	 * @ordered
	 */
	protected static final int AFTER_STEP_COUNT_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getAfterStepCount() <em>After Step Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAfterStepCount()
	 * @generated
	 * @ordered
	 */
	protected int afterStepCount = AFTER_STEP_COUNT_EDEFAULT;

	/**
	 * The default value of the '{@link #getMinimumDurationSeconds() <em>Minimum Duration Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMinimumDurationSeconds()
	 * @generated
	 * @ordered
	 */
	protected static final double MINIMUM_DURATION_SECONDS_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMinimumDurationSeconds() <em>Minimum Duration Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMinimumDurationSeconds()
	 * @generated
	 * @ordered
	 */
	protected double minimumDurationSeconds = MINIMUM_DURATION_SECONDS_EDEFAULT;

	/**
	 * The default value of the '{@link #getMessage() <em>Message</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMessage()
	 * @generated
	 * @ordered
	 */
	protected static final String MESSAGE_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getMessage() <em>Message</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMessage()
	 * @generated
	 * @ordered
	 */
	protected String message = MESSAGE_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected BreakImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.BREAK;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getAfterStepCount() {
		return afterStepCount;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setAfterStepCount(int newAfterStepCount) {
		int oldAfterStepCount = afterStepCount;
		afterStepCount = newAfterStepCount;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.BREAK__AFTER_STEP_COUNT, oldAfterStepCount, afterStepCount));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMinimumDurationSeconds() {
		return minimumDurationSeconds;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMinimumDurationSeconds(double newMinimumDurationSeconds) {
		double oldMinimumDurationSeconds = minimumDurationSeconds;
		minimumDurationSeconds = newMinimumDurationSeconds;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.BREAK__MINIMUM_DURATION_SECONDS, oldMinimumDurationSeconds, minimumDurationSeconds));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getMessage() {
		return message;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMessage(String newMessage) {
		String oldMessage = message;
		message = newMessage;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.BREAK__MESSAGE, oldMessage, message));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case LimenPackage.BREAK__AFTER_STEP_COUNT:
				return getAfterStepCount();
			case LimenPackage.BREAK__MINIMUM_DURATION_SECONDS:
				return getMinimumDurationSeconds();
			case LimenPackage.BREAK__MESSAGE:
				return getMessage();
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
			case LimenPackage.BREAK__AFTER_STEP_COUNT:
				setAfterStepCount((Integer)newValue);
				return;
			case LimenPackage.BREAK__MINIMUM_DURATION_SECONDS:
				setMinimumDurationSeconds((Double)newValue);
				return;
			case LimenPackage.BREAK__MESSAGE:
				setMessage((String)newValue);
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
			case LimenPackage.BREAK__AFTER_STEP_COUNT:
				setAfterStepCount(AFTER_STEP_COUNT_EDEFAULT);
				return;
			case LimenPackage.BREAK__MINIMUM_DURATION_SECONDS:
				setMinimumDurationSeconds(MINIMUM_DURATION_SECONDS_EDEFAULT);
				return;
			case LimenPackage.BREAK__MESSAGE:
				setMessage(MESSAGE_EDEFAULT);
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
			case LimenPackage.BREAK__AFTER_STEP_COUNT:
				return afterStepCount != AFTER_STEP_COUNT_EDEFAULT;
			case LimenPackage.BREAK__MINIMUM_DURATION_SECONDS:
				return minimumDurationSeconds != MINIMUM_DURATION_SECONDS_EDEFAULT;
			case LimenPackage.BREAK__MESSAGE:
				return MESSAGE_EDEFAULT == null ? message != null : !MESSAGE_EDEFAULT.equals(message);
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
		result.append(" (afterStepCount: ");
		result.append(afterStepCount);
		result.append(", minimumDurationSeconds: ");
		result.append(minimumDurationSeconds);
		result.append(", message: ");
		result.append(message);
		result.append(')');
		return result.toString();
	}

} //BreakImpl
