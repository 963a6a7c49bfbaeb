package org.tracegas.library.synthesis;

/**
 * Partition function from a table of Q against temperature, interpolated linearly between the tabulated
 * temperatures. Tables in 1 K steps (the usual spacing of published total internal partition sums) make
 * the interpolation error negligible next to the tabulated values' own uncertainty.
 */
public final class TabulatedPartitionFunction implements PartitionFunction {

    private final double[] temperatures;
    private final double[] values;
    private final String source;

    /**
     * @param temperatures strictly rising temperatures in K, at least 2
     * @param values       Q at each temperature, positive
     */
    public TabulatedPartitionFunction(double[] temperatures, double[] values) {
        this(temperatures, values, "table of " + (temperatures == null ? 0 : temperatures.length) + " values");
    }

    /**
     * @param temperatures strictly rising temperatures in K, at least 2
     * @param values       Q at each temperature, positive
     * @param source       where the table comes from, for provenance
     */
    public TabulatedPartitionFunction(double[] temperatures, double[] values, String source) {
        if (temperatures == null || values == null || temperatures.length < 2
                || temperatures.length != values.length) {
            throw new IllegalArgumentException("temperatures and values must have the same length, at least 2");
        }
        for (int i = 0; i < temperatures.length; i++) {
            if (!(values[i] > 0 && Double.isFinite(values[i]))) {
                throw new IllegalArgumentException("value " + i + " must be positive and finite, was " + values[i]);
            }
            if (!Double.isFinite(temperatures[i]) || (i > 0 && !(temperatures[i] > temperatures[i - 1]))) {
                throw new IllegalArgumentException("temperatures must be finite and rise strictly, index " + i
                        + " is " + temperatures[i]);
            }
        }
        this.temperatures = temperatures.clone();
        this.values = values.clone();
        this.source = source;
    }

    @Override
    public String description() {
        return source;
    }

    @Override
    public double value(double temperature) {
        int n = temperatures.length;
        if (!(temperature >= temperatures[0] && temperature <= temperatures[n - 1])) {
            throw new IllegalArgumentException("temperature " + temperature + " K is outside the table, "
                    + temperatures[0] + " .. " + temperatures[n - 1] + " K");
        }
        int hi = java.util.Arrays.binarySearch(temperatures, temperature);
        if (hi >= 0) {
            return values[hi];
        }
        hi = -hi - 1;
        int lo = hi - 1;
        double f = (temperature - temperatures[lo]) / (temperatures[hi] - temperatures[lo]);
        return values[lo] + f * (values[hi] - values[lo]);
    }
}
