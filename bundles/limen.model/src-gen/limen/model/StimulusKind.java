/**
 */
package limen.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Stimulus Kind</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * What a step measures.
 * <!-- end-model-doc -->
 * @see limen.model.LimenPackage#getStimulusKind()
 * @model
 * @generated
 */
public enum StimulusKind implements Enumerator {
	/**
	 * The '<em><b>FREQUENCY DISCRIMINATION</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Smallest detectable frequency difference between a standard tone and a higher comparison tone.
	 * <!-- end-model-doc -->
	 * @see #FREQUENCY_DISCRIMINATION_VALUE
	 * @generated
	 * @ordered
	 */
	FREQUENCY_DISCRIMINATION(0, "FREQUENCY_DISCRIMINATION", "FREQUENCY_DISCRIMINATION"),

	/**
	 * The '<em><b>INTENSITY DISCRIMINATION</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Smallest detectable level increment over the standard tone.
	 * <!-- end-model-doc -->
	 * @see #INTENSITY_DISCRIMINATION_VALUE
	 * @generated
	 * @ordered
	 */
	INTENSITY_DISCRIMINATION(1, "INTENSITY_DISCRIMINATION", "INTENSITY_DISCRIMINATION"),

	/**
	 * The '<em><b>DETECTION QUIET</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Absolute threshold of the tone in quiet.
	 * <!-- end-model-doc -->
	 * @see #DETECTION_QUIET_VALUE
	 * @generated
	 * @ordered
	 */
	DETECTION_QUIET(2, "DETECTION_QUIET", "DETECTION_QUIET"),

	/**
	 * The '<em><b>DETECTION NOISE</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Masked threshold of the tone in a noise band.
	 * <!-- end-model-doc -->
	 * @see #DETECTION_NOISE_VALUE
	 * @generated
	 * @ordered
	 */
	DETECTION_NOISE(3, "DETECTION_NOISE", "DETECTION_NOISE");

	/**
	 * The '<em><b>FREQUENCY DISCRIMINATION</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Smallest detectable frequency difference between a standard tone and a higher comparison tone.
	 * <!-- end-model-doc -->
	 * @see #FREQUENCY_DISCRIMINATION
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int FREQUENCY_DISCRIMINATION_VALUE = 0;

	/**
	 * The '<em><b>INTENSITY DISCRIMINATION</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Smallest detectable level increment over the standard tone.
	 * <!-- end-model-doc -->
	 * @see #INTENSITY_DISCRIMINATION
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int INTENSITY_DISCRIMINATION_VALUE = 1;

	/**
	 * The '<em><b>DETECTION QUIET</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Absolute threshold of the tone in quiet.
	 * <!-- end-model-doc -->
	 * @see #DETECTION_QUIET
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int DETECTION_QUIET_VALUE = 2;

	/**
	 * The '<em><b>DETECTION NOISE</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Masked threshold of the tone in a noise band.
	 * <!-- end-model-doc -->
	 * @see #DETECTION_NOISE
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int DETECTION_NOISE_VALUE = 3;

	/**
	 * An array of all the '<em><b>Stimulus Kind</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final StimulusKind[] VALUES_ARRAY =
		new StimulusKind[] {
			FREQUENCY_DISCRIMINATION,
			INTENSITY_DISCRIMINATION,
			DETECTION_QUIET,
			DETECTION_NOISE,
		};

	/**
	 * A public read-only list of all the '<em><b>Stimulus Kind</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<StimulusKind> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Stimulus Kind</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static StimulusKind get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			StimulusKind result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Stimulus Kind</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static StimulusKind getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			StimulusKind result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Stimulus Kind</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static StimulusKind get(int value) {
		switch (value) {
			case FREQUENCY_DISCRIMINATION_VALUE: return FREQUENCY_DISCRIMINATION;
			case INTENSITY_DISCRIMINATION_VALUE: return INTENSITY_DISCRIMINATION;
			case DETECTION_QUIET_VALUE: return DETECTION_QUIET;
			case DETECTION_NOISE_VALUE: return DETECTION_NOISE;
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
	private StimulusKind(int value, String name, String literal) {
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
	
} //StimulusKind
