package org.tracegas.ui.flows;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.audit.AuditQuery;
import org.tracegas.audit.AuditRecord;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.Report;
import org.tracegas.model.VersionKind;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.ui.Screens;
import org.tracegas.ui.internal.ReportHandler;
import org.tracegas.ui.jobs.CampaignReportJob;

/**
 * Analysis → Report… on a real H2 workspace holding a quantified morning and its stored QA checks: the report is
 * made in the background through the runner's report code, report.pdf and results.csv are written whole, and the
 * closing message gives the content hash a signature is given on, the audit anchor with the verification the
 * report was made under, the QA reading that failed and the caution about toxic gases.
 */
class DeskReportTest {

    @TempDir
    Path folder;

    private LabDesk desk;

    @BeforeEach
    void openWorkspace() throws Exception {
        // 6 % moisture (invented): the report states concentrations on dry gas
        desk = new LabDesk(folder, 800, 500, 60_000);
    }

    @AfterEach
    void close() {
        desk.close();
    }

    @Test
    void makesTheReportOfTheStoredResultsAndNamesItsHashAnchorQaAndCaution() throws Exception {
        LimeKilnLab lab = desk.lab;
        desk.quantifiedMorning();
        WorkspaceStore store = desk.access.store();
        ContentVersion method = store.versions().latest(VersionKind.METHOD).get(0);
        lab.recordQaChecks(method.getId());
        Path plan = lab.reportPlan();
        Path out = folder.resolve("report-QLW");

        List<String> reports = new ArrayList<>();
        CampaignReportJob job = ReportHandler.schedule(ReportHandler.request(store, lab.project, method, plan, out),
                desk.display, reports::add);
        Screens.waitFor(desk.display, () -> !reports.isEmpty(), 120_000);
        String message = reports.get(0);
        assertNotNull(job.outcome(), message);

        assertTrue(message.startsWith("Wrote report QLW-R-01 to " + out.resolve("report.pdf") + " with results.csv."
                + " Content hash (SHA-256) " + job.outcome().content().contentHash() + "."), message);
        // a SHA-256 digest is 256 bits, 64 hexadecimal digits (FIPS 180-4, section 1)
        assertTrue(job.outcome().content().contentHash().matches("[0-9a-f]{64}"), message);
        // the anchor is the newest record of the workspace's audit trail when the report was made, as the audit
        // trail itself lists it; the report's issue is recorded once it is written, after it
        List<AuditRecord> trail = store.audit().review(lab.reviewer, AuditQuery.all().build()).records();
        AuditRecord issue = trail.get(trail.size() - 1);
        AuditRecord newest = trail.get(trail.size() - 2);
        assertTrue(message.contains(" Audit anchor #" + newest.sequence() + " " + newest.hash() + " (Verified: audit"
                + " chain of " + newest.sequence() + " records"), message);
        assertTrue(message.contains(" Not signed yet."), message);
        assertTrue(message.contains(" 1 of 2 QA readings failed; the report says so on its first page."), message);
        assertTrue(message.contains(" Caution: Toxic gases"), message);

        // the PDF file header (ISO 32000-1:2008, section 7.5.2) and the CSV's header record (RFC 4180, section 2)
        byte[] pdf = Files.readAllBytes(out.resolve("report.pdf"));
        assertEquals("%PDF-", new String(pdf, 0, 5, StandardCharsets.US_ASCII));
        String csv = Files.readString(out.resolve("results.csv"), StandardCharsets.UTF_8);
        assertFalse(csv.isEmpty());
        // the issue is kept in the project: what a QA manager looks up years later
        List<Report> issued = store.reports().reports(lab.reviewer, lab.project.getId());
        assertEquals(1, issued.size());
        Report r = issued.get(0);
        assertEquals(List.of("report-issue", r.getId()), List.of(issue.objectType(), issue.objectId()));
        assertEquals(List.of("QLW-R-01", job.outcome().content().contentHash(), "report.pdf", method.getId()),
                List.of(r.getReportId(), r.getContentSha256(), r.getFileName(), r.getMethodVersionId()));
        // the page count is recorded with the issue (the writer's count is checked against the file in
        // PdfReportWriterTest)
        assertTrue(r.isSetPageCount() && r.getPageCount() >= 1, "page count " + r.getPageCount());
        try (var files = Files.list(out)) {
            assertEquals(List.of("report.pdf", "results.csv"), files.map(f -> f.getFileName().toString()).sorted()
                    .toList(), "each file whole, no part left beside them");
        }
    }
}
