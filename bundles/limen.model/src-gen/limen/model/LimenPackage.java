/**
 */
package limen.model;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EDataType;
import org.eclipse.emf.ecore.EEnum;
import org.eclipse.emf.ecore.EOperation;
import org.eclipse.emf.ecore.EPackage;
import org.eclipse.emf.ecore.EReference;

/**
 * <!-- begin-user-doc -->
 * The <b>Package</b> for the model.
 * It contains accessors for the meta objects to represent
 * <ul>
 *   <li>each class,</li>
 *   <li>each feature of each class,</li>
 *   <li>each operation of each class,</li>
 *   <li>each enum,</li>
 *   <li>and each data type</li>
 * </ul>
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * The Limen protocol model: batteries of psychoacoustic measurements (steps, tasks, stimuli, tracks, procedures, stopping rules), calibrations of an output chain and session headers. Units are in the feature names (frequencyHz, durationSeconds, levelDbSpl); values of a varied quantity are in that quantity's unit. Attributes at their intrinsic default (0, false, the first enum literal) are not written to files, so a default must never change meaning: never reorder enum literals, add new ones at the end. Invariants are implemented in limen.model.validation.internal and reported with stable codes (LMnnnn); see limen.model.validation.ProblemCode.
 * <!-- end-model-doc -->
 * @see limen.model.LimenFactory
 * @model kind="package"
 * @generated
 */
public interface LimenPackage extends EPackage {
	/**
	 * The package name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	String eNAME = "model";

	/**
	 * The package namespace URI.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	String eNS_URI = "http://limen.dev/model/1.0";

	/**
	 * The package namespace name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	String eNS_PREFIX = "limen";

	/**
	 * The singleton instance of the package.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	LimenPackage eINSTANCE = limen.model.impl.LimenPackageImpl.init();

	/**
	 * The meta object id for the '{@link limen.model.impl.LimenDocumentImpl <em>Document</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.LimenDocumentImpl
	 * @see limen.model.impl.LimenPackageImpl#getLimenDocument()
	 * @generated
	 */
	int LIMEN_DOCUMENT = 0;

	/**
	 * The feature id for the '<em><b>Schema Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIMEN_DOCUMENT__SCHEMA_VERSION = 0;

	/**
	 * The number of structural features of the '<em>Document</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIMEN_DOCUMENT_FEATURE_COUNT = 1;

	/**
	 * The number of operations of the '<em>Document</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIMEN_DOCUMENT_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link limen.model.impl.BatteryImpl <em>Battery</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.BatteryImpl
	 * @see limen.model.impl.LimenPackageImpl#getBattery()
	 * @generated
	 */
	int BATTERY = 1;

	/**
	 * The feature id for the '<em><b>Schema Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BATTERY__SCHEMA_VERSION = LIMEN_DOCUMENT__SCHEMA_VERSION;

	/**
	 * The feature id for the '<em><b>Title</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BATTERY__TITLE = LIMEN_DOCUMENT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Notes</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BATTERY__NOTES = LIMEN_DOCUMENT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Calibration File</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BATTERY__CALIBRATION_FILE = LIMEN_DOCUMENT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Ordering</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BATTERY__ORDERING = LIMEN_DOCUMENT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Shuffle Seed</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BATTERY__SHUFFLE_SEED = LIMEN_DOCUMENT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Steps</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BATTERY__STEPS = LIMEN_DOCUMENT_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Breaks</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BATTERY__BREAKS = LIMEN_DOCUMENT_FEATURE_COUNT + 6;

	/**
	 * The number of structural features of the '<em>Battery</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BATTERY_FEATURE_COUNT = LIMEN_DOCUMENT_FEATURE_COUNT + 7;

	/**
	 * The operation id for the '<em>Unique Step Ids</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BATTERY___UNIQUE_STEP_IDS__DIAGNOSTICCHAIN_MAP = LIMEN_DOCUMENT_OPERATION_COUNT + 0;

	/**
	 * The operation id for the '<em>Valid Ordering</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BATTERY___VALID_ORDERING__DIAGNOSTICCHAIN_MAP = LIMEN_DOCUMENT_OPERATION_COUNT + 1;

	/**
	 * The operation id for the '<em>Valid Breaks</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BATTERY___VALID_BREAKS__DIAGNOSTICCHAIN_MAP = LIMEN_DOCUMENT_OPERATION_COUNT + 2;

	/**
	 * The operation id for the '<em>No Reference Cycles</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BATTERY___NO_REFERENCE_CYCLES__DIAGNOSTICCHAIN_MAP = LIMEN_DOCUMENT_OPERATION_COUNT + 3;

	/**
	 * The number of operations of the '<em>Battery</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BATTERY_OPERATION_COUNT = LIMEN_DOCUMENT_OPERATION_COUNT + 4;

	/**
	 * The meta object id for the '{@link limen.model.impl.BreakImpl <em>Break</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.BreakImpl
	 * @see limen.model.impl.LimenPackageImpl#getBreak()
	 * @generated
	 */
	int BREAK = 2;

	/**
	 * The feature id for the '<em><b>After Step Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BREAK__AFTER_STEP_COUNT = 0;

	/**
	 * The feature id for the '<em><b>Minimum Duration Seconds</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BREAK__MINIMUM_DURATION_SECONDS = 1;

	/**
	 * The feature id for the '<em><b>Message</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BREAK__MESSAGE = 2;

	/**
	 * The number of structural features of the '<em>Break</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BREAK_FEATURE_COUNT = 3;

	/**
	 * The number of operations of the '<em>Break</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BREAK_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link limen.model.impl.StepImpl <em>Step</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.StepImpl
	 * @see limen.model.impl.LimenPackageImpl#getStep()
	 * @generated
	 */
	int STEP = 3;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STEP__ID = 0;

	/**
	 * The feature id for the '<em><b>Title</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STEP__TITLE = 1;

	/**
	 * The feature id for the '<em><b>Notes</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STEP__NOTES = 2;

	/**
	 * The feature id for the '<em><b>Fixed Position</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STEP__FIXED_POSITION = 3;

	/**
	 * The feature id for the '<em><b>Task</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STEP__TASK = 4;

	/**
	 * The feature id for the '<em><b>Stimulus</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STEP__STIMULUS = 5;

	/**
	 * The feature id for the '<em><b>Varied Quantity</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STEP__VARIED_QUANTITY = 6;

	/**
	 * The feature id for the '<em><b>Tracks</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STEP__TRACKS = 7;

	/**
	 * The number of structural features of the '<em>Step</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STEP_FEATURE_COUNT = 8;

	/**
	 * The operation id for the '<em>Consistent Quantity</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STEP___CONSISTENT_QUANTITY__DIAGNOSTICCHAIN_MAP = 0;

	/**
	 * The operation id for the '<em>Levels Within Ceiling</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STEP___LEVELS_WITHIN_CEILING__DIAGNOSTICCHAIN_MAP = 1;

	/**
	 * The operation id for the '<em>Frequencies Within Range</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STEP___FREQUENCIES_WITHIN_RANGE__DIAGNOSTICCHAIN_MAP = 2;

	/**
	 * The number of operations of the '<em>Step</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STEP_OPERATION_COUNT = 3;

	/**
	 * The meta object id for the '{@link limen.model.impl.TaskImpl <em>Task</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.TaskImpl
	 * @see limen.model.impl.LimenPackageImpl#getTask()
	 * @generated
	 */
	int TASK = 4;

	/**
	 * The feature id for the '<em><b>Interval Duration Seconds</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TASK__INTERVAL_DURATION_SECONDS = 0;

	/**
	 * The feature id for the '<em><b>Response Window Seconds</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TASK__RESPONSE_WINDOW_SECONDS = 1;

	/**
	 * The feature id for the '<em><b>Inter Trial Interval Seconds</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TASK__INTER_TRIAL_INTERVAL_SECONDS = 2;

	/**
	 * The feature id for the '<em><b>Feedback</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TASK__FEEDBACK = 3;

	/**
	 * The feature id for the '<em><b>Early Responses</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TASK__EARLY_RESPONSES = 4;

	/**
	 * The number of structural features of the '<em>Task</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TASK_FEATURE_COUNT = 5;

	/**
	 * The operation id for the '<em>Valid Timing</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TASK___VALID_TIMING__DIAGNOSTICCHAIN_MAP = 0;

	/**
	 * The number of operations of the '<em>Task</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TASK_OPERATION_COUNT = 1;

	/**
	 * The meta object id for the '{@link limen.model.impl.ForcedChoiceTaskImpl <em>Forced Choice Task</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.ForcedChoiceTaskImpl
	 * @see limen.model.impl.LimenPackageImpl#getForcedChoiceTask()
	 * @generated
	 */
	int FORCED_CHOICE_TASK = 5;

	/**
	 * The feature id for the '<em><b>Interval Duration Seconds</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FORCED_CHOICE_TASK__INTERVAL_DURATION_SECONDS = TASK__INTERVAL_DURATION_SECONDS;

	/**
	 * The feature id for the '<em><b>Response Window Seconds</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FORCED_CHOICE_TASK__RESPONSE_WINDOW_SECONDS = TASK__RESPONSE_WINDOW_SECONDS;

	/**
	 * The feature id for the '<em><b>Inter Trial Interval Seconds</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FORCED_CHOICE_TASK__INTER_TRIAL_INTERVAL_SECONDS = TASK__INTER_TRIAL_INTERVAL_SECONDS;

	/**
	 * The feature id for the '<em><b>Feedback</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FORCED_CHOICE_TASK__FEEDBACK = TASK__FEEDBACK;

	/**
	 * The feature id for the '<em><b>Early Responses</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FORCED_CHOICE_TASK__EARLY_RESPONSES = TASK__EARLY_RESPONSES;

	/**
	 * The feature id for the '<em><b>Interval Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FORCED_CHOICE_TASK__INTERVAL_COUNT = TASK_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Inter Stimulus Interval Seconds</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FORCED_CHOICE_TASK__INTER_STIMULUS_INTERVAL_SECONDS = TASK_FEATURE_COUNT + 1;

	/**
	 * The number of structural features of the '<em>Forced Choice Task</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FORCED_CHOICE_TASK_FEATURE_COUNT = TASK_FEATURE_COUNT + 2;

	/**
	 * The operation id for the '<em>Valid Timing</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FORCED_CHOICE_TASK___VALID_TIMING__DIAGNOSTICCHAIN_MAP = TASK___VALID_TIMING__DIAGNOSTICCHAIN_MAP;

	/**
	 * The operation id for the '<em>Valid Intervals</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FORCED_CHOICE_TASK___VALID_INTERVALS__DIAGNOSTICCHAIN_MAP = TASK_OPERATION_COUNT + 0;

	/**
	 * The number of operations of the '<em>Forced Choice Task</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FORCED_CHOICE_TASK_OPERATION_COUNT = TASK_OPERATION_COUNT + 1;

	/**
	 * The meta object id for the '{@link limen.model.impl.YesNoTaskImpl <em>Yes No Task</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.YesNoTaskImpl
	 * @see limen.model.impl.LimenPackageImpl#getYesNoTask()
	 * @generated
	 */
	int YES_NO_TASK = 6;

	/**
	 * The feature id for the '<em><b>Interval Duration Seconds</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int YES_NO_TASK__INTERVAL_DURATION_SECONDS = TASK__INTERVAL_DURATION_SECONDS;

	/**
	 * The feature id for the '<em><b>Response Window Seconds</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int YES_NO_TASK__RESPONSE_WINDOW_SECONDS = TASK__RESPONSE_WINDOW_SECONDS;

	/**
	 * The feature id for the '<em><b>Inter Trial Interval Seconds</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int YES_NO_TASK__INTER_TRIAL_INTERVAL_SECONDS = TASK__INTER_TRIAL_INTERVAL_SECONDS;

	/**
	 * The feature id for the '<em><b>Feedback</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int YES_NO_TASK__FEEDBACK = TASK__FEEDBACK;

	/**
	 * The feature id for the '<em><b>Early Responses</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int YES_NO_TASK__EARLY_RESPONSES = TASK__EARLY_RESPONSES;

	/**
	 * The feature id for the '<em><b>Catch Trial Rate</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int YES_NO_TASK__CATCH_TRIAL_RATE = TASK_FEATURE_COUNT + 0;

	/**
	 * The number of structural features of the '<em>Yes No Task</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int YES_NO_TASK_FEATURE_COUNT = TASK_FEATURE_COUNT + 1;

	/**
	 * The operation id for the '<em>Valid Timing</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int YES_NO_TASK___VALID_TIMING__DIAGNOSTICCHAIN_MAP = TASK___VALID_TIMING__DIAGNOSTICCHAIN_MAP;

	/**
	 * The operation id for the '<em>Valid Catch Trials</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int YES_NO_TASK___VALID_CATCH_TRIALS__DIAGNOSTICCHAIN_MAP = TASK_OPERATION_COUNT + 0;

	/**
	 * The number of operations of the '<em>Yes No Task</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int YES_NO_TASK_OPERATION_COUNT = TASK_OPERATION_COUNT + 1;

	/**
	 * The meta object id for the '{@link limen.model.impl.StimulusImpl <em>Stimulus</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.StimulusImpl
	 * @see limen.model.impl.LimenPackageImpl#getStimulus()
	 * @generated
	 */
	int STIMULUS = 7;

	/**
	 * The feature id for the '<em><b>Kind</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STIMULUS__KIND = 0;

	/**
	 * The feature id for the '<em><b>Standard Frequency Hz</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STIMULUS__STANDARD_FREQUENCY_HZ = 1;

	/**
	 * The feature id for the '<em><b>Standard Level</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STIMULUS__STANDARD_LEVEL = 2;

	/**
	 * The feature id for the '<em><b>Ramp Duration Seconds</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STIMULUS__RAMP_DURATION_SECONDS = 3;

	/**
	 * The feature id for the '<em><b>Ear</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STIMULUS__EAR = 4;

	/**
	 * The feature id for the '<em><b>Masker</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STIMULUS__MASKER = 5;

	/**
	 * The feature id for the '<em><b>Contributions</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STIMULUS__CONTRIBUTIONS = 6;

	/**
	 * The number of structural features of the '<em>Stimulus</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STIMULUS_FEATURE_COUNT = 7;

	/**
	 * The operation id for the '<em>Valid Tone</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STIMULUS___VALID_TONE__DIAGNOSTICCHAIN_MAP = 0;

	/**
	 * The operation id for the '<em>Valid Standard Level</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STIMULUS___VALID_STANDARD_LEVEL__DIAGNOSTICCHAIN_MAP = 1;

	/**
	 * The operation id for the '<em>Valid Masker</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STIMULUS___VALID_MASKER__DIAGNOSTICCHAIN_MAP = 2;

	/**
	 * The number of operations of the '<em>Stimulus</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STIMULUS_OPERATION_COUNT = 3;

	/**
	 * The meta object id for the '{@link limen.model.impl.LevelImpl <em>Level</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.LevelImpl
	 * @see limen.model.impl.LimenPackageImpl#getLevel()
	 * @generated
	 */
	int LEVEL = 8;

	/**
	 * The number of structural features of the '<em>Level</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LEVEL_FEATURE_COUNT = 0;

	/**
	 * The number of operations of the '<em>Level</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LEVEL_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link limen.model.impl.AbsoluteLevelImpl <em>Absolute Level</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.AbsoluteLevelImpl
	 * @see limen.model.impl.LimenPackageImpl#getAbsoluteLevel()
	 * @generated
	 */
	int ABSOLUTE_LEVEL = 9;

	/**
	 * The feature id for the '<em><b>Level Db Spl</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ABSOLUTE_LEVEL__LEVEL_DB_SPL = LEVEL_FEATURE_COUNT + 0;

	/**
	 * The number of structural features of the '<em>Absolute Level</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ABSOLUTE_LEVEL_FEATURE_COUNT = LEVEL_FEATURE_COUNT + 1;

	/**
	 * The number of operations of the '<em>Absolute Level</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ABSOLUTE_LEVEL_OPERATION_COUNT = LEVEL_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link limen.model.impl.RelativeLevelImpl <em>Relative Level</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.RelativeLevelImpl
	 * @see limen.model.impl.LimenPackageImpl#getRelativeLevel()
	 * @generated
	 */
	int RELATIVE_LEVEL = 10;

	/**
	 * The feature id for the '<em><b>Reference</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RELATIVE_LEVEL__REFERENCE = LEVEL_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Offset Db</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RELATIVE_LEVEL__OFFSET_DB = LEVEL_FEATURE_COUNT + 1;

	/**
	 * The number of structural features of the '<em>Relative Level</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RELATIVE_LEVEL_FEATURE_COUNT = LEVEL_FEATURE_COUNT + 2;

	/**
	 * The operation id for the '<em>Valid Reference</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RELATIVE_LEVEL___VALID_REFERENCE__DIAGNOSTICCHAIN_MAP = LEVEL_OPERATION_COUNT + 0;

	/**
	 * The number of operations of the '<em>Relative Level</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RELATIVE_LEVEL_OPERATION_COUNT = LEVEL_OPERATION_COUNT + 1;

	/**
	 * The meta object id for the '{@link limen.model.impl.MaskerNoiseImpl <em>Masker Noise</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.MaskerNoiseImpl
	 * @see limen.model.impl.LimenPackageImpl#getMaskerNoise()
	 * @generated
	 */
	int MASKER_NOISE = 11;

	/**
	 * The feature id for the '<em><b>Spectrum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MASKER_NOISE__SPECTRUM = 0;

	/**
	 * The feature id for the '<em><b>Low Cutoff Hz</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MASKER_NOISE__LOW_CUTOFF_HZ = 1;

	/**
	 * The feature id for the '<em><b>High Cutoff Hz</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MASKER_NOISE__HIGH_CUTOFF_HZ = 2;

	/**
	 * The feature id for the '<em><b>Level</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MASKER_NOISE__LEVEL = 3;

	/**
	 * The feature id for the '<em><b>Continuous</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MASKER_NOISE__CONTINUOUS = 4;

	/**
	 * The number of structural features of the '<em>Masker Noise</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MASKER_NOISE_FEATURE_COUNT = 5;

	/**
	 * The number of operations of the '<em>Masker Noise</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MASKER_NOISE_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link limen.model.impl.VariedQuantityImpl <em>Varied Quantity</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.VariedQuantityImpl
	 * @see limen.model.impl.LimenPackageImpl#getVariedQuantity()
	 * @generated
	 */
	int VARIED_QUANTITY = 12;

	/**
	 * The feature id for the '<em><b>Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIED_QUANTITY__UNIT = 0;

	/**
	 * The feature id for the '<em><b>Scale</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIED_QUANTITY__SCALE = 1;

	/**
	 * The number of structural features of the '<em>Varied Quantity</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIED_QUANTITY_FEATURE_COUNT = 2;

	/**
	 * The number of operations of the '<em>Varied Quantity</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIED_QUANTITY_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link limen.model.impl.TrackImpl <em>Track</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.TrackImpl
	 * @see limen.model.impl.LimenPackageImpl#getTrack()
	 * @generated
	 */
	int TRACK = 13;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRACK__NAME = 0;

	/**
	 * The feature id for the '<em><b>Procedure</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRACK__PROCEDURE = 1;

	/**
	 * The feature id for the '<em><b>Stopping Rule</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRACK__STOPPING_RULE = 2;

	/**
	 * The number of structural features of the '<em>Track</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRACK_FEATURE_COUNT = 3;

	/**
	 * The number of operations of the '<em>Track</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRACK_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link limen.model.impl.ProcedureImpl <em>Procedure</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.ProcedureImpl
	 * @see limen.model.impl.LimenPackageImpl#getProcedure()
	 * @generated
	 */
	int PROCEDURE = 14;

	/**
	 * The number of structural features of the '<em>Procedure</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROCEDURE_FEATURE_COUNT = 0;

	/**
	 * The number of operations of the '<em>Procedure</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROCEDURE_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link limen.model.impl.StaircaseProcedureImpl <em>Staircase Procedure</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.StaircaseProcedureImpl
	 * @see limen.model.impl.LimenPackageImpl#getStaircaseProcedure()
	 * @generated
	 */
	int STAIRCASE_PROCEDURE = 15;

	/**
	 * The feature id for the '<em><b>Start Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STAIRCASE_PROCEDURE__START_VALUE = PROCEDURE_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Floor Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STAIRCASE_PROCEDURE__FLOOR_VALUE = PROCEDURE_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Ceiling Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STAIRCASE_PROCEDURE__CEILING_VALUE = PROCEDURE_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Step Mode</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STAIRCASE_PROCEDURE__STEP_MODE = PROCEDURE_FEATURE_COUNT + 3;

	/**
	 * The number of structural features of the '<em>Staircase Procedure</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STAIRCASE_PROCEDURE_FEATURE_COUNT = PROCEDURE_FEATURE_COUNT + 4;

	/**
	 * The operation id for the '<em>Valid Limits</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STAIRCASE_PROCEDURE___VALID_LIMITS__DIAGNOSTICCHAIN_MAP = PROCEDURE_OPERATION_COUNT + 0;

	/**
	 * The number of operations of the '<em>Staircase Procedure</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STAIRCASE_PROCEDURE_OPERATION_COUNT = PROCEDURE_OPERATION_COUNT + 1;

	/**
	 * The meta object id for the '{@link limen.model.impl.TransformedUpDownProcedureImpl <em>Transformed Up Down Procedure</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.TransformedUpDownProcedureImpl
	 * @see limen.model.impl.LimenPackageImpl#getTransformedUpDownProcedure()
	 * @generated
	 */
	int TRANSFORMED_UP_DOWN_PROCEDURE = 16;

	/**
	 * The feature id for the '<em><b>Start Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFORMED_UP_DOWN_PROCEDURE__START_VALUE = STAIRCASE_PROCEDURE__START_VALUE;

	/**
	 * The feature id for the '<em><b>Floor Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFORMED_UP_DOWN_PROCEDURE__FLOOR_VALUE = STAIRCASE_PROCEDURE__FLOOR_VALUE;

	/**
	 * The feature id for the '<em><b>Ceiling Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFORMED_UP_DOWN_PROCEDURE__CEILING_VALUE = STAIRCASE_PROCEDURE__CEILING_VALUE;

	/**
	 * The feature id for the '<em><b>Step Mode</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFORMED_UP_DOWN_PROCEDURE__STEP_MODE = STAIRCASE_PROCEDURE__STEP_MODE;

	/**
	 * The feature id for the '<em><b>Down Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFORMED_UP_DOWN_PROCEDURE__DOWN_COUNT = STAIRCASE_PROCEDURE_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Up Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFORMED_UP_DOWN_PROCEDURE__UP_COUNT = STAIRCASE_PROCEDURE_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Initial Step</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFORMED_UP_DOWN_PROCEDURE__INITIAL_STEP = STAIRCASE_PROCEDURE_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Minimum Step</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFORMED_UP_DOWN_PROCEDURE__MINIMUM_STEP = STAIRCASE_PROCEDURE_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Shrink Factor</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFORMED_UP_DOWN_PROCEDURE__SHRINK_FACTOR = STAIRCASE_PROCEDURE_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Reversals Per Shrink</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFORMED_UP_DOWN_PROCEDURE__REVERSALS_PER_SHRINK = STAIRCASE_PROCEDURE_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Discarded Reversals</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFORMED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS = STAIRCASE_PROCEDURE_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>Averaged Reversals</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFORMED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS = STAIRCASE_PROCEDURE_FEATURE_COUNT + 7;

	/**
	 * The number of structural features of the '<em>Transformed Up Down Procedure</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFORMED_UP_DOWN_PROCEDURE_FEATURE_COUNT = STAIRCASE_PROCEDURE_FEATURE_COUNT + 8;

	/**
	 * The operation id for the '<em>Valid Limits</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFORMED_UP_DOWN_PROCEDURE___VALID_LIMITS__DIAGNOSTICCHAIN_MAP = STAIRCASE_PROCEDURE___VALID_LIMITS__DIAGNOSTICCHAIN_MAP;

	/**
	 * The operation id for the '<em>Valid Up Down Rule</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFORMED_UP_DOWN_PROCEDURE___VALID_UP_DOWN_RULE__DIAGNOSTICCHAIN_MAP = STAIRCASE_PROCEDURE_OPERATION_COUNT + 0;

	/**
	 * The number of operations of the '<em>Transformed Up Down Procedure</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFORMED_UP_DOWN_PROCEDURE_OPERATION_COUNT = STAIRCASE_PROCEDURE_OPERATION_COUNT + 1;

	/**
	 * The meta object id for the '{@link limen.model.impl.WeightedUpDownProcedureImpl <em>Weighted Up Down Procedure</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.WeightedUpDownProcedureImpl
	 * @see limen.model.impl.LimenPackageImpl#getWeightedUpDownProcedure()
	 * @generated
	 */
	int WEIGHTED_UP_DOWN_PROCEDURE = 17;

	/**
	 * The feature id for the '<em><b>Start Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WEIGHTED_UP_DOWN_PROCEDURE__START_VALUE = STAIRCASE_PROCEDURE__START_VALUE;

	/**
	 * The feature id for the '<em><b>Floor Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WEIGHTED_UP_DOWN_PROCEDURE__FLOOR_VALUE = STAIRCASE_PROCEDURE__FLOOR_VALUE;

	/**
	 * The feature id for the '<em><b>Ceiling Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WEIGHTED_UP_DOWN_PROCEDURE__CEILING_VALUE = STAIRCASE_PROCEDURE__CEILING_VALUE;

	/**
	 * The feature id for the '<em><b>Step Mode</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WEIGHTED_UP_DOWN_PROCEDURE__STEP_MODE = STAIRCASE_PROCEDURE__STEP_MODE;

	/**
	 * The feature id for the '<em><b>Target Probability</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WEIGHTED_UP_DOWN_PROCEDURE__TARGET_PROBABILITY = STAIRCASE_PROCEDURE_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Up Step</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WEIGHTED_UP_DOWN_PROCEDURE__UP_STEP = STAIRCASE_PROCEDURE_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Down Step</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WEIGHTED_UP_DOWN_PROCEDURE__DOWN_STEP = STAIRCASE_PROCEDURE_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Discarded Reversals</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WEIGHTED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS = STAIRCASE_PROCEDURE_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Averaged Reversals</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WEIGHTED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS = STAIRCASE_PROCEDURE_FEATURE_COUNT + 4;

	/**
	 * The number of structural features of the '<em>Weighted Up Down Procedure</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WEIGHTED_UP_DOWN_PROCEDURE_FEATURE_COUNT = STAIRCASE_PROCEDURE_FEATURE_COUNT + 5;

	/**
	 * The operation id for the '<em>Valid Limits</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WEIGHTED_UP_DOWN_PROCEDURE___VALID_LIMITS__DIAGNOSTICCHAIN_MAP = STAIRCASE_PROCEDURE___VALID_LIMITS__DIAGNOSTICCHAIN_MAP;

	/**
	 * The operation id for the '<em>Valid Weighted Steps</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WEIGHTED_UP_DOWN_PROCEDURE___VALID_WEIGHTED_STEPS__DIAGNOSTICCHAIN_MAP = STAIRCASE_PROCEDURE_OPERATION_COUNT + 0;

	/**
	 * The number of operations of the '<em>Weighted Up Down Procedure</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WEIGHTED_UP_DOWN_PROCEDURE_OPERATION_COUNT = STAIRCASE_PROCEDURE_OPERATION_COUNT + 1;

	/**
	 * The meta object id for the '{@link limen.model.impl.PestProcedureImpl <em>Pest Procedure</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.PestProcedureImpl
	 * @see limen.model.impl.LimenPackageImpl#getPestProcedure()
	 * @generated
	 */
	int PEST_PROCEDURE = 18;

	/**
	 * The feature id for the '<em><b>Start Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PEST_PROCEDURE__START_VALUE = STAIRCASE_PROCEDURE__START_VALUE;

	/**
	 * The feature id for the '<em><b>Floor Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PEST_PROCEDURE__FLOOR_VALUE = STAIRCASE_PROCEDURE__FLOOR_VALUE;

	/**
	 * The feature id for the '<em><b>Ceiling Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PEST_PROCEDURE__CEILING_VALUE = STAIRCASE_PROCEDURE__CEILING_VALUE;

	/**
	 * The feature id for the '<em><b>Step Mode</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PEST_PROCEDURE__STEP_MODE = STAIRCASE_PROCEDURE__STEP_MODE;

	/**
	 * The feature id for the '<em><b>Initial Step</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PEST_PROCEDURE__INITIAL_STEP = STAIRCASE_PROCEDURE_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Minimum Step</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PEST_PROCEDURE__MINIMUM_STEP = STAIRCASE_PROCEDURE_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Maximum Step</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PEST_PROCEDURE__MAXIMUM_STEP = STAIRCASE_PROCEDURE_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Wald Deviation</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PEST_PROCEDURE__WALD_DEVIATION = STAIRCASE_PROCEDURE_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Target Probability</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PEST_PROCEDURE__TARGET_PROBABILITY = STAIRCASE_PROCEDURE_FEATURE_COUNT + 4;

	/**
	 * The number of structural features of the '<em>Pest Procedure</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PEST_PROCEDURE_FEATURE_COUNT = STAIRCASE_PROCEDURE_FEATURE_COUNT + 5;

	/**
	 * The operation id for the '<em>Valid Limits</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PEST_PROCEDURE___VALID_LIMITS__DIAGNOSTICCHAIN_MAP = STAIRCASE_PROCEDURE___VALID_LIMITS__DIAGNOSTICCHAIN_MAP;

	/**
	 * The operation id for the '<em>Valid Pest Steps</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PEST_PROCEDURE___VALID_PEST_STEPS__DIAGNOSTICCHAIN_MAP = STAIRCASE_PROCEDURE_OPERATION_COUNT + 0;

	/**
	 * The number of operations of the '<em>Pest Procedure</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PEST_PROCEDURE_OPERATION_COUNT = STAIRCASE_PROCEDURE_OPERATION_COUNT + 1;

	/**
	 * The meta object id for the '{@link limen.model.impl.QuestProcedureImpl <em>Quest Procedure</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.QuestProcedureImpl
	 * @see limen.model.impl.LimenPackageImpl#getQuestProcedure()
	 * @generated
	 */
	int QUEST_PROCEDURE = 19;

	/**
	 * The feature id for the '<em><b>Variant</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QUEST_PROCEDURE__VARIANT = PROCEDURE_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Prior Mean</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QUEST_PROCEDURE__PRIOR_MEAN = PROCEDURE_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Prior Sd</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QUEST_PROCEDURE__PRIOR_SD = PROCEDURE_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Beta</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QUEST_PROCEDURE__BETA = PROCEDURE_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Lapse Rate</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QUEST_PROCEDURE__LAPSE_RATE = PROCEDURE_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Guess Rate</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QUEST_PROCEDURE__GUESS_RATE = PROCEDURE_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Grain</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QUEST_PROCEDURE__GRAIN = PROCEDURE_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>Range</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QUEST_PROCEDURE__RANGE = PROCEDURE_FEATURE_COUNT + 7;

	/**
	 * The feature id for the '<em><b>Placement</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QUEST_PROCEDURE__PLACEMENT = PROCEDURE_FEATURE_COUNT + 8;

	/**
	 * The number of structural features of the '<em>Quest Procedure</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QUEST_PROCEDURE_FEATURE_COUNT = PROCEDURE_FEATURE_COUNT + 9;

	/**
	 * The operation id for the '<em>Valid Quest Settings</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QUEST_PROCEDURE___VALID_QUEST_SETTINGS__DIAGNOSTICCHAIN_MAP = PROCEDURE_OPERATION_COUNT + 0;

	/**
	 * The number of operations of the '<em>Quest Procedure</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QUEST_PROCEDURE_OPERATION_COUNT = PROCEDURE_OPERATION_COUNT + 1;

	/**
	 * The meta object id for the '{@link limen.model.impl.PsiProcedureImpl <em>Psi Procedure</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.PsiProcedureImpl
	 * @see limen.model.impl.LimenPackageImpl#getPsiProcedure()
	 * @generated
	 */
	int PSI_PROCEDURE = 20;

	/**
	 * The feature id for the '<em><b>Family</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PSI_PROCEDURE__FAMILY = PROCEDURE_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Threshold Minimum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PSI_PROCEDURE__THRESHOLD_MINIMUM = PROCEDURE_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Threshold Maximum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PSI_PROCEDURE__THRESHOLD_MAXIMUM = PROCEDURE_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Threshold Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PSI_PROCEDURE__THRESHOLD_COUNT = PROCEDURE_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Slope Minimum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PSI_PROCEDURE__SLOPE_MINIMUM = PROCEDURE_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Slope Maximum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PSI_PROCEDURE__SLOPE_MAXIMUM = PROCEDURE_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Slope Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PSI_PROCEDURE__SLOPE_COUNT = PROCEDURE_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>Stimulus Minimum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PSI_PROCEDURE__STIMULUS_MINIMUM = PROCEDURE_FEATURE_COUNT + 7;

	/**
	 * The feature id for the '<em><b>Stimulus Maximum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PSI_PROCEDURE__STIMULUS_MAXIMUM = PROCEDURE_FEATURE_COUNT + 8;

	/**
	 * The feature id for the '<em><b>Stimulus Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PSI_PROCEDURE__STIMULUS_COUNT = PROCEDURE_FEATURE_COUNT + 9;

	/**
	 * The feature id for the '<em><b>Lapse Mode</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PSI_PROCEDURE__LAPSE_MODE = PROCEDURE_FEATURE_COUNT + 10;

	/**
	 * The feature id for the '<em><b>Lapse Rate</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PSI_PROCEDURE__LAPSE_RATE = PROCEDURE_FEATURE_COUNT + 11;

	/**
	 * The feature id for the '<em><b>Lapse Minimum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PSI_PROCEDURE__LAPSE_MINIMUM = PROCEDURE_FEATURE_COUNT + 12;

	/**
	 * The feature id for the '<em><b>Lapse Maximum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PSI_PROCEDURE__LAPSE_MAXIMUM = PROCEDURE_FEATURE_COUNT + 13;

	/**
	 * The feature id for the '<em><b>Lapse Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PSI_PROCEDURE__LAPSE_COUNT = PROCEDURE_FEATURE_COUNT + 14;

	/**
	 * The feature id for the '<em><b>Guess Rate</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PSI_PROCEDURE__GUESS_RATE = PROCEDURE_FEATURE_COUNT + 15;

	/**
	 * The number of structural features of the '<em>Psi Procedure</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PSI_PROCEDURE_FEATURE_COUNT = PROCEDURE_FEATURE_COUNT + 16;

	/**
	 * The operation id for the '<em>Valid Psi Grids</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PSI_PROCEDURE___VALID_PSI_GRIDS__DIAGNOSTICCHAIN_MAP = PROCEDURE_OPERATION_COUNT + 0;

	/**
	 * The number of operations of the '<em>Psi Procedure</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PSI_PROCEDURE_OPERATION_COUNT = PROCEDURE_OPERATION_COUNT + 1;

	/**
	 * The meta object id for the '{@link limen.model.impl.ConstantStimuliProcedureImpl <em>Constant Stimuli Procedure</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.ConstantStimuliProcedureImpl
	 * @see limen.model.impl.LimenPackageImpl#getConstantStimuliProcedure()
	 * @generated
	 */
	int CONSTANT_STIMULI_PROCEDURE = 21;

	/**
	 * The feature id for the '<em><b>Values</b></em>' attribute list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONSTANT_STIMULI_PROCEDURE__VALUES = PROCEDURE_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Repetitions Per Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONSTANT_STIMULI_PROCEDURE__REPETITIONS_PER_VALUE = PROCEDURE_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Blocked Shuffle</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONSTANT_STIMULI_PROCEDURE__BLOCKED_SHUFFLE = PROCEDURE_FEATURE_COUNT + 2;

	/**
	 * The number of structural features of the '<em>Constant Stimuli Procedure</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONSTANT_STIMULI_PROCEDURE_FEATURE_COUNT = PROCEDURE_FEATURE_COUNT + 3;

	/**
	 * The operation id for the '<em>Valid Constant Stimuli</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONSTANT_STIMULI_PROCEDURE___VALID_CONSTANT_STIMULI__DIAGNOSTICCHAIN_MAP = PROCEDURE_OPERATION_COUNT + 0;

	/**
	 * The number of operations of the '<em>Constant Stimuli Procedure</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONSTANT_STIMULI_PROCEDURE_OPERATION_COUNT = PROCEDURE_OPERATION_COUNT + 1;

	/**
	 * The meta object id for the '{@link limen.model.impl.ContributedProcedureImpl <em>Contributed Procedure</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.ContributedProcedureImpl
	 * @see limen.model.impl.LimenPackageImpl#getContributedProcedure()
	 * @generated
	 */
	int CONTRIBUTED_PROCEDURE = 22;

	/**
	 * The feature id for the '<em><b>Settings</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTRIBUTED_PROCEDURE__SETTINGS = PROCEDURE_FEATURE_COUNT + 0;

	/**
	 * The number of structural features of the '<em>Contributed Procedure</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTRIBUTED_PROCEDURE_FEATURE_COUNT = PROCEDURE_FEATURE_COUNT + 1;

	/**
	 * The number of operations of the '<em>Contributed Procedure</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTRIBUTED_PROCEDURE_OPERATION_COUNT = PROCEDURE_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link limen.model.impl.StoppingRuleImpl <em>Stopping Rule</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.StoppingRuleImpl
	 * @see limen.model.impl.LimenPackageImpl#getStoppingRule()
	 * @generated
	 */
	int STOPPING_RULE = 23;

	/**
	 * The feature id for the '<em><b>Maximum Reversals</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STOPPING_RULE__MAXIMUM_REVERSALS = 0;

	/**
	 * The feature id for the '<em><b>Maximum Trials</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STOPPING_RULE__MAXIMUM_TRIALS = 1;

	/**
	 * The feature id for the '<em><b>Posterior Sd Target</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STOPPING_RULE__POSTERIOR_SD_TARGET = 2;

	/**
	 * The number of structural features of the '<em>Stopping Rule</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STOPPING_RULE_FEATURE_COUNT = 3;

	/**
	 * The operation id for the '<em>Can End</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STOPPING_RULE___CAN_END__DIAGNOSTICCHAIN_MAP = 0;

	/**
	 * The number of operations of the '<em>Stopping Rule</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STOPPING_RULE_OPERATION_COUNT = 1;

	/**
	 * The meta object id for the '{@link limen.model.impl.SettingsGroupImpl <em>Settings Group</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.SettingsGroupImpl
	 * @see limen.model.impl.LimenPackageImpl#getSettingsGroup()
	 * @generated
	 */
	int SETTINGS_GROUP = 24;

	/**
	 * The feature id for the '<em><b>Contributor Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SETTINGS_GROUP__CONTRIBUTOR_ID = 0;

	/**
	 * The feature id for the '<em><b>Entries</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SETTINGS_GROUP__ENTRIES = 1;

	/**
	 * The number of structural features of the '<em>Settings Group</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SETTINGS_GROUP_FEATURE_COUNT = 2;

	/**
	 * The operation id for the '<em>Valid Settings</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SETTINGS_GROUP___VALID_SETTINGS__DIAGNOSTICCHAIN_MAP = 0;

	/**
	 * The number of operations of the '<em>Settings Group</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SETTINGS_GROUP_OPERATION_COUNT = 1;

	/**
	 * The meta object id for the '{@link limen.model.impl.SettingImpl <em>Setting</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.SettingImpl
	 * @see limen.model.impl.LimenPackageImpl#getSetting()
	 * @generated
	 */
	int SETTING = 25;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SETTING__NAME = 0;

	/**
	 * The feature id for the '<em><b>Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SETTING__VALUE = 1;

	/**
	 * The feature id for the '<em><b>Type</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SETTING__TYPE = 2;

	/**
	 * The number of structural features of the '<em>Setting</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SETTING_FEATURE_COUNT = 3;

	/**
	 * The number of operations of the '<em>Setting</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SETTING_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link limen.model.impl.CalibrationImpl <em>Calibration</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.CalibrationImpl
	 * @see limen.model.impl.LimenPackageImpl#getCalibration()
	 * @generated
	 */
	int CALIBRATION = 26;

	/**
	 * The feature id for the '<em><b>Schema Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CALIBRATION__SCHEMA_VERSION = LIMEN_DOCUMENT__SCHEMA_VERSION;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CALIBRATION__NAME = LIMEN_DOCUMENT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Device</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CALIBRATION__DEVICE = LIMEN_DOCUMENT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Transducer</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CALIBRATION__TRANSDUCER = LIMEN_DOCUMENT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Reference Level Dbfs</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CALIBRATION__REFERENCE_LEVEL_DBFS = LIMEN_DOCUMENT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Sample Rate Hz</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CALIBRATION__SAMPLE_RATE_HZ = LIMEN_DOCUMENT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Ceiling Db Spl</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CALIBRATION__CEILING_DB_SPL = LIMEN_DOCUMENT_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Measured By</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CALIBRATION__MEASURED_BY = LIMEN_DOCUMENT_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>Measured On</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CALIBRATION__MEASURED_ON = LIMEN_DOCUMENT_FEATURE_COUNT + 7;

	/**
	 * The feature id for the '<em><b>Demonstration Only</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CALIBRATION__DEMONSTRATION_ONLY = LIMEN_DOCUMENT_FEATURE_COUNT + 8;

	/**
	 * The feature id for the '<em><b>Notes</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CALIBRATION__NOTES = LIMEN_DOCUMENT_FEATURE_COUNT + 9;

	/**
	 * The feature id for the '<em><b>Points</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CALIBRATION__POINTS = LIMEN_DOCUMENT_FEATURE_COUNT + 10;

	/**
	 * The number of structural features of the '<em>Calibration</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CALIBRATION_FEATURE_COUNT = LIMEN_DOCUMENT_FEATURE_COUNT + 11;

	/**
	 * The operation id for the '<em>Valid Calibration</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CALIBRATION___VALID_CALIBRATION__DIAGNOSTICCHAIN_MAP = LIMEN_DOCUMENT_OPERATION_COUNT + 0;

	/**
	 * The number of operations of the '<em>Calibration</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CALIBRATION_OPERATION_COUNT = LIMEN_DOCUMENT_OPERATION_COUNT + 1;

	/**
	 * The meta object id for the '{@link limen.model.impl.CalibrationPointImpl <em>Calibration Point</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.CalibrationPointImpl
	 * @see limen.model.impl.LimenPackageImpl#getCalibrationPoint()
	 * @generated
	 */
	int CALIBRATION_POINT = 27;

	/**
	 * The feature id for the '<em><b>Frequency Hz</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CALIBRATION_POINT__FREQUENCY_HZ = 0;

	/**
	 * The feature id for the '<em><b>Measured Db Spl</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CALIBRATION_POINT__MEASURED_DB_SPL = 1;

	/**
	 * The number of structural features of the '<em>Calibration Point</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CALIBRATION_POINT_FEATURE_COUNT = 2;

	/**
	 * The number of operations of the '<em>Calibration Point</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CALIBRATION_POINT_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link limen.model.impl.SessionHeaderImpl <em>Session Header</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.SessionHeaderImpl
	 * @see limen.model.impl.LimenPackageImpl#getSessionHeader()
	 * @generated
	 */
	int SESSION_HEADER = 28;

	/**
	 * The feature id for the '<em><b>Schema Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SESSION_HEADER__SCHEMA_VERSION = LIMEN_DOCUMENT__SCHEMA_VERSION;

	/**
	 * The feature id for the '<em><b>Participant</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SESSION_HEADER__PARTICIPANT = LIMEN_DOCUMENT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Battery</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SESSION_HEADER__BATTERY = LIMEN_DOCUMENT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Calibration</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SESSION_HEADER__CALIBRATION = LIMEN_DOCUMENT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Device</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SESSION_HEADER__DEVICE = LIMEN_DOCUMENT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Random Seed</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SESSION_HEADER__RANDOM_SEED = LIMEN_DOCUMENT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Software Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SESSION_HEADER__SOFTWARE_VERSION = LIMEN_DOCUMENT_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Start Time</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SESSION_HEADER__START_TIME = LIMEN_DOCUMENT_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>End Time</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SESSION_HEADER__END_TIME = LIMEN_DOCUMENT_FEATURE_COUNT + 7;

	/**
	 * The feature id for the '<em><b>Status</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SESSION_HEADER__STATUS = LIMEN_DOCUMENT_FEATURE_COUNT + 8;

	/**
	 * The feature id for the '<em><b>Latin Square Row</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SESSION_HEADER__LATIN_SQUARE_ROW = LIMEN_DOCUMENT_FEATURE_COUNT + 9;

	/**
	 * The feature id for the '<em><b>Step Order</b></em>' reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SESSION_HEADER__STEP_ORDER = LIMEN_DOCUMENT_FEATURE_COUNT + 10;

	/**
	 * The feature id for the '<em><b>Exposure</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SESSION_HEADER__EXPOSURE = LIMEN_DOCUMENT_FEATURE_COUNT + 11;

	/**
	 * The number of structural features of the '<em>Session Header</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SESSION_HEADER_FEATURE_COUNT = LIMEN_DOCUMENT_FEATURE_COUNT + 12;

	/**
	 * The operation id for the '<em>Valid Session</em>' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SESSION_HEADER___VALID_SESSION__DIAGNOSTICCHAIN_MAP = LIMEN_DOCUMENT_OPERATION_COUNT + 0;

	/**
	 * The number of operations of the '<em>Session Header</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SESSION_HEADER_OPERATION_COUNT = LIMEN_DOCUMENT_OPERATION_COUNT + 1;

	/**
	 * The meta object id for the '{@link limen.model.impl.ExposureEstimateImpl <em>Exposure Estimate</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.impl.ExposureEstimateImpl
	 * @see limen.model.impl.LimenPackageImpl#getExposureEstimate()
	 * @generated
	 */
	int EXPOSURE_ESTIMATE = 29;

	/**
	 * The feature id for the '<em><b>Peak Level Db Spl</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EXPOSURE_ESTIMATE__PEAK_LEVEL_DB_SPL = 0;

	/**
	 * The feature id for the '<em><b>Equivalent Level Db Spl</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EXPOSURE_ESTIMATE__EQUIVALENT_LEVEL_DB_SPL = 1;

	/**
	 * The feature id for the '<em><b>Sound On Seconds</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EXPOSURE_ESTIMATE__SOUND_ON_SECONDS = 2;

	/**
	 * The feature id for the '<em><b>Niosh Dose Percent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EXPOSURE_ESTIMATE__NIOSH_DOSE_PERCENT = 3;

	/**
	 * The feature id for the '<em><b>Osha Dose Percent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EXPOSURE_ESTIMATE__OSHA_DOSE_PERCENT = 4;

	/**
	 * The number of structural features of the '<em>Exposure Estimate</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EXPOSURE_ESTIMATE_FEATURE_COUNT = 5;

	/**
	 * The number of operations of the '<em>Exposure Estimate</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EXPOSURE_ESTIMATE_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link limen.model.EarlyResponsePolicy <em>Early Response Policy</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.EarlyResponsePolicy
	 * @see limen.model.impl.LimenPackageImpl#getEarlyResponsePolicy()
	 * @generated
	 */
	int EARLY_RESPONSE_POLICY = 30;

	/**
	 * The meta object id for the '{@link limen.model.OrderingPolicy <em>Ordering Policy</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.OrderingPolicy
	 * @see limen.model.impl.LimenPackageImpl#getOrderingPolicy()
	 * @generated
	 */
	int ORDERING_POLICY = 31;

	/**
	 * The meta object id for the '{@link limen.model.StimulusKind <em>Stimulus Kind</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.StimulusKind
	 * @see limen.model.impl.LimenPackageImpl#getStimulusKind()
	 * @generated
	 */
	int STIMULUS_KIND = 32;

	/**
	 * The meta object id for the '{@link limen.model.Ear <em>Ear</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.Ear
	 * @see limen.model.impl.LimenPackageImpl#getEar()
	 * @generated
	 */
	int EAR = 33;

	/**
	 * The meta object id for the '{@link limen.model.QuantityUnit <em>Quantity Unit</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.QuantityUnit
	 * @see limen.model.impl.LimenPackageImpl#getQuantityUnit()
	 * @generated
	 */
	int QUANTITY_UNIT = 34;

	/**
	 * The meta object id for the '{@link limen.model.Scale <em>Scale</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.Scale
	 * @see limen.model.impl.LimenPackageImpl#getScale()
	 * @generated
	 */
	int SCALE = 35;

	/**
	 * The meta object id for the '{@link limen.model.StepMode <em>Step Mode</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.StepMode
	 * @see limen.model.impl.LimenPackageImpl#getStepMode()
	 * @generated
	 */
	int STEP_MODE = 36;

	/**
	 * The meta object id for the '{@link limen.model.BayesianVariant <em>Bayesian Variant</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.BayesianVariant
	 * @see limen.model.impl.LimenPackageImpl#getBayesianVariant()
	 * @generated
	 */
	int BAYESIAN_VARIANT = 37;

	/**
	 * The meta object id for the '{@link limen.model.EstimatePlacement <em>Estimate Placement</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.EstimatePlacement
	 * @see limen.model.impl.LimenPackageImpl#getEstimatePlacement()
	 * @generated
	 */
	int ESTIMATE_PLACEMENT = 38;

	/**
	 * The meta object id for the '{@link limen.model.LapseMode <em>Lapse Mode</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.LapseMode
	 * @see limen.model.impl.LimenPackageImpl#getLapseMode()
	 * @generated
	 */
	int LAPSE_MODE = 39;

	/**
	 * The meta object id for the '{@link limen.model.PsychometricFamily <em>Psychometric Family</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.PsychometricFamily
	 * @see limen.model.impl.LimenPackageImpl#getPsychometricFamily()
	 * @generated
	 */
	int PSYCHOMETRIC_FAMILY = 40;

	/**
	 * The meta object id for the '{@link limen.model.NoiseSpectrum <em>Noise Spectrum</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.NoiseSpectrum
	 * @see limen.model.impl.LimenPackageImpl#getNoiseSpectrum()
	 * @generated
	 */
	int NOISE_SPECTRUM = 41;

	/**
	 * The meta object id for the '{@link limen.model.SettingType <em>Setting Type</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.SettingType
	 * @see limen.model.impl.LimenPackageImpl#getSettingType()
	 * @generated
	 */
	int SETTING_TYPE = 42;

	/**
	 * The meta object id for the '{@link limen.model.SessionStatus <em>Session Status</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see limen.model.SessionStatus
	 * @see limen.model.impl.LimenPackageImpl#getSessionStatus()
	 * @generated
	 */
	int SESSION_STATUS = 43;

	/**
	 * The meta object id for the '<em>Instant</em>' data type.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see java.time.Instant
	 * @see limen.model.impl.LimenPackageImpl#getInstant()
	 * @generated
	 */
	int INSTANT = 44;

	/**
	 * The meta object id for the '<em>Local Date</em>' data type.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see java.time.LocalDate
	 * @see limen.model.impl.LimenPackageImpl#getLocalDate()
	 * @generated
	 */
	int LOCAL_DATE = 45;


	/**
	 * Returns the meta object for class '{@link limen.model.LimenDocument <em>Document</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Document</em>'.
	 * @see limen.model.LimenDocument
	 * @generated
	 */
	EClass getLimenDocument();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.LimenDocument#getSchemaVersion <em>Schema Version</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Schema Version</em>'.
	 * @see limen.model.LimenDocument#getSchemaVersion()
	 * @see #getLimenDocument()
	 * @generated
	 */
	EAttribute getLimenDocument_SchemaVersion();

	/**
	 * Returns the meta object for class '{@link limen.model.Battery <em>Battery</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Battery</em>'.
	 * @see limen.model.Battery
	 * @generated
	 */
	EClass getBattery();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Battery#getTitle <em>Title</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Title</em>'.
	 * @see limen.model.Battery#getTitle()
	 * @see #getBattery()
	 * @generated
	 */
	EAttribute getBattery_Title();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Battery#getNotes <em>Notes</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Notes</em>'.
	 * @see limen.model.Battery#getNotes()
	 * @see #getBattery()
	 * @generated
	 */
	EAttribute getBattery_Notes();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Battery#getCalibrationFile <em>Calibration File</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Calibration File</em>'.
	 * @see limen.model.Battery#getCalibrationFile()
	 * @see #getBattery()
	 * @generated
	 */
	EAttribute getBattery_CalibrationFile();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Battery#getOrdering <em>Ordering</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Ordering</em>'.
	 * @see limen.model.Battery#getOrdering()
	 * @see #getBattery()
	 * @generated
	 */
	EAttribute getBattery_Ordering();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Battery#getShuffleSeed <em>Shuffle Seed</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Shuffle Seed</em>'.
	 * @see limen.model.Battery#getShuffleSeed()
	 * @see #getBattery()
	 * @generated
	 */
	EAttribute getBattery_ShuffleSeed();

	/**
	 * Returns the meta object for the containment reference list '{@link limen.model.Battery#getSteps <em>Steps</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Steps</em>'.
	 * @see limen.model.Battery#getSteps()
	 * @see #getBattery()
	 * @generated
	 */
	EReference getBattery_Steps();

	/**
	 * Returns the meta object for the containment reference list '{@link limen.model.Battery#getBreaks <em>Breaks</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Breaks</em>'.
	 * @see limen.model.Battery#getBreaks()
	 * @see #getBattery()
	 * @generated
	 */
	EReference getBattery_Breaks();

	/**
	 * Returns the meta object for the '{@link limen.model.Battery#uniqueStepIds(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Unique Step Ids</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Unique Step Ids</em>' operation.
	 * @see limen.model.Battery#uniqueStepIds(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getBattery__UniqueStepIds__DiagnosticChain_Map();

	/**
	 * Returns the meta object for the '{@link limen.model.Battery#validOrdering(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Valid Ordering</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Valid Ordering</em>' operation.
	 * @see limen.model.Battery#validOrdering(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getBattery__ValidOrdering__DiagnosticChain_Map();

	/**
	 * Returns the meta object for the '{@link limen.model.Battery#validBreaks(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Valid Breaks</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Valid Breaks</em>' operation.
	 * @see limen.model.Battery#validBreaks(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getBattery__ValidBreaks__DiagnosticChain_Map();

	/**
	 * Returns the meta object for the '{@link limen.model.Battery#noReferenceCycles(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>No Reference Cycles</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>No Reference Cycles</em>' operation.
	 * @see limen.model.Battery#noReferenceCycles(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getBattery__NoReferenceCycles__DiagnosticChain_Map();

	/**
	 * Returns the meta object for class '{@link limen.model.Break <em>Break</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Break</em>'.
	 * @see limen.model.Break
	 * @generated
	 */
	EClass getBreak();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Break#getAfterStepCount <em>After Step Count</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>After Step Count</em>'.
	 * @see limen.model.Break#getAfterStepCount()
	 * @see #getBreak()
	 * @generated
	 */
	EAttribute getBreak_AfterStepCount();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Break#getMinimumDurationSeconds <em>Minimum Duration Seconds</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Minimum Duration Seconds</em>'.
	 * @see limen.model.Break#getMinimumDurationSeconds()
	 * @see #getBreak()
	 * @generated
	 */
	EAttribute getBreak_MinimumDurationSeconds();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Break#getMessage <em>Message</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Message</em>'.
	 * @see limen.model.Break#getMessage()
	 * @see #getBreak()
	 * @generated
	 */
	EAttribute getBreak_Message();

	/**
	 * Returns the meta object for class '{@link limen.model.Step <em>Step</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Step</em>'.
	 * @see limen.model.Step
	 * @generated
	 */
	EClass getStep();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Step#getId <em>Id</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Id</em>'.
	 * @see limen.model.Step#getId()
	 * @see #getStep()
	 * @generated
	 */
	EAttribute getStep_Id();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Step#getTitle <em>Title</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Title</em>'.
	 * @see limen.model.Step#getTitle()
	 * @see #getStep()
	 * @generated
	 */
	EAttribute getStep_Title();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Step#getNotes <em>Notes</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Notes</em>'.
	 * @see limen.model.Step#getNotes()
	 * @see #getStep()
	 * @generated
	 */
	EAttribute getStep_Notes();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Step#isFixedPosition <em>Fixed Position</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Fixed Position</em>'.
	 * @see limen.model.Step#isFixedPosition()
	 * @see #getStep()
	 * @generated
	 */
	EAttribute getStep_FixedPosition();

	/**
	 * Returns the meta object for the containment reference '{@link limen.model.Step#getTask <em>Task</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Task</em>'.
	 * @see limen.model.Step#getTask()
	 * @see #getStep()
	 * @generated
	 */
	EReference getStep_Task();

	/**
	 * Returns the meta object for the containment reference '{@link limen.model.Step#getStimulus <em>Stimulus</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Stimulus</em>'.
	 * @see limen.model.Step#getStimulus()
	 * @see #getStep()
	 * @generated
	 */
	EReference getStep_Stimulus();

	/**
	 * Returns the meta object for the containment reference '{@link limen.model.Step#getVariedQuantity <em>Varied Quantity</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Varied Quantity</em>'.
	 * @see limen.model.Step#getVariedQuantity()
	 * @see #getStep()
	 * @generated
	 */
	EReference getStep_VariedQuantity();

	/**
	 * Returns the meta object for the containment reference list '{@link limen.model.Step#getTracks <em>Tracks</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Tracks</em>'.
	 * @see limen.model.Step#getTracks()
	 * @see #getStep()
	 * @generated
	 */
	EReference getStep_Tracks();

	/**
	 * Returns the meta object for the '{@link limen.model.Step#consistentQuantity(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Consistent Quantity</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Consistent Quantity</em>' operation.
	 * @see limen.model.Step#consistentQuantity(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getStep__ConsistentQuantity__DiagnosticChain_Map();

	/**
	 * Returns the meta object for the '{@link limen.model.Step#levelsWithinCeiling(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Levels Within Ceiling</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Levels Within Ceiling</em>' operation.
	 * @see limen.model.Step#levelsWithinCeiling(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getStep__LevelsWithinCeiling__DiagnosticChain_Map();

	/**
	 * Returns the meta object for the '{@link limen.model.Step#frequenciesWithinRange(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Frequencies Within Range</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Frequencies Within Range</em>' operation.
	 * @see limen.model.Step#frequenciesWithinRange(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getStep__FrequenciesWithinRange__DiagnosticChain_Map();

	/**
	 * Returns the meta object for class '{@link limen.model.Task <em>Task</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Task</em>'.
	 * @see limen.model.Task
	 * @generated
	 */
	EClass getTask();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Task#getIntervalDurationSeconds <em>Interval Duration Seconds</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Interval Duration Seconds</em>'.
	 * @see limen.model.Task#getIntervalDurationSeconds()
	 * @see #getTask()
	 * @generated
	 */
	EAttribute getTask_IntervalDurationSeconds();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Task#getResponseWindowSeconds <em>Response Window Seconds</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Response Window Seconds</em>'.
	 * @see limen.model.Task#getResponseWindowSeconds()
	 * @see #getTask()
	 * @generated
	 */
	EAttribute getTask_ResponseWindowSeconds();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Task#getInterTrialIntervalSeconds <em>Inter Trial Interval Seconds</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Inter Trial Interval Seconds</em>'.
	 * @see limen.model.Task#getInterTrialIntervalSeconds()
	 * @see #getTask()
	 * @generated
	 */
	EAttribute getTask_InterTrialIntervalSeconds();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Task#isFeedback <em>Feedback</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Feedback</em>'.
	 * @see limen.model.Task#isFeedback()
	 * @see #getTask()
	 * @generated
	 */
	EAttribute getTask_Feedback();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Task#getEarlyResponses <em>Early Responses</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Early Responses</em>'.
	 * @see limen.model.Task#getEarlyResponses()
	 * @see #getTask()
	 * @generated
	 */
	EAttribute getTask_EarlyResponses();

	/**
	 * Returns the meta object for the '{@link limen.model.Task#validTiming(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Valid Timing</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Valid Timing</em>' operation.
	 * @see limen.model.Task#validTiming(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getTask__ValidTiming__DiagnosticChain_Map();

	/**
	 * Returns the meta object for class '{@link limen.model.ForcedChoiceTask <em>Forced Choice Task</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Forced Choice Task</em>'.
	 * @see limen.model.ForcedChoiceTask
	 * @generated
	 */
	EClass getForcedChoiceTask();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.ForcedChoiceTask#getIntervalCount <em>Interval Count</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Interval Count</em>'.
	 * @see limen.model.ForcedChoiceTask#getIntervalCount()
	 * @see #getForcedChoiceTask()
	 * @generated
	 */
	EAttribute getForcedChoiceTask_IntervalCount();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.ForcedChoiceTask#getInterStimulusIntervalSeconds <em>Inter Stimulus Interval Seconds</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Inter Stimulus Interval Seconds</em>'.
	 * @see limen.model.ForcedChoiceTask#getInterStimulusIntervalSeconds()
	 * @see #getForcedChoiceTask()
	 * @generated
	 */
	EAttribute getForcedChoiceTask_InterStimulusIntervalSeconds();

	/**
	 * Returns the meta object for the '{@link limen.model.ForcedChoiceTask#validIntervals(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Valid Intervals</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Valid Intervals</em>' operation.
	 * @see limen.model.ForcedChoiceTask#validIntervals(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getForcedChoiceTask__ValidIntervals__DiagnosticChain_Map();

	/**
	 * Returns the meta object for class '{@link limen.model.YesNoTask <em>Yes No Task</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Yes No Task</em>'.
	 * @see limen.model.YesNoTask
	 * @generated
	 */
	EClass getYesNoTask();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.YesNoTask#getCatchTrialRate <em>Catch Trial Rate</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Catch Trial Rate</em>'.
	 * @see limen.model.YesNoTask#getCatchTrialRate()
	 * @see #getYesNoTask()
	 * @generated
	 */
	EAttribute getYesNoTask_CatchTrialRate();

	/**
	 * Returns the meta object for the '{@link limen.model.YesNoTask#validCatchTrials(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Valid Catch Trials</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Valid Catch Trials</em>' operation.
	 * @see limen.model.YesNoTask#validCatchTrials(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getYesNoTask__ValidCatchTrials__DiagnosticChain_Map();

	/**
	 * Returns the meta object for class '{@link limen.model.Stimulus <em>Stimulus</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Stimulus</em>'.
	 * @see limen.model.Stimulus
	 * @generated
	 */
	EClass getStimulus();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Stimulus#getKind <em>Kind</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Kind</em>'.
	 * @see limen.model.Stimulus#getKind()
	 * @see #getStimulus()
	 * @generated
	 */
	EAttribute getStimulus_Kind();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Stimulus#getStandardFrequencyHz <em>Standard Frequency Hz</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Standard Frequency Hz</em>'.
	 * @see limen.model.Stimulus#getStandardFrequencyHz()
	 * @see #getStimulus()
	 * @generated
	 */
	EAttribute getStimulus_StandardFrequencyHz();

	/**
	 * Returns the meta object for the containment reference '{@link limen.model.Stimulus#getStandardLevel <em>Standard Level</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Standard Level</em>'.
	 * @see limen.model.Stimulus#getStandardLevel()
	 * @see #getStimulus()
	 * @generated
	 */
	EReference getStimulus_StandardLevel();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Stimulus#getRampDurationSeconds <em>Ramp Duration Seconds</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Ramp Duration Seconds</em>'.
	 * @see limen.model.Stimulus#getRampDurationSeconds()
	 * @see #getStimulus()
	 * @generated
	 */
	EAttribute getStimulus_RampDurationSeconds();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Stimulus#getEar <em>Ear</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Ear</em>'.
	 * @see limen.model.Stimulus#getEar()
	 * @see #getStimulus()
	 * @generated
	 */
	EAttribute getStimulus_Ear();

	/**
	 * Returns the meta object for the containment reference '{@link limen.model.Stimulus#getMasker <em>Masker</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Masker</em>'.
	 * @see limen.model.Stimulus#getMasker()
	 * @see #getStimulus()
	 * @generated
	 */
	EReference getStimulus_Masker();

	/**
	 * Returns the meta object for the containment reference list '{@link limen.model.Stimulus#getContributions <em>Contributions</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Contributions</em>'.
	 * @see limen.model.Stimulus#getContributions()
	 * @see #getStimulus()
	 * @generated
	 */
	EReference getStimulus_Contributions();

	/**
	 * Returns the meta object for the '{@link limen.model.Stimulus#validTone(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Valid Tone</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Valid Tone</em>' operation.
	 * @see limen.model.Stimulus#validTone(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getStimulus__ValidTone__DiagnosticChain_Map();

	/**
	 * Returns the meta object for the '{@link limen.model.Stimulus#validStandardLevel(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Valid Standard Level</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Valid Standard Level</em>' operation.
	 * @see limen.model.Stimulus#validStandardLevel(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getStimulus__ValidStandardLevel__DiagnosticChain_Map();

	/**
	 * Returns the meta object for the '{@link limen.model.Stimulus#validMasker(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Valid Masker</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Valid Masker</em>' operation.
	 * @see limen.model.Stimulus#validMasker(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getStimulus__ValidMasker__DiagnosticChain_Map();

	/**
	 * Returns the meta object for class '{@link limen.model.Level <em>Level</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Level</em>'.
	 * @see limen.model.Level
	 * @generated
	 */
	EClass getLevel();

	/**
	 * Returns the meta object for class '{@link limen.model.AbsoluteLevel <em>Absolute Level</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Absolute Level</em>'.
	 * @see limen.model.AbsoluteLevel
	 * @generated
	 */
	EClass getAbsoluteLevel();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.AbsoluteLevel#getLevelDbSpl <em>Level Db Spl</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Level Db Spl</em>'.
	 * @see limen.model.AbsoluteLevel#getLevelDbSpl()
	 * @see #getAbsoluteLevel()
	 * @generated
	 */
	EAttribute getAbsoluteLevel_LevelDbSpl();

	/**
	 * Returns the meta object for class '{@link limen.model.RelativeLevel <em>Relative Level</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Relative Level</em>'.
	 * @see limen.model.RelativeLevel
	 * @generated
	 */
	EClass getRelativeLevel();

	/**
	 * Returns the meta object for the reference '{@link limen.model.RelativeLevel#getReference <em>Reference</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Reference</em>'.
	 * @see limen.model.RelativeLevel#getReference()
	 * @see #getRelativeLevel()
	 * @generated
	 */
	EReference getRelativeLevel_Reference();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.RelativeLevel#getOffsetDb <em>Offset Db</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Offset Db</em>'.
	 * @see limen.model.RelativeLevel#getOffsetDb()
	 * @see #getRelativeLevel()
	 * @generated
	 */
	EAttribute getRelativeLevel_OffsetDb();

	/**
	 * Returns the meta object for the '{@link limen.model.RelativeLevel#validReference(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Valid Reference</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Valid Reference</em>' operation.
	 * @see limen.model.RelativeLevel#validReference(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getRelativeLevel__ValidReference__DiagnosticChain_Map();

	/**
	 * Returns the meta object for class '{@link limen.model.MaskerNoise <em>Masker Noise</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Masker Noise</em>'.
	 * @see limen.model.MaskerNoise
	 * @generated
	 */
	EClass getMaskerNoise();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.MaskerNoise#getSpectrum <em>Spectrum</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Spectrum</em>'.
	 * @see limen.model.MaskerNoise#getSpectrum()
	 * @see #getMaskerNoise()
	 * @generated
	 */
	EAttribute getMaskerNoise_Spectrum();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.MaskerNoise#getLowCutoffHz <em>Low Cutoff Hz</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Low Cutoff Hz</em>'.
	 * @see limen.model.MaskerNoise#getLowCutoffHz()
	 * @see #getMaskerNoise()
	 * @generated
	 */
	EAttribute getMaskerNoise_LowCutoffHz();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.MaskerNoise#getHighCutoffHz <em>High Cutoff Hz</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>High Cutoff Hz</em>'.
	 * @see limen.model.MaskerNoise#getHighCutoffHz()
	 * @see #getMaskerNoise()
	 * @generated
	 */
	EAttribute getMaskerNoise_HighCutoffHz();

	/**
	 * Returns the meta object for the containment reference '{@link limen.model.MaskerNoise#getLevel <em>Level</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Level</em>'.
	 * @see limen.model.MaskerNoise#getLevel()
	 * @see #getMaskerNoise()
	 * @generated
	 */
	EReference getMaskerNoise_Level();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.MaskerNoise#isContinuous <em>Continuous</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Continuous</em>'.
	 * @see limen.model.MaskerNoise#isContinuous()
	 * @see #getMaskerNoise()
	 * @generated
	 */
	EAttribute getMaskerNoise_Continuous();

	/**
	 * Returns the meta object for class '{@link limen.model.VariedQuantity <em>Varied Quantity</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Varied Quantity</em>'.
	 * @see limen.model.VariedQuantity
	 * @generated
	 */
	EClass getVariedQuantity();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.VariedQuantity#getUnit <em>Unit</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Unit</em>'.
	 * @see limen.model.VariedQuantity#getUnit()
	 * @see #getVariedQuantity()
	 * @generated
	 */
	EAttribute getVariedQuantity_Unit();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.VariedQuantity#getScale <em>Scale</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Scale</em>'.
	 * @see limen.model.VariedQuantity#getScale()
	 * @see #getVariedQuantity()
	 * @generated
	 */
	EAttribute getVariedQuantity_Scale();

	/**
	 * Returns the meta object for class '{@link limen.model.Track <em>Track</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Track</em>'.
	 * @see limen.model.Track
	 * @generated
	 */
	EClass getTrack();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Track#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see limen.model.Track#getName()
	 * @see #getTrack()
	 * @generated
	 */
	EAttribute getTrack_Name();

	/**
	 * Returns the meta object for the containment reference '{@link limen.model.Track#getProcedure <em>Procedure</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Procedure</em>'.
	 * @see limen.model.Track#getProcedure()
	 * @see #getTrack()
	 * @generated
	 */
	EReference getTrack_Procedure();

	/**
	 * Returns the meta object for the containment reference '{@link limen.model.Track#getStoppingRule <em>Stopping Rule</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Stopping Rule</em>'.
	 * @see limen.model.Track#getStoppingRule()
	 * @see #getTrack()
	 * @generated
	 */
	EReference getTrack_StoppingRule();

	/**
	 * Returns the meta object for class '{@link limen.model.Procedure <em>Procedure</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Procedure</em>'.
	 * @see limen.model.Procedure
	 * @generated
	 */
	EClass getProcedure();

	/**
	 * Returns the meta object for class '{@link limen.model.StaircaseProcedure <em>Staircase Procedure</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Staircase Procedure</em>'.
	 * @see limen.model.StaircaseProcedure
	 * @generated
	 */
	EClass getStaircaseProcedure();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.StaircaseProcedure#getStartValue <em>Start Value</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Start Value</em>'.
	 * @see limen.model.StaircaseProcedure#getStartValue()
	 * @see #getStaircaseProcedure()
	 * @generated
	 */
	EAttribute getStaircaseProcedure_StartValue();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.StaircaseProcedure#getFloorValue <em>Floor Value</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Floor Value</em>'.
	 * @see limen.model.StaircaseProcedure#getFloorValue()
	 * @see #getStaircaseProcedure()
	 * @generated
	 */
	EAttribute getStaircaseProcedure_FloorValue();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.StaircaseProcedure#getCeilingValue <em>Ceiling Value</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Ceiling Value</em>'.
	 * @see limen.model.StaircaseProcedure#getCeilingValue()
	 * @see #getStaircaseProcedure()
	 * @generated
	 */
	EAttribute getStaircaseProcedure_CeilingValue();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.StaircaseProcedure#getStepMode <em>Step Mode</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Step Mode</em>'.
	 * @see limen.model.StaircaseProcedure#getStepMode()
	 * @see #getStaircaseProcedure()
	 * @generated
	 */
	EAttribute getStaircaseProcedure_StepMode();

	/**
	 * Returns the meta object for the '{@link limen.model.StaircaseProcedure#validLimits(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Valid Limits</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Valid Limits</em>' operation.
	 * @see limen.model.StaircaseProcedure#validLimits(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getStaircaseProcedure__ValidLimits__DiagnosticChain_Map();

	/**
	 * Returns the meta object for class '{@link limen.model.TransformedUpDownProcedure <em>Transformed Up Down Procedure</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Transformed Up Down Procedure</em>'.
	 * @see limen.model.TransformedUpDownProcedure
	 * @generated
	 */
	EClass getTransformedUpDownProcedure();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.TransformedUpDownProcedure#getDownCount <em>Down Count</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Down Count</em>'.
	 * @see limen.model.TransformedUpDownProcedure#getDownCount()
	 * @see #getTransformedUpDownProcedure()
	 * @generated
	 */
	EAttribute getTransformedUpDownProcedure_DownCount();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.TransformedUpDownProcedure#getUpCount <em>Up Count</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Up Count</em>'.
	 * @see limen.model.TransformedUpDownProcedure#getUpCount()
	 * @see #getTransformedUpDownProcedure()
	 * @generated
	 */
	EAttribute getTransformedUpDownProcedure_UpCount();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.TransformedUpDownProcedure#getInitialStep <em>Initial Step</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Initial Step</em>'.
	 * @see limen.model.TransformedUpDownProcedure#getInitialStep()
	 * @see #getTransformedUpDownProcedure()
	 * @generated
	 */
	EAttribute getTransformedUpDownProcedure_InitialStep();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.TransformedUpDownProcedure#getMinimumStep <em>Minimum Step</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Minimum Step</em>'.
	 * @see limen.model.TransformedUpDownProcedure#getMinimumStep()
	 * @see #getTransformedUpDownProcedure()
	 * @generated
	 */
	EAttribute getTransformedUpDownProcedure_MinimumStep();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.TransformedUpDownProcedure#getShrinkFactor <em>Shrink Factor</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Shrink Factor</em>'.
	 * @see limen.model.TransformedUpDownProcedure#getShrinkFactor()
	 * @see #getTransformedUpDownProcedure()
	 * @generated
	 */
	EAttribute getTransformedUpDownProcedure_ShrinkFactor();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.TransformedUpDownProcedure#getReversalsPerShrink <em>Reversals Per Shrink</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Reversals Per Shrink</em>'.
	 * @see limen.model.TransformedUpDownProcedure#getReversalsPerShrink()
	 * @see #getTransformedUpDownProcedure()
	 * @generated
	 */
	EAttribute getTransformedUpDownProcedure_ReversalsPerShrink();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.TransformedUpDownProcedure#getDiscardedReversals <em>Discarded Reversals</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Discarded Reversals</em>'.
	 * @see limen.model.TransformedUpDownProcedure#getDiscardedReversals()
	 * @see #getTransformedUpDownProcedure()
	 * @generated
	 */
	EAttribute getTransformedUpDownProcedure_DiscardedReversals();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.TransformedUpDownProcedure#getAveragedReversals <em>Averaged Reversals</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Averaged Reversals</em>'.
	 * @see limen.model.TransformedUpDownProcedure#getAveragedReversals()
	 * @see #getTransformedUpDownProcedure()
	 * @generated
	 */
	EAttribute getTransformedUpDownProcedure_AveragedReversals();

	/**
	 * Returns the meta object for the '{@link limen.model.TransformedUpDownProcedure#validUpDownRule(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Valid Up Down Rule</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Valid Up Down Rule</em>' operation.
	 * @see limen.model.TransformedUpDownProcedure#validUpDownRule(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getTransformedUpDownProcedure__ValidUpDownRule__DiagnosticChain_Map();

	/**
	 * Returns the meta object for class '{@link limen.model.WeightedUpDownProcedure <em>Weighted Up Down Procedure</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Weighted Up Down Procedure</em>'.
	 * @see limen.model.WeightedUpDownProcedure
	 * @generated
	 */
	EClass getWeightedUpDownProcedure();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.WeightedUpDownProcedure#getTargetProbability <em>Target Probability</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Target Probability</em>'.
	 * @see limen.model.WeightedUpDownProcedure#getTargetProbability()
	 * @see #getWeightedUpDownProcedure()
	 * @generated
	 */
	EAttribute getWeightedUpDownProcedure_TargetProbability();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.WeightedUpDownProcedure#getUpStep <em>Up Step</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Up Step</em>'.
	 * @see limen.model.WeightedUpDownProcedure#getUpStep()
	 * @see #getWeightedUpDownProcedure()
	 * @generated
	 */
	EAttribute getWeightedUpDownProcedure_UpStep();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.WeightedUpDownProcedure#getDownStep <em>Down Step</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Down Step</em>'.
	 * @see limen.model.WeightedUpDownProcedure#getDownStep()
	 * @see #getWeightedUpDownProcedure()
	 * @generated
	 */
	EAttribute getWeightedUpDownProcedure_DownStep();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.WeightedUpDownProcedure#getDiscardedReversals <em>Discarded Reversals</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Discarded Reversals</em>'.
	 * @see limen.model.WeightedUpDownProcedure#getDiscardedReversals()
	 * @see #getWeightedUpDownProcedure()
	 * @generated
	 */
	EAttribute getWeightedUpDownProcedure_DiscardedReversals();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.WeightedUpDownProcedure#getAveragedReversals <em>Averaged Reversals</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Averaged Reversals</em>'.
	 * @see limen.model.WeightedUpDownProcedure#getAveragedReversals()
	 * @see #getWeightedUpDownProcedure()
	 * @generated
	 */
	EAttribute getWeightedUpDownProcedure_AveragedReversals();

	/**
	 * Returns the meta object for the '{@link limen.model.WeightedUpDownProcedure#validWeightedSteps(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Valid Weighted Steps</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Valid Weighted Steps</em>' operation.
	 * @see limen.model.WeightedUpDownProcedure#validWeightedSteps(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getWeightedUpDownProcedure__ValidWeightedSteps__DiagnosticChain_Map();

	/**
	 * Returns the meta object for class '{@link limen.model.PestProcedure <em>Pest Procedure</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Pest Procedure</em>'.
	 * @see limen.model.PestProcedure
	 * @generated
	 */
	EClass getPestProcedure();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.PestProcedure#getInitialStep <em>Initial Step</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Initial Step</em>'.
	 * @see limen.model.PestProcedure#getInitialStep()
	 * @see #getPestProcedure()
	 * @generated
	 */
	EAttribute getPestProcedure_InitialStep();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.PestProcedure#getMinimumStep <em>Minimum Step</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Minimum Step</em>'.
	 * @see limen.model.PestProcedure#getMinimumStep()
	 * @see #getPestProcedure()
	 * @generated
	 */
	EAttribute getPestProcedure_MinimumStep();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.PestProcedure#getMaximumStep <em>Maximum Step</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Maximum Step</em>'.
	 * @see limen.model.PestProcedure#getMaximumStep()
	 * @see #getPestProcedure()
	 * @generated
	 */
	EAttribute getPestProcedure_MaximumStep();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.PestProcedure#getWaldDeviation <em>Wald Deviation</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Wald Deviation</em>'.
	 * @see limen.model.PestProcedure#getWaldDeviation()
	 * @see #getPestProcedure()
	 * @generated
	 */
	EAttribute getPestProcedure_WaldDeviation();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.PestProcedure#getTargetProbability <em>Target Probability</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Target Probability</em>'.
	 * @see limen.model.PestProcedure#getTargetProbability()
	 * @see #getPestProcedure()
	 * @generated
	 */
	EAttribute getPestProcedure_TargetProbability();

	/**
	 * Returns the meta object for the '{@link limen.model.PestProcedure#validPestSteps(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Valid Pest Steps</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Valid Pest Steps</em>' operation.
	 * @see limen.model.PestProcedure#validPestSteps(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getPestProcedure__ValidPestSteps__DiagnosticChain_Map();

	/**
	 * Returns the meta object for class '{@link limen.model.QuestProcedure <em>Quest Procedure</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Quest Procedure</em>'.
	 * @see limen.model.QuestProcedure
	 * @generated
	 */
	EClass getQuestProcedure();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.QuestProcedure#getVariant <em>Variant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Variant</em>'.
	 * @see limen.model.QuestProcedure#getVariant()
	 * @see #getQuestProcedure()
	 * @generated
	 */
	EAttribute getQuestProcedure_Variant();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.QuestProcedure#getPriorMean <em>Prior Mean</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Prior Mean</em>'.
	 * @see limen.model.QuestProcedure#getPriorMean()
	 * @see #getQuestProcedure()
	 * @generated
	 */
	EAttribute getQuestProcedure_PriorMean();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.QuestProcedure#getPriorSd <em>Prior Sd</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Prior Sd</em>'.
	 * @see limen.model.QuestProcedure#getPriorSd()
	 * @see #getQuestProcedure()
	 * @generated
	 */
	EAttribute getQuestProcedure_PriorSd();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.QuestProcedure#getBeta <em>Beta</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Beta</em>'.
	 * @see limen.model.QuestProcedure#getBeta()
	 * @see #getQuestProcedure()
	 * @generated
	 */
	EAttribute getQuestProcedure_Beta();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.QuestProcedure#getLapseRate <em>Lapse Rate</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Lapse Rate</em>'.
	 * @see limen.model.QuestProcedure#getLapseRate()
	 * @see #getQuestProcedure()
	 * @generated
	 */
	EAttribute getQuestProcedure_LapseRate();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.QuestProcedure#getGuessRate <em>Guess Rate</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Guess Rate</em>'.
	 * @see limen.model.QuestProcedure#getGuessRate()
	 * @see #getQuestProcedure()
	 * @generated
	 */
	EAttribute getQuestProcedure_GuessRate();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.QuestProcedure#getGrain <em>Grain</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Grain</em>'.
	 * @see limen.model.QuestProcedure#getGrain()
	 * @see #getQuestProcedure()
	 * @generated
	 */
	EAttribute getQuestProcedure_Grain();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.QuestProcedure#getRange <em>Range</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Range</em>'.
	 * @see limen.model.QuestProcedure#getRange()
	 * @see #getQuestProcedure()
	 * @generated
	 */
	EAttribute getQuestProcedure_Range();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.QuestProcedure#getPlacement <em>Placement</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Placement</em>'.
	 * @see limen.model.QuestProcedure#getPlacement()
	 * @see #getQuestProcedure()
	 * @generated
	 */
	EAttribute getQuestProcedure_Placement();

	/**
	 * Returns the meta object for the '{@link limen.model.QuestProcedure#validQuestSettings(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Valid Quest Settings</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Valid Quest Settings</em>' operation.
	 * @see limen.model.QuestProcedure#validQuestSettings(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getQuestProcedure__ValidQuestSettings__DiagnosticChain_Map();

	/**
	 * Returns the meta object for class '{@link limen.model.PsiProcedure <em>Psi Procedure</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Psi Procedure</em>'.
	 * @see limen.model.PsiProcedure
	 * @generated
	 */
	EClass getPsiProcedure();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.PsiProcedure#getFamily <em>Family</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Family</em>'.
	 * @see limen.model.PsiProcedure#getFamily()
	 * @see #getPsiProcedure()
	 * @generated
	 */
	EAttribute getPsiProcedure_Family();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.PsiProcedure#getThresholdMinimum <em>Threshold Minimum</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Threshold Minimum</em>'.
	 * @see limen.model.PsiProcedure#getThresholdMinimum()
	 * @see #getPsiProcedure()
	 * @generated
	 */
	EAttribute getPsiProcedure_ThresholdMinimum();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.PsiProcedure#getThresholdMaximum <em>Threshold Maximum</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Threshold Maximum</em>'.
	 * @see limen.model.PsiProcedure#getThresholdMaximum()
	 * @see #getPsiProcedure()
	 * @generated
	 */
	EAttribute getPsiProcedure_ThresholdMaximum();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.PsiProcedure#getThresholdCount <em>Threshold Count</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Threshold Count</em>'.
	 * @see limen.model.PsiProcedure#getThresholdCount()
	 * @see #getPsiProcedure()
	 * @generated
	 */
	EAttribute getPsiProcedure_ThresholdCount();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.PsiProcedure#getSlopeMinimum <em>Slope Minimum</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Slope Minimum</em>'.
	 * @see limen.model.PsiProcedure#getSlopeMinimum()
	 * @see #getPsiProcedure()
	 * @generated
	 */
	EAttribute getPsiProcedure_SlopeMinimum();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.PsiProcedure#getSlopeMaximum <em>Slope Maximum</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Slope Maximum</em>'.
	 * @see limen.model.PsiProcedure#getSlopeMaximum()
	 * @see #getPsiProcedure()
	 * @generated
	 */
	EAttribute getPsiProcedure_SlopeMaximum();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.PsiProcedure#getSlopeCount <em>Slope Count</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Slope Count</em>'.
	 * @see limen.model.PsiProcedure#getSlopeCount()
	 * @see #getPsiProcedure()
	 * @generated
	 */
	EAttribute getPsiProcedure_SlopeCount();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.PsiProcedure#getStimulusMinimum <em>Stimulus Minimum</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Stimulus Minimum</em>'.
	 * @see limen.model.PsiProcedure#getStimulusMinimum()
	 * @see #getPsiProcedure()
	 * @generated
	 */
	EAttribute getPsiProcedure_StimulusMinimum();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.PsiProcedure#getStimulusMaximum <em>Stimulus Maximum</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Stimulus Maximum</em>'.
	 * @see limen.model.PsiProcedure#getStimulusMaximum()
	 * @see #getPsiProcedure()
	 * @generated
	 */
	EAttribute getPsiProcedure_StimulusMaximum();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.PsiProcedure#getStimulusCount <em>Stimulus Count</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Stimulus Count</em>'.
	 * @see limen.model.PsiProcedure#getStimulusCount()
	 * @see #getPsiProcedure()
	 * @generated
	 */
	EAttribute getPsiProcedure_StimulusCount();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.PsiProcedure#getLapseMode <em>Lapse Mode</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Lapse Mode</em>'.
	 * @see limen.model.PsiProcedure#getLapseMode()
	 * @see #getPsiProcedure()
	 * @generated
	 */
	EAttribute getPsiProcedure_LapseMode();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.PsiProcedure#getLapseRate <em>Lapse Rate</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Lapse Rate</em>'.
	 * @see limen.model.PsiProcedure#getLapseRate()
	 * @see #getPsiProcedure()
	 * @generated
	 */
	EAttribute getPsiProcedure_LapseRate();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.PsiProcedure#getLapseMinimum <em>Lapse Minimum</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Lapse Minimum</em>'.
	 * @see limen.model.PsiProcedure#getLapseMinimum()
	 * @see #getPsiProcedure()
	 * @generated
	 */
	EAttribute getPsiProcedure_LapseMinimum();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.PsiProcedure#getLapseMaximum <em>Lapse Maximum</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Lapse Maximum</em>'.
	 * @see limen.model.PsiProcedure#getLapseMaximum()
	 * @see #getPsiProcedure()
	 * @generated
	 */
	EAttribute getPsiProcedure_LapseMaximum();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.PsiProcedure#getLapseCount <em>Lapse Count</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Lapse Count</em>'.
	 * @see limen.model.PsiProcedure#getLapseCount()
	 * @see #getPsiProcedure()
	 * @generated
	 */
	EAttribute getPsiProcedure_LapseCount();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.PsiProcedure#getGuessRate <em>Guess Rate</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Guess Rate</em>'.
	 * @see limen.model.PsiProcedure#getGuessRate()
	 * @see #getPsiProcedure()
	 * @generated
	 */
	EAttribute getPsiProcedure_GuessRate();

	/**
	 * Returns the meta object for the '{@link limen.model.PsiProcedure#validPsiGrids(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Valid Psi Grids</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Valid Psi Grids</em>' operation.
	 * @see limen.model.PsiProcedure#validPsiGrids(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getPsiProcedure__ValidPsiGrids__DiagnosticChain_Map();

	/**
	 * Returns the meta object for class '{@link limen.model.ConstantStimuliProcedure <em>Constant Stimuli Procedure</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Constant Stimuli Procedure</em>'.
	 * @see limen.model.ConstantStimuliProcedure
	 * @generated
	 */
	EClass getConstantStimuliProcedure();

	/**
	 * Returns the meta object for the attribute list '{@link limen.model.ConstantStimuliProcedure#getValues <em>Values</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute list '<em>Values</em>'.
	 * @see limen.model.ConstantStimuliProcedure#getValues()
	 * @see #getConstantStimuliProcedure()
	 * @generated
	 */
	EAttribute getConstantStimuliProcedure_Values();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.ConstantStimuliProcedure#getRepetitionsPerValue <em>Repetitions Per Value</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Repetitions Per Value</em>'.
	 * @see limen.model.ConstantStimuliProcedure#getRepetitionsPerValue()
	 * @see #getConstantStimuliProcedure()
	 * @generated
	 */
	EAttribute getConstantStimuliProcedure_RepetitionsPerValue();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.ConstantStimuliProcedure#isBlockedShuffle <em>Blocked Shuffle</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Blocked Shuffle</em>'.
	 * @see limen.model.ConstantStimuliProcedure#isBlockedShuffle()
	 * @see #getConstantStimuliProcedure()
	 * @generated
	 */
	EAttribute getConstantStimuliProcedure_BlockedShuffle();

	/**
	 * Returns the meta object for the '{@link limen.model.ConstantStimuliProcedure#validConstantStimuli(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Valid Constant Stimuli</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Valid Constant Stimuli</em>' operation.
	 * @see limen.model.ConstantStimuliProcedure#validConstantStimuli(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getConstantStimuliProcedure__ValidConstantStimuli__DiagnosticChain_Map();

	/**
	 * Returns the meta object for class '{@link limen.model.ContributedProcedure <em>Contributed Procedure</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Contributed Procedure</em>'.
	 * @see limen.model.ContributedProcedure
	 * @generated
	 */
	EClass getContributedProcedure();

	/**
	 * Returns the meta object for the containment reference '{@link limen.model.ContributedProcedure#getSettings <em>Settings</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Settings</em>'.
	 * @see limen.model.ContributedProcedure#getSettings()
	 * @see #getContributedProcedure()
	 * @generated
	 */
	EReference getContributedProcedure_Settings();

	/**
	 * Returns the meta object for class '{@link limen.model.StoppingRule <em>Stopping Rule</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Stopping Rule</em>'.
	 * @see limen.model.StoppingRule
	 * @generated
	 */
	EClass getStoppingRule();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.StoppingRule#getMaximumReversals <em>Maximum Reversals</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Maximum Reversals</em>'.
	 * @see limen.model.StoppingRule#getMaximumReversals()
	 * @see #getStoppingRule()
	 * @generated
	 */
	EAttribute getStoppingRule_MaximumReversals();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.StoppingRule#getMaximumTrials <em>Maximum Trials</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Maximum Trials</em>'.
	 * @see limen.model.StoppingRule#getMaximumTrials()
	 * @see #getStoppingRule()
	 * @generated
	 */
	EAttribute getStoppingRule_MaximumTrials();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.StoppingRule#getPosteriorSdTarget <em>Posterior Sd Target</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Posterior Sd Target</em>'.
	 * @see limen.model.StoppingRule#getPosteriorSdTarget()
	 * @see #getStoppingRule()
	 * @generated
	 */
	EAttribute getStoppingRule_PosteriorSdTarget();

	/**
	 * Returns the meta object for the '{@link limen.model.StoppingRule#canEnd(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Can End</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Can End</em>' operation.
	 * @see limen.model.StoppingRule#canEnd(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getStoppingRule__CanEnd__DiagnosticChain_Map();

	/**
	 * Returns the meta object for class '{@link limen.model.SettingsGroup <em>Settings Group</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Settings Group</em>'.
	 * @see limen.model.SettingsGroup
	 * @generated
	 */
	EClass getSettingsGroup();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.SettingsGroup#getContributorId <em>Contributor Id</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Contributor Id</em>'.
	 * @see limen.model.SettingsGroup#getContributorId()
	 * @see #getSettingsGroup()
	 * @generated
	 */
	EAttribute getSettingsGroup_ContributorId();

	/**
	 * Returns the meta object for the containment reference list '{@link limen.model.SettingsGroup#getEntries <em>Entries</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Entries</em>'.
	 * @see limen.model.SettingsGroup#getEntries()
	 * @see #getSettingsGroup()
	 * @generated
	 */
	EReference getSettingsGroup_Entries();

	/**
	 * Returns the meta object for the '{@link limen.model.SettingsGroup#validSettings(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Valid Settings</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Valid Settings</em>' operation.
	 * @see limen.model.SettingsGroup#validSettings(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getSettingsGroup__ValidSettings__DiagnosticChain_Map();

	/**
	 * Returns the meta object for class '{@link limen.model.Setting <em>Setting</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Setting</em>'.
	 * @see limen.model.Setting
	 * @generated
	 */
	EClass getSetting();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Setting#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see limen.model.Setting#getName()
	 * @see #getSetting()
	 * @generated
	 */
	EAttribute getSetting_Name();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Setting#getValue <em>Value</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Value</em>'.
	 * @see limen.model.Setting#getValue()
	 * @see #getSetting()
	 * @generated
	 */
	EAttribute getSetting_Value();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Setting#getType <em>Type</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Type</em>'.
	 * @see limen.model.Setting#getType()
	 * @see #getSetting()
	 * @generated
	 */
	EAttribute getSetting_Type();

	/**
	 * Returns the meta object for class '{@link limen.model.Calibration <em>Calibration</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Calibration</em>'.
	 * @see limen.model.Calibration
	 * @generated
	 */
	EClass getCalibration();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Calibration#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see limen.model.Calibration#getName()
	 * @see #getCalibration()
	 * @generated
	 */
	EAttribute getCalibration_Name();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Calibration#getDevice <em>Device</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Device</em>'.
	 * @see limen.model.Calibration#getDevice()
	 * @see #getCalibration()
	 * @generated
	 */
	EAttribute getCalibration_Device();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Calibration#getTransducer <em>Transducer</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Transducer</em>'.
	 * @see limen.model.Calibration#getTransducer()
	 * @see #getCalibration()
	 * @generated
	 */
	EAttribute getCalibration_Transducer();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Calibration#getReferenceLevelDbfs <em>Reference Level Dbfs</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Reference Level Dbfs</em>'.
	 * @see limen.model.Calibration#getReferenceLevelDbfs()
	 * @see #getCalibration()
	 * @generated
	 */
	EAttribute getCalibration_ReferenceLevelDbfs();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Calibration#getSampleRateHz <em>Sample Rate Hz</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Sample Rate Hz</em>'.
	 * @see limen.model.Calibration#getSampleRateHz()
	 * @see #getCalibration()
	 * @generated
	 */
	EAttribute getCalibration_SampleRateHz();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Calibration#getCeilingDbSpl <em>Ceiling Db Spl</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Ceiling Db Spl</em>'.
	 * @see limen.model.Calibration#getCeilingDbSpl()
	 * @see #getCalibration()
	 * @generated
	 */
	EAttribute getCalibration_CeilingDbSpl();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Calibration#getMeasuredBy <em>Measured By</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Measured By</em>'.
	 * @see limen.model.Calibration#getMeasuredBy()
	 * @see #getCalibration()
	 * @generated
	 */
	EAttribute getCalibration_MeasuredBy();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Calibration#getMeasuredOn <em>Measured On</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Measured On</em>'.
	 * @see limen.model.Calibration#getMeasuredOn()
	 * @see #getCalibration()
	 * @generated
	 */
	EAttribute getCalibration_MeasuredOn();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Calibration#isDemonstrationOnly <em>Demonstration Only</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Demonstration Only</em>'.
	 * @see limen.model.Calibration#isDemonstrationOnly()
	 * @see #getCalibration()
	 * @generated
	 */
	EAttribute getCalibration_DemonstrationOnly();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.Calibration#getNotes <em>Notes</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Notes</em>'.
	 * @see limen.model.Calibration#getNotes()
	 * @see #getCalibration()
	 * @generated
	 */
	EAttribute getCalibration_Notes();

	/**
	 * Returns the meta object for the containment reference list '{@link limen.model.Calibration#getPoints <em>Points</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Points</em>'.
	 * @see limen.model.Calibration#getPoints()
	 * @see #getCalibration()
	 * @generated
	 */
	EReference getCalibration_Points();

	/**
	 * Returns the meta object for the '{@link limen.model.Calibration#validCalibration(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Valid Calibration</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Valid Calibration</em>' operation.
	 * @see limen.model.Calibration#validCalibration(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getCalibration__ValidCalibration__DiagnosticChain_Map();

	/**
	 * Returns the meta object for class '{@link limen.model.CalibrationPoint <em>Calibration Point</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Calibration Point</em>'.
	 * @see limen.model.CalibrationPoint
	 * @generated
	 */
	EClass getCalibrationPoint();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.CalibrationPoint#getFrequencyHz <em>Frequency Hz</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Frequency Hz</em>'.
	 * @see limen.model.CalibrationPoint#getFrequencyHz()
	 * @see #getCalibrationPoint()
	 * @generated
	 */
	EAttribute getCalibrationPoint_FrequencyHz();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.CalibrationPoint#getMeasuredDbSpl <em>Measured Db Spl</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Measured Db Spl</em>'.
	 * @see limen.model.CalibrationPoint#getMeasuredDbSpl()
	 * @see #getCalibrationPoint()
	 * @generated
	 */
	EAttribute getCalibrationPoint_MeasuredDbSpl();

	/**
	 * Returns the meta object for class '{@link limen.model.SessionHeader <em>Session Header</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Session Header</em>'.
	 * @see limen.model.SessionHeader
	 * @generated
	 */
	EClass getSessionHeader();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.SessionHeader#getParticipant <em>Participant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Participant</em>'.
	 * @see limen.model.SessionHeader#getParticipant()
	 * @see #getSessionHeader()
	 * @generated
	 */
	EAttribute getSessionHeader_Participant();

	/**
	 * Returns the meta object for the containment reference '{@link limen.model.SessionHeader#getBattery <em>Battery</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Battery</em>'.
	 * @see limen.model.SessionHeader#getBattery()
	 * @see #getSessionHeader()
	 * @generated
	 */
	EReference getSessionHeader_Battery();

	/**
	 * Returns the meta object for the containment reference '{@link limen.model.SessionHeader#getCalibration <em>Calibration</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Calibration</em>'.
	 * @see limen.model.SessionHeader#getCalibration()
	 * @see #getSessionHeader()
	 * @generated
	 */
	EReference getSessionHeader_Calibration();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.SessionHeader#getDevice <em>Device</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Device</em>'.
	 * @see limen.model.SessionHeader#getDevice()
	 * @see #getSessionHeader()
	 * @generated
	 */
	EAttribute getSessionHeader_Device();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.SessionHeader#getRandomSeed <em>Random Seed</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Random Seed</em>'.
	 * @see limen.model.SessionHeader#getRandomSeed()
	 * @see #getSessionHeader()
	 * @generated
	 */
	EAttribute getSessionHeader_RandomSeed();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.SessionHeader#getSoftwareVersion <em>Software Version</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Software Version</em>'.
	 * @see limen.model.SessionHeader#getSoftwareVersion()
	 * @see #getSessionHeader()
	 * @generated
	 */
	EAttribute getSessionHeader_SoftwareVersion();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.SessionHeader#getStartTime <em>Start Time</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Start Time</em>'.
	 * @see limen.model.SessionHeader#getStartTime()
	 * @see #getSessionHeader()
	 * @generated
	 */
	EAttribute getSessionHeader_StartTime();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.SessionHeader#getEndTime <em>End Time</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>End Time</em>'.
	 * @see limen.model.SessionHeader#getEndTime()
	 * @see #getSessionHeader()
	 * @generated
	 */
	EAttribute getSessionHeader_EndTime();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.SessionHeader#getStatus <em>Status</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Status</em>'.
	 * @see limen.model.SessionHeader#getStatus()
	 * @see #getSessionHeader()
	 * @generated
	 */
	EAttribute getSessionHeader_Status();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.SessionHeader#getLatinSquareRow <em>Latin Square Row</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Latin Square Row</em>'.
	 * @see limen.model.SessionHeader#getLatinSquareRow()
	 * @see #getSessionHeader()
	 * @generated
	 */
	EAttribute getSessionHeader_LatinSquareRow();

	/**
	 * Returns the meta object for the reference list '{@link limen.model.SessionHeader#getStepOrder <em>Step Order</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference list '<em>Step Order</em>'.
	 * @see limen.model.SessionHeader#getStepOrder()
	 * @see #getSessionHeader()
	 * @generated
	 */
	EReference getSessionHeader_StepOrder();

	/**
	 * Returns the meta object for the containment reference '{@link limen.model.SessionHeader#getExposure <em>Exposure</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Exposure</em>'.
	 * @see limen.model.SessionHeader#getExposure()
	 * @see #getSessionHeader()
	 * @generated
	 */
	EReference getSessionHeader_Exposure();

	/**
	 * Returns the meta object for the '{@link limen.model.SessionHeader#validSession(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map) <em>Valid Session</em>}' operation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the '<em>Valid Session</em>' operation.
	 * @see limen.model.SessionHeader#validSession(org.eclipse.emf.common.util.DiagnosticChain, java.util.Map)
	 * @generated
	 */
	EOperation getSessionHeader__ValidSession__DiagnosticChain_Map();

	/**
	 * Returns the meta object for class '{@link limen.model.ExposureEstimate <em>Exposure Estimate</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Exposure Estimate</em>'.
	 * @see limen.model.ExposureEstimate
	 * @generated
	 */
	EClass getExposureEstimate();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.ExposureEstimate#getPeakLevelDbSpl <em>Peak Level Db Spl</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Peak Level Db Spl</em>'.
	 * @see limen.model.ExposureEstimate#getPeakLevelDbSpl()
	 * @see #getExposureEstimate()
	 * @generated
	 */
	EAttribute getExposureEstimate_PeakLevelDbSpl();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.ExposureEstimate#getEquivalentLevelDbSpl <em>Equivalent Level Db Spl</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Equivalent Level Db Spl</em>'.
	 * @see limen.model.ExposureEstimate#getEquivalentLevelDbSpl()
	 * @see #getExposureEstimate()
	 * @generated
	 */
	EAttribute getExposureEstimate_EquivalentLevelDbSpl();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.ExposureEstimate#getSoundOnSeconds <em>Sound On Seconds</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Sound On Seconds</em>'.
	 * @see limen.model.ExposureEstimate#getSoundOnSeconds()
	 * @see #getExposureEstimate()
	 * @generated
	 */
	EAttribute getExposureEstimate_SoundOnSeconds();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.ExposureEstimate#getNioshDosePercent <em>Niosh Dose Percent</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Niosh Dose Percent</em>'.
	 * @see limen.model.ExposureEstimate#getNioshDosePercent()
	 * @see #getExposureEstimate()
	 * @generated
	 */
	EAttribute getExposureEstimate_NioshDosePercent();

	/**
	 * Returns the meta object for the attribute '{@link limen.model.ExposureEstimate#getOshaDosePercent <em>Osha Dose Percent</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Osha Dose Percent</em>'.
	 * @see limen.model.ExposureEstimate#getOshaDosePercent()
	 * @see #getExposureEstimate()
	 * @generated
	 */
	EAttribute getExposureEstimate_OshaDosePercent();

	/**
	 * Returns the meta object for enum '{@link limen.model.EarlyResponsePolicy <em>Early Response Policy</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Early Response Policy</em>'.
	 * @see limen.model.EarlyResponsePolicy
	 * @generated
	 */
	EEnum getEarlyResponsePolicy();

	/**
	 * Returns the meta object for enum '{@link limen.model.OrderingPolicy <em>Ordering Policy</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Ordering Policy</em>'.
	 * @see limen.model.OrderingPolicy
	 * @generated
	 */
	EEnum getOrderingPolicy();

	/**
	 * Returns the meta object for enum '{@link limen.model.StimulusKind <em>Stimulus Kind</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Stimulus Kind</em>'.
	 * @see limen.model.StimulusKind
	 * @generated
	 */
	EEnum getStimulusKind();

	/**
	 * Returns the meta object for enum '{@link limen.model.Ear <em>Ear</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Ear</em>'.
	 * @see limen.model.Ear
	 * @generated
	 */
	EEnum getEar();

	/**
	 * Returns the meta object for enum '{@link limen.model.QuantityUnit <em>Quantity Unit</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Quantity Unit</em>'.
	 * @see limen.model.QuantityUnit
	 * @generated
	 */
	EEnum getQuantityUnit();

	/**
	 * Returns the meta object for enum '{@link limen.model.Scale <em>Scale</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Scale</em>'.
	 * @see limen.model.Scale
	 * @generated
	 */
	EEnum getScale();

	/**
	 * Returns the meta object for enum '{@link limen.model.StepMode <em>Step Mode</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Step Mode</em>'.
	 * @see limen.model.StepMode
	 * @generated
	 */
	EEnum getStepMode();

	/**
	 * Returns the meta object for enum '{@link limen.model.BayesianVariant <em>Bayesian Variant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Bayesian Variant</em>'.
	 * @see limen.model.BayesianVariant
	 * @generated
	 */
	EEnum getBayesianVariant();

	/**
	 * Returns the meta object for enum '{@link limen.model.EstimatePlacement <em>Estimate Placement</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Estimate Placement</em>'.
	 * @see limen.model.EstimatePlacement
	 * @generated
	 */
	EEnum getEstimatePlacement();

	/**
	 * Returns the meta object for enum '{@link limen.model.LapseMode <em>Lapse Mode</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Lapse Mode</em>'.
	 * @see limen.model.LapseMode
	 * @generated
	 */
	EEnum getLapseMode();

	/**
	 * Returns the meta object for enum '{@link limen.model.PsychometricFamily <em>Psychometric Family</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Psychometric Family</em>'.
	 * @see limen.model.PsychometricFamily
	 * @generated
	 */
	EEnum getPsychometricFamily();

	/**
	 * Returns the meta object for enum '{@link limen.model.NoiseSpectrum <em>Noise Spectrum</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Noise Spectrum</em>'.
	 * @see limen.model.NoiseSpectrum
	 * @generated
	 */
	EEnum getNoiseSpectrum();

	/**
	 * Returns the meta object for enum '{@link limen.model.SettingType <em>Setting Type</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Setting Type</em>'.
	 * @see limen.model.SettingType
	 * @generated
	 */
	EEnum getSettingType();

	/**
	 * Returns the meta object for enum '{@link limen.model.SessionStatus <em>Session Status</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Session Status</em>'.
	 * @see limen.model.SessionStatus
	 * @generated
	 */
	EEnum getSessionStatus();

	/**
	 * Returns the meta object for data type '{@link java.time.Instant <em>Instant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
     * <!-- begin-model-doc -->
     * A point in time, written in ISO 8601 UTC form (2025-03-04T09:30:00Z).
     * <!-- end-model-doc -->
	 * @return the meta object for data type '<em>Instant</em>'.
	 * @see java.time.Instant
	 * @model instanceClass="java.time.Instant"
	 * @generated
	 */
	EDataType getInstant();

	/**
	 * Returns the meta object for data type '{@link java.time.LocalDate <em>Local Date</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
     * <!-- begin-model-doc -->
     * A calendar date, written in ISO 8601 form (2025-03-04).
     * <!-- end-model-doc -->
	 * @return the meta object for data type '<em>Local Date</em>'.
	 * @see java.time.LocalDate
	 * @model instanceClass="java.time.LocalDate"
	 * @generated
	 */
	EDataType getLocalDate();

	/**
	 * Returns the factory that creates the instances of the model.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the factory that creates the instances of the model.
	 * @generated
	 */
	LimenFactory getLimenFactory();

	/**
	 * <!-- begin-user-doc -->
	 * Defines literals for the meta objects that represent
	 * <ul>
	 *   <li>each class,</li>
	 *   <li>each feature of each class,</li>
	 *   <li>each operation of each class,</li>
	 *   <li>each enum,</li>
	 *   <li>and each data type</li>
	 * </ul>
	 * <!-- end-user-doc -->
	 * @generated
	 */
	interface Literals {
		/**
		 * The meta object literal for the '{@link limen.model.impl.LimenDocumentImpl <em>Document</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.LimenDocumentImpl
		 * @see limen.model.impl.LimenPackageImpl#getLimenDocument()
		 * @generated
		 */
		EClass LIMEN_DOCUMENT = eINSTANCE.getLimenDocument();

		/**
		 * The meta object literal for the '<em><b>Schema Version</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute LIMEN_DOCUMENT__SCHEMA_VERSION = eINSTANCE.getLimenDocument_SchemaVersion();

		/**
		 * The meta object literal for the '{@link limen.model.impl.BatteryImpl <em>Battery</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.BatteryImpl
		 * @see limen.model.impl.LimenPackageImpl#getBattery()
		 * @generated
		 */
		EClass BATTERY = eINSTANCE.getBattery();

		/**
		 * The meta object literal for the '<em><b>Title</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute BATTERY__TITLE = eINSTANCE.getBattery_Title();

		/**
		 * The meta object literal for the '<em><b>Notes</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute BATTERY__NOTES = eINSTANCE.getBattery_Notes();

		/**
		 * The meta object literal for the '<em><b>Calibration File</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute BATTERY__CALIBRATION_FILE = eINSTANCE.getBattery_CalibrationFile();

		/**
		 * The meta object literal for the '<em><b>Ordering</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute BATTERY__ORDERING = eINSTANCE.getBattery_Ordering();

		/**
		 * The meta object literal for the '<em><b>Shuffle Seed</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute BATTERY__SHUFFLE_SEED = eINSTANCE.getBattery_ShuffleSeed();

		/**
		 * The meta object literal for the '<em><b>Steps</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference BATTERY__STEPS = eINSTANCE.getBattery_Steps();

		/**
		 * The meta object literal for the '<em><b>Breaks</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference BATTERY__BREAKS = eINSTANCE.getBattery_Breaks();

		/**
		 * The meta object literal for the '<em><b>Unique Step Ids</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation BATTERY___UNIQUE_STEP_IDS__DIAGNOSTICCHAIN_MAP = eINSTANCE.getBattery__UniqueStepIds__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '<em><b>Valid Ordering</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation BATTERY___VALID_ORDERING__DIAGNOSTICCHAIN_MAP = eINSTANCE.getBattery__ValidOrdering__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '<em><b>Valid Breaks</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation BATTERY___VALID_BREAKS__DIAGNOSTICCHAIN_MAP = eINSTANCE.getBattery__ValidBreaks__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '<em><b>No Reference Cycles</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation BATTERY___NO_REFERENCE_CYCLES__DIAGNOSTICCHAIN_MAP = eINSTANCE.getBattery__NoReferenceCycles__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '{@link limen.model.impl.BreakImpl <em>Break</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.BreakImpl
		 * @see limen.model.impl.LimenPackageImpl#getBreak()
		 * @generated
		 */
		EClass BREAK = eINSTANCE.getBreak();

		/**
		 * The meta object literal for the '<em><b>After Step Count</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute BREAK__AFTER_STEP_COUNT = eINSTANCE.getBreak_AfterStepCount();

		/**
		 * The meta object literal for the '<em><b>Minimum Duration Seconds</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute BREAK__MINIMUM_DURATION_SECONDS = eINSTANCE.getBreak_MinimumDurationSeconds();

		/**
		 * The meta object literal for the '<em><b>Message</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute BREAK__MESSAGE = eINSTANCE.getBreak_Message();

		/**
		 * The meta object literal for the '{@link limen.model.impl.StepImpl <em>Step</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.StepImpl
		 * @see limen.model.impl.LimenPackageImpl#getStep()
		 * @generated
		 */
		EClass STEP = eINSTANCE.getStep();

		/**
		 * The meta object literal for the '<em><b>Id</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute STEP__ID = eINSTANCE.getStep_Id();

		/**
		 * The meta object literal for the '<em><b>Title</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute STEP__TITLE = eINSTANCE.getStep_Title();

		/**
		 * The meta object literal for the '<em><b>Notes</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute STEP__NOTES = eINSTANCE.getStep_Notes();

		/**
		 * The meta object literal for the '<em><b>Fixed Position</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute STEP__FIXED_POSITION = eINSTANCE.getStep_FixedPosition();

		/**
		 * The meta object literal for the '<em><b>Task</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference STEP__TASK = eINSTANCE.getStep_Task();

		/**
		 * The meta object literal for the '<em><b>Stimulus</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference STEP__STIMULUS = eINSTANCE.getStep_Stimulus();

		/**
		 * The meta object literal for the '<em><b>Varied Quantity</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference STEP__VARIED_QUANTITY = eINSTANCE.getStep_VariedQuantity();

		/**
		 * The meta object literal for the '<em><b>Tracks</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference STEP__TRACKS = eINSTANCE.getStep_Tracks();

		/**
		 * The meta object literal for the '<em><b>Consistent Quantity</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation STEP___CONSISTENT_QUANTITY__DIAGNOSTICCHAIN_MAP = eINSTANCE.getStep__ConsistentQuantity__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '<em><b>Levels Within Ceiling</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation STEP___LEVELS_WITHIN_CEILING__DIAGNOSTICCHAIN_MAP = eINSTANCE.getStep__LevelsWithinCeiling__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '<em><b>Frequencies Within Range</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation STEP___FREQUENCIES_WITHIN_RANGE__DIAGNOSTICCHAIN_MAP = eINSTANCE.getStep__FrequenciesWithinRange__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '{@link limen.model.impl.TaskImpl <em>Task</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.TaskImpl
		 * @see limen.model.impl.LimenPackageImpl#getTask()
		 * @generated
		 */
		EClass TASK = eINSTANCE.getTask();

		/**
		 * The meta object literal for the '<em><b>Interval Duration Seconds</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TASK__INTERVAL_DURATION_SECONDS = eINSTANCE.getTask_IntervalDurationSeconds();

		/**
		 * The meta object literal for the '<em><b>Response Window Seconds</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TASK__RESPONSE_WINDOW_SECONDS = eINSTANCE.getTask_ResponseWindowSeconds();

		/**
		 * The meta object literal for the '<em><b>Inter Trial Interval Seconds</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TASK__INTER_TRIAL_INTERVAL_SECONDS = eINSTANCE.getTask_InterTrialIntervalSeconds();

		/**
		 * The meta object literal for the '<em><b>Feedback</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TASK__FEEDBACK = eINSTANCE.getTask_Feedback();

		/**
		 * The meta object literal for the '<em><b>Early Responses</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TASK__EARLY_RESPONSES = eINSTANCE.getTask_EarlyResponses();

		/**
		 * The meta object literal for the '<em><b>Valid Timing</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation TASK___VALID_TIMING__DIAGNOSTICCHAIN_MAP = eINSTANCE.getTask__ValidTiming__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '{@link limen.model.impl.ForcedChoiceTaskImpl <em>Forced Choice Task</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.ForcedChoiceTaskImpl
		 * @see limen.model.impl.LimenPackageImpl#getForcedChoiceTask()
		 * @generated
		 */
		EClass FORCED_CHOICE_TASK = eINSTANCE.getForcedChoiceTask();

		/**
		 * The meta object literal for the '<em><b>Interval Count</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FORCED_CHOICE_TASK__INTERVAL_COUNT = eINSTANCE.getForcedChoiceTask_IntervalCount();

		/**
		 * The meta object literal for the '<em><b>Inter Stimulus Interval Seconds</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FORCED_CHOICE_TASK__INTER_STIMULUS_INTERVAL_SECONDS = eINSTANCE.getForcedChoiceTask_InterStimulusIntervalSeconds();

		/**
		 * The meta object literal for the '<em><b>Valid Intervals</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation FORCED_CHOICE_TASK___VALID_INTERVALS__DIAGNOSTICCHAIN_MAP = eINSTANCE.getForcedChoiceTask__ValidIntervals__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '{@link limen.model.impl.YesNoTaskImpl <em>Yes No Task</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.YesNoTaskImpl
		 * @see limen.model.impl.LimenPackageImpl#getYesNoTask()
		 * @generated
		 */
		EClass YES_NO_TASK = eINSTANCE.getYesNoTask();

		/**
		 * The meta object literal for the '<em><b>Catch Trial Rate</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute YES_NO_TASK__CATCH_TRIAL_RATE = eINSTANCE.getYesNoTask_CatchTrialRate();

		/**
		 * The meta object literal for the '<em><b>Valid Catch Trials</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation YES_NO_TASK___VALID_CATCH_TRIALS__DIAGNOSTICCHAIN_MAP = eINSTANCE.getYesNoTask__ValidCatchTrials__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '{@link limen.model.impl.StimulusImpl <em>Stimulus</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.StimulusImpl
		 * @see limen.model.impl.LimenPackageImpl#getStimulus()
		 * @generated
		 */
		EClass STIMULUS = eINSTANCE.getStimulus();

		/**
		 * The meta object literal for the '<em><b>Kind</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute STIMULUS__KIND = eINSTANCE.getStimulus_Kind();

		/**
		 * The meta object literal for the '<em><b>Standard Frequency Hz</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute STIMULUS__STANDARD_FREQUENCY_HZ = eINSTANCE.getStimulus_StandardFrequencyHz();

		/**
		 * The meta object literal for the '<em><b>Standard Level</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference STIMULUS__STANDARD_LEVEL = eINSTANCE.getStimulus_StandardLevel();

		/**
		 * The meta object literal for the '<em><b>Ramp Duration Seconds</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute STIMULUS__RAMP_DURATION_SECONDS = eINSTANCE.getStimulus_RampDurationSeconds();

		/**
		 * The meta object literal for the '<em><b>Ear</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute STIMULUS__EAR = eINSTANCE.getStimulus_Ear();

		/**
		 * The meta object literal for the '<em><b>Masker</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference STIMULUS__MASKER = eINSTANCE.getStimulus_Masker();

		/**
		 * The meta object literal for the '<em><b>Contributions</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference STIMULUS__CONTRIBUTIONS = eINSTANCE.getStimulus_Contributions();

		/**
		 * The meta object literal for the '<em><b>Valid Tone</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation STIMULUS___VALID_TONE__DIAGNOSTICCHAIN_MAP = eINSTANCE.getStimulus__ValidTone__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '<em><b>Valid Standard Level</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation STIMULUS___VALID_STANDARD_LEVEL__DIAGNOSTICCHAIN_MAP = eINSTANCE.getStimulus__ValidStandardLevel__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '<em><b>Valid Masker</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation STIMULUS___VALID_MASKER__DIAGNOSTICCHAIN_MAP = eINSTANCE.getStimulus__ValidMasker__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '{@link limen.model.impl.LevelImpl <em>Level</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.LevelImpl
		 * @see limen.model.impl.LimenPackageImpl#getLevel()
		 * @generated
		 */
		EClass LEVEL = eINSTANCE.getLevel();

		/**
		 * The meta object literal for the '{@link limen.model.impl.AbsoluteLevelImpl <em>Absolute Level</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.AbsoluteLevelImpl
		 * @see limen.model.impl.LimenPackageImpl#getAbsoluteLevel()
		 * @generated
		 */
		EClass ABSOLUTE_LEVEL = eINSTANCE.getAbsoluteLevel();

		/**
		 * The meta object literal for the '<em><b>Level Db Spl</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ABSOLUTE_LEVEL__LEVEL_DB_SPL = eINSTANCE.getAbsoluteLevel_LevelDbSpl();

		/**
		 * The meta object literal for the '{@link limen.model.impl.RelativeLevelImpl <em>Relative Level</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.RelativeLevelImpl
		 * @see limen.model.impl.LimenPackageImpl#getRelativeLevel()
		 * @generated
		 */
		EClass RELATIVE_LEVEL = eINSTANCE.getRelativeLevel();

		/**
		 * The meta object literal for the '<em><b>Reference</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference RELATIVE_LEVEL__REFERENCE = eINSTANCE.getRelativeLevel_Reference();

		/**
		 * The meta object literal for the '<em><b>Offset Db</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RELATIVE_LEVEL__OFFSET_DB = eINSTANCE.getRelativeLevel_OffsetDb();

		/**
		 * The meta object literal for the '<em><b>Valid Reference</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation RELATIVE_LEVEL___VALID_REFERENCE__DIAGNOSTICCHAIN_MAP = eINSTANCE.getRelativeLevel__ValidReference__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '{@link limen.model.impl.MaskerNoiseImpl <em>Masker Noise</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.MaskerNoiseImpl
		 * @see limen.model.impl.LimenPackageImpl#getMaskerNoise()
		 * @generated
		 */
		EClass MASKER_NOISE = eINSTANCE.getMaskerNoise();

		/**
		 * The meta object literal for the '<em><b>Spectrum</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute MASKER_NOISE__SPECTRUM = eINSTANCE.getMaskerNoise_Spectrum();

		/**
		 * The meta object literal for the '<em><b>Low Cutoff Hz</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute MASKER_NOISE__LOW_CUTOFF_HZ = eINSTANCE.getMaskerNoise_LowCutoffHz();

		/**
		 * The meta object literal for the '<em><b>High Cutoff Hz</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute MASKER_NOISE__HIGH_CUTOFF_HZ = eINSTANCE.getMaskerNoise_HighCutoffHz();

		/**
		 * The meta object literal for the '<em><b>Level</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference MASKER_NOISE__LEVEL = eINSTANCE.getMaskerNoise_Level();

		/**
		 * The meta object literal for the '<em><b>Continuous</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute MASKER_NOISE__CONTINUOUS = eINSTANCE.getMaskerNoise_Continuous();

		/**
		 * The meta object literal for the '{@link limen.model.impl.VariedQuantityImpl <em>Varied Quantity</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.VariedQuantityImpl
		 * @see limen.model.impl.LimenPackageImpl#getVariedQuantity()
		 * @generated
		 */
		EClass VARIED_QUANTITY = eINSTANCE.getVariedQuantity();

		/**
		 * The meta object literal for the '<em><b>Unit</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute VARIED_QUANTITY__UNIT = eINSTANCE.getVariedQuantity_Unit();

		/**
		 * The meta object literal for the '<em><b>Scale</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute VARIED_QUANTITY__SCALE = eINSTANCE.getVariedQuantity_Scale();

		/**
		 * The meta object literal for the '{@link limen.model.impl.TrackImpl <em>Track</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.TrackImpl
		 * @see limen.model.impl.LimenPackageImpl#getTrack()
		 * @generated
		 */
		EClass TRACK = eINSTANCE.getTrack();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TRACK__NAME = eINSTANCE.getTrack_Name();

		/**
		 * The meta object literal for the '<em><b>Procedure</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference TRACK__PROCEDURE = eINSTANCE.getTrack_Procedure();

		/**
		 * The meta object literal for the '<em><b>Stopping Rule</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference TRACK__STOPPING_RULE = eINSTANCE.getTrack_StoppingRule();

		/**
		 * The meta object literal for the '{@link limen.model.impl.ProcedureImpl <em>Procedure</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.ProcedureImpl
		 * @see limen.model.impl.LimenPackageImpl#getProcedure()
		 * @generated
		 */
		EClass PROCEDURE = eINSTANCE.getProcedure();

		/**
		 * The meta object literal for the '{@link limen.model.impl.StaircaseProcedureImpl <em>Staircase Procedure</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.StaircaseProcedureImpl
		 * @see limen.model.impl.LimenPackageImpl#getStaircaseProcedure()
		 * @generated
		 */
		EClass STAIRCASE_PROCEDURE = eINSTANCE.getStaircaseProcedure();

		/**
		 * The meta object literal for the '<em><b>Start Value</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute STAIRCASE_PROCEDURE__START_VALUE = eINSTANCE.getStaircaseProcedure_StartValue();

		/**
		 * The meta object literal for the '<em><b>Floor Value</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute STAIRCASE_PROCEDURE__FLOOR_VALUE = eINSTANCE.getStaircaseProcedure_FloorValue();

		/**
		 * The meta object literal for the '<em><b>Ceiling Value</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute STAIRCASE_PROCEDURE__CEILING_VALUE = eINSTANCE.getStaircaseProcedure_CeilingValue();

		/**
		 * The meta object literal for the '<em><b>Step Mode</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute STAIRCASE_PROCEDURE__STEP_MODE = eINSTANCE.getStaircaseProcedure_StepMode();

		/**
		 * The meta object literal for the '<em><b>Valid Limits</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation STAIRCASE_PROCEDURE___VALID_LIMITS__DIAGNOSTICCHAIN_MAP = eINSTANCE.getStaircaseProcedure__ValidLimits__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '{@link limen.model.impl.TransformedUpDownProcedureImpl <em>Transformed Up Down Procedure</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.TransformedUpDownProcedureImpl
		 * @see limen.model.impl.LimenPackageImpl#getTransformedUpDownProcedure()
		 * @generated
		 */
		EClass TRANSFORMED_UP_DOWN_PROCEDURE = eINSTANCE.getTransformedUpDownProcedure();

		/**
		 * The meta object literal for the '<em><b>Down Count</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TRANSFORMED_UP_DOWN_PROCEDURE__DOWN_COUNT = eINSTANCE.getTransformedUpDownProcedure_DownCount();

		/**
		 * The meta object literal for the '<em><b>Up Count</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TRANSFORMED_UP_DOWN_PROCEDURE__UP_COUNT = eINSTANCE.getTransformedUpDownProcedure_UpCount();

		/**
		 * The meta object literal for the '<em><b>Initial Step</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TRANSFORMED_UP_DOWN_PROCEDURE__INITIAL_STEP = eINSTANCE.getTransformedUpDownProcedure_InitialStep();

		/**
		 * The meta object literal for the '<em><b>Minimum Step</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TRANSFORMED_UP_DOWN_PROCEDURE__MINIMUM_STEP = eINSTANCE.getTransformedUpDownProcedure_MinimumStep();

		/**
		 * The meta object literal for the '<em><b>Shrink Factor</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TRANSFORMED_UP_DOWN_PROCEDURE__SHRINK_FACTOR = eINSTANCE.getTransformedUpDownProcedure_ShrinkFactor();

		/**
		 * The meta object literal for the '<em><b>Reversals Per Shrink</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TRANSFORMED_UP_DOWN_PROCEDURE__REVERSALS_PER_SHRINK = eINSTANCE.getTransformedUpDownProcedure_ReversalsPerShrink();

		/**
		 * The meta object literal for the '<em><b>Discarded Reversals</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TRANSFORMED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS = eINSTANCE.getTransformedUpDownProcedure_DiscardedReversals();

		/**
		 * The meta object literal for the '<em><b>Averaged Reversals</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TRANSFORMED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS = eINSTANCE.getTransformedUpDownProcedure_AveragedReversals();

		/**
		 * The meta object literal for the '<em><b>Valid Up Down Rule</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation TRANSFORMED_UP_DOWN_PROCEDURE___VALID_UP_DOWN_RULE__DIAGNOSTICCHAIN_MAP = eINSTANCE.getTransformedUpDownProcedure__ValidUpDownRule__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '{@link limen.model.impl.WeightedUpDownProcedureImpl <em>Weighted Up Down Procedure</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.WeightedUpDownProcedureImpl
		 * @see limen.model.impl.LimenPackageImpl#getWeightedUpDownProcedure()
		 * @generated
		 */
		EClass WEIGHTED_UP_DOWN_PROCEDURE = eINSTANCE.getWeightedUpDownProcedure();

		/**
		 * The meta object literal for the '<em><b>Target Probability</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute WEIGHTED_UP_DOWN_PROCEDURE__TARGET_PROBABILITY = eINSTANCE.getWeightedUpDownProcedure_TargetProbability();

		/**
		 * The meta object literal for the '<em><b>Up Step</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute WEIGHTED_UP_DOWN_PROCEDURE__UP_STEP = eINSTANCE.getWeightedUpDownProcedure_UpStep();

		/**
		 * The meta object literal for the '<em><b>Down Step</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute WEIGHTED_UP_DOWN_PROCEDURE__DOWN_STEP = eINSTANCE.getWeightedUpDownProcedure_DownStep();

		/**
		 * The meta object literal for the '<em><b>Discarded Reversals</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute WEIGHTED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS = eINSTANCE.getWeightedUpDownProcedure_DiscardedReversals();

		/**
		 * The meta object literal for the '<em><b>Averaged Reversals</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute WEIGHTED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS = eINSTANCE.getWeightedUpDownProcedure_AveragedReversals();

		/**
		 * The meta object literal for the '<em><b>Valid Weighted Steps</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation WEIGHTED_UP_DOWN_PROCEDURE___VALID_WEIGHTED_STEPS__DIAGNOSTICCHAIN_MAP = eINSTANCE.getWeightedUpDownProcedure__ValidWeightedSteps__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '{@link limen.model.impl.PestProcedureImpl <em>Pest Procedure</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.PestProcedureImpl
		 * @see limen.model.impl.LimenPackageImpl#getPestProcedure()
		 * @generated
		 */
		EClass PEST_PROCEDURE = eINSTANCE.getPestProcedure();

		/**
		 * The meta object literal for the '<em><b>Initial Step</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PEST_PROCEDURE__INITIAL_STEP = eINSTANCE.getPestProcedure_InitialStep();

		/**
		 * The meta object literal for the '<em><b>Minimum Step</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PEST_PROCEDURE__MINIMUM_STEP = eINSTANCE.getPestProcedure_MinimumStep();

		/**
		 * The meta object literal for the '<em><b>Maximum Step</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PEST_PROCEDURE__MAXIMUM_STEP = eINSTANCE.getPestProcedure_MaximumStep();

		/**
		 * The meta object literal for the '<em><b>Wald Deviation</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PEST_PROCEDURE__WALD_DEVIATION = eINSTANCE.getPestProcedure_WaldDeviation();

		/**
		 * The meta object literal for the '<em><b>Target Probability</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PEST_PROCEDURE__TARGET_PROBABILITY = eINSTANCE.getPestProcedure_TargetProbability();

		/**
		 * The meta object literal for the '<em><b>Valid Pest Steps</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation PEST_PROCEDURE___VALID_PEST_STEPS__DIAGNOSTICCHAIN_MAP = eINSTANCE.getPestProcedure__ValidPestSteps__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '{@link limen.model.impl.QuestProcedureImpl <em>Quest Procedure</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.QuestProcedureImpl
		 * @see limen.model.impl.LimenPackageImpl#getQuestProcedure()
		 * @generated
		 */
		EClass QUEST_PROCEDURE = eINSTANCE.getQuestProcedure();

		/**
		 * The meta object literal for the '<em><b>Variant</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QUEST_PROCEDURE__VARIANT = eINSTANCE.getQuestProcedure_Variant();

		/**
		 * The meta object literal for the '<em><b>Prior Mean</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QUEST_PROCEDURE__PRIOR_MEAN = eINSTANCE.getQuestProcedure_PriorMean();

		/**
		 * The meta object literal for the '<em><b>Prior Sd</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QUEST_PROCEDURE__PRIOR_SD = eINSTANCE.getQuestProcedure_PriorSd();

		/**
		 * The meta object literal for the '<em><b>Beta</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QUEST_PROCEDURE__BETA = eINSTANCE.getQuestProcedure_Beta();

		/**
		 * The meta object literal for the '<em><b>Lapse Rate</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QUEST_PROCEDURE__LAPSE_RATE = eINSTANCE.getQuestProcedure_LapseRate();

		/**
		 * The meta object literal for the '<em><b>Guess Rate</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QUEST_PROCEDURE__GUESS_RATE = eINSTANCE.getQuestProcedure_GuessRate();

		/**
		 * The meta object literal for the '<em><b>Grain</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QUEST_PROCEDURE__GRAIN = eINSTANCE.getQuestProcedure_Grain();

		/**
		 * The meta object literal for the '<em><b>Range</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QUEST_PROCEDURE__RANGE = eINSTANCE.getQuestProcedure_Range();

		/**
		 * The meta object literal for the '<em><b>Placement</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QUEST_PROCEDURE__PLACEMENT = eINSTANCE.getQuestProcedure_Placement();

		/**
		 * The meta object literal for the '<em><b>Valid Quest Settings</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation QUEST_PROCEDURE___VALID_QUEST_SETTINGS__DIAGNOSTICCHAIN_MAP = eINSTANCE.getQuestProcedure__ValidQuestSettings__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '{@link limen.model.impl.PsiProcedureImpl <em>Psi Procedure</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.PsiProcedureImpl
		 * @see limen.model.impl.LimenPackageImpl#getPsiProcedure()
		 * @generated
		 */
		EClass PSI_PROCEDURE = eINSTANCE.getPsiProcedure();

		/**
		 * The meta object literal for the '<em><b>Family</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PSI_PROCEDURE__FAMILY = eINSTANCE.getPsiProcedure_Family();

		/**
		 * The meta object literal for the '<em><b>Threshold Minimum</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PSI_PROCEDURE__THRESHOLD_MINIMUM = eINSTANCE.getPsiProcedure_ThresholdMinimum();

		/**
		 * The meta object literal for the '<em><b>Threshold Maximum</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PSI_PROCEDURE__THRESHOLD_MAXIMUM = eINSTANCE.getPsiProcedure_ThresholdMaximum();

		/**
		 * The meta object literal for the '<em><b>Threshold Count</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PSI_PROCEDURE__THRESHOLD_COUNT = eINSTANCE.getPsiProcedure_ThresholdCount();

		/**
		 * The meta object literal for the '<em><b>Slope Minimum</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PSI_PROCEDURE__SLOPE_MINIMUM = eINSTANCE.getPsiProcedure_SlopeMinimum();

		/**
		 * The meta object literal for the '<em><b>Slope Maximum</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PSI_PROCEDURE__SLOPE_MAXIMUM = eINSTANCE.getPsiProcedure_SlopeMaximum();

		/**
		 * The meta object literal for the '<em><b>Slope Count</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PSI_PROCEDURE__SLOPE_COUNT = eINSTANCE.getPsiProcedure_SlopeCount();

		/**
		 * The meta object literal for the '<em><b>Stimulus Minimum</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PSI_PROCEDURE__STIMULUS_MINIMUM = eINSTANCE.getPsiProcedure_StimulusMinimum();

		/**
		 * The meta object literal for the '<em><b>Stimulus Maximum</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PSI_PROCEDURE__STIMULUS_MAXIMUM = eINSTANCE.getPsiProcedure_StimulusMaximum();

		/**
		 * The meta object literal for the '<em><b>Stimulus Count</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PSI_PROCEDURE__STIMULUS_COUNT = eINSTANCE.getPsiProcedure_StimulusCount();

		/**
		 * The meta object literal for the '<em><b>Lapse Mode</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PSI_PROCEDURE__LAPSE_MODE = eINSTANCE.getPsiProcedure_LapseMode();

		/**
		 * The meta object literal for the '<em><b>Lapse Rate</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PSI_PROCEDURE__LAPSE_RATE = eINSTANCE.getPsiProcedure_LapseRate();

		/**
		 * The meta object literal for the '<em><b>Lapse Minimum</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PSI_PROCEDURE__LAPSE_MINIMUM = eINSTANCE.getPsiProcedure_LapseMinimum();

		/**
		 * The meta object literal for the '<em><b>Lapse Maximum</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PSI_PROCEDURE__LAPSE_MAXIMUM = eINSTANCE.getPsiProcedure_LapseMaximum();

		/**
		 * The meta object literal for the '<em><b>Lapse Count</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PSI_PROCEDURE__LAPSE_COUNT = eINSTANCE.getPsiProcedure_LapseCount();

		/**
		 * The meta object literal for the '<em><b>Guess Rate</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PSI_PROCEDURE__GUESS_RATE = eINSTANCE.getPsiProcedure_GuessRate();

		/**
		 * The meta object literal for the '<em><b>Valid Psi Grids</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation PSI_PROCEDURE___VALID_PSI_GRIDS__DIAGNOSTICCHAIN_MAP = eINSTANCE.getPsiProcedure__ValidPsiGrids__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '{@link limen.model.impl.ConstantStimuliProcedureImpl <em>Constant Stimuli Procedure</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.ConstantStimuliProcedureImpl
		 * @see limen.model.impl.LimenPackageImpl#getConstantStimuliProcedure()
		 * @generated
		 */
		EClass CONSTANT_STIMULI_PROCEDURE = eINSTANCE.getConstantStimuliProcedure();

		/**
		 * The meta object literal for the '<em><b>Values</b></em>' attribute list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONSTANT_STIMULI_PROCEDURE__VALUES = eINSTANCE.getConstantStimuliProcedure_Values();

		/**
		 * The meta object literal for the '<em><b>Repetitions Per Value</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONSTANT_STIMULI_PROCEDURE__REPETITIONS_PER_VALUE = eINSTANCE.getConstantStimuliProcedure_RepetitionsPerValue();

		/**
		 * The meta object literal for the '<em><b>Blocked Shuffle</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONSTANT_STIMULI_PROCEDURE__BLOCKED_SHUFFLE = eINSTANCE.getConstantStimuliProcedure_BlockedShuffle();

		/**
		 * The meta object literal for the '<em><b>Valid Constant Stimuli</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation CONSTANT_STIMULI_PROCEDURE___VALID_CONSTANT_STIMULI__DIAGNOSTICCHAIN_MAP = eINSTANCE.getConstantStimuliProcedure__ValidConstantStimuli__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '{@link limen.model.impl.ContributedProcedureImpl <em>Contributed Procedure</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.ContributedProcedureImpl
		 * @see limen.model.impl.LimenPackageImpl#getContributedProcedure()
		 * @generated
		 */
		EClass CONTRIBUTED_PROCEDURE = eINSTANCE.getContributedProcedure();

		/**
		 * The meta object literal for the '<em><b>Settings</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference CONTRIBUTED_PROCEDURE__SETTINGS = eINSTANCE.getContributedProcedure_Settings();

		/**
		 * The meta object literal for the '{@link limen.model.impl.StoppingRuleImpl <em>Stopping Rule</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.StoppingRuleImpl
		 * @see limen.model.impl.LimenPackageImpl#getStoppingRule()
		 * @generated
		 */
		EClass STOPPING_RULE = eINSTANCE.getStoppingRule();

		/**
		 * The meta object literal for the '<em><b>Maximum Reversals</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute STOPPING_RULE__MAXIMUM_REVERSALS = eINSTANCE.getStoppingRule_MaximumReversals();

		/**
		 * The meta object literal for the '<em><b>Maximum Trials</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute STOPPING_RULE__MAXIMUM_TRIALS = eINSTANCE.getStoppingRule_MaximumTrials();

		/**
		 * The meta object literal for the '<em><b>Posterior Sd Target</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute STOPPING_RULE__POSTERIOR_SD_TARGET = eINSTANCE.getStoppingRule_PosteriorSdTarget();

		/**
		 * The meta object literal for the '<em><b>Can End</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation STOPPING_RULE___CAN_END__DIAGNOSTICCHAIN_MAP = eINSTANCE.getStoppingRule__CanEnd__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '{@link limen.model.impl.SettingsGroupImpl <em>Settings Group</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.SettingsGroupImpl
		 * @see limen.model.impl.LimenPackageImpl#getSettingsGroup()
		 * @generated
		 */
		EClass SETTINGS_GROUP = eINSTANCE.getSettingsGroup();

		/**
		 * The meta object literal for the '<em><b>Contributor Id</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SETTINGS_GROUP__CONTRIBUTOR_ID = eINSTANCE.getSettingsGroup_ContributorId();

		/**
		 * The meta object literal for the '<em><b>Entries</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference SETTINGS_GROUP__ENTRIES = eINSTANCE.getSettingsGroup_Entries();

		/**
		 * The meta object literal for the '<em><b>Valid Settings</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation SETTINGS_GROUP___VALID_SETTINGS__DIAGNOSTICCHAIN_MAP = eINSTANCE.getSettingsGroup__ValidSettings__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '{@link limen.model.impl.SettingImpl <em>Setting</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.SettingImpl
		 * @see limen.model.impl.LimenPackageImpl#getSetting()
		 * @generated
		 */
		EClass SETTING = eINSTANCE.getSetting();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SETTING__NAME = eINSTANCE.getSetting_Name();

		/**
		 * The meta object literal for the '<em><b>Value</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SETTING__VALUE = eINSTANCE.getSetting_Value();

		/**
		 * The meta object literal for the '<em><b>Type</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SETTING__TYPE = eINSTANCE.getSetting_Type();

		/**
		 * The meta object literal for the '{@link limen.model.impl.CalibrationImpl <em>Calibration</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.CalibrationImpl
		 * @see limen.model.impl.LimenPackageImpl#getCalibration()
		 * @generated
		 */
		EClass CALIBRATION = eINSTANCE.getCalibration();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CALIBRATION__NAME = eINSTANCE.getCalibration_Name();

		/**
		 * The meta object literal for the '<em><b>Device</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CALIBRATION__DEVICE = eINSTANCE.getCalibration_Device();

		/**
		 * The meta object literal for the '<em><b>Transducer</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CALIBRATION__TRANSDUCER = eINSTANCE.getCalibration_Transducer();

		/**
		 * The meta object literal for the '<em><b>Reference Level Dbfs</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CALIBRATION__REFERENCE_LEVEL_DBFS = eINSTANCE.getCalibration_ReferenceLevelDbfs();

		/**
		 * The meta object literal for the '<em><b>Sample Rate Hz</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CALIBRATION__SAMPLE_RATE_HZ = eINSTANCE.getCalibration_SampleRateHz();

		/**
		 * The meta object literal for the '<em><b>Ceiling Db Spl</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CALIBRATION__CEILING_DB_SPL = eINSTANCE.getCalibration_CeilingDbSpl();

		/**
		 * The meta object literal for the '<em><b>Measured By</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CALIBRATION__MEASURED_BY = eINSTANCE.getCalibration_MeasuredBy();

		/**
		 * The meta object literal for the '<em><b>Measured On</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CALIBRATION__MEASURED_ON = eINSTANCE.getCalibration_MeasuredOn();

		/**
		 * The meta object literal for the '<em><b>Demonstration Only</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CALIBRATION__DEMONSTRATION_ONLY = eINSTANCE.getCalibration_DemonstrationOnly();

		/**
		 * The meta object literal for the '<em><b>Notes</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CALIBRATION__NOTES = eINSTANCE.getCalibration_Notes();

		/**
		 * The meta object literal for the '<em><b>Points</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference CALIBRATION__POINTS = eINSTANCE.getCalibration_Points();

		/**
		 * The meta object literal for the '<em><b>Valid Calibration</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation CALIBRATION___VALID_CALIBRATION__DIAGNOSTICCHAIN_MAP = eINSTANCE.getCalibration__ValidCalibration__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '{@link limen.model.impl.CalibrationPointImpl <em>Calibration Point</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.CalibrationPointImpl
		 * @see limen.model.impl.LimenPackageImpl#getCalibrationPoint()
		 * @generated
		 */
		EClass CALIBRATION_POINT = eINSTANCE.getCalibrationPoint();

		/**
		 * The meta object literal for the '<em><b>Frequency Hz</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CALIBRATION_POINT__FREQUENCY_HZ = eINSTANCE.getCalibrationPoint_FrequencyHz();

		/**
		 * The meta object literal for the '<em><b>Measured Db Spl</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CALIBRATION_POINT__MEASURED_DB_SPL = eINSTANCE.getCalibrationPoint_MeasuredDbSpl();

		/**
		 * The meta object literal for the '{@link limen.model.impl.SessionHeaderImpl <em>Session Header</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.SessionHeaderImpl
		 * @see limen.model.impl.LimenPackageImpl#getSessionHeader()
		 * @generated
		 */
		EClass SESSION_HEADER = eINSTANCE.getSessionHeader();

		/**
		 * The meta object literal for the '<em><b>Participant</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SESSION_HEADER__PARTICIPANT = eINSTANCE.getSessionHeader_Participant();

		/**
		 * The meta object literal for the '<em><b>Battery</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference SESSION_HEADER__BATTERY = eINSTANCE.getSessionHeader_Battery();

		/**
		 * The meta object literal for the '<em><b>Calibration</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference SESSION_HEADER__CALIBRATION = eINSTANCE.getSessionHeader_Calibration();

		/**
		 * The meta object literal for the '<em><b>Device</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SESSION_HEADER__DEVICE = eINSTANCE.getSessionHeader_Device();

		/**
		 * The meta object literal for the '<em><b>Random Seed</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SESSION_HEADER__RANDOM_SEED = eINSTANCE.getSessionHeader_RandomSeed();

		/**
		 * The meta object literal for the '<em><b>Software Version</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SESSION_HEADER__SOFTWARE_VERSION = eINSTANCE.getSessionHeader_SoftwareVersion();

		/**
		 * The meta object literal for the '<em><b>Start Time</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SESSION_HEADER__START_TIME = eINSTANCE.getSessionHeader_StartTime();

		/**
		 * The meta object literal for the '<em><b>End Time</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SESSION_HEADER__END_TIME = eINSTANCE.getSessionHeader_EndTime();

		/**
		 * The meta object literal for the '<em><b>Status</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SESSION_HEADER__STATUS = eINSTANCE.getSessionHeader_Status();

		/**
		 * The meta object literal for the '<em><b>Latin Square Row</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SESSION_HEADER__LATIN_SQUARE_ROW = eINSTANCE.getSessionHeader_LatinSquareRow();

		/**
		 * The meta object literal for the '<em><b>Step Order</b></em>' reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference SESSION_HEADER__STEP_ORDER = eINSTANCE.getSessionHeader_StepOrder();

		/**
		 * The meta object literal for the '<em><b>Exposure</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference SESSION_HEADER__EXPOSURE = eINSTANCE.getSessionHeader_Exposure();

		/**
		 * The meta object literal for the '<em><b>Valid Session</b></em>' operation.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EOperation SESSION_HEADER___VALID_SESSION__DIAGNOSTICCHAIN_MAP = eINSTANCE.getSessionHeader__ValidSession__DiagnosticChain_Map();

		/**
		 * The meta object literal for the '{@link limen.model.impl.ExposureEstimateImpl <em>Exposure Estimate</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.impl.ExposureEstimateImpl
		 * @see limen.model.impl.LimenPackageImpl#getExposureEstimate()
		 * @generated
		 */
		EClass EXPOSURE_ESTIMATE = eINSTANCE.getExposureEstimate();

		/**
		 * The meta object literal for the '<em><b>Peak Level Db Spl</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute EXPOSURE_ESTIMATE__PEAK_LEVEL_DB_SPL = eINSTANCE.getExposureEstimate_PeakLevelDbSpl();

		/**
		 * The meta object literal for the '<em><b>Equivalent Level Db Spl</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute EXPOSURE_ESTIMATE__EQUIVALENT_LEVEL_DB_SPL = eINSTANCE.getExposureEstimate_EquivalentLevelDbSpl();

		/**
		 * The meta object literal for the '<em><b>Sound On Seconds</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute EXPOSURE_ESTIMATE__SOUND_ON_SECONDS = eINSTANCE.getExposureEstimate_SoundOnSeconds();

		/**
		 * The meta object literal for the '<em><b>Niosh Dose Percent</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute EXPOSURE_ESTIMATE__NIOSH_DOSE_PERCENT = eINSTANCE.getExposureEstimate_NioshDosePercent();

		/**
		 * The meta object literal for the '<em><b>Osha Dose Percent</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute EXPOSURE_ESTIMATE__OSHA_DOSE_PERCENT = eINSTANCE.getExposureEstimate_OshaDosePercent();

		/**
		 * The meta object literal for the '{@link limen.model.EarlyResponsePolicy <em>Early Response Policy</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.EarlyResponsePolicy
		 * @see limen.model.impl.LimenPackageImpl#getEarlyResponsePolicy()
		 * @generated
		 */
		EEnum EARLY_RESPONSE_POLICY = eINSTANCE.getEarlyResponsePolicy();

		/**
		 * The meta object literal for the '{@link limen.model.OrderingPolicy <em>Ordering Policy</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.OrderingPolicy
		 * @see limen.model.impl.LimenPackageImpl#getOrderingPolicy()
		 * @generated
		 */
		EEnum ORDERING_POLICY = eINSTANCE.getOrderingPolicy();

		/**
		 * The meta object literal for the '{@link limen.model.StimulusKind <em>Stimulus Kind</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.StimulusKind
		 * @see limen.model.impl.LimenPackageImpl#getStimulusKind()
		 * @generated
		 */
		EEnum STIMULUS_KIND = eINSTANCE.getStimulusKind();

		/**
		 * The meta object literal for the '{@link limen.model.Ear <em>Ear</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.Ear
		 * @see limen.model.impl.LimenPackageImpl#getEar()
		 * @generated
		 */
		EEnum EAR = eINSTANCE.getEar();

		/**
		 * The meta object literal for the '{@link limen.model.QuantityUnit <em>Quantity Unit</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.QuantityUnit
		 * @see limen.model.impl.LimenPackageImpl#getQuantityUnit()
		 * @generated
		 */
		EEnum QUANTITY_UNIT = eINSTANCE.getQuantityUnit();

		/**
		 * The meta object literal for the '{@link limen.model.Scale <em>Scale</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.Scale
		 * @see limen.model.impl.LimenPackageImpl#getScale()
		 * @generated
		 */
		EEnum SCALE = eINSTANCE.getScale();

		/**
		 * The meta object literal for the '{@link limen.model.StepMode <em>Step Mode</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.StepMode
		 * @see limen.model.impl.LimenPackageImpl#getStepMode()
		 * @generated
		 */
		EEnum STEP_MODE = eINSTANCE.getStepMode();

		/**
		 * The meta object literal for the '{@link limen.model.BayesianVariant <em>Bayesian Variant</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.BayesianVariant
		 * @see limen.model.impl.LimenPackageImpl#getBayesianVariant()
		 * @generated
		 */
		EEnum BAYESIAN_VARIANT = eINSTANCE.getBayesianVariant();

		/**
		 * The meta object literal for the '{@link limen.model.EstimatePlacement <em>Estimate Placement</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.EstimatePlacement
		 * @see limen.model.impl.LimenPackageImpl#getEstimatePlacement()
		 * @generated
		 */
		EEnum ESTIMATE_PLACEMENT = eINSTANCE.getEstimatePlacement();

		/**
		 * The meta object literal for the '{@link limen.model.LapseMode <em>Lapse Mode</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.LapseMode
		 * @see limen.model.impl.LimenPackageImpl#getLapseMode()
		 * @generated
		 */
		EEnum LAPSE_MODE = eINSTANCE.getLapseMode();

		/**
		 * The meta object literal for the '{@link limen.model.PsychometricFamily <em>Psychometric Family</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.PsychometricFamily
		 * @see limen.model.impl.LimenPackageImpl#getPsychometricFamily()
		 * @generated
		 */
		EEnum PSYCHOMETRIC_FAMILY = eINSTANCE.getPsychometricFamily();

		/**
		 * The meta object literal for the '{@link limen.model.NoiseSpectrum <em>Noise Spectrum</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.NoiseSpectrum
		 * @see limen.model.impl.LimenPackageImpl#getNoiseSpectrum()
		 * @generated
		 */
		EEnum NOISE_SPECTRUM = eINSTANCE.getNoiseSpectrum();

		/**
		 * The meta object literal for the '{@link limen.model.SettingType <em>Setting Type</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.SettingType
		 * @see limen.model.impl.LimenPackageImpl#getSettingType()
		 * @generated
		 */
		EEnum SETTING_TYPE = eINSTANCE.getSettingType();

		/**
		 * The meta object literal for the '{@link limen.model.SessionStatus <em>Session Status</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see limen.model.SessionStatus
		 * @see limen.model.impl.LimenPackageImpl#getSessionStatus()
		 * @generated
		 */
		EEnum SESSION_STATUS = eINSTANCE.getSessionStatus();

		/**
		 * The meta object literal for the '<em>Instant</em>' data type.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see java.time.Instant
		 * @see limen.model.impl.LimenPackageImpl#getInstant()
		 * @generated
		 */
		EDataType INSTANT = eINSTANCE.getInstant();

		/**
		 * The meta object literal for the '<em>Local Date</em>' data type.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see java.time.LocalDate
		 * @see limen.model.impl.LimenPackageImpl#getLocalDate()
		 * @generated
		 */
		EDataType LOCAL_DATE = eINSTANCE.getLocalDate();

	}

} //LimenPackage
