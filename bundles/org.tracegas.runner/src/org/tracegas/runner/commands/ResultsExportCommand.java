package org.tracegas.runner.commands;

import java.nio.file.Path;
import java.util.List;

import org.tracegas.report.campaign.ResultsExport;
import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.store.ProjectInfo;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/** Writes a project's stored results as CSV, one line per result, without a report plan. */
public final class ResultsExportCommand implements Command {

    @Override
    public String name() {
        return "results-export";
    }

    @Override
    public String summary() {
        return "write a project's stored results as CSV: measurement, time, file, value, uncertainty, versions";
    }

    @Override
    public String usage() {
        return "usage: tracegas results-export <workspace and --as options> --project <code> --out <file.csv>\n"
                + WorkspaceLogin.USAGE + "\n" + """
                  One line per stored result: measurement, measured_utc, source_file, compound, value,
                  standard_uncertainty, detection_limit, unit, flags, method, method_version, library,
                  library_version, provenance_sha256 (of the absorbance fitted), recipe_sha256, and what the
                  value was corrected with: cell temperature, pressure and path with their origins, the
                  references' temperature and pressure, the fit's path, the factor, and the transform's noise
                  factor F with its origin. The file is written whole or not at all, and the export is recorded in
                  the audit trail with the file's SHA-256.
                exit codes: 0 written, 2 wrong arguments, 5 failure""";
    }

    @Override
    public int run(List<String> arguments, RunnerContext context) throws Exception {
        Options options = Options.parse(arguments, WorkspaceLogin.optionsWith("--project", "--out"));
        Path out = options.path("--out");
        try (WorkspaceStore store = WorkspaceLogin.open(options, context)) {
            Session actor = WorkspaceLogin.logIn(store, options, context);
            ProjectInfo project = StoredMethods.project(store, actor, options.text("--project"));
            ResultsExport.Written written = ResultsExport.write(store, actor, project.id(), out);
            context.out().printf("Wrote %d result(s) of project %s to %s (sha256 %s, recorded in the audit trail)%n",
                    written.results(), project.code(), out, written.sha256());
            // the values are of toxic gases: they are not to be used without their uncertainty and flags
            context.out().println("Caution: results of toxic gases; read each value with its uncertainty, detection"
                    + " limit and flags, and have them reviewed before acting on them.");
            return ExitCode.OK;
        }
    }
}
