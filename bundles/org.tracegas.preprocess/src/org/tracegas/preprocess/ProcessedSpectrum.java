package org.tracegas.preprocess;

import org.tracegas.spectrum.Spectrum;

/** A processed spectrum with the recipe that made it from its input. */
public record ProcessedSpectrum(Spectrum spectrum, Recipe recipe) {

    /** @throws IllegalArgumentException if a field is null */
    public ProcessedSpectrum {
        if (spectrum == null || recipe == null) {
            throw new IllegalArgumentException("spectrum and recipe must not be null");
        }
    }
}
