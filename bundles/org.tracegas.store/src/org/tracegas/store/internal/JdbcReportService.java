package org.tracegas.store.internal;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;

import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditEntry;
import org.tracegas.audit.AuditValues;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.Report;
import org.tracegas.model.VersionKind;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.store.ReportService;
import org.tracegas.store.Session;

final class JdbcReportService implements ReportService {

    private final Transactions transactions;

    JdbcReportService(Transactions transactions) {
        this.transactions = transactions;
    }

    @Override
    public Report record(Session actor, String projectId, Report report) {
        if (report == null) {
            throw new IllegalArgumentException("report must not be null");
        }
        requireText("reportId", report.getReportId(), 200);
        requireText("title", report.getTitle(), 1000);
        requireText("fileName", report.getFileName(), 1000);
        requireText("methodVersionId", report.getMethodVersionId(), 36);
        requireText("libraryVersionId", report.getLibraryVersionId(), 36);
        if (report.getContentSha256() == null || !report.getContentSha256().matches("[0-9a-f]{64}")) {
            throw new IllegalArgumentException("contentSha256 must be 64 lower-case hex digits (SHA-256), was "
                    + report.getContentSha256());
        }
        if (report.isSetPageCount() && report.getPageCount() < 1) {
            throw new IllegalArgumentException("pageCount must be at least 1 when known, was " + report.getPageCount());
        }
        return transactions.run("recording report " + report.getReportId() + " of project " + projectId, tx -> {
            // whoever may read the project's data may write its report out, a reviewer to sign it too: each
            // issue is recorded, by whomever
            Guard.requireProject(tx, actor, projectId, AccessLevel.READ);
            requireKind(tx, "methodVersionId", report.getMethodVersionId(), VersionKind.METHOD);
            requireKind(tx, "libraryVersionId", report.getLibraryVersionId(), VersionKind.LIBRARY);
            Report r = copy(report);
            r.setId(UUID.randomUUID().toString());
            r.setIssuedBy(actor.userId());
            r.setIssued(Instant.now().truncatedTo(ChronoUnit.MICROS));
            tx.update("INSERT INTO report (id, project_id, report_id, title, issued_at, issued_by, content_sha256,"
                    + " file_name, page_count, method_version_id, library_version_id)"
                    + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)", r.getId(), projectId, r.getReportId(), r.getTitle(),
                    r.getIssued(), r.getIssuedBy(), r.getContentSha256(), r.getFileName(),
                    r.isSetPageCount() ? r.getPageCount() : null, r.getMethodVersionId(), r.getLibraryVersionId());
            tx.wrote(DataKind.REPORT, r.getId());
            // not "report": the signatures given on a report id are audit records of that type
            tx.audit(AuditEntry.builder(actor.userId(), AuditAction.CREATE, "report-issue", r.getId())
                    .newValue(values(projectId, r)).build());
            return r;
        });
    }

    @Override
    public List<Report> reports(Session actor, String projectId) {
        return transactions.run("reading the reports of project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.READ);
            return tx.queryList("SELECT * FROM report WHERE project_id = ? ORDER BY issued_at, id",
                    JdbcReportService::map, projectId);
        });
    }

    private static void requireText(String field, String value, int maxLength) {
        JdbcUserService.requireText(field + " of a report", value);
        if (value.length() > maxLength) {
            throw new IllegalArgumentException(field + " of a report must not be longer than " + maxLength
                    + " characters, was " + value.length());
        }
    }

    private static void requireKind(Tx tx, String field, String versionId, VersionKind kind) throws SQLException {
        if (JdbcVersionService.load(tx, versionId).getKind() != kind) {
            throw new IllegalArgumentException(field + " " + versionId + " is not a "
                    + kind.getName().toLowerCase(java.util.Locale.ROOT) + " version");
        }
    }

    /** A new report with the given one's values, which the store completes and keeps; the given one stays. */
    private static Report copy(Report given) {
        Report r = WorkspaceFactory.eINSTANCE.createReport();
        r.setReportId(given.getReportId());
        r.setTitle(given.getTitle());
        r.setContentSha256(given.getContentSha256());
        r.setFileName(given.getFileName());
        if (given.isSetPageCount()) {
            r.setPageCount(given.getPageCount());
        }
        r.setMethodVersionId(given.getMethodVersionId());
        r.setLibraryVersionId(given.getLibraryVersionId());
        return r;
    }

    private static Report map(ResultSet rs) throws SQLException {
        Report r = WorkspaceFactory.eINSTANCE.createReport();
        r.setId(rs.getString("id"));
        r.setReportId(rs.getString("report_id"));
        r.setTitle(rs.getString("title"));
        r.setIssued(Tx.instant(rs, "issued_at"));
        r.setIssuedBy(rs.getString("issued_by"));
        r.setContentSha256(rs.getString("content_sha256").trim());
        r.setFileName(rs.getString("file_name"));
        int pages = rs.getInt("page_count");
        if (!rs.wasNull()) {
            r.setPageCount(pages);
        }
        r.setMethodVersionId(rs.getString("method_version_id"));
        r.setLibraryVersionId(rs.getString("library_version_id"));
        return r;
    }

    private static String values(String projectId, Report r) {
        Map<String, Object> fields = new LinkedHashMap<>();
        fields.put("project", projectId);
        fields.put("reportId", r.getReportId());
        fields.put("title", r.getTitle());
        fields.put("issued", r.getIssued());
        fields.put("contentSha256", r.getContentSha256());
        fields.put("fileName", r.getFileName());
        fields.put("pageCount", r.isSetPageCount() ? r.getPageCount() : null);
        fields.put("methodVersion", r.getMethodVersionId());
        fields.put("libraryVersion", r.getLibraryVersionId());
        return AuditValues.canonical(fields);
    }
}
