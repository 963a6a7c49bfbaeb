/**
 */
package org.tracegas.model.impl;

import java.time.Instant;

import java.util.Collection;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.eclipse.emf.ecore.util.EDataTypeUniqueEList;

import org.tracegas.model.Provenance;
import org.tracegas.model.Result;
import org.tracegas.model.ResultConditions;
import org.tracegas.model.ResultFlag;
import org.tracegas.model.WorkspacePackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Result</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getProjectId <em>Project Id</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getMeasurementId <em>Measurement Id</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getCompound <em>Compound</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getConcentration <em>Concentration</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getStandardUncertainty <em>Standard Uncertainty</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getDetectionLimit <em>Detection Limit</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getUnit <em>Unit</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getFlags <em>Flags</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getProvenance <em>Provenance</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getConditions <em>Conditions</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getRecordedBy <em>Recorded By</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getRecorded <em>Recorded</em>}</li>
 * </ul>
 *
 * @generated
 */
public class ResultImpl extends StoredObjectImpl implements Result {
	/**
	 * The default value of the '{@link #getProjectId() <em>Project Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getProjectId()
	 * @generated
	 * @ordered
	 */
	protected static final String PROJECT_ID_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getProjectId() <em>Project Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getProjectId()
	 * @generated
	 * @ordered
	 */
	protected String projectId = PROJECT_ID_EDEFAULT;

	/**
	 * The default value of the '{@link #getMeasurementId() <em>Measurement Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMeasurementId()
	 * @generated
	 * @ordered
	 */
	protected static final String MEASUREMENT_ID_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getMeasurementId() <em>Measurement Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMeasurementId()
	 * @generated
	 * @ordered
	 */
	protected String measurementId = MEASUREMENT_ID_EDEFAULT;

	/**
	 * The default value of the '{@link #getCompound() <em>Compound</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCompound()
	 * @generated
	 * @ordered
	 */
	protected static final String COMPOUND_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getCompound() <em>Compound</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCompound()
	 * @generated
	 * @ordered
	 */
	protected String compound = COMPOUND_EDEFAULT;

	/**
	 * The default value of the '{@link #getConcentration() <em>Concentration</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getConcentration()
	 * @generated
	 * @ordered
	 */
	protected static final double CONCENTRATION_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getConcentration() <em>Concentration</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getConcentration()
	 * @generated
	 * @ordered
	 */
	protected double concentration = CONCENTRATION_EDEFAULT;

	/**
	 * The default value of the '{@link #getStandardUncertainty() <em>Standard Uncertainty</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStandardUncertainty()
	 * @generated
	 * @ordered
	 */
	protected static final double STANDARD_UNCERTAINTY_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getStandardUncertainty() <em>Standard Uncertainty</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStandardUncertainty()
	 * @generated
	 * @ordered
	 */
	protected double standardUncertainty = STANDARD_UNCERTAINTY_EDEFAULT;

	/**
	 * The default value of the '{@link #getDetectionLimit() <em>Detection Limit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDetectionLimit()
	 * @generated
	 * @ordered
	 */
	protected static final double DETECTION_LIMIT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getDetectionLimit() <em>Detection Limit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDetectionLimit()
	 * @generated
	 * @ordered
	 */
	protected double detectionLimit = DETECTION_LIMIT_EDEFAULT;

	/**
	 * The default value of the '{@link #getUnit() <em>Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUnit()
	 * @generated
	 * @ordered
	 */
	protected static final String UNIT_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getUnit() <em>Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUnit()
	 * @generated
	 * @ordered
	 */
	protected String unit = UNIT_EDEFAULT;

	/**
	 * The cached value of the '{@link #getFlags() <em>Flags</em>}' attribute list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFlags()
	 * @generated
	 * @ordered
	 */
	protected EList<ResultFlag> flags;

	/**
	 * The default value of the '{@link #getProvenance() <em>Provenance</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getProvenance()
	 * @generated
	 * @ordered
	 */
	protected static final Provenance PROVENANCE_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getProvenance() <em>Provenance</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getProvenance()
	 * @generated
	 * @ordered
	 */
	protected Provenance provenance = PROVENANCE_EDEFAULT;

	/**
	 * The default value of the '{@link #getConditions() <em>Conditions</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getConditions()
	 * @generated
	 * @ordered
	 */
	protected static final ResultConditions CONDITIONS_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getConditions() <em>Conditions</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getConditions()
	 * @generated
	 * @ordered
	 */
	protected ResultConditions conditions = CONDITIONS_EDEFAULT;

	/**
	 * The default value of the '{@link #getRecordedBy() <em>Recorded By</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRecordedBy()
	 * @generated
	 * @ordered
	 */
	protected static final String RECORDED_BY_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getRecordedBy() <em>Recorded By</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRecordedBy()
	 * @generated
	 * @ordered
	 */
	protected String recordedBy = RECORDED_BY_EDEFAULT;

	/**
	 * The default value of the '{@link #getRecorded() <em>Recorded</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRecorded()
	 * @generated
	 * @ordered
	 */
	protected static final Instant RECORDED_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getRecorded() <em>Recorded</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRecorded()
	 * @generated
	 * @ordered
	 */
	protected Instant recorded = RECORDED_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected ResultImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return WorkspacePackage.Literals.RESULT;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getProjectId() {
		return projectId;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setProjectId(String newProjectId) {
		String oldProjectId = projectId;
		projectId = newProjectId;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.RESULT__PROJECT_ID, oldProjectId, projectId));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getMeasurementId() {
		return measurementId;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMeasurementId(String newMeasurementId) {
		String oldMeasurementId = measurementId;
		measurementId = newMeasurementId;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.RESULT__MEASUREMENT_ID, oldMeasurementId, measurementId));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getCompound() {
		return compound;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCompound(String newCompound) {
		String oldCompound = compound;
		compound = newCompound;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.RESULT__COMPOUND, oldCompound, compound));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getConcentration() {
		return concentration;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setConcentration(double newConcentration) {
		double oldConcentration = concentration;
		concentration = newConcentration;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.RESULT__CONCENTRATION, oldConcentration, concentration));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getStandardUncertainty() {
		return standardUncertainty;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setStandardUncertainty(double newStandardUncertainty) {
		double oldStandardUncertainty = standardUncertainty;
		standardUncertainty = newStandardUncertainty;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.RESULT__STANDARD_UNCERTAINTY, oldStandardUncertainty, standardUncertainty));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getDetectionLimit() {
		return detectionLimit;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDetectionLimit(double newDetectionLimit) {
		double oldDetectionLimit = detectionLimit;
		detectionLimit = newDetectionLimit;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.RESULT__DETECTION_LIMIT, oldDetectionLimit, detectionLimit));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getUnit() {
		return unit;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setUnit(String newUnit) {
		String oldUnit = unit;
		unit = newUnit;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.RESULT__UNIT, oldUnit, unit));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<ResultFlag> getFlags() {
		if (flags == null) {
			flags = new EDataTypeUniqueEList<ResultFlag>(ResultFlag.class, this, WorkspacePackage.RESULT__FLAGS);
		}
		return flags;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Provenance getProvenance() {
		return provenance;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setProvenance(Provenance newProvenance) {
		Provenance oldProvenance = provenance;
		provenance = newProvenance;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.RESULT__PROVENANCE, oldProvenance, provenance));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ResultConditions getConditions() {
		return conditions;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setConditions(ResultConditions newConditions) {
		ResultConditions oldConditions = conditions;
		conditions = newConditions;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.RESULT__CONDITIONS, oldConditions, conditions));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getRecordedBy() {
		return recordedBy;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setRecordedBy(String newRecordedBy) {
		String oldRecordedBy = recordedBy;
		recordedBy = newRecordedBy;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.RESULT__RECORDED_BY, oldRecordedBy, recordedBy));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Instant getRecorded() {
		return recorded;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setRecorded(Instant newRecorded) {
		Instant oldRecorded = recorded;
		recorded = newRecorded;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.RESULT__RECORDED, oldRecorded, recorded));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case WorkspacePackage.RESULT__PROJECT_ID:
				return getProjectId();
			case WorkspacePackage.RESULT__MEASUREMENT_ID:
				return getMeasurementId();
			case WorkspacePackage.RESULT__COMPOUND:
				return getCompound();
			case WorkspacePackage.RESULT__CONCENTRATION:
				return getConcentration();
			case WorkspacePackage.RESULT__STANDARD_UNCERTAINTY:
				return getStandardUncertainty();
			case WorkspacePackage.RESULT__DETECTION_LIMIT:
				return getDetectionLimit();
			case WorkspacePackage.RESULT__UNIT:
				return getUnit();
			case WorkspacePackage.RESULT__FLAGS:
				return getFlags();
			case WorkspacePackage.RESULT__PROVENANCE:
				return getProvenance();
			case WorkspacePackage.RESULT__CONDITIONS:
				return getConditions();
			case WorkspacePackage.RESULT__RECORDED_BY:
				return getRecordedBy();
			case WorkspacePackage.RESULT__RECORDED:
				return getRecorded();
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
			case WorkspacePackage.RESULT__PROJECT_ID:
				setProjectId((String)newValue);
				return;
			case WorkspacePackage.RESULT__MEASUREMENT_ID:
				setMeasurementId((String)newValue);
				return;
			case WorkspacePackage.RESULT__COMPOUND:
				setCompound((String)newValue);
				return;
			case WorkspacePackage.RESULT__CONCENTRATION:
				setConcentration((Double)newValue);
				return;
			case WorkspacePackage.RESULT__STANDARD_UNCERTAINTY:
				setStandardUncertainty((Double)newValue);
				return;
			case WorkspacePackage.RESULT__DETECTION_LIMIT:
				setDetectionLimit((Double)newValue);
				return;
			case WorkspacePackage.RESULT__UNIT:
				setUnit((String)newValue);
				return;
			case WorkspacePackage.RESULT__FLAGS:
				getFlags().clear();
				getFlags().addAll((Collection<? extends ResultFlag>)newValue);
				return;
			case WorkspacePackage.RESULT__PROVENANCE:
				setProvenance((Provenance)newValue);
				return;
			case WorkspacePackage.RESULT__CONDITIONS:
				setConditions((ResultConditions)newValue);
				return;
			case WorkspacePackage.RESULT__RECORDED_BY:
				setRecordedBy((String)newValue);
				return;
			case WorkspacePackage.RESULT__RECORDED:
				setRecorded((Instant)newValue);
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
			case WorkspacePackage.RESULT__PROJECT_ID:
				setProjectId(PROJECT_ID_EDEFAULT);
				return;
			case WorkspacePackage.RESULT__MEASUREMENT_ID:
				setMeasurementId(MEASUREMENT_ID_EDEFAULT);
				return;
			case WorkspacePackage.RESULT__COMPOUND:
				setCompound(COMPOUND_EDEFAULT);
				return;
			case WorkspacePackage.RESULT__CONCENTRATION:
				setConcentration(CONCENTRATION_EDEFAULT);
				return;
			case WorkspacePackage.RESULT__STANDARD_UNCERTAINTY:
				setStandardUncertainty(STANDARD_UNCERTAINTY_EDEFAULT);
				return;
			case WorkspacePackage.RESULT__DETECTION_LIMIT:
				setDetectionLimit(DETECTION_LIMIT_EDEFAULT);
				return;
			case WorkspacePackage.RESULT__UNIT:
				setUnit(UNIT_EDEFAULT);
				return;
			case WorkspacePackage.RESULT__FLAGS:
				getFlags().clear();
				return;
			case WorkspacePackage.RESULT__PROVENANCE:
				setProvenance(PROVENANCE_EDEFAULT);
				return;
			case WorkspacePackage.RESULT__CONDITIONS:
				setConditions(CONDITIONS_EDEFAULT);
				return;
			case WorkspacePackage.RESULT__RECORDED_BY:
				setRecordedBy(RECORDED_BY_EDEFAULT);
				return;
			case WorkspacePackage.RESULT__RECORDED:
				setRecorded(RECORDED_EDEFAULT);
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
			case WorkspacePackage.RESULT__PROJECT_ID:
				return PROJECT_ID_EDEFAULT == null ? projectId != null : !PROJECT_ID_EDEFAULT.equals(projectId);
			case WorkspacePackage.RESULT__MEASUREMENT_ID:
				return MEASUREMENT_ID_EDEFAULT == null ? measurementId != null : !MEASUREMENT_ID_EDEFAULT.equals(measurementId);
			case WorkspacePackage.RESULT__COMPOUND:
				return COMPOUND_EDEFAULT == null ? compound != null : !COMPOUND_EDEFAULT.equals(compound);
			case WorkspacePackage.RESULT__CONCENTRATION:
				return concentration != CONCENTRATION_EDEFAULT;
			case WorkspacePackage.RESULT__STANDARD_UNCERTAINTY:
				return standardUncertainty != STANDARD_UNCERTAINTY_EDEFAULT;
			case WorkspacePackage.RESULT__DETECTION_LIMIT:
				return detectionLimit != DETECTION_LIMIT_EDEFAULT;
			case WorkspacePackage.RESULT__UNIT:
				return UNIT_EDEFAULT == null ? unit != null : !UNIT_EDEFAULT.equals(unit);
			case WorkspacePackage.RESULT__FLAGS:
				return flags != null && !flags.isEmpty();
			case WorkspacePackage.RESULT__PROVENANCE:
				return PROVENANCE_EDEFAULT == null ? provenance != null : !PROVENANCE_EDEFAULT.equals(provenance);
			case WorkspacePackage.RESULT__CONDITIONS:
				return CONDITIONS_EDEFAULT == null ? conditions != null : !CONDITIONS_EDEFAULT.equals(conditions);
			case WorkspacePackage.RESULT__RECORDED_BY:
				return RECORDED_BY_EDEFAULT == null ? recordedBy != null : !RECORDED_BY_EDEFAULT.equals(recordedBy);
			case WorkspacePackage.RESULT__RECORDED:
				return RECORDED_EDEFAULT == null ? recorded != null : !RECORDED_EDEFAULT.equals(recorded);
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
		result.append(" (projectId: ");
		result.append(projectId);
		result.append(", measurementId: ");
		result.append(measurementId);
		result.append(", compound: ");
		result.append(compound);
		result.append(", concentration: ");
		result.append(concentration);
		result.append(", standardUncertainty: ");
		result.append(standardUncertainty);
		result.append(", detectionLimit: ");
		result.append(detectionLimit);
		result.append(", unit: ");
		result.append(unit);
		result.append(", flags: ");
		result.append(flags);
		result.append(", provenance: ");
		result.append(provenance);
		result.append(", conditions: ");
		result.append(conditions);
		result.append(", recordedBy: ");
		result.append(recordedBy);
		result.append(", recorded: ");
		result.append(recorded);
		result.append(')');
		return result.toString();
	}

} //ResultImpl
