package org.tracegas.store.internal;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.sql.Connection;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditEntry;
import org.tracegas.audit.AuditQuery;
import org.tracegas.audit.AuditRecord;
import org.tracegas.audit.AuditReview;
import org.tracegas.audit.AuditValues;
import org.tracegas.audit.AuditVerifier;
import org.tracegas.audit.ChainAnchor;
import org.tracegas.audit.VerificationReport;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.Role;
import org.tracegas.store.AuditService;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceVerification;

final class JdbcAuditService implements AuditService {

    /** Who reviews the trail: those who check others' work, and whoever keeps the workspace. */
    private static final Role[] READERS = {Role.REVIEWER, Role.QUALITY_MANAGER, Role.ADMINISTRATOR};

    private final Transactions transactions;

    JdbcAuditService(Transactions transactions) {
        this.transactions = transactions;
    }

    @Override
    public AuditReview.Result review(Session reader, AuditQuery query) {
        requireQuery(query);
        return snapshot("reading the audit trail", tx -> {
            Guard.requireRole(tx, reader, "read the audit trail", READERS);
            return AuditReview.review(tx.connection(), query);
        });
    }

    @Override
    public long exportCsv(Session reader, AuditQuery query, Writer out) throws IOException {
        requireQuery(query);
        if (out == null) {
            throw new IllegalArgumentException("out must not be null");
        }
        try {
            return snapshot("exporting the audit trail", tx -> {
                Guard.requireRole(tx, reader, "export the audit trail", READERS);
                try {
                    return AuditReview.exportCsv(tx.connection(), query, out);
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            });
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
    }

    @Override
    public boolean recordSoftware(Session actor, String installation, String software, String reason) {
        JdbcUserService.requireText("installation", installation);
        JdbcUserService.requireText("software", software);
        JdbcUserService.requireText("reason", reason);
        return transactions.run("recording the software of " + installation, tx -> {
            Guard.roles(tx, actor);
            List<AuditRecord> earlier = new ArrayList<>();
            AuditReview.forEach(tx.connection(), AuditQuery.all().object(SOFTWARE_OBJECT, installation).build(),
                    earlier::add);
            String previous = earlier.isEmpty() ? null : earlier.get(earlier.size() - 1).newValue();
            if (software.equals(previous)) {
                return false;
            }
            tx.audit(AuditEntry.builder(actor.userId(), previous == null ? AuditAction.CREATE : AuditAction.CHANGE,
                    SOFTWARE_OBJECT, installation).version(earlier.size()).oldValue(previous).newValue(software)
                    .reason(reason).build());
            return true;
        });
    }

    @Override
    public void recordExport(Session actor, String projectId, String fileName, long results, String sha256) {
        JdbcUserService.requireText("fileName", fileName);
        if (results < 0) {
            throw new IllegalArgumentException("results must not be negative, was " + results);
        }
        if (sha256 == null || !sha256.matches("[0-9a-f]{64}")) {
            throw new IllegalArgumentException("sha256 must be 64 lower-case hex digits, was " + sha256);
        }
        transactions.run("recording an export of the results of project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.READ);
            Map<String, Object> fields = new LinkedHashMap<>();
            fields.put("file", fileName);
            fields.put("results", results);
            fields.put("sha256", sha256);
            tx.audit(AuditEntry.builder(actor.userId(), AuditAction.EXPORT, EXPORT_OBJECT, projectId)
                    .newValue(AuditValues.canonical(fields)).build());
            return null;
        });
    }

    @Override
    public VerificationReport verify() {
        return snapshot("verifying the audit trail", tx -> AuditVerifier.verify(tx.connection()));
    }

    @Override
    public WorkspaceVerification verifyWorkspace(List<ChainAnchor> anchors) {
        if (anchors == null) {
            throw new IllegalArgumentException("anchors must not be null: List.of() verifies without anchors");
        }
        return snapshot("verifying the audit trail and the data it vouches for", 
                tx -> DataVerifier.verify(tx.connection(), anchors));
    }

    /**
     * Runs the work in one repeatable-read transaction: the records read and the chain verified are of the same
     * moment, and a PostgreSQL cursor streams (it fetches by fetch size only outside auto-commit).
     */
    private <T> T snapshot(String operation, Transactions.Work<T> work) {
        return transactions.run(operation, tx -> {
            // before the transaction's first statement, as PostgreSQL requires
            tx.connection().setTransactionIsolation(Connection.TRANSACTION_REPEATABLE_READ);
            return work.run(tx);
        });
    }

    private static void requireQuery(AuditQuery query) {
        if (query == null) {
            throw new IllegalArgumentException("query must not be null: AuditQuery.all().build() reads every record");
        }
    }
}
