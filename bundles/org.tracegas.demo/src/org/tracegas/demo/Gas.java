package org.tracegas.demo;

/**
 * A gas of the demo campaign: its identity, where its invented line list puts its bands, and the level at
 * which the invented plant emits it.
 *
 * @param name          compound name as analysts write it
 * @param casNumber     CAS registry number
 * @param formula       chemical formula
 * @param molarMass     g/mol
 * @param hitranId      molecule number of the HITRAN convention
 * @param linear        whether the molecule is linear (for the partition-function approximation)
 * @param nominalPpm    typical stack level of the demo plant, in ppm (wet)
 * @param bands         the invented bands of its line list
 */
record Gas(String name, String casNumber, String formula, double molarMass, int hitranId, boolean linear,
        double nominalPpm, Band... bands) {

    /**
     * An invented vibration-rotation band.
     *
     * @param origin       band origin, cm-1
     * @param rotational   rotational constant B, cm-1 (sets the line spacing 2B)
     * @param strength     sum of the line intensities at 296 K, cm-1/(molecule cm-2)
     * @param qBranch      whether the band has a Q branch
     * @param gammaAir     air-broadened half width at 296 K, cm-1/atm
     * @param gammaSelf    self-broadened half width at 296 K, cm-1/atm
     */
    record Band(double origin, double rotational, double strength, boolean qBranch, double gammaAir,
            double gammaSelf) {
    }
}
