package org.tracegas.audit.internal;

import java.io.IOException;
import java.io.Writer;
import java.util.List;

/** CSV output per RFC 4180: CRLF line ends; fields holding a comma, quote, CR or LF are quoted, quotes doubled. */
public final class Csv {

    private final Writer out;

    public Csv(Writer out) {
        this.out = out;
    }

    /** Writes one line; a null field is written empty. */
    public void line(List<String> fields) throws IOException {
        for (int i = 0; i < fields.size(); i++) {
            if (i > 0) {
                out.write(',');
            }
            String f = fields.get(i);
            if (f != null) {
                out.write(quote(f));
            }
        }
        out.write("\r\n");
    }

    static String quote(String field) {
        boolean needs = field.chars().anyMatch(ch -> ch == ',' || ch == '"' || ch == '\r' || ch == '\n');
        return needs ? '"' + field.replace("\"", "\"\"") + '"' : field;
    }
}
