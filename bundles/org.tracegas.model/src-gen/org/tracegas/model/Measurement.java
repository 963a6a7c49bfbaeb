/**
 */
package org.tracegas.model;

import java.time.Instant;

import org.eclipse.emf.common.util.EMap;

import org.tracegas.spectrum.Spectrum;

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
 *   <li>{@link org.tracegas.model.Measurement#getProject <em>Project</em>}</li>
 *   <li>{@link org.tracegas.model.Measurement#getKind <em>Kind</em>}</li>
 *   <li>{@link org.tracegas.model.Measurement#getTime <em>Time</em>}</li>
 *   <li>{@link org.tracegas.model.Measurement#getCellTemperature <em>Cell Temperature</em>}</li>
 *   <li>{@link org.tracegas.model.Measurement#getCellPressure <em>Cell Pressure</em>}</li>
 *   <li>{@link org.tracegas.model.Measurement#getOperatorId <em>Operator Id</em>}</li>
 *   <li>{@link org.tracegas.model.Measurement#getTitle <em>Title</em>}</li>
 *   <li>{@link org.tracegas.model.Measurement#getLabels <em>Labels</em>}</li>
 *   <li>{@link org.tracegas.model.Measurement#getContent <em>Content</em>}</li>
 *   <li>{@link org.tracegas.model.Measurement#getSpectrumId <em>Spectrum Id</em>}</li>
 *   <li>{@link org.tracegas.model.Measurement#getSpectrum <em>Spectrum</em>}</li>
 *   <li>{@link org.tracegas.model.Measurement#getSourceFile <em>Source File</em>}</li>
 *   <li>{@link org.tracegas.model.Measurement#getSourceSha256 <em>Source Sha256</em>}</li>
 *   <li>{@link org.tracegas.model.Measurement#getSourceRecord <em>Source Record</em>}</li>
 *   <li>{@link org.tracegas.model.Measurement#getInstrument <em>Instrument</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getMeasurement()
 * @model
 * @generated
 */
public interface Measurement extends StoredObject {
	/**
	 * Returns the value of the '<em><b>Project</b></em>' container reference.
	 * It is bidirectional and its opposite is '{@link org.tracegas.model.Project#getMeasurements <em>Measurements</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The project the measurement belongs to: its container.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Project</em>' container reference.
	 * @see #setProject(Project)
	 * @see org.tracegas.model.WorkspacePackage#getMeasurement_Project()
	 * @see org.tracegas.model.Project#getMeasurements
	 * @model opposite="measurements"
	 * @generated
	 */
	Project getProject();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Measurement#getProject <em>Project</em>}' container reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Project</em>' container reference.
	 * @see #getProject()
	 * @generated
	 */
	void setProject(Project value);

	/**
	 * Returns the value of the '<em><b>Kind</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracegas.model.MeasurementKind}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * What was measured: sample, background, a standard ...
	 * <!-- end-model-doc -->
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
	 * Returns the value of the '<em><b>Operator Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Id of the workspace user who recorded the measurement; set by the store.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Operator Id</em>' attribute.
	 * @see #setOperatorId(String)
	 * @see org.tracegas.model.WorkspacePackage#getMeasurement_OperatorId()
	 * @model
	 * @generated
	 */
	String getOperatorId();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Measurement#getOperatorId <em>Operator Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Operator Id</em>' attribute.
	 * @see #getOperatorId()
	 * @generated
	 */
	void setOperatorId(String value);

	/**
	 * Returns the value of the '<em><b>Title</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The record's title as its file gives it; empty for a measurement not imported from a file.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Title</em>' attribute.
	 * @see #setTitle(String)
	 * @see org.tracegas.model.WorkspacePackage#getMeasurement_Title()
	 * @model
	 * @generated
	 */
	String getTitle();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Measurement#getTitle <em>Title</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Title</em>' attribute.
	 * @see #getTitle()
	 * @generated
	 */
	void setTitle(String value);

	/**
	 * Returns the value of the '<em><b>Labels</b></em>' map.
	 * The key is of type {@link java.lang.String},
	 * and the value is of type {@link java.lang.String},
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The record's labels (metadata) as its file gives them, by name, in file order.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Labels</em>' map.
	 * @see org.tracegas.model.WorkspacePackage#getMeasurement_Labels()
	 * @model mapType="org.eclipse.emf.ecore.EStringToStringMapEntry&lt;org.eclipse.emf.ecore.EString, org.eclipse.emf.ecore.EString&gt;"
	 * @generated
	 */
	EMap<String, String> getLabels();

	/**
	 * Returns the value of the '<em><b>Content</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracegas.model.SpectralContent}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * What the measurement's values are: interferogram, single beam, transmittance or absorbance; unset for a measurement without values of its own.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Content</em>' attribute.
	 * @see org.tracegas.model.SpectralContent
	 * @see #isSetContent()
	 * @see #unsetContent()
	 * @see #setContent(SpectralContent)
	 * @see org.tracegas.model.WorkspacePackage#getMeasurement_Content()
	 * @model unsettable="true"
	 * @generated
	 */
	SpectralContent getContent();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Measurement#getContent <em>Content</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Content</em>' attribute.
	 * @see org.tracegas.model.SpectralContent
	 * @see #isSetContent()
	 * @see #unsetContent()
	 * @see #getContent()
	 * @generated
	 */
	void setContent(SpectralContent value);

	/**
	 * Unsets the value of the '{@link org.tracegas.model.Measurement#getContent <em>Content</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetContent()
	 * @see #getContent()
	 * @see #setContent(SpectralContent)
	 * @generated
	 */
	void unsetContent();

	/**
	 * Returns whether the value of the '{@link org.tracegas.model.Measurement#getContent <em>Content</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Content</em>' attribute is set.
	 * @see #unsetContent()
	 * @see #getContent()
	 * @see #setContent(SpectralContent)
	 * @generated
	 */
	boolean isSetContent();

	/**
	 * Returns the value of the '<em><b>Spectrum Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Id of the stored block holding the values as read from the measurement's file; set by the store.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Spectrum Id</em>' attribute.
	 * @see #setSpectrumId(String)
	 * @see org.tracegas.model.WorkspacePackage#getMeasurement_SpectrumId()
	 * @model
	 * @generated
	 */
	String getSpectrumId();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Measurement#getSpectrumId <em>Spectrum Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Spectrum Id</em>' attribute.
	 * @see #getSpectrumId()
	 * @generated
	 */
	void setSpectrumId(String value);

	/**
	 * Returns the value of the '<em><b>Spectrum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The values as read (axis and float64 values), while the measurement is being stored; the store keeps them as the block spectrumId names and does not fill this when reading.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Spectrum</em>' attribute.
	 * @see #setSpectrum(Spectrum)
	 * @see org.tracegas.model.WorkspacePackage#getMeasurement_Spectrum()
	 * @model dataType="org.tracegas.model.Spectrum" transient="true"
	 * @generated
	 */
	Spectrum getSpectrum();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Measurement#getSpectrum <em>Spectrum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Spectrum</em>' attribute.
	 * @see #getSpectrum()
	 * @generated
	 */
	void setSpectrum(Spectrum value);

	/**
	 * Returns the value of the '<em><b>Source File</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Name of the file the measurement was imported from; empty when it was not imported.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Source File</em>' attribute.
	 * @see #setSourceFile(String)
	 * @see org.tracegas.model.WorkspacePackage#getMeasurement_SourceFile()
	 * @model
	 * @generated
	 */
	String getSourceFile();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Measurement#getSourceFile <em>Source File</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Source File</em>' attribute.
	 * @see #getSourceFile()
	 * @generated
	 */
	void setSourceFile(String value);

	/**
	 * Returns the value of the '<em><b>Source Sha256</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * SHA-256, hex, of the raw input: the bytes of the file the measurement was imported from.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Source Sha256</em>' attribute.
	 * @see #setSourceSha256(String)
	 * @see org.tracegas.model.WorkspacePackage#getMeasurement_SourceSha256()
	 * @model
	 * @generated
	 */
	String getSourceSha256();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Measurement#getSourceSha256 <em>Source Sha256</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Source Sha256</em>' attribute.
	 * @see #getSourceSha256()
	 * @generated
	 */
	void setSourceSha256(String value);

	/**
	 * Returns the value of the '<em><b>Source Record</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The record's place in its file, from 0; meaningful only with a source file.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Source Record</em>' attribute.
	 * @see #setSourceRecord(int)
	 * @see org.tracegas.model.WorkspacePackage#getMeasurement_SourceRecord()
	 * @model
	 * @generated
	 */
	int getSourceRecord();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Measurement#getSourceRecord <em>Source Record</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Source Record</em>' attribute.
	 * @see #getSourceRecord()
	 * @generated
	 */
	void setSourceRecord(int value);

	/**
	 * Returns the value of the '<em><b>Instrument</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The instrument that made the acquisition; none for a measurement recorded without one (workspaces made before instruments were kept have none).
	 * <!-- end-model-doc -->
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

} // Measurement
