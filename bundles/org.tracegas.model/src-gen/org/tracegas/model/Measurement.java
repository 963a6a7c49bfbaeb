/**
 */
package org.tracegas.model;

import java.time.Instant;

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

} // Measurement
