/**
 */
package org.tracegas.model;

import java.time.Instant;

import org.eclipse.emf.common.util.EList;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Project</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A measurement campaign for one client.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.Project#getCode <em>Code</em>}</li>
 *   <li>{@link org.tracegas.model.Project#getClient <em>Client</em>}</li>
 *   <li>{@link org.tracegas.model.Project#getName <em>Name</em>}</li>
 *   <li>{@link org.tracegas.model.Project#getStart <em>Start</em>}</li>
 *   <li>{@link org.tracegas.model.Project#getEnd <em>End</em>}</li>
 *   <li>{@link org.tracegas.model.Project#getMeasurements <em>Measurements</em>}</li>
 *   <li>{@link org.tracegas.model.Project#getReports <em>Reports</em>}</li>
 *   <li>{@link org.tracegas.model.Project#getBatches <em>Batches</em>}</li>
 *   <li>{@link org.tracegas.model.Project#getSource <em>Source</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getProject()
 * @model
 * @generated
 */
public interface Project extends StoredObject {
	/**
	 * Returns the value of the '<em><b>Code</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Short campaign code, unique per client.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Code</em>' attribute.
	 * @see #setCode(String)
	 * @see org.tracegas.model.WorkspacePackage#getProject_Code()
	 * @model
	 * @generated
	 */
	String getCode();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Project#getCode <em>Code</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Code</em>' attribute.
	 * @see #getCode()
	 * @generated
	 */
	void setCode(String value);

	/**
	 * Returns the value of the '<em><b>Client</b></em>' container reference.
	 * It is bidirectional and its opposite is '{@link org.tracegas.model.Client#getProjects <em>Projects</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The client the campaign is made for: the project's container.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Client</em>' container reference.
	 * @see #setClient(Client)
	 * @see org.tracegas.model.WorkspacePackage#getProject_Client()
	 * @see org.tracegas.model.Client#getProjects
	 * @model opposite="projects"
	 * @generated
	 */
	Client getClient();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Project#getClient <em>Client</em>}' container reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Client</em>' container reference.
	 * @see #getClient()
	 * @generated
	 */
	void setClient(Client value);

	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * What the campaign is, in the lab's words.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see org.tracegas.model.WorkspacePackage#getProject_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Project#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Start</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Start</em>' attribute.
	 * @see #setStart(Instant)
	 * @see org.tracegas.model.WorkspacePackage#getProject_Start()
	 * @model dataType="org.tracegas.model.Instant"
	 * @generated
	 */
	Instant getStart();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Project#getStart <em>Start</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Start</em>' attribute.
	 * @see #getStart()
	 * @generated
	 */
	void setStart(Instant value);

	/**
	 * Returns the value of the '<em><b>End</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>End</em>' attribute.
	 * @see #setEnd(Instant)
	 * @see org.tracegas.model.WorkspacePackage#getProject_End()
	 * @model dataType="org.tracegas.model.Instant"
	 * @generated
	 */
	Instant getEnd();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Project#getEnd <em>End</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>End</em>' attribute.
	 * @see #getEnd()
	 * @generated
	 */
	void setEnd(Instant value);

	/**
	 * Returns the value of the '<em><b>Measurements</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracegas.model.Measurement}.
	 * It is bidirectional and its opposite is '{@link org.tracegas.model.Measurement#getProject <em>Project</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The project's measurements, in time order as the store reads them.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Measurements</em>' containment reference list.
	 * @see org.tracegas.model.WorkspacePackage#getProject_Measurements()
	 * @see org.tracegas.model.Measurement#getProject
	 * @model opposite="project" containment="true"
	 * @generated
	 */
	EList<Measurement> getMeasurements();

	/**
	 * Returns the value of the '<em><b>Reports</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracegas.model.Report}.
	 * It is bidirectional and its opposite is '{@link org.tracegas.model.Report#getProject <em>Project</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The reports issued from the project, in the order they were issued, as the store reads them.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Reports</em>' containment reference list.
	 * @see org.tracegas.model.WorkspacePackage#getProject_Reports()
	 * @see org.tracegas.model.Report#getProject
	 * @model opposite="project" containment="true"
	 * @generated
	 */
	EList<Report> getReports();

	/**
	 * Returns the value of the '<em><b>Batches</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracegas.model.WorkBatch}.
	 * It is bidirectional and its opposite is '{@link org.tracegas.model.WorkBatch#getProject <em>Project</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The project's shared work batches, oldest first as the store reads them.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Batches</em>' containment reference list.
	 * @see org.tracegas.model.WorkspacePackage#getProject_Batches()
	 * @see org.tracegas.model.WorkBatch#getProject
	 * @model opposite="project" containment="true"
	 * @generated
	 */
	EList<WorkBatch> getBatches();

	/**
	 * Returns the value of the '<em><b>Source</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The emission source the campaign measures; none for a project recorded without one (workspaces made before sites were kept have none).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Source</em>' reference.
	 * @see #setSource(EmissionSource)
	 * @see org.tracegas.model.WorkspacePackage#getProject_Source()
	 * @model
	 * @generated
	 */
	EmissionSource getSource();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Project#getSource <em>Source</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Source</em>' reference.
	 * @see #getSource()
	 * @generated
	 */
	void setSource(EmissionSource value);

} // Project
