package org.tracegas.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.math.BigDecimal;
import java.time.format.DateTimeFormatter;
import java.util.List;

/**
 * Result table as CSV after RFC 4180: CRLF line ends, a header line, fields with comma, quote or line break
 * enclosed in double quotes with inner quotes doubled. Numbers are written in full, with a point as decimal
 * separator; times in ISO 8601 UTC.
 */
public final class CsvExport {

    static final String HEADER = "compound,period,period_start_utc,value,expanded_uncertainty_k2,unit,flags,limit,"
            + "limit_status,cell_correction";

    private CsvExport() {
    }

    public static String toCsv(List<ResultRow> rows) {
        StringBuilder sb = new StringBuilder();
        try {
            write(rows, new Writer() {
                @Override
                public void write(char[] c, int off, int len) {
                    sb.append(c, off, len);
                }

                @Override
                public void flush() {
                }

                @Override
                public void close() {
                }
            });
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return sb.toString();
    }

    public static void write(List<ResultRow> rows, Writer out) throws IOException {
        out.write(HEADER);
        out.write("\r\n");
        for (ResultRow r : rows) {
            String[] fields = {r.compound(), r.period(), DateTimeFormatter.ISO_INSTANT.format(r.periodStart()),
                    number(r.value()), number(r.expandedUncertainty()), r.unit(), String.join("; ", r.flags()),
                    r.limit().isPresent() ? number(r.limit().getAsDouble()) : "", limitStatus(r), r.cellCorrection()};
            for (int i = 0; i < fields.length; i++) {
                if (i > 0) {
                    out.write(',');
                }
                out.write(quote(fields[i]));
            }
            out.write("\r\n");
        }
        out.flush();
    }

    static String limitStatus(ResultRow r) {
        return r.status().label();
    }

    static String quote(String field) {
        if (field.indexOf(',') < 0 && field.indexOf('"') < 0 && field.indexOf('\r') < 0 && field.indexOf('\n') < 0) {
            return field;
        }
        return '"' + field.replace("\"", "\"\"") + '"';
    }

    private static String number(double v) {
        return BigDecimal.valueOf(v).toPlainString();
    }
}
