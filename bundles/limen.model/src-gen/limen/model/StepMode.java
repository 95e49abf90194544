/**
 */
package limen.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Step Mode</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * How a staircase applies its steps.
 * <!-- end-model-doc -->
 * @see limen.model.LimenPackage#getStepMode()
 * @model
 * @generated
 */
public enum StepMode implements Enumerator {
	/**
	 * The '<em><b>ADDITIVE</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * value +/- step.
	 * <!-- end-model-doc -->
	 * @see #ADDITIVE_VALUE
	 * @generated
	 * @ordered
	 */
	ADDITIVE(0, "ADDITIVE", "ADDITIVE"),

	/**
	 * The '<em><b>MULTIPLICATIVE</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * value * step or value / step with a step factor above 1.
	 * <!-- end-model-doc -->
	 * @see #MULTIPLICATIVE_VALUE
	 * @generated
	 * @ordered
	 */
	MULTIPLICATIVE(1, "MULTIPLICATIVE", "MULTIPLICATIVE");

	/**
	 * The '<em><b>ADDITIVE</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * value +/- step.
	 * <!-- end-model-doc -->
	 * @see #ADDITIVE
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int ADDITIVE_VALUE = 0;

	/**
	 * The '<em><b>MULTIPLICATIVE</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * value * step or value / step with a step factor above 1.
	 * <!-- end-model-doc -->
	 * @see #MULTIPLICATIVE
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int MULTIPLICATIVE_VALUE = 1;

	/**
	 * An array of all the '<em><b>Step Mode</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final StepMode[] VALUES_ARRAY =
		new StepMode[] {
			ADDITIVE,
			MULTIPLICATIVE,
		};

	/**
	 * A public read-only list of all the '<em><b>Step Mode</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<StepMode> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Step Mode</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static StepMode get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			StepMode result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Step Mode</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static StepMode getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			StepMode result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Step Mode</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static StepMode get(int value) {
		switch (value) {
			case ADDITIVE_VALUE: return ADDITIVE;
			case MULTIPLICATIVE_VALUE: return MULTIPLICATIVE;
		}
		return null;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private final int value;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private final String name;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private final String literal;

	/**
	 * Only this class can construct instances.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private StepMode(int value, String name, String literal) {
		this.value = value;
		this.name = name;
		this.literal = literal;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getValue() {
	  return value;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getName() {
	  return name;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getLiteral() {
	  return literal;
	}

	/**
	 * Returns the literal value of the enumerator, which is its string representation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String toString() {
		return literal;
	}
	
} //StepMode
