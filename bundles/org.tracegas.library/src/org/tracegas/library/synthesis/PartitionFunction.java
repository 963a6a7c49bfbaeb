package org.tracegas.library.synthesis;

/** Total internal partition function Q(T) of the absorbing molecule; only ratios Q(T1)/Q(T2) are used. */
public interface PartitionFunction {

    /**
     * Q(T), on any scale common to all temperatures.
     *
     * @throws IllegalArgumentException if the temperature is outside the range of the function
     */
    double value(double temperature);

    /** Where the values come from, for the provenance of what is computed with them. */
    default String description() {
        return getClass().getSimpleName();
    }

    /** Q(numerator) / Q(denominator). */
    default double ratio(double numeratorTemperature, double denominatorTemperature) {
        return value(numeratorTemperature) / value(denominatorTemperature);
    }
}
