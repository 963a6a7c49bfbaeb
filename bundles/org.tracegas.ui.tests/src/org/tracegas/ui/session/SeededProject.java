package org.tracegas.ui.session;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.tracegas.library.Compound;
import org.tracegas.library.Origin;
import org.tracegas.library.OriginKind;
import org.tracegas.library.ReferenceConditions;
import org.tracegas.library.ReferenceMetadata;
import org.tracegas.method.MethodVersions;
import org.tracegas.method.StoredMethod;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.Measurement;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.Project;
import org.tracegas.model.ReferenceLibrary;
import org.tracegas.model.VersionKind;
import org.tracegas.model.Workspace;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.preprocess.TransformSettings;
import org.tracegas.quantify.AnalysisRegion;
import org.tracegas.quantify.Analyte;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.ReferenceSpectrum;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * A small project the desk's tests seed into a workspace: a client, a kiln stack campaign with three sample
 * measurements granted to an analyst and a quality manager the workspace has, a library of invented (synthetic)
 * band shapes and a CO / N2O method. The band shapes are sums of Lorentz lines around invented band centres and
 * are marked synthetic everywhere.
 */
public final class SeededProject {

    public static final String PROJECT_CODE = "HLW-26-03";

    static final SpectralAxis AXIS = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 1950, 0.5, 701);
    static final double PATH_METRES = 5.0;
    /** Sample times; the last comes 110 min after the background, well within the QA plan's limit. */
    static final List<Instant> TIMES = List.of(Instant.parse("2026-03-10T08:00:00Z"),
            Instant.parse("2026-03-10T08:01:00Z"), Instant.parse("2026-03-10T09:10:00Z"));
    static final Instant BACKGROUND = Instant.parse("2026-03-10T07:20:00Z");

    /** Ids of what was seeded, the model tree for the navigator and the method version as stored. */
    public record Seeded(Workspace model, String projectId, List<String> measurementIds, String methodVersionId,
            String libraryVersionId, StoredMethod method, List<org.tracegas.library.ReferenceSpectrum> library,
            List<Spectrum> samples, List<Instant> measurementTimes, Instant backgroundTime) {
    }

    private SeededProject() {
    }

    /**
     * Seeds a workspace with the demo project. The users come from the caller (the workspace's administrator
     * made them): the desk has no users or passwords of its own.
     *
     * @param analyst   records the measurements and versions, and may write the project
     * @param managerId may read the project (a quality manager or reviewer)
     */
    public static Seeded seed(WorkspaceStore store, Session admin, Session analyst, String managerId) {
        String analystId = analyst.userId();
        String clientId = store.projects().createClient(admin, "Harbour Lime Works").getId();
        Project project = store.projects().createProject(admin, clientId, PROJECT_CODE,
                "Kiln stack, March campaign");
        store.projects().grant(admin, project.getId(), analystId, AccessLevel.WRITE);
        store.projects().grant(admin, project.getId(), managerId, AccessLevel.READ);
        List<String> measurements = new ArrayList<>();
        for (Instant t : TIMES) {
            measurements.add(store.projects().recordMeasurement(analyst, project.getId(), MeasurementKind.SAMPLE, t,
                    453.15, 1013.0));
        }
        List<ReferenceSpectrum> refs = references();
        QuantificationMethod method = method(refs);
        ContentVersion library = store.versions().create(analyst, VersionKind.LIBRARY, "Demo band shapes",
                "origin=synthetic\ncompounds=CO,N2O,H2O\n", "demo library");
        // the demo's samples are absorbance spectra already; the transform is recorded as the default one
        StoredMethod stored = new StoredMethod(method, TransformSettings.defaults(), library.getId(),
                library.getContentHash());
        ContentVersion methodVersion = store.versions().create(analyst, VersionKind.METHOD, method.name(),
                stored.content(), "demo method");
        List<Spectrum> samples = new ArrayList<>();
        for (int i = 0; i < measurements.size(); i++) {
            samples.add(sample(refs, 40 + 15 * i, 8 + 2 * i, 9000, 11 + i));
        }
        Workspace model = model(store.projects().project(analyst, project.getId()),
                store.projects().measurements(analyst, project.getId()), stored, methodVersion, library);
        return new Seeded(model, project.getId(), List.copyOf(measurements), methodVersion.getId(), library.getId(),
                stored, libraryEntries(refs), List.copyOf(samples), TIMES, BACKGROUND);
    }

    /** Invented band shapes at 100 ppm·m each. */
    static List<ReferenceSpectrum> references() {
        return List.of(new ReferenceSpectrum("CO", band(2143, 3.8, 12, 0.004), 100),
                new ReferenceSpectrum("N2O", band(2224, 0.85, 10, 0.006), 100),
                new ReferenceSpectrum("H2O", band(2060, 6.5, 5, 0.00002), 100));
    }

    /** P and R branch lines of a rotational band around {@code centre}, line spacing {@code spacing}. */
    private static Spectrum band(double centre, double spacing, int lines, double peak) {
        double[] v = new double[AXIS.size()];
        double halfWidth = 0.35;
        for (int j = 1; j <= lines; j++) {
            double envelope = j * Math.exp(-j * j / (0.3 * lines * lines));
            for (double pos : new double[] {centre - j * spacing, centre + j * spacing}) {
                for (int i = 0; i < v.length; i++) {
                    double d = (AXIS.get(i) - pos) / halfWidth;
                    v[i] += peak * envelope / (1 + d * d);
                }
            }
        }
        return new Spectrum(AXIS, v, Ordinate.ABSORBANCE);
    }

    static QuantificationMethod method(List<ReferenceSpectrum> refs) {
        QuantificationMethod.Builder b = QuantificationMethod.builder("Kiln stack CO and N2O")
                .pathLengthMetres(PATH_METRES)
                .analyte(new Analyte("CO", List.of("H2O"), List.of(AnalysisRegion.of(2085, 2190, 1))))
                .analyte(new Analyte("N2O", List.of("CO"), List.of(AnalysisRegion.of(2195, 2270, 1))));
        refs.forEach(b::reference);
        return b.build();
    }

    /** A sample: the references scaled to the given ppm at the method's path, a small offset and noise. */
    static Spectrum sample(List<ReferenceSpectrum> refs, double coPpm, double n2oPpm, double h2oPpm, long seed) {
        double[] ppm = {coPpm, n2oPpm, h2oPpm};
        double[] v = new double[AXIS.size()];
        Random noise = new Random(seed);
        for (int i = 0; i < v.length; i++) {
            v[i] = 0.002 + 2e-4 * noise.nextGaussian();
            for (int k = 0; k < refs.size(); k++) {
                v[i] += refs.get(k).absorbance().get(i) * ppm[k] * PATH_METRES / refs.get(k).ppmMetres();
            }
        }
        return new Spectrum(AXIS, v, Ordinate.ABSORBANCE);
    }

    private static List<org.tracegas.library.ReferenceSpectrum> libraryEntries(List<ReferenceSpectrum> refs) {
        String[][] ids = {{"630-08-0", "CO", "28.010"}, {"10024-97-2", "N2O", "44.013"}, {"7732-18-5", "H2O", "18.015"}};
        List<org.tracegas.library.ReferenceSpectrum> out = new ArrayList<>();
        for (int k = 0; k < refs.size(); k++) {
            ReferenceMetadata meta = new ReferenceMetadata(
                    new Compound(refs.get(k).compound(), ids[k][0], ids[k][1], Double.parseDouble(ids[k][2])),
                    new ReferenceConditions(refs.get(k).ppmMetres(), 296, 101.3, 0.5, "triangular"),
                    new Origin(OriginKind.SYNTHETIC, "invented band shape for the demo"), 0.05);
            out.add(new org.tracegas.library.ReferenceSpectrum(refs.get(k).absorbance(), meta));
        }
        return List.copyOf(out);
    }

    /** The workspace with the project and its measurements as the store reads them. */
    private static Workspace model(Project project, List<Measurement> measurements, StoredMethod method,
            ContentVersion methodVersion, ContentVersion library) {
        WorkspaceFactory f = WorkspaceFactory.eINSTANCE;
        Workspace w = f.createWorkspace();
        w.setName("Demo workspace");
        for (Measurement m : measurements) {
            project.getMeasurements().add(m);
        }
        w.getClients().add(project.getClient());
        ReferenceLibrary lib = f.createReferenceLibrary();
        lib.setId(library.getItemId());
        lib.setName(library.getItemName());
        lib.setDescription("synthetic band shapes");
        w.getLibraries().add(lib);
        w.getMethods().add(MethodVersions.model(methodVersion, method));
        return w;
    }
}
