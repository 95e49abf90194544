/**
 */
package limen.model.impl;

import limen.model.Level;
import limen.model.LimenPackage;
import limen.model.MaskerNoise;
import limen.model.NoiseSpectrum;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.NotificationChain;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.EObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Masker Noise</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.MaskerNoiseImpl#getSpectrum <em>Spectrum</em>}</li>
 *   <li>{@link limen.model.impl.MaskerNoiseImpl#getLowCutoffHz <em>Low Cutoff Hz</em>}</li>
 *   <li>{@link limen.model.impl.MaskerNoiseImpl#getHighCutoffHz <em>High Cutoff Hz</em>}</li>
 *   <li>{@link limen.model.impl.MaskerNoiseImpl#getLevel <em>Level</em>}</li>
 *   <li>{@link limen.model.impl.MaskerNoiseImpl#isContinuous <em>Continuous</em>}</li>
 * </ul>
 *
 * @generated
 */
public class MaskerNoiseImpl extends EObjectImpl implements MaskerNoise {
	/**
	 * The default value of the '{@link #getSpectrum() <em>Spectrum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSpectrum()
	 * @generated
	 * @ordered
	 */
	protected static final NoiseSpectrum SPECTRUM_EDEFAULT = NoiseSpectrum.WHITE;

	/**
	 * The cached value of the '{@link #getSpectrum() <em>Spectrum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSpectrum()
	 * @generated
	 * @ordered
	 */
	protected NoiseSpectrum spectrum = SPECTRUM_EDEFAULT;

	/**
	 * The default value of the '{@link #getLowCutoffHz() <em>Low Cutoff Hz</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLowCutoffHz()
	 * @generated
	 * @ordered
	 */
	protected static final double LOW_CUTOFF_HZ_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getLowCutoffHz() <em>Low Cutoff Hz</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLowCutoffHz()
	 * @generated
	 * @ordered
	 */
	protected double lowCutoffHz = LOW_CUTOFF_HZ_EDEFAULT;

	/**
	 * The default value of the '{@link #getHighCutoffHz() <em>High Cutoff Hz</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getHighCutoffHz()
	 * @generated
	 * @ordered
	 */
	protected static final double HIGH_CUTOFF_HZ_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getHighCutoffHz() <em>High Cutoff Hz</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getHighCutoffHz()
	 * @generated
	 * @ordered
	 */
	protected double highCutoffHz = HIGH_CUTOFF_HZ_EDEFAULT;

	/**
	 * The cached value of the '{@link #getLevel() <em>Level</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLevel()
	 * @generated
	 * @ordered
	 */
	protected Level level;

	/**
	 * The default value of the '{@link #isContinuous() <em>Continuous</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isContinuous()
	 * @generated
	 * @ordered
	 */
	protected static final boolean CONTINUOUS_EDEFAULT = false;

	/**
	 * The cached value of the '{@link #isContinuous() <em>Continuous</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isContinuous()
	 * @generated
	 * @ordered
	 */
	protected boolean continuous = CONTINUOUS_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected MaskerNoiseImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.MASKER_NOISE;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NoiseSpectrum getSpectrum() {
		return spectrum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSpectrum(NoiseSpectrum newSpectrum) {
		NoiseSpectrum oldSpectrum = spectrum;
		spectrum = newSpectrum == null ? SPECTRUM_EDEFAULT : newSpectrum;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.MASKER_NOISE__SPECTRUM, oldSpectrum, spectrum));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getLowCutoffHz() {
		return lowCutoffHz;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLowCutoffHz(double newLowCutoffHz) {
		double oldLowCutoffHz = lowCutoffHz;
		lowCutoffHz = newLowCutoffHz;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.MASKER_NOISE__LOW_CUTOFF_HZ, oldLowCutoffHz, lowCutoffHz));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getHighCutoffHz() {
		return highCutoffHz;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setHighCutoffHz(double newHighCutoffHz) {
		double oldHighCutoffHz = highCutoffHz;
		highCutoffHz = newHighCutoffHz;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.MASKER_NOISE__HIGH_CUTOFF_HZ, oldHighCutoffHz, highCutoffHz));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Level getLevel() {
		return level;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetLevel(Level newLevel, NotificationChain msgs) {
		Level oldLevel = level;
		level = newLevel;
		if (eNotificationRequired()) {
			ENotificationImpl notification = new ENotificationImpl(this, Notification.SET, LimenPackage.MASKER_NOISE__LEVEL, oldLevel, newLevel);
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
	public void setLevel(Level newLevel) {
		if (newLevel != level) {
			NotificationChain msgs = null;
			if (level != null)
				msgs = ((InternalEObject)level).eInverseRemove(this, EOPPOSITE_FEATURE_BASE - LimenPackage.MASKER_NOISE__LEVEL, null, msgs);
			if (newLevel != null)
				msgs = ((InternalEObject)newLevel).eInverseAdd(this, EOPPOSITE_FEATURE_BASE - LimenPackage.MASKER_NOISE__LEVEL, null, msgs);
			msgs = basicSetLevel(newLevel, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.MASKER_NOISE__LEVEL, newLevel, newLevel));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isContinuous() {
		return continuous;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setContinuous(boolean newContinuous) {
		boolean oldContinuous = continuous;
		continuous = newContinuous;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.MASKER_NOISE__CONTINUOUS, oldContinuous, continuous));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case LimenPackage.MASKER_NOISE__LEVEL:
				return basicSetLevel(null, msgs);
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
			case LimenPackage.MASKER_NOISE__SPECTRUM:
				return getSpectrum();
			case LimenPackage.MASKER_NOISE__LOW_CUTOFF_HZ:
				return getLowCutoffHz();
			case LimenPackage.MASKER_NOISE__HIGH_CUTOFF_HZ:
				return getHighCutoffHz();
			case LimenPackage.MASKER_NOISE__LEVEL:
				return getLevel();
			case LimenPackage.MASKER_NOISE__CONTINUOUS:
				return isContinuous();
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
			case LimenPackage.MASKER_NOISE__SPECTRUM:
				setSpectrum((NoiseSpectrum)newValue);
				return;
			case LimenPackage.MASKER_NOISE__LOW_CUTOFF_HZ:
				setLowCutoffHz((Double)newValue);
				return;
			case LimenPackage.MASKER_NOISE__HIGH_CUTOFF_HZ:
				setHighCutoffHz((Double)newValue);
				return;
			case LimenPackage.MASKER_NOISE__LEVEL:
				setLevel((Level)newValue);
				return;
			case LimenPackage.MASKER_NOISE__CONTINUOUS:
				setContinuous((Boolean)newValue);
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
			case LimenPackage.MASKER_NOISE__SPECTRUM:
				setSpectrum(SPECTRUM_EDEFAULT);
				return;
			case LimenPackage.MASKER_NOISE__LOW_CUTOFF_HZ:
				setLowCutoffHz(LOW_CUTOFF_HZ_EDEFAULT);
				return;
			case LimenPackage.MASKER_NOISE__HIGH_CUTOFF_HZ:
				setHighCutoffHz(HIGH_CUTOFF_HZ_EDEFAULT);
				return;
			case LimenPackage.MASKER_NOISE__LEVEL:
				setLevel((Level)null);
				return;
			case LimenPackage.MASKER_NOISE__CONTINUOUS:
				setContinuous(CONTINUOUS_EDEFAULT);
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
			case LimenPackage.MASKER_NOISE__SPECTRUM:
				return spectrum != SPECTRUM_EDEFAULT;
			case LimenPackage.MASKER_NOISE__LOW_CUTOFF_HZ:
				return lowCutoffHz != LOW_CUTOFF_HZ_EDEFAULT;
			case LimenPackage.MASKER_NOISE__HIGH_CUTOFF_HZ:
				return highCutoffHz != HIGH_CUTOFF_HZ_EDEFAULT;
			case LimenPackage.MASKER_NOISE__LEVEL:
				return level != null;
			case LimenPackage.MASKER_NOISE__CONTINUOUS:
				return continuous != CONTINUOUS_EDEFAULT;
		}
		return super.eIsSet(featureID);
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
		result.append(" (spectrum: ");
		result.append(spectrum);
		result.append(", lowCutoffHz: ");
		result.append(lowCutoffHz);
		result.append(", highCutoffHz: ");
		result.append(highCutoffHz);
		result.append(", continuous: ");
		result.append(continuous);
		result.append(')');
		return result.toString();
	}

} //MaskerNoiseImpl
