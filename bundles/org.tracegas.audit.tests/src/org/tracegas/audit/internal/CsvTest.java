package org.tracegas.audit.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.StringWriter;
import java.util.Arrays;

import org.junit.jupiter.api.Test;

class CsvTest {

    @Test
    void quotesPerRfc4180() throws Exception {
        StringWriter out = new StringWriter();
        Csv csv = new Csv(out);
        csv.line(Arrays.asList("plain", "a,b", "say \"hi\"", "two\nlines", "cr\r", null, ""));
        csv.line(Arrays.asList("x"));
        // RFC 4180 section 2: rule 1 CRLF line breaks; rule 6 fields with CRLF, quotes or commas are enclosed
        // in double quotes; rule 7 a double quote inside is escaped by another double quote
        assertEquals("plain,\"a,b\",\"say \"\"hi\"\"\",\"two\nlines\",\"cr\r\",,\r\nx\r\n", out.toString());
    }
}
