/**
 */
package limen.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Psychometric Family</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * Shape of a psychometric function.
 * <!-- end-model-doc -->
 * @see limen.model.LimenPackage#getPsychometricFamily()
 * @model
 * @generated
 */
public enum PsychometricFamily implements Enumerator {
	/**
	 * The '<em><b>LOGISTIC</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Logistic function.
	 * <!-- end-model-doc -->
	 * @see #LOGISTIC_VALUE
	 * @generated
	 * @ordered
	 */
	LOGISTIC(0, "LOGISTIC", "LOGISTIC"),

	/**
	 * The '<em><b>CUMULATIVE NORMAL</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Cumulative normal (probit).
	 * <!-- end-model-doc -->
	 * @see #CUMULATIVE_NORMAL_VALUE
	 * @generated
	 * @ordered
	 */
	CUMULATIVE_NORMAL(1, "CUMULATIVE_NORMAL", "CUMULATIVE_NORMAL"),

	/**
	 * The '<em><b>WEIBULL</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Weibull function (a Gumbel on a log axis).
	 * <!-- end-model-doc -->
	 * @see #WEIBULL_VALUE
	 * @generated
	 * @ordered
	 */
	WEIBULL(2, "WEIBULL", "WEIBULL");

	/**
	 * The '<em><b>LOGISTIC</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Logistic function.
	 * <!-- end-model-doc -->
	 * @see #LOGISTIC
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int LOGISTIC_VALUE = 0;

	/**
	 * The '<em><b>CUMULATIVE NORMAL</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Cumulative normal (probit).
	 * <!-- end-model-doc -->
	 * @see #CUMULATIVE_NORMAL
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int CUMULATIVE_NORMAL_VALUE = 1;

	/**
	 * The '<em><b>WEIBULL</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Weibull function (a Gumbel on a log axis).
	 * <!-- end-model-doc -->
	 * @see #WEIBULL
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int WEIBULL_VALUE = 2;

	/**
	 * An array of all the '<em><b>Psychometric Family</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final PsychometricFamily[] VALUES_ARRAY =
		new PsychometricFamily[] {
			LOGISTIC,
			CUMULATIVE_NORMAL,
			WEIBULL,
		};

	/**
	 * A public read-only list of all the '<em><b>Psychometric Family</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<PsychometricFamily> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Psychometric Family</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static PsychometricFamily get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			PsychometricFamily result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Psychometric Family</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static PsychometricFamily getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			PsychometricFamily result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Psychometric Family</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static PsychometricFamily get(int value) {
		switch (value) {
			case LOGISTIC_VALUE: return LOGISTIC;
			case CUMULATIVE_NORMAL_VALUE: return CUMULATIVE_NORMAL;
			case WEIBULL_VALUE: return WEIBULL;
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
	private PsychometricFamily(int value, String name, String literal) {
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
	
} //PsychometricFamily
