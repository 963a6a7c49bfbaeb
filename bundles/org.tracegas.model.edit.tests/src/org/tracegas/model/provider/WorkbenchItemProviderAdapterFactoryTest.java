package org.tracegas.model.provider;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.emf.edit.provider.IItemLabelProvider;
import org.eclipse.emf.edit.provider.IItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.IItemPropertySource;
import org.eclipse.emf.edit.provider.ITreeItemContentProvider;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.tracegas.model.AnalysisMethod;
import org.tracegas.model.AnalysisRegion;
import org.tracegas.model.Client;
import org.tracegas.model.EmissionSource;
import org.tracegas.model.Instrument;
import org.tracegas.model.Measurement;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.MethodVersion;
import org.tracegas.model.ProcessedSpectrum;
import org.tracegas.model.Project;
import org.tracegas.model.ReferenceLibrary;
import org.tracegas.model.ReferenceOrigin;
import org.tracegas.model.ReferenceSpectrum;
import org.tracegas.model.Site;
import org.tracegas.model.WorkBatch;
import org.tracegas.model.Report;
import org.tracegas.model.SpectralContent;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * The labels and properties the generated item providers give the workbench's navigator and properties view,
 * on objects of the lime-kiln campaign of the invented Eastfield Cement plant.
 */
class WorkbenchItemProviderAdapterFactoryTest {

    /**
     * SHA-256("abc"): FIPS 180-2, appendix B.1, one-block message (from memory; coreutils sha256sum prints it
     * too), as the store writes it: lower-case hex.
     */
    private static final String SHA256_ABC = "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad";

    private final WorkbenchItemProviderAdapterFactory factory = new WorkbenchItemProviderAdapterFactory();
    private final WorkspaceFactory model = WorkspaceFactory.eINSTANCE;

    @AfterEach
    void dispose() {
        factory.dispose();
    }

    private Map<String, String> properties(Object o) {
        IItemPropertySource source = (IItemPropertySource) factory.adapt(o, IItemPropertySource.class);
        Map<String, String> shown = new LinkedHashMap<>();
        for (IItemPropertyDescriptor d : source.getPropertyDescriptors(o)) {
            Object value = d.getPropertyValue(o);
            // an attribute's value comes wrapped (for cell editors); its label provider writes the plain value
            value = value instanceof IItemPropertySource wrapper ? wrapper.getEditableValue(value) : value;
            shown.put(d.getDisplayName(o), d.getLabelProvider(o).getText(value));
        }
        return shown;
    }

    private String text(Object o) {
        return ((IItemLabelProvider) factory.adapt(o, IItemLabelProvider.class)).getText(o);
    }

    private Project campaign() {
        Client client = model.createClient();
        client.setName("Eastfield Cement");
        Project p = model.createProject();
        p.setCode("KLN-2026-07");
        p.setName("Kiln 1 stack, July day");
        client.getProjects().add(p);
        return p;
    }

    private static Measurement measurement(Project p, MeasurementKind kind, String time) {
        Measurement m = WorkspaceFactory.eINSTANCE.createMeasurement();
        m.setKind(kind);
        m.setTime(time == null ? null : Instant.parse(time));
        p.getMeasurements().add(m);
        return m;
    }

    @Test
    void labelsNameTheObjectsAsTheLabWritesThem() {
        Project p = campaign();
        Measurement cts = measurement(p, MeasurementKind.CALIBRATION_TRANSFER_STANDARD, "2026-07-14T08:19:00Z");
        Measurement undated = measurement(p, MeasurementKind.SAMPLE, null);

        assertEquals("Eastfield Cement", text(p.getClient()));
        assertEquals("KLN-2026-07  Kiln 1 stack, July day  (2 measurements)", text(p));
        // ISO 8601 calendar date and time of day, in UTC (common practice, no source for the layout)
        assertEquals("calibration transfer standard  2026-07-14 08:19:00 UTC", text(cts));
        assertEquals("sample  time unknown", text(undated));

        AnalysisMethod method = model.createAnalysisMethod();
        method.setName("Kiln stack CO/NO");
        MethodVersion v = model.createMethodVersion();
        v.setNumber(2);
        v.setFrozen(true);
        method.getVersions().add(v);
        AnalysisRegion co = model.createAnalysisRegion();
        co.setCompound("CO");
        co.setLowerWavenumber(2040);
        co.setUpperWavenumber(2220.5);
        v.getRegions().add(co);
        assertEquals("Kiln stack CO/NO", text(method));
        assertEquals("version 2 (frozen)", text(v));
        assertEquals("CO  2040–2220.5 cm-1", text(co));
    }

    @Test
    void aLibrarysReferencesAreItsChildrenNamedByCompoundAmountAndAComputedOneSaysSo() {
        ReferenceLibrary library = model.createReferenceLibrary();
        library.setName("Kiln gases 2026");
        ReferenceSpectrum co = model.createReferenceSpectrum();
        co.setCompound("Carbon monoxide");
        co.setPpmMetres(200);
        co.setOrigin(ReferenceOrigin.MEASURED);
        ReferenceSpectrum no = model.createReferenceSpectrum();
        no.setCompound("Nitric oxide");
        no.setPpmMetres(97.5);
        no.setOrigin(ReferenceOrigin.SYNTHETIC);
        library.getReferences().addAll(List.of(co, no));
        ITreeItemContentProvider tree = (ITreeItemContentProvider) factory.adapt(library,
                ITreeItemContentProvider.class);
        assertEquals(List.of(co, no), List.copyOf(tree.getChildren(library)));
        assertEquals("Carbon monoxide  200 ppm·m", text(co));
        assertEquals("Nitric oxide  97.5 ppm·m  (synthetic)", text(no));
    }

    @Test
    void aReferencesPropertiesStateItsConditionsWithUnitsAndPinItsSpectrumByHash() {
        ReferenceSpectrum co = model.createReferenceSpectrum();
        co.setCompound("Carbon monoxide");
        // CAS registry number of carbon monoxide, 630-08-0 (from memory; its check digit is verified by the library)
        co.setCasNumber("630-08-0");
        co.setPpmMetres(200);
        co.setTemperature(296);
        co.setPressure(101.325);
        co.setResolution(0.5);
        co.setApodization("Norton-Beer medium");
        co.setOrigin(ReferenceOrigin.SYNTHETIC);
        co.setOriginText("computed from line parameters");
        co.setContentSha256(SHA256_ABC);
        Map<String, String> shown = properties(co);
        assertEquals("630-08-0", shown.get("CAS No."));
        assertEquals("200.0", shown.get("Amount (ppm·m)"));
        assertEquals("296.0", shown.get("Temperature (K)"));
        // the reference library states its pressures in kPa, a measurement its cell pressure in hPa
        assertEquals("101.325", shown.get("Pressure (kPa)"));
        assertEquals("0.5", shown.get("Resolution (cm-1)"));
        assertEquals("Norton-Beer medium", shown.get("Apodization"));
        assertEquals("synthetic (computed, not measured)", shown.get("Origin"));
        assertEquals("computed from line parameters", shown.get("Origin (details)"));
        assertEquals(SHA256_ABC, shown.get("Spectrum file SHA-256"));
        assertEquals(10, shown.size(), shown.keySet().toString());
    }

    @Test
    void theTreeGoesClientProjectMeasurementAndAMeasurementIsALeaf() {
        Project p = campaign();
        Measurement m = measurement(p, MeasurementKind.SAMPLE, "2026-07-14T00:00:00Z");
        m.getLabels().put("operator note", "probe heated");
        ITreeItemContentProvider clients = (ITreeItemContentProvider) factory.adapt(p.getClient(),
                ITreeItemContentProvider.class);
        assertEquals(List.of(p), List.copyOf(clients.getChildren(p.getClient())));
        ITreeItemContentProvider projects = (ITreeItemContentProvider) factory.adapt(p, ITreeItemContentProvider.class);
        assertEquals(List.of(m), List.copyOf(projects.getChildren(p)));
        // the file's labels are no tree nodes: thousands of measurements each carry a dozen
        ITreeItemContentProvider measurements = (ITreeItemContentProvider) factory.adapt(m,
                ITreeItemContentProvider.class);
        assertFalse(measurements.hasChildren(m));
        assertEquals(p, measurements.getParent(m));
    }

    @Test
    void aMeasurementsPropertiesCarryTheirUnitsAndTheSourceFilesHash() {
        Measurement m = measurement(campaign(), MeasurementKind.SPAN, "2026-07-14T06:30:00Z");
        m.setCellTemperature(464.15);
        m.setCellPressure(1013.25);
        m.setSourceFile("kiln1-0630.jdx");
        m.setSourceSha256(SHA256_ABC);
        Map<String, String> shown = properties(m);
        assertEquals("464.15", shown.get("Cell temperature (K)"));
        assertEquals("1013.25", shown.get("Cell pressure (hPa)"));
        assertEquals("span", shown.get("Kind"));
        assertEquals("kiln1-0630.jdx", shown.get("Source file"));
        assertEquals(SHA256_ABC, shown.get("Source file SHA-256"));
        // the values are a block of their own in the store, never read into the model: no property for them
        assertFalse(shown.containsKey("Spectrum"), shown.keySet().toString());
        assertTrue(shown.containsKey("Time (UTC)"), shown.keySet().toString());
    }

    @Test
    void aClientShowsItsSitesAndASiteItsEmissionSources() {
        Project p = campaign();
        Site plant = model.createSite();
        plant.setName("Eastfield works");
        EmissionSource kiln = model.createEmissionSource();
        kiln.setName("Kiln 1 stack");
        plant.getSources().add(kiln);
        p.getClient().getSites().add(plant);
        p.setSource(kiln);

        ITreeItemContentProvider clients = (ITreeItemContentProvider) factory.adapt(p.getClient(),
                ITreeItemContentProvider.class);
        assertEquals(List.of(p, plant), List.copyOf(clients.getChildren(p.getClient())));
        ITreeItemContentProvider sites = (ITreeItemContentProvider) factory.adapt(plant, ITreeItemContentProvider.class);
        assertEquals(List.of(kiln), List.copyOf(sites.getChildren(plant)));
        assertEquals("Eastfield works", text(plant));
        assertEquals("Kiln 1 stack", text(kiln));
        // the campaign refers to its source; the source stays where its site holds it
        assertEquals(kiln, shown(p).get("Emission source"));
    }

    @Test
    void aMeasurementsPropertiesNameItsInstrument() {
        Measurement m = measurement(campaign(), MeasurementKind.SAMPLE, "2026-07-14T06:31:00Z");
        Instrument bench = model.createInstrument();
        bench.setName("Bench FTIR 2");
        bench.setSerialNumber("EC-0417");
        bench.setLaserWavenumber(15798.0);
        bench.setMaxPathDifference(1.0);
        bench.setCellPathLength(6.4);
        m.setInstrument(bench);

        assertEquals("Bench FTIR 2  (serial EC-0417)", text(bench));
        assertEquals("Bench FTIR 2  (serial EC-0417)", text(shown(m).get("Instrument")));
        Map<String, Object> figures = shown(bench);
        assertEquals(15798.0, figures.get("Laser wavenumber (cm-1)"));
        assertEquals(1.0, figures.get("Maximum path difference (cm)"));
        assertEquals(6.4, figures.get("Cell path length (m)"));
        assertTrue(figures.containsKey("Field of view, half-angle (mrad)"), figures.keySet().toString());
    }

    /** The values the properties view shows of an object, by their names, attributes unwrapped. */
    private Map<String, Object> shown(Object o) {
        IItemPropertySource source = (IItemPropertySource) factory.adapt(o, IItemPropertySource.class);
        Map<String, Object> shown = new LinkedHashMap<>();
        for (IItemPropertyDescriptor d : source.getPropertyDescriptors(o)) {
            Object value = d.getPropertyValue(o);
            shown.put(d.getDisplayName(o), value instanceof IItemPropertySource w ? w.getEditableValue(value) : value);
        }
        return shown;
    }

    @Test
    void aProjectsWorkBatchIsNamedByItsUnitsAndStartAndItsPropertiesSayWhoStartedItWithWhichVersion() {
        Project p = campaign();
        WorkBatch batch = model.createWorkBatch();
        batch.setId("b-0714");
        batch.setMethodVersionId("v-kiln-2");
        batch.setDescription("morning container files");
        batch.setUnitCount(12);
        batch.setCreatedBy("u-analyst");
        batch.setCreatedAt(Instant.parse("2026-07-14T09:05:00Z"));
        p.getBatches().add(batch);
        WorkBatch single = model.createWorkBatch();
        single.setUnitCount(1);
        p.getBatches().add(single);

        assertEquals("work batch of 12 units  2026-07-14 09:05:00 UTC", text(batch));
        assertEquals("work batch of 1 unit  time unknown", text(single));
        ITreeItemContentProvider projects = (ITreeItemContentProvider) factory.adapt(p, ITreeItemContentProvider.class);
        assertEquals(List.of(batch, single), List.copyOf(projects.getChildren(p)));
        Map<String, String> shown = properties(batch);
        assertEquals("v-kiln-2", shown.get("Method version id"));
        assertEquals("morning container files", shown.get("Description"));
        assertEquals("12", shown.get("Work units"));
        assertEquals("u-analyst", shown.get("Created by (user id)"));
        assertEquals("2026-07-14T09:05:00Z", shown.get("Created (UTC)"));
    }

    @Test
    void aProcessedSpectrumIsNamedByItsContentAndShowsItsHashesButNotItsValues() {
        ProcessedSpectrum s = model.createProcessedSpectrum();
        s.setContent(SpectralContent.SINGLE_BEAM);
        s.setMeasurementId("m-0630");
        s.setSampleEncoding("FLOAT32_LE");
        s.setSha256(SHA256_ABC);
        assertEquals("single beam  (values not read)", text(s));
        s.setSpectrum(new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 600, 0.5, 3), new double[] {1, 2, 3},
                Ordinate.SINGLE_BEAM));
        assertEquals("single beam  3 points", text(s));

        Map<String, String> shown = properties(s);
        assertEquals("single beam", shown.get("Content"));
        assertEquals("m-0630", shown.get("Measurement id"));
        assertEquals("FLOAT32_LE", shown.get("Stored as (encoding)"));
        assertEquals(SHA256_ABC, shown.get("Values SHA-256"));
        assertTrue(shown.containsKey("Processing recipe SHA-256"), shown.keySet().toString());
        // a few thousand numbers are no property value: the spectrum view draws them
        assertFalse(shown.containsKey("Spectrum"), shown.keySet().toString());
    }

    @Test
    void aReportIsAChildOfItsProjectNamedByItsIdAndIssueAndShowsItsSignedHash() {
        Project p = campaign();
        measurement(p, MeasurementKind.SAMPLE, "2026-07-14T06:00:00Z");
        Report r = model.createReport();
        r.setReportId("KLN-2026-07-R1");
        r.setIssued(Instant.parse("2026-07-20T09:15:00Z"));
        r.setContentSha256(SHA256_ABC);
        r.setFileName("report.pdf");
        p.getReports().add(r);
        assertEquals("report KLN-2026-07-R1  issued 2026-07-20 09:15:00 UTC", text(r));
        ITreeItemContentProvider projects = (ITreeItemContentProvider) factory.adapt(p, ITreeItemContentProvider.class);
        assertEquals(List.of(p.getMeasurements().get(0), r), List.copyOf(projects.getChildren(p)));

        Map<String, String> shown = properties(r);
        assertEquals(SHA256_ABC, shown.get("Content SHA-256 (signed)"));
        assertEquals("report.pdf", shown.get("File"));
        assertTrue(shown.containsKey("Issued by (user id)") && shown.containsKey("Pages"), shown.keySet().toString());
    }
}
