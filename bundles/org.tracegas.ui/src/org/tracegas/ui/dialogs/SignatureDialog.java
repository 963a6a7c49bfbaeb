package org.tracegas.ui.dialogs;

import java.util.Locale;

import org.eclipse.jface.dialogs.Dialog;
import org.eclipse.jface.dialogs.IDialogConstants;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Text;
import org.tracegas.audit.Signature;
import org.tracegas.audit.SignatureMeaning;
import org.tracegas.audit.SignatureRefusedException;
import org.tracegas.model.Result;
import org.tracegas.store.Session;
import org.tracegas.store.StoreException;
import org.tracegas.ui.session.ResultApproval;

/**
 * Signs one stored result or one report: shows what is signed and the signer's printed name, asks for the
 * meaning, the user name and the password again. A refusal is explained in the dialog (it is also in the audit
 * trail).
 */
public final class SignatureDialog extends Dialog {

    /** Gives the signature in the desk's session from what was typed in the dialog. */
    @FunctionalInterface
    public interface Signer {

        /**
         * @param typedLogin the login typed at signing; must be the session's own
         * @param password   typed at signing; cleared afterwards
         * @throws SignatureRefusedException wrong password, own work, or another user's login (the refusal is in
         *                                   the audit trail)
         */
        Signature sign(String typedLogin, char[] password, SignatureMeaning meaning, String comment)
                throws SignatureRefusedException;
    }

    /**
     * What the dialog signs, and how.
     *
     * @param kind        what is signed, in a word of the dialog's title: "result", "report"
     * @param description what is signed, as the dialog's first row shows it
     * @param printedName the signer's printed name, shown with the signature
     * @param ownWork     why the store refuses the signer's own work, completing "Signature refused: "
     * @param signer      gives the signature from what was typed
     */
    public record Subject(String kind, String description, String printedName, String ownWork, Signer signer) {
    }

    private final Subject subject;
    private Combo meaning;
    private Text login;
    private Text password;
    private Text comment;
    private Label message;
    private Signature signature;

    /** Signs a stored result in the session's name. */
    public SignatureDialog(Shell parent, ResultApproval approval, Session session, Result result) {
        this(parent, new Subject("result", String.format(Locale.ROOT, "%s %.4g %s (± %.2g), recorded by %s",
                result.getCompound(), result.getConcentration(), result.getUnit(), result.getStandardUncertainty(),
                approval.loginOf(result.getRecordedBy())), approval.printedName(session),
                "you recorded this result yourself",
                (login, password, meaning, comment) -> approval.sign(session, result, login, password, meaning,
                        comment)));
    }

    public SignatureDialog(Shell parent, Subject subject) {
        super(parent);
        this.subject = subject;
    }

    @Override
    protected void configureShell(Shell shell) {
        super.configureShell(shell);
        shell.setText("Sign " + subject.kind());
    }

    @Override
    protected Control createDialogArea(Composite parent) {
        Composite area = (Composite) super.createDialogArea(parent);
        area.setLayout(new GridLayout(2, false));
        row(area, Character.toUpperCase(subject.kind().charAt(0)) + subject.kind().substring(1),
                subject.description());
        row(area, "Printed name", subject.printedName());
        new Label(area, SWT.NONE).setText("Meaning");
        meaning = new Combo(area, SWT.READ_ONLY);
        meaning.setItems(SignatureMeaning.REVIEWED.name(), SignatureMeaning.APPROVED.name());
        meaning.select(1);
        new Label(area, SWT.NONE).setText("User name");
        login = new Text(area, SWT.BORDER);
        login.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        new Label(area, SWT.NONE).setText("Password");
        password = new Text(area, SWT.BORDER | SWT.PASSWORD);
        password.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        new Label(area, SWT.NONE).setText("Comment");
        comment = new Text(area, SWT.BORDER);
        comment.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        Label statement = new Label(area, SWT.WRAP);
        statement.setText("Your electronic signature binds you as a handwritten one would. It is stored with "
                + "the date, time, meaning and the exact values signed.");
        GridData sd = new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1);
        sd.widthHint = 460;
        statement.setLayoutData(sd);
        message = new Label(area, SWT.WRAP);
        message.setForeground(area.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
        GridData md = new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1);
        md.widthHint = 460;
        // room for the longest refusal, so the dialog need not grow when one is shown
        md.heightHint = 3 * message.computeSize(SWT.DEFAULT, SWT.DEFAULT).y + 4;
        message.setLayoutData(md);
        return area;
    }

    private static void row(Composite area, String label, String value) {
        new Label(area, SWT.NONE).setText(label);
        Label v = new Label(area, SWT.NONE);
        v.setText(value);
    }

    @Override
    protected void createButtonsForButtonBar(Composite parent) {
        createButton(parent, IDialogConstants.OK_ID, "Sign", true);
        createButton(parent, IDialogConstants.CANCEL_ID, IDialogConstants.CANCEL_LABEL, false);
    }

    @Override
    protected void okPressed() {
        try {
            signature = subject.signer().sign(login.getText().trim(), password.getText().toCharArray(),
                    SignatureMeaning.valueOf(meaning.getText()), comment.getText());
        } catch (SignatureRefusedException e) {
            message.setText(refusal(e.reason(), subject));
            password.setText("");
            return;
        } catch (StoreException e) {
            message.setText("The signature could not be stored: " + e.getMessage());
            return;
        }
        super.okPressed();
    }

    /** The text shown for a refusal of signing the subject. */
    public static String refusal(SignatureRefusedException.Reason reason, Subject subject) {
        return switch (reason) {
            case OWN_WORK -> "Signature refused: " + subject.ownWork() + ". Review and approval must come "
                    + "from someone else. The attempt is recorded in the audit trail.";
            case WRONG_CREDENTIALS -> "Signature refused: user name or password is wrong. The attempt is recorded "
                    + "in the audit trail.";
            case NOT_SESSION_USER -> "Signature refused: only the user logged in at this desk can sign here. "
                    + "The attempt is recorded in the audit trail.";
        };
    }

    /** The stored signature after signing, else null. */
    public Signature signature() {
        return signature;
    }

    public Combo meaningField() {
        return meaning;
    }

    public Text loginField() {
        return login;
    }

    public Text passwordField() {
        return password;
    }

    public Text commentField() {
        return comment;
    }

    public Label message() {
        return message;
    }

    /** The button that logs in or signs. */
    public org.eclipse.swt.widgets.Button okButton() {
        return getButton(IDialogConstants.OK_ID);
    }
}
