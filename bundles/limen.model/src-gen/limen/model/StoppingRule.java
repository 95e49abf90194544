/**
 */
package limen.model;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Stopping Rule</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * When a track ends: as soon as any criterion that is set is met. At least one criterion the track's procedure can reach must be set.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.StoppingRule#getMaximumReversals <em>Maximum Reversals</em>}</li>
 *   <li>{@link limen.model.StoppingRule#getMaximumTrials <em>Maximum Trials</em>}</li>
 *   <li>{@link limen.model.StoppingRule#getPosteriorSdTarget <em>Posterior Sd Target</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getStoppingRule()
 * @model
 * @generated
 */
public interface StoppingRule extends EObject {
	/**
	 * Returns the value of the '<em><b>Maximum Reversals</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * End after this many reversals (staircases only).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Maximum Reversals</em>' attribute.
	 * @see #isSetMaximumReversals()
	 * @see #unsetMaximumReversals()
	 * @see #setMaximumReversals(int)
	 * @see limen.model.LimenPackage#getStoppingRule_MaximumReversals()
	 * @model unsettable="true"
	 * @generated
	 */
	int getMaximumReversals();

	/**
	 * Sets the value of the '{@link limen.model.StoppingRule#getMaximumReversals <em>Maximum Reversals</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Maximum Reversals</em>' attribute.
	 * @see #isSetMaximumReversals()
	 * @see #unsetMaximumReversals()
	 * @see #getMaximumReversals()
	 * @generated
	 */
	void setMaximumReversals(int value);

	/**
	 * Unsets the value of the '{@link limen.model.StoppingRule#getMaximumReversals <em>Maximum Reversals</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetMaximumReversals()
	 * @see #getMaximumReversals()
	 * @see #setMaximumReversals(int)
	 * @generated
	 */
	void unsetMaximumReversals();

	/**
	 * Returns whether the value of the '{@link limen.model.StoppingRule#getMaximumReversals <em>Maximum Reversals</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Maximum Reversals</em>' attribute is set.
	 * @see #unsetMaximumReversals()
	 * @see #getMaximumReversals()
	 * @see #setMaximumReversals(int)
	 * @generated
	 */
	boolean isSetMaximumReversals();

	/**
	 * Returns the value of the '<em><b>Maximum Trials</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * End after this many trials.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Maximum Trials</em>' attribute.
	 * @see #isSetMaximumTrials()
	 * @see #unsetMaximumTrials()
	 * @see #setMaximumTrials(int)
	 * @see limen.model.LimenPackage#getStoppingRule_MaximumTrials()
	 * @model unsettable="true"
	 * @generated
	 */
	int getMaximumTrials();

	/**
	 * Sets the value of the '{@link limen.model.StoppingRule#getMaximumTrials <em>Maximum Trials</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Maximum Trials</em>' attribute.
	 * @see #isSetMaximumTrials()
	 * @see #unsetMaximumTrials()
	 * @see #getMaximumTrials()
	 * @generated
	 */
	void setMaximumTrials(int value);

	/**
	 * Unsets the value of the '{@link limen.model.StoppingRule#getMaximumTrials <em>Maximum Trials</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetMaximumTrials()
	 * @see #getMaximumTrials()
	 * @see #setMaximumTrials(int)
	 * @generated
	 */
	void unsetMaximumTrials();

	/**
	 * Returns whether the value of the '{@link limen.model.StoppingRule#getMaximumTrials <em>Maximum Trials</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Maximum Trials</em>' attribute is set.
	 * @see #unsetMaximumTrials()
	 * @see #getMaximumTrials()
	 * @see #setMaximumTrials(int)
	 * @generated
	 */
	boolean isSetMaximumTrials();

	/**
	 * Returns the value of the '<em><b>Posterior Sd Target</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * End when the posterior standard deviation of the threshold falls to this value, in axis units (QUEST, ZEST and Psi only).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Posterior Sd Target</em>' attribute.
	 * @see #isSetPosteriorSdTarget()
	 * @see #unsetPosteriorSdTarget()
	 * @see #setPosteriorSdTarget(double)
	 * @see limen.model.LimenPackage#getStoppingRule_PosteriorSdTarget()
	 * @model unsettable="true"
	 * @generated
	 */
	double getPosteriorSdTarget();

	/**
	 * Sets the value of the '{@link limen.model.StoppingRule#getPosteriorSdTarget <em>Posterior Sd Target</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Posterior Sd Target</em>' attribute.
	 * @see #isSetPosteriorSdTarget()
	 * @see #unsetPosteriorSdTarget()
	 * @see #getPosteriorSdTarget()
	 * @generated
	 */
	void setPosteriorSdTarget(double value);

	/**
	 * Unsets the value of the '{@link limen.model.StoppingRule#getPosteriorSdTarget <em>Posterior Sd Target</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetPosteriorSdTarget()
	 * @see #getPosteriorSdTarget()
	 * @see #setPosteriorSdTarget(double)
	 * @generated
	 */
	void unsetPosteriorSdTarget();

	/**
	 * Returns whether the value of the '{@link limen.model.StoppingRule#getPosteriorSdTarget <em>Posterior Sd Target</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Posterior Sd Target</em>' attribute is set.
	 * @see #unsetPosteriorSdTarget()
	 * @see #getPosteriorSdTarget()
	 * @see #setPosteriorSdTarget(double)
	 * @generated
	 */
	boolean isSetPosteriorSdTarget();

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * At least one criterion is set, each set criterion is positive, at least one can end the procedure, and a reversal limit leaves reversals to average (LM0401-LM0406).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean canEnd(DiagnosticChain diagnostics, Map<Object, Object> context);

} // StoppingRule
