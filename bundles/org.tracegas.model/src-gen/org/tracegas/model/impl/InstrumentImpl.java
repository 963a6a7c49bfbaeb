/**
 */
package org.tracegas.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

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
 *   <li>{@link org.tracegas.model.impl.InstrumentImpl#getLaserWavenumber <em>Laser Wavenumber</em>}</li>
 *   <li>{@link org.tracegas.model.impl.InstrumentImpl#getMaxPathDifference <em>Max Path Difference</em>}</li>
 *   <li>{@link org.tracegas.model.impl.InstrumentImpl#getFieldOfView <em>Field Of View</em>}</li>
 *   <li>{@link org.tracegas.model.impl.InstrumentImpl#getCellPathLength <em>Cell Path Length</em>}</li>
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
	 * The default value of the '{@link #getMaxPathDifference() <em>Max Path Difference</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxPathDifference()
	 * @generated
	 * @ordered
	 */
	protected static final double MAX_PATH_DIFFERENCE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMaxPathDifference() <em>Max Path Difference</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxPathDifference()
	 * @generated
	 * @ordered
	 */
	protected double maxPathDifference = MAX_PATH_DIFFERENCE_EDEFAULT;

	/**
	 * The default value of the '{@link #getFieldOfView() <em>Field Of View</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFieldOfView()
	 * @generated
	 * @ordered
	 */
	protected static final double FIELD_OF_VIEW_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getFieldOfView() <em>Field Of View</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFieldOfView()
	 * @generated
	 * @ordered
	 */
	protected double fieldOfView = FIELD_OF_VIEW_EDEFAULT;

	/**
	 * This is true if the Field Of View attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean fieldOfViewESet;

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
	public double getMaxPathDifference() {
		return maxPathDifference;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMaxPathDifference(double newMaxPathDifference) {
		double oldMaxPathDifference = maxPathDifference;
		maxPathDifference = newMaxPathDifference;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.INSTRUMENT__MAX_PATH_DIFFERENCE, oldMaxPathDifference, maxPathDifference));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getFieldOfView() {
		return fieldOfView;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setFieldOfView(double newFieldOfView) {
		double oldFieldOfView = fieldOfView;
		fieldOfView = newFieldOfView;
		boolean oldFieldOfViewESet = fieldOfViewESet;
		fieldOfViewESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.INSTRUMENT__FIELD_OF_VIEW, oldFieldOfView, fieldOfView, !oldFieldOfViewESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetFieldOfView() {
		double oldFieldOfView = fieldOfView;
		boolean oldFieldOfViewESet = fieldOfViewESet;
		fieldOfView = FIELD_OF_VIEW_EDEFAULT;
		fieldOfViewESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, WorkspacePackage.INSTRUMENT__FIELD_OF_VIEW, oldFieldOfView, FIELD_OF_VIEW_EDEFAULT, oldFieldOfViewESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetFieldOfView() {
		return fieldOfViewESet;
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
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case WorkspacePackage.INSTRUMENT__NAME:
				return getName();
			case WorkspacePackage.INSTRUMENT__SERIAL_NUMBER:
				return getSerialNumber();
			case WorkspacePackage.INSTRUMENT__LASER_WAVENUMBER:
				return getLaserWavenumber();
			case WorkspacePackage.INSTRUMENT__MAX_PATH_DIFFERENCE:
				return getMaxPathDifference();
			case WorkspacePackage.INSTRUMENT__FIELD_OF_VIEW:
				return getFieldOfView();
			case WorkspacePackage.INSTRUMENT__CELL_PATH_LENGTH:
				return getCellPathLength();
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
			case WorkspacePackage.INSTRUMENT__LASER_WAVENUMBER:
				setLaserWavenumber((Double)newValue);
				return;
			case WorkspacePackage.INSTRUMENT__MAX_PATH_DIFFERENCE:
				setMaxPathDifference((Double)newValue);
				return;
			case WorkspacePackage.INSTRUMENT__FIELD_OF_VIEW:
				setFieldOfView((Double)newValue);
				return;
			case WorkspacePackage.INSTRUMENT__CELL_PATH_LENGTH:
				setCellPathLength((Double)newValue);
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
			case WorkspacePackage.INSTRUMENT__LASER_WAVENUMBER:
				setLaserWavenumber(LASER_WAVENUMBER_EDEFAULT);
				return;
			case WorkspacePackage.INSTRUMENT__MAX_PATH_DIFFERENCE:
				setMaxPathDifference(MAX_PATH_DIFFERENCE_EDEFAULT);
				return;
			case WorkspacePackage.INSTRUMENT__FIELD_OF_VIEW:
				unsetFieldOfView();
				return;
			case WorkspacePackage.INSTRUMENT__CELL_PATH_LENGTH:
				setCellPathLength(CELL_PATH_LENGTH_EDEFAULT);
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
			case WorkspacePackage.INSTRUMENT__LASER_WAVENUMBER:
				return laserWavenumber != LASER_WAVENUMBER_EDEFAULT;
			case WorkspacePackage.INSTRUMENT__MAX_PATH_DIFFERENCE:
				return maxPathDifference != MAX_PATH_DIFFERENCE_EDEFAULT;
			case WorkspacePackage.INSTRUMENT__FIELD_OF_VIEW:
				return isSetFieldOfView();
			case WorkspacePackage.INSTRUMENT__CELL_PATH_LENGTH:
				return cellPathLength != CELL_PATH_LENGTH_EDEFAULT;
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
		result.append(", laserWavenumber: ");
		result.append(laserWavenumber);
		result.append(", maxPathDifference: ");
		result.append(maxPathDifference);
		result.append(", fieldOfView: ");
		if (fieldOfViewESet) result.append(fieldOfView); else result.append("<unset>");
		result.append(", cellPathLength: ");
		result.append(cellPathLength);
		result.append(')');
		return result.toString();
	}

} //InstrumentImpl
