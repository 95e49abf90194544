/**
 */
package limen.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Quantity Unit</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * Unit of a varied quantity.
 * <!-- end-model-doc -->
 * @see limen.model.LimenPackage#getQuantityUnit()
 * @model
 * @generated
 */
public enum QuantityUnit implements Enumerator {
	/**
	 * The '<em><b>HZ</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Hertz (frequency difference).
	 * <!-- end-model-doc -->
	 * @see #HZ_VALUE
	 * @generated
	 * @ordered
	 */
	HZ(0, "HZ", "HZ"),

	/**
	 * The '<em><b>PERCENT</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Percent of the standard frequency.
	 * <!-- end-model-doc -->
	 * @see #PERCENT_VALUE
	 * @generated
	 * @ordered
	 */
	PERCENT(1, "PERCENT", "PERCENT"),

	/**
	 * The '<em><b>CENTS</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Cents (1/1200 of an octave) above the standard frequency.
	 * <!-- end-model-doc -->
	 * @see #CENTS_VALUE
	 * @generated
	 * @ordered
	 */
	CENTS(2, "CENTS", "CENTS"),

	/**
	 * The '<em><b>DB</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Decibels (a level difference).
	 * <!-- end-model-doc -->
	 * @see #DB_VALUE
	 * @generated
	 * @ordered
	 */
	DB(3, "DB", "DB"),

	/**
	 * The '<em><b>DB SPL</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Decibels sound pressure level re 20 micropascal (an absolute level).
	 * <!-- end-model-doc -->
	 * @see #DB_SPL_VALUE
	 * @generated
	 * @ordered
	 */
	DB_SPL(4, "DB_SPL", "DB_SPL");

	/**
	 * The '<em><b>HZ</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Hertz (frequency difference).
	 * <!-- end-model-doc -->
	 * @see #HZ
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int HZ_VALUE = 0;

	/**
	 * The '<em><b>PERCENT</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Percent of the standard frequency.
	 * <!-- end-model-doc -->
	 * @see #PERCENT
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int PERCENT_VALUE = 1;

	/**
	 * The '<em><b>CENTS</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Cents (1/1200 of an octave) above the standard frequency.
	 * <!-- end-model-doc -->
	 * @see #CENTS
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int CENTS_VALUE = 2;

	/**
	 * The '<em><b>DB</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Decibels (a level difference).
	 * <!-- end-model-doc -->
	 * @see #DB
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int DB_VALUE = 3;

	/**
	 * The '<em><b>DB SPL</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Decibels sound pressure level re 20 micropascal (an absolute level).
	 * <!-- end-model-doc -->
	 * @see #DB_SPL
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int DB_SPL_VALUE = 4;

	/**
	 * An array of all the '<em><b>Quantity Unit</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final QuantityUnit[] VALUES_ARRAY =
		new QuantityUnit[] {
			HZ,
			PERCENT,
			CENTS,
			DB,
			DB_SPL,
		};

	/**
	 * A public read-only list of all the '<em><b>Quantity Unit</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<QuantityUnit> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Quantity Unit</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static QuantityUnit get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			QuantityUnit result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Quantity Unit</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static QuantityUnit getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			QuantityUnit result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Quantity Unit</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static QuantityUnit get(int value) {
		switch (value) {
			case HZ_VALUE: return HZ;
			case PERCENT_VALUE: return PERCENT;
			case CENTS_VALUE: return CENTS;
			case DB_VALUE: return DB;
			case DB_SPL_VALUE: return DB_SPL;
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
	private QuantityUnit(int value, String name, String literal) {
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
	
} //QuantityUnit
