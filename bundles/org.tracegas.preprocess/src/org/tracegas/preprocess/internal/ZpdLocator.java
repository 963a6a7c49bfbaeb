package org.tracegas.preprocess.internal;

import org.tracegas.preprocess.ZpdSearch;
import org.tracegas.spectrum.Interferogram;

/**
 * Finds the DC level and the zero path difference (ZPD) sample of an interferogram in one pass: the sample of
 * largest deviation from the mean is either the largest or the smallest sample.
 */
public final class ZpdLocator {

    private double dc;
    private int zpd;

    /** DC level found by the last {@link #locate}. */
    public double dc() {
        return dc;
    }

    /** ZPD sample found by the last {@link #locate}. */
    public int zpd() {
        return zpd;
    }

    /**
     * @param halfWindow half width in samples of the region around the largest sample used for the burst centre
     */
    public void locate(Interferogram x, ZpdSearch search, int halfWindow) {
        int n = x.size();
        double sum = 0.0;
        double max = Double.NEGATIVE_INFINITY;
        double min = Double.POSITIVE_INFINITY;
        int maxIndex = 0;
        int minIndex = 0;
        for (int i = 0; i < n; i++) {
            double v = x.get(i);
            sum += v;
            if (v > max) {
                max = v;
                maxIndex = i;
            }
            if (v < min) {
                min = v;
                minIndex = i;
            }
        }
        dc = sum / n;
        int largest = max - dc >= dc - min ? maxIndex : minIndex;
        zpd = search == ZpdSearch.LARGEST_MAGNITUDE ? largest : burstCentre(x, largest, halfWindow);
    }

    private int burstCentre(Interferogram x, int largest, int halfWindow) {
        int from = Math.max(0, largest - halfWindow);
        int to = Math.min(x.size() - 1, largest + halfWindow);
        double weight = 0.0;
        double moment = 0.0;
        for (int i = from; i <= to; i++) {
            double d = x.get(i) - dc;
            weight += d * d;
            moment += d * d * i;
        }
        return weight > 0 ? (int) Math.round(moment / weight) : largest;
    }
}
