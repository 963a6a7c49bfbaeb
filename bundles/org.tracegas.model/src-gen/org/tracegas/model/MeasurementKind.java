/**
 */
package org.tracegas.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Measurement Kind</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * Purpose of a measurement.
 * <!-- end-model-doc -->
 * @see org.tracegas.model.WorkspacePackage#getMeasurementKind()
 * @model
 * @generated
 */
public enum MeasurementKind implements Enumerator {
	/**
	 * The '<em><b>SAMPLE</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SAMPLE_VALUE
	 * @generated
	 * @ordered
	 */
	SAMPLE(0, "SAMPLE", "SAMPLE"),

	/**
	 * The '<em><b>BACKGROUND</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #BACKGROUND_VALUE
	 * @generated
	 * @ordered
	 */
	BACKGROUND(1, "BACKGROUND", "BACKGROUND"),

	/**
	 * The '<em><b>CALIBRATION TRANSFER STANDARD</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #CALIBRATION_TRANSFER_STANDARD_VALUE
	 * @generated
	 * @ordered
	 */
	CALIBRATION_TRANSFER_STANDARD(2, "CALIBRATION_TRANSFER_STANDARD", "CALIBRATION_TRANSFER_STANDARD"),

	/**
	 * The '<em><b>SPIKE</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SPIKE_VALUE
	 * @generated
	 * @ordered
	 */
	SPIKE(3, "SPIKE", "SPIKE"),

	/**
	 * The '<em><b>ZERO</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #ZERO_VALUE
	 * @generated
	 * @ordered
	 */
	ZERO(4, "ZERO", "ZERO"),

	/**
	 * The '<em><b>SPAN</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SPAN_VALUE
	 * @generated
	 * @ordered
	 */
	SPAN(5, "SPAN", "SPAN");

	/**
	 * The '<em><b>SAMPLE</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SAMPLE
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int SAMPLE_VALUE = 0;

	/**
	 * The '<em><b>BACKGROUND</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #BACKGROUND
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int BACKGROUND_VALUE = 1;

	/**
	 * The '<em><b>CALIBRATION TRANSFER STANDARD</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #CALIBRATION_TRANSFER_STANDARD
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int CALIBRATION_TRANSFER_STANDARD_VALUE = 2;

	/**
	 * The '<em><b>SPIKE</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SPIKE
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int SPIKE_VALUE = 3;

	/**
	 * The '<em><b>ZERO</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #ZERO
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int ZERO_VALUE = 4;

	/**
	 * The '<em><b>SPAN</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SPAN
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int SPAN_VALUE = 5;

	/**
	 * An array of all the '<em><b>Measurement Kind</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final MeasurementKind[] VALUES_ARRAY =
		new MeasurementKind[] {
			SAMPLE,
			BACKGROUND,
			CALIBRATION_TRANSFER_STANDARD,
			SPIKE,
			ZERO,
			SPAN,
		};

	/**
	 * A public read-only list of all the '<em><b>Measurement Kind</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<MeasurementKind> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Measurement Kind</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static MeasurementKind get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			MeasurementKind result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Measurement Kind</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static MeasurementKind getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			MeasurementKind result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Measurement Kind</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static MeasurementKind get(int value) {
		switch (value) {
			case SAMPLE_VALUE: return SAMPLE;
			case BACKGROUND_VALUE: return BACKGROUND;
			case CALIBRATION_TRANSFER_STANDARD_VALUE: return CALIBRATION_TRANSFER_STANDARD;
			case SPIKE_VALUE: return SPIKE;
			case ZERO_VALUE: return ZERO;
			case SPAN_VALUE: return SPAN;
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
	private MeasurementKind(int value, String name, String literal) {
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
	
} //MeasurementKind
