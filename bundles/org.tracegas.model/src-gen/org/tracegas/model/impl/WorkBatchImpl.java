/**
 */
package org.tracegas.model.impl;

import java.time.Instant;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.NotificationChain;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.eclipse.emf.ecore.util.EcoreUtil;

import org.tracegas.model.Project;
import org.tracegas.model.WorkBatch;
import org.tracegas.model.WorkspacePackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Work Batch</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.impl.WorkBatchImpl#getProject <em>Project</em>}</li>
 *   <li>{@link org.tracegas.model.impl.WorkBatchImpl#getMethodVersionId <em>Method Version Id</em>}</li>
 *   <li>{@link org.tracegas.model.impl.WorkBatchImpl#getDescription <em>Description</em>}</li>
 *   <li>{@link org.tracegas.model.impl.WorkBatchImpl#getUnitCount <em>Unit Count</em>}</li>
 *   <li>{@link org.tracegas.model.impl.WorkBatchImpl#getCreatedBy <em>Created By</em>}</li>
 *   <li>{@link org.tracegas.model.impl.WorkBatchImpl#getCreatedAt <em>Created At</em>}</li>
 * </ul>
 *
 * @generated
 */
public class WorkBatchImpl extends StoredObjectImpl implements WorkBatch {
	/**
	 * The default value of the '{@link #getMethodVersionId() <em>Method Version Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMethodVersionId()
	 * @generated
	 * @ordered
	 */
	protected static final String METHOD_VERSION_ID_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getMethodVersionId() <em>Method Version Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMethodVersionId()
	 * @generated
	 * @ordered
	 */
	protected String methodVersionId = METHOD_VERSION_ID_EDEFAULT;

	/**
	 * The default value of the '{@link #getDescription() <em>Description</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDescription()
	 * @generated
	 * @ordered
	 */
	protected static final String DESCRIPTION_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getDescription() <em>Description</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDescription()
	 * @generated
	 * @ordered
	 */
	protected String description = DESCRIPTION_EDEFAULT;

	/**
	 * The default value of the '{@link #getUnitCount() <em>Unit Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUnitCount()
	 * @generated
	 * @ordered
	 */
	protected static final int UNIT_COUNT_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getUnitCount() <em>Unit Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUnitCount()
	 * @generated
	 * @ordered
	 */
	protected int unitCount = UNIT_COUNT_EDEFAULT;

	/**
	 * The default value of the '{@link #getCreatedBy() <em>Created By</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCreatedBy()
	 * @generated
	 * @ordered
	 */
	protected static final String CREATED_BY_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getCreatedBy() <em>Created By</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCreatedBy()
	 * @generated
	 * @ordered
	 */
	protected String createdBy = CREATED_BY_EDEFAULT;

	/**
	 * The default value of the '{@link #getCreatedAt() <em>Created At</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCreatedAt()
	 * @generated
	 * @ordered
	 */
	protected static final Instant CREATED_AT_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getCreatedAt() <em>Created At</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCreatedAt()
	 * @generated
	 * @ordered
	 */
	protected Instant createdAt = CREATED_AT_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected WorkBatchImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return WorkspacePackage.Literals.WORK_BATCH;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Project getProject() {
		if (eContainerFeatureID() != WorkspacePackage.WORK_BATCH__PROJECT) return null;
		return (Project)eInternalContainer();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetProject(Project newProject, NotificationChain msgs) {
		msgs = eBasicSetContainer((InternalEObject)newProject, WorkspacePackage.WORK_BATCH__PROJECT, msgs);
		return msgs;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setProject(Project newProject) {
		if (newProject != eInternalContainer() || (eContainerFeatureID() != WorkspacePackage.WORK_BATCH__PROJECT && newProject != null)) {
			if (EcoreUtil.isAncestor(this, newProject))
				throw new IllegalArgumentException("Recursive containment not allowed for " + toString());
			NotificationChain msgs = null;
			if (eInternalContainer() != null)
				msgs = eBasicRemoveFromContainer(msgs);
			if (newProject != null)
				msgs = ((InternalEObject)newProject).eInverseAdd(this, WorkspacePackage.PROJECT__BATCHES, Project.class, msgs);
			msgs = basicSetProject(newProject, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.WORK_BATCH__PROJECT, newProject, newProject));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getMethodVersionId() {
		return methodVersionId;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMethodVersionId(String newMethodVersionId) {
		String oldMethodVersionId = methodVersionId;
		methodVersionId = newMethodVersionId;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.WORK_BATCH__METHOD_VERSION_ID, oldMethodVersionId, methodVersionId));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getDescription() {
		return description;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDescription(String newDescription) {
		String oldDescription = description;
		description = newDescription;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.WORK_BATCH__DESCRIPTION, oldDescription, description));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getUnitCount() {
		return unitCount;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setUnitCount(int newUnitCount) {
		int oldUnitCount = unitCount;
		unitCount = newUnitCount;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.WORK_BATCH__UNIT_COUNT, oldUnitCount, unitCount));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getCreatedBy() {
		return createdBy;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCreatedBy(String newCreatedBy) {
		String oldCreatedBy = createdBy;
		createdBy = newCreatedBy;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.WORK_BATCH__CREATED_BY, oldCreatedBy, createdBy));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Instant getCreatedAt() {
		return createdAt;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCreatedAt(Instant newCreatedAt) {
		Instant oldCreatedAt = createdAt;
		createdAt = newCreatedAt;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.WORK_BATCH__CREATED_AT, oldCreatedAt, createdAt));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseAdd(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case WorkspacePackage.WORK_BATCH__PROJECT:
				if (eInternalContainer() != null)
					msgs = eBasicRemoveFromContainer(msgs);
				return basicSetProject((Project)otherEnd, msgs);
		}
		return super.eInverseAdd(otherEnd, featureID, msgs);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case WorkspacePackage.WORK_BATCH__PROJECT:
				return basicSetProject(null, msgs);
		}
		return super.eInverseRemove(otherEnd, featureID, msgs);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eBasicRemoveFromContainerFeature(NotificationChain msgs) {
		switch (eContainerFeatureID()) {
			case WorkspacePackage.WORK_BATCH__PROJECT:
				return eInternalContainer().eInverseRemove(this, WorkspacePackage.PROJECT__BATCHES, Project.class, msgs);
		}
		return super.eBasicRemoveFromContainerFeature(msgs);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case WorkspacePackage.WORK_BATCH__PROJECT:
				return getProject();
			case WorkspacePackage.WORK_BATCH__METHOD_VERSION_ID:
				return getMethodVersionId();
			case WorkspacePackage.WORK_BATCH__DESCRIPTION:
				return getDescription();
			case WorkspacePackage.WORK_BATCH__UNIT_COUNT:
				return getUnitCount();
			case WorkspacePackage.WORK_BATCH__CREATED_BY:
				return getCreatedBy();
			case WorkspacePackage.WORK_BATCH__CREATED_AT:
				return getCreatedAt();
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
			case WorkspacePackage.WORK_BATCH__PROJECT:
				setProject((Project)newValue);
				return;
			case WorkspacePackage.WORK_BATCH__METHOD_VERSION_ID:
				setMethodVersionId((String)newValue);
				return;
			case WorkspacePackage.WORK_BATCH__DESCRIPTION:
				setDescription((String)newValue);
				return;
			case WorkspacePackage.WORK_BATCH__UNIT_COUNT:
				setUnitCount((Integer)newValue);
				return;
			case WorkspacePackage.WORK_BATCH__CREATED_BY:
				setCreatedBy((String)newValue);
				return;
			case WorkspacePackage.WORK_BATCH__CREATED_AT:
				setCreatedAt((Instant)newValue);
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
			case WorkspacePackage.WORK_BATCH__PROJECT:
				setProject((Project)null);
				return;
			case WorkspacePackage.WORK_BATCH__METHOD_VERSION_ID:
				setMethodVersionId(METHOD_VERSION_ID_EDEFAULT);
				return;
			case WorkspacePackage.WORK_BATCH__DESCRIPTION:
				setDescription(DESCRIPTION_EDEFAULT);
				return;
			case WorkspacePackage.WORK_BATCH__UNIT_COUNT:
				setUnitCount(UNIT_COUNT_EDEFAULT);
				return;
			case WorkspacePackage.WORK_BATCH__CREATED_BY:
				setCreatedBy(CREATED_BY_EDEFAULT);
				return;
			case WorkspacePackage.WORK_BATCH__CREATED_AT:
				setCreatedAt(CREATED_AT_EDEFAULT);
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
			case WorkspacePackage.WORK_BATCH__PROJECT:
				return getProject() != null;
			case WorkspacePackage.WORK_BATCH__METHOD_VERSION_ID:
				return METHOD_VERSION_ID_EDEFAULT == null ? methodVersionId != null : !METHOD_VERSION_ID_EDEFAULT.equals(methodVersionId);
			case WorkspacePackage.WORK_BATCH__DESCRIPTION:
				return DESCRIPTION_EDEFAULT == null ? description != null : !DESCRIPTION_EDEFAULT.equals(description);
			case WorkspacePackage.WORK_BATCH__UNIT_COUNT:
				return unitCount != UNIT_COUNT_EDEFAULT;
			case WorkspacePackage.WORK_BATCH__CREATED_BY:
				return CREATED_BY_EDEFAULT == null ? createdBy != null : !CREATED_BY_EDEFAULT.equals(createdBy);
			case WorkspacePackage.WORK_BATCH__CREATED_AT:
				return CREATED_AT_EDEFAULT == null ? createdAt != null : !CREATED_AT_EDEFAULT.equals(createdAt);
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
		result.append(" (methodVersionId: ");
		result.append(methodVersionId);
		result.append(", description: ");
		result.append(description);
		result.append(", unitCount: ");
		result.append(unitCount);
		result.append(", createdBy: ");
		result.append(createdBy);
		result.append(", createdAt: ");
		result.append(createdAt);
		result.append(')');
		return result.toString();
	}

} //WorkBatchImpl
