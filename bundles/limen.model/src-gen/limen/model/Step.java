/**
 */
package limen.model;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Step</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * One measurement: a task, a stimulus, the quantity the procedure varies and one or more interleaved tracks. Each trial picks one unfinished track at random (with the session's seeded generator); the step ends when every track has stopped.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.Step#getId <em>Id</em>}</li>
 *   <li>{@link limen.model.Step#getTitle <em>Title</em>}</li>
 *   <li>{@link limen.model.Step#getNotes <em>Notes</em>}</li>
 *   <li>{@link limen.model.Step#isFixedPosition <em>Fixed Position</em>}</li>
 *   <li>{@link limen.model.Step#getTask <em>Task</em>}</li>
 *   <li>{@link limen.model.Step#getStimulus <em>Stimulus</em>}</li>
 *   <li>{@link limen.model.Step#getVariedQuantity <em>Varied Quantity</em>}</li>
 *   <li>{@link limen.model.Step#getTracks <em>Tracks</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getStep()
 * @model
 * @generated
 */
public interface Step extends EObject {
	/**
	 * Returns the value of the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Identifier, unique within the battery, referred to by relative levels and session headers; a word without white space such as 'abs-1000'.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Id</em>' attribute.
	 * @see #setId(String)
	 * @see limen.model.LimenPackage#getStep_Id()
	 * @model id="true" required="true"
	 * @generated
	 */
	String getId();

	/**
	 * Sets the value of the '{@link limen.model.Step#getId <em>Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Id</em>' attribute.
	 * @see #getId()
	 * @generated
	 */
	void setId(String value);

	/**
	 * Returns the value of the '<em><b>Title</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Human-readable name used in messages and reports.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Title</em>' attribute.
	 * @see #setTitle(String)
	 * @see limen.model.LimenPackage#getStep_Title()
	 * @model required="true"
	 * @generated
	 */
	String getTitle();

	/**
	 * Sets the value of the '{@link limen.model.Step#getTitle <em>Title</em>}' attribute.
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
	 * @see limen.model.LimenPackage#getStep_Notes()
	 * @model
	 * @generated
	 */
	String getNotes();

	/**
	 * Sets the value of the '{@link limen.model.Step#getNotes <em>Notes</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Notes</em>' attribute.
	 * @see #getNotes()
	 * @generated
	 */
	void setNotes(String value);

	/**
	 * Returns the value of the '<em><b>Fixed Position</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * When true, the ordering policy never moves this step (for example absolute thresholds that later steps refer to).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Fixed Position</em>' attribute.
	 * @see #setFixedPosition(boolean)
	 * @see limen.model.LimenPackage#getStep_FixedPosition()
	 * @model
	 * @generated
	 */
	boolean isFixedPosition();

	/**
	 * Sets the value of the '{@link limen.model.Step#isFixedPosition <em>Fixed Position</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Fixed Position</em>' attribute.
	 * @see #isFixedPosition()
	 * @generated
	 */
	void setFixedPosition(boolean value);

	/**
	 * Returns the value of the '<em><b>Task</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * What the participant does on each trial.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Task</em>' containment reference.
	 * @see #setTask(Task)
	 * @see limen.model.LimenPackage#getStep_Task()
	 * @model containment="true" required="true"
	 * @generated
	 */
	Task getTask();

	/**
	 * Sets the value of the '{@link limen.model.Step#getTask <em>Task</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Task</em>' containment reference.
	 * @see #getTask()
	 * @generated
	 */
	void setTask(Task value);

	/**
	 * Returns the value of the '<em><b>Stimulus</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The sound presented.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Stimulus</em>' containment reference.
	 * @see #setStimulus(Stimulus)
	 * @see limen.model.LimenPackage#getStep_Stimulus()
	 * @model containment="true" required="true"
	 * @generated
	 */
	Stimulus getStimulus();

	/**
	 * Sets the value of the '{@link limen.model.Step#getStimulus <em>Stimulus</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Stimulus</em>' containment reference.
	 * @see #getStimulus()
	 * @generated
	 */
	void setStimulus(Stimulus value);

	/**
	 * Returns the value of the '<em><b>Varied Quantity</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The quantity the tracks' procedures change from trial to trial.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Varied Quantity</em>' containment reference.
	 * @see #setVariedQuantity(VariedQuantity)
	 * @see limen.model.LimenPackage#getStep_VariedQuantity()
	 * @model containment="true" required="true"
	 * @generated
	 */
	VariedQuantity getVariedQuantity();

	/**
	 * Sets the value of the '{@link limen.model.Step#getVariedQuantity <em>Varied Quantity</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Varied Quantity</em>' containment reference.
	 * @see #getVariedQuantity()
	 * @generated
	 */
	void setVariedQuantity(VariedQuantity value);

	/**
	 * Returns the value of the '<em><b>Tracks</b></em>' containment reference list.
	 * The list contents are of type {@link limen.model.Track}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * One or more interleaved tracks, each with its own procedure and stopping rule.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Tracks</em>' containment reference list.
	 * @see limen.model.LimenPackage#getStep_Tracks()
	 * @model containment="true" required="true"
	 * @generated
	 */
	EList<Track> getTracks();

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The varied quantity fits the stimulus kind and its scale fits the values the tracks can present (LM0220, LM0221, LM0223).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean consistentQuantity(DiagnosticChain diagnostics, Map<Object, Object> context);

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Every level the step can present, including the extreme values of its tracks, stays at or under the calibration ceiling and the full-scale output (LM0211-LM0214); needs a calibration in the context.
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean levelsWithinCeiling(DiagnosticChain diagnostics, Map<Object, Object> context);

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Every frequency the step can present lies below the Nyquist frequency and inside the calibrated range (LM0202, LM0203); needs a calibration in the context.
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean frequenciesWithinRange(DiagnosticChain diagnostics, Map<Object, Object> context);

} // Step
