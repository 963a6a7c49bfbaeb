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
 * An immutable version of a method or a reference library, as the store keeps it. It is frozen once a result uses it; an edit makes a new version. Its item and parent are named by id: versions are read one at a time, without their item's other versions.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.ContentVersion#getKind <em>Kind</em>}</li>
 *   <li>{@link org.tracegas.model.ContentVersion#getItemId <em>Item Id</em>}</li>
 *   <li>{@link org.tracegas.model.ContentVersion#getItemName <em>Item Name</em>}</li>
 *   <li>{@link org.tracegas.model.ContentVersion#getNumber <em>Number</em>}</li>
 *   <li>{@link org.tracegas.model.ContentVersion#getParentId <em>Parent Id</em>}</li>
 *   <li>{@link org.tracegas.model.ContentVersion#getAuthorId <em>Author Id</em>}</li>
 *   <li>{@link org.tracegas.model.ContentVersion#getReason <em>Reason</em>}</li>
 *   <li>{@link org.tracegas.model.ContentVersion#getCreated <em>Created</em>}</li>
 *   <li>{@link org.tracegas.model.ContentVersion#getContentHash <em>Content Hash</em>}</li>
 *   <li>{@link org.tracegas.model.ContentVersion#isFrozen <em>Frozen</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getContentVersion()
 * @model
 * @generated
 */
public interface ContentVersion extends StoredObject {
	/**
	 * Returns the value of the '<em><b>Kind</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracegas.model.VersionKind}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Whether this is a version of a method or of a library.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Kind</em>' attribute.
	 * @see org.tracegas.model.VersionKind
	 * @see #setKind(VersionKind)
	 * @see org.tracegas.model.WorkspacePackage#getContentVersion_Kind()
	 * @model
	 * @generated
	 */
	VersionKind getKind();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ContentVersion#getKind <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Kind</em>' attribute.
	 * @see org.tracegas.model.VersionKind
	 * @see #getKind()
	 * @generated
	 */
	void setKind(VersionKind value);

	/**
	 * Returns the value of the '<em><b>Item Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Id of the method or library this version belongs to.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Item Id</em>' attribute.
	 * @see #setItemId(String)
	 * @see org.tracegas.model.WorkspacePackage#getContentVersion_ItemId()
	 * @model
	 * @generated
	 */
	String getItemId();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ContentVersion#getItemId <em>Item Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Item Id</em>' attribute.
	 * @see #getItemId()
	 * @generated
	 */
	void setItemId(String value);

	/**
	 * Returns the value of the '<em><b>Item Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Name of the method or library this version belongs to.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Item Name</em>' attribute.
	 * @see #setItemName(String)
	 * @see org.tracegas.model.WorkspacePackage#getContentVersion_ItemName()
	 * @model
	 * @generated
	 */
	String getItemName();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ContentVersion#getItemName <em>Item Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Item Name</em>' attribute.
	 * @see #getItemName()
	 * @generated
	 */
	void setItemName(String value);

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
	 * Returns the value of the '<em><b>Parent Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Id of the version this one was derived from; null for the first.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Parent Id</em>' attribute.
	 * @see #setParentId(String)
	 * @see org.tracegas.model.WorkspacePackage#getContentVersion_ParentId()
	 * @model
	 * @generated
	 */
	String getParentId();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ContentVersion#getParentId <em>Parent Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Parent Id</em>' attribute.
	 * @see #getParentId()
	 * @generated
	 */
	void setParentId(String value);

	/**
	 * Returns the value of the '<em><b>Author Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Id of the workspace user who made this version; set by the store.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Author Id</em>' attribute.
	 * @see #setAuthorId(String)
	 * @see org.tracegas.model.WorkspacePackage#getContentVersion_AuthorId()
	 * @model
	 * @generated
	 */
	String getAuthorId();

	/**
	 * Sets the value of the '{@link org.tracegas.model.ContentVersion#getAuthorId <em>Author Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Author Id</em>' attribute.
	 * @see #getAuthorId()
	 * @generated
	 */
	void setAuthorId(String value);

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
