package org.tracegas.library.synthesis;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/** Rows of a numeric CSV with one header line, copied next to the tests from the SciPy reference data. */
final class ScipyReference {

    private ScipyReference() {
    }

    static List<double[]> rows(String resource) {
        InputStream in = ScipyReference.class.getResourceAsStream(resource);
        if (in == null) {
            throw new IllegalStateException("test resource " + resource + " is missing");
        }
        List<double[]> rows = new ArrayList<>();
        try (BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
            r.readLine();
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                if (!line.isBlank()) {
                    String[] p = line.split(",");
                    double[] row = new double[p.length];
                    for (int i = 0; i < p.length; i++) {
                        row[i] = Double.parseDouble(p[i]);
                    }
                    rows.add(row);
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return rows;
    }

    /** Relative error, or NaN where the reference is at most 1e-12 (the README's threshold for the check). */
    static double relativeError(double value, double reference) {
        return Math.abs(reference) > 1e-12 ? Math.abs(value - reference) / Math.abs(reference) : Double.NaN;
    }
}
