package org.tracegas.quantify.internal;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Reads the reference CSV files copied beside the tests. */
final class ReferenceCsv {

    private ReferenceCsv() {
    }

    /** Numeric rows after the header line. */
    static double[][] numericRows(Class<?> owner, String name) throws IOException {
        List<double[]> rows = new ArrayList<>();
        for (String[] f : lines(owner, name)) {
            double[] row = new double[f.length];
            for (int i = 0; i < f.length; i++) {
                row[i] = Double.parseDouble(f[i]);
            }
            rows.add(row);
        }
        return rows.toArray(new double[0][]);
    }

    /** First column to the remaining columns (empty fields become NaN). */
    static Map<String, double[]> keyed(Class<?> owner, String name) throws IOException {
        Map<String, double[]> map = new LinkedHashMap<>();
        for (String[] f : lines(owner, name)) {
            double[] v = new double[f.length - 1];
            for (int i = 1; i < f.length; i++) {
                v[i - 1] = f[i].isBlank() ? Double.NaN : Double.parseDouble(f[i]);
            }
            map.put(f[0], v);
        }
        return map;
    }

    private static List<String[]> lines(Class<?> owner, String name) throws IOException {
        InputStream in = owner.getResourceAsStream(name);
        if (in == null) {
            throw new IOException("missing test resource " + name);
        }
        List<String[]> out = new ArrayList<>();
        try (BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
            r.readLine(); // header
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                if (!line.isBlank()) {
                    out.add(line.split(",", -1));
                }
            }
        }
        return out;
    }
}
