/**
 */
package org.tracegas.model;

import org.tracegas.spectrum.Spectrum;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Processed Spectrum</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A spectral array the store keeps for a project, as it reads it back: the values read from a measurement's file, or the absorbance processed from them for the fit. Its id is the stored array's id. The store keeps it unchanged once stored. Its measurement is named by id: a campaign's spectra are streamed one at a time, never held together, and without their measurements.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.ProcessedSpectrum#getMeasurementId <em>Measurement Id</em>}</li>
 *   <li>{@link org.tracegas.model.ProcessedSpectrum#getContent <em>Content</em>}</li>
 *   <li>{@link org.tracegas.model.ProcessedSpectrum#getSampleEncoding <em>Sample Encoding</em>}</li>
 *   <li>{@link org.tracegas.model.ProcessedSpectrum#getSha256 <em>Sha256</em>}</li>
 *   <li>{@link org.tracegas.model.ProcessedSpectrum#getRecipeSha256 <em>Recipe Sha256</em>}</li>
 *   <li>{@link org.tracegas.model.ProcessedSpectrum#getSpectrum <em>Spectrum</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getProcessedSpectrum()
 * @model
 * @generated
 */
public interface ProcessedSpectrum extends StoredObject {
	/**
	 * Returns the value of the '<em><b>Measurement Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Id of the measurement whose values these are; null for an array of no measurement.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Measurement Id</em>' attribute.
	 * @see #setMeasurementId(String)
	 * @see org.tracegas.model.WorkspacePackage#getProcessedSpectrum_MeasurementId()
	 * @model
	 * @generated
	 */
	String getMeasurementId();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ProcessedSpectrum#getMeasurementId <em>Measurement Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Measurement Id</em>' attribute.
	 * @see #getMeasurementId()
	 * @generated
	 */
	void setMeasurementId(String value);

	/**
	 * Returns the value of the '<em><b>Content</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracegas.model.SpectralContent}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * What the values are: interferogram, single beam, transmittance, absorbance or residual.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Content</em>' attribute.
	 * @see org.tracegas.model.SpectralContent
	 * @see #setContent(SpectralContent)
	 * @see org.tracegas.model.WorkspacePackage#getProcessedSpectrum_Content()
	 * @model
	 * @generated
	 */
	SpectralContent getContent();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ProcessedSpectrum#getContent <em>Content</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Content</em>' attribute.
	 * @see org.tracegas.model.SpectralContent
	 * @see #getContent()
	 * @generated
	 */
	void setContent(SpectralContent value);

	/**
	 * Returns the value of the '<em><b>Sample Encoding</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * How the store keeps the values, as the store names its encodings: FLOAT64_LE (bit-exact) or FLOAT32_LE (each value rounded to the nearest float).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Sample Encoding</em>' attribute.
	 * @see #setSampleEncoding(String)
	 * @see org.tracegas.model.WorkspacePackage#getProcessedSpectrum_SampleEncoding()
	 * @model
	 * @generated
	 */
	String getSampleEncoding();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ProcessedSpectrum#getSampleEncoding <em>Sample Encoding</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Sample Encoding</em>' attribute.
	 * @see #getSampleEncoding()
	 * @generated
	 */
	void setSampleEncoding(String value);

	/**
	 * Returns the value of the '<em><b>Sha256</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * SHA-256, hex, of the stored value bytes as the encoding lays them out; the audit record of the array's storing names the same hash.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Sha256</em>' attribute.
	 * @see #setSha256(String)
	 * @see org.tracegas.model.WorkspacePackage#getProcessedSpectrum_Sha256()
	 * @model
	 * @generated
	 */
	String getSha256();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ProcessedSpectrum#getSha256 <em>Sha256</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Sha256</em>' attribute.
	 * @see #getSha256()
	 * @generated
	 */
	void setSha256(String value);

	/**
	 * Returns the value of the '<em><b>Recipe Sha256</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * SHA-256, hex, of the text of the processing recipe that made the array, as the store keeps the recipe (its text is read by this hash); null when the array was not stored with results of a recipe, such as the values read from a file.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Recipe Sha256</em>' attribute.
	 * @see #setRecipeSha256(String)
	 * @see org.tracegas.model.WorkspacePackage#getProcessedSpectrum_RecipeSha256()
	 * @model
	 * @generated
	 */
	String getRecipeSha256();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ProcessedSpectrum#getRecipeSha256 <em>Recipe Sha256</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Recipe Sha256</em>' attribute.
	 * @see #getRecipeSha256()
	 * @generated
	 */
	void setRecipeSha256(String value);

	/**
	 * Returns the value of the '<em><b>Spectrum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The values with their axis and ordinate, filled when the store reads the array; the store streams a project's arrays so that only a few are in memory at a time.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Spectrum</em>' attribute.
	 * @see #setSpectrum(Spectrum)
	 * @see org.tracegas.model.WorkspacePackage#getProcessedSpectrum_Spectrum()
	 * @model dataType="org.tracegas.model.Spectrum" transient="true"
	 * @generated
	 */
	Spectrum getSpectrum();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ProcessedSpectrum#getSpectrum <em>Spectrum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Spectrum</em>' attribute.
	 * @see #getSpectrum()
	 * @generated
	 */
	void setSpectrum(Spectrum value);

} // ProcessedSpectrum
