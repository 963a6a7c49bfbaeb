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
        List<String> steps = new java.util.ArrayList<>();
        for (KeyValueFile.Value v : block.all("step")) {
            try {
                check(v.text());
            } catch (IllegalArgumentException e) {
                throw v.error(e.getMessage());
            }
            steps.add(v.text());
        }
        return of(steps);
    }

    /** @throws IllegalArgumentException saying why the value of a step line does not parse */
    private static void check(String step) {
        if (step.contains("\n")) {
            throw new IllegalArgumentException("a step is one line, found '" + step + "'");
        }
        try {
            Recipe.parse(HEADER + step + "\n");
        } catch (IllegalArgumentException e) {
            // the step's own words: the line number counts the recipe text's header, which no one writes
            throw new IllegalArgumentException(e.getMessage().replaceFirst("^recipe line \\d+: ", ""), e);
        }
    }

    /** The {@code step = } lines of a recipe; empty for a recipe of no step. */
    static String write(Recipe recipe) {
        StringBuilder b = new StringBuilder();
        steps(recipe).forEach(l -> b.append("step = ").append(l).append('\n'));
        return b.toString();
    }

    /** The steps of a recipe in order, each as the value of its {@code step = } line. */
    public static List<String> steps(Recipe recipe) {
        return recipe.toCanonicalString().substring(HEADER.length()).lines().toList();
    }

    /**
     * The recipe of steps each written as the value of a {@code step = } line, as a method file's block reads them.
     *
     * @throws IllegalArgumentException naming the step (counted from 1) that does not parse, and why
     */
    public static Recipe of(List<String> steps) {
        StringBuilder text = new StringBuilder(HEADER);
        for (int i = 0; i < steps.size(); i++) {
            try {
                check(steps.get(i));
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException("recipe step " + (i + 1) + ": " + e.getMessage(), e);
            }
            text.append(steps.get(i)).append('\n');
        }
        return Recipe.parse(text.toString());
    }
}
