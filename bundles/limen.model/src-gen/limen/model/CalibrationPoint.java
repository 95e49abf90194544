/**
 */
package limen.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Calibration Point</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * The level measured for a tone at the calibration's reference digital level.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.CalibrationPoint#getFrequencyHz <em>Frequency Hz</em>}</li>
 *   <li>{@link limen.model.CalibrationPoint#getMeasuredDbSpl <em>Measured Db Spl</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getCalibrationPoint()
 * @model
 * @generated
 */
public interface CalibrationPoint extends EObject {
	/**
	 * Returns the value of the '<em><b>Frequency Hz</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Tone frequency in Hz.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Frequency Hz</em>' attribute.
	 * @see #setFrequencyHz(double)
	 * @see limen.model.LimenPackage#getCalibrationPoint_FrequencyHz()
	 * @model
	 * @generated
	 */
	double getFrequencyHz();

	/**
	 * Sets the value of the '{@link limen.model.CalibrationPoint#getFrequencyHz <em>Frequency Hz</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Frequency Hz</em>' attribute.
	 * @see #getFrequencyHz()
	 * @generated
	 */
	void setFrequencyHz(double value);

	/**
	 * Returns the value of the '<em><b>Measured Db Spl</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Measured sound pressure level in dB SPL.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Measured Db Spl</em>' attribute.
	 * @see #setMeasuredDbSpl(double)
	 * @see limen.model.LimenPackage#getCalibrationPoint_MeasuredDbSpl()
	 * @model
	 * @generated
	 */
	double getMeasuredDbSpl();

	/**
	 * Sets the value of the '{@link limen.model.CalibrationPoint#getMeasuredDbSpl <em>Measured Db Spl</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Measured Db Spl</em>' attribute.
	 * @see #getMeasuredDbSpl()
	 * @generated
	 */
	void setMeasuredDbSpl(double value);

} // CalibrationPoint
