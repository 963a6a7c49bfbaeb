/**
 */
package org.tracegas.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracegas.model.ProcessedSpectrum;
import org.tracegas.model.SpectralContent;
import org.tracegas.model.WorkspacePackage;

import org.tracegas.spectrum.Spectrum;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Processed Spectrum</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.impl.ProcessedSpectrumImpl#getMeasurementId <em>Measurement Id</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ProcessedSpectrumImpl#getContent <em>Content</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ProcessedSpectrumImpl#getSampleEncoding <em>Sample Encoding</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ProcessedSpectrumImpl#getSha256 <em>Sha256</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ProcessedSpectrumImpl#getRecipeSha256 <em>Recipe Sha256</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ProcessedSpectrumImpl#getSpectrum <em>Spectrum</em>}</li>
 * </ul>
 *
 * @generated
 */
public class ProcessedSpectrumImpl extends StoredObjectImpl implements ProcessedSpectrum {
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
	 * The default value of the '{@link #getSampleEncoding() <em>Sample Encoding</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSampleEncoding()
	 * @generated
	 * @ordered
	 */
	protected static final String SAMPLE_ENCODING_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getSampleEncoding() <em>Sample Encoding</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSampleEncoding()
	 * @generated
	 * @ordered
	 */
	protected String sampleEncoding = SAMPLE_ENCODING_EDEFAULT;

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
	 * The default value of the '{@link #getRecipeSha256() <em>Recipe Sha256</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRecipeSha256()
	 * @generated
	 * @ordered
	 */
	protected static final String RECIPE_SHA256_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getRecipeSha256() <em>Recipe Sha256</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRecipeSha256()
	 * @generated
	 * @ordered
	 */
	protected String recipeSha256 = RECIPE_SHA256_EDEFAULT;

	/**
	 * The default value of the '{@link #getSpectrum() <em>Spectrum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSpectrum()
	 * @generated
	 * @ordered
	 */
	protected static final Spectrum SPECTRUM_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getSpectrum() <em>Spectrum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSpectrum()
	 * @generated
	 * @ordered
	 */
	protected Spectrum spectrum = SPECTRUM_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected ProcessedSpectrumImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return WorkspacePackage.Literals.PROCESSED_SPECTRUM;
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
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.PROCESSED_SPECTRUM__MEASUREMENT_ID, oldMeasurementId, measurementId));
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
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.PROCESSED_SPECTRUM__CONTENT, oldContent, content));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getSampleEncoding() {
		return sampleEncoding;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSampleEncoding(String newSampleEncoding) {
		String oldSampleEncoding = sampleEncoding;
		sampleEncoding = newSampleEncoding;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.PROCESSED_SPECTRUM__SAMPLE_ENCODING, oldSampleEncoding, sampleEncoding));
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
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.PROCESSED_SPECTRUM__SHA256, oldSha256, sha256));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getRecipeSha256() {
		return recipeSha256;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setRecipeSha256(String newRecipeSha256) {
		String oldRecipeSha256 = recipeSha256;
		recipeSha256 = newRecipeSha256;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.PROCESSED_SPECTRUM__RECIPE_SHA256, oldRecipeSha256, recipeSha256));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Spectrum getSpectrum() {
		return spectrum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSpectrum(Spectrum newSpectrum) {
		Spectrum oldSpectrum = spectrum;
		spectrum = newSpectrum;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.PROCESSED_SPECTRUM__SPECTRUM, oldSpectrum, spectrum));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case WorkspacePackage.PROCESSED_SPECTRUM__MEASUREMENT_ID:
				return getMeasurementId();
			case WorkspacePackage.PROCESSED_SPECTRUM__CONTENT:
				return getContent();
			case WorkspacePackage.PROCESSED_SPECTRUM__SAMPLE_ENCODING:
				return getSampleEncoding();
			case WorkspacePackage.PROCESSED_SPECTRUM__SHA256:
				return getSha256();
			case WorkspacePackage.PROCESSED_SPECTRUM__RECIPE_SHA256:
				return getRecipeSha256();
			case WorkspacePackage.PROCESSED_SPECTRUM__SPECTRUM:
				return getSpectrum();
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
			case WorkspacePackage.PROCESSED_SPECTRUM__MEASUREMENT_ID:
				setMeasurementId((String)newValue);
				return;
			case WorkspacePackage.PROCESSED_SPECTRUM__CONTENT:
				setContent((SpectralContent)newValue);
				return;
			case WorkspacePackage.PROCESSED_SPECTRUM__SAMPLE_ENCODING:
				setSampleEncoding((String)newValue);
				return;
			case WorkspacePackage.PROCESSED_SPECTRUM__SHA256:
				setSha256((String)newValue);
				return;
			case WorkspacePackage.PROCESSED_SPECTRUM__RECIPE_SHA256:
				setRecipeSha256((String)newValue);
				return;
			case WorkspacePackage.PROCESSED_SPECTRUM__SPECTRUM:
				setSpectrum((Spectrum)newValue);
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
			case WorkspacePackage.PROCESSED_SPECTRUM__MEASUREMENT_ID:
				setMeasurementId(MEASUREMENT_ID_EDEFAULT);
				return;
			case WorkspacePackage.PROCESSED_SPECTRUM__CONTENT:
				setContent(CONTENT_EDEFAULT);
				return;
			case WorkspacePackage.PROCESSED_SPECTRUM__SAMPLE_ENCODING:
				setSampleEncoding(SAMPLE_ENCODING_EDEFAULT);
				return;
			case WorkspacePackage.PROCESSED_SPECTRUM__SHA256:
				setSha256(SHA256_EDEFAULT);
				return;
			case WorkspacePackage.PROCESSED_SPECTRUM__RECIPE_SHA256:
				setRecipeSha256(RECIPE_SHA256_EDEFAULT);
				return;
			case WorkspacePackage.PROCESSED_SPECTRUM__SPECTRUM:
				setSpectrum(SPECTRUM_EDEFAULT);
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
			case WorkspacePackage.PROCESSED_SPECTRUM__MEASUREMENT_ID:
				return MEASUREMENT_ID_EDEFAULT == null ? measurementId != null : !MEASUREMENT_ID_EDEFAULT.equals(measurementId);
			case WorkspacePackage.PROCESSED_SPECTRUM__CONTENT:
				return content != CONTENT_EDEFAULT;
			case WorkspacePackage.PROCESSED_SPECTRUM__SAMPLE_ENCODING:
				return SAMPLE_ENCODING_EDEFAULT == null ? sampleEncoding != null : !SAMPLE_ENCODING_EDEFAULT.equals(sampleEncoding);
			case WorkspacePackage.PROCESSED_SPECTRUM__SHA256:
				return SHA256_EDEFAULT == null ? sha256 != null : !SHA256_EDEFAULT.equals(sha256);
			case WorkspacePackage.PROCESSED_SPECTRUM__RECIPE_SHA256:
				return RECIPE_SHA256_EDEFAULT == null ? recipeSha256 != null : !RECIPE_SHA256_EDEFAULT.equals(recipeSha256);
			case WorkspacePackage.PROCESSED_SPECTRUM__SPECTRUM:
				return SPECTRUM_EDEFAULT == null ? spectrum != null : !SPECTRUM_EDEFAULT.equals(spectrum);
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
		result.append(" (measurementId: ");
		result.append(measurementId);
		result.append(", content: ");
		result.append(content);
		result.append(", sampleEncoding: ");
		result.append(sampleEncoding);
		result.append(", sha256: ");
		result.append(sha256);
		result.append(", recipeSha256: ");
		result.append(recipeSha256);
		result.append(", spectrum: ");
		result.append(spectrum);
		result.append(')');
		return result.toString();
	}

} //ProcessedSpectrumImpl
