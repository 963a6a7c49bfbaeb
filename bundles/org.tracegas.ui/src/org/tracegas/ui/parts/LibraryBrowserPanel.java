package org.tracegas.ui.parts;

import java.util.List;
import java.util.Locale;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Font;
import org.eclipse.swt.graphics.FontData;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.tracegas.library.ReferenceConditions;
import org.tracegas.library.ReferenceSpectrum;

/**
 * Reference spectra of a library with their metadata. Synthetic (computed) spectra are marked in their own
 * column and in bold, so nobody takes them for measured ones.
 */
public final class LibraryBrowserPanel extends Composite {

    /** Column texts, in order. */
    public static final List<String> COLUMNS = List.of("Compound", "CAS No.", "Origin", "ppm·m", "T (K)",
            "p (kPa)", "Resolution (cm⁻¹)", "Apodization", "Range (cm⁻¹)");

    private final Label summary;
    private final Table table;
    private final Font bold;

    public LibraryBrowserPanel(Composite parent, int style) {
        super(parent, style);
        setLayout(new GridLayout(1, false));
        summary = new Label(this, SWT.WRAP);
        summary.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        table = new Table(this, SWT.BORDER | SWT.FULL_SELECTION);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        table.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        for (String c : COLUMNS) {
            TableColumn col = new TableColumn(table, SWT.NONE);
            col.setText(c);
        }
        FontData fd = table.getFont().getFontData()[0];
        bold = new Font(getDisplay(), fd.getName(), fd.getHeight(), SWT.BOLD);
        addDisposeListener(e -> bold.dispose());
    }

    public void show(String libraryName, List<ReferenceSpectrum> spectra) {
        table.removeAll();
        long synthetic = spectra.stream().filter(ReferenceSpectrum::isSynthetic).count();
        for (ReferenceSpectrum r : spectra) {
            ReferenceConditions c = r.metadata().conditions();
            TableItem item = new TableItem(table, SWT.NONE);
            item.setText(new String[] {r.compound().name(), r.compound().casNumber(),
                    r.isSynthetic() ? "SYNTHETIC — " + r.metadata().origin().description() : r.metadata().origin().toString(),
                    fmt(c.concentrationPathLength()), fmt(c.temperature()), fmt(c.pressure()), fmt(c.resolution()),
                    c.apodization(), fmt(r.spectrum().axis().first()) + "–" + fmt(r.spectrum().axis().last())});
            if (r.isSynthetic()) {
                item.setFont(2, bold);
                item.setBackground(2, Palette.CHANGED);
            }
        }
        for (TableColumn col : table.getColumns()) {
            col.pack();
        }
        summary.setText(libraryName + ": " + spectra.size() + " reference spectra"
                + (synthetic == 0 ? "" : ", " + synthetic + " of them synthetic (computed, not measured)"));
        layout(true);
    }

    /**
     * Shows references as rows of {@link #COLUMNS} texts, e.g. those a stored library version lists.
     *
     * @throws IllegalArgumentException naming a row whose cells do not match the columns
     */
    public void showRows(String heading, List<String[]> rows) {
        table.removeAll();
        for (int i = 0; i < rows.size(); i++) {
            String[] cells = rows.get(i);
            if (cells.length != COLUMNS.size()) {
                throw new IllegalArgumentException("row " + i + " has " + cells.length + " cells for "
                        + COLUMNS.size() + " columns");
            }
            TableItem item = new TableItem(table, SWT.NONE);
            item.setText(cells);
            if (cells[2].startsWith("SYNTHETIC")) {
                item.setFont(2, bold);
                item.setBackground(2, Palette.CHANGED);
            }
        }
        for (TableColumn col : table.getColumns()) {
            col.pack();
        }
        summary.setText(heading);
        layout(true);
    }

    public Table table() {
        return table;
    }

    public Label summary() {
        return summary;
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6g", v).replaceAll("\\.?0+$", "");
    }
}
