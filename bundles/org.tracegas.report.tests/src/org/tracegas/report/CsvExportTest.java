package org.tracegas.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.List;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.tracegas.qa.basis.LimitStatus;

class CsvExportTest {

    private static final Instant T = Instant.parse("2026-03-02T21:00:00Z");

    @Test
    void rfc4180LinesAndQuoting() {
        // RFC 4180 section 2: CRLF line breaks; fields with commas, quotes or line breaks in double quotes;
        // a quote inside a quoted field is doubled
        String csv = CsvExport.toCsv(List.of(
                new ResultRow("CO", "30 min", T, 181.25, 17.0, "mg/m³", List.of("upset, plant log", "say \"hi\""),
                        OptionalDouble.of(150), LimitStatus.EXCEEDED),
                new ResultRow("HCl", "30 min", T, 7.5, 1.0, "mg/m³", List.of(), OptionalDouble.empty(),
                        LimitStatus.NO_LIMIT),
                new ResultRow("NO", "30 min", T, 12.0, 1.0, "mg/m³", List.of(), OptionalDouble.empty(),
                        LimitStatus.NO_LIMIT, "x1.0031 (T header, p header, path nominal); F 1.2")));
        String[] lines = csv.split("\r\n", -1);
        assertEquals(5, lines.length); // header, three records, empty after the last CRLF
        assertEquals(CsvExport.HEADER, lines[0]);
        assertEquals("CO,30 min,2026-03-02T21:00:00Z,181.25,17.0,mg/m³,"
                + "\"upset, plant log; say \"\"hi\"\"\",150.0,exceeded,", lines[1]);
        assertEquals("HCl,30 min,2026-03-02T21:00:00Z,7.5,1.0,mg/m³,,,no limit,", lines[2]);
        // the row's own cell correction, which the report states once for its table
        assertEquals("NO,30 min,2026-03-02T21:00:00Z,12.0,1.0,mg/m³,,,no limit,"
                + "\"x1.0031 (T header, p header, path nominal); F 1.2\"", lines[3]);
        assertEquals("", lines[4]);
        assertTrue(csv.indexOf('\n') == csv.indexOf("\r\n") + 1, "no bare LF");
    }

    @Test
    void aPeriodShortOfDataIsExportedAsNotAssessedNeverWithin() {
        String csv = CsvExport.toCsv(List.of(new ResultRow("CO", "30 min", T, 20.0, 2.0, "mg/m³",
                List.of("availability 60 % (18 of 30)"), OptionalDouble.of(150), LimitStatus.NOT_ASSESSED)));
        assertTrue(csv.contains(",not assessed (insufficient data)"), csv);
        assertTrue(!csv.contains("within"), csv);
        assertThrows(IllegalArgumentException.class, () -> new ResultRow("CO", "30 min", T, 20.0, 2.0, "mg/m³",
                List.of(), OptionalDouble.empty(), LimitStatus.WITHIN));
    }

    @Test
    void lineBreakInAFieldIsQuoted() {
        assertEquals("\"two\r\nlines\"", CsvExport.quote("two\r\nlines"));
        assertEquals("plain", CsvExport.quote("plain"));
    }

    @Test
    void everyResultOfTheCampaignIsExported() {
        ReportContent c = CampaignFixture.unsigned().build();
        String csv = CsvExport.toCsv(c.results());
        assertEquals(c.results().size() + 1, csv.split("\r\n").length);
        assertEquals(c.results().stream().filter(r -> r.status() == LimitStatus.EXCEEDED).count(),
                csv.lines().filter(l -> l.contains(",exceeded,")).count());
    }
}
