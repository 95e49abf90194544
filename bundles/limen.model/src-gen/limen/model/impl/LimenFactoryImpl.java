/**
 */
package limen.model.impl;

import java.time.Instant;
import java.time.LocalDate;

import limen.model.*;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EDataType;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EPackage;

import org.eclipse.emf.ecore.impl.EFactoryImpl;

import org.eclipse.emf.ecore.plugin.EcorePlugin;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model <b>Factory</b>.
 * <!-- end-user-doc -->
 * @generated
 */
public class LimenFactoryImpl extends EFactoryImpl implements LimenFactory {
	/**
	 * Creates the default factory implementation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static LimenFactory init() {
		try {
			LimenFactory theLimenFactory = (LimenFactory)EPackage.Registry.INSTANCE.getEFactory(LimenPackage.eNS_URI);
			if (theLimenFactory != null) {
				return theLimenFactory;
			}
		}
		catch (Exception exception) {
			EcorePlugin.INSTANCE.log(exception);
		}
		return new LimenFactoryImpl();
	}

	/**
	 * Creates an instance of the factory.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public LimenFactoryImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EObject create(EClass eClass) {
		switch (eClass.getClassifierID()) {
			case LimenPackage.BATTERY: return createBattery();
			case LimenPackage.BREAK: return createBreak();
			case LimenPackage.STEP: return createStep();
			case LimenPackage.FORCED_CHOICE_TASK: return createForcedChoiceTask();
			case LimenPackage.YES_NO_TASK: return createYesNoTask();
			case LimenPackage.STIMULUS: return createStimulus();
			case LimenPackage.ABSOLUTE_LEVEL: return createAbsoluteLevel();
			case LimenPackage.RELATIVE_LEVEL: return createRelativeLevel();
			case LimenPackage.MASKER_NOISE: return createMaskerNoise();
			case LimenPackage.VARIED_QUANTITY: return createVariedQuantity();
			case LimenPackage.TRACK: return createTrack();
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE: return createTransformedUpDownProcedure();
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE: return createWeightedUpDownProcedure();
			case LimenPackage.PEST_PROCEDURE: return createPestProcedure();
			case LimenPackage.QUEST_PROCEDURE: return createQuestProcedure();
			case LimenPackage.PSI_PROCEDURE: return createPsiProcedure();
			case LimenPackage.CONSTANT_STIMULI_PROCEDURE: return createConstantStimuliProcedure();
			case LimenPackage.CONTRIBUTED_PROCEDURE: return createContributedProcedure();
			case LimenPackage.STOPPING_RULE: return createStoppingRule();
			case LimenPackage.SETTINGS_GROUP: return createSettingsGroup();
			case LimenPackage.SETTING: return createSetting();
			case LimenPackage.CALIBRATION: return createCalibration();
			case LimenPackage.CALIBRATION_POINT: return createCalibrationPoint();
			case LimenPackage.SESSION_HEADER: return createSessionHeader();
			case LimenPackage.EXPOSURE_ESTIMATE: return createExposureEstimate();
			default:
				throw new IllegalArgumentException("The class '" + eClass.getName() + "' is not a valid classifier");
		}
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object createFromString(EDataType eDataType, String initialValue) {
		switch (eDataType.getClassifierID()) {
			case LimenPackage.EARLY_RESPONSE_POLICY:
				return createEarlyResponsePolicyFromString(eDataType, initialValue);
			case LimenPackage.ORDERING_POLICY:
				return createOrderingPolicyFromString(eDataType, initialValue);
			case LimenPackage.STIMULUS_KIND:
				return createStimulusKindFromString(eDataType, initialValue);
			case LimenPackage.EAR:
				return createEarFromString(eDataType, initialValue);
			case LimenPackage.QUANTITY_UNIT:
				return createQuantityUnitFromString(eDataType, initialValue);
			case LimenPackage.SCALE:
				return createScaleFromString(eDataType, initialValue);
			case LimenPackage.STEP_MODE:
				return createStepModeFromString(eDataType, initialValue);
			case LimenPackage.BAYESIAN_VARIANT:
				return createBayesianVariantFromString(eDataType, initialValue);
			case LimenPackage.ESTIMATE_PLACEMENT:
				return createEstimatePlacementFromString(eDataType, initialValue);
			case LimenPackage.LAPSE_MODE:
				return createLapseModeFromString(eDataType, initialValue);
			case LimenPackage.PSYCHOMETRIC_FAMILY:
				return createPsychometricFamilyFromString(eDataType, initialValue);
			case LimenPackage.NOISE_SPECTRUM:
				return createNoiseSpectrumFromString(eDataType, initialValue);
			case LimenPackage.SETTING_TYPE:
				return createSettingTypeFromString(eDataType, initialValue);
			case LimenPackage.SESSION_STATUS:
				return createSessionStatusFromString(eDataType, initialValue);
			case LimenPackage.INSTANT:
				return createInstantFromString(eDataType, initialValue);
			case LimenPackage.LOCAL_DATE:
				return createLocalDateFromString(eDataType, initialValue);
			default:
				throw new IllegalArgumentException("The datatype '" + eDataType.getName() + "' is not a valid classifier");
		}
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String convertToString(EDataType eDataType, Object instanceValue) {
		switch (eDataType.getClassifierID()) {
			case LimenPackage.EARLY_RESPONSE_POLICY:
				return convertEarlyResponsePolicyToString(eDataType, instanceValue);
			case LimenPackage.ORDERING_POLICY:
				return convertOrderingPolicyToString(eDataType, instanceValue);
			case LimenPackage.STIMULUS_KIND:
				return convertStimulusKindToString(eDataType, instanceValue);
			case LimenPackage.EAR:
				return convertEarToString(eDataType, instanceValue);
			case LimenPackage.QUANTITY_UNIT:
				return convertQuantityUnitToString(eDataType, instanceValue);
			case LimenPackage.SCALE:
				return convertScaleToString(eDataType, instanceValue);
			case LimenPackage.STEP_MODE:
				return convertStepModeToString(eDataType, instanceValue);
			case LimenPackage.BAYESIAN_VARIANT:
				return convertBayesianVariantToString(eDataType, instanceValue);
			case LimenPackage.ESTIMATE_PLACEMENT:
				return convertEstimatePlacementToString(eDataType, instanceValue);
			case LimenPackage.LAPSE_MODE:
				return convertLapseModeToString(eDataType, instanceValue);
			case LimenPackage.PSYCHOMETRIC_FAMILY:
				return convertPsychometricFamilyToString(eDataType, instanceValue);
			case LimenPackage.NOISE_SPECTRUM:
				return convertNoiseSpectrumToString(eDataType, instanceValue);
			case LimenPackage.SETTING_TYPE:
				return convertSettingTypeToString(eDataType, instanceValue);
			case LimenPackage.SESSION_STATUS:
				return convertSessionStatusToString(eDataType, instanceValue);
			case LimenPackage.INSTANT:
				return convertInstantToString(eDataType, instanceValue);
			case LimenPackage.LOCAL_DATE:
				return convertLocalDateToString(eDataType, instanceValue);
			default:
				throw new IllegalArgumentException("The datatype '" + eDataType.getName() + "' is not a valid classifier");
		}
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Battery createBattery() {
		BatteryImpl battery = new BatteryImpl();
		return battery;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Break createBreak() {
		BreakImpl break_ = new BreakImpl();
		return break_;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Step createStep() {
		StepImpl step = new StepImpl();
		return step;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ForcedChoiceTask createForcedChoiceTask() {
		ForcedChoiceTaskImpl forcedChoiceTask = new ForcedChoiceTaskImpl();
		return forcedChoiceTask;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public YesNoTask createYesNoTask() {
		YesNoTaskImpl yesNoTask = new YesNoTaskImpl();
		return yesNoTask;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Stimulus createStimulus() {
		StimulusImpl stimulus = new StimulusImpl();
		return stimulus;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public AbsoluteLevel createAbsoluteLevel() {
		AbsoluteLevelImpl absoluteLevel = new AbsoluteLevelImpl();
		return absoluteLevel;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public RelativeLevel createRelativeLevel() {
		RelativeLevelImpl relativeLevel = new RelativeLevelImpl();
		return relativeLevel;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public MaskerNoise createMaskerNoise() {
		MaskerNoiseImpl maskerNoise = new MaskerNoiseImpl();
		return maskerNoise;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public VariedQuantity createVariedQuantity() {
		VariedQuantityImpl variedQuantity = new VariedQuantityImpl();
		return variedQuantity;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Track createTrack() {
		TrackImpl track = new TrackImpl();
		return track;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public TransformedUpDownProcedure createTransformedUpDownProcedure() {
		TransformedUpDownProcedureImpl transformedUpDownProcedure = new TransformedUpDownProcedureImpl();
		return transformedUpDownProcedure;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public WeightedUpDownProcedure createWeightedUpDownProcedure() {
		WeightedUpDownProcedureImpl weightedUpDownProcedure = new WeightedUpDownProcedureImpl();
		return weightedUpDownProcedure;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public PestProcedure createPestProcedure() {
		PestProcedureImpl pestProcedure = new PestProcedureImpl();
		return pestProcedure;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public QuestProcedure createQuestProcedure() {
		QuestProcedureImpl questProcedure = new QuestProcedureImpl();
		return questProcedure;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public PsiProcedure createPsiProcedure() {
		PsiProcedureImpl psiProcedure = new PsiProcedureImpl();
		return psiProcedure;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ConstantStimuliProcedure createConstantStimuliProcedure() {
		ConstantStimuliProcedureImpl constantStimuliProcedure = new ConstantStimuliProcedureImpl();
		return constantStimuliProcedure;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ContributedProcedure createContributedProcedure() {
		ContributedProcedureImpl contributedProcedure = new ContributedProcedureImpl();
		return contributedProcedure;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public StoppingRule createStoppingRule() {
		StoppingRuleImpl stoppingRule = new StoppingRuleImpl();
		return stoppingRule;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public SettingsGroup createSettingsGroup() {
		SettingsGroupImpl settingsGroup = new SettingsGroupImpl();
		return settingsGroup;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Setting createSetting() {
		SettingImpl setting = new SettingImpl();
		return setting;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Calibration createCalibration() {
		CalibrationImpl calibration = new CalibrationImpl();
		return calibration;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public CalibrationPoint createCalibrationPoint() {
		CalibrationPointImpl calibrationPoint = new CalibrationPointImpl();
		return calibrationPoint;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public SessionHeader createSessionHeader() {
		SessionHeaderImpl sessionHeader = new SessionHeaderImpl();
		return sessionHeader;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ExposureEstimate createExposureEstimate() {
		ExposureEstimateImpl exposureEstimate = new ExposureEstimateImpl();
		return exposureEstimate;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public EarlyResponsePolicy createEarlyResponsePolicyFromString(EDataType eDataType, String initialValue) {
		EarlyResponsePolicy result = EarlyResponsePolicy.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertEarlyResponsePolicyToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public OrderingPolicy createOrderingPolicyFromString(EDataType eDataType, String initialValue) {
		OrderingPolicy result = OrderingPolicy.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertOrderingPolicyToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public StimulusKind createStimulusKindFromString(EDataType eDataType, String initialValue) {
		StimulusKind result = StimulusKind.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertStimulusKindToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public Ear createEarFromString(EDataType eDataType, String initialValue) {
		Ear result = Ear.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertEarToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public QuantityUnit createQuantityUnitFromString(EDataType eDataType, String initialValue) {
		QuantityUnit result = QuantityUnit.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertQuantityUnitToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public Scale createScaleFromString(EDataType eDataType, String initialValue) {
		Scale result = Scale.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertScaleToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public StepMode createStepModeFromString(EDataType eDataType, String initialValue) {
		StepMode result = StepMode.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertStepModeToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public BayesianVariant createBayesianVariantFromString(EDataType eDataType, String initialValue) {
		BayesianVariant result = BayesianVariant.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertBayesianVariantToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public EstimatePlacement createEstimatePlacementFromString(EDataType eDataType, String initialValue) {
		EstimatePlacement result = EstimatePlacement.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertEstimatePlacementToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public LapseMode createLapseModeFromString(EDataType eDataType, String initialValue) {
		LapseMode result = LapseMode.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertLapseModeToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public PsychometricFamily createPsychometricFamilyFromString(EDataType eDataType, String initialValue) {
		PsychometricFamily result = PsychometricFamily.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertPsychometricFamilyToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NoiseSpectrum createNoiseSpectrumFromString(EDataType eDataType, String initialValue) {
		NoiseSpectrum result = NoiseSpectrum.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertNoiseSpectrumToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public SettingType createSettingTypeFromString(EDataType eDataType, String initialValue) {
		SettingType result = SettingType.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertSettingTypeToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public SessionStatus createSessionStatusFromString(EDataType eDataType, String initialValue) {
		SessionStatus result = SessionStatus.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertSessionStatusToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public Instant createInstant(final String it) {
		return it == null ? null : java.time.Instant.parse(it.trim());
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public Instant createInstantFromString(EDataType eDataType, String initialValue) {
		return createInstant(initialValue);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertInstant(final Instant it) {
		return it == null ? null : it.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertInstantToString(EDataType eDataType, Object instanceValue) {
		return convertInstant((Instant)instanceValue);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public LocalDate createLocalDate(final String it) {
		return it == null ? null : java.time.LocalDate.parse(it.trim());
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public LocalDate createLocalDateFromString(EDataType eDataType, String initialValue) {
		return createLocalDate(initialValue);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertLocalDate(final LocalDate it) {
		return it == null ? null : it.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertLocalDateToString(EDataType eDataType, Object instanceValue) {
		return convertLocalDate((LocalDate)instanceValue);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public LimenPackage getLimenPackage() {
		return (LimenPackage)getEPackage();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @deprecated
	 * @generated
	 */
	@Deprecated
	public static LimenPackage getPackage() {
		return LimenPackage.eINSTANCE;
	}

} //LimenFactoryImpl
