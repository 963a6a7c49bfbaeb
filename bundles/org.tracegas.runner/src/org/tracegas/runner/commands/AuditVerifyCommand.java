package org.tracegas.runner.commands;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.tracegas.audit.ChainAnchor;
import org.tracegas.audit.ChainFinding;
import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.runner.UsageException;
import org.tracegas.store.DataFinding;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.WorkspaceVerification;

/**
 * Verifies a workspace's audit chain and every stored data row it vouches for, and names every record and row
 * that was altered, removed or inserted; anchors kept outside the database catch a consistent rewrite.
 */
public final class AuditVerifyCommand implements Command {

    @Override
    public String name() {
        return "audit-verify";
    }

    @Override
    public String summary() {
        return "verify the audit chain and the data it vouches for, and name every tampered record or row";
    }

    @Override
    public String usage() {
        return """
                usage: tracegas audit-verify --workspace <folder> [--anchor <seq>:<hash>]... [--anchors <file>]
                       tracegas audit-verify --server <jdbc:postgresql://...> --user <name> [anchors as above]
                  Walks the whole audit chain in order and checks each record's hash and its link to the one
                  before, then every stored data row (measurements, spectra, results, QA checks, method and
                  library versions, users, projects, grants) against the audit record that vouches for it.
                  Prints the number of records and rows and, for each finding, its kind and what it names:
                  records by sequence number and id (ALTERED, REMOVED, INSERTED, REORDERED), rows by kind,
                  id and vouching record (CHANGED, DELETED, INSERTED). Each anchor, as printed on a report
                  ("last audit record" and "its chain hash"), must still be in the chain: this catches a
                  consistent rewrite of the whole database. An anchors file holds one <seq>:<hash> a line;
                  blank lines and lines starting with # are skipped.
                  Last line printed: the chain anchor now, to keep with the next report.
                exit codes: 0 chain and data intact, 1 findings, 2 wrong arguments or no workspace in the folder, 3 bad anchors file, 5 failure""";
    }

    @Override
    public int run(List<String> arguments, RunnerContext context) throws UsageException {
        List<String> rest = new ArrayList<>();
        List<ChainAnchor> anchors = new ArrayList<>();
        for (String a : Options.repeatedText(arguments, "--anchor", rest)) {
            try {
                anchors.add(ChainAnchor.parse(a));
            } catch (IllegalArgumentException e) {
                throw new UsageException("--anchor " + a + ": " + e.getMessage());
            }
        }
        Options options = Options.parse(rest, WorkspaceLogin.optionsWith("--anchors"));
        if (options.has("--anchors")) {
            try {
                anchors.addAll(readAnchors(options.path("--anchors")));
            } catch (BadInputException e) {
                context.err().println("tracegas audit-verify: " + e.getMessage());
                return ExitCode.BAD_INPUT;
            }
        }
        try (WorkspaceStore store = WorkspaceLogin.open(options, context)) {
            WorkspaceVerification v = store.audit().verifyWorkspace(anchors);
            context.out().printf("Audit trail: %d records checked, head sequence %d; %d data rows checked;"
                    + " %d anchor(s) given%n", v.chain().recordsChecked(), v.chain().headSequence(), v.rowsChecked(),
                    anchors.size());
            for (ChainFinding f : v.chain().findings()) {
                context.out().println("  " + f);
            }
            for (DataFinding f : v.dataFindings()) {
                context.out().println("  " + f);
            }
            if (v.truncated() || v.chain().truncated()) {
                context.out().println("  (more findings left out)");
            }
            context.out().println(v.intact() ? "Chain and data intact." : "TAMPERING FOUND: "
                    + (v.chain().findings().size() + v.dataFindings().size()) + " finding(s).");
            context.out().println(v.head() == null ? "Chain anchor: none (empty chain)"
                    : "Chain anchor: " + v.head().text());
            return v.intact() ? ExitCode.OK : ExitCode.CHECK_FAILED;
        }
    }

    /** @throws BadInputException naming the file and line of a malformed anchor */
    static List<ChainAnchor> readAnchors(Path file) throws BadInputException {
        List<String> lines;
        try {
            lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new BadInputException(file + ": cannot be read: " + e.getMessage());
        }
        List<ChainAnchor> anchors = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) {
            String line = lines.get(i).strip();
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            try {
                anchors.add(ChainAnchor.parse(line));
            } catch (IllegalArgumentException e) {
                throw new BadInputException(file + ", line " + (i + 1) + ": " + e.getMessage());
            }
        }
        return anchors;
    }
}
