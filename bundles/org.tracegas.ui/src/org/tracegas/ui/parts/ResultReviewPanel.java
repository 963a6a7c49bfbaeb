package org.tracegas.ui.parts;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.tracegas.model.Result;
import org.tracegas.store.Session;
import org.tracegas.store.StoreException;
import org.tracegas.ui.dialogs.SignatureDialog;
import org.tracegas.ui.session.ResultApproval;
import org.tracegas.ui.session.WorkspaceAccess;

/** A project's results with the signatures given on each; the selected result can be reviewed and signed. */
public final class ResultReviewPanel extends Composite {

    private static final DateTimeFormatter SHOWN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss")
            .withZone(ZoneOffset.UTC);

    /** The heading while no project is open. */
    public static final String NO_PROJECT = "No project open: select a project in the workspace tree.";

    private final Label heading;
    private final Table table;
    private final Button sign;
    private WorkspaceAccess access;
    private ResultApproval approval;
    private Session session;
    private String projectId;
    private List<Result> results = List.of();

    public ResultReviewPanel(Composite parent, int style) {
        super(parent, style);
        setLayout(new GridLayout(2, false));
        heading = new Label(this, SWT.WRAP);
        GridData hd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        hd.widthHint = 200; // wraps in a narrow view instead of clipping
        heading.setLayoutData(hd);
        heading.setText(NO_PROJECT);
        sign = new Button(this, SWT.PUSH);
        sign.setText("Review and sign…");
        sign.addListener(SWT.Selection, e -> reviewSelected());
        table = new Table(this, SWT.BORDER | SWT.FULL_SELECTION);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        table.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true, 2, 1));
        for (String c : new String[] {"Compound", "Concentration", "± u", "Recorded (UTC)", "Recorded by",
                "Signatures"}) {
            new TableColumn(table, SWT.NONE).setText(c);
        }
    }

    public void open(WorkspaceAccess access, Session session, String projectId, String projectLabel) {
        this.access = access;
        this.approval = new ResultApproval(access);
        this.session = session;
        this.projectId = projectId;
        heading.setText("Results of " + projectLabel + " — signed in as " + session.login());
        reload();
    }

    /** Reads the results and their signatures again. */
    public void reload() {
        results = access.store().results().results(session, projectId);
        table.removeAll();
        for (Result r : results) {
            TableItem item = new TableItem(table, SWT.NONE);
            String signatures;
            try {
                signatures = approval.signatureSummary(session, r.getId());
            } catch (StoreException e) {
                signatures = "signatures unreadable: " + e.getMessage();
            }
            item.setText(new String[] {r.getCompound(),
                    String.format(Locale.ROOT, "%.4g %s", r.getConcentration(), r.getUnit()),
                    String.format(Locale.ROOT, "%.2g", r.getStandardUncertainty()), SHOWN.format(r.getRecorded()),
                    approval.loginOf(r.getRecordedBy()), signatures});
            if (!"not signed".equals(signatures)) {
                item.setBackground(Palette.PASS);
            }
        }
        for (TableColumn c : table.getColumns()) {
            c.pack();
        }
        if (!results.isEmpty() && table.getSelectionIndex() < 0) {
            table.select(0);
        }
        layout(true);
    }

    /**
     * Opens the signature dialog on the selected result and shows the new signature; without a project or a
     * selected result, says in the heading what is missing (a command that does nothing leaves the reviewer
     * guessing).
     */
    public void reviewSelected() {
        Result r = selected();
        if (r == null) {
            heading.setText(access == null ? NO_PROJECT : "Select a result in the table to review and sign it.");
        } else if (signatureDialog(r).open() == SignatureDialog.OK) {
            reload();
        }
    }

    /** The selected result, or null. */
    public Result selected() {
        int i = table.getSelectionIndex();
        return i < 0 ? null : results.get(i);
    }

    /** A signature dialog for a result, in this panel's session. */
    public SignatureDialog signatureDialog(Result r) {
        return new SignatureDialog(getShell(), approval, session, r);
    }

    public Label heading() {
        return heading;
    }

    public Button signButton() {
        return sign;
    }

    public Table table() {
        return table;
    }

    public List<Result> results() {
        return results;
    }
}
