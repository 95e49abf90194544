/**
 */
package limen.model.impl;

import java.lang.reflect.InvocationTargetException;

import java.util.Collection;
import java.util.Map;

import limen.model.Ear;
import limen.model.Level;
import limen.model.LimenPackage;
import limen.model.MaskerNoise;
import limen.model.SettingsGroup;
import limen.model.Stimulus;
import limen.model.StimulusKind;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.NotificationChain;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.EObjectImpl;

import org.eclipse.emf.ecore.util.EObjectContainmentEList;
import org.eclipse.emf.ecore.util.InternalEList;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Stimulus</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.StimulusImpl#getKind <em>Kind</em>}</li>
 *   <li>{@link limen.model.impl.StimulusImpl#getStandardFrequencyHz <em>Standard Frequency Hz</em>}</li>
 *   <li>{@link limen.model.impl.StimulusImpl#getStandardLevel <em>Standard Level</em>}</li>
 *   <li>{@link limen.model.impl.StimulusImpl#getRampDurationSeconds <em>Ramp Duration Seconds</em>}</li>
 *   <li>{@link limen.model.impl.StimulusImpl#getEar <em>Ear</em>}</li>
 *   <li>{@link limen.model.impl.StimulusImpl#getMasker <em>Masker</em>}</li>
 *   <li>{@link limen.model.impl.StimulusImpl#getContributions <em>Contributions</em>}</li>
 * </ul>
 *
 * @generated
 */
public class StimulusImpl extends EObjectImpl implements Stimulus {
	/**
	 * The default value of the '{@link #getKind() <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKind()
	 * @generated
	 * @ordered
	 */
	protected static final StimulusKind KIND_EDEFAULT = StimulusKind.FREQUENCY_DISCRIMINATION;

	/**
	 * The cached value of the '{@link #getKind() <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKind()
	 * @generated
	 * @ordered
	 */
	protected StimulusKind kind = KIND_EDEFAULT;

	/**
	 * The default value of the '{@link #getStandardFrequencyHz() <em>Standard Frequency Hz</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStandardFrequencyHz()
	 * @generated
	 * @ordered
	 */
	protected static final double STANDARD_FREQUENCY_HZ_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getStandardFrequencyHz() <em>Standard Frequency Hz</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStandardFrequencyHz()
	 * @generated
	 * @ordered
	 */
	protected double standardFrequencyHz = STANDARD_FREQUENCY_HZ_EDEFAULT;

	/**
	 * The cached value of the '{@link #getStandardLevel() <em>Standard Level</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStandardLevel()
	 * @generated
	 * @ordered
	 */
	protected Level standardLevel;

	/**
	 * The default value of the '{@link #getRampDurationSeconds() <em>Ramp Duration Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRampDurationSeconds()
	 * @generated
	 * @ordered
	 */
	protected static final double RAMP_DURATION_SECONDS_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getRampDurationSeconds() <em>Ramp Duration Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRampDurationSeconds()
	 * @generated
	 * @ordered
	 */
	protected double rampDurationSeconds = RAMP_DURATION_SECONDS_EDEFAULT;

	/**
	 * The default value of the '{@link #getEar() <em>Ear</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEar()
	 * @generated
	 * @ordered
	 */
	protected static final Ear EAR_EDEFAULT = Ear.BOTH;

	/**
	 * The cached value of the '{@link #getEar() <em>Ear</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEar()
	 * @generated
	 * @ordered
	 */
	protected Ear ear = EAR_EDEFAULT;

	/**
	 * The cached value of the '{@link #getMasker() <em>Masker</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMasker()
	 * @generated
	 * @ordered
	 */
	protected MaskerNoise masker;

	/**
	 * The cached value of the '{@link #getContributions() <em>Contributions</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getContributions()
	 * @generated
	 * @ordered
	 */
	protected EList<SettingsGroup> contributions;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected StimulusImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.STIMULUS;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public StimulusKind getKind() {
		return kind;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setKind(StimulusKind newKind) {
		StimulusKind oldKind = kind;
		kind = newKind == null ? KIND_EDEFAULT : newKind;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.STIMULUS__KIND, oldKind, kind));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getStandardFrequencyHz() {
		return standardFrequencyHz;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setStandardFrequencyHz(double newStandardFrequencyHz) {
		double oldStandardFrequencyHz = standardFrequencyHz;
		standardFrequencyHz = newStandardFrequencyHz;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.STIMULUS__STANDARD_FREQUENCY_HZ, oldStandardFrequencyHz, standardFrequencyHz));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Level getStandardLevel() {
		return standardLevel;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetStandardLevel(Level newStandardLevel, NotificationChain msgs) {
		Level oldStandardLevel = standardLevel;
		standardLevel = newStandardLevel;
		if (eNotificationRequired()) {
			ENotificationImpl notification = new ENotificationImpl(this, Notification.SET, LimenPackage.STIMULUS__STANDARD_LEVEL, oldStandardLevel, newStandardLevel);
			if (msgs == null) msgs = notification; else msgs.add(notification);
		}
		return msgs;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setStandardLevel(Level newStandardLevel) {
		if (newStandardLevel != standardLevel) {
			NotificationChain msgs = null;
			if (standardLevel != null)
				msgs = ((InternalEObject)standardLevel).eInverseRemove(this, EOPPOSITE_FEATURE_BASE - LimenPackage.STIMULUS__STANDARD_LEVEL, null, msgs);
			if (newStandardLevel != null)
				msgs = ((InternalEObject)newStandardLevel).eInverseAdd(this, EOPPOSITE_FEATURE_BASE - LimenPackage.STIMULUS__STANDARD_LEVEL, null, msgs);
			msgs = basicSetStandardLevel(newStandardLevel, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.STIMULUS__STANDARD_LEVEL, newStandardLevel, newStandardLevel));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getRampDurationSeconds() {
		return rampDurationSeconds;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setRampDurationSeconds(double newRampDurationSeconds) {
		double oldRampDurationSeconds = rampDurationSeconds;
		rampDurationSeconds = newRampDurationSeconds;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.STIMULUS__RAMP_DURATION_SECONDS, oldRampDurationSeconds, rampDurationSeconds));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Ear getEar() {
		return ear;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setEar(Ear newEar) {
		Ear oldEar = ear;
		ear = newEar == null ? EAR_EDEFAULT : newEar;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.STIMULUS__EAR, oldEar, ear));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public MaskerNoise getMasker() {
		return masker;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetMasker(MaskerNoise newMasker, NotificationChain msgs) {
		MaskerNoise oldMasker = masker;
		masker = newMasker;
		if (eNotificationRequired()) {
			ENotificationImpl notification = new ENotificationImpl(this, Notification.SET, LimenPackage.STIMULUS__MASKER, oldMasker, newMasker);
			if (msgs == null) msgs = notification; else msgs.add(notification);
		}
		return msgs;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMasker(MaskerNoise newMasker) {
		if (newMasker != masker) {
			NotificationChain msgs = null;
			if (masker != null)
				msgs = ((InternalEObject)masker).eInverseRemove(this, EOPPOSITE_FEATURE_BASE - LimenPackage.STIMULUS__MASKER, null, msgs);
			if (newMasker != null)
				msgs = ((InternalEObject)newMasker).eInverseAdd(this, EOPPOSITE_FEATURE_BASE - LimenPackage.STIMULUS__MASKER, null, msgs);
			msgs = basicSetMasker(newMasker, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.STIMULUS__MASKER, newMasker, newMasker));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<SettingsGroup> getContributions() {
		if (contributions == null) {
			contributions = new EObjectContainmentEList<SettingsGroup>(SettingsGroup.class, this, LimenPackage.STIMULUS__CONTRIBUTIONS);
		}
		return contributions;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean validTone(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.StimulusRules.validTone(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean validStandardLevel(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.StimulusRules.validStandardLevel(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean validMasker(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.StimulusRules.validMasker(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case LimenPackage.STIMULUS__STANDARD_LEVEL:
				return basicSetStandardLevel(null, msgs);
			case LimenPackage.STIMULUS__MASKER:
				return basicSetMasker(null, msgs);
			case LimenPackage.STIMULUS__CONTRIBUTIONS:
				return ((InternalEList<?>)getContributions()).basicRemove(otherEnd, msgs);
		}
		return super.eInverseRemove(otherEnd, featureID, msgs);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case LimenPackage.STIMULUS__KIND:
				return getKind();
			case LimenPackage.STIMULUS__STANDARD_FREQUENCY_HZ:
				return getStandardFrequencyHz();
			case LimenPackage.STIMULUS__STANDARD_LEVEL:
				return getStandardLevel();
			case LimenPackage.STIMULUS__RAMP_DURATION_SECONDS:
				return getRampDurationSeconds();
			case LimenPackage.STIMULUS__EAR:
				return getEar();
			case LimenPackage.STIMULUS__MASKER:
				return getMasker();
			case LimenPackage.STIMULUS__CONTRIBUTIONS:
				return getContributions();
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
			case LimenPackage.STIMULUS__KIND:
				setKind((StimulusKind)newValue);
				return;
			case LimenPackage.STIMULUS__STANDARD_FREQUENCY_HZ:
				setStandardFrequencyHz((Double)newValue);
				return;
			case LimenPackage.STIMULUS__STANDARD_LEVEL:
				setStandardLevel((Level)newValue);
				return;
			case LimenPackage.STIMULUS__RAMP_DURATION_SECONDS:
				setRampDurationSeconds((Double)newValue);
				return;
			case LimenPackage.STIMULUS__EAR:
				setEar((Ear)newValue);
				return;
			case LimenPackage.STIMULUS__MASKER:
				setMasker((MaskerNoise)newValue);
				return;
			case LimenPackage.STIMULUS__CONTRIBUTIONS:
				getContributions().clear();
				getContributions().addAll((Collection<? extends SettingsGroup>)newValue);
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
			case LimenPackage.STIMULUS__KIND:
				setKind(KIND_EDEFAULT);
				return;
			case LimenPackage.STIMULUS__STANDARD_FREQUENCY_HZ:
				setStandardFrequencyHz(STANDARD_FREQUENCY_HZ_EDEFAULT);
				return;
			case LimenPackage.STIMULUS__STANDARD_LEVEL:
				setStandardLevel((Level)null);
				return;
			case LimenPackage.STIMULUS__RAMP_DURATION_SECONDS:
				setRampDurationSeconds(RAMP_DURATION_SECONDS_EDEFAULT);
				return;
			case LimenPackage.STIMULUS__EAR:
				setEar(EAR_EDEFAULT);
				return;
			case LimenPackage.STIMULUS__MASKER:
				setMasker((MaskerNoise)null);
				return;
			case LimenPackage.STIMULUS__CONTRIBUTIONS:
				getContributions().clear();
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
			case LimenPackage.STIMULUS__KIND:
				return kind != KIND_EDEFAULT;
			case LimenPackage.STIMULUS__STANDARD_FREQUENCY_HZ:
				return standardFrequencyHz != STANDARD_FREQUENCY_HZ_EDEFAULT;
			case LimenPackage.STIMULUS__STANDARD_LEVEL:
				return standardLevel != null;
			case LimenPackage.STIMULUS__RAMP_DURATION_SECONDS:
				return rampDurationSeconds != RAMP_DURATION_SECONDS_EDEFAULT;
			case LimenPackage.STIMULUS__EAR:
				return ear != EAR_EDEFAULT;
			case LimenPackage.STIMULUS__MASKER:
				return masker != null;
			case LimenPackage.STIMULUS__CONTRIBUTIONS:
				return contributions != null && !contributions.isEmpty();
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
			case LimenPackage.STIMULUS___VALID_TONE__DIAGNOSTICCHAIN_MAP:
				return validTone((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
			case LimenPackage.STIMULUS___VALID_STANDARD_LEVEL__DIAGNOSTICCHAIN_MAP:
				return validStandardLevel((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
			case LimenPackage.STIMULUS___VALID_MASKER__DIAGNOSTICCHAIN_MAP:
				return validMasker((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
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
		result.append(" (kind: ");
		result.append(kind);
		result.append(", standardFrequencyHz: ");
		result.append(standardFrequencyHz);
		result.append(", rampDurationSeconds: ");
		result.append(rampDurationSeconds);
		result.append(", ear: ");
		result.append(ear);
		result.append(')');
		return result.toString();
	}

} //StimulusImpl
