/**
 */
package org.tracegas.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Spectral Data Ref</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * Reference to a binary spectral array held by the store; the model never carries the values.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.SpectralDataRef#getDataId <em>Data Id</em>}</li>
 *   <li>{@link org.tracegas.model.SpectralDataRef#getUri <em>Uri</em>}</li>
 *   <li>{@link org.tracegas.model.SpectralDataRef#getContent <em>Content</em>}</li>
 *   <li>{@link org.tracegas.model.SpectralDataRef#getPointCount <em>Point Count</em>}</li>
 *   <li>{@link org.tracegas.model.SpectralDataRef#getSha256 <em>Sha256</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getSpectralDataRef()
 * @model
 * @generated
 */
public interface SpectralDataRef extends EObject {
	/**
	 * Returns the value of the '<em><b>Data Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Identifier of the stored array.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Data Id</em>' attribute.
	 * @see #setDataId(String)
	 * @see org.tracegas.model.WorkspacePackage#getSpectralDataRef_DataId()
	 * @model
	 * @generated
	 */
	String getDataId();

	/**
	 * Sets the value of the '{@link org.tracegas.model.SpectralDataRef#getDataId <em>Data Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Data Id</em>' attribute.
	 * @see #getDataId()
	 * @generated
	 */
	void setDataId(String value);

	/**
	 * Returns the value of the '<em><b>Uri</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Location of the array when it is kept outside the store.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Uri</em>' attribute.
	 * @see #setUri(String)
	 * @see org.tracegas.model.WorkspacePackage#getSpectralDataRef_Uri()
	 * @model
	 * @generated
	 */
	String getUri();

	/**
	 * Sets the value of the '{@link org.tracegas.model.SpectralDataRef#getUri <em>Uri</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Uri</em>' attribute.
	 * @see #getUri()
	 * @generated
	 */
	void setUri(String value);

	/**
	 * Returns the value of the '<em><b>Content</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracegas.model.SpectralContent}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Content</em>' attribute.
	 * @see org.tracegas.model.SpectralContent
	 * @see #setContent(SpectralContent)
	 * @see org.tracegas.model.WorkspacePackage#getSpectralDataRef_Content()
	 * @model
	 * @generated
	 */
	SpectralContent getContent();

	/**
	 * Sets the value of the '{@link org.tracegas.model.SpectralDataRef#getContent <em>Content</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Content</em>' attribute.
	 * @see org.tracegas.model.SpectralContent
	 * @see #getContent()
	 * @generated
	 */
	void setContent(SpectralContent value);

	/**
	 * Returns the value of the '<em><b>Point Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Point Count</em>' attribute.
	 * @see #setPointCount(int)
	 * @see org.tracegas.model.WorkspacePackage#getSpectralDataRef_PointCount()
	 * @model
	 * @generated
	 */
	int getPointCount();

	/**
	 * Sets the value of the '{@link org.tracegas.model.SpectralDataRef#getPointCount <em>Point Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Point Count</em>' attribute.
	 * @see #getPointCount()
	 * @generated
	 */
	void setPointCount(int value);

	/**
	 * Returns the value of the '<em><b>Sha256</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * SHA-256 of the stored bytes, hex.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Sha256</em>' attribute.
	 * @see #setSha256(String)
	 * @see org.tracegas.model.WorkspacePackage#getSpectralDataRef_Sha256()
	 * @model
	 * @generated
	 */
	String getSha256();

	/**
	 * Sets the value of the '{@link org.tracegas.model.SpectralDataRef#getSha256 <em>Sha256</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Sha256</em>' attribute.
	 * @see #getSha256()
	 * @generated
	 */
	void setSha256(String value);

} // SpectralDataRef
