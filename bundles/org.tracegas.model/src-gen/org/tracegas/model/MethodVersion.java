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
 *   <li>{@link org.tracegas.model.MethodVersion#getPathLength <em>Path Length</em>}</li>
 *   <li>{@link org.tracegas.model.MethodVersion#getMaxIterations <em>Max Iterations</em>}</li>
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

	/**
	 * Returns the value of the '<em><b>Path Length</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The sample cell's nominal optical path, in m, that concentrations are computed for.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Path Length</em>' attribute.
	 * @see #setPathLength(double)
	 * @see org.tracegas.model.WorkspacePackage#getMethodVersion_PathLength()
	 * @model
	 * @generated
	 */
	double getPathLength();

	/**
	 * Sets the value of the '{@link org.tracegas.model.MethodVersion#getPathLength <em>Path Length</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Path Length</em>' attribute.
	 * @see #getPathLength()
	 * @generated
	 */
	void setPathLength(double value);

	/**
	 * Returns the value of the '<em><b>Max Iterations</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The most iterations the fit makes before a result is flagged as not converged.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Max Iterations</em>' attribute.
	 * @see #setMaxIterations(int)
	 * @see org.tracegas.model.WorkspacePackage#getMethodVersion_MaxIterations()
	 * @model
	 * @generated
	 */
	int getMaxIterations();

	/**
	 * Sets the value of the '{@link org.tracegas.model.MethodVersion#getMaxIterations <em>Max Iterations</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Max Iterations</em>' attribute.
	 * @see #getMaxIterations()
	 * @generated
	 */
	void setMaxIterations(int value);

} // MethodVersion
