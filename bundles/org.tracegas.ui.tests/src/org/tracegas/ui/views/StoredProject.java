package org.tracegas.ui.views;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.tracegas.library.io.LibraryVersionText;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.Project;
import org.tracegas.model.Provenance;
import org.tracegas.model.Result;
import org.tracegas.model.ResultFlag;
import org.tracegas.model.Results;
import org.tracegas.model.Role;
import org.tracegas.model.SpectralContent;
import org.tracegas.model.VersionKind;
import org.tracegas.qa.campaign.StoredQaChecks;
import org.tracegas.qa.checks.AcceptanceLimits;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.checks.Rule;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.SampleEncoding;
import org.tracegas.store.Session;
import org.tracegas.store.SpectrumInput;
import org.tracegas.store.WorkspaceStore;

/**
 * A project written through the store and campaign services as a campaign leaves it, with nothing the desk
 * made itself: a background and {@link #SAMPLES} samples, the absorbance spectrum of every sample, CO and NO
 * results (the last NO value flagged) and two stored QA outcomes judged by published limits.
 */
final class StoredProject {

    static final String ANALYST = "m.ferreira";
    static final String PASSWORD = "stored-project-pass";
    static final String CODE = "GLS-2026-09";
    static final int SAMPLES = 4;
    static final Instant FIRST = Instant.parse("2026-09-22T10:00:00Z");
    /** EPA Method 320 §8.11.3: pre- and post-test CTS within ±5 % of their mean. */
    static final String CTS_RULE = "pre- and post-test CTS agree within 5 % of their mean";
    static final String CTS_SOURCE = "EPA Method 320, section 8.11.3";
    /** EPA Method 320 §8.6.2: mean spike recovery within 0.7 to 1.3 of the expected value. */
    static final String SPIKE_RULE = "mean spike recovery between 0.7 and 1.3 of the expected value";
    static final String SPIKE_SOURCE = "EPA Method 320, section 8.6.2";

    final Project project;
    final List<String> sampleIds = new ArrayList<>();

    /** Name of the library; its version is recorded from a manifest as the runner records it. */
    static final String LIBRARY = "Furnace references";
    static final String REPORT_ID = "GLS-2026-09-R1";
    /** The plant and the emission source the project measures. */
    static final String SITE = "Hollin Bank works";
    static final String SOURCE = "Stack K3";

    StoredProject(WorkspaceStore store, Path folder) throws IOException {
        Session admin = store.users().createFirstAdministrator("admin", "Administrator", PASSWORD.toCharArray());
        String analystId = store.users().createUser(admin, ANALYST, "Marta Ferreira", Set.of(Role.ANALYST),
                PASSWORD.toCharArray()).getId();
        String client = store.projects().createClient(admin, "Glasshouse Lane Glassworks").getId();
        project = store.projects().createProject(admin, client, CODE, "Furnace 3 flue, September");
        String site = store.sites().createSite(admin, client, SITE, "float glass lines").getId();
        store.sites().setSource(admin, project.getId(), store.sites().createSource(admin, site, SOURCE,
                "furnace 3 exhaust after the filter").getId());
        store.projects().grant(admin, project.getId(), analystId, AccessLevel.WRITE);
        Session analyst = store.users().logIn(ANALYST, PASSWORD.toCharArray());
        store.projects().recordMeasurement(analyst, project.getId(), MeasurementKind.BACKGROUND,
                FIRST.minus(Duration.ofMinutes(5)), 453.15, 1013.0);
        ContentVersion method = store.versions().create(analyst, VersionKind.METHOD, "Furnace CO and NO",
                "compounds=CO,NO\n", "first");
        ContentVersion library = store.versions().create(analyst, VersionKind.LIBRARY, LIBRARY,
                libraryText(folder), "first");
        List<Result> results = new ArrayList<>();
        for (int i = 0; i < SAMPLES; i++) {
            String m = store.projects().recordMeasurement(analyst, project.getId(), MeasurementKind.SAMPLE,
                    FIRST.plus(Duration.ofMinutes(i)), 453.15, 1013.0);
            sampleIds.add(m);
            store.spectra().store(analyst, project.getId(), new SpectrumInput(m, SpectralContent.ABSORBANCE,
                    band(0.1 * (i + 1)), SampleEncoding.FLOAT64_LE));
            results.add(result(m, "CO", 30 + i, Set.of(), method, library));
            results.add(result(m, "NO", 80 + i, i == SAMPLES - 1 ? Set.of(ResultFlag.HIGH_RESIDUAL) : Set.of(),
                    method, library));
        }
        store.results().recordAll(analyst, project.getId(), results);
        StoredQaChecks.store(store, analyst, project.getId(), method.getId(), List.of(
                CheckOutcome.judge("CTS pre/post agreement", 3.1, "%", AcceptanceLimits.atMost(5),
                        new Rule(CTS_RULE, CTS_SOURCE)),
                CheckOutcome.judge("Spike recovery", 0.62, "", new AcceptanceLimits(0.7, 1.3),
                        new Rule(SPIKE_RULE, SPIKE_SOURCE))));
        org.tracegas.model.Report report = org.tracegas.model.WorkspaceFactory.eINSTANCE.createReport();
        report.setReportId(REPORT_ID);
        report.setTitle("Glasshouse Lane Glassworks, furnace 3 flue, 2026-09-22");
        // SHA-256 of "abc": FIPS 180-2, appendix B.1
        report.setContentSha256("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
        report.setFileName("report.pdf");
        report.setMethodVersionId(method.getId());
        report.setLibraryVersionId(library.getId());
        store.reports().record(analyst, project.getId(), report);
    }

    /**
     * The stored text of a library folder with a measured CO and a synthetic NO reference (CAS numbers from the
     * NIST Chemistry WebBook, from memory), made by {@link LibraryVersionText} from real files.
     */
    private static String libraryText(Path folder) throws IOException {
        Path lib = Files.createDirectories(folder.resolve("furnace-library"));
        Files.writeString(lib.resolve("co.txt"), "2000 0.0\n2001 0.1\n");
        Files.writeString(lib.resolve("no.txt"), "1850 0.0\n1851 0.2\n");
        Path manifest = Files.writeString(lib.resolve("library.manifest"), String.join("\n",
                "library = " + LIBRARY, "",
                "[reference]", "file = co.txt", "compound = Carbon monoxide", "cas = 630-08-0", "formula = CO",
                "molar-mass = 28.010", "ppm-m = 200", "temperature = 296", "pressure = 101.325",
                "resolution = 0.5", "apodization = triangular", "origin = measured",
                "origin-text = 10 m cell, 2026 calibration", "uncertainty = 0.02", "",
                "[reference]", "file = no.txt", "compound = Nitric oxide", "cas = 10102-43-9", "formula = NO",
                "molar-mass = 30.006", "ppm-m = 100", "temperature = 296", "pressure = 101.325",
                "resolution = 0.5", "apodization = triangular", "origin = synthetic",
                "origin-text = computed from line parameters", "uncertainty = 0.05", ""));
        return LibraryVersionText.of(manifest);
    }

    /** A CO-like band at 2143 cm⁻¹ (CO fundamental, NIST Chemistry WebBook, from memory) of a given height. */
    static Spectrum band(double height) {
        int n = 801;
        double[] a = new double[n];
        for (int k = 0; k < n; k++) {
            double x = (2000 + 0.5 * k - 2143) / 8;
            a[k] = height / (1 + x * x);
        }
        return new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 0.5, n), a, Ordinate.ABSORBANCE);
    }

    private static Result result(String measurementId, String compound, double ppm, Set<ResultFlag> flags,
            ContentVersion method, ContentVersion library) {
        return Results.of(measurementId, compound, ppm, 0.5, 0.2, "ppm", flags,
                new Provenance(method.getId(), library.getId(), "Tracegas Workbench 0.1.0", "0".repeat(64)), null);
    }
}
