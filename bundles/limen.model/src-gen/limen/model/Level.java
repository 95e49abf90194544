/**
 */
package limen.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Level</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A sound level in dB SPL, either absolute or relative to a participant's result in an earlier step.
 * <!-- end-model-doc -->
 *
 *
 * @see limen.model.LimenPackage#getLevel()
 * @model abstract="true"
 * @generated
 */
public interface Level extends EObject {
} // Level
