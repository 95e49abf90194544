/**
 */
package limen.model;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Transformed Up Down Procedure</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * Levitt's transformed up-down staircase (Levitt 1971, J. Acoust. Soc. Am. 49, 467-477): the value goes down one step after downCount consecutive correct responses and up one step after upCount consecutive wrong responses; 2-down/1-up converges on the 70.7 % correct point, 3-down/1-up on 79.4 %. The step shrinks by shrinkFactor after every reversalsPerShrink reversals, never below minimumStep (in MULTIPLICATIVE mode the factor's logarithm shrinks: step := step^shrinkFactor). The threshold estimate is the mean (geometric mean in MULTIPLICATIVE mode) of the reversal values after the first discardedReversals.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.TransformedUpDownProcedure#getDownCount <em>Down Count</em>}</li>
 *   <li>{@link limen.model.TransformedUpDownProcedure#getUpCount <em>Up Count</em>}</li>
 *   <li>{@link limen.model.TransformedUpDownProcedure#getInitialStep <em>Initial Step</em>}</li>
 *   <li>{@link limen.model.TransformedUpDownProcedure#getMinimumStep <em>Minimum Step</em>}</li>
 *   <li>{@link limen.model.TransformedUpDownProcedure#getShrinkFactor <em>Shrink Factor</em>}</li>
 *   <li>{@link limen.model.TransformedUpDownProcedure#getReversalsPerShrink <em>Reversals Per Shrink</em>}</li>
 *   <li>{@link limen.model.TransformedUpDownProcedure#getDiscardedReversals <em>Discarded Reversals</em>}</li>
 *   <li>{@link limen.model.TransformedUpDownProcedure#getAveragedReversals <em>Averaged Reversals</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getTransformedUpDownProcedure()
 * @model
 * @generated
 */
public interface TransformedUpDownProcedure extends StaircaseProcedure {
	/**
	 * Returns the value of the '<em><b>Down Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * n: consecutive correct responses needed for one step down; at least 1.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Down Count</em>' attribute.
	 * @see #setDownCount(int)
	 * @see limen.model.LimenPackage#getTransformedUpDownProcedure_DownCount()
	 * @model
	 * @generated
	 */
	int getDownCount();

	/**
	 * Sets the value of the '{@link limen.model.TransformedUpDownProcedure#getDownCount <em>Down Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Down Count</em>' attribute.
	 * @see #getDownCount()
	 * @generated
	 */
	void setDownCount(int value);

	/**
	 * Returns the value of the '<em><b>Up Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * m: consecutive wrong responses needed for one step up; at least 1.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Up Count</em>' attribute.
	 * @see #setUpCount(int)
	 * @see limen.model.LimenPackage#getTransformedUpDownProcedure_UpCount()
	 * @model
	 * @generated
	 */
	int getUpCount();

	/**
	 * Sets the value of the '{@link limen.model.TransformedUpDownProcedure#getUpCount <em>Up Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Up Count</em>' attribute.
	 * @see #getUpCount()
	 * @generated
	 */
	void setUpCount(int value);

	/**
	 * Returns the value of the '<em><b>Initial Step</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Step size at the start (a difference in ADDITIVE mode, a factor above 1 in MULTIPLICATIVE mode).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Initial Step</em>' attribute.
	 * @see #setInitialStep(double)
	 * @see limen.model.LimenPackage#getTransformedUpDownProcedure_InitialStep()
	 * @model
	 * @generated
	 */
	double getInitialStep();

	/**
	 * Sets the value of the '{@link limen.model.TransformedUpDownProcedure#getInitialStep <em>Initial Step</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Initial Step</em>' attribute.
	 * @see #getInitialStep()
	 * @generated
	 */
	void setInitialStep(double value);

	/**
	 * Returns the value of the '<em><b>Minimum Step</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Smallest step size the shrink rule may reach; when unset, the step never goes below what the shrink rule gives.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Minimum Step</em>' attribute.
	 * @see #isSetMinimumStep()
	 * @see #unsetMinimumStep()
	 * @see #setMinimumStep(double)
	 * @see limen.model.LimenPackage#getTransformedUpDownProcedure_MinimumStep()
	 * @model unsettable="true"
	 * @generated
	 */
	double getMinimumStep();

	/**
	 * Sets the value of the '{@link limen.model.TransformedUpDownProcedure#getMinimumStep <em>Minimum Step</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Minimum Step</em>' attribute.
	 * @see #isSetMinimumStep()
	 * @see #unsetMinimumStep()
	 * @see #getMinimumStep()
	 * @generated
	 */
	void setMinimumStep(double value);

	/**
	 * Unsets the value of the '{@link limen.model.TransformedUpDownProcedure#getMinimumStep <em>Minimum Step</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetMinimumStep()
	 * @see #getMinimumStep()
	 * @see #setMinimumStep(double)
	 * @generated
	 */
	void unsetMinimumStep();

	/**
	 * Returns whether the value of the '{@link limen.model.TransformedUpDownProcedure#getMinimumStep <em>Minimum Step</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Minimum Step</em>' attribute is set.
	 * @see #unsetMinimumStep()
	 * @see #getMinimumStep()
	 * @see #setMinimumStep(double)
	 * @generated
	 */
	boolean isSetMinimumStep();

	/**
	 * Returns the value of the '<em><b>Shrink Factor</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Factor in (0, 1] applied to the step after every reversalsPerShrink reversals; 1 (or unset) keeps the step fixed.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Shrink Factor</em>' attribute.
	 * @see #isSetShrinkFactor()
	 * @see #unsetShrinkFactor()
	 * @see #setShrinkFactor(double)
	 * @see limen.model.LimenPackage#getTransformedUpDownProcedure_ShrinkFactor()
	 * @model unsettable="true"
	 * @generated
	 */
	double getShrinkFactor();

	/**
	 * Sets the value of the '{@link limen.model.TransformedUpDownProcedure#getShrinkFactor <em>Shrink Factor</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Shrink Factor</em>' attribute.
	 * @see #isSetShrinkFactor()
	 * @see #unsetShrinkFactor()
	 * @see #getShrinkFactor()
	 * @generated
	 */
	void setShrinkFactor(double value);

	/**
	 * Unsets the value of the '{@link limen.model.TransformedUpDownProcedure#getShrinkFactor <em>Shrink Factor</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetShrinkFactor()
	 * @see #getShrinkFactor()
	 * @see #setShrinkFactor(double)
	 * @generated
	 */
	void unsetShrinkFactor();

	/**
	 * Returns whether the value of the '{@link limen.model.TransformedUpDownProcedure#getShrinkFactor <em>Shrink Factor</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Shrink Factor</em>' attribute is set.
	 * @see #unsetShrinkFactor()
	 * @see #getShrinkFactor()
	 * @see #setShrinkFactor(double)
	 * @generated
	 */
	boolean isSetShrinkFactor();

	/**
	 * Returns the value of the '<em><b>Reversals Per Shrink</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * k: the step shrinks after every k reversals; at least 1 when shrinkFactor is below 1.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Reversals Per Shrink</em>' attribute.
	 * @see #setReversalsPerShrink(int)
	 * @see limen.model.LimenPackage#getTransformedUpDownProcedure_ReversalsPerShrink()
	 * @model
	 * @generated
	 */
	int getReversalsPerShrink();

	/**
	 * Sets the value of the '{@link limen.model.TransformedUpDownProcedure#getReversalsPerShrink <em>Reversals Per Shrink</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Reversals Per Shrink</em>' attribute.
	 * @see #getReversalsPerShrink()
	 * @generated
	 */
	void setReversalsPerShrink(int value);

	/**
	 * Returns the value of the '<em><b>Discarded Reversals</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Number of first reversals left out of the threshold estimate.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Discarded Reversals</em>' attribute.
	 * @see #setDiscardedReversals(int)
	 * @see limen.model.LimenPackage#getTransformedUpDownProcedure_DiscardedReversals()
	 * @model
	 * @generated
	 */
	int getDiscardedReversals();

	/**
	 * Sets the value of the '{@link limen.model.TransformedUpDownProcedure#getDiscardedReversals <em>Discarded Reversals</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Discarded Reversals</em>' attribute.
	 * @see #getDiscardedReversals()
	 * @generated
	 */
	void setDiscardedReversals(int value);

	/**
	 * Returns the value of the '<em><b>Averaged Reversals</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Number of last reversals averaged for the estimate; when unset, all reversals after the discarded ones.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Averaged Reversals</em>' attribute.
	 * @see #isSetAveragedReversals()
	 * @see #unsetAveragedReversals()
	 * @see #setAveragedReversals(int)
	 * @see limen.model.LimenPackage#getTransformedUpDownProcedure_AveragedReversals()
	 * @model unsettable="true"
	 * @generated
	 */
	int getAveragedReversals();

	/**
	 * Sets the value of the '{@link limen.model.TransformedUpDownProcedure#getAveragedReversals <em>Averaged Reversals</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Averaged Reversals</em>' attribute.
	 * @see #isSetAveragedReversals()
	 * @see #unsetAveragedReversals()
	 * @see #getAveragedReversals()
	 * @generated
	 */
	void setAveragedReversals(int value);

	/**
	 * Unsets the value of the '{@link limen.model.TransformedUpDownProcedure#getAveragedReversals <em>Averaged Reversals</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetAveragedReversals()
	 * @see #getAveragedReversals()
	 * @see #setAveragedReversals(int)
	 * @generated
	 */
	void unsetAveragedReversals();

	/**
	 * Returns whether the value of the '{@link limen.model.TransformedUpDownProcedure#getAveragedReversals <em>Averaged Reversals</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Averaged Reversals</em>' attribute is set.
	 * @see #unsetAveragedReversals()
	 * @see #getAveragedReversals()
	 * @see #setAveragedReversals(int)
	 * @generated
	 */
	boolean isSetAveragedReversals();

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Counts at least 1, positive steps (factors above 1 in MULTIPLICATIVE mode), minimumStep not above initialStep, shrink factor in (0, 1] with reversalsPerShrink at least 1, reversal counts not negative (LM0303-LM0308).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean validUpDownRule(DiagnosticChain diagnostics, Map<Object, Object> context);

} // TransformedUpDownProcedure
