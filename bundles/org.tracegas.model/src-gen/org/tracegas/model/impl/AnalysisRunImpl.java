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
import org.tracegas.model.LibraryVersion;
import org.tracegas.model.Measurement;
import org.tracegas.model.MethodVersion;
import org.tracegas.model.QaCheck;
import org.tracegas.model.Result;
import org.tracegas.model.RunStatus;
import org.tracegas.model.User;
import org.tracegas.model.WorkspacePackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Analysis Run</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.impl.AnalysisRunImpl#getStarted <em>Started</em>}</li>
 *   <li>{@link org.tracegas.model.impl.AnalysisRunImpl#getFinished <em>Finished</em>}</li>
 *   <li>{@link org.tracegas.model.impl.AnalysisRunImpl#getStatus <em>Status</em>}</li>
 *   <li>{@link org.tracegas.model.impl.AnalysisRunImpl#getSoftwareVersion <em>Software Version</em>}</li>
 *   <li>{@link org.tracegas.model.impl.AnalysisRunImpl#getAnalyst <em>Analyst</em>}</li>
 *   <li>{@link org.tracegas.model.impl.AnalysisRunImpl#getMethod <em>Method</em>}</li>
 *   <li>{@link org.tracegas.model.impl.AnalysisRunImpl#getLibrary <em>Library</em>}</li>
 *   <li>{@link org.tracegas.model.impl.AnalysisRunImpl#getMeasurements <em>Measurements</em>}</li>
 *   <li>{@link org.tracegas.model.impl.AnalysisRunImpl#getResults <em>Results</em>}</li>
 *   <li>{@link org.tracegas.model.impl.AnalysisRunImpl#getQaChecks <em>Qa Checks</em>}</li>
 * </ul>
 *
 * @generated
 */
public class AnalysisRunImpl extends StoredObjectImpl implements AnalysisRun {
	/**
	 * The default value of the '{@link #getStarted() <em>Started</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStarted()
	 * @generated
	 * @ordered
	 */
	protected static final Instant STARTED_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getStarted() <em>Started</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStarted()
	 * @generated
	 * @ordered
	 */
	protected Instant started = STARTED_EDEFAULT;

	/**
	 * The default value of the '{@link #getFinished() <em>Finished</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFinished()
	 * @generated
	 * @ordered
	 */
	protected static final Instant FINISHED_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getFinished() <em>Finished</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFinished()
	 * @generated
	 * @ordered
	 */
	protected Instant finished = FINISHED_EDEFAULT;

	/**
	 * The default value of the '{@link #getStatus() <em>Status</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStatus()
	 * @generated
	 * @ordered
	 */
	protected static final RunStatus STATUS_EDEFAULT = RunStatus.PENDING;

	/**
	 * The cached value of the '{@link #getStatus() <em>Status</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStatus()
	 * @generated
	 * @ordered
	 */
	protected RunStatus status = STATUS_EDEFAULT;

	/**
	 * The default value of the '{@link #getSoftwareVersion() <em>Software Version</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSoftwareVersion()
	 * @generated
	 * @ordered
	 */
	protected static final String SOFTWARE_VERSION_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getSoftwareVersion() <em>Software Version</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSoftwareVersion()
	 * @generated
	 * @ordered
	 */
	protected String softwareVersion = SOFTWARE_VERSION_EDEFAULT;

	/**
	 * The cached value of the '{@link #getAnalyst() <em>Analyst</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAnalyst()
	 * @generated
	 * @ordered
	 */
	protected User analyst;

	/**
	 * The cached value of the '{@link #getMethod() <em>Method</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMethod()
	 * @generated
	 * @ordered
	 */
	protected MethodVersion method;

	/**
	 * The cached value of the '{@link #getLibrary() <em>Library</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLibrary()
	 * @generated
	 * @ordered
	 */
	protected LibraryVersion library;

	/**
	 * The cached value of the '{@link #getMeasurements() <em>Measurements</em>}' reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMeasurements()
	 * @generated
	 * @ordered
	 */
	protected EList<Measurement> measurements;

	/**
	 * The cached value of the '{@link #getResults() <em>Results</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getResults()
	 * @generated
	 * @ordered
	 */
	protected EList<Result> results;

	/**
	 * The cached value of the '{@link #getQaChecks() <em>Qa Checks</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getQaChecks()
	 * @generated
	 * @ordered
	 */
	protected EList<QaCheck> qaChecks;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected AnalysisRunImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return WorkspacePackage.Literals.ANALYSIS_RUN;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Instant getStarted() {
		return started;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setStarted(Instant newStarted) {
		Instant oldStarted = started;
		started = newStarted;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.ANALYSIS_RUN__STARTED, oldStarted, started));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Instant getFinished() {
		return finished;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setFinished(Instant newFinished) {
		Instant oldFinished = finished;
		finished = newFinished;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.ANALYSIS_RUN__FINISHED, oldFinished, finished));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public RunStatus getStatus() {
		return status;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setStatus(RunStatus newStatus) {
		RunStatus oldStatus = status;
		status = newStatus == null ? STATUS_EDEFAULT : newStatus;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.ANALYSIS_RUN__STATUS, oldStatus, status));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getSoftwareVersion() {
		return softwareVersion;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSoftwareVersion(String newSoftwareVersion) {
		String oldSoftwareVersion = softwareVersion;
		softwareVersion = newSoftwareVersion;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.ANALYSIS_RUN__SOFTWARE_VERSION, oldSoftwareVersion, softwareVersion));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public User getAnalyst() {
		if (analyst != null && analyst.eIsProxy()) {
			InternalEObject oldAnalyst = (InternalEObject)analyst;
			analyst = (User)eResolveProxy(oldAnalyst);
			if (analyst != oldAnalyst) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, WorkspacePackage.ANALYSIS_RUN__ANALYST, oldAnalyst, analyst));
			}
		}
		return analyst;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public User basicGetAnalyst() {
		return analyst;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setAnalyst(User newAnalyst) {
		User oldAnalyst = analyst;
		analyst = newAnalyst;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.ANALYSIS_RUN__ANALYST, oldAnalyst, analyst));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public MethodVersion getMethod() {
		if (method != null && method.eIsProxy()) {
			InternalEObject oldMethod = (InternalEObject)method;
			method = (MethodVersion)eResolveProxy(oldMethod);
			if (method != oldMethod) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, WorkspacePackage.ANALYSIS_RUN__METHOD, oldMethod, method));
			}
		}
		return method;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public MethodVersion basicGetMethod() {
		return method;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMethod(MethodVersion newMethod) {
		MethodVersion oldMethod = method;
		method = newMethod;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.ANALYSIS_RUN__METHOD, oldMethod, method));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public LibraryVersion getLibrary() {
		if (library != null && library.eIsProxy()) {
			InternalEObject oldLibrary = (InternalEObject)library;
			library = (LibraryVersion)eResolveProxy(oldLibrary);
			if (library != oldLibrary) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, WorkspacePackage.ANALYSIS_RUN__LIBRARY, oldLibrary, library));
			}
		}
		return library;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public LibraryVersion basicGetLibrary() {
		return library;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLibrary(LibraryVersion newLibrary) {
		LibraryVersion oldLibrary = library;
		library = newLibrary;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.ANALYSIS_RUN__LIBRARY, oldLibrary, library));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Measurement> getMeasurements() {
		if (measurements == null) {
			measurements = new EObjectResolvingEList<Measurement>(Measurement.class, this, WorkspacePackage.ANALYSIS_RUN__MEASUREMENTS);
		}
		return measurements;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Result> getResults() {
		if (results == null) {
			results = new EObjectContainmentEList<Result>(Result.class, this, WorkspacePackage.ANALYSIS_RUN__RESULTS);
		}
		return results;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<QaCheck> getQaChecks() {
		if (qaChecks == null) {
			qaChecks = new EObjectContainmentEList<QaCheck>(QaCheck.class, this, WorkspacePackage.ANALYSIS_RUN__QA_CHECKS);
		}
		return qaChecks;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case WorkspacePackage.ANALYSIS_RUN__RESULTS:
				return ((InternalEList<?>)getResults()).basicRemove(otherEnd, msgs);
			case WorkspacePackage.ANALYSIS_RUN__QA_CHECKS:
				return ((InternalEList<?>)getQaChecks()).basicRemove(otherEnd, msgs);
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
			case WorkspacePackage.ANALYSIS_RUN__STARTED:
				return getStarted();
			case WorkspacePackage.ANALYSIS_RUN__FINISHED:
				return getFinished();
			case WorkspacePackage.ANALYSIS_RUN__STATUS:
				return getStatus();
			case WorkspacePackage.ANALYSIS_RUN__SOFTWARE_VERSION:
				return getSoftwareVersion();
			case WorkspacePackage.ANALYSIS_RUN__ANALYST:
				if (resolve) return getAnalyst();
				return basicGetAnalyst();
			case WorkspacePackage.ANALYSIS_RUN__METHOD:
				if (resolve) return getMethod();
				return basicGetMethod();
			case WorkspacePackage.ANALYSIS_RUN__LIBRARY:
				if (resolve) return getLibrary();
				return basicGetLibrary();
			case WorkspacePackage.ANALYSIS_RUN__MEASUREMENTS:
				return getMeasurements();
			case WorkspacePackage.ANALYSIS_RUN__RESULTS:
				return getResults();
			case WorkspacePackage.ANALYSIS_RUN__QA_CHECKS:
				return getQaChecks();
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
			case WorkspacePackage.ANALYSIS_RUN__STARTED:
				setStarted((Instant)newValue);
				return;
			case WorkspacePackage.ANALYSIS_RUN__FINISHED:
				setFinished((Instant)newValue);
				return;
			case WorkspacePackage.ANALYSIS_RUN__STATUS:
				setStatus((RunStatus)newValue);
				return;
			case WorkspacePackage.ANALYSIS_RUN__SOFTWARE_VERSION:
				setSoftwareVersion((String)newValue);
				return;
			case WorkspacePackage.ANALYSIS_RUN__ANALYST:
				setAnalyst((User)newValue);
				return;
			case WorkspacePackage.ANALYSIS_RUN__METHOD:
				setMethod((MethodVersion)newValue);
				return;
			case WorkspacePackage.ANALYSIS_RUN__LIBRARY:
				setLibrary((LibraryVersion)newValue);
				return;
			case WorkspacePackage.ANALYSIS_RUN__MEASUREMENTS:
				getMeasurements().clear();
				getMeasurements().addAll((Collection<? extends Measurement>)newValue);
				return;
			case WorkspacePackage.ANALYSIS_RUN__RESULTS:
				getResults().clear();
				getResults().addAll((Collection<? extends Result>)newValue);
				return;
			case WorkspacePackage.ANALYSIS_RUN__QA_CHECKS:
				getQaChecks().clear();
				getQaChecks().addAll((Collection<? extends QaCheck>)newValue);
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
			case WorkspacePackage.ANALYSIS_RUN__STARTED:
				setStarted(STARTED_EDEFAULT);
				return;
			case WorkspacePackage.ANALYSIS_RUN__FINISHED:
				setFinished(FINISHED_EDEFAULT);
				return;
			case WorkspacePackage.ANALYSIS_RUN__STATUS:
				setStatus(STATUS_EDEFAULT);
				return;
			case WorkspacePackage.ANALYSIS_RUN__SOFTWARE_VERSION:
				setSoftwareVersion(SOFTWARE_VERSION_EDEFAULT);
				return;
			case WorkspacePackage.ANALYSIS_RUN__ANALYST:
				setAnalyst((User)null);
				return;
			case WorkspacePackage.ANALYSIS_RUN__METHOD:
				setMethod((MethodVersion)null);
				return;
			case WorkspacePackage.ANALYSIS_RUN__LIBRARY:
				setLibrary((LibraryVersion)null);
				return;
			case WorkspacePackage.ANALYSIS_RUN__MEASUREMENTS:
				getMeasurements().clear();
				return;
			case WorkspacePackage.ANALYSIS_RUN__RESULTS:
				getResults().clear();
				return;
			case WorkspacePackage.ANALYSIS_RUN__QA_CHECKS:
				getQaChecks().clear();
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
			case WorkspacePackage.ANALYSIS_RUN__STARTED:
				return STARTED_EDEFAULT == null ? started != null : !STARTED_EDEFAULT.equals(started);
			case WorkspacePackage.ANALYSIS_RUN__FINISHED:
				return FINISHED_EDEFAULT == null ? finished != null : !FINISHED_EDEFAULT.equals(finished);
			case WorkspacePackage.ANALYSIS_RUN__STATUS:
				return status != STATUS_EDEFAULT;
			case WorkspacePackage.ANALYSIS_RUN__SOFTWARE_VERSION:
				return SOFTWARE_VERSION_EDEFAULT == null ? softwareVersion != null : !SOFTWARE_VERSION_EDEFAULT.equals(softwareVersion);
			case WorkspacePackage.ANALYSIS_RUN__ANALYST:
				return analyst != null;
			case WorkspacePackage.ANALYSIS_RUN__METHOD:
				return method != null;
			case WorkspacePackage.ANALYSIS_RUN__LIBRARY:
				return library != null;
			case WorkspacePackage.ANALYSIS_RUN__MEASUREMENTS:
				return measurements != null && !measurements.isEmpty();
			case WorkspacePackage.ANALYSIS_RUN__RESULTS:
				return results != null && !results.isEmpty();
			case WorkspacePackage.ANALYSIS_RUN__QA_CHECKS:
				return qaChecks != null && !qaChecks.isEmpty();
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
		result.append(" (started: ");
		result.append(started);
		result.append(", finished: ");
		result.append(finished);
		result.append(", status: ");
		result.append(status);
		result.append(", softwareVersion: ");
		result.append(softwareVersion);
		result.append(')');
		return result.toString();
	}

} //AnalysisRunImpl
