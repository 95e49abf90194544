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
 *   <li>{@link limen.model.ExposureEstimate#getNioshDosePercent <em>Niosh Dose Percent</em>}</li>
 *   <li>{@link limen.model.ExposureEstimate#getOshaDosePercent <em>Osha Dose Percent</em>}</li>
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

	/**
	 * Returns the value of the '<em><b>Niosh Dose Percent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Daily noise dose of the louder ear by the NIOSH (1998) recommended exposure limit (85 dBA over 8 h, 3 dB exchange rate), in percent, from the A-weighted levels of the presented stimuli.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Niosh Dose Percent</em>' attribute.
	 * @see #setNioshDosePercent(double)
	 * @see limen.model.LimenPackage#getExposureEstimate_NioshDosePercent()
	 * @model
	 * @generated
	 */
	double getNioshDosePercent();

	/**
	 * Sets the value of the '{@link limen.model.ExposureEstimate#getNioshDosePercent <em>Niosh Dose Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Niosh Dose Percent</em>' attribute.
	 * @see #getNioshDosePercent()
	 * @generated
	 */
	void setNioshDosePercent(double value);

	/**
	 * Returns the value of the '<em><b>Osha Dose Percent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Daily noise dose of the louder ear by the OSHA 29 CFR 1910.95 permissible exposure limit (90 dBA over 8 h, 5 dB exchange rate, 80 dBA threshold), in percent.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Osha Dose Percent</em>' attribute.
	 * @see #setOshaDosePercent(double)
	 * @see limen.model.LimenPackage#getExposureEstimate_OshaDosePercent()
	 * @model
	 * @generated
	 */
	double getOshaDosePercent();

	/**
	 * Sets the value of the '{@link limen.model.ExposureEstimate#getOshaDosePercent <em>Osha Dose Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Osha Dose Percent</em>' attribute.
	 * @see #getOshaDosePercent()
	 * @generated
	 */
	void setOshaDosePercent(double value);

} // ExposureEstimate
