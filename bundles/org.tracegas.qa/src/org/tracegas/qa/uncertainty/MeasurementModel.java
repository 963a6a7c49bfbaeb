package org.tracegas.qa.uncertainty;

/** Measurement model y = f(x_1, ..., x_N). */
@FunctionalInterface
public interface MeasurementModel {

    double value(double[] inputs);
}
