/**
 */
package limen.model;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Yes No Task</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A single-interval yes/no task: the participant says whether the signal was present. Catch trials (no signal) estimate the false-alarm rate.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.YesNoTask#getCatchTrialRate <em>Catch Trial Rate</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getYesNoTask()
 * @model
 * @generated
 */
public interface YesNoTask extends Task {
	/**
	 * Returns the value of the '<em><b>Catch Trial Rate</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Fraction of trials without a signal, in [0, 1).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Catch Trial Rate</em>' attribute.
	 * @see #setCatchTrialRate(double)
	 * @see limen.model.LimenPackage#getYesNoTask_CatchTrialRate()
	 * @model
	 * @generated
	 */
	double getCatchTrialRate();

	/**
	 * Sets the value of the '{@link limen.model.YesNoTask#getCatchTrialRate <em>Catch Trial Rate</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Catch Trial Rate</em>' attribute.
	 * @see #getCatchTrialRate()
	 * @generated
	 */
	void setCatchTrialRate(double value);

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The catch-trial rate lies in [0, 1) (LM0115).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean validCatchTrials(DiagnosticChain diagnostics, Map<Object, Object> context);

} // YesNoTask
