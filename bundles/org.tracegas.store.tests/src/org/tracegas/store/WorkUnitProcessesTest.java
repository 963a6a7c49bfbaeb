package org.tracegas.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.File;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import java.util.stream.IntStream;

import org.flywaydb.core.Flyway;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.audit.AuditTrail;
import org.tracegas.model.WorkBatch;
import org.tracegas.model.WorkBatches;
import org.tracegas.spectrum.Spectrum;

/**
 * Three runner processes share one batch on the PostgreSQL server; one is killed with SIGKILL while it holds
 * a unit. The others finish the batch, taking the killed runner's unit once its lease has expired: every unit
 * is done exactly once, with exactly its own results, and the audit chain verifies.
 */
class WorkUnitProcessesTest {

    private static final int UNITS = 24;
    private static final int RUNNERS = 3;
    private static final long LEASE_MILLIS = 1500;
    private static final long WORK_MILLIS = 120;

    @TempDir
    Path folder;

    @Test
    void killedRunnerLosesNoUnitAndNoUnitIsStoredTwice() throws Exception {
        try (AnalysisFixture f = new AnalysisFixture(new PostgresBackend())) {
            WorkBatch batch = f.store.workUnits().createBatch(f.analyst, f.project.getId(),
                    WorkBatches.of(null, "processes test"),
                    IntStream.range(0, UNITS).mapToObj(i -> "unit-" + i).toList());
            List<Runner> runners = new ArrayList<>();
            for (int r = 0; r < RUNNERS; r++) {
                runners.add(new Runner(f, batch, "runner-" + r, folder.resolve("runner-" + r + ".log")));
            }
            Runner victim = runners.get(0);
            int held = victim.awaitClaims(3); // it completed two units and now works on a third
            victim.process.toHandle().destroyForcibly(); // SIGKILL on Linux: no orderly shutdown
            assertTrue(victim.process.waitFor(30, TimeUnit.SECONDS));
            for (Runner r : runners.subList(1, RUNNERS)) {
                assertTrue(r.process.waitFor(120, TimeUnit.SECONDS), r.name + " did not finish");
                assertEquals(0, r.process.exitValue(), r.name + " failed: " + r.log());
            }
            for (Runner r : runners) {
                r.reader.join(10_000);
            }

            assertEquals(new BatchProgress(0, 0, UNITS, 0), f.store.workUnits().progress(f.analyst, batch.getId()));
            List<Integer> completed = new ArrayList<>();
            runners.forEach(r -> completed.addAll(r.numbers("completed ")));
            assertEquals(IntStream.range(0, UNITS).boxed().toList(), completed.stream().sorted().toList(),
                    "each unit reported completed exactly once");
            assertTrue(!victim.numbers("completed ").contains(held), "the killed runner never completed " + held);
            assertEquals(2, attempt(f, batch.getId(), held), "unit " + held + " was claimed again after the kill");
            for (int seq = 0; seq < UNITS; seq++) {
                List<Instant> times = new ArrayList<>();
                for (String id : f.store.workUnits().measurementsOf(f.analyst, batch.getId(), seq)) {
                    times.add(time(f, id));
                }
                assertEquals(unitTimes(seq), times, "unit " + seq + " holds its own spectra");
            }
            long spectra = (long) UNITS * WorkUnitWorkerProcess.SPECTRA_PER_UNIT;
            assertEquals(spectra, f.count("SELECT COUNT(*) FROM measurement"));
            assertEquals(spectra, f.count("SELECT COUNT(*) FROM spectral_data"));
            assertEquals(spectra * WorkUnitWorkerProcess.RESULTS_PER_SPECTRUM,
                    f.count("SELECT COUNT(*) FROM analysis_result"));
            assertEquals(spectra, f.count("SELECT COUNT(*) FROM audit_record WHERE object_type = 'measurement'"));
            assertTrue(f.store.verifyAuditTrail().intact(), f.store.verifyAuditTrail().findings().toString());
        }
    }

    private static List<Instant> unitTimes(int seq) {
        return IntStream.range(0, WorkUnitWorkerProcess.SPECTRA_PER_UNIT).mapToObj(k -> SampleBlocks.START
                .plusSeconds(60L * (WorkUnitWorkerProcess.firstSpectrum(seq) + k))).toList();
    }

    private static Instant time(AnalysisFixture f, String measurementId) throws Exception {
        try (Connection c = f.backend.raw();
                PreparedStatement ps = c.prepareStatement("SELECT measured_at FROM measurement WHERE id = ?")) {
            ps.setString(1, measurementId);
            try (ResultSet rs = ps.executeQuery()) {
                rs.next();
                return rs.getObject(1, java.time.OffsetDateTime.class).toInstant();
            }
        }
    }

    private static int attempt(AnalysisFixture f, String batchId, int seq) throws Exception {
        return (int) f.count("SELECT attempt FROM work_unit WHERE batch_id = '" + batchId + "' AND seq = " + seq);
    }

    /** One child runner process and the lines it printed. */
    private static final class Runner {

        final String name;
        final Process process;
        final Thread reader;
        final Path log;
        private final List<String> lines = Collections.synchronizedList(new ArrayList<>());

        Runner(AnalysisFixture f, WorkBatch batch, String name, Path log) throws Exception {
            this.name = name;
            this.log = log;
            PostgresBackend pg = (PostgresBackend) f.backend;
            process = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-cp",
                    childClassPath(), WorkUnitWorkerProcess.class.getName(), pg.url(), pg.user(), pg.password(),
                    batch.getId(), name, Long.toString(LEASE_MILLIS), Long.toString(WORK_MILLIS), f.method.getId(),
                    f.library.getId()).redirectError(log.toFile()).start();
            reader = new Thread(this::read, name + " output");
            reader.start();
        }

        private void read() {
            try (BufferedReader out = new BufferedReader(new InputStreamReader(process.getInputStream(),
                    StandardCharsets.UTF_8))) {
                String line;
                while ((line = out.readLine()) != null) {
                    synchronized (lines) {
                        lines.add(line);
                        lines.notifyAll();
                    }
                }
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }

        /** Waits until the runner has printed {@code n} claims; returns the unit of the last one. */
        int awaitClaims(int n) throws Exception {
            long deadline = System.currentTimeMillis() + 60_000;
            synchronized (lines) {
                while (numbers("claimed ").size() < n) {
                    long left = deadline - System.currentTimeMillis();
                    assertTrue(left > 0 && process.isAlive(), name + " did not claim " + n + " units: " + log());
                    lines.wait(left);
                }
                List<Integer> claims = numbers("claimed ");
                return claims.get(n - 1);
            }
        }

        List<Integer> numbers(String prefix) {
            synchronized (lines) {
                return lines.stream().filter(l -> l.startsWith(prefix))
                        .map(l -> Integer.parseInt(l.substring(prefix.length()))).toList();
            }
        }

        String log() throws IOException {
            String text = Files.readString(log);
            return text.length() > 4000 ? text.substring(text.length() - 4000) : text;
        }
    }

    /*
     * Built from the code-source locations of the classes the child needs: under an OSGi test runtime the
     * java.class.path is only the launcher. Gson is looked up through Flyway's class loader, which sees it.
     */
    private static String childClassPath() throws Exception {
        Set<String> entries = new LinkedHashSet<>();
        List<Class<?>> needed = new ArrayList<>(List.of(WorkUnitWorkerProcess.class, WorkspaceStore.class,
                Spectrum.class, org.tracegas.model.Role.class, org.eclipse.emf.common.util.Enumerator.class,
                org.eclipse.emf.ecore.EObject.class, AuditTrail.class, Flyway.class, org.postgresql.Driver.class,
                org.h2.jdbcx.JdbcDataSource.class));
        needed.add(Class.forName("com.google.gson.Gson", false, Flyway.class.getClassLoader()));
        for (Class<?> k : needed) {
            entries.add(Path.of(k.getProtectionDomain().getCodeSource().getLocation().toURI()).toString());
        }
        return String.join(File.pathSeparator, entries);
    }
}
