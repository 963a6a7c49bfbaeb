package org.tracegas.demo;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.tracegas.audit.SignatureMeaning;
import org.tracegas.audit.SignatureRefusedException;
import org.tracegas.audit.VerificationReport;
import org.tracegas.importer.ImportException;
import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.io.LibraryManifestWriter;
import org.tracegas.method.LibraryPlan;
import org.tracegas.method.LibrarySynthesis;
import org.tracegas.method.MethodDefinition;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.EmissionSource;
import org.tracegas.model.Instrument;
import org.tracegas.model.Project;
import org.tracegas.model.Role;
import org.tracegas.model.Site;
import org.tracegas.pipeline.ContainerContents;
import org.tracegas.pipeline.ContainerInstrument;
import org.tracegas.pipeline.ProjectQuantification;
import org.tracegas.preprocess.InterferogramTransform;
import org.tracegas.qa.campaign.QaEvaluation;
import org.tracegas.qa.campaign.QaPlan;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.quantify.BatchOutcome;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.quantify.ProgressListener;
import org.tracegas.report.ReportContent;
import org.tracegas.report.campaign.CampaignReport;
import org.tracegas.report.campaign.MinuteSeries;
import org.tracegas.report.campaign.ReportPlan;
import org.tracegas.report.campaign.ReportSignatures;
import org.tracegas.report.campaign.WholeFile;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * The demo campaign end to end on a workspace folder: synthesizes the day's raw files (once), writes its
 * library plan, method file, QA plan and report plan in the runner's formats into the folder, and runs the
 * runner's jobs over them: library synthesis (once), method and library versions, quantification of every
 * interferogram into the workspace, the QA checks with control charts of the repeated readings, the report
 * from stored data, which the demo reviewer signs as reviewed; then verifies the audit trail. A second run on the same folder reuses the files, the library, the versions, the stored results and
 * QA checks, and makes the report again from the stored data.
 */
public final class DemoCampaign {

    /** The invented staff of the demo lab, with demo passwords (never use such passwords in a real lab). */
    public static final String ADMIN = "admin";
    public static final String ANALYST = "r.achterberg";
    public static final String REVIEWER = "i.halvorsen";
    static final char[] DEMO_PASSWORD = "demo-only-Tarnbeck-2026".toCharArray();
    private static final String SOFTWARE = "tracegas-demo";

    /**
     * The demo users and their password, as the demo command prints them: they exist in the demo's workspace
     * only, which the demo makes; the product has no users or passwords of its own anywhere else.
     */
    public static String demoUsers() {
        return "Demo users of this workspace (demo password " + new String(DEMO_PASSWORD) + ", for the demo only): "
                + ADMIN + " (administrator), " + ANALYST + " (analyst), " + REVIEWER
                + " (reviewer and quality manager)";
    }

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
        // the demo's plans in the runner's formats, beside the line lists, run by the commands' jobs
        Path methodFile = write(workspace.resolve("demo.method"), DemoMethod.methodText());
        MethodDefinition definition = MethodDefinition.read(methodFile);
        ContainerContents qa = ContainerContents.read(List.of(DemoCampaignFiles.qaFile(raw)),
                new InterferogramTransform(definition.transform()));
        Path libraryFolder = workspace.resolve(DemoMethod.LIBRARY_FOLDER);
        if (!Files.isRegularFile(libraryFolder.resolve(LibraryManifestWriter.MANIFEST))) {
            log.println("Building the synthetic reference library ...");
            Path planFile = write(workspace.resolve("library.plan"), DemoMethod.libraryPlanText(
                    qa.backgrounds().get(0).singleBeam().axis(), "line-lists"));
            ReferenceLibrary library = LibrarySynthesis.run(LibraryPlan.read(planFile), ProgressListener.NONE,
                    cancel);
            if (library == null) {
                return new Outcome(0, false, true, null, null, List.of(), null);
            }
            new LibraryManifestWriter().write(library, libraryFolder);
        }
        QaPlan qaPlan = QaPlan.read(write(workspace.resolve("qa.plan"), DemoMethod.qaPlanText()));
        ReportPlan reportPlan = ReportPlan.read(write(workspace.resolve("report.plan"),
                DemoMethod.reportPlanText("raw/" + DemoCampaignFiles.SIDE_CHANNEL_FILE, "qa.plan")));

        try (WorkspaceStore store = Workspaces.openH2(workspace.resolve("db"))) {
            Session analyst = DemoStaff.ensure(store);
            Project project = store.projects().findByCode(analyst, DemoScenario.PROJECT_CODE)
                    .orElseGet(() -> DemoStaff.createProject(store, analyst));
            if (project.getSource() == null) {
                // a new project, or one of a workspace made before sites were kept
                DemoStaff.placeProject(store, analyst, project);
            }
            MethodDefinition.Recorded recorded = definition.record(store, analyst);
            ContentVersion methodVersion = recorded.methodVersion();
            MinuteSeries series = MinuteSeries.of(store.projects().measurements(analyst, project.getId()),
                    store.results().results(analyst, project.getId()), methodVersion.getId());
            boolean reuse = series.size() >= DemoScenario.SAMPLES;
            // the day's containers were all acquired by the demo's analyzer: recorded once (a later run finds it),
            // it is stored with each measurement in the measurement's own write
            List<Path> containers = new ArrayList<>(DemoCampaignFiles.stackFiles(raw));
            containers.add(DemoCampaignFiles.qaFile(raw));
            Instrument instrument = store.instruments().record(analyst, ContainerInstrument.describe(containers,
                    DemoScenario.INSTRUMENT, DemoScenario.INSTRUMENT_SERIAL));
            long processed = 0;
            if (!reuse) {
                log.println("Processing " + DemoScenario.SAMPLES + " interferograms into the workspace ...");
                BatchOutcome outcome = new ProjectQuantification(store, analyst, project.getId(), SOFTWARE,
                        instrument.getId())
                        .run(methodVersion, recorded.method(), DemoCampaignFiles.stackFiles(raw),
                                DemoScenario.SAMPLES, qa.backgrounds(), progress, cancel);
                processed = outcome.delivered();
                if (outcome.cancelled()) {
                    return new Outcome(processed, false, true, null, null, List.of(), null);
                }
            } else {
                log.println("The workspace already holds this method version's results: making the report again "
                        + "from the stored data.");
            }
            List<CheckOutcome> checks = new QaEvaluation(store, analyst, project.getId(), SOFTWARE)
                    .run(methodVersion.getId(), recorded.method(), qaPlan, qa).checks();
            CampaignReport report = new CampaignReport(store, analyst, project.getId(), SOFTWARE);
            ReportContent content = report.content(methodVersion, recorded.method(), reportPlan);
            String hash = content.contentHash();
            if (content.signatures().stream().noneMatch(s -> s.contentSha256().equals(hash))) {
                reviewerSigns(store, project.getId(), analyst, content);
                content = report.content(methodVersion, recorded.method(), reportPlan);
            }
            Files.createDirectories(reportFolder);
            Path pdf = reportFolder.resolve("tarnbeck-line2-report.pdf");
            Path csv = reportFolder.resolve("tarnbeck-line2-results.csv");
            int pages = CampaignReport.write(content, pdf, csv);
            report.issue(content, methodVersion, recorded.method(), pdf, pages);
            return new Outcome(processed, reuse, false, pdf, csv, checks, store.verifyAuditTrail());
        }
    }

    /**
     * Demo only: the demo reviewer signs the report as reviewed right away, so that the demo's report shows a
     * review signature. In a lab the reviewer reads the report first and signs it from the workbench or with the
     * runner's report-sign command.
     */
    private void reviewerSigns(WorkspaceStore store, String projectId, Session analyst, ReportContent content) {
        log.println("The demo reviewer signs the report as reviewed (demo only) ...");
        Session reviewer = store.users().logIn(REVIEWER, DEMO_PASSWORD.clone());
        try {
            ReportSignatures.sign(store, reviewer, projectId, content, analyst.userId(), REVIEWER,
                    DEMO_PASSWORD.clone(), SignatureMeaning.REVIEWED, "demo review");
        } catch (SignatureRefusedException e) {
            // the demo's own staff and passwords: a refusal means the demo workspace was changed by hand
            throw new IllegalStateException("the demo reviewer's signature was refused: " + e.getMessage(), e);
        }
    }

    /** Writes a plan file whole, unless it holds that text already. */
    private static Path write(Path file, String text) throws IOException {
        if (!Files.isRegularFile(file) || !Files.readString(file, StandardCharsets.UTF_8).equals(text)) {
            WholeFile.write(file, out -> out.write(text.getBytes(StandardCharsets.UTF_8)));
        }
        return file;
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
        static Project createProject(WorkspaceStore store, Session analyst) {
            Project project = store.projects().createProject(analyst,
                    store.projects().createClient(analyst, DemoScenario.CLIENT).getId(), DemoScenario.PROJECT_CODE,
                    DemoScenario.PROJECT_NAME);
            Session reviewer = store.users().logIn(REVIEWER, DEMO_PASSWORD);
            store.projects().grant(analyst, project.getId(), reviewer.userId(), AccessLevel.READ);
            return project;
        }

        /** The project at the Tarnbeck line 2 stack, the site and source made where the client has none. */
        static void placeProject(WorkspaceStore store, Session analyst, Project project) {
            String clientId = project.getClient().getId();
            Site plant = store.sites().sites(analyst, clientId).stream()
                    .filter(s -> s.getName().equals(DemoScenario.PLANT)).findFirst()
                    .orElseGet(() -> store.sites().createSite(analyst, clientId, DemoScenario.PLANT,
                            DemoScenario.PLANT_DESCRIPTION));
            EmissionSource stack = plant.getSources().stream().filter(e -> e.getName().equals(DemoScenario.SOURCE))
                    .findFirst().orElseGet(() -> store.sites().createSource(analyst, plant.getId(),
                            DemoScenario.SOURCE, DemoScenario.SOURCE_DESCRIPTION));
            store.sites().setSource(analyst, project.getId(), stack.getId());
        }
    }
}
