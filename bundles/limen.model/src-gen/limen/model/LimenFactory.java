/**
 */
package limen.model;

import org.eclipse.emf.ecore.EFactory;

/**
 * <!-- begin-user-doc -->
 * The <b>Factory</b> for the model.
 * It provides a create method for each non-abstract class of the model.
 * <!-- end-user-doc -->
 * @see limen.model.LimenPackage
 * @generated
 */
public interface LimenFactory extends EFactory {
	/**
	 * The singleton instance of the factory.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	LimenFactory eINSTANCE = limen.model.impl.LimenFactoryImpl.init();

	/**
	 * Returns a new object of class '<em>Battery</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Battery</em>'.
	 * @generated
	 */
	Battery createBattery();

	/**
	 * Returns a new object of class '<em>Break</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Break</em>'.
	 * @generated
	 */
	Break createBreak();

	/**
	 * Returns a new object of class '<em>Step</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Step</em>'.
	 * @generated
	 */
	Step createStep();

	/**
	 * Returns a new object of class '<em>Forced Choice Task</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Forced Choice Task</em>'.
	 * @generated
	 */
	ForcedChoiceTask createForcedChoiceTask();

	/**
	 * Returns a new object of class '<em>Yes No Task</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Yes No Task</em>'.
	 * @generated
	 */
	YesNoTask createYesNoTask();

	/**
	 * Returns a new object of class '<em>Stimulus</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Stimulus</em>'.
	 * @generated
	 */
	Stimulus createStimulus();

	/**
	 * Returns a new object of class '<em>Absolute Level</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Absolute Level</em>'.
	 * @generated
	 */
	AbsoluteLevel createAbsoluteLevel();

	/**
	 * Returns a new object of class '<em>Relative Level</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Relative Level</em>'.
	 * @generated
	 */
	RelativeLevel createRelativeLevel();

	/**
	 * Returns a new object of class '<em>Masker Noise</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Masker Noise</em>'.
	 * @generated
	 */
	MaskerNoise createMaskerNoise();

	/**
	 * Returns a new object of class '<em>Varied Quantity</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Varied Quantity</em>'.
	 * @generated
	 */
	VariedQuantity createVariedQuantity();

	/**
	 * Returns a new object of class '<em>Track</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Track</em>'.
	 * @generated
	 */
	Track createTrack();

	/**
	 * Returns a new object of class '<em>Transformed Up Down Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Transformed Up Down Procedure</em>'.
	 * @generated
	 */
	TransformedUpDownProcedure createTransformedUpDownProcedure();

	/**
	 * Returns a new object of class '<em>Weighted Up Down Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Weighted Up Down Procedure</em>'.
	 * @generated
	 */
	WeightedUpDownProcedure createWeightedUpDownProcedure();

	/**
	 * Returns a new object of class '<em>Pest Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Pest Procedure</em>'.
	 * @generated
	 */
	PestProcedure createPestProcedure();

	/**
	 * Returns a new object of class '<em>Quest Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Quest Procedure</em>'.
	 * @generated
	 */
	QuestProcedure createQuestProcedure();

	/**
	 * Returns a new object of class '<em>Psi Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Psi Procedure</em>'.
	 * @generated
	 */
	PsiProcedure createPsiProcedure();

	/**
	 * Returns a new object of class '<em>Constant Stimuli Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Constant Stimuli Procedure</em>'.
	 * @generated
	 */
	ConstantStimuliProcedure createConstantStimuliProcedure();

	/**
	 * Returns a new object of class '<em>Contributed Procedure</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Contributed Procedure</em>'.
	 * @generated
	 */
	ContributedProcedure createContributedProcedure();

	/**
	 * Returns a new object of class '<em>Stopping Rule</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Stopping Rule</em>'.
	 * @generated
	 */
	StoppingRule createStoppingRule();

	/**
	 * Returns a new object of class '<em>Settings Group</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Settings Group</em>'.
	 * @generated
	 */
	SettingsGroup createSettingsGroup();

	/**
	 * Returns a new object of class '<em>Setting</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Setting</em>'.
	 * @generated
	 */
	Setting createSetting();

	/**
	 * Returns a new object of class '<em>Calibration</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Calibration</em>'.
	 * @generated
	 */
	Calibration createCalibration();

	/**
	 * Returns a new object of class '<em>Calibration Point</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Calibration Point</em>'.
	 * @generated
	 */
	CalibrationPoint createCalibrationPoint();

	/**
	 * Returns a new object of class '<em>Session Header</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Session Header</em>'.
	 * @generated
	 */
	SessionHeader createSessionHeader();

	/**
	 * Returns a new object of class '<em>Exposure Estimate</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Exposure Estimate</em>'.
	 * @generated
	 */
	ExposureEstimate createExposureEstimate();

	/**
	 * Returns the package supported by this factory.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the package supported by this factory.
	 * @generated
	 */
	LimenPackage getLimenPackage();

} //LimenFactory
