/**
 */
package limen.model;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Constant Stimuli Procedure</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * The method of constant stimuli: every value is presented repetitionsPerValue times in random order; the track ends by itself after values x repetitions trials.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.ConstantStimuliProcedure#getValues <em>Values</em>}</li>
 *   <li>{@link limen.model.ConstantStimuliProcedure#getRepetitionsPerValue <em>Repetitions Per Value</em>}</li>
 *   <li>{@link limen.model.ConstantStimuliProcedure#isBlockedShuffle <em>Blocked Shuffle</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getConstantStimuliProcedure()
 * @model
 * @generated
 */
public interface ConstantStimuliProcedure extends Procedure {
	/**
	 * Returns the value of the '<em><b>Values</b></em>' attribute list.
	 * The list contents are of type {@link java.lang.Double}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The stimulus values, in the quantity's unit.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Values</em>' attribute list.
	 * @see limen.model.LimenPackage#getConstantStimuliProcedure_Values()
	 * @model unique="false" required="true"
	 * @generated
	 */
	EList<Double> getValues();

	/**
	 * Returns the value of the '<em><b>Repetitions Per Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * How often each value is presented; at least 1.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Repetitions Per Value</em>' attribute.
	 * @see #setRepetitionsPerValue(int)
	 * @see limen.model.LimenPackage#getConstantStimuliProcedure_RepetitionsPerValue()
	 * @model
	 * @generated
	 */
	int getRepetitionsPerValue();

	/**
	 * Sets the value of the '{@link limen.model.ConstantStimuliProcedure#getRepetitionsPerValue <em>Repetitions Per Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Repetitions Per Value</em>' attribute.
	 * @see #getRepetitionsPerValue()
	 * @generated
	 */
	void setRepetitionsPerValue(int value);

	/**
	 * Returns the value of the '<em><b>Blocked Shuffle</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * True: trials run in blocks that each hold every value once, shuffled within the block; false: all trials shuffled together.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Blocked Shuffle</em>' attribute.
	 * @see #setBlockedShuffle(boolean)
	 * @see limen.model.LimenPackage#getConstantStimuliProcedure_BlockedShuffle()
	 * @model
	 * @generated
	 */
	boolean isBlockedShuffle();

	/**
	 * Sets the value of the '{@link limen.model.ConstantStimuliProcedure#isBlockedShuffle <em>Blocked Shuffle</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Blocked Shuffle</em>' attribute.
	 * @see #isBlockedShuffle()
	 * @generated
	 */
	void setBlockedShuffle(boolean value);

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * At least one value, no value twice, at least one repetition (LM0317).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean validConstantStimuli(DiagnosticChain diagnostics, Map<Object, Object> context);

} // ConstantStimuliProcedure
