package org.tracegas.runner.commands;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.tracegas.pipeline.ProjectQuantification;
import org.tracegas.model.Instrument;
import org.tracegas.model.Project;
import org.tracegas.model.WorkBatch;
import org.tracegas.model.WorkBatches;
import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.store.Session;
import org.tracegas.store.UnfinishedBatchException;
import org.tracegas.store.WorkUnitService;
import org.tracegas.store.WorkspaceStore;

/**
 * Records a quantification as a batch of work units, one per sample file, for any number of batch-work runners
 * to share; checks every input as quantify does before anything is recorded.
 */
public final class BatchSplitCommand implements Command {

    @Override
    public String name() {
        return "batch-split";
    }

    @Override
    public String summary() {
        return "record a quantification as a batch of work units, one per file, for batch-work runners";
    }

    @Override
    public String usage() {
        return "usage: tracegas batch-split <workspace and --as options> " + QuantifyArguments.USAGE_LINE + "\n"
                + WorkspaceLogin.USAGE + "\n"
                + StoredMethods.USAGE + "\n" + """
                  Checks everything quantify checks (every file read once, the method version exists, the
                  backgrounds files hold backgrounds, no sample file twice) and then records a batch: one work unit
                  per --file, the project, method version and background files in the batch's description. A
                  method whose path source is cts-derived needs --qa-plan, as quantify does: the CTS readings among
                  the --backgrounds files give the effective path, recorded in the description, that every runner
                  corrects the results to. --instrument and --instrument-serial name the analyzer that acquired
                  the containers, as for quantify: it is recorded once, with the figures the files' records carry
                  (files of different set-ups are refused), after every input is checked; its id goes into the
                  description and every runner stores each measurement of the batch naming it.
                  A project has at most one unfinished batch per method version, whatever its files: a second one
                  would store the same samples again. Finish the first with batch-work.
                  Prints the batch id alone on standard output; give it to batch-work and batch-status.
                exit codes: 0 recorded, 2 wrong arguments, 3 bad input file (file, record and field named), the
                  project holds this version's results already or has an unfinished batch of it (named); nothing
                  is recorded then, 5 failure""";
    }

    @Override
    public int run(List<String> commandLine, RunnerContext context) throws Exception {
        QuantifyArguments arguments = QuantifyArguments.parse(commandLine);
        Options options = arguments.options();
        try (WorkspaceStore store = WorkspaceLogin.open(options, context)) {
            Session actor = WorkspaceLogin.logIn(store, options, context);
            Project project = StoredMethods.project(store, actor, options.text("--project"));
            QuantifyArguments.Checked checked;
            Optional<Instrument> instrument;
            BatchDescription description;
            try {
                checked = arguments.check(store, actor, project,
                        new ProjectQuantification(store, actor, project.getId(), StoredMethods.SOFTWARE, null));
                instrument = arguments.instrument();
                description = new BatchDescription(project.getId(), checked.found().version().getId(),
                        arguments.backgroundFiles(), arguments.ctsPath(store, checked.found()), Optional.empty());
                requireFits(description.text().length()
                        + (instrument.isPresent() ? BatchDescription.INSTRUMENT_LINE_ROOM : 0), arguments.files());
            } catch (BadInputException e) {
                context.err().println("tracegas batch-split: " + e.getMessage());
                return ExitCode.BAD_INPUT;
            }
            // recorded only now that every input has been read and checked, as quantify records it
            Optional<Instrument> recorded = instrument.map(i -> store.instruments().record(actor, i));
            description = description.withInstrument(recorded.map(Instrument::getId));
            WorkBatch batch;
            try {
                batch = store.workUnits().createBatch(actor, project.getId(),
                        WorkBatches.of(checked.found().version().getId(), description.text()),
                        arguments.files().stream().map(Path::toString).toList());
            } catch (UnfinishedBatchException e) {
                // another runner recorded its batch between the check and now
                context.err().println("tracegas batch-split: " + e.getMessage());
                return ExitCode.BAD_INPUT;
            }
            context.out().println(batch.getId());
            context.err().printf("Recorded batch %s: %d work units with %d samples of project %s, method '%s' "
                    + "version %d%s%n", batch.getId(), batch.getUnitCount(), checked.inputs().samples(),
                    project.getCode(), checked.found().method().method().name(), checked.found().version().getNumber(),
                    recorded.map(i -> ", instrument '" + i.getName() + "' serial " + i.getSerialNumber()).orElse(""));
            return ExitCode.OK;
        }
    }

    /** Checked here so that the store's refusal cannot come after a partly successful check. */
    private static void requireFits(int descriptionLength, List<Path> files) throws BadInputException {
        if (descriptionLength > WorkUnitService.MAX_TEXT_LENGTH) {
            throw new BadInputException("the --backgrounds file names take " + descriptionLength
                    + " characters, more than a batch holds (" + WorkUnitService.MAX_TEXT_LENGTH + ")");
        }
        for (Path f : files) {
            if (f.toString().length() > WorkUnitService.MAX_TEXT_LENGTH) {
                throw new BadInputException("--file " + f + ": the name is longer than a work unit holds ("
                        + WorkUnitService.MAX_TEXT_LENGTH + " characters)");
            }
        }
    }
}
