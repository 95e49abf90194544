/**
 */
package limen.model.util;

import limen.model.*;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EPackage;

import org.eclipse.emf.ecore.util.Switch;

/**
 * <!-- begin-user-doc -->
 * The <b>Switch</b> for the model's inheritance hierarchy.
 * It supports the call {@link #doSwitch(EObject) doSwitch(object)}
 * to invoke the <code>caseXXX</code> method for each class of the model,
 * starting with the actual class of the object
 * and proceeding up the inheritance hierarchy
 * until a non-null result is returned,
 * which is the result of the switch.
 * <!-- end-user-doc -->
 * @see limen.model.LimenPackage
 * @generated
 */
public class LimenSwitch<T> extends Switch<T> {
	/**
	 * The cached model package
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected static LimenPackage modelPackage;

	/**
	 * Creates an instance of the switch.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public LimenSwitch() {
		if (modelPackage == null) {
			modelPackage = LimenPackage.eINSTANCE;
		}
	}

	/**
	 * Checks whether this is a switch for the given package.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param ePackage the package in question.
	 * @return whether this is a switch for the given package.
	 * @generated
	 */
	@Override
	protected boolean isSwitchFor(EPackage ePackage) {
		return ePackage == modelPackage;
	}

	/**
	 * Calls <code>caseXXX</code> for each class of the model until one returns a non null result; it yields that result.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the first non-null result returned by a <code>caseXXX</code> call.
	 * @generated
	 */
	@Override
	protected T doSwitch(int classifierID, EObject theEObject) {
		switch (classifierID) {
			case LimenPackage.LIMEN_DOCUMENT: {
				LimenDocument limenDocument = (LimenDocument)theEObject;
				T result = caseLimenDocument(limenDocument);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.BATTERY: {
				Battery battery = (Battery)theEObject;
				T result = caseBattery(battery);
				if (result == null) result = caseLimenDocument(battery);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.BREAK: {
				Break break_ = (Break)theEObject;
				T result = caseBreak(break_);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.STEP: {
				Step step = (Step)theEObject;
				T result = caseStep(step);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.TASK: {
				Task task = (Task)theEObject;
				T result = caseTask(task);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.FORCED_CHOICE_TASK: {
				ForcedChoiceTask forcedChoiceTask = (ForcedChoiceTask)theEObject;
				T result = caseForcedChoiceTask(forcedChoiceTask);
				if (result == null) result = caseTask(forcedChoiceTask);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.YES_NO_TASK: {
				YesNoTask yesNoTask = (YesNoTask)theEObject;
				T result = caseYesNoTask(yesNoTask);
				if (result == null) result = caseTask(yesNoTask);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.STIMULUS: {
				Stimulus stimulus = (Stimulus)theEObject;
				T result = caseStimulus(stimulus);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.LEVEL: {
				Level level = (Level)theEObject;
				T result = caseLevel(level);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.ABSOLUTE_LEVEL: {
				AbsoluteLevel absoluteLevel = (AbsoluteLevel)theEObject;
				T result = caseAbsoluteLevel(absoluteLevel);
				if (result == null) result = caseLevel(absoluteLevel);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.RELATIVE_LEVEL: {
				RelativeLevel relativeLevel = (RelativeLevel)theEObject;
				T result = caseRelativeLevel(relativeLevel);
				if (result == null) result = caseLevel(relativeLevel);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.MASKER_NOISE: {
				MaskerNoise maskerNoise = (MaskerNoise)theEObject;
				T result = caseMaskerNoise(maskerNoise);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.VARIED_QUANTITY: {
				VariedQuantity variedQuantity = (VariedQuantity)theEObject;
				T result = caseVariedQuantity(variedQuantity);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.TRACK: {
				Track track = (Track)theEObject;
				T result = caseTrack(track);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.PROCEDURE: {
				Procedure procedure = (Procedure)theEObject;
				T result = caseProcedure(procedure);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.STAIRCASE_PROCEDURE: {
				StaircaseProcedure staircaseProcedure = (StaircaseProcedure)theEObject;
				T result = caseStaircaseProcedure(staircaseProcedure);
				if (result == null) result = caseProcedure(staircaseProcedure);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE: {
				TransformedUpDownProcedure transformedUpDownProcedure = (TransformedUpDownProcedure)theEObject;
				T result = caseTransformedUpDownProcedure(transformedUpDownProcedure);
				if (result == null) result = caseStaircaseProcedure(transformedUpDownProcedure);
				if (result == null) result = caseProcedure(transformedUpDownProcedure);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE: {
				WeightedUpDownProcedure weightedUpDownProcedure = (WeightedUpDownProcedure)theEObject;
				T result = caseWeightedUpDownProcedure(weightedUpDownProcedure);
				if (result == null) result = caseStaircaseProcedure(weightedUpDownProcedure);
				if (result == null) result = caseProcedure(weightedUpDownProcedure);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.PEST_PROCEDURE: {
				PestProcedure pestProcedure = (PestProcedure)theEObject;
				T result = casePestProcedure(pestProcedure);
				if (result == null) result = caseStaircaseProcedure(pestProcedure);
				if (result == null) result = caseProcedure(pestProcedure);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.QUEST_PROCEDURE: {
				QuestProcedure questProcedure = (QuestProcedure)theEObject;
				T result = caseQuestProcedure(questProcedure);
				if (result == null) result = caseProcedure(questProcedure);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.PSI_PROCEDURE: {
				PsiProcedure psiProcedure = (PsiProcedure)theEObject;
				T result = casePsiProcedure(psiProcedure);
				if (result == null) result = caseProcedure(psiProcedure);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.CONSTANT_STIMULI_PROCEDURE: {
				ConstantStimuliProcedure constantStimuliProcedure = (ConstantStimuliProcedure)theEObject;
				T result = caseConstantStimuliProcedure(constantStimuliProcedure);
				if (result == null) result = caseProcedure(constantStimuliProcedure);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.CONTRIBUTED_PROCEDURE: {
				ContributedProcedure contributedProcedure = (ContributedProcedure)theEObject;
				T result = caseContributedProcedure(contributedProcedure);
				if (result == null) result = caseProcedure(contributedProcedure);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.STOPPING_RULE: {
				StoppingRule stoppingRule = (StoppingRule)theEObject;
				T result = caseStoppingRule(stoppingRule);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.SETTINGS_GROUP: {
				SettingsGroup settingsGroup = (SettingsGroup)theEObject;
				T result = caseSettingsGroup(settingsGroup);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.SETTING: {
				Setting setting = (Setting)theEObject;
				T result = caseSetting(setting);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.CALIBRATION: {
				Calibration calibration = (Calibration)theEObject;
				T result = caseCalibration(calibration);
				if (result == null) result = caseLimenDocument(calibration);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.CALIBRATION_POINT: {
				CalibrationPoint calibrationPoint = (CalibrationPoint)theEObject;
				T result = caseCalibrationPoint(calibrationPoint);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.SESSION_HEADER: {
				SessionHeader sessionHeader = (SessionHeader)theEObject;
				T result = caseSessionHeader(sessionHeader);
				if (result == null) result = caseLimenDocument(sessionHeader);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case LimenPackage.EXPOSURE_ESTIMATE: {
				ExposureEstimate exposureEstimate = (ExposureEstimate)theEObject;
				T result = caseExposureEstimate(exposureEstimate);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			default: return defaultCase(theEObject);
		}
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Document</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Document</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseLimenDocument(LimenDocument object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Battery</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Battery</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseBattery(Battery object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Break</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Break</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseBreak(Break object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Step</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Step</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseStep(Step object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Task</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Task</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseTask(Task object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Forced Choice Task</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Forced Choice Task</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseForcedChoiceTask(ForcedChoiceTask object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Yes No Task</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Yes No Task</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseYesNoTask(YesNoTask object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Stimulus</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Stimulus</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseStimulus(Stimulus object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Level</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Level</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseLevel(Level object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Absolute Level</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Absolute Level</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseAbsoluteLevel(AbsoluteLevel object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Relative Level</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Relative Level</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseRelativeLevel(RelativeLevel object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Masker Noise</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Masker Noise</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseMaskerNoise(MaskerNoise object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Varied Quantity</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Varied Quantity</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseVariedQuantity(VariedQuantity object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Track</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Track</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseTrack(Track object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Procedure</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseProcedure(Procedure object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Staircase Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Staircase Procedure</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseStaircaseProcedure(StaircaseProcedure object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Transformed Up Down Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Transformed Up Down Procedure</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseTransformedUpDownProcedure(TransformedUpDownProcedure object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Weighted Up Down Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Weighted Up Down Procedure</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseWeightedUpDownProcedure(WeightedUpDownProcedure object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Pest Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Pest Procedure</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T casePestProcedure(PestProcedure object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Quest Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Quest Procedure</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseQuestProcedure(QuestProcedure object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Psi Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Psi Procedure</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T casePsiProcedure(PsiProcedure object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Constant Stimuli Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Constant Stimuli Procedure</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseConstantStimuliProcedure(ConstantStimuliProcedure object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Contributed Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Contributed Procedure</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseContributedProcedure(ContributedProcedure object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Stopping Rule</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Stopping Rule</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseStoppingRule(StoppingRule object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Settings Group</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Settings Group</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseSettingsGroup(SettingsGroup object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Setting</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Setting</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseSetting(Setting object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Calibration</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Calibration</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseCalibration(Calibration object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Calibration Point</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Calibration Point</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseCalibrationPoint(CalibrationPoint object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Session Header</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Session Header</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseSessionHeader(SessionHeader object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Exposure Estimate</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Exposure Estimate</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseExposureEstimate(ExposureEstimate object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>EObject</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch, but this is the last case anyway.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>EObject</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject)
	 * @generated
	 */
	@Override
	public T defaultCase(EObject object) {
		return null;
	}

} //LimenSwitch
