package org.tracegas.quantify;

import java.util.Set;

import org.tracegas.quantify.internal.ClassicalLeastSquaresAlgorithm;
import org.tracegas.quantify.internal.CurveOfGrowthAlgorithm;
import org.tracegas.spectrum.SpectralAxis;

/**
 * How a method turns the sample absorbance into amounts; every algorithm reports the same kind of result. The
 * built-in algorithms and those of other bundles are found by name in a {@link FitAlgorithmRegistry}; a method file
 * and a stored method version name the algorithm by {@link #name()}. Implementations are immutable and safe to share
 * between threads; two instances that fit alike are equal.
 */
public interface FitAlgorithm {

    /**
     * Classical least squares: absorbance proportional to the amount, pooled over the references, optionally with
     * the absorptivity interpolated between references at the current estimate ({@link
     * QuantificationMethod#nonlinearity()}) and line position terms ({@link ShiftTerm#SHIFT}, {@link
     * ShiftTerm#SHIFT_AND_WIDTH}). The default of a method.
     */
    FitAlgorithm CLASSICAL_LEAST_SQUARES = new ClassicalLeastSquaresAlgorithm();

    /**
     * A smooth, monotone curve of growth at every spectral point, absorbance against amount through the origin and
     * fixed by the references; all compounds and baselines fitted together by Gauss-Newton with Levenberg-Marquardt
     * damping. For saturated lines measured at several amounts. Line position term: {@link ShiftTerm#SCALE}.
     */
    FitAlgorithm CURVE_OF_GROWTH = new CurveOfGrowthAlgorithm();

    /**
     * The name by which method files and stored method versions know the algorithm: lower-case letters and digits in
     * words joined by '-', for example "curve-of-growth". Stored texts keep it for years, so it never changes.
     */
    String name();

    /** The line position terms the algorithm offers besides {@link ShiftTerm#NONE}. */
    Set<ShiftTerm> shiftTerms();

    /**
     * Whether a method must hold reference spectra of every compound it fits; an algorithm that models the
     * compounds from other data (line lists, say) needs none.
     */
    default boolean fitsReferences() {
        return true;
    }

    /**
     * Makes the method ready for samples on one axis: everything that does not depend on the sample is computed
     * here.
     *
     * @param method the method, which names this algorithm
     * @param axis   the wavenumber axis of the samples to come, of at least 2 points
     * @throws IllegalArgumentException if the method cannot fit samples on the axis; the message names the analyte
     *                                  or compound at fault and why
     */
    PreparedFit prepare(QuantificationMethod method, SpectralAxis axis);
}
