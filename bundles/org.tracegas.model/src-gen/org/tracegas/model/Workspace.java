/**
 */
package org.tracegas.model;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Workspace</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * Root of one laboratory workspace.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.Workspace#getName <em>Name</em>}</li>
 *   <li>{@link org.tracegas.model.Workspace#getClients <em>Clients</em>}</li>
 *   <li>{@link org.tracegas.model.Workspace#getLibraries <em>Libraries</em>}</li>
 *   <li>{@link org.tracegas.model.Workspace#getMethods <em>Methods</em>}</li>
 *   <li>{@link org.tracegas.model.Workspace#getInstruments <em>Instruments</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getWorkspace()
 * @model
 * @generated
 */
public interface Workspace extends EObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see org.tracegas.model.WorkspacePackage#getWorkspace_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link org.tracegas.model.Workspace#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Clients</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracegas.model.Client}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Clients</em>' containment reference list.
	 * @see org.tracegas.model.WorkspacePackage#getWorkspace_Clients()
	 * @model containment="true"
	 * @generated
	 */
	EList<Client> getClients();

	/**
	 * Returns the value of the '<em><b>Libraries</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracegas.model.ReferenceLibrary}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Libraries</em>' containment reference list.
	 * @see org.tracegas.model.WorkspacePackage#getWorkspace_Libraries()
	 * @model containment="true"
	 * @generated
	 */
	EList<ReferenceLibrary> getLibraries();

	/**
	 * Returns the value of the '<em><b>Methods</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracegas.model.AnalysisMethod}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Methods</em>' containment reference list.
	 * @see org.tracegas.model.WorkspacePackage#getWorkspace_Methods()
	 * @model containment="true"
	 * @generated
	 */
	EList<AnalysisMethod> getMethods();

	/**
	 * Returns the value of the '<em><b>Instruments</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracegas.model.Instrument}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The laboratory's instruments: an analyzer serves the campaigns of several clients.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Instruments</em>' containment reference list.
	 * @see org.tracegas.model.WorkspacePackage#getWorkspace_Instruments()
	 * @model containment="true"
	 * @generated
	 */
	EList<Instrument> getInstruments();

} // Workspace
