/**
 */
package org.tracegas.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Result Flag</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * Qualifier of a result.
 * <!-- end-model-doc -->
 * @see org.tracegas.model.WorkspacePackage#getResultFlag()
 * @model
 * @generated
 */
public enum ResultFlag implements Enumerator {
	/**
	 * The '<em><b>BELOW DETECTION LIMIT</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #BELOW_DETECTION_LIMIT_VALUE
	 * @generated
	 * @ordered
	 */
	BELOW_DETECTION_LIMIT(0, "BELOW_DETECTION_LIMIT", "BELOW_DETECTION_LIMIT"),

	/**
	 * The '<em><b>ABOVE CALIBRATED RANGE</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #ABOVE_CALIBRATED_RANGE_VALUE
	 * @generated
	 * @ordered
	 */
	ABOVE_CALIBRATED_RANGE(1, "ABOVE_CALIBRATED_RANGE", "ABOVE_CALIBRATED_RANGE"),

	/**
	 * The '<em><b>HIGH RESIDUAL</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #HIGH_RESIDUAL_VALUE
	 * @generated
	 * @ordered
	 */
	HIGH_RESIDUAL(2, "HIGH_RESIDUAL", "HIGH_RESIDUAL"),

	/**
	 * The '<em><b>INTERFERENCE</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #INTERFERENCE_VALUE
	 * @generated
	 * @ordered
	 */
	INTERFERENCE(3, "INTERFERENCE", "INTERFERENCE"),

	/**
	 * The '<em><b>SATURATED</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SATURATED_VALUE
	 * @generated
	 * @ordered
	 */
	SATURATED(4, "SATURATED", "SATURATED"),

	/**
	 * The '<em><b>QA FAILED</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #QA_FAILED_VALUE
	 * @generated
	 * @ordered
	 */
	QA_FAILED(5, "QA_FAILED", "QA_FAILED"),

	/**
	 * The '<em><b>NEGATIVE BEYOND DETECTION LIMIT</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #NEGATIVE_BEYOND_DETECTION_LIMIT_VALUE
	 * @generated
	 * @ordered
	 */
	NEGATIVE_BEYOND_DETECTION_LIMIT(6, "NEGATIVE_BEYOND_DETECTION_LIMIT", "NEGATIVE_BEYOND_DETECTION_LIMIT"),

	/**
	 * The '<em><b>BACKGROUND TOO OLD</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #BACKGROUND_TOO_OLD_VALUE
	 * @generated
	 * @ordered
	 */
	BACKGROUND_TOO_OLD(7, "BACKGROUND_TOO_OLD", "BACKGROUND_TOO_OLD"),

	/**
	 * The '<em><b>NOT CONVERGED</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #NOT_CONVERGED_VALUE
	 * @generated
	 * @ordered
	 */
	NOT_CONVERGED(8, "NOT_CONVERGED", "NOT_CONVERGED");

	/**
	 * The '<em><b>BELOW DETECTION LIMIT</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #BELOW_DETECTION_LIMIT
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int BELOW_DETECTION_LIMIT_VALUE = 0;

	/**
	 * The '<em><b>ABOVE CALIBRATED RANGE</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #ABOVE_CALIBRATED_RANGE
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int ABOVE_CALIBRATED_RANGE_VALUE = 1;

	/**
	 * The '<em><b>HIGH RESIDUAL</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #HIGH_RESIDUAL
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int HIGH_RESIDUAL_VALUE = 2;

	/**
	 * The '<em><b>INTERFERENCE</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #INTERFERENCE
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int INTERFERENCE_VALUE = 3;

	/**
	 * The '<em><b>SATURATED</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SATURATED
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int SATURATED_VALUE = 4;

	/**
	 * The '<em><b>QA FAILED</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #QA_FAILED
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int QA_FAILED_VALUE = 5;

	/**
	 * The '<em><b>NEGATIVE BEYOND DETECTION LIMIT</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #NEGATIVE_BEYOND_DETECTION_LIMIT
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int NEGATIVE_BEYOND_DETECTION_LIMIT_VALUE = 6;

	/**
	 * The '<em><b>BACKGROUND TOO OLD</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #BACKGROUND_TOO_OLD
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int BACKGROUND_TOO_OLD_VALUE = 7;

	/**
	 * The '<em><b>NOT CONVERGED</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #NOT_CONVERGED
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int NOT_CONVERGED_VALUE = 8;

	/**
	 * An array of all the '<em><b>Result Flag</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final ResultFlag[] VALUES_ARRAY =
		new ResultFlag[] {
			BELOW_DETECTION_LIMIT,
			ABOVE_CALIBRATED_RANGE,
			HIGH_RESIDUAL,
			INTERFERENCE,
			SATURATED,
			QA_FAILED,
			NEGATIVE_BEYOND_DETECTION_LIMIT,
			BACKGROUND_TOO_OLD,
			NOT_CONVERGED,
		};

	/**
	 * A public read-only list of all the '<em><b>Result Flag</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<ResultFlag> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Result Flag</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ResultFlag get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			ResultFlag result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Result Flag</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ResultFlag getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			ResultFlag result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Result Flag</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ResultFlag get(int value) {
		switch (value) {
			case BELOW_DETECTION_LIMIT_VALUE: return BELOW_DETECTION_LIMIT;
			case ABOVE_CALIBRATED_RANGE_VALUE: return ABOVE_CALIBRATED_RANGE;
			case HIGH_RESIDUAL_VALUE: return HIGH_RESIDUAL;
			case INTERFERENCE_VALUE: return INTERFERENCE;
			case SATURATED_VALUE: return SATURATED;
			case QA_FAILED_VALUE: return QA_FAILED;
			case NEGATIVE_BEYOND_DETECTION_LIMIT_VALUE: return NEGATIVE_BEYOND_DETECTION_LIMIT;
			case BACKGROUND_TOO_OLD_VALUE: return BACKGROUND_TOO_OLD;
			case NOT_CONVERGED_VALUE: return NOT_CONVERGED;
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
	private ResultFlag(int value, String name, String literal) {
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
	
} //ResultFlag
