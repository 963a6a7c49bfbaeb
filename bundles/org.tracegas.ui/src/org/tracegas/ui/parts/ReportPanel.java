package org.tracegas.ui.parts;

import java.util.List;

import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.ScrolledComposite;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.tracegas.audit.Signature;
import org.tracegas.report.ReportContent;
import org.tracegas.store.StoreException;
import org.tracegas.store.WorkspaceVerification;
import org.tracegas.ui.dialogs.SignatureDialog;
import org.tracegas.ui.jobs.CampaignReportJob;
import org.tracegas.ui.session.ReportApproval;

/**
 * The report the desk made last, to review and sign: its id, files and content hash, the verification it was made
 * under, its signatures each marked whether it covers this content, what signing it still needs, and the audit
 * chain verified again after each signature. Review and sign opens the signature dialog on it.
 */
public final class ReportPanel extends Composite {

    /** The heading while no report was made. */
    public static final String NO_REPORT = "No report made yet: select a project and choose Analysis → Report….";

    private final ScrolledComposite scrolled;
    private final Label heading;
    private final Button sign;
    private final Label hash;
    private final Label signatureState;
    private final Label verification;
    private final Table table;
    private ReportApproval approval;
    private List<Signature> signatures = List.of();
    private volatile WorkspaceVerification verified;

    public ReportPanel(Composite parent, int style) {
        super(parent, style);
        setLayout(new FillLayout());
        // a small view scrolls the report's details instead of clipping them
        scrolled = new ScrolledComposite(this, SWT.V_SCROLL);
        scrolled.setExpandHorizontal(true);
        scrolled.setExpandVertical(true);
        Composite body = new Composite(scrolled, SWT.NONE);
        scrolled.setContent(body);
        scrolled.addListener(SWT.Resize, e -> refit());
        body.setLayout(new GridLayout(2, false));
        heading = new Label(body, SWT.WRAP);
        heading.setLayoutData(wrapping(1));
        heading.setText(NO_REPORT);
        sign = new Button(body, SWT.PUSH);
        sign.setText("Review and sign…");
        sign.setLayoutData(new GridData(SWT.END, SWT.TOP, false, false));
        sign.addListener(SWT.Selection, e -> reviewAndSign());
        sign.setEnabled(false);
        // what signing still needs and the signatures first: the details below may scroll out of a small view
        signatureState = new Label(body, SWT.WRAP);
        signatureState.setLayoutData(wrapping(2));
        table = new Table(body, SWT.BORDER | SWT.FULL_SELECTION);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        table.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, false, 2, 1));
        // what a signature covers first: the manifestation is long and may run past a narrow view's edge
        for (String c : new String[] {"Given on", "Signature", "Audit record"}) {
            new TableColumn(table, SWT.NONE).setText(c);
        }
        verification = new Label(body, SWT.WRAP);
        verification.setLayoutData(wrapping(2));
        hash = new Label(body, SWT.WRAP);
        hash.setLayoutData(wrapping(2));
    }

    private static GridData wrapping(int columns) {
        GridData gd = new GridData(SWT.FILL, SWT.TOP, true, false, columns, 1);
        gd.widthHint = 200; // wraps in a narrow view instead of clipping
        return gd;
    }

    /** Shows a report the desk wrote ({@link CampaignReportJob#outcome()} set) with its signatures. */
    public void show(CampaignReportJob job) {
        CampaignReportJob.Outcome outcome = job.outcome();
        ReportContent content = outcome.content();
        approval = new ReportApproval(job.request(), content);
        heading.setText("Report " + content.campaign().reportId() + " of " + job.request().project().getCode() + " — "
                + job.request().method().method().name() + " version " + job.request().version().getNumber()
                + (outcome.failedQa() == 0 ? "; every QA reading passed." : "; " + outcome.failedQa() + " of "
                        + content.qa().size() + " QA readings failed, as its first page says."));
        hash.setText("Content hash (SHA-256), what a signature is given on: " + content.contentHash()
                + content.auditAnchor().map(a -> "; audit anchor printed on it: #" + a.sequence() + " "
                        + a.hash().substring(0, 16) + "…").orElse("") + "; written to " + outcome.files().pdf());
        sign.setEnabled(true);
        reload();
    }

    /** Reads the report's signatures again and verifies the audit chain again in the background. */
    public void reload() {
        String state;
        try {
            signatures = approval.signatures();
            state = approval.state(signatures);
        } catch (StoreException e) {
            signatures = List.of();
            state = "Signatures unreadable: " + e.getMessage();
        }
        signatureState.setText(state);
        signatureState.setBackground(state.equals(ReportApproval.COMPLETE) ? Palette.PASS : null);
        table.removeAll();
        for (Signature s : signatures) {
            TableItem item = new TableItem(table, SWT.NONE);
            boolean current = approval.onThisContent(s);
            item.setText(new String[] {current ? "this content"
                    : "earlier content " + s.contentSha256().substring(0, 16) + "…, not this one", s.manifestation(),
                    "#" + s.sequence()});
            item.setBackground(current ? Palette.PASS : Palette.CHANGED);
        }
        for (TableColumn c : table.getColumns()) {
            c.pack();
        }
        // room for every signature, at least a review and an approval; the view scrolls when it is short
        ((GridData) table.getLayoutData()).heightHint = table.getHeaderHeight()
                + Math.max(2, signatures.size()) * table.getItemHeight() + 2 * table.getBorderWidth();
        verified = null;
        verification.setText("Verifying the audit chain and the data bound to it…");
        verification.setForeground(null);
        ReportApproval checking = approval;
        Job.create("Verifying the audit chain of report " + approval.content().campaign().reportId(), monitor -> {
            WorkspaceVerification v = null;
            String failure = null;
            try {
                v = checking.verifyNow();
            } catch (StoreException e) {
                failure = e.getMessage();
            }
            WorkspaceVerification done = v;
            String problem = failure;
            if (!isDisposed()) {
                getDisplay().asyncExec(() -> verifiedNow(checking, done, problem));
            }
            // the panel shows a failure; the job ends quietly instead of raising a second dialog
            return Status.OK_STATUS;
        }).schedule();
        refit();
    }

    /** Lays the report out again at the view's width, with room to scroll down to all of it. */
    private void refit() {
        Composite body = (Composite) scrolled.getContent();
        scrolled.setMinSize(body.computeSize(scrolled.getClientArea().width, SWT.DEFAULT));
        body.layout(true, true);
    }

    /** Shows the verification, or why there is none ({@code v} null, {@code problem} the reason). */
    private void verifiedNow(ReportApproval checked, WorkspaceVerification v, String problem) {
        if (isDisposed() || checked != approval) {
            return;
        }
        verified = v;
        verification.setText(v == null ? "Not verified now: " + problem : "Now: " + v.statement());
        verification.setForeground(v != null && v.intact() ? Palette.INTACT : Palette.BROKEN);
        refit();
    }

    /** Opens the signature dialog on the report shown and shows the new signature; nothing shown, nothing opens. */
    public void reviewAndSign() {
        if (approval != null && signatureDialog().open() == SignatureDialog.OK) {
            reload();
        }
    }

    /** A signature dialog for the report shown, in the desk's session. */
    public SignatureDialog signatureDialog() {
        return new SignatureDialog(getShell(), new SignatureDialog.Subject("report", approval.description(),
                approval.printedName(), "you recorded results or QA checks of this report yourself", approval::sign));
    }

    /** The report shown with its signing, or null. */
    public ReportApproval approval() {
        return approval;
    }

    /** The signatures shown. */
    public List<Signature> signatures() {
        return signatures;
    }

    /** The verification after the last signature or showing, or null while it runs. */
    public WorkspaceVerification verified() {
        return verified;
    }

    public Label heading() {
        return heading;
    }

    public Label signatureState() {
        return signatureState;
    }

    public Label verification() {
        return verification;
    }

    public Table table() {
        return table;
    }

    public Button signButton() {
        return sign;
    }
}
