package org.tracegas.report;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Calendar;
import java.util.GregorianCalendar;
import java.util.List;
import java.util.LinkedHashSet;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.TimeZone;

import org.apache.pdfbox.cos.COSArray;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.cos.COSString;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.tracegas.audit.Signature;
import org.tracegas.audit.SignatureMeaning;
import org.tracegas.qa.basis.LimitStatus;
import org.tracegas.qa.checks.MethodDetectionLimit;
import org.tracegas.qa.uncertainty.BudgetRow;
import org.tracegas.report.internal.Check;
import org.tracegas.report.internal.Numbers;
import org.tracegas.report.internal.PageWriter;
import org.tracegas.report.internal.PlotRenderer;
import org.tracegas.report.internal.QaTables;
import org.tracegas.report.internal.TableRenderer;
import org.tracegas.report.internal.TableRenderer.Column;

/**
 * Writes a campaign report as PDF. The file depends on the content alone: document dates come from the
 * campaign's issue time and the file identifier from the content hash, so the same content gives the same
 * bytes.
 */
public final class PdfReportWriter {

    /** Cautions every report carries. */
    public static final List<String> STANDARD_CAUTIONS = List.of(
            "Toxic gases: flue gas and the calibration, spike and tracer gases (for example CO, HCl, NH3, SO2, "
                    + "HF) are toxic or asphyxiant. Sampling, calibration and spiking follow the site's safety rules, "
                    + "with gas detection and venting of the instrument exhaust to a safe place.",
            "The results in this report must be reviewed by qualified staff before they are used.",
            "Compliance decisions rest with accredited practice and the local regulations that apply to the plant; "
                    + "this report on its own does not decide compliance.");

    private static final DateTimeFormatter TIME = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'", Locale.ROOT)
            .withZone(ZoneOffset.UTC);
    private static final DateTimeFormatter TABLE_TIME = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm", Locale.ROOT)
            .withZone(ZoneOffset.UTC);
    private static final float PLOT_HEIGHT = 230;
    private static final float RESIDUAL_HEIGHT = 130;
    private static final float CHART_HEIGHT = 170;
    private static final Set<String> ALARMS = Set.of("FAIL", "EXCEEDED");
    /** How a result below its compound's method detection limit is shown. */
    public static final String BELOW_MDL_CONVENTION = "A period average below its compound's MDL, converted to the "
            + "reporting basis with the mean conversion factor of the period's minutes, is shown as \""
            + ResultRow.BELOW_MDL + "\" in the results table and flagged with that MDL; the value itself is kept in the CSV export and "
            + "enters the comparison with the limit as measured (common practice, no source).";

    /** The report as PDF bytes. */
    public byte[] write(ReportContent content) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            write(content, out);
        } catch (IOException e) {
            throw new IllegalStateException("writing a report to memory failed", e);
        }
        return out.toByteArray();
    }

    /**
     * Writes the report as PDF to the stream.
     *
     * @return the number of pages written, for the record of the report's issue
     */
    public int write(ReportContent content, OutputStream out) throws IOException {
        Check.notNull("content", content);
        Check.notNull("out", out);
        try (PDDocument doc = new PDDocument()) {
            describe(doc, content);
            try (PageWriter pw = new PageWriter(doc)) {
                titleBlock(pw, content);
                campaign(pw, content);
                cautions(pw, content);
                methods(pw, content);
                qa(pw, content);
                results(pw, content);
                timeSeries(pw, content);
                spectra(pw, content);
                signatures(pw, content);
                qaAppendix(pw, content);
                pw.close();
                pw.footers("Report " + content.campaign().reportId() + "  |  " + content.campaign().plant()
                        + "  |  content hash " + content.contentHash().substring(0, 16));
            }
            doc.save(out);
            return doc.getNumberOfPages();
        }
    }

    private static void describe(PDDocument doc, ReportContent content) {
        Campaign c = content.campaign();
        PDDocumentInformation info = doc.getDocumentInformation();
        info.setTitle("Emission measurement report " + c.reportId());
        info.setSubject(c.client() + ", " + c.plant() + ", " + c.source());
        info.setCreator("Tracegas Workbench");
        info.setProducer("Tracegas Workbench");
        Calendar issued = new GregorianCalendar(TimeZone.getTimeZone("UTC"), Locale.ROOT);
        issued.setTimeInMillis(c.issued().toEpochMilli());
        info.setCreationDate(issued);
        info.setModificationDate(issued);
        // a fixed file identifier; otherwise the writer derives one from the current time
        byte[] id = content.contentHash().substring(0, 32).getBytes(StandardCharsets.US_ASCII);
        COSArray ids = new COSArray();
        ids.add(new COSString(id));
        ids.add(new COSString(id));
        doc.getDocument().getTrailer().setItem(COSName.ID, ids);
    }

    private static void titleBlock(PageWriter pw, ReportContent content) {
        Campaign c = content.campaign();
        pw.ensure(96);
        pw.down(20);
        pw.text(pw.bold(), 18, pw.left(), pw.y(), "Emission measurement report");
        pw.down(18);
        pw.text(pw.regular(), 11, pw.left(), pw.y(),
                "Extractive FTIR measurements at " + c.plant() + ", " + c.source());
        pw.down(16);
        // the QA verdict stands on the first page, so that a failed check is not first seen in section 4
        pw.text(pw.bold(), 10.5f, pw.left(), pw.y(), qaVerdict(content.qa()));
        pw.down(6);
        pw.line(pw.left(), pw.y(), pw.left() + pw.width(), pw.y(), 1.2f, 0f);
        pw.down(4);
    }

    /** One line: whether every QA reading passed, or how many failed. */
    static String qaVerdict(List<QaLine> qa) {
        long failed = qa.stream().filter(q -> !q.passed()).count();
        if (qa.isEmpty()) {
            return "Quality assurance: no QA checks are recorded; see section 4.";
        }
        return failed == 0 ? "Quality assurance: all " + qa.size() + " QA readings passed (section 4)."
                : "Quality assurance: " + failed + " of " + qa.size() + " QA readings FAILED; see section 4 "
                        + "before using the results.";
    }

    private static void campaign(PageWriter pw, ReportContent content) {
        Campaign c = content.campaign();
        pw.heading("1  Campaign", 120);
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"Report", c.reportId()});
        rows.add(new String[] {"Client", c.client()});
        rows.add(new String[] {"Plant", c.plant()});
        rows.add(new String[] {"Emission source", c.source()});
        for (String instrument : content.instruments()) {
            rows.add(new String[] {"Instrument", instrument});
        }
        rows.add(new String[] {"Measurement dates", c.firstDay() + " to " + c.lastDay()});
        rows.add(new String[] {"Reporting basis", c.reportingBasis()});
        rows.add(new String[] {"Issued", TIME.format(c.issued())});
        rows.add(new String[] {"Content hash (SHA-256)", content.contentHash()});
        pw.keyValues(rows, 130);
    }

    private static void cautions(PageWriter pw, ReportContent content) {
        pw.heading("2  Cautions", 60);
        List<String> all = new ArrayList<>(STANDARD_CAUTIONS);
        all.addAll(content.cautions());
        for (String caution : all) {
            pw.paragraph("-  " + caution, 9.5f);
        }
    }

    private static void methods(PageWriter pw, ReportContent content) {
        pw.heading("3  Methods and software", 60);
        List<String[]> methodRows = new ArrayList<>();
        for (MethodVersion m : content.methods()) {
            methodRows.add(new String[] {m.name(), m.version(), m.hash()});
        }
        new TableRenderer(List.of(new Column("Analysis method", 150, false), new Column("Version", 42, false),
                new Column("Method hash (SHA-256)", 303, false)), 8, ALARMS).draw(pw, methodRows);
        List<String[]> libRows = new ArrayList<>();
        for (LibraryVersion l : content.libraries()) {
            libRows.add(new String[] {l.name(), l.version()});
        }
        new TableRenderer(List.of(new Column("Library or reference data", 300, false),
                new Column("Version", 195, false)), 8, ALARMS).draw(pw, libRows);
    }

    private static void qa(PageWriter pw, ReportContent content) throws IOException {
        pw.heading("4  Quality assurance summary", 90);
        QaTables tables = new QaTables(content.qa());
        pw.paragraph(tables.overview(), 9.5f);
        tables.summaryTable(ALARMS).draw(pw, tables.summaryRows());
        detectionLimits(pw, content);
        if (!content.controlCharts().isEmpty()) {
            pw.subheading("Control charts of repeated QA readings");
            pw.paragraph("Readings in order, centre line and warning (2 sigma) and action (3 sigma) limits; marked "
                    + "readings signal under the rule of the chart's check above.", 9f);
            for (Plot p : content.controlCharts()) {
                plot(pw, p, CHART_HEIGHT);
            }
        }
    }

    /** The method detection limits and minimum analyte uncertainties, one row per compound. */
    private static void detectionLimits(PageWriter pw, ReportContent content) {
        if (content.detectionLimits().isEmpty()) {
            return;
        }
        pw.ensure(60 + 12 * content.detectionLimits().size());
        pw.subheading("Method detection limits");
        pw.paragraph("From the replicate zero-gas readings of the campaign, each quantified as a sample is: MDL = "
                + "t(n-1, 0.99) x S (40 CFR Part 136 Appendix B), MAU the minimum analyte uncertainty (EPA Method 320 "
                + "section 8.1.6), both in ppm corrected to the cell's temperature, pressure and path as every result "
                + "is. " + BELOW_MDL_CONVENTION, 9f);
        List<String[]> rows = new ArrayList<>();
        for (MethodDetectionLimit l : content.detectionLimits()) {
            rows.add(new String[] {l.analyte(), Numbers.significant(l.ppm()),
                    Numbers.significant(l.minimumAnalyteUncertainty()), Integer.toString(l.readings()),
                    String.format(Locale.ROOT, "%.3f", l.t()), Numbers.significant(l.standardDeviation()), "ppm"});
        }
        new TableRenderer(List.of(new Column("Compound", 80, false), new Column("MDL", 65, true),
                new Column("MAU", 65, true), new Column("n", 40, true), new Column("t(n-1, 0.99)", 70, true),
                new Column("S", 65, true), new Column("Unit", 50, false)), 7.5f, ALARMS).draw(pw, rows);
    }

    /** Every QA reading, when the summary in section 4 shows repeated checks as one row. */
    private static void qaAppendix(PageWriter pw, ReportContent content) {
        QaTables tables = new QaTables(content.qa());
        if (!tables.needsAppendix()) {
            return;
        }
        // an appendix starts on a page of its own
        if (!pw.atPageTop()) {
            pw.newPage();
        }
        pw.heading(QaTables.APPENDIX, 60);
        pw.paragraph("Each QA reading of section 4, grouped by check and numbered in the order taken; the rules and "
                + "their sources are given once per check in section 4.", 9f);
        tables.appendixTable(ALARMS).draw(pw, tables.appendixRows());
    }

    private static void results(PageWriter pw, ReportContent content) {
        pw.heading("5  Results", 110);
        pw.paragraph("Concentrations on the reporting basis (" + content.campaign().reportingBasis() + "). U is the "
                + "expanded uncertainty with coverage factor k = 2 (JCGM 100:2008); values are rounded to the "
                + "decimal place of U given with two significant digits.", 9f);
        for (String rule : content.averagingRules()) {
            pw.paragraph(rule, 9f);
        }
        cellCorrection(content.results()).ifPresent(text -> pw.paragraph(text, 9f));
        List<String[]> rows = new ArrayList<>();
        for (ResultRow r : content.results()) {
            String[] vu = Numbers.withUncertainty(r.value(), r.expandedUncertainty());
            if (r.belowMethodDetectionLimit()) {
                vu[0] = ResultRow.BELOW_MDL;
            }
            String limit = r.limit().isPresent() ? Numbers.significant(r.limit().getAsDouble()) : "-";
            String status = r.status() == LimitStatus.EXCEEDED ? "EXCEEDED" : r.status().label();
            rows.add(new String[] {r.compound(), r.period(), TABLE_TIME.format(r.periodStart()), vu[0], vu[1], r.unit(),
                    String.join("; ", r.flags()), limit, status});
        }
        new TableRenderer(List.of(new Column("Compound", 52, false), new Column("Period", 38, false),
                new Column("Period start (UTC)", 78, false), new Column("Value", 48, true),
                new Column("U (k=2)", 42, true),
                new Column("Unit", 36, false), new Column("Flags", 100, false), new Column("Limit", 40, true),
                new Column("Limit status", 61, false)), 7.5f, ALARMS).draw(pw, rows);
        for (UncertaintyTable t : content.budgets()) {
            budget(pw, t);
        }
    }

    /**
     * The cell correction of the results table, stated once: the one every row states, or that it varies and
     * each row's is in the export; empty when no row states one.
     */
    static Optional<String> cellCorrection(List<ResultRow> results) {
        Set<String> stated = new LinkedHashSet<>();
        results.stream().map(ResultRow::cellCorrection).filter(c -> !c.isEmpty()).forEach(stated::add);
        if (stated.isEmpty()) {
            return Optional.empty();
        }
        boolean everyRow = results.stream().noneMatch(r -> r.cellCorrection().isEmpty());
        return Optional.of(stated.size() == 1 && everyRow ? "Cell correction of every row: " + stated.iterator().next()
                + "." : "Cell correction: varies per row (" + stated.size() + " different" + (everyRow ? ""
                        : ", some rows none") + "): see the export, column cell_correction.");
    }

    /** One GUM budget: inputs with c_i and contributions, then u_c and U. */
    private static void budget(PageWriter pw, UncertaintyTable t) {
        pw.ensure(60 + 12 * t.rows().size());
        pw.subheading("Uncertainty budget: " + t.title());
        List<String[]> rows = new ArrayList<>();
        for (BudgetRow r : t.rows()) {
            rows.add(new String[] {r.name(), Numbers.significant(r.estimate()), Numbers.significant(
                    r.standardUncertainty()), r.unit(), Numbers.significant(r.sensitivity()),
                    Numbers.significant(r.contribution()), String.format(Locale.ROOT, "%.1f", r.sharePercent())});
        }
        rows.add(new String[] {"combined u_c", "", "", "", "", Numbers.significant(t.combined()), "100.0"});
        rows.add(new String[] {"expanded U (k = " + Numbers.significant(t.coverage()) + ")", "", "", "", "",
                Numbers.significant(t.expanded()), ""});
        new TableRenderer(List.of(new Column("Input x_i", 140, false), new Column("Estimate", 55, true),
                new Column("u(x_i)", 50, true), new Column("Unit", 45, false), new Column("c_i", 60, true),
                new Column("|c_i u(x_i)| " + t.unit(), 95, true), new Column("Share %", 50, true)), 7.5f, ALARMS)
                .draw(pw, rows);
    }

    private static void timeSeries(PageWriter pw, ReportContent content) throws IOException {
        pw.heading("6  Time series", content.timeSeries().isEmpty() ? 20 : PLOT_HEIGHT);
        if (content.timeSeries().isEmpty()) {
            pw.paragraph("No time series in this report.", 9.5f);
        }
        for (Plot p : content.timeSeries()) {
            plot(pw, p, PLOT_HEIGHT);
        }
    }

    private static void spectra(PageWriter pw, ReportContent content) throws IOException {
        pw.heading("7  Spectra: fit and residual", content.spectra().isEmpty() ? 20
                : PLOT_HEIGHT + RESIDUAL_HEIGHT + 20);
        if (content.spectra().isEmpty()) {
            pw.paragraph("No spectra in this report.", 9.5f);
        }
        for (SpectrumFit s : content.spectra()) {
            pw.ensure(PLOT_HEIGHT + RESIDUAL_HEIGHT + 20);
            plot(pw, s.fitPlot(), PLOT_HEIGHT);
            plot(pw, s.residualPlot(), RESIDUAL_HEIGHT);
        }
    }

    private static void plot(PageWriter pw, Plot p, float height) throws IOException {
        pw.ensure(height + 8);
        pw.down(height);
        PDPageContentStream cs = pw.stream();
        new PlotRenderer(pw.regular(), pw.bold()).draw(cs, p, pw.left(), pw.y(), pw.width(), height);
        pw.down(10);
    }

    private static void signatures(PageWriter pw, ReportContent content) {
        pw.heading("8  Review and approval", 140);
        pw.paragraph("Each signature names the signer, the time, its meaning and the SHA-256 hash of the content "
                + "signed; a signature applies to this report only if that hash equals the content hash in section 1.",
                9f);
        for (SignatureMeaning m : SignatureWords.PRINTED) {
            String noun = SignatureWords.noun(m);
            String pastTense = SignatureWords.pastTense(m);
            pw.subheading(noun);
            List<Signature> given = content.signatures(m);
            for (Signature s : given) {
                boolean matches = s.contentSha256().equals(content.contentHash());
                List<String[]> rows = new ArrayList<>();
                rows.add(new String[] {pastTense + " by", s.printedName()});
                rows.add(new String[] {"Time", TIME.format(s.signedAt())});
                rows.add(new String[] {"Meaning", SignatureWords.explanation(m)});
                rows.add(new String[] {"Signed content hash", s.contentSha256()});
                rows.add(new String[] {"Applies to this content", matches ? "yes"
                        : "NO: signed an earlier version; the content changed since, so this signature does not "
                                + "apply to this report"});
                pw.keyValues(rows, 130);
            }
            if (given.stream().noneMatch(s -> s.contentSha256().equals(content.contentHash()))) {
                pw.paragraph("Not yet " + pastTense.toLowerCase(Locale.ROOT) + ". This report has no "
                        + noun.toLowerCase(Locale.ROOT) + " signature on its content; do not use its results "
                        + "before it is " + pastTense.toLowerCase(Locale.ROOT) + ".", 9.5f, pw.left(), pw.width(),
                        pw.bold());
            }
        }
        content.auditAnchor().ifPresent(a -> {
            pw.subheading("Audit trail at report time");
            pw.keyValues(List.of(new String[] {"Last audit record", Long.toString(a.sequence())},
                    new String[] {"Its chain hash", a.hash()}), 130);
            if (a.verification() != null) {
                pw.paragraph("Made under: " + a.verification(), 9f);
            }
            pw.paragraph("Verifying the workspace's audit trail against this record and hash reveals any later "
                    + "rewrite of the trail up to it (tracegas audit-verify --anchor " + a.sequence() + ":"
                    + a.hash() + ").", 9f);
        });
    }
}
