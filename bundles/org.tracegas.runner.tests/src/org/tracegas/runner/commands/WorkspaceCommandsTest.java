package org.tracegas.runner.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
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
                new ProjectAddCommand(),
                new ImportCommand(new ReaderRegistry().register("csv", "delimited", new DelimitedReader()))));
        return table.dispatch(argv, new RunnerContext(new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), env));
    }

    @Test
    void workspaceUserProjectAndImport() throws Exception {
        String ws = folder.resolve("ws").toString();
        assertEquals(ExitCode.OK, run(Map.of("TRACEGAS_PASSWORD", "admin-pw-1"), "workspace-init", "--workspace", ws,
                "--admin", "root", "--name", "Lab administrator"));
        assertEquals(ExitCode.OK, run(Map.of("TRACEGAS_PASSWORD", "admin-pw-1", "TRACEGAS_NEW_PASSWORD", "ana-pw-22"),
                "user-add", "--workspace", ws, "--as", "root", "--login", "ana", "--name", "Ana Lyst", "--roles",
                "analyst"));
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
            String project = store.projects().findByCode(session, "CA-1").orElseThrow().id();
            try (var spectra = store.spectra().stream(session, project)) {
                assertEquals(1, spectra.count(), "only the good file's spectrum is stored, once");
            }
            var measurements = store.imports().measurements(session, project);
            assertEquals(1, measurements.size());
            assertEquals("absorbance.csv", measurements.get(0).fileName());
            assertEquals(296, measurements.get(0).measurement().cellTemperature());
            // the stored bytes are the file's bytes
            assertEquals(java.util.Arrays.toString(Files.readAllBytes(good)), java.util.Arrays.toString(
                    store.imports().content(session, project, measurements.get(0).fileSha256())));
            assertTrue(store.verifyAuditTrail().intact());
        }
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
