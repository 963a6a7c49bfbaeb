package org.tracegas.benchmarks;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swtchart.Chart;
import org.eclipse.swtchart.ILineSeries;
import org.eclipse.swtchart.ISeries.SeriesType;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import org.tracegas.ui.parts.ConcentrationTrace;
import org.tracegas.ui.parts.TimeSeriesPanel;

/**
 * First display of a day of one-second results of 20 compounds (86,400 × 20 values, a few flagged) in the desk's
 * time-series chart: from handing the traces to {@link TimeSeriesPanel#show} until the plot area has painted,
 * in a 1280 × 800 window. {@code allPoints} gives the same traces to a plain SWTChart chart with every point, so
 * that the gain of drawing min/max per pixel column (flagged values kept) is a ratio of one run. The target for
 * {@code firstDisplay} is under 100 ms. Needs a display: on a server run under {@code xvfb-run -a}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3)
@Measurement(iterations = 10)
@Fork(1)
public class TimeSeriesBenchmark {

    private static final int VALUES = 86_400;
    private static final int COMPOUNDS = 20;

    private Display display;
    private final List<Shell> shells = new ArrayList<>();
    private TimeSeriesPanel panel;
    private Chart plain;
    private List<ConcentrationTrace> traces;
    private int paints;

    @Setup(Level.Trial)
    public void setUp() {
        display = new Display();
        panel = new TimeSeriesPanel(window(), SWT.NONE);
        plain = new Chart(window(), SWT.NONE);
        shells.forEach(Shell::open);
        double[] hours = new double[VALUES];
        for (int i = 0; i < VALUES; i++) {
            hours[i] = i / 3600.0;
        }
        Random r = new Random(5);
        traces = new ArrayList<>();
        for (int c = 0; c < COMPOUNDS; c++) {
            double[] v = new double[VALUES];
            BitSet flags = new BitSet();
            for (int i = 0; i < VALUES; i++) {
                v[i] = 10 + 3 * c + 2 * Math.sin(i / 5000.0 + c) + 0.5 * r.nextGaussian();
                if (r.nextDouble() < 2e-4) {
                    flags.set(i);
                }
            }
            traces.add(new ConcentrationTrace("gas " + (c + 1), "ppm", hours, v, flags));
        }
        for (Chart chart : List.of(panel.chart(), plain)) {
            chart.getPlotArea().getControl().addListener(SWT.Paint, e -> paints++);
        }
        flush();
    }

    /** Before each display: the panel cleared (as while results are read) and the plain chart emptied. */
    @Setup(Level.Invocation)
    public void clear() {
        panel.showNote("Reading the stored results …");
        for (var s : plain.getSeriesSet().getSeries()) {
            plain.getSeriesSet().deleteSeries(s.getId());
        }
        flush();
    }

    @Benchmark
    public int firstDisplay() {
        panel.show("A day, one value per second", traces, List.of());
        return paint(panel.chart());
    }

    @Benchmark
    public int allPoints() {
        for (ConcentrationTrace t : traces) {
            ILineSeries<?> s = (ILineSeries<?>) plain.getSeriesSet().createSeries(SeriesType.LINE, t.compound());
            s.setXSeries(t.hours());
            s.setYSeries(t.values());
            s.setSymbolType(ILineSeries.PlotSymbolType.NONE);
        }
        plain.getAxisSet().adjustRange();
        return paint(plain);
    }

    /** Repaints now and runs the event loop until the plot area has painted (GTK may paint with the next frame). */
    private int paint(Chart chart) {
        Control plot = chart.getPlotArea().getControl();
        int before = paints;
        plot.redraw();
        plot.update();
        long give = System.currentTimeMillis() + 10_000;
        while (paints == before && System.currentTimeMillis() < give) {
            if (!display.readAndDispatch()) {
                Thread.onSpinWait();
            }
        }
        if (paints == before) {
            throw new IllegalStateException("the plot area did not paint within 10 s");
        }
        return paints;
    }

    /** A window of the smallest screen the desk is made for. */
    private Shell window() {
        Shell shell = new Shell(display);
        shell.setLayout(new FillLayout());
        shell.setSize(1280, 800);
        shells.add(shell);
        return shell;
    }

    private void flush() {
        while (display.readAndDispatch()) {
            // keep dispatching
        }
    }

    @TearDown(Level.Trial)
    public void tearDown() {
        display.dispose();
    }
}
