package org.tracegas.preprocess;

import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * Moves the features of a uniformly sampled spectrum by a wavenumber offset and keeps the axis: out(s) =
 * in(s - offset), interpolated band-limited. Points whose source lies beyond the ends get NaN.
 */
public final class WavenumberShift {

    private final double offset;
    private final SincResampler resampler;

    /** @throws IllegalArgumentException if the offset is not finite or the resampler is null */
    public WavenumberShift(double offset, SincResampler resampler) {
        if (!Double.isFinite(offset)) {
            throw new IllegalArgumentException("wavenumber shift offset must be finite, was " + offset);
        }
        if (resampler == null) {
            throw new IllegalArgumentException("resampler must not be null");
        }
        this.offset = offset;
        this.resampler = resampler;
    }

    public double offset() {
        return offset;
    }

    /** @throws IllegalArgumentException if the spectrum axis is not uniform */
    public Spectrum apply(Spectrum spectrum) {
        SpectralAxis axis = spectrum.axis();
        if (!axis.isUniform()) {
            throw new IllegalArgumentException("spectrum axis must be uniform for a shift, was " + axis);
        }
        SpectralAxis sources = SpectralAxis.uniform(axis.unit(), axis.first() - offset, axis.step(), axis.size());
        return spectrum.withValues(resampler.resample(spectrum, sources).toArray(), spectrum.ordinate());
    }
}
