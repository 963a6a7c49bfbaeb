package org.tracegas.runner.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.UUID;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.stream.Collectors;
import java.util.stream.IntStream;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.postgresql.ds.PGSimpleDataSource;
import org.tracegas.pipeline.QuantificationSetup;
import org.tracegas.model.Instrument;
import org.tracegas.model.Measurement;
import org.tracegas.preprocess.InterferogramTransform;
import org.tracegas.quantify.BatchQuantifier;
import org.tracegas.runner.CommandTable;
import org.tracegas.runner.ExitCode;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.BatchProgress;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.WorkspaceVerification;
import org.tracegas.store.Workspaces;

/**
 * Three runner processes work one quantification batch on the PostgreSQL lab server (system properties
 * tracegas.test.pg.url, .user and .password; a fresh schema per test). One is killed with SIGKILL while it holds
 * a unit; the others finish the batch and take that unit once its lease has ended. Every unit is done exactly
 * once, every sample of every file is stored once with one result per analyte and names the analyzer the batch
 * was split with, and the audit chain verifies with every row it vouches for.
 * Of runners splitting the same quantification at once, one records the batch and the others are refused.
 */
class BatchProcessesTest {

    private static final String URL = System.getProperty("tracegas.test.pg.url",
            "jdbc:postgresql://127.0.0.1:55432/tracegas");
    private static final String USER = System.getProperty("tracegas.test.pg.user", "tracegas");
    private static final String PASSWORD = System.getProperty("tracegas.test.pg.password", "tracegas");
    private static final int FILES = 8;
    private static final int SAMPLES_PER_FILE = 3;
    private static final int RUNNERS = 3;
    /** CO, N2O and H2O: the analytes of the method. */
    private static final int COMPOUNDS = 3;

    @TempDir
    Path folder;
    private final String schema = "test_" + UUID.randomUUID().toString().replace("-", "");
    private final String schemaUrl = URL + (URL.contains("?") ? "&" : "?") + "currentSchema=" + schema;

    @BeforeEach
    void createSchema() throws SQLException {
        try (Connection c = connect(URL); Statement s = c.createStatement()) {
            s.execute("CREATE SCHEMA " + schema);
        }
    }

    @AfterEach
    void dropSchema() throws SQLException {
        try (Connection c = connect(URL); Statement s = c.createStatement()) {
            s.execute("DROP SCHEMA " + schema + " CASCADE");
        }
    }

    @Test
    void killedRunnerLosesNoUnitAndNoSampleIsStoredTwice() throws Exception {
        List<String> server = List.of("--server", schemaUrl, "--user", USER);
        BatchCampaign campaign = new BatchCampaign(folder, server, List.of("P"), FILES, SAMPLES_PER_FILE);
        String batchId = campaign.ok("batch-split", campaign.quantification("P", campaign.stackFiles,
                "--instrument", "Stack FTIR 1", "--instrument-serial", "NV-2207")).strip();

        List<Process> runners = new ArrayList<>();
        for (int r = 0; r < RUNNERS; r++) {
            if (r == 1) {
                // the first runner holds a unit before the others start, so that they cannot take every unit
                // while its JVM is still starting on a busy machine
                awaitClaimWithUnitsLeft(runners.get(0), "%:" + runners.get(0).pid());
            }
            List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java")
                    .toString(), "-cp", childClassPath(), BatchRunnerProcess.class.getName(), "batch-work"));
            command.addAll(server);
            // a short lease, so that the killed runner's unit comes back within the test's time
            command.addAll(List.of("--as", "ana", "--batch", batchId, "--lease", "2", "--idle-poll", "0.2"));
            ProcessBuilder pb = new ProcessBuilder(command).redirectOutput(folder.resolve("runner-" + r + ".out")
                    .toFile()).redirectError(folder.resolve("runner-" + r + ".err").toFile());
            pb.environment().putAll(BatchCampaign.ENV);
            runners.add(pb.start());
        }
        for (Process runner : runners) {
            // what every user of the machine sees in the process list (/proc/<pid>/cmdline): no password
            Path cmdline = Path.of("/proc", Long.toString(runner.pid()), "cmdline");
            List<String> args = List.of(new String(Files.readAllBytes(cmdline), StandardCharsets.UTF_8).split("\0"));
            assertTrue(args.contains("batch-work"), "the runner's own arguments were read: " + args);
            for (int i = 0; i < args.size(); i++) {
                assertFalse(args.get(i).toLowerCase(java.util.Locale.ROOT).contains("password"), args.toString());
                // the test server's user and password are alike: the user may appear, as --user's value only
                assertTrue(!args.get(i).equals(PASSWORD) || i > 0 && args.get(i - 1).equals("--user"),
                        "a password on the command line: " + args);
            }
        }
        Process victim = runners.get(0);
        String victimId = "%:" + victim.pid();
        awaitClaimWithUnitsLeft(victim, victimId);
        victim.toHandle().destroyForcibly(); // SIGKILL on Linux: no orderly shutdown, the unit stays claimed
        assertTrue(victim.waitFor(30, TimeUnit.SECONDS));
        List<Integer> held = query("SELECT seq FROM work_unit WHERE state = 'CLAIMED' AND claimed_by LIKE ?",
                rs -> rs.getInt(1), victimId);
        assertEquals(1, held.size(), "the killed runner held one unit: " + held);

        for (int r = 1; r < RUNNERS; r++) {
            Process p = runners.get(r);
            assertTrue(p.waitFor(60, TimeUnit.SECONDS), "runner " + r + " did not finish");
            String out = Files.readString(folder.resolve("runner-" + r + ".out"));
            Path err = folder.resolve("runner-" + r + ".err");
            assertEquals(ExitCode.OK, p.exitValue(), () -> out + log(err));
            assertTrue(out.contains("Batch " + batchId + " complete: " + FILES + " units"), out);
        }

        assertTrue(campaign.ok("batch-status", "--as", "ana", "--batch", batchId).contains(FILES + " done, 0 failed: complete"));
        int heldUnit = held.get(0);
        assertTrue(query("SELECT attempt FROM work_unit WHERE seq = ?", rs -> rs.getInt(1), heldUnit).get(0) >= 2,
                "the killed runner's unit was claimed again");
        assertNotEquals(victim.pid(), query("SELECT claimed_by FROM work_unit WHERE seq = ?", rs -> rs.getString(1),
                heldUnit).get(0).replaceAll(".*:", ""), "another runner completed it");
        try (WorkspaceStore store = Workspaces.openPostgres(schemaUrl, USER, PASSWORD)) {
            Session ana = store.users().logIn("ana", BatchCampaign.PASSWORD.toCharArray());
            String project = store.projects().findByCode(ana, "P").orElseThrow().getId();
            assertEquals(new BatchProgress(0, 0, FILES, 0), store.workUnits().progress(ana, batchId));
            Map<String, Instant> times = store.projects().measurements(ana, project).stream()
                    .collect(Collectors.toMap(Measurement::getId, Measurement::getTime));
            for (int unit = 0; unit < FILES; unit++) {
                final int f = unit;
                assertEquals(IntStream.range(0, SAMPLES_PER_FILE).mapToObj(k -> campaign.time(f, k)).toList(),
                        store.workUnits().measurementsOf(ana, batchId, unit).stream().map(times::get).toList(),
                        "unit " + unit + " holds each sample of " + campaign.stackFiles.get(unit) + " once");
            }
            Set<Instant> expected = new LinkedHashSet<>();
            for (int f = 0; f < FILES; f++) {
                for (int k = 0; k < SAMPLES_PER_FILE; k++) {
                    expected.add(campaign.time(f, k));
                }
            }
            assertEquals(FILES * SAMPLES_PER_FILE, times.size(), "no sample stored twice, none missing");
            assertEquals(expected, new LinkedHashSet<>(times.values().stream().sorted().toList()));
            Map<String, Long> resultsPerMeasurement = store.results().results(ana, project).stream()
                    .collect(Collectors.groupingBy(r -> r.getMeasurementId(), Collectors.counting()));
            assertEquals(times.keySet(), resultsPerMeasurement.keySet());
            resultsPerMeasurement.forEach((m, n) -> assertEquals(COMPOUNDS, n, "results of measurement at "
                    + times.get(m)));
            // each runner read the analyzer from the batch: every measurement names it, whoever stored it, and
            // its audit record vouches for the link
            Instrument analyzer = store.instruments().find(ana, "Stack FTIR 1", "NV-2207").orElseThrow();
            BatchCampaign.assertWrittenFigures(analyzer);
            for (Measurement m : store.projects().measurements(ana, project)) {
                assertEquals(analyzer.getId(), m.getInstrument() == null ? null : m.getInstrument().getId(),
                        "measurement at " + m.getTime());
            }
            List<String> audited = query("SELECT new_value FROM audit_record WHERE object_type = 'measurement'",
                    rs -> rs.getString(1));
            assertEquals(FILES * SAMPLES_PER_FILE, audited.size());
            for (String values : audited) {
                assertTrue(values.lines().anyMatch(("instrument=" + analyzer.getId())::equals), values);
            }
            // the chain and every data row it vouches for, after a runner was killed holding a unit
            WorkspaceVerification verified = store.audit().verifyWorkspace(List.of());
            assertTrue(verified.intact(), verified.statement());
        }
    }

    @Test
    void ofRunnersSplittingAtOnceOneRecordsTheBatchAndTheOthersNameIt() throws Exception {
        List<String> server = List.of("--server", schemaUrl, "--user", USER);
        BatchCampaign campaign = new BatchCampaign(folder, server, List.of("R"), 2, 1);
        // each runner its own connections, as separate processes would have. Their starts are 100 ms apart:
        // opening a PostgreSQL workspace at the very same moment can deadlock on installing the audit triggers,
        // while reading and checking the files still overlaps
        int runners = 4;
        CountDownLatch start = new CountDownLatch(1);
        ExecutorService pool = Executors.newFixedThreadPool(runners);
        List<Future<String[]>> splits = new ArrayList<>();
        try {
            for (int r = 0; r < runners; r++) {
                long delay = 100L * r;
                splits.add(pool.submit(() -> {
                    start.await();
                    Thread.sleep(delay);
                    ByteArrayOutputStream out = new ByteArrayOutputStream();
                    ByteArrayOutputStream err = new ByteArrayOutputStream();
                    int code = campaign.run(out, err, "batch-split", campaign.quantification("R",
                            campaign.stackFiles));
                    return new String[] {Integer.toString(code), out.toString(StandardCharsets.UTF_8).strip(),
                            err.toString(StandardCharsets.UTF_8)};
                }));
            }
            start.countDown();
            List<String> recorded = new ArrayList<>();
            List<String> refusals = new ArrayList<>();
            for (Future<String[]> f : splits) {
                String[] r = f.get();
                if (r[0].equals(Integer.toString(ExitCode.OK))) {
                    recorded.add(r[1]);
                } else {
                    assertEquals(Integer.toString(ExitCode.BAD_INPUT), r[0], r[2]);
                    refusals.add(r[2]);
                }
            }
            assertEquals(1, recorded.size(), () -> "batches recorded: " + recorded + ", refusals: " + refusals);
            for (String refusal : refusals) {
                assertTrue(refusal.contains("unfinished work batch " + recorded.get(0)), refusal);
            }
        } finally {
            pool.shutdownNow();
        }
    }

    /**
     * Waits until the runner holds a unit while at least two others are still open, so that it is killed in the
     * middle of its share and not after the last unit.
     */
    private void awaitClaimWithUnitsLeft(Process runner, String runnerPattern) throws Exception {
        long deadline = System.currentTimeMillis() + 60_000;
        while (true) {
            assertTrue(runner.isAlive() && System.currentTimeMillis() < deadline, () -> "the runner claimed no unit: "
                    + log(folder.resolve("runner-0.err")));
            int open = query("SELECT COUNT(*) FROM work_unit WHERE state = 'OPEN'", rs -> rs.getInt(1)).get(0);
            if (open >= 2 && !query("SELECT seq FROM work_unit WHERE state = 'CLAIMED' AND claimed_by LIKE ?",
                    rs -> rs.getInt(1), runnerPattern).isEmpty()) {
                return;
            }
            Thread.sleep(20);
        }
    }

    private interface Row<T> {
        T read(ResultSet rs) throws SQLException;
    }

    private <T> List<T> query(String sql, Row<T> row, Object... args) throws SQLException {
        try (Connection c = connect(schemaUrl); PreparedStatement ps = c.prepareStatement(sql)) {
            for (int i = 0; i < args.length; i++) {
                ps.setObject(i + 1, args[i]);
            }
            List<T> rows = new ArrayList<>();
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    rows.add(row.read(rs));
                }
            }
            return rows;
        }
    }

    private static Connection connect(String url) throws SQLException {
        PGSimpleDataSource ds = new PGSimpleDataSource();
        ds.setURL(url);
        ds.setUser(USER);
        ds.setPassword(PASSWORD);
        return ds.getConnection();
    }

    private static String log(Path file) {
        try {
            String text = Files.readString(file, StandardCharsets.UTF_8);
            return text.length() > 4000 ? text.substring(text.length() - 4000) : text;
        } catch (java.io.IOException e) {
            return "(no log: " + e.getMessage() + ")";
        }
    }

    /*
     * Built from the code-source locations of the classes the child needs: under an OSGi test runtime the
     * java.class.path is only the launcher. Third-party classes are looked up through the class loader of the
     * bundle that imports them.
     */
    static String childClassPath() throws Exception {
        List<Class<?>> needed = new ArrayList<>(List.of(BatchRunnerProcess.class, CommandTable.class,
                QuantificationSetup.class, WorkspaceStore.class, Spectrum.class, InterferogramTransform.class,
                BatchQuantifier.class, org.tracegas.library.io.FileFormatException.class,
                org.tracegas.qa.basis.ConditionsCorrection.class, org.tracegas.method.StoredMethod.class,
                org.tracegas.qa.campaign.QaPlan.class, org.tracegas.report.campaign.ReportPlan.class,
                org.tracegas.importer.container.ContainerReader.class, org.tracegas.model.Role.class,
                org.tracegas.audit.AuditTrail.class, org.tracegas.installation.InstalledSoftware.class,
                org.eclipse.emf.common.util.Enumerator.class,
                org.eclipse.emf.ecore.EObject.class, PGSimpleDataSource.class));
        ClassLoader store = WorkspaceStore.class.getClassLoader();
        Class<?> flyway = Class.forName("org.flywaydb.core.Flyway", false, store);
        needed.add(flyway);
        needed.add(Class.forName("org.h2.jdbcx.JdbcDataSource", false, store));
        needed.add(Class.forName("com.google.gson.Gson", false, flyway.getClassLoader()));
        Class<?> fft = Class.forName("org.jtransforms.fft.DoubleFFT_1D", false,
                InterferogramTransform.class.getClassLoader());
        needed.add(fft);
        needed.add(Class.forName("pl.edu.icm.jlargearrays.LargeArray", false, fft.getClassLoader()));
        needed.add(Class.forName("org.apache.commons.math3.linear.RealMatrix", false,
                BatchQuantifier.class.getClassLoader()));
        Set<String> entries = new LinkedHashSet<>();
        for (Class<?> k : needed) {
            entries.add(Path.of(k.getProtectionDomain().getCodeSource().getLocation().toURI()).toString());
        }
        return String.join(File.pathSeparator, entries);
    }
}
