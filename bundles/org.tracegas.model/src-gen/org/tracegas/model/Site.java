/**
 */
package org.tracegas.model;

import org.eclipse.emf.common.util.EList;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Site</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A plant or other place of a client where the laboratory measures: holds its emission sources.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.Site#getName <em>Name</em>}</li>
 *   <li>{@link org.tracegas.model.Site#getDescription <em>Description</em>}</li>
 *   <li>{@link org.tracegas.model.Site#getClient <em>Client</em>}</li>
 *   <li>{@link org.tracegas.model.Site#getSources <em>Sources</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getSite()
 * @model
 * @generated
 */
public interface Site extends StoredObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The site's name, unique for its client.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see org.tracegas.model.WorkspacePackage#getSite_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Site#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * What and where the site is, in the lab's words; may be empty.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Description</em>' attribute.
	 * @see #setDescription(String)
	 * @see org.tracegas.model.WorkspacePackage#getSite_Description()
	 * @model
	 * @generated
	 */
	String getDescription();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Site#getDescription <em>Description</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Description</em>' attribute.
	 * @see #getDescription()
	 * @generated
	 */
	void setDescription(String value);

	/**
	 * Returns the value of the '<em><b>Client</b></em>' container reference.
	 * It is bidirectional and its opposite is '{@link org.tracegas.model.Client#getSites <em>Sites</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The client owning the site: its container.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Client</em>' container reference.
	 * @see #setClient(Client)
	 * @see org.tracegas.model.WorkspacePackage#getSite_Client()
	 * @see org.tracegas.model.Client#getSites
	 * @model opposite="sites"
	 * @generated
	 */
	Client getClient();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Site#getClient <em>Client</em>}' container reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Client</em>' container reference.
	 * @see #getClient()
	 * @generated
	 */
	void setClient(Client value);

	/**
	 * Returns the value of the '<em><b>Sources</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracegas.model.EmissionSource}.
	 * It is bidirectional and its opposite is '{@link org.tracegas.model.EmissionSource#getSite <em>Site</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The site's emission sources, by name as the store reads them.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Sources</em>' containment reference list.
	 * @see org.tracegas.model.WorkspacePackage#getSite_Sources()
	 * @see org.tracegas.model.EmissionSource#getSite
	 * @model opposite="site" containment="true"
	 * @generated
	 */
	EList<EmissionSource> getSources();

} // Site
