package org.tracegas.runner.commands;

import java.io.PrintStream;
import java.util.List;

import org.tracegas.model.WorkBatch;
import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.store.BatchProgress;
import org.tracegas.store.FailedUnit;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/** How far a batch of work units is: for scripts that wait for the runners of a batch-split. */
public final class BatchStatusCommand implements Command {

    @Override
    public String name() {
        return "batch-status";
    }

    @Override
    public String summary() {
        return "count a batch's open, claimed, done and failed work units";
    }

    @Override
    public String usage() {
        return "usage: tracegas batch-status <workspace and --as options> --batch <id>\n" + WorkspaceLogin.USAGE
                + "\n" + """
                  --batch <id>                the batch, as batch-split printed it
                  Prints the units open, claimed (held by a runner, or left by one that stopped until its lease
                  ends), done and failed; when and by whom the batch was created and with which method version
                  (ids); then each failed unit's file and error. Needs read access to the batch's
                  project.
                exit codes: 0 every unit done, 1 units remain, 2 wrong arguments or no such batch, 3 no units remain
                  but some files failed, 5 failure""";
    }

    @Override
    public int run(List<String> arguments, RunnerContext context) throws Exception {
        Options options = Options.parse(arguments, WorkspaceLogin.optionsWith("--batch"));
        try (WorkspaceStore store = WorkspaceLogin.open(options, context)) {
            Session actor = WorkspaceLogin.logIn(store, options, context);
            WorkBatch batch = BatchWorkCommand.batch(store, actor, options);
            String batchId = batch.getId();
            BatchProgress p = store.workUnits().progress(actor, batchId);
            context.out().printf("batch %s: %d units, %d open, %d claimed, %d done, %d failed: %s%n", batchId,
                    p.total(), p.open(), p.claimed(), p.done(), p.failed(),
                    p.complete() ? "complete" : p.finished() ? "finished with failures" : "not complete");
            // what a reviewer traces results back to: the version they were made with, and who started the work
            context.out().printf("created %s by user %s, method version %s%n", batch.getCreatedAt(),
                    batch.getCreatedBy(), batch.getMethodVersionId() == null ? "none" : batch.getMethodVersionId());
            listFailures(store, actor, batchId, context.out());
            if (!p.finished()) {
                return ExitCode.CHECK_FAILED;
            }
            return p.complete() ? ExitCode.OK : ExitCode.BAD_INPUT;
        }
    }

    /** One line per failed unit: its file and why it failed. */
    static void listFailures(WorkspaceStore store, Session actor, String batchId, PrintStream to) {
        for (FailedUnit f : store.workUnits().failures(actor, batchId)) {
            to.printf("failed: %s: %s%n", f.payload(), f.error());
        }
    }
}
