package org.tracegas.importer.example;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.tracegas.importer.ImportException;
import org.tracegas.importer.ImportOptions;
import org.tracegas.importer.ImportReader;
import org.tracegas.importer.ImportedData;
import org.tracegas.importer.ImportedSpectrum;
import org.tracegas.importer.Recognition;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * Reads the spectrum export of an invented example FTIR analyzer, an example format of this product:
 *
 * <pre>
 * EXAMPLE FTIR EXPORT 1
 * serial: EX-0042
 * acquired: 2026-11-30T10:15:00Z
 * quantity: absorbance            (absorbance or transmittance)
 * points: 3
 * data:                           (wavenumber in cm-1, value; separated by blanks)
 * 1000.0 0.0125
 * 1000.5 0.0130
 * 1001.0 0.0128
 * end
 * </pre>
 *
 * Header lines are {@code key: value}; all header lines are kept as metadata.
 */
public final class ExampleExportReader implements ImportReader {

    static final String MAGIC = "EXAMPLE FTIR EXPORT";

    @Override
    public Recognition recognise(byte[] head, String fileName) {
        String text = new String(head, StandardCharsets.ISO_8859_1);
        if (text.startsWith(MAGIC + " 1")) {
            return new Recognition(0.99, "first line is the example FTIR export header");
        }
        return Recognition.no("first line is not the example FTIR export header");
    }

    @Override
    public ImportedData read(Path file, ImportOptions options) throws ImportException {
        String source = file.toString();
        List<String> lines;
        try {
            if (Files.size(file) > options.maxWholeFileBytes()) {
                throw new ImportException(source, 0, "file size", Files.size(file) + " bytes exceed the limit of "
                        + options.maxWholeFileBytes());
            }
            lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new ImportException(source, 0, "file", "cannot be read: " + e.getMessage(), e);
        }
        if (lines.isEmpty()) {
            throw new ImportException(source, 0, "file", "is empty");
        }
        if (!lines.get(0).trim().equals(MAGIC + " 1")) {
            throw new ImportException(source, 1, "header", "expected '" + MAGIC + " 1'");
        }
        Map<String, String> metadata = new LinkedHashMap<>();
        Map<String, Integer> keyLines = new LinkedHashMap<>();
        int i = 1;
        for (; i < lines.size() && !lines.get(i).trim().equals("data:"); i++) {
            String line = lines.get(i);
            int colon = line.indexOf(':');
            if (colon < 1) {
                throw new ImportException(source, i + 1, "header", "expected 'key: value'");
            }
            metadata.put(line.substring(0, colon).trim(), line.substring(colon + 1).trim());
            keyLines.put(line.substring(0, colon).trim(), i + 1);
        }
        int dataLine = i + 1; // where a missing key is noticed
        int points = points(metadata, source, keyLines.getOrDefault("points", dataLine));
        Ordinate ordinate = ordinate(metadata, source, keyLines.getOrDefault("quantity", dataLine));
        if (i + points + 1 >= lines.size() || !lines.get(i + points + 1).trim().equals("end")) {
            throw new ImportException(source, Math.min(lines.size(), i + points + 2), "data",
                    "expected " + points + " data lines after 'data:' and then 'end' (truncated file?)");
        }
        double[] x = new double[points];
        double[] y = new double[points];
        for (int k = 0; k < points; k++) {
            int lineNo = i + 2 + k;
            String[] f = lines.get(i + 1 + k).trim().split("\\s+");
            if (f.length != 2) {
                throw new ImportException(source, lineNo, "data", "expected 'wavenumber value'");
            }
            x[k] = number(f[0], source, lineNo, "wavenumber");
            y[k] = number(f[1], source, lineNo, "value");
        }
        SpectralAxis axis;
        try {
            axis = SpectralAxis.of(AxisUnit.WAVENUMBER, x);
        } catch (IllegalArgumentException e) {
            throw new ImportException(source, i + 2, "wavenumber", e.getMessage());
        }
        return new ImportedData(source, "Example FTIR export 1", List.of(new ImportedSpectrum(
                new Spectrum(axis, y, ordinate), metadata, 1, i + points + 2)));
    }

    private static int points(Map<String, String> metadata, String source, int line) throws ImportException {
        String text = metadata.get("points");
        try {
            int n = Integer.parseInt(text == null ? "" : text);
            if (n >= 1) {
                return n;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new ImportException(source, line, "points", "needs a positive integer, was '" + text + "'");
    }

    private static Ordinate ordinate(Map<String, String> metadata, String source, int line)
            throws ImportException {
        String q = metadata.getOrDefault("quantity", "").toLowerCase(Locale.ROOT);
        return switch (q) {
            case "absorbance" -> Ordinate.ABSORBANCE;
            case "transmittance" -> Ordinate.TRANSMITTANCE;
            default -> throw new ImportException(source, line, "quantity", "unknown quantity '" + q
                    + "' (absorbance or transmittance)");
        };
    }

    private static double number(String text, String source, int line, String field) throws ImportException {
        try {
            double v = Double.parseDouble(text);
            if (Double.isFinite(v) && !text.matches(".*[xXpPdDfF].*")) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new ImportException(source, line, field, "not a finite number: '" + text + "'");
    }
}
