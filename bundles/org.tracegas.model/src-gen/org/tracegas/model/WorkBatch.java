/**
 */
package org.tracegas.model;

import java.time.Instant;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Work Batch</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * Work of a project split into numbered units (e.g. one container file each) that several runners share through the lab server: each unit is leased to one runner at a time and completed with its results. The store keeps the batch unchanged once created; how far its units are is counted from their rows when asked, not held here. The method version is named by id, as a result names it.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.WorkBatch#getProject <em>Project</em>}</li>
 *   <li>{@link org.tracegas.model.WorkBatch#getMethodVersionId <em>Method Version Id</em>}</li>
 *   <li>{@link org.tracegas.model.WorkBatch#getDescription <em>Description</em>}</li>
 *   <li>{@link org.tracegas.model.WorkBatch#getUnitCount <em>Unit Count</em>}</li>
 *   <li>{@link org.tracegas.model.WorkBatch#getCreatedBy <em>Created By</em>}</li>
 *   <li>{@link org.tracegas.model.WorkBatch#getCreatedAt <em>Created At</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getWorkBatch()
 * @model
 * @generated
 */
public interface WorkBatch extends StoredObject {
	/**
	 * Returns the value of the '<em><b>Project</b></em>' container reference.
	 * It is bidirectional and its opposite is '{@link org.tracegas.model.Project#getBatches <em>Batches</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The project whose work the batch is: its container.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Project</em>' container reference.
	 * @see #setProject(Project)
	 * @see org.tracegas.model.WorkspacePackage#getWorkBatch_Project()
	 * @see org.tracegas.model.Project#getBatches
	 * @model opposite="batches"
	 * @generated
	 */
	Project getProject();

	/**
	 * Sets the value of the '{@link org.tracegas.model.WorkBatch#getProject <em>Project</em>}' container reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Project</em>' container reference.
	 * @see #getProject()
	 * @generated
	 */
	void setProject(Project value);

	/**
	 * Returns the value of the '<em><b>Method Version Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Id of the method version the batch quantifies with, frozen once results use it; null for a batch of other work. A project has at most one unfinished batch per method version.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Method Version Id</em>' attribute.
	 * @see #setMethodVersionId(String)
	 * @see org.tracegas.model.WorkspacePackage#getWorkBatch_MethodVersionId()
	 * @model
	 * @generated
	 */
	String getMethodVersionId();

	/**
	 * Sets the value of the '{@link org.tracegas.model.WorkBatch#getMethodVersionId <em>Method Version Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Method Version Id</em>' attribute.
	 * @see #getMethodVersionId()
	 * @generated
	 */
	void setMethodVersionId(String value);

	/**
	 * Returns the value of the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * What every runner needs to process the units, in the words of the command that created the batch (e.g. the background files); at most 4000 characters.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Description</em>' attribute.
	 * @see #setDescription(String)
	 * @see org.tracegas.model.WorkspacePackage#getWorkBatch_Description()
	 * @model
	 * @generated
	 */
	String getDescription();

	/**
	 * Sets the value of the '{@link org.tracegas.model.WorkBatch#getDescription <em>Description</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Description</em>' attribute.
	 * @see #getDescription()
	 * @generated
	 */
	void setDescription(String value);

	/**
	 * Returns the value of the '<em><b>Unit Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Number of units, numbered 0 to unitCount - 1; set by the store, one per payload.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Unit Count</em>' attribute.
	 * @see #setUnitCount(int)
	 * @see org.tracegas.model.WorkspacePackage#getWorkBatch_UnitCount()
	 * @model
	 * @generated
	 */
	int getUnitCount();

	/**
	 * Sets the value of the '{@link org.tracegas.model.WorkBatch#getUnitCount <em>Unit Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Unit Count</em>' attribute.
	 * @see #getUnitCount()
	 * @generated
	 */
	void setUnitCount(int value);

	/**
	 * Returns the value of the '<em><b>Created By</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Id of the workspace user who created the batch; set by the store.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Created By</em>' attribute.
	 * @see #setCreatedBy(String)
	 * @see org.tracegas.model.WorkspacePackage#getWorkBatch_CreatedBy()
	 * @model
	 * @generated
	 */
	String getCreatedBy();

	/**
	 * Sets the value of the '{@link org.tracegas.model.WorkBatch#getCreatedBy <em>Created By</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Created By</em>' attribute.
	 * @see #getCreatedBy()
	 * @generated
	 */
	void setCreatedBy(String value);

	/**
	 * Returns the value of the '<em><b>Created At</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * When the batch was created; set by the store.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Created At</em>' attribute.
	 * @see #setCreatedAt(Instant)
	 * @see org.tracegas.model.WorkspacePackage#getWorkBatch_CreatedAt()
	 * @model dataType="org.tracegas.model.Instant"
	 * @generated
	 */
	Instant getCreatedAt();

	/**
	 * Sets the value of the '{@link org.tracegas.model.WorkBatch#getCreatedAt <em>Created At</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Created At</em>' attribute.
	 * @see #getCreatedAt()
	 * @generated
	 */
	void setCreatedAt(Instant value);

} // WorkBatch
