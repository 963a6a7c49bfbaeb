/**
 */
package org.tracegas.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Qa Check</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * Outcome of one quality-assurance rule.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.QaCheck#getRule <em>Rule</em>}</li>
 *   <li>{@link org.tracegas.model.QaCheck#isPassed <em>Passed</em>}</li>
 *   <li>{@link org.tracegas.model.QaCheck#getValue <em>Value</em>}</li>
 *   <li>{@link org.tracegas.model.QaCheck#getLimit <em>Limit</em>}</li>
 *   <li>{@link org.tracegas.model.QaCheck#getMessage <em>Message</em>}</li>
 *   <li>{@link org.tracegas.model.QaCheck#getMeasurement <em>Measurement</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getQaCheck()
 * @model
 * @generated
 */
public interface QaCheck extends StoredObject {
	/**
	 * Returns the value of the '<em><b>Rule</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Rule</em>' attribute.
	 * @see #setRule(String)
	 * @see org.tracegas.model.WorkspacePackage#getQaCheck_Rule()
	 * @model
	 * @generated
	 */
	String getRule();

	/**
	 * Sets the value of the '{@link org.tracegas.model.QaCheck#getRule <em>Rule</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Rule</em>' attribute.
	 * @see #getRule()
	 * @generated
	 */
	void setRule(String value);

	/**
	 * Returns the value of the '<em><b>Passed</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Passed</em>' attribute.
	 * @see #setPassed(boolean)
	 * @see org.tracegas.model.WorkspacePackage#getQaCheck_Passed()
	 * @model
	 * @generated
	 */
	boolean isPassed();

	/**
	 * Sets the value of the '{@link org.tracegas.model.QaCheck#isPassed <em>Passed</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Passed</em>' attribute.
	 * @see #isPassed()
	 * @generated
	 */
	void setPassed(boolean value);

	/**
	 * Returns the value of the '<em><b>Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Value</em>' attribute.
	 * @see #setValue(double)
	 * @see org.tracegas.model.WorkspacePackage#getQaCheck_Value()
	 * @model
	 * @generated
	 */
	double getValue();

	/**
	 * Sets the value of the '{@link org.tracegas.model.QaCheck#getValue <em>Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Value</em>' attribute.
	 * @see #getValue()
	 * @generated
	 */
	void setValue(double value);

	/**
	 * Returns the value of the '<em><b>Limit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Limit</em>' attribute.
	 * @see #setLimit(double)
	 * @see org.tracegas.model.WorkspacePackage#getQaCheck_Limit()
	 * @model
	 * @generated
	 */
	double getLimit();

	/**
	 * Sets the value of the '{@link org.tracegas.model.QaCheck#getLimit <em>Limit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Limit</em>' attribute.
	 * @see #getLimit()
	 * @generated
	 */
	void setLimit(double value);

	/**
	 * Returns the value of the '<em><b>Message</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Message</em>' attribute.
	 * @see #setMessage(String)
	 * @see org.tracegas.model.WorkspacePackage#getQaCheck_Message()
	 * @model
	 * @generated
	 */
	String getMessage();

	/**
	 * Sets the value of the '{@link org.tracegas.model.QaCheck#getMessage <em>Message</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Message</em>' attribute.
	 * @see #getMessage()
	 * @generated
	 */
	void setMessage(String value);

	/**
	 * Returns the value of the '<em><b>Measurement</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Measurement</em>' reference.
	 * @see #setMeasurement(Measurement)
	 * @see org.tracegas.model.WorkspacePackage#getQaCheck_Measurement()
	 * @model
	 * @generated
	 */
	Measurement getMeasurement();

	/**
	 * Sets the value of the '{@link org.tracegas.model.QaCheck#getMeasurement <em>Measurement</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Measurement</em>' reference.
	 * @see #getMeasurement()
	 * @generated
	 */
	void setMeasurement(Measurement value);

} // QaCheck
