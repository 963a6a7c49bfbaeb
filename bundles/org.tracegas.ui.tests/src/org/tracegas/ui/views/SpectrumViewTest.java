package org.tracegas.ui.views;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;

import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swtchart.Chart;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

class SpectrumViewTest {

    private Display display;
    private Shell shell;

    @BeforeEach
    void openShell() {
        display = Display.getDefault();
        shell = new Shell(display);
    }

    @AfterEach
    void closeShell() {
        shell.dispose();
    }

    @Test
    void viewShowsTheCautionAboveAnAbsorbanceChart() {
        new SpectrumView().createPartControl(shell);
        Control[] children = shell.getChildren();
        assertEquals(2, children.length, Arrays.toString(children));
        assertTrue(((Label) children[0]).getText().contains("qualified staff"));
        Chart chart = (Chart) children[1];
        assertEquals("Absorbance", chart.getAxisSet().getYAxis(0).getTitle().getText());
    }
}
