/**
 */
package org.tracegas.model.impl;

import java.time.Instant;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracegas.model.QaOutcome;
import org.tracegas.model.WorkspacePackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Qa Outcome</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.impl.QaOutcomeImpl#getProjectId <em>Project Id</em>}</li>
 *   <li>{@link org.tracegas.model.impl.QaOutcomeImpl#getMethodVersionId <em>Method Version Id</em>}</li>
 *   <li>{@link org.tracegas.model.impl.QaOutcomeImpl#getCheck <em>Check</em>}</li>
 *   <li>{@link org.tracegas.model.impl.QaOutcomeImpl#isPassed <em>Passed</em>}</li>
 *   <li>{@link org.tracegas.model.impl.QaOutcomeImpl#getMeasured <em>Measured</em>}</li>
 *   <li>{@link org.tracegas.model.impl.QaOutcomeImpl#getUnit <em>Unit</em>}</li>
 *   <li>{@link org.tracegas.model.impl.QaOutcomeImpl#getLowerLimit <em>Lower Limit</em>}</li>
 *   <li>{@link org.tracegas.model.impl.QaOutcomeImpl#getUpperLimit <em>Upper Limit</em>}</li>
 *   <li>{@link org.tracegas.model.impl.QaOutcomeImpl#getRule <em>Rule</em>}</li>
 *   <li>{@link org.tracegas.model.impl.QaOutcomeImpl#getSource <em>Source</em>}</li>
 *   <li>{@link org.tracegas.model.impl.QaOutcomeImpl#getRecordedBy <em>Recorded By</em>}</li>
 *   <li>{@link org.tracegas.model.impl.QaOutcomeImpl#getRecorded <em>Recorded</em>}</li>
 * </ul>
 *
 * @generated
 */
public class QaOutcomeImpl extends StoredObjectImpl implements QaOutcome {
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
	 * The default value of the '{@link #getCheck() <em>Check</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCheck()
	 * @generated
	 * @ordered
	 */
	protected static final String CHECK_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getCheck() <em>Check</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCheck()
	 * @generated
	 * @ordered
	 */
	protected String check = CHECK_EDEFAULT;

	/**
	 * The default value of the '{@link #isPassed() <em>Passed</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isPassed()
	 * @generated
	 * @ordered
	 */
	protected static final boolean PASSED_EDEFAULT = false;

	/**
	 * The cached value of the '{@link #isPassed() <em>Passed</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isPassed()
	 * @generated
	 * @ordered
	 */
	protected boolean passed = PASSED_EDEFAULT;

	/**
	 * The default value of the '{@link #getMeasured() <em>Measured</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMeasured()
	 * @generated
	 * @ordered
	 */
	protected static final double MEASURED_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMeasured() <em>Measured</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMeasured()
	 * @generated
	 * @ordered
	 */
	protected double measured = MEASURED_EDEFAULT;

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
	 * The default value of the '{@link #getLowerLimit() <em>Lower Limit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLowerLimit()
	 * @generated
	 * @ordered
	 */
	protected static final double LOWER_LIMIT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getLowerLimit() <em>Lower Limit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLowerLimit()
	 * @generated
	 * @ordered
	 */
	protected double lowerLimit = LOWER_LIMIT_EDEFAULT;

	/**
	 * The default value of the '{@link #getUpperLimit() <em>Upper Limit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUpperLimit()
	 * @generated
	 * @ordered
	 */
	protected static final double UPPER_LIMIT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getUpperLimit() <em>Upper Limit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUpperLimit()
	 * @generated
	 * @ordered
	 */
	protected double upperLimit = UPPER_LIMIT_EDEFAULT;

	/**
	 * The default value of the '{@link #getRule() <em>Rule</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRule()
	 * @generated
	 * @ordered
	 */
	protected static final String RULE_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getRule() <em>Rule</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRule()
	 * @generated
	 * @ordered
	 */
	protected String rule = RULE_EDEFAULT;

	/**
	 * The default value of the '{@link #getSource() <em>Source</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSource()
	 * @generated
	 * @ordered
	 */
	protected static final String SOURCE_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getSource() <em>Source</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSource()
	 * @generated
	 * @ordered
	 */
	protected String source = SOURCE_EDEFAULT;

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
	protected QaOutcomeImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return WorkspacePackage.Literals.QA_OUTCOME;
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
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.QA_OUTCOME__PROJECT_ID, oldProjectId, projectId));
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
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.QA_OUTCOME__METHOD_VERSION_ID, oldMethodVersionId, methodVersionId));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getCheck() {
		return check;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCheck(String newCheck) {
		String oldCheck = check;
		check = newCheck;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.QA_OUTCOME__CHECK, oldCheck, check));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isPassed() {
		return passed;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPassed(boolean newPassed) {
		boolean oldPassed = passed;
		passed = newPassed;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.QA_OUTCOME__PASSED, oldPassed, passed));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMeasured() {
		return measured;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMeasured(double newMeasured) {
		double oldMeasured = measured;
		measured = newMeasured;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.QA_OUTCOME__MEASURED, oldMeasured, measured));
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
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.QA_OUTCOME__UNIT, oldUnit, unit));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getLowerLimit() {
		return lowerLimit;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLowerLimit(double newLowerLimit) {
		double oldLowerLimit = lowerLimit;
		lowerLimit = newLowerLimit;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.QA_OUTCOME__LOWER_LIMIT, oldLowerLimit, lowerLimit));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getUpperLimit() {
		return upperLimit;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setUpperLimit(double newUpperLimit) {
		double oldUpperLimit = upperLimit;
		upperLimit = newUpperLimit;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.QA_OUTCOME__UPPER_LIMIT, oldUpperLimit, upperLimit));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getRule() {
		return rule;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setRule(String newRule) {
		String oldRule = rule;
		rule = newRule;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.QA_OUTCOME__RULE, oldRule, rule));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getSource() {
		return source;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSource(String newSource) {
		String oldSource = source;
		source = newSource;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.QA_OUTCOME__SOURCE, oldSource, source));
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
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.QA_OUTCOME__RECORDED_BY, oldRecordedBy, recordedBy));
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
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.QA_OUTCOME__RECORDED, oldRecorded, recorded));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case WorkspacePackage.QA_OUTCOME__PROJECT_ID:
				return getProjectId();
			case WorkspacePackage.QA_OUTCOME__METHOD_VERSION_ID:
				return getMethodVersionId();
			case WorkspacePackage.QA_OUTCOME__CHECK:
				return getCheck();
			case WorkspacePackage.QA_OUTCOME__PASSED:
				return isPassed();
			case WorkspacePackage.QA_OUTCOME__MEASURED:
				return getMeasured();
			case WorkspacePackage.QA_OUTCOME__UNIT:
				return getUnit();
			case WorkspacePackage.QA_OUTCOME__LOWER_LIMIT:
				return getLowerLimit();
			case WorkspacePackage.QA_OUTCOME__UPPER_LIMIT:
				return getUpperLimit();
			case WorkspacePackage.QA_OUTCOME__RULE:
				return getRule();
			case WorkspacePackage.QA_OUTCOME__SOURCE:
				return getSource();
			case WorkspacePackage.QA_OUTCOME__RECORDED_BY:
				return getRecordedBy();
			case WorkspacePackage.QA_OUTCOME__RECORDED:
				return getRecorded();
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
			case WorkspacePackage.QA_OUTCOME__PROJECT_ID:
				setProjectId((String)newValue);
				return;
			case WorkspacePackage.QA_OUTCOME__METHOD_VERSION_ID:
				setMethodVersionId((String)newValue);
				return;
			case WorkspacePackage.QA_OUTCOME__CHECK:
				setCheck((String)newValue);
				return;
			case WorkspacePackage.QA_OUTCOME__PASSED:
				setPassed((Boolean)newValue);
				return;
			case WorkspacePackage.QA_OUTCOME__MEASURED:
				setMeasured((Double)newValue);
				return;
			case WorkspacePackage.QA_OUTCOME__UNIT:
				setUnit((String)newValue);
				return;
			case WorkspacePackage.QA_OUTCOME__LOWER_LIMIT:
				setLowerLimit((Double)newValue);
				return;
			case WorkspacePackage.QA_OUTCOME__UPPER_LIMIT:
				setUpperLimit((Double)newValue);
				return;
			case WorkspacePackage.QA_OUTCOME__RULE:
				setRule((String)newValue);
				return;
			case WorkspacePackage.QA_OUTCOME__SOURCE:
				setSource((String)newValue);
				return;
			case WorkspacePackage.QA_OUTCOME__RECORDED_BY:
				setRecordedBy((String)newValue);
				return;
			case WorkspacePackage.QA_OUTCOME__RECORDED:
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
			case WorkspacePackage.QA_OUTCOME__PROJECT_ID:
				setProjectId(PROJECT_ID_EDEFAULT);
				return;
			case WorkspacePackage.QA_OUTCOME__METHOD_VERSION_ID:
				setMethodVersionId(METHOD_VERSION_ID_EDEFAULT);
				return;
			case WorkspacePackage.QA_OUTCOME__CHECK:
				setCheck(CHECK_EDEFAULT);
				return;
			case WorkspacePackage.QA_OUTCOME__PASSED:
				setPassed(PASSED_EDEFAULT);
				return;
			case WorkspacePackage.QA_OUTCOME__MEASURED:
				setMeasured(MEASURED_EDEFAULT);
				return;
			case WorkspacePackage.QA_OUTCOME__UNIT:
				setUnit(UNIT_EDEFAULT);
				return;
			case WorkspacePackage.QA_OUTCOME__LOWER_LIMIT:
				setLowerLimit(LOWER_LIMIT_EDEFAULT);
				return;
			case WorkspacePackage.QA_OUTCOME__UPPER_LIMIT:
				setUpperLimit(UPPER_LIMIT_EDEFAULT);
				return;
			case WorkspacePackage.QA_OUTCOME__RULE:
				setRule(RULE_EDEFAULT);
				return;
			case WorkspacePackage.QA_OUTCOME__SOURCE:
				setSource(SOURCE_EDEFAULT);
				return;
			case WorkspacePackage.QA_OUTCOME__RECORDED_BY:
				setRecordedBy(RECORDED_BY_EDEFAULT);
				return;
			case WorkspacePackage.QA_OUTCOME__RECORDED:
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
			case WorkspacePackage.QA_OUTCOME__PROJECT_ID:
				return PROJECT_ID_EDEFAULT == null ? projectId != null : !PROJECT_ID_EDEFAULT.equals(projectId);
			case WorkspacePackage.QA_OUTCOME__METHOD_VERSION_ID:
				return METHOD_VERSION_ID_EDEFAULT == null ? methodVersionId != null : !METHOD_VERSION_ID_EDEFAULT.equals(methodVersionId);
			case WorkspacePackage.QA_OUTCOME__CHECK:
				return CHECK_EDEFAULT == null ? check != null : !CHECK_EDEFAULT.equals(check);
			case WorkspacePackage.QA_OUTCOME__PASSED:
				return passed != PASSED_EDEFAULT;
			case WorkspacePackage.QA_OUTCOME__MEASURED:
				return measured != MEASURED_EDEFAULT;
			case WorkspacePackage.QA_OUTCOME__UNIT:
				return UNIT_EDEFAULT == null ? unit != null : !UNIT_EDEFAULT.equals(unit);
			case WorkspacePackage.QA_OUTCOME__LOWER_LIMIT:
				return lowerLimit != LOWER_LIMIT_EDEFAULT;
			case WorkspacePackage.QA_OUTCOME__UPPER_LIMIT:
				return upperLimit != UPPER_LIMIT_EDEFAULT;
			case WorkspacePackage.QA_OUTCOME__RULE:
				return RULE_EDEFAULT == null ? rule != null : !RULE_EDEFAULT.equals(rule);
			case WorkspacePackage.QA_OUTCOME__SOURCE:
				return SOURCE_EDEFAULT == null ? source != null : !SOURCE_EDEFAULT.equals(source);
			case WorkspacePackage.QA_OUTCOME__RECORDED_BY:
				return RECORDED_BY_EDEFAULT == null ? recordedBy != null : !RECORDED_BY_EDEFAULT.equals(recordedBy);
			case WorkspacePackage.QA_OUTCOME__RECORDED:
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
		result.append(", methodVersionId: ");
		result.append(methodVersionId);
		result.append(", check: ");
		result.append(check);
		result.append(", passed: ");
		result.append(passed);
		result.append(", measured: ");
		result.append(measured);
		result.append(", unit: ");
		result.append(unit);
		result.append(", lowerLimit: ");
		result.append(lowerLimit);
		result.append(", upperLimit: ");
		result.append(upperLimit);
		result.append(", rule: ");
		result.append(rule);
		result.append(", source: ");
		result.append(source);
		result.append(", recordedBy: ");
		result.append(recordedBy);
		result.append(", recorded: ");
		result.append(recorded);
		result.append(')');
		return result.toString();
	}

} //QaOutcomeImpl
