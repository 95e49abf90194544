/**
 */
package limen.model;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Weighted Up Down Procedure</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * Kaernbach's weighted up-down staircase (Kaernbach 1991, Perception & Psychophysics 49, 227-229): after every wrong response the value goes up by upStep, after every correct one down by downStep. It converges where p * downStep = (1 - p) * upStep, that is at the target probability p = upStep / (upStep + downStep).
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.WeightedUpDownProcedure#getTargetProbability <em>Target Probability</em>}</li>
 *   <li>{@link limen.model.WeightedUpDownProcedure#getUpStep <em>Up Step</em>}</li>
 *   <li>{@link limen.model.WeightedUpDownProcedure#getDownStep <em>Down Step</em>}</li>
 *   <li>{@link limen.model.WeightedUpDownProcedure#getDiscardedReversals <em>Discarded Reversals</em>}</li>
 *   <li>{@link limen.model.WeightedUpDownProcedure#getAveragedReversals <em>Averaged Reversals</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getWeightedUpDownProcedure()
 * @model
 * @generated
 */
public interface WeightedUpDownProcedure extends StaircaseProcedure {
	/**
	 * Returns the value of the '<em><b>Target Probability</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Proportion correct the staircase converges on, between chance and 1.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Target Probability</em>' attribute.
	 * @see #setTargetProbability(double)
	 * @see limen.model.LimenPackage#getWeightedUpDownProcedure_TargetProbability()
	 * @model
	 * @generated
	 */
	double getTargetProbability();

	/**
	 * Sets the value of the '{@link limen.model.WeightedUpDownProcedure#getTargetProbability <em>Target Probability</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Target Probability</em>' attribute.
	 * @see #getTargetProbability()
	 * @generated
	 */
	void setTargetProbability(double value);

	/**
	 * Returns the value of the '<em><b>Up Step</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Step after a wrong response.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Up Step</em>' attribute.
	 * @see #setUpStep(double)
	 * @see limen.model.LimenPackage#getWeightedUpDownProcedure_UpStep()
	 * @model
	 * @generated
	 */
	double getUpStep();

	/**
	 * Sets the value of the '{@link limen.model.WeightedUpDownProcedure#getUpStep <em>Up Step</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Up Step</em>' attribute.
	 * @see #getUpStep()
	 * @generated
	 */
	void setUpStep(double value);

	/**
	 * Returns the value of the '<em><b>Down Step</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Step after a correct response.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Down Step</em>' attribute.
	 * @see #setDownStep(double)
	 * @see limen.model.LimenPackage#getWeightedUpDownProcedure_DownStep()
	 * @model
	 * @generated
	 */
	double getDownStep();

	/**
	 * Sets the value of the '{@link limen.model.WeightedUpDownProcedure#getDownStep <em>Down Step</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Down Step</em>' attribute.
	 * @see #getDownStep()
	 * @generated
	 */
	void setDownStep(double value);

	/**
	 * Returns the value of the '<em><b>Discarded Reversals</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Number of first reversals left out of the threshold estimate.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Discarded Reversals</em>' attribute.
	 * @see #setDiscardedReversals(int)
	 * @see limen.model.LimenPackage#getWeightedUpDownProcedure_DiscardedReversals()
	 * @model
	 * @generated
	 */
	int getDiscardedReversals();

	/**
	 * Sets the value of the '{@link limen.model.WeightedUpDownProcedure#getDiscardedReversals <em>Discarded Reversals</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Discarded Reversals</em>' attribute.
	 * @see #getDiscardedReversals()
	 * @generated
	 */
	void setDiscardedReversals(int value);

	/**
	 * Returns the value of the '<em><b>Averaged Reversals</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Number of last reversals averaged; when unset, all after the discarded ones.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Averaged Reversals</em>' attribute.
	 * @see #isSetAveragedReversals()
	 * @see #unsetAveragedReversals()
	 * @see #setAveragedReversals(int)
	 * @see limen.model.LimenPackage#getWeightedUpDownProcedure_AveragedReversals()
	 * @model unsettable="true"
	 * @generated
	 */
	int getAveragedReversals();

	/**
	 * Sets the value of the '{@link limen.model.WeightedUpDownProcedure#getAveragedReversals <em>Averaged Reversals</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Averaged Reversals</em>' attribute.
	 * @see #isSetAveragedReversals()
	 * @see #unsetAveragedReversals()
	 * @see #getAveragedReversals()
	 * @generated
	 */
	void setAveragedReversals(int value);

	/**
	 * Unsets the value of the '{@link limen.model.WeightedUpDownProcedure#getAveragedReversals <em>Averaged Reversals</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetAveragedReversals()
	 * @see #getAveragedReversals()
	 * @see #setAveragedReversals(int)
	 * @generated
	 */
	void unsetAveragedReversals();

	/**
	 * Returns whether the value of the '{@link limen.model.WeightedUpDownProcedure#getAveragedReversals <em>Averaged Reversals</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Averaged Reversals</em>' attribute is set.
	 * @see #unsetAveragedReversals()
	 * @see #getAveragedReversals()
	 * @see #setAveragedReversals(int)
	 * @generated
	 */
	boolean isSetAveragedReversals();

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Positive steps, a target probability above chance and below 1, steps whose ratio gives the target (warning when off by more than 1 %), reversal counts not negative (LM0303, LM0304, LM0308-LM0310).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean validWeightedSteps(DiagnosticChain diagnostics, Map<Object, Object> context);

} // WeightedUpDownProcedure
