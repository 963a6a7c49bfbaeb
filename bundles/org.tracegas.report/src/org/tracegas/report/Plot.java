package org.tracegas.report;

import java.util.List;

import org.tracegas.report.internal.Check;

/**
 * A line plot.
 *
 * @param title     title above the plot
 * @param xLabel    x axis label with unit
 * @param yLabel    y axis label with unit
 * @param series    curves, at least one
 * @param reversedX whether x decreases to the right (wavenumber axes of infrared spectra)
 * @param levels    labelled horizontal lines (limits, centre line), drawn dashed
 */
public record Plot(String title, String xLabel, String yLabel, List<Series> series, boolean reversedX,
        List<Level> levels) {

    public Plot {
        Check.text("plot title", title);
        Check.text("xLabel", xLabel);
        Check.text("yLabel", yLabel);
        series = Check.list("series", series);
        if (series.isEmpty()) {
            throw new IllegalArgumentException("plot " + title + " needs at least one series");
        }
        levels = Check.list("levels", levels);
    }

    /** A plot without horizontal lines. */
    public Plot(String title, String xLabel, String yLabel, List<Series> series, boolean reversedX) {
        this(title, xLabel, yLabel, series, reversedX, List.of());
    }
}
