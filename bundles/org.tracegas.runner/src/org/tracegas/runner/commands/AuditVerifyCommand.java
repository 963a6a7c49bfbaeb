package org.tracegas.runner.commands;

import java.util.List;

import org.tracegas.audit.ChainFinding;
import org.tracegas.audit.VerificationReport;
import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.runner.UsageException;
import org.tracegas.store.WorkspaceStore;

/** Verifies a workspace's audit chain and names every record that was altered, removed, inserted or reordered. */
public final class AuditVerifyCommand implements Command {

    @Override
    public String name() {
        return "audit-verify";
    }

    @Override
    public String summary() {
        return "verify the audit chain of a workspace and name every tampered record";
    }

    @Override
    public String usage() {
        return """
                usage: tracegas audit-verify --workspace <folder>
                       tracegas audit-verify --server <jdbc:postgresql://...> --user <name> --password <secret>
                  Walks the whole audit chain in order and checks each record's hash and its link to the one
                  before. Prints the number of records and, for each finding, its kind (ALTERED, REMOVED,
                  INSERTED, REORDERED), sequence number and record id.
                exit codes: 0 chain intact, 1 findings, 2 wrong arguments or no workspace in the folder, 5 failure""";
    }

    @Override
    public int run(List<String> arguments, RunnerContext context) throws UsageException {
        Options options = Options.parse(arguments, List.of("--workspace", "--server", "--user", "--password"));
        try (WorkspaceStore store = WorkspaceLogin.open(options)) {
            VerificationReport report = store.verifyAuditTrail();
            context.out().printf("Audit trail: %d records checked, head sequence %d%n", report.recordsChecked(),
                    report.headSequence());
            for (ChainFinding f : report.findings()) {
                context.out().println("  " + f);
            }
            context.out().println(report.intact() ? "Chain intact." : "CHAIN BROKEN: " + report.findings().size()
                    + " finding(s).");
            return report.intact() ? ExitCode.OK : ExitCode.CHECK_FAILED;
        }
    }
}
