package org.tracegas.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.tracegas.report.internal.Numbers;

class PdfReportWriterTest {

    private static ReportContent content;
    private static byte[] pdf;

    @BeforeAll
    static void write() throws IOException {
        content = CampaignFixture.reviewed();
        pdf = new PdfReportWriter().write(content);
        // kept for looking at the pages; the tests read the bytes
        Files.write(Path.of(System.getProperty("java.io.tmpdir"), "tracegas-report-test.pdf"), pdf);
    }

    private static String text(PDDocument doc, int first, int last) throws IOException {
        PDFTextStripper s = new PDFTextStripper();
        s.setStartPage(first);
        s.setEndPage(last);
        return s.getText(doc);
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

    @Test
    void showsQaOutcomesWithRulesAndSources() throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            String t = text(doc, 1, doc.getNumberOfPages());
            assertTrue(t.contains("CTS path length"));
            assertTrue(t.contains("Spike recovery HCl"));
            assertTrue(t.contains("8.11.3"), "source of the CTS drift rule");
            // the NH3 span reads 48.1 on 49.7 ppm: -3.2 %, outside ±2 %
            assertTrue(t.contains("FAIL"));
            assertTrue(t.contains("-3.219 %"), "measured NH3 span drift");
            // and the zero chart: the CO zero drifts upwards through the campaign and signals
            long failed = content.qa().stream().filter(q -> !q.passed()).count();
            assertEquals(2, failed);
            assertTrue(t.contains("10 checks, 8 passed, 2 failed."));
        }
    }

    @Test
    void showsResultsWithUncertaintyAndExceedances() throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            String t = text(doc, 1, doc.getNumberOfPages());
            ResultRow exceeded = content.results().stream().filter(ResultRow::exceeded).findFirst().orElseThrow();
            String[] vu = Numbers.withUncertainty(exceeded.value(), exceeded.expandedUncertainty());
            assertTrue(t.contains(vu[0] + " " + vu[1]), "value and U of the exceedance " + vu[0] + " " + vu[1]);
            assertTrue(t.contains("EXCEEDED"));
            assertTrue(t.contains("2026-03-02 21:00"), "the upset half hour");
            assertTrue(t.contains("invalid: 60 % data"), "the half hour with the purge");
        }
    }

    @Test
    void signaturesAndMissingApproval() throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            String t = text(doc, doc.getNumberOfPages() - 1, doc.getNumberOfPages());
            assertTrue(t.contains("Reviewed by Dr. Imogen Hartle"));
            assertTrue(t.contains("2026-03-10 09:12 UTC"));
            assertTrue(t.contains("Applies to this content yes"));
            assertTrue(t.contains("Not yet approved"));
        }
    }

    @Test
    void signatureOverOtherContentIsMarked() throws IOException {
        ReportContent c = CampaignFixture.unsigned().build().withSignature(new Signature("A. Checker",
                CampaignFixture.START, SignatureMeaning.APPROVAL, CampaignFixture.sha256("an earlier draft")));
        try (PDDocument doc = Loader.loadPDF(new PdfReportWriter().write(c))) {
            String t = text(doc, doc.getNumberOfPages() - 1, doc.getNumberOfPages());
            assertTrue(t.contains("NO: signed an earlier version"), t);
            assertTrue(t.contains("Not yet approved"));
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
