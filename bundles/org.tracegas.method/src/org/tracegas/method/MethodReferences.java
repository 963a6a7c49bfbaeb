package org.tracegas.method;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

import org.tracegas.library.ReferenceConditions;
import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.preprocess.Apodization;
import org.tracegas.preprocess.TransformSettings;
import org.tracegas.quantify.ReferenceSpectrum;

/**
 * The conditions each reference of a method was recorded at, and the check that the references suit the
 * instrument. A reference fits a sample only when both spectra have the same instrument line shape: the same
 * nominal resolution and the same apodization (EPA Method 320 sections 10.3, 10.4 and 11.1: references
 * de-resolved to the sample's resolution, with the apodization of the reference spectra; standards notes, not
 * confirmed against the official text). The temperature and pressure
 * of the references are what a result is corrected from (see {@code ConditionsCorrection}).
 * <p>
 * A stored method version writes them in a {@code [references]} block, one line per reference in the order of
 * the method's references:
 *
 * <pre>
 * [references]
 * reference = CO | 16.0 ppm-m | 423.15 K | 101.3 kPa | 0.5 cm-1 | norton-beer-medium
 * </pre>
 */
final class MethodReferences {

    /** Relative difference below which two stated resolutions are the same number written differently. */
    private static final double SAME_RESOLUTION = 1e-6;

    private MethodReferences() {
    }

    /**
     * The library's conditions of each of the method's references, in their order.
     *
     * @param references the method's references, built from the library
     * @throws IllegalArgumentException naming the first reference whose apodization is not the transform's or
     *                                  whose resolution is not the stated one
     */
    static List<ReferenceConditions> of(ReferenceLibrary library, List<ReferenceSpectrum> references,
            TransformSettings transform, double resolution) {
        List<ReferenceConditions> conditions = new ArrayList<>();
        for (ReferenceSpectrum r : references) {
            org.tracegas.library.ReferenceSpectrum found = library.references().stream()
                    .filter(l -> l.compound().name().equals(r.compound())
                            && l.metadata().conditions().concentrationPathLength() == r.ppmMetres())
                    .findFirst().orElseThrow(() -> new IllegalStateException("reference " + r.compound() + " "
                            + r.ppmMetres() + " ppm·m is not in the library it was built from"));
            check(found.description(), found.metadata().conditions(), transform, resolution);
            conditions.add(found.metadata().conditions());
        }
        return List.copyOf(conditions);
    }

    /**
     * @param reference  names the reference in the error
     * @param resolution the instrument's nominal resolution in cm-1, NaN when the method states none
     * @throws IllegalArgumentException when the reference's apodization or resolution differs from the instrument's
     */
    static void check(String reference, ReferenceConditions c, TransformSettings transform, double resolution) {
        Optional<Apodization> apodization = apodization(c.apodization());
        if (apodization.isEmpty() || apodization.get() != transform.apodization()) {
            throw new IllegalArgumentException("reference " + reference + " was recorded with apodization '"
                    + c.apodization() + "', the method's transform applies "
                    + KeyValueFile.word(transform.apodization()));
        }
        if (!Double.isNaN(resolution) && Math.abs(c.resolution() - resolution) > SAME_RESOLUTION * resolution) {
            throw new IllegalArgumentException("reference " + reference + " was recorded at resolution "
                    + c.resolution() + " cm-1, the method states the instrument's resolution " + resolution + " cm-1");
        }
    }

    /** The apodization a library names in any case, with spaces, '-' or '_' between words. */
    static Optional<Apodization> apodization(String name) {
        String constant = name.strip().toUpperCase(Locale.ROOT).replaceAll("[^A-Z0-9]+", "_");
        for (Apodization a : Apodization.values()) {
            if (a.name().equals(constant)) {
                return Optional.of(a);
            }
        }
        return Optional.empty();
    }

    /** The {@code reference = } lines of the block. */
    static String write(List<ReferenceSpectrum> references, List<ReferenceConditions> conditions) {
        StringBuilder s = new StringBuilder();
        for (int i = 0; i < references.size(); i++) {
            ReferenceConditions c = conditions.get(i);
            s.append("reference = ").append(references.get(i).compound()).append(" | ")
                    .append(c.concentrationPathLength()).append(" ppm-m | ").append(c.temperature()).append(" K | ")
                    .append(c.pressure()).append(" kPa | ").append(c.resolution()).append(" cm-1 | ")
                    .append(c.apodization()).append('\n');
        }
        return s.toString();
    }

    /**
     * @param references the method's references, which the lines must name in their order
     * @throws FileFormatException naming the line that does not parse or names another reference
     */
    static List<ReferenceConditions> read(KeyValueFile.Section block, List<ReferenceSpectrum> references)
            throws FileFormatException {
        block.allow(Set.of("reference"));
        List<KeyValueFile.Value> lines = block.all("reference");
        if (lines.size() != references.size()) {
            throw block.error("reference", "names " + lines.size() + " references, the method has "
                    + references.size());
        }
        List<ReferenceConditions> conditions = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) {
            KeyValueFile.Value v = lines.get(i);
            String[] parts = v.text().split("\\|");
            String[] units = { "", "ppm-m", "K", "kPa", "cm-1", "" };
            if (parts.length != units.length) {
                throw v.error("needs compound | ppm-m | K | kPa | cm-1 | apodization, has " + parts.length
                        + " fields");
            }
            double[] numbers = new double[4];
            for (int k = 1; k <= 4; k++) {
                String p = parts[k].strip();
                if (!p.endsWith(" " + units[k])) {
                    throw v.error("field " + (k + 1) + " '" + p + "' is not in " + units[k]);
                }
                numbers[k - 1] = new KeyValueFile.Value(v.section(), v.key(),
                        p.substring(0, p.length() - units[k].length()).strip(), v.line()).number();
            }
            ReferenceSpectrum r = references.get(i);
            if (!parts[0].strip().equals(r.compound()) || numbers[0] != r.ppmMetres()) {
                throw v.error("names " + parts[0].strip() + " " + numbers[0] + " ppm·m, the method's reference "
                        + (i + 1) + " is " + r.compound() + " " + r.ppmMetres() + " ppm·m");
            }
            try {
                conditions.add(new ReferenceConditions(numbers[0], numbers[1], numbers[2], numbers[3],
                        parts[5].strip()));
            } catch (IllegalArgumentException e) {
                throw v.error(e.getMessage());
            }
        }
        return List.copyOf(conditions);
    }

}
