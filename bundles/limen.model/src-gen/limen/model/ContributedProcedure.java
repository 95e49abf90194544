/**
 */
package limen.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Contributed Procedure</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A procedure contributed by a lab extension, identified by its settings group's contributor id. Limen keeps and syntax-checks its settings; whether it can run depends on the contributor being installed.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.ContributedProcedure#getSettings <em>Settings</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getContributedProcedure()
 * @model
 * @generated
 */
public interface ContributedProcedure extends Procedure {
	/**
	 * Returns the value of the '<em><b>Settings</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The contributor id and its typed settings.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Settings</em>' containment reference.
	 * @see #setSettings(SettingsGroup)
	 * @see limen.model.LimenPackage#getContributedProcedure_Settings()
	 * @model containment="true" required="true"
	 * @generated
	 */
	SettingsGroup getSettings();

	/**
	 * Sets the value of the '{@link limen.model.ContributedProcedure#getSettings <em>Settings</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Settings</em>' containment reference.
	 * @see #getSettings()
	 * @generated
	 */
	void setSettings(SettingsGroup value);

} // ContributedProcedure
