/**
 */
package limen.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Absolute Level</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A fixed level.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link limen.model.AbsoluteLevel#getLevelDbSpl <em>Level Db Spl</em>}</li>
 * </ul>
 *
 * @see limen.model.LimenPackage#getAbsoluteLevel()
 * @model
 * @generated
 */
public interface AbsoluteLevel extends Level {
	/**
	 * Returns the value of the '<em><b>Level Db Spl</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The level in dB SPL (re 20 micropascal).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Level Db Spl</em>' attribute.
	 * @see #setLevelDbSpl(double)
	 * @see limen.model.LimenPackage#getAbsoluteLevel_LevelDbSpl()
	 * @model
	 * @generated
	 */
	double getLevelDbSpl();

	/**
	 * Sets the value of the '{@link limen.model.AbsoluteLevel#getLevelDbSpl <em>Level Db Spl</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Level Db Spl</em>' attribute.
	 * @see #getLevelDbSpl()
	 * @generated
	 */
	void setLevelDbSpl(double value);

} // AbsoluteLevel
