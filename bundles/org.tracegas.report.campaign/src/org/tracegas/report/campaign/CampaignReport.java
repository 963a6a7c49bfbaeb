package org.tracegas.report.campaign;

import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.tracegas.importer.ImportException;
import org.tracegas.importer.ImportOptions;
import org.tracegas.importer.sidechannel.SideChannelJoin;
import org.tracegas.importer.sidechannel.SideChannelReader;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.method.StoredMethod;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.Measurement;
import org.tracegas.model.ProcessedSpectrum;
import org.tracegas.model.Report;
import org.tracegas.model.SpectralContent;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.pipeline.MeasurementQuantification;
import org.tracegas.qa.campaign.QaControlCharts;
import org.tracegas.qa.campaign.QaPlan;
import org.tracegas.qa.campaign.StoredQaChecks;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.control.ChartEvaluation;
import org.tracegas.quantify.FitSpectra;
import org.tracegas.quantify.Sample;
import org.tracegas.report.Campaign;
import org.tracegas.report.CsvExport;
import org.tracegas.report.LibraryVersion;
import org.tracegas.report.MethodVersion;
import org.tracegas.report.PdfReportWriter;
import org.tracegas.report.ReportContent;
import org.tracegas.report.SpectrumFit;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.WorkspaceVerification;

/**
 * The report of a campaign made from stored data only: the results and QA checks a method version made, the
 * control charts of the repeated QA readings drawn again from the stored readings and the same history, the
 * O2 side channel, for the spectrum plot a stored absorbance spectrum fitted again with the stored method, and
 * the review and approval signatures given on the report's id with the audit anchor of now.
 */
public final class CampaignReport {

    private final WorkspaceStore store;
    private final Session actor;
    private final String projectId;
    private final String software;

    public CampaignReport(WorkspaceStore store, Session actor, String projectId, String software) {
        this.store = store;
        this.actor = actor;
        this.projectId = projectId;
        this.software = software;
    }

    /**
     * @throws IllegalStateException if the method version has no stored results or QA checks in the project
     * @throws FileFormatException   if the plan's example fit names no stored sample, its QA plan charts a
     *                               reading otherwise than the stored checks were charted, or its plant or
     *                               source differs from the project's emission source in the workspace
     * @throws ImportException       if the O2 file cannot be read
     */
    public ReportContent content(ContentVersion methodVersion, StoredMethod method, ReportPlan plan)
            throws IOException, ImportException {
        // the data are verified once, before they are read; the report states this verification and its anchor
        WorkspaceVerification verified = store.audit().verifyWorkspace(List.of())
                .requireIntact("make the report of project " + projectId);
        List<Measurement> measurements = store.projects().measurements(actor, projectId);
        MinuteSeries series = MinuteSeries.of(measurements, store.results().results(actor, projectId),
                methodVersion.getId());
        if (series.isEmpty()) {
            throw new IllegalStateException("the project holds no results of method version " + methodVersion.getId()
                    + "; quantify first");
        }
        List<CheckOutcome> checks = StoredQaChecks.load(store, actor, projectId, methodVersion.getId());
        if (checks.isEmpty()) {
            throw new IllegalStateException("the project holds no QA checks of method version "
                    + methodVersion.getId() + "; run the QA checks first");
        }
        SideChannelJoin o2 = new SideChannelJoin(new SideChannelReader(ZoneOffset.UTC).read(plan.o2File(),
                ImportOptions.defaults()));
        ContentVersion library = store.versions().version(method.libraryVersionId());
        ReportContent content = new CampaignReportBuilder(plan.basis(),
                plan.budget(method.method().pathLengthMetres()), plan.cellTemperatureK(), plan.cellPressureKPa(),
                plan.o2UncertaintyPercent())
                .build(CampaignPlace.of(plan, store.projects().project(actor, projectId)),
                        new MethodVersion(method.method().name(), "v" + methodVersion.getNumber(),
                                methodVersion.getContentHash()),
                        new LibraryVersion(library.getItemName(), "v" + library.getNumber() + ", content "
                                + method.libraryContentHash().substring(0, 16)),
                        checks, charts(method, plan, checks), series, plan.reported(), plan.moisture(),
                        t -> oxygen(o2, plan.o2Channel(), t), plan.periods(), exampleFit(measurements, method, plan))
                .withInstruments(ReportedInstruments.lines(measurements));
        return ReportSignatures.attach(store, actor, projectId, content, verified);
    }

    /**
     * The users who recorded the stored QA checks and results the report of a method version is made from, those
     * of the QA checks first: the report's authors, who may not review or approve it.
     */
    public List<String> authors(String methodVersionId) {
        Set<String> authors = new LinkedHashSet<>();
        store.qa().checks(actor, projectId).stream().filter(c -> c.getMethodVersionId().equals(methodVersionId))
                .forEach(c -> authors.add(c.getRecordedBy()));
        store.results().results(actor, projectId).stream()
                .filter(r -> r.getProvenance().methodVersionId().equals(methodVersionId))
                .forEach(r -> authors.add(r.getRecordedBy()));
        return List.copyOf(authors);
    }

    /**
     * The control charts of the plan's QA plan drawn again: this campaign's stored readings (the charts' own
     * outcomes are not readings) against the history the evaluation saw. Each must decide as its stored outcome
     * did, else the QA plan is not the one the checks were evaluated with. No QA plan, no charts drawn.
     */
    private List<ChartEvaluation> charts(StoredMethod method, ReportPlan plan, List<CheckOutcome> checks)
            throws IOException {
        if (plan.qaPlan() == null) {
            return List.of();
        }
        QaPlan qaPlan = QaPlan.read(plan.qaPlan());
        List<CheckOutcome> readings = checks.stream()
                .filter(c -> qaPlan.charts().stream().noneMatch(q -> q.isChartOutcome(c))).toList();
        List<CheckOutcome> history = StoredQaChecks.history(store, actor, projectId, method.method().name());
        List<ChartEvaluation> charts = new ArrayList<>();
        for (QaControlCharts q : qaPlan.charts()) {
            List<ChartEvaluation> remade = q.evaluate(history, readings);
            List<CheckOutcome> stored = checks.stream().filter(q::isChartOutcome).toList();
            boolean same = remade.size() == stored.size() && remade.stream().map(ChartEvaluation::outcome)
                    .allMatch(r -> stored.stream().anyMatch(c -> c.check().equals(r.check())
                            && c.passed() == r.passed() && c.measured() == r.measured()));
            if (!same) {
                throw new FileFormatException(qaPlan.file(), 0, "[chart]", "drawn again, the charts of "
                        + q.readings() + " give " + remade.stream().map(e -> e.outcome().summary()).toList()
                        + ", the stored QA checks " + stored.stream().map(CheckOutcome::summary).toList()
                        + "; is this the QA plan the checks were evaluated with?");
            }
            charts.addAll(remade);
        }
        return charts;
    }

    /** Where a report was written: its PDF and its CSV of results. */
    public record Written(Path pdf, Path csv) {
    }

    /**
     * Writes the report into {@code folder} (made if missing) as report.pdf and results.csv, each whole or not at
     * all, and records its issue in the project (see {@link #issue}); if the issue cannot be recorded, the files
     * are removed again. A report id names one report in the
     * workspace, so an id issued or signed already on another project is refused before anything is written:
     * its signatures would otherwise cover two reports.
     *
     * @param methodVersion the method version the content was made for
     * @param method        that version as stored, with the library version it fits with
     * @throws ReportIdTakenException if the report id is issued or signed already on another project of the
     *                                workspace
     */
    public Written writeInto(ReportContent content, ContentVersion methodVersion, StoredMethod method, Path folder)
            throws IOException, ReportIdTakenException {
        String reportId = content.campaign().reportId();
        Optional<String> other = store.reviews().otherProjectWithReport(projectId, reportId);
        if (other.isPresent()) {
            throw new ReportIdTakenException(reportId, other.get());
        }
        Files.createDirectories(folder);
        Written written = new Written(folder.resolve("report.pdf"), folder.resolve("results.csv"));
        int pages = write(content, written.pdf(), written.csv());
        try {
            issue(content, methodVersion, method, written.pdf(), pages);
        } catch (RuntimeException e) {
            // a report written out is an issue: without its record it is not left behind either
            try {
                Files.deleteIfExists(written.pdf());
                Files.deleteIfExists(written.csv());
            } catch (IOException d) {
                e.addSuppressed(d);
            }
            throw e;
        }
        return written;
    }

    /**
     * Records in the project that the report was issued, once its PDF is written whole: report id, title, file
     * and its number of pages, the method and library versions and the content hash its review and approval
     * signatures are given on.
     *
     * @param pages the PDF's number of pages, as {@link #write} returned it
     * @return the report as stored
     */
    public Report issue(ReportContent content, ContentVersion methodVersion, StoredMethod method, Path pdf,
            int pages) {
        Campaign c = content.campaign();
        Report r = WorkspaceFactory.eINSTANCE.createReport();
        r.setReportId(c.reportId());
        r.setTitle(c.client() + ", " + c.plant() + ", " + c.source() + ", " + c.firstDay()
                + (c.lastDay().equals(c.firstDay()) ? "" : " to " + c.lastDay()));
        r.setContentSha256(content.contentHash());
        r.setFileName(pdf.getFileName().toString());
        r.setPageCount(pages);
        r.setMethodVersionId(methodVersion.getId());
        r.setLibraryVersionId(method.libraryVersionId());
        return store.reports().record(actor, projectId, r);
    }

    /**
     * Writes the PDF and the CSV of results, each whole or not at all.
     *
     * @return the PDF's number of pages
     */
    public static int write(ReportContent content, Path pdf, Path csv) throws IOException {
        int[] pages = new int[1];
        WholeFile.write(pdf, out -> pages[0] = new PdfReportWriter().write(content, out));
        WholeFile.write(csv, out -> {
            Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
            CsvExport.write(content.results(), w);
            w.flush();
        });
        return pages[0];
    }

    private static double oxygen(SideChannelJoin o2, String channel, Instant t) {
        try {
            return o2.nearest(t, Duration.ofMinutes(2)).get(channel);
        } catch (ImportException e) {
            throw new IllegalStateException(e.getMessage(), e);
        }
    }

    /** The plan's example sample fitted again from its stored absorbance; null when the plan names none. */
    private SpectrumFit exampleFit(List<Measurement> measurements, StoredMethod method, ReportPlan plan)
            throws FileFormatException {
        if (plan.exampleTime() == null) {
            return null;
        }
        Measurement sample = measurements.stream().filter(m -> m.getTime().equals(plan.exampleTime()))
                .findFirst().orElseThrow(() -> new FileFormatException(plan.file(), 0,
                        "example-fit", "no stored sample at " + plan.exampleTime()));
        String measurement = sample.getId();
        Optional<ProcessedSpectrum> stored = store.spectra().ofMeasurement(actor, measurement).stream()
                .filter(s -> s.getContent() == SpectralContent.ABSORBANCE).findFirst();
        Spectrum a = stored.orElseThrow(() -> new FileFormatException(plan.file(), 0, "example-fit",
                "no stored absorbance at " + plan.exampleTime())).getSpectrum();
        FitSpectra fit = method.quantifier(a.axis(), software, true).quantify(
                // in its cell, for a method whose spectra are computed at each measurement's conditions
                MeasurementQuantification.inCellOf(Sample.of(a), sample))
                .compound(plan.exampleCompound()).orElseThrow(() -> new FileFormatException(plan.file(), 0,
                        "example-fit", "the method does not report " + plan.exampleCompound()))
                .spectra().orElseThrow();
        Spectrum model = fit.model();
        // the model is defined inside the analyte's regions only
        List<double[]> points = new ArrayList<>();
        for (int i = 0; i < model.size(); i++) {
            double x = model.axis().get(i);
            double y = a.get(a.axis().nearestIndex(x));
            if (Double.isFinite(model.get(i)) && Double.isFinite(y)) {
                points.add(new double[] { x, y, model.get(i) });
            }
        }
        return new SpectrumFit(plan.exampleCompound() + " region at " + plan.exampleTime()
                + (plan.exampleCaption() == null ? "" : " (" + plan.exampleCaption() + ")"),
                points.stream().mapToDouble(p -> p[0]).toArray(), points.stream().mapToDouble(p -> p[1]).toArray(),
                points.stream().mapToDouble(p -> p[2]).toArray());
    }
}
