/**
 */
package limen.model.impl;

import java.lang.reflect.InvocationTargetException;

import java.time.Instant;

import java.util.Collection;
import java.util.Map;

import limen.model.Battery;
import limen.model.Calibration;
import limen.model.ExposureEstimate;
import limen.model.LimenPackage;
import limen.model.SessionHeader;
import limen.model.SessionStatus;
import limen.model.Step;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.NotificationChain;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.eclipse.emf.ecore.util.EObjectResolvingEList;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Session Header</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.SessionHeaderImpl#getParticipant <em>Participant</em>}</li>
 *   <li>{@link limen.model.impl.SessionHeaderImpl#getBattery <em>Battery</em>}</li>
 *   <li>{@link limen.model.impl.SessionHeaderImpl#getCalibration <em>Calibration</em>}</li>
 *   <li>{@link limen.model.impl.SessionHeaderImpl#getDevice <em>Device</em>}</li>
 *   <li>{@link limen.model.impl.SessionHeaderImpl#getRandomSeed <em>Random Seed</em>}</li>
 *   <li>{@link limen.model.impl.SessionHeaderImpl#getSoftwareVersion <em>Software Version</em>}</li>
 *   <li>{@link limen.model.impl.SessionHeaderImpl#getStartTime <em>Start Time</em>}</li>
 *   <li>{@link limen.model.impl.SessionHeaderImpl#getEndTime <em>End Time</em>}</li>
 *   <li>{@link limen.model.impl.SessionHeaderImpl#getStatus <em>Status</em>}</li>
 *   <li>{@link limen.model.impl.SessionHeaderImpl#getLatinSquareRow <em>Latin Square Row</em>}</li>
 *   <li>{@link limen.model.impl.SessionHeaderImpl#getStepOrder <em>Step Order</em>}</li>
 *   <li>{@link limen.model.impl.SessionHeaderImpl#getExposure <em>Exposure</em>}</li>
 * </ul>
 *
 * @generated
 */
public class SessionHeaderImpl extends LimenDocumentImpl implements SessionHeader {
	/**
	 * The default value of the '{@link #getParticipant() <em>Participant</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getParticipant()
	 * @generated
	 * @ordered
	 */
	protected static final String PARTICIPANT_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getParticipant() <em>Participant</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getParticipant()
	 * @generated
	 * @ordered
	 */
	protected String participant = PARTICIPANT_EDEFAULT;

	/**
	 * The cached value of the '{@link #getBattery() <em>Battery</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBattery()
	 * @generated
	 * @ordered
	 */
	protected Battery battery;

	/**
	 * The cached value of the '{@link #getCalibration() <em>Calibration</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCalibration()
	 * @generated
	 * @ordered
	 */
	protected Calibration calibration;

	/**
	 * The default value of the '{@link #getDevice() <em>Device</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDevice()
	 * @generated
	 * @ordered
	 */
	protected static final String DEVICE_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getDevice() <em>Device</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDevice()
	 * @generated
	 * @ordered
	 */
	protected String device = DEVICE_EDEFAULT;

	/**
	 * The default value of the '{@link #getRandomSeed() <em>Random Seed</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRandomSeed()
	 * @generated
	 * @ordered
	 */
	protected static final long RANDOM_SEED_EDEFAULT = 0L;

	/**
	 * The cached value of the '{@link #getRandomSeed() <em>Random Seed</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRandomSeed()
	 * @generated
	 * @ordered
	 */
	protected long randomSeed = RANDOM_SEED_EDEFAULT;

	/**
	 * The default value of the '{@link #getSoftwareVersion() <em>Software Version</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSoftwareVersion()
	 * @generated
	 * @ordered
	 */
	protected static final String SOFTWARE_VERSION_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getSoftwareVersion() <em>Software Version</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSoftwareVersion()
	 * @generated
	 * @ordered
	 */
	protected String softwareVersion = SOFTWARE_VERSION_EDEFAULT;

	/**
	 * The default value of the '{@link #getStartTime() <em>Start Time</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStartTime()
	 * @generated
	 * @ordered
	 */
	protected static final Instant START_TIME_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getStartTime() <em>Start Time</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStartTime()
	 * @generated
	 * @ordered
	 */
	protected Instant startTime = START_TIME_EDEFAULT;

	/**
	 * The default value of the '{@link #getEndTime() <em>End Time</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEndTime()
	 * @generated
	 * @ordered
	 */
	protected static final Instant END_TIME_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getEndTime() <em>End Time</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEndTime()
	 * @generated
	 * @ordered
	 */
	protected Instant endTime = END_TIME_EDEFAULT;

	/**
	 * The default value of the '{@link #getStatus() <em>Status</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStatus()
	 * @generated
	 * @ordered
	 */
	protected static final SessionStatus STATUS_EDEFAULT = SessionStatus.RUNNING;

	/**
	 * The cached value of the '{@link #getStatus() <em>Status</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStatus()
	 * @generated
	 * @ordered
	 */
	protected SessionStatus status = STATUS_EDEFAULT;

	/**
	 * The default value of the '{@link #getLatinSquareRow() <em>Latin Square Row</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLatinSquareRow()
	 * @generated
	 * @ordered
	 */
	protected static final int LATIN_SQUARE_ROW_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getLatinSquareRow() <em>Latin Square Row</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLatinSquareRow()
	 * @generated
	 * @ordered
	 */
	protected int latinSquareRow = LATIN_SQUARE_ROW_EDEFAULT;

	/**
	 * This is true if the Latin Square Row attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean latinSquareRowESet;

	/**
	 * The cached value of the '{@link #getStepOrder() <em>Step Order</em>}' reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStepOrder()
	 * @generated
	 * @ordered
	 */
	protected EList<Step> stepOrder;

	/**
	 * The cached value of the '{@link #getExposure() <em>Exposure</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getExposure()
	 * @generated
	 * @ordered
	 */
	protected ExposureEstimate exposure;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected SessionHeaderImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.SESSION_HEADER;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getParticipant() {
		return participant;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setParticipant(String newParticipant) {
		String oldParticipant = participant;
		participant = newParticipant;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.SESSION_HEADER__PARTICIPANT, oldParticipant, participant));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Battery getBattery() {
		return battery;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetBattery(Battery newBattery, NotificationChain msgs) {
		Battery oldBattery = battery;
		battery = newBattery;
		if (eNotificationRequired()) {
			ENotificationImpl notification = new ENotificationImpl(this, Notification.SET, LimenPackage.SESSION_HEADER__BATTERY, oldBattery, newBattery);
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
	public void setBattery(Battery newBattery) {
		if (newBattery != battery) {
			NotificationChain msgs = null;
			if (battery != null)
				msgs = ((InternalEObject)battery).eInverseRemove(this, EOPPOSITE_FEATURE_BASE - LimenPackage.SESSION_HEADER__BATTERY, null, msgs);
			if (newBattery != null)
				msgs = ((InternalEObject)newBattery).eInverseAdd(this, EOPPOSITE_FEATURE_BASE - LimenPackage.SESSION_HEADER__BATTERY, null, msgs);
			msgs = basicSetBattery(newBattery, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.SESSION_HEADER__BATTERY, newBattery, newBattery));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Calibration getCalibration() {
		return calibration;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetCalibration(Calibration newCalibration, NotificationChain msgs) {
		Calibration oldCalibration = calibration;
		calibration = newCalibration;
		if (eNotificationRequired()) {
			ENotificationImpl notification = new ENotificationImpl(this, Notification.SET, LimenPackage.SESSION_HEADER__CALIBRATION, oldCalibration, newCalibration);
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
	public void setCalibration(Calibration newCalibration) {
		if (newCalibration != calibration) {
			NotificationChain msgs = null;
			if (calibration != null)
				msgs = ((InternalEObject)calibration).eInverseRemove(this, EOPPOSITE_FEATURE_BASE - LimenPackage.SESSION_HEADER__CALIBRATION, null, msgs);
			if (newCalibration != null)
				msgs = ((InternalEObject)newCalibration).eInverseAdd(this, EOPPOSITE_FEATURE_BASE - LimenPackage.SESSION_HEADER__CALIBRATION, null, msgs);
			msgs = basicSetCalibration(newCalibration, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.SESSION_HEADER__CALIBRATION, newCalibration, newCalibration));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getDevice() {
		return device;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDevice(String newDevice) {
		String oldDevice = device;
		device = newDevice;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.SESSION_HEADER__DEVICE, oldDevice, device));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public long getRandomSeed() {
		return randomSeed;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setRandomSeed(long newRandomSeed) {
		long oldRandomSeed = randomSeed;
		randomSeed = newRandomSeed;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.SESSION_HEADER__RANDOM_SEED, oldRandomSeed, randomSeed));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getSoftwareVersion() {
		return softwareVersion;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSoftwareVersion(String newSoftwareVersion) {
		String oldSoftwareVersion = softwareVersion;
		softwareVersion = newSoftwareVersion;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.SESSION_HEADER__SOFTWARE_VERSION, oldSoftwareVersion, softwareVersion));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Instant getStartTime() {
		return startTime;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setStartTime(Instant newStartTime) {
		Instant oldStartTime = startTime;
		startTime = newStartTime;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.SESSION_HEADER__START_TIME, oldStartTime, startTime));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Instant getEndTime() {
		return endTime;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setEndTime(Instant newEndTime) {
		Instant oldEndTime = endTime;
		endTime = newEndTime;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.SESSION_HEADER__END_TIME, oldEndTime, endTime));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public SessionStatus getStatus() {
		return status;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setStatus(SessionStatus newStatus) {
		SessionStatus oldStatus = status;
		status = newStatus == null ? STATUS_EDEFAULT : newStatus;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.SESSION_HEADER__STATUS, oldStatus, status));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getLatinSquareRow() {
		return latinSquareRow;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLatinSquareRow(int newLatinSquareRow) {
		int oldLatinSquareRow = latinSquareRow;
		latinSquareRow = newLatinSquareRow;
		boolean oldLatinSquareRowESet = latinSquareRowESet;
		latinSquareRowESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.SESSION_HEADER__LATIN_SQUARE_ROW, oldLatinSquareRow, latinSquareRow, !oldLatinSquareRowESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetLatinSquareRow() {
		int oldLatinSquareRow = latinSquareRow;
		boolean oldLatinSquareRowESet = latinSquareRowESet;
		latinSquareRow = LATIN_SQUARE_ROW_EDEFAULT;
		latinSquareRowESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, LimenPackage.SESSION_HEADER__LATIN_SQUARE_ROW, oldLatinSquareRow, LATIN_SQUARE_ROW_EDEFAULT, oldLatinSquareRowESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetLatinSquareRow() {
		return latinSquareRowESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Step> getStepOrder() {
		if (stepOrder == null) {
			stepOrder = new EObjectResolvingEList<Step>(Step.class, this, LimenPackage.SESSION_HEADER__STEP_ORDER);
		}
		return stepOrder;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ExposureEstimate getExposure() {
		return exposure;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetExposure(ExposureEstimate newExposure, NotificationChain msgs) {
		ExposureEstimate oldExposure = exposure;
		exposure = newExposure;
		if (eNotificationRequired()) {
			ENotificationImpl notification = new ENotificationImpl(this, Notification.SET, LimenPackage.SESSION_HEADER__EXPOSURE, oldExposure, newExposure);
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
	public void setExposure(ExposureEstimate newExposure) {
		if (newExposure != exposure) {
			NotificationChain msgs = null;
			if (exposure != null)
				msgs = ((InternalEObject)exposure).eInverseRemove(this, EOPPOSITE_FEATURE_BASE - LimenPackage.SESSION_HEADER__EXPOSURE, null, msgs);
			if (newExposure != null)
				msgs = ((InternalEObject)newExposure).eInverseAdd(this, EOPPOSITE_FEATURE_BASE - LimenPackage.SESSION_HEADER__EXPOSURE, null, msgs);
			msgs = basicSetExposure(newExposure, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.SESSION_HEADER__EXPOSURE, newExposure, newExposure));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean validSession(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.SessionRules.validSession(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case LimenPackage.SESSION_HEADER__BATTERY:
				return basicSetBattery(null, msgs);
			case LimenPackage.SESSION_HEADER__CALIBRATION:
				return basicSetCalibration(null, msgs);
			case LimenPackage.SESSION_HEADER__EXPOSURE:
				return basicSetExposure(null, msgs);
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
			case LimenPackage.SESSION_HEADER__PARTICIPANT:
				return getParticipant();
			case LimenPackage.SESSION_HEADER__BATTERY:
				return getBattery();
			case LimenPackage.SESSION_HEADER__CALIBRATION:
				return getCalibration();
			case LimenPackage.SESSION_HEADER__DEVICE:
				return getDevice();
			case LimenPackage.SESSION_HEADER__RANDOM_SEED:
				return getRandomSeed();
			case LimenPackage.SESSION_HEADER__SOFTWARE_VERSION:
				return getSoftwareVersion();
			case LimenPackage.SESSION_HEADER__START_TIME:
				return getStartTime();
			case LimenPackage.SESSION_HEADER__END_TIME:
				return getEndTime();
			case LimenPackage.SESSION_HEADER__STATUS:
				return getStatus();
			case LimenPackage.SESSION_HEADER__LATIN_SQUARE_ROW:
				return getLatinSquareRow();
			case LimenPackage.SESSION_HEADER__STEP_ORDER:
				return getStepOrder();
			case LimenPackage.SESSION_HEADER__EXPOSURE:
				return getExposure();
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
			case LimenPackage.SESSION_HEADER__PARTICIPANT:
				setParticipant((String)newValue);
				return;
			case LimenPackage.SESSION_HEADER__BATTERY:
				setBattery((Battery)newValue);
				return;
			case LimenPackage.SESSION_HEADER__CALIBRATION:
				setCalibration((Calibration)newValue);
				return;
			case LimenPackage.SESSION_HEADER__DEVICE:
				setDevice((String)newValue);
				return;
			case LimenPackage.SESSION_HEADER__RANDOM_SEED:
				setRandomSeed((Long)newValue);
				return;
			case LimenPackage.SESSION_HEADER__SOFTWARE_VERSION:
				setSoftwareVersion((String)newValue);
				return;
			case LimenPackage.SESSION_HEADER__START_TIME:
				setStartTime((Instant)newValue);
				return;
			case LimenPackage.SESSION_HEADER__END_TIME:
				setEndTime((Instant)newValue);
				return;
			case LimenPackage.SESSION_HEADER__STATUS:
				setStatus((SessionStatus)newValue);
				return;
			case LimenPackage.SESSION_HEADER__LATIN_SQUARE_ROW:
				setLatinSquareRow((Integer)newValue);
				return;
			case LimenPackage.SESSION_HEADER__STEP_ORDER:
				getStepOrder().clear();
				getStepOrder().addAll((Collection<? extends Step>)newValue);
				return;
			case LimenPackage.SESSION_HEADER__EXPOSURE:
				setExposure((ExposureEstimate)newValue);
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
			case LimenPackage.SESSION_HEADER__PARTICIPANT:
				setParticipant(PARTICIPANT_EDEFAULT);
				return;
			case LimenPackage.SESSION_HEADER__BATTERY:
				setBattery((Battery)null);
				return;
			case LimenPackage.SESSION_HEADER__CALIBRATION:
				setCalibration((Calibration)null);
				return;
			case LimenPackage.SESSION_HEADER__DEVICE:
				setDevice(DEVICE_EDEFAULT);
				return;
			case LimenPackage.SESSION_HEADER__RANDOM_SEED:
				setRandomSeed(RANDOM_SEED_EDEFAULT);
				return;
			case LimenPackage.SESSION_HEADER__SOFTWARE_VERSION:
				setSoftwareVersion(SOFTWARE_VERSION_EDEFAULT);
				return;
			case LimenPackage.SESSION_HEADER__START_TIME:
				setStartTime(START_TIME_EDEFAULT);
				return;
			case LimenPackage.SESSION_HEADER__END_TIME:
				setEndTime(END_TIME_EDEFAULT);
				return;
			case LimenPackage.SESSION_HEADER__STATUS:
				setStatus(STATUS_EDEFAULT);
				return;
			case LimenPackage.SESSION_HEADER__LATIN_SQUARE_ROW:
				unsetLatinSquareRow();
				return;
			case LimenPackage.SESSION_HEADER__STEP_ORDER:
				getStepOrder().clear();
				return;
			case LimenPackage.SESSION_HEADER__EXPOSURE:
				setExposure((ExposureEstimate)null);
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
			case LimenPackage.SESSION_HEADER__PARTICIPANT:
				return PARTICIPANT_EDEFAULT == null ? participant != null : !PARTICIPANT_EDEFAULT.equals(participant);
			case LimenPackage.SESSION_HEADER__BATTERY:
				return battery != null;
			case LimenPackage.SESSION_HEADER__CALIBRATION:
				return calibration != null;
			case LimenPackage.SESSION_HEADER__DEVICE:
				return DEVICE_EDEFAULT == null ? device != null : !DEVICE_EDEFAULT.equals(device);
			case LimenPackage.SESSION_HEADER__RANDOM_SEED:
				return randomSeed != RANDOM_SEED_EDEFAULT;
			case LimenPackage.SESSION_HEADER__SOFTWARE_VERSION:
				return SOFTWARE_VERSION_EDEFAULT == null ? softwareVersion != null : !SOFTWARE_VERSION_EDEFAULT.equals(softwareVersion);
			case LimenPackage.SESSION_HEADER__START_TIME:
				return START_TIME_EDEFAULT == null ? startTime != null : !START_TIME_EDEFAULT.equals(startTime);
			case LimenPackage.SESSION_HEADER__END_TIME:
				return END_TIME_EDEFAULT == null ? endTime != null : !END_TIME_EDEFAULT.equals(endTime);
			case LimenPackage.SESSION_HEADER__STATUS:
				return status != STATUS_EDEFAULT;
			case LimenPackage.SESSION_HEADER__LATIN_SQUARE_ROW:
				return isSetLatinSquareRow();
			case LimenPackage.SESSION_HEADER__STEP_ORDER:
				return stepOrder != null && !stepOrder.isEmpty();
			case LimenPackage.SESSION_HEADER__EXPOSURE:
				return exposure != null;
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
			case LimenPackage.SESSION_HEADER___VALID_SESSION__DIAGNOSTICCHAIN_MAP:
				return validSession((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
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
		result.append(" (participant: ");
		result.append(participant);
		result.append(", device: ");
		result.append(device);
		result.append(", randomSeed: ");
		result.append(randomSeed);
		result.append(", softwareVersion: ");
		result.append(softwareVersion);
		result.append(", startTime: ");
		result.append(startTime);
		result.append(", endTime: ");
		result.append(endTime);
		result.append(", status: ");
		result.append(status);
		result.append(", latinSquareRow: ");
		if (latinSquareRowESet) result.append(latinSquareRow); else result.append("<unset>");
		result.append(')');
		return result.toString();
	}

} //SessionHeaderImpl
