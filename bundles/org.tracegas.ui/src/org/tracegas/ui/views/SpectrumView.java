package org.tracegas.ui.views;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swtchart.Chart;
import org.eclipse.ui.part.ViewPart;

/** A spectrum and its fit, drawn with SWTChart. */
public final class SpectrumView extends ViewPart {

    public static final String ID = "org.tracegas.ui.views.spectrum";

    private Chart chart;

    @Override
    public void createPartControl(Composite parent) {
        parent.setLayout(new GridLayout(1, false));
        Label caution = new Label(parent, SWT.WRAP);
        caution.setText("Results concern toxic gases and may feed compliance decisions: they need review by "
                + "qualified staff, under local regulations and accredited practice.");
        caution.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        chart = new Chart(parent, SWT.NONE);
        chart.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        chart.getTitle().setText("Absorbance");
        chart.getAxisSet().getXAxis(0).getTitle().setText("Wavenumber (cm⁻¹)");
        chart.getAxisSet().getYAxis(0).getTitle().setText("Absorbance");
    }

    @Override
    public void setFocus() {
        chart.setFocus();
    }
}
