/**
 */
package limen.model.impl;

import java.lang.reflect.InvocationTargetException;

import java.time.LocalDate;

import java.util.Collection;
import java.util.Map;

import limen.model.Calibration;
import limen.model.CalibrationPoint;
import limen.model.LimenPackage;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.NotificationChain;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.eclipse.emf.ecore.util.EObjectContainmentEList;
import org.eclipse.emf.ecore.util.InternalEList;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Calibration</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.CalibrationImpl#getName <em>Name</em>}</li>
 *   <li>{@link limen.model.impl.CalibrationImpl#getDevice <em>Device</em>}</li>
 *   <li>{@link limen.model.impl.CalibrationImpl#getTransducer <em>Transducer</em>}</li>
 *   <li>{@link limen.model.impl.CalibrationImpl#getReferenceLevelDbfs <em>Reference Level Dbfs</em>}</li>
 *   <li>{@link limen.model.impl.CalibrationImpl#getSampleRateHz <em>Sample Rate Hz</em>}</li>
 *   <li>{@link limen.model.impl.CalibrationImpl#getCeilingDbSpl <em>Ceiling Db Spl</em>}</li>
 *   <li>{@link limen.model.impl.CalibrationImpl#getMeasuredBy <em>Measured By</em>}</li>
 *   <li>{@link limen.model.impl.CalibrationImpl#getMeasuredOn <em>Measured On</em>}</li>
 *   <li>{@link limen.model.impl.CalibrationImpl#isDemonstrationOnly <em>Demonstration Only</em>}</li>
 *   <li>{@link limen.model.impl.CalibrationImpl#getNotes <em>Notes</em>}</li>
 *   <li>{@link limen.model.impl.CalibrationImpl#getPoints <em>Points</em>}</li>
 * </ul>
 *
 * @generated
 */
public class CalibrationImpl extends LimenDocumentImpl implements Calibration {
	/**
	 * The default value of the '{@link #getName() <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getName()
	 * @generated
	 * @ordered
	 */
	protected static final String NAME_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getName() <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getName()
	 * @generated
	 * @ordered
	 */
	protected String name = NAME_EDEFAULT;

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
	 * The default value of the '{@link #getTransducer() <em>Transducer</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTransducer()
	 * @generated
	 * @ordered
	 */
	protected static final String TRANSDUCER_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getTransducer() <em>Transducer</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTransducer()
	 * @generated
	 * @ordered
	 */
	protected String transducer = TRANSDUCER_EDEFAULT;

	/**
	 * The default value of the '{@link #getReferenceLevelDbfs() <em>Reference Level Dbfs</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getReferenceLevelDbfs()
	 * @generated
	 * @ordered
	 */
	protected static final double REFERENCE_LEVEL_DBFS_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getReferenceLevelDbfs() <em>Reference Level Dbfs</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getReferenceLevelDbfs()
	 * @generated
	 * @ordered
	 */
	protected double referenceLevelDbfs = REFERENCE_LEVEL_DBFS_EDEFAULT;

	/**
	 * The default value of the '{@link #getSampleRateHz() <em>Sample Rate Hz</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSampleRateHz()
	 * @generated
	 * @ordered
	 */
	protected static final int SAMPLE_RATE_HZ_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getSampleRateHz() <em>Sample Rate Hz</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSampleRateHz()
	 * @generated
	 * @ordered
	 */
	protected int sampleRateHz = SAMPLE_RATE_HZ_EDEFAULT;

	/**
	 * The default value of the '{@link #getCeilingDbSpl() <em>Ceiling Db Spl</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCeilingDbSpl()
	 * @generated
	 * @ordered
	 */
	protected static final double CEILING_DB_SPL_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getCeilingDbSpl() <em>Ceiling Db Spl</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCeilingDbSpl()
	 * @generated
	 * @ordered
	 */
	protected double ceilingDbSpl = CEILING_DB_SPL_EDEFAULT;

	/**
	 * The default value of the '{@link #getMeasuredBy() <em>Measured By</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMeasuredBy()
	 * @generated
	 * @ordered
	 */
	protected static final String MEASURED_BY_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getMeasuredBy() <em>Measured By</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMeasuredBy()
	 * @generated
	 * @ordered
	 */
	protected String measuredBy = MEASURED_BY_EDEFAULT;

	/**
	 * The default value of the '{@link #getMeasuredOn() <em>Measured On</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMeasuredOn()
	 * @generated
	 * @ordered
	 */
	protected static final LocalDate MEASURED_ON_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getMeasuredOn() <em>Measured On</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMeasuredOn()
	 * @generated
	 * @ordered
	 */
	protected LocalDate measuredOn = MEASURED_ON_EDEFAULT;

	/**
	 * The default value of the '{@link #isDemonstrationOnly() <em>Demonstration Only</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isDemonstrationOnly()
	 * @generated
	 * @ordered
	 */
	protected static final boolean DEMONSTRATION_ONLY_EDEFAULT = false;

	/**
	 * The cached value of the '{@link #isDemonstrationOnly() <em>Demonstration Only</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isDemonstrationOnly()
	 * @generated
	 * @ordered
	 */
	protected boolean demonstrationOnly = DEMONSTRATION_ONLY_EDEFAULT;

	/**
	 * The default value of the '{@link #getNotes() <em>Notes</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNotes()
	 * @generated
	 * @ordered
	 */
	protected static final String NOTES_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getNotes() <em>Notes</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNotes()
	 * @generated
	 * @ordered
	 */
	protected String notes = NOTES_EDEFAULT;

	/**
	 * The cached value of the '{@link #getPoints() <em>Points</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPoints()
	 * @generated
	 * @ordered
	 */
	protected EList<CalibrationPoint> points;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected CalibrationImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.CALIBRATION;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getName() {
		return name;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setName(String newName) {
		String oldName = name;
		name = newName;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.CALIBRATION__NAME, oldName, name));
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
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.CALIBRATION__DEVICE, oldDevice, device));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getTransducer() {
		return transducer;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTransducer(String newTransducer) {
		String oldTransducer = transducer;
		transducer = newTransducer;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.CALIBRATION__TRANSDUCER, oldTransducer, transducer));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getReferenceLevelDbfs() {
		return referenceLevelDbfs;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setReferenceLevelDbfs(double newReferenceLevelDbfs) {
		double oldReferenceLevelDbfs = referenceLevelDbfs;
		referenceLevelDbfs = newReferenceLevelDbfs;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.CALIBRATION__REFERENCE_LEVEL_DBFS, oldReferenceLevelDbfs, referenceLevelDbfs));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getSampleRateHz() {
		return sampleRateHz;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSampleRateHz(int newSampleRateHz) {
		int oldSampleRateHz = sampleRateHz;
		sampleRateHz = newSampleRateHz;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.CALIBRATION__SAMPLE_RATE_HZ, oldSampleRateHz, sampleRateHz));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getCeilingDbSpl() {
		return ceilingDbSpl;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCeilingDbSpl(double newCeilingDbSpl) {
		double oldCeilingDbSpl = ceilingDbSpl;
		ceilingDbSpl = newCeilingDbSpl;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.CALIBRATION__CEILING_DB_SPL, oldCeilingDbSpl, ceilingDbSpl));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getMeasuredBy() {
		return measuredBy;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMeasuredBy(String newMeasuredBy) {
		String oldMeasuredBy = measuredBy;
		measuredBy = newMeasuredBy;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.CALIBRATION__MEASURED_BY, oldMeasuredBy, measuredBy));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public LocalDate getMeasuredOn() {
		return measuredOn;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMeasuredOn(LocalDate newMeasuredOn) {
		LocalDate oldMeasuredOn = measuredOn;
		measuredOn = newMeasuredOn;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.CALIBRATION__MEASURED_ON, oldMeasuredOn, measuredOn));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isDemonstrationOnly() {
		return demonstrationOnly;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDemonstrationOnly(boolean newDemonstrationOnly) {
		boolean oldDemonstrationOnly = demonstrationOnly;
		demonstrationOnly = newDemonstrationOnly;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.CALIBRATION__DEMONSTRATION_ONLY, oldDemonstrationOnly, demonstrationOnly));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getNotes() {
		return notes;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setNotes(String newNotes) {
		String oldNotes = notes;
		notes = newNotes;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.CALIBRATION__NOTES, oldNotes, notes));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<CalibrationPoint> getPoints() {
		if (points == null) {
			points = new EObjectContainmentEList<CalibrationPoint>(CalibrationPoint.class, this, LimenPackage.CALIBRATION__POINTS);
		}
		return points;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean validCalibration(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.CalibrationRules.validCalibration(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case LimenPackage.CALIBRATION__POINTS:
				return ((InternalEList<?>)getPoints()).basicRemove(otherEnd, msgs);
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
			case LimenPackage.CALIBRATION__NAME:
				return getName();
			case LimenPackage.CALIBRATION__DEVICE:
				return getDevice();
			case LimenPackage.CALIBRATION__TRANSDUCER:
				return getTransducer();
			case LimenPackage.CALIBRATION__REFERENCE_LEVEL_DBFS:
				return getReferenceLevelDbfs();
			case LimenPackage.CALIBRATION__SAMPLE_RATE_HZ:
				return getSampleRateHz();
			case LimenPackage.CALIBRATION__CEILING_DB_SPL:
				return getCeilingDbSpl();
			case LimenPackage.CALIBRATION__MEASURED_BY:
				return getMeasuredBy();
			case LimenPackage.CALIBRATION__MEASURED_ON:
				return getMeasuredOn();
			case LimenPackage.CALIBRATION__DEMONSTRATION_ONLY:
				return isDemonstrationOnly();
			case LimenPackage.CALIBRATION__NOTES:
				return getNotes();
			case LimenPackage.CALIBRATION__POINTS:
				return getPoints();
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
			case LimenPackage.CALIBRATION__NAME:
				setName((String)newValue);
				return;
			case LimenPackage.CALIBRATION__DEVICE:
				setDevice((String)newValue);
				return;
			case LimenPackage.CALIBRATION__TRANSDUCER:
				setTransducer((String)newValue);
				return;
			case LimenPackage.CALIBRATION__REFERENCE_LEVEL_DBFS:
				setReferenceLevelDbfs((Double)newValue);
				return;
			case LimenPackage.CALIBRATION__SAMPLE_RATE_HZ:
				setSampleRateHz((Integer)newValue);
				return;
			case LimenPackage.CALIBRATION__CEILING_DB_SPL:
				setCeilingDbSpl((Double)newValue);
				return;
			case LimenPackage.CALIBRATION__MEASURED_BY:
				setMeasuredBy((String)newValue);
				return;
			case LimenPackage.CALIBRATION__MEASURED_ON:
				setMeasuredOn((LocalDate)newValue);
				return;
			case LimenPackage.CALIBRATION__DEMONSTRATION_ONLY:
				setDemonstrationOnly((Boolean)newValue);
				return;
			case LimenPackage.CALIBRATION__NOTES:
				setNotes((String)newValue);
				return;
			case LimenPackage.CALIBRATION__POINTS:
				getPoints().clear();
				getPoints().addAll((Collection<? extends CalibrationPoint>)newValue);
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
			case LimenPackage.CALIBRATION__NAME:
				setName(NAME_EDEFAULT);
				return;
			case LimenPackage.CALIBRATION__DEVICE:
				setDevice(DEVICE_EDEFAULT);
				return;
			case LimenPackage.CALIBRATION__TRANSDUCER:
				setTransducer(TRANSDUCER_EDEFAULT);
				return;
			case LimenPackage.CALIBRATION__REFERENCE_LEVEL_DBFS:
				setReferenceLevelDbfs(REFERENCE_LEVEL_DBFS_EDEFAULT);
				return;
			case LimenPackage.CALIBRATION__SAMPLE_RATE_HZ:
				setSampleRateHz(SAMPLE_RATE_HZ_EDEFAULT);
				return;
			case LimenPackage.CALIBRATION__CEILING_DB_SPL:
				setCeilingDbSpl(CEILING_DB_SPL_EDEFAULT);
				return;
			case LimenPackage.CALIBRATION__MEASURED_BY:
				setMeasuredBy(MEASURED_BY_EDEFAULT);
				return;
			case LimenPackage.CALIBRATION__MEASURED_ON:
				setMeasuredOn(MEASURED_ON_EDEFAULT);
				return;
			case LimenPackage.CALIBRATION__DEMONSTRATION_ONLY:
				setDemonstrationOnly(DEMONSTRATION_ONLY_EDEFAULT);
				return;
			case LimenPackage.CALIBRATION__NOTES:
				setNotes(NOTES_EDEFAULT);
				return;
			case LimenPackage.CALIBRATION__POINTS:
				getPoints().clear();
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
			case LimenPackage.CALIBRATION__NAME:
				return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
			case LimenPackage.CALIBRATION__DEVICE:
				return DEVICE_EDEFAULT == null ? device != null : !DEVICE_EDEFAULT.equals(device);
			case LimenPackage.CALIBRATION__TRANSDUCER:
				return TRANSDUCER_EDEFAULT == null ? transducer != null : !TRANSDUCER_EDEFAULT.equals(transducer);
			case LimenPackage.CALIBRATION__REFERENCE_LEVEL_DBFS:
				return referenceLevelDbfs != REFERENCE_LEVEL_DBFS_EDEFAULT;
			case LimenPackage.CALIBRATION__SAMPLE_RATE_HZ:
				return sampleRateHz != SAMPLE_RATE_HZ_EDEFAULT;
			case LimenPackage.CALIBRATION__CEILING_DB_SPL:
				return ceilingDbSpl != CEILING_DB_SPL_EDEFAULT;
			case LimenPackage.CALIBRATION__MEASURED_BY:
				return MEASURED_BY_EDEFAULT == null ? measuredBy != null : !MEASURED_BY_EDEFAULT.equals(measuredBy);
			case LimenPackage.CALIBRATION__MEASURED_ON:
				return MEASURED_ON_EDEFAULT == null ? measuredOn != null : !MEASURED_ON_EDEFAULT.equals(measuredOn);
			case LimenPackage.CALIBRATION__DEMONSTRATION_ONLY:
				return demonstrationOnly != DEMONSTRATION_ONLY_EDEFAULT;
			case LimenPackage.CALIBRATION__NOTES:
				return NOTES_EDEFAULT == null ? notes != null : !NOTES_EDEFAULT.equals(notes);
			case LimenPackage.CALIBRATION__POINTS:
				return points != null && !points.isEmpty();
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
			case LimenPackage.CALIBRATION___VALID_CALIBRATION__DIAGNOSTICCHAIN_MAP:
				return validCalibration((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
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
		result.append(" (name: ");
		result.append(name);
		result.append(", device: ");
		result.append(device);
		result.append(", transducer: ");
		result.append(transducer);
		result.append(", referenceLevelDbfs: ");
		result.append(referenceLevelDbfs);
		result.append(", sampleRateHz: ");
		result.append(sampleRateHz);
		result.append(", ceilingDbSpl: ");
		result.append(ceilingDbSpl);
		result.append(", measuredBy: ");
		result.append(measuredBy);
		result.append(", measuredOn: ");
		result.append(measuredOn);
		result.append(", demonstrationOnly: ");
		result.append(demonstrationOnly);
		result.append(", notes: ");
		result.append(notes);
		result.append(')');
		return result.toString();
	}

} //CalibrationImpl
