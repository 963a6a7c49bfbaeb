package org.tracegas.qa.checks;

import java.time.Instant;

import org.tracegas.spectrum.Spectrum;

/** One QA measurement of a campaign as a check sees it: when, what for, the cell, its absorbance and its fit. */
public interface QaReading {

    Instant time();

    /** What the measurement was for, for example "cts" or "zero". */
    String role();

    /** The absorbance spectrum against its background. */
    Spectrum absorbance();

    double cellTemperatureK();

    double cellPressureKPa();

    /**
     * The amount fraction the method found, ppm.
     *
     * @throws IllegalArgumentException if the method does not report the compound
     */
    double ppm(String compound);

    /**
     * The detection limit of the fit for the compound, ppm.
     *
     * @throws IllegalArgumentException if the method does not report the compound
     */
    double detectionLimit(String compound);

    /**
     * The standard uncertainty of the fit's amount fraction for the compound, ppm.
     *
     * @throws IllegalArgumentException if the method does not report the compound
     */
    double standardUncertainty(String compound);
}
