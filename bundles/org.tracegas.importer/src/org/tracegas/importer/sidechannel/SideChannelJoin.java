package org.tracegas.importer.sidechannel;

import java.time.Duration;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.Map;

import org.tracegas.importer.ImportException;

/**
 * Assigns side-channel values to spectra by time. Errors are {@link ImportException}s naming the side-channel
 * file, the line of the sample concerned and the field "time".
 */
public final class SideChannelJoin {

    private final SideChannelSeries series;
    private final long[] times;

    public SideChannelJoin(SideChannelSeries series) {
        if (series == null) {
            throw new IllegalArgumentException("series must not be null");
        }
        this.series = series;
        this.times = series.timesMillis();
    }

    /**
     * The sample nearest to a time (on a tie the earlier one), if it lies within the tolerance.
     *
     * @throws ImportException if the nearest sample is farther away than the tolerance
     */
    public JoinedValues nearest(Instant time, Duration tolerance) throws ImportException {
        if (tolerance.isNegative()) {
            throw new IllegalArgumentException("tolerance must not be negative, was " + tolerance);
        }
        long t = time.toEpochMilli();
        int i = upperIndex(times, t);
        int best = i == 0 ? 0 : i == times.length ? times.length - 1
                : (t - times[i - 1] <= times[i] - t ? i - 1 : i);
        long distance = Math.abs(times[best] - t);
        if (distance > tolerance.toMillis()) {
            throw new ImportException(series.source(), series.line(best), "time", "nearest sample "
                    + series.time(best) + " lies " + Duration.ofMillis(distance) + " from the spectrum time " + time
                    + ", beyond the tolerance " + tolerance);
        }
        Map<String, Double> values = new LinkedHashMap<>();
        for (int c = 0; c < series.channels().size(); c++) {
            values.put(series.channels().get(c), series.value(c, best));
        }
        return new JoinedValues(values, units(), "nearest sample " + series.time(best) + " (line "
                + series.line(best) + ")");
    }

    /**
     * The time-weighted mean of each channel over an acquisition interval: the samples are joined by straight
     * lines and the area under them divided by the interval (trapezoidal rule). An empty interval gives the
     * interpolated value at that time.
     *
     * @param maxGap largest allowed time between neighbouring samples that bear on the interval
     * @throws ImportException if the samples do not cover the interval or a gap is larger than maxGap
     */
    public JoinedValues meanOver(Instant start, Instant end, Duration maxGap) throws ImportException {
        if (end.isBefore(start)) {
            throw new IllegalArgumentException("interval end " + end + " lies before its start " + start);
        }
        long a = start.toEpochMilli();
        long b = end.toEpochMilli();
        if (a < times[0] || b > times[times.length - 1]) {
            int edge = a < times[0] ? 0 : times.length - 1;
            throw new ImportException(series.source(), series.line(edge), "time", "samples cover " + series.time(0)
                    + " to " + series.time(times.length - 1) + " but the spectrum was acquired " + start + " to "
                    + end);
        }
        int from = Math.max(0, upperIndex(times, a) - 1);
        int to = Math.min(times.length - 1, lowerIndex(times, b));
        for (int i = from; i < to; i++) {
            if (times[i + 1] - times[i] > maxGap.toMillis()) {
                throw new ImportException(series.source(), series.line(i + 1), "time", "gap of "
                        + Duration.ofMillis(times[i + 1] - times[i]) + " after " + series.time(i)
                        + " exceeds the allowed " + maxGap);
            }
        }
        Map<String, Double> values = new LinkedHashMap<>();
        for (int c = 0; c < series.channels().size(); c++) {
            values.put(series.channels().get(c), a == b ? interpolate(c, a) : integrate(c, a, b) / (b - a));
        }
        return new JoinedValues(values, units(), "time-weighted mean " + start + " to " + end + " (lines "
                + series.line(from) + " to " + series.line(to) + ")");
    }

    private double integrate(int c, long a, long b) {
        double area = 0;
        long left = a;
        double leftValue = interpolate(c, a);
        for (int i = upperIndex(times, a); i < times.length && times[i] < b; i++) {
            area += 0.5 * (leftValue + series.value(c, i)) * (times[i] - left);
            left = times[i];
            leftValue = series.value(c, i);
        }
        return area + 0.5 * (leftValue + interpolate(c, b)) * (b - left);
    }

    private double interpolate(int c, long t) {
        int i = upperIndex(times, t);
        if (i == 0) {
            return series.value(c, 0);
        }
        if (i == times.length || times[i - 1] == t) {
            return series.value(c, i - 1);
        }
        double w = (double) (t - times[i - 1]) / (times[i] - times[i - 1]);
        return series.value(c, i - 1) + w * (series.value(c, i) - series.value(c, i - 1));
    }

    private Map<String, String> units() {
        Map<String, String> u = new LinkedHashMap<>();
        for (int c = 0; c < series.channels().size(); c++) {
            u.put(series.channels().get(c), series.units().get(c));
        }
        return u;
    }

    /** Index of the first time greater than t (times.length if none). */
    private static int upperIndex(long[] times, long t) {
        int lo = 0;
        int hi = times.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (times[mid] <= t) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    /** Index of the first time at or after t. */
    private static int lowerIndex(long[] times, long t) {
        int i = upperIndex(times, t);
        return i > 0 && times[i - 1] == t ? i - 1 : i;
    }
}
