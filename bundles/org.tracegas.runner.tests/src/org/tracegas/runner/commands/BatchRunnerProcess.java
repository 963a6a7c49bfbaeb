package org.tracegas.runner.commands;

import java.util.List;

import org.tracegas.quantify.CancellationFlag;
import org.tracegas.runner.CommandTable;
import org.tracegas.runner.RunnerContext;

/**
 * Child process for {@link BatchProcessesTest}: a runner with the batch commands, which dispatches its arguments
 * as the application does and exits with the command's exit code.
 */
public final class BatchRunnerProcess {

    private BatchRunnerProcess() {
    }

    public static void main(String[] args) {
        CancellationFlag cancel = new CancellationFlag();
        CommandTable table = new CommandTable("test", List.of(new BatchSplitCommand(), new BatchWorkCommand(cancel),
                new BatchStatusCommand()));
        System.exit(table.dispatch(args, new RunnerContext(System.out, System.err)));
    }
}
