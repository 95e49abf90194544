/**
 */
package limen.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Break</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A pause between two steps of a battery.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.Break#getAfterStepCount <em>After Step Count</em>}</li>
 *   <li>{@link limen.model.Break#getMinimumDurationSeconds <em>Minimum Duration Seconds</em>}</li>
 *   <li>{@link limen.model.Break#getMessage <em>Message</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getBreak()
 * @model
 * @generated
 */
public interface Break extends EObject {
	/**
	 * Returns the value of the '<em><b>After Step Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Number of steps completed before the pause, 1 to (number of steps - 1). Counted in running order, so a break stays in place when the ordering permutes the steps.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>After Step Count</em>' attribute.
	 * @see #setAfterStepCount(int)
	 * @see limen.model.LimenPackage#getBreak_AfterStepCount()
	 * @model
	 * @generated
	 */
	int getAfterStepCount();

	/**
	 * Sets the value of the '{@link limen.model.Break#getAfterStepCount <em>After Step Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>After Step Count</em>' attribute.
	 * @see #getAfterStepCount()
	 * @generated
	 */
	void setAfterStepCount(int value);

	/**
	 * Returns the value of the '<em><b>Minimum Duration Seconds</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Shortest pause in seconds (the participant continues when ready after that); 0 means no enforced minimum.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Minimum Duration Seconds</em>' attribute.
	 * @see #setMinimumDurationSeconds(double)
	 * @see limen.model.LimenPackage#getBreak_MinimumDurationSeconds()
	 * @model
	 * @generated
	 */
	double getMinimumDurationSeconds();

	/**
	 * Sets the value of the '{@link limen.model.Break#getMinimumDurationSeconds <em>Minimum Duration Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Minimum Duration Seconds</em>' attribute.
	 * @see #getMinimumDurationSeconds()
	 * @generated
	 */
	void setMinimumDurationSeconds(double value);

	/**
	 * Returns the value of the '<em><b>Message</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Text shown to the participant during the pause.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Message</em>' attribute.
	 * @see #setMessage(String)
	 * @see limen.model.LimenPackage#getBreak_Message()
	 * @model
	 * @generated
	 */
	String getMessage();

	/**
	 * Sets the value of the '{@link limen.model.Break#getMessage <em>Message</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Message</em>' attribute.
	 * @see #getMessage()
	 * @generated
	 */
	void setMessage(String value);

} // Break
