/**
 */
package limen.model.impl;

import limen.model.ExposureEstimate;
import limen.model.LimenPackage;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.EObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Exposure Estimate</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.ExposureEstimateImpl#getPeakLevelDbSpl <em>Peak Level Db Spl</em>}</li>
 *   <li>{@link limen.model.impl.ExposureEstimateImpl#getEquivalentLevelDbSpl <em>Equivalent Level Db Spl</em>}</li>
 *   <li>{@link limen.model.impl.ExposureEstimateImpl#getSoundOnSeconds <em>Sound On Seconds</em>}</li>
 *   <li>{@link limen.model.impl.ExposureEstimateImpl#getNioshDosePercent <em>Niosh Dose Percent</em>}</li>
 *   <li>{@link limen.model.impl.ExposureEstimateImpl#getOshaDosePercent <em>Osha Dose Percent</em>}</li>
 * </ul>
 *
 * @generated
 */
public class ExposureEstimateImpl extends EObjectImpl implements ExposureEstimate {
	/**
	 * The default value of the '{@link #getPeakLevelDbSpl() <em>Peak Level Db Spl</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPeakLevelDbSpl()
	 * @generated
	 * @ordered
	 */
	protected static final double PEAK_LEVEL_DB_SPL_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getPeakLevelDbSpl() <em>Peak Level Db Spl</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPeakLevelDbSpl()
	 * @generated
	 * @ordered
	 */
	protected double peakLevelDbSpl = PEAK_LEVEL_DB_SPL_EDEFAULT;

	/**
	 * The default value of the '{@link #getEquivalentLevelDbSpl() <em>Equivalent Level Db Spl</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEquivalentLevelDbSpl()
	 * @generated
	 * @ordered
	 */
	protected static final double EQUIVALENT_LEVEL_DB_SPL_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getEquivalentLevelDbSpl() <em>Equivalent Level Db Spl</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEquivalentLevelDbSpl()
	 * @generated
	 * @ordered
	 */
	protected double equivalentLevelDbSpl = EQUIVALENT_LEVEL_DB_SPL_EDEFAULT;

	/**
	 * The default value of the '{@link #getSoundOnSeconds() <em>Sound On Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSoundOnSeconds()
	 * @generated
	 * @ordered
	 */
	protected static final double SOUND_ON_SECONDS_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getSoundOnSeconds() <em>Sound On Seconds</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSoundOnSeconds()
	 * @generated
	 * @ordered
	 */
	protected double soundOnSeconds = SOUND_ON_SECONDS_EDEFAULT;

	/**
	 * The default value of the '{@link #getNioshDosePercent() <em>Niosh Dose Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNioshDosePercent()
	 * @generated
	 * @ordered
	 */
	protected static final double NIOSH_DOSE_PERCENT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getNioshDosePercent() <em>Niosh Dose Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNioshDosePercent()
	 * @generated
	 * @ordered
	 */
	protected double nioshDosePercent = NIOSH_DOSE_PERCENT_EDEFAULT;

	/**
	 * The default value of the '{@link #getOshaDosePercent() <em>Osha Dose Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOshaDosePercent()
	 * @generated
	 * @ordered
	 */
	protected static final double OSHA_DOSE_PERCENT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getOshaDosePercent() <em>Osha Dose Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOshaDosePercent()
	 * @generated
	 * @ordered
	 */
	protected double oshaDosePercent = OSHA_DOSE_PERCENT_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected ExposureEstimateImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.EXPOSURE_ESTIMATE;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getPeakLevelDbSpl() {
		return peakLevelDbSpl;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPeakLevelDbSpl(double newPeakLevelDbSpl) {
		double oldPeakLevelDbSpl = peakLevelDbSpl;
		peakLevelDbSpl = newPeakLevelDbSpl;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.EXPOSURE_ESTIMATE__PEAK_LEVEL_DB_SPL, oldPeakLevelDbSpl, peakLevelDbSpl));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getEquivalentLevelDbSpl() {
		return equivalentLevelDbSpl;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setEquivalentLevelDbSpl(double newEquivalentLevelDbSpl) {
		double oldEquivalentLevelDbSpl = equivalentLevelDbSpl;
		equivalentLevelDbSpl = newEquivalentLevelDbSpl;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.EXPOSURE_ESTIMATE__EQUIVALENT_LEVEL_DB_SPL, oldEquivalentLevelDbSpl, equivalentLevelDbSpl));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getSoundOnSeconds() {
		return soundOnSeconds;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSoundOnSeconds(double newSoundOnSeconds) {
		double oldSoundOnSeconds = soundOnSeconds;
		soundOnSeconds = newSoundOnSeconds;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.EXPOSURE_ESTIMATE__SOUND_ON_SECONDS, oldSoundOnSeconds, soundOnSeconds));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getNioshDosePercent() {
		return nioshDosePercent;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setNioshDosePercent(double newNioshDosePercent) {
		double oldNioshDosePercent = nioshDosePercent;
		nioshDosePercent = newNioshDosePercent;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.EXPOSURE_ESTIMATE__NIOSH_DOSE_PERCENT, oldNioshDosePercent, nioshDosePercent));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getOshaDosePercent() {
		return oshaDosePercent;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setOshaDosePercent(double newOshaDosePercent) {
		double oldOshaDosePercent = oshaDosePercent;
		oshaDosePercent = newOshaDosePercent;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.EXPOSURE_ESTIMATE__OSHA_DOSE_PERCENT, oldOshaDosePercent, oshaDosePercent));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case LimenPackage.EXPOSURE_ESTIMATE__PEAK_LEVEL_DB_SPL:
				return getPeakLevelDbSpl();
			case LimenPackage.EXPOSURE_ESTIMATE__EQUIVALENT_LEVEL_DB_SPL:
				return getEquivalentLevelDbSpl();
			case LimenPackage.EXPOSURE_ESTIMATE__SOUND_ON_SECONDS:
				return getSoundOnSeconds();
			case LimenPackage.EXPOSURE_ESTIMATE__NIOSH_DOSE_PERCENT:
				return getNioshDosePercent();
			case LimenPackage.EXPOSURE_ESTIMATE__OSHA_DOSE_PERCENT:
				return getOshaDosePercent();
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
			case LimenPackage.EXPOSURE_ESTIMATE__PEAK_LEVEL_DB_SPL:
				setPeakLevelDbSpl((Double)newValue);
				return;
			case LimenPackage.EXPOSURE_ESTIMATE__EQUIVALENT_LEVEL_DB_SPL:
				setEquivalentLevelDbSpl((Double)newValue);
				return;
			case LimenPackage.EXPOSURE_ESTIMATE__SOUND_ON_SECONDS:
				setSoundOnSeconds((Double)newValue);
				return;
			case LimenPackage.EXPOSURE_ESTIMATE__NIOSH_DOSE_PERCENT:
				setNioshDosePercent((Double)newValue);
				return;
			case LimenPackage.EXPOSURE_ESTIMATE__OSHA_DOSE_PERCENT:
				setOshaDosePercent((Double)newValue);
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
			case LimenPackage.EXPOSURE_ESTIMATE__PEAK_LEVEL_DB_SPL:
				setPeakLevelDbSpl(PEAK_LEVEL_DB_SPL_EDEFAULT);
				return;
			case LimenPackage.EXPOSURE_ESTIMATE__EQUIVALENT_LEVEL_DB_SPL:
				setEquivalentLevelDbSpl(EQUIVALENT_LEVEL_DB_SPL_EDEFAULT);
				return;
			case LimenPackage.EXPOSURE_ESTIMATE__SOUND_ON_SECONDS:
				setSoundOnSeconds(SOUND_ON_SECONDS_EDEFAULT);
				return;
			case LimenPackage.EXPOSURE_ESTIMATE__NIOSH_DOSE_PERCENT:
				setNioshDosePercent(NIOSH_DOSE_PERCENT_EDEFAULT);
				return;
			case LimenPackage.EXPOSURE_ESTIMATE__OSHA_DOSE_PERCENT:
				setOshaDosePercent(OSHA_DOSE_PERCENT_EDEFAULT);
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
			case LimenPackage.EXPOSURE_ESTIMATE__PEAK_LEVEL_DB_SPL:
				return peakLevelDbSpl != PEAK_LEVEL_DB_SPL_EDEFAULT;
			case LimenPackage.EXPOSURE_ESTIMATE__EQUIVALENT_LEVEL_DB_SPL:
				return equivalentLevelDbSpl != EQUIVALENT_LEVEL_DB_SPL_EDEFAULT;
			case LimenPackage.EXPOSURE_ESTIMATE__SOUND_ON_SECONDS:
				return soundOnSeconds != SOUND_ON_SECONDS_EDEFAULT;
			case LimenPackage.EXPOSURE_ESTIMATE__NIOSH_DOSE_PERCENT:
				return nioshDosePercent != NIOSH_DOSE_PERCENT_EDEFAULT;
			case LimenPackage.EXPOSURE_ESTIMATE__OSHA_DOSE_PERCENT:
				return oshaDosePercent != OSHA_DOSE_PERCENT_EDEFAULT;
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
		result.append(" (peakLevelDbSpl: ");
		result.append(peakLevelDbSpl);
		result.append(", equivalentLevelDbSpl: ");
		result.append(equivalentLevelDbSpl);
		result.append(", soundOnSeconds: ");
		result.append(soundOnSeconds);
		result.append(", nioshDosePercent: ");
		result.append(nioshDosePercent);
		result.append(", oshaDosePercent: ");
		result.append(oshaDosePercent);
		result.append(')');
		return result.toString();
	}

} //ExposureEstimateImpl
