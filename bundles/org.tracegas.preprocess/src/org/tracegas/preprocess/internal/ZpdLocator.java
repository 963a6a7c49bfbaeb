package org.tracegas.preprocess.internal;

import org.tracegas.preprocess.ZpdSearch;

/** Finds the zero path difference sample of an interferogram. */
public final class ZpdLocator {

    private ZpdLocator() {
    }

    /**
     * @param x          samples
     * @param n          number of samples used from x
     * @param dc         DC level of the samples (their mean), taken off before comparing
     * @param search     method
     * @param halfWindow half width in samples of the region searched for the burst centre
     * @return the ZPD sample index
     */
    public static int locate(double[] x, int n, double dc, ZpdSearch search, int halfWindow) {
        int largest = 0;
        double largestMagnitude = -1.0;
        for (int i = 0; i < n; i++) {
            double a = Math.abs(x[i] - dc);
            if (a > largestMagnitude) {
                largestMagnitude = a;
                largest = i;
            }
        }
        if (search == ZpdSearch.LARGEST_MAGNITUDE) {
            return largest;
        }
        int from = Math.max(0, largest - halfWindow);
        int to = Math.min(n - 1, largest + halfWindow);
        double weight = 0.0;
        double moment = 0.0;
        for (int i = from; i <= to; i++) {
            double e = (x[i] - dc) * (x[i] - dc);
            weight += e;
            moment += e * i;
        }
        return weight > 0 ? (int) Math.round(moment / weight) : largest;
    }
}
