/**
 */
package limen.model;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Settings Group</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * Typed settings that belong to one contributed procedure or stimulus extension.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.SettingsGroup#getContributorId <em>Contributor Id</em>}</li>
 *   <li>{@link limen.model.SettingsGroup#getEntries <em>Entries</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getSettingsGroup()
 * @model
 * @generated
 */
public interface SettingsGroup extends EObject {
	/**
	 * Returns the value of the '<em><b>Contributor Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Identifier of the contributing extension, for example 'org.example.lab.myprocedure'.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Contributor Id</em>' attribute.
	 * @see #setContributorId(String)
	 * @see limen.model.LimenPackage#getSettingsGroup_ContributorId()
	 * @model required="true"
	 * @generated
	 */
	String getContributorId();

	/**
	 * Sets the value of the '{@link limen.model.SettingsGroup#getContributorId <em>Contributor Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Contributor Id</em>' attribute.
	 * @see #getContributorId()
	 * @generated
	 */
	void setContributorId(String value);

	/**
	 * Returns the value of the '<em><b>Entries</b></em>' containment reference list.
	 * The list contents are of type {@link limen.model.Setting}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The settings.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Entries</em>' containment reference list.
	 * @see limen.model.LimenPackage#getSettingsGroup_Entries()
	 * @model containment="true"
	 * @generated
	 */
	EList<Setting> getEntries();

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * A non-blank contributor id, non-blank and distinct setting names, and values that parse as their declared type (LM0801-LM0803).
	 * @param diagnostics Receives one diagnostic per problem found (may be null to ask only whether the invariant holds).
	 * @param context The validation context; may hold the calibration to check levels and frequencies against, see limen.model.validation.BatteryValidator.
	 * <!-- end-model-doc -->
	 * @model
	 * @generated
	 */
	boolean validSettings(DiagnosticChain diagnostics, Map<Object, Object> context);

} // SettingsGroup
