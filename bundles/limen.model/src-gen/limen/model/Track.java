/**
 */
package limen.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Track</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * One adaptive or fixed sequence of trials within a step, interleaved with the step's other tracks.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.Track#getName <em>Name</em>}</li>
 *   <li>{@link limen.model.Track#getProcedure <em>Procedure</em>}</li>
 *   <li>{@link limen.model.Track#getStoppingRule <em>Stopping Rule</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getTrack()
 * @model
 * @generated
 */
public interface Track extends EObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Name of the track within its step (for example 'A' and 'B').
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see limen.model.LimenPackage#getTrack_Name()
	 * @model required="true"
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link limen.model.Track#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Procedure</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The method that chooses each trial's value.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Procedure</em>' containment reference.
	 * @see #setProcedure(Procedure)
	 * @see limen.model.LimenPackage#getTrack_Procedure()
	 * @model containment="true" required="true"
	 * @generated
	 */
	Procedure getProcedure();

	/**
	 * Sets the value of the '{@link limen.model.Track#getProcedure <em>Procedure</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Procedure</em>' containment reference.
	 * @see #getProcedure()
	 * @generated
	 */
	void setProcedure(Procedure value);

	/**
	 * Returns the value of the '<em><b>Stopping Rule</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * When the track ends.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Stopping Rule</em>' containment reference.
	 * @see #setStoppingRule(StoppingRule)
	 * @see limen.model.LimenPackage#getTrack_StoppingRule()
	 * @model containment="true" required="true"
	 * @generated
	 */
	StoppingRule getStoppingRule();

	/**
	 * Sets the value of the '{@link limen.model.Track#getStoppingRule <em>Stopping Rule</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Stopping Rule</em>' containment reference.
	 * @see #getStoppingRule()
	 * @generated
	 */
	void setStoppingRule(StoppingRule value);

} // Track
