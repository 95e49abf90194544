/**
 */
package limen.model;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Quest Procedure</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * Bayesian adaptive threshold estimation: QUEST (Watson and Pelli 1983, Perception & Psychophysics 33, 113-120) or ZEST (King-Smith et al. 1994, Vision Research 34, 885-912). The psychometric function is Watson and Pelli's Weibull on the quantity's axis, psi(x) = delta gamma + (1 - delta)(1 - (1 - gamma) exp(-10^(beta (x - T) / 20))), where x and T are axis values (decibels for a quantity in dB or on a LOG scale); the prior on the threshold T is Gaussian with mean priorMean and standard deviation priorSd; the posterior is held on a grid of spacing grain over priorMean +- range/2. Each trial is placed at the posterior's mode or mean. priorSd, grain and range are in axis units (see VariedQuantity.scale).
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.QuestProcedure#getVariant <em>Variant</em>}</li>
 *   <li>{@link limen.model.QuestProcedure#getPriorMean <em>Prior Mean</em>}</li>
 *   <li>{@link limen.model.QuestProcedure#getPriorSd <em>Prior Sd</em>}</li>
 *   <li>{@link limen.model.QuestProcedure#getBeta <em>Beta</em>}</li>
 *   <li>{@link limen.model.QuestProcedure#getLapseRate <em>Lapse Rate</em>}</li>
 *   <li>{@link limen.model.QuestProcedure#getGuessRate <em>Guess Rate</em>}</li>
 *   <li>{@link limen.model.QuestProcedure#getGrain <em>Grain</em>}</li>
 *   <li>{@link limen.model.QuestProcedure#getRange <em>Range</em>}</li>
 *   <li>{@link limen.model.QuestProcedure#getPlacement <em>Placement</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getQuestProcedure()
 * @model
 * @generated
 */
public interface QuestProcedure extends Procedure {
	/**
	 * Returns the value of the '<em><b>Variant</b></em>' attribute.
	 * The literals are from the enumeration {@link limen.model.BayesianVariant}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * QUEST or ZEST; they differ in the usual placement and prior shape, both are expressed by these settings.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Variant</em>' attribute.
	 * @see limen.model.BayesianVariant
	 * @see #setVariant(BayesianVariant)
	 * @see limen.model.LimenPackage#getQuestProcedure_Variant()
	 * @model
	 * @generated
	 */
	BayesianVariant getVariant();

	/**
	 * Sets the value of the '{@link limen.model.QuestProcedure#getVariant <em>Variant</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Variant</em>' attribute.
	 * @see limen.model.BayesianVariant
	 * @see #getVariant()
	 * @generated
	 */
	void setVariant(BayesianVariant value);

	/**
	 * Returns the value of the '<em><b>Prior Mean</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Mean of the Gaussian prior on the threshold, in the quantity's unit; also the first trial's value.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Prior Mean</em>' attribute.
	 * @see #setPriorMean(double)
	 * @see limen.model.LimenPackage#getQuestProcedure_PriorMean()
	 * @model
	 * @generated
	 */
	double getPriorMean();

	/**
	 * Sets the value of the '{@link limen.model.QuestProcedure#getPriorMean <em>Prior Mean</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Prior Mean</em>' attribute.
	 * @see #getPriorMean()
	 * @generated
	 */
	void setPriorMean(double value);

	/**
	 * Returns the value of the '<em><b>Prior Sd</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Standard deviation of the prior, in axis units.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Prior Sd</em>' attribute.
	 * @see #setPriorSd(double)
	 * @see limen.model.LimenPackage#getQuestProcedure_PriorSd()
	 * @model
	 * @generated
	 */
	double getPriorSd();

	/**
	 * Sets the value of the '{@link limen.model.QuestProcedure#getPriorSd <em>Prior Sd</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Prior Sd</em>' attribute.
	 * @see #getPriorSd()
	 * @generated
	 */
	void setPriorSd(double value);

	/**
	 * Returns the value of the '<em><b>Beta</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Slope parameter beta of the Weibull function (Watson and Pelli used 3.5).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Beta</em>' attribute.
	 * @see #setBeta(double)
	 * @see limen.model.LimenPackage#getQuestProcedure_Beta()
	 * @model
	 * @generated
	 */
	double getBeta();

	/**
	 * Sets the value of the '{@link limen.model.QuestProcedure#getBeta <em>Beta</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Beta</em>' attribute.
	 * @see #getBeta()
	 * @generated
	 */
	void setBeta(double value);

	/**
	 * Returns the value of the '<em><b>Lapse Rate</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * delta: the probability of a wrong response far above threshold, in [0, 0.5) (Watson and Pelli used 0.01).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Lapse Rate</em>' attribute.
	 * @see #setLapseRate(double)
	 * @see limen.model.LimenPackage#getQuestProcedure_LapseRate()
	 * @model
	 * @generated
	 */
	double getLapseRate();

	/**
	 * Sets the value of the '{@link limen.model.QuestProcedure#getLapseRate <em>Lapse Rate</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Lapse Rate</em>' attribute.
	 * @see #getLapseRate()
	 * @generated
	 */
	void setLapseRate(double value);

	/**
	 * Returns the value of the '<em><b>Guess Rate</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * gamma: the probability of a correct response far below threshold; when unset, the task's chance rate (1/n for nAFC, 0 for yes/no).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Guess Rate</em>' attribute.
	 * @see #isSetGuessRate()
	 * @see #unsetGuessRate()
	 * @see #setGuessRate(double)
	 * @see limen.model.LimenPackage#getQuestProcedure_GuessRate()
	 * @model unsettable="true"
	 * @generated
	 */
	double getGuessRate();

	/**
	 * Sets the value of the '{@link limen.model.QuestProcedure#getGuessRate <em>Guess Rate</em>}' attribute.
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
	 * Unsets the value of the '{@link limen.model.QuestProcedure#getGuessRate <em>Guess Rate</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetGuessRate()
	 * @see #getGuessRate()
	 * @see #setGuessRate(double)
	 * @generated
	 */
	void unsetGuessRate();

	/**
	 * Returns whether the value of the '{@link limen.model.QuestProcedure#getGuessRate <em>Guess Rate</em>}' attribute is set.
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
	 * Returns the value of the '<em><b>Grain</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Spacing of the threshold grid, in axis units.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Grain</em>' attribute.
	 * @see #setGrain(double)
	 * @see limen.model.LimenPackage#getQuestProcedure_Grain()
	 * @model
	 * @generated
	 */
	double getGrain();

	/**
	 * Sets the value of the '{@link limen.model.QuestProcedure#getGrain <em>Grain</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Grain</em>' attribute.
	 * @see #getGrain()
	 * @generated
	 */
	void setGrain(double value);

	/**
	 * Returns the value of the '<em><b>Range</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Total width of the threshold grid, centred on the prior mean, in axis units.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Range</em>' attribute.
	 * @see #setRange(double)
	 * @see limen.model.LimenPackage#getQuestProcedure_Range()
	 * @model
	 * @generated
	 */
	double getRange();

	/**
	 * Sets the value of the '{@link limen.model.QuestProcedure#getRange <em>Range</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Range</em>' attribute.
	 * @see #getRange()
	 * @generated
	 */
	void setRange(double value);

	/**
	 * Returns the value of the '<em><b>Placement</b></em>' attribute.
	 * The literals are from the enumeration {@link limen.model.EstimatePlacement}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Where each trial is placed and how the final estimate is taken from the posterior.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Placement</em>' attribute.
	 * @see limen.model.EstimatePlacement
	 * @see #setPlacement(EstimatePlacement)
	 * @see limen.model.LimenPackage#getQuestProcedure_Placement()
	 * @model
	 * @generated
	 */
	EstimatePlacement getPlacement();

	/**
	 * Sets the value of the '{@link limen.model.QuestProcedure#getPlacement <em>Placement</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Placement</em>' attribute.
	 * @see limen.model.EstimatePlacement
	 * @see #getPlacement()
	 * @generated
	 */
	void setPlacement(EstimatePlacement value);

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Positive prior sd, beta, grain and range (range wider than the grain, at most 100000 grid points), lapse rate in [0, 0.5), guess rate in [0, 1) with guess + lapse below 1, guess rate matching the task (warning) (LM0312-LM0315).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean validQuestSettings(DiagnosticChain diagnostics, Map<Object, Object> context);

} // QuestProcedure
