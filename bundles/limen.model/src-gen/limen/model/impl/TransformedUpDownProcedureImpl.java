/**
 */
package limen.model.impl;

import java.lang.reflect.InvocationTargetException;

import java.util.Map;

import limen.model.LimenPackage;
import limen.model.TransformedUpDownProcedure;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Transformed Up Down Procedure</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.TransformedUpDownProcedureImpl#getDownCount <em>Down Count</em>}</li>
 *   <li>{@link limen.model.impl.TransformedUpDownProcedureImpl#getUpCount <em>Up Count</em>}</li>
 *   <li>{@link limen.model.impl.TransformedUpDownProcedureImpl#getInitialStep <em>Initial Step</em>}</li>
 *   <li>{@link limen.model.impl.TransformedUpDownProcedureImpl#getMinimumStep <em>Minimum Step</em>}</li>
 *   <li>{@link limen.model.impl.TransformedUpDownProcedureImpl#getShrinkFactor <em>Shrink Factor</em>}</li>
 *   <li>{@link limen.model.impl.TransformedUpDownProcedureImpl#getReversalsPerShrink <em>Reversals Per Shrink</em>}</li>
 *   <li>{@link limen.model.impl.TransformedUpDownProcedureImpl#getDiscardedReversals <em>Discarded Reversals</em>}</li>
 *   <li>{@link limen.model.impl.TransformedUpDownProcedureImpl#getAveragedReversals <em>Averaged Reversals</em>}</li>
 * </ul>
 *
 * @generated
 */
public class TransformedUpDownProcedureImpl extends StaircaseProcedureImpl implements TransformedUpDownProcedure {
	/**
	 * The default value of the '{@link #getDownCount() <em>Down Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDownCount()
	 * @generated
	 * @ordered
	 */
	protected static final int DOWN_COUNT_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getDownCount() <em>Down Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDownCount()
	 * @generated
	 * @ordered
	 */
	protected int downCount = DOWN_COUNT_EDEFAULT;

	/**
	 * The default value of the '{@link #getUpCount() <em>Up Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUpCount()
	 * @generated
	 * @ordered
	 */
	protected static final int UP_COUNT_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getUpCount() <em>Up Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUpCount()
	 * @generated
	 * @ordered
	 */
	protected int upCount = UP_COUNT_EDEFAULT;

	/**
	 * The default value of the '{@link #getInitialStep() <em>Initial Step</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getInitialStep()
	 * @generated
	 * @ordered
	 */
	protected static final double INITIAL_STEP_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getInitialStep() <em>Initial Step</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getInitialStep()
	 * @generated
	 * @ordered
	 */
	protected double initialStep = INITIAL_STEP_EDEFAULT;

	/**
	 * The default value of the '{@link #getMinimumStep() <em>Minimum Step</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMinimumStep()
	 * @generated
	 * @ordered
	 */
	protected static final double MINIMUM_STEP_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMinimumStep() <em>Minimum Step</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMinimumStep()
	 * @generated
	 * @ordered
	 */
	protected double minimumStep = MINIMUM_STEP_EDEFAULT;

	/**
	 * This is true if the Minimum Step attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean minimumStepESet;

	/**
	 * The default value of the '{@link #getShrinkFactor() <em>Shrink Factor</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getShrinkFactor()
	 * @generated
	 * @ordered
	 */
	protected static final double SHRINK_FACTOR_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getShrinkFactor() <em>Shrink Factor</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getShrinkFactor()
	 * @generated
	 * @ordered
	 */
	protected double shrinkFactor = SHRINK_FACTOR_EDEFAULT;

	/**
	 * This is true if the Shrink Factor attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean shrinkFactorESet;

	/**
	 * The default value of the '{@link #getReversalsPerShrink() <em>Reversals Per Shrink</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getReversalsPerShrink()
	 * @generated
	 * @ordered
	 */
	protected static final int REVERSALS_PER_SHRINK_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getReversalsPerShrink() <em>Reversals Per Shrink</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getReversalsPerShrink()
	 * @generated
	 * @ordered
	 */
	protected int reversalsPerShrink = REVERSALS_PER_SHRINK_EDEFAULT;

	/**
	 * The default value of the '{@link #getDiscardedReversals() <em>Discarded Reversals</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDiscardedReversals()
	 * @generated
	 * @ordered
	 */
	protected static final int DISCARDED_REVERSALS_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getDiscardedReversals() <em>Discarded Reversals</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDiscardedReversals()
	 * @generated
	 * @ordered
	 */
	protected int discardedReversals = DISCARDED_REVERSALS_EDEFAULT;

	/**
	 * The default value of the '{@link #getAveragedReversals() <em>Averaged Reversals</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAveragedReversals()
	 * @generated
	 * @ordered
	 */
	protected static final int AVERAGED_REVERSALS_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getAveragedReversals() <em>Averaged Reversals</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAveragedReversals()
	 * @generated
	 * @ordered
	 */
	protected int averagedReversals = AVERAGED_REVERSALS_EDEFAULT;

	/**
	 * This is true if the Averaged Reversals attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean averagedReversalsESet;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected TransformedUpDownProcedureImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.TRANSFORMED_UP_DOWN_PROCEDURE;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getDownCount() {
		return downCount;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDownCount(int newDownCount) {
		int oldDownCount = downCount;
		downCount = newDownCount;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__DOWN_COUNT, oldDownCount, downCount));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getUpCount() {
		return upCount;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setUpCount(int newUpCount) {
		int oldUpCount = upCount;
		upCount = newUpCount;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__UP_COUNT, oldUpCount, upCount));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getInitialStep() {
		return initialStep;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setInitialStep(double newInitialStep) {
		double oldInitialStep = initialStep;
		initialStep = newInitialStep;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__INITIAL_STEP, oldInitialStep, initialStep));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMinimumStep() {
		return minimumStep;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMinimumStep(double newMinimumStep) {
		double oldMinimumStep = minimumStep;
		minimumStep = newMinimumStep;
		boolean oldMinimumStepESet = minimumStepESet;
		minimumStepESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__MINIMUM_STEP, oldMinimumStep, minimumStep, !oldMinimumStepESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetMinimumStep() {
		double oldMinimumStep = minimumStep;
		boolean oldMinimumStepESet = minimumStepESet;
		minimumStep = MINIMUM_STEP_EDEFAULT;
		minimumStepESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__MINIMUM_STEP, oldMinimumStep, MINIMUM_STEP_EDEFAULT, oldMinimumStepESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetMinimumStep() {
		return minimumStepESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getShrinkFactor() {
		return shrinkFactor;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setShrinkFactor(double newShrinkFactor) {
		double oldShrinkFactor = shrinkFactor;
		shrinkFactor = newShrinkFactor;
		boolean oldShrinkFactorESet = shrinkFactorESet;
		shrinkFactorESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__SHRINK_FACTOR, oldShrinkFactor, shrinkFactor, !oldShrinkFactorESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetShrinkFactor() {
		double oldShrinkFactor = shrinkFactor;
		boolean oldShrinkFactorESet = shrinkFactorESet;
		shrinkFactor = SHRINK_FACTOR_EDEFAULT;
		shrinkFactorESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__SHRINK_FACTOR, oldShrinkFactor, SHRINK_FACTOR_EDEFAULT, oldShrinkFactorESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetShrinkFactor() {
		return shrinkFactorESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getReversalsPerShrink() {
		return reversalsPerShrink;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setReversalsPerShrink(int newReversalsPerShrink) {
		int oldReversalsPerShrink = reversalsPerShrink;
		reversalsPerShrink = newReversalsPerShrink;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__REVERSALS_PER_SHRINK, oldReversalsPerShrink, reversalsPerShrink));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getDiscardedReversals() {
		return discardedReversals;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDiscardedReversals(int newDiscardedReversals) {
		int oldDiscardedReversals = discardedReversals;
		discardedReversals = newDiscardedReversals;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS, oldDiscardedReversals, discardedReversals));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getAveragedReversals() {
		return averagedReversals;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setAveragedReversals(int newAveragedReversals) {
		int oldAveragedReversals = averagedReversals;
		averagedReversals = newAveragedReversals;
		boolean oldAveragedReversalsESet = averagedReversalsESet;
		averagedReversalsESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS, oldAveragedReversals, averagedReversals, !oldAveragedReversalsESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetAveragedReversals() {
		int oldAveragedReversals = averagedReversals;
		boolean oldAveragedReversalsESet = averagedReversalsESet;
		averagedReversals = AVERAGED_REVERSALS_EDEFAULT;
		averagedReversalsESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS, oldAveragedReversals, AVERAGED_REVERSALS_EDEFAULT, oldAveragedReversalsESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetAveragedReversals() {
		return averagedReversalsESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean validUpDownRule(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.ProcedureRules.validUpDownRule(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__DOWN_COUNT:
				return getDownCount();
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__UP_COUNT:
				return getUpCount();
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__INITIAL_STEP:
				return getInitialStep();
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__MINIMUM_STEP:
				return getMinimumStep();
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__SHRINK_FACTOR:
				return getShrinkFactor();
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__REVERSALS_PER_SHRINK:
				return getReversalsPerShrink();
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS:
				return getDiscardedReversals();
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS:
				return getAveragedReversals();
		}
		return super.eGet(featureID, resolve, coreType);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void eSet(int featureID, Object newValue) {
		switch (featureID) {
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__DOWN_COUNT:
				setDownCount((Integer)newValue);
				return;
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__UP_COUNT:
				setUpCount((Integer)newValue);
				return;
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__INITIAL_STEP:
				setInitialStep((Double)newValue);
				return;
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__MINIMUM_STEP:
				setMinimumStep((Double)newValue);
				return;
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__SHRINK_FACTOR:
				setShrinkFactor((Double)newValue);
				return;
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__REVERSALS_PER_SHRINK:
				setReversalsPerShrink((Integer)newValue);
				return;
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS:
				setDiscardedReversals((Integer)newValue);
				return;
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS:
				setAveragedReversals((Integer)newValue);
				return;
		}
		super.eSet(featureID, newValue);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void eUnset(int featureID) {
		switch (featureID) {
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__DOWN_COUNT:
				setDownCount(DOWN_COUNT_EDEFAULT);
				return;
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__UP_COUNT:
				setUpCount(UP_COUNT_EDEFAULT);
				return;
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__INITIAL_STEP:
				setInitialStep(INITIAL_STEP_EDEFAULT);
				return;
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__MINIMUM_STEP:
				unsetMinimumStep();
				return;
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__SHRINK_FACTOR:
				unsetShrinkFactor();
				return;
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__REVERSALS_PER_SHRINK:
				setReversalsPerShrink(REVERSALS_PER_SHRINK_EDEFAULT);
				return;
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS:
				setDiscardedReversals(DISCARDED_REVERSALS_EDEFAULT);
				return;
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS:
				unsetAveragedReversals();
				return;
		}
		super.eUnset(featureID);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean eIsSet(int featureID) {
		switch (featureID) {
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__DOWN_COUNT:
				return downCount != DOWN_COUNT_EDEFAULT;
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__UP_COUNT:
				return upCount != UP_COUNT_EDEFAULT;
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__INITIAL_STEP:
				return initialStep != INITIAL_STEP_EDEFAULT;
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__MINIMUM_STEP:
				return isSetMinimumStep();
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__SHRINK_FACTOR:
				return isSetShrinkFactor();
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__REVERSALS_PER_SHRINK:
				return reversalsPerShrink != REVERSALS_PER_SHRINK_EDEFAULT;
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS:
				return discardedReversals != DISCARDED_REVERSALS_EDEFAULT;
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS:
				return isSetAveragedReversals();
		}
		return super.eIsSet(featureID);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	@SuppressWarnings("unchecked")
	public Object eInvoke(int operationID, EList<?> arguments) throws InvocationTargetException {
		switch (operationID) {
			case LimenPackage.TRANSFORMED_UP_DOWN_PROCEDURE___VALID_UP_DOWN_RULE__DIAGNOSTICCHAIN_MAP:
				return validUpDownRule((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
		}
		return super.eInvoke(operationID, arguments);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String toString() {
		if (eIsProxy()) return super.toString();

		StringBuilder result = new StringBuilder(super.toString());
		result.append(" (downCount: ");
		result.append(downCount);
		result.append(", upCount: ");
		result.append(upCount);
		result.append(", initialStep: ");
		result.append(initialStep);
		result.append(", minimumStep: ");
		if (minimumStepESet) result.append(minimumStep); else result.append("<unset>");
		result.append(", shrinkFactor: ");
		if (shrinkFactorESet) result.append(shrinkFactor); else result.append("<unset>");
		result.append(", reversalsPerShrink: ");
		result.append(reversalsPerShrink);
		result.append(", discardedReversals: ");
		result.append(discardedReversals);
		result.append(", averagedReversals: ");
		if (averagedReversalsESet) result.append(averagedReversals); else result.append("<unset>");
		result.append(')');
		return result.toString();
	}

} //TransformedUpDownProcedureImpl
