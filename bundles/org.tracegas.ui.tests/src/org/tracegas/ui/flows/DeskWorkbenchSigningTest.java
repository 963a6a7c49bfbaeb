package org.tracegas.ui.flows;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.handlers.IHandlerService;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditRecord;
import org.tracegas.audit.Signature;
import org.tracegas.audit.SignatureMeaning;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.Project;
import org.tracegas.model.VersionKind;
import org.tracegas.store.ReviewService;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.ui.ReviewDeskLayout;
import org.tracegas.ui.Screens;
import org.tracegas.ui.dialogs.SignatureDialog;
import org.tracegas.ui.internal.ReportHandler;
import org.tracegas.ui.parts.AuditTrailPanel;
import org.tracegas.ui.parts.QaOverviewPanel;
import org.tracegas.ui.parts.ReportPanel;
import org.tracegas.ui.parts.WorkspaceNavigator;
import org.tracegas.ui.session.Desk;
import org.tracegas.ui.session.ReportApproval;
import org.tracegas.ui.views.ReportView;

/**
 * Signing a report in the started product ({@link StartedWorkbench}) on a real H2 workspace: the analyst quantified
 * the morning and recorded its QA checks; the reviewer made the report at her desk and signed it as reviewed; the
 * QA manager logs in, opens the review desk and the project, makes the report again, sees the review on this very
 * content, approves it through Analysis → Review and sign (a wrong password first, refused and recorded), and
 * reads both signatures, the verification and the refusal in the audit trail. Independent review and approval,
 * each with the password typed again at signing, follow 21 CFR 11.200(a)(1) and 11.50 (from memory).
 */
class DeskWorkbenchSigningTest {

    private static final String REVIEW_AND_SIGN = "org.tracegas.ui.commands.reviewAndSign";

    @TempDir
    Path folder;

    @Test
    void theQaManagerApprovesTheReviewedReportWithHerPasswordAndTheAuditTrailShowsTheSignatures() throws Exception {
        Path plan;
        // 6 % moisture (invented): the report states concentrations on dry gas
        try (LabDesk lab = new LabDesk(folder, 900, 500, 60_000)) {
            lab.quantifiedMorning();
            ContentVersion method = lab.access.store().versions().latest(VersionKind.METHOD).get(0);
            lab.lab.recordQaChecks(method.getId());
            plan = lab.lab.reportPlan();
            reviewedByTheReviewer(lab, method, plan);
        }
        List<Path> shots = new ArrayList<>();
        StartedWorkbench.run(folder.resolve("ws"), LimeKilnLab.QA_MANAGER, LimeKilnLab.PASSWORD,
                (display, window) -> approve(display, window, plan, shots));
        assertEquals(4, shots.size());
    }

    /** The reviewer's desk: the report made and signed as reviewed through the same panel and dialog. */
    private void reviewedByTheReviewer(LabDesk lab, ContentVersion method, Path plan) throws Exception {
        Desk.get().start(lab.access, lab.lab.reviewer);
        ReportPanel panel = new ReportPanel(lab.shell, SWT.NONE);
        lab.shell.open();
        made(lab.display, lab.access.store(), lab.lab.project, method, plan, folder.resolve("report-reviewed"));
        panel.show(Desk.get().lastReport());
        assertEquals("Needs a review and an approval on this content, each by someone who recorded none of its"
                + " results or QA checks.", panel.signatureState().getText());
        SignatureDialog dialog = panel.signatureDialog();
        dialog.setBlockOnOpen(false);
        dialog.open();
        assertEquals("Sign report", dialog.getShell().getText());
        dialog.meaningField().select(0);
        dialog.loginField().setText(LimeKilnLab.REVIEWER);
        dialog.passwordField().setText(LimeKilnLab.PASSWORD);
        dialog.commentField().setText("results, QA and dry-gas basis checked");
        press(dialog.okButton());
        assertNotNull(dialog.signature(), "the dialog signed and closed");
        assertEquals(SignatureMeaning.REVIEWED, dialog.signature().meaning());
        assertEquals(panel.approval().content().contentHash(), dialog.signature().contentSha256());
        panel.reload();
        assertEquals("Needs an approval on this content, each by someone who recorded none of its results or QA"
                + " checks.", panel.signatureState().getText());
        panel.dispose();
    }

    private static void approve(Display display, IWorkbenchWindow window, Path plan, List<Path> shots)
            throws Exception {
        Shell shell = window.getShell();
        IWorkbenchPage page = window.getActivePage();
        page.setPerspective(PlatformUI.getWorkbench().getPerspectiveRegistry()
                .findPerspectiveWithId(ReviewDeskLayout.ID));
        WorkspaceNavigator nav = StartedWorkbench.find(shell, WorkspaceNavigator.class);
        Screens.waitFor(display, () -> LabDesk.project(nav) != null, 30_000);
        assertTrue(nav.openProject(LimeKilnLab.CODE));

        ReportView view = (ReportView) page.showView(ReportView.ID);
        ReportPanel panel = view.panel();
        assertEquals(ReportPanel.NO_REPORT, panel.heading().getText());
        WorkspaceStore store = Desk.get().access().store();
        Project project = store.projects().projects(Desk.get().session()).stream()
                .filter(p -> p.getCode().equals(LimeKilnLab.CODE)).findFirst().orElseThrow();
        made(display, store, project, store.versions().latest(VersionKind.METHOD).get(0), plan,
                plan.resolveSibling("report-approved"));
        Screens.waitFor(display, () -> panel.approval() != null && panel.verified() != null, 60_000);
        // the report made again from the same stored data has the content the reviewer signed
        assertEquals(1, panel.table().getItemCount());
        assertTrue(panel.table().getItem(0).getText(1).startsWith("REVIEWED by Elin Lindqvist"),
                panel.table().getItem(0).getText(1));
        assertEquals("this content", panel.table().getItem(0).getText(0));
        assertTrue(panel.signatureState().getText().startsWith("Needs an approval on this content"),
                panel.signatureState().getText());
        assertTrue(panel.verification().getText().startsWith("Now: Verified: audit chain of "),
                panel.verification().getText());
        assertTrue(panel.heading().getText().contains("1 of 2 QA readings failed"), panel.heading().getText());
        shots.add(Screens.save(shell, "workbench-report-reviewed"));

        // Analysis → Review and sign with the report's view active: first a mistyped password, then the right one
        page.activate(view);
        List<String> refusals = new ArrayList<>();
        display.timerExec(300, new Runnable() {
            private boolean mistyped;

            @Override
            public void run() {
                Shell active = display.getActiveShell();
                if (active == null || !(active.getData() instanceof SignatureDialog dialog)) {
                    display.timerExec(100, this);
                    return;
                }
                try {
                    if (!mistyped) {
                        mistyped = true;
                        dialog.meaningField().select(1);
                        dialog.loginField().setText(LimeKilnLab.QA_MANAGER);
                        dialog.passwordField().setText("quarrymoor-pw-8");
                        press(dialog.okButton());
                        refusals.add(dialog.message().getText());
                        shots.add(Screens.save(dialog.getShell(), "workbench-report-signature-refused"));
                        dialog.passwordField().setText(LimeKilnLab.PASSWORD);
                        dialog.commentField().setText("approved for the client");
                    }
                    press(dialog.okButton());
                } catch (Exception e) {
                    refusals.add(e.toString());
                    dialog.close();
                }
            }
        });
        PlatformUI.getWorkbench().getService(IHandlerService.class).executeCommand(REVIEW_AND_SIGN, null);
        assertEquals(List.of("Signature refused: user name or password is wrong. The attempt is recorded in the audit"
                + " trail."), refusals);
        Screens.waitFor(display, () -> panel.verified() != null, 60_000);
        assertEquals(ReportApproval.COMPLETE, panel.signatureState().getText());
        assertEquals(2, panel.table().getItemCount());
        TableItem approval = panel.table().getItem(1);
        assertTrue(approval.getText(1).startsWith("APPROVED by Amara Moreau"), approval.getText(1));
        assertEquals("this content", approval.getText(0));
        // the signature is the chain's newest record and the chain with it verifies
        List<Signature> signatures = panel.signatures();
        assertTrue(panel.verified().intact(), panel.verification().getText());
        assertEquals(signatures.get(1).sequence(), panel.verified().head().sequence());
        shots.add(Screens.save(shell, "workbench-report-approved"));
        // the QA checks view beside it, filled when the project was opened: its rows are painted, not only present
        QaOverviewPanel qa = StartedWorkbench.find(shell, QaOverviewPanel.class);
        Screens.waitFor(display, () -> qa.table().getItemCount() == 2, 30_000);
        int colours = DeskWorkbenchTest.coloursOnScreen(display, qa.table(), new org.eclipse.swt.graphics.Rectangle(0,
                0, qa.table().getClientArea().width, qa.table().getItemHeight()));
        assertTrue(colours > 20, "the first row of the QA checks is painted: " + colours + " colours on screen");

        // the audit trail of the review desk, filtered to reports: the review, the refused attempt, the approval
        AuditTrailPanel audit = StartedWorkbench.find(shell, AuditTrailPanel.class);
        Screens.waitFor(display, () -> audit.shown() != null, 30_000);
        audit.objectFilter().setText(ReviewService.OBJECT_TYPE);
        var before = audit.shown();
        press(audit.refreshButton());
        Screens.waitFor(display, () -> audit.shown() != before, 30_000);
        List<AuditRecord> records = audit.shown().records();
        assertEquals(List.of(AuditAction.SIGNATURE, AuditAction.REFUSED, AuditAction.SIGNATURE),
                records.stream().map(AuditRecord::action).toList());
        assertEquals(List.of(SignatureMeaning.REVIEWED, SignatureMeaning.APPROVED), records.stream()
                .filter(r -> r.action() == AuditAction.SIGNATURE).map(AuditRecord::meaning).toList());
        assertTrue(audit.shown().chain().intact(), audit.shown().chain().findings().toString());
        assertEquals(3, audit.table().getItemCount());
        // the review desk at 1280×800: the report and the trail lie inside their views
        assertEquals(new org.eclipse.swt.graphics.Point(1280, 800), shell.getSize());
        StartedWorkbench.assertInside(panel);
        StartedWorkbench.assertInside(audit);
        shots.add(Screens.save(shell, "workbench-audit-trail-signatures"));
    }

    /** Makes the report through the desk's report job and waits for it; the desk is told of it. */
    private static void made(Display display, WorkspaceStore store, Project project, ContentVersion method,
            Path plan, Path out) throws Exception {
        List<String> closing = new ArrayList<>();
        var job = ReportHandler.schedule(ReportHandler.request(store, project, method, plan, out), display,
                closing::add);
        Screens.waitFor(display, () -> !closing.isEmpty(), 120_000);
        assertNotNull(job.outcome(), closing.get(0));
        assertEquals(job, Desk.get().lastReport());
    }

    private static void press(Button b) {
        b.notifyListeners(SWT.Selection, new Event());
    }
}
