package org.tracegas.runner.commands;

import java.util.List;

import org.eclipse.core.runtime.IExtensionRegistry;
import org.eclipse.core.runtime.RegistryFactory;
import org.tracegas.pipeline.ContainerContents;
import org.tracegas.pipeline.MeasurementQuantification;
import org.tracegas.qa.campaign.QaEvaluation;
import org.tracegas.qa.campaign.QaPlan;
import org.tracegas.importer.ImportException;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.model.Project;
import org.tracegas.preprocess.InterferogramTransform;
import org.tracegas.preprocess.StepRegistry;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/** Evaluates a campaign's QA checks from its QA measurement file and stores them with the project. */
public final class QaCommand implements Command {

    @Override
    public String name() {
        return "qa";
    }

    @Override
    public String summary() {
        return "evaluate and store the QA checks of a project from its QA measurements (exit code 1 on a failure)";
    }

    @Override
    public String usage() {
        return "usage: tracegas qa <workspace and --as options> --project <code> --method <name>\n"
                + "                   --plan <QA plan> [--qa-file <container>]\n" + WorkspaceLogin.USAGE + "\n"
                + StoredMethods.USAGE + "\n" + """
                  The QA file holds backgrounds and the QA measurements, each with its role in the header (cts,
                  zero, spike, unspiked, spike-direct). Without --qa-file, the QA measurements are those the
                  project holds from imported files whose records state their role (label role; in JCAMP-DX
                  ##$ROLE=cts), made absorbance, put through the method's recipe and fitted as quantify does,
                  with the project's backgrounds; quantify leaves them out of the results. The plan (key = value lines) names the method's library folder, the CTS
                  gas, band and content, the spike gas, the zero-gas analytes, the noise region and limit, and
                  the background age limit, optionally the checks to evaluate by name (checks = ...; all built-in
                  ones by default, contributed ones too), and in [chart] blocks (readings, baseline) the repeated
                  readings charted against earlier campaigns of the method. Checks are evaluated once per method version
                  and stored; later runs print the stored ones.
                exit codes: 0 every check passed, 1 a check failed, 2 wrong arguments, 3 bad plan or QA file
                  (file, line and field named; nothing stored), 5 failure""";
    }

    /** The steps a method's recipe may name: those contributed to the running platform, else the built-in ones. */
    private static StepRegistry steps() {
        IExtensionRegistry running = RegistryFactory.getRegistry();
        return running == null ? StepRegistry.withBuiltInSteps() : StepRegistry.fromExtensions(running);
    }

    @Override
    public int run(List<String> arguments, RunnerContext context) throws Exception {
        Options options = Options.parse(arguments, WorkspaceLogin.optionsWith("--project", "--method",
                "--method-version", "--plan", "--qa-file"));
        try (WorkspaceStore store = WorkspaceLogin.open(options, context)) {
            Session actor = WorkspaceLogin.logIn(store, options, context);
            Project project = StoredMethods.project(store, actor, options.text("--project"));
            QaEvaluation.Outcome outcome;
            try {
                StoredMethods.Found found = StoredMethods.find(store, options);
                QaPlan plan = QaPlan.read(options.path("--plan"));
                QaEvaluation evaluation = new QaEvaluation(store, actor, project.getId(), StoredMethods.SOFTWARE);
                if (options.has("--qa-file")) {
                    ContainerContents qa = ContainerContents.read(List.of(options.path("--qa-file")),
                            new InterferogramTransform(found.method().transform()));
                    outcome = evaluation.run(found.version().getId(), found.method(), plan, qa);
                } else {
                    outcome = evaluation.run(found.version().getId(), found.method(), plan,
                            new MeasurementQuantification(store, actor, project.getId(), found.version(),
                                    found.method(), steps(), StoredMethods.SOFTWARE));
                }
            } catch (FileFormatException | ImportException e) {
                context.err().println("tracegas qa: " + e.getMessage());
                return ExitCode.BAD_INPUT;
            }
            long failed = outcome.checks().stream().filter(c -> !c.passed()).count();
            context.out().printf("QA checks: %d, failed: %d%s%n", outcome.checks().size(), failed,
                    outcome.reused() ? " (stored earlier)" : "");
            for (CheckOutcome c : outcome.checks()) {
                context.out().println("  " + (c.passed() ? "pass " : "FAIL ") + c.summary());
            }
            return failed == 0 ? ExitCode.OK : ExitCode.CHECK_FAILED;
        }
    }
}
