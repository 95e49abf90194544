/**
 */
package limen.model.impl;

import java.lang.reflect.InvocationTargetException;

import java.util.Map;

import limen.model.ForcedChoiceTask;
import limen.model.LimenPackage;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Forced Choice Task</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.ForcedChoiceTaskImpl#getIntervalCount <em>Interval Count</em>}</li>
 *   <li>{@link limen.model.impl.ForcedChoiceTaskImpl#getInterStimulusIntervalSeconds <em>Inter Stimulus Interval Seconds</em>}</li>
 * </ul>
 *
 * @generated
 */
public class ForcedChoiceTaskImpl extends TaskImpl implements ForcedChoiceTask {
	/**
	 * The default value of the '{@link #getIntervalCount() <em>Interval Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getIntervalCount()
	 * @generated
	 * @ordered
	 */
	protected static final int INTERVAL_COUNT_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getIntervalCount() <em>Interval Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getIntervalCount()
	 * @generated
	 * @ordered
	 */
	protected int intervalCount = INTERVAL_COUNT_EDEFAULT;

	/**
	 * The default value of the '{@link #getInterStimulusIntervalSeconds() <em>Inter Stimulus Interval Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getInterStimulusIntervalSeconds()
	 * @generated
	 * @ordered
	 */
	protected static final double INTER_STIMULUS_INTERVAL_SECONDS_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getInterStimulusIntervalSeconds() <em>Inter Stimulus Interval Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getInterStimulusIntervalSeconds()
	 * @generated
	 * @ordered
	 */
	protected double interStimulusIntervalSeconds = INTER_STIMULUS_INTERVAL_SECONDS_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected ForcedChoiceTaskImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.FORCED_CHOICE_TASK;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getIntervalCount() {
		return intervalCount;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setIntervalCount(int newIntervalCount) {
		int oldIntervalCount = intervalCount;
		intervalCount = newIntervalCount;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.FORCED_CHOICE_TASK__INTERVAL_COUNT, oldIntervalCount, intervalCount));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getInterStimulusIntervalSeconds() {
		return interStimulusIntervalSeconds;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setInterStimulusIntervalSeconds(double newInterStimulusIntervalSeconds) {
		double oldInterStimulusIntervalSeconds = interStimulusIntervalSeconds;
		interStimulusIntervalSeconds = newInterStimulusIntervalSeconds;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.FORCED_CHOICE_TASK__INTER_STIMULUS_INTERVAL_SECONDS, oldInterStimulusIntervalSeconds, interStimulusIntervalSeconds));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean validIntervals(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.TaskRules.validIntervals(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case LimenPackage.FORCED_CHOICE_TASK__INTERVAL_COUNT:
				return getIntervalCount();
			case LimenPackage.FORCED_CHOICE_TASK__INTER_STIMULUS_INTERVAL_SECONDS:
				return getInterStimulusIntervalSeconds();
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
			case LimenPackage.FORCED_CHOICE_TASK__INTERVAL_COUNT:
				setIntervalCount((Integer)newValue);
				return;
			case LimenPackage.FORCED_CHOICE_TASK__INTER_STIMULUS_INTERVAL_SECONDS:
				setInterStimulusIntervalSeconds((Double)newValue);
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
			case LimenPackage.FORCED_CHOICE_TASK__INTERVAL_COUNT:
				setIntervalCount(INTERVAL_COUNT_EDEFAULT);
				return;
			case LimenPackage.FORCED_CHOICE_TASK__INTER_STIMULUS_INTERVAL_SECONDS:
				setInterStimulusIntervalSeconds(INTER_STIMULUS_INTERVAL_SECONDS_EDEFAULT);
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
			case LimenPackage.FORCED_CHOICE_TASK__INTERVAL_COUNT:
				return intervalCount != INTERVAL_COUNT_EDEFAULT;
			case LimenPackage.FORCED_CHOICE_TASK__INTER_STIMULUS_INTERVAL_SECONDS:
				return interStimulusIntervalSeconds != INTER_STIMULUS_INTERVAL_SECONDS_EDEFAULT;
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
			case LimenPackage.FORCED_CHOICE_TASK___VALID_INTERVALS__DIAGNOSTICCHAIN_MAP:
				return validIntervals((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
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
		result.append(" (intervalCount: ");
		result.append(intervalCount);
		result.append(", interStimulusIntervalSeconds: ");
		result.append(interStimulusIntervalSeconds);
		result.append(')');
		return result.toString();
	}

} //ForcedChoiceTaskImpl
