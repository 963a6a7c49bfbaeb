/**
 */
package org.tracegas.model.impl;

import java.time.Instant;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.NotificationChain;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.eclipse.emf.ecore.util.EcoreUtil;

import org.tracegas.model.Project;
import org.tracegas.model.Report;
import org.tracegas.model.WorkspacePackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Report</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.impl.ReportImpl#getProject <em>Project</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReportImpl#getReportId <em>Report Id</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReportImpl#getTitle <em>Title</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReportImpl#getIssued <em>Issued</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReportImpl#getIssuedBy <em>Issued By</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReportImpl#getContentSha256 <em>Content Sha256</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReportImpl#getFileName <em>File Name</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReportImpl#getPageCount <em>Page Count</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReportImpl#getMethodVersionId <em>Method Version Id</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReportImpl#getLibraryVersionId <em>Library Version Id</em>}</li>
 * </ul>
 *
 * @generated
 */
public class ReportImpl extends StoredObjectImpl implements Report {
	/**
	 * The default value of the '{@link #getReportId() <em>Report Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getReportId()
	 * @generated
	 * @ordered
	 */
	protected static final String REPORT_ID_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getReportId() <em>Report Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getReportId()
	 * @generated
	 * @ordered
	 */
	protected String reportId = REPORT_ID_EDEFAULT;

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
	 * The default value of the '{@link #getIssued() <em>Issued</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getIssued()
	 * @generated
	 * @ordered
	 */
	protected static final Instant ISSUED_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getIssued() <em>Issued</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getIssued()
	 * @generated
	 * @ordered
	 */
	protected Instant issued = ISSUED_EDEFAULT;

	/**
	 * The default value of the '{@link #getIssuedBy() <em>Issued By</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getIssuedBy()
	 * @generated
	 * @ordered
	 */
	protected static final String ISSUED_BY_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getIssuedBy() <em>Issued By</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getIssuedBy()
	 * @generated
	 * @ordered
	 */
	protected String issuedBy = ISSUED_BY_EDEFAULT;

	/**
	 * The default value of the '{@link #getContentSha256() <em>Content Sha256</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getContentSha256()
	 * @generated
	 * @ordered
	 */
	protected static final String CONTENT_SHA256_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getContentSha256() <em>Content Sha256</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getContentSha256()
	 * @generated
	 * @ordered
	 */
	protected String contentSha256 = CONTENT_SHA256_EDEFAULT;

	/**
	 * The default value of the '{@link #getFileName() <em>File Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFileName()
	 * @generated
	 * @ordered
	 */
	protected static final String FILE_NAME_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getFileName() <em>File Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFileName()
	 * @generated
	 * @ordered
	 */
	protected String fileName = FILE_NAME_EDEFAULT;

	/**
	 * The default value of the '{@link #getPageCount() <em>Page Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPageCount()
	 * @generated
	 * @ordered
	 */
	protected static final int PAGE_COUNT_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getPageCount() <em>Page Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPageCount()
	 * @generated
	 * @ordered
	 */
	protected int pageCount = PAGE_COUNT_EDEFAULT;

	/**
	 * This is true if the Page Count attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean pageCountESet;

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
	 * The default value of the '{@link #getLibraryVersionId() <em>Library Version Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLibraryVersionId()
	 * @generated
	 * @ordered
	 */
	protected static final String LIBRARY_VERSION_ID_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getLibraryVersionId() <em>Library Version Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLibraryVersionId()
	 * @generated
	 * @ordered
	 */
	protected String libraryVersionId = LIBRARY_VERSION_ID_EDEFAULT;

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
	public Project getProject() {
		if (eContainerFeatureID() != WorkspacePackage.REPORT__PROJECT) return null;
		return (Project)eInternalContainer();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetProject(Project newProject, NotificationChain msgs) {
		msgs = eBasicSetContainer((InternalEObject)newProject, WorkspacePackage.REPORT__PROJECT, msgs);
		return msgs;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setProject(Project newProject) {
		if (newProject != eInternalContainer() || (eContainerFeatureID() != WorkspacePackage.REPORT__PROJECT && newProject != null)) {
			if (EcoreUtil.isAncestor(this, newProject))
				throw new IllegalArgumentException("Recursive containment not allowed for " + toString());
			NotificationChain msgs = null;
			if (eInternalContainer() != null)
				msgs = eBasicRemoveFromContainer(msgs);
			if (newProject != null)
				msgs = ((InternalEObject)newProject).eInverseAdd(this, WorkspacePackage.PROJECT__REPORTS, Project.class, msgs);
			msgs = basicSetProject(newProject, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REPORT__PROJECT, newProject, newProject));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getReportId() {
		return reportId;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setReportId(String newReportId) {
		String oldReportId = reportId;
		reportId = newReportId;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REPORT__REPORT_ID, oldReportId, reportId));
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
	public Instant getIssued() {
		return issued;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setIssued(Instant newIssued) {
		Instant oldIssued = issued;
		issued = newIssued;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REPORT__ISSUED, oldIssued, issued));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getIssuedBy() {
		return issuedBy;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setIssuedBy(String newIssuedBy) {
		String oldIssuedBy = issuedBy;
		issuedBy = newIssuedBy;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REPORT__ISSUED_BY, oldIssuedBy, issuedBy));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getContentSha256() {
		return contentSha256;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setContentSha256(String newContentSha256) {
		String oldContentSha256 = contentSha256;
		contentSha256 = newContentSha256;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REPORT__CONTENT_SHA256, oldContentSha256, contentSha256));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getFileName() {
		return fileName;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setFileName(String newFileName) {
		String oldFileName = fileName;
		fileName = newFileName;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REPORT__FILE_NAME, oldFileName, fileName));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getPageCount() {
		return pageCount;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPageCount(int newPageCount) {
		int oldPageCount = pageCount;
		pageCount = newPageCount;
		boolean oldPageCountESet = pageCountESet;
		pageCountESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REPORT__PAGE_COUNT, oldPageCount, pageCount, !oldPageCountESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetPageCount() {
		int oldPageCount = pageCount;
		boolean oldPageCountESet = pageCountESet;
		pageCount = PAGE_COUNT_EDEFAULT;
		pageCountESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, WorkspacePackage.REPORT__PAGE_COUNT, oldPageCount, PAGE_COUNT_EDEFAULT, oldPageCountESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetPageCount() {
		return pageCountESet;
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
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REPORT__METHOD_VERSION_ID, oldMethodVersionId, methodVersionId));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getLibraryVersionId() {
		return libraryVersionId;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLibraryVersionId(String newLibraryVersionId) {
		String oldLibraryVersionId = libraryVersionId;
		libraryVersionId = newLibraryVersionId;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REPORT__LIBRARY_VERSION_ID, oldLibraryVersionId, libraryVersionId));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseAdd(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case WorkspacePackage.REPORT__PROJECT:
				if (eInternalContainer() != null)
					msgs = eBasicRemoveFromContainer(msgs);
				return basicSetProject((Project)otherEnd, msgs);
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
			case WorkspacePackage.REPORT__PROJECT:
				return basicSetProject(null, msgs);
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
			case WorkspacePackage.REPORT__PROJECT:
				return eInternalContainer().eInverseRemove(this, WorkspacePackage.PROJECT__REPORTS, Project.class, msgs);
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
			case WorkspacePackage.REPORT__PROJECT:
				return getProject();
			case WorkspacePackage.REPORT__REPORT_ID:
				return getReportId();
			case WorkspacePackage.REPORT__TITLE:
				return getTitle();
			case WorkspacePackage.REPORT__ISSUED:
				return getIssued();
			case WorkspacePackage.REPORT__ISSUED_BY:
				return getIssuedBy();
			case WorkspacePackage.REPORT__CONTENT_SHA256:
				return getContentSha256();
			case WorkspacePackage.REPORT__FILE_NAME:
				return getFileName();
			case WorkspacePackage.REPORT__PAGE_COUNT:
				return getPageCount();
			case WorkspacePackage.REPORT__METHOD_VERSION_ID:
				return getMethodVersionId();
			case WorkspacePackage.REPORT__LIBRARY_VERSION_ID:
				return getLibraryVersionId();
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
			case WorkspacePackage.REPORT__PROJECT:
				setProject((Project)newValue);
				return;
			case WorkspacePackage.REPORT__REPORT_ID:
				setReportId((String)newValue);
				return;
			case WorkspacePackage.REPORT__TITLE:
				setTitle((String)newValue);
				return;
			case WorkspacePackage.REPORT__ISSUED:
				setIssued((Instant)newValue);
				return;
			case WorkspacePackage.REPORT__ISSUED_BY:
				setIssuedBy((String)newValue);
				return;
			case WorkspacePackage.REPORT__CONTENT_SHA256:
				setContentSha256((String)newValue);
				return;
			case WorkspacePackage.REPORT__FILE_NAME:
				setFileName((String)newValue);
				return;
			case WorkspacePackage.REPORT__PAGE_COUNT:
				setPageCount((Integer)newValue);
				return;
			case WorkspacePackage.REPORT__METHOD_VERSION_ID:
				setMethodVersionId((String)newValue);
				return;
			case WorkspacePackage.REPORT__LIBRARY_VERSION_ID:
				setLibraryVersionId((String)newValue);
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
			case WorkspacePackage.REPORT__PROJECT:
				setProject((Project)null);
				return;
			case WorkspacePackage.REPORT__REPORT_ID:
				setReportId(REPORT_ID_EDEFAULT);
				return;
			case WorkspacePackage.REPORT__TITLE:
				setTitle(TITLE_EDEFAULT);
				return;
			case WorkspacePackage.REPORT__ISSUED:
				setIssued(ISSUED_EDEFAULT);
				return;
			case WorkspacePackage.REPORT__ISSUED_BY:
				setIssuedBy(ISSUED_BY_EDEFAULT);
				return;
			case WorkspacePackage.REPORT__CONTENT_SHA256:
				setContentSha256(CONTENT_SHA256_EDEFAULT);
				return;
			case WorkspacePackage.REPORT__FILE_NAME:
				setFileName(FILE_NAME_EDEFAULT);
				return;
			case WorkspacePackage.REPORT__PAGE_COUNT:
				unsetPageCount();
				return;
			case WorkspacePackage.REPORT__METHOD_VERSION_ID:
				setMethodVersionId(METHOD_VERSION_ID_EDEFAULT);
				return;
			case WorkspacePackage.REPORT__LIBRARY_VERSION_ID:
				setLibraryVersionId(LIBRARY_VERSION_ID_EDEFAULT);
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
			case WorkspacePackage.REPORT__PROJECT:
				return getProject() != null;
			case WorkspacePackage.REPORT__REPORT_ID:
				return REPORT_ID_EDEFAULT == null ? reportId != null : !REPORT_ID_EDEFAULT.equals(reportId);
			case WorkspacePackage.REPORT__TITLE:
				return TITLE_EDEFAULT == null ? title != null : !TITLE_EDEFAULT.equals(title);
			case WorkspacePackage.REPORT__ISSUED:
				return ISSUED_EDEFAULT == null ? issued != null : !ISSUED_EDEFAULT.equals(issued);
			case WorkspacePackage.REPORT__ISSUED_BY:
				return ISSUED_BY_EDEFAULT == null ? issuedBy != null : !ISSUED_BY_EDEFAULT.equals(issuedBy);
			case WorkspacePackage.REPORT__CONTENT_SHA256:
				return CONTENT_SHA256_EDEFAULT == null ? contentSha256 != null : !CONTENT_SHA256_EDEFAULT.equals(contentSha256);
			case WorkspacePackage.REPORT__FILE_NAME:
				return FILE_NAME_EDEFAULT == null ? fileName != null : !FILE_NAME_EDEFAULT.equals(fileName);
			case WorkspacePackage.REPORT__PAGE_COUNT:
				return isSetPageCount();
			case WorkspacePackage.REPORT__METHOD_VERSION_ID:
				return METHOD_VERSION_ID_EDEFAULT == null ? methodVersionId != null : !METHOD_VERSION_ID_EDEFAULT.equals(methodVersionId);
			case WorkspacePackage.REPORT__LIBRARY_VERSION_ID:
				return LIBRARY_VERSION_ID_EDEFAULT == null ? libraryVersionId != null : !LIBRARY_VERSION_ID_EDEFAULT.equals(libraryVersionId);
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
		result.append(" (reportId: ");
		result.append(reportId);
		result.append(", title: ");
		result.append(title);
		result.append(", issued: ");
		result.append(issued);
		result.append(", issuedBy: ");
		result.append(issuedBy);
		result.append(", contentSha256: ");
		result.append(contentSha256);
		result.append(", fileName: ");
		result.append(fileName);
		result.append(", pageCount: ");
		if (pageCountESet) result.append(pageCount); else result.append("<unset>");
		result.append(", methodVersionId: ");
		result.append(methodVersionId);
		result.append(", libraryVersionId: ");
		result.append(libraryVersionId);
		result.append(')');
		return result.toString();
	}

} //ReportImpl
