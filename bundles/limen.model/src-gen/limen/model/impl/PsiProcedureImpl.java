/**
 */
package limen.model.impl;

import java.lang.reflect.InvocationTargetException;

import java.util.Map;

import limen.model.LapseMode;
import limen.model.LimenPackage;
import limen.model.PsiProcedure;
import limen.model.PsychometricFamily;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Psi Procedure</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.PsiProcedureImpl#getFamily <em>Family</em>}</li>
 *   <li>{@link limen.model.impl.PsiProcedureImpl#getThresholdMinimum <em>Threshold Minimum</em>}</li>
 *   <li>{@link limen.model.impl.PsiProcedureImpl#getThresholdMaximum <em>Threshold Maximum</em>}</li>
 *   <li>{@link limen.model.impl.PsiProcedureImpl#getThresholdCount <em>Threshold Count</em>}</li>
 *   <li>{@link limen.model.impl.PsiProcedureImpl#getSlopeMinimum <em>Slope Minimum</em>}</li>
 *   <li>{@link limen.model.impl.PsiProcedureImpl#getSlopeMaximum <em>Slope Maximum</em>}</li>
 *   <li>{@link limen.model.impl.PsiProcedureImpl#getSlopeCount <em>Slope Count</em>}</li>
 *   <li>{@link limen.model.impl.PsiProcedureImpl#getStimulusMinimum <em>Stimulus Minimum</em>}</li>
 *   <li>{@link limen.model.impl.PsiProcedureImpl#getStimulusMaximum <em>Stimulus Maximum</em>}</li>
 *   <li>{@link limen.model.impl.PsiProcedureImpl#getStimulusCount <em>Stimulus Count</em>}</li>
 *   <li>{@link limen.model.impl.PsiProcedureImpl#getLapseMode <em>Lapse Mode</em>}</li>
 *   <li>{@link limen.model.impl.PsiProcedureImpl#getLapseRate <em>Lapse Rate</em>}</li>
 *   <li>{@link limen.model.impl.PsiProcedureImpl#getLapseMinimum <em>Lapse Minimum</em>}</li>
 *   <li>{@link limen.model.impl.PsiProcedureImpl#getLapseMaximum <em>Lapse Maximum</em>}</li>
 *   <li>{@link limen.model.impl.PsiProcedureImpl#getLapseCount <em>Lapse Count</em>}</li>
 *   <li>{@link limen.model.impl.PsiProcedureImpl#getGuessRate <em>Guess Rate</em>}</li>
 * </ul>
 *
 * @generated
 */
public class PsiProcedureImpl extends ProcedureImpl implements PsiProcedure {
	/**
	 * The default value of the '{@link #getFamily() <em>Family</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFamily()
	 * @generated
	 * @ordered
	 */
	protected static final PsychometricFamily FAMILY_EDEFAULT = PsychometricFamily.LOGISTIC;

	/**
	 * The cached value of the '{@link #getFamily() <em>Family</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFamily()
	 * @generated
	 * @ordered
	 */
	protected PsychometricFamily family = FAMILY_EDEFAULT;

	/**
	 * The default value of the '{@link #getThresholdMinimum() <em>Threshold Minimum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getThresholdMinimum()
	 * @generated
	 * @ordered
	 */
	protected static final double THRESHOLD_MINIMUM_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getThresholdMinimum() <em>Threshold Minimum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getThresholdMinimum()
	 * @generated
	 * @ordered
	 */
	protected double thresholdMinimum = THRESHOLD_MINIMUM_EDEFAULT;

	/**
	 * The default value of the '{@link #getThresholdMaximum() <em>Threshold Maximum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getThresholdMaximum()
	 * @generated
	 * @ordered
	 */
	protected static final double THRESHOLD_MAXIMUM_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getThresholdMaximum() <em>Threshold Maximum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getThresholdMaximum()
	 * @generated
	 * @ordered
	 */
	protected double thresholdMaximum = THRESHOLD_MAXIMUM_EDEFAULT;

	/**
	 * The default value of the '{@link #getThresholdCount() <em>Threshold Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getThresholdCount()
	 * @generated
	 * @ordered
	 */
	protected static final int THRESHOLD_COUNT_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getThresholdCount() <em>Threshold Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getThresholdCount()
	 * @generated
	 * @ordered
	 */
	protected int thresholdCount = THRESHOLD_COUNT_EDEFAULT;

	/**
	 * The default value of the '{@link #getSlopeMinimum() <em>Slope Minimum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSlopeMinimum()
	 * @generated
	 * @ordered
	 */
	protected static final double SLOPE_MINIMUM_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getSlopeMinimum() <em>Slope Minimum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSlopeMinimum()
	 * @generated
	 * @ordered
	 */
	protected double slopeMinimum = SLOPE_MINIMUM_EDEFAULT;

	/**
	 * The default value of the '{@link #getSlopeMaximum() <em>Slope Maximum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSlopeMaximum()
	 * @generated
	 * @ordered
	 */
	protected static final double SLOPE_MAXIMUM_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getSlopeMaximum() <em>Slope Maximum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSlopeMaximum()
	 * @generated
	 * @ordered
	 */
	protected double slopeMaximum = SLOPE_MAXIMUM_EDEFAULT;

	/**
	 * The default value of the '{@link #getSlopeCount() <em>Slope Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSlopeCount()
	 * @generated
	 * @ordered
	 */
	protected static final int SLOPE_COUNT_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getSlopeCount() <em>Slope Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSlopeCount()
	 * @generated
	 * @ordered
	 */
	protected int slopeCount = SLOPE_COUNT_EDEFAULT;

	/**
	 * The default value of the '{@link #getStimulusMinimum() <em>Stimulus Minimum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStimulusMinimum()
	 * @generated
	 * @ordered
	 */
	protected static final double STIMULUS_MINIMUM_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getStimulusMinimum() <em>Stimulus Minimum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStimulusMinimum()
	 * @generated
	 * @ordered
	 */
	protected double stimulusMinimum = STIMULUS_MINIMUM_EDEFAULT;

	/**
	 * The default value of the '{@link #getStimulusMaximum() <em>Stimulus Maximum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStimulusMaximum()
	 * @generated
	 * @ordered
	 */
	protected static final double STIMULUS_MAXIMUM_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getStimulusMaximum() <em>Stimulus Maximum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStimulusMaximum()
	 * @generated
	 * @ordered
	 */
	protected double stimulusMaximum = STIMULUS_MAXIMUM_EDEFAULT;

	/**
	 * The default value of the '{@link #getStimulusCount() <em>Stimulus Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStimulusCount()
	 * @generated
	 * @ordered
	 */
	protected static final int STIMULUS_COUNT_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getStimulusCount() <em>Stimulus Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStimulusCount()
	 * @generated
	 * @ordered
	 */
	protected int stimulusCount = STIMULUS_COUNT_EDEFAULT;

	/**
	 * The default value of the '{@link #getLapseMode() <em>Lapse Mode</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLapseMode()
	 * @generated
	 * @ordered
	 */
	protected static final LapseMode LAPSE_MODE_EDEFAULT = LapseMode.FIXED;

	/**
	 * The cached value of the '{@link #getLapseMode() <em>Lapse Mode</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLapseMode()
	 * @generated
	 * @ordered
	 */
	protected LapseMode lapseMode = LAPSE_MODE_EDEFAULT;

	/**
	 * The default value of the '{@link #getLapseRate() <em>Lapse Rate</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLapseRate()
	 * @generated
	 * @ordered
	 */
	protected static final double LAPSE_RATE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getLapseRate() <em>Lapse Rate</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLapseRate()
	 * @generated
	 * @ordered
	 */
	protected double lapseRate = LAPSE_RATE_EDEFAULT;

	/**
	 * The default value of the '{@link #getLapseMinimum() <em>Lapse Minimum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLapseMinimum()
	 * @generated
	 * @ordered
	 */
	protected static final double LAPSE_MINIMUM_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getLapseMinimum() <em>Lapse Minimum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLapseMinimum()
	 * @generated
	 * @ordered
	 */
	protected double lapseMinimum = LAPSE_MINIMUM_EDEFAULT;

	/**
	 * The default value of the '{@link #getLapseMaximum() <em>Lapse Maximum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLapseMaximum()
	 * @generated
	 * @ordered
	 */
	protected static final double LAPSE_MAXIMUM_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getLapseMaximum() <em>Lapse Maximum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLapseMaximum()
	 * @generated
	 * @ordered
	 */
	protected double lapseMaximum = LAPSE_MAXIMUM_EDEFAULT;

	/**
	 * The default value of the '{@link #getLapseCount() <em>Lapse Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLapseCount()
	 * @generated
	 * @ordered
	 */
	protected static final int LAPSE_COUNT_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getLapseCount() <em>Lapse Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLapseCount()
	 * @generated
	 * @ordered
	 */
	protected int lapseCount = LAPSE_COUNT_EDEFAULT;

	/**
	 * The default value of the '{@link #getGuessRate() <em>Guess Rate</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getGuessRate()
	 * @generated
	 * @ordered
	 */
	protected static final double GUESS_RATE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getGuessRate() <em>Guess Rate</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getGuessRate()
	 * @generated
	 * @ordered
	 */
	protected double guessRate = GUESS_RATE_EDEFAULT;

	/**
	 * This is true if the Guess Rate attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean guessRateESet;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected PsiProcedureImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.PSI_PROCEDURE;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public PsychometricFamily getFamily() {
		return family;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setFamily(PsychometricFamily newFamily) {
		PsychometricFamily oldFamily = family;
		family = newFamily == null ? FAMILY_EDEFAULT : newFamily;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.PSI_PROCEDURE__FAMILY, oldFamily, family));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getThresholdMinimum() {
		return thresholdMinimum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setThresholdMinimum(double newThresholdMinimum) {
		double oldThresholdMinimum = thresholdMinimum;
		thresholdMinimum = newThresholdMinimum;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.PSI_PROCEDURE__THRESHOLD_MINIMUM, oldThresholdMinimum, thresholdMinimum));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getThresholdMaximum() {
		return thresholdMaximum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setThresholdMaximum(double newThresholdMaximum) {
		double oldThresholdMaximum = thresholdMaximum;
		thresholdMaximum = newThresholdMaximum;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.PSI_PROCEDURE__THRESHOLD_MAXIMUM, oldThresholdMaximum, thresholdMaximum));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getThresholdCount() {
		return thresholdCount;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setThresholdCount(int newThresholdCount) {
		int oldThresholdCount = thresholdCount;
		thresholdCount = newThresholdCount;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.PSI_PROCEDURE__THRESHOLD_COUNT, oldThresholdCount, thresholdCount));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getSlopeMinimum() {
		return slopeMinimum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSlopeMinimum(double newSlopeMinimum) {
		double oldSlopeMinimum = slopeMinimum;
		slopeMinimum = newSlopeMinimum;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.PSI_PROCEDURE__SLOPE_MINIMUM, oldSlopeMinimum, slopeMinimum));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getSlopeMaximum() {
		return slopeMaximum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSlopeMaximum(double newSlopeMaximum) {
		double oldSlopeMaximum = slopeMaximum;
		slopeMaximum = newSlopeMaximum;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.PSI_PROCEDURE__SLOPE_MAXIMUM, oldSlopeMaximum, slopeMaximum));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getSlopeCount() {
		return slopeCount;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSlopeCount(int newSlopeCount) {
		int oldSlopeCount = slopeCount;
		slopeCount = newSlopeCount;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.PSI_PROCEDURE__SLOPE_COUNT, oldSlopeCount, slopeCount));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getStimulusMinimum() {
		return stimulusMinimum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setStimulusMinimum(double newStimulusMinimum) {
		double oldStimulusMinimum = stimulusMinimum;
		stimulusMinimum = newStimulusMinimum;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.PSI_PROCEDURE__STIMULUS_MINIMUM, oldStimulusMinimum, stimulusMinimum));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getStimulusMaximum() {
		return stimulusMaximum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setStimulusMaximum(double newStimulusMaximum) {
		double oldStimulusMaximum = stimulusMaximum;
		stimulusMaximum = newStimulusMaximum;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.PSI_PROCEDURE__STIMULUS_MAXIMUM, oldStimulusMaximum, stimulusMaximum));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getStimulusCount() {
		return stimulusCount;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setStimulusCount(int newStimulusCount) {
		int oldStimulusCount = stimulusCount;
		stimulusCount = newStimulusCount;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.PSI_PROCEDURE__STIMULUS_COUNT, oldStimulusCount, stimulusCount));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public LapseMode getLapseMode() {
		return lapseMode;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLapseMode(LapseMode newLapseMode) {
		LapseMode oldLapseMode = lapseMode;
		lapseMode = newLapseMode == null ? LAPSE_MODE_EDEFAULT : newLapseMode;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.PSI_PROCEDURE__LAPSE_MODE, oldLapseMode, lapseMode));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getLapseRate() {
		return lapseRate;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLapseRate(double newLapseRate) {
		double oldLapseRate = lapseRate;
		lapseRate = newLapseRate;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.PSI_PROCEDURE__LAPSE_RATE, oldLapseRate, lapseRate));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getLapseMinimum() {
		return lapseMinimum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLapseMinimum(double newLapseMinimum) {
		double oldLapseMinimum = lapseMinimum;
		lapseMinimum = newLapseMinimum;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.PSI_PROCEDURE__LAPSE_MINIMUM, oldLapseMinimum, lapseMinimum));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getLapseMaximum() {
		return lapseMaximum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLapseMaximum(double newLapseMaximum) {
		double oldLapseMaximum = lapseMaximum;
		lapseMaximum = newLapseMaximum;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.PSI_PROCEDURE__LAPSE_MAXIMUM, oldLapseMaximum, lapseMaximum));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getLapseCount() {
		return lapseCount;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLapseCount(int newLapseCount) {
		int oldLapseCount = lapseCount;
		lapseCount = newLapseCount;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.PSI_PROCEDURE__LAPSE_COUNT, oldLapseCount, lapseCount));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getGuessRate() {
		return guessRate;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setGuessRate(double newGuessRate) {
		double oldGuessRate = guessRate;
		guessRate = newGuessRate;
		boolean oldGuessRateESet = guessRateESet;
		guessRateESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.PSI_PROCEDURE__GUESS_RATE, oldGuessRate, guessRate, !oldGuessRateESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetGuessRate() {
		double oldGuessRate = guessRate;
		boolean oldGuessRateESet = guessRateESet;
		guessRate = GUESS_RATE_EDEFAULT;
		guessRateESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, LimenPackage.PSI_PROCEDURE__GUESS_RATE, oldGuessRate, GUESS_RATE_EDEFAULT, oldGuessRateESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetGuessRate() {
		return guessRateESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean validPsiGrids(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.ProcedureRules.validPsiGrids(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case LimenPackage.PSI_PROCEDURE__FAMILY:
				return getFamily();
			case LimenPackage.PSI_PROCEDURE__THRESHOLD_MINIMUM:
				return getThresholdMinimum();
			case LimenPackage.PSI_PROCEDURE__THRESHOLD_MAXIMUM:
				return getThresholdMaximum();
			case LimenPackage.PSI_PROCEDURE__THRESHOLD_COUNT:
				return getThresholdCount();
			case LimenPackage.PSI_PROCEDURE__SLOPE_MINIMUM:
				return getSlopeMinimum();
			case LimenPackage.PSI_PROCEDURE__SLOPE_MAXIMUM:
				return getSlopeMaximum();
			case LimenPackage.PSI_PROCEDURE__SLOPE_COUNT:
				return getSlopeCount();
			case LimenPackage.PSI_PROCEDURE__STIMULUS_MINIMUM:
				return getStimulusMinimum();
			case LimenPackage.PSI_PROCEDURE__STIMULUS_MAXIMUM:
				return getStimulusMaximum();
			case LimenPackage.PSI_PROCEDURE__STIMULUS_COUNT:
				return getStimulusCount();
			case LimenPackage.PSI_PROCEDURE__LAPSE_MODE:
				return getLapseMode();
			case LimenPackage.PSI_PROCEDURE__LAPSE_RATE:
				return getLapseRate();
			case LimenPackage.PSI_PROCEDURE__LAPSE_MINIMUM:
				return getLapseMinimum();
			case LimenPackage.PSI_PROCEDURE__LAPSE_MAXIMUM:
				return getLapseMaximum();
			case LimenPackage.PSI_PROCEDURE__LAPSE_COUNT:
				return getLapseCount();
			case LimenPackage.PSI_PROCEDURE__GUESS_RATE:
				return getGuessRate();
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
			case LimenPackage.PSI_PROCEDURE__FAMILY:
				setFamily((PsychometricFamily)newValue);
				return;
			case LimenPackage.PSI_PROCEDURE__THRESHOLD_MINIMUM:
				setThresholdMinimum((Double)newValue);
				return;
			case LimenPackage.PSI_PROCEDURE__THRESHOLD_MAXIMUM:
				setThresholdMaximum((Double)newValue);
				return;
			case LimenPackage.PSI_PROCEDURE__THRESHOLD_COUNT:
				setThresholdCount((Integer)newValue);
				return;
			case LimenPackage.PSI_PROCEDURE__SLOPE_MINIMUM:
				setSlopeMinimum((Double)newValue);
				return;
			case LimenPackage.PSI_PROCEDURE__SLOPE_MAXIMUM:
				setSlopeMaximum((Double)newValue);
				return;
			case LimenPackage.PSI_PROCEDURE__SLOPE_COUNT:
				setSlopeCount((Integer)newValue);
				return;
			case LimenPackage.PSI_PROCEDURE__STIMULUS_MINIMUM:
				setStimulusMinimum((Double)newValue);
				return;
			case LimenPackage.PSI_PROCEDURE__STIMULUS_MAXIMUM:
				setStimulusMaximum((Double)newValue);
				return;
			case LimenPackage.PSI_PROCEDURE__STIMULUS_COUNT:
				setStimulusCount((Integer)newValue);
				return;
			case LimenPackage.PSI_PROCEDURE__LAPSE_MODE:
				setLapseMode((LapseMode)newValue);
				return;
			case LimenPackage.PSI_PROCEDURE__LAPSE_RATE:
				setLapseRate((Double)newValue);
				return;
			case LimenPackage.PSI_PROCEDURE__LAPSE_MINIMUM:
				setLapseMinimum((Double)newValue);
				return;
			case LimenPackage.PSI_PROCEDURE__LAPSE_MAXIMUM:
				setLapseMaximum((Double)newValue);
				return;
			case LimenPackage.PSI_PROCEDURE__LAPSE_COUNT:
				setLapseCount((Integer)newValue);
				return;
			case LimenPackage.PSI_PROCEDURE__GUESS_RATE:
				setGuessRate((Double)newValue);
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
			case LimenPackage.PSI_PROCEDURE__FAMILY:
				setFamily(FAMILY_EDEFAULT);
				return;
			case LimenPackage.PSI_PROCEDURE__THRESHOLD_MINIMUM:
				setThresholdMinimum(THRESHOLD_MINIMUM_EDEFAULT);
				return;
			case LimenPackage.PSI_PROCEDURE__THRESHOLD_MAXIMUM:
				setThresholdMaximum(THRESHOLD_MAXIMUM_EDEFAULT);
				return;
			case LimenPackage.PSI_PROCEDURE__THRESHOLD_COUNT:
				setThresholdCount(THRESHOLD_COUNT_EDEFAULT);
				return;
			case LimenPackage.PSI_PROCEDURE__SLOPE_MINIMUM:
				setSlopeMinimum(SLOPE_MINIMUM_EDEFAULT);
				return;
			case LimenPackage.PSI_PROCEDURE__SLOPE_MAXIMUM:
				setSlopeMaximum(SLOPE_MAXIMUM_EDEFAULT);
				return;
			case LimenPackage.PSI_PROCEDURE__SLOPE_COUNT:
				setSlopeCount(SLOPE_COUNT_EDEFAULT);
				return;
			case LimenPackage.PSI_PROCEDURE__STIMULUS_MINIMUM:
				setStimulusMinimum(STIMULUS_MINIMUM_EDEFAULT);
				return;
			case LimenPackage.PSI_PROCEDURE__STIMULUS_MAXIMUM:
				setStimulusMaximum(STIMULUS_MAXIMUM_EDEFAULT);
				return;
			case LimenPackage.PSI_PROCEDURE__STIMULUS_COUNT:
				setStimulusCount(STIMULUS_COUNT_EDEFAULT);
				return;
			case LimenPackage.PSI_PROCEDURE__LAPSE_MODE:
				setLapseMode(LAPSE_MODE_EDEFAULT);
				return;
			case LimenPackage.PSI_PROCEDURE__LAPSE_RATE:
				setLapseRate(LAPSE_RATE_EDEFAULT);
				return;
			case LimenPackage.PSI_PROCEDURE__LAPSE_MINIMUM:
				setLapseMinimum(LAPSE_MINIMUM_EDEFAULT);
				return;
			case LimenPackage.PSI_PROCEDURE__LAPSE_MAXIMUM:
				setLapseMaximum(LAPSE_MAXIMUM_EDEFAULT);
				return;
			case LimenPackage.PSI_PROCEDURE__LAPSE_COUNT:
				setLapseCount(LAPSE_COUNT_EDEFAULT);
				return;
			case LimenPackage.PSI_PROCEDURE__GUESS_RATE:
				unsetGuessRate();
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
			case LimenPackage.PSI_PROCEDURE__FAMILY:
				return family != FAMILY_EDEFAULT;
			case LimenPackage.PSI_PROCEDURE__THRESHOLD_MINIMUM:
				return thresholdMinimum != THRESHOLD_MINIMUM_EDEFAULT;
			case LimenPackage.PSI_PROCEDURE__THRESHOLD_MAXIMUM:
				return thresholdMaximum != THRESHOLD_MAXIMUM_EDEFAULT;
			case LimenPackage.PSI_PROCEDURE__THRESHOLD_COUNT:
				return thresholdCount != THRESHOLD_COUNT_EDEFAULT;
			case LimenPackage.PSI_PROCEDURE__SLOPE_MINIMUM:
				return slopeMinimum != SLOPE_MINIMUM_EDEFAULT;
			case LimenPackage.PSI_PROCEDURE__SLOPE_MAXIMUM:
				return slopeMaximum != SLOPE_MAXIMUM_EDEFAULT;
			case LimenPackage.PSI_PROCEDURE__SLOPE_COUNT:
				return slopeCount != SLOPE_COUNT_EDEFAULT;
			case LimenPackage.PSI_PROCEDURE__STIMULUS_MINIMUM:
				return stimulusMinimum != STIMULUS_MINIMUM_EDEFAULT;
			case LimenPackage.PSI_PROCEDURE__STIMULUS_MAXIMUM:
				return stimulusMaximum != STIMULUS_MAXIMUM_EDEFAULT;
			case LimenPackage.PSI_PROCEDURE__STIMULUS_COUNT:
				return stimulusCount != STIMULUS_COUNT_EDEFAULT;
			case LimenPackage.PSI_PROCEDURE__LAPSE_MODE:
				return lapseMode != LAPSE_MODE_EDEFAULT;
			case LimenPackage.PSI_PROCEDURE__LAPSE_RATE:
				return lapseRate != LAPSE_RATE_EDEFAULT;
			case LimenPackage.PSI_PROCEDURE__LAPSE_MINIMUM:
				return lapseMinimum != LAPSE_MINIMUM_EDEFAULT;
			case LimenPackage.PSI_PROCEDURE__LAPSE_MAXIMUM:
				return lapseMaximum != LAPSE_MAXIMUM_EDEFAULT;
			case LimenPackage.PSI_PROCEDURE__LAPSE_COUNT:
				return lapseCount != LAPSE_COUNT_EDEFAULT;
			case LimenPackage.PSI_PROCEDURE__GUESS_RATE:
				return isSetGuessRate();
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
			case LimenPackage.PSI_PROCEDURE___VALID_PSI_GRIDS__DIAGNOSTICCHAIN_MAP:
				return validPsiGrids((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
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
		result.append(" (family: ");
		result.append(family);
		result.append(", thresholdMinimum: ");
		result.append(thresholdMinimum);
		result.append(", thresholdMaximum: ");
		result.append(thresholdMaximum);
		result.append(", thresholdCount: ");
		result.append(thresholdCount);
		result.append(", slopeMinimum: ");
		result.append(slopeMinimum);
		result.append(", slopeMaximum: ");
		result.append(slopeMaximum);
		result.append(", slopeCount: ");
		result.append(slopeCount);
		result.append(", stimulusMinimum: ");
		result.append(stimulusMinimum);
		result.append(", stimulusMaximum: ");
		result.append(stimulusMaximum);
		result.append(", stimulusCount: ");
		result.append(stimulusCount);
		result.append(", lapseMode: ");
		result.append(lapseMode);
		result.append(", lapseRate: ");
		result.append(lapseRate);
		result.append(", lapseMinimum: ");
		result.append(lapseMinimum);
		result.append(", lapseMaximum: ");
		result.append(lapseMaximum);
		result.append(", lapseCount: ");
		result.append(lapseCount);
		result.append(", guessRate: ");
		if (guessRateESet) result.append(guessRate); else result.append("<unset>");
		result.append(')');
		return result.toString();
	}

} //PsiProcedureImpl
