package org.tracegas.runner.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.model.Result;
import org.tracegas.runner.ExitCode;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.WorkspaceVerification;
import org.tracegas.store.Workspaces;

/**
 * A quantify of the lab's measurements killed part-way (SIGKILL of a started runner process) on the PostgreSQL
 * lab server (system properties tracegas.test.pg.url, .user and .password; a fresh schema) is finished by running
 * it again, as is one cancelled before its first fit: what the killed run stored stays, in whole blocks; the second run quantifies the rest and says how
 * many it skipped; every measurement ends with one result per analyte, and the audit chain verifies.
 */
class LabQuantifyKillTest {

    private static final int SAMPLES = 160;
    private static final String URL = System.getProperty("tracegas.test.pg.url",
            "jdbc:postgresql://127.0.0.1:55432/tracegas");
    private static final String USER = System.getProperty("tracegas.test.pg.user", "tracegas");
    private static final String PASSWORD = System.getProperty("tracegas.test.pg.password", "tracegas");

    @TempDir
    Path folder;

    @Test
    void killedQuantifyIsFinishedByRunningItAgain() throws Exception {
        String schema = "kill_" + UUID.randomUUID().toString().replace("-", "");
        try (Connection c = LabJcampQuantificationTest.connect(URL, USER, PASSWORD);
                Statement s = c.createStatement()) {
            s.execute("CREATE SCHEMA " + schema);
        }
        String schemaUrl = URL + (URL.contains("?") ? "&" : "?") + "currentSchema=" + schema;
        List<String> server = List.of("--server", schemaUrl, "--user", USER);
        try {
            LabJcampQuantificationTest.Lab lab = new LabJcampQuantificationTest.Lab(folder, server, SAMPLES);
            lab.setUp();
            List<String> importArgs = new ArrayList<>(List.of("import", "--project", "LBK-5", "--file",
                    lab.background.toString(), "--kind", "background"));
            lab.ok(importArgs.toArray(String[]::new));
            importArgs = new ArrayList<>(List.of("import", "--project", "LBK-5"));
            for (Path f : lab.samples) {
                importArgs.addAll(List.of("--file", f.toString()));
            }
            lab.ok(importArgs.toArray(String[]::new));

            lab.cancelNext = true;
            assertEquals(ExitCode.CANCELLED, lab.run("quantify", "--project", "LBK-5", "--method",
                    "Kiln stack CO and N2O"));
            assertTrue(lab.errors().contains("cancelled after 0 of " + SAMPLES + " measurements; run again to"
                    + " finish"), lab.errors());

            List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java")
                    .toString(), "-cp", childClassPath(), LabRunnerProcess.class.getName(), "quantify"));
            command.addAll(server);
            command.addAll(List.of("--as", "ana", "--project", "LBK-5", "--method", "Kiln stack CO and N2O"));
            ProcessBuilder pb = new ProcessBuilder(command).redirectOutput(folder.resolve("runner.out").toFile())
                    .redirectError(folder.resolve("runner.err").toFile());
            pb.environment().putAll(LabJcampQuantificationTest.ENV);
            Process runner = pb.start();
            int stored = awaitFirstBlocks(schemaUrl, runner);
            runner.toHandle().destroyForcibly(); // SIGKILL on Linux: no orderly shutdown
            assertTrue(runner.waitFor(30, TimeUnit.SECONDS));
            int afterKill = analysed(schemaUrl);
            assertTrue(afterKill >= stored && afterKill < SAMPLES, () -> "killed part-way: " + afterKill + " of "
                    + SAMPLES + " stored; runner said " + read(folder.resolve("runner.err")));
            assertEquals(0, afterKill % org.tracegas.pipeline.MeasurementQuantification.BLOCK,
                    "blocks are stored whole: " + afterKill);

            String again = lab.ok("quantify", "--project", "LBK-5", "--method", "Kiln stack CO and N2O");
            assertTrue(again.contains("Quantified " + (SAMPLES - afterKill) + " measurement(s)")
                    && again.contains("skipped " + afterKill), again);
            try (WorkspaceStore store = Workspaces.openPostgres(schemaUrl, USER, PASSWORD)) {
                Session ana = store.users().logIn("ana", "lab-pw-12".toCharArray());
                String project = store.projects().findByCode(ana, "LBK-5").orElseThrow().getId();
                List<Result> results = store.results().results(ana, project);
                assertEquals(2 * SAMPLES, results.size(), "one result per analyte and measurement, none twice");
                assertEquals(SAMPLES, results.stream().map(r -> r.getMeasurementId()).distinct().count());
                // the chain and every data row it vouches for, after the kill and the second run
                WorkspaceVerification verified = store.audit().verifyWorkspace(List.of());
                assertTrue(verified.intact(), verified.statement());
            }
            System.out.printf("killed quantify: %d of %d stored at the kill, %d by the second run%n", afterKill,
                    SAMPLES, SAMPLES - afterKill);
            assertTrue(lab.ok("quantify", "--project", "LBK-5", "--method", "Kiln stack CO and N2O")
                    .contains("Quantified 0 measurement(s)"), "nothing is left, nothing repeated");
        } finally {
            try (Connection c = LabJcampQuantificationTest.connect(URL, USER, PASSWORD);
                    Statement s = c.createStatement()) {
                s.execute("DROP SCHEMA " + schema + " CASCADE");
            }
        }
    }

    /** Waits until the runner has stored its first block, polling the lab server. */
    private static int awaitFirstBlocks(String schemaUrl, Process runner) throws Exception {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
        while (System.nanoTime() < deadline) {
            assertTrue(runner.isAlive(), "the runner ended before it was killed");
            int n = analysed(schemaUrl);
            if (n > 0) {
                return n;
            }
            Thread.sleep(5);
        }
        throw new AssertionError("the runner stored nothing within 120 s");
    }

    private static int analysed(String schemaUrl) throws Exception {
        try (Connection c = LabJcampQuantificationTest.connect(schemaUrl, USER, PASSWORD);
                Statement s = c.createStatement();
                ResultSet rs = s.executeQuery("SELECT COUNT(DISTINCT measurement_id) FROM analysis_result")) {
            rs.next();
            return rs.getInt(1);
        }
    }

    private static String read(Path file) {
        try {
            return Files.readString(file);
        } catch (java.io.IOException e) {
            return "(" + file + " unreadable: " + e.getMessage() + ")";
        }
    }

    /** The child's class path: the batch runner's, with the extension registry the readers and steps refer to. */
    private static String childClassPath() throws Exception {
        List<String> entries = new ArrayList<>(List.of(BatchProcessesTest.childClassPath().split(File.pathSeparator)));
        for (Class<?> k : List.of(org.eclipse.core.runtime.IExtensionRegistry.class,
                org.eclipse.core.runtime.CoreException.class, LabRunnerProcess.class)) {
            String e = Path.of(k.getProtectionDomain().getCodeSource().getLocation().toURI()).toString();
            if (!entries.contains(e)) {
                entries.add(e);
            }
        }
        return String.join(File.pathSeparator, entries);
    }
}
