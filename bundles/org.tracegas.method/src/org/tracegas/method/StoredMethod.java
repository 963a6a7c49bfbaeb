package org.tracegas.method;

import java.nio.file.Path;
import java.util.List;
import java.util.Set;

import org.tracegas.library.ReferenceConditions;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.preprocess.Recipe;
import org.tracegas.preprocess.TransformSettings;
import org.tracegas.qa.basis.PathOrigin;
import org.tracegas.quantify.PreparedMethod;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.Quantifier;
import org.tracegas.quantify.ReferenceSpectrum;
import org.tracegas.spectrum.SpectralAxis;

/**
 * What a METHOD version of a workspace holds, so that any runner and the workbench rebuild the exact method from
 * it: the method in the text of a method file ({@link MethodDefinition}), with the library pinned by its version
 * and content hash in place of its folder, followed by the method's exact text (every reference value, see
 * {@link QuantificationMethod#canonicalText()}). The head is what a person reads, edits and compares; the exact
 * text must describe the very method the head declares over its references, or the version is refused.
 *
 * <pre>
 * method = Stack gas, 8 analytes
 * library-version = ...                 id of the LIBRARY version
 * library-sha256 = ...                  content hash of the library's references
 * path-length = 4.85
 * path-source = cts-derived            (only when not nominal)
 * ...                                   the other settings of a method file, each written out
 * [transform]
 * ...
 * [recipe]                              (only when the method has processing steps, see {@link MethodRecipe})
 * ...
 * [analyte]
 * ...
 * [references]                          (when the method was defined from a library's folder) the conditions
 * ...                                   of each reference, see {@link MethodReferences}
 * [exact]
 * tracegas-quantification-method 1      the exact text of the method
 * ...
 * </pre>
 *
 * @param resolution          the instrument's nominal resolution in cm-1 the method states, NaN when none
 * @param referenceConditions the conditions of each of the method's references in their order; empty for a
 *                            method whose references came without them
 * @param pathSource          where the sample cell's path that results are corrected to comes from
 */
public record StoredMethod(QuantificationMethod method, TransformSettings transform, String libraryVersionId,
        String libraryContentHash, Recipe recipe, double resolution, List<ReferenceConditions> referenceConditions,
        PathOrigin pathSource) {

    private static final String EXACT = "\n[exact]\n";
    private static final Set<String> LIBRARY_KEYS = Set.of("library-version", "library-sha256");

    /**
     * @throws IllegalArgumentException when the conditions are not one per reference, or a reference's
     *                                  apodization or resolution is not the instrument's
     */
    public StoredMethod {
        referenceConditions = List.copyOf(referenceConditions);
        if (pathSource == null) {
            throw new IllegalArgumentException("pathSource must not be null");
        }
        if (!referenceConditions.isEmpty()) {
            if (referenceConditions.size() != method.references().size()) {
                throw new IllegalArgumentException("referenceConditions must be one per reference, "
                        + method.references().size() + ", were " + referenceConditions.size());
            }
            for (int i = 0; i < referenceConditions.size(); i++) {
                ReferenceSpectrum r = method.references().get(i);
                MethodReferences.check(r.compound() + " " + r.ppmMetres() + " ppm·m", referenceConditions.get(i),
                        transform, resolution);
            }
        }
    }

    /** A method whose results are corrected to its nominal path. */
    public StoredMethod(QuantificationMethod method, TransformSettings transform, String libraryVersionId,
            String libraryContentHash, Recipe recipe, double resolution, List<ReferenceConditions> referenceConditions) {
        this(method, transform, libraryVersionId, libraryContentHash, recipe, resolution, referenceConditions,
                PathOrigin.NOMINAL);
    }

    /** A method whose references came without their conditions. */
    public StoredMethod(QuantificationMethod method, TransformSettings transform, String libraryVersionId,
            String libraryContentHash, Recipe recipe) {
        this(method, transform, libraryVersionId, libraryContentHash, recipe, Double.NaN, List.of());
    }

    /** A method without processing steps before the fit, whose references came without their conditions. */
    public StoredMethod(QuantificationMethod method, TransformSettings transform, String libraryVersionId,
            String libraryContentHash) {
        this(method, transform, libraryVersionId, libraryContentHash, MethodRecipe.none());
    }

    /**
     * The fit of this method on spectra of an axis.
     *
     * @param software     named in each result's reprocessing record
     * @param withSpectra  whether each result keeps its fitted model and residual (for plots)
     */
    public Quantifier quantifier(SpectralAxis axis, String software, boolean withSpectra) {
        return new Quantifier(PreparedMethod.prepare(method, axis), libraryContentHash, software, withSpectra);
    }

    /** The method as a method file writes it, with its library version: what a person reads and compares. */
    public String declaration() {
        String declaration = MethodDefinition.write(method, "library-version = " + libraryVersionId
                + "\nlibrary-sha256 = " + libraryContentHash + "\n", resolution, transform, recipe, pathSource);
        return referenceConditions.isEmpty() ? declaration
                : declaration + "\n[references]\n" + MethodReferences.write(method.references(), referenceConditions);
    }

    /** The text a METHOD version stores. */
    public String content() {
        return declaration() + EXACT + method.canonicalText();
    }

    /**
     * @param source names the version in errors
     * @throws FileFormatException naming the line and field of the stored text at fault
     */
    public static StoredMethod parse(String content, String source) throws FileFormatException {
        Path where = Path.of(source);
        int split = content.indexOf(EXACT);
        if (split < 0) {
            throw new FileFormatException(where, 0, "[exact]", "the exact text of the method is missing");
        }
        KeyValueFile head = KeyValueFile.parse(content.substring(0, split + 1), where);
        MethodDefinition declared = MethodDefinition.parse(head, LIBRARY_KEYS);
        int exactLine = (int) content.substring(0, split + 1).lines().count() + 2;
        QuantificationMethod method;
        try {
            method = QuantificationMethod.parse(content.substring(split + EXACT.length()));
        } catch (IllegalArgumentException e) {
            throw new FileFormatException(where, 0, "[exact]", "method text starting at line " + exactLine + ": "
                    + e.getMessage());
        }
        QuantificationMethod rebuilt;
        try {
            rebuilt = declared.build(method.references(), method.weights());
        } catch (IllegalArgumentException e) {
            throw new FileFormatException(where, 0, "[analyte]", e.getMessage());
        }
        if (!rebuilt.equals(method)) {
            throw new FileFormatException(where, exactLine, "[exact]",
                    "the exact text describes another method than the settings and analytes above it");
        }
        List<KeyValueFile.Section> blocks = head.blocks("references");
        if (blocks.size() > 1) {
            throw new FileFormatException(where, blocks.get(1).line(), "[references]",
                    "a stored method has at most one [references] block, found " + blocks.size());
        }
        List<ReferenceConditions> conditions = blocks.isEmpty() ? List.of()
                : MethodReferences.read(blocks.get(0), method.references());
        KeyValueFile.Section h = head.head();
        try {
            return new StoredMethod(method, declared.transform(), h.text("library-version"),
                    h.text("library-sha256"), declared.recipe(), declared.resolution(), conditions,
                    declared.pathSource());
        } catch (IllegalArgumentException e) {
            throw new FileFormatException(where, blocks.get(0).line(), "[references]", e.getMessage());
        }
    }
}
