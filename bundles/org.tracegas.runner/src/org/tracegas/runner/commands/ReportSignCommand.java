package org.tracegas.runner.commands;

import java.util.List;
import java.util.Locale;

import org.tracegas.audit.Signature;
import org.tracegas.audit.SignatureMeaning;
import org.tracegas.audit.SignatureRefusedException;
import org.tracegas.report.campaign.CampaignReport;
import org.tracegas.report.campaign.ReportPlan;
import org.tracegas.report.campaign.ReportSignatures;
import org.tracegas.importer.ImportException;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.model.Project;
import org.tracegas.report.ReportContent;
import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.runner.UsageException;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * Signs a project's report as reviewed or approved. The report is made again from stored data with the same
 * report plan, and it is signed only if its id and content hash are those the signer read on the report (the
 * report command prints both), so that the signature covers exactly the content reviewed.
 */
public final class ReportSignCommand implements Command {

    @Override
    public String name() {
        return "report-sign";
    }

    @Override
    public String summary() {
        return "sign a report as reviewed or approved, on the content hash the report command printed";
    }

    @Override
    public String usage() {
        return "usage: tracegas report-sign <workspace and --as options> --project <code> --method <name>\n"
                + "                            --plan <report plan> --report <id> --content-hash <sha-256>\n"
                + "                            --meaning reviewed|approved [--comment <text>]\n"
                + WorkspaceLogin.USAGE + "\n" + StoredMethods.USAGE + "\n" + """
                  The report is made again from stored data with the report plan it was made with; its id and
                  content hash (printed by the report command and in section 1 of the report) must be the ones
                  given. The password of --as is asked again for the signature, from $TRACEGAS_PASSWORD. Nobody
                  signs a report made from results or QA checks they recorded themselves. After signing, the
                  report command prints the signature and the report shows it.
                exit codes: 0 signed, 1 signature refused (own report, wrong password; recorded in the audit
                  trail), 2 wrong arguments, 3 bad plan, or the report id or content hash differ from the stored
                  data's, 5 failure""";
    }

    @Override
    public int run(List<String> arguments, RunnerContext context) throws Exception {
        Options options = Options.parse(arguments, WorkspaceLogin.optionsWith("--project", "--method",
                "--method-version", "--plan", "--report", "--content-hash", "--meaning",
                "--comment"));
        SignatureMeaning meaning = meaning(options.text("--meaning"));
        String reportId = options.text("--report");
        String reviewedHash = options.text("--content-hash").strip().toLowerCase(Locale.ROOT);
        try (WorkspaceStore store = WorkspaceLogin.open(options, context)) {
            Session signer = WorkspaceLogin.logIn(store, options, context);
            Project project = StoredMethods.project(store, signer, options.text("--project"));
            CampaignReport report = new CampaignReport(store, signer, project.getId(), StoredMethods.SOFTWARE);
            StoredMethods.Found found;
            ReportContent content;
            try {
                found = StoredMethods.find(store, options);
                content = report.content(found.version(), found.method(), ReportPlan.read(options.path("--plan")));
            } catch (FileFormatException | ImportException e) {
                context.err().println("tracegas report-sign: " + e.getMessage());
                return ExitCode.BAD_INPUT;
            }
            if (!content.campaign().reportId().equals(reportId)) {
                context.err().println("tracegas report-sign: the plan makes report " + content.campaign().reportId()
                        + ", not " + reportId);
                return ExitCode.BAD_INPUT;
            }
            if (!content.contentHash().equals(reviewedHash)) {
                context.err().println("tracegas report-sign: the stored data now give report " + reportId
                        + " the content hash " + content.contentHash() + ", not " + reviewedHash
                        + "; make the report again and review that content");
                return ExitCode.BAD_INPUT;
            }
            // whoever recorded any of the report's results or checks is its author; naming the signer as the
            // author then lets the store refuse the signature and record the refused attempt
            List<String> authors = report.authors(found.version().getId());
            String author = authors.contains(signer.userId()) ? signer.userId() : authors.get(0);
            try {
                Signature s = ReportSignatures.sign(store, signer, project.getId(), content, author,
                        options.text("--as"), WorkspaceLogin.password(context, WorkspaceLogin.PASSWORD_VARIABLE),
                        meaning, options.has("--comment") ? options.text("--comment") : null);
                context.out().println("Report " + reportId + " signed: " + s.manifestation());
                context.out().println("Content hash (SHA-256): " + s.contentSha256());
                // the signature is now the chain's newest record: kept outside, it anchors the chain
                org.tracegas.audit.ChainAnchor head = org.tracegas.audit.ChainAnchor.headOf(store.audit().verify());
                context.out().println("Chain anchor: " + (head == null ? "none" : head.text()));
                return ExitCode.OK;
            } catch (SignatureRefusedException e) {
                context.err().println("tracegas report-sign: signature refused: " + e.getMessage());
                return ExitCode.CHECK_FAILED;
            }
        }
    }

    private static SignatureMeaning meaning(String text) throws UsageException {
        return switch (text.strip().toLowerCase(Locale.ROOT)) {
            case "reviewed" -> SignatureMeaning.REVIEWED;
            case "approved" -> SignatureMeaning.APPROVED;
            default -> throw new UsageException("--meaning must be reviewed or approved, was '" + text + "'");
        };
    }
}
