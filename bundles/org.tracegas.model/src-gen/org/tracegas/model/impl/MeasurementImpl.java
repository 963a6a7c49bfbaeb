/**
 */
package org.tracegas.model.impl;

import java.time.Instant;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.NotificationChain;

import org.eclipse.emf.common.util.EMap;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.ecore.EcorePackage;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.EStringToStringMapEntryImpl;

import org.eclipse.emf.ecore.util.EcoreEMap;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.emf.ecore.util.InternalEList;

import org.tracegas.model.Instrument;
import org.tracegas.model.Measurement;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.Project;
import org.tracegas.model.SpectralContent;
import org.tracegas.model.WorkspacePackage;

import org.tracegas.spectrum.Spectrum;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Measurement</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracegas.model.impl.MeasurementImpl#getProject <em>Project</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MeasurementImpl#getKind <em>Kind</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MeasurementImpl#getTime <em>Time</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MeasurementImpl#getCellTemperature <em>Cell Temperature</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MeasurementImpl#getCellPressure <em>Cell Pressure</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MeasurementImpl#getOperatorId <em>Operator Id</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MeasurementImpl#getTitle <em>Title</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MeasurementImpl#getLabels <em>Labels</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MeasurementImpl#getContent <em>Content</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MeasurementImpl#getSpectrumId <em>Spectrum Id</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MeasurementImpl#getSpectrum <em>Spectrum</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MeasurementImpl#getSourceFile <em>Source File</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MeasurementImpl#getSourceSha256 <em>Source Sha256</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MeasurementImpl#getSourceRecord <em>Source Record</em>}</li>
 *   <li>{@link org.tracegas.model.impl.MeasurementImpl#getInstrument <em>Instrument</em>}</li>
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
	 * The default value of the '{@link #getOperatorId() <em>Operator Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOperatorId()
	 * @generated
	 * @ordered
	 */
	protected static final String OPERATOR_ID_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getOperatorId() <em>Operator Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOperatorId()
	 * @generated
	 * @ordered
	 */
	protected String operatorId = OPERATOR_ID_EDEFAULT;

	/**
	 * The default value of the '{@link #getTitle() <em>Title</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTitle()
	 * @generated
	 * @ordered
	 */
	protected static final String TITLE_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getTitle() <em>Title</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTitle()
	 * @generated
	 * @ordered
	 */
	protected String title = TITLE_EDEFAULT;

	/**
	 * The cached value of the '{@link #getLabels() <em>Labels</em>}' map.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLabels()
	 * @generated
	 * @ordered
	 */
	protected EMap<String, String> labels;

	/**
	 * The default value of the '{@link #getContent() <em>Content</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getContent()
	 * @generated
	 * @ordered
	 */
	protected static final SpectralContent CONTENT_EDEFAULT = SpectralContent.INTERFEROGRAM;

	/**
	 * The cached value of the '{@link #getContent() <em>Content</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getContent()
	 * @generated
	 * @ordered
	 */
	protected SpectralContent content = CONTENT_EDEFAULT;

	/**
	 * This is true if the Content attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean contentESet;

	/**
	 * The default value of the '{@link #getSpectrumId() <em>Spectrum Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSpectrumId()
	 * @generated
	 * @ordered
	 */
	protected static final String SPECTRUM_ID_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getSpectrumId() <em>Spectrum Id</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSpectrumId()
	 * @generated
	 * @ordered
	 */
	protected String spectrumId = SPECTRUM_ID_EDEFAULT;

	/**
	 * The default value of the '{@link #getSpectrum() <em>Spectrum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSpectrum()
	 * @generated
	 * @ordered
	 */
	protected static final Spectrum SPECTRUM_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getSpectrum() <em>Spectrum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSpectrum()
	 * @generated
	 * @ordered
	 */
	protected Spectrum spectrum = SPECTRUM_EDEFAULT;

	/**
	 * The default value of the '{@link #getSourceFile() <em>Source File</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSourceFile()
	 * @generated
	 * @ordered
	 */
	protected static final String SOURCE_FILE_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getSourceFile() <em>Source File</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSourceFile()
	 * @generated
	 * @ordered
	 */
	protected String sourceFile = SOURCE_FILE_EDEFAULT;

	/**
	 * The default value of the '{@link #getSourceSha256() <em>Source Sha256</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSourceSha256()
	 * @generated
	 * @ordered
	 */
	protected static final String SOURCE_SHA256_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getSourceSha256() <em>Source Sha256</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSourceSha256()
	 * @generated
	 * @ordered
	 */
	protected String sourceSha256 = SOURCE_SHA256_EDEFAULT;

	/**
	 * The default value of the '{@link #getSourceRecord() <em>Source Record</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSourceRecord()
	 * @generated
	 * @ordered
	 */
	protected static final int SOURCE_RECORD_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getSourceRecord() <em>Source Record</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSourceRecord()
	 * @generated
	 * @ordered
	 */
	protected int sourceRecord = SOURCE_RECORD_EDEFAULT;

	/**
	 * The cached value of the '{@link #getInstrument() <em>Instrument</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getInstrument()
	 * @generated
	 * @ordered
	 */
	protected Instrument instrument;

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
	public Project getProject() {
		if (eContainerFeatureID() != WorkspacePackage.MEASUREMENT__PROJECT) return null;
		return (Project)eInternalContainer();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetProject(Project newProject, NotificationChain msgs) {
		msgs = eBasicSetContainer((InternalEObject)newProject, WorkspacePackage.MEASUREMENT__PROJECT, msgs);
		return msgs;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setProject(Project newProject) {
		if (newProject != eInternalContainer() || (eContainerFeatureID() != WorkspacePackage.MEASUREMENT__PROJECT && newProject != null)) {
			if (EcoreUtil.isAncestor(this, newProject))
				throw new IllegalArgumentException("Recursive containment not allowed for " + toString());
			NotificationChain msgs = null;
			if (eInternalContainer() != null)
				msgs = eBasicRemoveFromContainer(msgs);
			if (newProject != null)
				msgs = ((InternalEObject)newProject).eInverseAdd(this, WorkspacePackage.PROJECT__MEASUREMENTS, Project.class, msgs);
			msgs = basicSetProject(newProject, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.MEASUREMENT__PROJECT, newProject, newProject));
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
	public String getOperatorId() {
		return operatorId;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setOperatorId(String newOperatorId) {
		String oldOperatorId = operatorId;
		operatorId = newOperatorId;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.MEASUREMENT__OPERATOR_ID, oldOperatorId, operatorId));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getTitle() {
		return title;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTitle(String newTitle) {
		String oldTitle = title;
		title = newTitle;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.MEASUREMENT__TITLE, oldTitle, title));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EMap<String, String> getLabels() {
		if (labels == null) {
			labels = new EcoreEMap<String,String>(EcorePackage.Literals.ESTRING_TO_STRING_MAP_ENTRY, EStringToStringMapEntryImpl.class, this, WorkspacePackage.MEASUREMENT__LABELS);
		}
		return labels;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public SpectralContent getContent() {
		return content;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setContent(SpectralContent newContent) {
		SpectralContent oldContent = content;
		content = newContent == null ? CONTENT_EDEFAULT : newContent;
		boolean oldContentESet = contentESet;
		contentESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.MEASUREMENT__CONTENT, oldContent, content, !oldContentESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetContent() {
		SpectralContent oldContent = content;
		boolean oldContentESet = contentESet;
		content = CONTENT_EDEFAULT;
		contentESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, WorkspacePackage.MEASUREMENT__CONTENT, oldContent, CONTENT_EDEFAULT, oldContentESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetContent() {
		return contentESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getSpectrumId() {
		return spectrumId;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSpectrumId(String newSpectrumId) {
		String oldSpectrumId = spectrumId;
		spectrumId = newSpectrumId;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.MEASUREMENT__SPECTRUM_ID, oldSpectrumId, spectrumId));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Spectrum getSpectrum() {
		return spectrum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSpectrum(Spectrum newSpectrum) {
		Spectrum oldSpectrum = spectrum;
		spectrum = newSpectrum;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.MEASUREMENT__SPECTRUM, oldSpectrum, spectrum));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getSourceFile() {
		return sourceFile;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSourceFile(String newSourceFile) {
		String oldSourceFile = sourceFile;
		sourceFile = newSourceFile;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.MEASUREMENT__SOURCE_FILE, oldSourceFile, sourceFile));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getSourceSha256() {
		return sourceSha256;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSourceSha256(String newSourceSha256) {
		String oldSourceSha256 = sourceSha256;
		sourceSha256 = newSourceSha256;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.MEASUREMENT__SOURCE_SHA256, oldSourceSha256, sourceSha256));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getSourceRecord() {
		return sourceRecord;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSourceRecord(int newSourceRecord) {
		int oldSourceRecord = sourceRecord;
		sourceRecord = newSourceRecord;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.MEASUREMENT__SOURCE_RECORD, oldSourceRecord, sourceRecord));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Instrument getInstrument() {
		if (instrument != null && instrument.eIsProxy()) {
			InternalEObject oldInstrument = (InternalEObject)instrument;
			instrument = (Instrument)eResolveProxy(oldInstrument);
			if (instrument != oldInstrument) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, WorkspacePackage.MEASUREMENT__INSTRUMENT, oldInstrument, instrument));
			}
		}
		return instrument;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public Instrument basicGetInstrument() {
		return instrument;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setInstrument(Instrument newInstrument) {
		Instrument oldInstrument = instrument;
		instrument = newInstrument;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, WorkspacePackage.MEASUREMENT__INSTRUMENT, oldInstrument, instrument));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseAdd(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case WorkspacePackage.MEASUREMENT__PROJECT:
				if (eInternalContainer() != null)
					msgs = eBasicRemoveFromContainer(msgs);
				return basicSetProject((Project)otherEnd, msgs);
		}
		return super.eInverseAdd(otherEnd, featureID, msgs);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case WorkspacePackage.MEASUREMENT__PROJECT:
				return basicSetProject(null, msgs);
			case WorkspacePackage.MEASUREMENT__LABELS:
				return ((InternalEList<?>)getLabels()).basicRemove(otherEnd, msgs);
		}
		return super.eInverseRemove(otherEnd, featureID, msgs);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eBasicRemoveFromContainerFeature(NotificationChain msgs) {
		switch (eContainerFeatureID()) {
			case WorkspacePackage.MEASUREMENT__PROJECT:
				return eInternalContainer().eInverseRemove(this, WorkspacePackage.PROJECT__MEASUREMENTS, Project.class, msgs);
		}
		return super.eBasicRemoveFromContainerFeature(msgs);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case WorkspacePackage.MEASUREMENT__PROJECT:
				return getProject();
			case WorkspacePackage.MEASUREMENT__KIND:
				return getKind();
			case WorkspacePackage.MEASUREMENT__TIME:
				return getTime();
			case WorkspacePackage.MEASUREMENT__CELL_TEMPERATURE:
				return getCellTemperature();
			case WorkspacePackage.MEASUREMENT__CELL_PRESSURE:
				return getCellPressure();
			case WorkspacePackage.MEASUREMENT__OPERATOR_ID:
				return getOperatorId();
			case WorkspacePackage.MEASUREMENT__TITLE:
				return getTitle();
			case WorkspacePackage.MEASUREMENT__LABELS:
				if (coreType) return getLabels();
				else return getLabels().map();
			case WorkspacePackage.MEASUREMENT__CONTENT:
				return getContent();
			case WorkspacePackage.MEASUREMENT__SPECTRUM_ID:
				return getSpectrumId();
			case WorkspacePackage.MEASUREMENT__SPECTRUM:
				return getSpectrum();
			case WorkspacePackage.MEASUREMENT__SOURCE_FILE:
				return getSourceFile();
			case WorkspacePackage.MEASUREMENT__SOURCE_SHA256:
				return getSourceSha256();
			case WorkspacePackage.MEASUREMENT__SOURCE_RECORD:
				return getSourceRecord();
			case WorkspacePackage.MEASUREMENT__INSTRUMENT:
				if (resolve) return getInstrument();
				return basicGetInstrument();
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
			case WorkspacePackage.MEASUREMENT__PROJECT:
				setProject((Project)newValue);
				return;
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
			case WorkspacePackage.MEASUREMENT__OPERATOR_ID:
				setOperatorId((String)newValue);
				return;
			case WorkspacePackage.MEASUREMENT__TITLE:
				setTitle((String)newValue);
				return;
			case WorkspacePackage.MEASUREMENT__LABELS:
				((EStructuralFeature.Setting)getLabels()).set(newValue);
				return;
			case WorkspacePackage.MEASUREMENT__CONTENT:
				setContent((SpectralContent)newValue);
				return;
			case WorkspacePackage.MEASUREMENT__SPECTRUM_ID:
				setSpectrumId((String)newValue);
				return;
			case WorkspacePackage.MEASUREMENT__SPECTRUM:
				setSpectrum((Spectrum)newValue);
				return;
			case WorkspacePackage.MEASUREMENT__SOURCE_FILE:
				setSourceFile((String)newValue);
				return;
			case WorkspacePackage.MEASUREMENT__SOURCE_SHA256:
				setSourceSha256((String)newValue);
				return;
			case WorkspacePackage.MEASUREMENT__SOURCE_RECORD:
				setSourceRecord((Integer)newValue);
				return;
			case WorkspacePackage.MEASUREMENT__INSTRUMENT:
				setInstrument((Instrument)newValue);
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
			case WorkspacePackage.MEASUREMENT__PROJECT:
				setProject((Project)null);
				return;
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
			case WorkspacePackage.MEASUREMENT__OPERATOR_ID:
				setOperatorId(OPERATOR_ID_EDEFAULT);
				return;
			case WorkspacePackage.MEASUREMENT__TITLE:
				setTitle(TITLE_EDEFAULT);
				return;
			case WorkspacePackage.MEASUREMENT__LABELS:
				getLabels().clear();
				return;
			case WorkspacePackage.MEASUREMENT__CONTENT:
				unsetContent();
				return;
			case WorkspacePackage.MEASUREMENT__SPECTRUM_ID:
				setSpectrumId(SPECTRUM_ID_EDEFAULT);
				return;
			case WorkspacePackage.MEASUREMENT__SPECTRUM:
				setSpectrum(SPECTRUM_EDEFAULT);
				return;
			case WorkspacePackage.MEASUREMENT__SOURCE_FILE:
				setSourceFile(SOURCE_FILE_EDEFAULT);
				return;
			case WorkspacePackage.MEASUREMENT__SOURCE_SHA256:
				setSourceSha256(SOURCE_SHA256_EDEFAULT);
				return;
			case WorkspacePackage.MEASUREMENT__SOURCE_RECORD:
				setSourceRecord(SOURCE_RECORD_EDEFAULT);
				return;
			case WorkspacePackage.MEASUREMENT__INSTRUMENT:
				setInstrument((Instrument)null);
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
			case WorkspacePackage.MEASUREMENT__PROJECT:
				return getProject() != null;
			case WorkspacePackage.MEASUREMENT__KIND:
				return kind != KIND_EDEFAULT;
			case WorkspacePackage.MEASUREMENT__TIME:
				return TIME_EDEFAULT == null ? time != null : !TIME_EDEFAULT.equals(time);
			case WorkspacePackage.MEASUREMENT__CELL_TEMPERATURE:
				return cellTemperature != CELL_TEMPERATURE_EDEFAULT;
			case WorkspacePackage.MEASUREMENT__CELL_PRESSURE:
				return cellPressure != CELL_PRESSURE_EDEFAULT;
			case WorkspacePackage.MEASUREMENT__OPERATOR_ID:
				return OPERATOR_ID_EDEFAULT == null ? operatorId != null : !OPERATOR_ID_EDEFAULT.equals(operatorId);
			case WorkspacePackage.MEASUREMENT__TITLE:
				return TITLE_EDEFAULT == null ? title != null : !TITLE_EDEFAULT.equals(title);
			case WorkspacePackage.MEASUREMENT__LABELS:
				return labels != null && !labels.isEmpty();
			case WorkspacePackage.MEASUREMENT__CONTENT:
				return isSetContent();
			case WorkspacePackage.MEASUREMENT__SPECTRUM_ID:
				return SPECTRUM_ID_EDEFAULT == null ? spectrumId != null : !SPECTRUM_ID_EDEFAULT.equals(spectrumId);
			case WorkspacePackage.MEASUREMENT__SPECTRUM:
				return SPECTRUM_EDEFAULT == null ? spectrum != null : !SPECTRUM_EDEFAULT.equals(spectrum);
			case WorkspacePackage.MEASUREMENT__SOURCE_FILE:
				return SOURCE_FILE_EDEFAULT == null ? sourceFile != null : !SOURCE_FILE_EDEFAULT.equals(sourceFile);
			case WorkspacePackage.MEASUREMENT__SOURCE_SHA256:
				return SOURCE_SHA256_EDEFAULT == null ? sourceSha256 != null : !SOURCE_SHA256_EDEFAULT.equals(sourceSha256);
			case WorkspacePackage.MEASUREMENT__SOURCE_RECORD:
				return sourceRecord != SOURCE_RECORD_EDEFAULT;
			case WorkspacePackage.MEASUREMENT__INSTRUMENT:
				return instrument != null;
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
		result.append(", operatorId: ");
		result.append(operatorId);
		result.append(", title: ");
		result.append(title);
		result.append(", content: ");
		if (contentESet) result.append(content); else result.append("<unset>");
		result.append(", spectrumId: ");
		result.append(spectrumId);
		result.append(", spectrum: ");
		result.append(spectrum);
		result.append(", sourceFile: ");
		result.append(sourceFile);
		result.append(", sourceSha256: ");
		result.append(sourceSha256);
		result.append(", sourceRecord: ");
		result.append(sourceRecord);
		result.append(')');
		return result.toString();
	}

} //MeasurementImpl
