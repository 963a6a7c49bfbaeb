package org.tracegas.quantify;

import java.util.List;

/**
 * A method made ready by its {@link FitAlgorithm} for samples on one axis. Immutable and safe to share between
 * threads: each call fits one spectrum on its own.
 */
public interface PreparedFit {

    /** Number of independent fits solved per sample (analytes fitted with the same compounds and regions share one). */
    int systemCount();

    /**
     * Fits one sample: one result per analyte, in the method's order.
     *
     * @param sample      absorbance on the prepared axis (the caller has checked ordinate and axis)
     * @param keepSpectra whether the results carry the fitted spectra and residuals for plots
     * @throws IllegalArgumentException if the algorithm cannot fit the sample; the message names the point and why
     */
    List<CompoundResult> fit(Sample sample, boolean keepSpectra);
}
