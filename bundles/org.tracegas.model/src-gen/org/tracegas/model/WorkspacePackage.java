/**
 */
package org.tracegas.model;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EDataType;
import org.eclipse.emf.ecore.EEnum;
import org.eclipse.emf.ecore.EPackage;
import org.eclipse.emf.ecore.EReference;

/**
 * <!-- begin-user-doc -->
 * The <b>Package</b> for the model.
 * It contains accessors for the meta objects to represent
 * <ul>
 *   <li>each class,</li>
 *   <li>each feature of each class,</li>
 *   <li>each operation of each class,</li>
 *   <li>each enum,</li>
 *   <li>and each data type</li>
 * </ul>
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * The workspace of an FTIR gas-analysis laboratory as the workbench shows and edits it: clients, campaigns, measurements, reference libraries and methods.
 * <!-- end-model-doc -->
 * @see org.tracegas.model.WorkspaceFactory
 * @model kind="package"
 * @generated
 */
public interface WorkspacePackage extends EPackage {
	/**
	 * The package name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	String eNAME = "model";

	/**
	 * The package namespace URI.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	String eNS_URI = "http://tracegas.org/workspace/1.0";

	/**
	 * The package namespace name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	String eNS_PREFIX = "workspace";

	/**
	 * The singleton instance of the package.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	WorkspacePackage eINSTANCE = org.tracegas.model.impl.WorkspacePackageImpl.init();

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.StoredObjectImpl <em>Stored Object</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.StoredObjectImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getStoredObject()
	 * @generated
	 */
	int STORED_OBJECT = 0;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STORED_OBJECT__ID = 0;

	/**
	 * The feature id for the '<em><b>Row Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STORED_OBJECT__ROW_VERSION = 1;

	/**
	 * The number of structural features of the '<em>Stored Object</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STORED_OBJECT_FEATURE_COUNT = 2;

	/**
	 * The number of operations of the '<em>Stored Object</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int STORED_OBJECT_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.WorkspaceImpl <em>Workspace</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.WorkspaceImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getWorkspace()
	 * @generated
	 */
	int WORKSPACE = 1;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORKSPACE__NAME = 0;

	/**
	 * The feature id for the '<em><b>Clients</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORKSPACE__CLIENTS = 1;

	/**
	 * The feature id for the '<em><b>Libraries</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORKSPACE__LIBRARIES = 2;

	/**
	 * The feature id for the '<em><b>Methods</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORKSPACE__METHODS = 3;

	/**
	 * The feature id for the '<em><b>Instruments</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORKSPACE__INSTRUMENTS = 4;

	/**
	 * The number of structural features of the '<em>Workspace</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORKSPACE_FEATURE_COUNT = 5;

	/**
	 * The number of operations of the '<em>Workspace</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORKSPACE_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.ClientImpl <em>Client</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.ClientImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getClient()
	 * @generated
	 */
	int CLIENT = 2;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLIENT__ID = STORED_OBJECT__ID;

	/**
	 * The feature id for the '<em><b>Row Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLIENT__ROW_VERSION = STORED_OBJECT__ROW_VERSION;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLIENT__NAME = STORED_OBJECT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Contact</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLIENT__CONTACT = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Projects</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLIENT__PROJECTS = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Sites</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLIENT__SITES = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The number of structural features of the '<em>Client</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLIENT_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 4;

	/**
	 * The number of operations of the '<em>Client</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLIENT_OPERATION_COUNT = STORED_OBJECT_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.ProjectImpl <em>Project</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.ProjectImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getProject()
	 * @generated
	 */
	int PROJECT = 3;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__ID = STORED_OBJECT__ID;

	/**
	 * The feature id for the '<em><b>Row Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__ROW_VERSION = STORED_OBJECT__ROW_VERSION;

	/**
	 * The feature id for the '<em><b>Code</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__CODE = STORED_OBJECT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Client</b></em>' container reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__CLIENT = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__NAME = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Start</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__START = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>End</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__END = STORED_OBJECT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Measurements</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__MEASUREMENTS = STORED_OBJECT_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Reports</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__REPORTS = STORED_OBJECT_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>Batches</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__BATCHES = STORED_OBJECT_FEATURE_COUNT + 7;

	/**
	 * The feature id for the '<em><b>Source</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__SOURCE = STORED_OBJECT_FEATURE_COUNT + 8;

	/**
	 * The number of structural features of the '<em>Project</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 9;

	/**
	 * The number of operations of the '<em>Project</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT_OPERATION_COUNT = STORED_OBJECT_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.SiteImpl <em>Site</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.SiteImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getSite()
	 * @generated
	 */
	int SITE = 4;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE__ID = STORED_OBJECT__ID;

	/**
	 * The feature id for the '<em><b>Row Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE__ROW_VERSION = STORED_OBJECT__ROW_VERSION;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE__NAME = STORED_OBJECT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE__DESCRIPTION = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Client</b></em>' container reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE__CLIENT = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Sources</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE__SOURCES = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The number of structural features of the '<em>Site</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 4;

	/**
	 * The number of operations of the '<em>Site</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE_OPERATION_COUNT = STORED_OBJECT_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.EmissionSourceImpl <em>Emission Source</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.EmissionSourceImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getEmissionSource()
	 * @generated
	 */
	int EMISSION_SOURCE = 5;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EMISSION_SOURCE__ID = STORED_OBJECT__ID;

	/**
	 * The feature id for the '<em><b>Row Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EMISSION_SOURCE__ROW_VERSION = STORED_OBJECT__ROW_VERSION;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EMISSION_SOURCE__NAME = STORED_OBJECT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EMISSION_SOURCE__DESCRIPTION = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Site</b></em>' container reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EMISSION_SOURCE__SITE = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The number of structural features of the '<em>Emission Source</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EMISSION_SOURCE_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The number of operations of the '<em>Emission Source</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EMISSION_SOURCE_OPERATION_COUNT = STORED_OBJECT_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.MeasurementImpl <em>Measurement</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.MeasurementImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getMeasurement()
	 * @generated
	 */
	int MEASUREMENT = 6;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__ID = STORED_OBJECT__ID;

	/**
	 * The feature id for the '<em><b>Row Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__ROW_VERSION = STORED_OBJECT__ROW_VERSION;

	/**
	 * The feature id for the '<em><b>Project</b></em>' container reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__PROJECT = STORED_OBJECT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Kind</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__KIND = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Time</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__TIME = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Cell Temperature</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__CELL_TEMPERATURE = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Cell Pressure</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__CELL_PRESSURE = STORED_OBJECT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Operator Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__OPERATOR_ID = STORED_OBJECT_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Title</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__TITLE = STORED_OBJECT_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>Labels</b></em>' map.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__LABELS = STORED_OBJECT_FEATURE_COUNT + 7;

	/**
	 * The feature id for the '<em><b>Content</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__CONTENT = STORED_OBJECT_FEATURE_COUNT + 8;

	/**
	 * The feature id for the '<em><b>Spectrum Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__SPECTRUM_ID = STORED_OBJECT_FEATURE_COUNT + 9;

	/**
	 * The feature id for the '<em><b>Spectrum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__SPECTRUM = STORED_OBJECT_FEATURE_COUNT + 10;

	/**
	 * The feature id for the '<em><b>Source File</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__SOURCE_FILE = STORED_OBJECT_FEATURE_COUNT + 11;

	/**
	 * The feature id for the '<em><b>Source Sha256</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__SOURCE_SHA256 = STORED_OBJECT_FEATURE_COUNT + 12;

	/**
	 * The feature id for the '<em><b>Source Record</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__SOURCE_RECORD = STORED_OBJECT_FEATURE_COUNT + 13;

	/**
	 * The feature id for the '<em><b>Instrument</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__INSTRUMENT = STORED_OBJECT_FEATURE_COUNT + 14;

	/**
	 * The number of structural features of the '<em>Measurement</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 15;

	/**
	 * The number of operations of the '<em>Measurement</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT_OPERATION_COUNT = STORED_OBJECT_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.InstrumentImpl <em>Instrument</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.InstrumentImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getInstrument()
	 * @generated
	 */
	int INSTRUMENT = 7;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int INSTRUMENT__ID = STORED_OBJECT__ID;

	/**
	 * The feature id for the '<em><b>Row Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int INSTRUMENT__ROW_VERSION = STORED_OBJECT__ROW_VERSION;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int INSTRUMENT__NAME = STORED_OBJECT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Serial Number</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int INSTRUMENT__SERIAL_NUMBER = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Laser Wavenumber</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int INSTRUMENT__LASER_WAVENUMBER = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Max Path Difference</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int INSTRUMENT__MAX_PATH_DIFFERENCE = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Field Of View</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int INSTRUMENT__FIELD_OF_VIEW = STORED_OBJECT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Cell Path Length</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int INSTRUMENT__CELL_PATH_LENGTH = STORED_OBJECT_FEATURE_COUNT + 5;

	/**
	 * The number of structural features of the '<em>Instrument</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int INSTRUMENT_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 6;

	/**
	 * The number of operations of the '<em>Instrument</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int INSTRUMENT_OPERATION_COUNT = STORED_OBJECT_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.ProcessedSpectrumImpl <em>Processed Spectrum</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.ProcessedSpectrumImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getProcessedSpectrum()
	 * @generated
	 */
	int PROCESSED_SPECTRUM = 8;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROCESSED_SPECTRUM__ID = STORED_OBJECT__ID;

	/**
	 * The feature id for the '<em><b>Row Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROCESSED_SPECTRUM__ROW_VERSION = STORED_OBJECT__ROW_VERSION;

	/**
	 * The feature id for the '<em><b>Measurement Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROCESSED_SPECTRUM__MEASUREMENT_ID = STORED_OBJECT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Content</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROCESSED_SPECTRUM__CONTENT = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Sample Encoding</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROCESSED_SPECTRUM__SAMPLE_ENCODING = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Sha256</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROCESSED_SPECTRUM__SHA256 = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Recipe Sha256</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROCESSED_SPECTRUM__RECIPE_SHA256 = STORED_OBJECT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Spectrum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROCESSED_SPECTRUM__SPECTRUM = STORED_OBJECT_FEATURE_COUNT + 5;

	/**
	 * The number of structural features of the '<em>Processed Spectrum</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROCESSED_SPECTRUM_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 6;

	/**
	 * The number of operations of the '<em>Processed Spectrum</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROCESSED_SPECTRUM_OPERATION_COUNT = STORED_OBJECT_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.ReportImpl <em>Report</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.ReportImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getReport()
	 * @generated
	 */
	int REPORT = 9;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT__ID = STORED_OBJECT__ID;

	/**
	 * The feature id for the '<em><b>Row Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT__ROW_VERSION = STORED_OBJECT__ROW_VERSION;

	/**
	 * The feature id for the '<em><b>Project</b></em>' container reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT__PROJECT = STORED_OBJECT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Report Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT__REPORT_ID = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Title</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT__TITLE = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Issued</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT__ISSUED = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Issued By</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT__ISSUED_BY = STORED_OBJECT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Content Sha256</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT__CONTENT_SHA256 = STORED_OBJECT_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>File Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT__FILE_NAME = STORED_OBJECT_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>Page Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT__PAGE_COUNT = STORED_OBJECT_FEATURE_COUNT + 7;

	/**
	 * The feature id for the '<em><b>Method Version Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT__METHOD_VERSION_ID = STORED_OBJECT_FEATURE_COUNT + 8;

	/**
	 * The feature id for the '<em><b>Library Version Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT__LIBRARY_VERSION_ID = STORED_OBJECT_FEATURE_COUNT + 9;

	/**
	 * The number of structural features of the '<em>Report</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 10;

	/**
	 * The number of operations of the '<em>Report</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT_OPERATION_COUNT = STORED_OBJECT_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.ContentVersionImpl <em>Content Version</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.ContentVersionImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getContentVersion()
	 * @generated
	 */
	int CONTENT_VERSION = 10;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION__ID = STORED_OBJECT__ID;

	/**
	 * The feature id for the '<em><b>Row Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION__ROW_VERSION = STORED_OBJECT__ROW_VERSION;

	/**
	 * The feature id for the '<em><b>Kind</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION__KIND = STORED_OBJECT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Item Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION__ITEM_ID = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Item Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION__ITEM_NAME = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Number</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION__NUMBER = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Parent Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION__PARENT_ID = STORED_OBJECT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Author Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION__AUTHOR_ID = STORED_OBJECT_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Reason</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION__REASON = STORED_OBJECT_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>Created</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION__CREATED = STORED_OBJECT_FEATURE_COUNT + 7;

	/**
	 * The feature id for the '<em><b>Content Hash</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION__CONTENT_HASH = STORED_OBJECT_FEATURE_COUNT + 8;

	/**
	 * The feature id for the '<em><b>Frozen</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION__FROZEN = STORED_OBJECT_FEATURE_COUNT + 9;

	/**
	 * The number of structural features of the '<em>Content Version</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 10;

	/**
	 * The number of operations of the '<em>Content Version</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION_OPERATION_COUNT = STORED_OBJECT_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.ReferenceLibraryImpl <em>Reference Library</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.ReferenceLibraryImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getReferenceLibrary()
	 * @generated
	 */
	int REFERENCE_LIBRARY = 11;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_LIBRARY__ID = STORED_OBJECT__ID;

	/**
	 * The feature id for the '<em><b>Row Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_LIBRARY__ROW_VERSION = STORED_OBJECT__ROW_VERSION;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_LIBRARY__NAME = STORED_OBJECT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_LIBRARY__DESCRIPTION = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>References</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_LIBRARY__REFERENCES = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The number of structural features of the '<em>Reference Library</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_LIBRARY_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The number of operations of the '<em>Reference Library</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_LIBRARY_OPERATION_COUNT = STORED_OBJECT_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.ReferenceSpectrumImpl <em>Reference Spectrum</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.ReferenceSpectrumImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getReferenceSpectrum()
	 * @generated
	 */
	int REFERENCE_SPECTRUM = 12;

	/**
	 * The feature id for the '<em><b>Compound</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_SPECTRUM__COMPOUND = 0;

	/**
	 * The feature id for the '<em><b>Cas Number</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_SPECTRUM__CAS_NUMBER = 1;

	/**
	 * The feature id for the '<em><b>Ppm Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_SPECTRUM__PPM_METRES = 2;

	/**
	 * The feature id for the '<em><b>Temperature</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_SPECTRUM__TEMPERATURE = 3;

	/**
	 * The feature id for the '<em><b>Pressure</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_SPECTRUM__PRESSURE = 4;

	/**
	 * The feature id for the '<em><b>Resolution</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_SPECTRUM__RESOLUTION = 5;

	/**
	 * The feature id for the '<em><b>Apodization</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_SPECTRUM__APODIZATION = 6;

	/**
	 * The feature id for the '<em><b>Origin</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_SPECTRUM__ORIGIN = 7;

	/**
	 * The feature id for the '<em><b>Origin Text</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_SPECTRUM__ORIGIN_TEXT = 8;

	/**
	 * The feature id for the '<em><b>Content Sha256</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_SPECTRUM__CONTENT_SHA256 = 9;

	/**
	 * The number of structural features of the '<em>Reference Spectrum</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_SPECTRUM_FEATURE_COUNT = 10;

	/**
	 * The number of operations of the '<em>Reference Spectrum</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_SPECTRUM_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.AnalysisMethodImpl <em>Analysis Method</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.AnalysisMethodImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getAnalysisMethod()
	 * @generated
	 */
	int ANALYSIS_METHOD = 13;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_METHOD__ID = STORED_OBJECT__ID;

	/**
	 * The feature id for the '<em><b>Row Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_METHOD__ROW_VERSION = STORED_OBJECT__ROW_VERSION;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_METHOD__NAME = STORED_OBJECT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_METHOD__DESCRIPTION = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Versions</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_METHOD__VERSIONS = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The number of structural features of the '<em>Analysis Method</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_METHOD_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The number of operations of the '<em>Analysis Method</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_METHOD_OPERATION_COUNT = STORED_OBJECT_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.MethodVersionImpl <em>Method Version</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.MethodVersionImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getMethodVersion()
	 * @generated
	 */
	int METHOD_VERSION = 14;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__ID = CONTENT_VERSION__ID;

	/**
	 * The feature id for the '<em><b>Row Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__ROW_VERSION = CONTENT_VERSION__ROW_VERSION;

	/**
	 * The feature id for the '<em><b>Kind</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__KIND = CONTENT_VERSION__KIND;

	/**
	 * The feature id for the '<em><b>Item Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__ITEM_ID = CONTENT_VERSION__ITEM_ID;

	/**
	 * The feature id for the '<em><b>Item Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__ITEM_NAME = CONTENT_VERSION__ITEM_NAME;

	/**
	 * The feature id for the '<em><b>Number</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__NUMBER = CONTENT_VERSION__NUMBER;

	/**
	 * The feature id for the '<em><b>Parent Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__PARENT_ID = CONTENT_VERSION__PARENT_ID;

	/**
	 * The feature id for the '<em><b>Author Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__AUTHOR_ID = CONTENT_VERSION__AUTHOR_ID;

	/**
	 * The feature id for the '<em><b>Reason</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__REASON = CONTENT_VERSION__REASON;

	/**
	 * The feature id for the '<em><b>Created</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__CREATED = CONTENT_VERSION__CREATED;

	/**
	 * The feature id for the '<em><b>Content Hash</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__CONTENT_HASH = CONTENT_VERSION__CONTENT_HASH;

	/**
	 * The feature id for the '<em><b>Frozen</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__FROZEN = CONTENT_VERSION__FROZEN;

	/**
	 * The feature id for the '<em><b>Regions</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__REGIONS = CONTENT_VERSION_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Path Length</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__PATH_LENGTH = CONTENT_VERSION_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Max Iterations</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__MAX_ITERATIONS = CONTENT_VERSION_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Algorithm</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__ALGORITHM = CONTENT_VERSION_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Path Source</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__PATH_SOURCE = CONTENT_VERSION_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Nonlinearity</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__NONLINEARITY = CONTENT_VERSION_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Tolerance</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__TOLERANCE = CONTENT_VERSION_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>Max Absorbance</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__MAX_ABSORBANCE = CONTENT_VERSION_FEATURE_COUNT + 7;

	/**
	 * The feature id for the '<em><b>Shift Term</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__SHIFT_TERM = CONTENT_VERSION_FEATURE_COUNT + 8;

	/**
	 * The feature id for the '<em><b>Reporting Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__REPORTING_UNIT = CONTENT_VERSION_FEATURE_COUNT + 9;

	/**
	 * The feature id for the '<em><b>Recipe Steps</b></em>' attribute list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__RECIPE_STEPS = CONTENT_VERSION_FEATURE_COUNT + 10;

	/**
	 * The feature id for the '<em><b>Cell Conditions</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__CELL_CONDITIONS = CONTENT_VERSION_FEATURE_COUNT + 11;

	/**
	 * The number of structural features of the '<em>Method Version</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION_FEATURE_COUNT = CONTENT_VERSION_FEATURE_COUNT + 12;

	/**
	 * The number of operations of the '<em>Method Version</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION_OPERATION_COUNT = CONTENT_VERSION_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.AnalysisRegionImpl <em>Analysis Region</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.AnalysisRegionImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getAnalysisRegion()
	 * @generated
	 */
	int ANALYSIS_REGION = 15;

	/**
	 * The feature id for the '<em><b>Compound</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_REGION__COMPOUND = 0;

	/**
	 * The feature id for the '<em><b>Lower Wavenumber</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_REGION__LOWER_WAVENUMBER = 1;

	/**
	 * The feature id for the '<em><b>Upper Wavenumber</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_REGION__UPPER_WAVENUMBER = 2;

	/**
	 * The feature id for the '<em><b>Interferents</b></em>' attribute list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_REGION__INTERFERENTS = 3;

	/**
	 * The feature id for the '<em><b>Baseline Order</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_REGION__BASELINE_ORDER = 4;

	/**
	 * The feature id for the '<em><b>Opened As</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_REGION__OPENED_AS = 5;

	/**
	 * The number of structural features of the '<em>Analysis Region</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_REGION_FEATURE_COUNT = 6;

	/**
	 * The number of operations of the '<em>Analysis Region</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_REGION_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.ResultImpl <em>Result</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.ResultImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getResult()
	 * @generated
	 */
	int RESULT = 16;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__ID = STORED_OBJECT__ID;

	/**
	 * The feature id for the '<em><b>Row Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__ROW_VERSION = STORED_OBJECT__ROW_VERSION;

	/**
	 * The feature id for the '<em><b>Project Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__PROJECT_ID = STORED_OBJECT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Measurement Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__MEASUREMENT_ID = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Compound</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__COMPOUND = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Concentration</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__CONCENTRATION = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Standard Uncertainty</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__STANDARD_UNCERTAINTY = STORED_OBJECT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Detection Limit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__DETECTION_LIMIT = STORED_OBJECT_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__UNIT = STORED_OBJECT_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>Flags</b></em>' attribute list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__FLAGS = STORED_OBJECT_FEATURE_COUNT + 7;

	/**
	 * The feature id for the '<em><b>Provenance</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__PROVENANCE = STORED_OBJECT_FEATURE_COUNT + 8;

	/**
	 * The feature id for the '<em><b>Conditions</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__CONDITIONS = STORED_OBJECT_FEATURE_COUNT + 9;

	/**
	 * The feature id for the '<em><b>Recorded By</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__RECORDED_BY = STORED_OBJECT_FEATURE_COUNT + 10;

	/**
	 * The feature id for the '<em><b>Recorded</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__RECORDED = STORED_OBJECT_FEATURE_COUNT + 11;

	/**
	 * The number of structural features of the '<em>Result</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 12;

	/**
	 * The number of operations of the '<em>Result</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT_OPERATION_COUNT = STORED_OBJECT_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.QaOutcomeImpl <em>Qa Outcome</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.QaOutcomeImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getQaOutcome()
	 * @generated
	 */
	int QA_OUTCOME = 17;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_OUTCOME__ID = STORED_OBJECT__ID;

	/**
	 * The feature id for the '<em><b>Row Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_OUTCOME__ROW_VERSION = STORED_OBJECT__ROW_VERSION;

	/**
	 * The feature id for the '<em><b>Project Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_OUTCOME__PROJECT_ID = STORED_OBJECT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Method Version Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_OUTCOME__METHOD_VERSION_ID = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Check</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_OUTCOME__CHECK = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Passed</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_OUTCOME__PASSED = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Measured</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_OUTCOME__MEASURED = STORED_OBJECT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_OUTCOME__UNIT = STORED_OBJECT_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Lower Limit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_OUTCOME__LOWER_LIMIT = STORED_OBJECT_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>Upper Limit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_OUTCOME__UPPER_LIMIT = STORED_OBJECT_FEATURE_COUNT + 7;

	/**
	 * The feature id for the '<em><b>Rule</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_OUTCOME__RULE = STORED_OBJECT_FEATURE_COUNT + 8;

	/**
	 * The feature id for the '<em><b>Source</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_OUTCOME__SOURCE = STORED_OBJECT_FEATURE_COUNT + 9;

	/**
	 * The feature id for the '<em><b>Recorded By</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_OUTCOME__RECORDED_BY = STORED_OBJECT_FEATURE_COUNT + 10;

	/**
	 * The feature id for the '<em><b>Recorded</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_OUTCOME__RECORDED = STORED_OBJECT_FEATURE_COUNT + 11;

	/**
	 * The number of structural features of the '<em>Qa Outcome</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_OUTCOME_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 12;

	/**
	 * The number of operations of the '<em>Qa Outcome</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_OUTCOME_OPERATION_COUNT = STORED_OBJECT_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.WorkBatchImpl <em>Work Batch</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.WorkBatchImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getWorkBatch()
	 * @generated
	 */
	int WORK_BATCH = 18;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORK_BATCH__ID = STORED_OBJECT__ID;

	/**
	 * The feature id for the '<em><b>Row Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORK_BATCH__ROW_VERSION = STORED_OBJECT__ROW_VERSION;

	/**
	 * The feature id for the '<em><b>Project</b></em>' container reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORK_BATCH__PROJECT = STORED_OBJECT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Method Version Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORK_BATCH__METHOD_VERSION_ID = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORK_BATCH__DESCRIPTION = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Unit Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORK_BATCH__UNIT_COUNT = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Created By</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORK_BATCH__CREATED_BY = STORED_OBJECT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Created At</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORK_BATCH__CREATED_AT = STORED_OBJECT_FEATURE_COUNT + 5;

	/**
	 * The number of structural features of the '<em>Work Batch</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORK_BATCH_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 6;

	/**
	 * The number of operations of the '<em>Work Batch</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORK_BATCH_OPERATION_COUNT = STORED_OBJECT_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.UserImpl <em>User</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.UserImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getUser()
	 * @generated
	 */
	int USER = 19;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int USER__ID = STORED_OBJECT__ID;

	/**
	 * The feature id for the '<em><b>Row Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int USER__ROW_VERSION = STORED_OBJECT__ROW_VERSION;

	/**
	 * The feature id for the '<em><b>Login</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int USER__LOGIN = STORED_OBJECT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Display Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int USER__DISPLAY_NAME = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Roles</b></em>' attribute list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int USER__ROLES = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Locked</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int USER__LOCKED = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The number of structural features of the '<em>User</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int USER_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 4;

	/**
	 * The number of operations of the '<em>User</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int USER_OPERATION_COUNT = STORED_OBJECT_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.AccessLevel <em>Access Level</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.AccessLevel
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getAccessLevel()
	 * @generated
	 */
	int ACCESS_LEVEL = 20;

	/**
	 * The meta object id for the '{@link org.tracegas.model.MeasurementKind <em>Measurement Kind</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.MeasurementKind
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getMeasurementKind()
	 * @generated
	 */
	int MEASUREMENT_KIND = 21;

	/**
	 * The meta object id for the '{@link org.tracegas.model.SpectralContent <em>Spectral Content</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.SpectralContent
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getSpectralContent()
	 * @generated
	 */
	int SPECTRAL_CONTENT = 22;

	/**
	 * The meta object id for the '{@link org.tracegas.model.VersionKind <em>Version Kind</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.VersionKind
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getVersionKind()
	 * @generated
	 */
	int VERSION_KIND = 23;

	/**
	 * The meta object id for the '{@link org.tracegas.model.ReferenceOrigin <em>Reference Origin</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.ReferenceOrigin
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getReferenceOrigin()
	 * @generated
	 */
	int REFERENCE_ORIGIN = 24;

	/**
	 * The meta object id for the '{@link org.tracegas.model.ResultFlag <em>Result Flag</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.ResultFlag
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getResultFlag()
	 * @generated
	 */
	int RESULT_FLAG = 25;

	/**
	 * The meta object id for the '{@link org.tracegas.model.Role <em>Role</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.Role
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getRole()
	 * @generated
	 */
	int ROLE = 26;

	/**
	 * The meta object id for the '<em>Instant</em>' data type.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see java.time.Instant
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getInstant()
	 * @generated
	 */
	int INSTANT = 27;

	/**
	 * The meta object id for the '<em>Spectrum</em>' data type.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.spectrum.Spectrum
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getSpectrum()
	 * @generated
	 */
	int SPECTRUM = 28;

	/**
	 * The meta object id for the '<em>Provenance</em>' data type.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.Provenance
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getProvenance()
	 * @generated
	 */
	int PROVENANCE = 29;

	/**
	 * The meta object id for the '<em>Result Conditions</em>' data type.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.ResultConditions
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getResultConditions()
	 * @generated
	 */
	int RESULT_CONDITIONS = 30;


	/**
	 * Returns the meta object for class '{@link org.tracegas.model.StoredObject <em>Stored Object</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Stored Object</em>'.
	 * @see org.tracegas.model.StoredObject
	 * @generated
	 */
	EClass getStoredObject();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.StoredObject#getId <em>Id</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Id</em>'.
	 * @see org.tracegas.model.StoredObject#getId()
	 * @see #getStoredObject()
	 * @generated
	 */
	EAttribute getStoredObject_Id();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.StoredObject#getRowVersion <em>Row Version</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Row Version</em>'.
	 * @see org.tracegas.model.StoredObject#getRowVersion()
	 * @see #getStoredObject()
	 * @generated
	 */
	EAttribute getStoredObject_RowVersion();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.Workspace <em>Workspace</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Workspace</em>'.
	 * @see org.tracegas.model.Workspace
	 * @generated
	 */
	EClass getWorkspace();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Workspace#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see org.tracegas.model.Workspace#getName()
	 * @see #getWorkspace()
	 * @generated
	 */
	EAttribute getWorkspace_Name();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracegas.model.Workspace#getClients <em>Clients</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Clients</em>'.
	 * @see org.tracegas.model.Workspace#getClients()
	 * @see #getWorkspace()
	 * @generated
	 */
	EReference getWorkspace_Clients();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracegas.model.Workspace#getLibraries <em>Libraries</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Libraries</em>'.
	 * @see org.tracegas.model.Workspace#getLibraries()
	 * @see #getWorkspace()
	 * @generated
	 */
	EReference getWorkspace_Libraries();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracegas.model.Workspace#getMethods <em>Methods</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Methods</em>'.
	 * @see org.tracegas.model.Workspace#getMethods()
	 * @see #getWorkspace()
	 * @generated
	 */
	EReference getWorkspace_Methods();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracegas.model.Workspace#getInstruments <em>Instruments</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Instruments</em>'.
	 * @see org.tracegas.model.Workspace#getInstruments()
	 * @see #getWorkspace()
	 * @generated
	 */
	EReference getWorkspace_Instruments();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.Client <em>Client</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Client</em>'.
	 * @see org.tracegas.model.Client
	 * @generated
	 */
	EClass getClient();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Client#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see org.tracegas.model.Client#getName()
	 * @see #getClient()
	 * @generated
	 */
	EAttribute getClient_Name();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Client#getContact <em>Contact</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Contact</em>'.
	 * @see org.tracegas.model.Client#getContact()
	 * @see #getClient()
	 * @generated
	 */
	EAttribute getClient_Contact();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracegas.model.Client#getProjects <em>Projects</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Projects</em>'.
	 * @see org.tracegas.model.Client#getProjects()
	 * @see #getClient()
	 * @generated
	 */
	EReference getClient_Projects();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracegas.model.Client#getSites <em>Sites</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Sites</em>'.
	 * @see org.tracegas.model.Client#getSites()
	 * @see #getClient()
	 * @generated
	 */
	EReference getClient_Sites();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.Project <em>Project</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Project</em>'.
	 * @see org.tracegas.model.Project
	 * @generated
	 */
	EClass getProject();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Project#getCode <em>Code</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Code</em>'.
	 * @see org.tracegas.model.Project#getCode()
	 * @see #getProject()
	 * @generated
	 */
	EAttribute getProject_Code();

	/**
	 * Returns the meta object for the container reference '{@link org.tracegas.model.Project#getClient <em>Client</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the container reference '<em>Client</em>'.
	 * @see org.tracegas.model.Project#getClient()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_Client();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Project#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see org.tracegas.model.Project#getName()
	 * @see #getProject()
	 * @generated
	 */
	EAttribute getProject_Name();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Project#getStart <em>Start</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Start</em>'.
	 * @see org.tracegas.model.Project#getStart()
	 * @see #getProject()
	 * @generated
	 */
	EAttribute getProject_Start();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Project#getEnd <em>End</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>End</em>'.
	 * @see org.tracegas.model.Project#getEnd()
	 * @see #getProject()
	 * @generated
	 */
	EAttribute getProject_End();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracegas.model.Project#getMeasurements <em>Measurements</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Measurements</em>'.
	 * @see org.tracegas.model.Project#getMeasurements()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_Measurements();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracegas.model.Project#getReports <em>Reports</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Reports</em>'.
	 * @see org.tracegas.model.Project#getReports()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_Reports();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracegas.model.Project#getBatches <em>Batches</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Batches</em>'.
	 * @see org.tracegas.model.Project#getBatches()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_Batches();

	/**
	 * Returns the meta object for the reference '{@link org.tracegas.model.Project#getSource <em>Source</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Source</em>'.
	 * @see org.tracegas.model.Project#getSource()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_Source();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.Site <em>Site</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Site</em>'.
	 * @see org.tracegas.model.Site
	 * @generated
	 */
	EClass getSite();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Site#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see org.tracegas.model.Site#getName()
	 * @see #getSite()
	 * @generated
	 */
	EAttribute getSite_Name();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Site#getDescription <em>Description</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Description</em>'.
	 * @see org.tracegas.model.Site#getDescription()
	 * @see #getSite()
	 * @generated
	 */
	EAttribute getSite_Description();

	/**
	 * Returns the meta object for the container reference '{@link org.tracegas.model.Site#getClient <em>Client</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the container reference '<em>Client</em>'.
	 * @see org.tracegas.model.Site#getClient()
	 * @see #getSite()
	 * @generated
	 */
	EReference getSite_Client();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracegas.model.Site#getSources <em>Sources</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Sources</em>'.
	 * @see org.tracegas.model.Site#getSources()
	 * @see #getSite()
	 * @generated
	 */
	EReference getSite_Sources();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.EmissionSource <em>Emission Source</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Emission Source</em>'.
	 * @see org.tracegas.model.EmissionSource
	 * @generated
	 */
	EClass getEmissionSource();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.EmissionSource#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see org.tracegas.model.EmissionSource#getName()
	 * @see #getEmissionSource()
	 * @generated
	 */
	EAttribute getEmissionSource_Name();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.EmissionSource#getDescription <em>Description</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Description</em>'.
	 * @see org.tracegas.model.EmissionSource#getDescription()
	 * @see #getEmissionSource()
	 * @generated
	 */
	EAttribute getEmissionSource_Description();

	/**
	 * Returns the meta object for the container reference '{@link org.tracegas.model.EmissionSource#getSite <em>Site</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the container reference '<em>Site</em>'.
	 * @see org.tracegas.model.EmissionSource#getSite()
	 * @see #getEmissionSource()
	 * @generated
	 */
	EReference getEmissionSource_Site();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.Measurement <em>Measurement</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Measurement</em>'.
	 * @see org.tracegas.model.Measurement
	 * @generated
	 */
	EClass getMeasurement();

	/**
	 * Returns the meta object for the container reference '{@link org.tracegas.model.Measurement#getProject <em>Project</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the container reference '<em>Project</em>'.
	 * @see org.tracegas.model.Measurement#getProject()
	 * @see #getMeasurement()
	 * @generated
	 */
	EReference getMeasurement_Project();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Measurement#getKind <em>Kind</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Kind</em>'.
	 * @see org.tracegas.model.Measurement#getKind()
	 * @see #getMeasurement()
	 * @generated
	 */
	EAttribute getMeasurement_Kind();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Measurement#getTime <em>Time</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Time</em>'.
	 * @see org.tracegas.model.Measurement#getTime()
	 * @see #getMeasurement()
	 * @generated
	 */
	EAttribute getMeasurement_Time();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Measurement#getCellTemperature <em>Cell Temperature</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Cell Temperature</em>'.
	 * @see org.tracegas.model.Measurement#getCellTemperature()
	 * @see #getMeasurement()
	 * @generated
	 */
	EAttribute getMeasurement_CellTemperature();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Measurement#getCellPressure <em>Cell Pressure</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Cell Pressure</em>'.
	 * @see org.tracegas.model.Measurement#getCellPressure()
	 * @see #getMeasurement()
	 * @generated
	 */
	EAttribute getMeasurement_CellPressure();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Measurement#getOperatorId <em>Operator Id</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Operator Id</em>'.
	 * @see org.tracegas.model.Measurement#getOperatorId()
	 * @see #getMeasurement()
	 * @generated
	 */
	EAttribute getMeasurement_OperatorId();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Measurement#getTitle <em>Title</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Title</em>'.
	 * @see org.tracegas.model.Measurement#getTitle()
	 * @see #getMeasurement()
	 * @generated
	 */
	EAttribute getMeasurement_Title();

	/**
	 * Returns the meta object for the map '{@link org.tracegas.model.Measurement#getLabels <em>Labels</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the map '<em>Labels</em>'.
	 * @see org.tracegas.model.Measurement#getLabels()
	 * @see #getMeasurement()
	 * @generated
	 */
	EReference getMeasurement_Labels();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Measurement#getContent <em>Content</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Content</em>'.
	 * @see org.tracegas.model.Measurement#getContent()
	 * @see #getMeasurement()
	 * @generated
	 */
	EAttribute getMeasurement_Content();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Measurement#getSpectrumId <em>Spectrum Id</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Spectrum Id</em>'.
	 * @see org.tracegas.model.Measurement#getSpectrumId()
	 * @see #getMeasurement()
	 * @generated
	 */
	EAttribute getMeasurement_SpectrumId();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Measurement#getSpectrum <em>Spectrum</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Spectrum</em>'.
	 * @see org.tracegas.model.Measurement#getSpectrum()
	 * @see #getMeasurement()
	 * @generated
	 */
	EAttribute getMeasurement_Spectrum();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Measurement#getSourceFile <em>Source File</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Source File</em>'.
	 * @see org.tracegas.model.Measurement#getSourceFile()
	 * @see #getMeasurement()
	 * @generated
	 */
	EAttribute getMeasurement_SourceFile();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Measurement#getSourceSha256 <em>Source Sha256</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Source Sha256</em>'.
	 * @see org.tracegas.model.Measurement#getSourceSha256()
	 * @see #getMeasurement()
	 * @generated
	 */
	EAttribute getMeasurement_SourceSha256();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Measurement#getSourceRecord <em>Source Record</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Source Record</em>'.
	 * @see org.tracegas.model.Measurement#getSourceRecord()
	 * @see #getMeasurement()
	 * @generated
	 */
	EAttribute getMeasurement_SourceRecord();

	/**
	 * Returns the meta object for the reference '{@link org.tracegas.model.Measurement#getInstrument <em>Instrument</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Instrument</em>'.
	 * @see org.tracegas.model.Measurement#getInstrument()
	 * @see #getMeasurement()
	 * @generated
	 */
	EReference getMeasurement_Instrument();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.Instrument <em>Instrument</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Instrument</em>'.
	 * @see org.tracegas.model.Instrument
	 * @generated
	 */
	EClass getInstrument();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Instrument#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see org.tracegas.model.Instrument#getName()
	 * @see #getInstrument()
	 * @generated
	 */
	EAttribute getInstrument_Name();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Instrument#getSerialNumber <em>Serial Number</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Serial Number</em>'.
	 * @see org.tracegas.model.Instrument#getSerialNumber()
	 * @see #getInstrument()
	 * @generated
	 */
	EAttribute getInstrument_SerialNumber();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Instrument#getLaserWavenumber <em>Laser Wavenumber</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Laser Wavenumber</em>'.
	 * @see org.tracegas.model.Instrument#getLaserWavenumber()
	 * @see #getInstrument()
	 * @generated
	 */
	EAttribute getInstrument_LaserWavenumber();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Instrument#getMaxPathDifference <em>Max Path Difference</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Max Path Difference</em>'.
	 * @see org.tracegas.model.Instrument#getMaxPathDifference()
	 * @see #getInstrument()
	 * @generated
	 */
	EAttribute getInstrument_MaxPathDifference();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Instrument#getFieldOfView <em>Field Of View</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Field Of View</em>'.
	 * @see org.tracegas.model.Instrument#getFieldOfView()
	 * @see #getInstrument()
	 * @generated
	 */
	EAttribute getInstrument_FieldOfView();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Instrument#getCellPathLength <em>Cell Path Length</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Cell Path Length</em>'.
	 * @see org.tracegas.model.Instrument#getCellPathLength()
	 * @see #getInstrument()
	 * @generated
	 */
	EAttribute getInstrument_CellPathLength();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.ProcessedSpectrum <em>Processed Spectrum</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Processed Spectrum</em>'.
	 * @see org.tracegas.model.ProcessedSpectrum
	 * @generated
	 */
	EClass getProcessedSpectrum();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ProcessedSpectrum#getMeasurementId <em>Measurement Id</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Measurement Id</em>'.
	 * @see org.tracegas.model.ProcessedSpectrum#getMeasurementId()
	 * @see #getProcessedSpectrum()
	 * @generated
	 */
	EAttribute getProcessedSpectrum_MeasurementId();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ProcessedSpectrum#getContent <em>Content</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Content</em>'.
	 * @see org.tracegas.model.ProcessedSpectrum#getContent()
	 * @see #getProcessedSpectrum()
	 * @generated
	 */
	EAttribute getProcessedSpectrum_Content();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ProcessedSpectrum#getSampleEncoding <em>Sample Encoding</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Sample Encoding</em>'.
	 * @see org.tracegas.model.ProcessedSpectrum#getSampleEncoding()
	 * @see #getProcessedSpectrum()
	 * @generated
	 */
	EAttribute getProcessedSpectrum_SampleEncoding();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ProcessedSpectrum#getSha256 <em>Sha256</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Sha256</em>'.
	 * @see org.tracegas.model.ProcessedSpectrum#getSha256()
	 * @see #getProcessedSpectrum()
	 * @generated
	 */
	EAttribute getProcessedSpectrum_Sha256();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ProcessedSpectrum#getRecipeSha256 <em>Recipe Sha256</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Recipe Sha256</em>'.
	 * @see org.tracegas.model.ProcessedSpectrum#getRecipeSha256()
	 * @see #getProcessedSpectrum()
	 * @generated
	 */
	EAttribute getProcessedSpectrum_RecipeSha256();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ProcessedSpectrum#getSpectrum <em>Spectrum</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Spectrum</em>'.
	 * @see org.tracegas.model.ProcessedSpectrum#getSpectrum()
	 * @see #getProcessedSpectrum()
	 * @generated
	 */
	EAttribute getProcessedSpectrum_Spectrum();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.Report <em>Report</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Report</em>'.
	 * @see org.tracegas.model.Report
	 * @generated
	 */
	EClass getReport();

	/**
	 * Returns the meta object for the container reference '{@link org.tracegas.model.Report#getProject <em>Project</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the container reference '<em>Project</em>'.
	 * @see org.tracegas.model.Report#getProject()
	 * @see #getReport()
	 * @generated
	 */
	EReference getReport_Project();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Report#getReportId <em>Report Id</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Report Id</em>'.
	 * @see org.tracegas.model.Report#getReportId()
	 * @see #getReport()
	 * @generated
	 */
	EAttribute getReport_ReportId();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Report#getTitle <em>Title</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Title</em>'.
	 * @see org.tracegas.model.Report#getTitle()
	 * @see #getReport()
	 * @generated
	 */
	EAttribute getReport_Title();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Report#getIssued <em>Issued</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Issued</em>'.
	 * @see org.tracegas.model.Report#getIssued()
	 * @see #getReport()
	 * @generated
	 */
	EAttribute getReport_Issued();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Report#getIssuedBy <em>Issued By</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Issued By</em>'.
	 * @see org.tracegas.model.Report#getIssuedBy()
	 * @see #getReport()
	 * @generated
	 */
	EAttribute getReport_IssuedBy();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Report#getContentSha256 <em>Content Sha256</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Content Sha256</em>'.
	 * @see org.tracegas.model.Report#getContentSha256()
	 * @see #getReport()
	 * @generated
	 */
	EAttribute getReport_ContentSha256();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Report#getFileName <em>File Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>File Name</em>'.
	 * @see org.tracegas.model.Report#getFileName()
	 * @see #getReport()
	 * @generated
	 */
	EAttribute getReport_FileName();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Report#getPageCount <em>Page Count</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Page Count</em>'.
	 * @see org.tracegas.model.Report#getPageCount()
	 * @see #getReport()
	 * @generated
	 */
	EAttribute getReport_PageCount();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Report#getMethodVersionId <em>Method Version Id</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Method Version Id</em>'.
	 * @see org.tracegas.model.Report#getMethodVersionId()
	 * @see #getReport()
	 * @generated
	 */
	EAttribute getReport_MethodVersionId();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Report#getLibraryVersionId <em>Library Version Id</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Library Version Id</em>'.
	 * @see org.tracegas.model.Report#getLibraryVersionId()
	 * @see #getReport()
	 * @generated
	 */
	EAttribute getReport_LibraryVersionId();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.ContentVersion <em>Content Version</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Content Version</em>'.
	 * @see org.tracegas.model.ContentVersion
	 * @generated
	 */
	EClass getContentVersion();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ContentVersion#getKind <em>Kind</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Kind</em>'.
	 * @see org.tracegas.model.ContentVersion#getKind()
	 * @see #getContentVersion()
	 * @generated
	 */
	EAttribute getContentVersion_Kind();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ContentVersion#getItemId <em>Item Id</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Item Id</em>'.
	 * @see org.tracegas.model.ContentVersion#getItemId()
	 * @see #getContentVersion()
	 * @generated
	 */
	EAttribute getContentVersion_ItemId();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ContentVersion#getItemName <em>Item Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Item Name</em>'.
	 * @see org.tracegas.model.ContentVersion#getItemName()
	 * @see #getContentVersion()
	 * @generated
	 */
	EAttribute getContentVersion_ItemName();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ContentVersion#getNumber <em>Number</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Number</em>'.
	 * @see org.tracegas.model.ContentVersion#getNumber()
	 * @see #getContentVersion()
	 * @generated
	 */
	EAttribute getContentVersion_Number();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ContentVersion#getParentId <em>Parent Id</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Parent Id</em>'.
	 * @see org.tracegas.model.ContentVersion#getParentId()
	 * @see #getContentVersion()
	 * @generated
	 */
	EAttribute getContentVersion_ParentId();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ContentVersion#getAuthorId <em>Author Id</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Author Id</em>'.
	 * @see org.tracegas.model.ContentVersion#getAuthorId()
	 * @see #getContentVersion()
	 * @generated
	 */
	EAttribute getContentVersion_AuthorId();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ContentVersion#getReason <em>Reason</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Reason</em>'.
	 * @see org.tracegas.model.ContentVersion#getReason()
	 * @see #getContentVersion()
	 * @generated
	 */
	EAttribute getContentVersion_Reason();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ContentVersion#getCreated <em>Created</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Created</em>'.
	 * @see org.tracegas.model.ContentVersion#getCreated()
	 * @see #getContentVersion()
	 * @generated
	 */
	EAttribute getContentVersion_Created();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ContentVersion#getContentHash <em>Content Hash</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Content Hash</em>'.
	 * @see org.tracegas.model.ContentVersion#getContentHash()
	 * @see #getContentVersion()
	 * @generated
	 */
	EAttribute getContentVersion_ContentHash();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ContentVersion#isFrozen <em>Frozen</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Frozen</em>'.
	 * @see org.tracegas.model.ContentVersion#isFrozen()
	 * @see #getContentVersion()
	 * @generated
	 */
	EAttribute getContentVersion_Frozen();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.ReferenceLibrary <em>Reference Library</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Reference Library</em>'.
	 * @see org.tracegas.model.ReferenceLibrary
	 * @generated
	 */
	EClass getReferenceLibrary();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ReferenceLibrary#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see org.tracegas.model.ReferenceLibrary#getName()
	 * @see #getReferenceLibrary()
	 * @generated
	 */
	EAttribute getReferenceLibrary_Name();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ReferenceLibrary#getDescription <em>Description</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Description</em>'.
	 * @see org.tracegas.model.ReferenceLibrary#getDescription()
	 * @see #getReferenceLibrary()
	 * @generated
	 */
	EAttribute getReferenceLibrary_Description();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracegas.model.ReferenceLibrary#getReferences <em>References</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>References</em>'.
	 * @see org.tracegas.model.ReferenceLibrary#getReferences()
	 * @see #getReferenceLibrary()
	 * @generated
	 */
	EReference getReferenceLibrary_References();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.ReferenceSpectrum <em>Reference Spectrum</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Reference Spectrum</em>'.
	 * @see org.tracegas.model.ReferenceSpectrum
	 * @generated
	 */
	EClass getReferenceSpectrum();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ReferenceSpectrum#getCompound <em>Compound</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Compound</em>'.
	 * @see org.tracegas.model.ReferenceSpectrum#getCompound()
	 * @see #getReferenceSpectrum()
	 * @generated
	 */
	EAttribute getReferenceSpectrum_Compound();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ReferenceSpectrum#getCasNumber <em>Cas Number</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Cas Number</em>'.
	 * @see org.tracegas.model.ReferenceSpectrum#getCasNumber()
	 * @see #getReferenceSpectrum()
	 * @generated
	 */
	EAttribute getReferenceSpectrum_CasNumber();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ReferenceSpectrum#getPpmMetres <em>Ppm Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Ppm Metres</em>'.
	 * @see org.tracegas.model.ReferenceSpectrum#getPpmMetres()
	 * @see #getReferenceSpectrum()
	 * @generated
	 */
	EAttribute getReferenceSpectrum_PpmMetres();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ReferenceSpectrum#getTemperature <em>Temperature</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Temperature</em>'.
	 * @see org.tracegas.model.ReferenceSpectrum#getTemperature()
	 * @see #getReferenceSpectrum()
	 * @generated
	 */
	EAttribute getReferenceSpectrum_Temperature();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ReferenceSpectrum#getPressure <em>Pressure</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Pressure</em>'.
	 * @see org.tracegas.model.ReferenceSpectrum#getPressure()
	 * @see #getReferenceSpectrum()
	 * @generated
	 */
	EAttribute getReferenceSpectrum_Pressure();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ReferenceSpectrum#getResolution <em>Resolution</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Resolution</em>'.
	 * @see org.tracegas.model.ReferenceSpectrum#getResolution()
	 * @see #getReferenceSpectrum()
	 * @generated
	 */
	EAttribute getReferenceSpectrum_Resolution();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ReferenceSpectrum#getApodization <em>Apodization</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Apodization</em>'.
	 * @see org.tracegas.model.ReferenceSpectrum#getApodization()
	 * @see #getReferenceSpectrum()
	 * @generated
	 */
	EAttribute getReferenceSpectrum_Apodization();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ReferenceSpectrum#getOrigin <em>Origin</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Origin</em>'.
	 * @see org.tracegas.model.ReferenceSpectrum#getOrigin()
	 * @see #getReferenceSpectrum()
	 * @generated
	 */
	EAttribute getReferenceSpectrum_Origin();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ReferenceSpectrum#getOriginText <em>Origin Text</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Origin Text</em>'.
	 * @see org.tracegas.model.ReferenceSpectrum#getOriginText()
	 * @see #getReferenceSpectrum()
	 * @generated
	 */
	EAttribute getReferenceSpectrum_OriginText();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ReferenceSpectrum#getContentSha256 <em>Content Sha256</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Content Sha256</em>'.
	 * @see org.tracegas.model.ReferenceSpectrum#getContentSha256()
	 * @see #getReferenceSpectrum()
	 * @generated
	 */
	EAttribute getReferenceSpectrum_ContentSha256();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.AnalysisMethod <em>Analysis Method</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Analysis Method</em>'.
	 * @see org.tracegas.model.AnalysisMethod
	 * @generated
	 */
	EClass getAnalysisMethod();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.AnalysisMethod#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see org.tracegas.model.AnalysisMethod#getName()
	 * @see #getAnalysisMethod()
	 * @generated
	 */
	EAttribute getAnalysisMethod_Name();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.AnalysisMethod#getDescription <em>Description</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Description</em>'.
	 * @see org.tracegas.model.AnalysisMethod#getDescription()
	 * @see #getAnalysisMethod()
	 * @generated
	 */
	EAttribute getAnalysisMethod_Description();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracegas.model.AnalysisMethod#getVersions <em>Versions</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Versions</em>'.
	 * @see org.tracegas.model.AnalysisMethod#getVersions()
	 * @see #getAnalysisMethod()
	 * @generated
	 */
	EReference getAnalysisMethod_Versions();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.MethodVersion <em>Method Version</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Method Version</em>'.
	 * @see org.tracegas.model.MethodVersion
	 * @generated
	 */
	EClass getMethodVersion();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracegas.model.MethodVersion#getRegions <em>Regions</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Regions</em>'.
	 * @see org.tracegas.model.MethodVersion#getRegions()
	 * @see #getMethodVersion()
	 * @generated
	 */
	EReference getMethodVersion_Regions();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.MethodVersion#getPathLength <em>Path Length</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Path Length</em>'.
	 * @see org.tracegas.model.MethodVersion#getPathLength()
	 * @see #getMethodVersion()
	 * @generated
	 */
	EAttribute getMethodVersion_PathLength();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.MethodVersion#getMaxIterations <em>Max Iterations</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Max Iterations</em>'.
	 * @see org.tracegas.model.MethodVersion#getMaxIterations()
	 * @see #getMethodVersion()
	 * @generated
	 */
	EAttribute getMethodVersion_MaxIterations();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.MethodVersion#getAlgorithm <em>Algorithm</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Algorithm</em>'.
	 * @see org.tracegas.model.MethodVersion#getAlgorithm()
	 * @see #getMethodVersion()
	 * @generated
	 */
	EAttribute getMethodVersion_Algorithm();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.MethodVersion#getPathSource <em>Path Source</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Path Source</em>'.
	 * @see org.tracegas.model.MethodVersion#getPathSource()
	 * @see #getMethodVersion()
	 * @generated
	 */
	EAttribute getMethodVersion_PathSource();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.MethodVersion#isNonlinearity <em>Nonlinearity</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Nonlinearity</em>'.
	 * @see org.tracegas.model.MethodVersion#isNonlinearity()
	 * @see #getMethodVersion()
	 * @generated
	 */
	EAttribute getMethodVersion_Nonlinearity();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.MethodVersion#getTolerance <em>Tolerance</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Tolerance</em>'.
	 * @see org.tracegas.model.MethodVersion#getTolerance()
	 * @see #getMethodVersion()
	 * @generated
	 */
	EAttribute getMethodVersion_Tolerance();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.MethodVersion#getMaxAbsorbance <em>Max Absorbance</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Max Absorbance</em>'.
	 * @see org.tracegas.model.MethodVersion#getMaxAbsorbance()
	 * @see #getMethodVersion()
	 * @generated
	 */
	EAttribute getMethodVersion_MaxAbsorbance();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.MethodVersion#getShiftTerm <em>Shift Term</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Shift Term</em>'.
	 * @see org.tracegas.model.MethodVersion#getShiftTerm()
	 * @see #getMethodVersion()
	 * @generated
	 */
	EAttribute getMethodVersion_ShiftTerm();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.MethodVersion#getReportingUnit <em>Reporting Unit</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Reporting Unit</em>'.
	 * @see org.tracegas.model.MethodVersion#getReportingUnit()
	 * @see #getMethodVersion()
	 * @generated
	 */
	EAttribute getMethodVersion_ReportingUnit();

	/**
	 * Returns the meta object for the attribute list '{@link org.tracegas.model.MethodVersion#getRecipeSteps <em>Recipe Steps</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute list '<em>Recipe Steps</em>'.
	 * @see org.tracegas.model.MethodVersion#getRecipeSteps()
	 * @see #getMethodVersion()
	 * @generated
	 */
	EAttribute getMethodVersion_RecipeSteps();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.MethodVersion#getCellConditions <em>Cell Conditions</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Cell Conditions</em>'.
	 * @see org.tracegas.model.MethodVersion#getCellConditions()
	 * @see #getMethodVersion()
	 * @generated
	 */
	EAttribute getMethodVersion_CellConditions();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.AnalysisRegion <em>Analysis Region</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Analysis Region</em>'.
	 * @see org.tracegas.model.AnalysisRegion
	 * @generated
	 */
	EClass getAnalysisRegion();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.AnalysisRegion#getCompound <em>Compound</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Compound</em>'.
	 * @see org.tracegas.model.AnalysisRegion#getCompound()
	 * @see #getAnalysisRegion()
	 * @generated
	 */
	EAttribute getAnalysisRegion_Compound();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.AnalysisRegion#getLowerWavenumber <em>Lower Wavenumber</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Lower Wavenumber</em>'.
	 * @see org.tracegas.model.AnalysisRegion#getLowerWavenumber()
	 * @see #getAnalysisRegion()
	 * @generated
	 */
	EAttribute getAnalysisRegion_LowerWavenumber();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.AnalysisRegion#getUpperWavenumber <em>Upper Wavenumber</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Upper Wavenumber</em>'.
	 * @see org.tracegas.model.AnalysisRegion#getUpperWavenumber()
	 * @see #getAnalysisRegion()
	 * @generated
	 */
	EAttribute getAnalysisRegion_UpperWavenumber();

	/**
	 * Returns the meta object for the attribute list '{@link org.tracegas.model.AnalysisRegion#getInterferents <em>Interferents</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute list '<em>Interferents</em>'.
	 * @see org.tracegas.model.AnalysisRegion#getInterferents()
	 * @see #getAnalysisRegion()
	 * @generated
	 */
	EAttribute getAnalysisRegion_Interferents();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.AnalysisRegion#getBaselineOrder <em>Baseline Order</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Baseline Order</em>'.
	 * @see org.tracegas.model.AnalysisRegion#getBaselineOrder()
	 * @see #getAnalysisRegion()
	 * @generated
	 */
	EAttribute getAnalysisRegion_BaselineOrder();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.AnalysisRegion#getOpenedAs <em>Opened As</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Opened As</em>'.
	 * @see org.tracegas.model.AnalysisRegion#getOpenedAs()
	 * @see #getAnalysisRegion()
	 * @generated
	 */
	EAttribute getAnalysisRegion_OpenedAs();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.Result <em>Result</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Result</em>'.
	 * @see org.tracegas.model.Result
	 * @generated
	 */
	EClass getResult();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Result#getProjectId <em>Project Id</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Project Id</em>'.
	 * @see org.tracegas.model.Result#getProjectId()
	 * @see #getResult()
	 * @generated
	 */
	EAttribute getResult_ProjectId();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Result#getMeasurementId <em>Measurement Id</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Measurement Id</em>'.
	 * @see org.tracegas.model.Result#getMeasurementId()
	 * @see #getResult()
	 * @generated
	 */
	EAttribute getResult_MeasurementId();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Result#getCompound <em>Compound</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Compound</em>'.
	 * @see org.tracegas.model.Result#getCompound()
	 * @see #getResult()
	 * @generated
	 */
	EAttribute getResult_Compound();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Result#getConcentration <em>Concentration</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Concentration</em>'.
	 * @see org.tracegas.model.Result#getConcentration()
	 * @see #getResult()
	 * @generated
	 */
	EAttribute getResult_Concentration();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Result#getStandardUncertainty <em>Standard Uncertainty</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Standard Uncertainty</em>'.
	 * @see org.tracegas.model.Result#getStandardUncertainty()
	 * @see #getResult()
	 * @generated
	 */
	EAttribute getResult_StandardUncertainty();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Result#getDetectionLimit <em>Detection Limit</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Detection Limit</em>'.
	 * @see org.tracegas.model.Result#getDetectionLimit()
	 * @see #getResult()
	 * @generated
	 */
	EAttribute getResult_DetectionLimit();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Result#getUnit <em>Unit</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Unit</em>'.
	 * @see org.tracegas.model.Result#getUnit()
	 * @see #getResult()
	 * @generated
	 */
	EAttribute getResult_Unit();

	/**
	 * Returns the meta object for the attribute list '{@link org.tracegas.model.Result#getFlags <em>Flags</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute list '<em>Flags</em>'.
	 * @see org.tracegas.model.Result#getFlags()
	 * @see #getResult()
	 * @generated
	 */
	EAttribute getResult_Flags();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Result#getProvenance <em>Provenance</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Provenance</em>'.
	 * @see org.tracegas.model.Result#getProvenance()
	 * @see #getResult()
	 * @generated
	 */
	EAttribute getResult_Provenance();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Result#getConditions <em>Conditions</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Conditions</em>'.
	 * @see org.tracegas.model.Result#getConditions()
	 * @see #getResult()
	 * @generated
	 */
	EAttribute getResult_Conditions();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Result#getRecordedBy <em>Recorded By</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Recorded By</em>'.
	 * @see org.tracegas.model.Result#getRecordedBy()
	 * @see #getResult()
	 * @generated
	 */
	EAttribute getResult_RecordedBy();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Result#getRecorded <em>Recorded</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Recorded</em>'.
	 * @see org.tracegas.model.Result#getRecorded()
	 * @see #getResult()
	 * @generated
	 */
	EAttribute getResult_Recorded();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.QaOutcome <em>Qa Outcome</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Qa Outcome</em>'.
	 * @see org.tracegas.model.QaOutcome
	 * @generated
	 */
	EClass getQaOutcome();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.QaOutcome#getProjectId <em>Project Id</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Project Id</em>'.
	 * @see org.tracegas.model.QaOutcome#getProjectId()
	 * @see #getQaOutcome()
	 * @generated
	 */
	EAttribute getQaOutcome_ProjectId();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.QaOutcome#getMethodVersionId <em>Method Version Id</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Method Version Id</em>'.
	 * @see org.tracegas.model.QaOutcome#getMethodVersionId()
	 * @see #getQaOutcome()
	 * @generated
	 */
	EAttribute getQaOutcome_MethodVersionId();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.QaOutcome#getCheck <em>Check</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Check</em>'.
	 * @see org.tracegas.model.QaOutcome#getCheck()
	 * @see #getQaOutcome()
	 * @generated
	 */
	EAttribute getQaOutcome_Check();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.QaOutcome#isPassed <em>Passed</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Passed</em>'.
	 * @see org.tracegas.model.QaOutcome#isPassed()
	 * @see #getQaOutcome()
	 * @generated
	 */
	EAttribute getQaOutcome_Passed();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.QaOutcome#getMeasured <em>Measured</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Measured</em>'.
	 * @see org.tracegas.model.QaOutcome#getMeasured()
	 * @see #getQaOutcome()
	 * @generated
	 */
	EAttribute getQaOutcome_Measured();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.QaOutcome#getUnit <em>Unit</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Unit</em>'.
	 * @see org.tracegas.model.QaOutcome#getUnit()
	 * @see #getQaOutcome()
	 * @generated
	 */
	EAttribute getQaOutcome_Unit();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.QaOutcome#getLowerLimit <em>Lower Limit</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Lower Limit</em>'.
	 * @see org.tracegas.model.QaOutcome#getLowerLimit()
	 * @see #getQaOutcome()
	 * @generated
	 */
	EAttribute getQaOutcome_LowerLimit();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.QaOutcome#getUpperLimit <em>Upper Limit</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Upper Limit</em>'.
	 * @see org.tracegas.model.QaOutcome#getUpperLimit()
	 * @see #getQaOutcome()
	 * @generated
	 */
	EAttribute getQaOutcome_UpperLimit();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.QaOutcome#getRule <em>Rule</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Rule</em>'.
	 * @see org.tracegas.model.QaOutcome#getRule()
	 * @see #getQaOutcome()
	 * @generated
	 */
	EAttribute getQaOutcome_Rule();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.QaOutcome#getSource <em>Source</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Source</em>'.
	 * @see org.tracegas.model.QaOutcome#getSource()
	 * @see #getQaOutcome()
	 * @generated
	 */
	EAttribute getQaOutcome_Source();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.QaOutcome#getRecordedBy <em>Recorded By</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Recorded By</em>'.
	 * @see org.tracegas.model.QaOutcome#getRecordedBy()
	 * @see #getQaOutcome()
	 * @generated
	 */
	EAttribute getQaOutcome_RecordedBy();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.QaOutcome#getRecorded <em>Recorded</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Recorded</em>'.
	 * @see org.tracegas.model.QaOutcome#getRecorded()
	 * @see #getQaOutcome()
	 * @generated
	 */
	EAttribute getQaOutcome_Recorded();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.WorkBatch <em>Work Batch</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Work Batch</em>'.
	 * @see org.tracegas.model.WorkBatch
	 * @generated
	 */
	EClass getWorkBatch();

	/**
	 * Returns the meta object for the container reference '{@link org.tracegas.model.WorkBatch#getProject <em>Project</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the container reference '<em>Project</em>'.
	 * @see org.tracegas.model.WorkBatch#getProject()
	 * @see #getWorkBatch()
	 * @generated
	 */
	EReference getWorkBatch_Project();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.WorkBatch#getMethodVersionId <em>Method Version Id</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Method Version Id</em>'.
	 * @see org.tracegas.model.WorkBatch#getMethodVersionId()
	 * @see #getWorkBatch()
	 * @generated
	 */
	EAttribute getWorkBatch_MethodVersionId();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.WorkBatch#getDescription <em>Description</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Description</em>'.
	 * @see org.tracegas.model.WorkBatch#getDescription()
	 * @see #getWorkBatch()
	 * @generated
	 */
	EAttribute getWorkBatch_Description();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.WorkBatch#getUnitCount <em>Unit Count</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Unit Count</em>'.
	 * @see org.tracegas.model.WorkBatch#getUnitCount()
	 * @see #getWorkBatch()
	 * @generated
	 */
	EAttribute getWorkBatch_UnitCount();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.WorkBatch#getCreatedBy <em>Created By</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Created By</em>'.
	 * @see org.tracegas.model.WorkBatch#getCreatedBy()
	 * @see #getWorkBatch()
	 * @generated
	 */
	EAttribute getWorkBatch_CreatedBy();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.WorkBatch#getCreatedAt <em>Created At</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Created At</em>'.
	 * @see org.tracegas.model.WorkBatch#getCreatedAt()
	 * @see #getWorkBatch()
	 * @generated
	 */
	EAttribute getWorkBatch_CreatedAt();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.User <em>User</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>User</em>'.
	 * @see org.tracegas.model.User
	 * @generated
	 */
	EClass getUser();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.User#getLogin <em>Login</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Login</em>'.
	 * @see org.tracegas.model.User#getLogin()
	 * @see #getUser()
	 * @generated
	 */
	EAttribute getUser_Login();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.User#getDisplayName <em>Display Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Display Name</em>'.
	 * @see org.tracegas.model.User#getDisplayName()
	 * @see #getUser()
	 * @generated
	 */
	EAttribute getUser_DisplayName();

	/**
	 * Returns the meta object for the attribute list '{@link org.tracegas.model.User#getRoles <em>Roles</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute list '<em>Roles</em>'.
	 * @see org.tracegas.model.User#getRoles()
	 * @see #getUser()
	 * @generated
	 */
	EAttribute getUser_Roles();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.User#isLocked <em>Locked</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Locked</em>'.
	 * @see org.tracegas.model.User#isLocked()
	 * @see #getUser()
	 * @generated
	 */
	EAttribute getUser_Locked();

	/**
	 * Returns the meta object for enum '{@link org.tracegas.model.AccessLevel <em>Access Level</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Access Level</em>'.
	 * @see org.tracegas.model.AccessLevel
	 * @generated
	 */
	EEnum getAccessLevel();

	/**
	 * Returns the meta object for enum '{@link org.tracegas.model.MeasurementKind <em>Measurement Kind</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Measurement Kind</em>'.
	 * @see org.tracegas.model.MeasurementKind
	 * @generated
	 */
	EEnum getMeasurementKind();

	/**
	 * Returns the meta object for enum '{@link org.tracegas.model.SpectralContent <em>Spectral Content</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Spectral Content</em>'.
	 * @see org.tracegas.model.SpectralContent
	 * @generated
	 */
	EEnum getSpectralContent();

	/**
	 * Returns the meta object for enum '{@link org.tracegas.model.VersionKind <em>Version Kind</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Version Kind</em>'.
	 * @see org.tracegas.model.VersionKind
	 * @generated
	 */
	EEnum getVersionKind();

	/**
	 * Returns the meta object for enum '{@link org.tracegas.model.ReferenceOrigin <em>Reference Origin</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Reference Origin</em>'.
	 * @see org.tracegas.model.ReferenceOrigin
	 * @generated
	 */
	EEnum getReferenceOrigin();

	/**
	 * Returns the meta object for enum '{@link org.tracegas.model.ResultFlag <em>Result Flag</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Result Flag</em>'.
	 * @see org.tracegas.model.ResultFlag
	 * @generated
	 */
	EEnum getResultFlag();

	/**
	 * Returns the meta object for enum '{@link org.tracegas.model.Role <em>Role</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Role</em>'.
	 * @see org.tracegas.model.Role
	 * @generated
	 */
	EEnum getRole();

	/**
	 * Returns the meta object for data type '{@link java.time.Instant <em>Instant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
     * <!-- begin-model-doc -->
     * A point in time (UTC), written in ISO-8601 form.
     * <!-- end-model-doc -->
	 * @return the meta object for data type '<em>Instant</em>'.
	 * @see java.time.Instant
	 * @model instanceClass="java.time.Instant"
	 * @generated
	 */
	EDataType getInstant();

	/**
	 * Returns the meta object for data type '{@link org.tracegas.spectrum.Spectrum <em>Spectrum</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
     * <!-- begin-model-doc -->
     * An immutable spectrum or interferogram: its axis and values. The store keeps the values as a block of their own, not in the model.
     * <!-- end-model-doc -->
	 * @return the meta object for data type '<em>Spectrum</em>'.
	 * @see org.tracegas.spectrum.Spectrum
	 * @model instanceClass="org.tracegas.spectrum.Spectrum" serializeable="false"
	 * @generated
	 */
	EDataType getSpectrum();

	/**
	 * Returns the meta object for data type '{@link org.tracegas.model.Provenance <em>Provenance</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
     * <!-- begin-model-doc -->
     * What made a result, as one immutable value: the method and library versions, the software version and the SHA-256 of the spectral input. The results of one fitted spectrum share it.
     * <!-- end-model-doc -->
	 * @return the meta object for data type '<em>Provenance</em>'.
	 * @see org.tracegas.model.Provenance
	 * @model instanceClass="org.tracegas.model.Provenance" serializeable="false"
	 * @generated
	 */
	EDataType getProvenance();

	/**
	 * Returns the meta object for data type '{@link org.tracegas.model.ResultConditions <em>Result Conditions</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
     * <!-- begin-model-doc -->
     * What a result was corrected with, as one immutable value: the sample cell's conditions and the references' with where each came from, the correction factor and the noise factor. A data type, not a class: the values are fixed together by the correction and checked together, and nothing edits one of them alone.
     * <!-- end-model-doc -->
	 * @return the meta object for data type '<em>Result Conditions</em>'.
	 * @see org.tracegas.model.ResultConditions
	 * @model instanceClass="org.tracegas.model.ResultConditions" serializeable="false"
	 * @generated
	 */
	EDataType getResultConditions();

	/**
	 * Returns the factory that creates the instances of the model.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the factory that creates the instances of the model.
	 * @generated
	 */
	WorkspaceFactory getWorkspaceFactory();

	/**
	 * <!-- begin-user-doc -->
	 * Defines literals for the meta objects that represent
	 * <ul>
	 *   <li>each class,</li>
	 *   <li>each feature of each class,</li>
	 *   <li>each operation of each class,</li>
	 *   <li>each enum,</li>
	 *   <li>and each data type</li>
	 * </ul>
	 * <!-- end-user-doc -->
	 * @generated
	 */
	interface Literals {
		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.StoredObjectImpl <em>Stored Object</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.StoredObjectImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getStoredObject()
		 * @generated
		 */
		EClass STORED_OBJECT = eINSTANCE.getStoredObject();

		/**
		 * The meta object literal for the '<em><b>Id</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute STORED_OBJECT__ID = eINSTANCE.getStoredObject_Id();

		/**
		 * The meta object literal for the '<em><b>Row Version</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute STORED_OBJECT__ROW_VERSION = eINSTANCE.getStoredObject_RowVersion();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.WorkspaceImpl <em>Workspace</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.WorkspaceImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getWorkspace()
		 * @generated
		 */
		EClass WORKSPACE = eINSTANCE.getWorkspace();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute WORKSPACE__NAME = eINSTANCE.getWorkspace_Name();

		/**
		 * The meta object literal for the '<em><b>Clients</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference WORKSPACE__CLIENTS = eINSTANCE.getWorkspace_Clients();

		/**
		 * The meta object literal for the '<em><b>Libraries</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference WORKSPACE__LIBRARIES = eINSTANCE.getWorkspace_Libraries();

		/**
		 * The meta object literal for the '<em><b>Methods</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference WORKSPACE__METHODS = eINSTANCE.getWorkspace_Methods();

		/**
		 * The meta object literal for the '<em><b>Instruments</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference WORKSPACE__INSTRUMENTS = eINSTANCE.getWorkspace_Instruments();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.ClientImpl <em>Client</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.ClientImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getClient()
		 * @generated
		 */
		EClass CLIENT = eINSTANCE.getClient();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CLIENT__NAME = eINSTANCE.getClient_Name();

		/**
		 * The meta object literal for the '<em><b>Contact</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CLIENT__CONTACT = eINSTANCE.getClient_Contact();

		/**
		 * The meta object literal for the '<em><b>Projects</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference CLIENT__PROJECTS = eINSTANCE.getClient_Projects();

		/**
		 * The meta object literal for the '<em><b>Sites</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference CLIENT__SITES = eINSTANCE.getClient_Sites();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.ProjectImpl <em>Project</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.ProjectImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getProject()
		 * @generated
		 */
		EClass PROJECT = eINSTANCE.getProject();

		/**
		 * The meta object literal for the '<em><b>Code</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PROJECT__CODE = eINSTANCE.getProject_Code();

		/**
		 * The meta object literal for the '<em><b>Client</b></em>' container reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__CLIENT = eINSTANCE.getProject_Client();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PROJECT__NAME = eINSTANCE.getProject_Name();

		/**
		 * The meta object literal for the '<em><b>Start</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PROJECT__START = eINSTANCE.getProject_Start();

		/**
		 * The meta object literal for the '<em><b>End</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PROJECT__END = eINSTANCE.getProject_End();

		/**
		 * The meta object literal for the '<em><b>Measurements</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__MEASUREMENTS = eINSTANCE.getProject_Measurements();

		/**
		 * The meta object literal for the '<em><b>Reports</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__REPORTS = eINSTANCE.getProject_Reports();

		/**
		 * The meta object literal for the '<em><b>Batches</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__BATCHES = eINSTANCE.getProject_Batches();

		/**
		 * The meta object literal for the '<em><b>Source</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__SOURCE = eINSTANCE.getProject_Source();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.SiteImpl <em>Site</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.SiteImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getSite()
		 * @generated
		 */
		EClass SITE = eINSTANCE.getSite();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SITE__NAME = eINSTANCE.getSite_Name();

		/**
		 * The meta object literal for the '<em><b>Description</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SITE__DESCRIPTION = eINSTANCE.getSite_Description();

		/**
		 * The meta object literal for the '<em><b>Client</b></em>' container reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference SITE__CLIENT = eINSTANCE.getSite_Client();

		/**
		 * The meta object literal for the '<em><b>Sources</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference SITE__SOURCES = eINSTANCE.getSite_Sources();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.EmissionSourceImpl <em>Emission Source</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.EmissionSourceImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getEmissionSource()
		 * @generated
		 */
		EClass EMISSION_SOURCE = eINSTANCE.getEmissionSource();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute EMISSION_SOURCE__NAME = eINSTANCE.getEmissionSource_Name();

		/**
		 * The meta object literal for the '<em><b>Description</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute EMISSION_SOURCE__DESCRIPTION = eINSTANCE.getEmissionSource_Description();

		/**
		 * The meta object literal for the '<em><b>Site</b></em>' container reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference EMISSION_SOURCE__SITE = eINSTANCE.getEmissionSource_Site();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.MeasurementImpl <em>Measurement</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.MeasurementImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getMeasurement()
		 * @generated
		 */
		EClass MEASUREMENT = eINSTANCE.getMeasurement();

		/**
		 * The meta object literal for the '<em><b>Project</b></em>' container reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference MEASUREMENT__PROJECT = eINSTANCE.getMeasurement_Project();

		/**
		 * The meta object literal for the '<em><b>Kind</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute MEASUREMENT__KIND = eINSTANCE.getMeasurement_Kind();

		/**
		 * The meta object literal for the '<em><b>Time</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute MEASUREMENT__TIME = eINSTANCE.getMeasurement_Time();

		/**
		 * The meta object literal for the '<em><b>Cell Temperature</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute MEASUREMENT__CELL_TEMPERATURE = eINSTANCE.getMeasurement_CellTemperature();

		/**
		 * The meta object literal for the '<em><b>Cell Pressure</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute MEASUREMENT__CELL_PRESSURE = eINSTANCE.getMeasurement_CellPressure();

		/**
		 * The meta object literal for the '<em><b>Operator Id</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute MEASUREMENT__OPERATOR_ID = eINSTANCE.getMeasurement_OperatorId();

		/**
		 * The meta object literal for the '<em><b>Title</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute MEASUREMENT__TITLE = eINSTANCE.getMeasurement_Title();

		/**
		 * The meta object literal for the '<em><b>Labels</b></em>' map feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference MEASUREMENT__LABELS = eINSTANCE.getMeasurement_Labels();

		/**
		 * The meta object literal for the '<em><b>Content</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute MEASUREMENT__CONTENT = eINSTANCE.getMeasurement_Content();

		/**
		 * The meta object literal for the '<em><b>Spectrum Id</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute MEASUREMENT__SPECTRUM_ID = eINSTANCE.getMeasurement_SpectrumId();

		/**
		 * The meta object literal for the '<em><b>Spectrum</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute MEASUREMENT__SPECTRUM = eINSTANCE.getMeasurement_Spectrum();

		/**
		 * The meta object literal for the '<em><b>Source File</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute MEASUREMENT__SOURCE_FILE = eINSTANCE.getMeasurement_SourceFile();

		/**
		 * The meta object literal for the '<em><b>Source Sha256</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute MEASUREMENT__SOURCE_SHA256 = eINSTANCE.getMeasurement_SourceSha256();

		/**
		 * The meta object literal for the '<em><b>Source Record</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute MEASUREMENT__SOURCE_RECORD = eINSTANCE.getMeasurement_SourceRecord();

		/**
		 * The meta object literal for the '<em><b>Instrument</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference MEASUREMENT__INSTRUMENT = eINSTANCE.getMeasurement_Instrument();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.InstrumentImpl <em>Instrument</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.InstrumentImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getInstrument()
		 * @generated
		 */
		EClass INSTRUMENT = eINSTANCE.getInstrument();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute INSTRUMENT__NAME = eINSTANCE.getInstrument_Name();

		/**
		 * The meta object literal for the '<em><b>Serial Number</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute INSTRUMENT__SERIAL_NUMBER = eINSTANCE.getInstrument_SerialNumber();

		/**
		 * The meta object literal for the '<em><b>Laser Wavenumber</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute INSTRUMENT__LASER_WAVENUMBER = eINSTANCE.getInstrument_LaserWavenumber();

		/**
		 * The meta object literal for the '<em><b>Max Path Difference</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute INSTRUMENT__MAX_PATH_DIFFERENCE = eINSTANCE.getInstrument_MaxPathDifference();

		/**
		 * The meta object literal for the '<em><b>Field Of View</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute INSTRUMENT__FIELD_OF_VIEW = eINSTANCE.getInstrument_FieldOfView();

		/**
		 * The meta object literal for the '<em><b>Cell Path Length</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute INSTRUMENT__CELL_PATH_LENGTH = eINSTANCE.getInstrument_CellPathLength();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.ProcessedSpectrumImpl <em>Processed Spectrum</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.ProcessedSpectrumImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getProcessedSpectrum()
		 * @generated
		 */
		EClass PROCESSED_SPECTRUM = eINSTANCE.getProcessedSpectrum();

		/**
		 * The meta object literal for the '<em><b>Measurement Id</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PROCESSED_SPECTRUM__MEASUREMENT_ID = eINSTANCE.getProcessedSpectrum_MeasurementId();

		/**
		 * The meta object literal for the '<em><b>Content</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PROCESSED_SPECTRUM__CONTENT = eINSTANCE.getProcessedSpectrum_Content();

		/**
		 * The meta object literal for the '<em><b>Sample Encoding</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PROCESSED_SPECTRUM__SAMPLE_ENCODING = eINSTANCE.getProcessedSpectrum_SampleEncoding();

		/**
		 * The meta object literal for the '<em><b>Sha256</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PROCESSED_SPECTRUM__SHA256 = eINSTANCE.getProcessedSpectrum_Sha256();

		/**
		 * The meta object literal for the '<em><b>Recipe Sha256</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PROCESSED_SPECTRUM__RECIPE_SHA256 = eINSTANCE.getProcessedSpectrum_RecipeSha256();

		/**
		 * The meta object literal for the '<em><b>Spectrum</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PROCESSED_SPECTRUM__SPECTRUM = eINSTANCE.getProcessedSpectrum_Spectrum();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.ReportImpl <em>Report</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.ReportImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getReport()
		 * @generated
		 */
		EClass REPORT = eINSTANCE.getReport();

		/**
		 * The meta object literal for the '<em><b>Project</b></em>' container reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference REPORT__PROJECT = eINSTANCE.getReport_Project();

		/**
		 * The meta object literal for the '<em><b>Report Id</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REPORT__REPORT_ID = eINSTANCE.getReport_ReportId();

		/**
		 * The meta object literal for the '<em><b>Title</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REPORT__TITLE = eINSTANCE.getReport_Title();

		/**
		 * The meta object literal for the '<em><b>Issued</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REPORT__ISSUED = eINSTANCE.getReport_Issued();

		/**
		 * The meta object literal for the '<em><b>Issued By</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REPORT__ISSUED_BY = eINSTANCE.getReport_IssuedBy();

		/**
		 * The meta object literal for the '<em><b>Content Sha256</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REPORT__CONTENT_SHA256 = eINSTANCE.getReport_ContentSha256();

		/**
		 * The meta object literal for the '<em><b>File Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REPORT__FILE_NAME = eINSTANCE.getReport_FileName();

		/**
		 * The meta object literal for the '<em><b>Page Count</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REPORT__PAGE_COUNT = eINSTANCE.getReport_PageCount();

		/**
		 * The meta object literal for the '<em><b>Method Version Id</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REPORT__METHOD_VERSION_ID = eINSTANCE.getReport_MethodVersionId();

		/**
		 * The meta object literal for the '<em><b>Library Version Id</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REPORT__LIBRARY_VERSION_ID = eINSTANCE.getReport_LibraryVersionId();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.ContentVersionImpl <em>Content Version</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.ContentVersionImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getContentVersion()
		 * @generated
		 */
		EClass CONTENT_VERSION = eINSTANCE.getContentVersion();

		/**
		 * The meta object literal for the '<em><b>Kind</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTENT_VERSION__KIND = eINSTANCE.getContentVersion_Kind();

		/**
		 * The meta object literal for the '<em><b>Item Id</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTENT_VERSION__ITEM_ID = eINSTANCE.getContentVersion_ItemId();

		/**
		 * The meta object literal for the '<em><b>Item Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTENT_VERSION__ITEM_NAME = eINSTANCE.getContentVersion_ItemName();

		/**
		 * The meta object literal for the '<em><b>Number</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTENT_VERSION__NUMBER = eINSTANCE.getContentVersion_Number();

		/**
		 * The meta object literal for the '<em><b>Parent Id</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTENT_VERSION__PARENT_ID = eINSTANCE.getContentVersion_ParentId();

		/**
		 * The meta object literal for the '<em><b>Author Id</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTENT_VERSION__AUTHOR_ID = eINSTANCE.getContentVersion_AuthorId();

		/**
		 * The meta object literal for the '<em><b>Reason</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTENT_VERSION__REASON = eINSTANCE.getContentVersion_Reason();

		/**
		 * The meta object literal for the '<em><b>Created</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTENT_VERSION__CREATED = eINSTANCE.getContentVersion_Created();

		/**
		 * The meta object literal for the '<em><b>Content Hash</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTENT_VERSION__CONTENT_HASH = eINSTANCE.getContentVersion_ContentHash();

		/**
		 * The meta object literal for the '<em><b>Frozen</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTENT_VERSION__FROZEN = eINSTANCE.getContentVersion_Frozen();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.ReferenceLibraryImpl <em>Reference Library</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.ReferenceLibraryImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getReferenceLibrary()
		 * @generated
		 */
		EClass REFERENCE_LIBRARY = eINSTANCE.getReferenceLibrary();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REFERENCE_LIBRARY__NAME = eINSTANCE.getReferenceLibrary_Name();

		/**
		 * The meta object literal for the '<em><b>Description</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REFERENCE_LIBRARY__DESCRIPTION = eINSTANCE.getReferenceLibrary_Description();

		/**
		 * The meta object literal for the '<em><b>References</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference REFERENCE_LIBRARY__REFERENCES = eINSTANCE.getReferenceLibrary_References();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.ReferenceSpectrumImpl <em>Reference Spectrum</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.ReferenceSpectrumImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getReferenceSpectrum()
		 * @generated
		 */
		EClass REFERENCE_SPECTRUM = eINSTANCE.getReferenceSpectrum();

		/**
		 * The meta object literal for the '<em><b>Compound</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REFERENCE_SPECTRUM__COMPOUND = eINSTANCE.getReferenceSpectrum_Compound();

		/**
		 * The meta object literal for the '<em><b>Cas Number</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REFERENCE_SPECTRUM__CAS_NUMBER = eINSTANCE.getReferenceSpectrum_CasNumber();

		/**
		 * The meta object literal for the '<em><b>Ppm Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REFERENCE_SPECTRUM__PPM_METRES = eINSTANCE.getReferenceSpectrum_PpmMetres();

		/**
		 * The meta object literal for the '<em><b>Temperature</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REFERENCE_SPECTRUM__TEMPERATURE = eINSTANCE.getReferenceSpectrum_Temperature();

		/**
		 * The meta object literal for the '<em><b>Pressure</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REFERENCE_SPECTRUM__PRESSURE = eINSTANCE.getReferenceSpectrum_Pressure();

		/**
		 * The meta object literal for the '<em><b>Resolution</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REFERENCE_SPECTRUM__RESOLUTION = eINSTANCE.getReferenceSpectrum_Resolution();

		/**
		 * The meta object literal for the '<em><b>Apodization</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REFERENCE_SPECTRUM__APODIZATION = eINSTANCE.getReferenceSpectrum_Apodization();

		/**
		 * The meta object literal for the '<em><b>Origin</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REFERENCE_SPECTRUM__ORIGIN = eINSTANCE.getReferenceSpectrum_Origin();

		/**
		 * The meta object literal for the '<em><b>Origin Text</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REFERENCE_SPECTRUM__ORIGIN_TEXT = eINSTANCE.getReferenceSpectrum_OriginText();

		/**
		 * The meta object literal for the '<em><b>Content Sha256</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REFERENCE_SPECTRUM__CONTENT_SHA256 = eINSTANCE.getReferenceSpectrum_ContentSha256();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.AnalysisMethodImpl <em>Analysis Method</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.AnalysisMethodImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getAnalysisMethod()
		 * @generated
		 */
		EClass ANALYSIS_METHOD = eINSTANCE.getAnalysisMethod();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALYSIS_METHOD__NAME = eINSTANCE.getAnalysisMethod_Name();

		/**
		 * The meta object literal for the '<em><b>Description</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALYSIS_METHOD__DESCRIPTION = eINSTANCE.getAnalysisMethod_Description();

		/**
		 * The meta object literal for the '<em><b>Versions</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference ANALYSIS_METHOD__VERSIONS = eINSTANCE.getAnalysisMethod_Versions();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.MethodVersionImpl <em>Method Version</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.MethodVersionImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getMethodVersion()
		 * @generated
		 */
		EClass METHOD_VERSION = eINSTANCE.getMethodVersion();

		/**
		 * The meta object literal for the '<em><b>Regions</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference METHOD_VERSION__REGIONS = eINSTANCE.getMethodVersion_Regions();

		/**
		 * The meta object literal for the '<em><b>Path Length</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute METHOD_VERSION__PATH_LENGTH = eINSTANCE.getMethodVersion_PathLength();

		/**
		 * The meta object literal for the '<em><b>Max Iterations</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute METHOD_VERSION__MAX_ITERATIONS = eINSTANCE.getMethodVersion_MaxIterations();

		/**
		 * The meta object literal for the '<em><b>Algorithm</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute METHOD_VERSION__ALGORITHM = eINSTANCE.getMethodVersion_Algorithm();

		/**
		 * The meta object literal for the '<em><b>Path Source</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute METHOD_VERSION__PATH_SOURCE = eINSTANCE.getMethodVersion_PathSource();

		/**
		 * The meta object literal for the '<em><b>Nonlinearity</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute METHOD_VERSION__NONLINEARITY = eINSTANCE.getMethodVersion_Nonlinearity();

		/**
		 * The meta object literal for the '<em><b>Tolerance</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute METHOD_VERSION__TOLERANCE = eINSTANCE.getMethodVersion_Tolerance();

		/**
		 * The meta object literal for the '<em><b>Max Absorbance</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute METHOD_VERSION__MAX_ABSORBANCE = eINSTANCE.getMethodVersion_MaxAbsorbance();

		/**
		 * The meta object literal for the '<em><b>Shift Term</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute METHOD_VERSION__SHIFT_TERM = eINSTANCE.getMethodVersion_ShiftTerm();

		/**
		 * The meta object literal for the '<em><b>Reporting Unit</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute METHOD_VERSION__REPORTING_UNIT = eINSTANCE.getMethodVersion_ReportingUnit();

		/**
		 * The meta object literal for the '<em><b>Recipe Steps</b></em>' attribute list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute METHOD_VERSION__RECIPE_STEPS = eINSTANCE.getMethodVersion_RecipeSteps();

		/**
		 * The meta object literal for the '<em><b>Cell Conditions</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute METHOD_VERSION__CELL_CONDITIONS = eINSTANCE.getMethodVersion_CellConditions();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.AnalysisRegionImpl <em>Analysis Region</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.AnalysisRegionImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getAnalysisRegion()
		 * @generated
		 */
		EClass ANALYSIS_REGION = eINSTANCE.getAnalysisRegion();

		/**
		 * The meta object literal for the '<em><b>Compound</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALYSIS_REGION__COMPOUND = eINSTANCE.getAnalysisRegion_Compound();

		/**
		 * The meta object literal for the '<em><b>Lower Wavenumber</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALYSIS_REGION__LOWER_WAVENUMBER = eINSTANCE.getAnalysisRegion_LowerWavenumber();

		/**
		 * The meta object literal for the '<em><b>Upper Wavenumber</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALYSIS_REGION__UPPER_WAVENUMBER = eINSTANCE.getAnalysisRegion_UpperWavenumber();

		/**
		 * The meta object literal for the '<em><b>Interferents</b></em>' attribute list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALYSIS_REGION__INTERFERENTS = eINSTANCE.getAnalysisRegion_Interferents();

		/**
		 * The meta object literal for the '<em><b>Baseline Order</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALYSIS_REGION__BASELINE_ORDER = eINSTANCE.getAnalysisRegion_BaselineOrder();

		/**
		 * The meta object literal for the '<em><b>Opened As</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALYSIS_REGION__OPENED_AS = eINSTANCE.getAnalysisRegion_OpenedAs();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.ResultImpl <em>Result</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.ResultImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getResult()
		 * @generated
		 */
		EClass RESULT = eINSTANCE.getResult();

		/**
		 * The meta object literal for the '<em><b>Project Id</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RESULT__PROJECT_ID = eINSTANCE.getResult_ProjectId();

		/**
		 * The meta object literal for the '<em><b>Measurement Id</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RESULT__MEASUREMENT_ID = eINSTANCE.getResult_MeasurementId();

		/**
		 * The meta object literal for the '<em><b>Compound</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RESULT__COMPOUND = eINSTANCE.getResult_Compound();

		/**
		 * The meta object literal for the '<em><b>Concentration</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RESULT__CONCENTRATION = eINSTANCE.getResult_Concentration();

		/**
		 * The meta object literal for the '<em><b>Standard Uncertainty</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RESULT__STANDARD_UNCERTAINTY = eINSTANCE.getResult_StandardUncertainty();

		/**
		 * The meta object literal for the '<em><b>Detection Limit</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RESULT__DETECTION_LIMIT = eINSTANCE.getResult_DetectionLimit();

		/**
		 * The meta object literal for the '<em><b>Unit</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RESULT__UNIT = eINSTANCE.getResult_Unit();

		/**
		 * The meta object literal for the '<em><b>Flags</b></em>' attribute list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RESULT__FLAGS = eINSTANCE.getResult_Flags();

		/**
		 * The meta object literal for the '<em><b>Provenance</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RESULT__PROVENANCE = eINSTANCE.getResult_Provenance();

		/**
		 * The meta object literal for the '<em><b>Conditions</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RESULT__CONDITIONS = eINSTANCE.getResult_Conditions();

		/**
		 * The meta object literal for the '<em><b>Recorded By</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RESULT__RECORDED_BY = eINSTANCE.getResult_RecordedBy();

		/**
		 * The meta object literal for the '<em><b>Recorded</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RESULT__RECORDED = eINSTANCE.getResult_Recorded();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.QaOutcomeImpl <em>Qa Outcome</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.QaOutcomeImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getQaOutcome()
		 * @generated
		 */
		EClass QA_OUTCOME = eINSTANCE.getQaOutcome();

		/**
		 * The meta object literal for the '<em><b>Project Id</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QA_OUTCOME__PROJECT_ID = eINSTANCE.getQaOutcome_ProjectId();

		/**
		 * The meta object literal for the '<em><b>Method Version Id</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QA_OUTCOME__METHOD_VERSION_ID = eINSTANCE.getQaOutcome_MethodVersionId();

		/**
		 * The meta object literal for the '<em><b>Check</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QA_OUTCOME__CHECK = eINSTANCE.getQaOutcome_Check();

		/**
		 * The meta object literal for the '<em><b>Passed</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QA_OUTCOME__PASSED = eINSTANCE.getQaOutcome_Passed();

		/**
		 * The meta object literal for the '<em><b>Measured</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QA_OUTCOME__MEASURED = eINSTANCE.getQaOutcome_Measured();

		/**
		 * The meta object literal for the '<em><b>Unit</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QA_OUTCOME__UNIT = eINSTANCE.getQaOutcome_Unit();

		/**
		 * The meta object literal for the '<em><b>Lower Limit</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QA_OUTCOME__LOWER_LIMIT = eINSTANCE.getQaOutcome_LowerLimit();

		/**
		 * The meta object literal for the '<em><b>Upper Limit</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QA_OUTCOME__UPPER_LIMIT = eINSTANCE.getQaOutcome_UpperLimit();

		/**
		 * The meta object literal for the '<em><b>Rule</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QA_OUTCOME__RULE = eINSTANCE.getQaOutcome_Rule();

		/**
		 * The meta object literal for the '<em><b>Source</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QA_OUTCOME__SOURCE = eINSTANCE.getQaOutcome_Source();

		/**
		 * The meta object literal for the '<em><b>Recorded By</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QA_OUTCOME__RECORDED_BY = eINSTANCE.getQaOutcome_RecordedBy();

		/**
		 * The meta object literal for the '<em><b>Recorded</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QA_OUTCOME__RECORDED = eINSTANCE.getQaOutcome_Recorded();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.WorkBatchImpl <em>Work Batch</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.WorkBatchImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getWorkBatch()
		 * @generated
		 */
		EClass WORK_BATCH = eINSTANCE.getWorkBatch();

		/**
		 * The meta object literal for the '<em><b>Project</b></em>' container reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference WORK_BATCH__PROJECT = eINSTANCE.getWorkBatch_Project();

		/**
		 * The meta object literal for the '<em><b>Method Version Id</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute WORK_BATCH__METHOD_VERSION_ID = eINSTANCE.getWorkBatch_MethodVersionId();

		/**
		 * The meta object literal for the '<em><b>Description</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute WORK_BATCH__DESCRIPTION = eINSTANCE.getWorkBatch_Description();

		/**
		 * The meta object literal for the '<em><b>Unit Count</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute WORK_BATCH__UNIT_COUNT = eINSTANCE.getWorkBatch_UnitCount();

		/**
		 * The meta object literal for the '<em><b>Created By</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute WORK_BATCH__CREATED_BY = eINSTANCE.getWorkBatch_CreatedBy();

		/**
		 * The meta object literal for the '<em><b>Created At</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute WORK_BATCH__CREATED_AT = eINSTANCE.getWorkBatch_CreatedAt();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.UserImpl <em>User</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.UserImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getUser()
		 * @generated
		 */
		EClass USER = eINSTANCE.getUser();

		/**
		 * The meta object literal for the '<em><b>Login</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute USER__LOGIN = eINSTANCE.getUser_Login();

		/**
		 * The meta object literal for the '<em><b>Display Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute USER__DISPLAY_NAME = eINSTANCE.getUser_DisplayName();

		/**
		 * The meta object literal for the '<em><b>Roles</b></em>' attribute list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute USER__ROLES = eINSTANCE.getUser_Roles();

		/**
		 * The meta object literal for the '<em><b>Locked</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute USER__LOCKED = eINSTANCE.getUser_Locked();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.AccessLevel <em>Access Level</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.AccessLevel
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getAccessLevel()
		 * @generated
		 */
		EEnum ACCESS_LEVEL = eINSTANCE.getAccessLevel();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.MeasurementKind <em>Measurement Kind</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.MeasurementKind
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getMeasurementKind()
		 * @generated
		 */
		EEnum MEASUREMENT_KIND = eINSTANCE.getMeasurementKind();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.SpectralContent <em>Spectral Content</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.SpectralContent
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getSpectralContent()
		 * @generated
		 */
		EEnum SPECTRAL_CONTENT = eINSTANCE.getSpectralContent();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.VersionKind <em>Version Kind</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.VersionKind
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getVersionKind()
		 * @generated
		 */
		EEnum VERSION_KIND = eINSTANCE.getVersionKind();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.ReferenceOrigin <em>Reference Origin</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.ReferenceOrigin
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getReferenceOrigin()
		 * @generated
		 */
		EEnum REFERENCE_ORIGIN = eINSTANCE.getReferenceOrigin();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.ResultFlag <em>Result Flag</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.ResultFlag
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getResultFlag()
		 * @generated
		 */
		EEnum RESULT_FLAG = eINSTANCE.getResultFlag();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.Role <em>Role</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.Role
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getRole()
		 * @generated
		 */
		EEnum ROLE = eINSTANCE.getRole();

		/**
		 * The meta object literal for the '<em>Instant</em>' data type.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see java.time.Instant
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getInstant()
		 * @generated
		 */
		EDataType INSTANT = eINSTANCE.getInstant();

		/**
		 * The meta object literal for the '<em>Spectrum</em>' data type.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.spectrum.Spectrum
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getSpectrum()
		 * @generated
		 */
		EDataType SPECTRUM = eINSTANCE.getSpectrum();

		/**
		 * The meta object literal for the '<em>Provenance</em>' data type.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.Provenance
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getProvenance()
		 * @generated
		 */
		EDataType PROVENANCE = eINSTANCE.getProvenance();

		/**
		 * The meta object literal for the '<em>Result Conditions</em>' data type.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.ResultConditions
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getResultConditions()
		 * @generated
		 */
		EDataType RESULT_CONDITIONS = eINSTANCE.getResultConditions();

	}

} //WorkspacePackage
