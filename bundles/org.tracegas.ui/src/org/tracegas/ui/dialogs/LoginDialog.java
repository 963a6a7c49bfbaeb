package org.tracegas.ui.dialogs;

import org.eclipse.jface.dialogs.Dialog;
import org.eclipse.jface.dialogs.IDialogConstants;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Text;
import org.tracegas.store.LoginFailedException;
import org.tracegas.store.Session;
import org.tracegas.store.UserService;
import org.tracegas.ui.parts.Caution;

/** Log-in to a workspace. A refused log-in keeps the dialog open with the reason shown. */
public final class LoginDialog extends Dialog {

    private final UserService users;
    private final String workspace;
    private Text login;
    private Text password;
    private Label message;
    private Session session;

    /** @param workspace which workspace the log-in is for, e.g. "local workspace in /data/ws", shown to the user */
    public LoginDialog(Shell parent, UserService users, String workspace) {
        super(parent);
        this.users = users;
        this.workspace = workspace;
    }

    @Override
    protected void configureShell(Shell shell) {
        super.configureShell(shell);
        shell.setText("Tracegas Workbench — log in");
    }

    @Override
    protected Control createDialogArea(Composite parent) {
        Composite area = (Composite) super.createDialogArea(parent);
        area.setLayout(new GridLayout(2, false));
        Label where = new Label(area, SWT.NONE);
        where.setText("Connecting to " + workspace);
        where.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1));
        new Label(area, SWT.NONE).setText("User name");
        login = new Text(area, SWT.BORDER);
        login.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        new Label(area, SWT.NONE).setText("Password");
        password = new Text(area, SWT.BORDER | SWT.PASSWORD);
        password.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        message = new Label(area, SWT.WRAP);
        message.setForeground(area.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
        GridData md = new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1);
        md.widthHint = 420;
        message.setLayoutData(md);
        Caution.banner(area, 2);
        return area;
    }

    @Override
    protected void createButtonsForButtonBar(Composite parent) {
        createButton(parent, IDialogConstants.OK_ID, "Log in", true);
        createButton(parent, IDialogConstants.CANCEL_ID, IDialogConstants.CANCEL_LABEL, false);
    }

    @Override
    protected void okPressed() {
        char[] typed = password.getText().toCharArray();
        try {
            session = users.logIn(login.getText().trim(), typed);
        } catch (LoginFailedException e) {
            message.setText(e.locked() ? "Log-in refused: the account is locked after repeated failures. "
                    + "An administrator can unlock it." : "Log-in refused: user name or password is wrong.");
            password.setText("");
            password.setFocus();
            return;
        } finally {
            java.util.Arrays.fill(typed, '\0');
        }
        super.okPressed();
    }

    /** The session after a successful log-in, else null. */
    public Session session() {
        return session;
    }

    public Text loginField() {
        return login;
    }

    public Text passwordField() {
        return password;
    }

    public Label message() {
        return message;
    }

    /** The button that logs in or signs. */
    public org.eclipse.swt.widgets.Button okButton() {
        return getButton(IDialogConstants.OK_ID);
    }
}
