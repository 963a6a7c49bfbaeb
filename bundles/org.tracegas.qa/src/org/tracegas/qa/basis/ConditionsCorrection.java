package org.tracegas.qa.basis;

import org.tracegas.qa.internal.Require;

/**
 * Correction of a concentration fitted against reference spectra for the differences between the reference
 * and the sample cell, EPA FTIR Protocol (the analysis protocol of EPA Method 320) section 11.2:
 * C_corr = (L_r/L_s)(T_s/T_r)(p_r/p_s) C_calc. Beer-Lambert absorbance scales with the number of absorbers on
 * the path, path x p/T (ideal gas): a fit at the reference's number density misreads a sample cell that is
 * hotter, at lower pressure or of another length by exactly these ratios. The temperature dependence of the line
 * intensities themselves is not corrected: over a whole band it is small (the band intensity barely changes),
 * which is why references should be recorded near the sample temperature.
 * <p>
 * L_r is the path at which C_calc was computed (the fit turns ppm·m into ppm with it), L_s the path of the sample
 * cell: the same nominal path gives 1, a CTS-derived path corrects for a cell whose mirrors drifted.
 */
public final class ConditionsCorrection {

    /** How the rule reads in a report, with its source. */
    public static final String RULE = "C_corr = (L_r/L_s)(T_s/T_r)(p_r/p_s) C_calc, EPA FTIR Protocol "
            + "section 11.2 (not confirmed against the official text)";

    private final double referenceTemperatureK;
    private final double referencePressureKPa;
    private final double fitPathM;

    /**
     * @param referenceTemperatureK T_r, cell temperature of the reference spectra in K
     * @param referencePressureKPa  p_r, cell pressure of the reference spectra in kPa
     * @param fitPathM              L_r, path in m at which the fit turned ppm·m into ppm
     */
    public ConditionsCorrection(double referenceTemperatureK, double referencePressureKPa, double fitPathM) {
        this.referenceTemperatureK = Require.positive("referenceTemperatureK", referenceTemperatureK);
        this.referencePressureKPa = Require.positive("referencePressureKPa", referencePressureKPa);
        this.fitPathM = Require.positive("fitPathM", fitPathM);
    }

    /** (L_r/L_s)(T_s/T_r)(p_r/p_s) for a sample cell. */
    public double factor(CellConditions sample) {
        Require.notNull("sample", sample);
        return (fitPathM / sample.pathM()) * (sample.temperatureK().value() / referenceTemperatureK)
                * (referencePressureKPa / sample.pressureKPa().value());
    }

    /** A fitted concentration corrected to the sample cell, with the conditions used. */
    public CorrectedConcentration correct(double calculated, CellConditions sample) {
        Require.finite("calculated", calculated);
        double factor = factor(sample);
        return new CorrectedConcentration(calculated, calculated * factor, factor, referenceTemperatureK,
                referencePressureKPa, fitPathM, sample);
    }

    /**
     * A concentration before and after the correction, with every number that went into it.
     *
     * @param calculated            C_calc, as fitted
     * @param corrected             C_corr
     * @param factor                C_corr / C_calc
     * @param referenceTemperatureK T_r in K
     * @param referencePressureKPa  p_r in kPa
     * @param fitPathM              L_r in m
     * @param sample                T_s, p_s and L_s with where they came from
     */
    public record CorrectedConcentration(double calculated, double corrected, double factor,
            double referenceTemperatureK, double referencePressureKPa, double fitPathM, CellConditions sample) {
    }
}
