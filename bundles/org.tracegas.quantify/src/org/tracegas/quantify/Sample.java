package org.tracegas.quantify;

import org.tracegas.spectrum.Spectrum;

/**
 * A sample absorbance spectrum to quantify, with the age of its background if the caller checks it.
 *
 * @param absorbance the sample absorbance spectrum
 * @param background background age and limit, or null when not checked
 */
public record Sample(Spectrum absorbance, BackgroundAge background) {

    /** @throws IllegalArgumentException if the spectrum is null */
    public Sample {
        if (absorbance == null) {
            throw new IllegalArgumentException("absorbance must not be null");
        }
    }

    /** A sample whose background age is not checked. */
    public static Sample of(Spectrum absorbance) {
        return new Sample(absorbance, null);
    }
}
