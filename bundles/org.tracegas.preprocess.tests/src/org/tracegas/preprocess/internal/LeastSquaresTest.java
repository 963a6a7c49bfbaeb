package org.tracegas.preprocess.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

class LeastSquaresTest {

    @Test
    void longleyCoefficientsMatchTheCertifiedValues() throws IOException {
        // NIST StRD linear regression "Longley" (higher difficulty): certified coefficients; NIST expects
        // about 8 significant digits of a good solver, we ask for 10 (1e-10 relative)
        List<double[]> rows = read("nist-strd-longley.csv");
        double[][] design = new double[rows.size()][];
        double[] y = new double[rows.size()];
        for (int r = 0; r < rows.size(); r++) {
            double[] row = rows.get(r);
            y[r] = row[0];
            design[r] = new double[7];
            design[r][0] = 1.0;
            System.arraycopy(row, 1, design[r], 1, 6);
        }
        Map<String, Double> certified = new HashMap<>();
        try (BufferedReader in = open("nist-strd-longley-certified.csv")) {
            in.readLine();
            for (String line = in.readLine(); line != null; line = in.readLine()) {
                String[] f = line.split(",");
                certified.put(f[0], Double.parseDouble(f[1]));
            }
        }
        double[] b = LeastSquares.solve(design, y);
        for (int k = 0; k < 7; k++) {
            double c = certified.get("b" + k);
            assertEquals(c, b[k], 1e-10 * Math.abs(c), "b" + k);
        }
    }

    @Test
    void rejectsTooFewObservationsAndDependentColumns() {
        assertThrows(IllegalArgumentException.class, () -> LeastSquares.solve(new double[][] {{1, 2}}, new double[] {1}));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LeastSquares.solve(new double[][] {{1, 2}, {2, 4}, {3, 6}}, new double[] {1, 2, 3}));
        assertEquals(true, e.getMessage().contains("rank deficient"), e.getMessage());
    }

    private List<double[]> read(String name) throws IOException {
        List<double[]> rows = new ArrayList<>();
        try (BufferedReader in = open(name)) {
            in.readLine();
            for (String line = in.readLine(); line != null; line = in.readLine()) {
                if (!line.isBlank()) {
                    String[] f = line.split(",");
                    double[] v = new double[f.length];
                    for (int i = 0; i < f.length; i++) {
                        v[i] = Double.parseDouble(f[i]);
                    }
                    rows.add(v);
                }
            }
        }
        return rows;
    }

    private BufferedReader open(String name) throws IOException {
        var in = getClass().getResourceAsStream(name);
        if (in == null) {
            throw new IOException("missing test resource " + name);
        }
        return new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
    }
}
