package org.tracegas.benchmarks;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.UUID;
import java.util.concurrent.TimeUnit;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import org.postgresql.ds.PGSimpleDataSource;
import org.tracegas.model.Instrument;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.Provenance;
import org.tracegas.model.Result;
import org.tracegas.model.ResultFlag;
import org.tracegas.model.Results;
import org.tracegas.model.Role;
import org.tracegas.model.SpectralContent;
import org.tracegas.model.VersionKind;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.ProcessedSpectrum;
import org.tracegas.store.SampleEncoding;
import org.tracegas.store.Session;
import org.tracegas.store.SpectrumInput;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * Storage of 64 processed spectra (6,800-point float32 absorbance, 9 results each, as the demo campaign makes
 * them): one transaction per service call (measurement, spectrum, results: 3 per spectrum) against one block
 * in one transaction, its measurements linked to their instrument ({@code instrument=named}, as the batch path
 * stores a container stream's) or of no known instrument ({@code unknown}), both measured in the same run, so
 * their ratio is the cost of the links. Backend h2 is a workspace file in a temporary folder; backend postgresql
 * needs the system property tracegas.bench.pg.url (user and password tracegas.bench.pg.user/.password, default
 * "tracegas") and works in a fresh schema that it drops afterwards.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgs = "-Xmx2g")
@Warmup(iterations = 3, time = 5)
@Measurement(iterations = 5, time = 5)
public class BlockStorageBenchmark {

    private static final int SPECTRA = 64;
    private static final int POINTS = 6_800;
    private static final String[] COMPOUNDS = {"H2O", "CO2", "CO", "NO", "NO2", "SO2", "HCl", "NH3", "CH4"};

    @Param({"h2", "postgresql"})
    public String backend;

    @Param({"named", "unknown"})
    public String instrument;

    private Path folder;
    private String schema;
    private WorkspaceStore store;
    private Session analyst;
    private String projectId;
    private List<ProcessedSpectrum> block;

    @Setup(Level.Trial)
    public void setUp() throws Exception {
        if (backend.equals("h2")) {
            folder = Files.createTempDirectory("tracegas-block-bench");
            store = Workspaces.openH2(folder);
        } else {
            schema = "bench_" + UUID.randomUUID().toString().replace("-", "");
            try (Connection c = pg(url()); Statement s = c.createStatement()) {
                s.execute("CREATE SCHEMA " + schema);
            }
            store = Workspaces.openPostgres(url() + "?currentSchema=" + schema, user(), password());
        }
        Session admin = store.users().createFirstAdministrator("admin", "Admin", "bench-admin-1".toCharArray());
        store.users().createUser(admin, "ana", "Analyst", Set.of(Role.ANALYST), "bench-ana-12".toCharArray());
        analyst = store.users().logIn("ana", "bench-ana-12".toCharArray());
        projectId = store.projects().createProject(analyst, store.projects().createClient(analyst, "Client").getId(),
                "B-1",
                "Benchmark").getId();
        String method = store.versions().create(analyst, VersionKind.METHOD, "m", "a=1\n", "bench").getId();
        String library = store.versions().create(analyst, VersionKind.LIBRARY, "l", "b=1\n", "bench").getId();
        String analyzer = null;
        if (instrument.equals("named")) {
            Instrument i = WorkspaceFactory.eINSTANCE.createInstrument();
            i.setName("Bench analyzer");
            i.setSerialNumber("BENCH-1");
            i.setLaserWavenumber(15798.0);
            i.setMaxPathDifference(1.0);
            i.setCellPathLength(6.4);
            analyzer = store.instruments().record(analyst, i).getId();
        }
        block = block(method, library, analyzer);
    }

    /**
     * 64 processed spectra as the demo campaign makes them, each with 9 results of the given versions.
     *
     * @param instrumentId the stored instrument that made them, or null when not known
     */
    public static List<ProcessedSpectrum> block(String method, String library, String instrumentId) {
        List<ProcessedSpectrum> block = new ArrayList<>();
        SpectralAxis axis = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 600.0, 0.5, POINTS);
        for (int i = 0; i < SPECTRA; i++) {
            double[] values = new double[POINTS];
            for (int k = 0; k < POINTS; k++) {
                values[k] = 0.01 * Math.sin(0.001 * k * (i + 1));
            }
            Provenance provenance = new Provenance(method, library, "bench",
                    "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855");
            List<Result> results = new ArrayList<>();
            for (String compound : COMPOUNDS) {
                results.add(Results.of(null, compound, 10 + i, 0.5, 0.2, "ppm", Set.of(ResultFlag.HIGH_RESIDUAL),
                        provenance, null));
            }
            block.add(new ProcessedSpectrum(MeasurementKind.SAMPLE, Instant.EPOCH.plusSeconds(60L * i), 438.15,
                    1013.0, new Spectrum(axis, values, Ordinate.ABSORBANCE),
                    SampleEncoding.FLOAT32_LE, results, instrumentId));
        }
        return block;
    }

    @TearDown(Level.Trial)
    public void tearDown() throws Exception {
        store.close();
        if (schema != null) {
            try (Connection c = pg(url()); Statement s = c.createStatement()) {
                s.execute("DROP SCHEMA " + schema + " CASCADE");
            }
        }
    }

    /** Each spectrum as three service calls, three transactions. */
    @Benchmark
    public int perSpectrumCalls() {
        int stored = 0;
        for (ProcessedSpectrum p : block) {
            String measurement = store.projects().recordMeasurement(analyst, projectId, p.kind(), p.time(),
                    p.cellTemperature(), p.cellPressure());
            store.spectra().store(analyst, projectId, new SpectrumInput(measurement, SpectralContent.ABSORBANCE,
                    p.absorbance(), p.encoding()));
            List<Result> results = new ArrayList<>(EcoreUtil.copyAll(p.results()));
            results.forEach(r -> r.setMeasurementId(measurement));
            stored += store.results().recordAll(analyst, projectId, results).size();
        }
        return stored;
    }

    /** All 64 spectra in one block, one transaction. */
    @Benchmark
    public int oneBlock() {
        return store.blocks().store(analyst, projectId, block).size();
    }

    private static String url() {
        String url = System.getProperty("tracegas.bench.pg.url");
        if (url == null) {
            throw new IllegalStateException("backend postgresql needs -Dtracegas.bench.pg.url=jdbc:postgresql://...");
        }
        return url;
    }

    private static String user() {
        return System.getProperty("tracegas.bench.pg.user", "tracegas");
    }

    private static String password() {
        return System.getProperty("tracegas.bench.pg.password", "tracegas");
    }

    private static Connection pg(String url) throws Exception {
        PGSimpleDataSource ds = new PGSimpleDataSource();
        ds.setURL(url);
        ds.setUser(user());
        ds.setPassword(password());
        return ds.getConnection();
    }
}
