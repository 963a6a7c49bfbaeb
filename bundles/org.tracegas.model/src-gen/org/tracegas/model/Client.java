/**
 */
package org.tracegas.model;

import org.eclipse.emf.common.util.EList;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Client</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A customer of the laboratory: owns sites and campaigns.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.Client#getName <em>Name</em>}</li>
 *   <li>{@link org.tracegas.model.Client#getContact <em>Contact</em>}</li>
 *   <li>{@link org.tracegas.model.Client#getProjects <em>Projects</em>}</li>
 *   <li>{@link org.tracegas.model.Client#getSites <em>Sites</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getClient()
 * @model
 * @generated
 */
public interface Client extends StoredObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The client's name, unique in the workspace.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see org.tracegas.model.WorkspacePackage#getClient_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Client#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Contact</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Contact</em>' attribute.
	 * @see #setContact(String)
	 * @see org.tracegas.model.WorkspacePackage#getClient_Contact()
	 * @model
	 * @generated
	 */
	String getContact();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Client#getContact <em>Contact</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Contact</em>' attribute.
	 * @see #getContact()
	 * @generated
	 */
	void setContact(String value);

	/**
	 * Returns the value of the '<em><b>Projects</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracegas.model.Project}.
	 * It is bidirectional and its opposite is '{@link org.tracegas.model.Project#getClient <em>Client</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The client's projects; as the store reads them, only those the signed-in user may read.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Projects</em>' containment reference list.
	 * @see org.tracegas.model.WorkspacePackage#getClient_Projects()
	 * @see org.tracegas.model.Project#getClient
	 * @model opposite="client" containment="true"
	 * @generated
	 */
	EList<Project> getProjects();

	/**
	 * Returns the value of the '<em><b>Sites</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracegas.model.Site}.
	 * It is bidirectional and its opposite is '{@link org.tracegas.model.Site#getClient <em>Client</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The client's sites (plants), by name as the store reads them.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Sites</em>' containment reference list.
	 * @see org.tracegas.model.WorkspacePackage#getClient_Sites()
	 * @see org.tracegas.model.Site#getClient
	 * @model opposite="client" containment="true"
	 * @generated
	 */
	EList<Site> getSites();

} // Client
