package org.tracegas.library.synthesis;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Collections;
import java.util.Optional;
import java.util.Set;

import org.tracegas.library.synthesis.MolecularConstantsPartitionFunction.Level;

/**
 * Partition functions from published constants of the main isotopologue of common stack-gas molecules, keyed by
 * formula. Fundamentals: Shimanouchi, Tables of Molecular Vibrational Frequencies Consolidated Volume I,
 * NSRDS-NBS 39 (1972), as listed by the NIST Computational Chemistry Comparison and Benchmark Database (CCCBDB);
 * ground-state rotational constants and symmetry numbers: CCCBDB and Herzberg, Molecular Spectra and Molecular
 * Structure II (1945); NO spin-orbit splitting: Huber and Herzberg, Constants of Diatomic Molecules (1979). The
 * numbers are written from memory of those tables; the comparison with the TIPS-2021 sums of Gamache et al., JQSRT
 * 271, 107713 (2021) in the tests bounds what a slip could do (every ratio within 0.3 % over 250-500 K).
 * <p>
 * The CO2 symmetric stretch is the unperturbed 1333 cm-1 of the 1285/1388 cm-1 Fermi dyad; the NH3 umbrella mode
 * is the mean 950 cm-1 of its inversion doublet (932/968 cm-1), and the 0.79 cm-1 ground-state inversion
 * doubling, a factor of nearly 2 at every temperature here, is left out as it cancels in a ratio.
 */
public final class PublishedMolecularConstants {

    private static final Map<String, MolecularConstantsPartitionFunction> BY_FORMULA = new LinkedHashMap<>();

    static {
        put(MolecularConstantsPartitionFunction.nonLinear("H2O", 27.877, 14.512, 9.285, 2,
                List.of(new Level(3657.1, 1), new Level(1594.7, 1), new Level(3755.9, 1))));
        put(MolecularConstantsPartitionFunction.linear("CO2", 0.39022, 2,
                List.of(new Level(1333.0, 1), new Level(667.4, 2), new Level(2349.1, 1))));
        put(MolecularConstantsPartitionFunction.linear("CO", 1.9313, 1, List.of(new Level(2143.27, 1))));
        put(MolecularConstantsPartitionFunction.linear("NO", 1.6961, 1, List.of(new Level(1876.0, 1)))
                .withElectronicStates(List.of(new Level(0.0, 2), new Level(119.82, 2))));
        put(MolecularConstantsPartitionFunction.linear("N2O", 0.4190, 1,
                List.of(new Level(1284.9, 1), new Level(588.8, 2), new Level(2223.8, 1))));
        put(MolecularConstantsPartitionFunction.nonLinear("NH3", 9.444, 9.444, 6.196, 3,
                List.of(new Level(3336.2, 1), new Level(950.0, 1), new Level(3443.6, 2), new Level(1626.1, 2))));
        put(MolecularConstantsPartitionFunction.linear("HCl", 10.4398, 1, List.of(new Level(2885.98, 1))));
        put(MolecularConstantsPartitionFunction.nonLinear("CH4", 5.241, 5.241, 5.241, 12,
                List.of(new Level(2917.0, 1), new Level(1534.0, 2), new Level(3019.0, 3), new Level(1306.0, 3))));
        put(MolecularConstantsPartitionFunction.nonLinear("SF6", 0.0911, 0.0911, 0.0911, 24,
                List.of(new Level(775.0, 1), new Level(643.0, 2), new Level(948.0, 3), new Level(615.0, 3),
                        new Level(524.0, 3), new Level(347.0, 3))));
    }

    private PublishedMolecularConstants() {
    }

    private static void put(MolecularConstantsPartitionFunction q) {
        BY_FORMULA.put(q.molecule(), q);
    }

    /** The partition function of the molecule with this formula, if its constants are here. */
    public static Optional<PartitionFunction> forFormula(String formula) {
        return Optional.ofNullable(BY_FORMULA.get(formula));
    }

    /** The formulas whose constants are here, in a fixed order. */
    public static Set<String> formulas() {
        return Collections.unmodifiableSet(BY_FORMULA.keySet());
    }
}
