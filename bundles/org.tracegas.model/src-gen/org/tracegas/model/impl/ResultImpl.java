/**
 */
package org.tracegas.model.impl;

import java.util.Collection;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.eclipse.emf.ecore.util.EDataTypeUniqueEList;

import org.tracegas.model.LibraryVersion;
import org.tracegas.model.Measurement;
import org.tracegas.model.MethodVersion;
import org.tracegas.model.Result;
import org.tracegas.model.ResultFlag;
import org.tracegas.model.WorkspacePackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Result</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getMeasurement <em>Measurement</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getCompound <em>Compound</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getConcentration <em>Concentration</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getUncertainty <em>Uncertainty</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getDetectionLimit <em>Detection Limit</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getUnit <em>Unit</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getFlags <em>Flags</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getMethodVersion <em>Method Version</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getLibraryVersion <em>Library Version</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getSoftwareVersion <em>Software Version</em>}</li>
 *   <li>{@link org.tracegas.model.impl.ResultImpl#getInputHash <em>Input Hash</em>}</li>
 * </ul>
 *
 * @generated
 */
public class ResultImpl extends StoredObjectImpl implements Result {
	/**
	 * The cached value of the '{@link #getMeasurement() <em>Measurement</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMeasurement()
	 * @generated
	 * @ordered
	 */
	protected Measurement measurement;

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
	 * The default value of the '{@link #getConcentration() <em>Concentration</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getConcentration()
	 * @generated
	 * @ordered
	 */
	protected static final double CONCENTRATION_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getConcentration() <em>Concentration</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getConcentration()
	 * @generated
	 * @ordered
	 */
	protected double concentration = CONCENTRATION_EDEFAULT;

	/**
	 * The default value of the '{@link #getUncertainty() <em>Uncertainty</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUncertainty()
	 * @generated
	 * @ordered
	 */
	protected static final double UNCERTAINTY_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getUncertainty() <em>Uncertainty</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUncertainty()
	 * @generated
	 * @ordered
	 */
	protected double uncertainty = UNCERTAINTY_EDEFAULT;

	/**
	 * The default value of the '{@link #getDetectionLimit() <em>Detection Limit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDetectionLimit()
	 * @generated
	 * @ordered
	 */
	protected static final double DETECTION_LIMIT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getDetectionLimit() <em>Detection Limit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDetectionLimit()
	 * @generated
	 * @ordered
	 */
	protected double detectionLimit = DETECTION_LIMIT_EDEFAULT;

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
	 * The cached value of the '{@link #getFlags() <em>Flags</em>}' attribute list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFlags()
	 * @generated
	 * @ordered
	 */
	protected EList<ResultFlag> flags;

	/**
	 * The cached value of the '{@link #getMethodVersion() <em>Method Version</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMethodVersion()
	 * @generated
	 * @ordered
	 */
	protected MethodVersion methodVersion;

	/**
	 * The cached value of the '{@link #getLibraryVersion() <em>Library Version</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLibraryVersion()
	 * @generated
	 * @ordered
	 */
	protected LibraryVersion libraryVersion;

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
	 * The default value of the '{@link #getInputHash() <em>Input Hash</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getInputHash()
	 * @generated
	 * @ordered
	 */
	protected static final String INPUT_HASH_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getInputHash() <em>Input Hash</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getInputHash()
	 * @generated
	 * @ordered
	 */
	protected String inputHash = INPUT_HASH_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected ResultImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return WorkspacePackage.Literals.RESULT;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Measurement getMeasurement() {
		if (measurement != null && measurement.eIsProxy()) {
			InternalEObject oldMeasurement = (InternalEObject)measurement;
			measurement = (Measurement)eResolveProxy(oldMeasurement);
			if (measurement != oldMeasurement) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, WorkspacePackage.RESULT__MEASUREMENT, oldMeasurement, measurement));
			}
		}
		return measurement;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public Measurement basicGetMeasurement() {
		return measurement;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMeasurement(Measurement newMeasurement) {
		Measurement oldMeasurement = measurement;
		measurement = newMeasurement;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.RESULT__MEASUREMENT, oldMeasurement, measurement));
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
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.RESULT__COMPOUND, oldCompound, compound));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getConcentration() {
		return concentration;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setConcentration(double newConcentration) {
		double oldConcentration = concentration;
		concentration = newConcentration;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.RESULT__CONCENTRATION, oldConcentration, concentration));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getUncertainty() {
		return uncertainty;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setUncertainty(double newUncertainty) {
		double oldUncertainty = uncertainty;
		uncertainty = newUncertainty;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.RESULT__UNCERTAINTY, oldUncertainty, uncertainty));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getDetectionLimit() {
		return detectionLimit;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDetectionLimit(double newDetectionLimit) {
		double oldDetectionLimit = detectionLimit;
		detectionLimit = newDetectionLimit;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.RESULT__DETECTION_LIMIT, oldDetectionLimit, detectionLimit));
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
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.RESULT__UNIT, oldUnit, unit));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<ResultFlag> getFlags() {
		if (flags == null) {
			flags = new EDataTypeUniqueEList<ResultFlag>(ResultFlag.class, this, WorkspacePackage.RESULT__FLAGS);
		}
		return flags;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public MethodVersion getMethodVersion() {
		if (methodVersion != null && methodVersion.eIsProxy()) {
			InternalEObject oldMethodVersion = (InternalEObject)methodVersion;
			methodVersion = (MethodVersion)eResolveProxy(oldMethodVersion);
			if (methodVersion != oldMethodVersion) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, WorkspacePackage.RESULT__METHOD_VERSION, oldMethodVersion, methodVersion));
			}
		}
		return methodVersion;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public MethodVersion basicGetMethodVersion() {
		return methodVersion;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMethodVersion(MethodVersion newMethodVersion) {
		MethodVersion oldMethodVersion = methodVersion;
		methodVersion = newMethodVersion;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.RESULT__METHOD_VERSION, oldMethodVersion, methodVersion));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public LibraryVersion getLibraryVersion() {
		if (libraryVersion != null && libraryVersion.eIsProxy()) {
			InternalEObject oldLibraryVersion = (InternalEObject)libraryVersion;
			libraryVersion = (LibraryVersion)eResolveProxy(oldLibraryVersion);
			if (libraryVersion != oldLibraryVersion) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, WorkspacePackage.RESULT__LIBRARY_VERSION, oldLibraryVersion, libraryVersion));
			}
		}
		return libraryVersion;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public LibraryVersion basicGetLibraryVersion() {
		return libraryVersion;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLibraryVersion(LibraryVersion newLibraryVersion) {
		LibraryVersion oldLibraryVersion = libraryVersion;
		libraryVersion = newLibraryVersion;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.RESULT__LIBRARY_VERSION, oldLibraryVersion, libraryVersion));
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
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.RESULT__SOFTWARE_VERSION, oldSoftwareVersion, softwareVersion));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getInputHash() {
		return inputHash;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setInputHash(String newInputHash) {
		String oldInputHash = inputHash;
		inputHash = newInputHash;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.RESULT__INPUT_HASH, oldInputHash, inputHash));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case WorkspacePackage.RESULT__MEASUREMENT:
				if (resolve) return getMeasurement();
				return basicGetMeasurement();
			case WorkspacePackage.RESULT__COMPOUND:
				return getCompound();
			case WorkspacePackage.RESULT__CONCENTRATION:
				return getConcentration();
			case WorkspacePackage.RESULT__UNCERTAINTY:
				return getUncertainty();
			case WorkspacePackage.RESULT__DETECTION_LIMIT:
				return getDetectionLimit();
			case WorkspacePackage.RESULT__UNIT:
				return getUnit();
			case WorkspacePackage.RESULT__FLAGS:
				return getFlags();
			case WorkspacePackage.RESULT__METHOD_VERSION:
				if (resolve) return getMethodVersion();
				return basicGetMethodVersion();
			case WorkspacePackage.RESULT__LIBRARY_VERSION:
				if (resolve) return getLibraryVersion();
				return basicGetLibraryVersion();
			case WorkspacePackage.RESULT__SOFTWARE_VERSION:
				return getSoftwareVersion();
			case WorkspacePackage.RESULT__INPUT_HASH:
				return getInputHash();
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
			case WorkspacePackage.RESULT__MEASUREMENT:
				setMeasurement((Measurement)newValue);
				return;
			case WorkspacePackage.RESULT__COMPOUND:
				setCompound((String)newValue);
				return;
			case WorkspacePackage.RESULT__CONCENTRATION:
				setConcentration((Double)newValue);
				return;
			case WorkspacePackage.RESULT__UNCERTAINTY:
				setUncertainty((Double)newValue);
				return;
			case WorkspacePackage.RESULT__DETECTION_LIMIT:
				setDetectionLimit((Double)newValue);
				return;
			case WorkspacePackage.RESULT__UNIT:
				setUnit((String)newValue);
				return;
			case WorkspacePackage.RESULT__FLAGS:
				getFlags().clear();
				getFlags().addAll((Collection<? extends ResultFlag>)newValue);
				return;
			case WorkspacePackage.RESULT__METHOD_VERSION:
				setMethodVersion((MethodVersion)newValue);
				return;
			case WorkspacePackage.RESULT__LIBRARY_VERSION:
				setLibraryVersion((LibraryVersion)newValue);
				return;
			case WorkspacePackage.RESULT__SOFTWARE_VERSION:
				setSoftwareVersion((String)newValue);
				return;
			case WorkspacePackage.RESULT__INPUT_HASH:
				setInputHash((String)newValue);
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
			case WorkspacePackage.RESULT__MEASUREMENT:
				setMeasurement((Measurement)null);
				return;
			case WorkspacePackage.RESULT__COMPOUND:
				setCompound(COMPOUND_EDEFAULT);
				return;
			case WorkspacePackage.RESULT__CONCENTRATION:
				setConcentration(CONCENTRATION_EDEFAULT);
				return;
			case WorkspacePackage.RESULT__UNCERTAINTY:
				setUncertainty(UNCERTAINTY_EDEFAULT);
				return;
			case WorkspacePackage.RESULT__DETECTION_LIMIT:
				setDetectionLimit(DETECTION_LIMIT_EDEFAULT);
				return;
			case WorkspacePackage.RESULT__UNIT:
				setUnit(UNIT_EDEFAULT);
				return;
			case WorkspacePackage.RESULT__FLAGS:
				getFlags().clear();
				return;
			case WorkspacePackage.RESULT__METHOD_VERSION:
				setMethodVersion((MethodVersion)null);
				return;
			case WorkspacePackage.RESULT__LIBRARY_VERSION:
				setLibraryVersion((LibraryVersion)null);
				return;
			case WorkspacePackage.RESULT__SOFTWARE_VERSION:
				setSoftwareVersion(SOFTWARE_VERSION_EDEFAULT);
				return;
			case WorkspacePackage.RESULT__INPUT_HASH:
				setInputHash(INPUT_HASH_EDEFAULT);
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
			case WorkspacePackage.RESULT__MEASUREMENT:
				return measurement != null;
			case WorkspacePackage.RESULT__COMPOUND:
				return COMPOUND_EDEFAULT == null ? compound != null : !COMPOUND_EDEFAULT.equals(compound);
			case WorkspacePackage.RESULT__CONCENTRATION:
				return concentration != CONCENTRATION_EDEFAULT;
			case WorkspacePackage.RESULT__UNCERTAINTY:
				return uncertainty != UNCERTAINTY_EDEFAULT;
			case WorkspacePackage.RESULT__DETECTION_LIMIT:
				return detectionLimit != DETECTION_LIMIT_EDEFAULT;
			case WorkspacePackage.RESULT__UNIT:
				return UNIT_EDEFAULT == null ? unit != null : !UNIT_EDEFAULT.equals(unit);
			case WorkspacePackage.RESULT__FLAGS:
				return flags != null && !flags.isEmpty();
			case WorkspacePackage.RESULT__METHOD_VERSION:
				return methodVersion != null;
			case WorkspacePackage.RESULT__LIBRARY_VERSION:
				return libraryVersion != null;
			case WorkspacePackage.RESULT__SOFTWARE_VERSION:
				return SOFTWARE_VERSION_EDEFAULT == null ? softwareVersion != null : !SOFTWARE_VERSION_EDEFAULT.equals(softwareVersion);
			case WorkspacePackage.RESULT__INPUT_HASH:
				return INPUT_HASH_EDEFAULT == null ? inputHash != null : !INPUT_HASH_EDEFAULT.equals(inputHash);
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
		result.append(", concentration: ");
		result.append(concentration);
		result.append(", uncertainty: ");
		result.append(uncertainty);
		result.append(", detectionLimit: ");
		result.append(detectionLimit);
		result.append(", unit: ");
		result.append(unit);
		result.append(", flags: ");
		result.append(flags);
		result.append(", softwareVersion: ");
		result.append(softwareVersion);
		result.append(", inputHash: ");
		result.append(inputHash);
		result.append(')');
		return result.toString();
	}

} //ResultImpl
