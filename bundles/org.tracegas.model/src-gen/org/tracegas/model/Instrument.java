/**
 */
package org.tracegas.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Instrument</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * An FTIR spectrometer with its gas cell.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.Instrument#getName <em>Name</em>}</li>
 *   <li>{@link org.tracegas.model.Instrument#getSerialNumber <em>Serial Number</em>}</li>
 *   <li>{@link org.tracegas.model.Instrument#getCellPathLength <em>Cell Path Length</em>}</li>
 *   <li>{@link org.tracegas.model.Instrument#getCellTemperature <em>Cell Temperature</em>}</li>
 *   <li>{@link org.tracegas.model.Instrument#getResolution <em>Resolution</em>}</li>
 *   <li>{@link org.tracegas.model.Instrument#getLaserWavenumber <em>Laser Wavenumber</em>}</li>
 *   <li>{@link org.tracegas.model.Instrument#getDetector <em>Detector</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getInstrument()
 * @model
 * @generated
 */
public interface Instrument extends StoredObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see org.tracegas.model.WorkspacePackage#getInstrument_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Instrument#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Serial Number</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Serial Number</em>' attribute.
	 * @see #setSerialNumber(String)
	 * @see org.tracegas.model.WorkspacePackage#getInstrument_SerialNumber()
	 * @model
	 * @generated
	 */
	String getSerialNumber();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Instrument#getSerialNumber <em>Serial Number</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Serial Number</em>' attribute.
	 * @see #getSerialNumber()
	 * @generated
	 */
	void setSerialNumber(String value);

	/**
	 * Returns the value of the '<em><b>Cell Path Length</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Optical path length of the gas cell, in m.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Cell Path Length</em>' attribute.
	 * @see #setCellPathLength(double)
	 * @see org.tracegas.model.WorkspacePackage#getInstrument_CellPathLength()
	 * @model
	 * @generated
	 */
	double getCellPathLength();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Instrument#getCellPathLength <em>Cell Path Length</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Cell Path Length</em>' attribute.
	 * @see #getCellPathLength()
	 * @generated
	 */
	void setCellPathLength(double value);

	/**
	 * Returns the value of the '<em><b>Cell Temperature</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Set-point temperature of the gas cell, in K.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Cell Temperature</em>' attribute.
	 * @see #setCellTemperature(double)
	 * @see org.tracegas.model.WorkspacePackage#getInstrument_CellTemperature()
	 * @model
	 * @generated
	 */
	double getCellTemperature();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Instrument#getCellTemperature <em>Cell Temperature</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Cell Temperature</em>' attribute.
	 * @see #getCellTemperature()
	 * @generated
	 */
	void setCellTemperature(double value);

	/**
	 * Returns the value of the '<em><b>Resolution</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Nominal spectral resolution, in cm-1.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Resolution</em>' attribute.
	 * @see #setResolution(double)
	 * @see org.tracegas.model.WorkspacePackage#getInstrument_Resolution()
	 * @model
	 * @generated
	 */
	double getResolution();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Instrument#getResolution <em>Resolution</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Resolution</em>' attribute.
	 * @see #getResolution()
	 * @generated
	 */
	void setResolution(double value);

	/**
	 * Returns the value of the '<em><b>Laser Wavenumber</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Wavenumber of the reference laser, in cm-1.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Laser Wavenumber</em>' attribute.
	 * @see #setLaserWavenumber(double)
	 * @see org.tracegas.model.WorkspacePackage#getInstrument_LaserWavenumber()
	 * @model
	 * @generated
	 */
	double getLaserWavenumber();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Instrument#getLaserWavenumber <em>Laser Wavenumber</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Laser Wavenumber</em>' attribute.
	 * @see #getLaserWavenumber()
	 * @generated
	 */
	void setLaserWavenumber(double value);

	/**
	 * Returns the value of the '<em><b>Detector</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracegas.model.DetectorType}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Detector</em>' attribute.
	 * @see org.tracegas.model.DetectorType
	 * @see #setDetector(DetectorType)
	 * @see org.tracegas.model.WorkspacePackage#getInstrument_Detector()
	 * @model
	 * @generated
	 */
	DetectorType getDetector();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Instrument#getDetector <em>Detector</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Detector</em>' attribute.
	 * @see org.tracegas.model.DetectorType
	 * @see #getDetector()
	 * @generated
	 */
	void setDetector(DetectorType value);

} // Instrument
