package org.tracegas.ui.parts;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.util.function.Consumer;

import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Font;
import org.eclipse.swt.graphics.FontData;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;
import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditQuery;
import org.tracegas.audit.AuditRecord;
import org.tracegas.audit.AuditReview;
import org.tracegas.audit.VerificationReport;
import org.tracegas.store.Session;
import org.tracegas.store.StoreException;
import org.tracegas.ui.jobs.ChainVerificationJob;
import org.tracegas.ui.session.WorkspaceAccess;

/**
 * The audit trail: filters by user, object, period and action; the matching records; and, above them in
 * large type, whether the hash chain of the whole trail verified. Reading and verifying run as a background
 * job; the CSV export writes the filtered records.
 */
public final class AuditTrailPanel extends Composite {

    private static final DateTimeFormatter SHOWN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss")
            .withZone(ZoneOffset.UTC);
    private static final String ALL = "(all)";
    /** The width filters ask for: they fill what the view gives them but do not widen it past its edge. */
    private static final int NARROW = 70;

    private final Label chainState;
    private final Text user;
    private final Combo objectType;
    private final Text objectId;
    private final Text from;
    private final Text to;
    private final Combo action;
    private final Label problem;
    private final Button refresh;
    private final Button export;
    private final Table table;
    private final Font large;
    private WorkspaceAccess access;
    private Session reader;
    private AuditReview.Result shown;
    private Consumer<Job> scheduler = Job::schedule;
    private final java.util.Map<String, String> logins = new java.util.HashMap<>();

    public AuditTrailPanel(Composite parent, int style) {
        super(parent, style);
        // the filters in two rows, so that the records keep the room in a view a third of the window high
        setLayout(new GridLayout(8, false));
        chainState = new Label(this, SWT.WRAP);
        FontData fd = chainState.getFont().getFontData()[0];
        large = new Font(getDisplay(), fd.getName(), fd.getHeight() + 3, SWT.BOLD);
        addDisposeListener(e -> large.dispose());
        chainState.setFont(large);
        GridData cd = new GridData(SWT.FILL, SWT.TOP, true, false, 8, 1);
        cd.widthHint = NARROW; // wraps in a narrow view instead of clipping
        chainState.setLayoutData(cd);
        chainState.setText("Chain not verified yet.");
        user = text("User id");
        objectType = combo("Object", true, ALL, "result", "report", "user", "project", "measurement",
                "spectral-data", "version");
        objectId = text("Object id");
        String[] actions = new String[AuditAction.values().length + 1];
        actions[0] = ALL;
        for (int i = 0; i < AuditAction.values().length; i++) {
            actions[i + 1] = AuditAction.values()[i].name();
        }
        action = combo("Action", false, actions);
        from = text("From");
        from.setMessage("UTC date");
        to = text("Until");
        to.setMessage("UTC date, exclusive");
        problem = new Label(this, SWT.WRAP);
        problem.setForeground(getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
        GridData pd = new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1);
        pd.widthHint = NARROW;
        problem.setLayoutData(pd);
        refresh = new Button(this, SWT.PUSH);
        refresh.setText("Filter and verify");
        refresh.addListener(SWT.Selection, e -> refresh());
        export = new Button(this, SWT.PUSH);
        export.setText("Export CSV…");
        export.addListener(SWT.Selection, e -> {
            FileDialog d = new FileDialog(getShell(), SWT.SAVE);
            d.setFilterExtensions(new String[] {"*.csv"});
            d.setFileName("audit-trail.csv");
            String f = d.open();
            if (f != null) {
                exportTo(Path.of(f));
            }
        });
        table = new Table(this, SWT.BORDER | SWT.FULL_SELECTION);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        table.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true, 8, 1));
        for (String c : new String[] {"#", "Time (UTC)", "User", "Action", "Object", "Ver.", "Details"}) {
            new TableColumn(table, SWT.NONE).setText(c);
        }
    }

    /** Names a problem beside the buttons (wrapped there) or clears it. */
    private void problem(String text) {
        problem.setText(text);
        layout(true);
    }

    private Text text(String label) {
        new Label(this, SWT.NONE).setText(label);
        Text t = new Text(this, SWT.BORDER);
        GridData gd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        gd.widthHint = NARROW;
        t.setLayoutData(gd);
        return t;
    }

    private Combo combo(String label, boolean editable, String... items) {
        new Label(this, SWT.NONE).setText(label);
        Combo c = new Combo(this, editable ? SWT.DROP_DOWN : SWT.READ_ONLY);
        c.setItems(items);
        c.select(0);
        GridData gd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        gd.widthHint = NARROW;
        c.setLayoutData(gd);
        return c;
    }

    /**
     * Connects the panel to a workspace and reads the trail as {@code reader} (the store lets reviewers, quality
     * managers and administrators read it; others see the refusal).
     */
    public void setWorkspace(WorkspaceAccess access, Session reader) {
        this.access = access;
        this.reader = reader;
        refresh();
    }

    /** How jobs are started (tests keep hold of the job to wait for it). */
    public void setScheduler(Consumer<Job> scheduler) {
        this.scheduler = scheduler;
    }

    /** Reads the filtered records and verifies the chain in a background job. */
    public void refresh() {
        AuditQuery q;
        try {
            q = query();
        } catch (IllegalArgumentException e) {
            problem(e.getMessage());
            return;
        }
        problem("");
        refresh.setEnabled(false);
        chainState.setText("Verifying the chain…");
        chainState.setForeground(getDisplay().getSystemColor(SWT.COLOR_DARK_GRAY));
        scheduler.accept(new ChainVerificationJob(access.store(), reader, q, result -> getDisplay().asyncExec(() -> {
            if (!isDisposed()) {
                show(result);
            }
        }), message -> getDisplay().asyncExec(() -> {
            if (!isDisposed()) {
                failed(message);
            }
        })));
    }

    /**
     * The filter as typed.
     *
     * @throws IllegalArgumentException naming the filter field that cannot be read
     */
    public AuditQuery query() {
        AuditQuery.Builder b = AuditQuery.all();
        if (!user.getText().isBlank()) {
            b.user(user.getText().trim());
        }
        String type = objectType.getText().trim();
        String id = objectId.getText().trim();
        if (!id.isEmpty() && (type.isEmpty() || ALL.equals(type))) {
            throw new IllegalArgumentException("Object id: choose the object kind as well");
        }
        if (!type.isEmpty() && !ALL.equals(type)) {
            b.object(type, id.isEmpty() ? null : id);
        }
        b.between(day("From", from.getText()), day("Until", to.getText()));
        if (action.getSelectionIndex() > 0) {
            b.actions(AuditAction.valueOf(action.getText()));
        }
        try {
            return b.build();
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("Period: " + e.getMessage(), e);
        }
    }

    private static Instant day(String field, String text) {
        if (text.isBlank()) {
            return null;
        }
        try {
            return LocalDate.parse(text.trim()).atStartOfDay(ZoneOffset.UTC).toInstant();
        } catch (DateTimeParseException e) {
            throw new IllegalArgumentException(field + ": '" + text.trim() + "' is not a date like 2026-03-10", e);
        }
    }

    private void show(AuditReview.Result result) {
        shown = result;
        refresh.setEnabled(true);
        VerificationReport chain = result.chain();
        if (chain.intact()) {
            chainState.setText("✔ Audit chain intact — " + chain.recordsChecked() + " records verified, head #"
                    + chain.headSequence() + " " + abbreviate(chain.headHash()));
            chainState.setForeground(Palette.INTACT);
        } else {
            chainState.setText("✖ AUDIT CHAIN BROKEN — " + chain.findings().size()
                    + (chain.truncated() ? "+" : "") + " findings; first: " + chain.findings().get(0));
            chainState.setForeground(Palette.BROKEN);
        }
        table.removeAll();
        for (AuditRecord r : result.records()) {
            TableItem item = new TableItem(table, SWT.NONE);
            item.setText(new String[] {Long.toString(r.sequence()), SHOWN.format(r.recordedAt()), userName(r.userId()),
                    r.action().name(), r.objectType() + " " + abbreviate(r.objectId()),
                    Long.toString(r.objectVersion()), details(r)});
            if (r.action() == AuditAction.REFUSED) {
                item.setBackground(Palette.FAIL);
            } else if (r.action() == AuditAction.SIGNATURE) {
                item.setBackground(Palette.PASS);
            }
        }
        for (TableColumn c : table.getColumns()) {
            c.pack();
        }
        layout(true);
        FreshTableSize.give(table);
    }


    private void failed(String message) {
        refresh.setEnabled(true);
        chainState.setText("Chain not verified.");
        chainState.setForeground(getDisplay().getSystemColor(SWT.COLOR_DARK_GRAY));
        problem("The audit trail could not be read: " + message);
        table.removeAll();
        layout(true);
    }

    private static String details(AuditRecord r) {
        if (r.meaning() != null) {
            return r.meaning() + " by " + r.signerName() + (r.reason() == null ? "" : " — " + r.reason());
        }
        String v = r.newValue() == null ? (r.reason() == null ? "" : r.reason()) : r.newValue();
        v = v.replace('\n', ';').replace(";", "; ").strip();
        return v.length() > 110 ? v.substring(0, 110) + "…" : v;
    }

    /** The login of a user id; records of refused log-ins carry the typed name, shown as it is. */
    private String userName(String userId) {
        return logins.computeIfAbsent(userId, id -> {
            try {
                return access.store().users().user(id).getLogin();
            } catch (org.tracegas.store.NoSuchObjectException e) {
                return id;
            }
        });
    }

    private static String abbreviate(String id) {
        return id == null || id.length() <= 12 ? String.valueOf(id) : id.substring(0, 8) + "…";
    }

    /**
     * Writes the records matching the filter as CSV. The file appears only when complete: the records go to a
     * file beside it first, which is then moved into place.
     *
     * @return records written, or -1 when the filter, the store or the file refused (the reason is shown)
     */
    public long exportTo(Path file) {
        Path part = null;
        try {
            AuditQuery q = query();
            part = Files.createTempFile(file.toAbsolutePath().getParent(), ".audit-trail-", ".part");
            long written;
            try (Writer w = Files.newBufferedWriter(part, StandardCharsets.UTF_8)) {
                written = access.store().audit().exportCsv(reader, q, w);
            }
            Files.move(part, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            return written;
        } catch (IOException | StoreException | IllegalArgumentException e) {
            problem("Export to " + file + " failed: " + e.getMessage());
            return -1;
        } finally {
            deleteQuietly(part);
        }
    }

    private void deleteQuietly(Path part) {
        if (part == null) {
            return;
        }
        try {
            Files.deleteIfExists(part);
        } catch (IOException e) {
            problem(problem.getText() + " (" + part + " could not be removed: " + e.getMessage() + ")");
        }
    }

    public AuditReview.Result shown() {
        return shown;
    }

    public Label chainState() {
        return chainState;
    }

    public Table table() {
        return table;
    }

    public Text userFilter() {
        return user;
    }

    public Combo objectFilter() {
        return objectType;
    }

    public Combo actionFilter() {
        return action;
    }

    public Text fromFilter() {
        return from;
    }

    public Label problem() {
        return problem;
    }

    public Button refreshButton() {
        return refresh;
    }
}
