package org.tracegas.ui.parts;

import org.eclipse.jface.action.ContributionItem;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;

/**
 * The caution every window with results carries, as a coloured banner: once in the desk window's status line
 * (not in every view, where it would repeat and crowd the data), and in the dialogs shown apart from it.
 */
public final class Caution {

    /** The caution in full. */
    public static final String TEXT = "Caution: these results concern toxic gases. They need review by qualified "
            + "staff before use; compliance decisions rest with accredited practice and local regulations.";

    /** The caution in one line of a window's status line. */
    public static final String LINE = "Caution: toxic gases. Results need review by qualified staff before use;"
            + " local regulations decide.";

    /** Id of the status-line item. */
    public static final String ID = "org.tracegas.ui.caution";

    private static final Color BACKGROUND = new Color(255, 236, 179);
    private static final Color FOREGROUND = new Color(96, 56, 0);

    private Caution() {
    }

    /**
     * The banner as an item of a window's status line: {@link #LINE}, the caution in full as its tooltip. The
     * status line is one text line high, and the caution in full would be cut at the right of a window 1280 pixels
     * wide.
     */
    public static ContributionItem statusItem() {
        return new ContributionItem(ID) {
            @Override
            public void fill(Composite parent) {
                Label l = colour(new Label(parent, SWT.NONE));
                l.setText(LINE);
                l.setToolTipText(TEXT);
            }
        };
    }

    /** Adds the banner as a full-width row of a grid layout. */
    public static Label banner(Composite parent, int columns) {
        Label l = new Label(parent, SWT.WRAP);
        colour(l);
        GridData gd = new GridData(SWT.FILL, SWT.TOP, true, false, columns, 1);
        gd.widthHint = 300;
        l.setLayoutData(gd);
        return l;
    }

    private static Label colour(Label l) {
        l.setText(TEXT);
        l.setBackground(BACKGROUND);
        l.setForeground(FOREGROUND);
        return l;
    }
}
