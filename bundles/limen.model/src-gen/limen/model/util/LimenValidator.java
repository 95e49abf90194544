/**
 */
package limen.model.util;

import java.time.Instant;
import java.time.LocalDate;

import java.util.Map;

import limen.model.*;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.ResourceLocator;

import org.eclipse.emf.ecore.EPackage;

import org.eclipse.emf.ecore.util.EObjectValidator;

/**
 * <!-- begin-user-doc -->
 * The <b>Validator</b> for the model.
 * <!-- end-user-doc -->
 * @see limen.model.LimenPackage
 * @generated
 */
public class LimenValidator extends EObjectValidator {
	/**
	 * The cached model package
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final LimenValidator INSTANCE = new LimenValidator();

	/**
	 * A constant for the {@link org.eclipse.emf.common.util.Diagnostic#getSource() source} of diagnostic {@link org.eclipse.emf.common.util.Diagnostic#getCode() codes} from this package.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.eclipse.emf.common.util.Diagnostic#getSource()
	 * @see org.eclipse.emf.common.util.Diagnostic#getCode()
	 * @generated
	 */
	public static final String DIAGNOSTIC_SOURCE = "limen.model";

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Unique Step Ids' of 'Battery'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int BATTERY__UNIQUE_STEP_IDS = 1;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Valid Ordering' of 'Battery'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int BATTERY__VALID_ORDERING = 2;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Valid Breaks' of 'Battery'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int BATTERY__VALID_BREAKS = 3;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'No Reference Cycles' of 'Battery'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int BATTERY__NO_REFERENCE_CYCLES = 4;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Consistent Quantity' of 'Step'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int STEP__CONSISTENT_QUANTITY = 5;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Levels Within Ceiling' of 'Step'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int STEP__LEVELS_WITHIN_CEILING = 6;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Frequencies Within Range' of 'Step'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int STEP__FREQUENCIES_WITHIN_RANGE = 7;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Valid Timing' of 'Task'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int TASK__VALID_TIMING = 8;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Valid Intervals' of 'Forced Choice Task'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int FORCED_CHOICE_TASK__VALID_INTERVALS = 9;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Valid Catch Trials' of 'Yes No Task'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int YES_NO_TASK__VALID_CATCH_TRIALS = 10;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Valid Tone' of 'Stimulus'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int STIMULUS__VALID_TONE = 11;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Valid Standard Level' of 'Stimulus'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int STIMULUS__VALID_STANDARD_LEVEL = 12;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Valid Masker' of 'Stimulus'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int STIMULUS__VALID_MASKER = 13;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Valid Reference' of 'Relative Level'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int RELATIVE_LEVEL__VALID_REFERENCE = 14;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Valid Limits' of 'Staircase Procedure'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int STAIRCASE_PROCEDURE__VALID_LIMITS = 15;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Valid Up Down Rule' of 'Transformed Up Down Procedure'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int TRANSFORMED_UP_DOWN_PROCEDURE__VALID_UP_DOWN_RULE = 16;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Valid Weighted Steps' of 'Weighted Up Down Procedure'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int WEIGHTED_UP_DOWN_PROCEDURE__VALID_WEIGHTED_STEPS = 17;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Valid Pest Steps' of 'Pest Procedure'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int PEST_PROCEDURE__VALID_PEST_STEPS = 18;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Valid Quest Settings' of 'Quest Procedure'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int QUEST_PROCEDURE__VALID_QUEST_SETTINGS = 19;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Valid Psi Grids' of 'Psi Procedure'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int PSI_PROCEDURE__VALID_PSI_GRIDS = 20;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Valid Constant Stimuli' of 'Constant Stimuli Procedure'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int CONSTANT_STIMULI_PROCEDURE__VALID_CONSTANT_STIMULI = 21;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Can End' of 'Stopping Rule'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int STOPPING_RULE__CAN_END = 22;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Valid Settings' of 'Settings Group'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int SETTINGS_GROUP__VALID_SETTINGS = 23;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Valid Calibration' of 'Calibration'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int CALIBRATION__VALID_CALIBRATION = 24;

	/**
	 * The {@link org.eclipse.emf.common.util.Diagnostic#getCode() code} for constraint 'Valid Session' of 'Session Header'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final int SESSION_HEADER__VALID_SESSION = 25;

	/**
	 * A constant with a fixed name that can be used as the base value for additional hand written constants.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final int GENERATED_DIAGNOSTIC_CODE_COUNT = 25;

	/**
	 * A constant with a fixed name that can be used as the base value for additional hand written constants in a derived class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected static final int DIAGNOSTIC_CODE_COUNT = GENERATED_DIAGNOSTIC_CODE_COUNT;

	/**
	 * Creates an instance of the switch.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public LimenValidator() {
		super();
	}

	/**
	 * Returns the package of this validator switch.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EPackage getEPackage() {
	  return LimenPackage.eINSTANCE;
	}

	/**
	 * Calls <code>validateXXX</code> for the corresponding classifier of the model.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected boolean validate(int classifierID, Object value, DiagnosticChain diagnostics, Map<Object, Object> context) {
		switch (classifierID) {
			case LimenPackage.LIMEN_DOCUMENT:
				return validateLimenDocument((LimenDocument)value, diagnostics, context);
			case LimenPackage.BATTERY:
				return validateBattery((Battery)value, diagnostics, context);
			case LimenPackage.BREAK:
				return validateBreak((Break)value, diagnostics, context);
			case LimenPackage.STEP:
				return validateStep((Step)value, diagnostics, context);
			case LimenPackage.TASK:
				return validateTask((Task)value, diagnostics, context);
			case LimenPackage.FORCED_CHOICE_TASK:
				return validateForcedChoiceTask((ForcedChoiceTask)value, diagnostics, context);
			case LimenPackage.YES_NO_TASK:
				return validateYesNoTask((YesNoTask)value, diagnostics, context);
			case LimenPackage.STIMULUS:
				return validateStimulus((Stimulus)value, diagnostics, context);
			case LimenPackage.LEVEL:
				return validateLevel((Level)value, diagnostics, context);
			case LimenPackage.ABSOLUTE_LEVEL:
				return validateAbsoluteLevel((AbsoluteLevel)value, diagnostics, context);
			case LimenPackage.RELATIVE_LEVEL:
				return validateRelativeLevel((RelativeLevel)value, diagnostics, context);
			case LimenPackage.MASKER_NOISE:
				return validateMaskerNoise((MaskerNoise)value, diagnostics, context);
			case LimenPackage.VARIED_QUANTITY:
				return validateVariedQuantity((VariedQuantity)value, diagnostics, context);
			case LimenPackage.TRACK:
				return validateTrack((Track)value, diagnostics, context);
			case LimenPackage.PROCEDURE:
				return validateProcedure((Procedure)value, diagnostics, context);
			case LimenPackage.STAIRCASE_PROCEDURE:
				return validateStaircaseProcedure((StaircaseProcedure)value, diagnostics, context);
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE:
				return validateTransformedUpDownProcedure((TransformedUpDownProcedure)value, diagnostics, context);
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE:
				return validateWeightedUpDownProcedure((WeightedUpDownProcedure)value, diagnostics, context);
			case LimenPackage.PEST_PROCEDURE:
				return validatePestProcedure((PestProcedure)value, diagnostics, context);
			case LimenPackage.QUEST_PROCEDURE:
				return validateQuestProcedure((QuestProcedure)value, diagnostics, context);
			case LimenPackage.PSI_PROCEDURE:
				return validatePsiProcedure((PsiProcedure)value, diagnostics, context);
			case LimenPackage.CONSTANT_STIMULI_PROCEDURE:
				return validateConstantStimuliProcedure((ConstantStimuliProcedure)value, diagnostics, context);
			case LimenPackage.CONTRIBUTED_PROCEDURE:
				return validateContributedProcedure((ContributedProcedure)value, diagnostics, context);
			case LimenPackage.STOPPING_RULE:
				return validateStoppingRule((StoppingRule)value, diagnostics, context);
			case LimenPackage.SETTINGS_GROUP:
				return validateSettingsGroup((SettingsGroup)value, diagnostics, context);
			case LimenPackage.SETTING:
				return validateSetting((Setting)value, diagnostics, context);
			case LimenPackage.CALIBRATION:
				return validateCalibration((Calibration)value, diagnostics, context);
			case LimenPackage.CALIBRATION_POINT:
				return validateCalibrationPoint((CalibrationPoint)value, diagnostics, context);
			case LimenPackage.SESSION_HEADER:
				return validateSessionHeader((SessionHeader)value, diagnostics, context);
			case LimenPackage.EXPOSURE_ESTIMATE:
				return validateExposureEstimate((ExposureEstimate)value, diagnostics, context);
			case LimenPackage.EARLY_RESPONSE_POLICY:
				return validateEarlyResponsePolicy((EarlyResponsePolicy)value, diagnostics, context);
			case LimenPackage.ORDERING_POLICY:
				return validateOrderingPolicy((OrderingPolicy)value, diagnostics, context);
			case LimenPackage.STIMULUS_KIND:
				return validateStimulusKind((StimulusKind)value, diagnostics, context);
			case LimenPackage.EAR:
				return validateEar((Ear)value, diagnostics, context);
			case LimenPackage.QUANTITY_UNIT:
				return validateQuantityUnit((QuantityUnit)value, diagnostics, context);
			case LimenPackage.SCALE:
				return validateScale((Scale)value, diagnostics, context);
			case LimenPackage.STEP_MODE:
				return validateStepMode((StepMode)value, diagnostics, context);
			case LimenPackage.BAYESIAN_VARIANT:
				return validateBayesianVariant((BayesianVariant)value, diagnostics, context);
			case LimenPackage.ESTIMATE_PLACEMENT:
				return validateEstimatePlacement((EstimatePlacement)value, diagnostics, context);
			case LimenPackage.LAPSE_MODE:
				return validateLapseMode((LapseMode)value, diagnostics, context);
			case LimenPackage.PSYCHOMETRIC_FAMILY:
				return validatePsychometricFamily((PsychometricFamily)value, diagnostics, context);
			case LimenPackage.NOISE_SPECTRUM:
				return validateNoiseSpectrum((NoiseSpectrum)value, diagnostics, context);
			case LimenPackage.SETTING_TYPE:
				return validateSettingType((SettingType)value, diagnostics, context);
			case LimenPackage.SESSION_STATUS:
				return validateSessionStatus((SessionStatus)value, diagnostics, context);
			case LimenPackage.INSTANT:
				return validateInstant((Instant)value, diagnostics, context);
			case LimenPackage.LOCAL_DATE:
				return validateLocalDate((LocalDate)value, diagnostics, context);
			default:
				return true;
		}
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateLimenDocument(LimenDocument limenDocument, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return validate_EveryDefaultConstraint(limenDocument, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateBattery(Battery battery, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(battery, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(battery, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(battery, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(battery, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(battery, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(battery, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(battery, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(battery, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(battery, diagnostics, context);
		if (result || diagnostics != null) result &= validateBattery_uniqueStepIds(battery, diagnostics, context);
		if (result || diagnostics != null) result &= validateBattery_validOrdering(battery, diagnostics, context);
		if (result || diagnostics != null) result &= validateBattery_validBreaks(battery, diagnostics, context);
		if (result || diagnostics != null) result &= validateBattery_noReferenceCycles(battery, diagnostics, context);
		return result;
	}

	/**
	 * Validates the uniqueStepIds constraint of '<em>Battery</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateBattery_uniqueStepIds(Battery battery, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return battery.uniqueStepIds(diagnostics, context);
	}

	/**
	 * Validates the validOrdering constraint of '<em>Battery</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateBattery_validOrdering(Battery battery, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return battery.validOrdering(diagnostics, context);
	}

	/**
	 * Validates the validBreaks constraint of '<em>Battery</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateBattery_validBreaks(Battery battery, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return battery.validBreaks(diagnostics, context);
	}

	/**
	 * Validates the noReferenceCycles constraint of '<em>Battery</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateBattery_noReferenceCycles(Battery battery, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return battery.noReferenceCycles(diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateBreak(Break break_, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return validate_EveryDefaultConstraint(break_, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateStep(Step step, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(step, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(step, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(step, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(step, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(step, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(step, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(step, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(step, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(step, diagnostics, context);
		if (result || diagnostics != null) result &= validateStep_consistentQuantity(step, diagnostics, context);
		if (result || diagnostics != null) result &= validateStep_levelsWithinCeiling(step, diagnostics, context);
		if (result || diagnostics != null) result &= validateStep_frequenciesWithinRange(step, diagnostics, context);
		return result;
	}

	/**
	 * Validates the consistentQuantity constraint of '<em>Step</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateStep_consistentQuantity(Step step, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return step.consistentQuantity(diagnostics, context);
	}

	/**
	 * Validates the levelsWithinCeiling constraint of '<em>Step</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateStep_levelsWithinCeiling(Step step, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return step.levelsWithinCeiling(diagnostics, context);
	}

	/**
	 * Validates the frequenciesWithinRange constraint of '<em>Step</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateStep_frequenciesWithinRange(Step step, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return step.frequenciesWithinRange(diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateTask(Task task, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(task, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(task, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(task, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(task, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(task, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(task, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(task, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(task, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(task, diagnostics, context);
		if (result || diagnostics != null) result &= validateTask_validTiming(task, diagnostics, context);
		return result;
	}

	/**
	 * Validates the validTiming constraint of '<em>Task</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateTask_validTiming(Task task, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return task.validTiming(diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateForcedChoiceTask(ForcedChoiceTask forcedChoiceTask, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(forcedChoiceTask, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(forcedChoiceTask, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(forcedChoiceTask, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(forcedChoiceTask, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(forcedChoiceTask, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(forcedChoiceTask, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(forcedChoiceTask, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(forcedChoiceTask, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(forcedChoiceTask, diagnostics, context);
		if (result || diagnostics != null) result &= validateTask_validTiming(forcedChoiceTask, diagnostics, context);
		if (result || diagnostics != null) result &= validateForcedChoiceTask_validIntervals(forcedChoiceTask, diagnostics, context);
		return result;
	}

	/**
	 * Validates the validIntervals constraint of '<em>Forced Choice Task</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateForcedChoiceTask_validIntervals(ForcedChoiceTask forcedChoiceTask, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return forcedChoiceTask.validIntervals(diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateYesNoTask(YesNoTask yesNoTask, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(yesNoTask, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(yesNoTask, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(yesNoTask, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(yesNoTask, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(yesNoTask, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(yesNoTask, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(yesNoTask, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(yesNoTask, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(yesNoTask, diagnostics, context);
		if (result || diagnostics != null) result &= validateTask_validTiming(yesNoTask, diagnostics, context);
		if (result || diagnostics != null) result &= validateYesNoTask_validCatchTrials(yesNoTask, diagnostics, context);
		return result;
	}

	/**
	 * Validates the validCatchTrials constraint of '<em>Yes No Task</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateYesNoTask_validCatchTrials(YesNoTask yesNoTask, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return yesNoTask.validCatchTrials(diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateStimulus(Stimulus stimulus, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(stimulus, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(stimulus, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(stimulus, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(stimulus, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(stimulus, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(stimulus, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(stimulus, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(stimulus, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(stimulus, diagnostics, context);
		if (result || diagnostics != null) result &= validateStimulus_validTone(stimulus, diagnostics, context);
		if (result || diagnostics != null) result &= validateStimulus_validStandardLevel(stimulus, diagnostics, context);
		if (result || diagnostics != null) result &= validateStimulus_validMasker(stimulus, diagnostics, context);
		return result;
	}

	/**
	 * Validates the validTone constraint of '<em>Stimulus</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateStimulus_validTone(Stimulus stimulus, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return stimulus.validTone(diagnostics, context);
	}

	/**
	 * Validates the validStandardLevel constraint of '<em>Stimulus</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateStimulus_validStandardLevel(Stimulus stimulus, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return stimulus.validStandardLevel(diagnostics, context);
	}

	/**
	 * Validates the validMasker constraint of '<em>Stimulus</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateStimulus_validMasker(Stimulus stimulus, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return stimulus.validMasker(diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateLevel(Level level, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return validate_EveryDefaultConstraint(level, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateAbsoluteLevel(AbsoluteLevel absoluteLevel, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return validate_EveryDefaultConstraint(absoluteLevel, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateRelativeLevel(RelativeLevel relativeLevel, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(relativeLevel, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(relativeLevel, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(relativeLevel, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(relativeLevel, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(relativeLevel, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(relativeLevel, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(relativeLevel, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(relativeLevel, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(relativeLevel, diagnostics, context);
		if (result || diagnostics != null) result &= validateRelativeLevel_validReference(relativeLevel, diagnostics, context);
		return result;
	}

	/**
	 * Validates the validReference constraint of '<em>Relative Level</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateRelativeLevel_validReference(RelativeLevel relativeLevel, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return relativeLevel.validReference(diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateMaskerNoise(MaskerNoise maskerNoise, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return validate_EveryDefaultConstraint(maskerNoise, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateVariedQuantity(VariedQuantity variedQuantity, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return validate_EveryDefaultConstraint(variedQuantity, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateTrack(Track track, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return validate_EveryDefaultConstraint(track, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateProcedure(Procedure procedure, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return validate_EveryDefaultConstraint(procedure, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateStaircaseProcedure(StaircaseProcedure staircaseProcedure, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(staircaseProcedure, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(staircaseProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(staircaseProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(staircaseProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(staircaseProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(staircaseProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(staircaseProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(staircaseProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(staircaseProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validateStaircaseProcedure_validLimits(staircaseProcedure, diagnostics, context);
		return result;
	}

	/**
	 * Validates the validLimits constraint of '<em>Staircase Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateStaircaseProcedure_validLimits(StaircaseProcedure staircaseProcedure, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return staircaseProcedure.validLimits(diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateTransformedUpDownProcedure(TransformedUpDownProcedure transformedUpDownProcedure, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(transformedUpDownProcedure, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(transformedUpDownProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(transformedUpDownProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(transformedUpDownProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(transformedUpDownProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(transformedUpDownProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(transformedUpDownProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(transformedUpDownProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(transformedUpDownProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validateStaircaseProcedure_validLimits(transformedUpDownProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validateTransformedUpDownProcedure_validUpDownRule(transformedUpDownProcedure, diagnostics, context);
		return result;
	}

	/**
	 * Validates the validUpDownRule constraint of '<em>Transformed Up Down Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateTransformedUpDownProcedure_validUpDownRule(TransformedUpDownProcedure transformedUpDownProcedure, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return transformedUpDownProcedure.validUpDownRule(diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateWeightedUpDownProcedure(WeightedUpDownProcedure weightedUpDownProcedure, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(weightedUpDownProcedure, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(weightedUpDownProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(weightedUpDownProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(weightedUpDownProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(weightedUpDownProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(weightedUpDownProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(weightedUpDownProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(weightedUpDownProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(weightedUpDownProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validateStaircaseProcedure_validLimits(weightedUpDownProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validateWeightedUpDownProcedure_validWeightedSteps(weightedUpDownProcedure, diagnostics, context);
		return result;
	}

	/**
	 * Validates the validWeightedSteps constraint of '<em>Weighted Up Down Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateWeightedUpDownProcedure_validWeightedSteps(WeightedUpDownProcedure weightedUpDownProcedure, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return weightedUpDownProcedure.validWeightedSteps(diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validatePestProcedure(PestProcedure pestProcedure, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(pestProcedure, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(pestProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(pestProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(pestProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(pestProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(pestProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(pestProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(pestProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(pestProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validateStaircaseProcedure_validLimits(pestProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validatePestProcedure_validPestSteps(pestProcedure, diagnostics, context);
		return result;
	}

	/**
	 * Validates the validPestSteps constraint of '<em>Pest Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validatePestProcedure_validPestSteps(PestProcedure pestProcedure, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return pestProcedure.validPestSteps(diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateQuestProcedure(QuestProcedure questProcedure, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(questProcedure, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(questProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(questProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(questProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(questProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(questProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(questProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(questProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(questProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validateQuestProcedure_validQuestSettings(questProcedure, diagnostics, context);
		return result;
	}

	/**
	 * Validates the validQuestSettings constraint of '<em>Quest Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateQuestProcedure_validQuestSettings(QuestProcedure questProcedure, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return questProcedure.validQuestSettings(diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validatePsiProcedure(PsiProcedure psiProcedure, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(psiProcedure, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(psiProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(psiProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(psiProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(psiProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(psiProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(psiProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(psiProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(psiProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validatePsiProcedure_validPsiGrids(psiProcedure, diagnostics, context);
		return result;
	}

	/**
	 * Validates the validPsiGrids constraint of '<em>Psi Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validatePsiProcedure_validPsiGrids(PsiProcedure psiProcedure, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return psiProcedure.validPsiGrids(diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateConstantStimuliProcedure(ConstantStimuliProcedure constantStimuliProcedure, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(constantStimuliProcedure, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(constantStimuliProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(constantStimuliProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(constantStimuliProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(constantStimuliProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(constantStimuliProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(constantStimuliProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(constantStimuliProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(constantStimuliProcedure, diagnostics, context);
		if (result || diagnostics != null) result &= validateConstantStimuliProcedure_validConstantStimuli(constantStimuliProcedure, diagnostics, context);
		return result;
	}

	/**
	 * Validates the validConstantStimuli constraint of '<em>Constant Stimuli Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateConstantStimuliProcedure_validConstantStimuli(ConstantStimuliProcedure constantStimuliProcedure, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return constantStimuliProcedure.validConstantStimuli(diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateContributedProcedure(ContributedProcedure contributedProcedure, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return validate_EveryDefaultConstraint(contributedProcedure, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateStoppingRule(StoppingRule stoppingRule, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(stoppingRule, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(stoppingRule, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(stoppingRule, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(stoppingRule, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(stoppingRule, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(stoppingRule, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(stoppingRule, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(stoppingRule, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(stoppingRule, diagnostics, context);
		if (result || diagnostics != null) result &= validateStoppingRule_canEnd(stoppingRule, diagnostics, context);
		return result;
	}

	/**
	 * Validates the canEnd constraint of '<em>Stopping Rule</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateStoppingRule_canEnd(StoppingRule stoppingRule, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return stoppingRule.canEnd(diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateSettingsGroup(SettingsGroup settingsGroup, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(settingsGroup, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(settingsGroup, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(settingsGroup, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(settingsGroup, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(settingsGroup, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(settingsGroup, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(settingsGroup, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(settingsGroup, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(settingsGroup, diagnostics, context);
		if (result || diagnostics != null) result &= validateSettingsGroup_validSettings(settingsGroup, diagnostics, context);
		return result;
	}

	/**
	 * Validates the validSettings constraint of '<em>Settings Group</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateSettingsGroup_validSettings(SettingsGroup settingsGroup, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return settingsGroup.validSettings(diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateSetting(Setting setting, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return validate_EveryDefaultConstraint(setting, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateCalibration(Calibration calibration, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(calibration, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(calibration, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(calibration, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(calibration, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(calibration, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(calibration, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(calibration, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(calibration, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(calibration, diagnostics, context);
		if (result || diagnostics != null) result &= validateCalibration_validCalibration(calibration, diagnostics, context);
		return result;
	}

	/**
	 * Validates the validCalibration constraint of '<em>Calibration</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateCalibration_validCalibration(Calibration calibration, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return calibration.validCalibration(diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateCalibrationPoint(CalibrationPoint calibrationPoint, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return validate_EveryDefaultConstraint(calibrationPoint, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateSessionHeader(SessionHeader sessionHeader, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(sessionHeader, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(sessionHeader, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(sessionHeader, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(sessionHeader, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(sessionHeader, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(sessionHeader, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(sessionHeader, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(sessionHeader, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(sessionHeader, diagnostics, context);
		if (result || diagnostics != null) result &= validateSessionHeader_validSession(sessionHeader, diagnostics, context);
		return result;
	}

	/**
	 * Validates the validSession constraint of '<em>Session Header</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateSessionHeader_validSession(SessionHeader sessionHeader, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return sessionHeader.validSession(diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateExposureEstimate(ExposureEstimate exposureEstimate, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return validate_EveryDefaultConstraint(exposureEstimate, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateEarlyResponsePolicy(EarlyResponsePolicy earlyResponsePolicy, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateOrderingPolicy(OrderingPolicy orderingPolicy, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateStimulusKind(StimulusKind stimulusKind, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateEar(Ear ear, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateQuantityUnit(QuantityUnit quantityUnit, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateScale(Scale scale, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateStepMode(StepMode stepMode, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateBayesianVariant(BayesianVariant bayesianVariant, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateEstimatePlacement(EstimatePlacement estimatePlacement, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateLapseMode(LapseMode lapseMode, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validatePsychometricFamily(PsychometricFamily psychometricFamily, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateNoiseSpectrum(NoiseSpectrum noiseSpectrum, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateSettingType(SettingType settingType, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateSessionStatus(SessionStatus sessionStatus, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateInstant(Instant instant, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateLocalDate(LocalDate localDate, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * Returns the resource locator that will be used to fetch messages for this validator's diagnostics.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ResourceLocator getResourceLocator() {
		// TODO
		// Specialize this to return a resource locator for messages specific to this validator.
		// Ensure that you remove @generated or mark it @generated NOT
		return super.getResourceLocator();
	}

} //LimenValidator
