package org.tracegas.runner.commands;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.tracegas.importer.ImportException;
import org.tracegas.pipeline.ContainerContents;
import org.tracegas.pipeline.ContainerInstrument;
import org.tracegas.pipeline.ProjectQuantification;
import org.tracegas.pipeline.QuantificationSetup;
import org.tracegas.qa.campaign.CtsPath;
import org.tracegas.qa.campaign.QaPlan;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.preprocess.InterferogramTransform;
import org.tracegas.qa.basis.PathOrigin;
import org.tracegas.model.Instrument;
import org.tracegas.model.Project;
import org.tracegas.model.WorkBatch;
import org.tracegas.runner.UsageException;
import org.tracegas.store.BatchProgress;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * The command line of a quantification (quantify, batch-split): the workspace and login, project, method and
 * version, the --backgrounds files and the --file sample files, each at least once.
 */
record QuantifyArguments(Options options, List<Path> backgroundFiles, List<Path> files) {

    static final String USAGE_LINE = "--project <code> --method <name>\n"
            + "       --backgrounds <container> [--backgrounds ...] --file <container> [--file ...]\n"
            + "       [--qa-plan <file>] [--instrument <name> --instrument-serial <serial>]";

    QuantifyArguments {
        backgroundFiles = List.copyOf(backgroundFiles);
        files = List.copyOf(files);
    }

    /** The method version rebuilt from the workspace and the inputs read, ready to process. */
    record Checked(StoredMethods.Found found, SampleInputs inputs) {
    }

    /**
     * Finds the method version and reads every input file once, before anything is stored or recorded.
     *
     * @throws BadInputException naming the file, record and field at fault, naming the unfinished batch of this
     *                           project and version (working it stores these results), or when the project holds
     *                           this version's results already (processing again would repeat them)
     * @throws UsageException    if the method or its version does not exist
     */
    Checked check(WorkspaceStore store, Session actor, Project project, ProjectQuantification job)
            throws BadInputException, UsageException {
        StoredMethods.Found found;
        try {
            found = StoredMethods.find(store, options);
        } catch (FileFormatException e) {
            throw new BadInputException(e.getMessage(), e);
        }
        try {
            QuantificationSetup.requireNoRecipeSteps(found.method());
        } catch (IllegalArgumentException e) {
            throw new BadInputException("method version " + found.version().getNumber() + ": " + e.getMessage()
                    + "; nothing done", e);
        }
        Optional<WorkBatch> unfinished = store.workUnits().unfinishedBatch(actor, project.getId(),
                found.version().getId());
        if (unfinished.isPresent()) {
            String id = unfinished.get().getId();
            BatchProgress progress = store.workUnits().progress(actor, id);
            throw new BadInputException("project " + project.getCode() + " has the unfinished work batch " + id
                    + " of method version " + found.version().getNumber() + " (" + progress.open() + " open and "
                    + progress.claimed() + " claimed of " + progress.total() + " units); finish it with batch-work"
                    + " --batch " + id + "; nothing done");
        }
        if (job.hasResults(found.version().getId())) {
            throw new BadInputException("project " + project.getCode() + " holds results of method version "
                    + found.version().getNumber() + " already; nothing done");
        }
        return new Checked(found, SampleInputs.read(found.method(), backgroundFiles, files));
    }

    /**
     * The effective path the CTS readings among the --backgrounds files measured ({@link CtsPath}), for a method
     * whose path source is CTS-derived; empty for a method of nominal path.
     *
     * @throws BadInputException as {@link #qaPlan}, or naming the file, record and field of the CTS readings at
     *                           fault
     * @throws UsageException    as {@link #qaPlan}
     */
    OptionalDouble ctsPath(WorkspaceStore store, StoredMethods.Found found)
            throws BadInputException, UsageException, IOException {
        Optional<QaPlan> plan = qaPlan(options, found);
        if (plan.isEmpty()) {
            return OptionalDouble.empty();
        }
        try {
            ContainerContents qa = ContainerContents.read(backgroundFiles,
                    new InterferogramTransform(found.method().transform()));
            return OptionalDouble.of(CtsPath.measure(store, plan.get(), found.method(), qa, StoredMethods.SOFTWARE));
        } catch (FileFormatException | ImportException e) {
            throw new BadInputException(e.getMessage() + "; nothing done", e);
        }
    }

    /**
     * The instrument that acquired the containers, as --instrument and --instrument-serial name it, with the
     * figures of the files' first records ({@link ContainerInstrument#describe}); empty when neither is given, and
     * the measurements are then stored without an instrument. Nothing is recorded here.
     *
     * @throws UsageException    if only one of the two options is given
     * @throws BadInputException naming the file, record and field where the files' set-ups differ
     */
    Optional<Instrument> instrument() throws UsageException, BadInputException, IOException {
        if (!options.has("--instrument") && !options.has("--instrument-serial")) {
            return Optional.empty();
        }
        if (!options.has("--instrument") || !options.has("--instrument-serial")) {
            throw new UsageException("give --instrument and --instrument-serial together: an instrument is known by"
                    + " its name and serial number", false);
        }
        List<Path> all = new ArrayList<>(backgroundFiles);
        all.addAll(files);
        try {
            return Optional.of(ContainerInstrument.describe(all, options.text("--instrument"),
                    options.text("--instrument-serial")));
        } catch (ImportException e) {
            throw new BadInputException(e.getMessage() + "; nothing done", e);
        }
    }

    /**
     * The QA plan (--qa-plan) that says how the CTS readings give the path of a method whose path source is
     * CTS-derived; empty for a method of nominal path.
     *
     * @throws BadInputException if such a method lacks --qa-plan, naming it, or naming the file, line and key of
     *                           the plan at fault
     * @throws UsageException    if --qa-plan is given for a method of nominal path, which would not use it
     */
    static Optional<QaPlan> qaPlan(Options options, StoredMethods.Found found)
            throws BadInputException, UsageException, IOException {
        String name = found.method().method().name();
        if (found.method().pathSource() != PathOrigin.CTS_DERIVED) {
            if (options.has("--qa-plan")) {
                throw new UsageException("method '" + name + "' corrects to its nominal path; --qa-plan is for a "
                        + "method whose path source is cts-derived", false);
            }
            return Optional.empty();
        }
        if (!options.has("--qa-plan")) {
            throw new BadInputException("method '" + name + "' takes its path from the CTS readings: give "
                    + "--qa-plan; nothing done");
        }
        try {
            return Optional.of(QaPlan.read(options.path("--qa-plan")));
        } catch (FileFormatException e) {
            throw new BadInputException(e.getMessage() + "; nothing done", e);
        }
    }

    static QuantifyArguments parse(List<String> arguments) throws UsageException {
        List<String> rest = new ArrayList<>();
        List<Path> files = Options.repeated(arguments, "--file", rest);
        List<String> rest2 = new ArrayList<>();
        List<Path> backgroundFiles = Options.repeated(rest, "--backgrounds", rest2);
        // the repeated options are among the accepted ones only so that a mistyped one is told its nearest name
        Options options = Options.parse(rest2, WorkspaceLogin.optionsWith("--project", "--method",
                "--method-version", "--file", "--backgrounds", "--qa-plan", "--instrument", "--instrument-serial"));
        if (files.isEmpty() || backgroundFiles.isEmpty()) {
            throw new UsageException("give at least one --file and one --backgrounds file");
        }
        return new QuantifyArguments(options, backgroundFiles, files);
    }
}
