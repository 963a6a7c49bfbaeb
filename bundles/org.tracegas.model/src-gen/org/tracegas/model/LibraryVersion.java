/**
 */
package org.tracegas.model;

import org.eclipse.emf.common.util.EList;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Library Version</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * One version of a reference library.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.LibraryVersion#getSpectra <em>Spectra</em>}</li>
 * </ul>
 *
 * @see org.tracegas.model.WorkspacePackage#getLibraryVersion()
 * @model
 * @generated
 */
public interface LibraryVersion extends ContentVersion {
	/**
	 * Returns the value of the '<em><b>Spectra</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracegas.model.ReferenceSpectrum}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Spectra</em>' containment reference list.
	 * @see org.tracegas.model.WorkspacePackage#getLibraryVersion_Spectra()
	 * @model containment="true"
	 * @generated
	 */
	EList<ReferenceSpectrum> getSpectra();

} // LibraryVersion
