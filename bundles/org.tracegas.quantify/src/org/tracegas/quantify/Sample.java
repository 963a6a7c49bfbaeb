package org.tracegas.quantify;

import org.tracegas.spectrum.Spectrum;

/**
 * A sample absorbance spectrum to quantify, with the age of its background if the caller checks it.
 *
 * @param absorbance       the sample absorbance spectrum
 * @param background       background age and limit, or null when not checked
 * @param noiseCorrelation factor, at least 1, by which the standard uncertainty of a fitted amount is enlarged
 *                         because the noise of neighbouring points is correlated (apodization and zero filling
 *                         spread each point's noise over its neighbours, so the least-squares formula, which counts
 *                         every point as independent, understates the uncertainty); 1 for white noise
 */
public record Sample(Spectrum absorbance, BackgroundAge background, double noiseCorrelation) {

    /** @throws IllegalArgumentException if the spectrum is null or the factor is below 1 or not finite */
    public Sample {
        if (absorbance == null) {
            throw new IllegalArgumentException("absorbance must not be null");
        }
        if (!(noiseCorrelation >= 1 && Double.isFinite(noiseCorrelation))) {
            throw new IllegalArgumentException("noiseCorrelation must be finite and at least 1, was "
                    + noiseCorrelation);
        }
    }

    /** A sample with uncorrelated noise between points. */
    public Sample(Spectrum absorbance, BackgroundAge background) {
        this(absorbance, background, 1);
    }

    /** A sample whose background age is not checked, with uncorrelated noise between points. */
    public static Sample of(Spectrum absorbance) {
        return new Sample(absorbance, null);
    }
}
