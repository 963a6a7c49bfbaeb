package org.tracegas.method;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.tracegas.library.Compound;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.library.io.PartitionTableText;
import org.tracegas.library.synthesis.PartitionFunction;
import org.tracegas.library.synthesis.PowerLawPartitionFunction;
import org.tracegas.library.synthesis.PublishedMolecularConstants;
import org.tracegas.preprocess.Apodization;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.SpectralAxis;

/**
 * What synthetic references to make, read from a library plan file:
 *
 * <pre>
 * library = Stack gas references, hot cell      name of the library
 * temperature = 438.15                           cell temperature, K
 * pressure = 101.3                               cell pressure, kPa
 * path-length = 6.4                              cell path, m (concentration = ppm-m / path-length)
 * resolution = 1.0                               nominal resolution, cm-1
 * apodization = norton-beer-medium
 * first-wavenumber = 700.02                      output axis: first point, cm-1,
 * step = 0.2410888671875                         step, cm-1 (at most half the resolution),
 * points = 13275                                 and number of points (use the axis of the processed spectra)
 * uncertainty = 0.02                             relative standard uncertainty stated for each reference
 *
 * [compound]                                     one block per gas
 * name = CO
 * cas = 630-08-0
 * formula = CO
 * molar-mass = 28.010
 * line-list = co.par                             HITRAN-format line list, relative to the plan
 * partition = table                              Q(T): table (from partition-table), constants (published
 *                                                molecular constants of the formula), or the rough power laws
 *                                                linear (Q ~ T) and non-linear (Q ~ T^1.5)
 * partition-table = co-q.txt                     temperature/K and Q per line, relative to the plan
 * ppm-m = 38.4, 115.2, 614.4                     amounts to synthesize, ppm·m
 * </pre>
 */
public record LibraryPlan(Path file, String name, double temperatureK, double pressureKPa, double pathLengthM,
        double resolution, Apodization apodization, SpectralAxis axis, double relativeUncertainty,
        List<Gas> gases) {

    /**
     * One gas of the plan, how its partition function is had and the amounts to synthesize of it.
     *
     * @param partition      table, constants, linear or non-linear
     * @param partitionTable the Q(T) table when partition is table, else null
     */
    public record Gas(Compound compound, Path lineList, String partition, Path partitionTable,
            List<Double> ppmMetres, int line) {

        /**
         * The partition function: read from the table, taken from the published constants of the formula, or
         * one of the power laws.
         *
         * @throws FileFormatException naming the table file and line at fault
         */
        public PartitionFunction partitionFunction() throws IOException {
            switch (partition) {
                case "table":
                    return PartitionTableText.read(partitionTable);
                case "constants":
                    return PublishedMolecularConstants.forFormula(compound.formula()).orElseThrow();
                case "linear":
                    return PowerLawPartitionFunction.linearMolecule();
                default:
                    return PowerLawPartitionFunction.nonLinearMolecule();
            }
        }
    }

    private static final Set<String> HEAD = Set.of("library", "temperature", "pressure", "path-length", "resolution",
            "apodization", "first-wavenumber", "step", "points", "uncertainty");
    private static final Set<String> GAS = Set.of("name", "cas", "formula", "molar-mass", "line-list", "partition",
            "partition-table", "ppm-m");

    public LibraryPlan {
        gases = List.copyOf(gases);
    }

    /** @throws FileFormatException naming the file, line and key of the first error */
    public static LibraryPlan read(Path file) throws IOException {
        return parse(KeyValueFile.read(file));
    }

    /**
     * A plan written as text, its line lists named relative to where the file would be.
     *
     * @param file names the text in errors and resolves the line lists
     * @throws FileFormatException naming the file, line and key of the first error
     */
    public static LibraryPlan parse(String text, Path file) throws FileFormatException {
        return parse(KeyValueFile.parse(text, file));
    }

    private static LibraryPlan parse(KeyValueFile f) throws FileFormatException {
        Path file = f.file();
        f.allowBlocks(Set.of("compound"));
        KeyValueFile.Section h = f.head().allow(HEAD);
        SpectralAxis axis;
        try {
            axis = SpectralAxis.uniform(AxisUnit.WAVENUMBER, h.number("first-wavenumber"), h.number("step"),
                    h.value("points").integer());
        } catch (IllegalArgumentException e) {
            throw h.error("points", e.getMessage());
        }
        if (!(axis.step() > 0)) {
            throw h.error("step", "must be positive, was " + axis.step());
        }
        List<Gas> gases = new ArrayList<>();
        for (KeyValueFile.Section b : f.blocks("compound")) {
            b.allow(GAS);
            Compound compound;
            try {
                compound = new Compound(b.text("name"), b.text("cas"), b.text("formula"), b.number("molar-mass"));
            } catch (IllegalArgumentException e) {
                String m = e.getMessage();
                throw b.error(m.startsWith("cas") ? "cas" : m.startsWith("molarMass") ? "molar-mass"
                        : m.startsWith("formula") ? "formula" : "name", m);
            }
            String partition = b.text("partition");
            checkPartition(b, partition, compound.formula());
            List<Double> amounts = b.value("ppm-m").numbers();
            for (double a : amounts) {
                if (!(a > 0)) {
                    throw b.error("ppm-m", "amounts must be positive, found " + a);
                }
            }
            gases.add(new Gas(compound, f.resolve(b.text("line-list")), partition,
                    partition.equals("table") ? f.resolve(b.text("partition-table")) : null, amounts, b.line()));
        }
        if (gases.isEmpty()) {
            throw new FileFormatException(file, 0, "[compound]", "the plan names no compound");
        }
        double uncertainty = h.number("uncertainty");
        if (!(uncertainty >= 0 && uncertainty < 1)) {
            throw h.error("uncertainty", "must lie in [0, 1), was " + uncertainty);
        }
        for (String key : List.of("temperature", "pressure", "path-length", "resolution")) {
            if (!(h.number(key) > 0)) {
                throw h.error(key, "must be positive, was " + h.number(key));
            }
        }
        if (axis.step() > 0.5 * h.number("resolution")) {
            throw h.error("step", "must be at most half the resolution " + h.number("resolution") + " cm-1");
        }
        return new LibraryPlan(file, h.text("library"), h.number("temperature"), h.number("pressure"),
                h.number("path-length"), h.number("resolution"), h.constant("apodization", Apodization.class), axis,
                uncertainty, gases);
    }

    private static void checkPartition(KeyValueFile.Section b, String kind, String formula)
            throws FileFormatException {
        if (!List.of("table", "constants", "linear", "non-linear").contains(kind)) {
            throw b.error("partition", "'" + kind + "' is none of table, constants, linear, non-linear");
        }
        if (b.has("partition-table") != kind.equals("table")) {
            throw b.error("partition-table", "is given exactly when partition = table");
        }
        if (kind.equals("constants") && PublishedMolecularConstants.forFormula(formula).isEmpty()) {
            throw b.error("partition", "no published constants for " + formula + ", known: "
                    + PublishedMolecularConstants.formulas());
        }
    }
}
