/**
 */
package org.tracegas.model.impl;

import java.time.Instant;

import java.util.Collection;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.eclipse.emf.ecore.util.EObjectResolvingEList;

import org.tracegas.model.AnalysisRun;
import org.tracegas.model.Report;
import org.tracegas.model.ReportStatus;
import org.tracegas.model.User;
import org.tracegas.model.WorkspacePackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Report</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.impl.ReportImpl#getTitle <em>Title</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReportImpl#getCreated <em>Created</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReportImpl#getStatus <em>Status</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReportImpl#getRuns <em>Runs</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReportImpl#getAuthor <em>Author</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReportImpl#getDocumentUri <em>Document Uri</em>}</li>
 * </ul>
 *
 * @generated
 */
public class ReportImpl extends StoredObjectImpl implements Report {
	/**
	 * The default value of the '{@link #getTitle() <em>Title</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTitle()
	 * @generated
	 * @ordered
	 */
	protected static final String TITLE_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getTitle() <em>Title</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTitle()
	 * @generated
	 * @ordered
	 */
	protected String title = TITLE_EDEFAULT;

	/**
	 * The default value of the '{@link #getCreated() <em>Created</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCreated()
	 * @generated
	 * @ordered
	 */
	protected static final Instant CREATED_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getCreated() <em>Created</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCreated()
	 * @generated
	 * @ordered
	 */
	protected Instant created = CREATED_EDEFAULT;

	/**
	 * The default value of the '{@link #getStatus() <em>Status</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStatus()
	 * @generated
	 * @ordered
	 */
	protected static final ReportStatus STATUS_EDEFAULT = ReportStatus.DRAFT;

	/**
	 * The cached value of the '{@link #getStatus() <em>Status</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStatus()
	 * @generated
	 * @ordered
	 */
	protected ReportStatus status = STATUS_EDEFAULT;

	/**
	 * The cached value of the '{@link #getRuns() <em>Runs</em>}' reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRuns()
	 * @generated
	 * @ordered
	 */
	protected EList<AnalysisRun> runs;

	/**
	 * The cached value of the '{@link #getAuthor() <em>Author</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAuthor()
	 * @generated
	 * @ordered
	 */
	protected User author;

	/**
	 * The default value of the '{@link #getDocumentUri() <em>Document Uri</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDocumentUri()
	 * @generated
	 * @ordered
	 */
	protected static final String DOCUMENT_URI_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getDocumentUri() <em>Document Uri</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDocumentUri()
	 * @generated
	 * @ordered
	 */
	protected String documentUri = DOCUMENT_URI_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected ReportImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return WorkspacePackage.Literals.REPORT;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getTitle() {
		return title;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTitle(String newTitle) {
		String oldTitle = title;
		title = newTitle;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REPORT__TITLE, oldTitle, title));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Instant getCreated() {
		return created;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCreated(Instant newCreated) {
		Instant oldCreated = created;
		created = newCreated;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REPORT__CREATED, oldCreated, created));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ReportStatus getStatus() {
		return status;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setStatus(ReportStatus newStatus) {
		ReportStatus oldStatus = status;
		status = newStatus == null ? STATUS_EDEFAULT : newStatus;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REPORT__STATUS, oldStatus, status));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<AnalysisRun> getRuns() {
		if (runs == null) {
			runs = new EObjectResolvingEList<AnalysisRun>(AnalysisRun.class, this, WorkspacePackage.REPORT__RUNS);
		}
		return runs;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public User getAuthor() {
		if (author != null && author.eIsProxy()) {
			InternalEObject oldAuthor = (InternalEObject)author;
			author = (User)eResolveProxy(oldAuthor);
			if (author != oldAuthor) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, WorkspacePackage.REPORT__AUTHOR, oldAuthor, author));
			}
		}
		return author;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public User basicGetAuthor() {
		return author;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setAuthor(User newAuthor) {
		User oldAuthor = author;
		author = newAuthor;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REPORT__AUTHOR, oldAuthor, author));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getDocumentUri() {
		return documentUri;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDocumentUri(String newDocumentUri) {
		String oldDocumentUri = documentUri;
		documentUri = newDocumentUri;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REPORT__DOCUMENT_URI, oldDocumentUri, documentUri));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case WorkspacePackage.REPORT__TITLE:
				return getTitle();
			case WorkspacePackage.REPORT__CREATED:
				return getCreated();
			case WorkspacePackage.REPORT__STATUS:
				return getStatus();
			case WorkspacePackage.REPORT__RUNS:
				return getRuns();
			case WorkspacePackage.REPORT__AUTHOR:
				if (resolve) return getAuthor();
				return basicGetAuthor();
			case WorkspacePackage.REPORT__DOCUMENT_URI:
				return getDocumentUri();
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
			case WorkspacePackage.REPORT__TITLE:
				setTitle((String)newValue);
				return;
			case WorkspacePackage.REPORT__CREATED:
				setCreated((Instant)newValue);
				return;
			case WorkspacePackage.REPORT__STATUS:
				setStatus((ReportStatus)newValue);
				return;
			case WorkspacePackage.REPORT__RUNS:
				getRuns().clear();
				getRuns().addAll((Collection<? extends AnalysisRun>)newValue);
				return;
			case WorkspacePackage.REPORT__AUTHOR:
				setAuthor((User)newValue);
				return;
			case WorkspacePackage.REPORT__DOCUMENT_URI:
				setDocumentUri((String)newValue);
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
			case WorkspacePackage.REPORT__TITLE:
				setTitle(TITLE_EDEFAULT);
				return;
			case WorkspacePackage.REPORT__CREATED:
				setCreated(CREATED_EDEFAULT);
				return;
			case WorkspacePackage.REPORT__STATUS:
				setStatus(STATUS_EDEFAULT);
				return;
			case WorkspacePackage.REPORT__RUNS:
				getRuns().clear();
				return;
			case WorkspacePackage.REPORT__AUTHOR:
				setAuthor((User)null);
				return;
			case WorkspacePackage.REPORT__DOCUMENT_URI:
				setDocumentUri(DOCUMENT_URI_EDEFAULT);
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
			case WorkspacePackage.REPORT__TITLE:
				return TITLE_EDEFAULT == null ? title != null : !TITLE_EDEFAULT.equals(title);
			case WorkspacePackage.REPORT__CREATED:
				return CREATED_EDEFAULT == null ? created != null : !CREATED_EDEFAULT.equals(created);
			case WorkspacePackage.REPORT__STATUS:
				return status != STATUS_EDEFAULT;
			case WorkspacePackage.REPORT__RUNS:
				return runs != null && !runs.isEmpty();
			case WorkspacePackage.REPORT__AUTHOR:
				return author != null;
			case WorkspacePackage.REPORT__DOCUMENT_URI:
				return DOCUMENT_URI_EDEFAULT == null ? documentUri != null : !DOCUMENT_URI_EDEFAULT.equals(documentUri);
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
		result.append(" (title: ");
		result.append(title);
		result.append(", created: ");
		result.append(created);
		result.append(", status: ");
		result.append(status);
		result.append(", documentUri: ");
		result.append(documentUri);
		result.append(')');
		return result.toString();
	}

} //ReportImpl
