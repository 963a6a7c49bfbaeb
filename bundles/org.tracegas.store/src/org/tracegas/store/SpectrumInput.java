package org.tracegas.store;

import org.tracegas.model.SpectralContent;
import org.tracegas.spectrum.Spectrum;

/**
 * A spectrum to store.
 *
 * @param measurementId the measurement it belongs to, or null
 * @param content       what the array holds
 * @param spectrum      axis and values
 * @param encoding      how the values are stored
 */
public record SpectrumInput(String measurementId, SpectralContent content, Spectrum spectrum,
        SampleEncoding encoding) {

    public SpectrumInput {
        if (content == null) {
            throw new IllegalArgumentException("content must not be null");
        }
        if (spectrum == null) {
            throw new IllegalArgumentException("spectrum must not be null");
        }
        if (encoding == null) {
            throw new IllegalArgumentException("encoding must not be null");
        }
    }

    /** A bit-exact (float64) spectrum of no particular measurement. */
    public static SpectrumInput of(SpectralContent content, Spectrum spectrum) {
        return new SpectrumInput(null, content, spectrum, SampleEncoding.FLOAT64_LE);
    }
}
