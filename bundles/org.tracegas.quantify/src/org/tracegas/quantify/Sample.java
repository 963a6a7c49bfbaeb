package org.tracegas.quantify;

import org.tracegas.spectrum.Spectrum;

/**
 * A sample absorbance spectrum to quantify, with the age of its background if the caller checks it, and the sample
 * cell's measured temperature and pressure if known (a fit that computes its spectra at each measurement's own
 * conditions needs them; the others ignore them).
 *
 * @param absorbance       the sample absorbance spectrum
 * @param background       background age and limit, or null when not checked
 * @param noiseCorrelation factor, at least 1, by which the standard uncertainty of a fitted amount is enlarged
 *                         because the noise of neighbouring points is correlated (apodization and zero filling
 *                         spread each point's noise over its neighbours, so the least-squares formula, which counts
 *                         every point as independent, understates the uncertainty); 1 for white noise
 * @param cellTemperature  measured gas temperature in the sample cell, K; NaN when not known
 * @param cellPressure     measured total pressure in the sample cell, kPa; NaN when not known
 */
public record Sample(Spectrum absorbance, BackgroundAge background, double noiseCorrelation, double cellTemperature,
        double cellPressure) {

    /**
     * @throws IllegalArgumentException if the spectrum is null, the factor is below 1 or not finite, or a cell
     *                                  condition is neither NaN nor positive and finite
     */
    public Sample {
        if (absorbance == null) {
            throw new IllegalArgumentException("absorbance must not be null");
        }
        if (!(noiseCorrelation >= 1 && Double.isFinite(noiseCorrelation))) {
            throw new IllegalArgumentException("noiseCorrelation must be finite and at least 1, was "
                    + noiseCorrelation);
        }
        if (!Double.isNaN(cellTemperature) && !(cellTemperature > 0 && Double.isFinite(cellTemperature))) {
            throw new IllegalArgumentException("cellTemperature must be positive and finite (K) or NaN, was "
                    + cellTemperature);
        }
        if (!Double.isNaN(cellPressure) && !(cellPressure > 0 && Double.isFinite(cellPressure))) {
            throw new IllegalArgumentException("cellPressure must be positive and finite (kPa) or NaN, was "
                    + cellPressure);
        }
    }

    /** A sample whose cell conditions are not known. */
    public Sample(Spectrum absorbance, BackgroundAge background, double noiseCorrelation) {
        this(absorbance, background, noiseCorrelation, Double.NaN, Double.NaN);
    }

    /** A sample with uncorrelated noise between points. */
    public Sample(Spectrum absorbance, BackgroundAge background) {
        this(absorbance, background, 1);
    }

    /** A sample whose background age is not checked, with uncorrelated noise between points. */
    public static Sample of(Spectrum absorbance) {
        return new Sample(absorbance, null);
    }

    /**
     * The same sample measured in a cell at the given conditions.
     *
     * @param temperature K, positive and finite
     * @param pressure    kPa, positive and finite
     * @throws IllegalArgumentException naming the condition that is not positive and finite
     */
    public Sample inCell(double temperature, double pressure) {
        if (Double.isNaN(temperature) || Double.isNaN(pressure)) {
            throw new IllegalArgumentException("cell temperature and pressure must be numbers, were " + temperature
                    + " K and " + pressure + " kPa");
        }
        return new Sample(absorbance, background, noiseCorrelation, temperature, pressure);
    }
}
