package org.tracegas.runner.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.tracegas.importer.ReaderRegistry;
import org.tracegas.preprocess.StepRegistry;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.runner.CommandTable;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;

/** The runner's own command table: every command the overview lists explains itself. */
class RunnerApplicationTest {

    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final RunnerContext context = new RunnerContext(new PrintStream(out, true, StandardCharsets.UTF_8),
            new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8));
    private final CommandTable table = new CommandTable("test",
            RunnerApplication.commands(new CancellationFlag(), new ReaderRegistry(), StepRegistry.withBuiltInSteps()));

    @Test
    void helpExplainsEveryListedCommand() {
        assertEquals(ExitCode.OK, table.dispatch(new String[] { "help" }, context));
        String overview = out.toString(StandardCharsets.UTF_8);
        Matcher listed = Pattern.compile("(?m)^  ([a-z][a-z-]*) ").matcher(overview);
        int count = 0;
        while (listed.find()) {
            String name = listed.group(1);
            out.reset();
            assertEquals(ExitCode.OK, table.dispatch(new String[] { "help", name }, context), name);
            String usage = out.toString(StandardCharsets.UTF_8);
            assertTrue(usage.startsWith("usage: tracegas " + name), name + ": " + usage);
            assertTrue(usage.contains("exit codes"), name + ": " + usage);
            count++;
        }
        assertTrue(count >= 19, "help, version and the commands: " + count);
        for (String name : List.of("version", "help", "user-unlock")) {
            assertTrue(overview.contains("  " + name + " "), name);
        }
        assertTrue(overview.contains("6 refused"), overview);
    }
}
