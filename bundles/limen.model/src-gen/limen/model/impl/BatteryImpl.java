/**
 */
package limen.model.impl;

import java.lang.reflect.InvocationTargetException;

import java.util.Collection;
import java.util.Map;

import limen.model.Battery;
import limen.model.Break;
import limen.model.LimenPackage;
import limen.model.OrderingPolicy;
import limen.model.Step;

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
 * An implementation of the model object '<em><b>Battery</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.BatteryImpl#getTitle <em>Title</em>}</li>
 *   <li>{@link limen.model.impl.BatteryImpl#getNotes <em>Notes</em>}</li>
 *   <li>{@link limen.model.impl.BatteryImpl#getCalibrationFile <em>Calibration File</em>}</li>
 *   <li>{@link limen.model.impl.BatteryImpl#getOrdering <em>Ordering</em>}</li>
 *   <li>{@link limen.model.impl.BatteryImpl#getShuffleSeed <em>Shuffle Seed</em>}</li>
 *   <li>{@link limen.model.impl.BatteryImpl#getSteps <em>Steps</em>}</li>
 *   <li>{@link limen.model.impl.BatteryImpl#getBreaks <em>Breaks</em>}</li>
 * </ul>
 *
 * @generated
 */
public class BatteryImpl extends LimenDocumentImpl implements Battery {
	/**
	 * The default value of the '{@link #getTitle() <em>Title</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTitle()
	 * @generated
	 * @ordered
	 */
	protected static final String TITLE_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getTitle() <em>Title</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTitle()
	 * @generated
	 * @ordered
	 */
	protected String title = TITLE_EDEFAULT;

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
	 * The default value of the '{@link #getCalibrationFile() <em>Calibration File</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCalibrationFile()
	 * @generated
	 * @ordered
	 */
	protected static final String CALIBRATION_FILE_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getCalibrationFile() <em>Calibration File</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCalibrationFile()
	 * @generated
	 * @ordered
	 */
	protected String calibrationFile = CALIBRATION_FILE_EDEFAULT;

	/**
	 * The default value of the '{@link #getOrdering() <em>Ordering</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOrdering()
	 * @generated
	 * @ordered
	 */
	protected static final OrderingPolicy ORDERING_EDEFAULT = OrderingPolicy.FIXED;

	/**
	 * The cached value of the '{@link #getOrdering() <em>Ordering</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOrdering()
	 * @generated
	 * @ordered
	 */
	protected OrderingPolicy ordering = ORDERING_EDEFAULT;

	/**
	 * The default value of the '{@link #getShuffleSeed() <em>Shuffle Seed</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getShuffleSeed()
	 * @generated
	 * @ordered
	 */
	protected static final long SHUFFLE_SEED_EDEFAULT = 0L;

	/**
	 * The cached value of the '{@link #getShuffleSeed() <em>Shuffle Seed</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getShuffleSeed()
	 * @generated
	 * @ordered
	 */
	protected long shuffleSeed = SHUFFLE_SEED_EDEFAULT;

	/**
	 * This is true if the Shuffle Seed attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean shuffleSeedESet;

	/**
	 * The cached value of the '{@link #getSteps() <em>Steps</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSteps()
	 * @generated
	 * @ordered
	 */
	protected EList<Step> steps;

	/**
	 * The cached value of the '{@link #getBreaks() <em>Breaks</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBreaks()
	 * @generated
	 * @ordered
	 */
	protected EList<Break> breaks;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected BatteryImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.BATTERY;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getTitle() {
		return title;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTitle(String newTitle) {
		String oldTitle = title;
		title = newTitle;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.BATTERY__TITLE, oldTitle, title));
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
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.BATTERY__NOTES, oldNotes, notes));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getCalibrationFile() {
		return calibrationFile;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCalibrationFile(String newCalibrationFile) {
		String oldCalibrationFile = calibrationFile;
		calibrationFile = newCalibrationFile;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.BATTERY__CALIBRATION_FILE, oldCalibrationFile, calibrationFile));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public OrderingPolicy getOrdering() {
		return ordering;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setOrdering(OrderingPolicy newOrdering) {
		OrderingPolicy oldOrdering = ordering;
		ordering = newOrdering == null ? ORDERING_EDEFAULT : newOrdering;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.BATTERY__ORDERING, oldOrdering, ordering));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public long getShuffleSeed() {
		return shuffleSeed;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setShuffleSeed(long newShuffleSeed) {
		long oldShuffleSeed = shuffleSeed;
		shuffleSeed = newShuffleSeed;
		boolean oldShuffleSeedESet = shuffleSeedESet;
		shuffleSeedESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.BATTERY__SHUFFLE_SEED, oldShuffleSeed, shuffleSeed, !oldShuffleSeedESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetShuffleSeed() {
		long oldShuffleSeed = shuffleSeed;
		boolean oldShuffleSeedESet = shuffleSeedESet;
		shuffleSeed = SHUFFLE_SEED_EDEFAULT;
		shuffleSeedESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, LimenPackage.BATTERY__SHUFFLE_SEED, oldShuffleSeed, SHUFFLE_SEED_EDEFAULT, oldShuffleSeedESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetShuffleSeed() {
		return shuffleSeedESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Step> getSteps() {
		if (steps == null) {
			steps = new EObjectContainmentEList<Step>(Step.class, this, LimenPackage.BATTERY__STEPS);
		}
		return steps;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Break> getBreaks() {
		if (breaks == null) {
			breaks = new EObjectContainmentEList<Break>(Break.class, this, LimenPackage.BATTERY__BREAKS);
		}
		return breaks;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean uniqueStepIds(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.BatteryRules.uniqueStepIds(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean validOrdering(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.BatteryRules.validOrdering(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean validBreaks(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.BatteryRules.validBreaks(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean noReferenceCycles(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.BatteryRules.noReferenceCycles(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case LimenPackage.BATTERY__STEPS:
				return ((InternalEList<?>)getSteps()).basicRemove(otherEnd, msgs);
			case LimenPackage.BATTERY__BREAKS:
				return ((InternalEList<?>)getBreaks()).basicRemove(otherEnd, msgs);
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
			case LimenPackage.BATTERY__TITLE:
				return getTitle();
			case LimenPackage.BATTERY__NOTES:
				return getNotes();
			case LimenPackage.BATTERY__CALIBRATION_FILE:
				return getCalibrationFile();
			case LimenPackage.BATTERY__ORDERING:
				return getOrdering();
			case LimenPackage.BATTERY__SHUFFLE_SEED:
				return getShuffleSeed();
			case LimenPackage.BATTERY__STEPS:
				return getSteps();
			case LimenPackage.BATTERY__BREAKS:
				return getBreaks();
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
			case LimenPackage.BATTERY__TITLE:
				setTitle((String)newValue);
				return;
			case LimenPackage.BATTERY__NOTES:
				setNotes((String)newValue);
				return;
			case LimenPackage.BATTERY__CALIBRATION_FILE:
				setCalibrationFile((String)newValue);
				return;
			case LimenPackage.BATTERY__ORDERING:
				setOrdering((OrderingPolicy)newValue);
				return;
			case LimenPackage.BATTERY__SHUFFLE_SEED:
				setShuffleSeed((Long)newValue);
				return;
			case LimenPackage.BATTERY__STEPS:
				getSteps().clear();
				getSteps().addAll((Collection<? extends Step>)newValue);
				return;
			case LimenPackage.BATTERY__BREAKS:
				getBreaks().clear();
				getBreaks().addAll((Collection<? extends Break>)newValue);
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
			case LimenPackage.BATTERY__TITLE:
				setTitle(TITLE_EDEFAULT);
				return;
			case LimenPackage.BATTERY__NOTES:
				setNotes(NOTES_EDEFAULT);
				return;
			case LimenPackage.BATTERY__CALIBRATION_FILE:
				setCalibrationFile(CALIBRATION_FILE_EDEFAULT);
				return;
			case LimenPackage.BATTERY__ORDERING:
				setOrdering(ORDERING_EDEFAULT);
				return;
			case LimenPackage.BATTERY__SHUFFLE_SEED:
				unsetShuffleSeed();
				return;
			case LimenPackage.BATTERY__STEPS:
				getSteps().clear();
				return;
			case LimenPackage.BATTERY__BREAKS:
				getBreaks().clear();
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
			case LimenPackage.BATTERY__TITLE:
				return TITLE_EDEFAULT == null ? title != null : !TITLE_EDEFAULT.equals(title);
			case LimenPackage.BATTERY__NOTES:
				return NOTES_EDEFAULT == null ? notes != null : !NOTES_EDEFAULT.equals(notes);
			case LimenPackage.BATTERY__CALIBRATION_FILE:
				return CALIBRATION_FILE_EDEFAULT == null ? calibrationFile != null : !CALIBRATION_FILE_EDEFAULT.equals(calibrationFile);
			case LimenPackage.BATTERY__ORDERING:
				return ordering != ORDERING_EDEFAULT;
			case LimenPackage.BATTERY__SHUFFLE_SEED:
				return isSetShuffleSeed();
			case LimenPackage.BATTERY__STEPS:
				return steps != null && !steps.isEmpty();
			case LimenPackage.BATTERY__BREAKS:
				return breaks != null && !breaks.isEmpty();
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
			case LimenPackage.BATTERY___UNIQUE_STEP_IDS__DIAGNOSTICCHAIN_MAP:
				return uniqueStepIds((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
			case LimenPackage.BATTERY___VALID_ORDERING__DIAGNOSTICCHAIN_MAP:
				return validOrdering((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
			case LimenPackage.BATTERY___VALID_BREAKS__DIAGNOSTICCHAIN_MAP:
				return validBreaks((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
			case LimenPackage.BATTERY___NO_REFERENCE_CYCLES__DIAGNOSTICCHAIN_MAP:
				return noReferenceCycles((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
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
		result.append(" (title: ");
		result.append(title);
		result.append(", notes: ");
		result.append(notes);
		result.append(", calibrationFile: ");
		result.append(calibrationFile);
		result.append(", ordering: ");
		result.append(ordering);
		result.append(", shuffleSeed: ");
		if (shuffleSeedESet) result.append(shuffleSeed); else result.append("<unset>");
		result.append(')');
		return result.toString();
	}

} //BatteryImpl
