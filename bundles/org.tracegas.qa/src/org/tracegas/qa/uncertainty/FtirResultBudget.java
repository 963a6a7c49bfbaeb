package org.tracegas.qa.uncertainty;

import java.util.ArrayList;
import java.util.List;

import org.tracegas.qa.internal.Require;

/**
 * Budget of one FTIR concentration C = C_fit · s_ref · (L_nom/L) · (T/T_nom) · (p_nom/p): the fitted value
 * at nominal path, temperature and pressure, corrected for the actual ones; s_ref = 1 is the scale of the
 * reference spectrum. Inputs: fit, reference spectrum, path length, temperature, pressure; on the reporting
 * basis also the H2O and O2 of the conversion.
 */
public final class FtirResultBudget {

    /** Name of the budget row of the fit residual: noise of the single spectrum. */
    public static final String FIT_ROW = "spectral fit";
    /** Name of the budget row of the water vapour used for the wet-to-dry conversion. */
    public static final String H2O_ROW = "H2O for wet-to-dry";
    /** Name of the budget row of the side-channel O2 used for the reference-oxygen correction. */
    public static final String O2_ROW = "O2 for reference-O2 correction";

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
        return budget(compound, concentration, fitUncertainty, pathM, temperatureK, pressureKPa);
    }

    /**
     * The budget at the sample cell a result was corrected to: its own path, temperature and pressure as the
     * correction C_corr = (L_r/L_s)(T_s/T_r)(p_r/p_s) C_calc took them, with the stated standard uncertainties.
     *
     * @param samplePathM the path the result was corrected to (nominal or CTS-derived), m
     */
    public UncertaintyBudget budget(String compound, double concentration, double fitUncertainty, double samplePathM,
            double temperatureK, double pressureKPa) {
        Require.finite("concentration", concentration);
        Require.positive("samplePathM", samplePathM);
        Require.positive("temperatureK", temperatureK);
        Require.positive("pressureKPa", pressureKPa);
        double c = concentration;
        // sensitivities of a product model at the estimates: C/x_i for factors, -C/x_i for divisors
        return UncertaintyBudget.of(compound, c, "ppm", List.of(
                new UncertaintyComponent(FIT_ROW, c, fitUncertainty, 1.0, "ppm"),
                new UncertaintyComponent("reference spectrum", 1.0, relativeReferenceUncertainty, c, "1"),
                new UncertaintyComponent("path length", samplePathM, pathUncertaintyM, -c / samplePathM, "m"),
                new UncertaintyComponent("cell temperature", temperatureK, temperatureUncertaintyK, c / temperatureK,
                        "K"),
                new UncertaintyComponent("cell pressure", pressureKPa, pressureUncertaintyKPa, -c / pressureKPa,
                        "kPa")));
    }

    /**
     * Whether a row of these budgets varies at random from one spectrum to the next: the fit residual does; the
     * reference spectrum, path, temperature and pressure calibrations, and the H2O and O2 rows (whose own
     * calibration dominates over minutes) are taken as systematic, common to every value of a campaign.
     */
    public static boolean random(UncertaintyComponent row) {
        return row.name().equals(FIT_ROW);
    }

    /**
     * Budget of the value on the reporting basis E = C · F (dry gas, reference O2; still a volume fraction in
     * ppm, since the conversion to mg/m³ at standard conditions is an exact factor): the five inputs of
     * {@link #budget} with their sensitivities times F, then the H2O of the wet-to-dry conversion and, with an
     * oxygen correction, the O2 of the side channel, each with the sensitivity c_i = ∂E/∂x_i (JCGM 100:2008
     * 5.1.3) of {@link BasisConversion}.
     */
    public UncertaintyBudget budgetOnBasis(String compound, double concentration, double fitUncertainty,
            double temperatureK, double pressureKPa, BasisConversion conversion) {
        return budgetOnBasis(compound, concentration, fitUncertainty, pathM, temperatureK, pressureKPa, conversion);
    }

    /**
     * {@link #budgetOnBasis(String, double, double, double, double, BasisConversion)} at the sample cell a result
     * was corrected to, as {@link #budget(String, double, double, double, double, double)}.
     */
    public UncertaintyBudget budgetOnBasis(String compound, double concentration, double fitUncertainty,
            double samplePathM, double temperatureK, double pressureKPa, BasisConversion conversion) {
        Require.notNull("conversion", conversion);
        double f = conversion.factor();
        double e = concentration * f;
        List<UncertaintyComponent> components = new ArrayList<>();
        for (UncertaintyComponent c : budget(compound, concentration, fitUncertainty, samplePathM, temperatureK,
                pressureKPa).components()) {
            components.add(new UncertaintyComponent(c.name(), c.estimate(), c.standardUncertainty(),
                    c.sensitivity() * f, c.unit()));
        }
        components.add(new UncertaintyComponent(H2O_ROW, conversion.h2oFraction(), conversion.h2oUncertainty(),
                e * conversion.relativeH2oSensitivity(), "mol/mol"));
        if (conversion.hasOxygenCorrection()) {
            components.add(new UncertaintyComponent(conversion.o2OnWetGas() ? O2_ROW + " (wet gas)" : O2_ROW,
                    conversion.o2Percent(), conversion.o2Uncertainty(), e * conversion.relativeO2Sensitivity(),
                    "% vol"));
        }
        return UncertaintyBudget.of(compound, e, "ppm (basis)", components);
    }
}
