/**
 */
package org.tracegas.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

import org.tracegas.model.SpectralContent;
import org.tracegas.model.SpectralDataRef;
import org.tracegas.model.WorkspacePackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Spectral Data Ref</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.impl.SpectralDataRefImpl#getDataId <em>Data Id</em>}</li>
 *   <li>{@link org.tracegas.model.impl.SpectralDataRefImpl#getUri <em>Uri</em>}</li>
 *   <li>{@link org.tracegas.model.impl.SpectralDataRefImpl#getContent <em>Content</em>}</li>
 *   <li>{@link org.tracegas.model.impl.SpectralDataRefImpl#getPointCount <em>Point Count</em>}</li>
 *   <li>{@link org.tracegas.model.impl.SpectralDataRefImpl#getSha256 <em>Sha256</em>}</li>
 * </ul>
 *
 * @generated
 */
public class SpectralDataRefImpl extends MinimalEObjectImpl.Container implements SpectralDataRef {
	/**
	 * The default value of the '{@link #getDataId() <em>Data Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDataId()
	 * @generated
	 * @ordered
	 */
	protected static final String DATA_ID_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getDataId() <em>Data Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDataId()
	 * @generated
	 * @ordered
	 */
	protected String dataId = DATA_ID_EDEFAULT;

	/**
	 * The default value of the '{@link #getUri() <em>Uri</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUri()
	 * @generated
	 * @ordered
	 */
	protected static final String URI_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getUri() <em>Uri</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUri()
	 * @generated
	 * @ordered
	 */
	protected String uri = URI_EDEFAULT;

	/**
	 * The default value of the '{@link #getContent() <em>Content</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getContent()
	 * @generated
	 * @ordered
	 */
	protected static final SpectralContent CONTENT_EDEFAULT = SpectralContent.INTERFEROGRAM;

	/**
	 * The cached value of the '{@link #getContent() <em>Content</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getContent()
	 * @generated
	 * @ordered
	 */
	protected SpectralContent content = CONTENT_EDEFAULT;

	/**
	 * The default value of the '{@link #getPointCount() <em>Point Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPointCount()
	 * @generated
	 * @ordered
	 */
	protected static final int POINT_COUNT_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getPointCount() <em>Point Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPointCount()
	 * @generated
	 * @ordered
	 */
	protected int pointCount = POINT_COUNT_EDEFAULT;

	/**
	 * The default value of the '{@link #getSha256() <em>Sha256</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSha256()
	 * @generated
	 * @ordered
	 */
	protected static final String SHA256_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getSha256() <em>Sha256</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSha256()
	 * @generated
	 * @ordered
	 */
	protected String sha256 = SHA256_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected SpectralDataRefImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return WorkspacePackage.Literals.SPECTRAL_DATA_REF;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getDataId() {
		return dataId;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDataId(String newDataId) {
		String oldDataId = dataId;
		dataId = newDataId;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.SPECTRAL_DATA_REF__DATA_ID, oldDataId, dataId));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getUri() {
		return uri;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setUri(String newUri) {
		String oldUri = uri;
		uri = newUri;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.SPECTRAL_DATA_REF__URI, oldUri, uri));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public SpectralContent getContent() {
		return content;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setContent(SpectralContent newContent) {
		SpectralContent oldContent = content;
		content = newContent == null ? CONTENT_EDEFAULT : newContent;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.SPECTRAL_DATA_REF__CONTENT, oldContent, content));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getPointCount() {
		return pointCount;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPointCount(int newPointCount) {
		int oldPointCount = pointCount;
		pointCount = newPointCount;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.SPECTRAL_DATA_REF__POINT_COUNT, oldPointCount, pointCount));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getSha256() {
		return sha256;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSha256(String newSha256) {
		String oldSha256 = sha256;
		sha256 = newSha256;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.SPECTRAL_DATA_REF__SHA256, oldSha256, sha256));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case WorkspacePackage.SPECTRAL_DATA_REF__DATA_ID:
				return getDataId();
			case WorkspacePackage.SPECTRAL_DATA_REF__URI:
				return getUri();
			case WorkspacePackage.SPECTRAL_DATA_REF__CONTENT:
				return getContent();
			case WorkspacePackage.SPECTRAL_DATA_REF__POINT_COUNT:
				return getPointCount();
			case WorkspacePackage.SPECTRAL_DATA_REF__SHA256:
				return getSha256();
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
			case WorkspacePackage.SPECTRAL_DATA_REF__DATA_ID:
				setDataId((String)newValue);
				return;
			case WorkspacePackage.SPECTRAL_DATA_REF__URI:
				setUri((String)newValue);
				return;
			case WorkspacePackage.SPECTRAL_DATA_REF__CONTENT:
				setContent((SpectralContent)newValue);
				return;
			case WorkspacePackage.SPECTRAL_DATA_REF__POINT_COUNT:
				setPointCount((Integer)newValue);
				return;
			case WorkspacePackage.SPECTRAL_DATA_REF__SHA256:
				setSha256((String)newValue);
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
			case WorkspacePackage.SPECTRAL_DATA_REF__DATA_ID:
				setDataId(DATA_ID_EDEFAULT);
				return;
			case WorkspacePackage.SPECTRAL_DATA_REF__URI:
				setUri(URI_EDEFAULT);
				return;
			case WorkspacePackage.SPECTRAL_DATA_REF__CONTENT:
				setContent(CONTENT_EDEFAULT);
				return;
			case WorkspacePackage.SPECTRAL_DATA_REF__POINT_COUNT:
				setPointCount(POINT_COUNT_EDEFAULT);
				return;
			case WorkspacePackage.SPECTRAL_DATA_REF__SHA256:
				setSha256(SHA256_EDEFAULT);
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
			case WorkspacePackage.SPECTRAL_DATA_REF__DATA_ID:
				return DATA_ID_EDEFAULT == null ? dataId != null : !DATA_ID_EDEFAULT.equals(dataId);
			case WorkspacePackage.SPECTRAL_DATA_REF__URI:
				return URI_EDEFAULT == null ? uri != null : !URI_EDEFAULT.equals(uri);
			case WorkspacePackage.SPECTRAL_DATA_REF__CONTENT:
				return content != CONTENT_EDEFAULT;
			case WorkspacePackage.SPECTRAL_DATA_REF__POINT_COUNT:
				return pointCount != POINT_COUNT_EDEFAULT;
			case WorkspacePackage.SPECTRAL_DATA_REF__SHA256:
				return SHA256_EDEFAULT == null ? sha256 != null : !SHA256_EDEFAULT.equals(sha256);
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
		result.append(" (dataId: ");
		result.append(dataId);
		result.append(", uri: ");
		result.append(uri);
		result.append(", content: ");
		result.append(content);
		result.append(", pointCount: ");
		result.append(pointCount);
		result.append(", sha256: ");
		result.append(sha256);
		result.append(')');
		return result.toString();
	}

} //SpectralDataRefImpl
