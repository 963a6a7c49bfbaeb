package org.tracegas.ui.parts;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;

/** The caution every screen with results carries, as a coloured banner. */
public final class Caution {

    /** The caution in full. */
    public static final String TEXT = "Caution: these results concern toxic gases. They need review by qualified "
            + "staff before use; compliance decisions rest with accredited practice and local regulations.";

    private Caution() {
    }

    /** Adds the banner as a full-width row of a grid layout. */
    public static Label banner(Composite parent, int columns) {
        Label l = new Label(parent, SWT.WRAP);
        l.setText(TEXT);
        l.setBackground(new Color(255, 236, 179));
        l.setForeground(new Color(96, 56, 0));
        GridData gd = new GridData(SWT.FILL, SWT.TOP, true, false, columns, 1);
        gd.widthHint = 300;
        l.setLayoutData(gd);
        return l;
    }
}
