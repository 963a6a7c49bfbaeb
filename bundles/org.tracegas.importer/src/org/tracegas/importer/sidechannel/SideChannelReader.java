package org.tracegas.importer.sidechannel;

import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDateTime;
import java.time.OffsetDateTime;
import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.tracegas.importer.ImportException;
import org.tracegas.importer.ImportOptions;
import org.tracegas.importer.delimited.internal.Dialect;
import org.tracegas.importer.internal.Numbers;
import org.tracegas.importer.internal.WholeFile;

/**
 * Reads time-stamped delimited text of other analyzers. The first row names the columns, the first column is the
 * time, every further column a channel; a unit stands in brackets after the name ("O2 [%vol]") or in an
 * optional second row. Times are ISO 8601 with offset or 'Z' ("2026-11-30T10:15:00Z"); times without offset
 * ("2026-11-30 10:15:00") need the zone they were recorded in. Separators and decimal comma as for spectra.
 */
public final class SideChannelReader {

    private static final Pattern BRACKETED_UNIT = Pattern.compile("^(.*?)\\s*[\\[(](.*)[\\])]\\s*$");
    private static final DateTimeFormatter LOCAL = DateTimeFormatter.ofPattern("yyyy-MM-dd[ ]['T']HH:mm:ss[.SSS]");

    private final ZoneId localZone;

    /** @param localZone zone of times written without offset; null to refuse such times */
    public SideChannelReader(ZoneId localZone) {
        this.localZone = localZone;
    }

    public SideChannelSeries read(Path file, ImportOptions options) throws ImportException {
        return read(WholeFile.readText(file, options), file.toString());
    }

    public SideChannelSeries read(String text, String source) throws ImportException {
        String[] all = text.split("\r\n|\n|\r", -1);
        List<Integer> numbers = new ArrayList<>();
        List<String> lines = new ArrayList<>();
        for (int i = 0; i < all.length; i++) {
            String s = i == 0 && all[i].startsWith("\uFEFF") ? all[i].substring(1) : all[i];
            if (!s.isBlank() && !s.stripLeading().startsWith("#")) {
                numbers.add(i + 1);
                lines.add(s);
            }
        }
        if (lines.isEmpty()) {
            throw new ImportException(source, 0, "file", "is empty");
        }
        Dialect dialect = Dialect.detect(lines.subList(0, Math.min(50, lines.size())));
        if (dialect == null) {
            throw new ImportException(source, numbers.get(0), "separator",
                    "no tab, semicolon or comma splits the lines into time and at least one channel");
        }
        String[] header = dialect.fields(lines.get(0));
        int columns = header.length;
        List<String> names = new ArrayList<>();
        List<String> units = new ArrayList<>();
        for (int c = 1; c < columns; c++) {
            Matcher m = BRACKETED_UNIT.matcher(header[c]);
            names.add(m.matches() ? m.group(1) : header[c]);
            units.add(m.matches() ? m.group(2).trim() : "");
            if (names.get(c - 1).isEmpty()) {
                throw new ImportException(source, numbers.get(0), "column " + (c + 1), "channel without a name");
            }
        }
        int first = 1;
        if (lines.size() > 1 && parseTime(dialect.fields(lines.get(1))[0]) == null) {
            String[] unitRow = dialect.fields(lines.get(1));
            if (unitRow.length != columns) {
                throw new ImportException(source, numbers.get(1), "units", unitRow.length + " fields but the header has "
                        + columns);
            }
            for (int c = 1; c < columns; c++) {
                units.set(c - 1, unitRow[c]);
            }
            first = 2;
        }
        int rows = lines.size() - first;
        if (rows < 1) {
            throw new ImportException(source, numbers.get(numbers.size() - 1), "data", "no samples");
        }
        long[] times = new long[rows];
        long[] lineNumbers = new long[rows];
        double[][] values = new double[columns - 1][rows];
        for (int r = 0; r < rows; r++) {
            int lineNo = numbers.get(first + r);
            String[] f = dialect.fields(lines.get(first + r));
            if (f.length != columns) {
                throw new ImportException(source, lineNo, "row", f.length + " fields but " + columns + " expected");
            }
            Instant t = parseTime(f[0]);
            if (t == null) {
                throw new ImportException(source, lineNo, header[0], "not a time: '" + Numbers.shown(f[0]) + "'"
                        + (looksLocal(f[0]) ? " (no offset and no local zone given)" : ""));
            }
            times[r] = t.toEpochMilli();
            if (r > 0 && times[r] <= times[r - 1]) {
                throw new ImportException(source, lineNo, header[0], "time " + t + " does not follow "
                        + Instant.ofEpochMilli(times[r - 1]) + " of line " + lineNumbers[r - 1]);
            }
            lineNumbers[r] = lineNo;
            for (int c = 1; c < columns; c++) {
                Double v = dialect.number(f[c]);
                if (v == null || !Double.isFinite(v)) {
                    String lower = f[c].toLowerCase(Locale.ROOT);
                    throw new ImportException(source, lineNo, header[c], (lower.contains("nan") ? "not a finite number"
                            : f[c].isEmpty() ? "empty field" : "not a number") + ": '" + Numbers.shown(f[c]) + "'");
                }
                values[c - 1][r] = v;
            }
        }
        return new SideChannelSeries(source, names, units, times, values, lineNumbers);
    }

    private boolean looksLocal(String s) {
        return localZone == null && parseLocal(s) != null;
    }

    private Instant parseTime(String s) {
        try {
            return OffsetDateTime.parse(s.replace(' ', 'T')).toInstant();
        } catch (DateTimeParseException e) {
            LocalDateTime local = parseLocal(s);
            return local == null || localZone == null ? null : local.atZone(localZone).toInstant();
        }
    }

    private static LocalDateTime parseLocal(String s) {
        try {
            return LocalDateTime.parse(s, LOCAL);
        } catch (DateTimeParseException e) {
            return null;
        }
    }
}
