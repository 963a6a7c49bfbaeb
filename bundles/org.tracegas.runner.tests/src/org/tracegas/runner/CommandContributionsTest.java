package org.tracegas.runner;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;

import org.eclipse.core.runtime.IExtensionRegistry;
import org.eclipse.core.runtime.RegistryFactory;
import org.junit.jupiter.api.Test;
import org.tracegas.quantify.CancellationFlag;

/** The runner's commands come through its extension point, and the table serves them like any other. */
class CommandContributionsTest {

    /** The commands the runner's README and help document. */
    private static final List<String> BUILT_IN = List.of("audit-verify", "workspace-init", "user-add", "user-unlock",
            "project-add", "import", "library-build", "library-add", "method-define", "quantify", "qa", "report",
            "results-export", "report-sign", "batch-split", "batch-work", "batch-status");

    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();
    private final CancellationFlag cancel = new CancellationFlag();
    private final RunnerContext context = new RunnerContext(new PrintStream(out, true, StandardCharsets.UTF_8),
            new PrintStream(err, true, StandardCharsets.UTF_8), Map.of(), cancel);

    private static List<Command> contributed() {
        IExtensionRegistry running = RegistryFactory.getRegistry();
        assertNotNull(running, "the tests run in an Equinox platform with its extension registry");
        return CommandContributions.fromExtensions(running);
    }

    @Test
    void everyBuiltInCommandIsContributed() {
        List<String> names = contributed().stream().map(Command::name).toList();
        assertTrue(names.containsAll(BUILT_IN), names.toString());
        assertEquals(BUILT_IN, names.subList(0, BUILT_IN.size()), "the runner's own come first, in its order");
    }

    @Test
    void theTableOfContributedCommandsListsAndExplainsThemAndSuggestsTheNearest() {
        CommandTable table = new CommandTable("test", contributed());
        assertEquals(ExitCode.OK, table.dispatch(new String[] { "help" }, context));
        String overview = out.toString(StandardCharsets.UTF_8);
        for (String name : BUILT_IN) {
            assertTrue(overview.contains("\n  " + name + " "), name + " in " + overview);
        }
        assertEquals(ExitCode.USAGE, table.dispatch(new String[] { "batch-stauts" }, context));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("did you mean batch-status?"), err.toString());
    }

    @Test
    void anElementWithoutARegistryIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> CommandContributions.fromExtensions(null));
    }
}
