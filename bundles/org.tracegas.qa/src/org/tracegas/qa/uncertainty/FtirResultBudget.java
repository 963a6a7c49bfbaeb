package org.tracegas.qa.uncertainty;

import java.util.List;

import org.tracegas.qa.internal.Require;

/**
 * Budget of one FTIR concentration C = C_fit · s_ref · (L_nom/L) · (T/T_nom) · (p_nom/p): the fitted value
 * at nominal path, temperature and pressure, corrected for the actual ones; s_ref = 1 is the scale of the
 * reference spectrum. Inputs: fit, reference spectrum, path length, temperature, pressure.
 */
public final class FtirResultBudget {

    private final double relativeReferenceUncertainty;
    private final double pathM;
    private final double pathUncertaintyM;
    private final double temperatureUncertaintyK;
    private final double pressureUncertaintyKPa;

    /**
     * @param relativeReferenceUncertainty standard uncertainty of the reference spectrum as a fraction (0.02 for 2 %)
     * @param pathM                        effective path length in m
     * @param pathUncertaintyM             its standard uncertainty in m
     * @param temperatureUncertaintyK      standard uncertainty of the cell temperature in K
     * @param pressureUncertaintyKPa       standard uncertainty of the cell pressure in kPa
     */
    public FtirResultBudget(double relativeReferenceUncertainty, double pathM, double pathUncertaintyM,
            double temperatureUncertaintyK, double pressureUncertaintyKPa) {
        this.relativeReferenceUncertainty = Require.nonNegative("relativeReferenceUncertainty",
                relativeReferenceUncertainty);
        this.pathM = Require.positive("pathM", pathM);
        this.pathUncertaintyM = Require.nonNegative("pathUncertaintyM", pathUncertaintyM);
        this.temperatureUncertaintyK = Require.nonNegative("temperatureUncertaintyK", temperatureUncertaintyK);
        this.pressureUncertaintyKPa = Require.nonNegative("pressureUncertaintyKPa", pressureUncertaintyKPa);
    }

    /**
     * @param compound     name of the compound
     * @param concentration the corrected concentration C (ppm)
     * @param fitUncertainty standard uncertainty of the fitted value from the fit residual, scaled like C (ppm)
     * @param temperatureK cell temperature
     * @param pressureKPa  cell pressure
     */
    public UncertaintyBudget budget(String compound, double concentration, double fitUncertainty,
            double temperatureK, double pressureKPa) {
        Require.finite("concentration", concentration);
        Require.positive("temperatureK", temperatureK);
        Require.positive("pressureKPa", pressureKPa);
        double c = concentration;
        // sensitivities of a product model at the estimates: C/x_i for factors, -C/x_i for divisors
        return UncertaintyBudget.of(compound, c, "ppm", List.of(
                new UncertaintyComponent("spectral fit", c, fitUncertainty, 1.0, "ppm"),
                new UncertaintyComponent("reference spectrum", 1.0, relativeReferenceUncertainty, c, "1"),
                new UncertaintyComponent("path length", pathM, pathUncertaintyM, -c / pathM, "m"),
                new UncertaintyComponent("cell temperature", temperatureK, temperatureUncertaintyK, c / temperatureK,
                        "K"),
                new UncertaintyComponent("cell pressure", pressureKPa, pressureUncertaintyKPa, -c / pressureKPa,
                        "kPa")));
    }
}
