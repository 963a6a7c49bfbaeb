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
 *   <li>{@link org.tracegas.model.MethodVersion#getAlgorithm <em>Algorithm</em>}</li>
 *   <li>{@link org.tracegas.model.MethodVersion#getPathSource <em>Path Source</em>}</li>
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

	/**
	 * Returns the value of the '<em><b>Algorithm</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Name of the fit algorithm, as the method text names it (classical-least-squares, curve-of-growth, or one another bundle installs).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Algorithm</em>' attribute.
	 * @see #setAlgorithm(String)
	 * @see org.tracegas.model.WorkspacePackage#getMethodVersion_Algorithm()
	 * @model
	 * @generated
	 */
	String getAlgorithm();

	/**
	 * Sets the value of the '{@link org.tracegas.model.MethodVersion#getAlgorithm <em>Algorithm</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Algorithm</em>' attribute.
	 * @see #getAlgorithm()
	 * @generated
	 */
	void setAlgorithm(String value);

	/**
	 * Returns the value of the '<em><b>Path Source</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Where the cell path that results are corrected to comes from, as the method text names it: nominal (the path length), or cts-derived (the effective path the campaign's calibration transfer standard readings measure).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Path Source</em>' attribute.
	 * @see #setPathSource(String)
	 * @see org.tracegas.model.WorkspacePackage#getMethodVersion_PathSource()
	 * @model
	 * @generated
	 */
	String getPathSource();

	/**
	 * Sets the value of the '{@link org.tracegas.model.MethodVersion#getPathSource <em>Path Source</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Path Source</em>' attribute.
	 * @see #getPathSource()
	 * @generated
	 */
	void setPathSource(String value);

} // MethodVersion
