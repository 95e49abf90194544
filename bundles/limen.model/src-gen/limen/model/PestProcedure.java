/**
 */
package limen.model;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Pest Procedure</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * Parameter Estimation by Sequential Testing (Taylor and Creelman 1967, J. Acoust. Soc. Am. 41, 782-787): trials stay at one value until a Wald sequential test shows that the number of correct responses departs from the expected count at targetProbability by more than waldDeviation; the step then changes direction with halving and doubling rules, between minimumStep and maximumStep. The estimate is the value the track would present next when it stops.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.PestProcedure#getInitialStep <em>Initial Step</em>}</li>
 *   <li>{@link limen.model.PestProcedure#getMinimumStep <em>Minimum Step</em>}</li>
 *   <li>{@link limen.model.PestProcedure#getMaximumStep <em>Maximum Step</em>}</li>
 *   <li>{@link limen.model.PestProcedure#getWaldDeviation <em>Wald Deviation</em>}</li>
 *   <li>{@link limen.model.PestProcedure#getTargetProbability <em>Target Probability</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getPestProcedure()
 * @model
 * @generated
 */
public interface PestProcedure extends StaircaseProcedure {
	/**
	 * Returns the value of the '<em><b>Initial Step</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Step size at the start.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Initial Step</em>' attribute.
	 * @see #setInitialStep(double)
	 * @see limen.model.LimenPackage#getPestProcedure_InitialStep()
	 * @model
	 * @generated
	 */
	double getInitialStep();

	/**
	 * Sets the value of the '{@link limen.model.PestProcedure#getInitialStep <em>Initial Step</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Initial Step</em>' attribute.
	 * @see #getInitialStep()
	 * @generated
	 */
	void setInitialStep(double value);

	/**
	 * Returns the value of the '<em><b>Minimum Step</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Smallest step size.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Minimum Step</em>' attribute.
	 * @see #setMinimumStep(double)
	 * @see limen.model.LimenPackage#getPestProcedure_MinimumStep()
	 * @model
	 * @generated
	 */
	double getMinimumStep();

	/**
	 * Sets the value of the '{@link limen.model.PestProcedure#getMinimumStep <em>Minimum Step</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Minimum Step</em>' attribute.
	 * @see #getMinimumStep()
	 * @generated
	 */
	void setMinimumStep(double value);

	/**
	 * Returns the value of the '<em><b>Maximum Step</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Largest step size.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Maximum Step</em>' attribute.
	 * @see #setMaximumStep(double)
	 * @see limen.model.LimenPackage#getPestProcedure_MaximumStep()
	 * @model
	 * @generated
	 */
	double getMaximumStep();

	/**
	 * Sets the value of the '{@link limen.model.PestProcedure#getMaximumStep <em>Maximum Step</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Maximum Step</em>' attribute.
	 * @see #getMaximumStep()
	 * @generated
	 */
	void setMaximumStep(double value);

	/**
	 * Returns the value of the '<em><b>Wald Deviation</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * W: the deviation, in expected correct responses, that ends testing at one value; Taylor and Creelman used W = 1.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Wald Deviation</em>' attribute.
	 * @see #setWaldDeviation(double)
	 * @see limen.model.LimenPackage#getPestProcedure_WaldDeviation()
	 * @model
	 * @generated
	 */
	double getWaldDeviation();

	/**
	 * Sets the value of the '{@link limen.model.PestProcedure#getWaldDeviation <em>Wald Deviation</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Wald Deviation</em>' attribute.
	 * @see #getWaldDeviation()
	 * @generated
	 */
	void setWaldDeviation(double value);

	/**
	 * Returns the value of the '<em><b>Target Probability</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Proportion correct being tracked, between chance and 1.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Target Probability</em>' attribute.
	 * @see #setTargetProbability(double)
	 * @see limen.model.LimenPackage#getPestProcedure_TargetProbability()
	 * @model
	 * @generated
	 */
	double getTargetProbability();

	/**
	 * Sets the value of the '{@link limen.model.PestProcedure#getTargetProbability <em>Target Probability</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Target Probability</em>' attribute.
	 * @see #getTargetProbability()
	 * @generated
	 */
	void setTargetProbability(double value);

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Positive steps with minimumStep <= initialStep <= maximumStep, a positive Wald deviation limit and a target probability between chance and 1 (LM0303-LM0305, LM0309, LM0311).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean validPestSteps(DiagnosticChain diagnostics, Map<Object, Object> context);

} // PestProcedure
