/**
 */
package org.tracegas.model;

import java.time.Instant;

import org.eclipse.emf.common.util.EList;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Measurement</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * One recorded spectrum acquisition with its conditions.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.Measurement#getKind <em>Kind</em>}</li>
 *   <li>{@link org.tracegas.model.Measurement#getTime <em>Time</em>}</li>
 *   <li>{@link org.tracegas.model.Measurement#getCellTemperature <em>Cell Temperature</em>}</li>
 *   <li>{@link org.tracegas.model.Measurement#getCellPressure <em>Cell Pressure</em>}</li>
 *   <li>{@link org.tracegas.model.Measurement#getOperator <em>Operator</em>}</li>
 *   <li>{@link org.tracegas.model.Measurement#getInstrument <em>Instrument</em>}</li>
 *   <li>{@link org.tracegas.model.Measurement#getSource <em>Source</em>}</li>
 *   <li>{@link org.tracegas.model.Measurement#getData <em>Data</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getMeasurement()
 * @model
 * @generated
 */
public interface Measurement extends StoredObject {
	/**
	 * Returns the value of the '<em><b>Kind</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracegas.model.MeasurementKind}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Kind</em>' attribute.
	 * @see org.tracegas.model.MeasurementKind
	 * @see #setKind(MeasurementKind)
	 * @see org.tracegas.model.WorkspacePackage#getMeasurement_Kind()
	 * @model
	 * @generated
	 */
	MeasurementKind getKind();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Measurement#getKind <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Kind</em>' attribute.
	 * @see org.tracegas.model.MeasurementKind
	 * @see #getKind()
	 * @generated
	 */
	void setKind(MeasurementKind value);

	/**
	 * Returns the value of the '<em><b>Time</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Start of the acquisition.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Time</em>' attribute.
	 * @see #setTime(Instant)
	 * @see org.tracegas.model.WorkspacePackage#getMeasurement_Time()
	 * @model dataType="org.tracegas.model.Instant"
	 * @generated
	 */
	Instant getTime();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Measurement#getTime <em>Time</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Time</em>' attribute.
	 * @see #getTime()
	 * @generated
	 */
	void setTime(Instant value);

	/**
	 * Returns the value of the '<em><b>Cell Temperature</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Measured cell temperature, in K.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Cell Temperature</em>' attribute.
	 * @see #setCellTemperature(double)
	 * @see org.tracegas.model.WorkspacePackage#getMeasurement_CellTemperature()
	 * @model
	 * @generated
	 */
	double getCellTemperature();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Measurement#getCellTemperature <em>Cell Temperature</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Cell Temperature</em>' attribute.
	 * @see #getCellTemperature()
	 * @generated
	 */
	void setCellTemperature(double value);

	/**
	 * Returns the value of the '<em><b>Cell Pressure</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Measured cell pressure, in hPa.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Cell Pressure</em>' attribute.
	 * @see #setCellPressure(double)
	 * @see org.tracegas.model.WorkspacePackage#getMeasurement_CellPressure()
	 * @model
	 * @generated
	 */
	double getCellPressure();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Measurement#getCellPressure <em>Cell Pressure</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Cell Pressure</em>' attribute.
	 * @see #getCellPressure()
	 * @generated
	 */
	void setCellPressure(double value);

	/**
	 * Returns the value of the '<em><b>Operator</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Operator</em>' reference.
	 * @see #setOperator(User)
	 * @see org.tracegas.model.WorkspacePackage#getMeasurement_Operator()
	 * @model
	 * @generated
	 */
	User getOperator();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Measurement#getOperator <em>Operator</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Operator</em>' reference.
	 * @see #getOperator()
	 * @generated
	 */
	void setOperator(User value);

	/**
	 * Returns the value of the '<em><b>Instrument</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Instrument</em>' reference.
	 * @see #setInstrument(Instrument)
	 * @see org.tracegas.model.WorkspacePackage#getMeasurement_Instrument()
	 * @model
	 * @generated
	 */
	Instrument getInstrument();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Measurement#getInstrument <em>Instrument</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Instrument</em>' reference.
	 * @see #getInstrument()
	 * @generated
	 */
	void setInstrument(Instrument value);

	/**
	 * Returns the value of the '<em><b>Source</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Source</em>' reference.
	 * @see #setSource(EmissionSource)
	 * @see org.tracegas.model.WorkspacePackage#getMeasurement_Source()
	 * @model
	 * @generated
	 */
	EmissionSource getSource();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Measurement#getSource <em>Source</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Source</em>' reference.
	 * @see #getSource()
	 * @generated
	 */
	void setSource(EmissionSource value);

	/**
	 * Returns the value of the '<em><b>Data</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracegas.model.SpectralDataRef}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Stored spectral arrays of this measurement (interferogram, single beam, absorbance).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Data</em>' containment reference list.
	 * @see org.tracegas.model.WorkspacePackage#getMeasurement_Data()
	 * @model containment="true"
	 * @generated
	 */
	EList<SpectralDataRef> getData();

} // Measurement
