/**
 */
package limen.model.impl;

import java.lang.reflect.InvocationTargetException;

import java.util.Map;

import limen.model.LimenPackage;
import limen.model.YesNoTask;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Yes No Task</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.YesNoTaskImpl#getCatchTrialRate <em>Catch Trial Rate</em>}</li>
 * </ul>
 *
 * @generated
 */
public class YesNoTaskImpl extends TaskImpl implements YesNoTask {
	/**
	 * The default value of the '{@link #getCatchTrialRate() <em>Catch Trial Rate</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCatchTrialRate()
	 * @generated
	 * @ordered
	 */
	protected static final double CATCH_TRIAL_RATE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getCatchTrialRate() <em>Catch Trial Rate</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCatchTrialRate()
	 * @generated
	 * @ordered
	 */
	protected double catchTrialRate = CATCH_TRIAL_RATE_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected YesNoTaskImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.YES_NO_TASK;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getCatchTrialRate() {
		return catchTrialRate;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCatchTrialRate(double newCatchTrialRate) {
		double oldCatchTrialRate = catchTrialRate;
		catchTrialRate = newCatchTrialRate;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.YES_NO_TASK__CATCH_TRIAL_RATE, oldCatchTrialRate, catchTrialRate));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean validCatchTrials(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.TaskRules.validCatchTrials(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case LimenPackage.YES_NO_TASK__CATCH_TRIAL_RATE:
				return getCatchTrialRate();
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
			case LimenPackage.YES_NO_TASK__CATCH_TRIAL_RATE:
				setCatchTrialRate((Double)newValue);
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
			case LimenPackage.YES_NO_TASK__CATCH_TRIAL_RATE:
				setCatchTrialRate(CATCH_TRIAL_RATE_EDEFAULT);
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
			case LimenPackage.YES_NO_TASK__CATCH_TRIAL_RATE:
				return catchTrialRate != CATCH_TRIAL_RATE_EDEFAULT;
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
			case LimenPackage.YES_NO_TASK___VALID_CATCH_TRIALS__DIAGNOSTICCHAIN_MAP:
				return validCatchTrials((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
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
		result.append(" (catchTrialRate: ");
		result.append(catchTrialRate);
		result.append(')');
		return result.toString();
	}

} //YesNoTaskImpl
