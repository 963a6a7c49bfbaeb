package org.tracegas.runner.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.audit.AuditQuery;
import org.tracegas.audit.AuditRecord;
import org.tracegas.importer.ReaderRegistry;
import org.tracegas.importer.delimited.DelimitedReader;
import org.tracegas.runner.CommandTable;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * The runner's workspace jobs from the command line, on a real H2 workspace: create it, add a user and a
 * project, import a file; a malformed file is refused with its line and leaves nothing behind.
 */
class WorkspaceCommandsTest {

    @TempDir
    Path folder;

    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();

    private int run(Map<String, String> env, String... argv) {
        CommandTable table = new CommandTable("test", List.of(new WorkspaceInitCommand(), new UserAddCommand(),
                new ProjectAddCommand(), new UserUnlockCommand(), new AuditVerifyCommand(),
                new ImportCommand(new ReaderRegistry().register("csv", "delimited", new DelimitedReader()))));
        return table.dispatch(argv, new RunnerContext(new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), env));
    }

    @Test
    void workspaceUserProjectAndImport() throws Exception {
        String ws = workspaceWithAnalyst();
        Map<String, String> ana = Map.of("TRACEGAS_PASSWORD", "ana-pw-22");
        assertEquals(ExitCode.OK, run(ana, "project-add", "--workspace", ws, "--as", "ana", "--client", "Client A",
                "--code", "CA-1", "--name", "First survey"));

        Path good = folder.resolve("absorbance.csv");
        Files.writeString(good, "wavenumber,absorbance\n1000,0.01\n1001,0.02\n1002,0.03\n");
        String[] conditions = { "--time", "2026-03-17T08:00:00Z", "--cell-temperature", "296", "--cell-pressure",
            "1013" };
        err.reset();
        assertEquals(ExitCode.BAD_INPUT, run(ana, "import", "--workspace", ws, "--as", "ana", "--project", "CA-1",
                "--file", good.toString()));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("absorbance.csv")
                && err.toString(StandardCharsets.UTF_8).contains("LONGDATE"), err.toString(StandardCharsets.UTF_8));
        assertEquals(ExitCode.OK, run(ana, withOptions(new String[] { "import", "--workspace", ws, "--as", "ana",
            "--project", "CA-1", "--file", good.toString() }, conditions)), err.toString(StandardCharsets.UTF_8));
        out.reset();
        assertEquals(ExitCode.OK, run(ana, withOptions(new String[] { "import", "--workspace", ws, "--as", "ana",
            "--project", "CA-1", "--file", good.toString() }, conditions)), err.toString(StandardCharsets.UTF_8));
        assertTrue(out.toString(StandardCharsets.UTF_8).contains("already imported as absorbance.csv"),
                out.toString(StandardCharsets.UTF_8));

        Path bad = folder.resolve("broken.csv");
        Files.writeString(bad, "wavenumber,absorbance\n1000,0.01\n1001,zero point two\n");
        err.reset();
        assertEquals(ExitCode.BAD_INPUT, run(ana, withOptions(new String[] { "import", "--workspace", ws, "--as",
            "ana", "--project", "CA-1", "--file", bad.toString() }, conditions)));
        String message = err.toString(StandardCharsets.UTF_8);
        assertTrue(message.contains("broken.csv") && message.contains("3"), message);

        try (WorkspaceStore store = Workspaces.openH2(folder.resolve("ws").resolve("db"))) {
            Session session = store.users().logIn("ana", "ana-pw-22".toCharArray());
            String project = store.projects().findByCode(session, "CA-1").orElseThrow().getId();
            try (var spectra = store.spectra().stream(session, project)) {
                assertEquals(1, spectra.count(), "only the good file's spectrum is stored, once");
            }
            var measurements = store.imports().measurements(session, project);
            assertEquals(1, measurements.size());
            assertEquals("absorbance.csv", measurements.get(0).getSourceFile());
            assertEquals(296, measurements.get(0).getCellTemperature());
            // the stored bytes are the file's bytes
            assertEquals(java.util.Arrays.toString(Files.readAllBytes(good)), java.util.Arrays.toString(
                    store.imports().content(session, project, measurements.get(0).getSourceSha256())));
            assertTrue(store.verifyAuditTrail().intact());
        }
    }

    private String errText() {
        return err.toString(StandardCharsets.UTF_8);
    }

    /** A workspace with the administrator root and the analyst ana; returns its folder. */
    private String workspaceWithAnalyst() {
        String ws = folder.resolve("ws").toString();
        assertEquals(ExitCode.OK, run(Map.of("TRACEGAS_PASSWORD", "admin-pw-1"), "workspace-init", "--workspace", ws,
                "--admin", "root", "--name", "Lab administrator"));
        assertEquals(ExitCode.OK, run(Map.of("TRACEGAS_PASSWORD", "admin-pw-1", "TRACEGAS_NEW_PASSWORD", "ana-pw-22"),
                "user-add", "--workspace", ws, "--as", "root", "--login", "ana", "--name", "Ana Lyst", "--roles",
                "analyst"));
        return ws;
    }

    @Test
    void mistypedWorkspaceIsNamedAndNotCreated() {
        Path typo = folder.resolve("wrokspace");
        assertEquals(ExitCode.USAGE, run(Map.of(), "audit-verify", "--workspace", typo.toString()));
        assertTrue(errText().contains("no workspace in " + typo), errText());
        assertFalse(errText().contains("usage:"), "the command line was well formed: " + errText());
        assertFalse(out.toString(StandardCharsets.UTF_8).contains("intact"));
        assertFalse(Files.exists(typo), "nothing is created for a command that reads a workspace");
        assertEquals(ExitCode.USAGE, run(Map.of("TRACEGAS_PASSWORD", "x"), "project-add", "--workspace",
                typo.toString(), "--as", "ana", "--client", "C", "--code", "C-1", "--name", "N"));
        assertFalse(Files.exists(typo));
    }

    @Test
    void refusalsHaveTheirOwnExitCodeAndAnAdministratorUnlocks() throws Exception {
        String ws = workspaceWithAnalyst();
        Map<String, String> wrong = Map.of("TRACEGAS_PASSWORD", "not-her-password");
        assertEquals(ExitCode.REFUSED, run(wrong, "project-add", "--workspace", ws, "--as", "ana", "--client", "C",
                "--code", "C-1", "--name", "N"));
        assertTrue(errText().contains("refused"), errText());
        // the store locks an account after 5 failed log-ins in a row (its default)
        for (int i = 0; i < 4; i++) {
            run(wrong, "project-add", "--workspace", ws, "--as", "ana", "--client", "C", "--code", "C-1", "--name",
                    "N");
        }
        err.reset();
        Map<String, String> ana = Map.of("TRACEGAS_PASSWORD", "ana-pw-22");
        assertEquals(ExitCode.REFUSED, run(ana, "project-add", "--workspace", ws, "--as", "ana", "--client", "C",
                "--code", "C-1", "--name", "N"));
        assertTrue(errText().contains("locked"), errText());
        // an analyst has no right to unlock anyone
        assertEquals(ExitCode.OK, run(Map.of("TRACEGAS_PASSWORD", "admin-pw-1", "TRACEGAS_NEW_PASSWORD", "bo-pw-333"),
                "user-add", "--workspace", ws, "--as", "root", "--login", "bo", "--name", "Bo", "--roles", "analyst"));
        assertEquals(ExitCode.REFUSED, run(Map.of("TRACEGAS_PASSWORD", "bo-pw-333"), "user-unlock", "--workspace", ws,
                "--as", "bo", "--login", "ana"));
        assertEquals(ExitCode.BAD_INPUT, run(Map.of("TRACEGAS_PASSWORD", "admin-pw-1"), "user-unlock", "--workspace",
                ws, "--as", "root", "--login", "nobody"));
        assertEquals(ExitCode.OK, run(Map.of("TRACEGAS_PASSWORD", "admin-pw-1"), "user-unlock", "--workspace", ws,
                "--as", "root", "--login", "ana"));
        assertEquals(ExitCode.OK, run(ana, "project-add", "--workspace", ws, "--as", "ana", "--client", "C",
                "--code", "C-1", "--name", "N"), errText());
        try (WorkspaceStore store = Workspaces.openH2(folder.resolve("ws").resolve("db"))) {
            Session root = store.users().logIn("root", "admin-pw-1".toCharArray());
            String anaId = store.users().findByLogin("ana").orElseThrow().getId();
            List<AuditRecord> changes = store.audit().review(root, AuditQuery.all().object("user", anaId).build())
                    .records();
            List<AuditRecord> unlocks = changes.stream().filter(r -> "account unlocked".equals(r.reason())).toList();
            assertEquals(1, unlocks.size(), changes.toString());
            assertEquals(root.userId(), unlocks.get(0).userId(), "the trail names the administrator who unlocked");
        }
    }

    @Test
    void existingClientAndProjectAreSaidInWords() {
        String ws = workspaceWithAnalyst();
        Map<String, String> ana = Map.of("TRACEGAS_PASSWORD", "ana-pw-22");
        assertEquals(ExitCode.OK, run(ana, "project-add", "--workspace", ws, "--as", "ana", "--client", "Client A",
                "--code", "CA-1", "--name", "First survey"));
        assertEquals(ExitCode.OK, run(ana, "project-add", "--workspace", ws, "--as", "ana", "--client", "Client A",
                "--code", "CA-2", "--name", "Second survey"), "a second project of the same client: " + errText());
        assertEquals(ExitCode.FAILURE, run(ana, "project-add", "--workspace", ws, "--as", "ana", "--client",
                "Client A", "--code", "CA-2", "--name", "Again"));
        assertTrue(errText().contains("project with the code 'CA-2' already"), errText());
        assertFalse(errText().toLowerCase(Locale.ROOT).contains("sql")
                || errText().contains("Unique index") || errText().contains("caused by"), errText());
    }

    /**
     * Another process holding the embedded database (as the workbench does while it shows the workspace): H2's
     * own shell in a child JVM keeps it open while the runner tries.
     */
    @Test
    void workspaceOpenElsewhereIsSaidOnOpening() throws Exception {
        String ws = workspaceWithAnalyst();
        String h2Jar = Path.of(org.h2.Driver.class.getProtectionDomain().getCodeSource().getLocation().toURI())
                .toString();
        Process holder = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-cp",
                h2Jar, "org.h2.tools.Shell", "-url", "jdbc:h2:file:" + folder.resolve("ws/db/workspace"), "-user", "",
                "-password", "").redirectErrorStream(true).start();
        try {
            // the shell prompts once it is connected, and holds the file lock from then on
            StringBuilder seen = new StringBuilder();
            var shellOut = holder.getInputStream();
            for (int c; !seen.toString().contains("sql>") && (c = shellOut.read()) >= 0;) {
                seen.append((char) c);
            }
            assertTrue(seen.toString().contains("sql>"), seen.toString());
            assertEquals(ExitCode.FAILURE, run(Map.of(), "audit-verify", "--workspace", ws));
            assertTrue(errText().contains("opening the workspace failed")
                    && errText().contains("in use by another program"), errText());
            assertFalse(errText().contains("closing"), errText());
        } finally {
            holder.getOutputStream().close();
            holder.destroy();
            holder.waitFor();
        }
    }

    @Test
    void mistypedOptionIsNamedWithTheNearestOne() {
        assertEquals(ExitCode.USAGE, run(Map.of(), "import", "--workspace", folder.toString(), "--flie", "a.csv"));
        assertTrue(errText().contains("unknown option '--flie'; did you mean --file?"), errText());
    }

    private static String[] withOptions(String[] argv, String[] more) {
        String[] all = java.util.Arrays.copyOf(argv, argv.length + more.length);
        System.arraycopy(more, 0, all, argv.length, more.length);
        return all;
    }

    @Test
    void missingPasswordIsNamed() {
        assertEquals(ExitCode.USAGE, run(Map.of(), "workspace-init", "--workspace", folder.toString(), "--admin", "x",
                "--name", "X"));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("TRACEGAS_PASSWORD"));
    }
}
