package org.tracegas.runner.commands;

import java.net.InetAddress;
import java.net.UnknownHostException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;

import org.tracegas.pipeline.QuantificationSetup;
import org.tracegas.pipeline.StackProcessor;
import org.tracegas.pipeline.shared.WorkUnitWorker;
import org.tracegas.pipeline.shared.WorkerOutcome;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.model.WorkBatch;
import org.tracegas.preprocess.Background;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.runner.UsageException;
import org.tracegas.store.BatchProgress;
import org.tracegas.store.NoSuchObjectException;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * One runner of a batch recorded by batch-split: claims a sample file at a time, processes it with the batch's
 * method version and backgrounds, and stores its results together with the unit's completion, until every unit
 * of the batch is done. Any number of runners, on any hosts of the lab server, may work the same batch.
 */
public final class BatchWorkCommand implements Command {

    static final Duration DEFAULT_LEASE = Duration.ofMinutes(2);
    static final Duration DEFAULT_IDLE_POLL = Duration.ofSeconds(5);

    private final CancellationFlag cancel;

    public BatchWorkCommand(CancellationFlag cancel) {
        this.cancel = cancel;
    }

    /** The command as the runner's extension point creates it: it stops on the runner's cancellation. */
    public BatchWorkCommand() {
        this(null);
    }

    @Override
    public String name() {
        return "batch-work";
    }

    @Override
    public String summary() {
        return "work on a batch-split batch with other runners until all its units are done or failed";
    }

    @Override
    public String usage() {
        return "usage: tracegas batch-work <workspace and --as options> --batch <id> [--lease <s>] "
                + "[--idle-poll <s>]\n" + WorkspaceLogin.USAGE + "\n" + """
                  --batch <id>                the batch, as batch-split printed it
                  --lease <seconds>           how long a claimed unit stays this runner's without renewal; renewed
                                              every third of it while the file is processed (default 120)
                  --idle-poll <seconds>       when the remaining units are all held by other runners, how long to
                                              wait before asking again (default 5)
                  The method version is rebuilt from the workspace and the backgrounds read from the files the
                  batch names, as quantify does; a CTS-derived path is the one batch-split recorded, and so is
                  the instrument every measurement names, when batch-split was given one. Each file's results are
                  stored together with its unit's completion, so a unit is done once, with all its results, or
                  not at all: a runner that stops or dies leaves its unit to the others once its lease ends.
                  The runner is named host:process id in the units and the audit trail. The progress line counts
                  the batch's done units (all runners).
                  A sample file that cannot be processed (e.g. a corrupt file) fails its unit with the error; no
                  runner tries it again and the others go on with the remaining files.
                exit codes: 0 the batch is complete, 2 wrong arguments or no such batch, 3 the batch's method version
                  or background files cannot be read, or the batch finished with failed files (each named with its
                  error), 4 cancelled (the unit in hand is given back), 5 failure""";
    }

    @Override
    public int run(List<String> arguments, RunnerContext context) throws Exception {
        Options options = Options.parse(arguments, WorkspaceLogin.optionsWith("--batch", "--lease",
                "--idle-poll"));
        Duration lease = options.seconds("--lease", DEFAULT_LEASE);
        Duration idlePoll = options.seconds("--idle-poll", DEFAULT_IDLE_POLL);
        try (WorkspaceStore store = WorkspaceLogin.open(options, context)) {
            Session actor = WorkspaceLogin.logIn(store, options, context);
            WorkBatch batch = batch(store, actor, options);
            StackProcessor stack;
            try {
                BatchDescription description = BatchDescription.of(batch);
                StoredMethods.Found found = StoredMethods.byId(store, description.methodVersionId());
                List<Background> backgrounds = SampleInputs.backgrounds(found.method(), description.backgrounds());
                String instrumentId = description.instrumentId().orElse(null);
                requireStored(store, actor, instrumentId);
                stack = new QuantificationSetup(found.version(), found.method(), backgrounds, StoredMethods.SOFTWARE,
                        description.ctsPathM()).processor(store, actor, batch.getProject().getId(), instrumentId);
            } catch (BadInputException | FileFormatException | IllegalArgumentException e) {
                // an IllegalArgumentException: the batch lacks the CTS path its method needs, or has one it does not, or
                // its method has [recipe] steps, which a stream of containers does not run
                context.err().println("tracegas batch-work: batch " + batch.getId() + ": " + e.getMessage());
                return ExitCode.BAD_INPUT;
            }
            String runner = runnerId();
            WorkUnitWorker worker = new WorkUnitWorker(store, actor, batch.getId(), runner, lease, idlePoll,
                    (payload, stop) -> stack.process(List.of(Path.of(payload)), stop));
            context.progress().begin("batch " + batch.getId() + " units done");
            WorkerOutcome outcome = worker.run((unit, spectra, progress) -> context.progress().update(progress.done(),
                    progress.total()), cancel != null ? cancel : context.cancellation());
            if (outcome.cancelled()) {
                context.err().println("tracegas batch-work: cancelled; runner " + runner + " completed "
                        + outcome.completed() + " units");
                return ExitCode.CANCELLED;
            }
            BatchProgress done = store.workUnits().progress(actor, batch.getId());
            if (!done.complete()) {
                context.err().printf("tracegas batch-work: batch %s finished with %d of %d files failed; runner %s"
                        + " completed %d units and failed %d%n", batch.getId(), done.failed(), done.total(), runner,
                        outcome.completed(), outcome.failed());
                BatchStatusCommand.listFailures(store, actor, batch.getId(), context.err());
                return ExitCode.BAD_INPUT;
            }
            context.out().printf("Batch %s complete: %d units; runner %s completed %d of them%n", batch.getId(),
                    done.total(), runner, outcome.completed());
            return ExitCode.OK;
        }
    }

    /**
     * Checked before the first unit is claimed: the store would refuse every unit's block otherwise.
     *
     * @throws BadInputException naming the instrument id the workspace does not hold
     */
    private static void requireStored(WorkspaceStore store, Session actor, String instrumentId)
            throws BadInputException {
        if (instrumentId != null && store.instruments().instruments(actor).stream()
                .noneMatch(i -> i.getId().equals(instrumentId))) {
            throw new BadInputException("the description names instrument " + instrumentId
                    + ", which the workspace does not hold");
        }
    }

    /** The batch --batch names. */
    static WorkBatch batch(WorkspaceStore store, Session actor, Options options) throws UsageException {
        String id = options.text("--batch");
        try {
            return store.workUnits().batch(actor, id);
        } catch (NoSuchObjectException e) {
            throw new UsageException("no work batch with id " + id);
        }
    }

    /** Host and process id: unique among the runners of a lab server, and says where to look for a stalled one. */
    static String runnerId() {
        String host;
        try {
            host = InetAddress.getLocalHost().getHostName();
        } catch (UnknownHostException e) {
            host = "localhost";
        }
        return host + ":" + ProcessHandle.current().pid();
    }
}
