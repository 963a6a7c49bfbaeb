/**
 */
package org.tracegas.model;

import java.time.Instant;

import org.eclipse.emf.common.util.EList;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Report</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A report over analysis runs of a project.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.Report#getTitle <em>Title</em>}</li>
 *   <li>{@link org.tracegas.model.Report#getCreated <em>Created</em>}</li>
 *   <li>{@link org.tracegas.model.Report#getStatus <em>Status</em>}</li>
 *   <li>{@link org.tracegas.model.Report#getRuns <em>Runs</em>}</li>
 *   <li>{@link org.tracegas.model.Report#getAuthor <em>Author</em>}</li>
 *   <li>{@link org.tracegas.model.Report#getDocumentUri <em>Document Uri</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getReport()
 * @model
 * @generated
 */
public interface Report extends StoredObject {
	/**
	 * Returns the value of the '<em><b>Title</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Title</em>' attribute.
	 * @see #setTitle(String)
	 * @see org.tracegas.model.WorkspacePackage#getReport_Title()
	 * @model
	 * @generated
	 */
	String getTitle();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Report#getTitle <em>Title</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Title</em>' attribute.
	 * @see #getTitle()
	 * @generated
	 */
	void setTitle(String value);

	/**
	 * Returns the value of the '<em><b>Created</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Created</em>' attribute.
	 * @see #setCreated(Instant)
	 * @see org.tracegas.model.WorkspacePackage#getReport_Created()
	 * @model dataType="org.tracegas.model.Instant"
	 * @generated
	 */
	Instant getCreated();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Report#getCreated <em>Created</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Created</em>' attribute.
	 * @see #getCreated()
	 * @generated
	 */
	void setCreated(Instant value);

	/**
	 * Returns the value of the '<em><b>Status</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracegas.model.ReportStatus}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Status</em>' attribute.
	 * @see org.tracegas.model.ReportStatus
	 * @see #setStatus(ReportStatus)
	 * @see org.tracegas.model.WorkspacePackage#getReport_Status()
	 * @model
	 * @generated
	 */
	ReportStatus getStatus();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Report#getStatus <em>Status</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Status</em>' attribute.
	 * @see org.tracegas.model.ReportStatus
	 * @see #getStatus()
	 * @generated
	 */
	void setStatus(ReportStatus value);

	/**
	 * Returns the value of the '<em><b>Runs</b></em>' reference list.
	 * The list contents are of type {@link org.tracegas.model.AnalysisRun}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Runs</em>' reference list.
	 * @see org.tracegas.model.WorkspacePackage#getReport_Runs()
	 * @model
	 * @generated
	 */
	EList<AnalysisRun> getRuns();

	/**
	 * Returns the value of the '<em><b>Author</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Author</em>' reference.
	 * @see #setAuthor(User)
	 * @see org.tracegas.model.WorkspacePackage#getReport_Author()
	 * @model
	 * @generated
	 */
	User getAuthor();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Report#getAuthor <em>Author</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Author</em>' reference.
	 * @see #getAuthor()
	 * @generated
	 */
	void setAuthor(User value);

	/**
	 * Returns the value of the '<em><b>Document Uri</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Location of the rendered document.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Document Uri</em>' attribute.
	 * @see #setDocumentUri(String)
	 * @see org.tracegas.model.WorkspacePackage#getReport_DocumentUri()
	 * @model
	 * @generated
	 */
	String getDocumentUri();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Report#getDocumentUri <em>Document Uri</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Document Uri</em>' attribute.
	 * @see #getDocumentUri()
	 * @generated
	 */
	void setDocumentUri(String value);

} // Report
