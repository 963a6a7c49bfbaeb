package org.tracegas.runner.commands;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;

import org.eclipse.core.runtime.RegistryFactory;
import org.tracegas.pipeline.FileMeasurements;
import org.tracegas.pipeline.MeasurementQuantification;
import org.tracegas.pipeline.ProjectQuantification;
import org.tracegas.qa.campaign.CtsPath;
import org.tracegas.qa.campaign.QaPlan;
import org.tracegas.importer.ImportException;
import org.tracegas.importer.ImportReader;
import org.tracegas.importer.ReaderRegistry;
import org.tracegas.importer.container.ContainerImportReader;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.model.Instrument;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.Project;
import org.tracegas.preprocess.InterferogramTransform;
import org.tracegas.preprocess.StepRegistry;
import org.tracegas.quantify.BatchOutcome;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.runner.UsageException;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * Quantifies a project with a stored method version: the lab's files and the measurements already in the
 * workspace, of any kind, each once per method version; or, given interferogram containers with their
 * backgrounds, streams them on all cores as a stack campaign.
 */
public final class QuantifyCommand implements Command {

    private final CancellationFlag cancel;
    private final ReaderRegistry readers;
    private final StepRegistry steps;

    /** The command with the given readers of the lab's files and the steps a method's recipe may name. */
    public QuantifyCommand(CancellationFlag cancel, ReaderRegistry readers, StepRegistry steps) {
        this.cancel = cancel;
        this.readers = readers;
        this.steps = steps;
    }

    /**
     * The command as the runner's extension point creates it: the readers and steps contributed to the running
     * platform, and the runner's cancellation.
     */
    public QuantifyCommand() {
        this(null, ReaderRegistry.fromPlatform(), StepRegistry.fromExtensions(RegistryFactory.getRegistry()));
    }

    /** The command for interferogram containers only, with the built-in recipe steps. */
    public QuantifyCommand(CancellationFlag cancel) {
        this(cancel, new ReaderRegistry().register("org.tracegas.importer.container", "interferogram container",
                new ContainerImportReader()), StepRegistry.withBuiltInSteps());
    }

    @Override
    public String name() {
        return "quantify";
    }

    /** The flag given to the command, else the runner's. */
    private CancellationFlag cancel(RunnerContext context) {
        return cancel != null ? cancel : context.cancellation();
    }

    @Override
    public String summary() {
        return "quantify a project's files and measurements (interferogram, single beam, transmittance,"
                + " absorbance) with a stored method";
    }

    @Override
    public String usage() {
        return "usage: tracegas quantify <workspace and --as options> --project <code> --method <name>\n"
                + "       [--file <file> ...] [--background-file <file> ...] [--qa-plan <file>] [import options]\n"
                + "   or: tracegas quantify <workspace and --as options> " + QuantifyArguments.USAGE_LINE + "\n"
                + WorkspaceLogin.USAGE + "\n" + StoredMethods.USAGE + "\n" + FileImports.USAGE + "\n" + """
                  The first form imports the --file files (samples) and --background-file files (backgrounds) as
                  the import command does (a file imported before adds nothing), then quantifies every sample
                  measurement of the project not yet quantified with the method version, and says how many it
                  skipped. Absorbance is fitted as it is; transmittance becomes -log10 T; single beams and
                  interferograms (transformed as the method says) are ratioed against the last background before
                  them. The method's [recipe] steps apply next, and the recipe that ran is recorded with every
                  result. Every sample is checked before anything is stored. A run that stops (cancelled,
                  killed) is finished by running it again. A method whose path source is cts-derived needs
                  --qa-plan: the project's CTS measurements (imported with their role label, or among the files)
                  give the effective path (mean of the readings) every result is corrected to.
                  The second form streams interferogram containers: backgrounds are the background records of the
                  --backgrounds files; each sample is ratioed against the last one before it. A method whose path
                  source is cts-derived needs --qa-plan: the CTS readings among the --backgrounds files give the
                  effective path (mean of the readings) every result is corrected to. --instrument and
                  --instrument-serial name the analyzer that acquired the containers: it is recorded once with the
                  figures the files' records carry (reference laser wavenumber, maximum path difference, cell
                  path length; files of different set-ups are refused) and every stored measurement names it.
                exit codes: 0 done, 2 wrong arguments, 3 bad input (file, record and field named; nothing
                  stored), or in the second form the project holds this version's results already or has an
                  unfinished batch-split batch of it (named), 4 cancelled (what was stored stays), 5 failure""";
    }

    @Override
    public int run(List<String> commandLine, RunnerContext context) throws Exception {
        if (commandLine.contains("--backgrounds") && containersOnly(commandLine)) {
            return runStack(commandLine, context);
        }
        List<String> rest = new ArrayList<>();
        List<Path> files = Options.repeated(commandLine, "--file", rest);
        List<String> rest2 = new ArrayList<>();
        List<Path> backgroundFiles = Options.repeated(rest, "--background-file", rest2);
        List<String> accepted = new ArrayList<>(WorkspaceLogin.optionsWith("--project", "--method",
                "--method-version", "--qa-plan"));
        accepted.addAll(FileImports.optionNames());
        Options options = Options.parse(rest2, accepted);
        try (WorkspaceStore store = WorkspaceLogin.open(options, context)) {
            Session actor = WorkspaceLogin.logIn(store, options, context);
            Project project = StoredMethods.project(store, actor, options.text("--project"));
            StoredMethods.Found found;
            MeasurementQuantification job;
            MeasurementQuantification.Plan plan;
            OptionalDouble ctsPath = OptionalDouble.empty();
            try {
                found = StoredMethods.find(store, options);
                job = new MeasurementQuantification(store, actor, project.getId(), found.version(), found.method(),
                        steps, StoredMethods.SOFTWARE);
                FileMeasurements.Defaults d = FileImports.defaults(options);
                List<Path> all = new ArrayList<>(backgroundFiles);
                all.addAll(files);
                List<FileMeasurements.Read> read = new ArrayList<>(FileImports.readAll(readers, backgroundFiles,
                        new FileMeasurements.Defaults(MeasurementKind.BACKGROUND, d.time(), d.cellTemperature(),
                                d.cellPressure())));
                read.addAll(FileImports.readAll(readers, files, d));
                // every sample, stored or in the files, is checked before anything is stored
                job.check(job.plan(read));
                // and the CTS readings among them give the path before anything is stored
                Optional<QaPlan> qaPlan = QuantifyArguments.qaPlan(options, found);
                if (qaPlan.isPresent()) {
                    ctsPath = OptionalDouble.of(CtsPath.measure(store, qaPlan.get(), found.method(), job));
                    job.correctToCtsPath(ctsPath.getAsDouble());
                }
                FileImports.storeAll(store, actor, project, all, read, context);
                plan = job.plan();
            } catch (FileFormatException | ImportException | IllegalArgumentException e) {
                context.err().println("tracegas quantify: " + e.getMessage() + "; nothing quantified");
                return ExitCode.BAD_INPUT;
            } catch (BadInputException e) {
                context.err().println("tracegas quantify: " + e.getMessage());
                return ExitCode.BAD_INPUT;
            }
            printPath(context, found, ctsPath);
            context.progress().begin("quantify");
            MeasurementQuantification.Outcome outcome = job.run(plan, context.progress()::update, cancel(context));
            if (outcome.cancelled()) {
                context.err().printf("tracegas quantify: cancelled after %d of %d measurements; run again to"
                        + " finish%n", outcome.stored(), plan.samples().size());
                return ExitCode.CANCELLED;
            }
            context.out().printf("Quantified %d measurement(s) of project %s with method '%s' version %d;"
                    + " skipped %d quantified with it before%n", outcome.stored(), project.getCode(),
                    found.method().method().name(), found.version().getNumber(), outcome.skipped());
            return ExitCode.OK;
        }
    }

    /** The path the CTS readings gave, when they gave it. */
    private static void printPath(RunnerContext context, StoredMethods.Found found, OptionalDouble ctsPath) {
        if (ctsPath.isPresent()) {
            context.out().printf(Locale.ROOT, "Path: %.4f m, derived from the CTS readings (nominal %s m)%n",
                    ctsPath.getAsDouble(), found.method().method().pathLengthMetres());
        }
    }

    /** Whether every --file and --backgrounds file is an interferogram container (the stack campaign form). */
    private static boolean containersOnly(List<String> commandLine) {
        ContainerImportReader container = new ContainerImportReader();
        for (int i = 0; i + 1 < commandLine.size(); i++) {
            String o = commandLine.get(i);
            if (o.equals("--file") || o.equals("--backgrounds")) {
                Path f = Path.of(commandLine.get(i + 1));
                try (InputStream in = Files.newInputStream(f)) {
                    if (!container.recognise(in.readNBytes(ImportReader.HEAD_BYTES), f.getFileName().toString())
                            .recognised()) {
                        return false;
                    }
                } catch (IOException e) {
                    return true; // the stack form names the file it cannot read
                }
            }
        }
        return true;
    }

    private int runStack(List<String> commandLine, RunnerContext context) throws Exception {
        QuantifyArguments arguments = QuantifyArguments.parse(commandLine);
        Options options = arguments.options();
        try (WorkspaceStore store = WorkspaceLogin.open(options, context)) {
            Session actor = WorkspaceLogin.logIn(store, options, context);
            Project project = StoredMethods.project(store, actor, options.text("--project"));
            // checking reads only: the instrument, if named, is recorded once every input has been read
            ProjectQuantification checking = new ProjectQuantification(store, actor, project.getId(),
                    StoredMethods.SOFTWARE, null);
            QuantifyArguments.Checked checked;
            try {
                checked = arguments.check(store, actor, project, checking);
            } catch (BadInputException e) {
                context.err().println("tracegas quantify: " + e.getMessage());
                return ExitCode.BAD_INPUT;
            }
            StoredMethods.Found found = checked.found();
            OptionalDouble ctsPath;
            Optional<Instrument> instrument;
            try {
                instrument = arguments.instrument();
                ctsPath = arguments.ctsPath(store, found);
            } catch (BadInputException e) {
                context.err().println("tracegas quantify: " + e.getMessage());
                return ExitCode.BAD_INPUT;
            }
            printPath(context, found, ctsPath);
            String instrumentId = instrument.map(i -> store.instruments().record(actor, i).getId()).orElse(null);
            ProjectQuantification job = new ProjectQuantification(store, actor, project.getId(),
                    StoredMethods.SOFTWARE, instrumentId);
            context.progress().begin("quantify");
            BatchOutcome outcome = job.run(found.version(), found.method(), arguments.files(),
                    checked.inputs().samples(), checked.inputs().backgrounds(), ctsPath, context.progress()::update,
                    cancel(context));
            if (outcome.cancelled()) {
                context.err().println("tracegas quantify: cancelled after " + outcome.delivered() + " spectra");
                return ExitCode.CANCELLED;
            }
            context.out().printf("Processed %d spectra of project %s with method '%s' version %d%n",
                    outcome.delivered(), project.getCode(), found.method().method().name(),
                    found.version().getNumber());
            return ExitCode.OK;
        }
    }
}
