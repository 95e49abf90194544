/**
 */
package limen.model;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Forced Choice Task</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * An n-interval, n-alternative forced choice (nAFC) task: the signal is in one of n intervals chosen at random, the participant names that interval. Chance performance is 1/n.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.ForcedChoiceTask#getIntervalCount <em>Interval Count</em>}</li>
 *   <li>{@link limen.model.ForcedChoiceTask#getInterStimulusIntervalSeconds <em>Inter Stimulus Interval Seconds</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getForcedChoiceTask()
 * @model
 * @generated
 */
public interface ForcedChoiceTask extends Task {
	/**
	 * Returns the value of the '<em><b>Interval Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Number of observation intervals n, 2 to 4.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Interval Count</em>' attribute.
	 * @see #setIntervalCount(int)
	 * @see limen.model.LimenPackage#getForcedChoiceTask_IntervalCount()
	 * @model
	 * @generated
	 */
	int getIntervalCount();

	/**
	 * Sets the value of the '{@link limen.model.ForcedChoiceTask#getIntervalCount <em>Interval Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Interval Count</em>' attribute.
	 * @see #getIntervalCount()
	 * @generated
	 */
	void setIntervalCount(int value);

	/**
	 * Returns the value of the '<em><b>Inter Stimulus Interval Seconds</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Silent gap between consecutive intervals, in seconds; not negative.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Inter Stimulus Interval Seconds</em>' attribute.
	 * @see #setInterStimulusIntervalSeconds(double)
	 * @see limen.model.LimenPackage#getForcedChoiceTask_InterStimulusIntervalSeconds()
	 * @model
	 * @generated
	 */
	double getInterStimulusIntervalSeconds();

	/**
	 * Sets the value of the '{@link limen.model.ForcedChoiceTask#getInterStimulusIntervalSeconds <em>Inter Stimulus Interval Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Inter Stimulus Interval Seconds</em>' attribute.
	 * @see #getInterStimulusIntervalSeconds()
	 * @generated
	 */
	void setInterStimulusIntervalSeconds(double value);

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The interval count is 2, 3 or 4 and the inter-stimulus interval is not negative (LM0114, LM0111).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean validIntervals(DiagnosticChain diagnostics, Map<Object, Object> context);

} // ForcedChoiceTask
