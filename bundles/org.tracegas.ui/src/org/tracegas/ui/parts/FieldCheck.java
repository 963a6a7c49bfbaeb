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

    /** Both bounds parse; checks their order. */
    public static String order(String lower, String upper) {
        if (wavenumber("lower", lower) != null || wavenumber("upper", upper) != null) {
            return null;
        }
        return Double.parseDouble(lower.trim()) < Double.parseDouble(upper.trim()) ? null
                : "Upper wavenumber: must lie above the lower wavenumber " + lower.trim() + " cm⁻¹";
    }
}
