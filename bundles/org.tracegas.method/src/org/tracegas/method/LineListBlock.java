package org.tracegas.method;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.tracegas.library.io.FileFormatException;
import org.tracegas.quantify.AlgorithmSetting;
import org.tracegas.store.RawFile;

/**
 * The {@code [line-list]} block of a method that fits with line lists ({@code algorithm = line-list}): what the
 * computed spectra depend on besides the method's path length, resolution and apodization, so that the method's
 * version binds it.
 *
 * <pre>
 * [line-list]
 * temperature = 308.15        gas temperature in the cell for the model, K
 * pressure = 99.8             total pressure in the cell for the model, kPa
 * field-of-view = 0.008       half angle of the beam in the interferometer, rad
 * cell-conditions = measured  optional: compute the spectra at each measurement's own measured cell temperature and
 *                             pressure instead of the two above (stated, the default)
 * gas = TX1 molar-mass 28.0 partition linear sha256 &lt;64 hex digits&gt; file lists/tx1.par
 *                             one line per fitted compound: its HITRAN-format line list (relative to the method
 *                             file; the rest of the line, so the name may hold spaces) with the SHA-256 of its
 *                             bytes, its molar mass in g/mol and its partition function Q(T): linear (Q ~ T) or
 *                             non-linear (Q ~ T^1.5)
 * </pre>
 *
 * The settings keep the line list's file as an absolute path, so that a stored version names the very file.
 */
final class LineListBlock {

    /** The algorithm whose method files carry this block, and the block's name. */
    static final String NAME = "line-list";

    private static final Set<String> KEYS = Set.of("temperature", "pressure", "field-of-view", "cell-conditions",
            "gas");
    /** The key of the cell conditions the spectra are computed at, and its values, the default first. */
    static final String CELL_CONDITIONS_KEY = "cell-conditions";
    static final List<String> CELL_CONDITIONS = List.of("stated", "measured");
    private static final Set<String> PARTITIONS = Set.of("linear", "non-linear");

    private LineListBlock() {
    }

    /**
     * @param checkFiles whether each line list is read and its SHA-256 compared (a method file), or the names and
     *                   hashes taken as written (a stored version, whose files the fit checks when it reads them)
     * @throws FileFormatException naming the method file, the line and the key at fault: for a line list whose
     *                             bytes have another SHA-256, the line list's file and both hashes
     */
    static List<AlgorithmSetting> read(KeyValueFile f, KeyValueFile.Section b, boolean checkFiles)
            throws FileFormatException {
        b.allow(KEYS);
        List<AlgorithmSetting> settings = new ArrayList<>();
        for (String key : List.of("temperature", "pressure", "field-of-view")) {
            double v = b.number(key);
            boolean valid = key.equals("field-of-view") ? v >= 0 && v <= 0.05 : v > 0 && Double.isFinite(v);
            if (!valid) {
                throw b.error(key, key.equals("field-of-view") ? "must lie in [0, 0.05] rad, was " + v
                        : "must be positive and finite, was " + v);
            }
            settings.add(new AlgorithmSetting(key, Double.toString(v)));
        }
        if (b.has(CELL_CONDITIONS_KEY)) {
            // only when given, so that the versions of methods written without it keep their text and hash
            String conditions = b.text(CELL_CONDITIONS_KEY);
            if (!CELL_CONDITIONS.contains(conditions)) {
                throw b.error(CELL_CONDITIONS_KEY, "'" + conditions + "' is none of " + CELL_CONDITIONS);
            }
            settings.add(new AlgorithmSetting(CELL_CONDITIONS_KEY, conditions));
        }
        Set<String> compounds = new HashSet<>();
        for (KeyValueFile.Value gas : b.all("gas")) {
            settings.add(new AlgorithmSetting("gas", gas(f, gas, compounds, checkFiles)));
        }
        if (compounds.isEmpty()) {
            throw b.error("gas", "the [line-list] block names no gas");
        }
        return settings;
    }

    /** "name molar-mass m partition p sha256 h file path", the path made absolute. */
    private static String gas(KeyValueFile f, KeyValueFile.Value v, Set<String> compounds, boolean checkFiles)
            throws FileFormatException {
        String[] w = v.text().strip().split("\\s+", 8);
        if (w.length != 8 || !w[1].equals("molar-mass") || !w[3].equals("partition") || !w[5].equals("sha256")
                || !w[7].startsWith("file ") || w[7].substring(5).isBlank()) {
            throw v.error("expected '<compound> molar-mass <g/mol> partition <linear|non-linear> sha256 <hex>"
                    + " file <line list>', found '" + v.text() + "'");
        }
        if (!compounds.add(w[0])) {
            throw v.error("names " + w[0] + " twice");
        }
        double molarMass = new KeyValueFile.Value(v.section(), v.key(), w[2], v.line()).number();
        if (!(molarMass > 0 && Double.isFinite(molarMass))) {
            throw v.error("molar-mass of " + w[0] + " must be positive, was " + molarMass);
        }
        if (!PARTITIONS.contains(w[4])) {
            throw v.error("partition of " + w[0] + " '" + w[4] + "' is none of " + PARTITIONS);
        }
        if (!w[6].matches("[0-9a-f]{64}")) {
            throw v.error("sha256 of " + w[0] + " must be 64 lower-case hex digits, was '" + w[6] + "'");
        }
        Path file = f.resolve(w[7].substring(5).strip()).toAbsolutePath().normalize();
        if (checkFiles) {
            String actual;
            try {
                actual = RawFile.sha256Hex(Files.readAllBytes(file));
            } catch (IOException e) {
                throw v.error("line list of " + w[0] + " " + file + " cannot be read: " + e.getMessage());
            }
            if (!actual.equals(w[6])) {
                throw v.error("sha256 of " + w[0] + ": the line list " + file + " has SHA-256 " + actual
                        + ", the method states " + w[6] + " (the file changed since the method was written)");
            }
        }
        return w[0] + " molar-mass " + molarMass + " partition " + w[4] + " sha256 " + w[6] + " file " + file;
    }
}
