/**
 */
package org.tracegas.model;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Analysis Region</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A wavenumber region fitted for one target compound with its interferents.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.AnalysisRegion#getCompound <em>Compound</em>}</li>
 *   <li>{@link org.tracegas.model.AnalysisRegion#getLowerWavenumber <em>Lower Wavenumber</em>}</li>
 *   <li>{@link org.tracegas.model.AnalysisRegion#getUpperWavenumber <em>Upper Wavenumber</em>}</li>
 *   <li>{@link org.tracegas.model.AnalysisRegion#getInterferents <em>Interferents</em>}</li>
 *   <li>{@link org.tracegas.model.AnalysisRegion#getBaselineOrder <em>Baseline Order</em>}</li>
 *   <li>{@link org.tracegas.model.AnalysisRegion#getOpenedAs <em>Opened As</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getAnalysisRegion()
 * @model
 * @generated
 */
public interface AnalysisRegion extends EObject {
	/**
	 * Returns the value of the '<em><b>Compound</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Compound</em>' attribute.
	 * @see #setCompound(String)
	 * @see org.tracegas.model.WorkspacePackage#getAnalysisRegion_Compound()
	 * @model
	 * @generated
	 */
	String getCompound();

	/**
	 * Sets the value of the '{@link org.tracegas.model.AnalysisRegion#getCompound <em>Compound</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Compound</em>' attribute.
	 * @see #getCompound()
	 * @generated
	 */
	void setCompound(String value);

	/**
	 * Returns the value of the '<em><b>Lower Wavenumber</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * in cm-1
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Lower Wavenumber</em>' attribute.
	 * @see #setLowerWavenumber(double)
	 * @see org.tracegas.model.WorkspacePackage#getAnalysisRegion_LowerWavenumber()
	 * @model
	 * @generated
	 */
	double getLowerWavenumber();

	/**
	 * Sets the value of the '{@link org.tracegas.model.AnalysisRegion#getLowerWavenumber <em>Lower Wavenumber</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Lower Wavenumber</em>' attribute.
	 * @see #getLowerWavenumber()
	 * @generated
	 */
	void setLowerWavenumber(double value);

	/**
	 * Returns the value of the '<em><b>Upper Wavenumber</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * in cm-1
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Upper Wavenumber</em>' attribute.
	 * @see #setUpperWavenumber(double)
	 * @see org.tracegas.model.WorkspacePackage#getAnalysisRegion_UpperWavenumber()
	 * @model
	 * @generated
	 */
	double getUpperWavenumber();

	/**
	 * Sets the value of the '{@link org.tracegas.model.AnalysisRegion#getUpperWavenumber <em>Upper Wavenumber</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Upper Wavenumber</em>' attribute.
	 * @see #getUpperWavenumber()
	 * @generated
	 */
	void setUpperWavenumber(double value);

	/**
	 * Returns the value of the '<em><b>Interferents</b></em>' attribute list.
	 * The list contents are of type {@link java.lang.String}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Interferents</em>' attribute list.
	 * @see org.tracegas.model.WorkspacePackage#getAnalysisRegion_Interferents()
	 * @model
	 * @generated
	 */
	EList<String> getInterferents();

	/**
	 * Returns the value of the '<em><b>Baseline Order</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Order of the polynomial baseline fitted with the references over the region: 0 for an offset, 1 for a sloping line, up to 3.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Baseline Order</em>' attribute.
	 * @see #setBaselineOrder(int)
	 * @see org.tracegas.model.WorkspacePackage#getAnalysisRegion_BaselineOrder()
	 * @model
	 * @generated
	 */
	int getBaselineOrder();

	/**
	 * Sets the value of the '{@link org.tracegas.model.AnalysisRegion#getBaselineOrder <em>Baseline Order</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Baseline Order</em>' attribute.
	 * @see #getBaselineOrder()
	 * @generated
	 */
	void setBaselineOrder(int value);

	/**
	 * Returns the value of the '<em><b>Opened As</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The region's place, from 1, among the regions of the stored method text the version was read from, so that an edit keeps what the model does not hold (the windows inside the span, the residual limit); 0 for a region added since.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Opened As</em>' attribute.
	 * @see #setOpenedAs(int)
	 * @see org.tracegas.model.WorkspacePackage#getAnalysisRegion_OpenedAs()
	 * @model
	 * @generated
	 */
	int getOpenedAs();

	/**
	 * Sets the value of the '{@link org.tracegas.model.AnalysisRegion#getOpenedAs <em>Opened As</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Opened As</em>' attribute.
	 * @see #getOpenedAs()
	 * @generated
	 */
	void setOpenedAs(int value);

} // AnalysisRegion
