package org.tracegas.library.synthesis;

import java.util.Map;

/**
 * Total internal partition sums of the main isotopologues at 250, 296, 350, 400, 450 and 500 K from TIPS-2021:
 * Gamache et al., "Total internal partition sums for the HITRAN2020 database", JQSRT 271, 107713 (2021), read from
 * the 1 K tables of the TIPS-2021 distribution as carried by the ARTS radiative-transfer package (src/partfun,
 * files H2O-161, CO2-626, CO-26, NO-46, N2O-446, NH3-4111, HCl-15, CH4-211, SF6-29). The 296 K values agree
 * with the Q(296 K) of the HITRAN isotopologue table (CO 107.42, CO2 286.09, H2O 174.58, CH4 590.48).
 */
final class Tips2021 {

    static final double[] TEMPERATURES = {250, 296, 350, 400, 450, 500};

    static final Map<String, double[]> Q = Map.of(
            "H2O", new double[] {135.70032, 174.5813, 224.44228, 274.5691, 328.50604, 386.32812},
            "CO2", new double[] {232.83719, 286.09382, 357.76174, 434.6809, 523.42631, 625.65731},
            "CO", new double[] {90.766281, 107.419824, 126.986735, 145.140529, 163.360418, 181.686304},
            "NO", new double[] {930.09268, 1142.13232, 1395.60919, 1633.90385, 1875.51605, 2120.74276},
            "N2O", new double[] {4003.8376, 4984.89635, 6332.22436, 7802.10508, 9519.66994, 11519.67549},
            "NH3", new double[] {1331.53662, 1725.22115, 2245.43944, 2790.04297, 3403.77108, 4096.29664},
            "HCl", new double[] {136.0699, 160.65438, 189.53685, 216.30422, 243.10265, 269.94627},
            "CH4", new double[] {456.58961, 590.47834, 767.52472, 954.59638, 1169.18175, 1417.48485},
            "SF6", new double[] {833755.9, 1610988.4, 3545008.7, 7393198.1, 15360788, 31609285});

    private Tips2021() {
    }

    /** Q(T) / Q(296 K) at TEMPERATURES[index]. */
    static double ratioTo296(String formula, int index) {
        double[] q = Q.get(formula);
        return q[index] / q[1];
    }
}
