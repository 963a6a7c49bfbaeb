package org.tracegas.runner.commands;

import java.util.List;

import org.tracegas.importer.ReaderRegistry;
import org.tracegas.importer.jcamp.JcampReader;
import org.tracegas.preprocess.StepRegistry;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.runner.CommandTable;
import org.tracegas.runner.RunnerContext;

/**
 * Child process for {@link LabQuantifyKillTest}: a runner with the quantify command over JCAMP-DX readers and
 * the built-in recipe steps, which dispatches its arguments as the application does and exits with the
 * command's exit code.
 */
public final class LabRunnerProcess {

    private LabRunnerProcess() {
    }

    public static void main(String[] args) {
        ReaderRegistry readers = new ReaderRegistry().register("jcamp", "JCAMP-DX", new JcampReader());
        CommandTable table = new CommandTable("test", List.of(new QuantifyCommand(new CancellationFlag(), readers,
                StepRegistry.withBuiltInSteps())));
        System.exit(table.dispatch(args, new RunnerContext(System.out, System.err)));
    }
}
