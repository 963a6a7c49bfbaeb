/**
 */
package org.tracegas.model;

import java.time.Instant;

import org.eclipse.emf.common.util.EList;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Analysis Run</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * One quantification of measurements with one method version.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.AnalysisRun#getStarted <em>Started</em>}</li>
 *   <li>{@link org.tracegas.model.AnalysisRun#getFinished <em>Finished</em>}</li>
 *   <li>{@link org.tracegas.model.AnalysisRun#getStatus <em>Status</em>}</li>
 *   <li>{@link org.tracegas.model.AnalysisRun#getSoftwareVersion <em>Software Version</em>}</li>
 *   <li>{@link org.tracegas.model.AnalysisRun#getAnalyst <em>Analyst</em>}</li>
 *   <li>{@link org.tracegas.model.AnalysisRun#getMethod <em>Method</em>}</li>
 *   <li>{@link org.tracegas.model.AnalysisRun#getLibrary <em>Library</em>}</li>
 *   <li>{@link org.tracegas.model.AnalysisRun#getMeasurements <em>Measurements</em>}</li>
 *   <li>{@link org.tracegas.model.AnalysisRun#getResults <em>Results</em>}</li>
 *   <li>{@link org.tracegas.model.AnalysisRun#getQaChecks <em>Qa Checks</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getAnalysisRun()
 * @model
 * @generated
 */
public interface AnalysisRun extends StoredObject {
	/**
	 * Returns the value of the '<em><b>Started</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Started</em>' attribute.
	 * @see #setStarted(Instant)
	 * @see org.tracegas.model.WorkspacePackage#getAnalysisRun_Started()
	 * @model dataType="org.tracegas.model.Instant"
	 * @generated
	 */
	Instant getStarted();

	/**
	 * Sets the value of the '{@link org.tracegas.model.AnalysisRun#getStarted <em>Started</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Started</em>' attribute.
	 * @see #getStarted()
	 * @generated
	 */
	void setStarted(Instant value);

	/**
	 * Returns the value of the '<em><b>Finished</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Finished</em>' attribute.
	 * @see #setFinished(Instant)
	 * @see org.tracegas.model.WorkspacePackage#getAnalysisRun_Finished()
	 * @model dataType="org.tracegas.model.Instant"
	 * @generated
	 */
	Instant getFinished();

	/**
	 * Sets the value of the '{@link org.tracegas.model.AnalysisRun#getFinished <em>Finished</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Finished</em>' attribute.
	 * @see #getFinished()
	 * @generated
	 */
	void setFinished(Instant value);

	/**
	 * Returns the value of the '<em><b>Status</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracegas.model.RunStatus}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Status</em>' attribute.
	 * @see org.tracegas.model.RunStatus
	 * @see #setStatus(RunStatus)
	 * @see org.tracegas.model.WorkspacePackage#getAnalysisRun_Status()
	 * @model
	 * @generated
	 */
	RunStatus getStatus();

	/**
	 * Sets the value of the '{@link org.tracegas.model.AnalysisRun#getStatus <em>Status</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Status</em>' attribute.
	 * @see org.tracegas.model.RunStatus
	 * @see #getStatus()
	 * @generated
	 */
	void setStatus(RunStatus value);

	/**
	 * Returns the value of the '<em><b>Software Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Software Version</em>' attribute.
	 * @see #setSoftwareVersion(String)
	 * @see org.tracegas.model.WorkspacePackage#getAnalysisRun_SoftwareVersion()
	 * @model
	 * @generated
	 */
	String getSoftwareVersion();

	/**
	 * Sets the value of the '{@link org.tracegas.model.AnalysisRun#getSoftwareVersion <em>Software Version</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Software Version</em>' attribute.
	 * @see #getSoftwareVersion()
	 * @generated
	 */
	void setSoftwareVersion(String value);

	/**
	 * Returns the value of the '<em><b>Analyst</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Analyst</em>' reference.
	 * @see #setAnalyst(User)
	 * @see org.tracegas.model.WorkspacePackage#getAnalysisRun_Analyst()
	 * @model
	 * @generated
	 */
	User getAnalyst();

	/**
	 * Sets the value of the '{@link org.tracegas.model.AnalysisRun#getAnalyst <em>Analyst</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Analyst</em>' reference.
	 * @see #getAnalyst()
	 * @generated
	 */
	void setAnalyst(User value);

	/**
	 * Returns the value of the '<em><b>Method</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Method</em>' reference.
	 * @see #setMethod(MethodVersion)
	 * @see org.tracegas.model.WorkspacePackage#getAnalysisRun_Method()
	 * @model
	 * @generated
	 */
	MethodVersion getMethod();

	/**
	 * Sets the value of the '{@link org.tracegas.model.AnalysisRun#getMethod <em>Method</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Method</em>' reference.
	 * @see #getMethod()
	 * @generated
	 */
	void setMethod(MethodVersion value);

	/**
	 * Returns the value of the '<em><b>Library</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Library</em>' reference.
	 * @see #setLibrary(LibraryVersion)
	 * @see org.tracegas.model.WorkspacePackage#getAnalysisRun_Library()
	 * @model
	 * @generated
	 */
	LibraryVersion getLibrary();

	/**
	 * Sets the value of the '{@link org.tracegas.model.AnalysisRun#getLibrary <em>Library</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Library</em>' reference.
	 * @see #getLibrary()
	 * @generated
	 */
	void setLibrary(LibraryVersion value);

	/**
	 * Returns the value of the '<em><b>Measurements</b></em>' reference list.
	 * The list contents are of type {@link org.tracegas.model.Measurement}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Measurements</em>' reference list.
	 * @see org.tracegas.model.WorkspacePackage#getAnalysisRun_Measurements()
	 * @model
	 * @generated
	 */
	EList<Measurement> getMeasurements();

	/**
	 * Returns the value of the '<em><b>Results</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracegas.model.Result}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Results</em>' containment reference list.
	 * @see org.tracegas.model.WorkspacePackage#getAnalysisRun_Results()
	 * @model containment="true"
	 * @generated
	 */
	EList<Result> getResults();

	/**
	 * Returns the value of the '<em><b>Qa Checks</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracegas.model.QaCheck}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Qa Checks</em>' containment reference list.
	 * @see org.tracegas.model.WorkspacePackage#getAnalysisRun_QaChecks()
	 * @model containment="true"
	 * @generated
	 */
	EList<QaCheck> getQaChecks();

} // AnalysisRun
