/**
 */
package org.tracegas.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Emission Source</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A place of a site whose gas is measured: a stack, a duct, a process line or a sampling port on one of them.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.EmissionSource#getName <em>Name</em>}</li>
 *   <li>{@link org.tracegas.model.EmissionSource#getDescription <em>Description</em>}</li>
 *   <li>{@link org.tracegas.model.EmissionSource#getSite <em>Site</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getEmissionSource()
 * @model
 * @generated
 */
public interface EmissionSource extends StoredObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The source's name, unique at its site.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see org.tracegas.model.WorkspacePackage#getEmissionSource_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link org.tracegas.model.EmissionSource#getName <em>Name</em>}' attribute.
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
	 * What the source is, in the lab's words; may be empty.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Description</em>' attribute.
	 * @see #setDescription(String)
	 * @see org.tracegas.model.WorkspacePackage#getEmissionSource_Description()
	 * @model
	 * @generated
	 */
	String getDescription();

	/**
	 * Sets the value of the '{@link org.tracegas.model.EmissionSource#getDescription <em>Description</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Description</em>' attribute.
	 * @see #getDescription()
	 * @generated
	 */
	void setDescription(String value);

	/**
	 * Returns the value of the '<em><b>Site</b></em>' container reference.
	 * It is bidirectional and its opposite is '{@link org.tracegas.model.Site#getSources <em>Sources</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The site the source is at: its container.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Site</em>' container reference.
	 * @see #setSite(Site)
	 * @see org.tracegas.model.WorkspacePackage#getEmissionSource_Site()
	 * @see org.tracegas.model.Site#getSources
	 * @model opposite="sources"
	 * @generated
	 */
	Site getSite();

	/**
	 * Sets the value of the '{@link org.tracegas.model.EmissionSource#getSite <em>Site</em>}' container reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Site</em>' container reference.
	 * @see #getSite()
	 * @generated
	 */
	void setSite(Site value);

} // EmissionSource
