/**
 */
package org.tracegas.model;

import org.eclipse.emf.common.util.EList;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Method Version</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * One version of an analysis method.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.MethodVersion#getRegions <em>Regions</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getMethodVersion()
 * @model
 * @generated
 */
public interface MethodVersion extends ContentVersion {
	/**
	 * Returns the value of the '<em><b>Regions</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracegas.model.AnalysisRegion}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Regions</em>' containment reference list.
	 * @see org.tracegas.model.WorkspacePackage#getMethodVersion_Regions()
	 * @model containment="true"
	 * @generated
	 */
	EList<AnalysisRegion> getRegions();

} // MethodVersion
