/**
 */
package limen.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Varied Quantity</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * The quantity a step's procedures vary, with its unit and the axis on which procedures work. For FREQUENCY_DISCRIMINATION the value is the frequency difference of the comparison tone above the standard (delta f in Hz, in percent of the standard, or in cents); for INTENSITY_DISCRIMINATION it is the level increment delta L in dB above the standard; for detection it is the tone level in dB SPL.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.VariedQuantity#getUnit <em>Unit</em>}</li>
 *   <li>{@link limen.model.VariedQuantity#getScale <em>Scale</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getVariedQuantity()
 * @model
 * @generated
 */
public interface VariedQuantity extends EObject {
	/**
	 * Returns the value of the '<em><b>Unit</b></em>' attribute.
	 * The literals are from the enumeration {@link limen.model.QuantityUnit}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Unit of every value of the quantity (start values, limits, step sizes in additive mode, grids).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Unit</em>' attribute.
	 * @see limen.model.QuantityUnit
	 * @see #setUnit(QuantityUnit)
	 * @see limen.model.LimenPackage#getVariedQuantity_Unit()
	 * @model
	 * @generated
	 */
	QuantityUnit getUnit();

	/**
	 * Sets the value of the '{@link limen.model.VariedQuantity#getUnit <em>Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Unit</em>' attribute.
	 * @see limen.model.QuantityUnit
	 * @see #getUnit()
	 * @generated
	 */
	void setUnit(QuantityUnit value);

	/**
	 * Returns the value of the '<em><b>Scale</b></em>' attribute.
	 * The literals are from the enumeration {@link limen.model.Scale}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Axis on which model-based procedures (QUEST, ZEST, Psi) place their grids and on which estimates are formed: the value itself (LINEAR) or 20 log10 of the value (LOG, values must stay positive): a decibel axis, so that slopes and standard deviations keep the meaning they have for quantities in dB. 'Axis units' elsewhere in the model means the quantity's unit on a LINEAR scale and dB re 1 unit on a LOG scale.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Scale</em>' attribute.
	 * @see limen.model.Scale
	 * @see #setScale(Scale)
	 * @see limen.model.LimenPackage#getVariedQuantity_Scale()
	 * @model
	 * @generated
	 */
	Scale getScale();

	/**
	 * Sets the value of the '{@link limen.model.VariedQuantity#getScale <em>Scale</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Scale</em>' attribute.
	 * @see limen.model.Scale
	 * @see #getScale()
	 * @generated
	 */
	void setScale(Scale value);

} // VariedQuantity
