/**
 */
package limen.model;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Task</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * What the participant does on each trial, with the trial timing. All durations are in seconds.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.Task#getIntervalDurationSeconds <em>Interval Duration Seconds</em>}</li>
 *   <li>{@link limen.model.Task#getResponseWindowSeconds <em>Response Window Seconds</em>}</li>
 *   <li>{@link limen.model.Task#getInterTrialIntervalSeconds <em>Inter Trial Interval Seconds</em>}</li>
 *   <li>{@link limen.model.Task#isFeedback <em>Feedback</em>}</li>
 *   <li>{@link limen.model.Task#getEarlyResponses <em>Early Responses</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getTask()
 * @model abstract="true"
 * @generated
 */
public interface Task extends EObject {
	/**
	 * Returns the value of the '<em><b>Interval Duration Seconds</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Duration of one observation interval including the ramps, in seconds; must be positive.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Interval Duration Seconds</em>' attribute.
	 * @see #setIntervalDurationSeconds(double)
	 * @see limen.model.LimenPackage#getTask_IntervalDurationSeconds()
	 * @model
	 * @generated
	 */
	double getIntervalDurationSeconds();

	/**
	 * Sets the value of the '{@link limen.model.Task#getIntervalDurationSeconds <em>Interval Duration Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Interval Duration Seconds</em>' attribute.
	 * @see #getIntervalDurationSeconds()
	 * @generated
	 */
	void setIntervalDurationSeconds(double value);

	/**
	 * Returns the value of the '<em><b>Response Window Seconds</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Time allowed for the response after the last interval, in seconds; when unset the trial waits for the response without limit.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Response Window Seconds</em>' attribute.
	 * @see #isSetResponseWindowSeconds()
	 * @see #unsetResponseWindowSeconds()
	 * @see #setResponseWindowSeconds(double)
	 * @see limen.model.LimenPackage#getTask_ResponseWindowSeconds()
	 * @model unsettable="true"
	 * @generated
	 */
	double getResponseWindowSeconds();

	/**
	 * Sets the value of the '{@link limen.model.Task#getResponseWindowSeconds <em>Response Window Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Response Window Seconds</em>' attribute.
	 * @see #isSetResponseWindowSeconds()
	 * @see #unsetResponseWindowSeconds()
	 * @see #getResponseWindowSeconds()
	 * @generated
	 */
	void setResponseWindowSeconds(double value);

	/**
	 * Unsets the value of the '{@link limen.model.Task#getResponseWindowSeconds <em>Response Window Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetResponseWindowSeconds()
	 * @see #getResponseWindowSeconds()
	 * @see #setResponseWindowSeconds(double)
	 * @generated
	 */
	void unsetResponseWindowSeconds();

	/**
	 * Returns whether the value of the '{@link limen.model.Task#getResponseWindowSeconds <em>Response Window Seconds</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Response Window Seconds</em>' attribute is set.
	 * @see #unsetResponseWindowSeconds()
	 * @see #getResponseWindowSeconds()
	 * @see #setResponseWindowSeconds(double)
	 * @generated
	 */
	boolean isSetResponseWindowSeconds();

	/**
	 * Returns the value of the '<em><b>Inter Trial Interval Seconds</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Silent time between the response (or the feedback) and the next trial, in seconds; not negative.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Inter Trial Interval Seconds</em>' attribute.
	 * @see #setInterTrialIntervalSeconds(double)
	 * @see limen.model.LimenPackage#getTask_InterTrialIntervalSeconds()
	 * @model
	 * @generated
	 */
	double getInterTrialIntervalSeconds();

	/**
	 * Sets the value of the '{@link limen.model.Task#getInterTrialIntervalSeconds <em>Inter Trial Interval Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Inter Trial Interval Seconds</em>' attribute.
	 * @see #getInterTrialIntervalSeconds()
	 * @generated
	 */
	void setInterTrialIntervalSeconds(double value);

	/**
	 * Returns the value of the '<em><b>Feedback</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Whether the participant is told after each trial whether the response was correct.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Feedback</em>' attribute.
	 * @see #setFeedback(boolean)
	 * @see limen.model.LimenPackage#getTask_Feedback()
	 * @model
	 * @generated
	 */
	boolean isFeedback();

	/**
	 * Sets the value of the '{@link limen.model.Task#isFeedback <em>Feedback</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Feedback</em>' attribute.
	 * @see #isFeedback()
	 * @generated
	 */
	void setFeedback(boolean value);

	/**
	 * Returns the value of the '<em><b>Early Responses</b></em>' attribute.
	 * The literals are from the enumeration {@link limen.model.EarlyResponsePolicy}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * What a response given before the end of the last observation interval does: ignored (the participant answers again after the sound) or taken and recorded as early (a negative response time).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Early Responses</em>' attribute.
	 * @see limen.model.EarlyResponsePolicy
	 * @see #setEarlyResponses(EarlyResponsePolicy)
	 * @see limen.model.LimenPackage#getTask_EarlyResponses()
	 * @model
	 * @generated
	 */
	EarlyResponsePolicy getEarlyResponses();

	/**
	 * Sets the value of the '{@link limen.model.Task#getEarlyResponses <em>Early Responses</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Early Responses</em>' attribute.
	 * @see limen.model.EarlyResponsePolicy
	 * @see #getEarlyResponses()
	 * @generated
	 */
	void setEarlyResponses(EarlyResponsePolicy value);

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The interval duration is positive, the response window is positive when given and the inter-trial interval is not negative (LM0110, LM0112, LM0113).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean validTiming(DiagnosticChain diagnostics, Map<Object, Object> context);

} // Task
