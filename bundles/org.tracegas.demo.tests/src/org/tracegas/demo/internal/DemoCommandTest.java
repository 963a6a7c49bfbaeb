package org.tracegas.demo.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.eclipse.core.runtime.IExtensionRegistry;
import org.eclipse.core.runtime.RegistryFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.runner.Command;
import org.tracegas.runner.CommandContributions;
import org.tracegas.runner.CommandTable;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;

/** The demo comes to the runner through the runner's commands extension point, like a lab's own command. */
class DemoCommandTest {

    @TempDir
    Path folder;

    private final ByteArrayOutputStream err = new ByteArrayOutputStream();
    private final CancellationFlag cancel = new CancellationFlag();
    private final RunnerContext context = new RunnerContext(
            new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8),
            new PrintStream(err, true, StandardCharsets.UTF_8), Map.of(), cancel);

    private static Command contributedDemo() {
        IExtensionRegistry running = RegistryFactory.getRegistry();
        assertNotNull(running, "the tests run in an Equinox platform with its extension registry");
        return CommandContributions.fromExtensions(running).stream().filter(c -> c.name().equals("demo"))
                .findFirst().orElseThrow(() -> new AssertionError("the demo bundle contributes no command 'demo'"));
    }

    @Test
    void theContributedDemoStopsOnTheRunnersCancellation() {
        Command demo = contributedDemo();
        cancel.cancel();
        // a demo that is cancelled before its first spectrum stops with the runner's code for a cancelled job
        assertEquals(ExitCode.CANCELLED, new CommandTable("test", List.of(demo)).dispatch(new String[] { "demo",
                "--workspace", folder.toString(), "--out", folder.resolve("out").toString() }, context),
                err.toString(StandardCharsets.UTF_8));
    }

    @Test
    void itsHelpNamesItsOptionsAndExitCodes() {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        RunnerContext listening = new RunnerContext(new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), Map.of(), cancel);
        assertEquals(ExitCode.OK, new CommandTable("test", List.of(contributedDemo()))
                .dispatch(new String[] { "help", "demo" }, listening));
        String usage = out.toString(StandardCharsets.UTF_8);
        assertTrue(usage.startsWith("usage: tracegas demo --workspace <folder> --out <folder>"), usage);
    }
}
