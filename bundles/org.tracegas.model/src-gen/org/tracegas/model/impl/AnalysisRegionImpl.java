/**
 */
package org.tracegas.model.impl;

import java.util.Collection;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

import org.eclipse.emf.ecore.util.EDataTypeUniqueEList;

import org.tracegas.model.AnalysisRegion;
import org.tracegas.model.WorkspacePackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Analysis Region</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.impl.AnalysisRegionImpl#getCompound <em>Compound</em>}</li>
 *   <li>{@link org.tracegas.model.impl.AnalysisRegionImpl#getLowerWavenumber <em>Lower Wavenumber</em>}</li>
 *   <li>{@link org.tracegas.model.impl.AnalysisRegionImpl#getUpperWavenumber <em>Upper Wavenumber</em>}</li>
 *   <li>{@link org.tracegas.model.impl.AnalysisRegionImpl#getInterferents <em>Interferents</em>}</li>
 *   <li>{@link org.tracegas.model.impl.AnalysisRegionImpl#getBaselineOrder <em>Baseline Order</em>}</li>
 *   <li>{@link org.tracegas.model.impl.AnalysisRegionImpl#getOpenedAs <em>Opened As</em>}</li>
 * </ul>
 *
 * @generated
 */
public class AnalysisRegionImpl extends MinimalEObjectImpl.Container implements AnalysisRegion {
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
	 * The default value of the '{@link #getLowerWavenumber() <em>Lower Wavenumber</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLowerWavenumber()
	 * @generated
	 * @ordered
	 */
	protected static final double LOWER_WAVENUMBER_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getLowerWavenumber() <em>Lower Wavenumber</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLowerWavenumber()
	 * @generated
	 * @ordered
	 */
	protected double lowerWavenumber = LOWER_WAVENUMBER_EDEFAULT;

	/**
	 * The default value of the '{@link #getUpperWavenumber() <em>Upper Wavenumber</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUpperWavenumber()
	 * @generated
	 * @ordered
	 */
	protected static final double UPPER_WAVENUMBER_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getUpperWavenumber() <em>Upper Wavenumber</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUpperWavenumber()
	 * @generated
	 * @ordered
	 */
	protected double upperWavenumber = UPPER_WAVENUMBER_EDEFAULT;

	/**
	 * The cached value of the '{@link #getInterferents() <em>Interferents</em>}' attribute list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getInterferents()
	 * @generated
	 * @ordered
	 */
	protected EList<String> interferents;

	/**
	 * The default value of the '{@link #getBaselineOrder() <em>Baseline Order</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBaselineOrder()
	 * @generated
	 * @ordered
	 */
	protected static final int BASELINE_ORDER_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getBaselineOrder() <em>Baseline Order</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBaselineOrder()
	 * @generated
	 * @ordered
	 */
	protected int baselineOrder = BASELINE_ORDER_EDEFAULT;

	/**
	 * The default value of the '{@link #getOpenedAs() <em>Opened As</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOpenedAs()
	 * @generated
	 * @ordered
	 */
	protected static final int OPENED_AS_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getOpenedAs() <em>Opened As</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOpenedAs()
	 * @generated
	 * @ordered
	 */
	protected int openedAs = OPENED_AS_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected AnalysisRegionImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return WorkspacePackage.Literals.ANALYSIS_REGION;
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
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.ANALYSIS_REGION__COMPOUND, oldCompound, compound));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getLowerWavenumber() {
		return lowerWavenumber;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLowerWavenumber(double newLowerWavenumber) {
		double oldLowerWavenumber = lowerWavenumber;
		lowerWavenumber = newLowerWavenumber;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.ANALYSIS_REGION__LOWER_WAVENUMBER, oldLowerWavenumber, lowerWavenumber));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getUpperWavenumber() {
		return upperWavenumber;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setUpperWavenumber(double newUpperWavenumber) {
		double oldUpperWavenumber = upperWavenumber;
		upperWavenumber = newUpperWavenumber;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.ANALYSIS_REGION__UPPER_WAVENUMBER, oldUpperWavenumber, upperWavenumber));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<String> getInterferents() {
		if (interferents == null) {
			interferents = new EDataTypeUniqueEList<String>(String.class, this, WorkspacePackage.ANALYSIS_REGION__INTERFERENTS);
		}
		return interferents;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getBaselineOrder() {
		return baselineOrder;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setBaselineOrder(int newBaselineOrder) {
		int oldBaselineOrder = baselineOrder;
		baselineOrder = newBaselineOrder;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.ANALYSIS_REGION__BASELINE_ORDER, oldBaselineOrder, baselineOrder));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getOpenedAs() {
		return openedAs;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setOpenedAs(int newOpenedAs) {
		int oldOpenedAs = openedAs;
		openedAs = newOpenedAs;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.ANALYSIS_REGION__OPENED_AS, oldOpenedAs, openedAs));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case WorkspacePackage.ANALYSIS_REGION__COMPOUND:
				return getCompound();
			case WorkspacePackage.ANALYSIS_REGION__LOWER_WAVENUMBER:
				return getLowerWavenumber();
			case WorkspacePackage.ANALYSIS_REGION__UPPER_WAVENUMBER:
				return getUpperWavenumber();
			case WorkspacePackage.ANALYSIS_REGION__INTERFERENTS:
				return getInterferents();
			case WorkspacePackage.ANALYSIS_REGION__BASELINE_ORDER:
				return getBaselineOrder();
			case WorkspacePackage.ANALYSIS_REGION__OPENED_AS:
				return getOpenedAs();
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
			case WorkspacePackage.ANALYSIS_REGION__COMPOUND:
				setCompound((String)newValue);
				return;
			case WorkspacePackage.ANALYSIS_REGION__LOWER_WAVENUMBER:
				setLowerWavenumber((Double)newValue);
				return;
			case WorkspacePackage.ANALYSIS_REGION__UPPER_WAVENUMBER:
				setUpperWavenumber((Double)newValue);
				return;
			case WorkspacePackage.ANALYSIS_REGION__INTERFERENTS:
				getInterferents().clear();
				getInterferents().addAll((Collection<? extends String>)newValue);
				return;
			case WorkspacePackage.ANALYSIS_REGION__BASELINE_ORDER:
				setBaselineOrder((Integer)newValue);
				return;
			case WorkspacePackage.ANALYSIS_REGION__OPENED_AS:
				setOpenedAs((Integer)newValue);
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
			case WorkspacePackage.ANALYSIS_REGION__COMPOUND:
				setCompound(COMPOUND_EDEFAULT);
				return;
			case WorkspacePackage.ANALYSIS_REGION__LOWER_WAVENUMBER:
				setLowerWavenumber(LOWER_WAVENUMBER_EDEFAULT);
				return;
			case WorkspacePackage.ANALYSIS_REGION__UPPER_WAVENUMBER:
				setUpperWavenumber(UPPER_WAVENUMBER_EDEFAULT);
				return;
			case WorkspacePackage.ANALYSIS_REGION__INTERFERENTS:
				getInterferents().clear();
				return;
			case WorkspacePackage.ANALYSIS_REGION__BASELINE_ORDER:
				setBaselineOrder(BASELINE_ORDER_EDEFAULT);
				return;
			case WorkspacePackage.ANALYSIS_REGION__OPENED_AS:
				setOpenedAs(OPENED_AS_EDEFAULT);
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
			case WorkspacePackage.ANALYSIS_REGION__COMPOUND:
				return COMPOUND_EDEFAULT == null ? compound != null : !COMPOUND_EDEFAULT.equals(compound);
			case WorkspacePackage.ANALYSIS_REGION__LOWER_WAVENUMBER:
				return lowerWavenumber != LOWER_WAVENUMBER_EDEFAULT;
			case WorkspacePackage.ANALYSIS_REGION__UPPER_WAVENUMBER:
				return upperWavenumber != UPPER_WAVENUMBER_EDEFAULT;
			case WorkspacePackage.ANALYSIS_REGION__INTERFERENTS:
				return interferents != null && !interferents.isEmpty();
			case WorkspacePackage.ANALYSIS_REGION__BASELINE_ORDER:
				return baselineOrder != BASELINE_ORDER_EDEFAULT;
			case WorkspacePackage.ANALYSIS_REGION__OPENED_AS:
				return openedAs != OPENED_AS_EDEFAULT;
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
		result.append(", lowerWavenumber: ");
		result.append(lowerWavenumber);
		result.append(", upperWavenumber: ");
		result.append(upperWavenumber);
		result.append(", interferents: ");
		result.append(interferents);
		result.append(", baselineOrder: ");
		result.append(baselineOrder);
		result.append(", openedAs: ");
		result.append(openedAs);
		result.append(')');
		return result.toString();
	}

} //AnalysisRegionImpl
