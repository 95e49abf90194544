/**
 */
package limen.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Document</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * The root of a Limen file (battery, calibration or session header).
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.LimenDocument#getSchemaVersion <em>Schema Version</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getLimenDocument()
 * @model abstract="true"
 * @generated
 */
public interface LimenDocument extends EObject {
	/**
	 * Returns the value of the '<em><b>Schema Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Version of the file layout this document was written with. Saving stamps the current version (limen.model.io.LimenFiles.SCHEMA_VERSION); loading refuses versions newer than the running software understands.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Schema Version</em>' attribute.
	 * @see #setSchemaVersion(int)
	 * @see limen.model.LimenPackage#getLimenDocument_SchemaVersion()
	 * @model
	 * @generated
	 */
	int getSchemaVersion();

	/**
	 * Sets the value of the '{@link limen.model.LimenDocument#getSchemaVersion <em>Schema Version</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Schema Version</em>' attribute.
	 * @see #getSchemaVersion()
	 * @generated
	 */
	void setSchemaVersion(int value);

} // LimenDocument
