package org.tracegas.ui.parts;

import java.time.Instant;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Consumer;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Menu;
import org.eclipse.swt.widgets.MenuItem;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swtchart.Chart;
import org.eclipse.swtchart.IAxis;
import org.eclipse.swtchart.ILineSeries;
import org.eclipse.swtchart.ILineSeries.PlotSymbolType;
import org.eclipse.swtchart.LineStyle;
import org.eclipse.swtchart.Range;
import org.tracegas.ui.chart.ChartNavigation;
import org.tracegas.ui.chart.ClockTime;
import org.tracegas.ui.chart.CursorReadout;
import org.tracegas.ui.chart.DecimatedSeries;

/**
 * Concentrations over time, one line per compound, flagged values marked with a cross and limits as red
 * horizontal lines. A checkable list chooses the compounds drawn; at first the trace gases are. Major
 * components (percent level, {@link ConcentrationLevel}) shown together with trace gases get a second axis on
 * the right and dashed lines, so that they do not flatten the trace gases' lines. Long records (a day of one-second values) are
 * thinned per pixel column for drawing.
 */
public final class TimeSeriesPanel extends Composite {

    /** A limit line, e.g. a daily emission limit value; drawn on the trace gases' axis. */
    public record Limit(String name, double value) {
    }

    /** A value picked on the chart: the trace and the value's index in it. */
    public record Pick(ConcentrationTrace trace, int index) {
    }

    /** How near, in pixels, a click must come to a value to pick it. */
    static final int PICK_PIXELS = 12;

    private static final String FLAGS_SUFFIX = " flagged";

    /** The key to the flag markers, shown under the compound list. */
    public static final String FLAG_KEY = "✕ red cross: the value carries a quality flag (e.g. a high fit "
            + "residual); Results to sign lists the flags";

    private final Chart chart;
    private final DecimatedSeries data;
    private final Label heading;
    private final Table compounds;
    private final ChartNavigation navigation;
    private final CursorReadout cursor;
    private final List<Consumer<Pick>> openers = new java.util.concurrent.CopyOnWriteArrayList<>();
    private final Map<String, Image> swatches = new HashMap<>();
    private List<ConcentrationTrace> traces = List.of();
    private List<Limit> limits = List.of();
    private Set<String> majors = Set.of();
    /** Id of the major components' axis while it is shown, else -1. */
    private int majorAxis = -1;
    /** Each concentration axis's title as words and unit, e.g. {"Trace gases", " (ppm)"}, by axis id. */
    private final Map<Integer, String[]> axisTitles = new HashMap<>();

    public TimeSeriesPanel(Composite parent, int style) {
        super(parent, style);
        setLayout(new GridLayout(2, false));
        heading = new Label(this, SWT.WRAP);
        GridData hd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        // wraps rather than clipping the time the hours count from when the view is narrow
        hd.widthHint = 200;
        heading.setLayoutData(hd);
        heading.setText("Select a project in the workspace tree to see its stored results.");
        Label readout = new Label(this, SWT.RIGHT);
        GridData rd = new GridData(SWT.END, SWT.CENTER, false, false);
        rd.widthHint = 300;
        readout.setLayoutData(rd);

        Composite body = new Composite(this, SWT.NONE);
        body.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true, 2, 1));
        GridLayout bl = new GridLayout(2, false);
        bl.marginWidth = 0;
        bl.marginHeight = 0;
        body.setLayout(bl);
        Composite side = new Composite(body, SWT.NONE);
        side.setLayoutData(new GridData(SWT.FILL, SWT.FILL, false, true));
        GridLayout sl = new GridLayout(2, true);
        sl.marginWidth = 0;
        sl.marginHeight = 0;
        side.setLayout(sl);
        Label listTitle = new Label(side, SWT.NONE);
        listTitle.setText("Compounds drawn");
        listTitle.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1));
        compounds = new Table(side, SWT.CHECK | SWT.BORDER | SWT.V_SCROLL | SWT.SINGLE);
        GridData cd = new GridData(SWT.FILL, SWT.FILL, true, true, 2, 1);
        cd.widthHint = 120;
        compounds.setLayoutData(cd);
        Label flags = new Label(side, SWT.WRAP);
        GridData fd = new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1);
        fd.widthHint = 120;
        flags.setLayoutData(fd);
        // the red crosses carry no legend entry of their own (one per compound would crowd the legend)
        flags.setText(FLAG_KEY);
        compounds.addListener(SWT.Selection, e -> {
            if (e.detail == SWT.CHECK) {
                draw(false);
            }
        });
        Button trace = new Button(side, SWT.PUSH);
        trace.setText("Trace gases");
        trace.setToolTipText("Draw the trace gases only");
        trace.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        trace.addListener(SWT.Selection, e -> select(traceGases()));
        Button all = new Button(side, SWT.PUSH);
        all.setText("All");
        all.setToolTipText("Draw every compound");
        all.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        all.addListener(SWT.Selection, e -> select(compounds()));

        chart = ChartStyle.chart(body, "", "Time (h)", "Concentration");
        chart.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        chart.getAxisSet().getYAxis(0).getTick().setFormat(new java.text.DecimalFormat("0.###"));
        data = new DecimatedSeries(chart);
        navigation = new ChartNavigation(data::refresh, chart);
        cursor = new CursorReadout(chart, readout, "%.4f h", "concentration");
        addListener(SWT.Dispose, e -> swatches.values().forEach(Image::dispose));
        Control plot = chart.getPlotArea().getControl();
        plot.addListener(SWT.Resize, e -> {
            for (IAxis axis : chart.getAxisSet().getYAxes()) {
                fitTitle(axis);
            }
        });
        plot.addListener(SWT.MouseDoubleClick, e -> open(nearest(e.x, e.y)));
        // the context menu acts on the value nearest to where it was asked for
        Menu menu = new Menu(plot);
        MenuItem openSpectrum = new MenuItem(menu, SWT.PUSH);
        openSpectrum.setText("Open the spectrum of this measurement");
        int[] at = new int[2];
        plot.addListener(SWT.MenuDetect, e -> {
            org.eclipse.swt.graphics.Point p = plot.toControl(e.x, e.y);
            at[0] = p.x;
            at[1] = p.y;
            Pick pick = nearest(p.x, p.y);
            openSpectrum.setEnabled(pick != null && !pick.trace().measurementIds().isEmpty());
        });
        openSpectrum.addListener(SWT.Selection, e -> open(nearest(at[0], at[1])));
        plot.setMenu(menu);
    }

    /**
     * Shows traces and limit lines over the whole period. The compounds drawn are the trace gases, or those
     * the user chose when the same compounds were shown before.
     */
    public void show(String title, List<ConcentrationTrace> traces, List<Limit> limits) {
        show(title, traces, limits, null);
    }

    /**
     * Shows traces as {@link #show(String, List, List)} does, on a clock-time axis (UTC) when {@code start},
     * the instant hour 0 of the traces stands for, is known.
     */
    public void show(String title, List<ConcentrationTrace> traces, List<Limit> limits, Instant start) {
        heading.setText(title);
        double last = traces.stream().filter(t -> t.hours().length > 0)
                .mapToDouble(t -> t.hours()[t.hours().length - 1]).max().orElse(0);
        IAxis time = chart.getAxisSet().getXAxis(0);
        if (start == null) {
            time.getTitle().setText("Time (h)");
            time.getTick().setFormat(null);
            cursor.setXText(x -> String.format(java.util.Locale.ROOT, "%.4f h", x));
        } else {
            ClockTime clock = new ClockTime(start, last);
            time.getTitle().setText(clock.axisTitle(last));
            time.getTick().setFormat(clock);
            cursor.setXText(clock::full);
        }
        List<String> before = compounds();
        Set<String> chosen = selectedCompounds();
        this.traces = List.copyOf(traces);
        this.limits = List.copyOf(limits);
        Set<String> m = new LinkedHashSet<>();
        for (ConcentrationTrace t : traces) {
            if (ConcentrationLevel.major(t)) {
                m.add(t.compound());
            }
        }
        majors = m;
        boolean sameCompounds = before.equals(compounds());
        fillList(sameCompounds ? chosen : defaultSelection());
        draw(true);
    }

    /** Clears the chart and the list and says why, e.g. while results are read. */
    public void showNote(String text) {
        heading.setText(text);
        traces = List.of();
        limits = List.of();
        majors = Set.of();
        fillList(Set.of());
        draw(true);
    }

    /** All compounds of the traces shown, in their order. */
    public List<String> compounds() {
        return traces.stream().map(ConcentrationTrace::compound).toList();
    }

    /** The compounds checked in the list. */
    public Set<String> selectedCompounds() {
        Set<String> out = new LinkedHashSet<>();
        for (TableItem item : compounds.getItems()) {
            if (item.getChecked()) {
                out.add((String) item.getData());
            }
        }
        return out;
    }

    /** Draws exactly the given compounds, keeping the time range shown. */
    public void select(Collection<String> chosen) {
        for (TableItem item : compounds.getItems()) {
            item.setChecked(chosen.contains(item.getData()));
        }
        draw(false);
    }

    /** The trace gases among the compounds shown (all but the major components). */
    public List<String> traceGases() {
        return compounds().stream().filter(c -> !majors.contains(c)).toList();
    }

    /** True when the compound is drawn against the major components' axis on the right. */
    public boolean onMajorAxis(String compound) {
        ILineSeries<?> s = (ILineSeries<?>) chart.getSeriesSet().getSeries(compound);
        return s != null && majorAxis >= 0 && s.getYAxisId() == majorAxis;
    }

    /** The major components' axis on the right, or null while it is not shown. */
    public IAxis majorAxis() {
        return majorAxis < 0 ? null : chart.getAxisSet().getYAxis(majorAxis);
    }

    public Table compoundList() {
        return compounds;
    }

    /** The traces shown (drawn or not). */
    public List<ConcentrationTrace> traces() {
        return traces;
    }

    public Label heading() {
        return heading;
    }

    private Set<String> defaultSelection() {
        List<String> trace = traceGases();
        return new LinkedHashSet<>(trace.isEmpty() ? compounds() : trace);
    }

    private void fillList(Set<String> checked) {
        // one repaint of the list for all its rows, not one per row
        compounds.setRedraw(false);
        compounds.removeAll();
        for (ConcentrationTrace t : traces) {
            String c = t.compound();
            TableItem item = new TableItem(compounds, SWT.NONE);
            item.setData(c);
            item.setText(majors.contains(c) ? c + "  (major)" : c);
            item.setImage(swatch(c));
            item.setChecked(checked.contains(c));
        }
        compounds.setRedraw(true);
    }

    /** A small square in the compound's line colour, so the list doubles as a key. */
    private Image swatch(String compound) {
        return swatches.computeIfAbsent(compound, k -> {
            Image img = new Image(getDisplay(), 12, 12);
            GC gc = new GC(img);
            try {
                gc.setBackground(Palette.compound(k));
                gc.fillRectangle(0, 0, 12, 12);
            } finally {
                gc.dispose();
            }
            return img;
        });
    }

    /** Puts the checked compounds, their flags and the limits on the chart; the full time range when asked. */
    private void draw(boolean fullTimeRange) {
        chart.suspendUpdate(true);
        ChartStyle.removeAllSeries(chart);
        data.clear();
        Set<String> chosen = selectedCompounds();
        List<ConcentrationTrace> drawn = new ArrayList<>();
        for (ConcentrationTrace t : traces) {
            if (chosen.contains(t.compound())) {
                drawn.add(t);
            }
        }
        boolean anyTrace = drawn.stream().anyMatch(t -> !majors.contains(t.compound()));
        boolean anyMajor = drawn.stream().anyMatch(t -> majors.contains(t.compound()));
        // a second axis only when both kinds are drawn; alone, either kind fits the one axis
        setMajorAxis(anyTrace && anyMajor);
        IAxis left = chart.getAxisSet().getYAxis(0);
        String leftUnit = unitOf(drawn, false, anyMajor && !anyTrace);
        title(left, majorAxis >= 0 ? "Trace gases" : "Concentration", leftUnit);
        if (majorAxis >= 0) {
            title(majorAxis(), "Major components, dashed", unitOf(drawn, true, true));
        }
        for (int k = 0; k < drawn.size(); k++) {
            String compound = drawn.get(k).compound();
            ILineSeries<?> s = ChartStyle.line(chart, compound, Palette.compound(compound), 1);
            s.setYAxisId(axisOf(drawn.get(k)));
            if (s.getYAxisId() != 0) {
                // dashed, so that a line tells by itself which axis it is read against
                s.setLineStyle(LineStyle.DASH);
            }
            data.put(s, drawn.get(k).hours(), drawn.get(k).values());
        }
        for (ConcentrationTrace t : drawn) {
            ILineSeries<?> m = ChartStyle.markers(chart, t.compound() + FLAGS_SUFFIX, Palette.LIMIT,
                    PlotSymbolType.CROSS);
            m.setVisibleInLegend(false);
            m.setYAxisId(axisOf(t));
            data.put(m, t.flaggedHours(), t.flaggedValues());
        }
        Range full = fullTimeRange();
        for (Limit l : limits) {
            ILineSeries<?> s = ChartStyle.line(chart, "Limit " + l.name(), Palette.LIMIT, 1);
            if (full != null) {
                data.put(s, new double[] {full.lower, full.upper}, new double[] {l.value(), l.value()});
            }
        }
        if (full != null && fullTimeRange) {
            chart.getAxisSet().getXAxis(0).setRange(full);
        }
        setYRange(0);
        if (majorAxis >= 0) {
            setYRange(majorAxis);
        }
        chart.suspendUpdate(false);
        data.refresh();
    }

    /** The time range of all traces (not only those drawn), so that choosing compounds keeps the period. */
    private Range fullTimeRange() {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (ConcentrationTrace t : traces) {
            if (t.hours().length > 0) {
                lo = Math.min(lo, t.hours()[0]);
                hi = Math.max(hi, t.hours()[t.hours().length - 1]);
            }
        }
        if (!(lo <= hi)) {
            return null;
        }
        return lo < hi ? new Range(lo, hi) : new Range(lo - 1, hi + 1);
    }

    private int axisOf(ConcentrationTrace t) {
        return majorAxis >= 0 && majors.contains(t.compound()) ? majorAxis : 0;
    }

    /** " (ppm)": the unit of the first drawn trace of one kind, or of any kind. */
    private String unitOf(List<ConcentrationTrace> drawn, boolean major, boolean kindMatters) {
        for (ConcentrationTrace t : drawn) {
            if (!kindMatters || majors.contains(t.compound()) == major) {
                return " (" + t.unit() + ")";
            }
        }
        return drawn.isEmpty() ? "" : " (" + drawn.get(0).unit() + ")";
    }

    private void title(IAxis axis, String words, String unit) {
        axisTitles.put(axis.getId(), new String[] {words, unit});
        fitTitle(axis);
    }

    /**
     * An axis's title in words and unit where the plot is tall enough to write them along it, else its unit alone:
     * the chart clips a title longer than its axis (the desk's default layout in a 1280 × 800 window).
     */
    private void fitTitle(IAxis axis) {
        String[] t = axisTitles.get(axis.getId());
        if (t == null) {
            return;
        }
        String full = t[0] + t[1];
        String unit = t[1].strip().replaceAll("^\\(|\\)$", "");
        int room = chart.getPlotArea().getControl().getSize().y;
        GC gc = new GC(chart);
        gc.setFont(axis.getTitle().getFont());
        boolean fits = room == 0 || unit.isEmpty() || gc.textExtent(full).x <= room;
        gc.dispose();
        String text = fits ? full : unit;
        if (!text.equals(axis.getTitle().getText())) {
            axis.getTitle().setText(text);
        }
    }

    private void setMajorAxis(boolean wanted) {
        if (wanted && majorAxis < 0) {
            majorAxis = chart.getAxisSet().createYAxis();
            IAxis axis = chart.getAxisSet().getYAxis(majorAxis);
            axis.setPosition(IAxis.Position.Secondary);
            axis.getTick().setFormat(new java.text.DecimalFormat("0.###"));
        } else if (!wanted && majorAxis >= 0) {
            axisTitles.remove(majorAxis);
            chart.getAxisSet().deleteYAxis(majorAxis);
            majorAxis = -1;
        }
    }

    private void setYRange(int axisId) {
        Range y = data.fullYRange(axisId);
        if (y != null) {
            chart.getAxisSet().getYAxis(axisId).setRange(y);
        }
    }

    /** Calls {@code opener} with the value picked by a double-click or the context menu. */
    public void addPointOpener(Consumer<Pick> opener) {
        openers.add(opener);
    }

    private void open(Pick pick) {
        if (pick != null && !pick.trace().measurementIds().isEmpty()) {
            openers.forEach(o -> o.accept(pick));
        }
    }

    /**
     * The drawn value nearest to a pixel of the plot area, or null when none lies within {@value #PICK_PIXELS}
     * pixels.
     */
    public Pick nearest(int x, int y) {
        Pick best = null;
        double bestDistance = PICK_PIXELS;
        Set<String> chosen = selectedCompounds();
        for (ConcentrationTrace t : traces) {
            if (!chosen.contains(t.compound())) {
                continue;
            }
            IAxis xAxis = chart.getAxisSet().getXAxis(0);
            IAxis yAxis = chart.getAxisSet().getYAxis(axisOf(t));
            for (int i = 0; i < t.hours().length; i++) {
                double d = Math.hypot(xAxis.getPixelCoordinate(t.hours()[i]) - x,
                        yAxis.getPixelCoordinate(t.values()[i]) - y);
                if (d <= bestDistance) {
                    bestDistance = d;
                    best = new Pick(t, i);
                }
            }
        }
        return best;
    }

    public ChartNavigation navigation() {
        return navigation;
    }

    public Chart chart() {
        return chart;
    }

    /** Points handed to the chart for a series after thinning. */
    public int shownPoints(String seriesId) {
        return data.shownPoints(seriesId);
    }
}
