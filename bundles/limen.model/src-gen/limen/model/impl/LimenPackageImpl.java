/**
 */
package limen.model.impl;

import java.time.Instant;
import java.time.LocalDate;

import limen.model.AbsoluteLevel;
import limen.model.Battery;
import limen.model.BayesianVariant;
import limen.model.Break;
import limen.model.Calibration;
import limen.model.CalibrationPoint;
import limen.model.ConstantStimuliProcedure;
import limen.model.ContributedProcedure;
import limen.model.Ear;
import limen.model.EarlyResponsePolicy;
import limen.model.EstimatePlacement;
import limen.model.ExposureEstimate;
import limen.model.ForcedChoiceTask;
import limen.model.LapseMode;
import limen.model.Level;
import limen.model.LimenDocument;
import limen.model.LimenFactory;
import limen.model.LimenPackage;
import limen.model.MaskerNoise;
import limen.model.NoiseSpectrum;
import limen.model.OrderingPolicy;
import limen.model.PestProcedure;
import limen.model.Procedure;
import limen.model.PsiProcedure;
import limen.model.PsychometricFamily;
import limen.model.QuantityUnit;
import limen.model.QuestProcedure;
import limen.model.RelativeLevel;
import limen.model.Scale;
import limen.model.SessionHeader;
import limen.model.SessionStatus;
import limen.model.Setting;
import limen.model.SettingType;
import limen.model.SettingsGroup;
import limen.model.StaircaseProcedure;
import limen.model.Step;
import limen.model.StepMode;
import limen.model.Stimulus;
import limen.model.StimulusKind;
import limen.model.StoppingRule;
import limen.model.Task;
import limen.model.Track;
import limen.model.TransformedUpDownProcedure;
import limen.model.VariedQuantity;
import limen.model.WeightedUpDownProcedure;
import limen.model.YesNoTask;

import limen.model.util.LimenValidator;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EDataType;
import org.eclipse.emf.ecore.EEnum;
import org.eclipse.emf.ecore.EGenericType;
import org.eclipse.emf.ecore.EOperation;
import org.eclipse.emf.ecore.EPackage;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.emf.ecore.EValidator;

import org.eclipse.emf.ecore.impl.EPackageImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model <b>Package</b>.
 * <!-- end-user-doc -->
 * @generated
 */
public class LimenPackageImpl extends EPackageImpl implements LimenPackage {
	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass limenDocumentEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass batteryEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass breakEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass stepEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass taskEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass forcedChoiceTaskEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass yesNoTaskEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass stimulusEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass levelEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass absoluteLevelEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass relativeLevelEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass maskerNoiseEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass variedQuantityEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass trackEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass procedureEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass staircaseProcedureEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass transformedUpDownProcedureEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass weightedUpDownProcedureEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass pestProcedureEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass questProcedureEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass psiProcedureEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass constantStimuliProcedureEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass contributedProcedureEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass stoppingRuleEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass settingsGroupEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass settingEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass calibrationEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass calibrationPointEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass sessionHeaderEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass exposureEstimateEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum earlyResponsePolicyEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum orderingPolicyEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum stimulusKindEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum earEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum quantityUnitEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum scaleEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum stepModeEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum bayesianVariantEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum estimatePlacementEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum lapseModeEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum psychometricFamilyEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum noiseSpectrumEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum settingTypeEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum sessionStatusEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EDataType instantEDataType = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EDataType localDateEDataType = null;

	/**
	 * Creates an instance of the model <b>Package</b>, registered with
	 * {@link org.eclipse.emf.ecore.EPackage.Registry EPackage.Registry} by the package
	 * package URI value.
	 * <p>Note: the correct way to create the package is via the static
	 * factory method {@link #init init()}, which also performs
	 * initialization of the package, or returns the registered package,
	 * if one already exists.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.eclipse.emf.ecore.EPackage.Registry
	 * @see limen.model.LimenPackage#eNS_URI
	 * @see #init()
	 * @generated
	 */
	private LimenPackageImpl() {
		super(eNS_URI, LimenFactory.eINSTANCE);
	}
	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static boolean isInited = false;

	/**
	 * Creates, registers, and initializes the <b>Package</b> for this model, and for any others upon which it depends.
	 *
	 * <p>This method is used to initialize {@link LimenPackage#eINSTANCE} when that field is accessed.
	 * Clients should not invoke it directly. Instead, they should simply access that field to obtain the package.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #eNS_URI
	 * @see #createPackageContents()
	 * @see #initializePackageContents()
	 * @generated
	 */
	public static LimenPackage init() {
		if (isInited) return (LimenPackage)EPackage.Registry.INSTANCE.getEPackage(LimenPackage.eNS_URI);

		// Obtain or create and register package
		Object registeredLimenPackage = EPackage.Registry.INSTANCE.get(eNS_URI);
		LimenPackageImpl theLimenPackage = registeredLimenPackage instanceof LimenPackageImpl ? (LimenPackageImpl)registeredLimenPackage : new LimenPackageImpl();

		isInited = true;

		// Create package meta-data objects
		theLimenPackage.createPackageContents();

		// Initialize created meta-data
		theLimenPackage.initializePackageContents();

		// Register package validator
		EValidator.Registry.INSTANCE.put
			(theLimenPackage,
			 new EValidator.Descriptor() {
				 @Override
				 public EValidator getEValidator() {
					 return LimenValidator.INSTANCE;
				 }
			 });

		// Mark meta-data to indicate it can't be changed
		theLimenPackage.freeze();

		// Update the registry and return the package
		EPackage.Registry.INSTANCE.put(LimenPackage.eNS_URI, theLimenPackage);
		return theLimenPackage;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getLimenDocument() {
		return limenDocumentEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getLimenDocument_SchemaVersion() {
		return (EAttribute)limenDocumentEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getBattery() {
		return batteryEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getBattery_Title() {
		return (EAttribute)batteryEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getBattery_Notes() {
		return (EAttribute)batteryEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getBattery_CalibrationFile() {
		return (EAttribute)batteryEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getBattery_Ordering() {
		return (EAttribute)batteryEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getBattery_ShuffleSeed() {
		return (EAttribute)batteryEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getBattery_Steps() {
		return (EReference)batteryEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getBattery_Breaks() {
		return (EReference)batteryEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getBattery__UniqueStepIds__DiagnosticChain_Map() {
		return batteryEClass.getEOperations().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getBattery__ValidOrdering__DiagnosticChain_Map() {
		return batteryEClass.getEOperations().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getBattery__ValidBreaks__DiagnosticChain_Map() {
		return batteryEClass.getEOperations().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getBattery__NoReferenceCycles__DiagnosticChain_Map() {
		return batteryEClass.getEOperations().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getBreak() {
		return breakEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getBreak_AfterStepCount() {
		return (EAttribute)breakEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getBreak_MinimumDurationSeconds() {
		return (EAttribute)breakEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getBreak_Message() {
		return (EAttribute)breakEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getStep() {
		return stepEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getStep_Id() {
		return (EAttribute)stepEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getStep_Title() {
		return (EAttribute)stepEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getStep_Notes() {
		return (EAttribute)stepEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getStep_FixedPosition() {
		return (EAttribute)stepEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getStep_Task() {
		return (EReference)stepEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getStep_Stimulus() {
		return (EReference)stepEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getStep_VariedQuantity() {
		return (EReference)stepEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getStep_Tracks() {
		return (EReference)stepEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getStep__ConsistentQuantity__DiagnosticChain_Map() {
		return stepEClass.getEOperations().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getStep__LevelsWithinCeiling__DiagnosticChain_Map() {
		return stepEClass.getEOperations().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getStep__FrequenciesWithinRange__DiagnosticChain_Map() {
		return stepEClass.getEOperations().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getTask() {
		return taskEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTask_IntervalDurationSeconds() {
		return (EAttribute)taskEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTask_ResponseWindowSeconds() {
		return (EAttribute)taskEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTask_InterTrialIntervalSeconds() {
		return (EAttribute)taskEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTask_Feedback() {
		return (EAttribute)taskEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTask_EarlyResponses() {
		return (EAttribute)taskEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getTask__ValidTiming__DiagnosticChain_Map() {
		return taskEClass.getEOperations().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getForcedChoiceTask() {
		return forcedChoiceTaskEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getForcedChoiceTask_IntervalCount() {
		return (EAttribute)forcedChoiceTaskEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getForcedChoiceTask_InterStimulusIntervalSeconds() {
		return (EAttribute)forcedChoiceTaskEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getForcedChoiceTask__ValidIntervals__DiagnosticChain_Map() {
		return forcedChoiceTaskEClass.getEOperations().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getYesNoTask() {
		return yesNoTaskEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getYesNoTask_CatchTrialRate() {
		return (EAttribute)yesNoTaskEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getYesNoTask__ValidCatchTrials__DiagnosticChain_Map() {
		return yesNoTaskEClass.getEOperations().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getStimulus() {
		return stimulusEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getStimulus_Kind() {
		return (EAttribute)stimulusEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getStimulus_StandardFrequencyHz() {
		return (EAttribute)stimulusEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getStimulus_StandardLevel() {
		return (EReference)stimulusEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getStimulus_RampDurationSeconds() {
		return (EAttribute)stimulusEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getStimulus_Ear() {
		return (EAttribute)stimulusEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getStimulus_Masker() {
		return (EReference)stimulusEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getStimulus_Contributions() {
		return (EReference)stimulusEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getStimulus__ValidTone__DiagnosticChain_Map() {
		return stimulusEClass.getEOperations().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getStimulus__ValidStandardLevel__DiagnosticChain_Map() {
		return stimulusEClass.getEOperations().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getStimulus__ValidMasker__DiagnosticChain_Map() {
		return stimulusEClass.getEOperations().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getLevel() {
		return levelEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getAbsoluteLevel() {
		return absoluteLevelEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getAbsoluteLevel_LevelDbSpl() {
		return (EAttribute)absoluteLevelEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getRelativeLevel() {
		return relativeLevelEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getRelativeLevel_Reference() {
		return (EReference)relativeLevelEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRelativeLevel_OffsetDb() {
		return (EAttribute)relativeLevelEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getRelativeLevel__ValidReference__DiagnosticChain_Map() {
		return relativeLevelEClass.getEOperations().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getMaskerNoise() {
		return maskerNoiseEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getMaskerNoise_Spectrum() {
		return (EAttribute)maskerNoiseEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getMaskerNoise_LowCutoffHz() {
		return (EAttribute)maskerNoiseEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getMaskerNoise_HighCutoffHz() {
		return (EAttribute)maskerNoiseEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getMaskerNoise_Level() {
		return (EReference)maskerNoiseEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getMaskerNoise_Continuous() {
		return (EAttribute)maskerNoiseEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getVariedQuantity() {
		return variedQuantityEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getVariedQuantity_Unit() {
		return (EAttribute)variedQuantityEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getVariedQuantity_Scale() {
		return (EAttribute)variedQuantityEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getTrack() {
		return trackEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTrack_Name() {
		return (EAttribute)trackEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getTrack_Procedure() {
		return (EReference)trackEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getTrack_StoppingRule() {
		return (EReference)trackEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getProcedure() {
		return procedureEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getStaircaseProcedure() {
		return staircaseProcedureEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getStaircaseProcedure_StartValue() {
		return (EAttribute)staircaseProcedureEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getStaircaseProcedure_FloorValue() {
		return (EAttribute)staircaseProcedureEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getStaircaseProcedure_CeilingValue() {
		return (EAttribute)staircaseProcedureEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getStaircaseProcedure_StepMode() {
		return (EAttribute)staircaseProcedureEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getStaircaseProcedure__ValidLimits__DiagnosticChain_Map() {
		return staircaseProcedureEClass.getEOperations().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getTransformedUpDownProcedure() {
		return transformedUpDownProcedureEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTransformedUpDownProcedure_DownCount() {
		return (EAttribute)transformedUpDownProcedureEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTransformedUpDownProcedure_UpCount() {
		return (EAttribute)transformedUpDownProcedureEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTransformedUpDownProcedure_InitialStep() {
		return (EAttribute)transformedUpDownProcedureEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTransformedUpDownProcedure_MinimumStep() {
		return (EAttribute)transformedUpDownProcedureEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTransformedUpDownProcedure_ShrinkFactor() {
		return (EAttribute)transformedUpDownProcedureEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTransformedUpDownProcedure_ReversalsPerShrink() {
		return (EAttribute)transformedUpDownProcedureEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTransformedUpDownProcedure_DiscardedReversals() {
		return (EAttribute)transformedUpDownProcedureEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTransformedUpDownProcedure_AveragedReversals() {
		return (EAttribute)transformedUpDownProcedureEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getTransformedUpDownProcedure__ValidUpDownRule__DiagnosticChain_Map() {
		return transformedUpDownProcedureEClass.getEOperations().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getWeightedUpDownProcedure() {
		return weightedUpDownProcedureEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getWeightedUpDownProcedure_TargetProbability() {
		return (EAttribute)weightedUpDownProcedureEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getWeightedUpDownProcedure_UpStep() {
		return (EAttribute)weightedUpDownProcedureEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getWeightedUpDownProcedure_DownStep() {
		return (EAttribute)weightedUpDownProcedureEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getWeightedUpDownProcedure_DiscardedReversals() {
		return (EAttribute)weightedUpDownProcedureEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getWeightedUpDownProcedure_AveragedReversals() {
		return (EAttribute)weightedUpDownProcedureEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getWeightedUpDownProcedure__ValidWeightedSteps__DiagnosticChain_Map() {
		return weightedUpDownProcedureEClass.getEOperations().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getPestProcedure() {
		return pestProcedureEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPestProcedure_InitialStep() {
		return (EAttribute)pestProcedureEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPestProcedure_MinimumStep() {
		return (EAttribute)pestProcedureEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPestProcedure_MaximumStep() {
		return (EAttribute)pestProcedureEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPestProcedure_WaldDeviation() {
		return (EAttribute)pestProcedureEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPestProcedure_TargetProbability() {
		return (EAttribute)pestProcedureEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getPestProcedure__ValidPestSteps__DiagnosticChain_Map() {
		return pestProcedureEClass.getEOperations().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getQuestProcedure() {
		return questProcedureEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getQuestProcedure_Variant() {
		return (EAttribute)questProcedureEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getQuestProcedure_PriorMean() {
		return (EAttribute)questProcedureEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getQuestProcedure_PriorSd() {
		return (EAttribute)questProcedureEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getQuestProcedure_Beta() {
		return (EAttribute)questProcedureEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getQuestProcedure_LapseRate() {
		return (EAttribute)questProcedureEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getQuestProcedure_GuessRate() {
		return (EAttribute)questProcedureEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getQuestProcedure_Grain() {
		return (EAttribute)questProcedureEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getQuestProcedure_Range() {
		return (EAttribute)questProcedureEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getQuestProcedure_Placement() {
		return (EAttribute)questProcedureEClass.getEStructuralFeatures().get(8);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getQuestProcedure__ValidQuestSettings__DiagnosticChain_Map() {
		return questProcedureEClass.getEOperations().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getPsiProcedure() {
		return psiProcedureEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPsiProcedure_Family() {
		return (EAttribute)psiProcedureEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPsiProcedure_ThresholdMinimum() {
		return (EAttribute)psiProcedureEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPsiProcedure_ThresholdMaximum() {
		return (EAttribute)psiProcedureEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPsiProcedure_ThresholdCount() {
		return (EAttribute)psiProcedureEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPsiProcedure_SlopeMinimum() {
		return (EAttribute)psiProcedureEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPsiProcedure_SlopeMaximum() {
		return (EAttribute)psiProcedureEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPsiProcedure_SlopeCount() {
		return (EAttribute)psiProcedureEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPsiProcedure_StimulusMinimum() {
		return (EAttribute)psiProcedureEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPsiProcedure_StimulusMaximum() {
		return (EAttribute)psiProcedureEClass.getEStructuralFeatures().get(8);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPsiProcedure_StimulusCount() {
		return (EAttribute)psiProcedureEClass.getEStructuralFeatures().get(9);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPsiProcedure_LapseMode() {
		return (EAttribute)psiProcedureEClass.getEStructuralFeatures().get(10);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPsiProcedure_LapseRate() {
		return (EAttribute)psiProcedureEClass.getEStructuralFeatures().get(11);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPsiProcedure_LapseMinimum() {
		return (EAttribute)psiProcedureEClass.getEStructuralFeatures().get(12);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPsiProcedure_LapseMaximum() {
		return (EAttribute)psiProcedureEClass.getEStructuralFeatures().get(13);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPsiProcedure_LapseCount() {
		return (EAttribute)psiProcedureEClass.getEStructuralFeatures().get(14);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPsiProcedure_GuessRate() {
		return (EAttribute)psiProcedureEClass.getEStructuralFeatures().get(15);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getPsiProcedure__ValidPsiGrids__DiagnosticChain_Map() {
		return psiProcedureEClass.getEOperations().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getConstantStimuliProcedure() {
		return constantStimuliProcedureEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getConstantStimuliProcedure_Values() {
		return (EAttribute)constantStimuliProcedureEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getConstantStimuliProcedure_RepetitionsPerValue() {
		return (EAttribute)constantStimuliProcedureEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getConstantStimuliProcedure_BlockedShuffle() {
		return (EAttribute)constantStimuliProcedureEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getConstantStimuliProcedure__ValidConstantStimuli__DiagnosticChain_Map() {
		return constantStimuliProcedureEClass.getEOperations().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getContributedProcedure() {
		return contributedProcedureEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getContributedProcedure_Settings() {
		return (EReference)contributedProcedureEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getStoppingRule() {
		return stoppingRuleEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getStoppingRule_MaximumReversals() {
		return (EAttribute)stoppingRuleEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getStoppingRule_MaximumTrials() {
		return (EAttribute)stoppingRuleEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getStoppingRule_PosteriorSdTarget() {
		return (EAttribute)stoppingRuleEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getStoppingRule__CanEnd__DiagnosticChain_Map() {
		return stoppingRuleEClass.getEOperations().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getSettingsGroup() {
		return settingsGroupEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSettingsGroup_ContributorId() {
		return (EAttribute)settingsGroupEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getSettingsGroup_Entries() {
		return (EReference)settingsGroupEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getSettingsGroup__ValidSettings__DiagnosticChain_Map() {
		return settingsGroupEClass.getEOperations().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getSetting() {
		return settingEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSetting_Name() {
		return (EAttribute)settingEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSetting_Value() {
		return (EAttribute)settingEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSetting_Type() {
		return (EAttribute)settingEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getCalibration() {
		return calibrationEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCalibration_Name() {
		return (EAttribute)calibrationEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCalibration_Device() {
		return (EAttribute)calibrationEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCalibration_Transducer() {
		return (EAttribute)calibrationEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCalibration_ReferenceLevelDbfs() {
		return (EAttribute)calibrationEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCalibration_SampleRateHz() {
		return (EAttribute)calibrationEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCalibration_CeilingDbSpl() {
		return (EAttribute)calibrationEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCalibration_MeasuredBy() {
		return (EAttribute)calibrationEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCalibration_MeasuredOn() {
		return (EAttribute)calibrationEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCalibration_DemonstrationOnly() {
		return (EAttribute)calibrationEClass.getEStructuralFeatures().get(8);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCalibration_Notes() {
		return (EAttribute)calibrationEClass.getEStructuralFeatures().get(9);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getCalibration_Points() {
		return (EReference)calibrationEClass.getEStructuralFeatures().get(10);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getCalibration__ValidCalibration__DiagnosticChain_Map() {
		return calibrationEClass.getEOperations().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getCalibrationPoint() {
		return calibrationPointEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCalibrationPoint_FrequencyHz() {
		return (EAttribute)calibrationPointEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCalibrationPoint_MeasuredDbSpl() {
		return (EAttribute)calibrationPointEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getSessionHeader() {
		return sessionHeaderEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSessionHeader_Participant() {
		return (EAttribute)sessionHeaderEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getSessionHeader_Battery() {
		return (EReference)sessionHeaderEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getSessionHeader_Calibration() {
		return (EReference)sessionHeaderEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSessionHeader_Device() {
		return (EAttribute)sessionHeaderEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSessionHeader_RandomSeed() {
		return (EAttribute)sessionHeaderEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSessionHeader_SoftwareVersion() {
		return (EAttribute)sessionHeaderEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSessionHeader_StartTime() {
		return (EAttribute)sessionHeaderEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSessionHeader_EndTime() {
		return (EAttribute)sessionHeaderEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSessionHeader_Status() {
		return (EAttribute)sessionHeaderEClass.getEStructuralFeatures().get(8);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSessionHeader_LatinSquareRow() {
		return (EAttribute)sessionHeaderEClass.getEStructuralFeatures().get(9);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getSessionHeader_StepOrder() {
		return (EReference)sessionHeaderEClass.getEStructuralFeatures().get(10);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getSessionHeader_Exposure() {
		return (EReference)sessionHeaderEClass.getEStructuralFeatures().get(11);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EOperation getSessionHeader__ValidSession__DiagnosticChain_Map() {
		return sessionHeaderEClass.getEOperations().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getExposureEstimate() {
		return exposureEstimateEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getExposureEstimate_PeakLevelDbSpl() {
		return (EAttribute)exposureEstimateEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getExposureEstimate_EquivalentLevelDbSpl() {
		return (EAttribute)exposureEstimateEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getExposureEstimate_SoundOnSeconds() {
		return (EAttribute)exposureEstimateEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getExposureEstimate_NioshDosePercent() {
		return (EAttribute)exposureEstimateEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getExposureEstimate_OshaDosePercent() {
		return (EAttribute)exposureEstimateEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getEarlyResponsePolicy() {
		return earlyResponsePolicyEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getOrderingPolicy() {
		return orderingPolicyEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getStimulusKind() {
		return stimulusKindEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getEar() {
		return earEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getQuantityUnit() {
		return quantityUnitEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getScale() {
		return scaleEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getStepMode() {
		return stepModeEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getBayesianVariant() {
		return bayesianVariantEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getEstimatePlacement() {
		return estimatePlacementEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getLapseMode() {
		return lapseModeEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getPsychometricFamily() {
		return psychometricFamilyEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getNoiseSpectrum() {
		return noiseSpectrumEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getSettingType() {
		return settingTypeEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getSessionStatus() {
		return sessionStatusEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EDataType getInstant() {
		return instantEDataType;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EDataType getLocalDate() {
		return localDateEDataType;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public LimenFactory getLimenFactory() {
		return (LimenFactory)getEFactoryInstance();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private boolean isCreated = false;

	/**
	 * Creates the meta-model objects for the package.  This method is
	 * guarded to have no affect on any invocation but its first.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public void createPackageContents() {
		if (isCreated) return;
		isCreated = true;

		// Create classes and their features
		limenDocumentEClass = createEClass(LIMEN_DOCUMENT);
		createEAttribute(limenDocumentEClass, LIMEN_DOCUMENT__SCHEMA_VERSION);

		batteryEClass = createEClass(BATTERY);
		createEAttribute(batteryEClass, BATTERY__TITLE);
		createEAttribute(batteryEClass, BATTERY__NOTES);
		createEAttribute(batteryEClass, BATTERY__CALIBRATION_FILE);
		createEAttribute(batteryEClass, BATTERY__ORDERING);
		createEAttribute(batteryEClass, BATTERY__SHUFFLE_SEED);
		createEReference(batteryEClass, BATTERY__STEPS);
		createEReference(batteryEClass, BATTERY__BREAKS);
		createEOperation(batteryEClass, BATTERY___UNIQUE_STEP_IDS__DIAGNOSTICCHAIN_MAP);
		createEOperation(batteryEClass, BATTERY___VALID_ORDERING__DIAGNOSTICCHAIN_MAP);
		createEOperation(batteryEClass, BATTERY___VALID_BREAKS__DIAGNOSTICCHAIN_MAP);
		createEOperation(batteryEClass, BATTERY___NO_REFERENCE_CYCLES__DIAGNOSTICCHAIN_MAP);

		breakEClass = createEClass(BREAK);
		createEAttribute(breakEClass, BREAK__AFTER_STEP_COUNT);
		createEAttribute(breakEClass, BREAK__MINIMUM_DURATION_SECONDS);
		createEAttribute(breakEClass, BREAK__MESSAGE);

		stepEClass = createEClass(STEP);
		createEAttribute(stepEClass, STEP__ID);
		createEAttribute(stepEClass, STEP__TITLE);
		createEAttribute(stepEClass, STEP__NOTES);
		createEAttribute(stepEClass, STEP__FIXED_POSITION);
		createEReference(stepEClass, STEP__TASK);
		createEReference(stepEClass, STEP__STIMULUS);
		createEReference(stepEClass, STEP__VARIED_QUANTITY);
		createEReference(stepEClass, STEP__TRACKS);
		createEOperation(stepEClass, STEP___CONSISTENT_QUANTITY__DIAGNOSTICCHAIN_MAP);
		createEOperation(stepEClass, STEP___LEVELS_WITHIN_CEILING__DIAGNOSTICCHAIN_MAP);
		createEOperation(stepEClass, STEP___FREQUENCIES_WITHIN_RANGE__DIAGNOSTICCHAIN_MAP);

		taskEClass = createEClass(TASK);
		createEAttribute(taskEClass, TASK__INTERVAL_DURATION_SECONDS);
		createEAttribute(taskEClass, TASK__RESPONSE_WINDOW_SECONDS);
		createEAttribute(taskEClass, TASK__INTER_TRIAL_INTERVAL_SECONDS);
		createEAttribute(taskEClass, TASK__FEEDBACK);
		createEAttribute(taskEClass, TASK__EARLY_RESPONSES);
		createEOperation(taskEClass, TASK___VALID_TIMING__DIAGNOSTICCHAIN_MAP);

		forcedChoiceTaskEClass = createEClass(FORCED_CHOICE_TASK);
		createEAttribute(forcedChoiceTaskEClass, FORCED_CHOICE_TASK__INTERVAL_COUNT);
		createEAttribute(forcedChoiceTaskEClass, FORCED_CHOICE_TASK__INTER_STIMULUS_INTERVAL_SECONDS);
		createEOperation(forcedChoiceTaskEClass, FORCED_CHOICE_TASK___VALID_INTERVALS__DIAGNOSTICCHAIN_MAP);

		yesNoTaskEClass = createEClass(YES_NO_TASK);
		createEAttribute(yesNoTaskEClass, YES_NO_TASK__CATCH_TRIAL_RATE);
		createEOperation(yesNoTaskEClass, YES_NO_TASK___VALID_CATCH_TRIALS__DIAGNOSTICCHAIN_MAP);

		stimulusEClass = createEClass(STIMULUS);
		createEAttribute(stimulusEClass, STIMULUS__KIND);
		createEAttribute(stimulusEClass, STIMULUS__STANDARD_FREQUENCY_HZ);
		createEReference(stimulusEClass, STIMULUS__STANDARD_LEVEL);
		createEAttribute(stimulusEClass, STIMULUS__RAMP_DURATION_SECONDS);
		createEAttribute(stimulusEClass, STIMULUS__EAR);
		createEReference(stimulusEClass, STIMULUS__MASKER);
		createEReference(stimulusEClass, STIMULUS__CONTRIBUTIONS);
		createEOperation(stimulusEClass, STIMULUS___VALID_TONE__DIAGNOSTICCHAIN_MAP);
		createEOperation(stimulusEClass, STIMULUS___VALID_STANDARD_LEVEL__DIAGNOSTICCHAIN_MAP);
		createEOperation(stimulusEClass, STIMULUS___VALID_MASKER__DIAGNOSTICCHAIN_MAP);

		levelEClass = createEClass(LEVEL);

		absoluteLevelEClass = createEClass(ABSOLUTE_LEVEL);
		createEAttribute(absoluteLevelEClass, ABSOLUTE_LEVEL__LEVEL_DB_SPL);

		relativeLevelEClass = createEClass(RELATIVE_LEVEL);
		createEReference(relativeLevelEClass, RELATIVE_LEVEL__REFERENCE);
		createEAttribute(relativeLevelEClass, RELATIVE_LEVEL__OFFSET_DB);
		createEOperation(relativeLevelEClass, RELATIVE_LEVEL___VALID_REFERENCE__DIAGNOSTICCHAIN_MAP);

		maskerNoiseEClass = createEClass(MASKER_NOISE);
		createEAttribute(maskerNoiseEClass, MASKER_NOISE__SPECTRUM);
		createEAttribute(maskerNoiseEClass, MASKER_NOISE__LOW_CUTOFF_HZ);
		createEAttribute(maskerNoiseEClass, MASKER_NOISE__HIGH_CUTOFF_HZ);
		createEReference(maskerNoiseEClass, MASKER_NOISE__LEVEL);
		createEAttribute(maskerNoiseEClass, MASKER_NOISE__CONTINUOUS);

		variedQuantityEClass = createEClass(VARIED_QUANTITY);
		createEAttribute(variedQuantityEClass, VARIED_QUANTITY__UNIT);
		createEAttribute(variedQuantityEClass, VARIED_QUANTITY__SCALE);

		trackEClass = createEClass(TRACK);
		createEAttribute(trackEClass, TRACK__NAME);
		createEReference(trackEClass, TRACK__PROCEDURE);
		createEReference(trackEClass, TRACK__STOPPING_RULE);

		procedureEClass = createEClass(PROCEDURE);

		staircaseProcedureEClass = createEClass(STAIRCASE_PROCEDURE);
		createEAttribute(staircaseProcedureEClass, STAIRCASE_PROCEDURE__START_VALUE);
		createEAttribute(staircaseProcedureEClass, STAIRCASE_PROCEDURE__FLOOR_VALUE);
		createEAttribute(staircaseProcedureEClass, STAIRCASE_PROCEDURE__CEILING_VALUE);
		createEAttribute(staircaseProcedureEClass, STAIRCASE_PROCEDURE__STEP_MODE);
		createEOperation(staircaseProcedureEClass, STAIRCASE_PROCEDURE___VALID_LIMITS__DIAGNOSTICCHAIN_MAP);

		transformedUpDownProcedureEClass = createEClass(TRANSFORMED_UP_DOWN_PROCEDURE);
		createEAttribute(transformedUpDownProcedureEClass, TRANSFORMED_UP_DOWN_PROCEDURE__DOWN_COUNT);
		createEAttribute(transformedUpDownProcedureEClass, TRANSFORMED_UP_DOWN_PROCEDURE__UP_COUNT);
		createEAttribute(transformedUpDownProcedureEClass, TRANSFORMED_UP_DOWN_PROCEDURE__INITIAL_STEP);
		createEAttribute(transformedUpDownProcedureEClass, TRANSFORMED_UP_DOWN_PROCEDURE__MINIMUM_STEP);
		createEAttribute(transformedUpDownProcedureEClass, TRANSFORMED_UP_DOWN_PROCEDURE__SHRINK_FACTOR);
		createEAttribute(transformedUpDownProcedureEClass, TRANSFORMED_UP_DOWN_PROCEDURE__REVERSALS_PER_SHRINK);
		createEAttribute(transformedUpDownProcedureEClass, TRANSFORMED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS);
		createEAttribute(transformedUpDownProcedureEClass, TRANSFORMED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS);
		createEOperation(transformedUpDownProcedureEClass, TRANSFORMED_UP_DOWN_PROCEDURE___VALID_UP_DOWN_RULE__DIAGNOSTICCHAIN_MAP);

		weightedUpDownProcedureEClass = createEClass(WEIGHTED_UP_DOWN_PROCEDURE);
		createEAttribute(weightedUpDownProcedureEClass, WEIGHTED_UP_DOWN_PROCEDURE__TARGET_PROBABILITY);
		createEAttribute(weightedUpDownProcedureEClass, WEIGHTED_UP_DOWN_PROCEDURE__UP_STEP);
		createEAttribute(weightedUpDownProcedureEClass, WEIGHTED_UP_DOWN_PROCEDURE__DOWN_STEP);
		createEAttribute(weightedUpDownProcedureEClass, WEIGHTED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS);
		createEAttribute(weightedUpDownProcedureEClass, WEIGHTED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS);
		createEOperation(weightedUpDownProcedureEClass, WEIGHTED_UP_DOWN_PROCEDURE___VALID_WEIGHTED_STEPS__DIAGNOSTICCHAIN_MAP);

		pestProcedureEClass = createEClass(PEST_PROCEDURE);
		createEAttribute(pestProcedureEClass, PEST_PROCEDURE__INITIAL_STEP);
		createEAttribute(pestProcedureEClass, PEST_PROCEDURE__MINIMUM_STEP);
		createEAttribute(pestProcedureEClass, PEST_PROCEDURE__MAXIMUM_STEP);
		createEAttribute(pestProcedureEClass, PEST_PROCEDURE__WALD_DEVIATION);
		createEAttribute(pestProcedureEClass, PEST_PROCEDURE__TARGET_PROBABILITY);
		createEOperation(pestProcedureEClass, PEST_PROCEDURE___VALID_PEST_STEPS__DIAGNOSTICCHAIN_MAP);

		questProcedureEClass = createEClass(QUEST_PROCEDURE);
		createEAttribute(questProcedureEClass, QUEST_PROCEDURE__VARIANT);
		createEAttribute(questProcedureEClass, QUEST_PROCEDURE__PRIOR_MEAN);
		createEAttribute(questProcedureEClass, QUEST_PROCEDURE__PRIOR_SD);
		createEAttribute(questProcedureEClass, QUEST_PROCEDURE__BETA);
		createEAttribute(questProcedureEClass, QUEST_PROCEDURE__LAPSE_RATE);
		createEAttribute(questProcedureEClass, QUEST_PROCEDURE__GUESS_RATE);
		createEAttribute(questProcedureEClass, QUEST_PROCEDURE__GRAIN);
		createEAttribute(questProcedureEClass, QUEST_PROCEDURE__RANGE);
		createEAttribute(questProcedureEClass, QUEST_PROCEDURE__PLACEMENT);
		createEOperation(questProcedureEClass, QUEST_PROCEDURE___VALID_QUEST_SETTINGS__DIAGNOSTICCHAIN_MAP);

		psiProcedureEClass = createEClass(PSI_PROCEDURE);
		createEAttribute(psiProcedureEClass, PSI_PROCEDURE__FAMILY);
		createEAttribute(psiProcedureEClass, PSI_PROCEDURE__THRESHOLD_MINIMUM);
		createEAttribute(psiProcedureEClass, PSI_PROCEDURE__THRESHOLD_MAXIMUM);
		createEAttribute(psiProcedureEClass, PSI_PROCEDURE__THRESHOLD_COUNT);
		createEAttribute(psiProcedureEClass, PSI_PROCEDURE__SLOPE_MINIMUM);
		createEAttribute(psiProcedureEClass, PSI_PROCEDURE__SLOPE_MAXIMUM);
		createEAttribute(psiProcedureEClass, PSI_PROCEDURE__SLOPE_COUNT);
		createEAttribute(psiProcedureEClass, PSI_PROCEDURE__STIMULUS_MINIMUM);
		createEAttribute(psiProcedureEClass, PSI_PROCEDURE__STIMULUS_MAXIMUM);
		createEAttribute(psiProcedureEClass, PSI_PROCEDURE__STIMULUS_COUNT);
		createEAttribute(psiProcedureEClass, PSI_PROCEDURE__LAPSE_MODE);
		createEAttribute(psiProcedureEClass, PSI_PROCEDURE__LAPSE_RATE);
		createEAttribute(psiProcedureEClass, PSI_PROCEDURE__LAPSE_MINIMUM);
		createEAttribute(psiProcedureEClass, PSI_PROCEDURE__LAPSE_MAXIMUM);
		createEAttribute(psiProcedureEClass, PSI_PROCEDURE__LAPSE_COUNT);
		createEAttribute(psiProcedureEClass, PSI_PROCEDURE__GUESS_RATE);
		createEOperation(psiProcedureEClass, PSI_PROCEDURE___VALID_PSI_GRIDS__DIAGNOSTICCHAIN_MAP);

		constantStimuliProcedureEClass = createEClass(CONSTANT_STIMULI_PROCEDURE);
		createEAttribute(constantStimuliProcedureEClass, CONSTANT_STIMULI_PROCEDURE__VALUES);
		createEAttribute(constantStimuliProcedureEClass, CONSTANT_STIMULI_PROCEDURE__REPETITIONS_PER_VALUE);
		createEAttribute(constantStimuliProcedureEClass, CONSTANT_STIMULI_PROCEDURE__BLOCKED_SHUFFLE);
		createEOperation(constantStimuliProcedureEClass, CONSTANT_STIMULI_PROCEDURE___VALID_CONSTANT_STIMULI__DIAGNOSTICCHAIN_MAP);

		contributedProcedureEClass = createEClass(CONTRIBUTED_PROCEDURE);
		createEReference(contributedProcedureEClass, CONTRIBUTED_PROCEDURE__SETTINGS);

		stoppingRuleEClass = createEClass(STOPPING_RULE);
		createEAttribute(stoppingRuleEClass, STOPPING_RULE__MAXIMUM_REVERSALS);
		createEAttribute(stoppingRuleEClass, STOPPING_RULE__MAXIMUM_TRIALS);
		createEAttribute(stoppingRuleEClass, STOPPING_RULE__POSTERIOR_SD_TARGET);
		createEOperation(stoppingRuleEClass, STOPPING_RULE___CAN_END__DIAGNOSTICCHAIN_MAP);

		settingsGroupEClass = createEClass(SETTINGS_GROUP);
		createEAttribute(settingsGroupEClass, SETTINGS_GROUP__CONTRIBUTOR_ID);
		createEReference(settingsGroupEClass, SETTINGS_GROUP__ENTRIES);
		createEOperation(settingsGroupEClass, SETTINGS_GROUP___VALID_SETTINGS__DIAGNOSTICCHAIN_MAP);

		settingEClass = createEClass(SETTING);
		createEAttribute(settingEClass, SETTING__NAME);
		createEAttribute(settingEClass, SETTING__VALUE);
		createEAttribute(settingEClass, SETTING__TYPE);

		calibrationEClass = createEClass(CALIBRATION);
		createEAttribute(calibrationEClass, CALIBRATION__NAME);
		createEAttribute(calibrationEClass, CALIBRATION__DEVICE);
		createEAttribute(calibrationEClass, CALIBRATION__TRANSDUCER);
		createEAttribute(calibrationEClass, CALIBRATION__REFERENCE_LEVEL_DBFS);
		createEAttribute(calibrationEClass, CALIBRATION__SAMPLE_RATE_HZ);
		createEAttribute(calibrationEClass, CALIBRATION__CEILING_DB_SPL);
		createEAttribute(calibrationEClass, CALIBRATION__MEASURED_BY);
		createEAttribute(calibrationEClass, CALIBRATION__MEASURED_ON);
		createEAttribute(calibrationEClass, CALIBRATION__DEMONSTRATION_ONLY);
		createEAttribute(calibrationEClass, CALIBRATION__NOTES);
		createEReference(calibrationEClass, CALIBRATION__POINTS);
		createEOperation(calibrationEClass, CALIBRATION___VALID_CALIBRATION__DIAGNOSTICCHAIN_MAP);

		calibrationPointEClass = createEClass(CALIBRATION_POINT);
		createEAttribute(calibrationPointEClass, CALIBRATION_POINT__FREQUENCY_HZ);
		createEAttribute(calibrationPointEClass, CALIBRATION_POINT__MEASURED_DB_SPL);

		sessionHeaderEClass = createEClass(SESSION_HEADER);
		createEAttribute(sessionHeaderEClass, SESSION_HEADER__PARTICIPANT);
		createEReference(sessionHeaderEClass, SESSION_HEADER__BATTERY);
		createEReference(sessionHeaderEClass, SESSION_HEADER__CALIBRATION);
		createEAttribute(sessionHeaderEClass, SESSION_HEADER__DEVICE);
		createEAttribute(sessionHeaderEClass, SESSION_HEADER__RANDOM_SEED);
		createEAttribute(sessionHeaderEClass, SESSION_HEADER__SOFTWARE_VERSION);
		createEAttribute(sessionHeaderEClass, SESSION_HEADER__START_TIME);
		createEAttribute(sessionHeaderEClass, SESSION_HEADER__END_TIME);
		createEAttribute(sessionHeaderEClass, SESSION_HEADER__STATUS);
		createEAttribute(sessionHeaderEClass, SESSION_HEADER__LATIN_SQUARE_ROW);
		createEReference(sessionHeaderEClass, SESSION_HEADER__STEP_ORDER);
		createEReference(sessionHeaderEClass, SESSION_HEADER__EXPOSURE);
		createEOperation(sessionHeaderEClass, SESSION_HEADER___VALID_SESSION__DIAGNOSTICCHAIN_MAP);

		exposureEstimateEClass = createEClass(EXPOSURE_ESTIMATE);
		createEAttribute(exposureEstimateEClass, EXPOSURE_ESTIMATE__PEAK_LEVEL_DB_SPL);
		createEAttribute(exposureEstimateEClass, EXPOSURE_ESTIMATE__EQUIVALENT_LEVEL_DB_SPL);
		createEAttribute(exposureEstimateEClass, EXPOSURE_ESTIMATE__SOUND_ON_SECONDS);
		createEAttribute(exposureEstimateEClass, EXPOSURE_ESTIMATE__NIOSH_DOSE_PERCENT);
		createEAttribute(exposureEstimateEClass, EXPOSURE_ESTIMATE__OSHA_DOSE_PERCENT);

		// Create enums
		earlyResponsePolicyEEnum = createEEnum(EARLY_RESPONSE_POLICY);
		orderingPolicyEEnum = createEEnum(ORDERING_POLICY);
		stimulusKindEEnum = createEEnum(STIMULUS_KIND);
		earEEnum = createEEnum(EAR);
		quantityUnitEEnum = createEEnum(QUANTITY_UNIT);
		scaleEEnum = createEEnum(SCALE);
		stepModeEEnum = createEEnum(STEP_MODE);
		bayesianVariantEEnum = createEEnum(BAYESIAN_VARIANT);
		estimatePlacementEEnum = createEEnum(ESTIMATE_PLACEMENT);
		lapseModeEEnum = createEEnum(LAPSE_MODE);
		psychometricFamilyEEnum = createEEnum(PSYCHOMETRIC_FAMILY);
		noiseSpectrumEEnum = createEEnum(NOISE_SPECTRUM);
		settingTypeEEnum = createEEnum(SETTING_TYPE);
		sessionStatusEEnum = createEEnum(SESSION_STATUS);

		// Create data types
		instantEDataType = createEDataType(INSTANT);
		localDateEDataType = createEDataType(LOCAL_DATE);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private boolean isInitialized = false;

	/**
	 * Complete the initialization of the package and its meta-model.  This
	 * method is guarded to have no affect on any invocation but its first.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public void initializePackageContents() {
		if (isInitialized) return;
		isInitialized = true;

		// Initialize package
		setName(eNAME);
		setNsPrefix(eNS_PREFIX);
		setNsURI(eNS_URI);

		// Create type parameters

		// Set bounds for type parameters

		// Add supertypes to classes
		batteryEClass.getESuperTypes().add(this.getLimenDocument());
		forcedChoiceTaskEClass.getESuperTypes().add(this.getTask());
		yesNoTaskEClass.getESuperTypes().add(this.getTask());
		absoluteLevelEClass.getESuperTypes().add(this.getLevel());
		relativeLevelEClass.getESuperTypes().add(this.getLevel());
		staircaseProcedureEClass.getESuperTypes().add(this.getProcedure());
		transformedUpDownProcedureEClass.getESuperTypes().add(this.getStaircaseProcedure());
		weightedUpDownProcedureEClass.getESuperTypes().add(this.getStaircaseProcedure());
		pestProcedureEClass.getESuperTypes().add(this.getStaircaseProcedure());
		questProcedureEClass.getESuperTypes().add(this.getProcedure());
		psiProcedureEClass.getESuperTypes().add(this.getProcedure());
		constantStimuliProcedureEClass.getESuperTypes().add(this.getProcedure());
		contributedProcedureEClass.getESuperTypes().add(this.getProcedure());
		calibrationEClass.getESuperTypes().add(this.getLimenDocument());
		sessionHeaderEClass.getESuperTypes().add(this.getLimenDocument());

		// Initialize classes, features, and operations; add parameters
		initEClass(limenDocumentEClass, LimenDocument.class, "LimenDocument", IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getLimenDocument_SchemaVersion(), ecorePackage.getEInt(), "schemaVersion", null, 0, 1, LimenDocument.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(batteryEClass, Battery.class, "Battery", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getBattery_Title(), ecorePackage.getEString(), "title", null, 1, 1, Battery.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getBattery_Notes(), ecorePackage.getEString(), "notes", null, 0, 1, Battery.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getBattery_CalibrationFile(), ecorePackage.getEString(), "calibrationFile", null, 0, 1, Battery.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getBattery_Ordering(), this.getOrderingPolicy(), "ordering", null, 0, 1, Battery.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getBattery_ShuffleSeed(), ecorePackage.getELong(), "shuffleSeed", null, 0, 1, Battery.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getBattery_Steps(), this.getStep(), null, "steps", null, 1, -1, Battery.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getBattery_Breaks(), this.getBreak(), null, "breaks", null, 0, -1, Battery.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		EOperation op = initEOperation(getBattery__UniqueStepIds__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "uniqueStepIds", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		EGenericType g1 = createEGenericType(ecorePackage.getEMap());
		EGenericType g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		op = initEOperation(getBattery__ValidOrdering__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "validOrdering", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		op = initEOperation(getBattery__ValidBreaks__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "validBreaks", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		op = initEOperation(getBattery__NoReferenceCycles__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "noReferenceCycles", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		initEClass(breakEClass, Break.class, "Break", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getBreak_AfterStepCount(), ecorePackage.getEInt(), "afterStepCount", null, 0, 1, Break.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getBreak_MinimumDurationSeconds(), ecorePackage.getEDouble(), "minimumDurationSeconds", null, 0, 1, Break.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getBreak_Message(), ecorePackage.getEString(), "message", null, 0, 1, Break.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(stepEClass, Step.class, "Step", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getStep_Id(), ecorePackage.getEString(), "id", null, 1, 1, Step.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getStep_Title(), ecorePackage.getEString(), "title", null, 1, 1, Step.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getStep_Notes(), ecorePackage.getEString(), "notes", null, 0, 1, Step.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getStep_FixedPosition(), ecorePackage.getEBoolean(), "fixedPosition", null, 0, 1, Step.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getStep_Task(), this.getTask(), null, "task", null, 1, 1, Step.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getStep_Stimulus(), this.getStimulus(), null, "stimulus", null, 1, 1, Step.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getStep_VariedQuantity(), this.getVariedQuantity(), null, "variedQuantity", null, 1, 1, Step.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getStep_Tracks(), this.getTrack(), null, "tracks", null, 1, -1, Step.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		op = initEOperation(getStep__ConsistentQuantity__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "consistentQuantity", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		op = initEOperation(getStep__LevelsWithinCeiling__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "levelsWithinCeiling", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		op = initEOperation(getStep__FrequenciesWithinRange__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "frequenciesWithinRange", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		initEClass(taskEClass, Task.class, "Task", IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getTask_IntervalDurationSeconds(), ecorePackage.getEDouble(), "intervalDurationSeconds", null, 0, 1, Task.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getTask_ResponseWindowSeconds(), ecorePackage.getEDouble(), "responseWindowSeconds", null, 0, 1, Task.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getTask_InterTrialIntervalSeconds(), ecorePackage.getEDouble(), "interTrialIntervalSeconds", null, 0, 1, Task.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getTask_Feedback(), ecorePackage.getEBoolean(), "feedback", null, 0, 1, Task.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getTask_EarlyResponses(), this.getEarlyResponsePolicy(), "earlyResponses", null, 0, 1, Task.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		op = initEOperation(getTask__ValidTiming__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "validTiming", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		initEClass(forcedChoiceTaskEClass, ForcedChoiceTask.class, "ForcedChoiceTask", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getForcedChoiceTask_IntervalCount(), ecorePackage.getEInt(), "intervalCount", null, 0, 1, ForcedChoiceTask.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getForcedChoiceTask_InterStimulusIntervalSeconds(), ecorePackage.getEDouble(), "interStimulusIntervalSeconds", null, 0, 1, ForcedChoiceTask.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		op = initEOperation(getForcedChoiceTask__ValidIntervals__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "validIntervals", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		initEClass(yesNoTaskEClass, YesNoTask.class, "YesNoTask", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getYesNoTask_CatchTrialRate(), ecorePackage.getEDouble(), "catchTrialRate", null, 0, 1, YesNoTask.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		op = initEOperation(getYesNoTask__ValidCatchTrials__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "validCatchTrials", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		initEClass(stimulusEClass, Stimulus.class, "Stimulus", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getStimulus_Kind(), this.getStimulusKind(), "kind", null, 0, 1, Stimulus.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getStimulus_StandardFrequencyHz(), ecorePackage.getEDouble(), "standardFrequencyHz", null, 0, 1, Stimulus.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getStimulus_StandardLevel(), this.getLevel(), null, "standardLevel", null, 0, 1, Stimulus.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getStimulus_RampDurationSeconds(), ecorePackage.getEDouble(), "rampDurationSeconds", null, 0, 1, Stimulus.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getStimulus_Ear(), this.getEar(), "ear", null, 0, 1, Stimulus.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getStimulus_Masker(), this.getMaskerNoise(), null, "masker", null, 0, 1, Stimulus.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getStimulus_Contributions(), this.getSettingsGroup(), null, "contributions", null, 0, -1, Stimulus.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		op = initEOperation(getStimulus__ValidTone__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "validTone", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		op = initEOperation(getStimulus__ValidStandardLevel__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "validStandardLevel", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		op = initEOperation(getStimulus__ValidMasker__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "validMasker", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		initEClass(levelEClass, Level.class, "Level", IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);

		initEClass(absoluteLevelEClass, AbsoluteLevel.class, "AbsoluteLevel", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getAbsoluteLevel_LevelDbSpl(), ecorePackage.getEDouble(), "levelDbSpl", null, 0, 1, AbsoluteLevel.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(relativeLevelEClass, RelativeLevel.class, "RelativeLevel", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEReference(getRelativeLevel_Reference(), this.getStep(), null, "reference", null, 1, 1, RelativeLevel.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getRelativeLevel_OffsetDb(), ecorePackage.getEDouble(), "offsetDb", null, 0, 1, RelativeLevel.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		op = initEOperation(getRelativeLevel__ValidReference__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "validReference", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		initEClass(maskerNoiseEClass, MaskerNoise.class, "MaskerNoise", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getMaskerNoise_Spectrum(), this.getNoiseSpectrum(), "spectrum", null, 0, 1, MaskerNoise.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getMaskerNoise_LowCutoffHz(), ecorePackage.getEDouble(), "lowCutoffHz", null, 0, 1, MaskerNoise.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getMaskerNoise_HighCutoffHz(), ecorePackage.getEDouble(), "highCutoffHz", null, 0, 1, MaskerNoise.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getMaskerNoise_Level(), this.getLevel(), null, "level", null, 1, 1, MaskerNoise.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getMaskerNoise_Continuous(), ecorePackage.getEBoolean(), "continuous", null, 0, 1, MaskerNoise.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(variedQuantityEClass, VariedQuantity.class, "VariedQuantity", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getVariedQuantity_Unit(), this.getQuantityUnit(), "unit", null, 0, 1, VariedQuantity.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getVariedQuantity_Scale(), this.getScale(), "scale", null, 0, 1, VariedQuantity.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(trackEClass, Track.class, "Track", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getTrack_Name(), ecorePackage.getEString(), "name", null, 1, 1, Track.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getTrack_Procedure(), this.getProcedure(), null, "procedure", null, 1, 1, Track.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getTrack_StoppingRule(), this.getStoppingRule(), null, "stoppingRule", null, 1, 1, Track.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(procedureEClass, Procedure.class, "Procedure", IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);

		initEClass(staircaseProcedureEClass, StaircaseProcedure.class, "StaircaseProcedure", IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getStaircaseProcedure_StartValue(), ecorePackage.getEDouble(), "startValue", null, 0, 1, StaircaseProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getStaircaseProcedure_FloorValue(), ecorePackage.getEDouble(), "floorValue", null, 0, 1, StaircaseProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getStaircaseProcedure_CeilingValue(), ecorePackage.getEDouble(), "ceilingValue", null, 0, 1, StaircaseProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getStaircaseProcedure_StepMode(), this.getStepMode(), "stepMode", null, 0, 1, StaircaseProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		op = initEOperation(getStaircaseProcedure__ValidLimits__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "validLimits", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		initEClass(transformedUpDownProcedureEClass, TransformedUpDownProcedure.class, "TransformedUpDownProcedure", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getTransformedUpDownProcedure_DownCount(), ecorePackage.getEInt(), "downCount", null, 0, 1, TransformedUpDownProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getTransformedUpDownProcedure_UpCount(), ecorePackage.getEInt(), "upCount", null, 0, 1, TransformedUpDownProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getTransformedUpDownProcedure_InitialStep(), ecorePackage.getEDouble(), "initialStep", null, 0, 1, TransformedUpDownProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getTransformedUpDownProcedure_MinimumStep(), ecorePackage.getEDouble(), "minimumStep", null, 0, 1, TransformedUpDownProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getTransformedUpDownProcedure_ShrinkFactor(), ecorePackage.getEDouble(), "shrinkFactor", null, 0, 1, TransformedUpDownProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getTransformedUpDownProcedure_ReversalsPerShrink(), ecorePackage.getEInt(), "reversalsPerShrink", null, 0, 1, TransformedUpDownProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getTransformedUpDownProcedure_DiscardedReversals(), ecorePackage.getEInt(), "discardedReversals", null, 0, 1, TransformedUpDownProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getTransformedUpDownProcedure_AveragedReversals(), ecorePackage.getEInt(), "averagedReversals", null, 0, 1, TransformedUpDownProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		op = initEOperation(getTransformedUpDownProcedure__ValidUpDownRule__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "validUpDownRule", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		initEClass(weightedUpDownProcedureEClass, WeightedUpDownProcedure.class, "WeightedUpDownProcedure", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getWeightedUpDownProcedure_TargetProbability(), ecorePackage.getEDouble(), "targetProbability", null, 0, 1, WeightedUpDownProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getWeightedUpDownProcedure_UpStep(), ecorePackage.getEDouble(), "upStep", null, 0, 1, WeightedUpDownProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getWeightedUpDownProcedure_DownStep(), ecorePackage.getEDouble(), "downStep", null, 0, 1, WeightedUpDownProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getWeightedUpDownProcedure_DiscardedReversals(), ecorePackage.getEInt(), "discardedReversals", null, 0, 1, WeightedUpDownProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getWeightedUpDownProcedure_AveragedReversals(), ecorePackage.getEInt(), "averagedReversals", null, 0, 1, WeightedUpDownProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		op = initEOperation(getWeightedUpDownProcedure__ValidWeightedSteps__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "validWeightedSteps", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		initEClass(pestProcedureEClass, PestProcedure.class, "PestProcedure", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getPestProcedure_InitialStep(), ecorePackage.getEDouble(), "initialStep", null, 0, 1, PestProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPestProcedure_MinimumStep(), ecorePackage.getEDouble(), "minimumStep", null, 0, 1, PestProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPestProcedure_MaximumStep(), ecorePackage.getEDouble(), "maximumStep", null, 0, 1, PestProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPestProcedure_WaldDeviation(), ecorePackage.getEDouble(), "waldDeviation", null, 0, 1, PestProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPestProcedure_TargetProbability(), ecorePackage.getEDouble(), "targetProbability", null, 0, 1, PestProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		op = initEOperation(getPestProcedure__ValidPestSteps__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "validPestSteps", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		initEClass(questProcedureEClass, QuestProcedure.class, "QuestProcedure", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getQuestProcedure_Variant(), this.getBayesianVariant(), "variant", null, 0, 1, QuestProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getQuestProcedure_PriorMean(), ecorePackage.getEDouble(), "priorMean", null, 0, 1, QuestProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getQuestProcedure_PriorSd(), ecorePackage.getEDouble(), "priorSd", null, 0, 1, QuestProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getQuestProcedure_Beta(), ecorePackage.getEDouble(), "beta", null, 0, 1, QuestProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getQuestProcedure_LapseRate(), ecorePackage.getEDouble(), "lapseRate", null, 0, 1, QuestProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getQuestProcedure_GuessRate(), ecorePackage.getEDouble(), "guessRate", null, 0, 1, QuestProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getQuestProcedure_Grain(), ecorePackage.getEDouble(), "grain", null, 0, 1, QuestProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getQuestProcedure_Range(), ecorePackage.getEDouble(), "range", null, 0, 1, QuestProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getQuestProcedure_Placement(), this.getEstimatePlacement(), "placement", null, 0, 1, QuestProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		op = initEOperation(getQuestProcedure__ValidQuestSettings__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "validQuestSettings", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		initEClass(psiProcedureEClass, PsiProcedure.class, "PsiProcedure", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getPsiProcedure_Family(), this.getPsychometricFamily(), "family", null, 0, 1, PsiProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPsiProcedure_ThresholdMinimum(), ecorePackage.getEDouble(), "thresholdMinimum", null, 0, 1, PsiProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPsiProcedure_ThresholdMaximum(), ecorePackage.getEDouble(), "thresholdMaximum", null, 0, 1, PsiProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPsiProcedure_ThresholdCount(), ecorePackage.getEInt(), "thresholdCount", null, 0, 1, PsiProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPsiProcedure_SlopeMinimum(), ecorePackage.getEDouble(), "slopeMinimum", null, 0, 1, PsiProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPsiProcedure_SlopeMaximum(), ecorePackage.getEDouble(), "slopeMaximum", null, 0, 1, PsiProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPsiProcedure_SlopeCount(), ecorePackage.getEInt(), "slopeCount", null, 0, 1, PsiProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPsiProcedure_StimulusMinimum(), ecorePackage.getEDouble(), "stimulusMinimum", null, 0, 1, PsiProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPsiProcedure_StimulusMaximum(), ecorePackage.getEDouble(), "stimulusMaximum", null, 0, 1, PsiProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPsiProcedure_StimulusCount(), ecorePackage.getEInt(), "stimulusCount", null, 0, 1, PsiProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPsiProcedure_LapseMode(), this.getLapseMode(), "lapseMode", null, 0, 1, PsiProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPsiProcedure_LapseRate(), ecorePackage.getEDouble(), "lapseRate", null, 0, 1, PsiProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPsiProcedure_LapseMinimum(), ecorePackage.getEDouble(), "lapseMinimum", null, 0, 1, PsiProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPsiProcedure_LapseMaximum(), ecorePackage.getEDouble(), "lapseMaximum", null, 0, 1, PsiProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPsiProcedure_LapseCount(), ecorePackage.getEInt(), "lapseCount", null, 0, 1, PsiProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPsiProcedure_GuessRate(), ecorePackage.getEDouble(), "guessRate", null, 0, 1, PsiProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		op = initEOperation(getPsiProcedure__ValidPsiGrids__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "validPsiGrids", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		initEClass(constantStimuliProcedureEClass, ConstantStimuliProcedure.class, "ConstantStimuliProcedure", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getConstantStimuliProcedure_Values(), ecorePackage.getEDouble(), "values", null, 1, -1, ConstantStimuliProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, !IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getConstantStimuliProcedure_RepetitionsPerValue(), ecorePackage.getEInt(), "repetitionsPerValue", null, 0, 1, ConstantStimuliProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getConstantStimuliProcedure_BlockedShuffle(), ecorePackage.getEBoolean(), "blockedShuffle", null, 0, 1, ConstantStimuliProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		op = initEOperation(getConstantStimuliProcedure__ValidConstantStimuli__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "validConstantStimuli", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		initEClass(contributedProcedureEClass, ContributedProcedure.class, "ContributedProcedure", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEReference(getContributedProcedure_Settings(), this.getSettingsGroup(), null, "settings", null, 1, 1, ContributedProcedure.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(stoppingRuleEClass, StoppingRule.class, "StoppingRule", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getStoppingRule_MaximumReversals(), ecorePackage.getEInt(), "maximumReversals", null, 0, 1, StoppingRule.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getStoppingRule_MaximumTrials(), ecorePackage.getEInt(), "maximumTrials", null, 0, 1, StoppingRule.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getStoppingRule_PosteriorSdTarget(), ecorePackage.getEDouble(), "posteriorSdTarget", null, 0, 1, StoppingRule.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		op = initEOperation(getStoppingRule__CanEnd__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "canEnd", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		initEClass(settingsGroupEClass, SettingsGroup.class, "SettingsGroup", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getSettingsGroup_ContributorId(), ecorePackage.getEString(), "contributorId", null, 1, 1, SettingsGroup.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getSettingsGroup_Entries(), this.getSetting(), null, "entries", null, 0, -1, SettingsGroup.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		op = initEOperation(getSettingsGroup__ValidSettings__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "validSettings", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		initEClass(settingEClass, Setting.class, "Setting", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getSetting_Name(), ecorePackage.getEString(), "name", null, 1, 1, Setting.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSetting_Value(), ecorePackage.getEString(), "value", null, 0, 1, Setting.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSetting_Type(), this.getSettingType(), "type", null, 0, 1, Setting.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(calibrationEClass, Calibration.class, "Calibration", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getCalibration_Name(), ecorePackage.getEString(), "name", null, 1, 1, Calibration.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCalibration_Device(), ecorePackage.getEString(), "device", null, 1, 1, Calibration.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCalibration_Transducer(), ecorePackage.getEString(), "transducer", null, 1, 1, Calibration.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCalibration_ReferenceLevelDbfs(), ecorePackage.getEDouble(), "referenceLevelDbfs", null, 0, 1, Calibration.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCalibration_SampleRateHz(), ecorePackage.getEInt(), "sampleRateHz", null, 0, 1, Calibration.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCalibration_CeilingDbSpl(), ecorePackage.getEDouble(), "ceilingDbSpl", null, 0, 1, Calibration.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCalibration_MeasuredBy(), ecorePackage.getEString(), "measuredBy", null, 0, 1, Calibration.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCalibration_MeasuredOn(), this.getLocalDate(), "measuredOn", null, 0, 1, Calibration.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCalibration_DemonstrationOnly(), ecorePackage.getEBoolean(), "demonstrationOnly", null, 0, 1, Calibration.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCalibration_Notes(), ecorePackage.getEString(), "notes", null, 0, 1, Calibration.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getCalibration_Points(), this.getCalibrationPoint(), null, "points", null, 1, -1, Calibration.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		op = initEOperation(getCalibration__ValidCalibration__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "validCalibration", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		initEClass(calibrationPointEClass, CalibrationPoint.class, "CalibrationPoint", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getCalibrationPoint_FrequencyHz(), ecorePackage.getEDouble(), "frequencyHz", null, 0, 1, CalibrationPoint.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCalibrationPoint_MeasuredDbSpl(), ecorePackage.getEDouble(), "measuredDbSpl", null, 0, 1, CalibrationPoint.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(sessionHeaderEClass, SessionHeader.class, "SessionHeader", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getSessionHeader_Participant(), ecorePackage.getEString(), "participant", null, 1, 1, SessionHeader.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getSessionHeader_Battery(), this.getBattery(), null, "battery", null, 1, 1, SessionHeader.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getSessionHeader_Calibration(), this.getCalibration(), null, "calibration", null, 1, 1, SessionHeader.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSessionHeader_Device(), ecorePackage.getEString(), "device", null, 0, 1, SessionHeader.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSessionHeader_RandomSeed(), ecorePackage.getELong(), "randomSeed", null, 0, 1, SessionHeader.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSessionHeader_SoftwareVersion(), ecorePackage.getEString(), "softwareVersion", null, 0, 1, SessionHeader.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSessionHeader_StartTime(), this.getInstant(), "startTime", null, 0, 1, SessionHeader.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSessionHeader_EndTime(), this.getInstant(), "endTime", null, 0, 1, SessionHeader.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSessionHeader_Status(), this.getSessionStatus(), "status", null, 0, 1, SessionHeader.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSessionHeader_LatinSquareRow(), ecorePackage.getEInt(), "latinSquareRow", null, 0, 1, SessionHeader.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getSessionHeader_StepOrder(), this.getStep(), null, "stepOrder", null, 0, -1, SessionHeader.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getSessionHeader_Exposure(), this.getExposureEstimate(), null, "exposure", null, 0, 1, SessionHeader.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		op = initEOperation(getSessionHeader__ValidSession__DiagnosticChain_Map(), ecorePackage.getEBoolean(), "validSession", 0, 1, IS_UNIQUE, IS_ORDERED);
		addEParameter(op, ecorePackage.getEDiagnosticChain(), "diagnostics", 0, 1, IS_UNIQUE, IS_ORDERED);
		g1 = createEGenericType(ecorePackage.getEMap());
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		g2 = createEGenericType(ecorePackage.getEJavaObject());
		g1.getETypeArguments().add(g2);
		addEParameter(op, g1, "context", 0, 1, IS_UNIQUE, IS_ORDERED);

		initEClass(exposureEstimateEClass, ExposureEstimate.class, "ExposureEstimate", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getExposureEstimate_PeakLevelDbSpl(), ecorePackage.getEDouble(), "peakLevelDbSpl", null, 0, 1, ExposureEstimate.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getExposureEstimate_EquivalentLevelDbSpl(), ecorePackage.getEDouble(), "equivalentLevelDbSpl", null, 0, 1, ExposureEstimate.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getExposureEstimate_SoundOnSeconds(), ecorePackage.getEDouble(), "soundOnSeconds", null, 0, 1, ExposureEstimate.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getExposureEstimate_NioshDosePercent(), ecorePackage.getEDouble(), "nioshDosePercent", null, 0, 1, ExposureEstimate.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getExposureEstimate_OshaDosePercent(), ecorePackage.getEDouble(), "oshaDosePercent", null, 0, 1, ExposureEstimate.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		// Initialize enums and add enum literals
		initEEnum(earlyResponsePolicyEEnum, EarlyResponsePolicy.class, "EarlyResponsePolicy");
		addEEnumLiteral(earlyResponsePolicyEEnum, EarlyResponsePolicy.IGNORE);
		addEEnumLiteral(earlyResponsePolicyEEnum, EarlyResponsePolicy.RECORD);

		initEEnum(orderingPolicyEEnum, OrderingPolicy.class, "OrderingPolicy");
		addEEnumLiteral(orderingPolicyEEnum, OrderingPolicy.FIXED);
		addEEnumLiteral(orderingPolicyEEnum, OrderingPolicy.SHUFFLED);
		addEEnumLiteral(orderingPolicyEEnum, OrderingPolicy.LATIN_SQUARE);

		initEEnum(stimulusKindEEnum, StimulusKind.class, "StimulusKind");
		addEEnumLiteral(stimulusKindEEnum, StimulusKind.FREQUENCY_DISCRIMINATION);
		addEEnumLiteral(stimulusKindEEnum, StimulusKind.INTENSITY_DISCRIMINATION);
		addEEnumLiteral(stimulusKindEEnum, StimulusKind.DETECTION_QUIET);
		addEEnumLiteral(stimulusKindEEnum, StimulusKind.DETECTION_NOISE);

		initEEnum(earEEnum, Ear.class, "Ear");
		addEEnumLiteral(earEEnum, Ear.BOTH);
		addEEnumLiteral(earEEnum, Ear.LEFT);
		addEEnumLiteral(earEEnum, Ear.RIGHT);

		initEEnum(quantityUnitEEnum, QuantityUnit.class, "QuantityUnit");
		addEEnumLiteral(quantityUnitEEnum, QuantityUnit.HZ);
		addEEnumLiteral(quantityUnitEEnum, QuantityUnit.PERCENT);
		addEEnumLiteral(quantityUnitEEnum, QuantityUnit.CENTS);
		addEEnumLiteral(quantityUnitEEnum, QuantityUnit.DB);
		addEEnumLiteral(quantityUnitEEnum, QuantityUnit.DB_SPL);

		initEEnum(scaleEEnum, Scale.class, "Scale");
		addEEnumLiteral(scaleEEnum, Scale.LINEAR);
		addEEnumLiteral(scaleEEnum, Scale.LOG);

		initEEnum(stepModeEEnum, StepMode.class, "StepMode");
		addEEnumLiteral(stepModeEEnum, StepMode.ADDITIVE);
		addEEnumLiteral(stepModeEEnum, StepMode.MULTIPLICATIVE);

		initEEnum(bayesianVariantEEnum, BayesianVariant.class, "BayesianVariant");
		addEEnumLiteral(bayesianVariantEEnum, BayesianVariant.QUEST);
		addEEnumLiteral(bayesianVariantEEnum, BayesianVariant.ZEST);

		initEEnum(estimatePlacementEEnum, EstimatePlacement.class, "EstimatePlacement");
		addEEnumLiteral(estimatePlacementEEnum, EstimatePlacement.MEAN);
		addEEnumLiteral(estimatePlacementEEnum, EstimatePlacement.MODE);

		initEEnum(lapseModeEEnum, LapseMode.class, "LapseMode");
		addEEnumLiteral(lapseModeEEnum, LapseMode.FIXED);
		addEEnumLiteral(lapseModeEEnum, LapseMode.MARGINALIZED);

		initEEnum(psychometricFamilyEEnum, PsychometricFamily.class, "PsychometricFamily");
		addEEnumLiteral(psychometricFamilyEEnum, PsychometricFamily.LOGISTIC);
		addEEnumLiteral(psychometricFamilyEEnum, PsychometricFamily.CUMULATIVE_NORMAL);
		addEEnumLiteral(psychometricFamilyEEnum, PsychometricFamily.WEIBULL);

		initEEnum(noiseSpectrumEEnum, NoiseSpectrum.class, "NoiseSpectrum");
		addEEnumLiteral(noiseSpectrumEEnum, NoiseSpectrum.WHITE);
		addEEnumLiteral(noiseSpectrumEEnum, NoiseSpectrum.PINK);

		initEEnum(settingTypeEEnum, SettingType.class, "SettingType");
		addEEnumLiteral(settingTypeEEnum, SettingType.STRING);
		addEEnumLiteral(settingTypeEEnum, SettingType.INTEGER);
		addEEnumLiteral(settingTypeEEnum, SettingType.REAL);
		addEEnumLiteral(settingTypeEEnum, SettingType.BOOLEAN);

		initEEnum(sessionStatusEEnum, SessionStatus.class, "SessionStatus");
		addEEnumLiteral(sessionStatusEEnum, SessionStatus.RUNNING);
		addEEnumLiteral(sessionStatusEEnum, SessionStatus.COMPLETED);
		addEEnumLiteral(sessionStatusEEnum, SessionStatus.ABORTED);
		addEEnumLiteral(sessionStatusEEnum, SessionStatus.INTERRUPTED);

		// Initialize data types
		initEDataType(instantEDataType, Instant.class, "Instant", IS_SERIALIZABLE, !IS_GENERATED_INSTANCE_CLASS);
		initEDataType(localDateEDataType, LocalDate.class, "LocalDate", IS_SERIALIZABLE, !IS_GENERATED_INSTANCE_CLASS);

		// Create resource
		createResource(eNS_URI);
	}

} //LimenPackageImpl
