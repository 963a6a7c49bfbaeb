/**
 */
package org.tracegas.model;

import java.time.Instant;

import org.eclipse.emf.common.util.EList;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Result</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A concentration result of one compound, with its uncertainty, flags, conditions and provenance. The store keeps it unchanged once recorded. Project and measurement are named by id: results are read by the thousand without their measurements.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.Result#getProjectId <em>Project Id</em>}</li>
 *   <li>{@link org.tracegas.model.Result#getMeasurementId <em>Measurement Id</em>}</li>
 *   <li>{@link org.tracegas.model.Result#getCompound <em>Compound</em>}</li>
 *   <li>{@link org.tracegas.model.Result#getConcentration <em>Concentration</em>}</li>
 *   <li>{@link org.tracegas.model.Result#getStandardUncertainty <em>Standard Uncertainty</em>}</li>
 *   <li>{@link org.tracegas.model.Result#getDetectionLimit <em>Detection Limit</em>}</li>
 *   <li>{@link org.tracegas.model.Result#getUnit <em>Unit</em>}</li>
 *   <li>{@link org.tracegas.model.Result#getFlags <em>Flags</em>}</li>
 *   <li>{@link org.tracegas.model.Result#getProvenance <em>Provenance</em>}</li>
 *   <li>{@link org.tracegas.model.Result#getConditions <em>Conditions</em>}</li>
 *   <li>{@link org.tracegas.model.Result#getRecordedBy <em>Recorded By</em>}</li>
 *   <li>{@link org.tracegas.model.Result#getRecorded <em>Recorded</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getResult()
 * @model
 * @generated
 */
public interface Result extends StoredObject {
	/**
	 * Returns the value of the '<em><b>Project Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Id of the project the result belongs to; set by the store.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Project Id</em>' attribute.
	 * @see #setProjectId(String)
	 * @see org.tracegas.model.WorkspacePackage#getResult_ProjectId()
	 * @model
	 * @generated
	 */
	String getProjectId();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Result#getProjectId <em>Project Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Project Id</em>' attribute.
	 * @see #getProjectId()
	 * @generated
	 */
	void setProjectId(String value);

	/**
	 * Returns the value of the '<em><b>Measurement Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Id of the measurement analysed; null for a result of no measurement, and for one of a processed spectrum, whose measurement the store assigns.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Measurement Id</em>' attribute.
	 * @see #setMeasurementId(String)
	 * @see org.tracegas.model.WorkspacePackage#getResult_MeasurementId()
	 * @model
	 * @generated
	 */
	String getMeasurementId();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Result#getMeasurementId <em>Measurement Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Measurement Id</em>' attribute.
	 * @see #getMeasurementId()
	 * @generated
	 */
	void setMeasurementId(String value);

	/**
	 * Returns the value of the '<em><b>Compound</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The compound, as the method names it.
	 * <!-- end-model-doc -->
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
	 * <!-- begin-model-doc -->
	 * The concentration, in the unit.
	 * <!-- end-model-doc -->
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
	 * Returns the value of the '<em><b>Standard Uncertainty</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The standard uncertainty (k = 1) of the concentration, in the unit.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Standard Uncertainty</em>' attribute.
	 * @see #setStandardUncertainty(double)
	 * @see org.tracegas.model.WorkspacePackage#getResult_StandardUncertainty()
	 * @model
	 * @generated
	 */
	double getStandardUncertainty();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Result#getStandardUncertainty <em>Standard Uncertainty</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Standard Uncertainty</em>' attribute.
	 * @see #getStandardUncertainty()
	 * @generated
	 */
	void setStandardUncertainty(double value);

	/**
	 * Returns the value of the '<em><b>Detection Limit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The detection limit, in the unit.
	 * <!-- end-model-doc -->
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
	 * <!-- begin-model-doc -->
	 * The result's qualifiers, each at most once.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Flags</em>' attribute list.
	 * @see org.tracegas.model.ResultFlag
	 * @see org.tracegas.model.WorkspacePackage#getResult_Flags()
	 * @model
	 * @generated
	 */
	EList<ResultFlag> getFlags();

	/**
	 * Returns the value of the '<em><b>Provenance</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * What made the result.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Provenance</em>' attribute.
	 * @see #setProvenance(Provenance)
	 * @see org.tracegas.model.WorkspacePackage#getResult_Provenance()
	 * @model dataType="org.tracegas.model.Provenance"
	 * @generated
	 */
	Provenance getProvenance();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Result#getProvenance <em>Provenance</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Provenance</em>' attribute.
	 * @see #getProvenance()
	 * @generated
	 */
	void setProvenance(Provenance value);

	/**
	 * Returns the value of the '<em><b>Conditions</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * What the result was corrected with; null when it was not corrected.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Conditions</em>' attribute.
	 * @see #setConditions(ResultConditions)
	 * @see org.tracegas.model.WorkspacePackage#getResult_Conditions()
	 * @model dataType="org.tracegas.model.ResultConditions"
	 * @generated
	 */
	ResultConditions getConditions();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Result#getConditions <em>Conditions</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Conditions</em>' attribute.
	 * @see #getConditions()
	 * @generated
	 */
	void setConditions(ResultConditions value);

	/**
	 * Returns the value of the '<em><b>Recorded By</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Id of the workspace user who recorded the result; set by the store.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Recorded By</em>' attribute.
	 * @see #setRecordedBy(String)
	 * @see org.tracegas.model.WorkspacePackage#getResult_RecordedBy()
	 * @model
	 * @generated
	 */
	String getRecordedBy();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Result#getRecordedBy <em>Recorded By</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Recorded By</em>' attribute.
	 * @see #getRecordedBy()
	 * @generated
	 */
	void setRecordedBy(String value);

	/**
	 * Returns the value of the '<em><b>Recorded</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * When the result was recorded; set by the store.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Recorded</em>' attribute.
	 * @see #setRecorded(Instant)
	 * @see org.tracegas.model.WorkspacePackage#getResult_Recorded()
	 * @model dataType="org.tracegas.model.Instant"
	 * @generated
	 */
	Instant getRecorded();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Result#getRecorded <em>Recorded</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Recorded</em>' attribute.
	 * @see #getRecorded()
	 * @generated
	 */
	void setRecorded(Instant value);

} // Result
