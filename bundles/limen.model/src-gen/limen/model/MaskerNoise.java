/**
 */
package limen.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Masker Noise</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A band of Gaussian noise presented with the tone for DETECTION_NOISE.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.MaskerNoise#getSpectrum <em>Spectrum</em>}</li>
 *   <li>{@link limen.model.MaskerNoise#getLowCutoffHz <em>Low Cutoff Hz</em>}</li>
 *   <li>{@link limen.model.MaskerNoise#getHighCutoffHz <em>High Cutoff Hz</em>}</li>
 *   <li>{@link limen.model.MaskerNoise#getLevel <em>Level</em>}</li>
 *   <li>{@link limen.model.MaskerNoise#isContinuous <em>Continuous</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getMaskerNoise()
 * @model
 * @generated
 */
public interface MaskerNoise extends EObject {
	/**
	 * Returns the value of the '<em><b>Spectrum</b></em>' attribute.
	 * The literals are from the enumeration {@link limen.model.NoiseSpectrum}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Spectral shape within the band.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Spectrum</em>' attribute.
	 * @see limen.model.NoiseSpectrum
	 * @see #setSpectrum(NoiseSpectrum)
	 * @see limen.model.LimenPackage#getMaskerNoise_Spectrum()
	 * @model
	 * @generated
	 */
	NoiseSpectrum getSpectrum();

	/**
	 * Sets the value of the '{@link limen.model.MaskerNoise#getSpectrum <em>Spectrum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Spectrum</em>' attribute.
	 * @see limen.model.NoiseSpectrum
	 * @see #getSpectrum()
	 * @generated
	 */
	void setSpectrum(NoiseSpectrum value);

	/**
	 * Returns the value of the '<em><b>Low Cutoff Hz</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Lower edge of the noise band in Hz; positive.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Low Cutoff Hz</em>' attribute.
	 * @see #setLowCutoffHz(double)
	 * @see limen.model.LimenPackage#getMaskerNoise_LowCutoffHz()
	 * @model
	 * @generated
	 */
	double getLowCutoffHz();

	/**
	 * Sets the value of the '{@link limen.model.MaskerNoise#getLowCutoffHz <em>Low Cutoff Hz</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Low Cutoff Hz</em>' attribute.
	 * @see #getLowCutoffHz()
	 * @generated
	 */
	void setLowCutoffHz(double value);

	/**
	 * Returns the value of the '<em><b>High Cutoff Hz</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Upper edge of the noise band in Hz; above the lower edge and below the Nyquist frequency.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>High Cutoff Hz</em>' attribute.
	 * @see #setHighCutoffHz(double)
	 * @see limen.model.LimenPackage#getMaskerNoise_HighCutoffHz()
	 * @model
	 * @generated
	 */
	double getHighCutoffHz();

	/**
	 * Sets the value of the '{@link limen.model.MaskerNoise#getHighCutoffHz <em>High Cutoff Hz</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>High Cutoff Hz</em>' attribute.
	 * @see #getHighCutoffHz()
	 * @generated
	 */
	void setHighCutoffHz(double value);

	/**
	 * Returns the value of the '<em><b>Level</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Overall level of the noise band in dB SPL.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Level</em>' containment reference.
	 * @see #setLevel(Level)
	 * @see limen.model.LimenPackage#getMaskerNoise_Level()
	 * @model containment="true" required="true"
	 * @generated
	 */
	Level getLevel();

	/**
	 * Sets the value of the '{@link limen.model.MaskerNoise#getLevel <em>Level</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Level</em>' containment reference.
	 * @see #getLevel()
	 * @generated
	 */
	void setLevel(Level value);

	/**
	 * Returns the value of the '<em><b>Continuous</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * True: the noise runs through the whole trial; false: it is gated on and off with each interval using the stimulus ramps.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Continuous</em>' attribute.
	 * @see #setContinuous(boolean)
	 * @see limen.model.LimenPackage#getMaskerNoise_Continuous()
	 * @model
	 * @generated
	 */
	boolean isContinuous();

	/**
	 * Sets the value of the '{@link limen.model.MaskerNoise#isContinuous <em>Continuous</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Continuous</em>' attribute.
	 * @see #isContinuous()
	 * @generated
	 */
	void setContinuous(boolean value);

} // MaskerNoise
