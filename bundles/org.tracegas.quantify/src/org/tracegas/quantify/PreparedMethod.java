package org.tracegas.quantify;

import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.SpectralAxis;

/**
 * A method made ready for samples on one axis by its {@link FitAlgorithm}: everything that does not depend on the
 * sample computed once (for the built-in algorithms: references resampled onto the axis, design matrices
 * decomposed, pseudo-inverses or Gram matrices formed). Immutable and safe to share between threads.
 */
public final class PreparedMethod {

    private final QuantificationMethod method;
    private final SpectralAxis axis;
    private final PreparedFit fit;

    private PreparedMethod(QuantificationMethod method, SpectralAxis axis, PreparedFit fit) {
        this.method = method;
        this.axis = axis;
        this.fit = fit;
    }

    /**
     * @param method the method
     * @param axis   the wavenumber axis of the samples to come
     * @throws IllegalArgumentException if the axis is not in wavenumbers, or the method's algorithm cannot fit on it:
     *                                  a reference or the weights do not cover a region, a region holds too few
     *                                  points, compounds cannot be told apart in a fit, or a reference's axis does
     *                                  not suit the algorithm; the message names the analyte and compound
     */
    public static PreparedMethod prepare(QuantificationMethod method, SpectralAxis axis) {
        if (method == null) {
            throw new IllegalArgumentException("method must not be null");
        }
        if (axis == null || axis.unit() != AxisUnit.WAVENUMBER || axis.size() < 2) {
            throw new IllegalArgumentException("axis must be a WAVENUMBER axis of at least 2 points, was " + axis);
        }
        PreparedFit fit = method.algorithm().prepare(method, axis);
        if (fit == null) {
            throw new IllegalArgumentException("algorithm " + method.algorithm().name() + " prepared no fit for "
                    + method.name());
        }
        return new PreparedMethod(method, axis, fit);
    }

    public QuantificationMethod method() {
        return method;
    }

    public SpectralAxis axis() {
        return axis;
    }

    /** Number of distinct fits solved per sample. */
    public int systemCount() {
        return fit.systemCount();
    }

    PreparedFit fit() {
        return fit;
    }
}
