/**
 */
package limen.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Bayesian Variant</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * Name of the Bayesian method, for reports.
 * <!-- end-model-doc -->
 * @see limen.model.LimenPackage#getBayesianVariant()
 * @model
 * @generated
 */
public enum BayesianVariant implements Enumerator {
	/**
	 * The '<em><b>QUEST</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Watson and Pelli 1983.
	 * <!-- end-model-doc -->
	 * @see #QUEST_VALUE
	 * @generated
	 * @ordered
	 */
	QUEST(0, "QUEST", "QUEST"),

	/**
	 * The '<em><b>ZEST</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * King-Smith et al. 1994.
	 * <!-- end-model-doc -->
	 * @see #ZEST_VALUE
	 * @generated
	 * @ordered
	 */
	ZEST(1, "ZEST", "ZEST");

	/**
	 * The '<em><b>QUEST</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Watson and Pelli 1983.
	 * <!-- end-model-doc -->
	 * @see #QUEST
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int QUEST_VALUE = 0;

	/**
	 * The '<em><b>ZEST</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * King-Smith et al. 1994.
	 * <!-- end-model-doc -->
	 * @see #ZEST
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int ZEST_VALUE = 1;

	/**
	 * An array of all the '<em><b>Bayesian Variant</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final BayesianVariant[] VALUES_ARRAY =
		new BayesianVariant[] {
			QUEST,
			ZEST,
		};

	/**
	 * A public read-only list of all the '<em><b>Bayesian Variant</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<BayesianVariant> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Bayesian Variant</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static BayesianVariant get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			BayesianVariant result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Bayesian Variant</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static BayesianVariant getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			BayesianVariant result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Bayesian Variant</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static BayesianVariant get(int value) {
		switch (value) {
			case QUEST_VALUE: return QUEST;
			case ZEST_VALUE: return ZEST;
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
	private BayesianVariant(int value, String name, String literal) {
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
	
} //BayesianVariant
