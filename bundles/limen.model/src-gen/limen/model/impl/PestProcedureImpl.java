/**
 */
package limen.model.impl;

import java.lang.reflect.InvocationTargetException;

import java.util.Map;

import limen.model.LimenPackage;
import limen.model.PestProcedure;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Pest Procedure</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.PestProcedureImpl#getInitialStep <em>Initial Step</em>}</li>
 *   <li>{@link limen.model.impl.PestProcedureImpl#getMinimumStep <em>Minimum Step</em>}</li>
 *   <li>{@link limen.model.impl.PestProcedureImpl#getMaximumStep <em>Maximum Step</em>}</li>
 *   <li>{@link limen.model.impl.PestProcedureImpl#getWaldDeviation <em>Wald Deviation</em>}</li>
 *   <li>{@link limen.model.impl.PestProcedureImpl#getTargetProbability <em>Target Probability</em>}</li>
 * </ul>
 *
 * @generated
 */
public class PestProcedureImpl extends StaircaseProcedureImpl implements PestProcedure {
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
	 * The default value of the '{@link #getMaximumStep() <em>Maximum Step</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaximumStep()
	 * @generated
	 * @ordered
	 */
	protected static final double MAXIMUM_STEP_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMaximumStep() <em>Maximum Step</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaximumStep()
	 * @generated
	 * @ordered
	 */
	protected double maximumStep = MAXIMUM_STEP_EDEFAULT;

	/**
	 * The default value of the '{@link #getWaldDeviation() <em>Wald Deviation</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getWaldDeviation()
	 * @generated
	 * @ordered
	 */
	protected static final double WALD_DEVIATION_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getWaldDeviation() <em>Wald Deviation</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getWaldDeviation()
	 * @generated
	 * @ordered
	 */
	protected double waldDeviation = WALD_DEVIATION_EDEFAULT;

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
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected PestProcedureImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.PEST_PROCEDURE;
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
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.PEST_PROCEDURE__INITIAL_STEP, oldInitialStep, initialStep));
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
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.PEST_PROCEDURE__MINIMUM_STEP, oldMinimumStep, minimumStep));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMaximumStep() {
		return maximumStep;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMaximumStep(double newMaximumStep) {
		double oldMaximumStep = maximumStep;
		maximumStep = newMaximumStep;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.PEST_PROCEDURE__MAXIMUM_STEP, oldMaximumStep, maximumStep));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getWaldDeviation() {
		return waldDeviation;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setWaldDeviation(double newWaldDeviation) {
		double oldWaldDeviation = waldDeviation;
		waldDeviation = newWaldDeviation;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.PEST_PROCEDURE__WALD_DEVIATION, oldWaldDeviation, waldDeviation));
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
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.PEST_PROCEDURE__TARGET_PROBABILITY, oldTargetProbability, targetProbability));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean validPestSteps(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.ProcedureRules.validPestSteps(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case LimenPackage.PEST_PROCEDURE__INITIAL_STEP:
				return getInitialStep();
			case LimenPackage.PEST_PROCEDURE__MINIMUM_STEP:
				return getMinimumStep();
			case LimenPackage.PEST_PROCEDURE__MAXIMUM_STEP:
				return getMaximumStep();
			case LimenPackage.PEST_PROCEDURE__WALD_DEVIATION:
				return getWaldDeviation();
			case LimenPackage.PEST_PROCEDURE__TARGET_PROBABILITY:
				return getTargetProbability();
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
			case LimenPackage.PEST_PROCEDURE__INITIAL_STEP:
				setInitialStep((Double)newValue);
				return;
			case LimenPackage.PEST_PROCEDURE__MINIMUM_STEP:
				setMinimumStep((Double)newValue);
				return;
			case LimenPackage.PEST_PROCEDURE__MAXIMUM_STEP:
				setMaximumStep((Double)newValue);
				return;
			case LimenPackage.PEST_PROCEDURE__WALD_DEVIATION:
				setWaldDeviation((Double)newValue);
				return;
			case LimenPackage.PEST_PROCEDURE__TARGET_PROBABILITY:
				setTargetProbability((Double)newValue);
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
			case LimenPackage.PEST_PROCEDURE__INITIAL_STEP:
				setInitialStep(INITIAL_STEP_EDEFAULT);
				return;
			case LimenPackage.PEST_PROCEDURE__MINIMUM_STEP:
				setMinimumStep(MINIMUM_STEP_EDEFAULT);
				return;
			case LimenPackage.PEST_PROCEDURE__MAXIMUM_STEP:
				setMaximumStep(MAXIMUM_STEP_EDEFAULT);
				return;
			case LimenPackage.PEST_PROCEDURE__WALD_DEVIATION:
				setWaldDeviation(WALD_DEVIATION_EDEFAULT);
				return;
			case LimenPackage.PEST_PROCEDURE__TARGET_PROBABILITY:
				setTargetProbability(TARGET_PROBABILITY_EDEFAULT);
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
			case LimenPackage.PEST_PROCEDURE__INITIAL_STEP:
				return initialStep != INITIAL_STEP_EDEFAULT;
			case LimenPackage.PEST_PROCEDURE__MINIMUM_STEP:
				return minimumStep != MINIMUM_STEP_EDEFAULT;
			case LimenPackage.PEST_PROCEDURE__MAXIMUM_STEP:
				return maximumStep != MAXIMUM_STEP_EDEFAULT;
			case LimenPackage.PEST_PROCEDURE__WALD_DEVIATION:
				return waldDeviation != WALD_DEVIATION_EDEFAULT;
			case LimenPackage.PEST_PROCEDURE__TARGET_PROBABILITY:
				return targetProbability != TARGET_PROBABILITY_EDEFAULT;
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
			case LimenPackage.PEST_PROCEDURE___VALID_PEST_STEPS__DIAGNOSTICCHAIN_MAP:
				return validPestSteps((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
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
		result.append(" (initialStep: ");
		result.append(initialStep);
		result.append(", minimumStep: ");
		result.append(minimumStep);
		result.append(", maximumStep: ");
		result.append(maximumStep);
		result.append(", waldDeviation: ");
		result.append(waldDeviation);
		result.append(", targetProbability: ");
		result.append(targetProbability);
		result.append(')');
		return result.toString();
	}

} //PestProcedureImpl
