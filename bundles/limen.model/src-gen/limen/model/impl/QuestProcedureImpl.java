/**
 */
package limen.model.impl;

import java.lang.reflect.InvocationTargetException;

import java.util.Map;

import limen.model.BayesianVariant;
import limen.model.EstimatePlacement;
import limen.model.LimenPackage;
import limen.model.QuestProcedure;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Quest Procedure</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link limen.model.impl.QuestProcedureImpl#getVariant <em>Variant</em>}</li>
 *   <li>{@link limen.model.impl.QuestProcedureImpl#getPriorMean <em>Prior Mean</em>}</li>
 *   <li>{@link limen.model.impl.QuestProcedureImpl#getPriorSd <em>Prior Sd</em>}</li>
 *   <li>{@link limen.model.impl.QuestProcedureImpl#getBeta <em>Beta</em>}</li>
 *   <li>{@link limen.model.impl.QuestProcedureImpl#getLapseRate <em>Lapse Rate</em>}</li>
 *   <li>{@link limen.model.impl.QuestProcedureImpl#getGuessRate <em>Guess Rate</em>}</li>
 *   <li>{@link limen.model.impl.QuestProcedureImpl#getGrain <em>Grain</em>}</li>
 *   <li>{@link limen.model.impl.QuestProcedureImpl#getRange <em>Range</em>}</li>
 *   <li>{@link limen.model.impl.QuestProcedureImpl#getPlacement <em>Placement</em>}</li>
 * </ul>
 *
 * @generated
 */
public class QuestProcedureImpl extends ProcedureImpl implements QuestProcedure {
	/**
	 * The default value of the '{@link #getVariant() <em>Variant</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVariant()
	 * @generated
	 * @ordered
	 */
	protected static final BayesianVariant VARIANT_EDEFAULT = BayesianVariant.QUEST;

	/**
	 * The cached value of the '{@link #getVariant() <em>Variant</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVariant()
	 * @generated
	 * @ordered
	 */
	protected BayesianVariant variant = VARIANT_EDEFAULT;

	/**
	 * The default value of the '{@link #getPriorMean() <em>Prior Mean</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPriorMean()
	 * @generated
	 * @ordered
	 */
	protected static final double PRIOR_MEAN_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getPriorMean() <em>Prior Mean</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPriorMean()
	 * @generated
	 * @ordered
	 */
	protected double priorMean = PRIOR_MEAN_EDEFAULT;

	/**
	 * The default value of the '{@link #getPriorSd() <em>Prior Sd</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPriorSd()
	 * @generated
	 * @ordered
	 */
	protected static final double PRIOR_SD_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getPriorSd() <em>Prior Sd</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPriorSd()
	 * @generated
	 * @ordered
	 */
	protected double priorSd = PRIOR_SD_EDEFAULT;

	/**
	 * The default value of the '{@link #getBeta() <em>Beta</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBeta()
	 * @generated
	 * @ordered
	 */
	protected static final double BETA_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getBeta() <em>Beta</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBeta()
	 * @generated
	 * @ordered
	 */
	protected double beta = BETA_EDEFAULT;

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
	 * The default value of the '{@link #getGrain() <em>Grain</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getGrain()
	 * @generated
	 * @ordered
	 */
	protected static final double GRAIN_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getGrain() <em>Grain</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getGrain()
	 * @generated
	 * @ordered
	 */
	protected double grain = GRAIN_EDEFAULT;

	/**
	 * The default value of the '{@link #getRange() <em>Range</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRange()
	 * @generated
	 * @ordered
	 */
	protected static final double RANGE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getRange() <em>Range</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRange()
	 * @generated
	 * @ordered
	 */
	protected double range = RANGE_EDEFAULT;

	/**
	 * The default value of the '{@link #getPlacement() <em>Placement</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPlacement()
	 * @generated
	 * @ordered
	 */
	protected static final EstimatePlacement PLACEMENT_EDEFAULT = EstimatePlacement.MEAN;

	/**
	 * The cached value of the '{@link #getPlacement() <em>Placement</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPlacement()
	 * @generated
	 * @ordered
	 */
	protected EstimatePlacement placement = PLACEMENT_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected QuestProcedureImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return LimenPackage.Literals.QUEST_PROCEDURE;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public BayesianVariant getVariant() {
		return variant;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setVariant(BayesianVariant newVariant) {
		BayesianVariant oldVariant = variant;
		variant = newVariant == null ? VARIANT_EDEFAULT : newVariant;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.QUEST_PROCEDURE__VARIANT, oldVariant, variant));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getPriorMean() {
		return priorMean;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPriorMean(double newPriorMean) {
		double oldPriorMean = priorMean;
		priorMean = newPriorMean;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.QUEST_PROCEDURE__PRIOR_MEAN, oldPriorMean, priorMean));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getPriorSd() {
		return priorSd;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPriorSd(double newPriorSd) {
		double oldPriorSd = priorSd;
		priorSd = newPriorSd;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.QUEST_PROCEDURE__PRIOR_SD, oldPriorSd, priorSd));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getBeta() {
		return beta;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setBeta(double newBeta) {
		double oldBeta = beta;
		beta = newBeta;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.QUEST_PROCEDURE__BETA, oldBeta, beta));
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
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.QUEST_PROCEDURE__LAPSE_RATE, oldLapseRate, lapseRate));
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
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.QUEST_PROCEDURE__GUESS_RATE, oldGuessRate, guessRate, !oldGuessRateESet));
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
			eNotify(new ENotificationImpl(this, Notification.UNSET, LimenPackage.QUEST_PROCEDURE__GUESS_RATE, oldGuessRate, GUESS_RATE_EDEFAULT, oldGuessRateESet));
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
	public double getGrain() {
		return grain;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setGrain(double newGrain) {
		double oldGrain = grain;
		grain = newGrain;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.QUEST_PROCEDURE__GRAIN, oldGrain, grain));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getRange() {
		return range;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setRange(double newRange) {
		double oldRange = range;
		range = newRange;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.QUEST_PROCEDURE__RANGE, oldRange, range));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EstimatePlacement getPlacement() {
		return placement;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPlacement(EstimatePlacement newPlacement) {
		EstimatePlacement oldPlacement = placement;
		placement = newPlacement == null ? PLACEMENT_EDEFAULT : newPlacement;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, LimenPackage.QUEST_PROCEDURE__PLACEMENT, oldPlacement, placement));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean validQuestSettings(final DiagnosticChain diagnostics, final Map<Object, Object> context) {
		return limen.model.validation.internal.ProcedureRules.validQuestSettings(this, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case LimenPackage.QUEST_PROCEDURE__VARIANT:
				return getVariant();
			case LimenPackage.QUEST_PROCEDURE__PRIOR_MEAN:
				return getPriorMean();
			case LimenPackage.QUEST_PROCEDURE__PRIOR_SD:
				return getPriorSd();
			case LimenPackage.QUEST_PROCEDURE__BETA:
				return getBeta();
			case LimenPackage.QUEST_PROCEDURE__LAPSE_RATE:
				return getLapseRate();
			case LimenPackage.QUEST_PROCEDURE__GUESS_RATE:
				return getGuessRate();
			case LimenPackage.QUEST_PROCEDURE__GRAIN:
				return getGrain();
			case LimenPackage.QUEST_PROCEDURE__RANGE:
				return getRange();
			case LimenPackage.QUEST_PROCEDURE__PLACEMENT:
				return getPlacement();
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
			case LimenPackage.QUEST_PROCEDURE__VARIANT:
				setVariant((BayesianVariant)newValue);
				return;
			case LimenPackage.QUEST_PROCEDURE__PRIOR_MEAN:
				setPriorMean((Double)newValue);
				return;
			case LimenPackage.QUEST_PROCEDURE__PRIOR_SD:
				setPriorSd((Double)newValue);
				return;
			case LimenPackage.QUEST_PROCEDURE__BETA:
				setBeta((Double)newValue);
				return;
			case LimenPackage.QUEST_PROCEDURE__LAPSE_RATE:
				setLapseRate((Double)newValue);
				return;
			case LimenPackage.QUEST_PROCEDURE__GUESS_RATE:
				setGuessRate((Double)newValue);
				return;
			case LimenPackage.QUEST_PROCEDURE__GRAIN:
				setGrain((Double)newValue);
				return;
			case LimenPackage.QUEST_PROCEDURE__RANGE:
				setRange((Double)newValue);
				return;
			case LimenPackage.QUEST_PROCEDURE__PLACEMENT:
				setPlacement((EstimatePlacement)newValue);
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
			case LimenPackage.QUEST_PROCEDURE__VARIANT:
				setVariant(VARIANT_EDEFAULT);
				return;
			case LimenPackage.QUEST_PROCEDURE__PRIOR_MEAN:
				setPriorMean(PRIOR_MEAN_EDEFAULT);
				return;
			case LimenPackage.QUEST_PROCEDURE__PRIOR_SD:
				setPriorSd(PRIOR_SD_EDEFAULT);
				return;
			case LimenPackage.QUEST_PROCEDURE__BETA:
				setBeta(BETA_EDEFAULT);
				return;
			case LimenPackage.QUEST_PROCEDURE__LAPSE_RATE:
				setLapseRate(LAPSE_RATE_EDEFAULT);
				return;
			case LimenPackage.QUEST_PROCEDURE__GUESS_RATE:
				unsetGuessRate();
				return;
			case LimenPackage.QUEST_PROCEDURE__GRAIN:
				setGrain(GRAIN_EDEFAULT);
				return;
			case LimenPackage.QUEST_PROCEDURE__RANGE:
				setRange(RANGE_EDEFAULT);
				return;
			case LimenPackage.QUEST_PROCEDURE__PLACEMENT:
				setPlacement(PLACEMENT_EDEFAULT);
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
			case LimenPackage.QUEST_PROCEDURE__VARIANT:
				return variant != VARIANT_EDEFAULT;
			case LimenPackage.QUEST_PROCEDURE__PRIOR_MEAN:
				return priorMean != PRIOR_MEAN_EDEFAULT;
			case LimenPackage.QUEST_PROCEDURE__PRIOR_SD:
				return priorSd != PRIOR_SD_EDEFAULT;
			case LimenPackage.QUEST_PROCEDURE__BETA:
				return beta != BETA_EDEFAULT;
			case LimenPackage.QUEST_PROCEDURE__LAPSE_RATE:
				return lapseRate != LAPSE_RATE_EDEFAULT;
			case LimenPackage.QUEST_PROCEDURE__GUESS_RATE:
				return isSetGuessRate();
			case LimenPackage.QUEST_PROCEDURE__GRAIN:
				return grain != GRAIN_EDEFAULT;
			case LimenPackage.QUEST_PROCEDURE__RANGE:
				return range != RANGE_EDEFAULT;
			case LimenPackage.QUEST_PROCEDURE__PLACEMENT:
				return placement != PLACEMENT_EDEFAULT;
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
			case LimenPackage.QUEST_PROCEDURE___VALID_QUEST_SETTINGS__DIAGNOSTICCHAIN_MAP:
				return validQuestSettings((DiagnosticChain)arguments.get(0), (Map<Object, Object>)arguments.get(1));
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
		result.append(" (variant: ");
		result.append(variant);
		result.append(", priorMean: ");
		result.append(priorMean);
		result.append(", priorSd: ");
		result.append(priorSd);
		result.append(", beta: ");
		result.append(beta);
		result.append(", lapseRate: ");
		result.append(lapseRate);
		result.append(", guessRate: ");
		if (guessRateESet) result.append(guessRate); else result.append("<unset>");
		result.append(", grain: ");
		result.append(grain);
		result.append(", range: ");
		result.append(range);
		result.append(", placement: ");
		result.append(placement);
		result.append(')');
		return result.toString();
	}

} //QuestProcedureImpl
