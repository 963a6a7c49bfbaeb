package org.tracegas.method;

import java.util.List;
import java.util.Set;

import org.tracegas.library.io.FileFormatException;
import org.tracegas.preprocess.Recipe;

/**
 * The {@code [recipe]} block of a method: the processing steps, in order, that every absorbance gets before the
 * fit, one {@code step = <id> key=value;key=value} line per step in the recipe's canonical line form. The steps
 * are those of {@link StepRegistry} (baseline, resample, deresolve, shift, and any contributed to its extension
 * point), created through the registry when the method runs.
 *
 * <pre>
 * [recipe]
 * step = resample first=2000.0;halfWidth=16;size=801;step=0.5
 * step = baseline degree=1;regions=2000:2010,2390:2400
 * </pre>
 */
public final class MethodRecipe {

    private static final String HEADER = "recipe 1\n";

    private MethodRecipe() {
    }

    /** The recipe of no step. */
    public static Recipe none() {
        return Recipe.of(List.of());
    }

    /**
     * The steps are created through the registry of the quantification that runs them, so that steps contributed
     * to the extension point serve as well as the built-in ones.
     *
     * @throws FileFormatException naming the line of a step that does not parse
     */
    static Recipe read(KeyValueFile.Section block) throws FileFormatException {
        block.allow(Set.of("step"));
        StringBuilder text = new StringBuilder(HEADER);
        for (KeyValueFile.Value v : block.all("step")) {
            try {
                Recipe.parse(HEADER + v.text() + "\n");
            } catch (IllegalArgumentException e) {
                throw v.error(e.getMessage());
            }
            text.append(v.text()).append('\n');
        }
        return Recipe.parse(text.toString());
    }

    /** The {@code step = } lines of a recipe; empty for a recipe of no step. */
    static String write(Recipe recipe) {
        String canonical = recipe.toCanonicalString();
        StringBuilder b = new StringBuilder();
        canonical.substring(HEADER.length()).lines().forEach(l -> b.append("step = ").append(l).append('\n'));
        return b.toString();
    }
}
