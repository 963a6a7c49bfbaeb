package org.tracegas.runner.commands;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import org.tracegas.audit.Signature;
import org.tracegas.report.campaign.CampaignReport;
import org.tracegas.report.campaign.ReportIdTakenException;
import org.tracegas.report.campaign.ReportPlan;
import org.tracegas.importer.ImportException;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.model.Project;
import org.tracegas.report.ReportContent;
import org.tracegas.report.SignatureWords;
import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/** Makes a project's PDF report and CSV of results from stored results and stored QA checks only. */
public final class ReportCommand implements Command {

    @Override
    public String name() {
        return "report";
    }

    @Override
    public String summary() {
        return "make the PDF report and the CSV of results from stored results and stored QA checks, with its "
                + "signatures";
    }

    @Override
    public String usage() {
        return "usage: tracegas report <workspace and --as options> --project <code> --method <name>\n"
                + "                       --plan <report plan> --out <folder>\n" + WorkspaceLogin.USAGE + "\n"
                + StoredMethods.USAGE + "\n" + """
                  The plan (key = value lines) gives the campaign (report-id, client, plant, source, days,
                  issued), the reporting basis (standard conditions, reference-o2), the O2 side-channel file and
                  column, the water compound (or water = none with moisture and moisture-uncertainty in
                  % vol, stated where the method measures no water; the report prints them and their plan
                  line), the uncertainty budget, the averaging periods, an optional example fit, and one [compound] block per reported compound (name, molar-mass, limit lines
                  such as '100 per 30 min'), and the QA plan whose control charts the report draws again
                  (qa-plan). Writes report.pdf and results.csv into --out, each whole, and prints the report id
                  and content hash that report-sign is given, and the signatures given on the report.
                  A report id names one report in the workspace: an id issued or signed on another project is refused.
                exit codes: 0 written and every QA reading passed, 1 written but a QA reading failed (the first
                  page says so), 2 wrong arguments, 3 bad plan or O2 file (file, line and field named; nothing
                  written) or a report id of another project, 5 failure (for example: no stored results or QA
                  checks yet), 6 refused""";
    }

    @Override
    public int run(List<String> arguments, RunnerContext context) throws Exception {
        Options options = Options.parse(arguments, WorkspaceLogin.optionsWith("--project", "--method",
                "--method-version", "--plan", "--out"));
        Path out = options.path("--out");
        try (WorkspaceStore store = WorkspaceLogin.open(options, context)) {
            Session actor = WorkspaceLogin.logIn(store, options, context);
            Project project = StoredMethods.project(store, actor, options.text("--project"));
            CampaignReport report = new CampaignReport(store, actor, project.getId(), StoredMethods.SOFTWARE);
            ReportContent content;
            StoredMethods.Found found;
            try {
                found = StoredMethods.find(store, options);
                content = report.content(found.version(), found.method(), ReportPlan.read(options.path("--plan")));
            } catch (FileFormatException | ImportException e) {
                context.err().println("tracegas report: " + e.getMessage());
                return ExitCode.BAD_INPUT;
            }
            CampaignReport.Written written;
            try {
                written = report.writeInto(content, found.version(), found.method(), out);
            } catch (ReportIdTakenException e) {
                context.err().println("tracegas report: " + e.getMessage() + "; give this report its own report-id"
                        + " in the plan " + options.path("--plan") + " (nothing written)");
                return ExitCode.BAD_INPUT;
            }
            context.out().println("Report: " + written.pdf());
            context.out().println("Results: " + written.csv());
            // what report-sign is given, so that a signature covers exactly the content reviewed
            context.out().println("Report id: " + content.campaign().reportId());
            context.out().println("Content hash (SHA-256): " + content.contentHash());
            for (Signature s : content.signatures()) {
                context.out().println("Signature: " + SignatureWords.noun(s.meaning()).toUpperCase(Locale.ROOT)
                        + " by " + s.printedName() + " at " + s.signedAt()
                        + (s.contentSha256().equals(content.contentHash()) ? ""
                                : " (on earlier content " + s.contentSha256() + ")"));
            }
            long failed = content.qa().stream().filter(q -> !q.passed()).count();
            if (failed > 0) {
                context.out().println("QA: " + failed + " of " + content.qa().size() + " QA readings failed; the "
                        + "report says so on its first page");
                return ExitCode.CHECK_FAILED;
            }
            return ExitCode.OK;
        }
    }
}
