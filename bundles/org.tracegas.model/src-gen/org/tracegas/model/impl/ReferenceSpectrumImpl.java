/**
 */
package org.tracegas.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

import org.tracegas.model.ReferenceOrigin;
import org.tracegas.model.ReferenceSpectrum;
import org.tracegas.model.WorkspacePackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Reference Spectrum</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.impl.ReferenceSpectrumImpl#getCompound <em>Compound</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReferenceSpectrumImpl#getCasNumber <em>Cas Number</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReferenceSpectrumImpl#getPpmMetres <em>Ppm Metres</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReferenceSpectrumImpl#getTemperature <em>Temperature</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReferenceSpectrumImpl#getPressure <em>Pressure</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReferenceSpectrumImpl#getResolution <em>Resolution</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReferenceSpectrumImpl#getApodization <em>Apodization</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReferenceSpectrumImpl#getOrigin <em>Origin</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReferenceSpectrumImpl#getOriginText <em>Origin Text</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReferenceSpectrumImpl#getContentSha256 <em>Content Sha256</em>}</li>
 * </ul>
 *
 * @generated
 */
public class ReferenceSpectrumImpl extends MinimalEObjectImpl.Container implements ReferenceSpectrum {
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
	 * The default value of the '{@link #getCasNumber() <em>Cas Number</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCasNumber()
	 * @generated
	 * @ordered
	 */
	protected static final String CAS_NUMBER_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getCasNumber() <em>Cas Number</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCasNumber()
	 * @generated
	 * @ordered
	 */
	protected String casNumber = CAS_NUMBER_EDEFAULT;

	/**
	 * The default value of the '{@link #getPpmMetres() <em>Ppm Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPpmMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double PPM_METRES_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getPpmMetres() <em>Ppm Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPpmMetres()
	 * @generated
	 * @ordered
	 */
	protected double ppmMetres = PPM_METRES_EDEFAULT;

	/**
	 * The default value of the '{@link #getTemperature() <em>Temperature</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTemperature()
	 * @generated
	 * @ordered
	 */
	protected static final double TEMPERATURE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getTemperature() <em>Temperature</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTemperature()
	 * @generated
	 * @ordered
	 */
	protected double temperature = TEMPERATURE_EDEFAULT;

	/**
	 * The default value of the '{@link #getPressure() <em>Pressure</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPressure()
	 * @generated
	 * @ordered
	 */
	protected static final double PRESSURE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getPressure() <em>Pressure</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPressure()
	 * @generated
	 * @ordered
	 */
	protected double pressure = PRESSURE_EDEFAULT;

	/**
	 * The default value of the '{@link #getResolution() <em>Resolution</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getResolution()
	 * @generated
	 * @ordered
	 */
	protected static final double RESOLUTION_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getResolution() <em>Resolution</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getResolution()
	 * @generated
	 * @ordered
	 */
	protected double resolution = RESOLUTION_EDEFAULT;

	/**
	 * The default value of the '{@link #getApodization() <em>Apodization</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getApodization()
	 * @generated
	 * @ordered
	 */
	protected static final String APODIZATION_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getApodization() <em>Apodization</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getApodization()
	 * @generated
	 * @ordered
	 */
	protected String apodization = APODIZATION_EDEFAULT;

	/**
	 * The default value of the '{@link #getOrigin() <em>Origin</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOrigin()
	 * @generated
	 * @ordered
	 */
	protected static final ReferenceOrigin ORIGIN_EDEFAULT = ReferenceOrigin.MEASURED;

	/**
	 * The cached value of the '{@link #getOrigin() <em>Origin</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOrigin()
	 * @generated
	 * @ordered
	 */
	protected ReferenceOrigin origin = ORIGIN_EDEFAULT;

	/**
	 * The default value of the '{@link #getOriginText() <em>Origin Text</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOriginText()
	 * @generated
	 * @ordered
	 */
	protected static final String ORIGIN_TEXT_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getOriginText() <em>Origin Text</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOriginText()
	 * @generated
	 * @ordered
	 */
	protected String originText = ORIGIN_TEXT_EDEFAULT;

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
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected ReferenceSpectrumImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return WorkspacePackage.Literals.REFERENCE_SPECTRUM;
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
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REFERENCE_SPECTRUM__COMPOUND, oldCompound, compound));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getCasNumber() {
		return casNumber;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCasNumber(String newCasNumber) {
		String oldCasNumber = casNumber;
		casNumber = newCasNumber;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REFERENCE_SPECTRUM__CAS_NUMBER, oldCasNumber, casNumber));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getPpmMetres() {
		return ppmMetres;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPpmMetres(double newPpmMetres) {
		double oldPpmMetres = ppmMetres;
		ppmMetres = newPpmMetres;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REFERENCE_SPECTRUM__PPM_METRES, oldPpmMetres, ppmMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getTemperature() {
		return temperature;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTemperature(double newTemperature) {
		double oldTemperature = temperature;
		temperature = newTemperature;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REFERENCE_SPECTRUM__TEMPERATURE, oldTemperature, temperature));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getPressure() {
		return pressure;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPressure(double newPressure) {
		double oldPressure = pressure;
		pressure = newPressure;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REFERENCE_SPECTRUM__PRESSURE, oldPressure, pressure));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getResolution() {
		return resolution;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setResolution(double newResolution) {
		double oldResolution = resolution;
		resolution = newResolution;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REFERENCE_SPECTRUM__RESOLUTION, oldResolution, resolution));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getApodization() {
		return apodization;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setApodization(String newApodization) {
		String oldApodization = apodization;
		apodization = newApodization;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REFERENCE_SPECTRUM__APODIZATION, oldApodization, apodization));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ReferenceOrigin getOrigin() {
		return origin;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setOrigin(ReferenceOrigin newOrigin) {
		ReferenceOrigin oldOrigin = origin;
		origin = newOrigin == null ? ORIGIN_EDEFAULT : newOrigin;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REFERENCE_SPECTRUM__ORIGIN, oldOrigin, origin));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getOriginText() {
		return originText;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setOriginText(String newOriginText) {
		String oldOriginText = originText;
		originText = newOriginText;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REFERENCE_SPECTRUM__ORIGIN_TEXT, oldOriginText, originText));
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
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REFERENCE_SPECTRUM__CONTENT_SHA256, oldContentSha256, contentSha256));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case WorkspacePackage.REFERENCE_SPECTRUM__COMPOUND:
				return getCompound();
			case WorkspacePackage.REFERENCE_SPECTRUM__CAS_NUMBER:
				return getCasNumber();
			case WorkspacePackage.REFERENCE_SPECTRUM__PPM_METRES:
				return getPpmMetres();
			case WorkspacePackage.REFERENCE_SPECTRUM__TEMPERATURE:
				return getTemperature();
			case WorkspacePackage.REFERENCE_SPECTRUM__PRESSURE:
				return getPressure();
			case WorkspacePackage.REFERENCE_SPECTRUM__RESOLUTION:
				return getResolution();
			case WorkspacePackage.REFERENCE_SPECTRUM__APODIZATION:
				return getApodization();
			case WorkspacePackage.REFERENCE_SPECTRUM__ORIGIN:
				return getOrigin();
			case WorkspacePackage.REFERENCE_SPECTRUM__ORIGIN_TEXT:
				return getOriginText();
			case WorkspacePackage.REFERENCE_SPECTRUM__CONTENT_SHA256:
				return getContentSha256();
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
			case WorkspacePackage.REFERENCE_SPECTRUM__COMPOUND:
				setCompound((String)newValue);
				return;
			case WorkspacePackage.REFERENCE_SPECTRUM__CAS_NUMBER:
				setCasNumber((String)newValue);
				return;
			case WorkspacePackage.REFERENCE_SPECTRUM__PPM_METRES:
				setPpmMetres((Double)newValue);
				return;
			case WorkspacePackage.REFERENCE_SPECTRUM__TEMPERATURE:
				setTemperature((Double)newValue);
				return;
			case WorkspacePackage.REFERENCE_SPECTRUM__PRESSURE:
				setPressure((Double)newValue);
				return;
			case WorkspacePackage.REFERENCE_SPECTRUM__RESOLUTION:
				setResolution((Double)newValue);
				return;
			case WorkspacePackage.REFERENCE_SPECTRUM__APODIZATION:
				setApodization((String)newValue);
				return;
			case WorkspacePackage.REFERENCE_SPECTRUM__ORIGIN:
				setOrigin((ReferenceOrigin)newValue);
				return;
			case WorkspacePackage.REFERENCE_SPECTRUM__ORIGIN_TEXT:
				setOriginText((String)newValue);
				return;
			case WorkspacePackage.REFERENCE_SPECTRUM__CONTENT_SHA256:
				setContentSha256((String)newValue);
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
			case WorkspacePackage.REFERENCE_SPECTRUM__COMPOUND:
				setCompound(COMPOUND_EDEFAULT);
				return;
			case WorkspacePackage.REFERENCE_SPECTRUM__CAS_NUMBER:
				setCasNumber(CAS_NUMBER_EDEFAULT);
				return;
			case WorkspacePackage.REFERENCE_SPECTRUM__PPM_METRES:
				setPpmMetres(PPM_METRES_EDEFAULT);
				return;
			case WorkspacePackage.REFERENCE_SPECTRUM__TEMPERATURE:
				setTemperature(TEMPERATURE_EDEFAULT);
				return;
			case WorkspacePackage.REFERENCE_SPECTRUM__PRESSURE:
				setPressure(PRESSURE_EDEFAULT);
				return;
			case WorkspacePackage.REFERENCE_SPECTRUM__RESOLUTION:
				setResolution(RESOLUTION_EDEFAULT);
				return;
			case WorkspacePackage.REFERENCE_SPECTRUM__APODIZATION:
				setApodization(APODIZATION_EDEFAULT);
				return;
			case WorkspacePackage.REFERENCE_SPECTRUM__ORIGIN:
				setOrigin(ORIGIN_EDEFAULT);
				return;
			case WorkspacePackage.REFERENCE_SPECTRUM__ORIGIN_TEXT:
				setOriginText(ORIGIN_TEXT_EDEFAULT);
				return;
			case WorkspacePackage.REFERENCE_SPECTRUM__CONTENT_SHA256:
				setContentSha256(CONTENT_SHA256_EDEFAULT);
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
			case WorkspacePackage.REFERENCE_SPECTRUM__COMPOUND:
				return COMPOUND_EDEFAULT == null ? compound != null : !COMPOUND_EDEFAULT.equals(compound);
			case WorkspacePackage.REFERENCE_SPECTRUM__CAS_NUMBER:
				return CAS_NUMBER_EDEFAULT == null ? casNumber != null : !CAS_NUMBER_EDEFAULT.equals(casNumber);
			case WorkspacePackage.REFERENCE_SPECTRUM__PPM_METRES:
				return ppmMetres != PPM_METRES_EDEFAULT;
			case WorkspacePackage.REFERENCE_SPECTRUM__TEMPERATURE:
				return temperature != TEMPERATURE_EDEFAULT;
			case WorkspacePackage.REFERENCE_SPECTRUM__PRESSURE:
				return pressure != PRESSURE_EDEFAULT;
			case WorkspacePackage.REFERENCE_SPECTRUM__RESOLUTION:
				return resolution != RESOLUTION_EDEFAULT;
			case WorkspacePackage.REFERENCE_SPECTRUM__APODIZATION:
				return APODIZATION_EDEFAULT == null ? apodization != null : !APODIZATION_EDEFAULT.equals(apodization);
			case WorkspacePackage.REFERENCE_SPECTRUM__ORIGIN:
				return origin != ORIGIN_EDEFAULT;
			case WorkspacePackage.REFERENCE_SPECTRUM__ORIGIN_TEXT:
				return ORIGIN_TEXT_EDEFAULT == null ? originText != null : !ORIGIN_TEXT_EDEFAULT.equals(originText);
			case WorkspacePackage.REFERENCE_SPECTRUM__CONTENT_SHA256:
				return CONTENT_SHA256_EDEFAULT == null ? contentSha256 != null : !CONTENT_SHA256_EDEFAULT.equals(contentSha256);
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
		result.append(" (compound: ");
		result.append(compound);
		result.append(", casNumber: ");
		result.append(casNumber);
		result.append(", ppmMetres: ");
		result.append(ppmMetres);
		result.append(", temperature: ");
		result.append(temperature);
		result.append(", pressure: ");
		result.append(pressure);
		result.append(", resolution: ");
		result.append(resolution);
		result.append(", apodization: ");
		result.append(apodization);
		result.append(", origin: ");
		result.append(origin);
		result.append(", originText: ");
		result.append(originText);
		result.append(", contentSha256: ");
		result.append(contentSha256);
		result.append(')');
		return result.toString();
	}

} //ReferenceSpectrumImpl
