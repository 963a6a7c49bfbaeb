package org.tracegas.campaign.demo;

import org.tracegas.campaign.WholeFile;
import java.io.IOException;
import java.io.PrintStream;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.tracegas.audit.VerificationReport;
import org.tracegas.campaign.AnalysisVersions;
import org.tracegas.campaign.BackgroundTimeline;
import org.tracegas.campaign.CampaignQaChecks;
import org.tracegas.campaign.CampaignReportBuilder;
import org.tracegas.campaign.MeasuredSpectrum;
import org.tracegas.campaign.MinuteSeries;
import org.tracegas.campaign.QaMeasurements;
import org.tracegas.campaign.SpectrumChain;
import org.tracegas.campaign.StackProcessor;
import org.tracegas.campaign.StoredMethod;
import org.tracegas.campaign.StoredQaChecks;
import org.tracegas.campaign.VersionRecorder;
import org.tracegas.importer.ImportException;
import org.tracegas.importer.ImportOptions;
import org.tracegas.importer.container.ContainerReader;
import org.tracegas.importer.container.ContainerRecord;
import org.tracegas.importer.container.SampleKind;
import org.tracegas.importer.sidechannel.SideChannelJoin;
import org.tracegas.importer.sidechannel.SideChannelReader;
import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.ReferenceSpectrum;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.Role;
import org.tracegas.preprocess.Background;
import org.tracegas.preprocess.BackgroundRatio;
import org.tracegas.preprocess.InterferogramTransform;
import org.tracegas.qa.basis.EmissionLimit;
import org.tracegas.qa.basis.OxygenCorrection;
import org.tracegas.qa.basis.ReportingBasis;
import org.tracegas.qa.basis.StandardConditions;
import org.tracegas.qa.checks.AbsorbanceRegion;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.checks.SpikeGas;
import org.tracegas.qa.uncertainty.FtirResultBudget;
import org.tracegas.quantify.BatchOutcome;
import org.tracegas.quantify.BatchQuantifier;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.quantify.FitSpectra;
import org.tracegas.quantify.PreparedMethod;
import org.tracegas.quantify.ProgressListener;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.Quantifier;
import org.tracegas.quantify.Sample;
import org.tracegas.report.Campaign;
import org.tracegas.report.CsvExport;
import org.tracegas.report.LibraryVersion;
import org.tracegas.report.MethodVersion;
import org.tracegas.report.PdfReportWriter;
import org.tracegas.report.ReportContent;
import org.tracegas.report.SpectrumFit;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.ProjectInfo;
import org.tracegas.store.Session;
import org.tracegas.store.VersionInfo;
import org.tracegas.store.VersionKind;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * The demo campaign end to end on a workspace folder: synthesizes the day's raw files (once), builds the
 * synthetic library and the method, processes and fits every interferogram into the workspace, runs the QA
 * checks, writes the report and verifies the audit trail. A second run on the same folder reuses the files,
 * the versions and the stored results and makes the report again from the stored data.
 */
public final class DemoCampaign {

    /** The invented staff of the demo lab, with demo passwords (never use such passwords in a real lab). */
    public static final String ADMIN = "admin";
    public static final String ANALYST = "r.achterberg";
    public static final String REVIEWER = "i.halvorsen";
    static final char[] DEMO_PASSWORD = "demo-only-Tarnbeck-2026".toCharArray();
    private static final String SOFTWARE = "tracegas-demo";

    /** What a run did, for the runner to print and the tests to check. */
    public record Outcome(long spectraProcessed, boolean reusedResults, boolean cancelled, Path report, Path csv,
            List<CheckOutcome> qa, VerificationReport audit) {
    }

    private final Path workspace;
    private final Path reportFolder;
    private final PrintStream log;

    public DemoCampaign(Path workspace, Path reportFolder, PrintStream log) {
        this.workspace = workspace;
        this.reportFolder = reportFolder;
        this.log = log;
    }

    public Outcome run(ProgressListener progress, CancellationFlag cancel) throws IOException, ImportException {
        Files.createDirectories(workspace);
        Path raw = workspace.resolve("raw");
        DemoPhysics physics = DemoPhysics.fromInventedLineLists(workspace.resolve("line-lists"));
        if (!DemoCampaignFiles.complete(raw)) {
            log.println("Synthesizing the demo day's interferograms (invented plant, synthetic physics) ...");
            DemoCampaignFiles.write(raw, physics, progress, cancel);
            if (cancel.isCancelled()) {
                return new Outcome(0, false, true, null, null, List.of(), null);
            }
        }
        InterferogramTransform transform = new InterferogramTransform(DemoMethod.transform());
        List<Background> backgrounds = new ArrayList<>();
        List<ContainerRecord> qaRecords = new ArrayList<>();
        try (ContainerReader reader = ContainerReader.open(DemoCampaignFiles.qaFile(raw))) {
            while (reader.hasNext()) {
                ContainerRecord r = reader.next();
                if (r.header().kind() == SampleKind.BACKGROUND) {
                    backgrounds.add(new Background("background " + r.header().time(), r.header().time(),
                            transform.singleBeam(r.interferogram())));
                } else {
                    qaRecords.add(r);
                }
            }
        }
        BackgroundRatio ratio = new BackgroundRatio();
        SpectrumChain chain = new SpectrumChain(transform, ratio, new BackgroundTimeline(backgrounds));
        List<MeasuredSpectrum> qaSpectra = qaRecords.stream().map(chain::process).toList();
        log.println("Building the synthetic reference library ...");
        ReferenceLibrary library = DemoMethod.library(physics, backgrounds.get(0).singleBeam().axis());
        QuantificationMethod method = DemoMethod.method(library);
        PreparedMethod prepared = PreparedMethod.prepare(method, backgrounds.get(0).singleBeam().axis());

        try (WorkspaceStore store = Workspaces.openH2(workspace.resolve("db"))) {
            Session analyst = DemoStaff.ensure(store);
            ProjectInfo project = store.projects().findByCode(analyst, DemoScenario.PROJECT_CODE)
                    .orElseGet(() -> DemoStaff.createProject(store, analyst));
            VersionInfo libraryVersion = VersionRecorder.ensure(store, analyst, VersionKind.LIBRARY, library.name(),
                    "library=" + library.name() + "\ncontent-sha256=" + library.contentHash() + "\n",
                    "demo data regenerated");
            VersionInfo methodVersion = VersionRecorder.ensure(store, analyst, VersionKind.METHOD, method.name(),
                    new StoredMethod(method, DemoMethod.transform(), libraryVersion.id(), library.contentHash())
                            .content(), "demo data regenerated");
            AnalysisVersions versions = new AnalysisVersions(methodVersion.id(), libraryVersion.id());
            Quantifier quantifier = new Quantifier(prepared, library.contentHash(), SOFTWARE, false);

            MinuteSeries series = MinuteSeries.of(store.projects().measurements(analyst, project.id()),
                    store.results().results(analyst, project.id()), methodVersion.id());
            boolean reuse = series.size() >= DemoScenario.SAMPLES;
            long processed = 0;
            if (!reuse) {
                log.println("Processing " + DemoScenario.SAMPLES + " interferograms into the workspace ...");
                BatchOutcome outcome = new StackProcessor(store, analyst, project.id(), chain,
                        BatchQuantifier.onAllCores(quantifier), versions)
                        .run(DemoCampaignFiles.stackFiles(raw), DemoScenario.SAMPLES, progress, cancel);
                processed = outcome.delivered();
                if (outcome.cancelled()) {
                    return new Outcome(processed, false, true, null, null, List.of(), null);
                }
                series = MinuteSeries.of(store.projects().measurements(analyst, project.id()),
                        store.results().results(analyst, project.id()), methodVersion.id());
            } else {
                log.println("The workspace already holds this method version's results: making the report again "
                        + "from the stored data.");
            }
            List<CheckOutcome> checks = StoredQaChecks.load(store, analyst, project.id(), methodVersion.id());
            if (checks.isEmpty()) {
                QaMeasurements qa = QaMeasurements.fit(qaSpectra, quantifier);
                StoredQaChecks.store(store, analyst, project.id(), methodVersion.id(),
                        CampaignQaChecks.evaluate(qaPlan(library), qa, backgrounds, DemoScenario.DAY_START,
                                DemoScenario.DAY_START.plus(Duration.ofDays(1))));
                checks = StoredQaChecks.load(store, analyst, project.id(), methodVersion.id());
            }
            SideChannelJoin o2 = new SideChannelJoin(new SideChannelReader(ZoneOffset.UTC)
                    .read(raw.resolve(DemoCampaignFiles.SIDE_CHANNEL_FILE), ImportOptions.defaults()));
            ReportContent content = new CampaignReportBuilder(
                    new ReportingBasis(StandardConditions.EU_EMISSIONS, new OxygenCorrection(11.0, 20.0)),
                    new FtirResultBudget(0.02, DemoScenario.PATH_LENGTH, 0.05, 2.0, 0.5),
                    DemoScenario.CELL_TEMPERATURE, DemoScenario.CELL_PRESSURE)
                    .build(campaign(), new MethodVersion(method.name(), "v" + methodVersion.number(), methodVersion.contentHash()),
                            new LibraryVersion(library.name(), "v" + libraryVersion.number() + ", content " + library.contentHash().substring(0, 16)), checks, series, reported(),
                            "H2O", t -> oxygen(o2, t), List.of(Duration.ofMinutes(30), Duration.ofDays(1)),
                            exampleFit(prepared, library, chain, raw));
            Files.createDirectories(reportFolder);
            Path pdf = reportFolder.resolve("tarnbeck-line2-report.pdf");
            Path csv = reportFolder.resolve("tarnbeck-line2-results.csv");
            WholeFile.write(pdf, out -> new PdfReportWriter().write(content, out));
            WholeFile.write(csv, out -> {
                Writer w = new java.io.OutputStreamWriter(out, StandardCharsets.UTF_8);
                CsvExport.write(content.results(), w);
                w.flush();
            });
            return new Outcome(processed, reuse, false, pdf, csv, checks, store.verifyAuditTrail());
        }
    }

    private static double oxygen(SideChannelJoin o2, Instant t) {
        try {
            return o2.nearest(t, Duration.ofMinutes(2)).get("O2");
        } catch (ImportException e) {
            throw new IllegalStateException(e.getMessage(), e);
        }
    }

    private static Campaign campaign() {
        LocalDate day = LocalDate.ofInstant(DemoScenario.DAY_START, ZoneOffset.UTC);
        return new Campaign("FRR-2026-031", DemoScenario.CLIENT, DemoScenario.PLANT, DemoScenario.SOURCE, day, day,
                DemoScenario.DAY_START.plus(Duration.ofDays(2)),
                "mg/m³ dry gas, 273.15 K, 101.3 kPa, 11 % O2");
    }

    private static List<CampaignReportBuilder.Reported> reported() {
        String basis = "mg/m³ dry, 273.15 K, 101.3 kPa, 11 % O2";
        return List.of(
                new CampaignReportBuilder.Reported("CO", DemoScenario.CO.molarMass(), List.of(
                        new EmissionLimit("CO", 100, basis, Duration.ofMinutes(30)),
                        new EmissionLimit("CO", 50, basis, Duration.ofDays(1)))),
                new CampaignReportBuilder.Reported("HCl", DemoScenario.HCl.molarMass(), List.of(
                        new EmissionLimit("HCl", 60, basis, Duration.ofMinutes(30)),
                        new EmissionLimit("HCl", 10, basis, Duration.ofDays(1)))),
                new CampaignReportBuilder.Reported("NH3", DemoScenario.NH3.molarMass(), List.of(
                        new EmissionLimit("NH3", 10, basis, Duration.ofDays(1)))),
                new CampaignReportBuilder.Reported("NO", DemoScenario.NO.molarMass(), List.of()),
                new CampaignReportBuilder.Reported("N2O", DemoScenario.N2O.molarMass(), List.of()),
                new CampaignReportBuilder.Reported("CH4", DemoScenario.CH4.molarMass(), List.of()));
    }

    private static CampaignQaChecks.Plan qaPlan(ReferenceLibrary library) {
        // the CO reference nearest in amount to the CTS gas, so that saturation does not bias the band ratio
        double ctsPpmMetres = DemoCampaignFiles.CTS_CO_PPM * DemoScenario.PATH_LENGTH;
        ReferenceSpectrum co = library.references().stream().filter(r -> r.compound().name().equals("CO"))
                .min(java.util.Comparator.comparingDouble(
                        r -> Math.abs(r.metadata().conditions().concentrationPathLength() - ctsPpmMetres)))
                .orElseThrow();
        return new CampaignQaChecks.Plan("CO", DemoCampaignFiles.CTS_CO_PPM, 2040, 2240, co.spectrum(),
                co.metadata().conditions().concentrationPathLength(), co.metadata().conditions().temperature(),
                co.metadata().conditions().pressure(), DemoScenario.PATH_LENGTH, "HCl", "SF6",
                new SpikeGas(DemoCampaignFiles.SPIKE_SF6_PPM, DemoCampaignFiles.SPIKE_HCL_PPM),
                List.of("CO", "NO", "N2O", "NH3", "HCl", "CH4"), new AbsorbanceRegion(2450, 2600), 2e-3,
                BackgroundRatio.DEFAULT_AGE_LIMIT);
    }

    /** The fit of the sample in the middle of the morning CO upset, for the report's spectrum plot. */
    private static SpectrumFit exampleFit(PreparedMethod prepared, ReferenceLibrary library, SpectrumChain chain,
            Path raw) throws ImportException, IOException {
        try (ContainerReader reader = ContainerReader.open(DemoCampaignFiles.stackFiles(raw).get(7))) {
            ContainerRecord record = null;
            for (int i = 0; i <= 10 && reader.hasNext(); i++) {
                record = reader.next();
            }
            Spectrum a = chain.process(record).ratio().spectrum();
            FitSpectra fit = new Quantifier(prepared, library.contentHash(), SOFTWARE, true)
                    .quantify(Sample.of(a)).compound("CO").orElseThrow().spectra().orElseThrow();
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
            double[] x = points.stream().mapToDouble(p -> p[0]).toArray();
            double[] measured = points.stream().mapToDouble(p -> p[1]).toArray();
            double[] fitted = points.stream().mapToDouble(p -> p[2]).toArray();
            return new SpectrumFit("CO region at " + record.header().time() + " (morning upset)", x, measured,
                    fitted);
        }
    }

    /** The demo's users: created on the first run, logged in on later runs. */
    static final class DemoStaff {

        private DemoStaff() {
        }

        static Session ensure(WorkspaceStore store) {
            if (!store.users().hasUsers()) {
                Session admin = store.users().createFirstAdministrator(ADMIN, "Demo administrator", DEMO_PASSWORD);
                store.users().createUser(admin, ANALYST, "Rosa Achterberg (demo analyst)", Set.of(Role.ANALYST),
                        DEMO_PASSWORD);
                store.users().createUser(admin, REVIEWER, "Ines Halvorsen (demo reviewer)",
                        Set.of(Role.REVIEWER, Role.QUALITY_MANAGER), DEMO_PASSWORD);
            }
            return store.users().logIn(ANALYST, DEMO_PASSWORD);
        }

        /** The demo project, readable by the reviewer too, who reviews and approves its results. */
        static ProjectInfo createProject(WorkspaceStore store, Session analyst) {
            ProjectInfo project = store.projects().createProject(analyst,
                    store.projects().createClient(analyst, DemoScenario.CLIENT), DemoScenario.PROJECT_CODE,
                    DemoScenario.PROJECT_NAME);
            Session reviewer = store.users().logIn(REVIEWER, DEMO_PASSWORD);
            store.projects().grant(analyst, project.id(), reviewer.userId(), AccessLevel.READ);
            return project;
        }
    }
}
