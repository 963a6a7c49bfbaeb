package org.tracegas.ui.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.Instant;

import org.junit.jupiter.api.Test;

/** Clock-time labels of hours counted from a start (calendar arithmetic in UTC, common practice, no source). */
class ClockTimeTest {

    private static final Instant START = Instant.parse("2026-07-14T05:55:00Z");

    @Test
    void aDayIsLabelledWithItsClockTimeAndTheDateGoesInTheAxisTitle() {
        ClockTime clock = new ClockTime(START, 12);
        assertEquals("05:55", clock.format(0.0));
        // 6.5 h after 05:55 is 12:25
        assertEquals("12:25", clock.format(6.5));
        assertEquals("Time (UTC) on 2026-07-14", clock.axisTitle(12));
        assertEquals("2026-07-14 12:25 UTC", clock.full(6.5));
    }

    @Test
    void aPeriodOverMidnightCarriesTheDayInItsLabels() {
        ClockTime clock = new ClockTime(START, 30);
        // 20 h after 05:55 on the 14th is 01:55 on the 15th
        assertEquals("07-15 01:55", clock.format(20.0));
        assertEquals("Time (UTC), 2026-07-14 to 2026-07-15", clock.axisTitle(20));
    }

    @Test
    void aFewMinutesCarryTheSecondsInTheirLabels() throws Exception {
        ClockTime minutes = new ClockTime(START, 0.05);
        // 0.0125 h = 45 s
        assertEquals("05:55:45", minutes.format(0.0125));
        assertEquals(0.0125, (Double) minutes.parseObject("05:55:45"), 1e-9);
    }

    @Test
    void labelsReadBackIntoHoursFromTheStart() throws Exception {
        ClockTime day = new ClockTime(START, 12);
        assertEquals(6.5, (Double) day.parseObject("12:25"), 1e-9);
        // 01:55 lies before the 05:55 start, so it is the next morning: 20 h later
        assertEquals(20.0, (Double) day.parseObject("01:55"), 1e-9);
        assertEquals(20.0, (Double) new ClockTime(START, 30).parseObject("07-15 01:55"), 1e-9);
        assertThrows(java.text.ParseException.class, () -> day.parseObject("noon"));
    }

    @Test
    void aClockWithoutStartIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new ClockTime(null, 1));
        assertEquals("start must not be null", e.getMessage());
    }
}
