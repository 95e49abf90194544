/**
 */
package limen.model.impl;

import java.lang.reflect.InvocationTargetException;

import java.util.Map;

import limen.model.LimenPackage;
import limen.model.StoppingRule;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.EObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Stopping Rule</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.StoppingRuleImpl#getMaximumReversals <em>Maximum Reversals</em>}</li>
 *   <li>{@link limen.model.impl.StoppingRuleImpl#getMaximumTrials <em>Maximum Trials</em>}</li>
 *   <li>{@link limen.model.impl.StoppingRuleImpl#getPosteriorSdTarget <em>Posterior Sd Target</em>}</li>
 * </ul>
 *
 * @generated
 */
public class StoppingRuleImpl extends EObjectImpl implements StoppingRule {
	/**
	 * The default value of the '{@link #getMaximumReversals() <em>Maximum Reversals</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaximumReversals()
	 * @generated
	 * @ordered
	 */
	protected static final int MAXIMUM_REVERSALS_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getMaximumReversals() <em>Maximum Reversals</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaximumReversals()
	 * @generated
	 * @ordered
	 */
	protected int maximumReversals = MAXIMUM_REVERSALS_EDEFAULT;

	/**
	 * This is true if the Maximum Reversals attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean maximumReversalsESet;

	/**
	 * The default value of the '{@link #getMaximumTrials() <em>Maximum Trials</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaximumTrials()
	 * @generated
	 * @ordered
	 */
	protected static final int MAXIMUM_TRIALS_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getMaximumTrials() <em>Maximum Trials</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaximumTrials()
	 * @generated
	 * @ordered
	 */
	protected int maximumTrials = MAXIMUM_TRIALS_EDEFAULT;

	/**
	 * This is true if the Maximum Trials attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean maximumTrialsESet;

	/**
	 * The default value of the '{@link #getPosteriorSdTarget() <em>Posterior Sd Target</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPosteriorSdTarget()
	 * @generated
	 * @ordered
	 */
	protected static final double POSTERIOR_SD_TARGET_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getPosteriorSdTarget() <em>Posterior Sd Target</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPosteriorSdTarget()
	 * @generated
	 * @ordered
	 */
	protected double posteriorSdTarget = POSTERIOR_SD_TARGET_EDEFAULT;

	/**
	 * This is true if the Posterior Sd Target attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean posteriorSdTargetESet;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected StoppingRuleImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.STOPPING_RULE;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getMaximumReversals() {
		return maximumReversals;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMaximumReversals(int newMaximumReversals) {
		int oldMaximumReversals = maximumReversals;
		maximumReversals = newMaximumReversals;
		boolean oldMaximumReversalsESet = maximumReversalsESet;
		maximumReversalsESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.STOPPING_RULE__MAXIMUM_REVERSALS, oldMaximumReversals, maximumReversals, !oldMaximumReversalsESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetMaximumReversals() {
		int oldMaximumReversals = maximumReversals;
		boolean oldMaximumReversalsESet = maximumReversalsESet;
		maximumReversals = MAXIMUM_REVERSALS_EDEFAULT;
		maximumReversalsESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, LimenPackage.STOPPING_RULE__MAXIMUM_REVERSALS, oldMaximumReversals, MAXIMUM_REVERSALS_EDEFAULT, oldMaximumReversalsESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetMaximumReversals() {
		return maximumReversalsESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getMaximumTrials() {
		return maximumTrials;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMaximumTrials(int newMaximumTrials) {
		int oldMaximumTrials = maximumTrials;
		maximumTrials = newMaximumTrials;
		boolean oldMaximumTrialsESet = maximumTrialsESet;
		maximumTrialsESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.STOPPING_RULE__MAXIMUM_TRIALS, oldMaximumTrials, maximumTrials, !oldMaximumTrialsESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetMaximumTrials() {
		int oldMaximumTrials = maximumTrials;
		boolean oldMaximumTrialsESet = maximumTrialsESet;
		maximumTrials = MAXIMUM_TRIALS_EDEFAULT;
		maximumTrialsESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, LimenPackage.STOPPING_RULE__MAXIMUM_TRIALS, oldMaximumTrials, MAXIMUM_TRIALS_EDEFAULT, oldMaximumTrialsESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetMaximumTrials() {
		return maximumTrialsESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getPosteriorSdTarget() {
		return posteriorSdTarget;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPosteriorSdTarget(double newPosteriorSdTarget) {
		double oldPosteriorSdTarget = posteriorSdTarget;
		posteriorSdTarget = newPosteriorSdTarget;
		boolean oldPosteriorSdTargetESet = posteriorSdTargetESet;
		posteriorSdTargetESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.STOPPING_RULE__POSTERIOR_SD_TARGET, oldPosteriorSdTarget, posteriorSdTarget, !oldPosteriorSdTargetESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetPosteriorSdTarget() {
		double oldPosteriorSdTarget = posteriorSdTarget;
		boolean oldPosteriorSdTargetESet = posteriorSdTargetESet;
		posteriorSdTarget = POSTERIOR_SD_TARGET_EDEFAULT;
		posteriorSdTargetESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, LimenPackage.STOPPING_RULE__POSTERIOR_SD_TARGET, oldPosteriorSdTarget, POSTERIOR_SD_TARGET_EDEFAULT, oldPosteriorSdTargetESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetPosteriorSdTarget() {
		return posteriorSdTargetESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean canEnd(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.ProcedureRules.canEnd(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case LimenPackage.STOPPING_RULE__MAXIMUM_REVERSALS:
				return getMaximumReversals();
			case LimenPackage.STOPPING_RULE__MAXIMUM_TRIALS:
				return getMaximumTrials();
			case LimenPackage.STOPPING_RULE__POSTERIOR_SD_TARGET:
				return getPosteriorSdTarget();
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
			case LimenPackage.STOPPING_RULE__MAXIMUM_REVERSALS:
				setMaximumReversals((Integer)newValue);
				return;
			case LimenPackage.STOPPING_RULE__MAXIMUM_TRIALS:
				setMaximumTrials((Integer)newValue);
				return;
			case LimenPackage.STOPPING_RULE__POSTERIOR_SD_TARGET:
				setPosteriorSdTarget((Double)newValue);
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
			case LimenPackage.STOPPING_RULE__MAXIMUM_REVERSALS:
				unsetMaximumReversals();
				return;
			case LimenPackage.STOPPING_RULE__MAXIMUM_TRIALS:
				unsetMaximumTrials();
				return;
			case LimenPackage.STOPPING_RULE__POSTERIOR_SD_TARGET:
				unsetPosteriorSdTarget();
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
			case LimenPackage.STOPPING_RULE__MAXIMUM_REVERSALS:
				return isSetMaximumReversals();
			case LimenPackage.STOPPING_RULE__MAXIMUM_TRIALS:
				return isSetMaximumTrials();
			case LimenPackage.STOPPING_RULE__POSTERIOR_SD_TARGET:
				return isSetPosteriorSdTarget();
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
			case LimenPackage.STOPPING_RULE___CAN_END__DIAGNOSTICCHAIN_MAP:
				return canEnd((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
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
		result.append(" (maximumReversals: ");
		if (maximumReversalsESet) result.append(maximumReversals); else result.append("<unset>");
		result.append(", maximumTrials: ");
		if (maximumTrialsESet) result.append(maximumTrials); else result.append("<unset>");
		result.append(", posteriorSdTarget: ");
		if (posteriorSdTargetESet) result.append(posteriorSdTarget); else result.append("<unset>");
		result.append(')');
		return result.toString();
	}

} //StoppingRuleImpl
