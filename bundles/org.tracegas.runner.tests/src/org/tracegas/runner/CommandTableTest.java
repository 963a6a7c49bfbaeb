package org.tracegas.runner;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.List;

import org.junit.jupiter.api.Test;

class CommandTableTest {

    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();
    private final RunnerContext context = new RunnerContext(new PrintStream(out, true, StandardCharsets.UTF_8),
            new PrintStream(err, true, StandardCharsets.UTF_8));

    private static Command echo() {
        return new Command() {
            @Override
            public String name() {
                return "echo";
            }

            @Override
            public String summary() {
                return "print the arguments";
            }

            @Override
            public String usage() {
                return "usage: tracegas echo <word>...";
            }

            @Override
            public int run(List<String> arguments, RunnerContext c) throws UsageException {
                if (arguments.isEmpty()) {
                    throw new UsageException("give at least one word");
                }
                c.out().println(String.join(" ", arguments));
                return ExitCode.OK;
            }
        };
    }

    @Test
    void helpListsEveryCommandAndTheCaution() {
        CommandTable table = new CommandTable("1.2.3", List.of(echo()));
        assertEquals(ExitCode.OK, table.dispatch(new String[0], context));
        String text = out.toString(StandardCharsets.UTF_8);
        assertTrue(text.contains("echo") && text.contains("print the arguments"), text);
        assertTrue(text.contains("1.2.3"), text);
        assertTrue(text.contains("qualified staff"), text);
    }

    @Test
    void commandRunsWithItsArguments() {
        CommandTable table = new CommandTable("1", List.of(echo()));
        assertEquals(ExitCode.OK, table.dispatch(new String[] { "echo", "a", "b" }, context));
        assertEquals("a b", out.toString(StandardCharsets.UTF_8).strip());
    }

    @Test
    void wrongArgumentsGiveTheUsageExitCodeAndTheReason() {
        CommandTable table = new CommandTable("1", List.of(echo()));
        assertEquals(ExitCode.USAGE, table.dispatch(new String[] { "echo" }, context));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("give at least one word"));
    }

    @Test
    void unknownCommandIsNamed() {
        CommandTable table = new CommandTable("1", List.of(echo()));
        assertEquals(ExitCode.USAGE, table.dispatch(new String[] { "frobnicate" }, context));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("'frobnicate'"));
    }

    @Test
    void duplicateNamesAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> new CommandTable("1", List.of(echo(), echo())));
    }

    @Test
    void progressLineShowsCountPercentAndRate() {
        assertEquals("fit: 50/200 (25.0%) 25/s", ProgressLine.format("fit", 50, 200, 2.0));
    }
}
