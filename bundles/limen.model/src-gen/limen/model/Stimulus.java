/**
 */
package limen.model;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Stimulus</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * The sound of one step: a pure tone (the standard) with raised-cosine ramps, optionally in a masking noise.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.Stimulus#getKind <em>Kind</em>}</li>
 *   <li>{@link limen.model.Stimulus#getStandardFrequencyHz <em>Standard Frequency Hz</em>}</li>
 *   <li>{@link limen.model.Stimulus#getStandardLevel <em>Standard Level</em>}</li>
 *   <li>{@link limen.model.Stimulus#getRampDurationSeconds <em>Ramp Duration Seconds</em>}</li>
 *   <li>{@link limen.model.Stimulus#getEar <em>Ear</em>}</li>
 *   <li>{@link limen.model.Stimulus#getMasker <em>Masker</em>}</li>
 *   <li>{@link limen.model.Stimulus#getContributions <em>Contributions</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getStimulus()
 * @model
 * @generated
 */
public interface Stimulus extends EObject {
	/**
	 * Returns the value of the '<em><b>Kind</b></em>' attribute.
	 * The literals are from the enumeration {@link limen.model.StimulusKind}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * What the step measures.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Kind</em>' attribute.
	 * @see limen.model.StimulusKind
	 * @see #setKind(StimulusKind)
	 * @see limen.model.LimenPackage#getStimulus_Kind()
	 * @model
	 * @generated
	 */
	StimulusKind getKind();

	/**
	 * Sets the value of the '{@link limen.model.Stimulus#getKind <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Kind</em>' attribute.
	 * @see limen.model.StimulusKind
	 * @see #getKind()
	 * @generated
	 */
	void setKind(StimulusKind value);

	/**
	 * Returns the value of the '<em><b>Standard Frequency Hz</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Frequency of the standard tone in Hz (for detection: the frequency of the tone to detect).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Standard Frequency Hz</em>' attribute.
	 * @see #setStandardFrequencyHz(double)
	 * @see limen.model.LimenPackage#getStimulus_StandardFrequencyHz()
	 * @model
	 * @generated
	 */
	double getStandardFrequencyHz();

	/**
	 * Sets the value of the '{@link limen.model.Stimulus#getStandardFrequencyHz <em>Standard Frequency Hz</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Standard Frequency Hz</em>' attribute.
	 * @see #getStandardFrequencyHz()
	 * @generated
	 */
	void setStandardFrequencyHz(double value);

	/**
	 * Returns the value of the '<em><b>Standard Level</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Level of the standard tone; required for discrimination, ignored for detection (the tracks vary the level there).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Standard Level</em>' containment reference.
	 * @see #setStandardLevel(Level)
	 * @see limen.model.LimenPackage#getStimulus_StandardLevel()
	 * @model containment="true"
	 * @generated
	 */
	Level getStandardLevel();

	/**
	 * Sets the value of the '{@link limen.model.Stimulus#getStandardLevel <em>Standard Level</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Standard Level</em>' containment reference.
	 * @see #getStandardLevel()
	 * @generated
	 */
	void setStandardLevel(Level value);

	/**
	 * Returns the value of the '<em><b>Ramp Duration Seconds</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Duration of each raised-cosine onset and offset ramp, in seconds; at most half the interval duration.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Ramp Duration Seconds</em>' attribute.
	 * @see #setRampDurationSeconds(double)
	 * @see limen.model.LimenPackage#getStimulus_RampDurationSeconds()
	 * @model
	 * @generated
	 */
	double getRampDurationSeconds();

	/**
	 * Sets the value of the '{@link limen.model.Stimulus#getRampDurationSeconds <em>Ramp Duration Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Ramp Duration Seconds</em>' attribute.
	 * @see #getRampDurationSeconds()
	 * @generated
	 */
	void setRampDurationSeconds(double value);

	/**
	 * Returns the value of the '<em><b>Ear</b></em>' attribute.
	 * The literals are from the enumeration {@link limen.model.Ear}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Which ear(s) receive the sound.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Ear</em>' attribute.
	 * @see limen.model.Ear
	 * @see #setEar(Ear)
	 * @see limen.model.LimenPackage#getStimulus_Ear()
	 * @model
	 * @generated
	 */
	Ear getEar();

	/**
	 * Sets the value of the '{@link limen.model.Stimulus#getEar <em>Ear</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Ear</em>' attribute.
	 * @see limen.model.Ear
	 * @see #getEar()
	 * @generated
	 */
	void setEar(Ear value);

	/**
	 * Returns the value of the '<em><b>Masker</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The masking noise for DETECTION_NOISE.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Masker</em>' containment reference.
	 * @see #setMasker(MaskerNoise)
	 * @see limen.model.LimenPackage#getStimulus_Masker()
	 * @model containment="true"
	 * @generated
	 */
	MaskerNoise getMasker();

	/**
	 * Sets the value of the '{@link limen.model.Stimulus#getMasker <em>Masker</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Masker</em>' containment reference.
	 * @see #getMasker()
	 * @generated
	 */
	void setMasker(MaskerNoise value);

	/**
	 * Returns the value of the '<em><b>Contributions</b></em>' containment reference list.
	 * The list contents are of type {@link limen.model.SettingsGroup}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Settings for stimulus extensions contributed by the lab (kept and validated for syntax; interpreted by the contributor).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Contributions</em>' containment reference list.
	 * @see limen.model.LimenPackage#getStimulus_Contributions()
	 * @model containment="true"
	 * @generated
	 */
	EList<SettingsGroup> getContributions();

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The standard frequency is positive, the ramps are not negative, not shorter than 5 ms (warning) and no longer than half the interval (LM0201, LM0204-LM0206).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean validTone(DiagnosticChain diagnostics, Map<Object, Object> context);

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Discrimination stimuli have a standard level; detection stimuli ignore it (LM0210, LM0215).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean validStandardLevel(DiagnosticChain diagnostics, Map<Object, Object> context);

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Detection in noise has a masker with a valid band that contains the tone; other kinds have none (LM0230-LM0233, LM0235).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean validMasker(DiagnosticChain diagnostics, Map<Object, Object> context);

} // Stimulus
