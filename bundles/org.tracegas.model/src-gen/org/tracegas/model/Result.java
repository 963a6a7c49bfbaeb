/**
 */
package org.tracegas.model;

import org.eclipse.emf.common.util.EList;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Result</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * Concentration of one compound in one measurement, with what made it.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.Result#getMeasurement <em>Measurement</em>}</li>
 *   <li>{@link org.tracegas.model.Result#getCompound <em>Compound</em>}</li>
 *   <li>{@link org.tracegas.model.Result#getConcentration <em>Concentration</em>}</li>
 *   <li>{@link org.tracegas.model.Result#getUncertainty <em>Uncertainty</em>}</li>
 *   <li>{@link org.tracegas.model.Result#getDetectionLimit <em>Detection Limit</em>}</li>
 *   <li>{@link org.tracegas.model.Result#getUnit <em>Unit</em>}</li>
 *   <li>{@link org.tracegas.model.Result#getFlags <em>Flags</em>}</li>
 *   <li>{@link org.tracegas.model.Result#getMethodVersion <em>Method Version</em>}</li>
 *   <li>{@link org.tracegas.model.Result#getLibraryVersion <em>Library Version</em>}</li>
 *   <li>{@link org.tracegas.model.Result#getSoftwareVersion <em>Software Version</em>}</li>
 *   <li>{@link org.tracegas.model.Result#getInputHash <em>Input Hash</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getResult()
 * @model
 * @generated
 */
public interface Result extends StoredObject {
	/**
	 * Returns the value of the '<em><b>Measurement</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Measurement</em>' reference.
	 * @see #setMeasurement(Measurement)
	 * @see org.tracegas.model.WorkspacePackage#getResult_Measurement()
	 * @model
	 * @generated
	 */
	Measurement getMeasurement();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Result#getMeasurement <em>Measurement</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Measurement</em>' reference.
	 * @see #getMeasurement()
	 * @generated
	 */
	void setMeasurement(Measurement value);

	/**
	 * Returns the value of the '<em><b>Compound</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Compound</em>' attribute.
	 * @see #setCompound(String)
	 * @see org.tracegas.model.WorkspacePackage#getResult_Compound()
	 * @model
	 * @generated
	 */
	String getCompound();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Result#getCompound <em>Compound</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Compound</em>' attribute.
	 * @see #getCompound()
	 * @generated
	 */
	void setCompound(String value);

	/**
	 * Returns the value of the '<em><b>Concentration</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Concentration</em>' attribute.
	 * @see #setConcentration(double)
	 * @see org.tracegas.model.WorkspacePackage#getResult_Concentration()
	 * @model
	 * @generated
	 */
	double getConcentration();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Result#getConcentration <em>Concentration</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Concentration</em>' attribute.
	 * @see #getConcentration()
	 * @generated
	 */
	void setConcentration(double value);

	/**
	 * Returns the value of the '<em><b>Uncertainty</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Expanded uncertainty, same unit as the concentration.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Uncertainty</em>' attribute.
	 * @see #setUncertainty(double)
	 * @see org.tracegas.model.WorkspacePackage#getResult_Uncertainty()
	 * @model
	 * @generated
	 */
	double getUncertainty();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Result#getUncertainty <em>Uncertainty</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Uncertainty</em>' attribute.
	 * @see #getUncertainty()
	 * @generated
	 */
	void setUncertainty(double value);

	/**
	 * Returns the value of the '<em><b>Detection Limit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Detection Limit</em>' attribute.
	 * @see #setDetectionLimit(double)
	 * @see org.tracegas.model.WorkspacePackage#getResult_DetectionLimit()
	 * @model
	 * @generated
	 */
	double getDetectionLimit();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Result#getDetectionLimit <em>Detection Limit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Detection Limit</em>' attribute.
	 * @see #getDetectionLimit()
	 * @generated
	 */
	void setDetectionLimit(double value);

	/**
	 * Returns the value of the '<em><b>Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Unit of concentration, uncertainty and detection limit, e.g. ppm.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Unit</em>' attribute.
	 * @see #setUnit(String)
	 * @see org.tracegas.model.WorkspacePackage#getResult_Unit()
	 * @model
	 * @generated
	 */
	String getUnit();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Result#getUnit <em>Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Unit</em>' attribute.
	 * @see #getUnit()
	 * @generated
	 */
	void setUnit(String value);

	/**
	 * Returns the value of the '<em><b>Flags</b></em>' attribute list.
	 * The list contents are of type {@link org.tracegas.model.ResultFlag}.
	 * The literals are from the enumeration {@link org.tracegas.model.ResultFlag}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Flags</em>' attribute list.
	 * @see org.tracegas.model.ResultFlag
	 * @see org.tracegas.model.WorkspacePackage#getResult_Flags()
	 * @model
	 * @generated
	 */
	EList<ResultFlag> getFlags();

	/**
	 * Returns the value of the '<em><b>Method Version</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Method Version</em>' reference.
	 * @see #setMethodVersion(MethodVersion)
	 * @see org.tracegas.model.WorkspacePackage#getResult_MethodVersion()
	 * @model
	 * @generated
	 */
	MethodVersion getMethodVersion();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Result#getMethodVersion <em>Method Version</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Method Version</em>' reference.
	 * @see #getMethodVersion()
	 * @generated
	 */
	void setMethodVersion(MethodVersion value);

	/**
	 * Returns the value of the '<em><b>Library Version</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Library Version</em>' reference.
	 * @see #setLibraryVersion(LibraryVersion)
	 * @see org.tracegas.model.WorkspacePackage#getResult_LibraryVersion()
	 * @model
	 * @generated
	 */
	LibraryVersion getLibraryVersion();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Result#getLibraryVersion <em>Library Version</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Library Version</em>' reference.
	 * @see #getLibraryVersion()
	 * @generated
	 */
	void setLibraryVersion(LibraryVersion value);

	/**
	 * Returns the value of the '<em><b>Software Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Software Version</em>' attribute.
	 * @see #setSoftwareVersion(String)
	 * @see org.tracegas.model.WorkspacePackage#getResult_SoftwareVersion()
	 * @model
	 * @generated
	 */
	String getSoftwareVersion();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Result#getSoftwareVersion <em>Software Version</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Software Version</em>' attribute.
	 * @see #getSoftwareVersion()
	 * @generated
	 */
	void setSoftwareVersion(String value);

	/**
	 * Returns the value of the '<em><b>Input Hash</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * SHA-256, hex, of the spectral input the result was computed from.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Input Hash</em>' attribute.
	 * @see #setInputHash(String)
	 * @see org.tracegas.model.WorkspacePackage#getResult_InputHash()
	 * @model
	 * @generated
	 */
	String getInputHash();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Result#getInputHash <em>Input Hash</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Input Hash</em>' attribute.
	 * @see #getInputHash()
	 * @generated
	 */
	void setInputHash(String value);

} // Result
