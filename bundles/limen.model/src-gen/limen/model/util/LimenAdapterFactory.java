/**
 */
package limen.model.util;

import limen.model.*;

import org.eclipse.emf.common.notify.Adapter;
import org.eclipse.emf.common.notify.Notifier;

import org.eclipse.emf.common.notify.impl.AdapterFactoryImpl;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * The <b>Adapter Factory</b> for the model.
 * It provides an adapter <code>createXXX</code> method for each class of the model.
 * <!-- end-user-doc -->
 * @see limen.model.LimenPackage
 * @generated
 */
public class LimenAdapterFactory extends AdapterFactoryImpl {
	/**
	 * The cached model package.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected static LimenPackage modelPackage;

	/**
	 * Creates an instance of the adapter factory.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public LimenAdapterFactory() {
		if (modelPackage == null) {
			modelPackage = LimenPackage.eINSTANCE;
		}
	}

	/**
	 * Returns whether this factory is applicable for the type of the object.
	 * <!-- begin-user-doc -->
	 * This implementation returns <code>true</code> if the object is either the model's package or is an instance object of the model.
	 * <!-- end-user-doc -->
	 * @return whether this factory is applicable for the type of the object.
	 * @generated
	 */
	@Override
	public boolean isFactoryForType(Object object) {
		if (object == modelPackage) {
			return true;
		}
		if (object instanceof EObject) {
			return ((EObject)object).eClass().getEPackage() == modelPackage;
		}
		return false;
	}

	/**
	 * The switch that delegates to the <code>createXXX</code> methods.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected LimenSwitch<Adapter> modelSwitch =
		new LimenSwitch<Adapter>() {
			@Override
			public Adapter caseLimenDocument(LimenDocument object) {
				return createLimenDocumentAdapter();
			}
			@Override
			public Adapter caseBattery(Battery object) {
				return createBatteryAdapter();
			}
			@Override
			public Adapter caseBreak(Break object) {
				return createBreakAdapter();
			}
			@Override
			public Adapter caseStep(Step object) {
				return createStepAdapter();
			}
			@Override
			public Adapter caseTask(Task object) {
				return createTaskAdapter();
			}
			@Override
			public Adapter caseForcedChoiceTask(ForcedChoiceTask object) {
				return createForcedChoiceTaskAdapter();
			}
			@Override
			public Adapter caseYesNoTask(YesNoTask object) {
				return createYesNoTaskAdapter();
			}
			@Override
			public Adapter caseStimulus(Stimulus object) {
				return createStimulusAdapter();
			}
			@Override
			public Adapter caseLevel(Level object) {
				return createLevelAdapter();
			}
			@Override
			public Adapter caseAbsoluteLevel(AbsoluteLevel object) {
				return createAbsoluteLevelAdapter();
			}
			@Override
			public Adapter caseRelativeLevel(RelativeLevel object) {
				return createRelativeLevelAdapter();
			}
			@Override
			public Adapter caseMaskerNoise(MaskerNoise object) {
				return createMaskerNoiseAdapter();
			}
			@Override
			public Adapter caseVariedQuantity(VariedQuantity object) {
				return createVariedQuantityAdapter();
			}
			@Override
			public Adapter caseTrack(Track object) {
				return createTrackAdapter();
			}
			@Override
			public Adapter caseProcedure(Procedure object) {
				return createProcedureAdapter();
			}
			@Override
			public Adapter caseStaircaseProcedure(StaircaseProcedure object) {
				return createStaircaseProcedureAdapter();
			}
			@Override
			public Adapter caseTransformedUpDownProcedure(TransformedUpDownProcedure object) {
				return createTransformedUpDownProcedureAdapter();
			}
			@Override
			public Adapter caseWeightedUpDownProcedure(WeightedUpDownProcedure object) {
				return createWeightedUpDownProcedureAdapter();
			}
			@Override
			public Adapter casePestProcedure(PestProcedure object) {
				return createPestProcedureAdapter();
			}
			@Override
			public Adapter caseQuestProcedure(QuestProcedure object) {
				return createQuestProcedureAdapter();
			}
			@Override
			public Adapter casePsiProcedure(PsiProcedure object) {
				return createPsiProcedureAdapter();
			}
			@Override
			public Adapter caseConstantStimuliProcedure(ConstantStimuliProcedure object) {
				return createConstantStimuliProcedureAdapter();
			}
			@Override
			public Adapter caseContributedProcedure(ContributedProcedure object) {
				return createContributedProcedureAdapter();
			}
			@Override
			public Adapter caseStoppingRule(StoppingRule object) {
				return createStoppingRuleAdapter();
			}
			@Override
			public Adapter caseSettingsGroup(SettingsGroup object) {
				return createSettingsGroupAdapter();
			}
			@Override
			public Adapter caseSetting(Setting object) {
				return createSettingAdapter();
			}
			@Override
			public Adapter caseCalibration(Calibration object) {
				return createCalibrationAdapter();
			}
			@Override
			public Adapter caseCalibrationPoint(CalibrationPoint object) {
				return createCalibrationPointAdapter();
			}
			@Override
			public Adapter caseSessionHeader(SessionHeader object) {
				return createSessionHeaderAdapter();
			}
			@Override
			public Adapter caseExposureEstimate(ExposureEstimate object) {
				return createExposureEstimateAdapter();
			}
			@Override
			public Adapter defaultCase(EObject object) {
				return createEObjectAdapter();
			}
		};

	/**
	 * Creates an adapter for the <code>target</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param target the object to adapt.
	 * @return the adapter for the <code>target</code>.
	 * @generated
	 */
	@Override
	public Adapter createAdapter(Notifier target) {
		return modelSwitch.doSwitch((EObject)target);
	}


	/**
	 * Creates a new adapter for an object of class '{@link limen.model.LimenDocument <em>Document</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.LimenDocument
	 * @generated
	 */
	public Adapter createLimenDocumentAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.Battery <em>Battery</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.Battery
	 * @generated
	 */
	public Adapter createBatteryAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.Break <em>Break</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.Break
	 * @generated
	 */
	public Adapter createBreakAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.Step <em>Step</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.Step
	 * @generated
	 */
	public Adapter createStepAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.Task <em>Task</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.Task
	 * @generated
	 */
	public Adapter createTaskAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.ForcedChoiceTask <em>Forced Choice Task</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.ForcedChoiceTask
	 * @generated
	 */
	public Adapter createForcedChoiceTaskAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.YesNoTask <em>Yes No Task</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.YesNoTask
	 * @generated
	 */
	public Adapter createYesNoTaskAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.Stimulus <em>Stimulus</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.Stimulus
	 * @generated
	 */
	public Adapter createStimulusAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.Level <em>Level</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.Level
	 * @generated
	 */
	public Adapter createLevelAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.AbsoluteLevel <em>Absolute Level</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.AbsoluteLevel
	 * @generated
	 */
	public Adapter createAbsoluteLevelAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.RelativeLevel <em>Relative Level</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.RelativeLevel
	 * @generated
	 */
	public Adapter createRelativeLevelAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.MaskerNoise <em>Masker Noise</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.MaskerNoise
	 * @generated
	 */
	public Adapter createMaskerNoiseAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.VariedQuantity <em>Varied Quantity</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.VariedQuantity
	 * @generated
	 */
	public Adapter createVariedQuantityAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.Track <em>Track</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.Track
	 * @generated
	 */
	public Adapter createTrackAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.Procedure <em>Procedure</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.Procedure
	 * @generated
	 */
	public Adapter createProcedureAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.StaircaseProcedure <em>Staircase Procedure</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.StaircaseProcedure
	 * @generated
	 */
	public Adapter createStaircaseProcedureAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.TransformedUpDownProcedure <em>Transformed Up Down Procedure</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.TransformedUpDownProcedure
	 * @generated
	 */
	public Adapter createTransformedUpDownProcedureAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.WeightedUpDownProcedure <em>Weighted Up Down Procedure</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.WeightedUpDownProcedure
	 * @generated
	 */
	public Adapter createWeightedUpDownProcedureAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.PestProcedure <em>Pest Procedure</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.PestProcedure
	 * @generated
	 */
	public Adapter createPestProcedureAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.QuestProcedure <em>Quest Procedure</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.QuestProcedure
	 * @generated
	 */
	public Adapter createQuestProcedureAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.PsiProcedure <em>Psi Procedure</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.PsiProcedure
	 * @generated
	 */
	public Adapter createPsiProcedureAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.ConstantStimuliProcedure <em>Constant Stimuli Procedure</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.ConstantStimuliProcedure
	 * @generated
	 */
	public Adapter createConstantStimuliProcedureAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.ContributedProcedure <em>Contributed Procedure</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.ContributedProcedure
	 * @generated
	 */
	public Adapter createContributedProcedureAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.StoppingRule <em>Stopping Rule</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.StoppingRule
	 * @generated
	 */
	public Adapter createStoppingRuleAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.SettingsGroup <em>Settings Group</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.SettingsGroup
	 * @generated
	 */
	public Adapter createSettingsGroupAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.Setting <em>Setting</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.Setting
	 * @generated
	 */
	public Adapter createSettingAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.Calibration <em>Calibration</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.Calibration
	 * @generated
	 */
	public Adapter createCalibrationAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.CalibrationPoint <em>Calibration Point</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.CalibrationPoint
	 * @generated
	 */
	public Adapter createCalibrationPointAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.SessionHeader <em>Session Header</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.SessionHeader
	 * @generated
	 */
	public Adapter createSessionHeaderAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link limen.model.ExposureEstimate <em>Exposure Estimate</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see limen.model.ExposureEstimate
	 * @generated
	 */
	public Adapter createExposureEstimateAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for the default case.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @generated
	 */
	public Adapter createEObjectAdapter() {
		return null;
	}

} //LimenAdapterFactory
