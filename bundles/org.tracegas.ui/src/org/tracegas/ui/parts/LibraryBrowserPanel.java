package org.tracegas.ui.parts;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.graphics.Font;
import org.eclipse.swt.graphics.FontData;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swtchart.Chart;
import org.tracegas.library.ReferenceConditions;
import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.ReferenceSpectrum;
import org.tracegas.method.LabReferenceSource;
import org.tracegas.ui.chart.DecimatedSeries;

/**
 * Reference spectra of a library with their metadata. Synthetic (computed) spectra are marked in their own
 * column and in bold, so nobody takes them for measured ones. Below the table, the selected reference is plotted
 * with its stated conditions; a second one selected with it is drawn over it, and the conditions in which the two
 * differ are named. A library folder on disk can be opened to preview its spectra.
 */
public final class LibraryBrowserPanel extends Composite {

    /** Column texts, in order. */
    public static final List<String> COLUMNS = List.of("Compound", "CAS No.", "Origin", "ppm·m", "T (K)",
            "p (kPa)", "Resolution (cm⁻¹)", "Apodization", "Range (cm⁻¹)");

    private final Label summary;
    private final Button openFolder;
    private final Table table;
    private final Label conditions;
    private final Chart preview;
    private final DecimatedSeries previewData;
    private final Font bold;
    private List<ReferenceSpectrum> spectra = List.of();

    public LibraryBrowserPanel(Composite parent, int style) {
        super(parent, style);
        setLayout(new GridLayout(2, false));
        summary = new Label(this, SWT.WRAP);
        GridData sd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        sd.widthHint = 100; // wraps in a narrow view instead of clipping
        summary.setLayoutData(sd);
        openFolder = new Button(this, SWT.PUSH);
        openFolder.setText("Preview a library folder…");
        openFolder.addListener(SWT.Selection, e -> {
            FileDialog d = new FileDialog(getShell(), SWT.OPEN);
            d.setText("The manifest of a library folder");
            d.setFilterExtensions(new String[] {"*.manifest", "*"});
            String chosen = d.open();
            if (chosen != null) {
                open(Path.of(chosen));
            }
        });
        SashForm sash = new SashForm(this, SWT.VERTICAL);
        sash.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true, 2, 1));
        table = new Table(sash, SWT.BORDER | SWT.FULL_SELECTION | SWT.MULTI);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        for (String c : COLUMNS) {
            TableColumn col = new TableColumn(table, SWT.NONE);
            col.setText(c);
        }
        table.addListener(SWT.Selection, e -> preview(table.getSelectionIndices()));
        Composite plot = new Composite(sash, SWT.NONE);
        plot.setLayout(new GridLayout(1, false));
        conditions = new Label(plot, SWT.WRAP);
        GridData cd = new GridData(SWT.FILL, SWT.TOP, true, false);
        cd.widthHint = 100;
        conditions.setLayoutData(cd);
        preview = ChartStyle.chart(plot, "", "Wavenumber (cm⁻¹)", "Absorbance");
        preview.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        // wavenumbers fall to the right, as spectroscopists read them
        preview.getAxisSet().getXAxis(0).setReversed(true);
        previewData = new DecimatedSeries(preview);
        sash.setWeights(2, 3);
        FontData fd = table.getFont().getFontData()[0];
        bold = new Font(getDisplay(), fd.getName(), fd.getHeight(), SWT.BOLD);
        addDisposeListener(e -> bold.dispose());
    }

    public void show(String libraryName, List<ReferenceSpectrum> spectra) {
        this.spectra = List.copyOf(spectra);
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
        if (!spectra.isEmpty()) {
            table.select(0);
        }
        preview(table.getSelectionIndices());
        layout(true);
    }

    /**
     * Reads a library folder by its manifest in the background, as the runner's library-add reads it, and shows
     * its references to preview; a manifest or spectrum file that cannot be read is named in the summary.
     */
    public void open(Path manifest) {
        summary.setText("Reading the library folder " + manifest.getParent() + " …");
        Job.create("Reading the library " + manifest, monitor -> {
            String failure = null;
            ReferenceLibrary read = null;
            try {
                read = LabReferenceSource.manifestReader().read(manifest);
            } catch (IOException | RuntimeException e) {
                failure = e.getMessage();
            }
            ReferenceLibrary library = read;
            String problem = failure;
            if (!isDisposed()) {
                getDisplay().asyncExec(() -> {
                    if (isDisposed()) {
                        return;
                    }
                    if (library == null) {
                        showRows("The library folder cannot be read: " + problem, List.of());
                    } else {
                        show(library.name() + " (folder " + manifest.getParent() + ")", library.references());
                    }
                });
            }
            return Status.OK_STATUS;
        }).schedule();
    }

    /**
     * Plots the references of the given rows: the first, and the second drawn over it with the conditions in which
     * the two differ named. Rows listed from a stored version have no spectra to plot (the store keeps the
     * conditions, the folder the spectra), which the conditions line says.
     */
    public void preview(int... rows) {
        ChartStyle.removeAllSeries(preview);
        previewData.clear();
        if (rows.length == 0 || spectra.isEmpty()) {
            conditions.setText(table.getItemCount() == 0 ? "" : spectra.isEmpty()
                    ? "A stored library version keeps its references' conditions, not their spectra: open the"
                            + " library folder to plot them."
                    : "Select a reference to plot it, and a second one with it to compare them.");
        } else {
            List<ReferenceSpectrum> shown = java.util.Arrays.stream(rows).limit(2).mapToObj(spectra::get).toList();
            StringBuilder text = new StringBuilder();
            for (int i = 0; i < shown.size(); i++) {
                ReferenceSpectrum r = shown.get(i);
                String id = (i == 0 ? "" : "over it: ") + label(r);
                previewData.put(ChartStyle.line(preview, id, i == 0 ? Palette.SAMPLE : Palette.FIT, 1),
                        r.spectrum().axis().toArray(), r.spectrum().toArray());
                text.append(i == 0 ? "" : "\n").append(id).append(": ").append(stated(r.metadata().conditions()));
            }
            if (shown.size() == 2) {
                text.append("\n").append(differences(shown.get(0).metadata().conditions(),
                        shown.get(1).metadata().conditions()));
            }
            if (rows.length > 2) {
                text.append("\n(the first two of the ").append(rows.length).append(" selected are drawn)");
            }
            conditions.setText(text.toString());
            preview.getAxisSet().getXAxis(0).setRange(previewData.fullXRange());
            previewData.refresh();
            preview.getAxisSet().getYAxis(0).setRange(previewData.fullYRange());
        }
        preview.redraw();
        layout(true, true);
    }

    private static String label(ReferenceSpectrum r) {
        return r.compound().name() + " " + fmt(r.metadata().conditions().concentrationPathLength()) + " ppm·m";
    }

    /** The conditions a reference states, each with its unit. */
    static String stated(ReferenceConditions c) {
        return fmt(c.concentrationPathLength()) + " ppm·m in the path, " + fmt(c.temperature()) + " K, "
                + fmt(c.pressure()) + " kPa, resolution " + fmt(c.resolution()) + " cm⁻¹, apodization "
                + c.apodization();
    }

    /**
     * The conditions in which two references differ: a difference of temperature, pressure, resolution or
     * apodization changes a band's shape, not only its size, so such references do not scale onto each other.
     */
    static String differences(ReferenceConditions a, ReferenceConditions b) {
        List<String> differ = new java.util.ArrayList<>();
        if (a.temperature() != b.temperature()) {
            differ.add("temperature " + fmt(a.temperature()) + " K and " + fmt(b.temperature()) + " K");
        }
        if (a.pressure() != b.pressure()) {
            differ.add("pressure " + fmt(a.pressure()) + " kPa and " + fmt(b.pressure()) + " kPa");
        }
        if (a.resolution() != b.resolution()) {
            differ.add("resolution " + fmt(a.resolution()) + " cm⁻¹ and " + fmt(b.resolution()) + " cm⁻¹");
        }
        if (!a.apodization().equals(b.apodization())) {
            differ.add("apodization " + a.apodization() + " and " + b.apodization());
        }
        return differ.isEmpty() ? "Recorded under the same conditions; they differ in amount only."
                : "The two differ in " + String.join("; ", differ) + ".";
    }

    /**
     * Shows references as rows of {@link #COLUMNS} texts, e.g. those a stored library version lists.
     *
     * @throws IllegalArgumentException naming a row whose cells do not match the columns
     */
    public void showRows(String heading, List<String[]> rows) {
        spectra = List.of();
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
        preview();
        layout(true);
    }

    public Table table() {
        return table;
    }

    /** The stated conditions of the references plotted. */
    public Label conditions() {
        return conditions;
    }

    public Chart previewChart() {
        return preview;
    }

    public Label summary() {
        return summary;
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6g", v).replaceAll("\\.?0+$", "");
    }
}
