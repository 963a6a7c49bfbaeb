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
 * One absorbance reference spectrum of a library version: the compound it shows and the conditions it holds under. The absorbance values are not held here: the library folder keeps them, and contentSha256 pins them (the version refuses a changed file).
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.ReferenceSpectrum#getCompound <em>Compound</em>}</li>
 *   <li>{@link org.tracegas.model.ReferenceSpectrum#getCasNumber <em>Cas Number</em>}</li>
 *   <li>{@link org.tracegas.model.ReferenceSpectrum#getPpmMetres <em>Ppm Metres</em>}</li>
 *   <li>{@link org.tracegas.model.ReferenceSpectrum#getTemperature <em>Temperature</em>}</li>
 *   <li>{@link org.tracegas.model.ReferenceSpectrum#getPressure <em>Pressure</em>}</li>
 *   <li>{@link org.tracegas.model.ReferenceSpectrum#getResolution <em>Resolution</em>}</li>
 *   <li>{@link org.tracegas.model.ReferenceSpectrum#getApodization <em>Apodization</em>}</li>
 *   <li>{@link org.tracegas.model.ReferenceSpectrum#getOrigin <em>Origin</em>}</li>
 *   <li>{@link org.tracegas.model.ReferenceSpectrum#getOriginText <em>Origin Text</em>}</li>
 *   <li>{@link org.tracegas.model.ReferenceSpectrum#getContentSha256 <em>Content Sha256</em>}</li>
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
	 * <!-- begin-model-doc -->
	 * Compound name, as the library's manifest gives it.
	 * <!-- end-model-doc -->
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
	 * <!-- begin-model-doc -->
	 * CAS registry number of the compound (NNNNNNN-NN-N).
	 * <!-- end-model-doc -->
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
	 * Returns the value of the '<em><b>Ppm Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Concentration times optical path of the reference, in ppm·m.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Ppm Metres</em>' attribute.
	 * @see #setPpmMetres(double)
	 * @see org.tracegas.model.WorkspacePackage#getReferenceSpectrum_PpmMetres()
	 * @model
	 * @generated
	 */
	double getPpmMetres();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ReferenceSpectrum#getPpmMetres <em>Ppm Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Ppm Metres</em>' attribute.
	 * @see #getPpmMetres()
	 * @generated
	 */
	void setPpmMetres(double value);

	/**
	 * Returns the value of the '<em><b>Temperature</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Cell temperature the reference was recorded or computed at, in K.
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
	 * Cell pressure the reference was recorded or computed at, in kPa (the unit of the reference library; a measurement states hPa).
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
	 * Nominal spectral resolution of the reference, in cm-1.
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
	 * <!-- begin-model-doc -->
	 * Name of the apodization function the reference was computed with, as the library names it.
	 * <!-- end-model-doc -->
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
	 * Returns the value of the '<em><b>Origin</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracegas.model.ReferenceOrigin}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * How the reference came about: measured, synthetic (computed) or imported.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Origin</em>' attribute.
	 * @see org.tracegas.model.ReferenceOrigin
	 * @see #setOrigin(ReferenceOrigin)
	 * @see org.tracegas.model.WorkspacePackage#getReferenceSpectrum_Origin()
	 * @model
	 * @generated
	 */
	ReferenceOrigin getOrigin();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ReferenceSpectrum#getOrigin <em>Origin</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Origin</em>' attribute.
	 * @see org.tracegas.model.ReferenceOrigin
	 * @see #getOrigin()
	 * @generated
	 */
	void setOrigin(ReferenceOrigin value);

	/**
	 * Returns the value of the '<em><b>Origin Text</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Free text on the origin: instrument and cell, line list and model, or the collection it came from; may be empty.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Origin Text</em>' attribute.
	 * @see #setOriginText(String)
	 * @see org.tracegas.model.WorkspacePackage#getReferenceSpectrum_OriginText()
	 * @model
	 * @generated
	 */
	String getOriginText();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ReferenceSpectrum#getOriginText <em>Origin Text</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Origin Text</em>' attribute.
	 * @see #getOriginText()
	 * @generated
	 */
	void setOriginText(String value);

	/**
	 * Returns the value of the '<em><b>Content Sha256</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * SHA-256 (hex) of the reference's spectrum file, as the library version pins it.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Content Sha256</em>' attribute.
	 * @see #setContentSha256(String)
	 * @see org.tracegas.model.WorkspacePackage#getReferenceSpectrum_ContentSha256()
	 * @model
	 * @generated
	 */
	String getContentSha256();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ReferenceSpectrum#getContentSha256 <em>Content Sha256</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Content Sha256</em>' attribute.
	 * @see #getContentSha256()
	 * @generated
	 */
	void setContentSha256(String value);

} // ReferenceSpectrum
