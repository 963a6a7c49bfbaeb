/**
 */
package org.tracegas.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Emission Source</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A stack or duct that is sampled.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.EmissionSource#getName <em>Name</em>}</li>
 *   <li>{@link org.tracegas.model.EmissionSource#getDescription <em>Description</em>}</li>
 *   <li>{@link org.tracegas.model.EmissionSource#getDuctDiameter <em>Duct Diameter</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getEmissionSource()
 * @model
 * @generated
 */
public interface EmissionSource extends StoredObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see org.tracegas.model.WorkspacePackage#getEmissionSource_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link org.tracegas.model.EmissionSource#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Description</em>' attribute.
	 * @see #setDescription(String)
	 * @see org.tracegas.model.WorkspacePackage#getEmissionSource_Description()
	 * @model
	 * @generated
	 */
	String getDescription();

	/**
	 * Sets the value of the '{@link org.tracegas.model.EmissionSource#getDescription <em>Description</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Description</em>' attribute.
	 * @see #getDescription()
	 * @generated
	 */
	void setDescription(String value);

	/**
	 * Returns the value of the '<em><b>Duct Diameter</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Inner diameter of the duct at the sampling plane, in m.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Duct Diameter</em>' attribute.
	 * @see #setDuctDiameter(double)
	 * @see org.tracegas.model.WorkspacePackage#getEmissionSource_DuctDiameter()
	 * @model
	 * @generated
	 */
	double getDuctDiameter();

	/**
	 * Sets the value of the '{@link org.tracegas.model.EmissionSource#getDuctDiameter <em>Duct Diameter</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Duct Diameter</em>' attribute.
	 * @see #getDuctDiameter()
	 * @generated
	 */
	void setDuctDiameter(double value);

} // EmissionSource
