/**
 */
package limen.model.impl;

import java.lang.reflect.InvocationTargetException;

import java.util.Map;

import limen.model.EarlyResponsePolicy;
import limen.model.LimenPackage;
import limen.model.Task;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.EObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Task</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.TaskImpl#getIntervalDurationSeconds <em>Interval Duration Seconds</em>}</li>
 *   <li>{@link limen.model.impl.TaskImpl#getResponseWindowSeconds <em>Response Window Seconds</em>}</li>
 *   <li>{@link limen.model.impl.TaskImpl#getInterTrialIntervalSeconds <em>Inter Trial Interval Seconds</em>}</li>
 *   <li>{@link limen.model.impl.TaskImpl#isFeedback <em>Feedback</em>}</li>
 *   <li>{@link limen.model.impl.TaskImpl#getEarlyResponses <em>Early Responses</em>}</li>
 * </ul>
 *
 * @generated
 */
public abstract class TaskImpl extends EObjectImpl implements Task {
	/**
	 * The default value of the '{@link #getIntervalDurationSeconds() <em>Interval Duration Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getIntervalDurationSeconds()
	 * @generated
	 * @ordered
	 */
	protected static final double INTERVAL_DURATION_SECONDS_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getIntervalDurationSeconds() <em>Interval Duration Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getIntervalDurationSeconds()
	 * @generated
	 * @ordered
	 */
	protected double intervalDurationSeconds = INTERVAL_DURATION_SECONDS_EDEFAULT;

	/**
	 * The default value of the '{@link #getResponseWindowSeconds() <em>Response Window Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getResponseWindowSeconds()
	 * @generated
	 * @ordered
	 */
	protected static final double RESPONSE_WINDOW_SECONDS_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getResponseWindowSeconds() <em>Response Window Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getResponseWindowSeconds()
	 * @generated
	 * @ordered
	 */
	protected double responseWindowSeconds = RESPONSE_WINDOW_SECONDS_EDEFAULT;

	/**
	 * This is true if the Response Window Seconds attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean responseWindowSecondsESet;

	/**
	 * The default value of the '{@link #getInterTrialIntervalSeconds() <em>Inter Trial Interval Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getInterTrialIntervalSeconds()
	 * @generated
	 * @ordered
	 */
	protected static final double INTER_TRIAL_INTERVAL_SECONDS_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getInterTrialIntervalSeconds() <em>Inter Trial Interval Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getInterTrialIntervalSeconds()
	 * @generated
	 * @ordered
	 */
	protected double interTrialIntervalSeconds = INTER_TRIAL_INTERVAL_SECONDS_EDEFAULT;

	/**
	 * The default value of the '{@link #isFeedback() <em>Feedback</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isFeedback()
	 * @generated
	 * @ordered
	 */
	protected static final boolean FEEDBACK_EDEFAULT = false;

	/**
	 * The cached value of the '{@link #isFeedback() <em>Feedback</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isFeedback()
	 * @generated
	 * @ordered
	 */
	protected boolean feedback = FEEDBACK_EDEFAULT;

	/**
	 * The default value of the '{@link #getEarlyResponses() <em>Early Responses</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEarlyResponses()
	 * @generated
	 * @ordered
	 */
	protected static final EarlyResponsePolicy EARLY_RESPONSES_EDEFAULT = EarlyResponsePolicy.IGNORE;

	/**
	 * The cached value of the '{@link #getEarlyResponses() <em>Early Responses</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEarlyResponses()
	 * @generated
	 * @ordered
	 */
	protected EarlyResponsePolicy earlyResponses = EARLY_RESPONSES_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected TaskImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.TASK;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getIntervalDurationSeconds() {
		return intervalDurationSeconds;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setIntervalDurationSeconds(double newIntervalDurationSeconds) {
		double oldIntervalDurationSeconds = intervalDurationSeconds;
		intervalDurationSeconds = newIntervalDurationSeconds;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.TASK__INTERVAL_DURATION_SECONDS, oldIntervalDurationSeconds, intervalDurationSeconds));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getResponseWindowSeconds() {
		return responseWindowSeconds;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setResponseWindowSeconds(double newResponseWindowSeconds) {
		double oldResponseWindowSeconds = responseWindowSeconds;
		responseWindowSeconds = newResponseWindowSeconds;
		boolean oldResponseWindowSecondsESet = responseWindowSecondsESet;
		responseWindowSecondsESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.TASK__RESPONSE_WINDOW_SECONDS, oldResponseWindowSeconds, responseWindowSeconds, !oldResponseWindowSecondsESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetResponseWindowSeconds() {
		double oldResponseWindowSeconds = responseWindowSeconds;
		boolean oldResponseWindowSecondsESet = responseWindowSecondsESet;
		responseWindowSeconds = RESPONSE_WINDOW_SECONDS_EDEFAULT;
		responseWindowSecondsESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, LimenPackage.TASK__RESPONSE_WINDOW_SECONDS, oldResponseWindowSeconds, RESPONSE_WINDOW_SECONDS_EDEFAULT, oldResponseWindowSecondsESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetResponseWindowSeconds() {
		return responseWindowSecondsESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getInterTrialIntervalSeconds() {
		return interTrialIntervalSeconds;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setInterTrialIntervalSeconds(double newInterTrialIntervalSeconds) {
		double oldInterTrialIntervalSeconds = interTrialIntervalSeconds;
		interTrialIntervalSeconds = newInterTrialIntervalSeconds;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.TASK__INTER_TRIAL_INTERVAL_SECONDS, oldInterTrialIntervalSeconds, interTrialIntervalSeconds));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isFeedback() {
		return feedback;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setFeedback(boolean newFeedback) {
		boolean oldFeedback = feedback;
		feedback = newFeedback;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.TASK__FEEDBACK, oldFeedback, feedback));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EarlyResponsePolicy getEarlyResponses() {
		return earlyResponses;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setEarlyResponses(EarlyResponsePolicy newEarlyResponses) {
		EarlyResponsePolicy oldEarlyResponses = earlyResponses;
		earlyResponses = newEarlyResponses == null ? EARLY_RESPONSES_EDEFAULT : newEarlyResponses;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.TASK__EARLY_RESPONSES, oldEarlyResponses, earlyResponses));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean validTiming(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.TaskRules.validTiming(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case LimenPackage.TASK__INTERVAL_DURATION_SECONDS:
				return getIntervalDurationSeconds();
			case LimenPackage.TASK__RESPONSE_WINDOW_SECONDS:
				return getResponseWindowSeconds();
			case LimenPackage.TASK__INTER_TRIAL_INTERVAL_SECONDS:
				return getInterTrialIntervalSeconds();
			case LimenPackage.TASK__FEEDBACK:
				return isFeedback();
			case LimenPackage.TASK__EARLY_RESPONSES:
				return getEarlyResponses();
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
			case LimenPackage.TASK__INTERVAL_DURATION_SECONDS:
				setIntervalDurationSeconds((Double)newValue);
				return;
			case LimenPackage.TASK__RESPONSE_WINDOW_SECONDS:
				setResponseWindowSeconds((Double)newValue);
				return;
			case LimenPackage.TASK__INTER_TRIAL_INTERVAL_SECONDS:
				setInterTrialIntervalSeconds((Double)newValue);
				return;
			case LimenPackage.TASK__FEEDBACK:
				setFeedback((Boolean)newValue);
				return;
			case LimenPackage.TASK__EARLY_RESPONSES:
				setEarlyResponses((EarlyResponsePolicy)newValue);
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
			case LimenPackage.TASK__INTERVAL_DURATION_SECONDS:
				setIntervalDurationSeconds(INTERVAL_DURATION_SECONDS_EDEFAULT);
				return;
			case LimenPackage.TASK__RESPONSE_WINDOW_SECONDS:
				unsetResponseWindowSeconds();
				return;
			case LimenPackage.TASK__INTER_TRIAL_INTERVAL_SECONDS:
				setInterTrialIntervalSeconds(INTER_TRIAL_INTERVAL_SECONDS_EDEFAULT);
				return;
			case LimenPackage.TASK__FEEDBACK:
				setFeedback(FEEDBACK_EDEFAULT);
				return;
			case LimenPackage.TASK__EARLY_RESPONSES:
				setEarlyResponses(EARLY_RESPONSES_EDEFAULT);
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
			case LimenPackage.TASK__INTERVAL_DURATION_SECONDS:
				return intervalDurationSeconds != INTERVAL_DURATION_SECONDS_EDEFAULT;
			case LimenPackage.TASK__RESPONSE_WINDOW_SECONDS:
				return isSetResponseWindowSeconds();
			case LimenPackage.TASK__INTER_TRIAL_INTERVAL_SECONDS:
				return interTrialIntervalSeconds != INTER_TRIAL_INTERVAL_SECONDS_EDEFAULT;
			case LimenPackage.TASK__FEEDBACK:
				return feedback != FEEDBACK_EDEFAULT;
			case LimenPackage.TASK__EARLY_RESPONSES:
				return earlyResponses != EARLY_RESPONSES_EDEFAULT;
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
			case LimenPackage.TASK___VALID_TIMING__DIAGNOSTICCHAIN_MAP:
				return validTiming((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
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
		result.append(" (intervalDurationSeconds: ");
		result.append(intervalDurationSeconds);
		result.append(", responseWindowSeconds: ");
		if (responseWindowSecondsESet) result.append(responseWindowSeconds); else result.append("<unset>");
		result.append(", interTrialIntervalSeconds: ");
		result.append(interTrialIntervalSeconds);
		result.append(", feedback: ");
		result.append(feedback);
		result.append(", earlyResponses: ");
		result.append(earlyResponses);
		result.append(')');
		return result.toString();
	}

} //TaskImpl
