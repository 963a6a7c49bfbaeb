/**
 */
package org.tracegas.model.impl;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.NotificationChain;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

import org.tracegas.model.ReferenceSpectrum;
import org.tracegas.model.SpectralDataRef;
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
 *   <li>{@link org.tracegas.model.impl.ReferenceSpectrumImpl#getConcentrationPathLength <em>Concentration Path Length</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReferenceSpectrumImpl#getTemperature <em>Temperature</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReferenceSpectrumImpl#getPressure <em>Pressure</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReferenceSpectrumImpl#getResolution <em>Resolution</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReferenceSpectrumImpl#getApodization <em>Apodization</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ReferenceSpectrumImpl#getData <em>Data</em>}</li>
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
	 * The default value of the '{@link #getConcentrationPathLength() <em>Concentration Path Length</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getConcentrationPathLength()
	 * @generated
	 * @ordered
	 */
	protected static final double CONCENTRATION_PATH_LENGTH_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getConcentrationPathLength() <em>Concentration Path Length</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getConcentrationPathLength()
	 * @generated
	 * @ordered
	 */
	protected double concentrationPathLength = CONCENTRATION_PATH_LENGTH_EDEFAULT;

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
	 * The cached value of the '{@link #getData() <em>Data</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getData()
	 * @generated
	 * @ordered
	 */
	protected SpectralDataRef data;

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
	public double getConcentrationPathLength() {
		return concentrationPathLength;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setConcentrationPathLength(double newConcentrationPathLength) {
		double oldConcentrationPathLength = concentrationPathLength;
		concentrationPathLength = newConcentrationPathLength;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REFERENCE_SPECTRUM__CONCENTRATION_PATH_LENGTH, oldConcentrationPathLength, concentrationPathLength));
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
	public SpectralDataRef getData() {
		return data;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetData(SpectralDataRef newData, NotificationChain msgs) {
		SpectralDataRef oldData = data;
		data = newData;
		if (eNotificationRequired()) {
			ENotificationImpl notification = new ENotificationImpl(this, Notification.SET, WorkspacePackage.REFERENCE_SPECTRUM__DATA, oldData, newData);
			if (msgs == null) msgs = notification; else msgs.add(notification);
		}
		return msgs;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setData(SpectralDataRef newData) {
		if (newData != data) {
			NotificationChain msgs = null;
			if (data != null)
				msgs = ((InternalEObject)data).eInverseRemove(this, EOPPOSITE_FEATURE_BASE - WorkspacePackage.REFERENCE_SPECTRUM__DATA, null, msgs);
			if (newData != null)
				msgs = ((InternalEObject)newData).eInverseAdd(this, EOPPOSITE_FEATURE_BASE - WorkspacePackage.REFERENCE_SPECTRUM__DATA, null, msgs);
			msgs = basicSetData(newData, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.REFERENCE_SPECTRUM__DATA, newData, newData));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case WorkspacePackage.REFERENCE_SPECTRUM__DATA:
				return basicSetData(null, msgs);
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
			case WorkspacePackage.REFERENCE_SPECTRUM__COMPOUND:
				return getCompound();
			case WorkspacePackage.REFERENCE_SPECTRUM__CAS_NUMBER:
				return getCasNumber();
			case WorkspacePackage.REFERENCE_SPECTRUM__CONCENTRATION_PATH_LENGTH:
				return getConcentrationPathLength();
			case WorkspacePackage.REFERENCE_SPECTRUM__TEMPERATURE:
				return getTemperature();
			case WorkspacePackage.REFERENCE_SPECTRUM__PRESSURE:
				return getPressure();
			case WorkspacePackage.REFERENCE_SPECTRUM__RESOLUTION:
				return getResolution();
			case WorkspacePackage.REFERENCE_SPECTRUM__APODIZATION:
				return getApodization();
			case WorkspacePackage.REFERENCE_SPECTRUM__DATA:
				return getData();
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
			case WorkspacePackage.REFERENCE_SPECTRUM__CONCENTRATION_PATH_LENGTH:
				setConcentrationPathLength((Double)newValue);
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
			case WorkspacePackage.REFERENCE_SPECTRUM__DATA:
				setData((SpectralDataRef)newValue);
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
			case WorkspacePackage.REFERENCE_SPECTRUM__CONCENTRATION_PATH_LENGTH:
				setConcentrationPathLength(CONCENTRATION_PATH_LENGTH_EDEFAULT);
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
			case WorkspacePackage.REFERENCE_SPECTRUM__DATA:
				setData((SpectralDataRef)null);
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
			case WorkspacePackage.REFERENCE_SPECTRUM__CONCENTRATION_PATH_LENGTH:
				return concentrationPathLength != CONCENTRATION_PATH_LENGTH_EDEFAULT;
			case WorkspacePackage.REFERENCE_SPECTRUM__TEMPERATURE:
				return temperature != TEMPERATURE_EDEFAULT;
			case WorkspacePackage.REFERENCE_SPECTRUM__PRESSURE:
				return pressure != PRESSURE_EDEFAULT;
			case WorkspacePackage.REFERENCE_SPECTRUM__RESOLUTION:
				return resolution != RESOLUTION_EDEFAULT;
			case WorkspacePackage.REFERENCE_SPECTRUM__APODIZATION:
				return APODIZATION_EDEFAULT == null ? apodization != null : !APODIZATION_EDEFAULT.equals(apodization);
			case WorkspacePackage.REFERENCE_SPECTRUM__DATA:
				return data != null;
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
		result.append(", concentrationPathLength: ");
		result.append(concentrationPathLength);
		result.append(", temperature: ");
		result.append(temperature);
		result.append(", pressure: ");
		result.append(pressure);
		result.append(", resolution: ");
		result.append(resolution);
		result.append(", apodization: ");
		result.append(apodization);
		result.append(')');
		return result.toString();
	}

} //ReferenceSpectrumImpl
