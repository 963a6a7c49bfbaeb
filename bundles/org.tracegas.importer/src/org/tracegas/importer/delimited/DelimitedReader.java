package org.tracegas.importer.delimited;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.tracegas.importer.ImportException;
import org.tracegas.importer.ImportOptions;
import org.tracegas.importer.ImportReader;
import org.tracegas.importer.ImportedData;
import org.tracegas.importer.ImportedRecord;
import org.tracegas.importer.ImportedSpectrum;
import org.tracegas.importer.Recognition;
import org.tracegas.importer.delimited.internal.ColumnUnits;
import org.tracegas.importer.delimited.internal.Dialect;
import org.tracegas.importer.internal.Numbers;
import org.tracegas.importer.internal.WholeFile;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * Reads spectra from delimited text (CSV, TSV, semicolon-separated with decimal comma). The first column is the
 * axis, every further column one spectrum. Up to two header rows come before the numbers: column names, then
 * optionally a units row; units may also stand in the names, as in "Wavenumber (cm-1)". Lines starting with
 * '#' are comments. Wavelength axes in micrometres are kept or, on request, converted to wavenumbers; the
 * unit found in the file is recorded in the metadata.
 */
public final class DelimitedReader implements ImportReader {

    /** Metadata key: the axis unit written in the file. */
    public static final String AXIS_UNIT_IN_FILE = "axis unit in file";
    /** Metadata key: the column header (name, and unit when a units row is present). */
    public static final String COLUMN = "column";

    private static final int DETECT_LINES = 50;

    @Override
    public Recognition recognise(byte[] head, String fileName) {
        String text = WholeFile.headText(head);
        if (text.indexOf('\0') >= 0 || text.stripLeading().startsWith("##")) {
            return Recognition.no("binary content or labelled records");
        }
        List<Line> lines = contentLines(text, 20);
        if (lines.size() > 1) {
            lines = lines.subList(0, lines.size() - 1); // the last line of a head may be cut
        }
        Dialect d = Dialect.detect(lines.stream().map(Line::text).toList());
        if (d == null) {
            return Recognition.no("no consistent field separator");
        }
        long numericRows = lines.stream().filter(l -> numeric(d.fields(l.text()), d)).count();
        if (numericRows == 0) {
            return new Recognition(0.2, "fields separated by " + d.describe() + " but no numeric rows");
        }
        String lower = fileName.toLowerCase(Locale.ROOT);
        boolean named = lower.endsWith(".csv") || lower.endsWith(".tsv") || lower.endsWith(".txt");
        return new Recognition(named ? 0.6 : 0.5, "numeric rows separated by " + d.describe());
    }

    @Override
    public ImportedData read(Path file, ImportOptions options) throws ImportException {
        return read(WholeFile.readText(file, options), file.toString(), options);
    }

    /** Reads delimited text already in memory; {@code source} names it in error messages. */
    public ImportedData read(String text, String source, ImportOptions options) throws ImportException {
        List<Line> lines = contentLines(text, Integer.MAX_VALUE);
        if (lines.isEmpty()) {
            throw new ImportException(source, 0, "file", "is empty");
        }
        Dialect dialect = Dialect.detect(lines.subList(0, Math.min(DETECT_LINES, lines.size())).stream()
                .map(Line::text).toList());
        if (dialect == null) {
            throw new ImportException(source, lines.get(0).number(), "separator",
                    "no tab, semicolon or comma splits the first lines into the same number (at least 2) of fields");
        }
        int headerRows = 0;
        while (headerRows < lines.size() && !numeric(dialect.fields(lines.get(headerRows).text()), dialect)) {
            headerRows++;
        }
        if (headerRows > 2) {
            Line third = lines.get(2);
            throw new ImportException(source, third.number(), "header", "more than two non-numeric rows before"
                    + " the data (names and units are allowed)");
        }
        if (headerRows == lines.size()) {
            throw new ImportException(source, lines.get(lines.size() - 1).number(), "data", "no numeric rows");
        }
        String[] firstData = dialect.fields(lines.get(headerRows).text());
        int columns = firstData.length;
        String[] headers = new String[columns];
        for (int c = 0; c < columns; c++) {
            headers[c] = headerRows == 0 ? "column " + (c + 1) : "";
        }
        for (int h = 0; h < headerRows; h++) {
            String[] f = dialect.fields(lines.get(h).text());
            if (f.length != columns) {
                throw new ImportException(source, lines.get(h).number(), "header", f.length
                        + " fields but the data rows have " + columns);
            }
            for (int c = 0; c < columns; c++) {
                headers[c] = (headers[c] + " " + f[c]).trim();
            }
        }
        long headerLine = lines.get(0).number();
        AxisUnit unit = axisUnit(headers[0], headerRows, options, source, headerLine);

        int rows = lines.size() - headerRows;
        double[] x = new double[rows];
        double[][] y = new double[columns - 1][rows];
        for (int r = 0; r < rows; r++) {
            Line line = lines.get(headerRows + r);
            String[] f = dialect.fields(line.text());
            if (f.length != columns) {
                throw new ImportException(source, line.number(), "row", f.length + " fields but " + columns
                        + " expected");
            }
            x[r] = value(f[0], dialect, source, line.number(), headers[0]);
            for (int c = 1; c < columns; c++) {
                y[c - 1][r] = value(f[c], dialect, source, line.number(), headers[c]);
            }
        }
        Map<String, String> common = new LinkedHashMap<>();
        common.put(AXIS_UNIT_IN_FILE, unit.name());
        common.put("dialect", dialect.describe());
        SpectralAxis axis = axis(x, unit, options, lines, headerRows, source, headers[0], common);
        List<ImportedRecord> records = new ArrayList<>();
        long first = lines.get(0).number();
        long last = lines.get(lines.size() - 1).number();
        for (int c = 1; c < columns; c++) {
            Map<String, String> metadata = new LinkedHashMap<>(common);
            metadata.put(COLUMN, headers[c]);
            double[] values = y[c - 1];
            if (options.wavelengthToWavenumber() && unit == AxisUnit.MICROMETRE && x.length > 1 && x[1] > x[0]) {
                values = reversed(values); // the wavenumber axis is kept ascending
            }
            records.add(new ImportedSpectrum(new Spectrum(axis, values, ColumnUnits.ordinate(headers[c])), metadata,
                    first, last));
        }
        return new ImportedData(source, "delimited text (" + dialect.describe() + ")", records);
    }

    private static AxisUnit axisUnit(String header, int headerRows, ImportOptions options, String source, long line)
            throws ImportException {
        if (headerRows == 0) {
            if (options.assumedAxisUnit() == null) {
                throw new ImportException(source, line, "column 1", "no header names the axis unit and no unit is"
                        + " assumed in the import options");
            }
            return options.assumedAxisUnit();
        }
        AxisUnit unit = ColumnUnits.axis(header);
        if (unit == null) {
            throw new ImportException(source, line, header.isEmpty() ? "column 1" : header,
                    "unknown axis unit (expected wavenumber in cm-1 or wavelength in micrometres)");
        }
        return unit;
    }

    private static SpectralAxis axis(double[] x, AxisUnit unit, ImportOptions options, List<Line> lines,
            int headerRows, String source, String field, Map<String, String> metadata) throws ImportException {
        double[] values = x;
        AxisUnit target = unit;
        if (options.wavelengthToWavenumber() && unit == AxisUnit.MICROMETRE) {
            values = new double[x.length];
            for (int i = 0; i < x.length; i++) {
                if (!(x[i] > 0)) {
                    throw new ImportException(source, lines.get(headerRows + i).number(), field,
                            "wavelength " + x[i] + " must be positive to convert it to a wavenumber");
                }
                values[i] = 1e4 / x[i]; // cm-1 from micrometres
            }
            if (values.length > 1 && values[1] < values[0]) {
                values = reversed(values);
            }
            target = AxisUnit.WAVENUMBER;
            metadata.put("axis converted", "wavenumber = 1e4 / wavelength in micrometres");
        }
        try {
            return SpectralAxis.of(target, values);
        } catch (IllegalArgumentException e) {
            int index = indexIn(e.getMessage());
            if (target != unit && values.length > 1) {
                index = values.length - 1 - index; // reported in file order
            }
            throw new ImportException(source, lines.get(headerRows + Math.max(0, index)).number(), field,
                    "axis is not strictly monotonic: " + e.getMessage());
        }
    }

    private static double value(String field, Dialect d, String source, long line, String header)
            throws ImportException {
        Double v = d.number(field);
        if (v == null || !Double.isFinite(v)) {
            String lower = field.toLowerCase(Locale.ROOT);
            String why = lower.contains("nan") || lower.contains("inf") ? "not a finite number"
                    : field.isEmpty() ? "empty field" : "not a number";
            throw new ImportException(source, line, header, why + ": '" + Numbers.shown(field) + "'");
        }
        return v;
    }

    private static boolean numeric(String[] fields, Dialect d) {
        for (String f : fields) {
            if (d.number(f) == null) {
                return false;
            }
        }
        return true;
    }

    private static double[] reversed(double[] v) {
        double[] r = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            r[i] = v[v.length - 1 - i];
        }
        return r;
    }

    private static int indexIn(String message) {
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("index (\\d+)").matcher(message);
        return m.find() ? Integer.parseInt(m.group(1)) : 0;
    }

    private record Line(long number, String text) {
    }

    private static List<Line> contentLines(String text, int max) {
        List<Line> lines = new ArrayList<>();
        String[] all = text.split("\r\n|\n|\r", -1);
        for (int i = 0; i < all.length && lines.size() < max; i++) {
            String s = i == 0 && all[i].startsWith("\uFEFF") ? all[i].substring(1) : all[i];
            if (!s.isBlank() && !s.stripLeading().startsWith("#")) {
                lines.add(new Line(i + 1, s));
            }
        }
        return lines;
    }
}
