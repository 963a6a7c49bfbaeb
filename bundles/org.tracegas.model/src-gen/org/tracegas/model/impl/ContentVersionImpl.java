/**
 */
package org.tracegas.model.impl;

import java.time.Instant;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracegas.model.ContentVersion;
import org.tracegas.model.WorkspacePackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Content Version</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.impl.ContentVersionImpl#getNumber <em>Number</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ContentVersionImpl#getParent <em>Parent</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ContentVersionImpl#getReason <em>Reason</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ContentVersionImpl#getCreated <em>Created</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ContentVersionImpl#getContentHash <em>Content Hash</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ContentVersionImpl#isFrozen <em>Frozen</em>}</li>
 * </ul>
 *
 * @generated
 */
public abstract class ContentVersionImpl extends StoredObjectImpl implements ContentVersion {
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
	 * The cached value of the '{@link #getParent() <em>Parent</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getParent()
	 * @generated
	 * @ordered
	 */
	protected ContentVersion parent;

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
	public ContentVersion getParent() {
		if (parent != null && parent.eIsProxy()) {
			InternalEObject oldParent = (InternalEObject)parent;
			parent = (ContentVersion)eResolveProxy(oldParent);
			if (parent != oldParent) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, WorkspacePackage.CONTENT_VERSION__PARENT, oldParent, parent));
			}
		}
		return parent;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public ContentVersion basicGetParent() {
		return parent;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setParent(ContentVersion newParent) {
		ContentVersion oldParent = parent;
		parent = newParent;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.CONTENT_VERSION__PARENT, oldParent, parent));
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
			case WorkspacePackage.CONTENT_VERSION__NUMBER:
				return getNumber();
			case WorkspacePackage.CONTENT_VERSION__PARENT:
				if (resolve) return getParent();
				return basicGetParent();
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
			case WorkspacePackage.CONTENT_VERSION__NUMBER:
				setNumber((Integer)newValue);
				return;
			case WorkspacePackage.CONTENT_VERSION__PARENT:
				setParent((ContentVersion)newValue);
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
			case WorkspacePackage.CONTENT_VERSION__NUMBER:
				setNumber(NUMBER_EDEFAULT);
				return;
			case WorkspacePackage.CONTENT_VERSION__PARENT:
				setParent((ContentVersion)null);
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
			case WorkspacePackage.CONTENT_VERSION__NUMBER:
				return number != NUMBER_EDEFAULT;
			case WorkspacePackage.CONTENT_VERSION__PARENT:
				return parent != null;
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
		result.append(" (number: ");
		result.append(number);
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
