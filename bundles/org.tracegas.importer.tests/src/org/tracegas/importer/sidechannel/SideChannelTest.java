package org.tracegas.importer.sidechannel;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.time.Instant;
import java.time.ZoneId;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracegas.importer.ImportException;

class SideChannelTest {

    private static final Instant T0 = Instant.parse("2026-11-30T10:00:00Z");

    private static String resource(String name) throws IOException {
        try (InputStream in = SideChannelTest.class.getResourceAsStream(name)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    private static SideChannelSeries analyzers() throws Exception {
        return new SideChannelReader(null).read(resource("analyzers.csv"), "analyzers.csv");
    }

    @Test
    void readsChannelsWithBracketedUnits() throws Exception {
        SideChannelSeries s = analyzers();
        assertEquals(List.of("O2", "T", "p", "flow"), s.channels());
        assertEquals(List.of("%vol", "°C", "hPa", "l/min"), s.units());
        assertEquals(4, s.size());
        assertEquals(T0.plusSeconds(10), s.time(1));
        assertEquals(3, s.line(1));
    }

    @Test
    void unitsRowDecimalCommaAndLocalTimes() throws Exception {
        SideChannelSeries s = new SideChannelReader(ZoneId.of("Europe/Berlin")).read(resource("local-time.csv"), "l.csv");
        assertEquals(List.of("%vol", "hPa"), s.units());
        // 11:00 in Berlin in November (CET, UTC+1) is 10:00 UTC
        assertEquals(T0, s.time(0));
        assertEquals(1013.4, s.value(1, 1), 0.0);
        ImportException e = assertThrows(ImportException.class,
                () -> new SideChannelReader(null).read(resource("local-time.csv"), "l.csv"));
        assertEquals(3, e.line());
        assertEquals("Zeit", e.field());
        assertTrue(e.reason().contains("no offset"), e.getMessage());
    }

    @Test
    void nearestSampleWithinTolerance() throws Exception {
        SideChannelJoin join = new SideChannelJoin(analyzers());
        JoinedValues v = join.nearest(T0.plusSeconds(12), Duration.ofSeconds(3));
        assertEquals(21.0, v.get("O2"), 0.0);
        assertEquals("%vol", v.units().get("O2"));
        // exactly between 10:00:00 and 10:00:10: the earlier sample
        assertEquals(20.0, join.nearest(T0.plusSeconds(5), Duration.ofSeconds(5)).get("O2"), 0.0);
        ImportException e = assertThrows(ImportException.class,
                () -> join.nearest(T0.plusSeconds(45), Duration.ofSeconds(3)));
        assertEquals("analyzers.csv", e.source());
        assertEquals(4, e.line());
        assertEquals("time", e.field());
    }

    @Test
    void timeWeightedMeanOverTheAcquisitionInterval() throws Exception {
        SideChannelJoin join = new SideChannelJoin(analyzers());
        // straight lines between (0 s, 20), (10 s, 21), (20 s, 19): the value is 20.5 at 5 s and 20 at 15 s;
        // trapezoids: (20.5+21)/2*5 + (21+20)/2*5 = 206.25 over 10 s = 20.625 (computed by hand)
        JoinedValues v = join.meanOver(T0.plusSeconds(5), T0.plusSeconds(15), Duration.ofSeconds(30));
        assertEquals(20.625, v.get("O2"), 1e-12);
        // flow is 5 until 10 s and rises to 6 at 20 s: (5*5 + (5+5.5)/2*5)/10 = 5.125
        assertEquals(5.125, v.get("flow"), 1e-12);
        // the interval [10 s, 20 s] ends on samples: (21+19)/2 = 20
        assertEquals(20.0, join.meanOver(T0.plusSeconds(10), T0.plusSeconds(20), Duration.ofSeconds(30)).get("O2"),
                1e-12);
        assertEquals(20.5, join.meanOver(T0.plusSeconds(5), T0.plusSeconds(5), Duration.ofSeconds(30)).get("O2"),
                1e-12);
    }

    @Test
    void intervalOutsideTheSamplesOrAcrossAGapIsAnError() throws Exception {
        SideChannelJoin join = new SideChannelJoin(analyzers());
        ImportException outside = assertThrows(ImportException.class,
                () -> join.meanOver(T0.minusSeconds(5), T0.plusSeconds(5), Duration.ofSeconds(30)));
        assertEquals(2, outside.line());
        assertTrue(outside.reason().contains("cover"), outside.getMessage());
        ImportException gap = assertThrows(ImportException.class,
                () -> join.meanOver(T0.plusSeconds(15), T0.plusSeconds(30), Duration.ofSeconds(30)));
        assertEquals(5, gap.line());
        assertTrue(gap.reason().contains("gap"), gap.getMessage());
    }

    @Test
    void malformedFilesNameLineAndField() {
        SideChannelReader reader = new SideChannelReader(null);
        ImportException order = assertThrows(ImportException.class, () -> reader.read(
                "time,O2\n2026-11-30T10:00:10Z,1\n2026-11-30T10:00:00Z,2\n", "o.csv"));
        assertEquals(3, order.line());
        assertEquals("time", order.field());
        ImportException nan = assertThrows(ImportException.class, () -> reader.read(
                "time,O2\n2026-11-30T10:00:10Z,NaN\n", "n.csv"));
        assertEquals("O2", nan.field());
        assertEquals(2, nan.line());
        assertEquals("file", assertThrows(ImportException.class, () -> reader.read("", "e.csv")).field());
    }
}
