/**
 */
package limen.model.impl;

import java.lang.reflect.InvocationTargetException;

import java.util.Map;

import limen.model.LimenPackage;
import limen.model.StaircaseProcedure;
import limen.model.StepMode;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Staircase Procedure</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.StaircaseProcedureImpl#getStartValue <em>Start Value</em>}</li>
 *   <li>{@link limen.model.impl.StaircaseProcedureImpl#getFloorValue <em>Floor Value</em>}</li>
 *   <li>{@link limen.model.impl.StaircaseProcedureImpl#getCeilingValue <em>Ceiling Value</em>}</li>
 *   <li>{@link limen.model.impl.StaircaseProcedureImpl#getStepMode <em>Step Mode</em>}</li>
 * </ul>
 *
 * @generated
 */
public abstract class StaircaseProcedureImpl extends ProcedureImpl implements StaircaseProcedure {
	/**
	 * The default value of the '{@link #getStartValue() <em>Start Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStartValue()
	 * @generated
	 * @ordered
	 */
	protected static final double START_VALUE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getStartValue() <em>Start Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStartValue()
	 * @generated
	 * @ordered
	 */
	protected double startValue = START_VALUE_EDEFAULT;

	/**
	 * The default value of the '{@link #getFloorValue() <em>Floor Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFloorValue()
	 * @generated
	 * @ordered
	 */
	protected static final double FLOOR_VALUE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getFloorValue() <em>Floor Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFloorValue()
	 * @generated
	 * @ordered
	 */
	protected double floorValue = FLOOR_VALUE_EDEFAULT;

	/**
	 * The default value of the '{@link #getCeilingValue() <em>Ceiling Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCeilingValue()
	 * @generated
	 * @ordered
	 */
	protected static final double CEILING_VALUE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getCeilingValue() <em>Ceiling Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCeilingValue()
	 * @generated
	 * @ordered
	 */
	protected double ceilingValue = CEILING_VALUE_EDEFAULT;

	/**
	 * The default value of the '{@link #getStepMode() <em>Step Mode</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStepMode()
	 * @generated
	 * @ordered
	 */
	protected static final StepMode STEP_MODE_EDEFAULT = StepMode.ADDITIVE;

	/**
	 * The cached value of the '{@link #getStepMode() <em>Step Mode</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStepMode()
	 * @generated
	 * @ordered
	 */
	protected StepMode stepMode = STEP_MODE_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected StaircaseProcedureImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.STAIRCASE_PROCEDURE;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getStartValue() {
		return startValue;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setStartValue(double newStartValue) {
		double oldStartValue = startValue;
		startValue = newStartValue;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.STAIRCASE_PROCEDURE__START_VALUE, oldStartValue, startValue));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getFloorValue() {
		return floorValue;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setFloorValue(double newFloorValue) {
		double oldFloorValue = floorValue;
		floorValue = newFloorValue;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.STAIRCASE_PROCEDURE__FLOOR_VALUE, oldFloorValue, floorValue));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getCeilingValue() {
		return ceilingValue;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCeilingValue(double newCeilingValue) {
		double oldCeilingValue = ceilingValue;
		ceilingValue = newCeilingValue;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.STAIRCASE_PROCEDURE__CEILING_VALUE, oldCeilingValue, ceilingValue));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public StepMode getStepMode() {
		return stepMode;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setStepMode(StepMode newStepMode) {
		StepMode oldStepMode = stepMode;
		stepMode = newStepMode == null ? STEP_MODE_EDEFAULT : newStepMode;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.STAIRCASE_PROCEDURE__STEP_MODE, oldStepMode, stepMode));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean validLimits(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.ProcedureRules.validLimits(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case LimenPackage.STAIRCASE_PROCEDURE__START_VALUE:
				return getStartValue();
			case LimenPackage.STAIRCASE_PROCEDURE__FLOOR_VALUE:
				return getFloorValue();
			case LimenPackage.STAIRCASE_PROCEDURE__CEILING_VALUE:
				return getCeilingValue();
			case LimenPackage.STAIRCASE_PROCEDURE__STEP_MODE:
				return getStepMode();
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
			case LimenPackage.STAIRCASE_PROCEDURE__START_VALUE:
				setStartValue((Double)newValue);
				return;
			case LimenPackage.STAIRCASE_PROCEDURE__FLOOR_VALUE:
				setFloorValue((Double)newValue);
				return;
			case LimenPackage.STAIRCASE_PROCEDURE__CEILING_VALUE:
				setCeilingValue((Double)newValue);
				return;
			case LimenPackage.STAIRCASE_PROCEDURE__STEP_MODE:
				setStepMode((StepMode)newValue);
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
			case LimenPackage.STAIRCASE_PROCEDURE__START_VALUE:
				setStartValue(START_VALUE_EDEFAULT);
				return;
			case LimenPackage.STAIRCASE_PROCEDURE__FLOOR_VALUE:
				setFloorValue(FLOOR_VALUE_EDEFAULT);
				return;
			case LimenPackage.STAIRCASE_PROCEDURE__CEILING_VALUE:
				setCeilingValue(CEILING_VALUE_EDEFAULT);
				return;
			case LimenPackage.STAIRCASE_PROCEDURE__STEP_MODE:
				setStepMode(STEP_MODE_EDEFAULT);
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
			case LimenPackage.STAIRCASE_PROCEDURE__START_VALUE:
				return startValue != START_VALUE_EDEFAULT;
			case LimenPackage.STAIRCASE_PROCEDURE__FLOOR_VALUE:
				return floorValue != FLOOR_VALUE_EDEFAULT;
			case LimenPackage.STAIRCASE_PROCEDURE__CEILING_VALUE:
				return ceilingValue != CEILING_VALUE_EDEFAULT;
			case LimenPackage.STAIRCASE_PROCEDURE__STEP_MODE:
				return stepMode != STEP_MODE_EDEFAULT;
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
			case LimenPackage.STAIRCASE_PROCEDURE___VALID_LIMITS__DIAGNOSTICCHAIN_MAP:
				return validLimits((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
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
		result.append(" (startValue: ");
		result.append(startValue);
		result.append(", floorValue: ");
		result.append(floorValue);
		result.append(", ceilingValue: ");
		result.append(ceilingValue);
		result.append(", stepMode: ");
		result.append(stepMode);
		result.append(')');
		return result.toString();
	}

} //StaircaseProcedureImpl
