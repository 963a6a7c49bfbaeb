package org.tracegas.importer.sidechannel;

import java.time.Instant;
import java.util.List;

/**
 * Immutable time series of other analyzers (for example O2 in %vol, temperature, pressure, flow), sampled at
 * strictly increasing times.
 *
 * @param source   the file it was read from, named in errors
 * @param channels names of the channels in column order
 * @param units    unit of each channel as written ("" when none)
 */
public record SideChannelSeries(String source, List<String> channels, List<String> units, long[] timesMillis,
        double[][] values, long[] lines) {

    /**
     * @param timesMillis sample times in milliseconds since 1970-01-01T00:00Z, strictly increasing
     * @param values      values[channel][sample]
     * @param lines       1-based file line of each sample
     */
    public SideChannelSeries {
        channels = List.copyOf(channels);
        units = List.copyOf(units);
        if (channels.isEmpty() || units.size() != channels.size() || values.length != channels.size()) {
            throw new IllegalArgumentException("channels, units and values must match in number, at least one");
        }
        if (timesMillis.length == 0 || lines.length != timesMillis.length) {
            throw new IllegalArgumentException("at least one sample, with one line number per sample");
        }
        for (int i = 1; i < timesMillis.length; i++) {
            if (timesMillis[i] <= timesMillis[i - 1]) {
                throw new IllegalArgumentException("time of sample " + i + " does not increase");
            }
        }
        double[][] copy = new double[values.length][];
        for (int c = 0; c < values.length; c++) {
            if (values[c].length != timesMillis.length) {
                throw new IllegalArgumentException("channel " + channels.get(c) + " has " + values[c].length
                        + " values for " + timesMillis.length + " times");
            }
            copy[c] = values[c].clone();
        }
        values = copy;
        timesMillis = timesMillis.clone();
        lines = lines.clone();
    }

    public int size() {
        return timesMillis.length;
    }

    public Instant time(int sample) {
        return Instant.ofEpochMilli(timesMillis[sample]);
    }

    public double value(int channel, int sample) {
        return values[channel][sample];
    }

    public long line(int sample) {
        return lines[sample];
    }

    @Override
    public long[] timesMillis() {
        return timesMillis.clone();
    }

    @Override
    public double[][] values() {
        double[][] copy = new double[values.length][];
        for (int c = 0; c < values.length; c++) {
            copy[c] = values[c].clone();
        }
        return copy;
    }

    @Override
    public long[] lines() {
        return lines.clone();
    }
}
