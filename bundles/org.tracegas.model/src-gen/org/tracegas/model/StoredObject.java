/**
 */
package org.tracegas.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Stored Object</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * Anything kept in the workspace store: a stable identifier and a row version for optimistic locking.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.StoredObject#getId <em>Id</em>}</li>
 *   <li>{@link org.tracegas.model.StoredObject#getRowVersion <em>Row Version</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getStoredObject()
 * @model abstract="true"
 * @generated
 */
public interface StoredObject extends EObject {
	/**
	 * Returns the value of the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Stable identifier (a UUID), unique in the workspace.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Id</em>' attribute.
	 * @see #setId(String)
	 * @see org.tracegas.model.WorkspacePackage#getStoredObject_Id()
	 * @model id="true"
	 * @generated
	 */
	String getId();

	/**
	 * Sets the value of the '{@link org.tracegas.model.StoredObject#getId <em>Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Id</em>' attribute.
	 * @see #getId()
	 * @generated
	 */
	void setId(String value);

	/**
	 * Returns the value of the '<em><b>Row Version</b></em>' attribute.
	 * The default value is <code>"0"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Incremented by every stored change; a write that carries an older value is refused.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Row Version</em>' attribute.
	 * @see #setRowVersion(long)
	 * @see org.tracegas.model.WorkspacePackage#getStoredObject_RowVersion()
	 * @model default="0"
	 * @generated
	 */
	long getRowVersion();

	/**
	 * Sets the value of the '{@link org.tracegas.model.StoredObject#getRowVersion <em>Row Version</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Row Version</em>' attribute.
	 * @see #getRowVersion()
	 * @generated
	 */
	void setRowVersion(long value);

} // StoredObject
