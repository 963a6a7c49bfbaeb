package org.tracegas.quantify;

/**
 * Residual of a fit in one analysis region.
 *
 * @param region the region
 * @param rms    root mean square of sample minus model over the region's points, in absorbance (unweighted)
 */
public record RegionResidual(AnalysisRegion region, double rms) {

    public boolean aboveLimit() {
        return rms > region.residualRmsLimit();
    }
}
