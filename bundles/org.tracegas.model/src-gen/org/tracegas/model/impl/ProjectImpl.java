/**
 */
package org.tracegas.model.impl;

import java.time.Instant;

import java.util.Collection;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.NotificationChain;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.eclipse.emf.ecore.util.EObjectContainmentEList;
import org.eclipse.emf.ecore.util.EObjectResolvingEList;
import org.eclipse.emf.ecore.util.InternalEList;

import org.tracegas.model.AnalysisRun;
import org.tracegas.model.EmissionSource;
import org.tracegas.model.Measurement;
import org.tracegas.model.Project;
import org.tracegas.model.ProjectGrant;
import org.tracegas.model.Report;
import org.tracegas.model.WorkspacePackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Project</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.impl.ProjectImpl#getCode <em>Code</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ProjectImpl#getName <em>Name</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ProjectImpl#getStart <em>Start</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ProjectImpl#getEnd <em>End</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ProjectImpl#getSources <em>Sources</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ProjectImpl#getGrants <em>Grants</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ProjectImpl#getMeasurements <em>Measurements</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ProjectImpl#getRuns <em>Runs</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ProjectImpl#getReports <em>Reports</em>}</li>
 * </ul>
 *
 * @generated
 */
public class ProjectImpl extends StoredObjectImpl implements Project {
	/**
	 * The default value of the '{@link #getCode() <em>Code</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCode()
	 * @generated
	 * @ordered
	 */
	protected static final String CODE_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getCode() <em>Code</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCode()
	 * @generated
	 * @ordered
	 */
	protected String code = CODE_EDEFAULT;

	/**
	 * The default value of the '{@link #getName() <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getName()
	 * @generated
	 * @ordered
	 */
	protected static final String NAME_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getName() <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getName()
	 * @generated
	 * @ordered
	 */
	protected String name = NAME_EDEFAULT;

	/**
	 * The default value of the '{@link #getStart() <em>Start</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStart()
	 * @generated
	 * @ordered
	 */
	protected static final Instant START_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getStart() <em>Start</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStart()
	 * @generated
	 * @ordered
	 */
	protected Instant start = START_EDEFAULT;

	/**
	 * The default value of the '{@link #getEnd() <em>End</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEnd()
	 * @generated
	 * @ordered
	 */
	protected static final Instant END_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getEnd() <em>End</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEnd()
	 * @generated
	 * @ordered
	 */
	protected Instant end = END_EDEFAULT;

	/**
	 * The cached value of the '{@link #getSources() <em>Sources</em>}' reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSources()
	 * @generated
	 * @ordered
	 */
	protected EList<EmissionSource> sources;

	/**
	 * The cached value of the '{@link #getGrants() <em>Grants</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getGrants()
	 * @generated
	 * @ordered
	 */
	protected EList<ProjectGrant> grants;

	/**
	 * The cached value of the '{@link #getMeasurements() <em>Measurements</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMeasurements()
	 * @generated
	 * @ordered
	 */
	protected EList<Measurement> measurements;

	/**
	 * The cached value of the '{@link #getRuns() <em>Runs</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRuns()
	 * @generated
	 * @ordered
	 */
	protected EList<AnalysisRun> runs;

	/**
	 * The cached value of the '{@link #getReports() <em>Reports</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getReports()
	 * @generated
	 * @ordered
	 */
	protected EList<Report> reports;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected ProjectImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return WorkspacePackage.Literals.PROJECT;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getCode() {
		return code;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCode(String newCode) {
		String oldCode = code;
		code = newCode;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.PROJECT__CODE, oldCode, code));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getName() {
		return name;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setName(String newName) {
		String oldName = name;
		name = newName;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.PROJECT__NAME, oldName, name));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Instant getStart() {
		return start;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setStart(Instant newStart) {
		Instant oldStart = start;
		start = newStart;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.PROJECT__START, oldStart, start));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Instant getEnd() {
		return end;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setEnd(Instant newEnd) {
		Instant oldEnd = end;
		end = newEnd;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.PROJECT__END, oldEnd, end));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<EmissionSource> getSources() {
		if (sources == null) {
			sources = new EObjectResolvingEList<EmissionSource>(EmissionSource.class, this, WorkspacePackage.PROJECT__SOURCES);
		}
		return sources;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<ProjectGrant> getGrants() {
		if (grants == null) {
			grants = new EObjectContainmentEList<ProjectGrant>(ProjectGrant.class, this, WorkspacePackage.PROJECT__GRANTS);
		}
		return grants;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Measurement> getMeasurements() {
		if (measurements == null) {
			measurements = new EObjectContainmentEList<Measurement>(Measurement.class, this, WorkspacePackage.PROJECT__MEASUREMENTS);
		}
		return measurements;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<AnalysisRun> getRuns() {
		if (runs == null) {
			runs = new EObjectContainmentEList<AnalysisRun>(AnalysisRun.class, this, WorkspacePackage.PROJECT__RUNS);
		}
		return runs;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Report> getReports() {
		if (reports == null) {
			reports = new EObjectContainmentEList<Report>(Report.class, this, WorkspacePackage.PROJECT__REPORTS);
		}
		return reports;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case WorkspacePackage.PROJECT__GRANTS:
				return ((InternalEList<?>)getGrants()).basicRemove(otherEnd, msgs);
			case WorkspacePackage.PROJECT__MEASUREMENTS:
				return ((InternalEList<?>)getMeasurements()).basicRemove(otherEnd, msgs);
			case WorkspacePackage.PROJECT__RUNS:
				return ((InternalEList<?>)getRuns()).basicRemove(otherEnd, msgs);
			case WorkspacePackage.PROJECT__REPORTS:
				return ((InternalEList<?>)getReports()).basicRemove(otherEnd, msgs);
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
			case WorkspacePackage.PROJECT__CODE:
				return getCode();
			case WorkspacePackage.PROJECT__NAME:
				return getName();
			case WorkspacePackage.PROJECT__START:
				return getStart();
			case WorkspacePackage.PROJECT__END:
				return getEnd();
			case WorkspacePackage.PROJECT__SOURCES:
				return getSources();
			case WorkspacePackage.PROJECT__GRANTS:
				return getGrants();
			case WorkspacePackage.PROJECT__MEASUREMENTS:
				return getMeasurements();
			case WorkspacePackage.PROJECT__RUNS:
				return getRuns();
			case WorkspacePackage.PROJECT__REPORTS:
				return getReports();
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
			case WorkspacePackage.PROJECT__CODE:
				setCode((String)newValue);
				return;
			case WorkspacePackage.PROJECT__NAME:
				setName((String)newValue);
				return;
			case WorkspacePackage.PROJECT__START:
				setStart((Instant)newValue);
				return;
			case WorkspacePackage.PROJECT__END:
				setEnd((Instant)newValue);
				return;
			case WorkspacePackage.PROJECT__SOURCES:
				getSources().clear();
				getSources().addAll((Collection<? extends EmissionSource>)newValue);
				return;
			case WorkspacePackage.PROJECT__GRANTS:
				getGrants().clear();
				getGrants().addAll((Collection<? extends ProjectGrant>)newValue);
				return;
			case WorkspacePackage.PROJECT__MEASUREMENTS:
				getMeasurements().clear();
				getMeasurements().addAll((Collection<? extends Measurement>)newValue);
				return;
			case WorkspacePackage.PROJECT__RUNS:
				getRuns().clear();
				getRuns().addAll((Collection<? extends AnalysisRun>)newValue);
				return;
			case WorkspacePackage.PROJECT__REPORTS:
				getReports().clear();
				getReports().addAll((Collection<? extends Report>)newValue);
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
			case WorkspacePackage.PROJECT__CODE:
				setCode(CODE_EDEFAULT);
				return;
			case WorkspacePackage.PROJECT__NAME:
				setName(NAME_EDEFAULT);
				return;
			case WorkspacePackage.PROJECT__START:
				setStart(START_EDEFAULT);
				return;
			case WorkspacePackage.PROJECT__END:
				setEnd(END_EDEFAULT);
				return;
			case WorkspacePackage.PROJECT__SOURCES:
				getSources().clear();
				return;
			case WorkspacePackage.PROJECT__GRANTS:
				getGrants().clear();
				return;
			case WorkspacePackage.PROJECT__MEASUREMENTS:
				getMeasurements().clear();
				return;
			case WorkspacePackage.PROJECT__RUNS:
				getRuns().clear();
				return;
			case WorkspacePackage.PROJECT__REPORTS:
				getReports().clear();
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
			case WorkspacePackage.PROJECT__CODE:
				return CODE_EDEFAULT == null ? code != null : !CODE_EDEFAULT.equals(code);
			case WorkspacePackage.PROJECT__NAME:
				return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
			case WorkspacePackage.PROJECT__START:
				return START_EDEFAULT == null ? start != null : !START_EDEFAULT.equals(start);
			case WorkspacePackage.PROJECT__END:
				return END_EDEFAULT == null ? end != null : !END_EDEFAULT.equals(end);
			case WorkspacePackage.PROJECT__SOURCES:
				return sources != null && !sources.isEmpty();
			case WorkspacePackage.PROJECT__GRANTS:
				return grants != null && !grants.isEmpty();
			case WorkspacePackage.PROJECT__MEASUREMENTS:
				return measurements != null && !measurements.isEmpty();
			case WorkspacePackage.PROJECT__RUNS:
				return runs != null && !runs.isEmpty();
			case WorkspacePackage.PROJECT__REPORTS:
				return reports != null && !reports.isEmpty();
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
		result.append(" (code: ");
		result.append(code);
		result.append(", name: ");
		result.append(name);
		result.append(", start: ");
		result.append(start);
		result.append(", end: ");
		result.append(end);
		result.append(')');
		return result.toString();
	}

} //ProjectImpl
