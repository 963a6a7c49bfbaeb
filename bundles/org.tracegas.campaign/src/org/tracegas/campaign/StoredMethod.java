package org.tracegas.campaign;

import java.nio.file.Path;
import java.util.List;
import java.util.Set;

import org.tracegas.library.io.FileFormatException;
import org.tracegas.preprocess.Recipe;
import org.tracegas.preprocess.TransformSettings;
import org.tracegas.quantify.PreparedMethod;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.Quantifier;
import org.tracegas.spectrum.SpectralAxis;

/**
 * What a METHOD version of a workspace holds, so that any runner rebuilds the exact method from it: the library
 * version the references came from, the transform of the interferograms, and the method's canonical text (which
 * holds every reference value).
 *
 * <pre>
 * tracegas-method-version 1
 * library-version = ...                 id of the LIBRARY version
 * library-sha256 = ...                  content hash of the library's references
 * [transform]
 * ...                                   see {@link TransformText}
 * [recipe]                              (only when the method has processing steps)
 * step = ...                            see {@link MethodRecipe}
 * [method]
 * ...                                   the canonical text of the method
 * </pre>
 */
public record StoredMethod(QuantificationMethod method, TransformSettings transform, String libraryVersionId,
        String libraryContentHash, Recipe recipe) {

    private static final String FORMAT = "tracegas-method-version 1";
    private static final String METHOD = "\n[method]\n";

    /** A method without processing steps before the fit. */
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

    public String content() {
        return FORMAT + "\nlibrary-version = " + libraryVersionId + "\nlibrary-sha256 = " + libraryContentHash
                + "\n[transform]\n" + TransformText.write(transform)
                // a method without steps keeps the text (and hash) it had before recipes were stored
                + (recipe.entries().isEmpty() ? "" : "[recipe]\n" + MethodRecipe.write(recipe))
                + METHOD.substring(1) + method.canonicalText();
    }

    /**
     * @param source names the version in errors
     * @throws FileFormatException naming the line and field of the stored text at fault
     */
    public static StoredMethod parse(String content, String source) throws FileFormatException {
        Path where = Path.of(source);
        if (!content.startsWith(FORMAT + "\n")) {
            throw new FileFormatException(where, 1, "format", "expected '" + FORMAT + "'");
        }
        int split = content.indexOf(METHOD);
        if (split < 0) {
            throw new FileFormatException(where, 0, "[method]", "the method text is missing");
        }
        String head = content.substring(FORMAT.length() + 1, split + 1);
        KeyValueFile settings = KeyValueFile.parse(head, where);
        settings.allowBlocks(Set.of("transform", "recipe"));
        KeyValueFile.Section h = settings.head().allow(Set.of("library-version", "library-sha256"));
        TransformSettings transform = TransformText.read(settings.blocks("transform").get(0));
        int methodLine = (int) head.lines().count() + 3;
        QuantificationMethod method;
        try {
            method = QuantificationMethod.parse(content.substring(split + METHOD.length()));
        } catch (IllegalArgumentException e) {
            throw new FileFormatException(where, 0, "[method]", "method text starting at line " + methodLine + ": "
                    + e.getMessage());
        }
        List<KeyValueFile.Section> recipe = settings.blocks("recipe");
        return new StoredMethod(method, transform, h.text("library-version"), h.text("library-sha256"),
                recipe.isEmpty() ? MethodRecipe.none() : MethodRecipe.read(recipe.get(0)));
    }
}
