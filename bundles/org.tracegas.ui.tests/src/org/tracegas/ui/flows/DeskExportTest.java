package org.tracegas.ui.flows;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;

import org.eclipse.swt.SWT;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditQuery;
import org.tracegas.audit.AuditRecord;
import org.tracegas.store.AuditService;
import org.tracegas.ui.Screens;
import org.tracegas.ui.internal.ExportResultsHandler;
import org.tracegas.ui.parts.AuditTrailPanel;

/**
 * File → Export results on a real H2 workspace: the stored results written as CSV through the runner's export
 * code, and the export recorded in the audit trail with the SHA-256 of the bytes written, which the reviewer
 * sees in the audit trail view.
 */
class DeskExportTest {

    @TempDir
    Path folder;

    private LabDesk desk;

    @BeforeEach
    void openWorkspace() throws Exception {
        desk = new LabDesk(folder, 1100, 500);
    }

    @AfterEach
    void close() {
        desk.close();
    }

    @Test
    void writesTheStoredResultsAsCsvAndTheAuditTrailRecordsTheExport() throws Exception {
        LimeKilnLab lab = desk.lab;
        List<String> reports = new ArrayList<>(desk.quantifiedMorning());
        assertTrue(reports.get(1).startsWith("Quantified 4 measurement(s)"), reports.get(1));

        Path out = folder.resolve("qlw-results.csv");
        ExportResultsHandler.schedule(lab.project, out, desk.display, reports::add);
        Screens.waitFor(desk.display, () -> reports.size() == 3, 60_000);
        String sha = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(out)));
        assertTrue(reports.get(2).startsWith("Wrote 4 result(s) of project " + LimeKilnLab.CODE + " to " + out
                + " (sha256 " + sha + ", recorded in the audit trail)"), reports.get(2));

        // RFC 4180 section 2: records end in CRLF, the first is the header
        String text = Files.readString(out, StandardCharsets.UTF_8);
        List<String> lines = List.of(text.split("\r\n"));
        assertEquals(5, lines.size(), text);
        List<String> header = List.of(lines.get(0).split(","));
        assertTrue(lines.get(0).startsWith("measurement,measured_utc,source_file,compound,value,standard_uncertainty"),
                lines.get(0));
        int value = header.indexOf("value");
        int u = header.indexOf("standard_uncertainty");
        int flags = header.indexOf("flags");
        int file = header.indexOf("source_file");
        for (String line : lines.subList(1, lines.size())) {
            String[] f = line.split(",", -1);
            if (f[file].equals("s03.jdx")) {
                // made with 150 ppm (LimeKilnLab, ideal gas law), beyond the reference's amount and flagged so
                assertTrue(Math.abs(Double.parseDouble(f[value]) - 150) <= 3 * Double.parseDouble(f[u]) + 0.15, line);
                assertTrue(f[flags].contains("ABOVE_CALIBRATED_RANGE"), line);
            }
        }

        List<AuditRecord> exports = desk.access.store().audit().review(lab.reviewer, AuditQuery.all()
                .objectType(AuditService.EXPORT_OBJECT).build()).records();
        assertEquals(1, exports.size());
        AuditRecord r = exports.get(0);
        assertEquals(AuditAction.EXPORT, r.action());
        assertEquals(lab.analyst.userId(), r.userId());
        assertEquals(lab.project.getId(), r.objectId());
        assertTrue(r.newValue().contains(sha) && r.newValue().contains("qlw-results.csv"), r.newValue());

        AuditTrailPanel panel = new AuditTrailPanel(desk.shell, SWT.NONE);
        desk.shell.open();
        panel.setWorkspace(desk.access, lab.reviewer);
        Screens.waitFor(desk.display, () -> panel.shown() != null, 30_000);
        assertTrue(panel.shown().chain().intact());
        assertTrue(panel.shown().records().stream().anyMatch(x -> x.action() == AuditAction.EXPORT));
        panel.table().setTopIndex(panel.table().getItemCount() - 1);
        Screens.save(desk.shell, "export-audit-trail");
    }
}
