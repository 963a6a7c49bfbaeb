/**
 */
package org.tracegas.model.impl;

import java.time.Instant;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracegas.model.ContentVersion;
import org.tracegas.model.VersionKind;
import org.tracegas.model.WorkspacePackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Content Version</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.impl.ContentVersionImpl#getKind <em>Kind</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ContentVersionImpl#getItemId <em>Item Id</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ContentVersionImpl#getItemName <em>Item Name</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ContentVersionImpl#getNumber <em>Number</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ContentVersionImpl#getParentId <em>Parent Id</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ContentVersionImpl#getAuthorId <em>Author Id</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ContentVersionImpl#getReason <em>Reason</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ContentVersionImpl#getCreated <em>Created</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ContentVersionImpl#getContentHash <em>Content Hash</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ContentVersionImpl#isFrozen <em>Frozen</em>}</li>
 * </ul>
 *
 * @generated
 */
public class ContentVersionImpl extends StoredObjectImpl implements ContentVersion {
	/**
	 * The default value of the '{@link #getKind() <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKind()
	 * @generated
	 * @ordered
	 */
	protected static final VersionKind KIND_EDEFAULT = VersionKind.METHOD;

	/**
	 * The cached value of the '{@link #getKind() <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKind()
	 * @generated
	 * @ordered
	 */
	protected VersionKind kind = KIND_EDEFAULT;

	/**
	 * The default value of the '{@link #getItemId() <em>Item Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getItemId()
	 * @generated
	 * @ordered
	 */
	protected static final String ITEM_ID_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getItemId() <em>Item Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getItemId()
	 * @generated
	 * @ordered
	 */
	protected String itemId = ITEM_ID_EDEFAULT;

	/**
	 * The default value of the '{@link #getItemName() <em>Item Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getItemName()
	 * @generated
	 * @ordered
	 */
	protected static final String ITEM_NAME_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getItemName() <em>Item Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getItemName()
	 * @generated
	 * @ordered
	 */
	protected String itemName = ITEM_NAME_EDEFAULT;

	/**
	 * The default value of the '{@link #getNumber() <em>Number</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNumber()
	 * @generated
	 * @ordered
	 */
	protected static final int NUMBER_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getNumber() <em>Number</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNumber()
	 * @generated
	 * @ordered
	 */
	protected int number = NUMBER_EDEFAULT;

	/**
	 * The default value of the '{@link #getParentId() <em>Parent Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getParentId()
	 * @generated
	 * @ordered
	 */
	protected static final String PARENT_ID_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getParentId() <em>Parent Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getParentId()
	 * @generated
	 * @ordered
	 */
	protected String parentId = PARENT_ID_EDEFAULT;

	/**
	 * The default value of the '{@link #getAuthorId() <em>Author Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAuthorId()
	 * @generated
	 * @ordered
	 */
	protected static final String AUTHOR_ID_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getAuthorId() <em>Author Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAuthorId()
	 * @generated
	 * @ordered
	 */
	protected String authorId = AUTHOR_ID_EDEFAULT;

	/**
	 * The default value of the '{@link #getReason() <em>Reason</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getReason()
	 * @generated
	 * @ordered
	 */
	protected static final String REASON_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getReason() <em>Reason</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getReason()
	 * @generated
	 * @ordered
	 */
	protected String reason = REASON_EDEFAULT;

	/**
	 * The default value of the '{@link #getCreated() <em>Created</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCreated()
	 * @generated
	 * @ordered
	 */
	protected static final Instant CREATED_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getCreated() <em>Created</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCreated()
	 * @generated
	 * @ordered
	 */
	protected Instant created = CREATED_EDEFAULT;

	/**
	 * The default value of the '{@link #getContentHash() <em>Content Hash</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getContentHash()
	 * @generated
	 * @ordered
	 */
	protected static final String CONTENT_HASH_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getContentHash() <em>Content Hash</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getContentHash()
	 * @generated
	 * @ordered
	 */
	protected String contentHash = CONTENT_HASH_EDEFAULT;

	/**
	 * The default value of the '{@link #isFrozen() <em>Frozen</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isFrozen()
	 * @generated
	 * @ordered
	 */
	protected static final boolean FROZEN_EDEFAULT = false;

	/**
	 * The cached value of the '{@link #isFrozen() <em>Frozen</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isFrozen()
	 * @generated
	 * @ordered
	 */
	protected boolean frozen = FROZEN_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected ContentVersionImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return WorkspacePackage.Literals.CONTENT_VERSION;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public VersionKind getKind() {
		return kind;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setKind(VersionKind newKind) {
		VersionKind oldKind = kind;
		kind = newKind == null ? KIND_EDEFAULT : newKind;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.CONTENT_VERSION__KIND, oldKind, kind));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getItemId() {
		return itemId;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setItemId(String newItemId) {
		String oldItemId = itemId;
		itemId = newItemId;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.CONTENT_VERSION__ITEM_ID, oldItemId, itemId));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getItemName() {
		return itemName;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setItemName(String newItemName) {
		String oldItemName = itemName;
		itemName = newItemName;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.CONTENT_VERSION__ITEM_NAME, oldItemName, itemName));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getNumber() {
		return number;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setNumber(int newNumber) {
		int oldNumber = number;
		number = newNumber;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.CONTENT_VERSION__NUMBER, oldNumber, number));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getParentId() {
		return parentId;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setParentId(String newParentId) {
		String oldParentId = parentId;
		parentId = newParentId;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.CONTENT_VERSION__PARENT_ID, oldParentId, parentId));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getAuthorId() {
		return authorId;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setAuthorId(String newAuthorId) {
		String oldAuthorId = authorId;
		authorId = newAuthorId;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.CONTENT_VERSION__AUTHOR_ID, oldAuthorId, authorId));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getReason() {
		return reason;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setReason(String newReason) {
		String oldReason = reason;
		reason = newReason;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.CONTENT_VERSION__REASON, oldReason, reason));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Instant getCreated() {
		return created;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCreated(Instant newCreated) {
		Instant oldCreated = created;
		created = newCreated;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.CONTENT_VERSION__CREATED, oldCreated, created));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getContentHash() {
		return contentHash;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setContentHash(String newContentHash) {
		String oldContentHash = contentHash;
		contentHash = newContentHash;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.CONTENT_VERSION__CONTENT_HASH, oldContentHash, contentHash));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isFrozen() {
		return frozen;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setFrozen(boolean newFrozen) {
		boolean oldFrozen = frozen;
		frozen = newFrozen;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.CONTENT_VERSION__FROZEN, oldFrozen, frozen));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case WorkspacePackage.CONTENT_VERSION__KIND:
				return getKind();
			case WorkspacePackage.CONTENT_VERSION__ITEM_ID:
				return getItemId();
			case WorkspacePackage.CONTENT_VERSION__ITEM_NAME:
				return getItemName();
			case WorkspacePackage.CONTENT_VERSION__NUMBER:
				return getNumber();
			case WorkspacePackage.CONTENT_VERSION__PARENT_ID:
				return getParentId();
			case WorkspacePackage.CONTENT_VERSION__AUTHOR_ID:
				return getAuthorId();
			case WorkspacePackage.CONTENT_VERSION__REASON:
				return getReason();
			case WorkspacePackage.CONTENT_VERSION__CREATED:
				return getCreated();
			case WorkspacePackage.CONTENT_VERSION__CONTENT_HASH:
				return getContentHash();
			case WorkspacePackage.CONTENT_VERSION__FROZEN:
				return isFrozen();
		}
		return super.eGet(featureID, resolve, coreType);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void eSet(int featureID, Object newValue) {
		switch (featureID) {
			case WorkspacePackage.CONTENT_VERSION__KIND:
				setKind((VersionKind)newValue);
				return;
			case WorkspacePackage.CONTENT_VERSION__ITEM_ID:
				setItemId((String)newValue);
				return;
			case WorkspacePackage.CONTENT_VERSION__ITEM_NAME:
				setItemName((String)newValue);
				return;
			case WorkspacePackage.CONTENT_VERSION__NUMBER:
				setNumber((Integer)newValue);
				return;
			case WorkspacePackage.CONTENT_VERSION__PARENT_ID:
				setParentId((String)newValue);
				return;
			case WorkspacePackage.CONTENT_VERSION__AUTHOR_ID:
				setAuthorId((String)newValue);
				return;
			case WorkspacePackage.CONTENT_VERSION__REASON:
				setReason((String)newValue);
				return;
			case WorkspacePackage.CONTENT_VERSION__CREATED:
				setCreated((Instant)newValue);
				return;
			case WorkspacePackage.CONTENT_VERSION__CONTENT_HASH:
				setContentHash((String)newValue);
				return;
			case WorkspacePackage.CONTENT_VERSION__FROZEN:
				setFrozen((Boolean)newValue);
				return;
		}
		super.eSet(featureID, newValue);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void eUnset(int featureID) {
		switch (featureID) {
			case WorkspacePackage.CONTENT_VERSION__KIND:
				setKind(KIND_EDEFAULT);
				return;
			case WorkspacePackage.CONTENT_VERSION__ITEM_ID:
				setItemId(ITEM_ID_EDEFAULT);
				return;
			case WorkspacePackage.CONTENT_VERSION__ITEM_NAME:
				setItemName(ITEM_NAME_EDEFAULT);
				return;
			case WorkspacePackage.CONTENT_VERSION__NUMBER:
				setNumber(NUMBER_EDEFAULT);
				return;
			case WorkspacePackage.CONTENT_VERSION__PARENT_ID:
				setParentId(PARENT_ID_EDEFAULT);
				return;
			case WorkspacePackage.CONTENT_VERSION__AUTHOR_ID:
				setAuthorId(AUTHOR_ID_EDEFAULT);
				return;
			case WorkspacePackage.CONTENT_VERSION__REASON:
				setReason(REASON_EDEFAULT);
				return;
			case WorkspacePackage.CONTENT_VERSION__CREATED:
				setCreated(CREATED_EDEFAULT);
				return;
			case WorkspacePackage.CONTENT_VERSION__CONTENT_HASH:
				setContentHash(CONTENT_HASH_EDEFAULT);
				return;
			case WorkspacePackage.CONTENT_VERSION__FROZEN:
				setFrozen(FROZEN_EDEFAULT);
				return;
		}
		super.eUnset(featureID);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean eIsSet(int featureID) {
		switch (featureID) {
			case WorkspacePackage.CONTENT_VERSION__KIND:
				return kind != KIND_EDEFAULT;
			case WorkspacePackage.CONTENT_VERSION__ITEM_ID:
				return ITEM_ID_EDEFAULT == null ? itemId != null : !ITEM_ID_EDEFAULT.equals(itemId);
			case WorkspacePackage.CONTENT_VERSION__ITEM_NAME:
				return ITEM_NAME_EDEFAULT == null ? itemName != null : !ITEM_NAME_EDEFAULT.equals(itemName);
			case WorkspacePackage.CONTENT_VERSION__NUMBER:
				return number != NUMBER_EDEFAULT;
			case WorkspacePackage.CONTENT_VERSION__PARENT_ID:
				return PARENT_ID_EDEFAULT == null ? parentId != null : !PARENT_ID_EDEFAULT.equals(parentId);
			case WorkspacePackage.CONTENT_VERSION__AUTHOR_ID:
				return AUTHOR_ID_EDEFAULT == null ? authorId != null : !AUTHOR_ID_EDEFAULT.equals(authorId);
			case WorkspacePackage.CONTENT_VERSION__REASON:
				return REASON_EDEFAULT == null ? reason != null : !REASON_EDEFAULT.equals(reason);
			case WorkspacePackage.CONTENT_VERSION__CREATED:
				return CREATED_EDEFAULT == null ? created != null : !CREATED_EDEFAULT.equals(created);
			case WorkspacePackage.CONTENT_VERSION__CONTENT_HASH:
				return CONTENT_HASH_EDEFAULT == null ? contentHash != null : !CONTENT_HASH_EDEFAULT.equals(contentHash);
			case WorkspacePackage.CONTENT_VERSION__FROZEN:
				return frozen != FROZEN_EDEFAULT;
		}
		return super.eIsSet(featureID);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String toString() {
		if (eIsProxy()) return super.toString();

		StringBuilder result = new StringBuilder(super.toString());
		result.append(" (kind: ");
		result.append(kind);
		result.append(", itemId: ");
		result.append(itemId);
		result.append(", itemName: ");
		result.append(itemName);
		result.append(", number: ");
		result.append(number);
		result.append(", parentId: ");
		result.append(parentId);
		result.append(", authorId: ");
		result.append(authorId);
		result.append(", reason: ");
		result.append(reason);
		result.append(", created: ");
		result.append(created);
		result.append(", contentHash: ");
		result.append(contentHash);
		result.append(", frozen: ");
		result.append(frozen);
		result.append(')');
		return result.toString();
	}

} //ContentVersionImpl
