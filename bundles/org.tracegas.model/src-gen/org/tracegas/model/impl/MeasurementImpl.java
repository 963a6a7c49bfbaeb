/**
 */
package org.tracegas.model.impl;

import java.time.Instant;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracegas.model.Measurement;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.WorkspacePackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Measurement</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.impl.MeasurementImpl#getKind <em>Kind</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MeasurementImpl#getTime <em>Time</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MeasurementImpl#getCellTemperature <em>Cell Temperature</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MeasurementImpl#getCellPressure <em>Cell Pressure</em>}</li>
 * </ul>
 *
 * @generated
 */
public class MeasurementImpl extends StoredObjectImpl implements Measurement {
	/**
	 * The default value of the '{@link #getKind() <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKind()
	 * @generated
	 * @ordered
	 */
	protected static final MeasurementKind KIND_EDEFAULT = MeasurementKind.SAMPLE;

	/**
	 * The cached value of the '{@link #getKind() <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKind()
	 * @generated
	 * @ordered
	 */
	protected MeasurementKind kind = KIND_EDEFAULT;

	/**
	 * The default value of the '{@link #getTime() <em>Time</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTime()
	 * @generated
	 * @ordered
	 */
	protected static final Instant TIME_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getTime() <em>Time</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTime()
	 * @generated
	 * @ordered
	 */
	protected Instant time = TIME_EDEFAULT;

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
	 * The default value of the '{@link #getCellPressure() <em>Cell Pressure</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCellPressure()
	 * @generated
	 * @ordered
	 */
	protected static final double CELL_PRESSURE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getCellPressure() <em>Cell Pressure</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCellPressure()
	 * @generated
	 * @ordered
	 */
	protected double cellPressure = CELL_PRESSURE_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected MeasurementImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return WorkspacePackage.Literals.MEASUREMENT;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public MeasurementKind getKind() {
		return kind;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setKind(MeasurementKind newKind) {
		MeasurementKind oldKind = kind;
		kind = newKind == null ? KIND_EDEFAULT : newKind;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.MEASUREMENT__KIND, oldKind, kind));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Instant getTime() {
		return time;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTime(Instant newTime) {
		Instant oldTime = time;
		time = newTime;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.MEASUREMENT__TIME, oldTime, time));
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
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.MEASUREMENT__CELL_TEMPERATURE, oldCellTemperature, cellTemperature));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getCellPressure() {
		return cellPressure;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCellPressure(double newCellPressure) {
		double oldCellPressure = cellPressure;
		cellPressure = newCellPressure;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.MEASUREMENT__CELL_PRESSURE, oldCellPressure, cellPressure));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case WorkspacePackage.MEASUREMENT__KIND:
				return getKind();
			case WorkspacePackage.MEASUREMENT__TIME:
				return getTime();
			case WorkspacePackage.MEASUREMENT__CELL_TEMPERATURE:
				return getCellTemperature();
			case WorkspacePackage.MEASUREMENT__CELL_PRESSURE:
				return getCellPressure();
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
			case WorkspacePackage.MEASUREMENT__KIND:
				setKind((MeasurementKind)newValue);
				return;
			case WorkspacePackage.MEASUREMENT__TIME:
				setTime((Instant)newValue);
				return;
			case WorkspacePackage.MEASUREMENT__CELL_TEMPERATURE:
				setCellTemperature((Double)newValue);
				return;
			case WorkspacePackage.MEASUREMENT__CELL_PRESSURE:
				setCellPressure((Double)newValue);
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
			case WorkspacePackage.MEASUREMENT__KIND:
				setKind(KIND_EDEFAULT);
				return;
			case WorkspacePackage.MEASUREMENT__TIME:
				setTime(TIME_EDEFAULT);
				return;
			case WorkspacePackage.MEASUREMENT__CELL_TEMPERATURE:
				setCellTemperature(CELL_TEMPERATURE_EDEFAULT);
				return;
			case WorkspacePackage.MEASUREMENT__CELL_PRESSURE:
				setCellPressure(CELL_PRESSURE_EDEFAULT);
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
			case WorkspacePackage.MEASUREMENT__KIND:
				return kind != KIND_EDEFAULT;
			case WorkspacePackage.MEASUREMENT__TIME:
				return TIME_EDEFAULT == null ? time != null : !TIME_EDEFAULT.equals(time);
			case WorkspacePackage.MEASUREMENT__CELL_TEMPERATURE:
				return cellTemperature != CELL_TEMPERATURE_EDEFAULT;
			case WorkspacePackage.MEASUREMENT__CELL_PRESSURE:
				return cellPressure != CELL_PRESSURE_EDEFAULT;
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
		result.append(" (kind: ");
		result.append(kind);
		result.append(", time: ");
		result.append(time);
		result.append(", cellTemperature: ");
		result.append(cellTemperature);
		result.append(", cellPressure: ");
		result.append(cellPressure);
		result.append(')');
		return result.toString();
	}

} //MeasurementImpl
