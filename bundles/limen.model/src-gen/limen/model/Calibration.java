/**
 */
package limen.model;

import java.time.LocalDate;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Calibration</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * The measured acoustic output of one output chain (device, amplifier, transducer): the sound pressure level produced by a pure tone at referenceLevelDbfs at each frequency, and the lab's ceiling. Levels between points are interpolated linearly in dB on a log-frequency axis; frequencies outside the points are not calibrated.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.Calibration#getName <em>Name</em>}</li>
 *   <li>{@link limen.model.Calibration#getDevice <em>Device</em>}</li>
 *   <li>{@link limen.model.Calibration#getTransducer <em>Transducer</em>}</li>
 *   <li>{@link limen.model.Calibration#getReferenceLevelDbfs <em>Reference Level Dbfs</em>}</li>
 *   <li>{@link limen.model.Calibration#getSampleRateHz <em>Sample Rate Hz</em>}</li>
 *   <li>{@link limen.model.Calibration#getCeilingDbSpl <em>Ceiling Db Spl</em>}</li>
 *   <li>{@link limen.model.Calibration#getMeasuredBy <em>Measured By</em>}</li>
 *   <li>{@link limen.model.Calibration#getMeasuredOn <em>Measured On</em>}</li>
 *   <li>{@link limen.model.Calibration#isDemonstrationOnly <em>Demonstration Only</em>}</li>
 *   <li>{@link limen.model.Calibration#getNotes <em>Notes</em>}</li>
 *   <li>{@link limen.model.Calibration#getPoints <em>Points</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getCalibration()
 * @model
 * @generated
 */
public interface Calibration extends LimenDocument {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Name of this calibration.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see limen.model.LimenPackage#getCalibration_Name()
	 * @model required="true"
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link limen.model.Calibration#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Device</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Output device and driver chain, for example the sound interface and its channel.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Device</em>' attribute.
	 * @see #setDevice(String)
	 * @see limen.model.LimenPackage#getCalibration_Device()
	 * @model required="true"
	 * @generated
	 */
	String getDevice();

	/**
	 * Sets the value of the '{@link limen.model.Calibration#getDevice <em>Device</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Device</em>' attribute.
	 * @see #getDevice()
	 * @generated
	 */
	void setDevice(String value);

	/**
	 * Returns the value of the '<em><b>Transducer</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Headphone, insert earphone or loudspeaker, and the coupler or ear simulator used for the measurement.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Transducer</em>' attribute.
	 * @see #setTransducer(String)
	 * @see limen.model.LimenPackage#getCalibration_Transducer()
	 * @model required="true"
	 * @generated
	 */
	String getTransducer();

	/**
	 * Sets the value of the '{@link limen.model.Calibration#getTransducer <em>Transducer</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Transducer</em>' attribute.
	 * @see #getTransducer()
	 * @generated
	 */
	void setTransducer(String value);

	/**
	 * Returns the value of the '<em><b>Reference Level Dbfs</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Digital level of the calibration tone in dB re full scale (a full-scale sine is 0 dBFS); at most 0.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Reference Level Dbfs</em>' attribute.
	 * @see #setReferenceLevelDbfs(double)
	 * @see limen.model.LimenPackage#getCalibration_ReferenceLevelDbfs()
	 * @model
	 * @generated
	 */
	double getReferenceLevelDbfs();

	/**
	 * Sets the value of the '{@link limen.model.Calibration#getReferenceLevelDbfs <em>Reference Level Dbfs</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Reference Level Dbfs</em>' attribute.
	 * @see #getReferenceLevelDbfs()
	 * @generated
	 */
	void setReferenceLevelDbfs(double value);

	/**
	 * Returns the value of the '<em><b>Sample Rate Hz</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Sample rate of the output chain in Hz; frequencies must stay below half of it.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Sample Rate Hz</em>' attribute.
	 * @see #setSampleRateHz(int)
	 * @see limen.model.LimenPackage#getCalibration_SampleRateHz()
	 * @model
	 * @generated
	 */
	int getSampleRateHz();

	/**
	 * Sets the value of the '{@link limen.model.Calibration#getSampleRateHz <em>Sample Rate Hz</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Sample Rate Hz</em>' attribute.
	 * @see #getSampleRateHz()
	 * @generated
	 */
	void setSampleRateHz(int value);

	/**
	 * Returns the value of the '<em><b>Ceiling Db Spl</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The lab's highest allowed level in dB SPL; the safety guard refuses anything louder.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Ceiling Db Spl</em>' attribute.
	 * @see #setCeilingDbSpl(double)
	 * @see limen.model.LimenPackage#getCalibration_CeilingDbSpl()
	 * @model
	 * @generated
	 */
	double getCeilingDbSpl();

	/**
	 * Sets the value of the '{@link limen.model.Calibration#getCeilingDbSpl <em>Ceiling Db Spl</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Ceiling Db Spl</em>' attribute.
	 * @see #getCeilingDbSpl()
	 * @generated
	 */
	void setCeilingDbSpl(double value);

	/**
	 * Returns the value of the '<em><b>Measured By</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Who measured.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Measured By</em>' attribute.
	 * @see #setMeasuredBy(String)
	 * @see limen.model.LimenPackage#getCalibration_MeasuredBy()
	 * @model
	 * @generated
	 */
	String getMeasuredBy();

	/**
	 * Sets the value of the '{@link limen.model.Calibration#getMeasuredBy <em>Measured By</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Measured By</em>' attribute.
	 * @see #getMeasuredBy()
	 * @generated
	 */
	void setMeasuredBy(String value);

	/**
	 * Returns the value of the '<em><b>Measured On</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Date of the measurement (ISO 8601, yyyy-mm-dd).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Measured On</em>' attribute.
	 * @see #setMeasuredOn(LocalDate)
	 * @see limen.model.LimenPackage#getCalibration_MeasuredOn()
	 * @model dataType="limen.model.LocalDate"
	 * @generated
	 */
	LocalDate getMeasuredOn();

	/**
	 * Sets the value of the '{@link limen.model.Calibration#getMeasuredOn <em>Measured On</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Measured On</em>' attribute.
	 * @see #getMeasuredOn()
	 * @generated
	 */
	void setMeasuredOn(LocalDate value);

	/**
	 * Returns the value of the '<em><b>Demonstration Only</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * True for made-up calibrations that ship as examples: they are not valid for any real transducer and must not be used with listeners.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Demonstration Only</em>' attribute.
	 * @see #setDemonstrationOnly(boolean)
	 * @see limen.model.LimenPackage#getCalibration_DemonstrationOnly()
	 * @model
	 * @generated
	 */
	boolean isDemonstrationOnly();

	/**
	 * Sets the value of the '{@link limen.model.Calibration#isDemonstrationOnly <em>Demonstration Only</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Demonstration Only</em>' attribute.
	 * @see #isDemonstrationOnly()
	 * @generated
	 */
	void setDemonstrationOnly(boolean value);

	/**
	 * Returns the value of the '<em><b>Notes</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Free text: conditions of the measurement, instruments.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Notes</em>' attribute.
	 * @see #setNotes(String)
	 * @see limen.model.LimenPackage#getCalibration_Notes()
	 * @model
	 * @generated
	 */
	String getNotes();

	/**
	 * Sets the value of the '{@link limen.model.Calibration#getNotes <em>Notes</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Notes</em>' attribute.
	 * @see #getNotes()
	 * @generated
	 */
	void setNotes(String value);

	/**
	 * Returns the value of the '<em><b>Points</b></em>' containment reference list.
	 * The list contents are of type {@link limen.model.CalibrationPoint}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Measured points, one per frequency.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Points</em>' containment reference list.
	 * @see limen.model.LimenPackage#getCalibration_Points()
	 * @model containment="true" required="true"
	 * @generated
	 */
	EList<CalibrationPoint> getPoints();

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Positive sample rate, reference level at or under 0 dBFS, finite points at distinct frequencies above 0 and below Nyquist, a positive ceiling (warning above 100 dB SPL), the measurer and date given (warning), demonstration calibrations flagged (warning) (LM0602-LM0608, LM0610).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean validCalibration(DiagnosticChain diagnostics, Map<Object, Object> context);

} // Calibration
