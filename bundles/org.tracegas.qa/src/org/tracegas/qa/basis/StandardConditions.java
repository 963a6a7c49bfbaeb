package org.tracegas.qa.basis;

import org.tracegas.qa.internal.Require;

/**
 * Temperature and pressure that a mass concentration refers to.
 *
 * @param temperatureK temperature in K
 * @param pressureKPa  pressure in kPa
 */
public record StandardConditions(double temperatureK, double pressureKPa) {

    /** Molar gas constant in J/(mol·K); exact since the 2019 SI redefinition (CODATA 2018). */
    public static final double GAS_CONSTANT = 8.314462618;

    /** 273.15 K and 101.325 kPa. */
    public static final StandardConditions NORMAL = new StandardConditions(273.15, 101.325);
    /** 273.15 K and 101.3 kPa, the wording of EU emission legislation. */
    public static final StandardConditions EU_EMISSIONS = new StandardConditions(273.15, 101.3);
    /** 298.15 K and 101.325 kPa. */
    public static final StandardConditions AMBIENT_25C = new StandardConditions(298.15, 101.325);

    public StandardConditions {
        Require.positive("temperatureK", temperatureK);
        Require.positive("pressureKPa", pressureKPa);
    }

    /** Ideal-gas molar volume V_m = R·T/p in L/mol. */
    public double molarVolumeLitresPerMol() {
        return GAS_CONSTANT * temperatureK / pressureKPa;
    }

    /** Mass concentration in mg/m³ of a volume fraction in ppm (µmol/mol): ppm·M/V_m. */
    public double ppmToMgPerCubicMetre(double ppm, double molarMassGPerMol) {
        Require.finite("ppm", ppm);
        Require.positive("molarMassGPerMol", molarMassGPerMol);
        return ppm * molarMassGPerMol / molarVolumeLitresPerMol();
    }

    /** The inverse of {@link #ppmToMgPerCubicMetre}. */
    public double mgPerCubicMetreToPpm(double mgPerCubicMetre, double molarMassGPerMol) {
        Require.finite("mgPerCubicMetre", mgPerCubicMetre);
        Require.positive("molarMassGPerMol", molarMassGPerMol);
        return mgPerCubicMetre * molarVolumeLitresPerMol() / molarMassGPerMol;
    }
}
