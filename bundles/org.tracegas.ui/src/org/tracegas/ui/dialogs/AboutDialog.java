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
import org.tracegas.ui.parts.Caution;

/** Product name, purpose and the caution. */
public final class AboutDialog extends Dialog {

    public AboutDialog(Shell parent) {
        super(parent);
    }

    @Override
    protected void configureShell(Shell shell) {
        super.configureShell(shell);
        shell.setText("About Tracegas Workbench");
    }

    @Override
    protected Control createDialogArea(Composite parent) {
        Composite area = (Composite) super.createDialogArea(parent);
        area.setLayout(new GridLayout(1, false));
        Label name = new Label(area, SWT.NONE);
        name.setText("Tracegas Workbench");
        Label purpose = new Label(area, SWT.WRAP);
        purpose.setText("Extractive FTIR gas analysis: absorbance spectra, multi-component quantification against "
                + "reference spectra, quality checks and an audit trail. Licensed under the EPL-2.0.");
        GridData gd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        gd.widthHint = 460;
        purpose.setLayoutData(gd);
        Caution.banner(area, 1);
        return area;
    }

    @Override
    protected void createButtonsForButtonBar(Composite parent) {
        createButton(parent, IDialogConstants.OK_ID, IDialogConstants.CLOSE_LABEL, true);
    }
}
