package org.tracegas.preprocess.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

import org.tracegas.preprocess.RealFft;

/**
 * Reference transforms computed with NumPy 2.4.6 numpy.fft.rfft of x[n] = sin(0.1 n) + 0.5 cos(0.37 n) + (n mod 7)/10.
 */
final class NumpyRfftReference {

    final int n;
    final double[] re;
    final double[] im;

    private NumpyRfftReference(int n, double[] re, double[] im) {
        this.n = n;
        this.re = re;
        this.im = im;
    }

    static NumpyRfftReference load(int n) throws IOException {
        String name = "rfft-numpy-n" + n + ".csv";
        List<double[]> rows = new ArrayList<>();
        try (InputStream in = NumpyRfftReference.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IOException("missing test resource " + name);
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            r.readLine(); // header k,re,im
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                if (!line.isBlank()) {
                    String[] f = line.split(",");
                    rows.add(new double[] {Double.parseDouble(f[1]), Double.parseDouble(f[2])});
                }
            }
        }
        double[] re = new double[rows.size()];
        double[] im = new double[rows.size()];
        for (int k = 0; k < rows.size(); k++) {
            re[k] = rows.get(k)[0];
            im[k] = rows.get(k)[1];
        }
        assertEquals(n / 2 + 1, re.length, name + " row count");
        return new NumpyRfftReference(n, re, im);
    }

    double[] signal() {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = Math.sin(0.1 * i) + 0.5 * Math.cos(0.37 * i) + (i % 7) / 10.0;
        }
        return x;
    }

    /** Checks a transform against the reference: 1e-9 relative to the largest magnitude (tolerance per the README). */
    void check(RealFft fft) {
        double[] x = signal();
        double[] re2 = new double[n / 2 + 1];
        double[] im2 = new double[n / 2 + 1];
        fft.forward(x.clone(), re2, im2); // forward may overwrite its input
        double largest = 0;
        for (int k = 0; k < re.length; k++) {
            largest = Math.max(largest, Math.hypot(re[k], im[k]));
        }
        for (int k = 0; k < re.length; k++) {
            assertEquals(re[k], re2[k], 1e-9 * largest, "Re X[" + k + "]");
            assertEquals(im[k], im2[k], 1e-9 * largest, "Im X[" + k + "]");
        }
        double[] back = new double[n];
        fft.inverse(re2, im2, back);
        for (int i = 0; i < n; i++) {
            assertEquals(x[i], back[i], 1e-12, "inverse x[" + i + "]");
        }
    }
}
