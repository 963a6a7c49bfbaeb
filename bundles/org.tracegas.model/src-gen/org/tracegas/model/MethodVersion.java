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
 *   <li>{@link org.tracegas.model.MethodVersion#isNonlinearity <em>Nonlinearity</em>}</li>
 *   <li>{@link org.tracegas.model.MethodVersion#getTolerance <em>Tolerance</em>}</li>
 *   <li>{@link org.tracegas.model.MethodVersion#getMaxAbsorbance <em>Max Absorbance</em>}</li>
 *   <li>{@link org.tracegas.model.MethodVersion#getShiftTerm <em>Shift Term</em>}</li>
 *   <li>{@link org.tracegas.model.MethodVersion#getReportingUnit <em>Reporting Unit</em>}</li>
 *   <li>{@link org.tracegas.model.MethodVersion#getRecipeSteps <em>Recipe Steps</em>}</li>
 *   <li>{@link org.tracegas.model.MethodVersion#getCellConditions <em>Cell Conditions</em>}</li>
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

	/**
	 * Returns the value of the '<em><b>Nonlinearity</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Whether the fit interpolates between references of several amounts.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Nonlinearity</em>' attribute.
	 * @see #setNonlinearity(boolean)
	 * @see org.tracegas.model.WorkspacePackage#getMethodVersion_Nonlinearity()
	 * @model
	 * @generated
	 */
	boolean isNonlinearity();

	/**
	 * Sets the value of the '{@link org.tracegas.model.MethodVersion#isNonlinearity <em>Nonlinearity</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Nonlinearity</em>' attribute.
	 * @see #isNonlinearity()
	 * @generated
	 */
	void setNonlinearity(boolean value);

	/**
	 * Returns the value of the '<em><b>Tolerance</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The relative change of the concentrations at which the fit's iteration stops.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Tolerance</em>' attribute.
	 * @see #setTolerance(double)
	 * @see org.tracegas.model.WorkspacePackage#getMethodVersion_Tolerance()
	 * @model
	 * @generated
	 */
	double getTolerance();

	/**
	 * Sets the value of the '{@link org.tracegas.model.MethodVersion#getTolerance <em>Tolerance</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Tolerance</em>' attribute.
	 * @see #getTolerance()
	 * @generated
	 */
	void setTolerance(double value);

	/**
	 * Returns the value of the '<em><b>Max Absorbance</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The highest sample absorbance inside the fit windows the fit trusts; a result whose sample absorbs more is flagged.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Max Absorbance</em>' attribute.
	 * @see #setMaxAbsorbance(double)
	 * @see org.tracegas.model.WorkspacePackage#getMethodVersion_MaxAbsorbance()
	 * @model
	 * @generated
	 */
	double getMaxAbsorbance();

	/**
	 * Sets the value of the '{@link org.tracegas.model.MethodVersion#getMaxAbsorbance <em>Max Absorbance</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Max Absorbance</em>' attribute.
	 * @see #getMaxAbsorbance()
	 * @generated
	 */
	void setMaxAbsorbance(double value);

	/**
	 * Returns the value of the '<em><b>Shift Term</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The non-linear term the fit adds for a mismatch of line positions, as the method text names it (none, shift, shift-and-width, scale).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Shift Term</em>' attribute.
	 * @see #setShiftTerm(String)
	 * @see org.tracegas.model.WorkspacePackage#getMethodVersion_ShiftTerm()
	 * @model
	 * @generated
	 */
	String getShiftTerm();

	/**
	 * Sets the value of the '{@link org.tracegas.model.MethodVersion#getShiftTerm <em>Shift Term</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Shift Term</em>' attribute.
	 * @see #getShiftTerm()
	 * @generated
	 */
	void setShiftTerm(String value);

	/**
	 * Returns the value of the '<em><b>Reporting Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The unit concentrations are reported in, as the method text names it (ppm, ppb, percent).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Reporting Unit</em>' attribute.
	 * @see #setReportingUnit(String)
	 * @see org.tracegas.model.WorkspacePackage#getMethodVersion_ReportingUnit()
	 * @model
	 * @generated
	 */
	String getReportingUnit();

	/**
	 * Sets the value of the '{@link org.tracegas.model.MethodVersion#getReportingUnit <em>Reporting Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Reporting Unit</em>' attribute.
	 * @see #getReportingUnit()
	 * @generated
	 */
	void setReportingUnit(String value);

	/**
	 * Returns the value of the '<em><b>Recipe Steps</b></em>' attribute list.
	 * The list contents are of type {@link java.lang.String}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The processing steps every absorbance gets before the fit, in order, each in the recipe's line form (<step> key=value;key=value).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Recipe Steps</em>' attribute list.
	 * @see org.tracegas.model.WorkspacePackage#getMethodVersion_RecipeSteps()
	 * @model
	 * @generated
	 */
	EList<String> getRecipeSteps();

	/**
	 * Returns the value of the '<em><b>Cell Conditions</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * For a method that computes its spectra from line lists: the cell conditions they are computed at, stated (the method's) or measured (each measurement's own); empty for other methods.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Cell Conditions</em>' attribute.
	 * @see #setCellConditions(String)
	 * @see org.tracegas.model.WorkspacePackage#getMethodVersion_CellConditions()
	 * @model
	 * @generated
	 */
	String getCellConditions();

	/**
	 * Sets the value of the '{@link org.tracegas.model.MethodVersion#getCellConditions <em>Cell Conditions</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Cell Conditions</em>' attribute.
	 * @see #getCellConditions()
	 * @generated
	 */
	void setCellConditions(String value);

} // MethodVersion
