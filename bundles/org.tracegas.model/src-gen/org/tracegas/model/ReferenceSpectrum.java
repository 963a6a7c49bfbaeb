/**
 */
package org.tracegas.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Reference Spectrum</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * Absorbance spectrum of one compound at known conditions.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.ReferenceSpectrum#getCompound <em>Compound</em>}</li>
 *   <li>{@link org.tracegas.model.ReferenceSpectrum#getCasNumber <em>Cas Number</em>}</li>
 *   <li>{@link org.tracegas.model.ReferenceSpectrum#getConcentrationPathLength <em>Concentration Path Length</em>}</li>
 *   <li>{@link org.tracegas.model.ReferenceSpectrum#getTemperature <em>Temperature</em>}</li>
 *   <li>{@link org.tracegas.model.ReferenceSpectrum#getPressure <em>Pressure</em>}</li>
 *   <li>{@link org.tracegas.model.ReferenceSpectrum#getResolution <em>Resolution</em>}</li>
 *   <li>{@link org.tracegas.model.ReferenceSpectrum#getApodization <em>Apodization</em>}</li>
 *   <li>{@link org.tracegas.model.ReferenceSpectrum#getData <em>Data</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getReferenceSpectrum()
 * @model
 * @generated
 */
public interface ReferenceSpectrum extends EObject {
	/**
	 * Returns the value of the '<em><b>Compound</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Compound</em>' attribute.
	 * @see #setCompound(String)
	 * @see org.tracegas.model.WorkspacePackage#getReferenceSpectrum_Compound()
	 * @model
	 * @generated
	 */
	String getCompound();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ReferenceSpectrum#getCompound <em>Compound</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Compound</em>' attribute.
	 * @see #getCompound()
	 * @generated
	 */
	void setCompound(String value);

	/**
	 * Returns the value of the '<em><b>Cas Number</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Cas Number</em>' attribute.
	 * @see #setCasNumber(String)
	 * @see org.tracegas.model.WorkspacePackage#getReferenceSpectrum_CasNumber()
	 * @model
	 * @generated
	 */
	String getCasNumber();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ReferenceSpectrum#getCasNumber <em>Cas Number</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Cas Number</em>' attribute.
	 * @see #getCasNumber()
	 * @generated
	 */
	void setCasNumber(String value);

	/**
	 * Returns the value of the '<em><b>Concentration Path Length</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Concentration times path length, in ppm·m.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Concentration Path Length</em>' attribute.
	 * @see #setConcentrationPathLength(double)
	 * @see org.tracegas.model.WorkspacePackage#getReferenceSpectrum_ConcentrationPathLength()
	 * @model
	 * @generated
	 */
	double getConcentrationPathLength();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ReferenceSpectrum#getConcentrationPathLength <em>Concentration Path Length</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Concentration Path Length</em>' attribute.
	 * @see #getConcentrationPathLength()
	 * @generated
	 */
	void setConcentrationPathLength(double value);

	/**
	 * Returns the value of the '<em><b>Temperature</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Gas temperature, in K.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Temperature</em>' attribute.
	 * @see #setTemperature(double)
	 * @see org.tracegas.model.WorkspacePackage#getReferenceSpectrum_Temperature()
	 * @model
	 * @generated
	 */
	double getTemperature();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ReferenceSpectrum#getTemperature <em>Temperature</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Temperature</em>' attribute.
	 * @see #getTemperature()
	 * @generated
	 */
	void setTemperature(double value);

	/**
	 * Returns the value of the '<em><b>Pressure</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Gas pressure, in hPa.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Pressure</em>' attribute.
	 * @see #setPressure(double)
	 * @see org.tracegas.model.WorkspacePackage#getReferenceSpectrum_Pressure()
	 * @model
	 * @generated
	 */
	double getPressure();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ReferenceSpectrum#getPressure <em>Pressure</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Pressure</em>' attribute.
	 * @see #getPressure()
	 * @generated
	 */
	void setPressure(double value);

	/**
	 * Returns the value of the '<em><b>Resolution</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Spectral resolution, in cm-1.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Resolution</em>' attribute.
	 * @see #setResolution(double)
	 * @see org.tracegas.model.WorkspacePackage#getReferenceSpectrum_Resolution()
	 * @model
	 * @generated
	 */
	double getResolution();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ReferenceSpectrum#getResolution <em>Resolution</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Resolution</em>' attribute.
	 * @see #getResolution()
	 * @generated
	 */
	void setResolution(double value);

	/**
	 * Returns the value of the '<em><b>Apodization</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Apodization</em>' attribute.
	 * @see #setApodization(String)
	 * @see org.tracegas.model.WorkspacePackage#getReferenceSpectrum_Apodization()
	 * @model
	 * @generated
	 */
	String getApodization();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ReferenceSpectrum#getApodization <em>Apodization</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Apodization</em>' attribute.
	 * @see #getApodization()
	 * @generated
	 */
	void setApodization(String value);

	/**
	 * Returns the value of the '<em><b>Data</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Data</em>' containment reference.
	 * @see #setData(SpectralDataRef)
	 * @see org.tracegas.model.WorkspacePackage#getReferenceSpectrum_Data()
	 * @model containment="true"
	 * @generated
	 */
	SpectralDataRef getData();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ReferenceSpectrum#getData <em>Data</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Data</em>' containment reference.
	 * @see #getData()
	 * @generated
	 */
	void setData(SpectralDataRef value);

} // ReferenceSpectrum
