package org.tracegas.qa.campaign;

import org.tracegas.spectrum.Spectrum;

/**
 * Integrated absorbance of a band over a wavenumber window, above the straight line through the window's end
 * points: the band area that the CTS path-length check compares. The sign is kept: an inverted band (the CTS gas
 * in the background) comes out negative and fails the check instead of passing as its mirror image.
 */
public final class BandArea {

    private BandArea() {
    }

    /** @throws IllegalArgumentException if the window holds fewer than 2 points of the spectrum */
    public static double of(Spectrum absorbance, double low, double high) {
        int first = -1;
        int last = -1;
        for (int i = 0; i < absorbance.size(); i++) {
            double x = absorbance.axis().get(i);
            if (x >= low && x <= high) {
                if (first < 0) {
                    first = i;
                }
                last = i;
            }
        }
        if (first < 0 || last - first < 1) {
            throw new IllegalArgumentException("window " + low + ".." + high + " cm-1 holds fewer than 2 points");
        }
        double x0 = absorbance.axis().get(first);
        double x1 = absorbance.axis().get(last);
        double y0 = absorbance.get(first);
        double y1 = absorbance.get(last);
        double area = 0;
        for (int i = first; i < last; i++) {
            double xa = absorbance.axis().get(i);
            double xb = absorbance.axis().get(i + 1);
            double ya = absorbance.get(i) - (y0 + (y1 - y0) * (xa - x0) / (x1 - x0));
            double yb = absorbance.get(i + 1) - (y0 + (y1 - y0) * (xb - x0) / (x1 - x0));
            area += 0.5 * (ya + yb) * (xb - xa);
        }
        return area;
    }
}
