package org.tracegas.quantify.internal;

/**
 * A fit algorithm made ready for one set of compounds and regions on one sample axis: everything that does not
 * depend on the sample is computed when it is built, so that {@link #fit(double[])} only handles the sample.
 * Implementations are immutable and safe to share between threads.
 */
public interface SystemSolver {

    /** Names the system in messages, for example "fit of CO". */
    String label();

    /** The fit points, regions and baselines. */
    FitPoints points();

    /** Number of compound columns. */
    int compounds();

    /** Name of compound column c. */
    String compound(int column);

    /** Highest reference amount of compound column c, in ppm·m: above it a result is an extrapolation. */
    double highestAmount(int column);

    /**
     * Fits one sample given as absorbance on the full sample axis.
     *
     * @throws IllegalArgumentException if the sample cannot be fitted; the message names the point and why
     */
    SystemFit fit(double[] sample);
}
