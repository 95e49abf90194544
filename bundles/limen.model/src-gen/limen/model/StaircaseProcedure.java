/**
 */
package limen.model;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Staircase Procedure</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * An adaptive staircase that moves the value up after wrong responses and down after correct ones, within [floorValue, ceilingValue].
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.StaircaseProcedure#getStartValue <em>Start Value</em>}</li>
 *   <li>{@link limen.model.StaircaseProcedure#getFloorValue <em>Floor Value</em>}</li>
 *   <li>{@link limen.model.StaircaseProcedure#getCeilingValue <em>Ceiling Value</em>}</li>
 *   <li>{@link limen.model.StaircaseProcedure#getStepMode <em>Step Mode</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getStaircaseProcedure()
 * @model abstract="true"
 * @generated
 */
public interface StaircaseProcedure extends Procedure {
	/**
	 * Returns the value of the '<em><b>Start Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Value of the first trial.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Start Value</em>' attribute.
	 * @see #setStartValue(double)
	 * @see limen.model.LimenPackage#getStaircaseProcedure_StartValue()
	 * @model
	 * @generated
	 */
	double getStartValue();

	/**
	 * Sets the value of the '{@link limen.model.StaircaseProcedure#getStartValue <em>Start Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Start Value</em>' attribute.
	 * @see #getStartValue()
	 * @generated
	 */
	void setStartValue(double value);

	/**
	 * Returns the value of the '<em><b>Floor Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Lowest value the track may present; the staircase stays here instead of going lower.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Floor Value</em>' attribute.
	 * @see #setFloorValue(double)
	 * @see limen.model.LimenPackage#getStaircaseProcedure_FloorValue()
	 * @model
	 * @generated
	 */
	double getFloorValue();

	/**
	 * Sets the value of the '{@link limen.model.StaircaseProcedure#getFloorValue <em>Floor Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Floor Value</em>' attribute.
	 * @see #getFloorValue()
	 * @generated
	 */
	void setFloorValue(double value);

	/**
	 * Returns the value of the '<em><b>Ceiling Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Highest value the track may present; the staircase stays here instead of going higher. Levels at this value must stay under the calibration ceiling.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Ceiling Value</em>' attribute.
	 * @see #setCeilingValue(double)
	 * @see limen.model.LimenPackage#getStaircaseProcedure_CeilingValue()
	 * @model
	 * @generated
	 */
	double getCeilingValue();

	/**
	 * Sets the value of the '{@link limen.model.StaircaseProcedure#getCeilingValue <em>Ceiling Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Ceiling Value</em>' attribute.
	 * @see #getCeilingValue()
	 * @generated
	 */
	void setCeilingValue(double value);

	/**
	 * Returns the value of the '<em><b>Step Mode</b></em>' attribute.
	 * The literals are from the enumeration {@link limen.model.StepMode}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Whether steps are added to the value (ADDITIVE: step sizes in the quantity's unit) or multiply it (MULTIPLICATIVE: step sizes are factors greater than 1, the value is multiplied by the factor going up and divided by it going down).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Step Mode</em>' attribute.
	 * @see limen.model.StepMode
	 * @see #setStepMode(StepMode)
	 * @see limen.model.LimenPackage#getStaircaseProcedure_StepMode()
	 * @model
	 * @generated
	 */
	StepMode getStepMode();

	/**
	 * Sets the value of the '{@link limen.model.StaircaseProcedure#getStepMode <em>Step Mode</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Step Mode</em>' attribute.
	 * @see limen.model.StepMode
	 * @see #getStepMode()
	 * @generated
	 */
	void setStepMode(StepMode value);

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * floorValue < ceilingValue and the start value lies between them (LM0301, LM0302).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean validLimits(DiagnosticChain diagnostics, Map<Object, Object> context);

} // StaircaseProcedure
