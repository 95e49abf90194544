/**
 */
package limen.model;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Relative Level</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A level set per participant: the threshold (in dB SPL) that this participant reached in an earlier step, plus an offset. Example: offsetDb = 40 on a detection step at the same frequency gives a tone 40 dB above the listener's own threshold (40 dB sensation level).
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.RelativeLevel#getReference <em>Reference</em>}</li>
 *   <li>{@link limen.model.RelativeLevel#getOffsetDb <em>Offset Db</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getRelativeLevel()
 * @model
 * @generated
 */
public interface RelativeLevel extends Level {
	/**
	 * Returns the value of the '<em><b>Reference</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The earlier step whose threshold is the base of this level.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Reference</em>' reference.
	 * @see #setReference(Step)
	 * @see limen.model.LimenPackage#getRelativeLevel_Reference()
	 * @model required="true"
	 * @generated
	 */
	Step getReference();

	/**
	 * Sets the value of the '{@link limen.model.RelativeLevel#getReference <em>Reference</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Reference</em>' reference.
	 * @see #getReference()
	 * @generated
	 */
	void setReference(Step value);

	/**
	 * Returns the value of the '<em><b>Offset Db</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Decibels added to the referenced threshold (negative values give levels below it).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Offset Db</em>' attribute.
	 * @see #setOffsetDb(double)
	 * @see limen.model.LimenPackage#getRelativeLevel_OffsetDb()
	 * @model
	 * @generated
	 */
	double getOffsetDb();

	/**
	 * Sets the value of the '{@link limen.model.RelativeLevel#getOffsetDb <em>Offset Db</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Offset Db</em>' attribute.
	 * @see #getOffsetDb()
	 * @generated
	 */
	void setOffsetDb(double value);

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The referenced step is in the same battery, runs before the referring step in every ordering, measures an absolute threshold in dB SPL and does so at the same frequency (LM0501-LM0504).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean validReference(DiagnosticChain diagnostics, Map<Object, Object> context);

} // RelativeLevel
