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
 * The workspace of an FTIR gas-analysis laboratory: clients, campaigns, instruments, measurements, reference libraries, methods, analysis results, QA and users.
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
	 * The feature id for the '<em><b>Instruments</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORKSPACE__INSTRUMENTS = 2;

	/**
	 * The feature id for the '<em><b>Libraries</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORKSPACE__LIBRARIES = 3;

	/**
	 * The feature id for the '<em><b>Methods</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORKSPACE__METHODS = 4;

	/**
	 * The feature id for the '<em><b>Users</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORKSPACE__USERS = 5;

	/**
	 * The number of structural features of the '<em>Workspace</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int WORKSPACE_FEATURE_COUNT = 6;

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
	 * The feature id for the '<em><b>Sites</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLIENT__SITES = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Projects</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLIENT__PROJECTS = STORED_OBJECT_FEATURE_COUNT + 3;

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
	 * The meta object id for the '{@link org.tracegas.model.impl.SiteImpl <em>Site</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.SiteImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getSite()
	 * @generated
	 */
	int SITE = 3;

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
	 * The feature id for the '<em><b>Address</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE__ADDRESS = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Sources</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE__SOURCES = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The number of structural features of the '<em>Site</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 3;

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
	int EMISSION_SOURCE = 4;

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
	 * The feature id for the '<em><b>Duct Diameter</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int EMISSION_SOURCE__DUCT_DIAMETER = STORED_OBJECT_FEATURE_COUNT + 2;

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
	 * The meta object id for the '{@link org.tracegas.model.impl.ProjectImpl <em>Project</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.ProjectImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getProject()
	 * @generated
	 */
	int PROJECT = 5;

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
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__NAME = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Start</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__START = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>End</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__END = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Sources</b></em>' reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__SOURCES = STORED_OBJECT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Grants</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__GRANTS = STORED_OBJECT_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Measurements</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__MEASUREMENTS = STORED_OBJECT_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>Runs</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__RUNS = STORED_OBJECT_FEATURE_COUNT + 7;

	/**
	 * The feature id for the '<em><b>Reports</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__REPORTS = STORED_OBJECT_FEATURE_COUNT + 8;

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
	 * The meta object id for the '{@link org.tracegas.model.impl.ProjectGrantImpl <em>Project Grant</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.ProjectGrantImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getProjectGrant()
	 * @generated
	 */
	int PROJECT_GRANT = 6;

	/**
	 * The feature id for the '<em><b>User</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT_GRANT__USER = 0;

	/**
	 * The feature id for the '<em><b>Access</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT_GRANT__ACCESS = 1;

	/**
	 * The number of structural features of the '<em>Project Grant</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT_GRANT_FEATURE_COUNT = 2;

	/**
	 * The number of operations of the '<em>Project Grant</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT_GRANT_OPERATION_COUNT = 0;

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
	 * The feature id for the '<em><b>Cell Path Length</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int INSTRUMENT__CELL_PATH_LENGTH = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Cell Temperature</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int INSTRUMENT__CELL_TEMPERATURE = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Resolution</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int INSTRUMENT__RESOLUTION = STORED_OBJECT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Laser Wavenumber</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int INSTRUMENT__LASER_WAVENUMBER = STORED_OBJECT_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Detector</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int INSTRUMENT__DETECTOR = STORED_OBJECT_FEATURE_COUNT + 6;

	/**
	 * The number of structural features of the '<em>Instrument</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int INSTRUMENT_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 7;

	/**
	 * The number of operations of the '<em>Instrument</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int INSTRUMENT_OPERATION_COUNT = STORED_OBJECT_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.MeasurementImpl <em>Measurement</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.MeasurementImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getMeasurement()
	 * @generated
	 */
	int MEASUREMENT = 8;

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
	 * The feature id for the '<em><b>Kind</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__KIND = STORED_OBJECT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Time</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__TIME = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Cell Temperature</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__CELL_TEMPERATURE = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Cell Pressure</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__CELL_PRESSURE = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Operator</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__OPERATOR = STORED_OBJECT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Instrument</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__INSTRUMENT = STORED_OBJECT_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Source</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__SOURCE = STORED_OBJECT_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>Data</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT__DATA = STORED_OBJECT_FEATURE_COUNT + 7;

	/**
	 * The number of structural features of the '<em>Measurement</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 8;

	/**
	 * The number of operations of the '<em>Measurement</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MEASUREMENT_OPERATION_COUNT = STORED_OBJECT_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.SpectralDataRefImpl <em>Spectral Data Ref</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.SpectralDataRefImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getSpectralDataRef()
	 * @generated
	 */
	int SPECTRAL_DATA_REF = 9;

	/**
	 * The feature id for the '<em><b>Data Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SPECTRAL_DATA_REF__DATA_ID = 0;

	/**
	 * The feature id for the '<em><b>Uri</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SPECTRAL_DATA_REF__URI = 1;

	/**
	 * The feature id for the '<em><b>Content</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SPECTRAL_DATA_REF__CONTENT = 2;

	/**
	 * The feature id for the '<em><b>Point Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SPECTRAL_DATA_REF__POINT_COUNT = 3;

	/**
	 * The feature id for the '<em><b>Sha256</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SPECTRAL_DATA_REF__SHA256 = 4;

	/**
	 * The number of structural features of the '<em>Spectral Data Ref</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SPECTRAL_DATA_REF_FEATURE_COUNT = 5;

	/**
	 * The number of operations of the '<em>Spectral Data Ref</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SPECTRAL_DATA_REF_OPERATION_COUNT = 0;

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
	 * The feature id for the '<em><b>Number</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION__NUMBER = STORED_OBJECT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Parent</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION__PARENT = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Author</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION__AUTHOR = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Reason</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION__REASON = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Created</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION__CREATED = STORED_OBJECT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Content Hash</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION__CONTENT_HASH = STORED_OBJECT_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Frozen</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION__FROZEN = STORED_OBJECT_FEATURE_COUNT + 6;

	/**
	 * The number of structural features of the '<em>Content Version</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTENT_VERSION_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 7;

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
	 * The feature id for the '<em><b>Versions</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_LIBRARY__VERSIONS = STORED_OBJECT_FEATURE_COUNT + 2;

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
	 * The meta object id for the '{@link org.tracegas.model.impl.LibraryVersionImpl <em>Library Version</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.LibraryVersionImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getLibraryVersion()
	 * @generated
	 */
	int LIBRARY_VERSION = 12;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIBRARY_VERSION__ID = CONTENT_VERSION__ID;

	/**
	 * The feature id for the '<em><b>Row Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIBRARY_VERSION__ROW_VERSION = CONTENT_VERSION__ROW_VERSION;

	/**
	 * The feature id for the '<em><b>Number</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIBRARY_VERSION__NUMBER = CONTENT_VERSION__NUMBER;

	/**
	 * The feature id for the '<em><b>Parent</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIBRARY_VERSION__PARENT = CONTENT_VERSION__PARENT;

	/**
	 * The feature id for the '<em><b>Author</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIBRARY_VERSION__AUTHOR = CONTENT_VERSION__AUTHOR;

	/**
	 * The feature id for the '<em><b>Reason</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIBRARY_VERSION__REASON = CONTENT_VERSION__REASON;

	/**
	 * The feature id for the '<em><b>Created</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIBRARY_VERSION__CREATED = CONTENT_VERSION__CREATED;

	/**
	 * The feature id for the '<em><b>Content Hash</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIBRARY_VERSION__CONTENT_HASH = CONTENT_VERSION__CONTENT_HASH;

	/**
	 * The feature id for the '<em><b>Frozen</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIBRARY_VERSION__FROZEN = CONTENT_VERSION__FROZEN;

	/**
	 * The feature id for the '<em><b>Spectra</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIBRARY_VERSION__SPECTRA = CONTENT_VERSION_FEATURE_COUNT + 0;

	/**
	 * The number of structural features of the '<em>Library Version</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIBRARY_VERSION_FEATURE_COUNT = CONTENT_VERSION_FEATURE_COUNT + 1;

	/**
	 * The number of operations of the '<em>Library Version</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIBRARY_VERSION_OPERATION_COUNT = CONTENT_VERSION_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.ReferenceSpectrumImpl <em>Reference Spectrum</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.ReferenceSpectrumImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getReferenceSpectrum()
	 * @generated
	 */
	int REFERENCE_SPECTRUM = 13;

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
	 * The feature id for the '<em><b>Concentration Path Length</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_SPECTRUM__CONCENTRATION_PATH_LENGTH = 2;

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
	 * The feature id for the '<em><b>Data</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_SPECTRUM__DATA = 7;

	/**
	 * The number of structural features of the '<em>Reference Spectrum</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REFERENCE_SPECTRUM_FEATURE_COUNT = 8;

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
	int ANALYSIS_METHOD = 14;

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
	int METHOD_VERSION = 15;

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
	 * The feature id for the '<em><b>Number</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__NUMBER = CONTENT_VERSION__NUMBER;

	/**
	 * The feature id for the '<em><b>Parent</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__PARENT = CONTENT_VERSION__PARENT;

	/**
	 * The feature id for the '<em><b>Author</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__AUTHOR = CONTENT_VERSION__AUTHOR;

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
	 * The feature id for the '<em><b>Library</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__LIBRARY = CONTENT_VERSION_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Regions</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION__REGIONS = CONTENT_VERSION_FEATURE_COUNT + 1;

	/**
	 * The number of structural features of the '<em>Method Version</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int METHOD_VERSION_FEATURE_COUNT = CONTENT_VERSION_FEATURE_COUNT + 2;

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
	int ANALYSIS_REGION = 16;

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
	 * The number of structural features of the '<em>Analysis Region</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_REGION_FEATURE_COUNT = 4;

	/**
	 * The number of operations of the '<em>Analysis Region</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_REGION_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.AnalysisRunImpl <em>Analysis Run</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.AnalysisRunImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getAnalysisRun()
	 * @generated
	 */
	int ANALYSIS_RUN = 17;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_RUN__ID = STORED_OBJECT__ID;

	/**
	 * The feature id for the '<em><b>Row Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_RUN__ROW_VERSION = STORED_OBJECT__ROW_VERSION;

	/**
	 * The feature id for the '<em><b>Started</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_RUN__STARTED = STORED_OBJECT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Finished</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_RUN__FINISHED = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Status</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_RUN__STATUS = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Software Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_RUN__SOFTWARE_VERSION = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Analyst</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_RUN__ANALYST = STORED_OBJECT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Method</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_RUN__METHOD = STORED_OBJECT_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Library</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_RUN__LIBRARY = STORED_OBJECT_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>Measurements</b></em>' reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_RUN__MEASUREMENTS = STORED_OBJECT_FEATURE_COUNT + 7;

	/**
	 * The feature id for the '<em><b>Results</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_RUN__RESULTS = STORED_OBJECT_FEATURE_COUNT + 8;

	/**
	 * The feature id for the '<em><b>Qa Checks</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_RUN__QA_CHECKS = STORED_OBJECT_FEATURE_COUNT + 9;

	/**
	 * The number of structural features of the '<em>Analysis Run</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_RUN_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 10;

	/**
	 * The number of operations of the '<em>Analysis Run</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALYSIS_RUN_OPERATION_COUNT = STORED_OBJECT_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.ResultImpl <em>Result</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.ResultImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getResult()
	 * @generated
	 */
	int RESULT = 18;

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
	 * The feature id for the '<em><b>Measurement</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__MEASUREMENT = STORED_OBJECT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Compound</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__COMPOUND = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Concentration</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__CONCENTRATION = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Uncertainty</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__UNCERTAINTY = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Detection Limit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__DETECTION_LIMIT = STORED_OBJECT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__UNIT = STORED_OBJECT_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Flags</b></em>' attribute list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__FLAGS = STORED_OBJECT_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>Method Version</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__METHOD_VERSION = STORED_OBJECT_FEATURE_COUNT + 7;

	/**
	 * The feature id for the '<em><b>Library Version</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__LIBRARY_VERSION = STORED_OBJECT_FEATURE_COUNT + 8;

	/**
	 * The feature id for the '<em><b>Software Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__SOFTWARE_VERSION = STORED_OBJECT_FEATURE_COUNT + 9;

	/**
	 * The feature id for the '<em><b>Input Hash</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT__INPUT_HASH = STORED_OBJECT_FEATURE_COUNT + 10;

	/**
	 * The number of structural features of the '<em>Result</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 11;

	/**
	 * The number of operations of the '<em>Result</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RESULT_OPERATION_COUNT = STORED_OBJECT_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.QaCheckImpl <em>Qa Check</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.QaCheckImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getQaCheck()
	 * @generated
	 */
	int QA_CHECK = 19;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_CHECK__ID = STORED_OBJECT__ID;

	/**
	 * The feature id for the '<em><b>Row Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_CHECK__ROW_VERSION = STORED_OBJECT__ROW_VERSION;

	/**
	 * The feature id for the '<em><b>Rule</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_CHECK__RULE = STORED_OBJECT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Passed</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_CHECK__PASSED = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_CHECK__VALUE = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Limit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_CHECK__LIMIT = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Message</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_CHECK__MESSAGE = STORED_OBJECT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Measurement</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_CHECK__MEASUREMENT = STORED_OBJECT_FEATURE_COUNT + 5;

	/**
	 * The number of structural features of the '<em>Qa Check</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_CHECK_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 6;

	/**
	 * The number of operations of the '<em>Qa Check</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int QA_CHECK_OPERATION_COUNT = STORED_OBJECT_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.ReportImpl <em>Report</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.ReportImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getReport()
	 * @generated
	 */
	int REPORT = 20;

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
	 * The feature id for the '<em><b>Title</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT__TITLE = STORED_OBJECT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Created</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT__CREATED = STORED_OBJECT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Status</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT__STATUS = STORED_OBJECT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Runs</b></em>' reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT__RUNS = STORED_OBJECT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Author</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT__AUTHOR = STORED_OBJECT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Document Uri</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT__DOCUMENT_URI = STORED_OBJECT_FEATURE_COUNT + 5;

	/**
	 * The number of structural features of the '<em>Report</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT_FEATURE_COUNT = STORED_OBJECT_FEATURE_COUNT + 6;

	/**
	 * The number of operations of the '<em>Report</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REPORT_OPERATION_COUNT = STORED_OBJECT_OPERATION_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracegas.model.impl.UserImpl <em>User</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.impl.UserImpl
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getUser()
	 * @generated
	 */
	int USER = 21;

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
	 * The feature id for the '<em><b>Active</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int USER__ACTIVE = STORED_OBJECT_FEATURE_COUNT + 3;

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
	int ACCESS_LEVEL = 22;

	/**
	 * The meta object id for the '{@link org.tracegas.model.DetectorType <em>Detector Type</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.DetectorType
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getDetectorType()
	 * @generated
	 */
	int DETECTOR_TYPE = 23;

	/**
	 * The meta object id for the '{@link org.tracegas.model.MeasurementKind <em>Measurement Kind</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.MeasurementKind
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getMeasurementKind()
	 * @generated
	 */
	int MEASUREMENT_KIND = 24;

	/**
	 * The meta object id for the '{@link org.tracegas.model.SpectralContent <em>Spectral Content</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.SpectralContent
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getSpectralContent()
	 * @generated
	 */
	int SPECTRAL_CONTENT = 25;

	/**
	 * The meta object id for the '{@link org.tracegas.model.RunStatus <em>Run Status</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.RunStatus
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getRunStatus()
	 * @generated
	 */
	int RUN_STATUS = 26;

	/**
	 * The meta object id for the '{@link org.tracegas.model.ResultFlag <em>Result Flag</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.ResultFlag
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getResultFlag()
	 * @generated
	 */
	int RESULT_FLAG = 27;

	/**
	 * The meta object id for the '{@link org.tracegas.model.ReportStatus <em>Report Status</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.ReportStatus
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getReportStatus()
	 * @generated
	 */
	int REPORT_STATUS = 28;

	/**
	 * The meta object id for the '{@link org.tracegas.model.Role <em>Role</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracegas.model.Role
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getRole()
	 * @generated
	 */
	int ROLE = 29;

	/**
	 * The meta object id for the '<em>Instant</em>' data type.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see java.time.Instant
	 * @see org.tracegas.model.impl.WorkspacePackageImpl#getInstant()
	 * @generated
	 */
	int INSTANT = 30;


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
	 * Returns the meta object for the containment reference list '{@link org.tracegas.model.Workspace#getUsers <em>Users</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Users</em>'.
	 * @see org.tracegas.model.Workspace#getUsers()
	 * @see #getWorkspace()
	 * @generated
	 */
	EReference getWorkspace_Users();

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
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Site#getAddress <em>Address</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Address</em>'.
	 * @see org.tracegas.model.Site#getAddress()
	 * @see #getSite()
	 * @generated
	 */
	EAttribute getSite_Address();

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
	 * Returns the meta object for the attribute '{@link org.tracegas.model.EmissionSource#getDuctDiameter <em>Duct Diameter</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Duct Diameter</em>'.
	 * @see org.tracegas.model.EmissionSource#getDuctDiameter()
	 * @see #getEmissionSource()
	 * @generated
	 */
	EAttribute getEmissionSource_DuctDiameter();

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
	 * Returns the meta object for the reference list '{@link org.tracegas.model.Project#getSources <em>Sources</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference list '<em>Sources</em>'.
	 * @see org.tracegas.model.Project#getSources()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_Sources();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracegas.model.Project#getGrants <em>Grants</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Grants</em>'.
	 * @see org.tracegas.model.Project#getGrants()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_Grants();

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
	 * Returns the meta object for the containment reference list '{@link org.tracegas.model.Project#getRuns <em>Runs</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Runs</em>'.
	 * @see org.tracegas.model.Project#getRuns()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_Runs();

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
	 * Returns the meta object for class '{@link org.tracegas.model.ProjectGrant <em>Project Grant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Project Grant</em>'.
	 * @see org.tracegas.model.ProjectGrant
	 * @generated
	 */
	EClass getProjectGrant();

	/**
	 * Returns the meta object for the reference '{@link org.tracegas.model.ProjectGrant#getUser <em>User</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>User</em>'.
	 * @see org.tracegas.model.ProjectGrant#getUser()
	 * @see #getProjectGrant()
	 * @generated
	 */
	EReference getProjectGrant_User();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ProjectGrant#getAccess <em>Access</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Access</em>'.
	 * @see org.tracegas.model.ProjectGrant#getAccess()
	 * @see #getProjectGrant()
	 * @generated
	 */
	EAttribute getProjectGrant_Access();

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
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Instrument#getCellTemperature <em>Cell Temperature</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Cell Temperature</em>'.
	 * @see org.tracegas.model.Instrument#getCellTemperature()
	 * @see #getInstrument()
	 * @generated
	 */
	EAttribute getInstrument_CellTemperature();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Instrument#getResolution <em>Resolution</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Resolution</em>'.
	 * @see org.tracegas.model.Instrument#getResolution()
	 * @see #getInstrument()
	 * @generated
	 */
	EAttribute getInstrument_Resolution();

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
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Instrument#getDetector <em>Detector</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Detector</em>'.
	 * @see org.tracegas.model.Instrument#getDetector()
	 * @see #getInstrument()
	 * @generated
	 */
	EAttribute getInstrument_Detector();

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
	 * Returns the meta object for the reference '{@link org.tracegas.model.Measurement#getOperator <em>Operator</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Operator</em>'.
	 * @see org.tracegas.model.Measurement#getOperator()
	 * @see #getMeasurement()
	 * @generated
	 */
	EReference getMeasurement_Operator();

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
	 * Returns the meta object for the reference '{@link org.tracegas.model.Measurement#getSource <em>Source</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Source</em>'.
	 * @see org.tracegas.model.Measurement#getSource()
	 * @see #getMeasurement()
	 * @generated
	 */
	EReference getMeasurement_Source();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracegas.model.Measurement#getData <em>Data</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Data</em>'.
	 * @see org.tracegas.model.Measurement#getData()
	 * @see #getMeasurement()
	 * @generated
	 */
	EReference getMeasurement_Data();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.SpectralDataRef <em>Spectral Data Ref</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Spectral Data Ref</em>'.
	 * @see org.tracegas.model.SpectralDataRef
	 * @generated
	 */
	EClass getSpectralDataRef();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.SpectralDataRef#getDataId <em>Data Id</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Data Id</em>'.
	 * @see org.tracegas.model.SpectralDataRef#getDataId()
	 * @see #getSpectralDataRef()
	 * @generated
	 */
	EAttribute getSpectralDataRef_DataId();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.SpectralDataRef#getUri <em>Uri</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Uri</em>'.
	 * @see org.tracegas.model.SpectralDataRef#getUri()
	 * @see #getSpectralDataRef()
	 * @generated
	 */
	EAttribute getSpectralDataRef_Uri();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.SpectralDataRef#getContent <em>Content</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Content</em>'.
	 * @see org.tracegas.model.SpectralDataRef#getContent()
	 * @see #getSpectralDataRef()
	 * @generated
	 */
	EAttribute getSpectralDataRef_Content();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.SpectralDataRef#getPointCount <em>Point Count</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Point Count</em>'.
	 * @see org.tracegas.model.SpectralDataRef#getPointCount()
	 * @see #getSpectralDataRef()
	 * @generated
	 */
	EAttribute getSpectralDataRef_PointCount();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.SpectralDataRef#getSha256 <em>Sha256</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Sha256</em>'.
	 * @see org.tracegas.model.SpectralDataRef#getSha256()
	 * @see #getSpectralDataRef()
	 * @generated
	 */
	EAttribute getSpectralDataRef_Sha256();

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
	 * Returns the meta object for the reference '{@link org.tracegas.model.ContentVersion#getParent <em>Parent</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Parent</em>'.
	 * @see org.tracegas.model.ContentVersion#getParent()
	 * @see #getContentVersion()
	 * @generated
	 */
	EReference getContentVersion_Parent();

	/**
	 * Returns the meta object for the reference '{@link org.tracegas.model.ContentVersion#getAuthor <em>Author</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Author</em>'.
	 * @see org.tracegas.model.ContentVersion#getAuthor()
	 * @see #getContentVersion()
	 * @generated
	 */
	EReference getContentVersion_Author();

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
	 * Returns the meta object for the containment reference list '{@link org.tracegas.model.ReferenceLibrary#getVersions <em>Versions</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Versions</em>'.
	 * @see org.tracegas.model.ReferenceLibrary#getVersions()
	 * @see #getReferenceLibrary()
	 * @generated
	 */
	EReference getReferenceLibrary_Versions();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.LibraryVersion <em>Library Version</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Library Version</em>'.
	 * @see org.tracegas.model.LibraryVersion
	 * @generated
	 */
	EClass getLibraryVersion();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracegas.model.LibraryVersion#getSpectra <em>Spectra</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Spectra</em>'.
	 * @see org.tracegas.model.LibraryVersion#getSpectra()
	 * @see #getLibraryVersion()
	 * @generated
	 */
	EReference getLibraryVersion_Spectra();

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
	 * Returns the meta object for the attribute '{@link org.tracegas.model.ReferenceSpectrum#getConcentrationPathLength <em>Concentration Path Length</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Concentration Path Length</em>'.
	 * @see org.tracegas.model.ReferenceSpectrum#getConcentrationPathLength()
	 * @see #getReferenceSpectrum()
	 * @generated
	 */
	EAttribute getReferenceSpectrum_ConcentrationPathLength();

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
	 * Returns the meta object for the containment reference '{@link org.tracegas.model.ReferenceSpectrum#getData <em>Data</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Data</em>'.
	 * @see org.tracegas.model.ReferenceSpectrum#getData()
	 * @see #getReferenceSpectrum()
	 * @generated
	 */
	EReference getReferenceSpectrum_Data();

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
	 * Returns the meta object for the reference '{@link org.tracegas.model.MethodVersion#getLibrary <em>Library</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Library</em>'.
	 * @see org.tracegas.model.MethodVersion#getLibrary()
	 * @see #getMethodVersion()
	 * @generated
	 */
	EReference getMethodVersion_Library();

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
	 * Returns the meta object for class '{@link org.tracegas.model.AnalysisRun <em>Analysis Run</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Analysis Run</em>'.
	 * @see org.tracegas.model.AnalysisRun
	 * @generated
	 */
	EClass getAnalysisRun();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.AnalysisRun#getStarted <em>Started</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Started</em>'.
	 * @see org.tracegas.model.AnalysisRun#getStarted()
	 * @see #getAnalysisRun()
	 * @generated
	 */
	EAttribute getAnalysisRun_Started();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.AnalysisRun#getFinished <em>Finished</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Finished</em>'.
	 * @see org.tracegas.model.AnalysisRun#getFinished()
	 * @see #getAnalysisRun()
	 * @generated
	 */
	EAttribute getAnalysisRun_Finished();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.AnalysisRun#getStatus <em>Status</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Status</em>'.
	 * @see org.tracegas.model.AnalysisRun#getStatus()
	 * @see #getAnalysisRun()
	 * @generated
	 */
	EAttribute getAnalysisRun_Status();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.AnalysisRun#getSoftwareVersion <em>Software Version</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Software Version</em>'.
	 * @see org.tracegas.model.AnalysisRun#getSoftwareVersion()
	 * @see #getAnalysisRun()
	 * @generated
	 */
	EAttribute getAnalysisRun_SoftwareVersion();

	/**
	 * Returns the meta object for the reference '{@link org.tracegas.model.AnalysisRun#getAnalyst <em>Analyst</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Analyst</em>'.
	 * @see org.tracegas.model.AnalysisRun#getAnalyst()
	 * @see #getAnalysisRun()
	 * @generated
	 */
	EReference getAnalysisRun_Analyst();

	/**
	 * Returns the meta object for the reference '{@link org.tracegas.model.AnalysisRun#getMethod <em>Method</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Method</em>'.
	 * @see org.tracegas.model.AnalysisRun#getMethod()
	 * @see #getAnalysisRun()
	 * @generated
	 */
	EReference getAnalysisRun_Method();

	/**
	 * Returns the meta object for the reference '{@link org.tracegas.model.AnalysisRun#getLibrary <em>Library</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Library</em>'.
	 * @see org.tracegas.model.AnalysisRun#getLibrary()
	 * @see #getAnalysisRun()
	 * @generated
	 */
	EReference getAnalysisRun_Library();

	/**
	 * Returns the meta object for the reference list '{@link org.tracegas.model.AnalysisRun#getMeasurements <em>Measurements</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference list '<em>Measurements</em>'.
	 * @see org.tracegas.model.AnalysisRun#getMeasurements()
	 * @see #getAnalysisRun()
	 * @generated
	 */
	EReference getAnalysisRun_Measurements();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracegas.model.AnalysisRun#getResults <em>Results</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Results</em>'.
	 * @see org.tracegas.model.AnalysisRun#getResults()
	 * @see #getAnalysisRun()
	 * @generated
	 */
	EReference getAnalysisRun_Results();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracegas.model.AnalysisRun#getQaChecks <em>Qa Checks</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Qa Checks</em>'.
	 * @see org.tracegas.model.AnalysisRun#getQaChecks()
	 * @see #getAnalysisRun()
	 * @generated
	 */
	EReference getAnalysisRun_QaChecks();

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
	 * Returns the meta object for the reference '{@link org.tracegas.model.Result#getMeasurement <em>Measurement</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Measurement</em>'.
	 * @see org.tracegas.model.Result#getMeasurement()
	 * @see #getResult()
	 * @generated
	 */
	EReference getResult_Measurement();

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
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Result#getUncertainty <em>Uncertainty</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Uncertainty</em>'.
	 * @see org.tracegas.model.Result#getUncertainty()
	 * @see #getResult()
	 * @generated
	 */
	EAttribute getResult_Uncertainty();

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
	 * Returns the meta object for the reference '{@link org.tracegas.model.Result#getMethodVersion <em>Method Version</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Method Version</em>'.
	 * @see org.tracegas.model.Result#getMethodVersion()
	 * @see #getResult()
	 * @generated
	 */
	EReference getResult_MethodVersion();

	/**
	 * Returns the meta object for the reference '{@link org.tracegas.model.Result#getLibraryVersion <em>Library Version</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Library Version</em>'.
	 * @see org.tracegas.model.Result#getLibraryVersion()
	 * @see #getResult()
	 * @generated
	 */
	EReference getResult_LibraryVersion();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Result#getSoftwareVersion <em>Software Version</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Software Version</em>'.
	 * @see org.tracegas.model.Result#getSoftwareVersion()
	 * @see #getResult()
	 * @generated
	 */
	EAttribute getResult_SoftwareVersion();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Result#getInputHash <em>Input Hash</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Input Hash</em>'.
	 * @see org.tracegas.model.Result#getInputHash()
	 * @see #getResult()
	 * @generated
	 */
	EAttribute getResult_InputHash();

	/**
	 * Returns the meta object for class '{@link org.tracegas.model.QaCheck <em>Qa Check</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Qa Check</em>'.
	 * @see org.tracegas.model.QaCheck
	 * @generated
	 */
	EClass getQaCheck();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.QaCheck#getRule <em>Rule</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Rule</em>'.
	 * @see org.tracegas.model.QaCheck#getRule()
	 * @see #getQaCheck()
	 * @generated
	 */
	EAttribute getQaCheck_Rule();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.QaCheck#isPassed <em>Passed</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Passed</em>'.
	 * @see org.tracegas.model.QaCheck#isPassed()
	 * @see #getQaCheck()
	 * @generated
	 */
	EAttribute getQaCheck_Passed();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.QaCheck#getValue <em>Value</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Value</em>'.
	 * @see org.tracegas.model.QaCheck#getValue()
	 * @see #getQaCheck()
	 * @generated
	 */
	EAttribute getQaCheck_Value();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.QaCheck#getLimit <em>Limit</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Limit</em>'.
	 * @see org.tracegas.model.QaCheck#getLimit()
	 * @see #getQaCheck()
	 * @generated
	 */
	EAttribute getQaCheck_Limit();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.QaCheck#getMessage <em>Message</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Message</em>'.
	 * @see org.tracegas.model.QaCheck#getMessage()
	 * @see #getQaCheck()
	 * @generated
	 */
	EAttribute getQaCheck_Message();

	/**
	 * Returns the meta object for the reference '{@link org.tracegas.model.QaCheck#getMeasurement <em>Measurement</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Measurement</em>'.
	 * @see org.tracegas.model.QaCheck#getMeasurement()
	 * @see #getQaCheck()
	 * @generated
	 */
	EReference getQaCheck_Measurement();

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
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Report#getCreated <em>Created</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Created</em>'.
	 * @see org.tracegas.model.Report#getCreated()
	 * @see #getReport()
	 * @generated
	 */
	EAttribute getReport_Created();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Report#getStatus <em>Status</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Status</em>'.
	 * @see org.tracegas.model.Report#getStatus()
	 * @see #getReport()
	 * @generated
	 */
	EAttribute getReport_Status();

	/**
	 * Returns the meta object for the reference list '{@link org.tracegas.model.Report#getRuns <em>Runs</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference list '<em>Runs</em>'.
	 * @see org.tracegas.model.Report#getRuns()
	 * @see #getReport()
	 * @generated
	 */
	EReference getReport_Runs();

	/**
	 * Returns the meta object for the reference '{@link org.tracegas.model.Report#getAuthor <em>Author</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Author</em>'.
	 * @see org.tracegas.model.Report#getAuthor()
	 * @see #getReport()
	 * @generated
	 */
	EReference getReport_Author();

	/**
	 * Returns the meta object for the attribute '{@link org.tracegas.model.Report#getDocumentUri <em>Document Uri</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Document Uri</em>'.
	 * @see org.tracegas.model.Report#getDocumentUri()
	 * @see #getReport()
	 * @generated
	 */
	EAttribute getReport_DocumentUri();

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
	 * Returns the meta object for the attribute '{@link org.tracegas.model.User#isActive <em>Active</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Active</em>'.
	 * @see org.tracegas.model.User#isActive()
	 * @see #getUser()
	 * @generated
	 */
	EAttribute getUser_Active();

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
	 * Returns the meta object for enum '{@link org.tracegas.model.DetectorType <em>Detector Type</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Detector Type</em>'.
	 * @see org.tracegas.model.DetectorType
	 * @generated
	 */
	EEnum getDetectorType();

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
	 * Returns the meta object for enum '{@link org.tracegas.model.RunStatus <em>Run Status</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Run Status</em>'.
	 * @see org.tracegas.model.RunStatus
	 * @generated
	 */
	EEnum getRunStatus();

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
	 * Returns the meta object for enum '{@link org.tracegas.model.ReportStatus <em>Report Status</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Report Status</em>'.
	 * @see org.tracegas.model.ReportStatus
	 * @generated
	 */
	EEnum getReportStatus();

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
		 * The meta object literal for the '<em><b>Instruments</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference WORKSPACE__INSTRUMENTS = eINSTANCE.getWorkspace_Instruments();

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
		 * The meta object literal for the '<em><b>Users</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference WORKSPACE__USERS = eINSTANCE.getWorkspace_Users();

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
		 * The meta object literal for the '<em><b>Sites</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference CLIENT__SITES = eINSTANCE.getClient_Sites();

		/**
		 * The meta object literal for the '<em><b>Projects</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference CLIENT__PROJECTS = eINSTANCE.getClient_Projects();

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
		 * The meta object literal for the '<em><b>Address</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SITE__ADDRESS = eINSTANCE.getSite_Address();

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
		 * The meta object literal for the '<em><b>Duct Diameter</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute EMISSION_SOURCE__DUCT_DIAMETER = eINSTANCE.getEmissionSource_DuctDiameter();

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
		 * The meta object literal for the '<em><b>Sources</b></em>' reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__SOURCES = eINSTANCE.getProject_Sources();

		/**
		 * The meta object literal for the '<em><b>Grants</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__GRANTS = eINSTANCE.getProject_Grants();

		/**
		 * The meta object literal for the '<em><b>Measurements</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__MEASUREMENTS = eINSTANCE.getProject_Measurements();

		/**
		 * The meta object literal for the '<em><b>Runs</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__RUNS = eINSTANCE.getProject_Runs();

		/**
		 * The meta object literal for the '<em><b>Reports</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__REPORTS = eINSTANCE.getProject_Reports();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.ProjectGrantImpl <em>Project Grant</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.ProjectGrantImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getProjectGrant()
		 * @generated
		 */
		EClass PROJECT_GRANT = eINSTANCE.getProjectGrant();

		/**
		 * The meta object literal for the '<em><b>User</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT_GRANT__USER = eINSTANCE.getProjectGrant_User();

		/**
		 * The meta object literal for the '<em><b>Access</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PROJECT_GRANT__ACCESS = eINSTANCE.getProjectGrant_Access();

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
		 * The meta object literal for the '<em><b>Cell Path Length</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute INSTRUMENT__CELL_PATH_LENGTH = eINSTANCE.getInstrument_CellPathLength();

		/**
		 * The meta object literal for the '<em><b>Cell Temperature</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute INSTRUMENT__CELL_TEMPERATURE = eINSTANCE.getInstrument_CellTemperature();

		/**
		 * The meta object literal for the '<em><b>Resolution</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute INSTRUMENT__RESOLUTION = eINSTANCE.getInstrument_Resolution();

		/**
		 * The meta object literal for the '<em><b>Laser Wavenumber</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute INSTRUMENT__LASER_WAVENUMBER = eINSTANCE.getInstrument_LaserWavenumber();

		/**
		 * The meta object literal for the '<em><b>Detector</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute INSTRUMENT__DETECTOR = eINSTANCE.getInstrument_Detector();

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
		 * The meta object literal for the '<em><b>Operator</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference MEASUREMENT__OPERATOR = eINSTANCE.getMeasurement_Operator();

		/**
		 * The meta object literal for the '<em><b>Instrument</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference MEASUREMENT__INSTRUMENT = eINSTANCE.getMeasurement_Instrument();

		/**
		 * The meta object literal for the '<em><b>Source</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference MEASUREMENT__SOURCE = eINSTANCE.getMeasurement_Source();

		/**
		 * The meta object literal for the '<em><b>Data</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference MEASUREMENT__DATA = eINSTANCE.getMeasurement_Data();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.SpectralDataRefImpl <em>Spectral Data Ref</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.SpectralDataRefImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getSpectralDataRef()
		 * @generated
		 */
		EClass SPECTRAL_DATA_REF = eINSTANCE.getSpectralDataRef();

		/**
		 * The meta object literal for the '<em><b>Data Id</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SPECTRAL_DATA_REF__DATA_ID = eINSTANCE.getSpectralDataRef_DataId();

		/**
		 * The meta object literal for the '<em><b>Uri</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SPECTRAL_DATA_REF__URI = eINSTANCE.getSpectralDataRef_Uri();

		/**
		 * The meta object literal for the '<em><b>Content</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SPECTRAL_DATA_REF__CONTENT = eINSTANCE.getSpectralDataRef_Content();

		/**
		 * The meta object literal for the '<em><b>Point Count</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SPECTRAL_DATA_REF__POINT_COUNT = eINSTANCE.getSpectralDataRef_PointCount();

		/**
		 * The meta object literal for the '<em><b>Sha256</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SPECTRAL_DATA_REF__SHA256 = eINSTANCE.getSpectralDataRef_Sha256();

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
		 * The meta object literal for the '<em><b>Number</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTENT_VERSION__NUMBER = eINSTANCE.getContentVersion_Number();

		/**
		 * The meta object literal for the '<em><b>Parent</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference CONTENT_VERSION__PARENT = eINSTANCE.getContentVersion_Parent();

		/**
		 * The meta object literal for the '<em><b>Author</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference CONTENT_VERSION__AUTHOR = eINSTANCE.getContentVersion_Author();

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
		 * The meta object literal for the '<em><b>Versions</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference REFERENCE_LIBRARY__VERSIONS = eINSTANCE.getReferenceLibrary_Versions();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.LibraryVersionImpl <em>Library Version</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.LibraryVersionImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getLibraryVersion()
		 * @generated
		 */
		EClass LIBRARY_VERSION = eINSTANCE.getLibraryVersion();

		/**
		 * The meta object literal for the '<em><b>Spectra</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference LIBRARY_VERSION__SPECTRA = eINSTANCE.getLibraryVersion_Spectra();

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
		 * The meta object literal for the '<em><b>Concentration Path Length</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REFERENCE_SPECTRUM__CONCENTRATION_PATH_LENGTH = eINSTANCE.getReferenceSpectrum_ConcentrationPathLength();

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
		 * The meta object literal for the '<em><b>Data</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference REFERENCE_SPECTRUM__DATA = eINSTANCE.getReferenceSpectrum_Data();

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
		 * The meta object literal for the '<em><b>Library</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference METHOD_VERSION__LIBRARY = eINSTANCE.getMethodVersion_Library();

		/**
		 * The meta object literal for the '<em><b>Regions</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference METHOD_VERSION__REGIONS = eINSTANCE.getMethodVersion_Regions();

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
		 * The meta object literal for the '{@link org.tracegas.model.impl.AnalysisRunImpl <em>Analysis Run</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.AnalysisRunImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getAnalysisRun()
		 * @generated
		 */
		EClass ANALYSIS_RUN = eINSTANCE.getAnalysisRun();

		/**
		 * The meta object literal for the '<em><b>Started</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALYSIS_RUN__STARTED = eINSTANCE.getAnalysisRun_Started();

		/**
		 * The meta object literal for the '<em><b>Finished</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALYSIS_RUN__FINISHED = eINSTANCE.getAnalysisRun_Finished();

		/**
		 * The meta object literal for the '<em><b>Status</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALYSIS_RUN__STATUS = eINSTANCE.getAnalysisRun_Status();

		/**
		 * The meta object literal for the '<em><b>Software Version</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALYSIS_RUN__SOFTWARE_VERSION = eINSTANCE.getAnalysisRun_SoftwareVersion();

		/**
		 * The meta object literal for the '<em><b>Analyst</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference ANALYSIS_RUN__ANALYST = eINSTANCE.getAnalysisRun_Analyst();

		/**
		 * The meta object literal for the '<em><b>Method</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference ANALYSIS_RUN__METHOD = eINSTANCE.getAnalysisRun_Method();

		/**
		 * The meta object literal for the '<em><b>Library</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference ANALYSIS_RUN__LIBRARY = eINSTANCE.getAnalysisRun_Library();

		/**
		 * The meta object literal for the '<em><b>Measurements</b></em>' reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference ANALYSIS_RUN__MEASUREMENTS = eINSTANCE.getAnalysisRun_Measurements();

		/**
		 * The meta object literal for the '<em><b>Results</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference ANALYSIS_RUN__RESULTS = eINSTANCE.getAnalysisRun_Results();

		/**
		 * The meta object literal for the '<em><b>Qa Checks</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference ANALYSIS_RUN__QA_CHECKS = eINSTANCE.getAnalysisRun_QaChecks();

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
		 * The meta object literal for the '<em><b>Measurement</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference RESULT__MEASUREMENT = eINSTANCE.getResult_Measurement();

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
		 * The meta object literal for the '<em><b>Uncertainty</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RESULT__UNCERTAINTY = eINSTANCE.getResult_Uncertainty();

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
		 * The meta object literal for the '<em><b>Method Version</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference RESULT__METHOD_VERSION = eINSTANCE.getResult_MethodVersion();

		/**
		 * The meta object literal for the '<em><b>Library Version</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference RESULT__LIBRARY_VERSION = eINSTANCE.getResult_LibraryVersion();

		/**
		 * The meta object literal for the '<em><b>Software Version</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RESULT__SOFTWARE_VERSION = eINSTANCE.getResult_SoftwareVersion();

		/**
		 * The meta object literal for the '<em><b>Input Hash</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RESULT__INPUT_HASH = eINSTANCE.getResult_InputHash();

		/**
		 * The meta object literal for the '{@link org.tracegas.model.impl.QaCheckImpl <em>Qa Check</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.impl.QaCheckImpl
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getQaCheck()
		 * @generated
		 */
		EClass QA_CHECK = eINSTANCE.getQaCheck();

		/**
		 * The meta object literal for the '<em><b>Rule</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QA_CHECK__RULE = eINSTANCE.getQaCheck_Rule();

		/**
		 * The meta object literal for the '<em><b>Passed</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QA_CHECK__PASSED = eINSTANCE.getQaCheck_Passed();

		/**
		 * The meta object literal for the '<em><b>Value</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QA_CHECK__VALUE = eINSTANCE.getQaCheck_Value();

		/**
		 * The meta object literal for the '<em><b>Limit</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QA_CHECK__LIMIT = eINSTANCE.getQaCheck_Limit();

		/**
		 * The meta object literal for the '<em><b>Message</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute QA_CHECK__MESSAGE = eINSTANCE.getQaCheck_Message();

		/**
		 * The meta object literal for the '<em><b>Measurement</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference QA_CHECK__MEASUREMENT = eINSTANCE.getQaCheck_Measurement();

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
		 * The meta object literal for the '<em><b>Title</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REPORT__TITLE = eINSTANCE.getReport_Title();

		/**
		 * The meta object literal for the '<em><b>Created</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REPORT__CREATED = eINSTANCE.getReport_Created();

		/**
		 * The meta object literal for the '<em><b>Status</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REPORT__STATUS = eINSTANCE.getReport_Status();

		/**
		 * The meta object literal for the '<em><b>Runs</b></em>' reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference REPORT__RUNS = eINSTANCE.getReport_Runs();

		/**
		 * The meta object literal for the '<em><b>Author</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference REPORT__AUTHOR = eINSTANCE.getReport_Author();

		/**
		 * The meta object literal for the '<em><b>Document Uri</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REPORT__DOCUMENT_URI = eINSTANCE.getReport_DocumentUri();

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
		 * The meta object literal for the '<em><b>Active</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute USER__ACTIVE = eINSTANCE.getUser_Active();

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
		 * The meta object literal for the '{@link org.tracegas.model.DetectorType <em>Detector Type</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.DetectorType
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getDetectorType()
		 * @generated
		 */
		EEnum DETECTOR_TYPE = eINSTANCE.getDetectorType();

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
		 * The meta object literal for the '{@link org.tracegas.model.RunStatus <em>Run Status</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.RunStatus
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getRunStatus()
		 * @generated
		 */
		EEnum RUN_STATUS = eINSTANCE.getRunStatus();

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
		 * The meta object literal for the '{@link org.tracegas.model.ReportStatus <em>Report Status</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracegas.model.ReportStatus
		 * @see org.tracegas.model.impl.WorkspacePackageImpl#getReportStatus()
		 * @generated
		 */
		EEnum REPORT_STATUS = eINSTANCE.getReportStatus();

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

	}

} //WorkspacePackage
