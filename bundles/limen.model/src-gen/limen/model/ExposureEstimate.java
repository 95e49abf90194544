/**
 */
package limen.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Exposure Estimate</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * Estimated sound exposure of the participant from the presented stimuli (computed from the calibration, not measured).
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.ExposureEstimate#getPeakLevelDbSpl <em>Peak Level Db Spl</em>}</li>
 *   <li>{@link limen.model.ExposureEstimate#getEquivalentLevelDbSpl <em>Equivalent Level Db Spl</em>}</li>
 *   <li>{@link limen.model.ExposureEstimate#getSoundOnSeconds <em>Sound On Seconds</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getExposureEstimate()
 * @model
 * @generated
 */
public interface ExposureEstimate extends EObject {
	/**
	 * Returns the value of the '<em><b>Peak Level Db Spl</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Highest level presented, in dB SPL.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Peak Level Db Spl</em>' attribute.
	 * @see #setPeakLevelDbSpl(double)
	 * @see limen.model.LimenPackage#getExposureEstimate_PeakLevelDbSpl()
	 * @model
	 * @generated
	 */
	double getPeakLevelDbSpl();

	/**
	 * Sets the value of the '{@link limen.model.ExposureEstimate#getPeakLevelDbSpl <em>Peak Level Db Spl</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Peak Level Db Spl</em>' attribute.
	 * @see #getPeakLevelDbSpl()
	 * @generated
	 */
	void setPeakLevelDbSpl(double value);

	/**
	 * Returns the value of the '<em><b>Equivalent Level Db Spl</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Equivalent continuous level over the sound-on time, in dB SPL: 10 log10 of the mean of 10^(L/10) weighted by duration.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Equivalent Level Db Spl</em>' attribute.
	 * @see #setEquivalentLevelDbSpl(double)
	 * @see limen.model.LimenPackage#getExposureEstimate_EquivalentLevelDbSpl()
	 * @model
	 * @generated
	 */
	double getEquivalentLevelDbSpl();

	/**
	 * Sets the value of the '{@link limen.model.ExposureEstimate#getEquivalentLevelDbSpl <em>Equivalent Level Db Spl</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Equivalent Level Db Spl</em>' attribute.
	 * @see #getEquivalentLevelDbSpl()
	 * @generated
	 */
	void setEquivalentLevelDbSpl(double value);

	/**
	 * Returns the value of the '<em><b>Sound On Seconds</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Total time sound was presented, in seconds.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Sound On Seconds</em>' attribute.
	 * @see #setSoundOnSeconds(double)
	 * @see limen.model.LimenPackage#getExposureEstimate_SoundOnSeconds()
	 * @model
	 * @generated
	 */
	double getSoundOnSeconds();

	/**
	 * Sets the value of the '{@link limen.model.ExposureEstimate#getSoundOnSeconds <em>Sound On Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Sound On Seconds</em>' attribute.
	 * @see #getSoundOnSeconds()
	 * @generated
	 */
	void setSoundOnSeconds(double value);

} // ExposureEstimate
