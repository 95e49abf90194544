/**
 */
package limen.model;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Battery</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * An ordered list of measurement steps that one participant runs in one session, with the ordering policy and the breaks.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.Battery#getTitle <em>Title</em>}</li>
 *   <li>{@link limen.model.Battery#getNotes <em>Notes</em>}</li>
 *   <li>{@link limen.model.Battery#getCalibrationFile <em>Calibration File</em>}</li>
 *   <li>{@link limen.model.Battery#getOrdering <em>Ordering</em>}</li>
 *   <li>{@link limen.model.Battery#getShuffleSeed <em>Shuffle Seed</em>}</li>
 *   <li>{@link limen.model.Battery#getSteps <em>Steps</em>}</li>
 *   <li>{@link limen.model.Battery#getBreaks <em>Breaks</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getBattery()
 * @model
 * @generated
 */
public interface Battery extends LimenDocument {
	/**
	 * Returns the value of the '<em><b>Title</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Human-readable name of the battery.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Title</em>' attribute.
	 * @see #setTitle(String)
	 * @see limen.model.LimenPackage#getBattery_Title()
	 * @model required="true"
	 * @generated
	 */
	String getTitle();

	/**
	 * Sets the value of the '{@link limen.model.Battery#getTitle <em>Title</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Title</em>' attribute.
	 * @see #getTitle()
	 * @generated
	 */
	void setTitle(String value);

	/**
	 * Returns the value of the '<em><b>Notes</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Free text for the experimenter.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Notes</em>' attribute.
	 * @see #setNotes(String)
	 * @see limen.model.LimenPackage#getBattery_Notes()
	 * @model
	 * @generated
	 */
	String getNotes();

	/**
	 * Sets the value of the '{@link limen.model.Battery#getNotes <em>Notes</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Notes</em>' attribute.
	 * @see #getNotes()
	 * @generated
	 */
	void setNotes(String value);

	/**
	 * Returns the value of the '<em><b>Calibration File</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Path of the calibration file this battery is meant for, relative to the battery file's folder. Used by the checker to verify levels and frequency ranges; the session runner may use another calibration of the same lab.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Calibration File</em>' attribute.
	 * @see #setCalibrationFile(String)
	 * @see limen.model.LimenPackage#getBattery_CalibrationFile()
	 * @model
	 * @generated
	 */
	String getCalibrationFile();

	/**
	 * Sets the value of the '{@link limen.model.Battery#getCalibrationFile <em>Calibration File</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Calibration File</em>' attribute.
	 * @see #getCalibrationFile()
	 * @generated
	 */
	void setCalibrationFile(String value);

	/**
	 * Returns the value of the '<em><b>Ordering</b></em>' attribute.
	 * The literals are from the enumeration {@link limen.model.OrderingPolicy}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * How the steps are ordered for each participant. Steps with fixedPosition keep their place.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Ordering</em>' attribute.
	 * @see limen.model.OrderingPolicy
	 * @see #setOrdering(OrderingPolicy)
	 * @see limen.model.LimenPackage#getBattery_Ordering()
	 * @model
	 * @generated
	 */
	OrderingPolicy getOrdering();

	/**
	 * Sets the value of the '{@link limen.model.Battery#getOrdering <em>Ordering</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Ordering</em>' attribute.
	 * @see limen.model.OrderingPolicy
	 * @see #getOrdering()
	 * @generated
	 */
	void setOrdering(OrderingPolicy value);

	/**
	 * Returns the value of the '<em><b>Shuffle Seed</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Seed of the random generator that shuffles the steps (SHUFFLED only). When unset, the session draws a seed and records it in its header.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Shuffle Seed</em>' attribute.
	 * @see #isSetShuffleSeed()
	 * @see #unsetShuffleSeed()
	 * @see #setShuffleSeed(long)
	 * @see limen.model.LimenPackage#getBattery_ShuffleSeed()
	 * @model unsettable="true"
	 * @generated
	 */
	long getShuffleSeed();

	/**
	 * Sets the value of the '{@link limen.model.Battery#getShuffleSeed <em>Shuffle Seed</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Shuffle Seed</em>' attribute.
	 * @see #isSetShuffleSeed()
	 * @see #unsetShuffleSeed()
	 * @see #getShuffleSeed()
	 * @generated
	 */
	void setShuffleSeed(long value);

	/**
	 * Unsets the value of the '{@link limen.model.Battery#getShuffleSeed <em>Shuffle Seed</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetShuffleSeed()
	 * @see #getShuffleSeed()
	 * @see #setShuffleSeed(long)
	 * @generated
	 */
	void unsetShuffleSeed();

	/**
	 * Returns whether the value of the '{@link limen.model.Battery#getShuffleSeed <em>Shuffle Seed</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Shuffle Seed</em>' attribute is set.
	 * @see #unsetShuffleSeed()
	 * @see #getShuffleSeed()
	 * @see #setShuffleSeed(long)
	 * @generated
	 */
	boolean isSetShuffleSeed();

	/**
	 * Returns the value of the '<em><b>Steps</b></em>' containment reference list.
	 * The list contents are of type {@link limen.model.Step}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The measurements, in their nominal order.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Steps</em>' containment reference list.
	 * @see limen.model.LimenPackage#getBattery_Steps()
	 * @model containment="true" required="true"
	 * @generated
	 */
	EList<Step> getSteps();

	/**
	 * Returns the value of the '<em><b>Breaks</b></em>' containment reference list.
	 * The list contents are of type {@link limen.model.Break}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Pauses between steps.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Breaks</em>' containment reference list.
	 * @see limen.model.LimenPackage#getBattery_Breaks()
	 * @model containment="true"
	 * @generated
	 */
	EList<Break> getBreaks();

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Every step id is a non-blank word without white space and no two steps share one (codes LM0102, LM0108).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean uniqueStepIds(DiagnosticChain diagnostics, Map<Object, Object> context);

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The shuffle seed is only given for SHUFFLED ordering and a permuting policy has at least two movable steps (LM0103, LM0104).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean validOrdering(DiagnosticChain diagnostics, Map<Object, Object> context);

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Each break lies between two steps and has a non-negative duration (LM0105-LM0107).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean validBreaks(DiagnosticChain diagnostics, Map<Object, Object> context);

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * No chain of relative levels leads from a step back to itself (LM0505).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean noReferenceCycles(DiagnosticChain diagnostics, Map<Object, Object> context);

} // Battery
