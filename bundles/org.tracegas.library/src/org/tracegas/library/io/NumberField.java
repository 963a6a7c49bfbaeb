package org.tracegas.library.io;

import java.nio.file.Path;

/** A number read from a text file, whose errors name the file, the line and the field. */
final class NumberField {

    private NumberField() {
    }

    /** @throws FileFormatException if the text is not a finite number */
    static double parse(Path file, int line, String field, String text) throws FileFormatException {
        try {
            double v = Double.parseDouble(text);
            if (Double.isFinite(v)) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below with the file, line and field
        }
        throw new FileFormatException(file, line, field, "'" + text + "' is not a finite number");
    }
}
