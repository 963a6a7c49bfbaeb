/**
 */
package org.tracegas.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Instrument</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * An FTIR analyzer of the laboratory with the optical figures a result depends on. Its name and serial number identify it; the figures are fixed for one instrument record, so a changed set-up is recorded as another instrument.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.Instrument#getName <em>Name</em>}</li>
 *   <li>{@link org.tracegas.model.Instrument#getSerialNumber <em>Serial Number</em>}</li>
 *   <li>{@link org.tracegas.model.Instrument#getLaserWavenumber <em>Laser Wavenumber</em>}</li>
 *   <li>{@link org.tracegas.model.Instrument#getMaxPathDifference <em>Max Path Difference</em>}</li>
 *   <li>{@link org.tracegas.model.Instrument#getFieldOfView <em>Field Of View</em>}</li>
 *   <li>{@link org.tracegas.model.Instrument#getCellPathLength <em>Cell Path Length</em>}</li>
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
	 * <!-- begin-model-doc -->
	 * The lab's name of the instrument.
	 * <!-- end-model-doc -->
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
	 * <!-- begin-model-doc -->
	 * The maker's serial number; with the name, unique in the workspace.
	 * <!-- end-model-doc -->
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
	 * Returns the value of the '<em><b>Laser Wavenumber</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Wavenumber of the reference laser that samples the interferogram, in cm-1.
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
	 * Returns the value of the '<em><b>Max Path Difference</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Maximum optical path difference of the interferometer, in cm; the nominal resolution is its reciprocal, in cm-1.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Max Path Difference</em>' attribute.
	 * @see #setMaxPathDifference(double)
	 * @see org.tracegas.model.WorkspacePackage#getInstrument_MaxPathDifference()
	 * @model
	 * @generated
	 */
	double getMaxPathDifference();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Instrument#getMaxPathDifference <em>Max Path Difference</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Max Path Difference</em>' attribute.
	 * @see #getMaxPathDifference()
	 * @generated
	 */
	void setMaxPathDifference(double value);

	/**
	 * Returns the value of the '<em><b>Field Of View</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Half-angle of the beam's field of view in the interferometer, in mrad; unset when not known.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Field Of View</em>' attribute.
	 * @see #isSetFieldOfView()
	 * @see #unsetFieldOfView()
	 * @see #setFieldOfView(double)
	 * @see org.tracegas.model.WorkspacePackage#getInstrument_FieldOfView()
	 * @model unsettable="true"
	 * @generated
	 */
	double getFieldOfView();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Instrument#getFieldOfView <em>Field Of View</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Field Of View</em>' attribute.
	 * @see #isSetFieldOfView()
	 * @see #unsetFieldOfView()
	 * @see #getFieldOfView()
	 * @generated
	 */
	void setFieldOfView(double value);

	/**
	 * Unsets the value of the '{@link org.tracegas.model.Instrument#getFieldOfView <em>Field Of View</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetFieldOfView()
	 * @see #getFieldOfView()
	 * @see #setFieldOfView(double)
	 * @generated
	 */
	void unsetFieldOfView();

	/**
	 * Returns whether the value of the '{@link org.tracegas.model.Instrument#getFieldOfView <em>Field Of View</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Field Of View</em>' attribute is set.
	 * @see #unsetFieldOfView()
	 * @see #getFieldOfView()
	 * @see #setFieldOfView(double)
	 * @generated
	 */
	boolean isSetFieldOfView();

	/**
	 * Returns the value of the '<em><b>Cell Path Length</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Optical path length through the gas in the cell, in m.
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

} // Instrument
