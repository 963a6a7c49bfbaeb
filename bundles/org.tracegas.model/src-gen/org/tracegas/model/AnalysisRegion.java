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

} // AnalysisRegion
