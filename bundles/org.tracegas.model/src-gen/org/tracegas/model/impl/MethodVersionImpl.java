/**
 */
package org.tracegas.model.impl;

import java.util.Collection;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.NotificationChain;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.eclipse.emf.ecore.util.EDataTypeUniqueEList;
import org.eclipse.emf.ecore.util.EObjectContainmentEList;
import org.eclipse.emf.ecore.util.InternalEList;

import org.tracegas.model.AnalysisRegion;
import org.tracegas.model.MethodVersion;
import org.tracegas.model.WorkspacePackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Method Version</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.impl.MethodVersionImpl#getRegions <em>Regions</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MethodVersionImpl#getPathLength <em>Path Length</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MethodVersionImpl#getMaxIterations <em>Max Iterations</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MethodVersionImpl#getAlgorithm <em>Algorithm</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MethodVersionImpl#getPathSource <em>Path Source</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MethodVersionImpl#isNonlinearity <em>Nonlinearity</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MethodVersionImpl#getTolerance <em>Tolerance</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MethodVersionImpl#getMaxAbsorbance <em>Max Absorbance</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MethodVersionImpl#getShiftTerm <em>Shift Term</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MethodVersionImpl#getReportingUnit <em>Reporting Unit</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MethodVersionImpl#getRecipeSteps <em>Recipe Steps</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MethodVersionImpl#getCellConditions <em>Cell Conditions</em>}</li>
 * </ul>
 *
 * @generated
 */
public class MethodVersionImpl extends ContentVersionImpl implements MethodVersion {
	/**
	 * The cached value of the '{@link #getRegions() <em>Regions</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRegions()
	 * @generated
	 * @ordered
	 */
	protected EList<AnalysisRegion> regions;

	/**
	 * The default value of the '{@link #getPathLength() <em>Path Length</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPathLength()
	 * @generated
	 * @ordered
	 */
	protected static final double PATH_LENGTH_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getPathLength() <em>Path Length</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPathLength()
	 * @generated
	 * @ordered
	 */
	protected double pathLength = PATH_LENGTH_EDEFAULT;

	/**
	 * The default value of the '{@link #getMaxIterations() <em>Max Iterations</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxIterations()
	 * @generated
	 * @ordered
	 */
	protected static final int MAX_ITERATIONS_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getMaxIterations() <em>Max Iterations</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxIterations()
	 * @generated
	 * @ordered
	 */
	protected int maxIterations = MAX_ITERATIONS_EDEFAULT;

	/**
	 * The default value of the '{@link #getAlgorithm() <em>Algorithm</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAlgorithm()
	 * @generated
	 * @ordered
	 */
	protected static final String ALGORITHM_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getAlgorithm() <em>Algorithm</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAlgorithm()
	 * @generated
	 * @ordered
	 */
	protected String algorithm = ALGORITHM_EDEFAULT;

	/**
	 * The default value of the '{@link #getPathSource() <em>Path Source</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPathSource()
	 * @generated
	 * @ordered
	 */
	protected static final String PATH_SOURCE_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getPathSource() <em>Path Source</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPathSource()
	 * @generated
	 * @ordered
	 */
	protected String pathSource = PATH_SOURCE_EDEFAULT;

	/**
	 * The default value of the '{@link #isNonlinearity() <em>Nonlinearity</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isNonlinearity()
	 * @generated
	 * @ordered
	 */
	protected static final boolean NONLINEARITY_EDEFAULT = false;

	/**
	 * The cached value of the '{@link #isNonlinearity() <em>Nonlinearity</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isNonlinearity()
	 * @generated
	 * @ordered
	 */
	protected boolean nonlinearity = NONLINEARITY_EDEFAULT;

	/**
	 * The default value of the '{@link #getTolerance() <em>Tolerance</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTolerance()
	 * @generated
	 * @ordered
	 */
	protected static final double TOLERANCE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getTolerance() <em>Tolerance</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTolerance()
	 * @generated
	 * @ordered
	 */
	protected double tolerance = TOLERANCE_EDEFAULT;

	/**
	 * The default value of the '{@link #getMaxAbsorbance() <em>Max Absorbance</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxAbsorbance()
	 * @generated
	 * @ordered
	 */
	protected static final double MAX_ABSORBANCE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMaxAbsorbance() <em>Max Absorbance</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxAbsorbance()
	 * @generated
	 * @ordered
	 */
	protected double maxAbsorbance = MAX_ABSORBANCE_EDEFAULT;

	/**
	 * The default value of the '{@link #getShiftTerm() <em>Shift Term</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getShiftTerm()
	 * @generated
	 * @ordered
	 */
	protected static final String SHIFT_TERM_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getShiftTerm() <em>Shift Term</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getShiftTerm()
	 * @generated
	 * @ordered
	 */
	protected String shiftTerm = SHIFT_TERM_EDEFAULT;

	/**
	 * The default value of the '{@link #getReportingUnit() <em>Reporting Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getReportingUnit()
	 * @generated
	 * @ordered
	 */
	protected static final String REPORTING_UNIT_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getReportingUnit() <em>Reporting Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getReportingUnit()
	 * @generated
	 * @ordered
	 */
	protected String reportingUnit = REPORTING_UNIT_EDEFAULT;

	/**
	 * The cached value of the '{@link #getRecipeSteps() <em>Recipe Steps</em>}' attribute list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRecipeSteps()
	 * @generated
	 * @ordered
	 */
	protected EList<String> recipeSteps;

	/**
	 * The default value of the '{@link #getCellConditions() <em>Cell Conditions</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCellConditions()
	 * @generated
	 * @ordered
	 */
	protected static final String CELL_CONDITIONS_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getCellConditions() <em>Cell Conditions</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCellConditions()
	 * @generated
	 * @ordered
	 */
	protected String cellConditions = CELL_CONDITIONS_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected MethodVersionImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return WorkspacePackage.Literals.METHOD_VERSION;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<AnalysisRegion> getRegions() {
		if (regions == null) {
			regions = new EObjectContainmentEList<AnalysisRegion>(AnalysisRegion.class, this, WorkspacePackage.METHOD_VERSION__REGIONS);
		}
		return regions;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getPathLength() {
		return pathLength;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPathLength(double newPathLength) {
		double oldPathLength = pathLength;
		pathLength = newPathLength;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.METHOD_VERSION__PATH_LENGTH, oldPathLength, pathLength));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getMaxIterations() {
		return maxIterations;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMaxIterations(int newMaxIterations) {
		int oldMaxIterations = maxIterations;
		maxIterations = newMaxIterations;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.METHOD_VERSION__MAX_ITERATIONS, oldMaxIterations, maxIterations));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getAlgorithm() {
		return algorithm;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setAlgorithm(String newAlgorithm) {
		String oldAlgorithm = algorithm;
		algorithm = newAlgorithm;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.METHOD_VERSION__ALGORITHM, oldAlgorithm, algorithm));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getPathSource() {
		return pathSource;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPathSource(String newPathSource) {
		String oldPathSource = pathSource;
		pathSource = newPathSource;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.METHOD_VERSION__PATH_SOURCE, oldPathSource, pathSource));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isNonlinearity() {
		return nonlinearity;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setNonlinearity(boolean newNonlinearity) {
		boolean oldNonlinearity = nonlinearity;
		nonlinearity = newNonlinearity;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.METHOD_VERSION__NONLINEARITY, oldNonlinearity, nonlinearity));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getTolerance() {
		return tolerance;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTolerance(double newTolerance) {
		double oldTolerance = tolerance;
		tolerance = newTolerance;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.METHOD_VERSION__TOLERANCE, oldTolerance, tolerance));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMaxAbsorbance() {
		return maxAbsorbance;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMaxAbsorbance(double newMaxAbsorbance) {
		double oldMaxAbsorbance = maxAbsorbance;
		maxAbsorbance = newMaxAbsorbance;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.METHOD_VERSION__MAX_ABSORBANCE, oldMaxAbsorbance, maxAbsorbance));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getShiftTerm() {
		return shiftTerm;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setShiftTerm(String newShiftTerm) {
		String oldShiftTerm = shiftTerm;
		shiftTerm = newShiftTerm;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.METHOD_VERSION__SHIFT_TERM, oldShiftTerm, shiftTerm));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getReportingUnit() {
		return reportingUnit;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setReportingUnit(String newReportingUnit) {
		String oldReportingUnit = reportingUnit;
		reportingUnit = newReportingUnit;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.METHOD_VERSION__REPORTING_UNIT, oldReportingUnit, reportingUnit));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<String> getRecipeSteps() {
		if (recipeSteps == null) {
			recipeSteps = new EDataTypeUniqueEList<String>(String.class, this, WorkspacePackage.METHOD_VERSION__RECIPE_STEPS);
		}
		return recipeSteps;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getCellConditions() {
		return cellConditions;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCellConditions(String newCellConditions) {
		String oldCellConditions = cellConditions;
		cellConditions = newCellConditions;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.METHOD_VERSION__CELL_CONDITIONS, oldCellConditions, cellConditions));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case WorkspacePackage.METHOD_VERSION__REGIONS:
				return ((InternalEList<?>)getRegions()).basicRemove(otherEnd, msgs);
		}
		return super.eInverseRemove(otherEnd, featureID, msgs);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case WorkspacePackage.METHOD_VERSION__REGIONS:
				return getRegions();
			case WorkspacePackage.METHOD_VERSION__PATH_LENGTH:
				return getPathLength();
			case WorkspacePackage.METHOD_VERSION__MAX_ITERATIONS:
				return getMaxIterations();
			case WorkspacePackage.METHOD_VERSION__ALGORITHM:
				return getAlgorithm();
			case WorkspacePackage.METHOD_VERSION__PATH_SOURCE:
				return getPathSource();
			case WorkspacePackage.METHOD_VERSION__NONLINEARITY:
				return isNonlinearity();
			case WorkspacePackage.METHOD_VERSION__TOLERANCE:
				return getTolerance();
			case WorkspacePackage.METHOD_VERSION__MAX_ABSORBANCE:
				return getMaxAbsorbance();
			case WorkspacePackage.METHOD_VERSION__SHIFT_TERM:
				return getShiftTerm();
			case WorkspacePackage.METHOD_VERSION__REPORTING_UNIT:
				return getReportingUnit();
			case WorkspacePackage.METHOD_VERSION__RECIPE_STEPS:
				return getRecipeSteps();
			case WorkspacePackage.METHOD_VERSION__CELL_CONDITIONS:
				return getCellConditions();
		}
		return super.eGet(featureID, resolve, coreType);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@SuppressWarnings("unchecked")
	@Override
	public void eSet(int featureID, Object newValue) {
		switch (featureID) {
			case WorkspacePackage.METHOD_VERSION__REGIONS:
				getRegions().clear();
				getRegions().addAll((Collection<? extends AnalysisRegion>)newValue);
				return;
			case WorkspacePackage.METHOD_VERSION__PATH_LENGTH:
				setPathLength((Double)newValue);
				return;
			case WorkspacePackage.METHOD_VERSION__MAX_ITERATIONS:
				setMaxIterations((Integer)newValue);
				return;
			case WorkspacePackage.METHOD_VERSION__ALGORITHM:
				setAlgorithm((String)newValue);
				return;
			case WorkspacePackage.METHOD_VERSION__PATH_SOURCE:
				setPathSource((String)newValue);
				return;
			case WorkspacePackage.METHOD_VERSION__NONLINEARITY:
				setNonlinearity((Boolean)newValue);
				return;
			case WorkspacePackage.METHOD_VERSION__TOLERANCE:
				setTolerance((Double)newValue);
				return;
			case WorkspacePackage.METHOD_VERSION__MAX_ABSORBANCE:
				setMaxAbsorbance((Double)newValue);
				return;
			case WorkspacePackage.METHOD_VERSION__SHIFT_TERM:
				setShiftTerm((String)newValue);
				return;
			case WorkspacePackage.METHOD_VERSION__REPORTING_UNIT:
				setReportingUnit((String)newValue);
				return;
			case WorkspacePackage.METHOD_VERSION__RECIPE_STEPS:
				getRecipeSteps().clear();
				getRecipeSteps().addAll((Collection<? extends String>)newValue);
				return;
			case WorkspacePackage.METHOD_VERSION__CELL_CONDITIONS:
				setCellConditions((String)newValue);
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
			case WorkspacePackage.METHOD_VERSION__REGIONS:
				getRegions().clear();
				return;
			case WorkspacePackage.METHOD_VERSION__PATH_LENGTH:
				setPathLength(PATH_LENGTH_EDEFAULT);
				return;
			case WorkspacePackage.METHOD_VERSION__MAX_ITERATIONS:
				setMaxIterations(MAX_ITERATIONS_EDEFAULT);
				return;
			case WorkspacePackage.METHOD_VERSION__ALGORITHM:
				setAlgorithm(ALGORITHM_EDEFAULT);
				return;
			case WorkspacePackage.METHOD_VERSION__PATH_SOURCE:
				setPathSource(PATH_SOURCE_EDEFAULT);
				return;
			case WorkspacePackage.METHOD_VERSION__NONLINEARITY:
				setNonlinearity(NONLINEARITY_EDEFAULT);
				return;
			case WorkspacePackage.METHOD_VERSION__TOLERANCE:
				setTolerance(TOLERANCE_EDEFAULT);
				return;
			case WorkspacePackage.METHOD_VERSION__MAX_ABSORBANCE:
				setMaxAbsorbance(MAX_ABSORBANCE_EDEFAULT);
				return;
			case WorkspacePackage.METHOD_VERSION__SHIFT_TERM:
				setShiftTerm(SHIFT_TERM_EDEFAULT);
				return;
			case WorkspacePackage.METHOD_VERSION__REPORTING_UNIT:
				setReportingUnit(REPORTING_UNIT_EDEFAULT);
				return;
			case WorkspacePackage.METHOD_VERSION__RECIPE_STEPS:
				getRecipeSteps().clear();
				return;
			case WorkspacePackage.METHOD_VERSION__CELL_CONDITIONS:
				setCellConditions(CELL_CONDITIONS_EDEFAULT);
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
			case WorkspacePackage.METHOD_VERSION__REGIONS:
				return regions != null && !regions.isEmpty();
			case WorkspacePackage.METHOD_VERSION__PATH_LENGTH:
				return pathLength != PATH_LENGTH_EDEFAULT;
			case WorkspacePackage.METHOD_VERSION__MAX_ITERATIONS:
				return maxIterations != MAX_ITERATIONS_EDEFAULT;
			case WorkspacePackage.METHOD_VERSION__ALGORITHM:
				return ALGORITHM_EDEFAULT == null ? algorithm != null : !ALGORITHM_EDEFAULT.equals(algorithm);
			case WorkspacePackage.METHOD_VERSION__PATH_SOURCE:
				return PATH_SOURCE_EDEFAULT == null ? pathSource != null : !PATH_SOURCE_EDEFAULT.equals(pathSource);
			case WorkspacePackage.METHOD_VERSION__NONLINEARITY:
				return nonlinearity != NONLINEARITY_EDEFAULT;
			case WorkspacePackage.METHOD_VERSION__TOLERANCE:
				return tolerance != TOLERANCE_EDEFAULT;
			case WorkspacePackage.METHOD_VERSION__MAX_ABSORBANCE:
				return maxAbsorbance != MAX_ABSORBANCE_EDEFAULT;
			case WorkspacePackage.METHOD_VERSION__SHIFT_TERM:
				return SHIFT_TERM_EDEFAULT == null ? shiftTerm != null : !SHIFT_TERM_EDEFAULT.equals(shiftTerm);
			case WorkspacePackage.METHOD_VERSION__REPORTING_UNIT:
				return REPORTING_UNIT_EDEFAULT == null ? reportingUnit != null : !REPORTING_UNIT_EDEFAULT.equals(reportingUnit);
			case WorkspacePackage.METHOD_VERSION__RECIPE_STEPS:
				return recipeSteps != null && !recipeSteps.isEmpty();
			case WorkspacePackage.METHOD_VERSION__CELL_CONDITIONS:
				return CELL_CONDITIONS_EDEFAULT == null ? cellConditions != null : !CELL_CONDITIONS_EDEFAULT.equals(cellConditions);
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
		result.append(" (pathLength: ");
		result.append(pathLength);
		result.append(", maxIterations: ");
		result.append(maxIterations);
		result.append(", algorithm: ");
		result.append(algorithm);
		result.append(", pathSource: ");
		result.append(pathSource);
		result.append(", nonlinearity: ");
		result.append(nonlinearity);
		result.append(", tolerance: ");
		result.append(tolerance);
		result.append(", maxAbsorbance: ");
		result.append(maxAbsorbance);
		result.append(", shiftTerm: ");
		result.append(shiftTerm);
		result.append(", reportingUnit: ");
		result.append(reportingUnit);
		result.append(", recipeSteps: ");
		result.append(recipeSteps);
		result.append(", cellConditions: ");
		result.append(cellConditions);
		result.append(')');
		return result.toString();
	}

} //MethodVersionImpl
