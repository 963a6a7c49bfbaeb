package org.tracegas.quantify;

import java.util.Collections;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * Result of one analyte in one spectrum. Concentrations are in ppm at the method's optical path.
 *
 * @param compound            the analyte
 * @param concentration       concentration in ppm
 * @param standardUncertainty standard uncertainty in ppm, from sigma^2 (J^T W J)^-1 with J the design (the
 *                            Jacobian at the optimum for a non-linear fit) and sigma^2 the residual variance of
 *                            the fit (for the curve-of-growth fit, where the compound's information lies), times
 *                            the sample's noise-correlation factor
 * @param detectionLimit      three standard uncertainties, in ppm
 * @param reportingUnit       unit for {@link #reported(double)}
 * @param residuals           residual per region of the analyte, in the method's region order
 * @param flags               quality flags
 * @param iterations          iterations of the non-linear part of the fit, 0 for a linear fit
 * @param shift               fitted wavenumber shift in cm-1, NaN when the method fits none
 * @param width               fitted width change in cm-2, NaN when the method fits none
 * @param scale               fitted relative wavenumber scale of the sample against the references (the sample's
 *                            lines lie at nu (1 + scale) for reference lines at nu), NaN when the method fits none
 * @param spectra             fitted spectra for plots, present only when requested
 */
public record CompoundResult(String compound, double concentration, double standardUncertainty, double detectionLimit,
        ReportingUnit reportingUnit, List<RegionResidual> residuals, Set<QualityFlag> flags, int iterations,
        double shift, double width, double scale, Optional<FitSpectra> spectra) {

    public CompoundResult {
        residuals = List.copyOf(residuals);
        EnumSet<QualityFlag> copy = EnumSet.noneOf(QualityFlag.class);
        copy.addAll(flags);
        flags = Collections.unmodifiableSet(copy);
    }

    /** A value in ppm converted to the reporting unit. */
    public double reported(double ppm) {
        return reportingUnit.fromPpm(ppm);
    }

    public boolean flagged(QualityFlag flag) {
        return flags.contains(flag);
    }
}
