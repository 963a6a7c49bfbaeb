/**
 */
package org.tracegas.model;

import java.time.Instant;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Report</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A report issued from a project: what it was, when and by whom it was issued, and the SHA-256 of its canonical content, which its review and approval signatures are stored with. The store keeps it unchanged once recorded; each issue of a report is a record of its own.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.Report#getProject <em>Project</em>}</li>
 *   <li>{@link org.tracegas.model.Report#getReportId <em>Report Id</em>}</li>
 *   <li>{@link org.tracegas.model.Report#getTitle <em>Title</em>}</li>
 *   <li>{@link org.tracegas.model.Report#getIssued <em>Issued</em>}</li>
 *   <li>{@link org.tracegas.model.Report#getIssuedBy <em>Issued By</em>}</li>
 *   <li>{@link org.tracegas.model.Report#getContentSha256 <em>Content Sha256</em>}</li>
 *   <li>{@link org.tracegas.model.Report#getFileName <em>File Name</em>}</li>
 *   <li>{@link org.tracegas.model.Report#getPageCount <em>Page Count</em>}</li>
 *   <li>{@link org.tracegas.model.Report#getMethodVersionId <em>Method Version Id</em>}</li>
 *   <li>{@link org.tracegas.model.Report#getLibraryVersionId <em>Library Version Id</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getReport()
 * @model
 * @generated
 */
public interface Report extends StoredObject {
	/**
	 * Returns the value of the '<em><b>Project</b></em>' container reference.
	 * It is bidirectional and its opposite is '{@link org.tracegas.model.Project#getReports <em>Reports</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The project the report was issued from: its container.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Project</em>' container reference.
	 * @see #setProject(Project)
	 * @see org.tracegas.model.WorkspacePackage#getReport_Project()
	 * @see org.tracegas.model.Project#getReports
	 * @model opposite="reports"
	 * @generated
	 */
	Project getProject();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Report#getProject <em>Project</em>}' container reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Project</em>' container reference.
	 * @see #getProject()
	 * @generated
	 */
	void setProject(Project value);

	/**
	 * Returns the value of the '<em><b>Report Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The report's identifier as printed on it; its signatures are given on it.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Report Id</em>' attribute.
	 * @see #setReportId(String)
	 * @see org.tracegas.model.WorkspacePackage#getReport_ReportId()
	 * @model
	 * @generated
	 */
	String getReportId();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Report#getReportId <em>Report Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Report Id</em>' attribute.
	 * @see #getReportId()
	 * @generated
	 */
	void setReportId(String value);

	/**
	 * Returns the value of the '<em><b>Title</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * What the report is, in the lab's words: the campaign it reports on.
	 * <!-- end-model-doc -->
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
	 * Returns the value of the '<em><b>Issued</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * When the report was issued (written out); set by the store.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Issued</em>' attribute.
	 * @see #setIssued(Instant)
	 * @see org.tracegas.model.WorkspacePackage#getReport_Issued()
	 * @model dataType="org.tracegas.model.Instant"
	 * @generated
	 */
	Instant getIssued();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Report#getIssued <em>Issued</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Issued</em>' attribute.
	 * @see #getIssued()
	 * @generated
	 */
	void setIssued(Instant value);

	/**
	 * Returns the value of the '<em><b>Issued By</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Id of the workspace user who issued the report; set by the store.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Issued By</em>' attribute.
	 * @see #setIssuedBy(String)
	 * @see org.tracegas.model.WorkspacePackage#getReport_IssuedBy()
	 * @model
	 * @generated
	 */
	String getIssuedBy();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Report#getIssuedBy <em>Issued By</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Issued By</em>' attribute.
	 * @see #getIssuedBy()
	 * @generated
	 */
	void setIssuedBy(String value);

	/**
	 * Returns the value of the '<em><b>Content Sha256</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * SHA-256, hex, of the report's canonical content: the hash its review and approval signatures are stored with.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Content Sha256</em>' attribute.
	 * @see #setContentSha256(String)
	 * @see org.tracegas.model.WorkspacePackage#getReport_ContentSha256()
	 * @model
	 * @generated
	 */
	String getContentSha256();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Report#getContentSha256 <em>Content Sha256</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Content Sha256</em>' attribute.
	 * @see #getContentSha256()
	 * @generated
	 */
	void setContentSha256(String value);

	/**
	 * Returns the value of the '<em><b>File Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Name of the file the report was written to.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>File Name</em>' attribute.
	 * @see #setFileName(String)
	 * @see org.tracegas.model.WorkspacePackage#getReport_FileName()
	 * @model
	 * @generated
	 */
	String getFileName();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Report#getFileName <em>File Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>File Name</em>' attribute.
	 * @see #getFileName()
	 * @generated
	 */
	void setFileName(String value);

	/**
	 * Returns the value of the '<em><b>Page Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * How many pages the written report has; unset when not known.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Page Count</em>' attribute.
	 * @see #isSetPageCount()
	 * @see #unsetPageCount()
	 * @see #setPageCount(int)
	 * @see org.tracegas.model.WorkspacePackage#getReport_PageCount()
	 * @model unsettable="true"
	 * @generated
	 */
	int getPageCount();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Report#getPageCount <em>Page Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Page Count</em>' attribute.
	 * @see #isSetPageCount()
	 * @see #unsetPageCount()
	 * @see #getPageCount()
	 * @generated
	 */
	void setPageCount(int value);

	/**
	 * Unsets the value of the '{@link org.tracegas.model.Report#getPageCount <em>Page Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetPageCount()
	 * @see #getPageCount()
	 * @see #setPageCount(int)
	 * @generated
	 */
	void unsetPageCount();

	/**
	 * Returns whether the value of the '{@link org.tracegas.model.Report#getPageCount <em>Page Count</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Page Count</em>' attribute is set.
	 * @see #unsetPageCount()
	 * @see #getPageCount()
	 * @see #setPageCount(int)
	 * @generated
	 */
	boolean isSetPageCount();

	/**
	 * Returns the value of the '<em><b>Method Version Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Id of the method version whose results and QA checks the report gives.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Method Version Id</em>' attribute.
	 * @see #setMethodVersionId(String)
	 * @see org.tracegas.model.WorkspacePackage#getReport_MethodVersionId()
	 * @model
	 * @generated
	 */
	String getMethodVersionId();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Report#getMethodVersionId <em>Method Version Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Method Version Id</em>' attribute.
	 * @see #getMethodVersionId()
	 * @generated
	 */
	void setMethodVersionId(String value);

	/**
	 * Returns the value of the '<em><b>Library Version Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Id of the reference library version that method version fits with.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Library Version Id</em>' attribute.
	 * @see #setLibraryVersionId(String)
	 * @see org.tracegas.model.WorkspacePackage#getReport_LibraryVersionId()
	 * @model
	 * @generated
	 */
	String getLibraryVersionId();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Report#getLibraryVersionId <em>Library Version Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Library Version Id</em>' attribute.
	 * @see #getLibraryVersionId()
	 * @generated
	 */
	void setLibraryVersionId(String value);

} // Report
