/**
 */
package limen.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Procedure</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * The method that chooses the value of the varied quantity on each trial. Values are in the unit of the step's varied quantity.
 * <!-- end-model-doc -->
 *
 *
 * @see limen.model.LimenPackage#getProcedure()
 * @model abstract="true"
 * @generated
 */
public interface Procedure extends EObject {
} // Procedure
