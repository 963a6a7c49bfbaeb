package org.tracegas.library.synthesis;

/**
 * Approximation Q(T) proportional to T^j, the classical rigid-rotor rotational partition function: j = 1 for
 * linear molecules, j = 1.5 for non-linear ones.
 * <p>
 * The approximation ignores the vibrational partition function (and centrifugal distortion, nuclear spin
 * and electronic terms, which cancel in the ratio or are small). Its error in the ratio Q(296 K)/Q(T) is
 * the ratio of the harmonic vibrational sums Q_vib(T)/Q_vib(296 K), with Q_vib = prod (1 - exp(-c2 w_i / T))^-d_i:
 * for CO (w = 2143 cm-1) it stays below 0.02 % between 250 and 350 K, for H2O (lowest w = 1595 cm-1) below
 * 0.1 %, but for molecules with low bending modes it is large, for CO2 (w2 = 667 cm-1, twofold) about 6 % at
 * 350 K and 12 % at 400 K (harmonic estimate; fundamental wavenumbers from memory). Use a
 * {@link TabulatedPartitionFunction} or {@link MolecularConstantsPartitionFunction} for those, and for all
 * molecules far from 296 K (against TIPS-2021 at 450 K this law is 17 % off for CO2, 20 % for N2O, 80 % for SF6).
 */
public final class PowerLawPartitionFunction implements PartitionFunction {

    private final double exponent;

    /** @param exponent j in Q proportional to T^j, positive */
    public PowerLawPartitionFunction(double exponent) {
        if (!(exponent > 0 && Double.isFinite(exponent))) {
            throw new IllegalArgumentException("exponent must be positive and finite, was " + exponent);
        }
        this.exponent = exponent;
    }

    /** Q proportional to T (linear molecules such as CO, NO, HCl, CO2, N2O). */
    public static PowerLawPartitionFunction linearMolecule() {
        return new PowerLawPartitionFunction(1.0);
    }

    /** Q proportional to T^1.5 (non-linear molecules such as H2O, CH4, NH3, SO2). */
    public static PowerLawPartitionFunction nonLinearMolecule() {
        return new PowerLawPartitionFunction(1.5);
    }

    @Override
    public double value(double temperature) {
        if (!(temperature > 0 && Double.isFinite(temperature))) {
            throw new IllegalArgumentException("temperature must be positive and finite, was " + temperature);
        }
        return Math.pow(temperature, exponent);
    }

    @Override
    public String description() {
        return "Q ~ T^" + exponent + " (rigid rotor without vibration)";
    }

    public double exponent() {
        return exponent;
    }
}
