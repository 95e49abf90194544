/**
 */
package limen.model;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Psi Procedure</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * The Psi method (Kontsevich and Tyler 1999, Vision Research 39, 2729-2737): a posterior over threshold and slope (and optionally the lapse rate, Prins 2013, Journal of Vision 13(7):3) is kept on a grid; each trial takes the candidate stimulus that minimises the expected entropy of the posterior. Threshold and stimulus grids are evenly spaced on the quantity's axis (evenly in dB on a LOG scale), the slope grid is spaced logarithmically; slopes are in 1/axis units.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.PsiProcedure#getFamily <em>Family</em>}</li>
 *   <li>{@link limen.model.PsiProcedure#getThresholdMinimum <em>Threshold Minimum</em>}</li>
 *   <li>{@link limen.model.PsiProcedure#getThresholdMaximum <em>Threshold Maximum</em>}</li>
 *   <li>{@link limen.model.PsiProcedure#getThresholdCount <em>Threshold Count</em>}</li>
 *   <li>{@link limen.model.PsiProcedure#getSlopeMinimum <em>Slope Minimum</em>}</li>
 *   <li>{@link limen.model.PsiProcedure#getSlopeMaximum <em>Slope Maximum</em>}</li>
 *   <li>{@link limen.model.PsiProcedure#getSlopeCount <em>Slope Count</em>}</li>
 *   <li>{@link limen.model.PsiProcedure#getStimulusMinimum <em>Stimulus Minimum</em>}</li>
 *   <li>{@link limen.model.PsiProcedure#getStimulusMaximum <em>Stimulus Maximum</em>}</li>
 *   <li>{@link limen.model.PsiProcedure#getStimulusCount <em>Stimulus Count</em>}</li>
 *   <li>{@link limen.model.PsiProcedure#getLapseMode <em>Lapse Mode</em>}</li>
 *   <li>{@link limen.model.PsiProcedure#getLapseRate <em>Lapse Rate</em>}</li>
 *   <li>{@link limen.model.PsiProcedure#getLapseMinimum <em>Lapse Minimum</em>}</li>
 *   <li>{@link limen.model.PsiProcedure#getLapseMaximum <em>Lapse Maximum</em>}</li>
 *   <li>{@link limen.model.PsiProcedure#getLapseCount <em>Lapse Count</em>}</li>
 *   <li>{@link limen.model.PsiProcedure#getGuessRate <em>Guess Rate</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getPsiProcedure()
 * @model
 * @generated
 */
public interface PsiProcedure extends Procedure {
	/**
	 * Returns the value of the '<em><b>Family</b></em>' attribute.
	 * The literals are from the enumeration {@link limen.model.PsychometricFamily}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Shape of the psychometric function.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Family</em>' attribute.
	 * @see limen.model.PsychometricFamily
	 * @see #setFamily(PsychometricFamily)
	 * @see limen.model.LimenPackage#getPsiProcedure_Family()
	 * @model
	 * @generated
	 */
	PsychometricFamily getFamily();

	/**
	 * Sets the value of the '{@link limen.model.PsiProcedure#getFamily <em>Family</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Family</em>' attribute.
	 * @see limen.model.PsychometricFamily
	 * @see #getFamily()
	 * @generated
	 */
	void setFamily(PsychometricFamily value);

	/**
	 * Returns the value of the '<em><b>Threshold Minimum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Lowest threshold in the grid, in the quantity's unit.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Threshold Minimum</em>' attribute.
	 * @see #setThresholdMinimum(double)
	 * @see limen.model.LimenPackage#getPsiProcedure_ThresholdMinimum()
	 * @model
	 * @generated
	 */
	double getThresholdMinimum();

	/**
	 * Sets the value of the '{@link limen.model.PsiProcedure#getThresholdMinimum <em>Threshold Minimum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Threshold Minimum</em>' attribute.
	 * @see #getThresholdMinimum()
	 * @generated
	 */
	void setThresholdMinimum(double value);

	/**
	 * Returns the value of the '<em><b>Threshold Maximum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Highest threshold in the grid, in the quantity's unit.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Threshold Maximum</em>' attribute.
	 * @see #setThresholdMaximum(double)
	 * @see limen.model.LimenPackage#getPsiProcedure_ThresholdMaximum()
	 * @model
	 * @generated
	 */
	double getThresholdMaximum();

	/**
	 * Sets the value of the '{@link limen.model.PsiProcedure#getThresholdMaximum <em>Threshold Maximum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Threshold Maximum</em>' attribute.
	 * @see #getThresholdMaximum()
	 * @generated
	 */
	void setThresholdMaximum(double value);

	/**
	 * Returns the value of the '<em><b>Threshold Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Number of threshold grid points; at least 2.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Threshold Count</em>' attribute.
	 * @see #setThresholdCount(int)
	 * @see limen.model.LimenPackage#getPsiProcedure_ThresholdCount()
	 * @model
	 * @generated
	 */
	int getThresholdCount();

	/**
	 * Sets the value of the '{@link limen.model.PsiProcedure#getThresholdCount <em>Threshold Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Threshold Count</em>' attribute.
	 * @see #getThresholdCount()
	 * @generated
	 */
	void setThresholdCount(int value);

	/**
	 * Returns the value of the '<em><b>Slope Minimum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Lowest slope in the grid (positive, in 1/axis units).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Slope Minimum</em>' attribute.
	 * @see #setSlopeMinimum(double)
	 * @see limen.model.LimenPackage#getPsiProcedure_SlopeMinimum()
	 * @model
	 * @generated
	 */
	double getSlopeMinimum();

	/**
	 * Sets the value of the '{@link limen.model.PsiProcedure#getSlopeMinimum <em>Slope Minimum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Slope Minimum</em>' attribute.
	 * @see #getSlopeMinimum()
	 * @generated
	 */
	void setSlopeMinimum(double value);

	/**
	 * Returns the value of the '<em><b>Slope Maximum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Highest slope in the grid.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Slope Maximum</em>' attribute.
	 * @see #setSlopeMaximum(double)
	 * @see limen.model.LimenPackage#getPsiProcedure_SlopeMaximum()
	 * @model
	 * @generated
	 */
	double getSlopeMaximum();

	/**
	 * Sets the value of the '{@link limen.model.PsiProcedure#getSlopeMaximum <em>Slope Maximum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Slope Maximum</em>' attribute.
	 * @see #getSlopeMaximum()
	 * @generated
	 */
	void setSlopeMaximum(double value);

	/**
	 * Returns the value of the '<em><b>Slope Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Number of slope grid points; at least 2.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Slope Count</em>' attribute.
	 * @see #setSlopeCount(int)
	 * @see limen.model.LimenPackage#getPsiProcedure_SlopeCount()
	 * @model
	 * @generated
	 */
	int getSlopeCount();

	/**
	 * Sets the value of the '{@link limen.model.PsiProcedure#getSlopeCount <em>Slope Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Slope Count</em>' attribute.
	 * @see #getSlopeCount()
	 * @generated
	 */
	void setSlopeCount(int value);

	/**
	 * Returns the value of the '<em><b>Stimulus Minimum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Lowest candidate stimulus value, in the quantity's unit.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Stimulus Minimum</em>' attribute.
	 * @see #setStimulusMinimum(double)
	 * @see limen.model.LimenPackage#getPsiProcedure_StimulusMinimum()
	 * @model
	 * @generated
	 */
	double getStimulusMinimum();

	/**
	 * Sets the value of the '{@link limen.model.PsiProcedure#getStimulusMinimum <em>Stimulus Minimum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Stimulus Minimum</em>' attribute.
	 * @see #getStimulusMinimum()
	 * @generated
	 */
	void setStimulusMinimum(double value);

	/**
	 * Returns the value of the '<em><b>Stimulus Maximum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Highest candidate stimulus value; levels at this value must stay under the calibration ceiling.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Stimulus Maximum</em>' attribute.
	 * @see #setStimulusMaximum(double)
	 * @see limen.model.LimenPackage#getPsiProcedure_StimulusMaximum()
	 * @model
	 * @generated
	 */
	double getStimulusMaximum();

	/**
	 * Sets the value of the '{@link limen.model.PsiProcedure#getStimulusMaximum <em>Stimulus Maximum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Stimulus Maximum</em>' attribute.
	 * @see #getStimulusMaximum()
	 * @generated
	 */
	void setStimulusMaximum(double value);

	/**
	 * Returns the value of the '<em><b>Stimulus Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Number of candidate stimulus values; at least 2.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Stimulus Count</em>' attribute.
	 * @see #setStimulusCount(int)
	 * @see limen.model.LimenPackage#getPsiProcedure_StimulusCount()
	 * @model
	 * @generated
	 */
	int getStimulusCount();

	/**
	 * Sets the value of the '{@link limen.model.PsiProcedure#getStimulusCount <em>Stimulus Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Stimulus Count</em>' attribute.
	 * @see #getStimulusCount()
	 * @generated
	 */
	void setStimulusCount(int value);

	/**
	 * Returns the value of the '<em><b>Lapse Mode</b></em>' attribute.
	 * The literals are from the enumeration {@link limen.model.LapseMode}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Whether the lapse rate is fixed or a nuisance parameter marginalised over a grid.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Lapse Mode</em>' attribute.
	 * @see limen.model.LapseMode
	 * @see #setLapseMode(LapseMode)
	 * @see limen.model.LimenPackage#getPsiProcedure_LapseMode()
	 * @model
	 * @generated
	 */
	LapseMode getLapseMode();

	/**
	 * Sets the value of the '{@link limen.model.PsiProcedure#getLapseMode <em>Lapse Mode</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Lapse Mode</em>' attribute.
	 * @see limen.model.LapseMode
	 * @see #getLapseMode()
	 * @generated
	 */
	void setLapseMode(LapseMode value);

	/**
	 * Returns the value of the '<em><b>Lapse Rate</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The fixed lapse rate (FIXED), in [0, 0.5).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Lapse Rate</em>' attribute.
	 * @see #setLapseRate(double)
	 * @see limen.model.LimenPackage#getPsiProcedure_LapseRate()
	 * @model
	 * @generated
	 */
	double getLapseRate();

	/**
	 * Sets the value of the '{@link limen.model.PsiProcedure#getLapseRate <em>Lapse Rate</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Lapse Rate</em>' attribute.
	 * @see #getLapseRate()
	 * @generated
	 */
	void setLapseRate(double value);

	/**
	 * Returns the value of the '<em><b>Lapse Minimum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Lowest lapse rate of the grid (MARGINALIZED).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Lapse Minimum</em>' attribute.
	 * @see #setLapseMinimum(double)
	 * @see limen.model.LimenPackage#getPsiProcedure_LapseMinimum()
	 * @model
	 * @generated
	 */
	double getLapseMinimum();

	/**
	 * Sets the value of the '{@link limen.model.PsiProcedure#getLapseMinimum <em>Lapse Minimum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Lapse Minimum</em>' attribute.
	 * @see #getLapseMinimum()
	 * @generated
	 */
	void setLapseMinimum(double value);

	/**
	 * Returns the value of the '<em><b>Lapse Maximum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Highest lapse rate of the grid (MARGINALIZED), below 0.5.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Lapse Maximum</em>' attribute.
	 * @see #setLapseMaximum(double)
	 * @see limen.model.LimenPackage#getPsiProcedure_LapseMaximum()
	 * @model
	 * @generated
	 */
	double getLapseMaximum();

	/**
	 * Sets the value of the '{@link limen.model.PsiProcedure#getLapseMaximum <em>Lapse Maximum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Lapse Maximum</em>' attribute.
	 * @see #getLapseMaximum()
	 * @generated
	 */
	void setLapseMaximum(double value);

	/**
	 * Returns the value of the '<em><b>Lapse Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Number of lapse grid points (MARGINALIZED); at least 2.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Lapse Count</em>' attribute.
	 * @see #setLapseCount(int)
	 * @see limen.model.LimenPackage#getPsiProcedure_LapseCount()
	 * @model
	 * @generated
	 */
	int getLapseCount();

	/**
	 * Sets the value of the '{@link limen.model.PsiProcedure#getLapseCount <em>Lapse Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Lapse Count</em>' attribute.
	 * @see #getLapseCount()
	 * @generated
	 */
	void setLapseCount(int value);

	/**
	 * Returns the value of the '<em><b>Guess Rate</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Guess rate; when unset, the task's chance rate (1/n for nAFC, 0 for yes/no).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Guess Rate</em>' attribute.
	 * @see #isSetGuessRate()
	 * @see #unsetGuessRate()
	 * @see #setGuessRate(double)
	 * @see limen.model.LimenPackage#getPsiProcedure_GuessRate()
	 * @model unsettable="true"
	 * @generated
	 */
	double getGuessRate();

	/**
	 * Sets the value of the '{@link limen.model.PsiProcedure#getGuessRate <em>Guess Rate</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Guess Rate</em>' attribute.
	 * @see #isSetGuessRate()
	 * @see #unsetGuessRate()
	 * @see #getGuessRate()
	 * @generated
	 */
	void setGuessRate(double value);

	/**
	 * Unsets the value of the '{@link limen.model.PsiProcedure#getGuessRate <em>Guess Rate</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetGuessRate()
	 * @see #getGuessRate()
	 * @see #setGuessRate(double)
	 * @generated
	 */
	void unsetGuessRate();

	/**
	 * Returns whether the value of the '{@link limen.model.PsiProcedure#getGuessRate <em>Guess Rate</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Guess Rate</em>' attribute is set.
	 * @see #unsetGuessRate()
	 * @see #getGuessRate()
	 * @see #setGuessRate(double)
	 * @generated
	 */
	boolean isSetGuessRate();

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Every grid has minimum < maximum and at least 2 points, slopes are positive, the lapse is fixed in [0, 0.5) or marginalised over a grid inside [0, 0.5), the guess rate fits, and the grid is small enough to decide quickly (warning above 5 million points) (LM0313, LM0314, LM0315, LM0316).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean validPsiGrids(DiagnosticChain diagnostics, Map<Object, Object> context);

} // PsiProcedure
