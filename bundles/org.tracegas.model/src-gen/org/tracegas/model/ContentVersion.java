/**
 */
package org.tracegas.model;

import java.time.Instant;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Content Version</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * An immutable version of versioned content. It is frozen once a result uses it; an edit makes a new version.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.ContentVersion#getNumber <em>Number</em>}</li>
 *   <li>{@link org.tracegas.model.ContentVersion#getParent <em>Parent</em>}</li>
 *   <li>{@link org.tracegas.model.ContentVersion#getReason <em>Reason</em>}</li>
 *   <li>{@link org.tracegas.model.ContentVersion#getCreated <em>Created</em>}</li>
 *   <li>{@link org.tracegas.model.ContentVersion#getContentHash <em>Content Hash</em>}</li>
 *   <li>{@link org.tracegas.model.ContentVersion#isFrozen <em>Frozen</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getContentVersion()
 * @model abstract="true"
 * @generated
 */
public interface ContentVersion extends StoredObject {
	/**
	 * Returns the value of the '<em><b>Number</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * 1 for the first version, then counting up.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Number</em>' attribute.
	 * @see #setNumber(int)
	 * @see org.tracegas.model.WorkspacePackage#getContentVersion_Number()
	 * @model
	 * @generated
	 */
	int getNumber();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ContentVersion#getNumber <em>Number</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Number</em>' attribute.
	 * @see #getNumber()
	 * @generated
	 */
	void setNumber(int value);

	/**
	 * Returns the value of the '<em><b>Parent</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The version this one was derived from; none for the first.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Parent</em>' reference.
	 * @see #setParent(ContentVersion)
	 * @see org.tracegas.model.WorkspacePackage#getContentVersion_Parent()
	 * @model
	 * @generated
	 */
	ContentVersion getParent();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ContentVersion#getParent <em>Parent</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Parent</em>' reference.
	 * @see #getParent()
	 * @generated
	 */
	void setParent(ContentVersion value);

	/**
	 * Returns the value of the '<em><b>Reason</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Why this version was made.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Reason</em>' attribute.
	 * @see #setReason(String)
	 * @see org.tracegas.model.WorkspacePackage#getContentVersion_Reason()
	 * @model
	 * @generated
	 */
	String getReason();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ContentVersion#getReason <em>Reason</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Reason</em>' attribute.
	 * @see #getReason()
	 * @generated
	 */
	void setReason(String value);

	/**
	 * Returns the value of the '<em><b>Created</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Created</em>' attribute.
	 * @see #setCreated(Instant)
	 * @see org.tracegas.model.WorkspacePackage#getContentVersion_Created()
	 * @model dataType="org.tracegas.model.Instant"
	 * @generated
	 */
	Instant getCreated();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ContentVersion#getCreated <em>Created</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Created</em>' attribute.
	 * @see #getCreated()
	 * @generated
	 */
	void setCreated(Instant value);

	/**
	 * Returns the value of the '<em><b>Content Hash</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * SHA-256, hex, of the canonical serialization of the content.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Content Hash</em>' attribute.
	 * @see #setContentHash(String)
	 * @see org.tracegas.model.WorkspacePackage#getContentVersion_ContentHash()
	 * @model
	 * @generated
	 */
	String getContentHash();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ContentVersion#getContentHash <em>Content Hash</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Content Hash</em>' attribute.
	 * @see #getContentHash()
	 * @generated
	 */
	void setContentHash(String value);

	/**
	 * Returns the value of the '<em><b>Frozen</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * True once a result refers to this version.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Frozen</em>' attribute.
	 * @see #setFrozen(boolean)
	 * @see org.tracegas.model.WorkspacePackage#getContentVersion_Frozen()
	 * @model
	 * @generated
	 */
	boolean isFrozen();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ContentVersion#isFrozen <em>Frozen</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Frozen</em>' attribute.
	 * @see #isFrozen()
	 * @generated
	 */
	void setFrozen(boolean value);

} // ContentVersion
