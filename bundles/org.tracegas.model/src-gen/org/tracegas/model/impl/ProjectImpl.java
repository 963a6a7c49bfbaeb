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

import org.eclipse.emf.ecore.util.EObjectContainmentWithInverseEList;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.emf.ecore.util.InternalEList;

import org.tracegas.model.Client;
import org.tracegas.model.EmissionSource;
import org.tracegas.model.Measurement;
import org.tracegas.model.Project;
import org.tracegas.model.Report;
import org.tracegas.model.WorkBatch;
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
 *   <li>{@link org.tracegas.model.impl.ProjectImpl#getClient <em>Client</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ProjectImpl#getName <em>Name</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ProjectImpl#getStart <em>Start</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ProjectImpl#getEnd <em>End</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ProjectImpl#getMeasurements <em>Measurements</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ProjectImpl#getReports <em>Reports</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ProjectImpl#getBatches <em>Batches</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ProjectImpl#getSource <em>Source</em>}</li>
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
	 * The cached value of the '{@link #getMeasurements() <em>Measurements</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMeasurements()
	 * @generated
	 * @ordered
	 */
	protected EList<Measurement> measurements;

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
	 * The cached value of the '{@link #getBatches() <em>Batches</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBatches()
	 * @generated
	 * @ordered
	 */
	protected EList<WorkBatch> batches;

	/**
	 * The cached value of the '{@link #getSource() <em>Source</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSource()
	 * @generated
	 * @ordered
	 */
	protected EmissionSource source;

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
	public Client getClient() {
		if (eContainerFeatureID() != WorkspacePackage.PROJECT__CLIENT) return null;
		return (Client)eInternalContainer();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetClient(Client newClient, NotificationChain msgs) {
		msgs = eBasicSetContainer((InternalEObject)newClient, WorkspacePackage.PROJECT__CLIENT, msgs);
		return msgs;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setClient(Client newClient) {
		if (newClient != eInternalContainer() || (eContainerFeatureID() != WorkspacePackage.PROJECT__CLIENT && newClient != null)) {
			if (EcoreUtil.isAncestor(this, newClient))
				throw new IllegalArgumentException("Recursive containment not allowed for " + toString());
			NotificationChain msgs = null;
			if (eInternalContainer() != null)
				msgs = eBasicRemoveFromContainer(msgs);
			if (newClient != null)
				msgs = ((InternalEObject)newClient).eInverseAdd(this, WorkspacePackage.CLIENT__PROJECTS, Client.class, msgs);
			msgs = basicSetClient(newClient, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.PROJECT__CLIENT, newClient, newClient));
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
	public EList<Measurement> getMeasurements() {
		if (measurements == null) {
			measurements = new EObjectContainmentWithInverseEList<Measurement>(Measurement.class, this, WorkspacePackage.PROJECT__MEASUREMENTS, WorkspacePackage.MEASUREMENT__PROJECT);
		}
		return measurements;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Report> getReports() {
		if (reports == null) {
			reports = new EObjectContainmentWithInverseEList<Report>(Report.class, this, WorkspacePackage.PROJECT__REPORTS, WorkspacePackage.REPORT__PROJECT);
		}
		return reports;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<WorkBatch> getBatches() {
		if (batches == null) {
			batches = new EObjectContainmentWithInverseEList<WorkBatch>(WorkBatch.class, this, WorkspacePackage.PROJECT__BATCHES, WorkspacePackage.WORK_BATCH__PROJECT);
		}
		return batches;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EmissionSource getSource() {
		if (source != null && source.eIsProxy()) {
			InternalEObject oldSource = (InternalEObject)source;
			source = (EmissionSource)eResolveProxy(oldSource);
			if (source != oldSource) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, WorkspacePackage.PROJECT__SOURCE, oldSource, source));
			}
		}
		return source;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public EmissionSource basicGetSource() {
		return source;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSource(EmissionSource newSource) {
		EmissionSource oldSource = source;
		source = newSource;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.PROJECT__SOURCE, oldSource, source));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@SuppressWarnings("unchecked")
	@Override
	public NotificationChain eInverseAdd(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case WorkspacePackage.PROJECT__CLIENT:
				if (eInternalContainer() != null)
					msgs = eBasicRemoveFromContainer(msgs);
				return basicSetClient((Client)otherEnd, msgs);
			case WorkspacePackage.PROJECT__MEASUREMENTS:
				return ((InternalEList<InternalEObject>)(InternalEList<?>)getMeasurements()).basicAdd(otherEnd, msgs);
			case WorkspacePackage.PROJECT__REPORTS:
				return ((InternalEList<InternalEObject>)(InternalEList<?>)getReports()).basicAdd(otherEnd, msgs);
			case WorkspacePackage.PROJECT__BATCHES:
				return ((InternalEList<InternalEObject>)(InternalEList<?>)getBatches()).basicAdd(otherEnd, msgs);
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
			case WorkspacePackage.PROJECT__CLIENT:
				return basicSetClient(null, msgs);
			case WorkspacePackage.PROJECT__MEASUREMENTS:
				return ((InternalEList<?>)getMeasurements()).basicRemove(otherEnd, msgs);
			case WorkspacePackage.PROJECT__REPORTS:
				return ((InternalEList<?>)getReports()).basicRemove(otherEnd, msgs);
			case WorkspacePackage.PROJECT__BATCHES:
				return ((InternalEList<?>)getBatches()).basicRemove(otherEnd, msgs);
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
			case WorkspacePackage.PROJECT__CLIENT:
				return eInternalContainer().eInverseRemove(this, WorkspacePackage.CLIENT__PROJECTS, Client.class, msgs);
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
			case WorkspacePackage.PROJECT__CODE:
				return getCode();
			case WorkspacePackage.PROJECT__CLIENT:
				return getClient();
			case WorkspacePackage.PROJECT__NAME:
				return getName();
			case WorkspacePackage.PROJECT__START:
				return getStart();
			case WorkspacePackage.PROJECT__END:
				return getEnd();
			case WorkspacePackage.PROJECT__MEASUREMENTS:
				return getMeasurements();
			case WorkspacePackage.PROJECT__REPORTS:
				return getReports();
			case WorkspacePackage.PROJECT__BATCHES:
				return getBatches();
			case WorkspacePackage.PROJECT__SOURCE:
				if (resolve) return getSource();
				return basicGetSource();
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
			case WorkspacePackage.PROJECT__CLIENT:
				setClient((Client)newValue);
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
			case WorkspacePackage.PROJECT__MEASUREMENTS:
				getMeasurements().clear();
				getMeasurements().addAll((Collection<? extends Measurement>)newValue);
				return;
			case WorkspacePackage.PROJECT__REPORTS:
				getReports().clear();
				getReports().addAll((Collection<? extends Report>)newValue);
				return;
			case WorkspacePackage.PROJECT__BATCHES:
				getBatches().clear();
				getBatches().addAll((Collection<? extends WorkBatch>)newValue);
				return;
			case WorkspacePackage.PROJECT__SOURCE:
				setSource((EmissionSource)newValue);
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
			case WorkspacePackage.PROJECT__CLIENT:
				setClient((Client)null);
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
			case WorkspacePackage.PROJECT__MEASUREMENTS:
				getMeasurements().clear();
				return;
			case WorkspacePackage.PROJECT__REPORTS:
				getReports().clear();
				return;
			case WorkspacePackage.PROJECT__BATCHES:
				getBatches().clear();
				return;
			case WorkspacePackage.PROJECT__SOURCE:
				setSource((EmissionSource)null);
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
			case WorkspacePackage.PROJECT__CLIENT:
				return getClient() != null;
			case WorkspacePackage.PROJECT__NAME:
				return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
			case WorkspacePackage.PROJECT__START:
				return START_EDEFAULT == null ? start != null : !START_EDEFAULT.equals(start);
			case WorkspacePackage.PROJECT__END:
				return END_EDEFAULT == null ? end != null : !END_EDEFAULT.equals(end);
			case WorkspacePackage.PROJECT__MEASUREMENTS:
				return measurements != null && !measurements.isEmpty();
			case WorkspacePackage.PROJECT__REPORTS:
				return reports != null && !reports.isEmpty();
			case WorkspacePackage.PROJECT__BATCHES:
				return batches != null && !batches.isEmpty();
			case WorkspacePackage.PROJECT__SOURCE:
				return source != null;
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
