/**
 */
package limen.model.impl;

import java.lang.reflect.InvocationTargetException;

import java.util.Map;

import limen.model.LimenPackage;
import limen.model.WeightedUpDownProcedure;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Weighted Up Down Procedure</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.WeightedUpDownProcedureImpl#getTargetProbability <em>Target Probability</em>}</li>
 *   <li>{@link limen.model.impl.WeightedUpDownProcedureImpl#getUpStep <em>Up Step</em>}</li>
 *   <li>{@link limen.model.impl.WeightedUpDownProcedureImpl#getDownStep <em>Down Step</em>}</li>
 *   <li>{@link limen.model.impl.WeightedUpDownProcedureImpl#getDiscardedReversals <em>Discarded Reversals</em>}</li>
 *   <li>{@link limen.model.impl.WeightedUpDownProcedureImpl#getAveragedReversals <em>Averaged Reversals</em>}</li>
 * </ul>
 *
 * @generated
 */
public class WeightedUpDownProcedureImpl extends StaircaseProcedureImpl implements WeightedUpDownProcedure {
	/**
	 * The default value of the '{@link #getTargetProbability() <em>Target Probability</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTargetProbability()
	 * @generated
	 * @ordered
	 */
	protected static final double TARGET_PROBABILITY_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getTargetProbability() <em>Target Probability</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTargetProbability()
	 * @generated
	 * @ordered
	 */
	protected double targetProbability = TARGET_PROBABILITY_EDEFAULT;

	/**
	 * The default value of the '{@link #getUpStep() <em>Up Step</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUpStep()
	 * @generated
	 * @ordered
	 */
	protected static final double UP_STEP_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getUpStep() <em>Up Step</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUpStep()
	 * @generated
	 * @ordered
	 */
	protected double upStep = UP_STEP_EDEFAULT;

	/**
	 * The default value of the '{@link #getDownStep() <em>Down Step</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDownStep()
	 * @generated
	 * @ordered
	 */
	protected static final double DOWN_STEP_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getDownStep() <em>Down Step</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDownStep()
	 * @generated
	 * @ordered
	 */
	protected double downStep = DOWN_STEP_EDEFAULT;

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
	protected WeightedUpDownProcedureImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.WEIGHTED_UP_DOWN_PROCEDURE;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getTargetProbability() {
		return targetProbability;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTargetProbability(double newTargetProbability) {
		double oldTargetProbability = targetProbability;
		targetProbability = newTargetProbability;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__TARGET_PROBABILITY, oldTargetProbability, targetProbability));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getUpStep() {
		return upStep;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setUpStep(double newUpStep) {
		double oldUpStep = upStep;
		upStep = newUpStep;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__UP_STEP, oldUpStep, upStep));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getDownStep() {
		return downStep;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDownStep(double newDownStep) {
		double oldDownStep = downStep;
		downStep = newDownStep;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__DOWN_STEP, oldDownStep, downStep));
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
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS, oldDiscardedReversals, discardedReversals));
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
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS, oldAveragedReversals, averagedReversals, !oldAveragedReversalsESet));
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
			eNotify(new ENotificationImpl(this, Notification.UNSET, LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS, oldAveragedReversals, AVERAGED_REVERSALS_EDEFAULT, oldAveragedReversalsESet));
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
	public boolean validWeightedSteps(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.ProcedureRules.validWeightedSteps(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__TARGET_PROBABILITY:
				return getTargetProbability();
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__UP_STEP:
				return getUpStep();
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__DOWN_STEP:
				return getDownStep();
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS:
				return getDiscardedReversals();
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS:
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
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__TARGET_PROBABILITY:
				setTargetProbability((Double)newValue);
				return;
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__UP_STEP:
				setUpStep((Double)newValue);
				return;
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__DOWN_STEP:
				setDownStep((Double)newValue);
				return;
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS:
				setDiscardedReversals((Integer)newValue);
				return;
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS:
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
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__TARGET_PROBABILITY:
				setTargetProbability(TARGET_PROBABILITY_EDEFAULT);
				return;
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__UP_STEP:
				setUpStep(UP_STEP_EDEFAULT);
				return;
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__DOWN_STEP:
				setDownStep(DOWN_STEP_EDEFAULT);
				return;
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS:
				setDiscardedReversals(DISCARDED_REVERSALS_EDEFAULT);
				return;
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS:
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
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__TARGET_PROBABILITY:
				return targetProbability != TARGET_PROBABILITY_EDEFAULT;
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__UP_STEP:
				return upStep != UP_STEP_EDEFAULT;
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__DOWN_STEP:
				return downStep != DOWN_STEP_EDEFAULT;
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__DISCARDED_REVERSALS:
				return discardedReversals != DISCARDED_REVERSALS_EDEFAULT;
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE__AVERAGED_REVERSALS:
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
			case LimenPackage.WEIGHTED_UP_DOWN_PROCEDURE___VALID_WEIGHTED_STEPS__DIAGNOSTICCHAIN_MAP:
				return validWeightedSteps((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
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
		result.append(" (targetProbability: ");
		result.append(targetProbability);
		result.append(", upStep: ");
		result.append(upStep);
		result.append(", downStep: ");
		result.append(downStep);
		result.append(", discardedReversals: ");
		result.append(discardedReversals);
		result.append(", averagedReversals: ");
		if (averagedReversalsESet) result.append(averagedReversals); else result.append("<unset>");
		result.append(')');
		return result.toString();
	}

} //WeightedUpDownProcedureImpl
