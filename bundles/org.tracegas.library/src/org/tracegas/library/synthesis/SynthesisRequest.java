package org.tracegas.library.synthesis;

import org.tracegas.preprocess.Apodization;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.SpectralAxis;

/**
 * What to synthesize: the gas path, the output axis, the instrument settings and the uncertainty to state.
 *
 * @param path                temperature, pressure, concentration and path length
 * @param axis                output axis: uniform, rising, in wavenumbers, at least 2 points
 * @param apodization         apodization of the instrument
 * @param resolution          nominal resolution in cm-1, positive, at least twice the output step
 * @param relativeUncertainty relative standard uncertainty to state for the absorbance scale, in [0, 1)
 */
public record SynthesisRequest(AbsorptionPath path, SpectralAxis axis, Apodization apodization, double resolution,
        double relativeUncertainty) {

    public SynthesisRequest {
        if (path == null || apodization == null) {
            throw new IllegalArgumentException("path and apodization must not be null");
        }
        if (axis == null || axis.unit() != AxisUnit.WAVENUMBER || !axis.isUniform() || !axis.isAscending()
                || axis.size() < 2) {
            throw new IllegalArgumentException("axis must be a uniform, rising wavenumber axis of at least 2 points,"
                    + " was " + axis);
        }
        if (!(resolution > 0 && Double.isFinite(resolution))) {
            throw new IllegalArgumentException("resolution must be positive and finite, was " + resolution);
        }
        if (axis.step() > 0.5 * resolution) {
            throw new IllegalArgumentException("axis step " + axis.step() + " cm-1 must be at most half the resolution "
                    + resolution + " cm-1");
        }
        if (!(relativeUncertainty >= 0 && relativeUncertainty < 1)) {
            throw new IllegalArgumentException("relativeUncertainty must lie in [0, 1), was " + relativeUncertainty);
        }
    }
}
