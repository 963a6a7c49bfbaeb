package org.tracegas.library.io;

import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;

import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * Reads a plain text file of two columns, wavenumber in cm-1 and decadic absorbance, separated by a comma,
 * a semicolon or white space; empty lines and lines starting with '#' are skipped. An axis whose steps are
 * equal to a relative 1e-6 becomes a uniform axis (text files round the wavenumbers), otherwise it is kept
 * point by point.
 */
public final class TwoColumnTextSource implements ReferenceSpectrumSource {

    private static final double UNIFORM_TOLERANCE = 1e-6;

    @Override
    public Spectrum read(Path file) throws IOException {
        double[] x = new double[1024];
        double[] y = new double[1024];
        int n = 0;
        try (BufferedReader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            String line;
            int lineNumber = 0;
            while ((line = in.readLine()) != null) {
                lineNumber++;
                String t = line.strip();
                if (t.isEmpty() || t.startsWith("#")) {
                    continue;
                }
                String[] parts = t.split("\\s*[,;\\s]\\s*");
                if (parts.length != 2) {
                    throw new FileFormatException(file, lineNumber, "",
                            "expected 2 columns (wavenumber, absorbance), found " + parts.length);
                }
                if (n == x.length) {
                    x = Arrays.copyOf(x, 2 * n);
                    y = Arrays.copyOf(y, 2 * n);
                }
                x[n] = NumberField.parse(file, lineNumber, "wavenumber", parts[0]);
                y[n] = NumberField.parse(file, lineNumber, "absorbance", parts[1]);
                if (n > 0 && (x[n] == x[n - 1] || (n > 1 && (x[n] > x[n - 1]) != (x[1] > x[0])))) {
                    throw new FileFormatException(file, lineNumber, "wavenumber",
                            "wavenumbers must rise or fall strictly, " + x[n - 1] + " is followed by " + x[n]);
                }
                n++;
            }
        }
        if (n < 2) {
            throw new FileFormatException(file, 0, "", "needs at least 2 data lines, found " + n);
        }
        return new Spectrum(axis(Arrays.copyOf(x, n)), Arrays.copyOf(y, n), Ordinate.ABSORBANCE);
    }

    private static SpectralAxis axis(double[] x) {
        double step = (x[x.length - 1] - x[0]) / (x.length - 1);
        for (int i = 1; i < x.length; i++) {
            if (Math.abs(x[i] - x[i - 1] - step) > UNIFORM_TOLERANCE * Math.abs(step)) {
                return SpectralAxis.of(AxisUnit.WAVENUMBER, x);
            }
        }
        return SpectralAxis.uniform(AxisUnit.WAVENUMBER, x[0], step, x.length);
    }
}
