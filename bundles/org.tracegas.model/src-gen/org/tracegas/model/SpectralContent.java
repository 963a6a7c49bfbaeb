/**
 */
package org.tracegas.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Spectral Content</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * What a stored spectral array holds.
 * <!-- end-model-doc -->
 * @see org.tracegas.model.WorkspacePackage#getSpectralContent()
 * @model
 * @generated
 */
public enum SpectralContent implements Enumerator {
	/**
	 * The '<em><b>INTERFEROGRAM</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #INTERFEROGRAM_VALUE
	 * @generated
	 * @ordered
	 */
	INTERFEROGRAM(0, "INTERFEROGRAM", "INTERFEROGRAM"),

	/**
	 * The '<em><b>SINGLE BEAM</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SINGLE_BEAM_VALUE
	 * @generated
	 * @ordered
	 */
	SINGLE_BEAM(1, "SINGLE_BEAM", "SINGLE_BEAM"),

	/**
	 * The '<em><b>TRANSMITTANCE</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #TRANSMITTANCE_VALUE
	 * @generated
	 * @ordered
	 */
	TRANSMITTANCE(2, "TRANSMITTANCE", "TRANSMITTANCE"),

	/**
	 * The '<em><b>ABSORBANCE</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #ABSORBANCE_VALUE
	 * @generated
	 * @ordered
	 */
	ABSORBANCE(3, "ABSORBANCE", "ABSORBANCE"),

	/**
	 * The '<em><b>RESIDUAL</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #RESIDUAL_VALUE
	 * @generated
	 * @ordered
	 */
	RESIDUAL(4, "RESIDUAL", "RESIDUAL");

	/**
	 * The '<em><b>INTERFEROGRAM</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #INTERFEROGRAM
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int INTERFEROGRAM_VALUE = 0;

	/**
	 * The '<em><b>SINGLE BEAM</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SINGLE_BEAM
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int SINGLE_BEAM_VALUE = 1;

	/**
	 * The '<em><b>TRANSMITTANCE</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #TRANSMITTANCE
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int TRANSMITTANCE_VALUE = 2;

	/**
	 * The '<em><b>ABSORBANCE</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #ABSORBANCE
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int ABSORBANCE_VALUE = 3;

	/**
	 * The '<em><b>RESIDUAL</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #RESIDUAL
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int RESIDUAL_VALUE = 4;

	/**
	 * An array of all the '<em><b>Spectral Content</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final SpectralContent[] VALUES_ARRAY =
		new SpectralContent[] {
			INTERFEROGRAM,
			SINGLE_BEAM,
			TRANSMITTANCE,
			ABSORBANCE,
			RESIDUAL,
		};

	/**
	 * A public read-only list of all the '<em><b>Spectral Content</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<SpectralContent> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Spectral Content</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static SpectralContent get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			SpectralContent result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Spectral Content</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static SpectralContent getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			SpectralContent result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Spectral Content</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static SpectralContent get(int value) {
		switch (value) {
			case INTERFEROGRAM_VALUE: return INTERFEROGRAM;
			case SINGLE_BEAM_VALUE: return SINGLE_BEAM;
			case TRANSMITTANCE_VALUE: return TRANSMITTANCE;
			case ABSORBANCE_VALUE: return ABSORBANCE;
			case RESIDUAL_VALUE: return RESIDUAL;
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
	private SpectralContent(int value, String name, String literal) {
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
	
} //SpectralContent
