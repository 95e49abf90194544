/**
 */
package limen.model.impl;

import java.lang.reflect.InvocationTargetException;

import java.util.Collection;
import java.util.Map;

import limen.model.ConstantStimuliProcedure;
import limen.model.LimenPackage;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.eclipse.emf.ecore.util.EDataTypeEList;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Constant Stimuli Procedure</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.ConstantStimuliProcedureImpl#getValues <em>Values</em>}</li>
 *   <li>{@link limen.model.impl.ConstantStimuliProcedureImpl#getRepetitionsPerValue <em>Repetitions Per Value</em>}</li>
 *   <li>{@link limen.model.impl.ConstantStimuliProcedureImpl#isBlockedShuffle <em>Blocked Shuffle</em>}</li>
 * </ul>
 *
 * @generated
 */
public class ConstantStimuliProcedureImpl extends ProcedureImpl implements ConstantStimuliProcedure {
	/**
	 * The cached value of the '{@link #getValues() <em>Values</em>}' attribute list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getValues()
	 * @generated
	 * @ordered
	 */
	protected EList<Double> values;

	/**
	 * The default value of the '{@link #getRepetitionsPerValue() <em>Repetitions Per Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRepetitionsPerValue()
	 * @generated
	 * @ordered
	 */
	protected static final int REPETITIONS_PER_VALUE_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getRepetitionsPerValue() <em>Repetitions Per Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRepetitionsPerValue()
	 * @generated
	 * @ordered
	 */
	protected int repetitionsPerValue = REPETITIONS_PER_VALUE_EDEFAULT;

	/**
	 * The default value of the '{@link #isBlockedShuffle() <em>Blocked Shuffle</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isBlockedShuffle()
	 * @generated
	 * @ordered
	 */
	protected static final boolean BLOCKED_SHUFFLE_EDEFAULT = false;

	/**
	 * The cached value of the '{@link #isBlockedShuffle() <em>Blocked Shuffle</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isBlockedShuffle()
	 * @generated
	 * @ordered
	 */
	protected boolean blockedShuffle = BLOCKED_SHUFFLE_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected ConstantStimuliProcedureImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.CONSTANT_STIMULI_PROCEDURE;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Double> getValues() {
		if (values == null) {
			values = new EDataTypeEList<Double>(Double.class, this, LimenPackage.CONSTANT_STIMULI_PROCEDURE__VALUES);
		}
		return values;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getRepetitionsPerValue() {
		return repetitionsPerValue;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setRepetitionsPerValue(int newRepetitionsPerValue) {
		int oldRepetitionsPerValue = repetitionsPerValue;
		repetitionsPerValue = newRepetitionsPerValue;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.CONSTANT_STIMULI_PROCEDURE__REPETITIONS_PER_VALUE, oldRepetitionsPerValue, repetitionsPerValue));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isBlockedShuffle() {
		return blockedShuffle;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setBlockedShuffle(boolean newBlockedShuffle) {
		boolean oldBlockedShuffle = blockedShuffle;
		blockedShuffle = newBlockedShuffle;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.CONSTANT_STIMULI_PROCEDURE__BLOCKED_SHUFFLE, oldBlockedShuffle, blockedShuffle));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean validConstantStimuli(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.ProcedureRules.validConstantStimuli(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case LimenPackage.CONSTANT_STIMULI_PROCEDURE__VALUES:
				return getValues();
			case LimenPackage.CONSTANT_STIMULI_PROCEDURE__REPETITIONS_PER_VALUE:
				return getRepetitionsPerValue();
			case LimenPackage.CONSTANT_STIMULI_PROCEDURE__BLOCKED_SHUFFLE:
				return isBlockedShuffle();
		}
		return super.eGet(featureID, resolve, coreType);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@SuppressWarnings("unchecked")
	@Override
	public void eSet(int featureID, Object newValue) {
		switch (featureID) {
			case LimenPackage.CONSTANT_STIMULI_PROCEDURE__VALUES:
				getValues().clear();
				getValues().addAll((Collection<? extends Double>)newValue);
				return;
			case LimenPackage.CONSTANT_STIMULI_PROCEDURE__REPETITIONS_PER_VALUE:
				setRepetitionsPerValue((Integer)newValue);
				return;
			case LimenPackage.CONSTANT_STIMULI_PROCEDURE__BLOCKED_SHUFFLE:
				setBlockedShuffle((Boolean)newValue);
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
			case LimenPackage.CONSTANT_STIMULI_PROCEDURE__VALUES:
				getValues().clear();
				return;
			case LimenPackage.CONSTANT_STIMULI_PROCEDURE__REPETITIONS_PER_VALUE:
				setRepetitionsPerValue(REPETITIONS_PER_VALUE_EDEFAULT);
				return;
			case LimenPackage.CONSTANT_STIMULI_PROCEDURE__BLOCKED_SHUFFLE:
				setBlockedShuffle(BLOCKED_SHUFFLE_EDEFAULT);
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
			case LimenPackage.CONSTANT_STIMULI_PROCEDURE__VALUES:
				return values != null && !values.isEmpty();
			case LimenPackage.CONSTANT_STIMULI_PROCEDURE__REPETITIONS_PER_VALUE:
				return repetitionsPerValue != REPETITIONS_PER_VALUE_EDEFAULT;
			case LimenPackage.CONSTANT_STIMULI_PROCEDURE__BLOCKED_SHUFFLE:
				return blockedShuffle != BLOCKED_SHUFFLE_EDEFAULT;
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
			case LimenPackage.CONSTANT_STIMULI_PROCEDURE___VALID_CONSTANT_STIMULI__DIAGNOSTICCHAIN_MAP:
				return validConstantStimuli((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
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
		result.append(" (values: ");
		result.append(values);
		result.append(", repetitionsPerValue: ");
		result.append(repetitionsPerValue);
		result.append(", blockedShuffle: ");
		result.append(blockedShuffle);
		result.append(')');
		return result.toString();
	}

} //ConstantStimuliProcedureImpl
