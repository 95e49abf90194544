/**
 */
package limen.model;

import java.time.Instant;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Session Header</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * What is known about one session apart from its trials (the trials are in the session's journal file): who, with which battery and calibration (copies, so later edits of the originals do not change the record), on which device, with which random seed and software, when, and how it ended.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.SessionHeader#getParticipant <em>Participant</em>}</li>
 *   <li>{@link limen.model.SessionHeader#getBattery <em>Battery</em>}</li>
 *   <li>{@link limen.model.SessionHeader#getCalibration <em>Calibration</em>}</li>
 *   <li>{@link limen.model.SessionHeader#getDevice <em>Device</em>}</li>
 *   <li>{@link limen.model.SessionHeader#getRandomSeed <em>Random Seed</em>}</li>
 *   <li>{@link limen.model.SessionHeader#getSoftwareVersion <em>Software Version</em>}</li>
 *   <li>{@link limen.model.SessionHeader#getStartTime <em>Start Time</em>}</li>
 *   <li>{@link limen.model.SessionHeader#getEndTime <em>End Time</em>}</li>
 *   <li>{@link limen.model.SessionHeader#getStatus <em>Status</em>}</li>
 *   <li>{@link limen.model.SessionHeader#getLatinSquareRow <em>Latin Square Row</em>}</li>
 *   <li>{@link limen.model.SessionHeader#getStepOrder <em>Step Order</em>}</li>
 *   <li>{@link limen.model.SessionHeader#getExposure <em>Exposure</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getSessionHeader()
 * @model
 * @generated
 */
public interface SessionHeader extends LimenDocument {
	/**
	 * Returns the value of the '<em><b>Participant</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Pseudonym of the participant (never a real name).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Participant</em>' attribute.
	 * @see #setParticipant(String)
	 * @see limen.model.LimenPackage#getSessionHeader_Participant()
	 * @model required="true"
	 * @generated
	 */
	String getParticipant();

	/**
	 * Sets the value of the '{@link limen.model.SessionHeader#getParticipant <em>Participant</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Participant</em>' attribute.
	 * @see #getParticipant()
	 * @generated
	 */
	void setParticipant(String value);

	/**
	 * Returns the value of the '<em><b>Battery</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Copy of the battery as it was run.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Battery</em>' containment reference.
	 * @see #setBattery(Battery)
	 * @see limen.model.LimenPackage#getSessionHeader_Battery()
	 * @model containment="true" required="true"
	 * @generated
	 */
	Battery getBattery();

	/**
	 * Sets the value of the '{@link limen.model.SessionHeader#getBattery <em>Battery</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Battery</em>' containment reference.
	 * @see #getBattery()
	 * @generated
	 */
	void setBattery(Battery value);

	/**
	 * Returns the value of the '<em><b>Calibration</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Copy of the calibration in force.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Calibration</em>' containment reference.
	 * @see #setCalibration(Calibration)
	 * @see limen.model.LimenPackage#getSessionHeader_Calibration()
	 * @model containment="true" required="true"
	 * @generated
	 */
	Calibration getCalibration();

	/**
	 * Sets the value of the '{@link limen.model.SessionHeader#getCalibration <em>Calibration</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Calibration</em>' containment reference.
	 * @see #getCalibration()
	 * @generated
	 */
	void setCalibration(Calibration value);

	/**
	 * Returns the value of the '<em><b>Device</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Audio device actually used.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Device</em>' attribute.
	 * @see #setDevice(String)
	 * @see limen.model.LimenPackage#getSessionHeader_Device()
	 * @model
	 * @generated
	 */
	String getDevice();

	/**
	 * Sets the value of the '{@link limen.model.SessionHeader#getDevice <em>Device</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Device</em>' attribute.
	 * @see #getDevice()
	 * @generated
	 */
	void setDevice(String value);

	/**
	 * Returns the value of the '<em><b>Random Seed</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Seed of the session's random generator (track interleaving, interval positions, shuffles).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Random Seed</em>' attribute.
	 * @see #setRandomSeed(long)
	 * @see limen.model.LimenPackage#getSessionHeader_RandomSeed()
	 * @model
	 * @generated
	 */
	long getRandomSeed();

	/**
	 * Sets the value of the '{@link limen.model.SessionHeader#getRandomSeed <em>Random Seed</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Random Seed</em>' attribute.
	 * @see #getRandomSeed()
	 * @generated
	 */
	void setRandomSeed(long value);

	/**
	 * Returns the value of the '<em><b>Software Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Version of Limen that ran the session.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Software Version</em>' attribute.
	 * @see #setSoftwareVersion(String)
	 * @see limen.model.LimenPackage#getSessionHeader_SoftwareVersion()
	 * @model
	 * @generated
	 */
	String getSoftwareVersion();

	/**
	 * Sets the value of the '{@link limen.model.SessionHeader#getSoftwareVersion <em>Software Version</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Software Version</em>' attribute.
	 * @see #getSoftwareVersion()
	 * @generated
	 */
	void setSoftwareVersion(String value);

	/**
	 * Returns the value of the '<em><b>Start Time</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * When the session started (UTC).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Start Time</em>' attribute.
	 * @see #setStartTime(Instant)
	 * @see limen.model.LimenPackage#getSessionHeader_StartTime()
	 * @model dataType="limen.model.Instant"
	 * @generated
	 */
	Instant getStartTime();

	/**
	 * Sets the value of the '{@link limen.model.SessionHeader#getStartTime <em>Start Time</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Start Time</em>' attribute.
	 * @see #getStartTime()
	 * @generated
	 */
	void setStartTime(Instant value);

	/**
	 * Returns the value of the '<em><b>End Time</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * When the session ended (UTC); unset while it runs.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>End Time</em>' attribute.
	 * @see #setEndTime(Instant)
	 * @see limen.model.LimenPackage#getSessionHeader_EndTime()
	 * @model dataType="limen.model.Instant"
	 * @generated
	 */
	Instant getEndTime();

	/**
	 * Sets the value of the '{@link limen.model.SessionHeader#getEndTime <em>End Time</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>End Time</em>' attribute.
	 * @see #getEndTime()
	 * @generated
	 */
	void setEndTime(Instant value);

	/**
	 * Returns the value of the '<em><b>Status</b></em>' attribute.
	 * The literals are from the enumeration {@link limen.model.SessionStatus}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * How far the session got.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Status</em>' attribute.
	 * @see limen.model.SessionStatus
	 * @see #setStatus(SessionStatus)
	 * @see limen.model.LimenPackage#getSessionHeader_Status()
	 * @model
	 * @generated
	 */
	SessionStatus getStatus();

	/**
	 * Sets the value of the '{@link limen.model.SessionHeader#getStatus <em>Status</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Status</em>' attribute.
	 * @see limen.model.SessionStatus
	 * @see #getStatus()
	 * @generated
	 */
	void setStatus(SessionStatus value);

	/**
	 * Returns the value of the '<em><b>Latin Square Row</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Row of the Latin square used for this participant (LATIN_SQUARE ordering).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Latin Square Row</em>' attribute.
	 * @see #isSetLatinSquareRow()
	 * @see #unsetLatinSquareRow()
	 * @see #setLatinSquareRow(int)
	 * @see limen.model.LimenPackage#getSessionHeader_LatinSquareRow()
	 * @model unsettable="true"
	 * @generated
	 */
	int getLatinSquareRow();

	/**
	 * Sets the value of the '{@link limen.model.SessionHeader#getLatinSquareRow <em>Latin Square Row</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Latin Square Row</em>' attribute.
	 * @see #isSetLatinSquareRow()
	 * @see #unsetLatinSquareRow()
	 * @see #getLatinSquareRow()
	 * @generated
	 */
	void setLatinSquareRow(int value);

	/**
	 * Unsets the value of the '{@link limen.model.SessionHeader#getLatinSquareRow <em>Latin Square Row</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetLatinSquareRow()
	 * @see #getLatinSquareRow()
	 * @see #setLatinSquareRow(int)
	 * @generated
	 */
	void unsetLatinSquareRow();

	/**
	 * Returns whether the value of the '{@link limen.model.SessionHeader#getLatinSquareRow <em>Latin Square Row</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Latin Square Row</em>' attribute is set.
	 * @see #unsetLatinSquareRow()
	 * @see #getLatinSquareRow()
	 * @see #setLatinSquareRow(int)
	 * @generated
	 */
	boolean isSetLatinSquareRow();

	/**
	 * Returns the value of the '<em><b>Step Order</b></em>' reference list.
	 * The list contents are of type {@link limen.model.Step}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The snapshot's steps in the order they were run (or are to be run); each step at most once.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Step Order</em>' reference list.
	 * @see limen.model.LimenPackage#getSessionHeader_StepOrder()
	 * @model
	 * @generated
	 */
	EList<Step> getStepOrder();

	/**
	 * Returns the value of the '<em><b>Exposure</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Estimate of the sound exposure during the session.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Exposure</em>' containment reference.
	 * @see #setExposure(ExposureEstimate)
	 * @see limen.model.LimenPackage#getSessionHeader_Exposure()
	 * @model containment="true"
	 * @generated
	 */
	ExposureEstimate getExposure();

	/**
	 * Sets the value of the '{@link limen.model.SessionHeader#getExposure <em>Exposure</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Exposure</em>' containment reference.
	 * @see #getExposure()
	 * @generated
	 */
	void setExposure(ExposureEstimate value);

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * A non-blank pseudonym, an end not before the start, an end time for finished sessions, a run order of snapshot steps only, and exposure figures that are not negative and stay at or under the ceiling (LM0701-LM0705).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean validSession(DiagnosticChain diagnostics, Map<Object, Object> context);

} // SessionHeader
