package org.tracegas.library.synthesis;

import static org.tracegas.library.synthesis.PhysicalConstants.C2;

import java.util.List;

/**
 * Q(T) computed from a molecule's constants as the product of a rigid-rotor rotational sum, a harmonic-oscillator
 * vibrational sum over the fundamentals and an electronic sum over low-lying states (Herzberg, Molecular Spectra
 * and Molecular Structure II (1945), ch. V; McQuarrie, Statistical Mechanics (1976), ch. 6 and 8):
 * <ul>
 * <li>linear molecule: Q_rot = (T / c2 B) (1 + c2 B / 3T + (c2 B / T)^2 / 15) / sigma (Mulholland's
 * expansion of the rigid-rotor sum);</li>
 * <li>non-linear molecule: Q_rot = sqrt(pi / (A B C)) (T / c2)^1.5 / sigma (classical limit; its first quantum
 * correction is below 1 % of Q for the molecules here and nearly cancels in a ratio);</li>
 * <li>Q_vib = prod_i (1 - exp(-c2 w_i / T))^-d_i with the fundamental wavenumbers w_i and degeneracies d_i;</li>
 * <li>Q_el = sum_j g_j exp(-c2 E_j / T).</li>
 * </ul>
 * Anharmonicity, rotation-vibration coupling and centrifugal distortion are left out; between 250 and 500 K they
 * move the ratio Q(T)/Q(296 K) of the molecules in {@link PublishedMolecularConstants} by at most 0.3 % against the
 * total internal partition sums of Gamache et al., JQSRT 271, 107713 (2021). Nuclear-spin factors are constant
 * and cancel in every ratio, so Q here is on the scale of the symmetry number only.
 */
public final class MolecularConstantsPartitionFunction implements PartitionFunction {

    /** A vibrational fundamental or an electronic state: wavenumber (cm-1) above the ground state and degeneracy. */
    public record Level(double wavenumber, int degeneracy) {

        /** @throws IllegalArgumentException if the wavenumber is negative or not finite, or the degeneracy below 1 */
        public Level {
            if (!(wavenumber >= 0 && Double.isFinite(wavenumber))) {
                throw new IllegalArgumentException("wavenumber must be finite and not negative, was " + wavenumber);
            }
            if (degeneracy < 1) {
                throw new IllegalArgumentException("degeneracy must be at least 1, was " + degeneracy);
            }
        }
    }

    private final String molecule;
    private final double[] rotational;
    private final int symmetryNumber;
    private final List<Level> fundamentals;
    private final List<Level> electronicStates;

    private MolecularConstantsPartitionFunction(String molecule, double[] rotational, int symmetryNumber,
            List<Level> fundamentals, List<Level> electronicStates) {
        if (molecule == null || molecule.isBlank()) {
            throw new IllegalArgumentException("molecule must be named");
        }
        for (double b : rotational) {
            if (!(b > 0 && Double.isFinite(b))) {
                throw new IllegalArgumentException(molecule + ": rotational constants must be positive, was " + b);
            }
        }
        if (symmetryNumber < 1) {
            throw new IllegalArgumentException(molecule + ": symmetry number must be at least 1, was "
                    + symmetryNumber);
        }
        if (fundamentals.stream().anyMatch(l -> l.wavenumber() == 0)) {
            throw new IllegalArgumentException(molecule + ": a fundamental must lie above the ground state");
        }
        this.molecule = molecule;
        this.rotational = rotational.clone();
        this.symmetryNumber = symmetryNumber;
        this.fundamentals = List.copyOf(fundamentals);
        this.electronicStates = List.copyOf(electronicStates);
    }

    /**
     * A linear molecule in a single electronic state.
     *
     * @param b rotational constant B in cm-1
     */
    public static MolecularConstantsPartitionFunction linear(String molecule, double b, int symmetryNumber,
            List<Level> fundamentals) {
        return new MolecularConstantsPartitionFunction(molecule, new double[] {b}, symmetryNumber, fundamentals,
                List.of());
    }

    /**
     * A non-linear molecule in a single electronic state.
     *
     * @param a, b, c rotational constants in cm-1 (equal for a spherical top, two equal for a symmetric top)
     */
    public static MolecularConstantsPartitionFunction nonLinear(String molecule, double a, double b, double c,
            int symmetryNumber, List<Level> fundamentals) {
        return new MolecularConstantsPartitionFunction(molecule, new double[] {a, b, c}, symmetryNumber,
                fundamentals, List.of());
    }

    /**
     * The same molecule with low-lying electronic states (the ground state included, at 0 cm-1), as the two
     * spin-orbit components of NO.
     */
    public MolecularConstantsPartitionFunction withElectronicStates(List<Level> states) {
        if (states.isEmpty() || states.stream().noneMatch(l -> l.wavenumber() == 0)) {
            throw new IllegalArgumentException(molecule + ": electronic states must include the ground state at 0");
        }
        return new MolecularConstantsPartitionFunction(molecule, rotational, symmetryNumber, fundamentals, states);
    }

    /** The molecule these constants belong to, as its formula. */
    public String molecule() {
        return molecule;
    }

    @Override
    public double value(double temperature) {
        if (!(temperature > 0 && Double.isFinite(temperature))) {
            throw new IllegalArgumentException("temperature must be positive and finite, was " + temperature);
        }
        return rotationalSum(temperature) * vibrationalSum(temperature) * electronicSum(temperature);
    }

    private double rotationalSum(double t) {
        if (rotational.length == 1) {
            double x = C2 * rotational[0] / t;
            return (1.0 + x / 3.0 + x * x / 15.0) / (x * symmetryNumber);
        }
        double kt = t / C2;
        return Math.sqrt(Math.PI / (rotational[0] * rotational[1] * rotational[2])) * kt * Math.sqrt(kt)
                / symmetryNumber;
    }

    private double vibrationalSum(double t) {
        double q = 1.0;
        for (Level mode : fundamentals) {
            q *= Math.pow(-Math.expm1(-C2 * mode.wavenumber() / t), -mode.degeneracy());
        }
        return q;
    }

    private double electronicSum(double t) {
        if (electronicStates.isEmpty()) {
            return 1.0;
        }
        double q = 0.0;
        for (Level state : electronicStates) {
            q += state.degeneracy() * Math.exp(-C2 * state.wavenumber() / t);
        }
        return q;
    }

    @Override
    public String description() {
        return "rigid rotor x harmonic oscillator" + (electronicStates.isEmpty() ? "" : " x electronic states")
                + " from the published constants of " + molecule;
    }

    @Override
    public String toString() {
        return "MolecularConstantsPartitionFunction[" + molecule + "]";
    }
}
