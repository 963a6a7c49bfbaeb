package org.tracegas.runner.internal;

import java.util.List;

import org.eclipse.equinox.app.IApplication;
import org.eclipse.equinox.app.IApplicationContext;
import org.osgi.framework.FrameworkUtil;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.runner.Command;
import org.tracegas.runner.CommandContributions;
import org.tracegas.runner.CommandTable;
import org.tracegas.runner.commands.AuditVerifyCommand;
import org.tracegas.runner.commands.BatchSplitCommand;
import org.tracegas.runner.commands.BatchStatusCommand;
import org.tracegas.runner.commands.BatchWorkCommand;
import org.tracegas.runner.commands.ImportCommand;
import org.tracegas.runner.commands.LibraryAddCommand;
import org.tracegas.runner.commands.LibraryBuildCommand;
import org.tracegas.runner.commands.MethodDefineCommand;
import org.tracegas.runner.commands.ProjectAddCommand;
import org.tracegas.runner.commands.QaCommand;
import org.tracegas.runner.commands.QuantifyCommand;
import org.tracegas.runner.commands.ReportCommand;
import org.tracegas.runner.commands.ReportSignCommand;
import org.tracegas.runner.commands.ResultsExportCommand;
import org.tracegas.runner.commands.UserAddCommand;
import org.tracegas.runner.commands.UserUnlockCommand;
import org.tracegas.runner.commands.WorkspaceInitCommand;
import org.tracegas.importer.ReaderRegistry;
import org.tracegas.preprocess.StepRegistry;
import org.eclipse.core.runtime.RegistryFactory;
import org.tracegas.runner.RunnerContext;

/** The headless Equinox application: hands the command line to the runner's command table. */
public final class RunnerApplication implements IApplication {

    private final CancellationFlag cancel = new CancellationFlag();

    @Override
    public Object start(IApplicationContext context) {
        String[] argv = (String[]) context.getArguments().get(IApplicationContext.APPLICATION_ARGS);
        String version = FrameworkUtil.getBundle(getClass()).getVersion().toString();
        String[] line = argv == null ? new String[0] : argv;
        try (RunnerLogging logging = RunnerLogging.configure(List.of(line))) {
            CommandTable table = new CommandTable(version,
                    CommandContributions.fromExtensions(RegistryFactory.getRegistry()));
            return table.dispatch(line, new RunnerContext(System.out, System.err, System.getenv(), cancel));
        }
    }

    /**
     * The runner's own commands, as its plugin.xml contributes them, for use without an extension registry: with
     * the given cancellation, readers and steps.
     */
    static List<Command> commands(CancellationFlag cancel, ReaderRegistry readers, StepRegistry steps) {
        return List.of(new AuditVerifyCommand(), new WorkspaceInitCommand(),
                new UserAddCommand(), new UserUnlockCommand(), new ProjectAddCommand(), new ImportCommand(readers),
                new LibraryBuildCommand(cancel), new LibraryAddCommand(), new MethodDefineCommand(),
                new QuantifyCommand(cancel, readers, steps), new QaCommand(), new ReportCommand(),
                new ResultsExportCommand(), new ReportSignCommand(), new BatchSplitCommand(),
                new BatchWorkCommand(cancel), new BatchStatusCommand());
    }

    @Override
    public void stop() {
        cancel.cancel();
    }
}
