package org.tracegas.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.tracegas.audit.SignatureMeaning;
import org.tracegas.qa.basis.LimitStatus;
import org.tracegas.qa.checks.CtsDriftCheck;
import org.tracegas.qa.checks.MethodDetectionLimit;
import org.tracegas.qa.checks.ZeroSpanCheck;
import org.tracegas.report.internal.Numbers;
import org.tracegas.report.internal.QaTables;

class PdfReportWriterTest {

    private static ReportContent content;
    private static byte[] pdf;

    @BeforeAll
    static void write() throws IOException {
        content = CampaignFixture.reviewed();
        pdf = new PdfReportWriter().write(content);
        // the tests read the bytes; -Dtracegas.test.keep-report=<file> keeps the pages to look at
        String keep = System.getProperty("tracegas.test.keep-report");
        if (keep != null) {
            Files.write(Path.of(keep), pdf);
        }
    }

    private static String text(PDDocument doc, int first, int last) throws IOException {
        PDFTextStripper s = new PDFTextStripper();
        s.setStartPage(first);
        s.setEndPage(last);
        return s.getText(doc);
    }

    /** The count the writer returns is the page count of the document read back (PDFBox's reader). */
    @Test
    void writingToAStreamReturnsThePageCount() throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        int pages = new PdfReportWriter().write(content, out);
        try (PDDocument doc = Loader.loadPDF(out.toByteArray())) {
            assertEquals(doc.getNumberOfPages(), pages);
        }
        assertTrue(pages > 1, pages + " pages");
    }

    @Test
    void firstPageSaysThatQaChecksFailed() throws IOException {
        long failed = content.qa().stream().filter(q -> !q.passed()).count();
        assertTrue(failed >= CampaignFixture.FAILED_NH3_ZEROS.size(), "the fixture has failed NH3 zeros");
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            String first = text(doc, 1, 1);
            assertTrue(first.contains("Quality assurance: " + failed + " of " + content.qa().size()
                    + " QA readings FAILED"), first);
        }
        QaLine zero = new QaLine("Zero CO", true, "0.01 ppm", "|x| <= 0.5 ppm", "zero", "common practice");
        assertEquals("Quality assurance: all 2 QA readings passed (section 4).", PdfReportWriter.qaVerdict(
                List.of(zero, zero)));
    }

    @Test
    void showsSectionsCautionsAndCampaign() throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            String t = text(doc, 1, doc.getNumberOfPages());
            for (String section : new String[] {"Campaign", "Cautions", "Methods and software",
                    "Quality assurance summary", "Results", "Time series", "Spectra: fit and residual",
                    "Review and approval"}) {
                assertTrue(t.contains(section), "section " + section);
            }
            assertTrue(t.contains("Toxic gases"));
            assertTrue(t.contains("must be reviewed by qualified staff"));
            assertTrue(t.contains("Compliance decisions rest with accredited practice"));
            assertTrue(t.contains("firing upset"), "caution of the content");
            assertTrue(t.contains(CampaignFixture.CLIENT) && t.contains(CampaignFixture.PLANT));
            assertTrue(t.contains("2026-03-02 to 2026-03-03"));
            assertTrue(t.contains(content.contentHash()));
            assertTrue(t.contains(content.methods().get(0).hash()));
            assertTrue(t.contains("Apache PDFBox"));
        }
    }

    /** Section 4 up to its control charts. */
    private static String qaSummary(String all) {
        return all.substring(all.indexOf("Quality assurance summary"), all.indexOf("Control charts of repeated QA"));
    }

    private static long linesStartingWith(String text, String prefix) {
        return text.lines().filter(l -> l.startsWith(prefix)).count();
    }

    @Test
    void showsQaOutcomesWithRulesAndSources() throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            String t = qaSummary(text(doc, 1, doc.getNumberOfPages()));
            assertTrue(t.contains("Spike recovery HCl"));
            assertTrue(t.contains("8.11.3"), "source of the CTS drift rule");
            // the NH3 span reads 48.1 on 49.7 ppm: -3.2 %, outside ±2 % (hand-computed)
            assertTrue(t.contains("-3.219 %"), "measured NH3 span drift");
            // 5 CTS paths, drift, spike, 12 times 6 zeros and a noise level, detection limit, background age,
            // 2 spans and the CO zero chart; the 2 NH3 zeros, the NH3 span and the chart fail (fixture design)
            assertTrue(t.contains("96 readings of 15 checks: 92 passed, 4 failed."), t);
            assertTrue(t.contains("Failed: Zero NH3 (2 of 12), Span NH3, Control chart: Zero CO."), t);
        }
    }

    @Test
    void qaSummaryHasOneRowPerCheckAndEachFailedReading() throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            String t = qaSummary(text(doc, 1, doc.getNumberOfPages()));
            assertEquals(1, linesStartingWith(t, "CTS path length pass 5, all pass worst "), t);
            for (String analyte : CampaignFixture.ZERO_ANALYTES) {
                long rows = linesStartingWith(t, "Zero " + analyte + " ");
                if (analyte.equals("NH3")) {
                    assertEquals(1, linesStartingWith(t, "Zero NH3 FAIL 12, 2 fail worst "), t);
                    for (int n : CampaignFixture.FAILED_NH3_ZEROS) {
                        assertEquals(1, linesStartingWith(t, "Zero NH3 FAIL no. " + n + " of 12 "), "failed " + n);
                    }
                    assertEquals(1 + CampaignFixture.FAILED_NH3_ZEROS.size(), rows);
                } else {
                    assertEquals(1, linesStartingWith(t, "Zero " + analyte + " pass 12, all pass worst "), analyte);
                    assertEquals(1, rows, "rows of Zero " + analyte);
                }
            }
            assertEquals(1, linesStartingWith(t, "Noise level pass 12, all pass worst "));
            assertEquals(1, linesStartingWith(t, "Span NH3 FAIL 1 -3.219 %"));
            // the rule text once per zero check name, not once per reading
            assertEquals(CampaignFixture.ZERO_ANALYTES.size(), t.split("Zero reading within", -1).length - 1);
            // the worst CO zero is the largest, 0.35 ppm against ±1 ppm (fixture readings)
            assertTrue(t.contains("Zero CO pass 12, all pass worst 0.35 ppm -1 .. 1 ppm Zero reading within ±1"), t);
        }
    }

    @Test
    void appendixAtTheEndListsEveryQaReading() throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            String all = text(doc, 1, doc.getNumberOfPages());
            int start = all.indexOf(QaTables.APPENDIX);
            assertTrue(start > all.indexOf("Review and approval"), "appendix after the last section");
            String appendix = all.substring(start);
            Map<String, Integer> seen = new HashMap<>();
            Map<String, Long> total = content.qa().stream().collect(Collectors.groupingBy(QaLine::check,
                    Collectors.counting()));
            for (QaLine q : content.qa()) {
                int n = seen.merge(q.check(), 1, Integer::sum);
                String row = q.check() + " " + n + " of " + total.get(q.check()) + " " + (q.passed() ? "pass" : "FAIL")
                        + " " + q.measured() + " " + q.limits();
                assertEquals(1, linesStartingWith(appendix, row), row);
            }
            assertEquals(96, content.qa().size());
        }
    }

    @Test
    void checksReadOnceAreNotRepeatedInAnAppendix() throws IOException {
        ReportContent.Builder b = ReportContent.builder(CampaignFixture.campaign());
        b.qa(QaLine.of(new CtsDriftCheck(5).evaluate(1.00, 0.88)));
        b.qa(QaLine.of(new ZeroSpanCheck(1.0, 2.0).zero("CO", 0.4)));
        try (PDDocument doc = Loader.loadPDF(new PdfReportWriter().write(b.build()))) {
            String t = text(doc, 1, doc.getNumberOfPages());
            // 0.06/0.94 = 6.383 % > 5 % fails, 0.4 ppm within ±1 ppm passes (hand-computed)
            assertTrue(t.contains("2 readings of 2 checks: 1 passed, 1 failed. Failed: CTS drift."), t);
            assertEquals(1, linesStartingWith(t, "CTS drift FAIL 1 6.383 % <= 5 %"), t);
            assertEquals(1, linesStartingWith(t, "Zero CO pass 1 0.4 ppm -1 .. 1 ppm"), t);
            assertFalse(t.contains("QA readings in full"));
            assertFalse(t.contains("Appendix A"));
        }
    }

    @Test
    void showsResultsWithUncertaintyAndExceedances() throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            String t = text(doc, 1, doc.getNumberOfPages());
            ResultRow exceeded = content.results().stream().filter(r -> r.status() == LimitStatus.EXCEEDED)
                    .findFirst().orElseThrow();
            String[] vu = Numbers.withUncertainty(exceeded.value(), exceeded.expandedUncertainty());
            assertTrue(t.contains(vu[0] + " " + vu[1]), "value and U of the exceedance " + vu[0] + " " + vu[1]);
            assertTrue(t.contains("EXCEEDED"));
            assertTrue(t.contains("2026-03-02 21:00"), "the upset half hour");
            assertTrue(t.contains("invalid: 60 % data"), "the half hour with the purge");
        }
    }

    @Test
    void methodDetectionLimitsHaveTheirTableAndValuesBelowThemAreMarked() throws IOException {
        // 7 readings, S = 0.216025 ppm (hand-computed), t(6, 0.99) = 3.143 (40 CFR Part 136 Appendix B table)
        MethodDetectionLimit mdl = MethodDetectionLimit.fromZeroReadings("HCl",
                new double[] { 0.1, -0.1, 0.2, -0.2, 0, 0.3, -0.3 }, new double[] { 0.05, 0.05, 0.05, 0.05, 0.05,
                        0.05, 0.05 });
        ReportContent c = CampaignFixture.unsigned().detectionLimit(mdl).result(new ResultRow("HCl", "30 min",
                CampaignFixture.START, 0.123456, 0.05, "mg/m³", List.of(ResultRow.BELOW_MDL + " 1.1 mg/m³"),
                java.util.OptionalDouble.empty(), LimitStatus.NO_LIMIT)).build();
        try (PDDocument doc = Loader.loadPDF(new PdfReportWriter().write(c))) {
            String t = text(doc, 1, doc.getNumberOfPages()).replaceAll("\\s+", " ");
            assertTrue(t.contains("Method detection limits"), "the table's heading");
            assertTrue(t.contains("HCl " + Numbers.significant(mdl.ppm()) + " 0.15 7 3.143"), t);
            assertTrue(t.contains(PdfReportWriter.BELOW_MDL_CONVENTION.substring(0, 50)), "the convention");
            String[] vu = Numbers.withUncertainty(0.123456, 0.05);
            assertTrue(t.contains("2026-03-02 00:00 < MDL " + vu[1]), "the value shown as < MDL, with its U: " + t);
            assertFalse(t.contains(vu[0] + " " + vu[1]), "the value itself is left to the export");
        }
        assertTrue(CsvExport.toCsv(c.results()).contains("0.123456"), "the export keeps the value");
    }

    @Test
    void theCellCorrectionIsStatedOnceForTheTable() {
        String same = "x1.0031 (T header, p header, path nominal); F 1.2";
        List<ResultRow> rows = content.results().stream().map(r -> new ResultRow(r.compound(), r.period(),
                r.periodStart(), r.value(), r.expandedUncertainty(), r.unit(), r.flags(), r.limit(), r.status(),
                same)).toList();
        assertEquals("Cell correction of every row: " + same + ".", PdfReportWriter.cellCorrection(rows)
                .orElseThrow());
        List<ResultRow> varied = new java.util.ArrayList<>(rows);
        ResultRow r = rows.get(0);
        varied.set(0, new ResultRow(r.compound(), r.period(), r.periodStart(), r.value(), r.expandedUncertainty(),
                r.unit(), r.flags(), r.limit(), r.status(), "x1.0102 (T header, p header, path "
                        + "nominal); F 1.2"));
        assertTrue(PdfReportWriter.cellCorrection(varied).orElseThrow().contains("varies per row (2 different): see "
                + "the export"), PdfReportWriter.cellCorrection(varied).orElseThrow());
        assertTrue(PdfReportWriter.cellCorrection(content.results()).isEmpty(), "no row states one");
        ReportContent c = CampaignFixture.unsigned().build();
        ReportContent.Builder b = ReportContent.builder(c.campaign());
        rows.forEach(b::result);
        try (PDDocument doc = Loader.loadPDF(new PdfReportWriter().write(b.build()))) {
            String t = text(doc, 1, doc.getNumberOfPages()).replaceAll("\\s+", " ");
            assertEquals(1, t.split(java.util.regex.Pattern.quote("x1.0031"), -1).length - 1, "stated once: " + t);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    @Test
    void signaturesAndMissingApproval() throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            String t = text(doc, 1, doc.getNumberOfPages());
            assertTrue(t.contains("Reviewed by Dr. Imogen Hartle"));
            assertTrue(t.contains("Meaning Review: the content was checked by qualified staff"), t);
            assertTrue(t.contains("2026-03-10 09:12 UTC"));
            assertTrue(t.contains("Applies to this content yes"));
            assertTrue(t.contains("Not yet approved"));
        }
    }

    @Test
    void signatureOverOtherContentIsMarked() throws IOException {
        ReportContent c = CampaignFixture.unsigned().build().withSignature(CampaignFixture.signature("A. Checker",
                CampaignFixture.START, SignatureMeaning.APPROVED, CampaignFixture.sha256("an earlier draft")));
        try (PDDocument doc = Loader.loadPDF(new PdfReportWriter().write(c))) {
            String t = text(doc, 1, doc.getNumberOfPages());
            assertTrue(t.contains("NO: signed an earlier version"), t);
            assertTrue(t.contains("Approved by A. Checker"), t);
            assertTrue(t.contains("Meaning Approval: the report is released"), t);
            assertTrue(t.contains("Not yet approved. This report has no approval signature on its content"), t);
            assertTrue(t.contains("Not yet reviewed"));
        }
    }

    @Test
    void showsControlChartBudgetRowsAndTheAuditAnchor() throws IOException {
        String hash = CampaignFixture.sha256("audit record 4711");
        ReportContent anchored = content.withAuditAnchor(new AuditAnchor(4711, hash));
        assertEquals(content.contentHash(), anchored.contentHash(), "the anchor is not content");
        try (PDDocument doc = Loader.loadPDF(new PdfReportWriter().write(anchored))) {
            String t = text(doc, 1, doc.getNumberOfPages());
            assertTrue(t.contains("Control charts of repeated QA readings"));
            assertTrue(t.contains("Control chart: Zero CO"));
            assertTrue(t.contains("Uncertainty budget: CO"));
            assertTrue(t.contains("H2O for wet-to-dry"));
            assertTrue(t.contains("O2 for reference-O2 correction"));
            assertTrue(t.contains("Last audit record 4711") && t.contains(hash), "anchor printed");
        }
    }

    @Test
    void longTablesContinueWithTheirHeader() throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            int pagesWithResultHeader = 0;
            for (int p = 1; p <= doc.getNumberOfPages(); p++) {
                if (text(doc, p, p).contains("Limit status")) {
                    pagesWithResultHeader++;
                }
            }
            // 96 CO + 96 HCl half hours and 8 daily rows do not fit on one page
            assertTrue(pagesWithResultHeader >= 4, "result table pages " + pagesWithResultHeader);
        }
    }

    @Test
    void sameContentGivesTheSameBytes() {
        byte[] again = new PdfReportWriter().write(CampaignFixture.reviewed());
        assertArrayEquals(pdf, again);
        ReportContent changed = CampaignFixture.unsigned().caution("Second line of the plant log.").build();
        assertFalse(Arrays.equals(pdf, new PdfReportWriter().write(changed)));
    }

    @Test
    void documentDatesComeFromTheContent() throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            assertEquals(content.campaign().issued().toEpochMilli(),
                    doc.getDocumentInformation().getCreationDate().getTimeInMillis());
            assertEquals("Emission measurement report PMR-2026-014", doc.getDocumentInformation().getTitle());
        }
    }
}
