package org.tracegas.ui.parts;

/**
 * Checks of typed method fields. Each returns null when the text is acceptable, otherwise a message that
 * names the field and says what is wrong.
 */
public final class FieldCheck {

    /** Mid-infrared range the desk accepts for analysis regions, cm-1 (common practice, no source). */
    public static final double LOWEST = 400;
    public static final double HIGHEST = 5000;

    private FieldCheck() {
    }

    public static String text(String field, String value) {
        return value == null || value.isBlank() ? field + ": must not be empty" : null;
    }

    public static String wavenumber(String field, String value) {
        double v;
        try {
            v = Double.parseDouble(value.trim());
        } catch (NumberFormatException e) {
            return field + ": '" + value + "' is not a number";
        }
        if (!(v >= LOWEST && v <= HIGHEST)) {
            return field + ": " + value + " cm⁻¹ lies outside " + (int) LOWEST + " to " + (int) HIGHEST + " cm⁻¹";
        }
        return null;
    }

    /** A region's baseline order: a whole number from 0 (an offset) to the highest order the fit takes. */
    public static String baselineOrder(String value) {
        int max = org.tracegas.quantify.AnalysisRegion.MAX_BASELINE_ORDER;
        try {
            int v = Integer.parseInt(value.trim());
            return v >= 0 && v <= max ? null : "Baseline order: must be 0 to " + max + ", was " + v;
        } catch (NumberFormatException e) {
            return "Baseline order: '" + value + "' is not a whole number from 0 to " + max;
        }
    }

    /** The cell's path length in metres: a positive number. */
    public static String pathLength(String value) {
        return number("Path length", value, v -> v > 0 && Double.isFinite(v), "a positive number of metres");
    }

    /** The relative change of the concentrations at which the fit's iteration stops: between 0 and 1. */
    public static String tolerance(String value) {
        return number("Tolerance", value, v -> v > 0 && v < 1, "between 0 and 1 (a relative change)");
    }

    /** The highest sample absorbance the fit trusts: a positive number. */
    public static String maxAbsorbance(String value) {
        return number("Max. absorbance", value, v -> v > 0 && Double.isFinite(v), "a positive number");
    }

    private static String number(String field, String value, java.util.function.DoublePredicate acceptable,
            String rule) {
        try {
            return acceptable.test(Double.parseDouble(value.trim())) ? null : field + ": must be " + rule + ", was "
                    + value.trim();
        } catch (NumberFormatException e) {
            return field + ": '" + value + "' is not a number";
        }
    }

    /**
     * Processing steps, one a line in the method text's {@code step = } form: each must parse, and the steps the
     * desk runs with must create it with its parameters.
     *
     * @param steps the registry of the steps contributed to the platform, which runs the method
     */
    public static String recipeSteps(java.util.List<String> steps, org.tracegas.preprocess.StepRegistry registry) {
        org.tracegas.preprocess.Recipe recipe;
        try {
            recipe = org.tracegas.method.MethodRecipe.of(steps);
        } catch (IllegalArgumentException e) {
            return "R" + e.getMessage().substring(1);
        }
        for (int i = 0; i < recipe.entries().size(); i++) {
            org.tracegas.preprocess.Recipe.Entry step = recipe.entries().get(i);
            try {
                registry.create(step.stepId(), step.parameters());
            } catch (IllegalArgumentException e) {
                return "Recipe step " + (i + 1) + ": " + e.getMessage();
            }
        }
        return null;
    }

    /** The non-blank lines of a text, trimmed. */
    public static java.util.List<String> lines(String value) {
        return value.lines().map(String::strip).filter(l -> !l.isEmpty()).toList();
    }

    /** The fit's iteration limit: a whole number of at least 1. */
    public static String maxIterations(String value) {
        try {
            int v = Integer.parseInt(value.trim());
            return v >= 1 ? null : "Max. fit iterations: must be at least 1, was " + v;
        } catch (NumberFormatException e) {
            return "Max. fit iterations: '" + value + "' is not a whole number";
        }
    }

    /** Both bounds parse; checks their order. */
    public static String order(String lower, String upper) {
        if (wavenumber("lower", lower) != null || wavenumber("upper", upper) != null) {
            return null;
        }
        return Double.parseDouble(lower.trim()) < Double.parseDouble(upper.trim()) ? null
                : "Upper wavenumber: must lie above the lower wavenumber " + lower.trim() + " cm⁻¹";
    }

    /**
     * Checks a comma-separated list of interferents of an analyte: each named once, not the analyte itself, and
     * each among the compounds the method has references of (a compound from elsewhere in the library is added
     * in the method file, which brings its references).
     *
     * @param known the compounds of the method's references
     */
    public static String interferents(String value, String analyte, java.util.Collection<String> known) {
        java.util.Set<String> seen = new java.util.HashSet<>();
        for (String name : split(value)) {
            if (name.isEmpty()) {
                return "Interferents: an empty name in '" + value.trim() + "'; separate compounds by commas";
            }
            if (name.equals(analyte)) {
                return "Interferents: " + name + " is the analyte itself";
            }
            if (!seen.add(name)) {
                return "Interferents: " + name + " is named twice";
            }
            if (!known.contains(name)) {
                return "Interferents: the method has no reference of '" + name + "' (it has " + String.join(", ",
                        new java.util.TreeSet<>(known)) + ")";
            }
        }
        return null;
    }

    /** The names of a comma-separated list, trimmed; none for a blank text. */
    public static java.util.List<String> split(String value) {
        return value == null || value.isBlank() ? java.util.List.of()
                : java.util.Arrays.stream(value.split(",", -1)).map(String::trim).toList();
    }
}
