/**
 */
package org.tracegas.model;

import java.time.Instant;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Qa Outcome</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * The outcome of one QA check of a project: what was checked, the value, the acceptance limits, pass or fail, and the rule that decided it with its source. The store keeps it unchanged once recorded; project and method version are named by id, as a result names them.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.QaOutcome#getProjectId <em>Project Id</em>}</li>
 *   <li>{@link org.tracegas.model.QaOutcome#getMethodVersionId <em>Method Version Id</em>}</li>
 *   <li>{@link org.tracegas.model.QaOutcome#getCheck <em>Check</em>}</li>
 *   <li>{@link org.tracegas.model.QaOutcome#isPassed <em>Passed</em>}</li>
 *   <li>{@link org.tracegas.model.QaOutcome#getMeasured <em>Measured</em>}</li>
 *   <li>{@link org.tracegas.model.QaOutcome#getUnit <em>Unit</em>}</li>
 *   <li>{@link org.tracegas.model.QaOutcome#getLowerLimit <em>Lower Limit</em>}</li>
 *   <li>{@link org.tracegas.model.QaOutcome#getUpperLimit <em>Upper Limit</em>}</li>
 *   <li>{@link org.tracegas.model.QaOutcome#getRule <em>Rule</em>}</li>
 *   <li>{@link org.tracegas.model.QaOutcome#getSource <em>Source</em>}</li>
 *   <li>{@link org.tracegas.model.QaOutcome#getRecordedBy <em>Recorded By</em>}</li>
 *   <li>{@link org.tracegas.model.QaOutcome#getRecorded <em>Recorded</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getQaOutcome()
 * @model
 * @generated
 */
public interface QaOutcome extends StoredObject {
	/**
	 * Returns the value of the '<em><b>Project Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Id of the project the check belongs to; set by the store.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Project Id</em>' attribute.
	 * @see #setProjectId(String)
	 * @see org.tracegas.model.WorkspacePackage#getQaOutcome_ProjectId()
	 * @model
	 * @generated
	 */
	String getProjectId();

	/**
	 * Sets the value of the '{@link org.tracegas.model.QaOutcome#getProjectId <em>Project Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Project Id</em>' attribute.
	 * @see #getProjectId()
	 * @generated
	 */
	void setProjectId(String value);

	/**
	 * Returns the value of the '<em><b>Method Version Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Id of the method version the check was made with; set by the store, which freezes the version.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Method Version Id</em>' attribute.
	 * @see #setMethodVersionId(String)
	 * @see org.tracegas.model.WorkspacePackage#getQaOutcome_MethodVersionId()
	 * @model
	 * @generated
	 */
	String getMethodVersionId();

	/**
	 * Sets the value of the '{@link org.tracegas.model.QaOutcome#getMethodVersionId <em>Method Version Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Method Version Id</em>' attribute.
	 * @see #getMethodVersionId()
	 * @generated
	 */
	void setMethodVersionId(String value);

	/**
	 * Returns the value of the '<em><b>Check</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * What was checked, e.g. a spike recovery of one compound.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Check</em>' attribute.
	 * @see #setCheck(String)
	 * @see org.tracegas.model.WorkspacePackage#getQaOutcome_Check()
	 * @model
	 * @generated
	 */
	String getCheck();

	/**
	 * Sets the value of the '{@link org.tracegas.model.QaOutcome#getCheck <em>Check</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Check</em>' attribute.
	 * @see #getCheck()
	 * @generated
	 */
	void setCheck(String value);

	/**
	 * Returns the value of the '<em><b>Passed</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Whether the value met the rule; a check without a usable value has failed.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Passed</em>' attribute.
	 * @see #setPassed(boolean)
	 * @see org.tracegas.model.WorkspacePackage#getQaOutcome_Passed()
	 * @model
	 * @generated
	 */
	boolean isPassed();

	/**
	 * Sets the value of the '{@link org.tracegas.model.QaOutcome#isPassed <em>Passed</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Passed</em>' attribute.
	 * @see #isPassed()
	 * @generated
	 */
	void setPassed(boolean value);

	/**
	 * Returns the value of the '<em><b>Measured</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The value checked, in the unit; NaN when there was none.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Measured</em>' attribute.
	 * @see #setMeasured(double)
	 * @see org.tracegas.model.WorkspacePackage#getQaOutcome_Measured()
	 * @model
	 * @generated
	 */
	double getMeasured();

	/**
	 * Sets the value of the '{@link org.tracegas.model.QaOutcome#getMeasured <em>Measured</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Measured</em>' attribute.
	 * @see #getMeasured()
	 * @generated
	 */
	void setMeasured(double value);

	/**
	 * Returns the value of the '<em><b>Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Unit of the value and the limits; empty for a ratio.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Unit</em>' attribute.
	 * @see #setUnit(String)
	 * @see org.tracegas.model.WorkspacePackage#getQaOutcome_Unit()
	 * @model
	 * @generated
	 */
	String getUnit();

	/**
	 * Sets the value of the '{@link org.tracegas.model.QaOutcome#getUnit <em>Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Unit</em>' attribute.
	 * @see #getUnit()
	 * @generated
	 */
	void setUnit(String value);

	/**
	 * Returns the value of the '<em><b>Lower Limit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Lowest accepted value; negative infinity when there is none.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Lower Limit</em>' attribute.
	 * @see #setLowerLimit(double)
	 * @see org.tracegas.model.WorkspacePackage#getQaOutcome_LowerLimit()
	 * @model
	 * @generated
	 */
	double getLowerLimit();

	/**
	 * Sets the value of the '{@link org.tracegas.model.QaOutcome#getLowerLimit <em>Lower Limit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Lower Limit</em>' attribute.
	 * @see #getLowerLimit()
	 * @generated
	 */
	void setLowerLimit(double value);

	/**
	 * Returns the value of the '<em><b>Upper Limit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Highest accepted value; positive infinity when there is none.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Upper Limit</em>' attribute.
	 * @see #setUpperLimit(double)
	 * @see org.tracegas.model.WorkspacePackage#getQaOutcome_UpperLimit()
	 * @model
	 * @generated
	 */
	double getUpperLimit();

	/**
	 * Sets the value of the '{@link org.tracegas.model.QaOutcome#getUpperLimit <em>Upper Limit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Upper Limit</em>' attribute.
	 * @see #getUpperLimit()
	 * @generated
	 */
	void setUpperLimit(double value);

	/**
	 * Returns the value of the '<em><b>Rule</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The rule that decided, as the report states it.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Rule</em>' attribute.
	 * @see #setRule(String)
	 * @see org.tracegas.model.WorkspacePackage#getQaOutcome_Rule()
	 * @model
	 * @generated
	 */
	String getRule();

	/**
	 * Sets the value of the '{@link org.tracegas.model.QaOutcome#getRule <em>Rule</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Rule</em>' attribute.
	 * @see #getRule()
	 * @generated
	 */
	void setRule(String value);

	/**
	 * Returns the value of the '<em><b>Source</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Where the rule comes from: a section of a published method, or that it is common practice.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Source</em>' attribute.
	 * @see #setSource(String)
	 * @see org.tracegas.model.WorkspacePackage#getQaOutcome_Source()
	 * @model
	 * @generated
	 */
	String getSource();

	/**
	 * Sets the value of the '{@link org.tracegas.model.QaOutcome#getSource <em>Source</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Source</em>' attribute.
	 * @see #getSource()
	 * @generated
	 */
	void setSource(String value);

	/**
	 * Returns the value of the '<em><b>Recorded By</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Id of the workspace user who recorded the check; set by the store.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Recorded By</em>' attribute.
	 * @see #setRecordedBy(String)
	 * @see org.tracegas.model.WorkspacePackage#getQaOutcome_RecordedBy()
	 * @model
	 * @generated
	 */
	String getRecordedBy();

	/**
	 * Sets the value of the '{@link org.tracegas.model.QaOutcome#getRecordedBy <em>Recorded By</em>}' attribute.
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
	 * When the check was recorded; set by the store.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Recorded</em>' attribute.
	 * @see #setRecorded(Instant)
	 * @see org.tracegas.model.WorkspacePackage#getQaOutcome_Recorded()
	 * @model dataType="org.tracegas.model.Instant"
	 * @generated
	 */
	Instant getRecorded();

	/**
	 * Sets the value of the '{@link org.tracegas.model.QaOutcome#getRecorded <em>Recorded</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Recorded</em>' attribute.
	 * @see #getRecorded()
	 * @generated
	 */
	void setRecorded(Instant value);

} // QaOutcome
