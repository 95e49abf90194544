/**
 */
package limen.model.impl;

import java.lang.reflect.InvocationTargetException;

import java.util.Collection;
import java.util.Map;

import limen.model.LimenPackage;
import limen.model.Step;
import limen.model.Stimulus;
import limen.model.Task;
import limen.model.Track;
import limen.model.VariedQuantity;

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
 * An implementation of the model object '<em><b>Step</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.StepImpl#getId <em>Id</em>}</li>
 *   <li>{@link limen.model.impl.StepImpl#getTitle <em>Title</em>}</li>
 *   <li>{@link limen.model.impl.StepImpl#getNotes <em>Notes</em>}</li>
 *   <li>{@link limen.model.impl.StepImpl#isFixedPosition <em>Fixed Position</em>}</li>
 *   <li>{@link limen.model.impl.StepImpl#getTask <em>Task</em>}</li>
 *   <li>{@link limen.model.impl.StepImpl#getStimulus <em>Stimulus</em>}</li>
 *   <li>{@link limen.model.impl.StepImpl#getVariedQuantity <em>Varied Quantity</em>}</li>
 *   <li>{@link limen.model.impl.StepImpl#getTracks <em>Tracks</em>}</li>
 * </ul>
 *
 * @generated
 */
public class StepImpl extends EObjectImpl implements Step {
	/**
	 * The default value of the '{@link #getId() <em>Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getId()
	 * @generated
	 * @ordered
	 */
	protected static final String ID_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getId() <em>Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getId()
	 * @generated
	 * @ordered
	 */
	protected String id = ID_EDEFAULT;

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
	 * The default value of the '{@link #isFixedPosition() <em>Fixed Position</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isFixedPosition()
	 * @generated
	 * @ordered
	 */
	protected static final boolean FIXED_POSITION_EDEFAULT = false;

	/**
	 * The cached value of the '{@link #isFixedPosition() <em>Fixed Position</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isFixedPosition()
	 * @generated
	 * @ordered
	 */
	protected boolean fixedPosition = FIXED_POSITION_EDEFAULT;

	/**
	 * The cached value of the '{@link #getTask() <em>Task</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTask()
	 * @generated
	 * @ordered
	 */
	protected Task task;

	/**
	 * The cached value of the '{@link #getStimulus() <em>Stimulus</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStimulus()
	 * @generated
	 * @ordered
	 */
	protected Stimulus stimulus;

	/**
	 * The cached value of the '{@link #getVariedQuantity() <em>Varied Quantity</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVariedQuantity()
	 * @generated
	 * @ordered
	 */
	protected VariedQuantity variedQuantity;

	/**
	 * The cached value of the '{@link #getTracks() <em>Tracks</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTracks()
	 * @generated
	 * @ordered
	 */
	protected EList<Track> tracks;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected StepImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.STEP;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getId() {
		return id;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setId(String newId) {
		String oldId = id;
		id = newId;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.STEP__ID, oldId, id));
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
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.STEP__TITLE, oldTitle, title));
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
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.STEP__NOTES, oldNotes, notes));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isFixedPosition() {
		return fixedPosition;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setFixedPosition(boolean newFixedPosition) {
		boolean oldFixedPosition = fixedPosition;
		fixedPosition = newFixedPosition;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.STEP__FIXED_POSITION, oldFixedPosition, fixedPosition));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Task getTask() {
		return task;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetTask(Task newTask, NotificationChain msgs) {
		Task oldTask = task;
		task = newTask;
		if (eNotificationRequired()) {
			ENotificationImpl notification = new ENotificationImpl(this, Notification.SET, LimenPackage.STEP__TASK, oldTask, newTask);
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
	public void setTask(Task newTask) {
		if (newTask != task) {
			NotificationChain msgs = null;
			if (task != null)
				msgs = ((InternalEObject)task).eInverseRemove(this, EOPPOSITE_FEATURE_BASE - LimenPackage.STEP__TASK, null, msgs);
			if (newTask != null)
				msgs = ((InternalEObject)newTask).eInverseAdd(this, EOPPOSITE_FEATURE_BASE - LimenPackage.STEP__TASK, null, msgs);
			msgs = basicSetTask(newTask, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.STEP__TASK, newTask, newTask));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Stimulus getStimulus() {
		return stimulus;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetStimulus(Stimulus newStimulus, NotificationChain msgs) {
		Stimulus oldStimulus = stimulus;
		stimulus = newStimulus;
		if (eNotificationRequired()) {
			ENotificationImpl notification = new ENotificationImpl(this, Notification.SET, LimenPackage.STEP__STIMULUS, oldStimulus, newStimulus);
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
	public void setStimulus(Stimulus newStimulus) {
		if (newStimulus != stimulus) {
			NotificationChain msgs = null;
			if (stimulus != null)
				msgs = ((InternalEObject)stimulus).eInverseRemove(this, EOPPOSITE_FEATURE_BASE - LimenPackage.STEP__STIMULUS, null, msgs);
			if (newStimulus != null)
				msgs = ((InternalEObject)newStimulus).eInverseAdd(this, EOPPOSITE_FEATURE_BASE - LimenPackage.STEP__STIMULUS, null, msgs);
			msgs = basicSetStimulus(newStimulus, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.STEP__STIMULUS, newStimulus, newStimulus));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public VariedQuantity getVariedQuantity() {
		return variedQuantity;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetVariedQuantity(VariedQuantity newVariedQuantity, NotificationChain msgs) {
		VariedQuantity oldVariedQuantity = variedQuantity;
		variedQuantity = newVariedQuantity;
		if (eNotificationRequired()) {
			ENotificationImpl notification = new ENotificationImpl(this, Notification.SET, LimenPackage.STEP__VARIED_QUANTITY, oldVariedQuantity, newVariedQuantity);
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
	public void setVariedQuantity(VariedQuantity newVariedQuantity) {
		if (newVariedQuantity != variedQuantity) {
			NotificationChain msgs = null;
			if (variedQuantity != null)
				msgs = ((InternalEObject)variedQuantity).eInverseRemove(this, EOPPOSITE_FEATURE_BASE - LimenPackage.STEP__VARIED_QUANTITY, null, msgs);
			if (newVariedQuantity != null)
				msgs = ((InternalEObject)newVariedQuantity).eInverseAdd(this, EOPPOSITE_FEATURE_BASE - LimenPackage.STEP__VARIED_QUANTITY, null, msgs);
			msgs = basicSetVariedQuantity(newVariedQuantity, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.STEP__VARIED_QUANTITY, newVariedQuantity, newVariedQuantity));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Track> getTracks() {
		if (tracks == null) {
			tracks = new EObjectContainmentEList<Track>(Track.class, this, LimenPackage.STEP__TRACKS);
		}
		return tracks;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean consistentQuantity(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.StepRules.consistentQuantity(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean levelsWithinCeiling(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.StepRules.levelsWithinCeiling(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean frequenciesWithinRange(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.StepRules.frequenciesWithinRange(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case LimenPackage.STEP__TASK:
				return basicSetTask(null, msgs);
			case LimenPackage.STEP__STIMULUS:
				return basicSetStimulus(null, msgs);
			case LimenPackage.STEP__VARIED_QUANTITY:
				return basicSetVariedQuantity(null, msgs);
			case LimenPackage.STEP__TRACKS:
				return ((InternalEList<?>)getTracks()).basicRemove(otherEnd, msgs);
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
			case LimenPackage.STEP__ID:
				return getId();
			case LimenPackage.STEP__TITLE:
				return getTitle();
			case LimenPackage.STEP__NOTES:
				return getNotes();
			case LimenPackage.STEP__FIXED_POSITION:
				return isFixedPosition();
			case LimenPackage.STEP__TASK:
				return getTask();
			case LimenPackage.STEP__STIMULUS:
				return getStimulus();
			case LimenPackage.STEP__VARIED_QUANTITY:
				return getVariedQuantity();
			case LimenPackage.STEP__TRACKS:
				return getTracks();
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
			case LimenPackage.STEP__ID:
				setId((String)newValue);
				return;
			case LimenPackage.STEP__TITLE:
				setTitle((String)newValue);
				return;
			case LimenPackage.STEP__NOTES:
				setNotes((String)newValue);
				return;
			case LimenPackage.STEP__FIXED_POSITION:
				setFixedPosition((Boolean)newValue);
				return;
			case LimenPackage.STEP__TASK:
				setTask((Task)newValue);
				return;
			case LimenPackage.STEP__STIMULUS:
				setStimulus((Stimulus)newValue);
				return;
			case LimenPackage.STEP__VARIED_QUANTITY:
				setVariedQuantity((VariedQuantity)newValue);
				return;
			case LimenPackage.STEP__TRACKS:
				getTracks().clear();
				getTracks().addAll((Collection<? extends Track>)newValue);
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
			case LimenPackage.STEP__ID:
				setId(ID_EDEFAULT);
				return;
			case LimenPackage.STEP__TITLE:
				setTitle(TITLE_EDEFAULT);
				return;
			case LimenPackage.STEP__NOTES:
				setNotes(NOTES_EDEFAULT);
				return;
			case LimenPackage.STEP__FIXED_POSITION:
				setFixedPosition(FIXED_POSITION_EDEFAULT);
				return;
			case LimenPackage.STEP__TASK:
				setTask((Task)null);
				return;
			case LimenPackage.STEP__STIMULUS:
				setStimulus((Stimulus)null);
				return;
			case LimenPackage.STEP__VARIED_QUANTITY:
				setVariedQuantity((VariedQuantity)null);
				return;
			case LimenPackage.STEP__TRACKS:
				getTracks().clear();
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
			case LimenPackage.STEP__ID:
				return ID_EDEFAULT == null ? id != null : !ID_EDEFAULT.equals(id);
			case LimenPackage.STEP__TITLE:
				return TITLE_EDEFAULT == null ? title != null : !TITLE_EDEFAULT.equals(title);
			case LimenPackage.STEP__NOTES:
				return NOTES_EDEFAULT == null ? notes != null : !NOTES_EDEFAULT.equals(notes);
			case LimenPackage.STEP__FIXED_POSITION:
				return fixedPosition != FIXED_POSITION_EDEFAULT;
			case LimenPackage.STEP__TASK:
				return task != null;
			case LimenPackage.STEP__STIMULUS:
				return stimulus != null;
			case LimenPackage.STEP__VARIED_QUANTITY:
				return variedQuantity != null;
			case LimenPackage.STEP__TRACKS:
				return tracks != null && !tracks.isEmpty();
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
			case LimenPackage.STEP___CONSISTENT_QUANTITY__DIAGNOSTICCHAIN_MAP:
				return consistentQuantity((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
			case LimenPackage.STEP___LEVELS_WITHIN_CEILING__DIAGNOSTICCHAIN_MAP:
				return levelsWithinCeiling((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
			case LimenPackage.STEP___FREQUENCIES_WITHIN_RANGE__DIAGNOSTICCHAIN_MAP:
				return frequenciesWithinRange((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
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
		result.append(" (id: ");
		result.append(id);
		result.append(", title: ");
		result.append(title);
		result.append(", notes: ");
		result.append(notes);
		result.append(", fixedPosition: ");
		result.append(fixedPosition);
		result.append(')');
		return result.toString();
	}

} //StepImpl
