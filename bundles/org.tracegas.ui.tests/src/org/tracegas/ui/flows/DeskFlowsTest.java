package org.tracegas.ui.flows;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicReference;

import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.TreeItem;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.audit.AuditAction;
import org.tracegas.model.Project;
import org.tracegas.model.Result;
import org.tracegas.store.Session;
import org.tracegas.ui.Screens;
import org.tracegas.ui.dialogs.LoginDialog;
import org.tracegas.ui.dialogs.SignatureDialog;
import org.tracegas.ui.jobs.AnalysisRuns;
import org.tracegas.ui.jobs.BatchQuantificationJob;
import org.tracegas.ui.parts.AuditTrailPanel;
import org.tracegas.ui.parts.FitDisplay;
import org.tracegas.ui.parts.ResultReviewPanel;
import org.tracegas.ui.parts.SpectrumPanel;
import org.tracegas.ui.parts.WorkspaceNavigator;
import org.tracegas.ui.session.DemoStaff;
import org.tracegas.ui.session.SeededProject;
import org.tracegas.ui.session.WorkspaceAccess;

/**
 * The main flows of the desk, driven through the composites and dialogs on a real H2 workspace in a
 * temporary folder. Each flow saves a screenshot under target/screenshots.
 */
class DeskFlowsTest {

    @TempDir
    Path folder;

    private Display display;
    private Shell shell;
    private WorkspaceAccess access;
    private SeededProject.Seeded demo;

    @BeforeEach
    void openWorkspace() {
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setLayout(new FillLayout());
        shell.setSize(1100, 700);
        access = WorkspaceAccess.openH2(folder.resolve("ws"));
        demo = DemoStaff.seed(access.store());
    }

    @AfterEach
    void close() {
        shell.dispose();
        access.close();
    }

    private static void press(org.eclipse.swt.widgets.Button b) {
        b.notifyListeners(SWT.Selection, new Event());
    }

    @Test
    void logInIsRefusedWithAWrongPasswordAndAcceptedWithTheRightOne() throws Exception {
        LoginDialog dialog = new LoginDialog(shell, access.store().users(), access.location().description());
        dialog.setBlockOnOpen(false);
        dialog.open();
        dialog.loginField().setText(DemoStaff.ANALYST);
        dialog.passwordField().setText("not-the-password");
        press(dialog.okButton());
        assertTrue(dialog.message().getText().startsWith("Log-in refused"), dialog.message().getText());
        assertNull(dialog.session());
        assertFalse(dialog.getShell().isDisposed(), "a refused log-in keeps the dialog open");
        Screens.save(dialog.getShell(), "flow1-login-refused");
        dialog.passwordField().setText(DemoStaff.PASSWORD);
        press(dialog.okButton());
        assertEquals(DemoStaff.ANALYST, dialog.session().login());
        assertNull(dialog.getShell(), "the dialog closes after a successful log-in");
    }

    @Test
    void theNavigatorOpensTheSeededProjectWithItsMeasurements() throws Exception {
        WorkspaceNavigator nav = new WorkspaceNavigator(shell, SWT.NONE);
        nav.setWorkspace(demo.model());
        shell.open();
        assertTrue(nav.openProject(SeededProject.PROJECT_CODE));
        Project p = (Project) ((IStructuredSelection) nav.viewer().getSelection()).getFirstElement();
        assertEquals(demo.projectId(), p.getId());
        TreeItem[] top = nav.viewer().getTree().getItems();
        assertEquals(List.of("Harbour Lime Works", "Reference libraries", "Analysis methods"),
                List.of(top[0].getText(), top[1].getText(), top[2].getText()));
        TreeItem project = top[0].getItem(0);
        assertTrue(project.getExpanded());
        nav.viewer().expandAll();
        // the demo's three samples of one day, grouped by day and kind
        assertEquals(1, project.getItemCount());
        assertEquals("2026-03-10", project.getItem(0).getText());
        TreeItem samples = project.getItem(0).getItem(0);
        assertEquals("sample", samples.getText());
        assertEquals(3, samples.getItemCount());
        assertTrue(samples.getItem(2).getText().startsWith("sample  2026-03-10 09:10:00"), samples.getItem(2).getText());
        Screens.save(shell, "flow2-navigator");
    }

    @Test
    void runningTheMethodInABackgroundJobRecordsResultsAndShowsTheFitAndResidual() throws Exception {
        Session analyst = access.store().users().logIn(DemoStaff.ANALYST, DemoStaff.PASSWORD.toCharArray());
        SpectrumPanel panel = new SpectrumPanel(shell, SWT.NONE);
        shell.open();
        AtomicReference<List<BatchQuantificationJob.Outcome>> done = new AtomicReference<>();
        BatchQuantificationJob job = BatchQuantificationJob.of(access, analyst, demo, outcomes -> display.asyncExec(() -> {
            done.set(outcomes);
            panel.show(BatchQuantificationJob.fit(outcomes.get(outcomes.size() - 1)));
        }));
        job.schedule();
        // the UI thread keeps dispatching events while the job runs
        Screens.waitFor(display, () -> panel.shown() != null, 60_000);
        assertTrue(job.getResult().isOK(), job.getResult().toString());
        assertEquals(3, done.get().size());
        List<Result> stored = access.store().results().results(analyst, demo.projectId());
        assertEquals(6, stored.size(), "two analytes for each of three measurements");
        // the third demo sample was made with 70 ppm CO and 12 ppm N2O (SeededProject.seed); the fit finds them
        // again within 2 % (a check of the whole chain against the composition it was built from)
        var third = done.get().get(2).result();
        assertEquals(70, third.compound("CO").orElseThrow().concentration(), 1.4);
        assertEquals(12, third.compound("N2O").orElseThrow().concentration(), 0.24);
        FitDisplay fit = panel.shown();
        assertNotNull(panel.residualChart().getSeriesSet().getSeries(SpectrumPanel.RESIDUAL));
        assertTrue(panel.shownPoints(SpectrumPanel.RESIDUAL) > 100);
        double sum = 0;
        int n = 0;
        for (double r : fit.residual()) {
            if (!Double.isNaN(r)) {
                sum += r * r;
                n++;
            }
        }
        // noise of the demo samples is 2e-4 absorbance (SeededProject.sample); the residual is of that size
        double rms = Math.sqrt(sum / n);
        assertTrue(rms > 1e-4 && rms < 4e-4, "residual RMS " + rms);
        assertEquals(2, panel.shading().bands().size());
        Screens.save(shell, "flow3-run-method-spectrum");
    }

    private List<Result> runAsAnalyst() throws InterruptedException {
        Session analyst = access.store().users().logIn(DemoStaff.ANALYST, DemoStaff.PASSWORD.toCharArray());
        BatchQuantificationJob job = BatchQuantificationJob.of(access, analyst, demo, outcomes -> { });
        job.schedule();
        job.join();
        return access.store().results().results(analyst, demo.projectId());
    }

    @Test
    void aManagerApprovesAResultThroughTheSignatureDialogAndTheAnalystCannotApproveOwnWork() throws Exception {
        runAsAnalyst();
        Session analyst = access.store().users().logIn(DemoStaff.ANALYST, DemoStaff.PASSWORD.toCharArray());
        ResultReviewPanel own = new ResultReviewPanel(shell, SWT.NONE);
        own.open(access, analyst, demo.projectId(), SeededProject.PROJECT_CODE);
        SignatureDialog refused = own.signatureDialog(own.selected());
        refused.setBlockOnOpen(false);
        refused.open();
        refused.loginField().setText(DemoStaff.ANALYST);
        refused.passwordField().setText(DemoStaff.PASSWORD);
        press(refused.okButton());
        assertTrue(refused.message().getText().contains("you recorded this result yourself"),
                refused.message().getText());
        assertNull(refused.signature());
        Screens.save(refused.getShell(), "flow4-self-approval-refused");
        refused.close();
        own.dispose();

        Session manager = access.store().users().logIn(DemoStaff.MANAGER, DemoStaff.PASSWORD.toCharArray());
        ResultReviewPanel review = new ResultReviewPanel(shell, SWT.NONE);
        review.open(access, manager, demo.projectId(), SeededProject.PROJECT_CODE);
        shell.layout(true, true);
        shell.open();
        Result first = review.selected();
        SignatureDialog dialog = review.signatureDialog(first);
        dialog.setBlockOnOpen(false);
        dialog.open();
        dialog.meaningField().select(1);
        dialog.loginField().setText(DemoStaff.MANAGER);
        dialog.passwordField().setText(DemoStaff.PASSWORD);
        dialog.commentField().setText("fit and residual inspected");
        Screens.save(dialog.getShell(), "flow4-signature-dialog");
        press(dialog.okButton());
        assertNotNull(dialog.signature(), dialog.message() == null ? "" : "dialog stayed open");
        assertTrue(dialog.signature().manifestation().startsWith("APPROVED by Quentin Morel (" + manager.userId() + ")"),
                dialog.signature().manifestation());
        review.reload();
        TableItem row = review.table().getItem(0);
        assertTrue(row.getText(5).startsWith("APPROVED by Quentin Morel"), row.getText(5));
        assertEquals("not signed", review.table().getItem(1).getText(5));
        Screens.save(shell, "flow4-results-approved");
    }

    @Test
    void theAuditTrailShowsTheRecordsAndAnIntactChainFiltersAndExports() throws Exception {
        runAsAnalyst();
        AuditTrailPanel panel = new AuditTrailPanel(shell, SWT.NONE);
        List<Job> jobs = new ArrayList<>();
        panel.setScheduler(j -> {
            jobs.add(j);
            j.schedule();
        });
        shell.open();
        Session manager = access.store().users().logIn(DemoStaff.MANAGER, DemoStaff.PASSWORD.toCharArray());
        panel.setWorkspace(access, manager);
        Screens.waitFor(display, () -> panel.shown() != null, 30_000);
        assertTrue(panel.shown().chain().intact());
        assertTrue(panel.chainState().getText().startsWith("✔ Audit chain intact — "), panel.chainState().getText());
        int all = panel.table().getItemCount();
        assertEquals(panel.shown().chain().recordsChecked(), all, "no filter: every record is listed");
        Screens.save(shell, "flow5-audit-trail");

        panel.actionFilter().setText(AuditAction.LOGIN.name());
        panel.actionFilter().select(List.of(panel.actionFilter().getItems()).indexOf(AuditAction.LOGIN.name()));
        var previous = panel.shown();
        press(panel.refreshButton());
        Screens.waitFor(display, () -> panel.shown() != previous, 30_000);
        assertTrue(panel.table().getItemCount() > 0 && panel.table().getItemCount() < all);
        for (TableItem i : panel.table().getItems()) {
            assertEquals("LOGIN", i.getText(3));
        }
        Path csv = folder.resolve("logins.csv");
        long written = panel.exportTo(csv);
        assertEquals(panel.table().getItemCount(), written);
        List<String> lines = Files.readAllLines(csv);
        assertEquals(written + 1, lines.size());
        assertTrue(lines.get(0).startsWith("sequence,record_id,recorded_at_utc,user_id,action"), lines.get(0));

        panel.fromFilter().setText("10 March");
        press(panel.refreshButton());
        assertTrue(panel.problem().getText().startsWith("From: '10 March' is not a date"), panel.problem().getText());
        assertEquals(2, jobs.size(), "a filter that cannot be read starts no job");
    }

    @Test
    void theAuditTrailIsRefusedToTheAnalystAndNoFileIsExported() throws Exception {
        runAsAnalyst();
        Session analyst = access.store().users().logIn(DemoStaff.ANALYST, DemoStaff.PASSWORD.toCharArray());
        AuditTrailPanel panel = new AuditTrailPanel(shell, SWT.NONE);
        List<Job> jobs = new ArrayList<>();
        panel.setScheduler(j -> {
            jobs.add(j);
            j.schedule();
        });
        shell.open();
        panel.setWorkspace(access, analyst);
        Screens.waitFor(display, () -> !panel.problem().getText().isEmpty(), 30_000);
        assertTrue(panel.problem().getText().contains("may not read the audit trail"), panel.problem().getText());
        assertNull(panel.shown());
        assertEquals(0, panel.table().getItemCount());
        assertTrue(panel.refreshButton().isEnabled(), "the filter can be tried again");
        Path csv = folder.resolve("refused.csv");
        assertEquals(-1, panel.exportTo(csv));
        assertTrue(panel.problem().getText().contains("may not export the audit trail"), panel.problem().getText());
        try (var left = Files.list(folder)) {
            assertEquals(List.of(), left.filter(f -> f.getFileName().toString().contains("csv")
                    || f.getFileName().toString().endsWith(".part")).toList(), "no file, whole or in part");
        }
    }
}
