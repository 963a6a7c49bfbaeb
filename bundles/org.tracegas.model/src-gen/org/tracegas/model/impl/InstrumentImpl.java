/**
 */
package org.tracegas.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracegas.model.DetectorType;
import org.tracegas.model.Instrument;
import org.tracegas.model.WorkspacePackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Instrument</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.impl.InstrumentImpl#getName <em>Name</em>}</li>
 *   <li>{@link org.tracegas.model.impl.InstrumentImpl#getSerialNumber <em>Serial Number</em>}</li>
 *   <li>{@link org.tracegas.model.impl.InstrumentImpl#getCellPathLength <em>Cell Path Length</em>}</li>
 *   <li>{@link org.tracegas.model.impl.InstrumentImpl#getCellTemperature <em>Cell Temperature</em>}</li>
 *   <li>{@link org.tracegas.model.impl.InstrumentImpl#getResolution <em>Resolution</em>}</li>
 *   <li>{@link org.tracegas.model.impl.InstrumentImpl#getLaserWavenumber <em>Laser Wavenumber</em>}</li>
 *   <li>{@link org.tracegas.model.impl.InstrumentImpl#getDetector <em>Detector</em>}</li>
 * </ul>
 *
 * @generated
 */
public class InstrumentImpl extends StoredObjectImpl implements Instrument {
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
	 * The default value of the '{@link #getSerialNumber() <em>Serial Number</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSerialNumber()
	 * @generated
	 * @ordered
	 */
	protected static final String SERIAL_NUMBER_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getSerialNumber() <em>Serial Number</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSerialNumber()
	 * @generated
	 * @ordered
	 */
	protected String serialNumber = SERIAL_NUMBER_EDEFAULT;

	/**
	 * The default value of the '{@link #getCellPathLength() <em>Cell Path Length</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCellPathLength()
	 * @generated
	 * @ordered
	 */
	protected static final double CELL_PATH_LENGTH_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getCellPathLength() <em>Cell Path Length</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCellPathLength()
	 * @generated
	 * @ordered
	 */
	protected double cellPathLength = CELL_PATH_LENGTH_EDEFAULT;

	/**
	 * The default value of the '{@link #getCellTemperature() <em>Cell Temperature</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCellTemperature()
	 * @generated
	 * @ordered
	 */
	protected static final double CELL_TEMPERATURE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getCellTemperature() <em>Cell Temperature</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCellTemperature()
	 * @generated
	 * @ordered
	 */
	protected double cellTemperature = CELL_TEMPERATURE_EDEFAULT;

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
	 * The default value of the '{@link #getLaserWavenumber() <em>Laser Wavenumber</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLaserWavenumber()
	 * @generated
	 * @ordered
	 */
	protected static final double LASER_WAVENUMBER_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getLaserWavenumber() <em>Laser Wavenumber</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLaserWavenumber()
	 * @generated
	 * @ordered
	 */
	protected double laserWavenumber = LASER_WAVENUMBER_EDEFAULT;

	/**
	 * The default value of the '{@link #getDetector() <em>Detector</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDetector()
	 * @generated
	 * @ordered
	 */
	protected static final DetectorType DETECTOR_EDEFAULT = DetectorType.MCT;

	/**
	 * The cached value of the '{@link #getDetector() <em>Detector</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDetector()
	 * @generated
	 * @ordered
	 */
	protected DetectorType detector = DETECTOR_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected InstrumentImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return WorkspacePackage.Literals.INSTRUMENT;
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
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.INSTRUMENT__NAME, oldName, name));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getSerialNumber() {
		return serialNumber;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSerialNumber(String newSerialNumber) {
		String oldSerialNumber = serialNumber;
		serialNumber = newSerialNumber;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.INSTRUMENT__SERIAL_NUMBER, oldSerialNumber, serialNumber));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getCellPathLength() {
		return cellPathLength;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCellPathLength(double newCellPathLength) {
		double oldCellPathLength = cellPathLength;
		cellPathLength = newCellPathLength;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.INSTRUMENT__CELL_PATH_LENGTH, oldCellPathLength, cellPathLength));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getCellTemperature() {
		return cellTemperature;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCellTemperature(double newCellTemperature) {
		double oldCellTemperature = cellTemperature;
		cellTemperature = newCellTemperature;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.INSTRUMENT__CELL_TEMPERATURE, oldCellTemperature, cellTemperature));
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
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.INSTRUMENT__RESOLUTION, oldResolution, resolution));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getLaserWavenumber() {
		return laserWavenumber;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLaserWavenumber(double newLaserWavenumber) {
		double oldLaserWavenumber = laserWavenumber;
		laserWavenumber = newLaserWavenumber;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.INSTRUMENT__LASER_WAVENUMBER, oldLaserWavenumber, laserWavenumber));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public DetectorType getDetector() {
		return detector;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDetector(DetectorType newDetector) {
		DetectorType oldDetector = detector;
		detector = newDetector == null ? DETECTOR_EDEFAULT : newDetector;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.INSTRUMENT__DETECTOR, oldDetector, detector));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case WorkspacePackage.INSTRUMENT__NAME:
				return getName();
			case WorkspacePackage.INSTRUMENT__SERIAL_NUMBER:
				return getSerialNumber();
			case WorkspacePackage.INSTRUMENT__CELL_PATH_LENGTH:
				return getCellPathLength();
			case WorkspacePackage.INSTRUMENT__CELL_TEMPERATURE:
				return getCellTemperature();
			case WorkspacePackage.INSTRUMENT__RESOLUTION:
				return getResolution();
			case WorkspacePackage.INSTRUMENT__LASER_WAVENUMBER:
				return getLaserWavenumber();
			case WorkspacePackage.INSTRUMENT__DETECTOR:
				return getDetector();
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
			case WorkspacePackage.INSTRUMENT__NAME:
				setName((String)newValue);
				return;
			case WorkspacePackage.INSTRUMENT__SERIAL_NUMBER:
				setSerialNumber((String)newValue);
				return;
			case WorkspacePackage.INSTRUMENT__CELL_PATH_LENGTH:
				setCellPathLength((Double)newValue);
				return;
			case WorkspacePackage.INSTRUMENT__CELL_TEMPERATURE:
				setCellTemperature((Double)newValue);
				return;
			case WorkspacePackage.INSTRUMENT__RESOLUTION:
				setResolution((Double)newValue);
				return;
			case WorkspacePackage.INSTRUMENT__LASER_WAVENUMBER:
				setLaserWavenumber((Double)newValue);
				return;
			case WorkspacePackage.INSTRUMENT__DETECTOR:
				setDetector((DetectorType)newValue);
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
			case WorkspacePackage.INSTRUMENT__NAME:
				setName(NAME_EDEFAULT);
				return;
			case WorkspacePackage.INSTRUMENT__SERIAL_NUMBER:
				setSerialNumber(SERIAL_NUMBER_EDEFAULT);
				return;
			case WorkspacePackage.INSTRUMENT__CELL_PATH_LENGTH:
				setCellPathLength(CELL_PATH_LENGTH_EDEFAULT);
				return;
			case WorkspacePackage.INSTRUMENT__CELL_TEMPERATURE:
				setCellTemperature(CELL_TEMPERATURE_EDEFAULT);
				return;
			case WorkspacePackage.INSTRUMENT__RESOLUTION:
				setResolution(RESOLUTION_EDEFAULT);
				return;
			case WorkspacePackage.INSTRUMENT__LASER_WAVENUMBER:
				setLaserWavenumber(LASER_WAVENUMBER_EDEFAULT);
				return;
			case WorkspacePackage.INSTRUMENT__DETECTOR:
				setDetector(DETECTOR_EDEFAULT);
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
			case WorkspacePackage.INSTRUMENT__NAME:
				return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
			case WorkspacePackage.INSTRUMENT__SERIAL_NUMBER:
				return SERIAL_NUMBER_EDEFAULT == null ? serialNumber != null : !SERIAL_NUMBER_EDEFAULT.equals(serialNumber);
			case WorkspacePackage.INSTRUMENT__CELL_PATH_LENGTH:
				return cellPathLength != CELL_PATH_LENGTH_EDEFAULT;
			case WorkspacePackage.INSTRUMENT__CELL_TEMPERATURE:
				return cellTemperature != CELL_TEMPERATURE_EDEFAULT;
			case WorkspacePackage.INSTRUMENT__RESOLUTION:
				return resolution != RESOLUTION_EDEFAULT;
			case WorkspacePackage.INSTRUMENT__LASER_WAVENUMBER:
				return laserWavenumber != LASER_WAVENUMBER_EDEFAULT;
			case WorkspacePackage.INSTRUMENT__DETECTOR:
				return detector != DETECTOR_EDEFAULT;
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
		result.append(" (name: ");
		result.append(name);
		result.append(", serialNumber: ");
		result.append(serialNumber);
		result.append(", cellPathLength: ");
		result.append(cellPathLength);
		result.append(", cellTemperature: ");
		result.append(cellTemperature);
		result.append(", resolution: ");
		result.append(resolution);
		result.append(", laserWavenumber: ");
		result.append(laserWavenumber);
		result.append(", detector: ");
		result.append(detector);
		result.append(')');
		return result.toString();
	}

} //InstrumentImpl
